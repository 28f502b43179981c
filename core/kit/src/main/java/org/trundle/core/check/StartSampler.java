package org.trundle.core.check;

import java.util.SplittableRandom;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.BallState;
import org.trundle.core.internal.Checks;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Phase;
import org.trundle.core.Simulation;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceDomainException;

/**
 * Draws consistent starts on any {@link Surface}: rolling, sliding or flying, with the contact
 * point inside the patch.
 *
 * <p>Method: a query point {@code x} is drawn uniformly in a user-given region (a ball of radius
 * {@code ρ} about a point, m) and projected: {@code c ← p(c) + r n(c)}, repeated until the signed
 * distance is {@code r} to {@code 1e-12 r} (one step for analytic surfaces, whose closest point
 * from {@code c} is {@code p} itself; a few for a generic surface). Points where the surface throws
 * {@link SurfaceDomainException}, does not converge, or whose contact point lies outside the patch
 * by less than the required margin, are redrawn (up to 200 times; then
 * {@link IllegalStateException} names the region). The speed {@code |v|} (m/s) is drawn from an
 * interval and the direction uniformly in the tangent plane.
 * <ul>
 *   <li>rolling: {@link Simulation#rollingStart(Vector3D, Vector3D, double)} with a normal spin
 *       {@code ω·n = f |v|/r}, {@code f} drawn from the normal-spin interval;</li>
 *   <li>sliding: the rolling spin plus a random spin perturbation of size {@code |v|/r} times a
 *       factor in [0.2, 2], so the contact point slips;</li>
 *   <li>flight: the centre lifted off by a gap {@code γ r} along {@code n} ({@code γ} from the gap
 *       interval), a normal velocity component {@code ±|v|/2}, and a random spin.</li>
 * </ul>
 *
 * <p>Immutable; {@code withX} copies.
 */
public final class StartSampler {
    private static final int ATTEMPTS = 200;

    private final Vector3D regionCentre;
    private final double regionRadius;
    private final Interval speed;
    private final Interval normalSpin;
    private final Interval gap;
    private final double rollingWeight;
    private final double slidingWeight;
    private final double flyingWeight;
    private final double minMargin;

    private StartSampler(Vector3D regionCentre, double regionRadius, Interval speed, Interval normalSpin,
                         Interval gap, double rollingWeight, double slidingWeight, double flyingWeight,
                         double minMargin) {
        this.regionCentre = regionCentre;
        this.regionRadius = regionRadius;
        this.speed = speed;
        this.normalSpin = normalSpin;
        this.gap = gap;
        this.rollingWeight = rollingWeight;
        this.slidingWeight = slidingWeight;
        this.flyingWeight = flyingWeight;
        this.minMargin = minMargin;
    }

    /**
     * Starts near a region: speeds 0.05–2 m/s, normal spin {@code ±2|v|/r}, flight gaps 0.05–0.4
     * r, half rolling, a quarter sliding, a quarter flying, contact points at least 0 m inside the
     * patch.
     *
     * @param centre centre of the region of query points (m)
     * @param radius radius of the region (m), ≥ 0
     * @return the sampler
     */
    public static StartSampler near(Vector3D centre, double radius) {
        Checks.finite("region centre", centre);
        Checks.nonNegative("region radius", radius);
        return new StartSampler(centre, radius, Interval.of(0.05, 2.0), Interval.of(-2, 2), Interval.of(0.05, 0.4),
            2, 1, 1, 0.0);
    }

    /**
     * @param v speed range (m/s)
     * @return a copy drawing speeds from v
     */
    public StartSampler withSpeed(Interval v) {
        return new StartSampler(regionCentre, regionRadius, v, normalSpin, gap, rollingWeight, slidingWeight,
            flyingWeight, minMargin);
    }

    /**
     * @param f range of the normal spin as a fraction of {@code |v|/r}
     * @return a copy
     */
    public StartSampler withNormalSpin(Interval f) {
        return new StartSampler(regionCentre, regionRadius, speed, f, gap, rollingWeight, slidingWeight,
            flyingWeight, minMargin);
    }

    /**
     * @param g range of flight gaps as a fraction of the ball radius
     * @return a copy
     */
    public StartSampler withFlightGap(Interval g) {
        return new StartSampler(regionCentre, regionRadius, speed, normalSpin, g, rollingWeight, slidingWeight,
            flyingWeight, minMargin);
    }

    /**
     * @param rolling weight of rolling starts, ≥ 0
     * @param sliding weight of sliding starts, ≥ 0
     * @param flying weight of flight starts, ≥ 0 (the sum must be positive)
     * @return a copy
     */
    public StartSampler withPhases(double rolling, double sliding, double flying) {
        Checks.nonNegative("rolling weight", rolling);
        Checks.nonNegative("sliding weight", sliding);
        Checks.nonNegative("flying weight", flying);
        Checks.positive("sum of phase weights", rolling + sliding + flying);
        return new StartSampler(regionCentre, regionRadius, speed, normalSpin, gap, rolling, sliding, flying,
            minMargin);
    }

    /**
     * @param margin smallest distance (m) of the start contact point from the patch edge
     * @return a copy
     */
    public StartSampler withMinMargin(double margin) {
        return new StartSampler(regionCentre, regionRadius, speed, normalSpin, gap, rollingWeight, slidingWeight,
            flyingWeight, Checks.nonNegative("margin", margin));
    }

    /**
     * Draws a start for the simulation's ball and surface.
     *
     * @param rnd the random source
     * @param sim the simulation
     * @return a consistent start at time 0
     * @throws IllegalStateException when no contact point inside the patch is found in the region
     */
    public BallState draw(SplittableRandom rnd, Simulation sim) {
        double r = sim.ball().radius();
        Surface surface = sim.surface();
        ContactGeometry g = new ContactGeometry();
        g.scratch = surface.newScratch();
        for (int attempt = 0; attempt < ATTEMPTS; attempt++) {
            Vector3D x = Draws.inBall(rnd, regionCentre, regionRadius);
            Vector3D c = project(surface, g, x, r);
            if (c == null) {
                continue;
            }
            Vector3D n = new Vector3D(g.normal[0], g.normal[1], g.normal[2]);
            double u = speed.draw(rnd);
            Vector3D v = Draws.tangent(rnd, n).scalarMultiply(u);
            double pick = rnd.nextDouble() * (rollingWeight + slidingWeight + flyingWeight);
            if (pick < rollingWeight) {
                return sim.rollingStart(c, v, normalSpin.draw(rnd) * u / r);
            }
            BallState rolling = sim.rollingStart(c, v, normalSpin.draw(rnd) * u / r);
            Vector3D kick = Draws.unitVector(rnd).scalarMultiply((0.2 + 1.8 * rnd.nextDouble()) * Math.max(u, 1e-3) / r);
            if (pick < rollingWeight + slidingWeight) {
                return BallState.of(0, c, v, Rotation.IDENTITY, rolling.spin().add(kick), Phase.SLIDING);
            }
            double lift = gap.draw(rnd) * r;
            Vector3D cf = c.add(lift, n);
            double vn = (rnd.nextBoolean() ? 0.5 : -0.5) * u;
            try {
                surface.query(0.0, cf.toArray(), g);
            } catch (SurfaceDomainException e) {
                continue;
            }
            if (!(g.distance >= r)) {
                continue;
            }
            return BallState.flying(cf, v.add(vn, n), kick);
        }
        throw new IllegalStateException("no start found in the region of radius " + regionRadius + " m about "
            + regionCentre + " on " + surface.name() + " for a ball of radius " + r + " m");
    }

    /**
     * Projects a query point to a ball centre at distance r; returns null when the point is outside
     * the surface's domain, the projection does not converge or the contact point is not inside the
     * patch by the margin. Leaves the geometry of the centre in {@code g}.
     */
    private Vector3D project(Surface surface, ContactGeometry g, Vector3D x, double r) {
        try {
            double[] q = x.toArray();
            for (int it = 0; it < 12; it++) {
                surface.query(0.0, q, g);
                if (Math.abs(g.distance - r) <= 1e-12 * r && it > 0) {
                    break;
                }
                for (int i = 0; i < 3; i++) {
                    q[i] = g.point[i] + r * g.normal[i];
                }
            }
            surface.query(0.0, q, g);
            if (!(Math.abs(g.distance - r) <= 1e-10 * r) || !(g.patchMargin >= minMargin)
                || !(r * g.curvature1 < 1)) {
                return null;
            }
            return new Vector3D(q);
        } catch (SurfaceDomainException e) {
            return null;
        }
    }
}
