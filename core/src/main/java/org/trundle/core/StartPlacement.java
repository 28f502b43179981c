package org.trundle.core;

import org.trundle.core.internal.Checks;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * A ball centre moved onto the surface for a contact start: the result of
 * {@link #onSurface(Simulation, Vector3D, double)}.
 *
 * <p>A contact start must lie within {@code contactTolerance·r} of the offset surface
 * {@code d(c) = r} (the default tolerance, 1e-6·r, is 4 nm for a 4 mm ball), which on curved
 * surfaces is hard to hit by hand. Placement moves a centre that lies within a stated distance of
 * the offset surface onto it along the surface normal: with {@code d} the signed distance from
 * the centre to the surface and {@code n = ∇d} the unit normal toward the ball, each step is the
 * Newton step of {@code d(c) − r = 0} along the gradient,
 * {@code c ← c + (r − d(c)) n(c)}, which is exact in one step where the normal is constant along
 * the move (planes, cylinders, spheres, tori: {@code |∇d| = 1} and the normal line is straight)
 * and converges quadratically elsewhere. Steps repeat until {@code |d − r|} is below a thousandth
 * of the contact tolerance, at most 20 times.
 *
 * <pre>{@code
 * StartPlacement p = StartPlacement.onSurface(sim, new Vector3D(0.0111, 0, -0.002), 1e-3);
 * BallState start = sim.rollingStart(p.centre(), velocity);   // p.distance(): how far it moved (m)
 * }</pre>
 *
 * @param given the centre as given (m)
 * @param centre the placed centre, at distance r from the surface (m)
 * @param move {@code centre − given} (m)
 */
public record StartPlacement(Vector3D given, Vector3D centre, Vector3D move) {
    /** Most Newton steps before placement gives up. */
    static final int MAX_STEPS = 20;

    /** @return the distance moved (m) */
    public double distance() {
        return move.getNorm();
    }

    /**
     * Moves a centre onto the offset surface {@code d = r} along the normal, at time 0.
     *
     * @param sim the simulation (its ball, surface and contact tolerance)
     * @param centre the centre as given (m)
     * @param maxMove the farthest the centre may be moved (m, ≥ 0)
     * @return the placement; a centre already within the contact tolerance is not moved
     * @throws IllegalArgumentException when the centre is farther than {@code maxMove} from where
     *     it would be placed, has no closest point, or placement does not converge; the message gives
     *     the gap, the limit and the contact tolerance
     */
    public static StartPlacement onSurface(Simulation sim, Vector3D centre, double maxMove) {
        Checks.finite("centre", centre);
        if (!(maxMove >= 0) || Double.isInfinite(maxMove)) {
            throw new IllegalArgumentException("maxMove must be a finite distance >= 0 (m), got " + maxMove);
        }
        double r = sim.ball().radius();
        double tol = sim.settings().contactTolerance() * r;
        Vector3D c = centre;
        for (int step = 0; step <= MAX_STEPS; step++) {
            ContactGeometry g;
            try {
                g = sim.geometryAt(c, 0.0);
            } catch (SurfaceDomainException e) {
                throw new IllegalArgumentException("cannot place centre " + centre + " on the surface: "
                    + e.getMessage(), e);
            }
            double gap = g.distance - r;
            if (step == 0 && Math.abs(gap) <= tol) {
                return new StartPlacement(centre, centre, Vector3D.ZERO);
            }
            if (Math.abs(gap) <= 1e-3 * tol && step > 0) {
                break;
            }
            if (step == MAX_STEPS) {
                throw new IllegalArgumentException("cannot place centre " + centre + " on the surface: " + MAX_STEPS
                    + " steps along the normal left a gap of " + gap + " m");
            }
            Vector3D n = new Vector3D(g.normal[0], g.normal[1], g.normal[2]);
            c = c.add(-gap, n);
            if (c.distance(centre) > maxMove) {
                throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "centre %s is %.6g m from the surface; placing it at the ball radius %.6g m would move it"
                        + " %.3g m, more than the %.3g m allowed (the contact tolerance is %.3g m, %.0e of the"
                        + " radius)", centre, g.distance, r, c.distance(centre), maxMove, tol,
                    sim.settings().contactTolerance()));
            }
        }
        return new StartPlacement(centre, c, c.subtract(centre));
    }
}
