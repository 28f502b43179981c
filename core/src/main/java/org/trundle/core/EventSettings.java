package org.trundle.core;

import org.trundle.core.internal.Checks;

/**
 * How the solver looks for switching events (lift-off, slip onset, stick, exit, impact, rest).
 * Part of {@link SolverSettings}.
 *
 * <ul>
 *   <li>{@code maxCheckInterval} (s, default 1e-3): time between two evaluations of an event
 *       function near its root; an event whose function changes sign twice within it may be
 *       missed, so it must be below the shortest phase of interest. Far from a root the detectors
 *       check less often, at half the earliest time a local model of their function (a bound on
 *       its rate, or its measured rate and curvature) allows it to reach zero, and at least at
 *       every step end.</li>
 *   <li>{@code eventTimeTolerance} (s, default 1e-12): convergence of event times.</li>
 * </ul>
 *
 * @param maxCheckInterval largest interval between event-function checks (s), positive
 * @param eventTimeTolerance event time convergence (s), positive
 */
public record EventSettings(double maxCheckInterval, double eventTimeTolerance) {
    /** Checks every value; the message names the parameter and the value. */
    public EventSettings {
        Checks.positive("maxCheckInterval", maxCheckInterval);
        Checks.positive("eventTimeTolerance", eventTimeTolerance);
    }

    /** @return the defaults: checks at most 1e-3 s apart near a root, times to 1e-12 s */
    public static EventSettings defaults() {
        return new EventSettings(1e-3, 1e-12);
    }
}
