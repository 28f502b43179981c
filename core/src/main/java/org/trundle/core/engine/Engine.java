package org.trundle.core.engine;

import static org.trundle.core.engine.StateMapper.APPLIED;
import static org.trundle.core.engine.StateMapper.DIM;
import static org.trundle.core.engine.StateMapper.LOSS;
import static org.trundle.core.engine.StateMapper.PATH;
import static org.trundle.core.engine.StateMapper.Q;
import static org.trundle.core.engine.StateMapper.V;

import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.ode.ODEStateAndDerivative;
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
        return new Engine(model, observer).run(start, duration);
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
        dyn.budget = maxEvaluations;

        Phase phase0;
        try {
            phase0 = transitions.startPhase(start.phase());
        } catch (SurfaceDomainException e) {
            throw new IllegalArgumentException("start state is not valid on this surface: " + e.getMessage(), e);
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

        EndReason reason = null;
        String message = "";
        try {
            while (reason == null) {
                if (run.events.size() >= run.set.maxEvents()) {
                    reason = EndReason.BUDGET;
                    message = "event budget of " + run.set.maxEvents() + " events exhausted";
                    break;
                }
                if (run.t >= run.endTime) {
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
                } catch (Dynamics.NumericalFailure | MathRuntimeException e) {
                    throw new SimulationException("run failed: " + e.getMessage(), run.lastGoodBallState(), e);
                }
                run.t = end.getTime();
                run.y = run.snapshots.fullState(end);
                SwitchRule fired = segment.fired;
                if (fired == null) {
                    reason = EndReason.DURATION;
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
        }
        return close(reason, message, e0, gn, eScale);
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
        run.model.access().setSpins(run.slot.ctx, run.set.smoothingSpinFraction() * run.speedScale / r,
            run.stickEps / r);
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

    /** The closing bookkeeping: end state, last sample, energy budget, result. */
    private RunResult close(EndReason reason, String message, double e0, double gn, double eScale) {
        Run run = this.run;
        // the closing bookkeeping evaluates the right-hand side a few more times: lift the budget
        // so that a run that exhausted it still returns its result
        run.dyn.budget = Long.MAX_VALUE;
        run.closeSpan();
        Phase phase = run.phase();
        BallState endState = run.toState(run.t, run.y, phase);
        run.emitSample(run.t, run.y, phase, true);
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
            run.impactLoss, y[APPLIED], scale);
        RunResult result = new RunResult(reason, message, endState, run.events, run.spans, budget,
            run.maxDistanceError, run.maxNormalForce, run.dyn.evaluations, run.steps);
        run.observer.finish(result);
        return result;
    }
}
