package org.trundle.core.engine;

import static org.trundle.core.engine.StateMapper.APPLIED;
import static org.trundle.core.engine.StateMapper.DIM;
import static org.trundle.core.engine.StateMapper.DRIVE;
import static org.trundle.core.engine.StateMapper.LOSS;
import static org.trundle.core.engine.StateMapper.PATH;
import static org.trundle.core.engine.StateMapper.Q;
import static org.trundle.core.engine.StateMapper.V;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.trundle.core.AppliedLoad;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EnergyBudget;
import org.trundle.core.EventKind;
import org.trundle.core.LossKind;
import org.trundle.core.Phase;
import org.trundle.core.RunEvent;
import org.trundle.core.RunObserver;
import org.trundle.core.RunResult;
import org.trundle.core.SimulationException;
import org.trundle.core.SimulationInterruptedException;
import org.trundle.core.Slab;
import org.trundle.core.SurfaceDomainException;

/**
 * The run loop: sets the run's scales, validates the start, then integrates one {@link Segment} at
 * a time until a switch rule ends the run, the duration is reached or the budget (evaluations,
 * events) is spent, and closes the books (end state, energy budget, residuals). It owns the end
 * reasons and the handling of exceptions; everything else lives in the classes it calls.
 * Internal; {@code Simulation.run} is the public entry.
 */
public final class Engine {
    private final Run run;
    private final Transitions transitions;
    private final Segment segment;

    private Engine(Model model, RunObserver observer) {
        this.run = new Run(model, observer);
        this.transitions = new Transitions(run);
        this.segment = new Segment(run, transitions);
    }

    /**
     * Runs a model from a start state.
     *
     * @param model the problem
     * @param start the start state (its phase says what is asked for)
     * @param duration simulated time (s), checked positive by the caller
     * @param observer receives samples and events
     * @return the result
     * @throws IllegalArgumentException for an inconsistent start
     * @throws SimulationException when the integration fails numerically
     */
    public static RunResult run(Model model, BallState start, double duration, RunObserver observer) {
        Engine engine;
        try {
            engine = new Engine(model, observer);
        } catch (RuntimeException e) {
            // user code asked while setting up (restitution, couples, scratch)
            throw new SimulationException("run failed before its start: " + e, start, e);
        }
        try {
            return engine.run(start, duration);
        } catch (RuntimeException e) {
            throw engine.failure(e, start);
        }
    }

    /**
     * The exception boundary of a run: every exception that leaves it is the engine's own
     * rejection of the start ({@link IllegalArgumentException}) or a {@link SimulationException}
     * with the last good state; a failure of the engine's own checks ({@link RunFailure}) gives its
     * message, an integrator failure is described in our words ({@link IntegratorFailure}), and
     * anything else (user code, the integrator) becomes the cause.
     */
    private RuntimeException failure(RuntimeException e, BallState start) {
        if (e == run.rejection) {
            return e;
        }
        BallState last = run.lastGoodBallState(start);
        String at = "run failed at t = " + last.time() + " s: ";
        if (e instanceof Interrupted) {
            return new SimulationInterruptedException("run interrupted at t = " + last.time() + " s", last);
        } else if (e instanceof RunFailure) {
            return new SimulationException(at + e.getMessage(), last, null);
        } else if (e instanceof MathRuntimeException) {
            return new SimulationException(at + IntegratorFailure.describe((MathRuntimeException) e, last.time(),
                run.phase() != null ? run.phase() : last.phase()), last, e);
        } else if (e instanceof Dynamics.BudgetExhausted || e instanceof Segment.ProjectionRestart) {
            return new SimulationException(at + "internal signal escaped: " + e.getMessage(), last, null);
        }
        return new SimulationException(at + e, last, e);
    }

    /**
     * The shortest interval the integrator accepts between two times (Hipparchus refuses one below
     * 1000 units in the last place of the larger): a run whose remaining time is below it has
     * reached its end.
     *
     * @param t0 one time (s)
     * @param t1 the other (s)
     * @return the shortest interval (s)
     */
    public static double shortestInterval(double t0, double t1) {
        return 1000 * Math.ulp(Math.max(Math.abs(t0), Math.abs(t1)));
    }

    private static String budgetMessage(long max) {
        return "evaluation budget of " + max + " right-hand-side evaluations exhausted";
    }

    private RunResult run(BallState start, double duration) {
        Run run = this.run;
        Dynamics dyn = run.dyn;
        long maxEvaluations = run.set.maxEvaluations();
        double gn = Vec.norm(run.g);
        double eScale = setScales(start, duration, gn);

        Phase phase0;
        try {
            // the start's checks are not budgeted (they count): the first turn of the loop stops a
            // run whose budget they used up
            phase0 = transitions.startPhase(start.phase());
        } catch (SurfaceDomainException e) {
            throw run.reject("start state is not valid on this surface: " + e.getMessage(), e);
        }
        run.setPhase(phase0);
        BallState s0 = run.toState(run.t, run.y, phase0);
        double e0 = run.model.energy(s0);
        run.lastGoodY = run.y.clone();
        run.lastGoodT = run.t;
        run.lastGoodPhase = phase0;
        run.maxKinetic = s0.kineticEnergy(run.ball);
        run.observer.start(s0);
        run.openSpan();
        run.sampleT0 = run.t;
        run.sampleIndex = 0;
        run.emitSample(run.t, run.y, phase0, true);
        for (RunEvent e : run.events) {
            run.observer.event(e);
        }

        dyn.budget = maxEvaluations;
        EndReason reason = null;
        String message = "";
        try {
            while (reason == null) {
                Interrupted.check();
                run.syncSpan();
                if (run.events.size() >= run.set.maxEvents()) {
                    reason = EndReason.BUDGET;
                    message = "event budget of " + run.set.maxEvents() + " events exhausted";
                    break;
                }
                if (run.endTime - run.t < shortestInterval(run.t, run.endTime)) {
                    reason = EndReason.DURATION;
                    break;
                }
                if (dyn.evaluations >= maxEvaluations) {
                    reason = EndReason.BUDGET;
                    message = budgetMessage(maxEvaluations);
                    dyn.budget = Long.MAX_VALUE;
                    break;
                }
                if (run.phase().inContact() && transitions.restsNow()) {
                    BallState before = run.toState(run.t, run.y, run.phase());
                    if (run.phase() == Phase.ROLLING) {
                        transitions.setDerivedVelocity();
                    }
                    run.changePhase(Phase.REST);
                    run.log(EventKind.REST, before, null, Vector3D.ZERO);
                    reason = EndReason.REST;
                    break;
                }
                ContactSlot pivotSlot = run.contacts.pivotSlot();
                EventKind pivot = transitions.pivotCheck();
                if (pivot != null) {
                    run.logOn(pivotSlot.id, pivot, run.toState(run.t, run.y, run.phase()), null, Vector3D.ZERO, null,
                        null);
                }
                run.flightClear = flightClear();
                if (run.flightClear - run.t < shortestInterval(run.t, run.flightClear)) {
                    reason = EndReason.LEFT_FOR_GOOD;
                    message = leftMessage();
                    break;
                }
                ODEStateAndDerivative end;
                try {
                    end = segment.integrate();
                } catch (Segment.ProjectionRestart e) {
                    run.t = run.lastGoodT;
                    run.y = transitions.projected(run.t, run.lastGoodY());
                    continue;
                } catch (Dynamics.BudgetExhausted e) {
                    // lift the budget so that the end-of-run bookkeeping (end state, samples) can evaluate
                    dyn.budget = Long.MAX_VALUE;
                    reason = EndReason.BUDGET;
                    message = budgetMessage(maxEvaluations);
                    run.restoreLastGood();
                    break;
                } catch (SurfaceDomainException e) {
                    reason = EndReason.GEOMETRY;
                    message = e.getMessage();
                    run.restoreLastGood();
                    break;
                }
                run.t = end.getTime();
                run.y = run.snapshots.fullState(end);
                SwitchRule fired = segment.fired;
                if (fired == null) {
                    if (run.t >= run.flightClear) {
                        reason = EndReason.LEFT_FOR_GOOD;
                        message = leftMessage();
                    } else {
                        reason = EndReason.DURATION;
                    }
                    break;
                }
                try {
                    fired.prepare(transitions);
                    BallState before = run.toState(run.t, run.y, run.phase());
                    reason = fired.react(transitions, before);
                    if (reason == EndReason.GEOMETRY) {
                        message = run.stopMessage;
                    }
                } catch (Dynamics.BudgetExhausted e) {
                    reason = EndReason.BUDGET;
                    message = budgetMessage(maxEvaluations);
                    dyn.budget = Long.MAX_VALUE;
                } catch (SurfaceDomainException e) {
                    reason = EndReason.GEOMETRY;
                    message = e.getMessage();
                    run.restoreLastGood();
                }
            }
        } catch (Dynamics.BudgetExhausted e) {
            // exhausted outside the integrator: in a switch, the rest test or a start-of-segment check
            reason = EndReason.BUDGET;
            message = budgetMessage(maxEvaluations);
            run.restoreLastGood();
        } catch (SurfaceDomainException e) {
            // outside the integrator: the rest test, a projection or a start-of-segment check
            reason = EndReason.GEOMETRY;
            message = e.getMessage();
            run.restoreLastGood();
        }
        return close(reason, message, e0, gn, eScale);
    }

    /**
     * In free flight (gravity alone: no applied load, every patch still, not in a compliant
     * contact) the time from which the ball can meet no patch again ({@link LeaveCheck}); +∞ in
     * every other case, or when it cannot be shown. The reach is the radius grown by 1e-6 of it,
     * far above the integration error of a parabola (Dormand–Prince integrates a quadratic
     * exactly up to rounding).
     */
    private double flightClear() {
        Run run = this.run;
        if (run.phase() != Phase.FLIGHT || run.pressingAny() || run.model.load() != AppliedLoad.NONE) {
            return Double.POSITIVE_INFINITY;
        }
        for (ContactSlot s : run.slots) {
            if (s.moving) {
                return Double.POSITIVE_INFINITY;
            }
        }
        if (run.extents == null) {
            List<List<Slab>> all = new ArrayList<>();
            for (ContactSlot s : run.slots) {
                all.add(List.copyOf(s.surface.extent()));
            }
            run.extents = all;
        }
        double[] y = run.y;
        return LeaveCheck.clearFrom(run.t, new double[] {y[0], y[1], y[2]}, new double[] {y[V], y[V + 1], y[V + 2]},
            run.g, run.extents, run.r * (1 + 1e-6));
    }

    private String leftMessage() {
        return "left for good: in flight at t = " + run.t + " s on a path that meets no patch again";
    }

    /** Sets the time, state, end time, thresholds and tolerances of the run from its start; returns the energy scale. */
    private double setScales(BallState start, double duration, double gn) {
        Run run = this.run;
        double r = run.r;
        run.t = start.time();
        run.endTime = run.t + duration;
        run.y = StateMapper.toArray(start);
        run.c0 = start.centre().toArray();
        run.speedScale = Math.max(Math.max(start.velocity().getNorm(), r * start.spin().getNorm()),
            Math.max(Math.sqrt(gn * r), 1e-3));
        run.stickEps = run.set.stickSpeedFraction() * run.speedScale;
        run.settleSpeed = run.set.settleSpeed() > 0 ? run.set.settleSpeed()
            : Math.max(0.01 * Math.sqrt(gn * r), 1e-6);
        run.impactSlack = 1e-9 * r;
        run.restSpeed = run.set.restSpeedFraction() * run.speedScale;
        run.dyn.stickEps = run.stickEps;
        run.dyn.compliantSlipSpeed = run.settleSpeed;
        for (ContactSlot slot : run.slots) {
            slot.touchSpeed = run.settleSpeed;
            slot.pressing = false;
        }
        for (ContactSlot slot : run.slots) {
            run.model.access().setSpins(slot.ctx, run.set.smoothingSpinFraction() * run.speedScale / r,
                run.stickEps / r);
        }
        double tol = run.set.tolerance();
        double eScale = run.m * run.speedScale * run.speedScale + run.m * gn * r;
        run.absTol = new double[DIM];
        run.relTol = new double[DIM];
        for (int i = 0; i < DIM; i++) {
            run.relTol[i] = tol;
            double s;
            if (i < V || i == PATH) {
                s = r;
            } else if (i < Q) {
                s = run.speedScale;
            } else if (i < StateMapper.W) {
                s = 1.0;
            } else if (i < LOSS) {
                s = run.speedScale / r;
            } else {
                s = eScale;
            }
            run.absTol[i] = tol * s;
        }
        return eScale;
    }

    /**
     * The closing bookkeeping: end state, last sample, energy budget, result. After a geometry
     * stop the surface may refuse even the last good state (a Newton-based surface seeded from the
     * failed query): the end state then keeps the velocity stored with it and the closing sample
     * is left out. A result holding a number that is not finite is not returned.
     */
    private RunResult close(EndReason reason, String message, double e0, double gn, double eScale) {
        Run run = this.run;
        // the closing bookkeeping evaluates the right-hand side a few more times: lift the budget
        // so that a run that exhausted it still returns its result
        run.dyn.budget = Long.MAX_VALUE;
        run.closeSpan();
        Phase phase = run.phase();
        BallState endState;
        try {
            endState = run.toState(run.t, run.y, phase);
            run.emitSample(run.t, run.y, phase, true);
        } catch (SurfaceDomainException e) {
            if (reason != EndReason.GEOMETRY) {
                throw e;
            }
            endState = run.storedState(run.t, run.y, phase);
        }
        double ke = endState.kineticEnergy(run.ball);
        run.maxKinetic = Math.max(run.maxKinetic, ke);
        double e1 = run.model.energy(endState);
        double scale = Math.max(run.maxKinetic + run.m * gn * run.extent, eScale * 1e-12);
        double[] y = run.y;
        EnergyBudget budget = new EnergyBudget(e0, e1,
            y[LOSS + LossKind.SLIDING_FRICTION.ordinal()],
            y[LOSS + LossKind.ROLLING_RESISTANCE.ordinal()],
            y[LOSS + LossKind.PIVOTING_RESISTANCE.ordinal()],
            y[LOSS + LossKind.OTHER.ordinal()],
            run.impactLoss, y[APPLIED], y[DRIVE] + run.impulseDrive, scale, y[StateMapper.DAMPING]);
        RunResult result = new RunResult(reason, message, endState, run.events, run.spans, budget,
            run.maxDistanceError, run.maxNormalForce, run.dyn.evaluations, run.steps);
        String bad = Results.nonFinite(result);
        if (bad != null) {
            throw new RunFailure("the result holds a number that is not finite (" + bad
                + "): the run's numbers exceed the range of double");
        }
        run.observer.finish(result);
        return result;
    }
}
