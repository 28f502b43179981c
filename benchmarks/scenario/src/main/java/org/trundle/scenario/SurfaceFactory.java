package org.trundle.scenario;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.Surface;
import org.trundle.surfaces.Cone;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Plane;
import org.trundle.surfaces.Side;
import org.trundle.surfaces.Sphere;
import org.trundle.surfaces.SplineTube;
import org.trundle.surfaces.SurfaceOfRevolution;
import org.trundle.surfaces.Torus;

/**
 * Builds the {@link Surface} of a scenario's {@code surface} section from its {@code type}. Each
 * type is one small method that declares its keys ({@link Section#allow}) and calls the surface's
 * constructor; adding a type is adding one method and one line to {@link #TYPES}.
 *
 * <p>Types (lengths in metres, angles in degrees):
 * <ul>
 *   <li>{@code plane}: {@code origin}, {@code normal};</li>
 *   <li>{@code cylinder}: {@code origin}, {@code axis}, {@code radius}, {@code side}, optional
 *       {@code from}, {@code to} (axial distances from {@code origin} along {@code axis});</li>
 *   <li>{@code cone}: {@code apex}, {@code axis} (apex toward the opening), {@code half_angle} (from the
 *       axis), {@code side}, optional {@code from} (default 0; inside it must exclude the apex),
 *       {@code to} (axial distances of the contact point from the apex);</li>
 *   <li>{@code sphere}: {@code center}, {@code radius}, {@code side}, optional cap {@code pole}
 *       (default [0, 0, -1]), {@code polar_from_deg} (default 0), {@code polar_to_deg} (default 180);</li>
 *   <li>{@code torus}: {@code center}, {@code axis}, {@code major_radius}, {@code minor_radius},
 *       {@code side}, optional {@code reference} (direction of azimuth 0), {@code azimuth_from_deg},
 *       {@code azimuth_to_deg} (default −180, 180), {@code tube_from_deg}, {@code tube_to_deg} (tube angle
 *       from the outward radial direction, default −180, 180);</li>
 *   <li>{@code revolution}: {@code origin}, {@code axis}, {@code profile} (list of [axial, radius]),
 *       {@code side};</li>
 *   <li>{@code spline_tube}: {@code centerline} (list of points), {@code radius} (a number or one per
 *       point), optional {@code side} (default inside), {@code reference}, {@code angle_from_deg},
 *       {@code angle_to_deg} (an open chute: only the wall between these angles about the centreline).</li>
 * </ul>
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
        TYPES.put("cone", SurfaceFactory::cone);
        TYPES.put("sphere", SurfaceFactory::sphere);
        TYPES.put("torus", SurfaceFactory::torus);
        TYPES.put("revolution", SurfaceFactory::revolution);
        TYPES.put("spline_tube", SurfaceFactory::splineTube);
    }

    private SurfaceFactory() {
    }

    /**
     * @param s the {@code surface} section
     * @return the surface
     */
    static Surface create(Section s) {
        List<String> all = new ArrayList<>(TYPES.keySet());
        all.addAll(AssemblyFactory.TYPES.keySet());
        String type = s.choice("type", all);
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

    private static Surface cone(Section s) {
        s.allow("type", "apex", "axis", "half_angle", "side", "from", "to");
        Vector3D apex = s.vector("apex", "m");
        Vector3D axis = s.direction("axis");
        double half = s.positive("half_angle", "degrees");
        Side side = side(s);
        double from = s.optionalNumber("from", "m").orElse(0.0);
        double to = s.optionalNumber("to", "m").orElse(Double.POSITIVE_INFINITY);
        return new Cone(apex, axis, Math.toRadians(half), side, from, to);
    }

    private static Surface sphere(Section s) {
        s.allow("type", "center", "radius", "side", "pole", "polar_from_deg", "polar_to_deg");
        Vector3D centre = s.vector("center", "m");
        double radius = s.positive("radius", "m");
        Side side = side(s);
        Vector3D pole = s.has("pole") ? s.direction("pole") : Vector3D.MINUS_K;
        double from = s.optionalNumber("polar_from_deg", "degrees").orElse(0.0);
        double to = s.optionalNumber("polar_to_deg", "degrees").orElse(180.0);
        return new Sphere(centre, radius, side, pole, Math.toRadians(from), Math.toRadians(to));
    }

    private static Surface torus(Section s) {
        s.allow("type", "center", "axis", "major_radius", "minor_radius", "side", "reference", "azimuth_from_deg",
            "azimuth_to_deg", "tube_from_deg", "tube_to_deg");
        Vector3D centre = s.vector("center", "m");
        Vector3D axis = s.direction("axis");
        double major = s.positive("major_radius", "m");
        double minor = s.positive("minor_radius", "m");
        Side side = side(s);
        Vector3D reference = s.has("reference") ? s.direction("reference") : null;
        double az0 = s.optionalNumber("azimuth_from_deg", "degrees").orElse(-180.0);
        double az1 = s.optionalNumber("azimuth_to_deg", "degrees").orElse(180.0);
        double tu0 = s.optionalNumber("tube_from_deg", "degrees").orElse(-180.0);
        double tu1 = s.optionalNumber("tube_to_deg", "degrees").orElse(180.0);
        return new Torus(centre, axis, reference, major, minor, side, Math.toRadians(az0), Math.toRadians(az1),
            Math.toRadians(tu0), Math.toRadians(tu1));
    }

    private static Surface revolution(Section s) {
        s.allow("type", "origin", "axis", "profile", "side");
        Vector3D origin = s.vector("origin", "m");
        Vector3D axis = s.direction("axis");
        double[][] profile = s.pairList("profile", "m", 2);
        return new SurfaceOfRevolution(origin, axis, profile[0], profile[1], side(s));
    }

    private static Surface splineTube(Section s) {
        s.allow("type", "centerline", "radius", "side", "reference", "angle_from_deg", "angle_to_deg");
        Vector3D[] points = s.vectorList("centerline", "m", 2);
        double[] radii = s.numberOrList("radius", "m", points.length);
        Side side = s.has("side") ? side(s) : Side.INSIDE;
        Vector3D reference = s.has("reference") ? s.direction("reference") : null;
        double a0 = s.optionalNumber("angle_from_deg", "degrees").orElse(-180.0);
        double a1 = s.optionalNumber("angle_to_deg", "degrees").orElse(180.0);
        return new SplineTube(points, radii, side, reference, Math.toRadians(a0), Math.toRadians(a1));
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
