package org.trundle.core.engine;

import org.hipparchus.ode.AbstractIntegrator;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;
import org.trundle.core.AppliedLoad;
import org.trundle.core.Phase;
import org.trundle.core.RunObserver;

/**
 * The Hipparchus adapter: integrates one segment of constant phase with Dormand–Prince 8(5,3), or with
 * the {@link SymmetricProjectionIntegrator} when the settings ask for it in rolling and flight, on
 * the phase's compact layout, watching the {@link SwitchRule}s of that phase, until the first
 * switch or the end time. Its step observer samples, keeps the last good state and the ledger, and
 * leaves the integration ({@link ProjectionRestart}) when a step end has drifted past the projection
 * thresholds.
 */
final class Segment {
    private final Run run;
    private final Transitions transitions;
    /** Every rule, in the order their detectors are added (which orders simultaneous events). */
    private final SwitchRule[] rules;
    /** Integrated layout per patch and phase, built on first use. */
    private final int[][][] layouts;
    /** Integrated layout of two rolling contacts on still patches, without and with couples, built on first use. */
    private final int[][] pairLayouts = new int[2][];
    /** The rule whose switch stopped the segment, or null. */
    SwitchRule fired;
    /** The time the current segment started at (s). */
    double startTime;
    /** The right-hand side's observer of Dormand–Prince's step-end stage (off on symmetric segments). */
    private final Dynamics.StageObserver stageObserver;
    /**
     * Whether the current segment runs on the symmetric integrator, whose step ends are on the manifold
     * to rounding already: no projection restart (with a projection threshold set near rounding, a
     * restart after every step would only cost).
     */
    private boolean symmetricSegment;

    Segment(Run run, Transitions transitions) {
        this.run = run;
        this.transitions = transitions;
        java.util.List<SwitchRule> list = new java.util.ArrayList<>(java.util.List.of(
            new LiftOffRule(run, 0), new RestRule(run), new FitRule(run), new ExitRule(run, 0),
            new SlipRule(run, 0), new StickRule(run, 0)));
        for (ContactSlot s : run.slots) {
            list.add(new ImpactRule(run, s));
        }
        for (ContactSlot s : run.slots) {
            if (s.compliance != null) {
                list.add(new ReleaseRule(run, s));
            }
        }
        list.add(new PivotRule(run));
        if (run.slots.length > 1) {
            // the second and third contacts of a scene: their own release, slip and stick
            for (int k = 1; k < ContactForceSolver.MAX_CONTACTS; k++) {
                list.add(new LiftOffRule(run, k));
                list.add(new SlipRule(run, k));
                list.add(new StickRule(run, k));
                list.add(new ExitRule(run, k));
            }
        }
        this.rules = list.toArray(new SwitchRule[0]);
        this.layouts = new int[run.slots.length][Phase.values().length][];
        this.stageObserver = run.dyn.stageObserver;
    }

    /**
     * Integrates from the run's state until a switch or the end time.
     *
     * @return the state at the end of the segment
     * @throws ProjectionRestart when a step end drifted past the projection thresholds
     */
    ODEStateAndDerivative integrate() {
        // the last good state must take its full form before the layout changes
        run.lastGoodY();
        Phase phase = run.phase();
        Dynamics dyn = run.dyn;
        dyn.phase = phase;
        int[][] perPhase = layouts[run.slot.index];
        // several contacts integrate the full layout (the velocity is not derived from one normal), except
        // two rolling contacts on still patches: their velocity is derived from the spin, v = r ω × n₀
        // a scene with compliant patches integrates every component in every phase (a compliant contact's
        // damping, friction and drive work may accrue during a rigid contact phase too)
        int[] layout = run.compliant ? StateMapper.identity() : run.contacts.rollingPair() ? pairLayout()
            : run.contacts.multi() ? StateMapper.identity() : perPhase[phase.ordinal()];
        if (layout == null) {
            // a compliant contact integrates flight with every loss (its friction, couples and damping)
            layout = run.compliant && phase == Phase.FLIGHT ? StateMapper.identity()
                : StateMapper.layout(phase, run.slot.couples, run.model.load() != AppliedLoad.NONE,
                    run.slot.moving);
            perPhase[phase.ordinal()] = layout;
        }
        double[] abs = new double[layout.length];
        double[] rel = new double[layout.length];
        for (int i = 0; i < layout.length; i++) {
            abs[i] = run.absTol[layout[i]];
            rel[i] = run.relTol[layout[i]];
        }
        // the smallest step advances the time (a step of zero length would end no step and no check)
        // a free flight ends where it is clear of every patch for good (LeaveCheck), if that is sooner
        double until = Math.min(run.endTime, run.flightClear);
        AbstractIntegrator integ;
        symmetricSegment = symmetricApplies(phase);
        if (symmetricSegment) {
            integ = symmetric(phase, layout);
            // the implicit stages evaluate many times at one time: that is not Dormand–Prince's step end
            dyn.stageObserver = null;
        } else {
            DormandPrince853Integrator dp = new DormandPrince853Integrator(minStep(run.t), until - run.t + 1e-300,
                abs, rel);
            if (run.restartStep > 0) {
                dp.setInitialStepSize(run.restartStep);
            }
            integ = dp;
            dyn.stageObserver = stageObserver;
        }
        run.restartStep = 0;
        integ.addStepHandler(new StepObserver());
        fired = null;
        startTime = run.t;
        if (phase.inContact()) {
            // a switch may hand over a drifted state: start each contact segment well within the
            // projection thresholds (the step observer checks them only at step ends)
            if (run.contacts.multi()) {
                if (transitions.multiDrift(run.t, run.y) >= 0.5) {
                    run.y = transitions.projected(run.t, run.y);
                }
            } else {
                run.slot.query(run.t, run.centreOf(run.y));
                if (run.snapshots.drift(run.y, dyn.geo.distance) >= 0.5) {
                    run.y = transitions.projected(run.t, run.y);
                }
            }
        } else {
            // a flight may end far from where it began: let Newton-based surfaces start afresh
            for (ContactSlot s : run.slots) {
                s.geo.resetHint();
            }
        }
        for (SwitchRule rule : rules) {
            if (rule.watches(phase)) {
                rule.beginSegment();
                integ.addEventDetector(new SwitchDetector(this, rule));
            }
        }
        return integ.integrate(dyn, new ODEState(run.t, dyn.beginSegment(layout, run.y)), until);
    }

    /**
     * The compact rolling layout of two rolling contacts on still patches ({@link ContactSet#rollingPair}):
     * centre, quaternion, spin and the integrals either contact's law or the load can change; the velocity is
     * derived ({@code v = r ω × n₀}, as with one contact).
     */
    private int[] pairLayout() {
        boolean couples = run.contacts.at(0).couples || run.contacts.at(1).couples;
        int i = couples ? 1 : 0;
        if (pairLayouts[i] == null) {
            pairLayouts[i] = StateMapper.layout(Phase.ROLLING, couples, run.model.load() != AppliedLoad.NONE, false);
        }
        return pairLayouts[i];
    }

    /**
     * The smallest step the integrator may take from a time: two units in the last place, so that
     * the step's end is a later time. A step the error control wants shorter fails the run
     * ("minimal step size reached") instead of repeating steps that do not advance.
     *
     * @param t the segment's start time (s)
     * @return the step floor (s)
     */
    static double minStep(double t) {
        return 2 * Math.ulp(t);
    }

    /**
     * Whether a segment in {@code phase} runs on the {@link SymmetricProjectionIntegrator}: when the
     * settings ask for it and the phase is rolling or flight on a patch that stands still with a rigid
     * contact, touching one patch (the reversible phases; sliding, compliant contacts, moving patches and
     * several simultaneous contacts, whose layout and constraints {@link ContactManifold} does not cover,
     * keep Dormand–Prince).
     */
    private boolean symmetricApplies(Phase phase) {
        return run.fixedStep > 0 && (phase == Phase.ROLLING || phase == Phase.FLIGHT) && !run.compliant
            && !run.slot.moving && !run.contacts.multi();
    }

    /**
     * The symmetric integrator of a rolling or flight segment on its compact layout; its implicit stages
     * stop at the rounding of each component's scale (the absolute tolerance's scale: the radius for
     * lengths, the speed scale for velocities, …).
     */
    private SymmetricProjectionIntegrator symmetric(Phase phase, int[] layout) {
        double[] scale = new double[layout.length];
        double tol = run.set.tolerance();
        for (int i = 0; i < layout.length; i++) {
            scale[i] = run.absTol[layout[i]] / tol;
        }
        return new SymmetricProjectionIntegrator(run.fixedStep, run.composition,
            new ContactManifold(run, phase == Phase.ROLLING), scale);
    }

    /**
     * Residuals at an accepted step end in contact (read from the state's snapshot): largest normal
     * force and distance residual {@code |d − r|}.
     */
    private void trackResiduals(Snapshot s) {
        if (run.contacts.multi()) {
            run.maxNormalForce = Math.max(run.maxNormalForce, s.contactLargestForce);
            run.maxDistanceError = Math.max(run.maxDistanceError, s.contactDistanceError);
            return;
        }
        run.maxNormalForce = Math.max(run.maxNormalForce, s.normalForce);
        run.maxDistanceError = Math.max(run.maxDistanceError, Math.abs(s.distance - run.r));
    }

    /** Leaves a segment's integration to project its last accepted state (see {@link StepObserver}). */
    static final class ProjectionRestart extends RuntimeException {
        private static final long serialVersionUID = 1L;
        static final ProjectionRestart INSTANCE = new ProjectionRestart();

        private ProjectionRestart() {
            super("projection restart", null, false, false);
        }
    }

    /** Step observer: samples, last good state, ledger; projection restarts. */
    private final class StepObserver implements ODEStepHandler {
        @Override
        public void handleStep(ODEStateInterpolator interpolator) {
            ODEStateAndDerivative cur = interpolator.getCurrentState();
            if (cur.getTime() == interpolator.getPreviousState().getTime()) {
                // Hipparchus hands over a zero-length remainder after a step-end handler that
                // returned CONTINUE; it is not a step, and sampling it would duplicate the sample
                return;
            }
            run.steps++;
            Phase phase = run.phase();
            Dynamics dyn = run.dyn;
            double tc = cur.getTime();
            boolean observed = run.observer != RunObserver.NONE;
            double[] yc = observed ? run.snapshots.fullState(cur) : null;
            double interval = run.set.sampleInterval();
            if (interval > 0) {
                while (true) {
                    double ts = run.sampleT0 + (run.sampleIndex + 1) * interval;
                    if (ts > tc || ts > run.endTime) {
                        break;
                    }
                    run.sampleIndex++;
                    Interrupted.check();
                    ODEStateAndDerivative si = interpolator.getInterpolatedState(ts);
                    run.emitSample(ts, run.snapshots.fullState(si), phase, false);
                }
            } else if (tc < Math.min(run.endTime, run.flightClear) && observed) {
                run.emitSample(tc, yc, phase, false);
            }
            // kinetic energy, centre and slip from the snapshot (every layout starts with the
            // centre), which the integrator's FSAL stage at the step end filled without an evaluation
            Snapshot s = run.snapshots.at(cur);
            if (run.contacts.multi()) {
                ContactSet set = run.contacts;
                for (int k = 0; k < set.count(); k++) {
                    double sp = s.contactSlipSpeed[k];
                    if (set.at(k).mode == Mode.SLIDING && sp > run.stickEps) {
                        double[] dir = set.at(k).slideDir;
                        for (int i = 0; i < 3; i++) {
                            dir[i] = s.contactSlip[k][i] / sp;
                        }
                    }
                }
            } else if (phase == Phase.SLIDING) {
                double sp = s.slipSpeed;
                if (sp > run.stickEps) {
                    for (int i = 0; i < 3; i++) {
                        dyn.slideDir0[i] = s.slip[i] / sp;
                    }
                }
            }
            double[] yk = run.snapshots.lastKey();
            run.maxKinetic = Math.max(run.maxKinetic, s.kinetic);
            double dx = yk[0] - run.c0[0];
            double dy = yk[1] - run.c0[1];
            double dz = yk[2] - run.c0[2];
            run.extent = Math.max(run.extent, Math.sqrt(dx * dx + dy * dy + dz * dz));
            run.lastGoodY = yc;
            run.lastGoodState = yc == null ? cur : null;
            if (yc == null) {
                double[] sn = s.normal;
                run.lastGoodNormal[0] = sn[0];
                run.lastGoodNormal[1] = sn[1];
                run.lastGoodNormal[2] = sn[2];
            }
            run.lastGoodT = tc;
            run.lastGoodPhase = phase;
            if (phase == Phase.FLIGHT && run.compliant) {
                run.trackForce(tc, yc != null ? yc : run.snapshots.fullState(cur), phase);
            }
            if (phase.inContact()) {
                trackResiduals(run.snapshots.at(cur));
                // a whole step (no event cut it short) whose end drifted past the thresholds: leave
                // the integrator and start afresh from the projected state, with the step size
                // reached (cheaper than a step-end handler, which interpolates every step)
                if (!symmetricSegment && !interpolator.isCurrentStateInterpolated() && s.drift >= 1
                    && tc < run.endTime) {
                    run.restartStep = tc - interpolator.getPreviousState().getTime();
                    throw ProjectionRestart.INSTANCE;
                }
            }
            Interrupted.check();
        }
    }
}
