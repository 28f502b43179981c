package org.trundle.core;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.BracketedUnivariateSolver;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.events.AbstractODEDetector;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.events.ODEEventDetector;
import org.hipparchus.ode.events.ODEEventHandler;

/**
 * Hipparchus adapter for one {@link Trigger}: detection ({@code g}) delegates to the engine, and
 * so does the reaction (stop on a decreasing root, ignore increasing ones).
 */
final class SwitchDetector extends AbstractODEDetector<SwitchDetector> {
    private final Engine engine;
    private final Trigger trigger;

    SwitchDetector(Engine engine, Trigger trigger, SolverSettings set) {
        this(engine, trigger, trigger == Trigger.STICK
                ? (state, forward) -> engine.stickCheckInterval(state)
                : trigger == Trigger.EXIT
                ? (state, forward) -> engine.exitCheckInterval(state)
                : trigger == Trigger.REST
                ? (state, forward) -> engine.restCheckInterval(state)
                : trigger == Trigger.LIFT_OFF || trigger == Trigger.SLIP
                ? (state, forward) -> engine.flowCheckInterval(trigger, state)
                : AdaptableInterval.of(set.maxCheckInterval()), 100,
            new BracketingNthOrderBrentSolver(0.0, set.eventTimeTolerance(), 0.0, 5), null);
    }

    private SwitchDetector(Engine engine, Trigger trigger, AdaptableInterval maxCheck, int maxIter,
                           BracketedUnivariateSolver<UnivariateFunction> solver, ODEEventHandler handler) {
        super(maxCheck, maxIter, solver, handler != null ? handler : new Handler(engine, trigger));
        this.engine = engine;
        this.trigger = trigger;
    }

    @Override
    protected SwitchDetector create(AdaptableInterval newMaxCheck, int newMaxIter,
                                    BracketedUnivariateSolver<UnivariateFunction> newSolver,
                                    ODEEventHandler newHandler) {
        return new SwitchDetector(engine, trigger, newMaxCheck, newMaxIter, newSolver, newHandler);
    }

    @Override
    public double g(ODEStateAndDerivative state) {
        return engine.g(trigger, state);
    }

    /** Names the trigger, so that an integrator error message about this detector says which switch it was. */
    @Override
    public String toString() {
        return "switch detector for " + trigger.name().toLowerCase(java.util.Locale.ROOT);
    }

    private static final class Handler implements ODEEventHandler {
        private final Engine engine;
        private final Trigger trigger;

        Handler(Engine engine, Trigger trigger) {
            this.engine = engine;
            this.trigger = trigger;
        }

        @Override
        public Action eventOccurred(ODEStateAndDerivative s, ODEEventDetector detector, boolean increasing) {
            return engine.occurred(trigger, s, increasing);
        }
    }
}
