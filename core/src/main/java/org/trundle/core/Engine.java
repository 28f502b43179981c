package org.trundle.core;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;

/**
 * One run of a {@link Simulation}: the phase machine. It integrates one phase at a time with
 * the phase's event detectors, stops at the first event, applies the switch (impulses, phase
 * choice) and starts the next segment. Owns every workspace of the run.
 */
final class Engine {
    private final Simulation sim;
    private final RunObserver observer;
    private final SolverSettings set;
    private final Surface surface;
    private final ContactLaw law;
    private final double r;
    private final double m;
    private final double k;
    private final double inertia;
    private final double[] g;
    private final Dynamics dyn;
    private final double[] centreWork = new double[3];

    /**
     * Drift of the quaternion norm {@code ||q| − 1|} above which the step-end handler restarts the
     * integrator only to normalise it. The norm does not enter the equations of motion (the spin
     * is integrated on its own and every output state is normalised), so a tight threshold
     * (1e-12 formerly) restarted the integration on most steps at the default tolerance for no
     * gain in accuracy; the quaternion is still normalised whenever a projection happens anyway.
     */
    private static final double QUATERNION_DRIFT = 1e-9;

    private double speedScale;
    private double stickEps;
    private double settleSpeed;
    private double impactSlack;
    private double restSpeed;
    private double restitution;
    private double[] absTol;
    /** Integrated layout per phase (see {@link Dynamics#layout}), built on first use. */
    private final int[][] layouts = new int[Phase.values().length][];
    private final boolean lawCouples;
    private double[] relTol;

    private double t;
    private double[] y;
    private Phase phase;
    private double endTime;

    private final List<RunEvent> events = new ArrayList<>();
    private final List<PhaseSpan> spans = new ArrayList<>();
    private double spanStart;
    private double spanPath;

    private double maxDistanceError;
    private double maxNormalForce;
    private double maxKinetic;
    private double extent;
    private double[] c0;
    private double impactLoss;
    private long steps;
    /** Step size (s) the next segment starts with, after a projection restart; 0: Hipparchus' own estimate. */
    private double restartStep;
    private int sampleIndex;
    private double sampleT0;
    private double[] lastGoodY;
    /** The last accepted step end, kept as the integrator's state until its full form is needed. */
    private ODEStateAndDerivative lastGoodState;
    private double lastGoodT;
    private Phase lastGoodPhase;

    // event-function workspaces (no allocation per call)
    private final double[] gv = new double[3];
    private final double[] ghv = new double[3];
    private final double[] gw = new double[3];
    private final double[] gwd = new double[3];
    private final double[] ga = new double[3];
    private final double[] gb = new double[3];

    // event values of the last few states asked about
    private static final int CACHE = 4;
    /** Event values per state: see {@link #evaluateEventValues}. */
    private static final int VALUES = 14;
    private final double[][] cacheY = new double[CACHE][Dynamics.DIM];
    private final double[] cacheTime = {Double.NaN, Double.NaN, Double.NaN, Double.NaN};
    private final Phase[] cachePhase = new Phase[CACHE];
    private final int[] cacheLength = new int[CACHE];
    /** Bumped whenever a slot is reused, so that the identity shortcut of {@link #g} never reads stale values. */
    private final long[] cacheGeneration = new long[CACHE];
    private ODEStateAndDerivative lastState;
    private int lastStateSlot;
    private long lastStateGeneration;
    /** Full-layout workspace of the event functions (the integrator's states are compact). */
    private final double[] eventFull = new double[Dynamics.DIM];
    private final double[][] cacheValues = new double[CACHE][VALUES];
    /** Per watched trigger (lift-off, slip): times and values of its last three checks in the segment. */
    private final double[][] checkTimes = new double[2][3];
    private final double[][] checkValues = new double[2][3];
    private final int[] checkCount = new int[2];
    private int cacheNext;
    private double cachedHessianNorm;
    private double[] lastValues;

    // set by handlers during a segment
    private Trigger fired;
    private String geometryMessage;

    Engine(Simulation sim, RunObserver observer) {
        this.sim = sim;
        this.observer = observer;
        this.set = sim.settings();
        this.surface = sim.surface();
        this.law = sim.law();
        Ball b = sim.ball();
        this.r = b.radius();
        this.m = b.mass();
        this.k = b.inertiaFactor();
        this.inertia = b.momentOfInertia();
        this.g = sim.gravity().toArray();
        this.dyn = new Dynamics(b, surface, law, g, sim.load());
        this.restitution = law.restitution().orElse(0.0);
        this.lawCouples = Dynamics.addsCouples(law);
        this.dyn.stageObserver = this::stageAtStepEnd;
    }

    RunResult run(BallState start, double duration) {
        t = start.time();
        endTime = t + duration;
        y = new double[Dynamics.DIM];
        Rotation q = start.orientation();
        put(y, Dynamics.C, start.centre());
        put(y, Dynamics.V, start.velocity());
        y[Dynamics.Q] = q.getQ0();
        y[Dynamics.Q + 1] = -q.getQ1();
        y[Dynamics.Q + 2] = -q.getQ2();
        y[Dynamics.Q + 3] = -q.getQ3();
        put(y, Dynamics.W, start.spin());
        c0 = start.centre().toArray();
        double gn = Dynamics.norm(g);
        speedScale = Math.max(Math.max(start.velocity().getNorm(), r * start.spin().getNorm()),
            Math.max(Math.sqrt(gn * r), 1e-3));
        stickEps = set.stickSpeedFraction() * speedScale;
        settleSpeed = set.settleSpeed() > 0 ? set.settleSpeed() : Math.max(0.01 * Math.sqrt(gn * r), 1e-6);
        impactSlack = 1e-9 * r;
        restSpeed = set.restSpeedFraction() * speedScale;
        dyn.stickEps = stickEps;
        dyn.ctx.setSmoothingSpin(set.smoothingSpinFraction() * speedScale / r);
        dyn.ctx.setStickSpin(stickEps / r);
        double tol = set.tolerance();
        double eScale = m * speedScale * speedScale + m * gn * r;
        absTol = new double[Dynamics.DIM];
        relTol = new double[Dynamics.DIM];
        for (int i = 0; i < Dynamics.DIM; i++) {
            relTol[i] = tol;
            double s;
            if (i < Dynamics.V || i == Dynamics.PATH) {
                s = r;
            } else if (i < Dynamics.Q) {
                s = speedScale;
            } else if (i < Dynamics.W) {
                s = 1.0;
            } else if (i < Dynamics.LOSS) {
                s = speedScale / r;
            } else {
                s = eScale;
            }
            absTol[i] = tol * s;
        }
        dyn.budget = set.maxEvaluations();

        try {
            phase = startPhase(start.phase());
        } catch (SurfaceDomainException e) {
            throw new IllegalArgumentException("start state is not valid on this surface: " + e.getMessage(), e);
        }
        BallState s0 = toState(t, y, phase);
        double e0 = sim.energy(s0);
        lastGoodY = y.clone();
        lastGoodT = t;
        lastGoodPhase = phase;
        maxKinetic = s0.kineticEnergy(sim.ball());
        observer.start(s0);
        spanStart = t;
        spanPath = 0;
        sampleT0 = t;
        sampleIndex = 0;
        emitSample(t, y, phase, true);
        for (RunEvent e : events) {
            observer.event(e);
        }

        EndReason reason = null;
        String message = "";
        try {
            while (reason == null) {
                if (events.size() >= set.maxEvents()) {
                    reason = EndReason.BUDGET;
                    message = "event budget of " + set.maxEvents() + " events exhausted";
                    break;
                }
                if (t >= endTime) {
                    reason = EndReason.DURATION;
                    break;
                }
                if (dyn.evaluations >= set.maxEvaluations()) {
                    reason = EndReason.BUDGET;
                    message = "evaluation budget of " + set.maxEvaluations() + " right-hand-side evaluations exhausted";
                    dyn.budget = Long.MAX_VALUE;
                    break;
                }
                if (phase.inContact() && restsNow()) {
                    BallState before = toState(t, y, phase);
                    if (phase == Phase.ROLLING) {
                        setDerivedVelocity();
                    }
                    changePhase(Phase.REST);
                    log(EventKind.REST, before, null, Vector3D.ZERO);
                    reason = EndReason.REST;
                    break;
                }
                fired = null;
                ODEStateAndDerivative end;
                try {
                    end = integrateSegment();
                } catch (ProjectionRestart e) {
                    t = lastGoodT;
                    y = projected(t, lastGoodY());
                    continue;
                } catch (Dynamics.BudgetExhausted e) {
                    // lift the budget so that the end-of-run bookkeeping (end state, samples) can evaluate
                    dyn.budget = Long.MAX_VALUE;
                    reason = EndReason.BUDGET;
                    message = "evaluation budget of " + set.maxEvaluations() + " right-hand-side evaluations exhausted";
                    dyn.budget = Long.MAX_VALUE;
                    restoreLastGood();
                    break;
                } catch (SurfaceDomainException e) {
                    reason = EndReason.GEOMETRY;
                    message = e.getMessage();
                    restoreLastGood();
                    break;
                } catch (Dynamics.NumericalFailure | MathRuntimeException e) {
                    throw new SimulationException("run failed: " + e.getMessage(), lastGoodState(), e);
                }
                t = end.getTime();
                y = fullState(end);
                if (fired == null) {
                    reason = EndReason.DURATION;
                    break;
                }
                try {
                    reason = applySwitch(fired);
                    if (reason == EndReason.GEOMETRY) {
                        message = geometryMessage;
                    }
                } catch (Dynamics.BudgetExhausted e) {
                    reason = EndReason.BUDGET;
                    message = "evaluation budget of " + set.maxEvaluations() + " right-hand-side evaluations exhausted";
                    dyn.budget = Long.MAX_VALUE;
                } catch (SurfaceDomainException e) {
                    reason = EndReason.GEOMETRY;
                    message = e.getMessage();
                    restoreLastGood();
                }
            }
        } catch (Dynamics.BudgetExhausted e) {
            // exhausted outside the integrator: in a switch, the rest test or a start-of-segment check
            reason = EndReason.BUDGET;
            message = "evaluation budget of " + set.maxEvaluations() + " right-hand-side evaluations exhausted";
            restoreLastGood();
        }
        // the closing bookkeeping below evaluates the right-hand side a few more times: lift the budget
        // so that a run that exhausted it still returns its result (it used to throw BudgetExhausted)
        dyn.budget = Long.MAX_VALUE;
        closeSpan();
        BallState endState = toState(t, y, phase);
        emitSample(t, y, phase, true);
        double ke = endState.kineticEnergy(sim.ball());
        maxKinetic = Math.max(maxKinetic, ke);
        double e1 = sim.energy(endState);
        double scale = Math.max(maxKinetic + m * gn * extent, eScale * 1e-12);
        EnergyBudget budget = new EnergyBudget(e0, e1,
            y[Dynamics.LOSS + LossKind.SLIDING_FRICTION.ordinal()],
            y[Dynamics.LOSS + LossKind.ROLLING_RESISTANCE.ordinal()],
            y[Dynamics.LOSS + LossKind.PIVOTING_RESISTANCE.ordinal()],
            y[Dynamics.LOSS + LossKind.OTHER.ordinal()],
            impactLoss, y[Dynamics.APPLIED], scale);
        RunResult result = new RunResult(reason, message, endState, events, spans, budget,
            maxDistanceError, maxNormalForce, dyn.evaluations, steps);
        observer.finish(result);
        return result;
    }

    /** The full state of the last accepted step end (expanded on first use, in the segment's layout). */
    private double[] lastGoodY() {
        if (lastGoodY == null) {
            lastGoodY = fullState(lastGoodState);
            lastGoodState = null;
        }
        return lastGoodY;
    }

    private void restoreLastGood() {
        t = lastGoodT;
        y = lastGoodY().clone();
        phase = lastGoodPhase;
    }

    private BallState lastGoodState() {
        dyn.budget = Long.MAX_VALUE;
        return toState(lastGoodT, lastGoodY(), lastGoodPhase);
    }

    private ODEStateAndDerivative integrateSegment() {
        // the last good state must take its full form before the layout changes
        lastGoodY();
        dyn.phase = phase;
        int[] layout = layouts[phase.ordinal()];
        if (layout == null) {
            layout = Dynamics.layout(phase, lawCouples, sim.load() != AppliedLoad.NONE);
            layouts[phase.ordinal()] = layout;
        }
        double[] abs = new double[layout.length];
        double[] rel = new double[layout.length];
        for (int i = 0; i < layout.length; i++) {
            abs[i] = absTol[layout[i]];
            rel[i] = relTol[layout[i]];
        }
        DormandPrince853Integrator integ = new DormandPrince853Integrator(0.0, endTime - t + 1e-300, abs, rel);
        if (restartStep > 0) {
            integ.setInitialStepSize(restartStep);
            restartStep = 0;
        }
        integ.addStepHandler(new StepObserver());
        checkCount[0] = 0;
        checkCount[1] = 0;
        if (phase.inContact()) {
            // a switch may hand over a drifted state: start each contact segment well within the
            // projection thresholds (the step observer checks them only at step ends)
            surface.query(t, centreOf(y), dyn.geo);
            if (drift(y, dyn.geo.distance) >= 0.5) {
                y = projected(t, y);
            }
            integ.addEventDetector(new SwitchDetector(this, Trigger.LIFT_OFF, set));
            integ.addEventDetector(new SwitchDetector(this, Trigger.REST, set));
            if (Double.isNaN(surface.maxConcaveCurvature())) {
                integ.addEventDetector(new SwitchDetector(this, Trigger.FIT, set));
            }
            if (surface.hasEdges()) {
                integ.addEventDetector(new SwitchDetector(this, Trigger.EXIT, set));
            }
            if (phase == Phase.ROLLING) {
                dyn.evaluate(t, y);
                if (Double.isFinite(dyn.grip)) {
                    integ.addEventDetector(new SwitchDetector(this, Trigger.SLIP, set));
                }
            } else {
                integ.addEventDetector(new SwitchDetector(this, Trigger.STICK, set));
            }
        } else {
            // a flight may end far from where it began: let Newton-based surfaces start afresh
            dyn.geo.resetHint();
            integ.addEventDetector(new SwitchDetector(this, Trigger.IMPACT, set));
        }
        return integ.integrate(dyn, new ODEState(t, dyn.beginSegment(layout, y)), endTime);
    }

    /** Whether the ball, at the start of a contact segment, is already slow enough and held at rest. */
    private boolean restsNow() {
        dyn.phase = phase;
        dyn.evaluate(t, y);
        double w = Math.sqrt(y[Dynamics.W] * y[Dynamics.W] + y[Dynamics.W + 1] * y[Dynamics.W + 1]
            + y[Dynamics.W + 2] * y[Dynamics.W + 2]);
        return Dynamics.norm(dyn.vel) + r * w <= restSpeed && dyn.canRest(t, y, 1e-9);
    }

    /** Event function value of a trigger at a state. */
    double g(Trigger trig, ODEStateAndDerivative s) {
        int slot;
        if (s == lastState && cacheGeneration[lastStateSlot] == lastStateGeneration && cachePhase[lastStateSlot] == phase) {
            // Hipparchus hands the same (immutable) state object to every detector in turn
            slot = lastStateSlot;
        } else {
            slot = slotOf(s);
            lastState = s;
            lastStateSlot = slot;
            lastStateGeneration = cacheGeneration[slot];
        }
        double[] v = cacheValues[slot];
        cachedHessianNorm = v[6];
        lastValues = v;
        switch (trig) {
            case LIFT_OFF:
                return v[0];
            case SLIP:
                return v[1];
            case STICK:
                return v[2] - stickEps;
            case EXIT:
                return v[4];
            case REST:
                return v[3] - restSpeed;
            case FIT:
                return v[7];
            case IMPACT:
            default:
                return v[5] - r + impactSlack;
        }
    }

    /** The cache slot holding the event values of an integrator state, evaluated if not cached. */
    private int slotOf(ODEStateAndDerivative s) {
        double[] ys = s.getPrimaryState();
        double ts = s.getTime();
        int len = ys.length;
        for (int i = 0; i < CACHE; i++) {
            if (cachePhase[i] == phase && cacheTime[i] == ts && cacheLength[i] == len
                && java.util.Arrays.equals(ys, 0, len, cacheY[i], 0, len)) {
                return i;
            }
        }
        int slot = nextSlot(ts, ys);
        evaluateEventValues(ts, dyn.expand(ys, eventFull), cacheValues[slot]);
        return slot;
    }

    /** Claims the next cache slot for the integrator state (ts, ys), keyed by its compact array. */
    private int nextSlot(double ts, double[] ys) {
        int slot = cacheNext;
        cacheGeneration[slot]++;
        cacheNext = (cacheNext + 1) % CACHE;
        System.arraycopy(ys, 0, cacheY[slot], 0, ys.length);
        cacheLength[slot] = ys.length;
        cacheTime[slot] = ts;
        cachePhase[slot] = phase;
        return slot;
    }

    /**
     * Dormand–Prince 8(5,3) evaluates its last two main stages at the step end, the second at the
     * step's end state itself (first same as last); the detectors ask about that state next, so
     * its event values are taken from that evaluation instead of a new one (a state that differs
     * in the last bit just misses the cache and is evaluated).
     */
    private void stageAtStepEnd(double ts, double[] compact, double[] full, double[] fullDot) {
        if (phase.inContact()) {
            fillEventValues(full, fullDot, cacheValues[nextSlot(ts, compact)]);
        }
    }

    /**
     * Evaluates every event function of the current phase at once into {@code v}: Hipparchus asks
     * each detector in turn about the same few states of a step (its check points and end), so one
     * evaluation per state, kept in a small cache by {@link #g}, serves all detectors. Layout:
     * 0 normal force, 1 grip minus needed tangential force, 2 slip speed, 3 speed measure
     * {@code |v| + r|ω|}, 4 patch margin, 5 centre distance, 6 Hessian norm, 7 {@code 1 − r κ₁},
     * 8–10 normal, 11 constraint drift (the larger of distance residual / (threshold · r) and
     * quaternion-norm drift / its threshold; contact phases only, 0 in flight), 12 acceleration
     * measure {@code |a| + r|α|} (contact phases only), 13 kinetic energy (J). {@code ys} is a
     * full-layout state.
     */
    private void evaluateEventValues(double ts, double[] ys, double[] v) {
        dyn.phase = phase;
        if (phase.inContact()) {
            dyn.evaluate(ts, ys);
        } else {
            surface.query(ts, centreOf(ys), dyn.geo);
        }
        fillEventValues(ys, dyn.lastDerivative(), v);
    }

    /**
     * The event values of {@link #evaluateEventValues} from the results the last evaluation left in
     * {@code dyn} (forces, geometry), for the full state {@code ys} with full derivative {@code yd}.
     */
    private void fillEventValues(double[] ys, double[] yd, double[] v) {
        if (phase.inContact()) {
            v[0] = dyn.normalForce;
            v[1] = dyn.grip - dyn.neededTangential;
            v[2] = dyn.slipSpeed;
            double wx = ys[Dynamics.W];
            double wy = ys[Dynamics.W + 1];
            double wz = ys[Dynamics.W + 2];
            v[3] = Dynamics.norm(dyn.vel) + r * Math.sqrt(wx * wx + wy * wy + wz * wz);
            v[12] = Math.sqrt(yd[Dynamics.V] * yd[Dynamics.V] + yd[Dynamics.V + 1] * yd[Dynamics.V + 1]
                + yd[Dynamics.V + 2] * yd[Dynamics.V + 2]) + r * Math.sqrt(yd[Dynamics.W] * yd[Dynamics.W]
                + yd[Dynamics.W + 1] * yd[Dynamics.W + 1] + yd[Dynamics.W + 2] * yd[Dynamics.W + 2]);
        }
        v[4] = dyn.geo.patchMargin;
        v[5] = dyn.geo.distance;
        double hn = 0;
        for (int i = 0; i < 9; i++) {
            hn += dyn.geo.hessian[i] * dyn.geo.hessian[i];
        }
        v[6] = Math.sqrt(hn);
        v[7] = 1.0 - r * dyn.geo.curvature1;
        double[] n = dyn.geo.normal;
        v[8] = n[0];
        v[9] = n[1];
        v[10] = n[2];
        v[11] = phase.inContact() ? drift(ys, v[5]) : 0.0;
        double[] vel = phase.inContact() ? dyn.vel : null;
        double vx = vel != null ? vel[0] : ys[Dynamics.V];
        double vy = vel != null ? vel[1] : ys[Dynamics.V + 1];
        double vz = vel != null ? vel[2] : ys[Dynamics.V + 2];
        v[13] = kinetic(vx, vy, vz, ys);
    }

    /**
     * Constraint drift of a contact state relative to the projection thresholds (see
     * {@link #evaluateEventValues}). Rolling has no slip drift: its velocity is not integrated but
     * derived, {@code v = r ω × n}.
     */
    private double drift(double[] ys, double distance) {
        double d = Math.abs(distance - r) / (set.projectionThreshold() * r);
        double qn = Math.sqrt(ys[Dynamics.Q] * ys[Dynamics.Q] + ys[Dynamics.Q + 1] * ys[Dynamics.Q + 1]
            + ys[Dynamics.Q + 2] * ys[Dynamics.Q + 2] + ys[Dynamics.Q + 3] * ys[Dynamics.Q + 3]);
        return Math.max(d, Math.abs(qn - 1) / QUATERNION_DRIFT);
    }

    /**
     * Check interval of the lift-off and slip detectors (s). Their functions {@code f} (normal
     * force; grip minus needed tangential force) have no cheap analytic bound on their rate, so a
     * local model is fitted to this detector's last three checks in the segment (values the
     * detector computed anyway, so no extra evaluation): the quadratic through them gives the rate
     * {@code ḟ} and the curvature {@code f̈} now. The pessimistic model
     * {@code f + ḟ τ − ½|f̈| τ² = 0} gives the earliest time {@code τ₀} the function could reach
     * zero; the next check is at {@code τ₀/2}, and never sooner than the configured interval (so a
     * detector is never checked less often than with a fixed interval near a root; until three
     * checks exist, the configured interval is used). Common practice for event location (check
     * spacing from a local model of the event function, as the exit, rest and stick detectors do
     * with their bounds).
     */
    double flowCheckInterval(Trigger trig, ODEStateAndDerivative s) {
        int w = trig == Trigger.LIFT_OFF ? 0 : 1;
        double f = g(trig, s);
        double ts = s.getTime();
        double[] ht = checkTimes[w];
        double[] hf = checkValues[w];
        if (ts > ht[2] || checkCount[w] == 0) {
            ht[0] = ht[1];
            hf[0] = hf[1];
            ht[1] = ht[2];
            hf[1] = hf[2];
            ht[2] = ts;
            hf[2] = f;
            checkCount[w]++;
        } else if (ts < ht[2]) {
            // not in time order (should not happen within a segment): start the history afresh
            checkCount[w] = 1;
            ht[2] = ts;
            hf[2] = f;
        }
        if (!(f > 0) || checkCount[w] < 3) {
            return set.maxCheckInterval();
        }
        double dab = (hf[1] - hf[0]) / (ht[1] - ht[0]);
        double dbc = (hf[2] - hf[1]) / (ht[2] - ht[1]);
        double dabc = (dbc - dab) / (ht[2] - ht[0]);
        double rate = dbc + dabc * (ht[2] - ht[1]);
        double curv = 2 * Math.abs(dabc);
        double tau;
        if (curv > 0) {
            tau = (rate + Math.sqrt(rate * rate + 2 * curv * f)) / curv;
        } else {
            tau = rate < 0 ? f / -rate : Double.POSITIVE_INFINITY;
        }
        if (!(tau >= 0)) {
            return set.maxCheckInterval();
        }
        return Math.max(set.maxCheckInterval(), 0.5 * tau);
    }

    /**
     * Check interval of the stick detector (s). The slip speed {@code |s|} falls to zero with a kink
     * and bounces back, so a step may pass both roots of {@code |s| − ε} between two checks; while
     * {@code |s|} decreases, the next check is set at half the time {@code (|s| − ε)/|d|s|/dt|} the
     * slip needs to reach the band at its current rate, so checks close in geometrically on the
     * root and never step over it.
     */
    double stickCheckInterval(ODEStateAndDerivative s) {
        // sliding integrates the full mechanical state: c, v, q, ω sit at their full indices
        double[] ys = dyn.expand(s.getPrimaryState(), eventFull);
        double[] yd = s.getPrimaryDerivative();
        double ts = s.getTime();
        dyn.evaluate(ts, ys);
        double sp = dyn.slipSpeed;
        double gap = sp - stickEps;
        if (!(gap > 0)) {
            return set.maxCheckInterval();
        }
        double[] n = dyn.geo.normal;
        double[] h = dyn.geo.hessian;
        for (int i = 0; i < 3; i++) {
            gv[i] = ys[Dynamics.V + i];
            gw[i] = ys[Dynamics.W + i];
            gwd[i] = yd[Dynamics.W + i];
        }
        Dynamics.mulSym(h, gv, ghv);
        Dynamics.cross(gwd, n, ga);
        Dynamics.cross(gw, ghv, gb);
        double rate = 0;
        for (int i = 0; i < 3; i++) {
            double sdot = yd[Dynamics.V + i] - r * ga[i] - r * gb[i];
            rate += dyn.slip[i] * sdot / sp;
        }
        if (!(rate < 0)) {
            return set.maxCheckInterval();
        }
        return Math.min(set.maxCheckInterval(), Math.max(0.5 * gap / -rate, set.eventTimeTolerance()));
    }

    /**
     * Check interval of the exit detector (s): the contact point {@code p = c − r n} moves at
     * {@code |ṗ| = |(I − r H) v| ≤ |v| (1 + r‖H‖)}, so it cannot reach the patch edge, {@code margin}
     * away, sooner than {@code margin / (|v| (1 + r‖H‖))}; half of that (and never less than the
     * configured interval) is a safe time to the next check.
     */
    double exitCheckInterval(ODEStateAndDerivative s) {
        double margin = g(Trigger.EXIT, s);
        if (!(margin > 0)) {
            return set.maxCheckInterval();
        }
        double hessianNorm = cachedHessianNorm;
        // |v| + r|ω| bounds |v| from above (the velocity itself is not integrated while rolling)
        double v = lastValues[3];
        double reach = margin / (v * (1 + r * hessianNorm) + 1e-300);
        return Math.max(set.maxCheckInterval(), 0.5 * reach);
    }

    /**
     * Check interval of the rest detector (s): the speed measure {@code |v| + r|ω|} changes at most
     * at {@code |a| + r|α|}, read from the state's derivative, so it cannot fall to the rest speed
     * sooner than {@code (speed − restSpeed)/(|a| + r|α|)} (read from the cached event values,
     * since the rolling velocity is not integrated) while the accelerations stay at that
     * level; half of that (never less than the configured interval) is the time to the next check.
     */
    double restCheckInterval(ODEStateAndDerivative s) {
        double gap = g(Trigger.REST, s);
        if (!(gap > 0)) {
            return set.maxCheckInterval();
        }
        return Math.max(set.maxCheckInterval(), 0.5 * gap / (lastValues[12] + 1e-300));
    }

    /** Reaction to a located root of a trigger's event function. */
    Action occurred(Trigger trig, ODEStateAndDerivative s, boolean increasing) {
        if (increasing) {
            return Action.CONTINUE;
        }
        if (trig == Trigger.IMPACT) {
            // flight integrates the full mechanical state: c, v sit at their full indices
            double[] ys = s.getPrimaryState();
            surface.query(s.getTime(), centreOf(ys), dyn.geo);
            double vn = ys[Dynamics.V] * dyn.geo.normal[0] + ys[Dynamics.V + 1] * dyn.geo.normal[1]
                + ys[Dynamics.V + 2] * dyn.geo.normal[2];
            if (dyn.geo.patchMargin < 0 || vn >= 0) {
                return Action.CONTINUE;
            }
        }
        if (trig == Trigger.REST && !dyn.canRest(s.getTime(), fullState(s), 1e-9)) {
            return Action.CONTINUE;
        }
        fired = trig;
        return Action.STOP;
    }

    /** Applies the switch of a fired trigger at (t, y); returns an end reason or null to go on. */
    private EndReason applySwitch(Trigger trig) {
        if (trig == Trigger.IMPACT) {
            rewindToContact();
        }
        BallState before = toState(t, y, phase);
        switch (trig) {
            case LIFT_OFF: {
                if (phase == Phase.ROLLING) {
                    setDerivedVelocity();
                }
                changePhase(Phase.FLIGHT);
                log(EventKind.LIFT_OFF, before, null, Vector3D.ZERO);
                return null;
            }
            case SLIP: {
                dyn.phase = Phase.ROLLING;
                dyn.evaluate(t, y);
                setSlideDirectionFromRolling();
                setDerivedVelocity();
                changePhase(Phase.SLIDING);
                log(EventKind.SLIP, before, null, Vector3D.ZERO);
                return null;
            }
            case STICK: {
                Vector3D j = stickImpulse();
                Phase next = contactPhaseAfterStick();
                if (next == Phase.SLIDING) {
                    // the grip cannot hold rolling: keep sliding from zero slip, no event
                    phase = Phase.SLIDING;
                    return null;
                }
                changePhase(next);
                log(next == Phase.ROLLING ? EventKind.STICK : EventKind.LIFT_OFF, before, null, j);
                return null;
            }
            case EXIT: {
                surface.query(t, centreOf(y), dyn.geo);
                String edge = surface.edgeName(dyn.geo.edge);
                if (phase == Phase.ROLLING) {
                    setDerivedVelocity();
                }
                if (set.stopAtExit()) {
                    log(EventKind.EXIT, before, before, Vector3D.ZERO, edge);
                    return EndReason.EXIT;
                }
                changePhase(Phase.FLIGHT);
                log(EventKind.EXIT, before, null, Vector3D.ZERO, edge);
                return null;
            }
            case FIT: {
                surface.query(t, centreOf(y), dyn.geo);
                geometryMessage = String.format(Locale.ROOT,
                    "ball of radius %s m no longer fits surface %s at the contact point: r*kappa = %s >= 1",
                    r, surface.name(), r * dyn.geo.curvature1);
                return EndReason.GEOMETRY;
            }
            case REST: {
                if (phase == Phase.ROLLING) {
                    setDerivedVelocity();
                }
                changePhase(Phase.REST);
                log(EventKind.REST, before, null, Vector3D.ZERO);
                return EndReason.REST;
            }
            case IMPACT:
            default: {
                Vector3D j = impact();
                log(EventKind.IMPACT, before, null, j);
                return null;
            }
        }
    }

    private void log(EventKind kind, BallState before, BallState after, Vector3D impulse) {
        log(kind, before, after, impulse, null);
    }

    private void log(EventKind kind, BallState before, BallState after, Vector3D impulse, String edge) {
        BallState a = after != null ? after : toState(t, y, phase);
        RunEvent e = new RunEvent(kind, before, a, edge, impulse);
        events.add(e);
        trackForce(t, y, phase);
        emitSample(t, y, phase, true);
        observer.event(e);
    }

    private void changePhase(Phase next) {
        if (next != phase) {
            closeSpan();
            phase = next;
            spanStart = t;
            spanPath = y[Dynamics.PATH];
        }
    }

    private void closeSpan() {
        if (t > spanStart || spans.isEmpty()) {
            spans.add(new PhaseSpan(phase, spanStart, t, y[Dynamics.PATH] - spanPath));
        }
        spanStart = t;
        spanPath = y[Dynamics.PATH];
    }

    // ---------------------------------------------------------------- start

    private Phase startPhase(Phase requested) {
        surface.query(t, centreOf(y), dyn.geo);
        double gap = dyn.geo.distance - r;
        double tolLen = set.contactTolerance() * r;
        if (requested == Phase.FLIGHT) {
            if (gap < -tolLen) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "start centre penetrates surface %s: distance %s m is below the ball radius %s m",
                    surface.name(), dyn.geo.distance, r));
            }
            return Phase.FLIGHT;
        }
        if (Math.abs(gap) > tolLen) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                "start centre is %s m from surface %s, but a %s start needs distance r = %s m (tolerance %s m);"
                    + " use a flight start for a ball off the surface",
                dyn.geo.distance, surface.name(), requested.label(), r, tolLen));
        }
        if (dyn.geo.patchMargin < 0) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                "start contact point lies outside the patch of surface %s by %s m (edge %s)",
                surface.name(), -dyn.geo.patchMargin, surface.edgeName(dyn.geo.edge)));
        }
        double[] n = dyn.geo.normal;
        double vn = y[Dynamics.V] * n[0] + y[Dynamics.V + 1] * n[1] + y[Dynamics.V + 2] * n[2];
        double tolSpeed = set.contactTolerance() * speedScale;
        if (Math.abs(vn) > tolSpeed) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                "start velocity has a normal component %s m/s on surface %s (tolerance %s m/s);"
                    + " a contact start must move tangentially",
                vn, surface.name(), tolSpeed));
        }
        projectOntoSurface();
        double[] s = slipOf(y);
        double slip = Dynamics.norm(s);
        if (requested == Phase.ROLLING || requested == Phase.REST) {
            if (slip > tolSpeed) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "start velocity violates the no-slip condition v = r w x n by %s m/s (tolerance %s m/s);"
                        + " build a rolling start with Simulation.rollingStart(centre, velocity)",
                    slip, tolSpeed));
            }
        }
        Phase p = chooseContactPhase(slip <= stickEps || requested != Phase.SLIDING);
        if (p == Phase.FLIGHT) {
            BallState s0 = toState(t, y, requested == Phase.SLIDING ? Phase.SLIDING : Phase.ROLLING);
            events.add(new RunEvent(EventKind.LIFT_OFF, s0, toState(t, y, Phase.FLIGHT), null, Vector3D.ZERO));
        } else if (p == Phase.SLIDING && requested != Phase.SLIDING) {
            BallState s0 = toState(t, y, Phase.ROLLING);
            events.add(new RunEvent(EventKind.SLIP, s0, toState(t, y, Phase.SLIDING), null, Vector3D.ZERO));
        }
        return p;
    }

    /**
     * Chooses rolling, sliding or flight for a ball on the surface with no normal velocity.
     * With {@code rollingCandidate} the slip is removed (tiny, by a sticking impulse) and the grip
     * test decides between rolling and sliding.
     */
    private Phase chooseContactPhase(boolean rollingCandidate) {
        if (rollingCandidate) {
            stickImpulse();
            return contactPhaseAfterStick();
        }
        dyn.phase = Phase.SLIDING;
        double[] s = slipOf(y);
        double sp = Dynamics.norm(s);
        for (int i = 0; i < 3; i++) {
            dyn.slideDir0[i] = s[i] / sp;
        }
        dyn.evaluate(t, y);
        return dyn.normalForce > 0 ? Phase.SLIDING : Phase.FLIGHT;
    }

    /** Rolling if the grip holds the no-slip state, else sliding; flight if the normal force would be negative. */
    private Phase contactPhaseAfterStick() {
        dyn.phase = Phase.ROLLING;
        dyn.evaluate(t, y);
        if (!(dyn.normalForce > 0)) {
            return Phase.FLIGHT;
        }
        if (dyn.neededTangential <= dyn.grip) {
            return Phase.ROLLING;
        }
        setSlideDirectionFromRolling();
        return Phase.SLIDING;
    }

    private void setSlideDirectionFromRolling() {
        double f = dyn.neededTangential;
        for (int i = 0; i < 3; i++) {
            dyn.slideDir0[i] = f > 0 ? -dyn.friction[i] / f : 0.0;
        }
        if (!(f > 0)) {
            // no preferred direction: any tangent will do, pick one deterministically
            double[] n = dyn.geo.normal;
            double[] a = Math.abs(n[0]) < 0.9 ? new double[] {1, 0, 0} : new double[] {0, 1, 0};
            Dynamics.cross(n, a, dyn.slideDir0);
            Dynamics.scale(dyn.slideDir0, 1.0 / Dynamics.norm(dyn.slideDir0));
        }
    }

    // ---------------------------------------------------------------- impulses

    /** Removes the contact-point slip by the impulse {@code J = −k m s/(1+k)}; books the loss. */
    private Vector3D stickImpulse() {
        surface.query(t, centreOf(y), dyn.geo);
        double[] s = slipOf(y);
        double f = -k * m / (1 + k);
        double[] j = {f * s[0], f * s[1], f * s[2]};
        double before = kinetic(y);
        applyImpulse(j);
        y[Dynamics.LOSS + LossKind.SLIDING_FRICTION.ordinal()] += before - kinetic(y);
        return new Vector3D(j[0], j[1], j[2]);
    }

    /**
     * The impact detector fires at a penetration of {@code impactSlack} (so that its function is
     * strictly positive when a flight starts on the surface); this moves the flight state back
     * along its own motion, {@code δt = (r − d)/|v_n|}, to the instant of contact {@code d = r}.
     */
    private void rewindToContact() {
        surface.query(t, centreOf(y), dyn.geo);
        double[] n = dyn.geo.normal;
        double vn = y[Dynamics.V] * n[0] + y[Dynamics.V + 1] * n[1] + y[Dynamics.V + 2] * n[2];
        double pen = r - dyn.geo.distance;
        if (!(vn < 0) || !(pen > 0)) {
            return;
        }
        double dt = pen / -vn;
        double[] yd = new double[Dynamics.DIM];
        dyn.phase = Phase.FLIGHT;
        dyn.evaluate(t, y, yd);
        for (int i = 0; i < 3; i++) {
            y[Dynamics.C + i] += -y[Dynamics.V + i] * dt + 0.5 * yd[Dynamics.V + i] * dt * dt;
            y[Dynamics.V + i] -= yd[Dynamics.V + i] * dt;
        }
        t -= dt;
    }

    /** Impact at re-contact: restitution and friction impulses, then the settling hand-over. */
    private Vector3D impact() {
        surface.query(t, centreOf(y), dyn.geo);
        double[] n = dyn.geo.normal.clone();
        double vn = y[Dynamics.V] * n[0] + y[Dynamics.V + 1] * n[1] + y[Dynamics.V + 2] * n[2];
        double[] s = slipOf(y);
        double jn = -(1 + restitution) * m * vn;
        double f = -k * m / (1 + k);
        double[] jt = {f * s[0], f * s[1], f * s[2]};
        double[] w = {y[Dynamics.W], y[Dynamics.W + 1], y[Dynamics.W + 2]};
        dyn.ctx.set(sim.ball(), dyn.geo, jn, Phase.SLIDING, s, w, true);
        double gripJ = law.gripLimit(dyn.ctx);
        double jtn = Dynamics.norm(jt);
        if (jtn > gripJ) {
            double slideJ = law.slidingFriction(dyn.ctx);
            double sp = Dynamics.norm(s);
            for (int i = 0; i < 3; i++) {
                jt[i] = sp > 0 ? -slideJ * s[i] / sp : 0.0;
            }
        }
        double[] j = {jn * n[0] + jt[0], jn * n[1] + jt[1], jn * n[2] + jt[2]};
        double before = kinetic(y);
        applyImpulse(j);
        projectOntoSurface();
        double vn1 = y[Dynamics.V] * n[0] + y[Dynamics.V + 1] * n[1] + y[Dynamics.V + 2] * n[2];
        impactLoss += before - kinetic(y);
        if (vn1 <= settleSpeed) {
            double[] saved = y.clone();
            double ke = kinetic(y);
            for (int i = 0; i < 3; i++) {
                y[Dynamics.V + i] -= vn1 * n[i];
            }
            double settleLoss = ke - kinetic(y);
            double lossBefore = y[Dynamics.LOSS + LossKind.SLIDING_FRICTION.ordinal()];
            double[] sl = slipOf(y);
            Phase next = chooseContactPhase(Dynamics.norm(sl) <= stickEps);
            if (next != Phase.FLIGHT) {
                impactLoss += settleLoss;
                changePhase(next);
                return new Vector3D(j[0], j[1], j[2]).add(-m * vn1, new Vector3D(n[0], n[1], n[2]));
            }
            y = saved;
            y[Dynamics.LOSS + LossKind.SLIDING_FRICTION.ordinal()] = lossBefore;
        }
        phase = Phase.FLIGHT;
        return new Vector3D(j[0], j[1], j[2]);
    }

    private void applyImpulse(double[] j) {
        double[] n = dyn.geo.normal;
        for (int i = 0; i < 3; i++) {
            y[Dynamics.V + i] += j[i] / m;
        }
        // d(omega) = (-r n x J)/I
        double[] nxj = new double[3];
        Dynamics.cross(n, j, nxj);
        for (int i = 0; i < 3; i++) {
            y[Dynamics.W + i] -= r * nxj[i] / inertia;
        }
    }

    // ---------------------------------------------------------------- helpers

    /** Slip velocity of the contact point, tangential part, from the state's v and ω (uses dyn.geo). */
    private double[] slipOf(double[] ys) {
        double[] n = dyn.geo.normal;
        double[] w = {ys[Dynamics.W], ys[Dynamics.W + 1], ys[Dynamics.W + 2]};
        double[] wxn = new double[3];
        Dynamics.cross(w, n, wxn);
        double[] s = new double[3];
        for (int i = 0; i < 3; i++) {
            s[i] = ys[Dynamics.V + i] - r * wxn[i];
        }
        double sn = Dynamics.dot(s, n);
        for (int i = 0; i < 3; i++) {
            s[i] -= sn * n[i];
        }
        return s;
    }

    /** Sets the velocity slot of y to the no-slip velocity r ω × n. */
    private void setDerivedVelocity() {
        surface.query(t, centreOf(y), dyn.geo);
        double[] w = {y[Dynamics.W], y[Dynamics.W + 1], y[Dynamics.W + 2]};
        double[] v = new double[3];
        Dynamics.cross(w, dyn.geo.normal, v);
        for (int i = 0; i < 3; i++) {
            y[Dynamics.V + i] = r * v[i];
        }
    }

    /** Moves the centre to distance r along the normal and removes the normal velocity. */
    private void projectOntoSurface() {
        surface.query(t, centreOf(y), dyn.geo);
        double dr = r - dyn.geo.distance;
        double[] n = dyn.geo.normal;
        for (int i = 0; i < 3; i++) {
            y[Dynamics.C + i] += dr * n[i];
        }
        surface.query(t, centreOf(y), dyn.geo);
        n = dyn.geo.normal;
        double vn = y[Dynamics.V] * n[0] + y[Dynamics.V + 1] * n[1] + y[Dynamics.V + 2] * n[2];
        if (phase == null || phase.inContact()) {
            for (int i = 0; i < 3; i++) {
                y[Dynamics.V + i] -= vn * n[i];
            }
        }
    }

    private double kinetic(double[] ys) {
        return kinetic(ys[Dynamics.V], ys[Dynamics.V + 1], ys[Dynamics.V + 2], ys);
    }

    /** Kinetic energy (J) with centre velocity (vx, vy, vz) and the spin of {@code ys}. */
    private double kinetic(double vx, double vy, double vz, double[] ys) {
        double v2 = vx * vx + vy * vy + vz * vz;
        double w2 = ys[Dynamics.W] * ys[Dynamics.W] + ys[Dynamics.W + 1] * ys[Dynamics.W + 1]
            + ys[Dynamics.W + 2] * ys[Dynamics.W + 2];
        return 0.5 * m * v2 + 0.5 * inertia * w2;
    }


    /**
     * The centre of a state array, copied into the run's workspace (no allocation). The result is
     * only valid until the next call.
     */
    private double[] centreOf(double[] ys) {
        centreWork[0] = ys[Dynamics.C];
        centreWork[1] = ys[Dynamics.C + 1];
        centreWork[2] = ys[Dynamics.C + 2];
        return centreWork;
    }

    private static void put(double[] a, int at, Vector3D v) {
        a[at] = v.getX();
        a[at + 1] = v.getY();
        a[at + 2] = v.getZ();
    }

    /** Domain state from the array state; rolling uses the no-slip velocity. */
    private BallState toState(double ts, double[] ys, Phase p) {
        double vx = ys[Dynamics.V];
        double vy = ys[Dynamics.V + 1];
        double vz = ys[Dynamics.V + 2];
        if (p == Phase.ROLLING || p == Phase.REST) {
            Phase keep = dyn.phase;
            dyn.phase = Phase.ROLLING;
            dyn.evaluate(ts, ys);
            dyn.phase = keep;
            vx = dyn.vel[0];
            vy = dyn.vel[1];
            vz = dyn.vel[2];
        }
        return stateFromVelocity(ts, ys, p, vx, vy, vz);
    }

    private static BallState stateFromVelocity(double ts, double[] ys, Phase p, double vx, double vy, double vz) {
        // the state holds the Hamilton quaternion (body to world); Hipparchus stores its conjugate
        Rotation q = new Rotation(ys[Dynamics.Q], -ys[Dynamics.Q + 1], -ys[Dynamics.Q + 2], -ys[Dynamics.Q + 3], true);
        return BallState.of(ts, new Vector3D(ys[Dynamics.C], ys[Dynamics.C + 1], ys[Dynamics.C + 2]),
            new Vector3D(vx, vy, vz), q, new Vector3D(ys[Dynamics.W], ys[Dynamics.W + 1], ys[Dynamics.W + 2]), p);
    }

    private void trackForce(double ts, double[] ys, Phase p) {
        if (p.inContact()) {
            Phase keep = dyn.phase;
            dyn.phase = p;
            dyn.evaluate(ts, ys);
            dyn.phase = keep;
            maxNormalForce = Math.max(maxNormalForce, dyn.normalForce);
        }
    }

    private void emitSample(double ts, double[] ys, Phase p, boolean isEvent) {
        if (observer == RunObserver.NONE) {
            return;
        }
        Phase keep = dyn.phase;
        dyn.phase = p;
        // output evaluations are neither counted nor budgeted, so that the integration, the
        // evaluation count and a budget stop do not depend on whether anyone observes the run
        long count = dyn.evaluations;
        long budget = dyn.budget;
        dyn.budget = Long.MAX_VALUE;
        dyn.evaluate(ts, ys);
        dyn.evaluations = count;
        dyn.budget = budget;
        dyn.phase = keep;
        // dyn.vel now holds the phase's velocity (the no-slip one while rolling, the state's otherwise)
        BallState s = stateFromVelocity(ts, ys, p, dyn.vel[0], dyn.vel[1], dyn.vel[2]);
        Vector3D fr = new Vector3D(dyn.friction[0], dyn.friction[1], dyn.friction[2]);
        Vector3D cp = null;
        Vector3D onBall = null;
        boolean touching = p != Phase.FLIGHT;
        if (touching) {
            double[] n = dyn.geo.normal;
            cp = new Vector3D(ys[0] - r * n[0], ys[1] - r * n[1], ys[2] - r * n[2]);
            onBall = s.orientation().applyInverseTo(new Vector3D(-r * n[0], -r * n[1], -r * n[2]));
        }
        observer.sample(new Sample(s, touching ? dyn.normalForce : 0.0, fr, cp, onBall, isEvent));
    }

    /** Leaves a segment's integration to project its last accepted state (see {@link StepObserver}). */
    private static final class ProjectionRestart extends RuntimeException {
        private static final long serialVersionUID = 1L;
        static final ProjectionRestart INSTANCE = new ProjectionRestart();

        private ProjectionRestart() {
            super("projection restart", null, false, false);
        }
    }

    /** Step observer: samples, last good state, scales; projection restarts. */
    private final class StepObserver implements ODEStepHandler {
        @Override
        public void handleStep(ODEStateInterpolator interpolator) {
            ODEStateAndDerivative cur = interpolator.getCurrentState();
            if (cur.getTime() == interpolator.getPreviousState().getTime()) {
                // Hipparchus hands over a zero-length remainder after a step-end handler that
                // returned CONTINUE; it is not a step, and sampling it would duplicate the sample
                return;
            }
            steps++;
            double tc = cur.getTime();
            boolean observed = observer != RunObserver.NONE;
            double[] yc = observed || phase == Phase.SLIDING ? fullState(cur) : null;
            double interval = set.sampleInterval();
            if (interval > 0) {
                while (true) {
                    double ts = sampleT0 + (sampleIndex + 1) * interval;
                    if (ts > tc || ts > endTime) {
                        break;
                    }
                    sampleIndex++;
                    ODEStateAndDerivative si = interpolator.getInterpolatedState(ts);
                    emitSample(ts, fullState(si), phase, false);
                }
            } else if (tc < endTime && observed) {
                emitSample(tc, yc, phase, false);
            }
            if (phase == Phase.SLIDING) {
                dyn.phase = Phase.SLIDING;
                dyn.evaluate(tc, yc);
                double sp = dyn.slipSpeed;
                if (sp > stickEps) {
                    for (int i = 0; i < 3; i++) {
                        dyn.slideDir0[i] = dyn.slip[i] / sp;
                    }
                }
            }
            // kinetic energy and centre from the event cache (every layout starts with the centre)
            g(Trigger.LIFT_OFF, cur);
            double[] yk = cacheY[lastStateSlot];
            maxKinetic = Math.max(maxKinetic, lastValues[13]);
            double dx = yk[0] - c0[0];
            double dy = yk[1] - c0[1];
            double dz = yk[2] - c0[2];
            extent = Math.max(extent, Math.sqrt(dx * dx + dy * dy + dz * dz));
            lastGoodY = yc;
            lastGoodState = yc == null ? cur : null;
            lastGoodT = tc;
            lastGoodPhase = phase;
            if (phase.inContact()) {
                trackResiduals(cur);
                // a whole step (no event cut it short) whose end drifted past the thresholds: leave
                // the integrator and start afresh from the projected state, with the step size
                // reached (cheaper than a step-end handler, which interpolates every step)
                if (!interpolator.isCurrentStateInterpolated() && lastValues[11] >= 1 && tc < endTime) {
                    restartStep = tc - interpolator.getPreviousState().getTime();
                    throw ProjectionRestart.INSTANCE;
                }
            }
        }
    }

    /**
     * Residuals at an accepted step end in contact (read from the detectors' cached values of that
     * state): largest normal force and distance residual {@code |d − r|}.
     */
    private void trackResiduals(ODEStateAndDerivative state) {
        g(Trigger.LIFT_OFF, state);
        double[] ev = lastValues;
        maxNormalForce = Math.max(maxNormalForce, ev[0]);
        maxDistanceError = Math.max(maxDistanceError, Math.abs(ev[5] - r));
    }

    /**
     * The full-layout state (a new array) of an integrator state of the current segment; while
     * rolling, its velocity slot holds the no-slip {@code r ω × n} (normal from the event cache).
     */
    private double[] fullState(ODEStateAndDerivative s) {
        double[] out = dyn.expand(s.getPrimaryState(), new double[Dynamics.DIM]);
        if (dyn.derivedVelocity()) {
            g(Trigger.LIFT_OFF, s);
            double[] n = {lastValues[8], lastValues[9], lastValues[10]};
            double wx = out[Dynamics.W];
            double wy = out[Dynamics.W + 1];
            double wz = out[Dynamics.W + 2];
            out[Dynamics.V] = r * (wy * n[2] - wz * n[1]);
            out[Dynamics.V + 1] = r * (wz * n[0] - wx * n[2]);
            out[Dynamics.V + 2] = r * (wx * n[1] - wy * n[0]);
        }
        return out;
    }

    /**
     * The projection of a contact state back onto the constraints, applied at an accepted step end
     * where the drift measure of {@link #evaluateEventValues} has reached 1: the centre moves along
     * the normal to {@code d = r}, the quaternion is normalised, and the velocity is set to the
     * no-slip {@code r ω × n} (rolling) or stripped of its normal part (sliding).
     */
    private double[] projected(double ts, double[] ys) {
        surface.query(ts, centreOf(ys), dyn.geo);
        double[] p = ys.clone();
        double dr = r - dyn.geo.distance;
        for (int i = 0; i < 3; i++) {
            p[Dynamics.C + i] += dr * dyn.geo.normal[i];
        }
        double qn = Math.sqrt(p[Dynamics.Q] * p[Dynamics.Q] + p[Dynamics.Q + 1] * p[Dynamics.Q + 1]
            + p[Dynamics.Q + 2] * p[Dynamics.Q + 2] + p[Dynamics.Q + 3] * p[Dynamics.Q + 3]);
        for (int i = 0; i < 4; i++) {
            p[Dynamics.Q + i] /= qn;
        }
        ContactGeometry geo = dyn.geo;
        surface.query(ts, centreOf(p), geo);
        double[] n = geo.normal;
        if (phase == Phase.ROLLING) {
            double[] w = {p[Dynamics.W], p[Dynamics.W + 1], p[Dynamics.W + 2]};
            double[] v = new double[3];
            Dynamics.cross(w, n, v);
            for (int i = 0; i < 3; i++) {
                p[Dynamics.V + i] = r * v[i];
            }
        } else {
            double vn = p[Dynamics.V] * n[0] + p[Dynamics.V + 1] * n[1] + p[Dynamics.V + 2] * n[2];
            for (int i = 0; i < 3; i++) {
                p[Dynamics.V + i] -= vn * n[i];
            }
        }
        return p;
    }
}
