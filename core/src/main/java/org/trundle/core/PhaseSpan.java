package org.trundle.core;

/**
 * One stretch of a run spent in a single phase: its start and end time (s) and the path length
 * travelled by the ball's centre during it (m).
 *
 * @param phase the phase
 * @param start start time (s)
 * @param end end time (s)
 * @param centrePath path length of the centre (m)
 */
public record PhaseSpan(Phase phase, double start, double end, double centrePath) {
    /** @return duration (s) */
    public double duration() {
        return end - start;
    }
}
