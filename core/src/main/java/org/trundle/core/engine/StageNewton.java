package org.trundle.core.engine;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;

/**
 * The simplified Newton iteration matrix of the implicit midpoint stages of the
 * {@link SymmetricProjectionIntegrator}. A stage {@code z = y + c f(t_m, z)} ({@code c = γh/2}, γ the stage's
 * weight) has the residual {@code r(z) = z − y − c f(t_m, z)}; simplified Newton replaces its derivative
 * {@code I − c ∂f/∂y(z)} by {@code I − c J} with one Jacobian {@code J} kept over many stages and steps:
 * <pre>
 *   d_k     = y + c f(t_m, z_k) − z_k        (the fixed-point map's change, −r(z_k))
 *   z_{k+1} = z_k + (I − c J)⁻¹ d_k
 * </pre>
 * (E. Hairer, G. Wanner, Solving Ordinary Differential Equations II, 2nd ed., Springer 1996, §IV.8, the
 * simplified Newton iterations of implicit Runge–Kutta methods and the rule of recomputing the Jacobian
 * only when the observed contraction is poor; from memory). Its contraction factor is about
 * {@code |c| ‖∂f/∂y(z) − J‖}, so a Jacobian a little stale still gains many digits per iteration, where the plain
 * fixed-point iteration gains {@code −log₁₀(|c| ‖∂f/∂y‖)} (one digit per iteration in the vertical tube at
 * h = 1 ms).
 *
 * <p>{@code J} is the forward-difference Jacobian of the right-hand side, column {@code j} from
 * {@code (f(z + δ_j e_j) − f(z)) / δ_j} with {@code δ_j = √ε · max(|z_j|, scale_j)} (the usual step of a
 * forward difference, its error about {@code √ε} of the derivative; same book §IV.8; from memory): {@code n}
 * evaluations, charged to the run like any other. Its error only slows the iteration, never moves its fixed
 * point. {@code I − c J} is factored by LU (EJML) once per stage and coefficient {@code c}, and the
 * factorisation is reused until the Jacobian is refreshed or the coefficient changes; after construction
 * nothing is allocated but the right-hand side's own arrays. Internal to the solver.
 */
final class StageNewton {
    /** The right-hand side as the integrator evaluates it (counted against the evaluation budget). */
    @FunctionalInterface
    interface Rhs {
        /**
         * @param t time (s)
         * @param y state
         * @return the derivative (a new array the caller may keep)
         */
        double[] derivative(double t, double[] y);
    }

    private static final double SQRT_EPS = Math.sqrt(Math.ulp(1.0));

    private final int n;
    private final double[] scale;
    private final DMatrixRMaj jacobian;
    private final double[] shifted;
    private final DMatrixRMaj[] matrix;
    private final LinearSolverDense<DMatrixRMaj>[] lu;
    /** Coefficient {@code c} each slot's inverse was made for (NaN: none). */
    private final double[] factored;
    private final DMatrixRMaj[] inverse;
    private final double[] work;
    /** The slot the next new coefficient is factored into. */
    private int next;
    private boolean ready;
    private long refreshes;

    /**
     * @param n state dimension
     * @param stages number of stages: at most this many distinct coefficients {@code c} are kept factored
     * @param scale a typical magnitude of each state component (its unit), positive: the floor of the
     *     difference step
     */
    @SuppressWarnings("unchecked")
    StageNewton(int n, int stages, double[] scale) {
        this.n = n;
        this.scale = scale.clone();
        this.jacobian = new DMatrixRMaj(n, n);
        this.shifted = new double[n];
        this.matrix = new DMatrixRMaj[stages];
        this.lu = new LinearSolverDense[stages];
        this.factored = new double[stages];
        this.inverse = new DMatrixRMaj[stages];
        for (int s = 0; s < stages; s++) {
            matrix[s] = new DMatrixRMaj(n, n);
            inverse[s] = new DMatrixRMaj(n, n);
            lu[s] = LinearSolverFactory_DDRM.lu(n);
            factored[s] = Double.NaN;
        }
        this.work = new double[n];
    }

    /** @return whether a Jacobian has been computed */
    boolean ready() {
        return ready;
    }

    /** @return how many Jacobians have been computed */
    long refreshes() {
        return refreshes;
    }

    /**
     * Computes the Jacobian at {@code (t, z)} by forward differences ({@code n} evaluations) and drops every
     * factorisation.
     *
     * @param f the right-hand side
     * @param t time (s)
     * @param z state
     * @param fz {@code f(t, z)}, already evaluated
     */
    void refresh(Rhs f, double t, double[] z, double[] fz) {
        System.arraycopy(z, 0, shifted, 0, n);
        for (int j = 0; j < n; j++) {
            double zj = z[j];
            shifted[j] = zj + SQRT_EPS * Math.max(Math.abs(zj), scale[j]);
            // the step actually taken (the sum is rounded)
            double delta = shifted[j] - zj;
            double[] f1 = f.derivative(t, shifted);
            for (int i = 0; i < n; i++) {
                jacobian.unsafe_set(i, j, (f1[i] - fz[i]) / delta);
            }
            shifted[j] = zj;
        }
        java.util.Arrays.fill(factored, Double.NaN);
        next = 0;
        ready = true;
        refreshes++;
    }

    /**
     * Replaces {@code d} by {@code (I − c J)⁻¹ d}, inverting {@code I − c J} first (by LU) if no slot holds
     * it for this {@code c}.
     *
     * @param c the stage's coefficient {@code γh/2} (s)
     * @param d the fixed-point map's change on entry, the Newton correction on return
     * @throws RunFailure if {@code I − c J} is singular (a step far too large for the motion)
     */
    void correct(double c, double[] d) {
        // the step sizes of a fixed-step run differ in their last bits (t_k = t_0 + k h): the matrix only sets
        // the contraction, so a coefficient within 1e-6 of a factored one keeps its factorisation; stages of equal
        // weight share one
        int slot = -1;
        for (int s = 0; s < factored.length && slot < 0; s++) {
            if (Math.abs(c - factored[s]) <= 1e-6 * Math.abs(c)) {
                slot = s;
            }
        }
        if (slot < 0) {
            slot = next;
            next = (next + 1) % factored.length;
            DMatrixRMaj a = matrix[slot];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    a.unsafe_set(i, j, (i == j ? 1.0 : 0.0) - c * jacobian.unsafe_get(i, j));
                }
            }
            // a singular matrix leaves a zero pivot, and its inverse infinite or NaN (EJML's LU does not refuse it;
            // its quality measure is no guide here, the rows having the units of the components)
            boolean ok = lu[slot].setA(a);
            if (ok) {
                lu[slot].invert(inverse[slot]);
                for (double v : inverse[slot].data) {
                    ok &= Double.isFinite(v);
                }
            }
            if (!ok) {
                factored[slot] = Double.NaN;
                throw new RunFailure("the symmetric integrator's Newton matrix I − (γh/2) J is singular: a stage of "
                    + Math.abs(2 * c) + " s (the fixed step times the stage's weight) is too large for the motion;"
                    + " choose a smaller step");
            }
            factored[slot] = c;
        }
        double[] m = inverse[slot].data;
        System.arraycopy(d, 0, work, 0, n);
        for (int i = 0, row = 0; i < n; i++, row += n) {
            double s = 0;
            for (int j = 0; j < n; j++) {
                s += m[row + j] * work[j];
            }
            d[i] = s;
        }
    }
}
