package org.trundle.core.check;

import java.util.SplittableRandom;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * Small seeded draws shared by the samplers, and the per-case random source.
 */
public final class Draws {
    private Draws() {
    }

    /**
     * The random source of case {@code index} of a run seeded with {@code seed}: a
     * {@link SplittableRandom} whose seed mixes both with the golden-ratio increment (common
     * practice for splitting a seed into independent streams), so that case {@code i} can be
     * regenerated alone.
     *
     * @param seed the run's seed
     * @param index the case index, ≥ 0
     * @return a fresh random source
     */
    public static SplittableRandom forCase(long seed, int index) {
        if (index < 0) {
            throw new IllegalArgumentException("case index must not be negative, got " + index);
        }
        return new SplittableRandom(seed + 0x9E3779B97F4A7C15L * (index + 1L));
    }

    /**
     * A direction uniformly distributed on the unit sphere (rejection sampling in the cube).
     *
     * @param rnd the random source
     * @return a unit vector
     */
    public static Vector3D unitVector(SplittableRandom rnd) {
        while (true) {
            double x = 2 * rnd.nextDouble() - 1;
            double y = 2 * rnd.nextDouble() - 1;
            double z = 2 * rnd.nextDouble() - 1;
            double n2 = x * x + y * y + z * z;
            if (n2 > 0.01 && n2 <= 1) {
                double n = Math.sqrt(n2);
                return new Vector3D(x / n, y / n, z / n);
            }
        }
    }

    /**
     * A point uniformly distributed in the ball of radius {@code radius} about {@code centre}.
     *
     * @param rnd the random source
     * @param centre the centre (m)
     * @param radius the radius (m), ≥ 0
     * @return the point (m)
     */
    public static Vector3D inBall(SplittableRandom rnd, Vector3D centre, double radius) {
        while (true) {
            double x = 2 * rnd.nextDouble() - 1;
            double y = 2 * rnd.nextDouble() - 1;
            double z = 2 * rnd.nextDouble() - 1;
            if (x * x + y * y + z * z <= 1) {
                return new Vector3D(centre.getX() + radius * x, centre.getY() + radius * y,
                    centre.getZ() + radius * z);
            }
        }
    }

    /**
     * A unit tangent of the plane normal to {@code n}, at a uniformly drawn angle.
     *
     * @param rnd the random source
     * @param n unit normal
     * @return a unit vector orthogonal to n
     */
    public static Vector3D tangent(SplittableRandom rnd, Vector3D n) {
        Vector3D a = n.orthogonal();
        Vector3D b = Vector3D.crossProduct(n, a);
        double phi = 2 * Math.PI * rnd.nextDouble();
        return new Vector3D(Math.cos(phi), a, Math.sin(phi), b);
    }

    /**
     * Rounds to a number of significant digits (used by the minimiser for rounder numbers).
     *
     * @param x value
     * @param digits significant digits, ≥ 1
     * @return the rounded value; x itself when zero or not finite
     */
    public static double round(double x, int digits) {
        if (x == 0 || !Double.isFinite(x)) {
            return x;
        }
        return new java.math.BigDecimal(x).round(new java.math.MathContext(digits)).doubleValue();
    }
}
