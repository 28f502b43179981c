package org.trundle.surfaces;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.internal.Checks;
import org.trundle.core.Surface;

/**
 * A V-groove: two planes meeting at the apex line through {@code apex} along the unit direction {@code a},
 * opening toward the unit bisector {@code b} (perpendicular to {@code a}), with included angle {@code 2γ}.
 *
 * <p>Geometry: with {@code s = a × b}, the wall on the {@code +s} side has the inward normal
 * {@code n₊ = −cos γ s + sin γ b}, the other {@code n₋ = cos γ s + sin γ b}; both pass through the apex.
 * A ball of radius {@code r} resting in the groove has its centre on the bisector plane at height
 * {@code r / sin γ} above the apex, touches each wall at {@code c − r n±}, and rolls along the groove about
 * the chord through both contact points, at the rolling radius {@code r_e = r sin γ} (design notes §9;
 * common practice).
 *
 * <p>Immutable and thread-safe; the two walls are unbounded {@link Plane}s (the ball never reaches the
 * apex, and beyond the rim is up to the scene).
 */
public final class VGroove {
    private final Vector3D apex;
    private final Vector3D axis;
    private final Vector3D bisector;
    private final double halfAngle;
    private final Plane plus;
    private final Plane minus;

    /**
     * @param apex a point of the apex line (m)
     * @param axis direction of the groove (any length, not zero)
     * @param opening direction the groove opens toward (its part perpendicular to the axis is used)
     * @param includedAngle the angle between the walls (rad), in (0, π)
     */
    public VGroove(Vector3D apex, Vector3D axis, Vector3D opening, double includedAngle) {
        this.apex = Checks.finite("apex", apex);
        this.axis = Checks.direction("axis", axis);
        Vector3D o = Checks.finite("opening", opening);
        Vector3D perp = o.subtract(this.axis.scalarMultiply(o.dotProduct(this.axis)));
        if (!(perp.getNorm() > 1e-9 * o.getNorm())) {
            throw new IllegalArgumentException("groove opening must not be parallel to the axis, got opening = "
                + opening + ", axis = " + axis);
        }
        this.bisector = perp.normalize();
        if (!(includedAngle > 0 && includedAngle < Math.PI)) {
            throw new IllegalArgumentException("groove included angle must lie in (0, pi) rad, got " + includedAngle);
        }
        this.halfAngle = includedAngle / 2;
        Vector3D s = Vector3D.crossProduct(this.axis, bisector);
        double sg = Math.sin(halfAngle);
        double cg = Math.cos(halfAngle);
        this.plus = new Plane(apex, new Vector3D(-cg, s, sg, bisector));
        this.minus = new Plane(apex, new Vector3D(cg, s, sg, bisector));
    }

    /** @return the wall on the {@code a × b} side */
    public Plane plusWall() {
        return plus;
    }

    /** @return the wall on the {@code −a × b} side */
    public Plane minusWall() {
        return minus;
    }

    /** @return both walls, the {@code +} wall first */
    public List<Surface> walls() {
        return List.of(plus, minus);
    }

    /** @return the half-angle γ (rad) */
    public double halfAngle() {
        return halfAngle;
    }

    /**
     * @param ballRadius ball radius r (m)
     * @return the rolling radius {@code r_e = r sin γ} (m)
     */
    public double rollingRadius(double ballRadius) {
        return Checks.positive("ball radius", ballRadius) * Math.sin(halfAngle);
    }

    /**
     * The centre of a ball touching both walls.
     *
     * @param ballRadius ball radius r (m)
     * @param along position along the groove from the apex point (m)
     * @return the centre (m)
     */
    public Vector3D restingCentre(double ballRadius, double along) {
        double h = Checks.positive("ball radius", ballRadius) / Math.sin(halfAngle);
        return new Vector3D(1, apex, Checks.finite("along", along), axis, h, bisector);
    }

    /** @return the groove's direction (unit) */
    public Vector3D axis() {
        return axis;
    }
}
