package org.trundle.core.engine;

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
 * Hipparchus adapter for one {@link SwitchRule}: the event function is the rule's value on the
 * state's shared {@link Snapshot}, the check interval the rule's, and the handler stops the segment
 * at a decreasing root the rule confirms (increasing roots are ignored).
 */
final class SwitchDetector extends AbstractODEDetector<SwitchDetector> {
    private final Segment segment;
    private final SwitchRule rule;

    SwitchDetector(Segment segment, SwitchRule rule) {
        this(segment, rule, (state, forward) -> rule.checkInterval(state), 100,
            new BracketingNthOrderBrentSolver(0.0, rule.run.set.eventTimeTolerance(), 0.0, 5), null);
    }

    private SwitchDetector(Segment segment, SwitchRule rule, AdaptableInterval maxCheck, int maxIter,
                           BracketedUnivariateSolver<UnivariateFunction> solver, ODEEventHandler handler) {
        super(maxCheck, maxIter, solver, handler != null ? handler : new Handler(segment, rule));
        this.segment = segment;
        this.rule = rule;
    }

    @Override
    protected SwitchDetector create(AdaptableInterval newMaxCheck, int newMaxIter,
                                    BracketedUnivariateSolver<UnivariateFunction> newSolver,
                                    ODEEventHandler newHandler) {
        return new SwitchDetector(segment, rule, newMaxCheck, newMaxIter, newSolver, newHandler);
    }

    @Override
    public double g(ODEStateAndDerivative state) {
        return rule.value(rule.run.snapshots.at(state));
    }

    /** Names the rule, so that an integrator error message about this detector says which switch it was. */
    @Override
    public String toString() {
        return "switch detector for " + rule.label();
    }

    private static final class Handler implements ODEEventHandler {
        private final Segment segment;
        private final SwitchRule rule;

        Handler(Segment segment, SwitchRule rule) {
            this.segment = segment;
            this.rule = rule;
        }

        @Override
        public Action eventOccurred(ODEStateAndDerivative s, ODEEventDetector detector, boolean increasing) {
            if (increasing || !rule.confirms(s)) {
                return Action.CONTINUE;
            }
            segment.fired = rule;
            return Action.STOP;
        }
    }
}
