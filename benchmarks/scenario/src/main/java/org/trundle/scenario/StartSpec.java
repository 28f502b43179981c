package org.trundle.scenario;

import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.BallState;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Phase;
import org.trundle.core.Simulation;
import org.trundle.core.StartPlacement;
import org.trundle.core.SurfaceDomainException;

/**
 * The {@code start} section: where the ball starts and how it moves.
 *
 * <ul>
 *   <li>{@code position}: centre (m);</li>
 *   <li>{@code velocity}: centre velocity (m/s), or instead {@code speed} (m/s) with
 *       {@code elevation_deg} and {@code azimuth_deg} (degrees):
 *       {@code v = speed·(cos el cos az, cos el sin az, sin el)} in world axes;</li>
 *   <li>{@code spin}: {@code "rolling"} (the no-slip spin {@code ω = n × v / r} for the velocity,
 *       zero about the normal; a contact start only) or a vector (rad/s);</li>
 *   <li>{@code on_surface} (optional): {@code true} makes a contact start, moving a centre that
 *       lies within {@code placement_limit} (m, default a tenth of the ball radius) of the offset
 *       surface onto it along the normal ({@link StartPlacement}; an error farther away),
 *       {@code false} forces a flight start; left out, a centre at distance r from the surface
 *       (within the contact tolerance) is a contact start and any other a flight start.</li>
 * </ul>
 *
 * @param position centre (m)
 * @param velocity velocity (m/s)
 * @param spin spin vector (rad/s), or null for "rolling"
 * @param onSurface the forced choice, empty for automatic
 * @param placementLimit farthest placement move (m), empty for the default
 */
record StartSpec(Vector3D position, Vector3D velocity, Vector3D spin, Optional<Boolean> onSurface,
    OptionalDouble placementLimit) {

    /** Default farthest move of {@code on_surface: true} placement, as a fraction of the ball radius. */
    static final double DEFAULT_PLACEMENT_FRACTION = 0.1;

    static StartSpec parse(Section s) {
        s.allow("position", "velocity", "speed", "elevation_deg", "azimuth_deg", "spin", "on_surface",
            "placement_limit");
        Vector3D pos = s.vector("position", "m");
        Vector3D vel;
        boolean polar = s.has("speed") || s.has("elevation_deg") || s.has("azimuth_deg");
        if (polar && s.has("velocity")) {
            throw new ScenarioException("give either " + s.where("velocity") + " or " + s.where("speed") + " with "
                + s.where("elevation_deg") + " and " + s.where("azimuth_deg") + ", not both");
        }
        if (polar) {
            double speed = s.nonNegative("speed", "m/s", Double.NaN);
            if (!s.has("speed")) {
                s.number("speed", "m/s");
            }
            double el = Math.toRadians(s.number("elevation_deg", "degrees"));
            double az = Math.toRadians(s.number("azimuth_deg", "degrees"));
            vel = new Vector3D(speed * Math.cos(el) * Math.cos(az), speed * Math.cos(el) * Math.sin(az),
                speed * Math.sin(el));
        } else {
            if (!s.has("velocity")) {
                throw new ScenarioException("missing key " + s.where("velocity") + " (a vector [x, y, z] (m/s)), or give "
                    + s.where("speed") + ", " + s.where("elevation_deg") + " and " + s.where("azimuth_deg"));
            }
            vel = s.vector("velocity", "m/s");
        }
        Vector3D spin = null;
        if (!s.has("spin")) {
            throw new ScenarioException("missing key " + s.where("spin") + " (\"rolling\" or a vector [x, y, z] (rad/s))");
        }
        if (s.raw("spin").isTextual()) {
            s.choice("spin", java.util.List.of("rolling"));
        } else if (s.raw("spin").isArray()) {
            spin = s.vector("spin", "rad/s");
        } else {
            throw new ScenarioException(s.where("spin") + " must be \"rolling\" or a vector [x, y, z] (rad/s), got "
                + Section.kind(s.raw("spin")));
        }
        OptionalDouble limit = s.has("placement_limit")
            ? OptionalDouble.of(s.nonNegative("placement_limit", "m", 0.0)) : OptionalDouble.empty();
        if (limit.isPresent() && !s.optionalBool("on_surface").orElse(false)) {
            throw new ScenarioException(s.where("placement_limit") + " needs " + s.where("on_surface") + ": true");
        }
        return new StartSpec(pos, vel, spin, s.optionalBool("on_surface"), limit);
    }

    /**
     * With {@code on_surface: true}, moves the start centre onto the surface along the normal
     * ({@link StartPlacement}) when it lies within {@code placement_limit} (default a tenth of the
     * ball radius) of where it belongs.
     *
     * @param sim the simulation
     * @return the placement (no move when already within the contact tolerance), or null without
     *     {@code on_surface: true}
     */
    StartPlacement placement(Simulation sim) {
        if (!onSurface.orElse(false)) {
            return null;
        }
        double r = sim.ball().radius();
        double limit = placementLimit.orElse(DEFAULT_PLACEMENT_FRACTION * r);
        try {
            return StartPlacement.onSurface(sim, position, limit);
        } catch (IllegalArgumentException e) {
            throw new ScenarioException("start.position: contact start not on the surface: " + e.getMessage()
                + (placementLimit.isPresent() ? "" : "; start.placement_limit (m) allows a larger move")
                + "; leave out start.on_surface for a flight start");
        }
    }

    /**
     * @param centre a new start centre (m)
     * @return this start from that centre
     */
    StartSpec at(Vector3D centre) {
        return new StartSpec(centre, velocity, spin, onSurface, placementLimit);
    }

    /**
     * The velocity, the spin and the kinetic energy they carry must be finite doubles: a speed of
     * 1e308 m/s is a number, but no state of a ball.
     */
    private void checkFinite(Simulation sim) {
        double r = sim.ball().radius();
        double m = sim.ball().mass();
        double v = norm(velocity);
        if (!Double.isFinite(v) || !Double.isFinite(velocity.getX()) || !Double.isFinite(velocity.getY())
            || !Double.isFinite(velocity.getZ()) || !Double.isFinite(0.5 * m * v * v) || !Double.isFinite(v / r)) {
            throw new ScenarioException(String.format(Locale.ROOT, "start: a speed of %s m/s is too large to compute"
                + " with: the velocity, the rolling spin v/r or the kinetic energy m v^2/2 of a %s kg ball of radius"
                + " %s m overflows a double", v, m, r));
        }
        if (spin != null) {
            double w = norm(spin);
            if (!Double.isFinite(w) || !Double.isFinite(0.5 * sim.ball().momentOfInertia() * w * w)) {
                throw new ScenarioException(String.format(Locale.ROOT, "start.spin: a spin of %s rad/s is too large to"
                    + " compute with: the rotational energy I w^2/2 overflows a double", w));
            }
        }
    }

    /** The length of a vector without overflow in the squares (Math.hypot). */
    private static double norm(Vector3D v) {
        return Math.hypot(Math.hypot(v.getX(), v.getY()), v.getZ());
    }

    /**
     * The start state for a simulation, checked: a contact start must lie on the surface inside the
     * patch and move along it; no start may penetrate the surface.
     *
     * @param sim the simulation
     * @return the start state
     */
    BallState state(Simulation sim) {
        checkFinite(sim);
        ContactGeometry g;
        try {
            g = sim.geometryAt(position, 0.0);
        } catch (SurfaceDomainException e) {
            throw new ScenarioException("start.position: " + e.getMessage());
        }
        double r = sim.ball().radius();
        double gap = g.distance - r;
        double tol = sim.settings().contactTolerance() * r;
        if (gap < -tol) {
            throw new ScenarioException(String.format(Locale.ROOT,
                "start.position: the ball penetrates the surface: its centre is %s m from it, less than the ball radius"
                    + " %s m", g.distance, r));
        }
        boolean touching = Math.abs(gap) <= tol;
        boolean contact = onSurface.orElse(touching);
        if (contact && !touching) {
            throw new ScenarioException(String.format(Locale.ROOT,
                "start.position: contact start not on the surface: the centre is %s m from the surface, a contact"
                    + " start needs the ball radius %s m within the contact tolerance %s m (%s of the radius); set"
                    + " start.on_surface: true to move a centre up to %s m away onto the surface, or leave out"
                    + " start.on_surface for a flight start", g.distance, r, tol, sim.settings().contactTolerance(),
                DEFAULT_PLACEMENT_FRACTION * r));
        }
        if (!contact) {
            if (spin == null) {
                throw new ScenarioException(String.format(Locale.ROOT,
                    "start.spin: \"rolling\" needs a contact start, but the ball starts in flight (its centre is %s m"
                        + " from the surface, the ball radius is %s m, beyond the contact tolerance %s m); give the spin"
                        + " as a vector (rad/s), or set start.on_surface: true to move a centre up to %s m away onto the"
                        + " surface", g.distance, r, tol, DEFAULT_PLACEMENT_FRACTION * r));
            }
            return BallState.flying(position, velocity, spin);
        }
        if (g.patchMargin < 0) {
            throw new ScenarioException(String.format(Locale.ROOT,
                "start.position: contact start not on the surface: the contact point lies %s m outside the patch,"
                    + " beyond edge \"%s\"", -g.patchMargin, sim.surface().edgeName(g.edge)));
        }
        Vector3D n = new Vector3D(g.normal[0], g.normal[1], g.normal[2]);
        double vn = velocity.dotProduct(n);
        double w = spin == null ? velocity.subtract(vn, n).getNorm() : r * spin.getNorm();
        double speedScale = Math.max(Math.max(velocity.getNorm(), w),
            Math.max(Math.sqrt(sim.gravity().getNorm() * r), 1e-3));
        double tolSpeed = sim.settings().contactTolerance() * speedScale;
        if (Math.abs(vn) > tolSpeed) {
            throw new ScenarioException(String.format(Locale.ROOT,
                "start.velocity: a contact start must move along the surface, but the velocity has a normal component"
                    + " %s m/s (tolerance %s m/s)", vn, tolSpeed));
        }
        if (spin == null) {
            return sim.rollingStart(position, velocity);
        }
        return BallState.of(0.0, position, velocity, org.hipparchus.geometry.euclidean.threed.Rotation.IDENTITY, spin,
            Phase.SLIDING);
    }
}
