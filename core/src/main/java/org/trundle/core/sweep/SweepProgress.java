package org.trundle.core.sweep;

/**
 * Progress callback of a {@link Sweep}: called on the sweep's calling thread after each run is
 * delivered to the consumer, with the number delivered so far and the total, so
 * {@code done} counts up by one from 1 to {@code total} (fewer when cancelled).
 */
@FunctionalInterface
public interface SweepProgress {
    /** A callback that ignores progress. */
    SweepProgress NONE = (done, total) -> { };

    /**
     * @param done runs delivered so far
     * @param total runs in the sweep
     */
    void update(int done, int total);
}
