package org.trundle.core.check;

import java.util.SplittableRandom;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.internal.Checks;

/**
 * Draws gravitational accelerations (m/s²): a magnitude from an {@link Interval} and a direction
 * either uniform on the sphere or uniform within a cone of half-angle {@code β} about a mean
 * direction (uniform in {@code cos} of the angle, common practice for sampling a spherical cap).
 *
 * <p>Immutable.
 */
public final class GravitySampler {
    private final Interval magnitude;
    private final Vector3D mean;
    private final double maxAngle;

    private GravitySampler(Interval magnitude, Vector3D mean, double maxAngle) {
        this.magnitude = magnitude;
        this.mean = mean;
        this.maxAngle = maxAngle;
    }

    /**
     * @param magnitude magnitude range (m/s²), ≥ 0
     * @return a sampler of any direction
     */
    public static GravitySampler anyDirection(Interval magnitude) {
        return new GravitySampler(magnitude, Vector3D.MINUS_K, Math.PI);
    }

    /**
     * @param mean mean direction (any length, not zero)
     * @param maxAngle largest angle from it (rad), in [0, π]
     * @param magnitude magnitude range (m/s²)
     * @return a sampler of directions in the cone about mean
     */
    public static GravitySampler near(Vector3D mean, double maxAngle, Interval magnitude) {
        if (!(maxAngle >= 0 && maxAngle <= Math.PI)) {
            throw new IllegalArgumentException("maxAngle must lie in [0, pi], got " + maxAngle);
        }
        return new GravitySampler(magnitude, Checks.direction("mean", mean), maxAngle);
    }

    /**
     * @param g the gravity (m/s²)
     * @return a sampler that always gives g
     */
    public static GravitySampler fixed(Vector3D g) {
        Checks.finite("gravity", g);
        double n = g.getNorm();
        return new GravitySampler(Interval.fixed(n), n > 0 ? g.normalize() : Vector3D.MINUS_K, 0.0);
    }

    /**
     * @param rnd the random source
     * @return a gravity vector (m/s²)
     */
    public Vector3D draw(SplittableRandom rnd) {
        double g = magnitude.draw(rnd);
        if (maxAngle >= Math.PI) {
            return Draws.unitVector(rnd).scalarMultiply(g);
        }
        double cosMax = Math.cos(maxAngle);
        double c = 1 - rnd.nextDouble() * (1 - cosMax);
        double s = Math.sqrt(Math.max(0, 1 - c * c));
        Vector3D t = Draws.tangent(rnd, mean);
        return new Vector3D(c, mean, s, t).scalarMultiply(g);
    }
}
