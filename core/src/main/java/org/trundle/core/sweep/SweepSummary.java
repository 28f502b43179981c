package org.trundle.core.sweep;

/**
 * What a finished {@link Sweep} did: runs in the space, runs delivered to the consumer (in index
 * order, always a prefix {@code 0 … delivered−1} of the space), how many of those failed, and
 * whether it was cancelled before the end.
 *
 * @param total runs in the space
 * @param delivered runs delivered
 * @param failed delivered runs that failed
 * @param cancelled whether the sweep stopped early on cancellation
 */
public record SweepSummary(int total, int delivered, int failed, boolean cancelled) {
}
