package org.trundle.runner;

import java.util.LinkedHashMap;
import java.util.Map;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.Surface;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Plane;
import org.trundle.surfaces.Side;

/**
 * Builds the {@link Surface} of a scenario's {@code surface} section from its {@code type}. Each
 * type is one small method that declares its keys ({@link Section#allow}) and calls the surface's
 * constructor; adding a type is adding one method and one line to {@link #TYPES}.
 *
 * <p>Types now: {@code plane} ({@code origin}, {@code normal}) and {@code cylinder} ({@code origin},
 * {@code axis}, {@code radius}, {@code side}, {@code from}, {@code to}). All lengths in metres;
 * {@code from}/{@code to} are axial distances from {@code origin} along {@code axis}, unbounded
 * when left out.
 *
 * <p>Keys reserved for the types still to be wired (from the scenario-runner issue): {@code cone}
 * ({@code apex}, {@code axis}, {@code half_angle} in degrees, {@code side}, {@code from}, {@code to});
 * {@code sphere} ({@code center}, {@code radius}, {@code side}, plus cap bounds); {@code torus}
 * ({@code center}, {@code axis}, {@code major_radius}, {@code minor_radius}, {@code side}, plus
 * angular bounds); {@code revolution} ({@code origin}, {@code axis}, {@code profile}: a list of
 * {@code [axial, radius]} pairs, {@code side}); {@code spline_tube} ({@code centerline}: a list of
 * points, {@code radius}: a number or one per point).
 */
final class SurfaceFactory {
    /** One surface type: reads its keys from the section and builds the surface. */
    @FunctionalInterface
    interface Maker {
        Surface make(Section s);
    }

    private static final Map<String, Maker> TYPES = new LinkedHashMap<>();

    static {
        TYPES.put("plane", SurfaceFactory::plane);
        TYPES.put("cylinder", SurfaceFactory::cylinder);
    }

    private SurfaceFactory() {
    }

    /**
     * @param s the {@code surface} section
     * @return the surface
     */
    static Surface create(Section s) {
        String type = s.choice("type", TYPES.keySet());
        try {
            return TYPES.get(type).make(s);
        } catch (IllegalArgumentException e) {
            throw new ScenarioException(s.path() + ": " + e.getMessage());
        }
    }

    private static Surface plane(Section s) {
        s.allow("type", "origin", "normal");
        return new Plane(s.vector("origin", "m"), s.direction("normal"));
    }

    private static Surface cylinder(Section s) {
        s.allow("type", "origin", "axis", "radius", "side", "from", "to");
        Vector3D origin = s.vector("origin", "m");
        Vector3D axis = s.direction("axis");
        double radius = s.positive("radius", "m");
        Side side = side(s);
        double[] b = bounds(s);
        return new Cylinder(origin, axis, radius, side, b[0], b[1]);
    }

    /** {@code side}: "inside" or "outside". */
    static Side side(Section s) {
        return Side.valueOf(s.choice("side", java.util.List.of("inside", "outside")).toUpperCase(java.util.Locale.ROOT));
    }

    /** Optional axial bounds {@code from < to} (m), infinite when left out. */
    static double[] bounds(Section s) {
        double from = s.optionalNumber("from", "m").orElse(Double.NEGATIVE_INFINITY);
        double to = s.optionalNumber("to", "m").orElse(Double.POSITIVE_INFINITY);
        if (!(from < to)) {
            throw new ScenarioException(s.where("from") + " must be below " + s.where("to") + ", got from = " + from
                + " m, to = " + to + " m");
        }
        return new double[] {from, to};
    }
}
