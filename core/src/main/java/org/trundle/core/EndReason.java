package org.trundle.core;

/** Why a run ended. */
public enum EndReason {
    /** The requested duration was reached. */
    DURATION,
    /** The ball left the patch and the run was set to stop there. */
    EXIT,
    /** The ball came to rest in static equilibrium. */
    REST,
    /** The evaluation or event budget ran out (the result holds the last good state). */
    BUDGET,
    /** The geometry stopped the run: the ball no longer fits the surface where it touches it, or
     *  reached a point where the surface is undefined (see {@link RunResult#message()}). */
    GEOMETRY,
    /** The ball is in flight on a path that provably meets no patch again (free flight under
     *  gravity alone, every patch still and bounded in the direction it flies off; see
     *  {@link Surface#extent()}): the run ends there instead of flying through empty space. */
    LEFT_FOR_GOOD;

    /** @return the lower-case name used in files */
    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
