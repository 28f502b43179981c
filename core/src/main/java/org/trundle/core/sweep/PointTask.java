package org.trundle.core.sweep;

import java.util.function.BooleanSupplier;

/**
 * The work of one point of a sweep, reduced where it runs to a row of type {@code R} (a flat,
 * small value: parameters, outcome, summary figures), so that an executor never holds or ships a
 * whole run. A {@link SweepExecutor} calls it for every point of a {@link ParameterSpace}, on
 * whatever thread or machine it likes; so it must be a pure function of the point (no shared
 * mutable state, no randomness of its own) and thread-safe. A run that fails must come back as a
 * row carrying its reason (see {@link Sweep#runPoint}); an exception thrown by the task stops the
 * sweep.
 *
 * @param <R> the row type
 */
@FunctionalInterface
public interface PointTask<R> {
    /**
     * @param point the parameter point
     * @param abandoned true once the executor wants the run given up (cancellation); poll it at
     *     output samples, as {@link Sweep#runPoint} does
     * @return the point's row, or {@code null} when the run was abandoned
     */
    R run(ParameterPoint point, BooleanSupplier abandoned);

    /**
     * @param row a row this task returned
     * @return whether it records a failed run (counted in {@link SweepSummary#failed()})
     */
    default boolean failed(R row) {
        return false;
    }
}
