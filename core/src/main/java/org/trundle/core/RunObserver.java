package org.trundle.core;

/**
 * Receives a run's output as it is produced, so that long runs need not be held in memory.
 * Only {@link #sample} must be written; a lambda serves.
 */
@FunctionalInterface
public interface RunObserver {
    /** An observer that ignores everything. */
    RunObserver NONE = s -> { };

    /**
     * Called once with the validated start state.
     *
     * @param start start state
     */
    default void start(BallState start) {
    }

    /**
     * Called at every sample instant (see {@link SolverSettings#sampleInterval()}) and at each
     * event instant.
     *
     * @param sample the sample
     */
    void sample(Sample sample);

    /**
     * Called at each logged event.
     *
     * @param event the event
     */
    default void event(RunEvent event) {
    }

    /**
     * Called once at the end of a run that did not fail.
     *
     * @param result the result
     */
    default void finish(RunResult result) {
    }
}
