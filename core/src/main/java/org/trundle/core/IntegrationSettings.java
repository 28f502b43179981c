package org.trundle.core;

/**
 * How accurately the solver integrates the motion: the integrator's relative tolerance and the
 * threshold of the projection back onto the constraints. Part of {@link SolverSettings}.
 *
 * <ul>
 *   <li>{@code tolerance} (default 1e-10, in (0, 1e-2)): relative tolerance of the Dormand–Prince
 *       8(5,3) integrator; absolute tolerances are this times the problem's scales (ball radius for
 *       lengths, the speed scale {@code V} for velocities, {@code V/r} for spins, the energy scale
 *       for energies).</li>
 *   <li>{@code projectionThreshold} (default 0, meaning "follow the tolerance"): distance residual
 *       {@code |d − r|}, as a fraction of the ball radius, above which the centre is projected back
 *       onto the offset surface at the end of a step (the quaternion norm is renormalised past ten
 *       times that). A fixed threshold below the integrator's local error restarts the integration
 *       on almost every step at a loose tolerance, so the default follows the tolerance and
 *       loosening the tolerance always makes a run cheaper.</li>
 * </ul>
 *
 * @param tolerance relative integration tolerance, in (0, 1e-2)
 * @param projectionThreshold projection threshold as a fraction of the ball radius, or 0 to
 *     follow the tolerance
 */
public record IntegrationSettings(double tolerance, double projectionThreshold) {
    /** Checks every value; the message names the parameter and the value. */
    public IntegrationSettings {
        Checks.positive("tolerance", tolerance);
        Checks.nonNegative("projectionThreshold", projectionThreshold);
        if (tolerance >= 1e-2) {
            throw new IllegalArgumentException("tolerance must be below 1e-2, got " + tolerance);
        }
    }

    /** @return the defaults: tolerance 1e-10, projection following the tolerance */
    public static IntegrationSettings defaults() {
        return new IntegrationSettings(1e-10, 0.0);
    }

    /**
     * @return the projection threshold in force, as a fraction of the ball radius: the set value,
     *     or the tolerance when it is 0
     */
    public double effectiveProjectionThreshold() {
        return projectionThreshold > 0 ? projectionThreshold : tolerance;
    }
}
