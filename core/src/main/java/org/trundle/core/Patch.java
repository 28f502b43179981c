package org.trundle.core;

/**
 * One piece of a scene: a surface patch with an id, an optional rigid motion and an optional contact
 * law (the run's law when absent). A run's scene is a list of patches; the ball touches one at a
 * time and is handed over from one to a neighbour that continues the surface where the contact point
 * crosses an edge (a tube and its rounded mouth, a funnel and its spout, two tubes end to end).
 *
 * <p>Immutable.
 *
 * @param id the patch's name in events and outputs (letters, digits, {@code _}, {@code -}, {@code .})
 * @param surface the surface at its rest pose
 * @param motion its rigid motion ({@link SurfaceMotion#NONE} for a still patch)
 * @param law its contact law, or null for the run's
 */
public record Patch(String id, Surface surface, SurfaceMotion motion, ContactLaw law) {

    /** Checks the parts. */
    public Patch {
        if (id == null || !id.matches("[A-Za-z0-9_.-]{1,64}")) {
            throw new IllegalArgumentException("patch id must be 1 to 64 letters, digits, '_', '-' or '.', got "
                + (id == null ? "null" : "\"" + (id.length() > 70 ? id.substring(0, 70) + "..." : id) + "\""));
        }
        if (surface == null) {
            throw new IllegalArgumentException("surface of patch " + id + " must be given, got null");
        }
        if (motion == null) {
            motion = SurfaceMotion.NONE;
        }
    }

    /**
     * A still patch with the run's law.
     *
     * @param id the id
     * @param surface the surface
     * @return the patch
     */
    public static Patch of(String id, Surface surface) {
        return new Patch(id, surface, SurfaceMotion.NONE, null);
    }

    /**
     * @param m a motion
     * @return this patch moving by m
     */
    public Patch withMotion(SurfaceMotion m) {
        return new Patch(id, surface, m, law);
    }

    /**
     * @param l a contact law (null: the run's)
     * @return this patch with law l
     */
    public Patch withLaw(ContactLaw l) {
        return new Patch(id, surface, motion, l);
    }
}
