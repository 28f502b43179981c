package org.trundle.core.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.stream.LongStream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The closed-form projections of two contacts ({@link RollingPair#projectVelocity},
 * {@link RollingPair#stepPosition}) against the general least-norm projections the engine uses for any
 * contacts ({@link LeastNorm}: EJML's SVD pseudo-inverse), on seeded random geometry with normals 10° to 170°
 * apart. Both are exact up to rounding, so they agree to 1e-12 of the velocity and position scales; the
 * projected velocity also rolls without slip at both contacts (its own check: {@code v + r n_i × ω = 0}).
 */
class RollingPairTest {
    private static final double R = 0.01;
    private static final double M = 0.03;

    static LongStream seeds() {
        return LongStream.rangeClosed(1, 100);
    }

    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void velocityProjectionMatchesTheLeastNormProjection(long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double inertia = (0.2 + 0.47 * rnd.nextDouble()) * M * R * R;
        double[][] n = normals(rnd);
        double[] y = new double[StateMapper.DIM];
        for (int i = 0; i < 3; i++) {
            y[StateMapper.V + i] = rnd.nextDouble() - 0.5;
            y[StateMapper.W + i] = 100 * (rnd.nextDouble() - 0.5);
        }
        double[] general = y.clone();
        assertTrue(RollingPair.projectVelocity(R, M, inertia, n[0], n[1], y));
        // the general projection: ν ← ν − M⁻¹Jᵀ (J M⁻¹ Jᵀ)⁺ J ν over the six no-slip rows
        double[][] rows = new double[6][];
        double[] b = new double[6];
        for (int k = 0; k < 2; k++) {
            for (int c = 0; c < 3; c++) {
                double[] e = {c == 0 ? 1 : 0, c == 1 ? 1 : 0, c == 2 ? 1 : 0};
                double[] en = new double[3];
                Vec.cross(e, n[k], en);
                double[] row = {e[0], e[1], e[2], R * en[0], R * en[1], R * en[2]};
                rows[3 * k + c] = row;
                for (int i = 0; i < 3; i++) {
                    b[3 * k + c] += row[i] * general[StateMapper.V + i] + row[3 + i] * general[StateMapper.W + i];
                }
            }
        }
        double[] minv = {1 / M, 1 / M, 1 / M, 1 / inertia, 1 / inertia, 1 / inertia};
        double[] lambda = LeastNorm.multipliers(rows, minv, b);
        for (int p = 0; p < 6; p++) {
            for (int i = 0; i < 6; i++) {
                general[(i < 3 ? StateMapper.V : StateMapper.W - 3) + i] -= minv[i] * rows[p][i] * lambda[p];
            }
        }
        double speed = 1 + 100 * R;
        for (int i = 0; i < 3; i++) {
            assertEquals(general[StateMapper.V + i], y[StateMapper.V + i], 1e-12 * speed, "v " + i);
            assertEquals(general[StateMapper.W + i], y[StateMapper.W + i], 1e-12 * speed / R, "w " + i);
        }
        for (int k = 0; k < 2; k++) {
            double[] rolling = new double[3];
            ContactKinematics.noSlipVelocity(R, y[StateMapper.W], y[StateMapper.W + 1], y[StateMapper.W + 2], n[k],
                rolling, 0);
            for (int i = 0; i < 3; i++) {
                assertEquals(rolling[i], y[StateMapper.V + i], 1e-13 * speed, "no slip at contact " + k);
            }
        }
    }

    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void positionStepMatchesTheLeastNormStep(long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[][] n = normals(rnd);
        double[] res = {1e-6 * (rnd.nextDouble() - 0.5), 1e-6 * (rnd.nextDouble() - 0.5)};
        double[] y = new double[StateMapper.DIM];
        assertTrue(RollingPair.stepPosition(n[0], res[0], n[1], res[1], y));
        double[] step = LeastNorm.solve(new double[][] {n[0], n[1]}, new double[] {1, 1, 1}, res);
        for (int i = 0; i < 3; i++) {
            assertEquals(step[i], y[StateMapper.C + i], 1e-12 * 1e-6, "component " + i);
        }
        // the step meets both linearised constraints n_i·Δc = r − d_i
        for (int k = 0; k < 2; k++) {
            assertEquals(res[k], Vec.dot(n[k], new double[] {y[0], y[1], y[2]}), 1e-12 * 1e-6);
        }
    }

    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void nearlyParallelOrAntipodalNormalsAreRefused(long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] n1 = unit(rnd);
        double sign = seed % 2 == 0 ? 1 : -1;
        double[] n2 = {sign * n1[0] + 1e-3 * rnd.nextDouble(), sign * n1[1], sign * n1[2]};
        Vec.scale(n2, 1 / Vec.norm(n2));
        double[] y = new double[StateMapper.DIM];
        y[StateMapper.W] = 1;
        double[] before = y.clone();
        assertFalse(RollingPair.projectVelocity(R, M, 0.4 * M * R * R, n1, n2, y));
        assertFalse(RollingPair.stepPosition(n1, 1e-6, n2, 1e-6, y));
        assertEquals(java.util.Arrays.toString(before), java.util.Arrays.toString(y));
    }

    /** Two random unit normals 10° to 170° apart (also the sampler of {@code ContactForceSolverTest}). */
    static double[][] normals(SplittableRandom rnd) {
        double[] n1 = unit(rnd);
        double[] side = unit(rnd);
        double[] perp = new double[3];
        Vec.cross(n1, side, perp);
        Vec.scale(perp, 1.0 / Vec.norm(perp));
        double angle = Math.toRadians(10 + 160 * rnd.nextDouble());
        double[] n2 = new double[3];
        for (int i = 0; i < 3; i++) {
            n2[i] = Math.cos(angle) * n1[i] + Math.sin(angle) * perp[i];
        }
        return new double[][] {n1, n2};
    }

    private static double[] unit(SplittableRandom rnd) {
        double[] u = {rnd.nextGaussian(), rnd.nextGaussian(), rnd.nextGaussian()};
        Vec.scale(u, 1.0 / Vec.norm(u));
        return u;
    }
}
