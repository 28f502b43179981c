package org.trundle.core.sweep;

/**
 * Builds the run of one parameter point (the user's model of the sweep). It must be a pure function
 * of the point — no shared mutable state, no randomness of its own — and thread-safe, since a
 * sweep calls it from several threads; that is what makes the results independent of the thread
 * count. An exception it throws marks that point's run as failed, with the exception's message as
 * the reason.
 */
@FunctionalInterface
public interface RunFactory {
    /**
     * @param point the parameter point
     * @return the run for that point
     */
    RunSpec create(ParameterPoint point);
}
