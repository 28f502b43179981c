package org.trundle.core;

import org.trundle.core.internal.Checks;

import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * An axis-aligned box (m, world frame): the region a picture asks a surface to draw where the
 * patch itself is unbounded (a plane, an implicit surface, an open axial range). A bounded patch
 * ignores it and gives its real extent. Immutable.
 */
public final class Box {
    private final double[] lo;
    private final double[] hi;

    private Box(double[] lo, double[] hi) {
        this.lo = lo;
        this.hi = hi;
    }

    /**
     * @param min lowest corner (m)
     * @param max highest corner (m), each coordinate strictly above {@code min}'s
     * @return the box
     */
    public static Box of(Vector3D min, Vector3D max) {
        Checks.finite("min", min);
        Checks.finite("max", max);
        double[] a = min.toArray();
        double[] b = max.toArray();
        for (int i = 0; i < 3; i++) {
            if (!(a[i] < b[i])) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "box min must lie below max in every coordinate, got min = %s, max = %s", min, max));
            }
        }
        return new Box(a, b);
    }

    /**
     * The smallest box holding the points, grown by {@code margin} on every side.
     *
     * @param points at least one finite point (m)
     * @param margin growth on every side (m), positive
     * @return the box
     */
    public static Box around(Iterable<Vector3D> points, double margin) {
        Checks.positive("margin", margin);
        double[] a = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
        double[] b = {Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (Vector3D p : points) {
            Checks.finite("point", p);
            double[] c = p.toArray();
            for (int i = 0; i < 3; i++) {
                a[i] = Math.min(a[i], c[i]);
                b[i] = Math.max(b[i], c[i]);
            }
        }
        if (a[0] == Double.POSITIVE_INFINITY) {
            throw new IllegalArgumentException("box around points needs at least one point, got none");
        }
        for (int i = 0; i < 3; i++) {
            a[i] -= margin;
            b[i] += margin;
        }
        return new Box(a, b);
    }

    /** @return the lowest corner (m) */
    public Vector3D min() {
        return new Vector3D(lo[0], lo[1], lo[2]);
    }

    /** @return the highest corner (m) */
    public Vector3D max() {
        return new Vector3D(hi[0], hi[1], hi[2]);
    }

    /** @return the centre (m) */
    public Vector3D centre() {
        return new Vector3D(0.5 * (lo[0] + hi[0]), 0.5 * (lo[1] + hi[1]), 0.5 * (lo[2] + hi[2]));
    }

    /**
     * @param axis 0, 1 or 2
     * @return the box's size along that world axis (m)
     */
    public double size(int axis) {
        return hi[axis] - lo[axis];
    }

    /**
     * @param p a point (m)
     * @return whether it lies in the closed box
     */
    public boolean contains(Vector3D p) {
        return p.getX() >= lo[0] && p.getX() <= hi[0] && p.getY() >= lo[1] && p.getY() <= hi[1]
            && p.getZ() >= lo[2] && p.getZ() <= hi[2];
    }

    /**
     * The range of {@code (x − origin)·direction} over the box (its extreme corners): where a line
     * coordinate along {@code direction} meets the box.
     *
     * @param origin origin of the coordinate (m)
     * @param direction direction of the coordinate (not necessarily unit)
     * @return {@code {lowest, highest}}
     */
    public double[] rangeAlong(Vector3D origin, Vector3D direction) {
        double[] d = direction.toArray();
        double[] o = origin.toArray();
        double a = 0;
        double b = 0;
        for (int i = 0; i < 3; i++) {
            double p = (lo[i] - o[i]) * d[i];
            double q = (hi[i] - o[i]) * d[i];
            a += Math.min(p, q);
            b += Math.max(p, q);
        }
        return new double[] {a, b};
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "box[(%g, %g, %g) .. (%g, %g, %g)] m", lo[0], lo[1], lo[2], hi[0], hi[1], hi[2]);
    }
}
