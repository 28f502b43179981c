package org.trundle.core.engine;

import org.hipparchus.ode.ODEStateAndDerivative;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.Phase;

/**
 * One switching condition of the hybrid system: its event function in physical units (a switch
 * happens where it falls through zero), how far apart its checks may be, and the reaction. A new
 * rule is one new subclass, listed in {@link Segment}'s rule list; the {@link Snapshot} gives it
 * every value of the state it may need, evaluated once for all rules.
 */
abstract class SwitchRule {
    /** The run the rule watches. */
    final Run run;

    SwitchRule(Run run) {
        this.run = run;
    }

    /** @return a short name for messages ("lift-off", …) */
    abstract String label();

    /**
     * Whether the rule is watched in a segment starting now in {@code phase} (may evaluate the
     * run's state).
     *
     * @param phase the segment's phase
     * @return whether to watch it
     */
    abstract boolean watches(Phase phase);

    /**
     * The event function: a switch where it falls through zero.
     *
     * @param s the snapshot of a state
     * @return its value, in the rule's physical unit
     */
    abstract double value(Snapshot s);

    /**
     * Time to the next check of this rule (s); the configured interval unless the rule can bound
     * the rate of its function.
     *
     * @param s a state of the segment
     * @return the check interval (s)
     */
    double checkInterval(ODEStateAndDerivative s) {
        return run.set.maxCheckInterval();
    }

    /** Forgets any history of earlier segments. */
    void beginSegment() {
    }

    /**
     * Whether a located decreasing root is a switch (an impact outside the patch, or a rest the
     * contact cannot hold, is not).
     *
     * @param s the state at the root
     * @return whether to stop the segment there
     */
    boolean confirms(ODEStateAndDerivative s) {
        return true;
    }

    /**
     * Moves the run's state to the switch instant before the "before" state is taken (the impact
     * rewinds to the instant of contact).
     *
     * @param x the transitions
     */
    void prepare(Transitions x) {
    }

    /**
     * Applies the switch at the run's time and state.
     *
     * @param x the transitions
     * @param before the state before the switch
     * @return an end reason, or null to go on
     */
    abstract EndReason react(Transitions x, BallState before);
}
