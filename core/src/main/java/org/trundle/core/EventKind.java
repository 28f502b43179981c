package org.trundle.core;

/**
 * Kinds of logged run events. Each phase change has one of these as its cause; the pivoting stick
 * and release change no phase (they hold and free the spin about the normal while rolling).
 */
public enum EventKind {
    /** The contact point crossed the patch edge. */
    EXIT,
    /** Rolling could no longer be held: the needed tangential force exceeded the grip. */
    SLIP,
    /** The slip speed fell to zero and the grip could hold rolling. */
    STICK,
    /** The normal force fell to zero: the ball left the surface. */
    LIFT_OFF,
    /** The ball met the surface from flight. */
    IMPACT,
    /** The ball came to rest in static equilibrium. */
    REST,
    /**
     * The contact point crossed an edge of its patch onto a neighbouring patch that continues the
     * surface: the contact moves to the neighbour with no impulse.
     */
    HANDOVER,
    /**
     * While rolling, the spin about the normal fell to zero and the couple needed to keep it there is
     * within the law's set-valued pivoting couple: it is held at zero (exact pivoting stick).
     */
    PIVOT_STICK,
    /** The couple needed to hold the spin about the normal at zero exceeded the pivoting couple. */
    PIVOT_RELEASE,
    /**
     * The ball, touching one patch, reached another with a normal speed at most the settle speed: a further
     * contact began without a bounce (several contacts at once; a faster arrival is an {@link #IMPACT}).
     */
    TOUCH;

    /** @return the lower-case name used in files ({@code lift_off}) */
    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
