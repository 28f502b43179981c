package org.trundle.core;

import org.trundle.core.internal.Checks;

/**
 * How the solver integrates the motion: the method, the integrator's relative tolerance, the
 * threshold of the projection back onto the constraints, and the fixed step and order of the
 * symmetric method for long runs. Part of {@link SolverSettings}.
 *
 * <ul>
 *   <li>{@code tolerance} (default 1e-10, in (0, 1e-2)): relative tolerance of the Dormand–Prince
 *       8(5,3) integrator; absolute tolerances are this times the problem's scales (ball radius for
 *       lengths, the speed scale {@code V} for velocities, {@code V/r} for spins, the energy scale
 *       for energies). It also sets the event thresholds and the scales under either method.</li>
 *   <li>{@code projectionThreshold} (default 0, meaning "follow the tolerance"): distance residual
 *       {@code |d − r|}, as a fraction of the ball radius, above which the centre is projected back
 *       onto the offset surface at the end of a step (the quaternion norm is renormalised past ten
 *       times that). A fixed threshold below the integrator's local error restarts the integration
 *       on almost every step at a loose tolerance, so the default follows the tolerance and
 *       loosening the tolerance always makes a run cheaper.</li>
 *   <li>{@code integrator} (default {@link Integrator#DORMAND_PRINCE}): the method;
 *       {@link Integrator#SYMMETRIC_PROJECTION} keeps the energy error of long conservative rolling
 *       runs bounded (see there for what it covers).</li>
 *   <li>{@code fixedStep} (s, default 1e-3, positive and finite): the step of
 *       {@link Integrator#SYMMETRIC_PROJECTION}. It must resolve the fastest motion of the run: at
 *       order 4 the relative energy error is about {@code (ω h)⁴} for the fastest angular frequency
 *       {@code ω} of the motion (rad/s), and an implicit stage stops converging near {@code ω h ≈ 1}
 *       (the run then fails with a message that says so). Unused by Dormand–Prince.</li>
 *   <li>{@code symmetricOrder} (default 4; 2, 4 or 6): order of the symmetric method: the implicit
 *       midpoint rule (2), its triple-jump composition (4; H. Yoshida, Phys. Lett. A 150 (1990) 262)
 *       or Yoshida's seven-stage composition (6). One order-4 step costs about three order-2 steps.</li>
 * </ul>
 *
 * @param tolerance relative integration tolerance, in (0, 1e-2)
 * @param projectionThreshold projection threshold as a fraction of the ball radius, or 0 to
 *     follow the tolerance
 * @param integrator the integration method
 * @param fixedStep step of the symmetric method (s)
 * @param symmetricOrder order of the symmetric method: 2, 4 or 6
 */
public record IntegrationSettings(double tolerance, double projectionThreshold, Integrator integrator,
        double fixedStep, int symmetricOrder) {
    /** Default step of the symmetric method (s). */
    public static final double DEFAULT_FIXED_STEP = 1e-3;
    /** Default order of the symmetric method. */
    public static final int DEFAULT_SYMMETRIC_ORDER = 4;

    /** Checks every value; the message names the parameter and the value. */
    public IntegrationSettings {
        Checks.positive("tolerance", tolerance);
        Checks.nonNegative("projectionThreshold", projectionThreshold);
        if (tolerance >= 1e-2) {
            throw new IllegalArgumentException("tolerance must be below 1e-2, got " + tolerance);
        }
        if (integrator == null) {
            throw new IllegalArgumentException("integrator must be given, got null");
        }
        Checks.positive("fixedStep", fixedStep);
        if (symmetricOrder != 2 && symmetricOrder != 4 && symmetricOrder != 6) {
            throw new IllegalArgumentException("symmetricOrder must be 2, 4 or 6, got " + symmetricOrder);
        }
    }

    /**
     * Dormand–Prince at the given tolerance and projection threshold (the symmetric method's values
     * at their defaults).
     *
     * @param tolerance relative integration tolerance, in (0, 1e-2)
     * @param projectionThreshold projection threshold as a fraction of the ball radius, or 0 to
     *     follow the tolerance
     */
    public IntegrationSettings(double tolerance, double projectionThreshold) {
        this(tolerance, projectionThreshold, Integrator.DORMAND_PRINCE, DEFAULT_FIXED_STEP, DEFAULT_SYMMETRIC_ORDER);
    }

    /** @return the defaults: Dormand–Prince at tolerance 1e-10, projection following the tolerance */
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

    /**
     * @param v new relative integration tolerance, in (0, 1e-2)
     * @return a copy with that value
     */
    public IntegrationSettings withTolerance(double v) {
        return new IntegrationSettings(v, projectionThreshold, integrator, fixedStep, symmetricOrder);
    }

    /**
     * @param v new projection threshold as a fraction of the ball radius, or 0 to follow the tolerance
     * @return a copy with that value
     */
    public IntegrationSettings withProjectionThreshold(double v) {
        return new IntegrationSettings(tolerance, v, integrator, fixedStep, symmetricOrder);
    }

    /**
     * @param v new integration method
     * @return a copy with that value
     */
    public IntegrationSettings withIntegrator(Integrator v) {
        return new IntegrationSettings(tolerance, projectionThreshold, v, fixedStep, symmetricOrder);
    }

    /**
     * @param v new step of the symmetric method (s), positive and finite
     * @return a copy with that value
     */
    public IntegrationSettings withFixedStep(double v) {
        return new IntegrationSettings(tolerance, projectionThreshold, integrator, v, symmetricOrder);
    }

    /**
     * @param v new order of the symmetric method: 2, 4 or 6
     * @return a copy with that value
     */
    public IntegrationSettings withSymmetricOrder(int v) {
        return new IntegrationSettings(tolerance, projectionThreshold, integrator, fixedStep, v);
    }
}
