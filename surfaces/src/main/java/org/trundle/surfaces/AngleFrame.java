package org.trundle.surfaces;

/**
 * How a {@link SplineTube} measures the angle round its centreline (for an open chute's angular
 * bounds and the {@code angle} coordinate).
 */
public enum AngleFrame {
    /**
     * From the tube's reference direction projected onto each cross-section, {@code
     * r(u) = (ref − (ref·t) t)/|ref − (ref·t) t|}: a world "down" stays down along the whole tube,
     * so an open chute's lips stay where the builder put them (the default; scenario key
     * {@code "angle_frame": "projected_reference"}). The reference must never be along the tangent.
     */
    PROJECTED_REFERENCE,
    /**
     * From a rotation-minimising frame started at the first point from the projected reference and
     * carried along the centreline without twist about the tangent (scenario key
     * {@code "angle_frame": "rotation_minimising"}). On a helix this frame turns relative to the
     * helix, so a fixed angle drifts round the cross-section from turn to turn.
     */
    ROTATION_MINIMISING
}
