package org.trundle.core.internal;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * Argument checks shared by the public API: each failure is an
 * {@link IllegalArgumentException} whose message names the parameter and the value.
 */
public final class Checks {
    private Checks() {
    }

    /**
     * @param name parameter name for the message
     * @param value value to check
     * @return the value, when finite and strictly positive
     */
    public static double positive(String name, double value) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be finite and positive, got " + value);
        }
        return value;
    }

    /**
     * @param name parameter name for the message
     * @param value value to check
     * @return the value, when finite and not negative
     */
    public static double nonNegative(String name, double value) {
        if (!(value >= 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be finite and not negative, got " + value);
        }
        return value;
    }

    /**
     * @param name parameter name for the message
     * @param value value to check
     * @return the value, when finite
     */
    public static double finite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be finite, got " + value);
        }
        return value;
    }

    /**
     * @param name parameter name for the message
     * @param v vector to check
     * @return the vector, when non-null with finite components
     */
    public static Vector3D finite(String name, Vector3D v) {
        if (v == null) {
            throw new IllegalArgumentException(name + " must be given, got null");
        }
        if (!Double.isFinite(v.getX()) || !Double.isFinite(v.getY()) || !Double.isFinite(v.getZ())) {
            throw new IllegalArgumentException(name + " must have finite components, got " + v);
        }
        return v;
    }

    /**
     * The unit vector along {@code v}, normalised with scaling: the components are first divided
     * by the largest magnitude among them, so neither the squares of large components (an axis
     * {@code (0, 0, 1e200)}) overflow nor those of tiny ones (components of 1e-160, or subnormal)
     * underflow. Only a true zero vector and non-finite components are rejected.
     *
     * @param name parameter name for the message
     * @param v vector to check
     * @return the unit vector along v, when v is finite and not zero
     */
    public static Vector3D direction(String name, Vector3D v) {
        finite(name, v);
        double m = Math.max(Math.abs(v.getX()), Math.max(Math.abs(v.getY()), Math.abs(v.getZ())));
        if (m == 0) {
            throw new IllegalArgumentException(name + " must be a non-zero direction, got " + v);
        }
        // dividing by m (not multiplying by 1/m, which overflows for subnormal m) keeps every ratio exact to rounding
        double x = v.getX() / m;
        double y = v.getY() / m;
        double z = v.getZ() / m;
        double n = Math.sqrt(x * x + y * y + z * z);
        return new Vector3D(x / n, y / n, z / n);
    }
}
