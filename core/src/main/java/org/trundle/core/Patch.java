package org.trundle.core;

/**
 * One piece of a scene: a surface patch with an id, an optional rigid motion, an optional contact
 * law (the run's law when absent) and an optional compliant contact ({@link Compliance}: Hertz law with
 * Hunt–Crossley damping; the run's compliance, {@code Simulation.Builder#compliance}, when absent, and
 * rigid when neither is given). A run's scene is a list of patches; the ball touches one at a
 * time and is handed over from one to a neighbour that continues the surface where the contact point
 * crosses an edge (a tube and its rounded mouth, a funnel and its spout, two tubes end to end).
 *
 * <p>Immutable.
 *
 * @param id the patch's name in events and outputs (letters, digits, {@code _}, {@code -}, {@code .})
 * @param surface the surface at its rest pose
 * @param motion its rigid motion ({@link SurfaceMotion#NONE} for a still patch)
 * @param law its contact law, or null for the run's
 * @param compliance its compliant contact, or null for the run's (rigid when the run has none either)
 */
public record Patch(String id, Surface surface, SurfaceMotion motion, ContactLaw law, Compliance compliance) {

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
     * A patch with the run's compliance (rigid when the run has none).
     *
     * @param id the id
     * @param surface the surface at its rest pose
     * @param motion its rigid motion (null: still)
     * @param law its contact law, or null for the run's
     */
    public Patch(String id, Surface surface, SurfaceMotion motion, ContactLaw law) {
        this(id, surface, motion, law, null);
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
        return new Patch(id, surface, m, law, compliance);
    }

    /**
     * @param l a contact law (null: the run's)
     * @return this patch with law l
     */
    public Patch withLaw(ContactLaw l) {
        return new Patch(id, surface, motion, l, compliance);
    }

    /**
     * @param c a compliant contact for this patch (null: the run's)
     * @return this patch with compliance c
     */
    public Patch withCompliance(Compliance c) {
        return new Patch(id, surface, motion, law, c);
    }
}
