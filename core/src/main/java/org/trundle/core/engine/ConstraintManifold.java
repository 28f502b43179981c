package org.trundle.core.engine;

/**
 * A manifold {@code M = {y : g(y) = 0}} of a few constraints {@code g = (g₁ … g_m)} on the state of an
 * ordinary differential equation, as the {@link SymmetricProjectionIntegrator} needs it: the residuals
 * and their gradients (the rows of {@code G = ∂g/∂y}), which are also the projection directions
 * ({@code y + Gᵀ μ}). The exact flow of the equation must keep {@code g} constant (the constraints are
 * invariants); the integrator only removes the drift of its discretisation.
 *
 * <p>Internal to the solver.
 */
interface ConstraintManifold {
    /** @return the number of constraints m, at least 1 */
    int constraints();

    /**
     * The residuals {@code g(y)}.
     *
     * @param t time (s)
     * @param y state
     * @param out residuals, length {@link #constraints()}, in each constraint's own unit
     */
    void residuals(double t, double[] y, double[] out);

    /**
     * The gradients {@code ∇g_i(y)}, one row per constraint.
     *
     * @param t time (s)
     * @param y state
     * @param out {@code m} rows of the state's length; every entry is written
     */
    void gradients(double t, double[] y, double[][] out);

    /**
     * The residual below which constraint {@code i} counts as met (the level of rounding of its
     * evaluation), in the constraint's unit.
     *
     * @param i constraint index
     * @return the tolerance, positive
     */
    double tolerance(int i);
}
