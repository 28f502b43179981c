package org.trundle.core.engine;

import org.hipparchus.ode.ODEStateAndDerivative;

/**
 * A rule whose check spacing comes from a local model of its own function ({@link FlowSpacing}):
 * lift-off and slip onset, whose functions have no cheap bound on their rate.
 */
abstract class FlowSpacedRule extends SwitchRule {
    private final FlowSpacing spacing = new FlowSpacing();

    FlowSpacedRule(Run run) {
        super(run);
    }

    @Override
    final void beginSegment() {
        spacing.reset();
    }

    @Override
    final double checkInterval(ODEStateAndDerivative s) {
        return spacing.next(s.getTime(), value(run.snapshots.at(s)), run.set.maxCheckInterval());
    }
}
