package org.trundle.core;

import org.trundle.core.internal.Checks;

/**
 * A rigid sphere with isotropic inertia: radius {@code r} (m), mass {@code m} (kg) and inertia
 * factor {@code k = I/(m r²)} (dimensionless), so that the moment of inertia about any axis
 * through the centre is {@code I = k m r²} (kg·m²).
 *
 * <p>Presets: a solid homogeneous ball has {@code k = 2/5}, a thin spherical shell
 * {@code k = 2/3} (standard textbook results, e.g. any mechanics text's table of moments of
 * inertia). Any {@code 0 < k ≤ 2/3} describes a layered ball whose density does not increase
 * outward-to-inward beyond the shell limit.
 *
 * <p>The mass, the moment of inertia and their inverses must be finite numbers (a radius of 1e300 m
 * or a mass of 1e-320 kg is refused), since the solver divides by both.
 *
 * <p>Immutable and thread-safe.
 */
public final class Ball {
    /** Inertia factor of a solid homogeneous sphere, {@code 2/5}. */
    public static final double SOLID = 2.0 / 5.0;
    /** Inertia factor of a thin spherical shell, {@code 2/3}. */
    public static final double THIN_SHELL = 2.0 / 3.0;

    private final double radius;
    private final double mass;
    private final double inertiaFactor;

    private Ball(double radius, double mass, double inertiaFactor) {
        this.radius = Checks.positive("radius", radius);
        this.mass = Checks.positive("mass", mass);
        if (!(inertiaFactor > 0 && inertiaFactor <= THIN_SHELL + 1e-15)) {
            throw new IllegalArgumentException(
                "inertia factor k must lie in (0, 2/3], got k = " + inertiaFactor);
        }
        this.inertiaFactor = inertiaFactor;
        // the solver divides by m and I = k m r²: both and their inverses must be finite numbers
        double inertia = momentOfInertia();
        if (!Double.isFinite(1.0 / mass) || !(inertia > 0) || !Double.isFinite(inertia)
            || !Double.isFinite(1.0 / inertia)) {
            throw new IllegalArgumentException("ball of radius " + radius + " m, mass " + mass + " kg and inertia factor "
                + inertiaFactor + " has moment of inertia k m r^2 = " + inertia + " kg m^2; the mass, the moment of"
                + " inertia and their inverses must be finite numbers (a double spans about 1e-308 to 1e308)");
        }
    }

    /**
     * A ball with any inertia factor.
     *
     * @param radius radius r (m), finite and positive
     * @param mass mass m (kg), finite and positive
     * @param inertiaFactor k = I/(m r²), in (0, 2/3]
     * @return the ball
     * @throws IllegalArgumentException naming the parameter and value when out of range
     */
    public static Ball of(double radius, double mass, double inertiaFactor) {
        return new Ball(radius, mass, inertiaFactor);
    }

    /**
     * A solid homogeneous ball, {@code k = 2/5}.
     *
     * @param radius radius (m)
     * @param mass mass (kg)
     * @return the ball
     */
    public static Ball solid(double radius, double mass) {
        return new Ball(radius, mass, SOLID);
    }

    /**
     * A thin spherical shell, {@code k = 2/3}.
     *
     * @param radius radius (m)
     * @param mass mass (kg)
     * @return the ball
     */
    public static Ball thinShell(double radius, double mass) {
        return new Ball(radius, mass, THIN_SHELL);
    }

    /** @return radius r (m) */
    public double radius() {
        return radius;
    }

    /** @return mass m (kg) */
    public double mass() {
        return mass;
    }

    /** @return inertia factor k = I/(m r²) (dimensionless) */
    public double inertiaFactor() {
        return inertiaFactor;
    }

    /** @return moment of inertia I = k m r² (kg·m²) */
    public double momentOfInertia() {
        return inertiaFactor * mass * radius * radius;
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof Ball)) {
            return false;
        }
        Ball b = (Ball) o;
        return Double.compare(radius, b.radius) == 0 && Double.compare(mass, b.mass) == 0
            && Double.compare(inertiaFactor, b.inertiaFactor) == 0;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(radius) * 31 * 31 + Double.hashCode(mass) * 31 + Double.hashCode(inertiaFactor);
    }

    @Override
    public String toString() {
        return "Ball[r=" + radius + " m, m=" + mass + " kg, k=" + inertiaFactor + "]";
    }
}
