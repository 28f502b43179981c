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
    /**
     * What an exact zero at the segment's start reads as: positive, far below anything a rule's
     * unit resolves (m, N, m/s), yet large enough that the root bracketing's product with any
     * other value above 1e-224 does not underflow to zero (the smallest subnormal would).
     */
    static final double START_ZERO = 1e-100;

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

    /**
     * The rule's value; at the segment's start a value of exactly zero reads as
     * {@link #START_ZERO}. A switch region is closed (a contact point exactly on the patch edge is
     * on the patch), so a segment that starts exactly on a switch boundary has not switched yet:
     * it switches at once if the value goes negative after the start, and goes on if it goes
     * positive. Hipparchus instead skips a zero at the start by reading the function a little
     * later, which misses a switch that begins at the start and, after a first step of zero length
     * (every later state equal to the start), never ends.
     */
    @Override
    public double g(ODEStateAndDerivative state) {
        double v = rule.value(rule.run.snapshots.at(state));
        return v == 0 && state.getTime() == segment.startTime ? START_ZERO : v;
    }

    /** @return the watched rule's label ("exit", "lift-off", …) */
    String label() {
        return rule.label();
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
