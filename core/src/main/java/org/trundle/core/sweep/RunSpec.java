package org.trundle.core.sweep;

import org.trundle.core.BallState;
import org.trundle.core.Simulation;

/**
 * What one run of a sweep needs: the simulation, the start state and the duration (s).
 *
 * @param simulation the configured simulation
 * @param start the start state
 * @param duration simulated time (s), finite and positive
 */
public record RunSpec(Simulation simulation, BallState start, double duration) {
    /** Checks the parts. */
    public RunSpec {
        if (simulation == null) {
            throw new IllegalArgumentException("simulation must be given, got null");
        }
        if (start == null) {
            throw new IllegalArgumentException("start state must be given, got null");
        }
        if (!(duration > 0) || !Double.isFinite(duration)) {
            throw new IllegalArgumentException("duration must be finite and positive, got " + duration);
        }
    }
}
