package org.trundle.surfaces;

/** Which side of a closed or tubular surface the ball is on. */
public enum Side {
    /** Inside (concave side of a tube, bowl or groove). */
    INSIDE,
    /** Outside (convex side). */
    OUTSIDE;

    /** @return the lower-case name used in files */
    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
