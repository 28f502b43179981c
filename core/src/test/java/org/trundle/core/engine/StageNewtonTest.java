package org.trundle.core.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * {@link StageNewton} against Hipparchus' own dense LU (a general-purpose reference library) on seeded random
 * right-hand sides {@code f(z) = A z + (z₀² , 0, …)}: its forward-difference Jacobian and its correction
 * {@code (I − c J)⁻¹ d}.
 */
class StageNewtonTest {
    private static final int N = 6;

    private static double[][] matrix(Random rnd) {
        double[][] a = new double[N][N];
        for (int i = 0; i < N; i++) {
            for (int j = 0; j < N; j++) {
                a[i][j] = 100 * (2 * rnd.nextDouble() - 1);
            }
        }
        return a;
    }

    /**
     * The Jacobian of {@code f(z) = A z + (z₀², 0, …)} is {@code A} plus {@code 2 z₀} in its corner; a forward
     * difference with step {@code √ε·max(|z_j|, 1)} is exact on the linear part up to the rounding of
     * {@code f} divided by the step (about {@code ε ‖A‖ |z| / √ε}) and off by half the step on the quadratic
     * one: 1e-5 of {@code ‖A‖} (entries up to 100) covers both with room; a Newton correction with this
     * Jacobian then agrees with Hipparchus' solve of {@code (I − c ∂f/∂z) x = d} to {@code |c|·1e-5·‖A‖ ≈ 1e-5}.
     */
    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3, 4, 5})
    void theCorrectionSolvesTheNewtonSystem(long seed) {
        Random rnd = new Random(seed);
        double[][] a = matrix(rnd);
        double[] scale = {1, 1, 1, 1, 1, 1};
        StageNewton newton = new StageNewton(N, 3, scale);
        StageNewton.Rhs f = (t, y) -> {
            double[] out = new double[N];
            for (int i = 0; i < N; i++) {
                for (int j = 0; j < N; j++) {
                    out[i] += a[i][j] * y[j];
                }
            }
            out[0] += y[0] * y[0];
            return out;
        };
        double[] z = new double[N];
        for (int i = 0; i < N; i++) {
            z[i] = 2 * rnd.nextDouble() - 1;
        }
        newton.refresh(f, 0, z, f.derivative(0, z));
        RealMatrix exact = new Array2DRowRealMatrix(a);
        exact.addToEntry(0, 0, 2 * z[0]);
        double c = 1e-3 * (1 + rnd.nextDouble());
        for (double sign : new double[] {1, -1}) {
            double[] d = new double[N];
            for (int i = 0; i < N; i++) {
                d[i] = 2 * rnd.nextDouble() - 1;
            }
            RealMatrix m = MatrixUtils.createRealIdentityMatrix(N).subtract(exact.scalarMultiply(sign * c));
            double[] x = new LUDecomposition(m).getSolver().solve(new ArrayRealVector(d)).toArray();
            newton.correct(sign * c, d);
            for (int i = 0; i < N; i++) {
                assertEquals(x[i], d[i], 1e-5, "component " + i + " of the correction, c = " + sign * c);
            }
        }
        assertEquals(1, newton.refreshes());
    }

    /** A singular Newton matrix ({@code c J = I}) fails the run with a message that names the step. */
    @ParameterizedTest
    @ValueSource(doubles = {0.5, 2.0})
    void aSingularNewtonMatrixSaysTheStepIsTooLarge(double c) {
        StageNewton newton = new StageNewton(2, 1, new double[] {1, 1});
        // f(z) = z / c: J = I / c, I − c J = 0
        StageNewton.Rhs f = (t, y) -> new double[] {y[0] / c, y[1] / c};
        double[] z = {0.25, -0.5};
        newton.refresh(f, 0, z, f.derivative(0, z));
        RunFailure e = org.junit.jupiter.api.Assertions.assertThrows(RunFailure.class,
            () -> newton.correct(c, new double[] {1, 1}));
        assertTrue(e.getMessage().contains("too large for the motion"), e.getMessage());
    }
}
