package org.trundle.scenario;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceMotion;
import org.trundle.surfaces.BearingRaces;
import org.trundle.surfaces.Bounded;
import org.trundle.surfaces.Rails;
import org.trundle.surfaces.VGroove;

/**
 * Surface types that expand into several patches (an assembly of walls a ball may touch together), built by the
 * helpers of {@code org.trundle.surfaces} from the usual dimensions. Each part becomes an ordinary patch whose id
 * is the part's name ({@code left}, {@code right}; {@code inner}, {@code outer}) for a single {@code surface}, or
 * {@code <id>.<name>} for an entry of {@code surfaces}.
 *
 * <ul>
 *   <li>{@code v_groove} ({@link VGroove}): {@code included_angle_deg} (between the walls, in (0, 180)),
 *       {@code origin} (a point of the apex line at the groove's start, default [0, 0, 0]), the direction either
 *       by {@code slope_deg} (default 0: the groove runs down along +x at this angle below horizontal and opens
 *       up, toward +z tilted back by the slope) or by {@code axis} (the groove's direction) and {@code up} (the
 *       side it opens toward), optional {@code length} (m, along the axis from the origin; edges
 *       {@code axial_from}, {@code axial_to}) and {@code wall_width} (m, each wall's width from the apex; edge
 *       {@code rim}); each wall is cut at the apex line (edge {@code apex}). Parts {@code left}, {@code right}
 *       (seen looking along the axis with the opening up).</li>
 *   <li>{@code rails} ({@link Rails}): {@code spacing} (m, between the rail axes), {@code rail_radius} (m),
 *       {@code origin} (midway between the axes at the start, default [0, 0, 0]), {@code slope_deg} or
 *       {@code axis} and {@code up} (the side the ball rides on) as for the groove, optional {@code length}.
 *       Parts {@code left}, {@code right}. The ball must not fall through: {@code spacing < 2 (r + rail_radius)}.</li>
 *   <li>{@code bearing_races} ({@link BearingRaces}; zero contact angle, for the scenario's ball):
 *       {@code axis}, {@code pitch_diameter} (m, more than twice the ball's diameter), optional
 *       {@code center} (default [0, 0, 0]), {@code inner_conformity}, {@code outer_conformity} (groove radius
 *       over ball diameter, in (0.5, 1), default 0.52 and 0.53, common practice for deep-groove bearings),
 *       {@code clearance} (diametral clearance P_d, m, default 0: the ball has P_d/4 of play toward each race),
 *       {@code inner_rate}, {@code outer_rate} (rad/s, each race turning right-handed about the axis, default 0).
 *       Parts {@code inner}, {@code outer}. Its motions come from the rates: a {@code motion} key is refused.</li>
 * </ul>
 * A {@code motion} of a groove or of rails moves both parts alike.
 */
final class AssemblyFactory {
    /** One part of an assembly: its name (the id suffix), its surface at rest and its motion. */
    record Part(String name, Surface surface, SurfaceMotion motion) {
    }

    /** The assembly types and their part names. */
    static final Map<String, List<String>> TYPES = new LinkedHashMap<>();

    static {
        TYPES.put("v_groove", List.of("left", "right"));
        TYPES.put("rails", List.of("left", "right"));
        TYPES.put("bearing_races", List.of("inner", "outer"));
    }

    /** Default inner and outer groove conformities f = groove radius / ball diameter (common practice). */
    static final double DEFAULT_INNER_CONFORMITY = 0.52;
    /** See {@link #DEFAULT_INNER_CONFORMITY}. */
    static final double DEFAULT_OUTER_CONFORMITY = 0.53;

    private AssemblyFactory() {
    }

    /**
     * @param s a surface section
     * @return whether its {@code type} is an assembly type
     */
    static boolean isAssembly(Section s) {
        return s.has("type") && s.raw("type").isTextual() && TYPES.containsKey(s.raw("type").textValue());
    }

    /**
     * @param s a surface section of an assembly type
     * @return the names of its parts
     */
    static List<String> partNames(Section s) {
        return TYPES.get(s.raw("type").textValue());
    }

    /**
     * @param s a surface section of an assembly type (without {@code id}, {@code contact}, {@code material})
     * @param ballRadius the scenario's ball radius r (m)
     * @return the parts, in the order of {@link #partNames}
     */
    static List<Part> expand(Section s, double ballRadius) {
        String type = s.raw("type").textValue();
        try {
            switch (type) {
                case "v_groove":
                    return vGroove(s);
                case "rails":
                    return rails(s, ballRadius);
                default:
                    return bearingRaces(s, ballRadius);
            }
        } catch (IllegalArgumentException e) {
            throw new ScenarioException(s.path() + ": " + e.getMessage());
        }
    }

    private static List<Part> vGroove(Section s) {
        s.allow("type", "included_angle_deg", "origin", "slope_deg", "axis", "up", "length", "wall_width", "motion");
        double angle = s.number("included_angle_deg", "degrees");
        if (!(angle > 0 && angle < 180)) {
            throw new ScenarioException(s.where("included_angle_deg") + " must lie in (0, 180) degrees, got " + angle);
        }
        Vector3D origin = s.vector("origin", "m", Vector3D.ZERO);
        Vector3D[] frame = frame(s);
        VGroove g = new VGroove(origin, frame[0], frame[1], Math.toRadians(angle));
        double length = optionalPositive(s, "length");
        double width = optionalPositive(s, "wall_width");
        Vector3D a = g.axis();
        Vector3D b = frame[1].subtract(a.scalarMultiply(frame[1].dotProduct(a))).normalize();
        Vector3D side = Vector3D.crossProduct(a, b);
        double gamma = g.halfAngle();
        // in-plane directions from the apex toward each wall's rim, perpendicular to the axis
        Vector3D plusUp = new Vector3D(Math.sin(gamma), side, Math.cos(gamma), b);
        Vector3D minusUp = new Vector3D(-Math.sin(gamma), side, Math.cos(gamma), b);
        SurfaceMotion m = motion(s);
        return List.of(new Part("left", wall(g.minusWall(), origin, a, minusUp, length, width), m),
            new Part("right", wall(g.plusWall(), origin, a, plusUp, length, width), m));
    }

    private static Surface wall(Surface plane, Vector3D origin, Vector3D axis, Vector3D towardRim, double length,
                                double width) {
        Bounded.Builder b = Bounded.of(plane).plane("apex", origin, towardRim);
        if (width < Double.POSITIVE_INFINITY) {
            b.plane("rim", new Vector3D(1, origin, width, towardRim), towardRim.negate());
        }
        if (length < Double.POSITIVE_INFINITY) {
            b.axialRange(origin, axis, 0, length);
        }
        return b.build();
    }

    private static List<Part> rails(Section s, double ballRadius) {
        s.allow("type", "spacing", "rail_radius", "origin", "slope_deg", "axis", "up", "length", "motion");
        double spacing = s.positive("spacing", "m");
        double railRadius = s.positive("rail_radius", "m");
        Vector3D origin = s.vector("origin", "m", Vector3D.ZERO);
        Vector3D[] frame = frame(s);
        Rails rails = new Rails(origin, frame[0], frame[1], spacing, 2 * railRadius);
        if (!(spacing < 2 * (ballRadius + railRadius))) {
            throw new ScenarioException(s.where("spacing") + " = " + spacing + " m lets a ball of radius " + ballRadius
                + " m fall between rails of radius " + railRadius + " m: it must be below 2 (r + rail_radius) = "
                + 2 * (ballRadius + railRadius) + " m");
        }
        double length = optionalPositive(s, "length");
        SurfaceMotion m = motion(s);
        return List.of(new Part("left", axial(rails.minusRail(), origin, rails.axis(), length), m),
            new Part("right", axial(rails.plusRail(), origin, rails.axis(), length), m));
    }

    private static Surface axial(Surface rail, Vector3D origin, Vector3D axis, double length) {
        return length < Double.POSITIVE_INFINITY ? Bounded.of(rail).axialRange(origin, axis, 0, length).build() : rail;
    }

    private static List<Part> bearingRaces(Section s, double ballRadius) {
        if (s.has("motion")) {
            throw new ScenarioException(s.where("motion") + ": a bearing's races turn by inner_rate and outer_rate"
                + " (rad/s about its axis); leave out motion");
        }
        s.allow("type", "axis", "pitch_diameter", "center", "inner_conformity", "outer_conformity", "clearance",
            "inner_rate", "outer_rate");
        Vector3D axis = s.direction("axis");
        double pitch = s.positive("pitch_diameter", "m");
        if (!(pitch > 4 * ballRadius)) {
            throw new ScenarioException(s.where("pitch_diameter") + " must exceed twice the ball's diameter "
                + 2 * ballRadius + " m (the inner ring needs a bore), got " + pitch);
        }
        Vector3D centre = s.vector("center", "m", Vector3D.ZERO);
        double fi = conformity(s, "inner_conformity", DEFAULT_INNER_CONFORMITY);
        double fo = conformity(s, "outer_conformity", DEFAULT_OUTER_CONFORMITY);
        double wi = s.optionalNumber("inner_rate", "rad/s").orElse(0.0);
        double wo = s.optionalNumber("outer_rate", "rad/s").orElse(0.0);
        double clearance = s.nonNegative("clearance", "m", 0.0);
        if (!(clearance < 2 * ballRadius)) {
            throw new ScenarioException(s.where("clearance") + " must be below the ball's diameter " + 2 * ballRadius
                + " m, got " + clearance);
        }
        BearingRaces races = new BearingRaces(centre, axis, pitch, 2 * ballRadius, fi, fo, clearance);
        return List.of(new Part("inner", races.innerRace(), turning(axis, centre, wi)),
            new Part("outer", races.outerRace(), turning(axis, centre, wo)));
    }

    private static SurfaceMotion turning(Vector3D axis, Vector3D centre, double rate) {
        return rate == 0 ? SurfaceMotion.NONE : SurfaceMotion.rotation(axis, centre, rate);
    }

    private static double conformity(Section s, String key, double dflt) {
        double f = s.optionalNumber(key, "").orElse(dflt);
        if (!(f > 0.5 && f < 1)) {
            throw new ScenarioException(s.where(key) + " must lie in (0.5, 1) (groove radius over ball diameter), got "
                + f);
        }
        return f;
    }

    /** {axis, up} from {@code slope_deg} or from {@code axis} and {@code up}. */
    private static Vector3D[] frame(Section s) {
        if (s.has("axis") || s.has("up")) {
            if (s.has("slope_deg")) {
                throw new ScenarioException("give either " + s.where("slope_deg") + " or " + s.where("axis") + " with "
                    + s.where("up") + ", not both");
            }
            Vector3D axis = s.direction("axis");
            Vector3D up = s.direction("up");
            Vector3D perp = up.subtract(axis.scalarMultiply(up.dotProduct(axis) / axis.getNormSq()));
            if (!(perp.getNorm() > 1e-9 * up.getNorm())) {
                throw new ScenarioException(s.where("up") + " must not be parallel to " + s.where("axis") + ", got up = "
                    + Section.fmt(up.getX()) + ", " + Section.fmt(up.getY()) + ", " + Section.fmt(up.getZ()));
            }
            return new Vector3D[] {axis, up};
        }
        double slope = s.optionalNumber("slope_deg", "degrees").orElse(0.0);
        if (!(slope > -90 && slope < 90)) {
            throw new ScenarioException(s.where("slope_deg") + " must lie in (-90, 90) degrees, got " + slope);
        }
        double th = Math.toRadians(slope);
        return new Vector3D[] {new Vector3D(Math.cos(th), 0, -Math.sin(th)), new Vector3D(Math.sin(th), 0, Math.cos(th))};
    }

    /** The assembly's {@code motion}, moving every part alike. */
    private static SurfaceMotion motion(Section s) {
        return s.has("motion") ? SceneFactory.motion(s.section("motion")) : SurfaceMotion.NONE;
    }

    private static double optionalPositive(Section s, String key) {
        return s.has(key) ? s.positive(key, "m") : Double.POSITIVE_INFINITY;
    }
}
