package org.trundle.core;

import org.trundle.core.internal.Checks;

/**
 * What a run records and when it stops early: the output sampling, the end at the patch exit and
 * the budget. Part of {@link SolverSettings}.
 *
 * <ul>
 *   <li>{@code sampleInterval} (s, default 0): interval of output samples; 0 means one per accepted
 *       step.</li>
 *   <li>{@code stopAtExit} (default true): end the run when the contact point leaves the patch;
 *       otherwise continue in flight.</li>
 *   <li>{@code maxEvaluations} (default 20,000,000) and {@code maxEvents} (default 100,000): the
 *       budget (right-hand-side and event-function evaluations; logged events); a run that
 *       exhausts it ends with {@link EndReason#BUDGET}.</li>
 * </ul>
 *
 * @param sampleInterval sample interval (s), not negative; 0 for one sample per accepted step
 * @param stopAtExit whether a run ends at the patch exit
 * @param maxEvaluations evaluation budget, positive
 * @param maxEvents event budget, positive
 */
public record RunControl(double sampleInterval, boolean stopAtExit, long maxEvaluations, int maxEvents) {
    /** Checks every value; the message names the parameter and the value. */
    public RunControl {
        Checks.nonNegative("sampleInterval", sampleInterval);
        if (maxEvaluations <= 0) {
            throw new IllegalArgumentException("maxEvaluations must be positive, got " + maxEvaluations);
        }
        if (maxEvents <= 0) {
            throw new IllegalArgumentException("maxEvents must be positive, got " + maxEvents);
        }
    }

    /** @return the defaults: a sample per step, stop at the exit, 20,000,000 evaluations, 100,000 events */
    public static RunControl defaults() {
        return new RunControl(0.0, true, 20_000_000L, 100_000);
    }
}
