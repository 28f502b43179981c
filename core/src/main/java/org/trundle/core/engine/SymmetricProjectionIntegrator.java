package org.trundle.core.engine;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.DecompositionSolver;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.ode.AbstractIntegrator;
import org.hipparchus.ode.ExpandableODE;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;

/**
 * A reversible fixed-step integrator for long conservative runs: a symmetric composition of the
 * implicit midpoint rule ({@link MidpointComposition}) with symmetric projection onto a
 * {@link ConstraintManifold} (E. Hairer, "Symmetric projection methods for differential equations on
 * manifolds", BIT 40 (2000) 726–734; E. Hairer, C. Lubich, G. Wanner, Geometric Numerical Integration,
 * 2nd ed., Springer 2006, §V.4.1; from memory). One step from {@code y_n} on the manifold:
 * <pre>
 *   ŷ       = y_n + G(y_n)ᵀ μ
 *   ỹ       = Φ_h(ŷ)                      (the symmetric base method)
 *   y_{n+1} = ỹ + G(y_{n+1})ᵀ μ,   g(y_{n+1}) = 0
 * </pre>
 * with {@code G = ∂g/∂y} and one vector {@code μ} for both projections, found by simplified Newton
 * with the matrix {@code 2 G(y_n) G(y_n)ᵀ} (the same reference). Because the base method is symmetric
 * and the two projections mirror each other, the step is symmetric: stepping back with {@code −h} from
 * {@code y_{n+1}} returns {@code y_n} (with {@code −μ}). On a reversible problem whose reversing map
 * leaves the constraints and their gradients alone (rolling and flight, with {@code ω ↦ −ω},
 * {@code v ↦ −v}), the method is reversible, and on such problems near an invariant torus the energy
 * error stays bounded over times exponentially long in {@code 1/h} instead of growing (Hairer, Lubich,
 * Wanner ch. XI, near-conservation of reversible methods; from memory). The step size must stay fixed:
 * an adaptive step breaks the symmetry.
 *
 * <p>The implicit stages {@code z = y + (γh/2) f(t + γh/2, z)} are solved to rounding: iterated until the
 * change {@code G(z) − z} of the fixed-point map {@code G(z) = y + (γh/2) f(t + γh/2, z)} falls, in every
 * component, to its rounding, {@code 2 ulp(z_i)} (or {@code 1e-17·scale_i} for a component near zero), or stops
 * falling within {@value #ROUNDING_FLOOR} times that or with a Jacobian just computed (the rounding of
 * {@code f}); the stage is then {@code G(z)}. Stopping any earlier leaves
 * an error of one sign in every step (the iteration approaches its fixed point from one side), and that drifts:
 * stopping at {@code 1e-15·scale_i} made the energy error of a 10⁶-step order-6 run in a bowl grow linearly, to
 * 8e-12, where solving to rounding leaves a random walk of rounding errors, 3e-13 after 2·10⁵ steps. The
 * iterates between are simplified Newton steps {@code z ← z + (I − (γh/2) J)⁻¹ (G(z) − z)} ({@link StageNewton};
 * E. Hairer, G. Wanner, Solving Ordinary Differential Equations II, §IV.8; from memory) with one
 * finite-difference Jacobian {@code J} kept over stages and steps and recomputed when an iteration contracts by
 * less than {@value #POOR_CONTRACTION}. They change how fast the stage reaches its fixed point, not the fixed
 * point. Why Newton: the plain fixed-point iteration (the usual choice for non-stiff problems, Hairer, Lubich,
 * Wanner §VIII.6) contracts by {@code |γh/2| ‖∂f/∂y‖}, about 0.1 in the vertical tube at h = 1 ms (the state
 * turns at about 100 rad/s there), so a stage took about 14 evaluations; simplified Newton with a
 * Jacobian a few steps old contracts by 10⁻²–10⁻³ per iteration and takes about 6 plus its share of the
 * Jacobians (measured with {@code LongRunDrift}: 1.7 times fewer evaluations in the tube). Anderson acceleration
 * of the fixed-point map (H. F. Walker, P. Ni, SIAM J. Numer. Anal. 49 (2011) 1715; from memory), which needs no
 * Jacobian, was tried and took 2–14% more evaluations there (3 or 4 differences kept), its last digits limited
 * by the quaternion's rotating kinematics. The projection's Newton iteration runs until every residual is within the manifold's {@link ConstraintManifold#tolerance}. Both
 * solve to rounding, so the symmetry holds to rounding too. A stage that does not converge in
 * {@value #MAX_STAGE_ITERATIONS} iterations means the step is far too large for the motion: the run
 * fails with a message that says so.
 *
 * <p>The continuous extension (for event location and samples) is the cubic Hermite polynomial on the
 * step ends ({@link HermiteStateInterpolator}); Hipparchus' event machinery and step handlers work on
 * it as on any of its own integrators. Internal to the solver.
 */
final class SymmetricProjectionIntegrator extends AbstractIntegrator {
    /** Largest number of Newton iterations of one implicit stage. */
    static final int MAX_STAGE_ITERATIONS = 60;
    /** Number of past steps whose stage solutions the predictor extrapolates. */
    static final int HISTORY = 5;
    /**
     * A change that stops falling within this many times its stop {@code 1e-17·scale_i + 2 ulp(z_i)} has reached
     * the rounding of the right-hand side: the stage is solved.
     */
    static final double ROUNDING_FLOOR = 64;
    /**
     * Largest contraction factor (change over the previous change) of the stage's Newton iteration before the
     * Jacobian is recomputed: below it each iteration gains at least two digits, where the fixed-point
     * iteration gains about one in the vertical tube at h = 1 ms.
     */
    static final double POOR_CONTRACTION = 3e-2;
    /** Largest number of Newton iterations of one projection. */
    static final int MAX_PROJECTION_ITERATIONS = 12;

    private final double step;
    private final MidpointComposition composition;
    private final ConstraintManifold manifold;
    private final double[] scale;
    private final double[] inverseScale;

    // workspaces, sized on first use
    private int n = -1;
    private double[][] stageGuess;
    private boolean[] guessReady;
    private double[] hat;
    private double[] tilde;
    private double[] z;
    private double[] image;
    private double[] delta;
    private StageNewton newton;
    private double[][] grad0;
    private double[][] grad1;
    private double[] residual;
    private double[] mu;
    /** The converged midpoints of each stage over the last three steps, newest first (the predictor). */
    private double[][][] history;
    private int historyCount;
    private double historyStep;
    /** Whether the stages of the current step start from the extrapolated midpoints. */
    private boolean predict;
    /** Number of projection iterations of the last step (for tests and benchmarks). */
    int lastProjectionIterations;

    /**
     * @param step the fixed step size (s), positive
     * @param composition the symmetric base method
     * @param manifold the constraints to keep
     * @param scale a typical magnitude of each state component (its unit), positive, for the stop of
     *     the implicit stages
     */
    SymmetricProjectionIntegrator(double step, MidpointComposition composition, ConstraintManifold manifold,
                                  double[] scale) {
        super("symmetric projection " + composition.name().toLowerCase(java.util.Locale.ROOT).replace('_', ' '));
        if (!(step > 0) || !Double.isFinite(step)) {
            throw new IllegalArgumentException("fixed step must be positive and finite, got " + step);
        }
        this.step = step;
        this.composition = composition;
        this.manifold = manifold;
        this.scale = scale.clone();
        this.inverseScale = new double[scale.length];
        for (int i = 0; i < scale.length; i++) {
            inverseScale[i] = 1.0 / scale[i];
        }
    }

    /** @return the fixed step size (s) */
    double step() {
        return step;
    }

    @Override
    public ODEStateAndDerivative integrate(ExpandableODE equations, ODEState initialState, double finalTime) {
        sanityChecks(initialState, finalTime);
        setStepStart(initIntegration(equations, initialState, finalTime));
        boolean forward = finalTime > initialState.getTime();
        double tStart = initialState.getTime();
        double signed = forward ? step : -step;
        long k = 0;
        historyCount = 0;
        setIsLastStep(false);
        do {
            ODEStateAndDerivative start = getStepStart();
            double t0 = start.getTime();
            // step ends at tStart + k h, so that a million steps do not accumulate the rounding of a million sums
            double t1 = tStart + (++k) * signed;
            if (Math.abs(finalTime - t0) <= step * (1 + 1e-6) || (forward ? t1 >= finalTime : t1 <= finalTime)) {
                // the last step ends exactly at the final time (a shorter step ends a segment only)
                t1 = finalTime;
            }
            double h = t1 - t0;
            setStepSize(h);
            double[] y1 = advance(t0, start.getCompleteState(), h);
            double[] f1 = computeDerivatives(t1, y1);
            ODEStateAndDerivative end = equations.getMapper().mapStateAndDerivative(t1, y1, f1);
            setStepStart(acceptStep(new HermiteStateInterpolator(forward, start, end, start, end,
                equations.getMapper()), finalTime));
        } while (!isLastStep());
        ODEStateAndDerivative last = getStepStart();
        setStepStart(null);
        setStepSize(Double.NaN);
        return last;
    }

    /**
     * Sets the equations for {@link #advance} outside {@link #integrate} (tests and benchmarks that
     * step by hand).
     *
     * @param ode the equations
     * @param t0 start time (s)
     * @param y0 start state
     * @param tEnd a time in the direction of the steps to come (s)
     */
    void prepare(org.hipparchus.ode.OrdinaryDifferentialEquation ode, double t0, double[] y0, double tEnd) {
        initIntegration(new ExpandableODE(ode), new ODEState(t0, y0), tEnd);
        historyCount = 0;
    }

    /**
     * One symmetric projected step (the equations must have been set by {@link #integrate} or
     * {@link #prepare}).
     *
     * @param t0 time at the step start (s)
     * @param y0 state at the step start (on the manifold, or near it)
     * @param h signed step (s)
     * @return the state at {@code t0 + h}, on the manifold
     */
    double[] advance(double t0, double[] y0, double h) {
        size(y0.length);
        int m = manifold.constraints();
        double t1 = t0 + h;
        manifold.gradients(t0, y0, grad0);
        double[][] a = new double[m][m];
        for (int i = 0; i < m; i++) {
            for (int j = 0; j < m; j++) {
                a[i][j] = 2 * dot(grad0[i], grad0[j]);
            }
        }
        DecompositionSolver newton = new LUDecomposition(new Array2DRowRealMatrix(a, false)).getSolver();
        java.util.Arrays.fill(mu, 0.0);
        java.util.Arrays.fill(guessReady, false);
        predict = historyCount >= 3 && Math.abs(h - historyStep) <= 1e-9 * Math.abs(h);
        double[] y1 = new double[n];
        double previous = Double.POSITIVE_INFINITY;
        for (int it = 1; ; it++) {
            for (int i = 0; i < n; i++) {
                double s = y0[i];
                for (int k = 0; k < m; k++) {
                    s += grad0[k][i] * mu[k];
                }
                hat[i] = s;
            }
            base(t0, hat, h, tilde);
            // y1 = ỹ + G(y1)ᵀ μ: a fixed point in y1, contracting at the size of μ (a few iterations)
            System.arraycopy(tilde, 0, y1, 0, n);
            for (int pass = 0; pass < 3; pass++) {
                manifold.gradients(t1, y1, grad1);
                for (int i = 0; i < n; i++) {
                    double s = tilde[i];
                    for (int k = 0; k < m; k++) {
                        s += grad1[k][i] * mu[k];
                    }
                    y1[i] = s;
                }
            }
            manifold.residuals(t1, y1, residual);
            double worst = 0;
            for (int k = 0; k < m; k++) {
                worst = Math.max(worst, Math.abs(residual[k]) / manifold.tolerance(k));
            }
            if (!(worst <= 1) && !(it >= 3 && worst >= 0.5 * previous) && it < MAX_PROJECTION_ITERATIONS) {
                // Newton: g(y1(μ)) with ∂y1/∂μ ≈ 2 Gᵀ gives μ ← μ − (2 G Gᵀ)⁻¹ g
                double[] d = newton.solve(new org.hipparchus.linear.ArrayRealVector(residual, false)).toArray();
                for (int k = 0; k < m; k++) {
                    mu[k] -= d[k];
                }
                previous = worst;
                continue;
            }
            lastProjectionIterations = it;
            remember(h);
            if (!(worst <= 1e3)) {
                throw new RunFailure("the symmetric projection did not reach the constraint manifold at t = " + t1
                    + " s (residual " + worst + " times its tolerance after " + it + " iterations): the fixed step "
                    + Math.abs(h) + " s is too large for the motion; choose a smaller step");
            }
            return y1;
        }
    }

    /** Keeps the step's converged stage midpoints as the newest history entry. */
    private void remember(double h) {
        if (historyCount > 0 && !(Math.abs(h - historyStep) <= 1e-9 * Math.abs(h))) {
            historyCount = 0;
        }
        for (int s = 0; s < composition.stages(); s++) {
            double[][] hs = history[s];
            double[] oldest = hs[HISTORY - 1];
            System.arraycopy(hs, 0, hs, 1, HISTORY - 1);
            hs[0] = oldest;
            System.arraycopy(stageGuess[s], 0, oldest, 0, n);
        }
        historyCount = Math.min(HISTORY, historyCount + 1);
        historyStep = h;
    }

    /** The base method {@code Φ_h}: the composition's midpoint stages from {@code y} into {@code out}. */
    private void base(double t0, double[] y, double h, double[] out) {
        System.arraycopy(y, 0, out, 0, n);
        double t = t0;
        for (int s = 0; s < composition.stages(); s++) {
            double hs = composition.weight(s) * h;
            midpoint(s, t, out, hs);
            t += hs;
        }
    }

    /**
     * One implicit midpoint stage in place: {@code z = y + (h/2) f(t + h/2, z)}, {@code y ← 2z − y}.
     * The first projection iteration starts from the quartic extrapolation of the stage's midpoints over
     * the last five steps of the same size, {@code 5z₁ − 10z₂ + 10z₃ − 5z₄ + z₅} (its error is {@code O((ωh)⁵)},
     * about 2e-5 of the scale in the vertical tube at h = 1 ms), or the quadratic one over three,
     * {@code 3z₁ − 3z₂ + z₃} ({@code O((ωh)³)}, 1e-3 there), or the stage's start {@code y} ({@code O(ωh)}) while
     * there is no such history; later
     * ones from the stage's last solution (the projection moves it by the tiny {@code Gᵀ Δμ}). The guess
     * changes only the number of iterations, not the solution.
     */
    private void midpoint(int stage, double t, double[] y, double h) {
        double[] guess = stageGuess[stage];
        if (guessReady[stage]) {
            System.arraycopy(guess, 0, z, 0, n);
        } else if (predict && historyCount >= 5) {
            double[][] hs = history[stage];
            for (int i = 0; i < n; i++) {
                z[i] = 5 * (hs[0][i] - hs[3][i]) + 10 * (hs[2][i] - hs[1][i]) + hs[4][i];
            }
        } else if (predict) {
            double[][] hs = history[stage];
            for (int i = 0; i < n; i++) {
                z[i] = 3 * (hs[0][i] - hs[1][i]) + hs[2][i];
            }
        } else {
            System.arraycopy(y, 0, z, 0, n);
        }
        double half = 0.5 * h;
        double tm = t + half;
        double previous = Double.POSITIVE_INFINITY;
        boolean refreshed = false;
        for (int it = 1; ; it++) {
            double[] f = computeDerivatives(tm, z);
            boolean converged = true;
            double change = 0;
            for (int i = 0; i < n; i++) {
                double next = y[i] + half * f[i];
                double d = next - z[i];
                double tol = 1e-17 * scale[i] + 2 * Math.ulp(next);
                if (!(Math.abs(d) <= tol)) {
                    converged = false;
                }
                change = Math.max(change, Math.abs(d) * inverseScale[i]);
                image[i] = next;
                delta[i] = d;
            }
            if (converged) {
                System.arraycopy(image, 0, z, 0, n);
                break;
            }
            if (it >= MAX_STAGE_ITERATIONS || !Double.isFinite(change)) {
                throw new RunFailure("the symmetric integrator's implicit stage did not converge at t = " + tm
                    + " s (" + it + " Newton iterations, last change " + change + " of the component scale):"
                    + " the fixed step " + Math.abs(h) + " s is too large for the motion; choose a smaller step");
            }
            if (it >= 2 && change >= previous && (refreshed || atRoundingFloor())) {
                // the change stopped falling a few roundings above the stop, or with a Jacobian just computed:
                // the rounding of f itself
                System.arraycopy(image, 0, z, 0, n);
                break;
            }
            if (!newton.ready() || !refreshed && it >= 2 && change > POOR_CONTRACTION * previous) {
                newton.refresh(this::computeDerivatives, tm, z, f);
                refreshed = true;
            }
            newton.correct(half, delta);
            for (int i = 0; i < n; i++) {
                z[i] += delta[i];
            }
            previous = change;
        }
        System.arraycopy(z, 0, guess, 0, n);
        guessReady[stage] = true;
        for (int i = 0; i < n; i++) {
            y[i] = 2 * z[i] - y[i];
        }
    }

    /**
     * @return whether every component's change ({@code delta}) is within {@link #ROUNDING_FLOOR} times its stop
     *     {@code 1e-17·scale_i + 2 ulp(G(z)_i)} ({@code image})
     */
    private boolean atRoundingFloor() {
        for (int i = 0; i < n; i++) {
            if (!(Math.abs(delta[i]) <= ROUNDING_FLOOR * (1e-17 * scale[i] + 2 * Math.ulp(image[i])))) {
                return false;
            }
        }
        return true;
    }

    /** @return how many Jacobians the stages' Newton iteration has computed (for tests and benchmarks) */
    long jacobianRefreshes() {
        return newton == null ? 0 : newton.refreshes();
    }

    private void size(int dim) {
        if (dim == n) {
            return;
        }
        if (scale.length != dim) {
            throw new IllegalArgumentException("the symmetric integrator has " + scale.length
                + " component scales for a state of dimension " + dim);
        }
        n = dim;
        int m = manifold.constraints();
        stageGuess = new double[composition.stages()][dim];
        guessReady = new boolean[composition.stages()];
        hat = new double[dim];
        tilde = new double[dim];
        z = new double[dim];
        image = new double[dim];
        delta = new double[dim];
        newton = new StageNewton(dim, composition.stages(), scale);
        grad0 = new double[m][dim];
        grad1 = new double[m][dim];
        residual = new double[m];
        mu = new double[m];
        history = new double[composition.stages()][HISTORY][dim];
        historyCount = 0;
    }

    private static double dot(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += a[i] * b[i];
        }
        return s;
    }
}
