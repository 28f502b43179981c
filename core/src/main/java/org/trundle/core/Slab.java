package org.trundle.core;

import org.trundle.core.internal.Checks;

import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * A slab of space, {@code low ≤ x·d ≤ high} (m) for a unit direction {@code d}: a region a
 * surface's patch lies within (see {@link Surface#extent()}). One side may be open
 * ({@code low = −∞} or {@code high = +∞}); a plane is the slab of zero thickness
 * {@code low = high = o·n}. Immutable.
 *
 * @param direction the unit direction {@code d}
 * @param low the lower bound of {@code x·d} (m), not NaN, at most {@code high}
 * @param high the upper bound of {@code x·d} (m), not NaN
 */
public record Slab(Vector3D direction, double low, double high) {
    /**
     * Checks the slab.
     *
     * @param direction the unit direction {@code d} (a non-zero finite vector, normalised here)
     * @param low the lower bound (m)
     * @param high the upper bound (m)
     */
    public Slab {
        direction = Checks.direction("direction", direction);
        if (Double.isNaN(low) || Double.isNaN(high) || !(low <= high)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                "slab bounds must satisfy low <= high, got low = %s, high = %s", low, high));
        }
    }

    /**
     * The slab about a point: {@code o·d − below ≤ x·d ≤ o·d + above}.
     *
     * @param direction the direction
     * @param point a point {@code o} (m)
     * @param below extent below the point along {@code d} (m, not negative, may be +∞)
     * @param above extent above it (m, not negative, may be +∞)
     * @return the slab
     */
    public static Slab about(Vector3D direction, Vector3D point, double below, double above) {
        Vector3D d = Checks.direction("direction", direction);
        double at = point.dotProduct(d);
        return new Slab(d, at - below, at + above);
    }

    /**
     * The slab moved by the rigid transform {@code y = Q x + t}.
     *
     * @param rotation {@code Q} (applied as {@link Rotation#applyTo(Vector3D)})
     * @param translation {@code t} (m)
     * @return the moved slab
     */
    public Slab moved(Rotation rotation, Vector3D translation) {
        Vector3D d = rotation.applyTo(direction);
        double shift = translation.dotProduct(d);
        return new Slab(d, low + shift, high + shift);
    }
}
