package org.trundle.surfaces;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.internal.Checks;
import org.trundle.core.Surface;

/**
 * Two parallel round rails carrying a ball between them from above: cylinders of radius {@code ρ} with
 * axes along the unit direction {@code a}, their axes {@code S} apart (centre to centre) in the plane
 * spanned by {@code a} and {@code s}, the ball on the side of the unit "up" direction {@code u}
 * ({@code s = a × u}); {@code origin} is the point midway between the axes.
 *
 * <p>A ball of radius {@code r} resting on both rails has its centre at height
 * {@code h = √((r + ρ)² − S²/4)} above the midpoint, touches the rails at points {@code d = S r/(r + ρ)}
 * apart, and rolls along the rails about the chord through both contacts at the rolling radius
 * {@code r_e = √(r² − d²/4)} (design notes §9; the textbook rolling-on-rails result, common practice).
 * The ball must not fall through: {@code S < 2(r + ρ)}.
 *
 * <p>Immutable and thread-safe; the rails are unbounded {@link Cylinder}s with the ball outside.
 */
public final class Rails {
    private final Vector3D origin;
    private final Vector3D axis;
    private final Vector3D up;
    private final Vector3D across;
    private final double spacing;
    private final double railRadius;
    private final Cylinder plus;
    private final Cylinder minus;

    /**
     * @param origin the point midway between the rail axes (m)
     * @param axis direction of the rails (any length, not zero)
     * @param up the side the ball rides on (its part perpendicular to the axis is used)
     * @param spacing distance S between the rail axes (m), positive
     * @param railDiameter rail diameter 2ρ (m), positive
     */
    public Rails(Vector3D origin, Vector3D axis, Vector3D up, double spacing, double railDiameter) {
        this.origin = Checks.finite("origin", origin);
        this.axis = Checks.direction("axis", axis);
        Vector3D u = Checks.finite("up", up);
        Vector3D perp = u.subtract(this.axis.scalarMultiply(u.dotProduct(this.axis)));
        if (!(perp.getNorm() > 1e-9 * u.getNorm())) {
            throw new IllegalArgumentException("rails' up direction must not be parallel to the rails, got up = "
                + up + ", axis = " + axis);
        }
        this.up = perp.normalize();
        this.across = Vector3D.crossProduct(this.axis, this.up);
        this.spacing = Checks.positive("rail spacing", spacing);
        this.railRadius = Checks.positive("rail diameter", railDiameter) / 2;
        this.plus = new Cylinder(new Vector3D(1, origin, spacing / 2, across), this.axis, railRadius, Side.OUTSIDE);
        this.minus = new Cylinder(new Vector3D(1, origin, -spacing / 2, across), this.axis, railRadius, Side.OUTSIDE);
    }

    /** @return the rail on the {@code a × u} side */
    public Cylinder plusRail() {
        return plus;
    }

    /** @return the other rail */
    public Cylinder minusRail() {
        return minus;
    }

    /** @return both rails, the {@code +} rail first */
    public List<Surface> rails() {
        return List.of(plus, minus);
    }

    /**
     * @param ballRadius ball radius r (m)
     * @return the distance d between the two contact points (m)
     */
    public double contactSpacing(double ballRadius) {
        double r = checkFits(ballRadius);
        return spacing * r / (r + railRadius);
    }

    /**
     * @param ballRadius ball radius r (m)
     * @return the rolling radius {@code r_e = √(r² − d²/4)} (m)
     */
    public double rollingRadius(double ballRadius) {
        double d = contactSpacing(ballRadius);
        return Math.sqrt(ballRadius * ballRadius - d * d / 4);
    }

    /**
     * The centre of a ball resting on both rails.
     *
     * @param ballRadius ball radius r (m)
     * @param along position along the rails from the origin (m)
     * @return the centre (m)
     */
    public Vector3D restingCentre(double ballRadius, double along) {
        double r = checkFits(ballRadius);
        double dist = r + railRadius;
        double h = Math.sqrt(dist * dist - spacing * spacing / 4);
        return new Vector3D(1, origin, Checks.finite("along", along), axis, h, up);
    }

    private double checkFits(double ballRadius) {
        double r = Checks.positive("ball radius", ballRadius);
        if (!(spacing < 2 * (r + railRadius))) {
            throw new IllegalArgumentException("a ball of radius " + r + " m falls between rails " + spacing
                + " m apart of radius " + railRadius + " m: needs spacing < 2 (r + rail radius)");
        }
        return r;
    }

    /** @return the rails' direction (unit) */
    public Vector3D axis() {
        return axis;
    }
}
