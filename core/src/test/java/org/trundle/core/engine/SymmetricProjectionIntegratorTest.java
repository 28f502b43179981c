package org.trundle.core.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.special.elliptic.jacobi.JacobiEllipticBuilder;
import org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * The {@link SymmetricProjectionIntegrator} on the planar pendulum written in Cartesian coordinates, an
 * ordinary differential equation on the manifold {@code |x|² = L²}, {@code x·v = 0}: position {@code x},
 * velocity {@code v}, {@code a = g − λ x} with {@code λ = (|v|² + x·g)/|x|²} (the multiplier that keeps
 * {@code x·v} an invariant). Released from rest at the angle {@code θ₀} from the downward vertical, the
 * exact angle is {@code sin(θ/2) = k sn(K(k) − ω₀ t, k)} with {@code k = sin(θ₀/2)},
 * {@code ω₀ = √(g/L)} (D. F. Lawden, Elliptic Functions and Applications, Springer 1989, §5.2; from
 * memory), evaluated with Hipparchus' Jacobi elliptic functions and complete elliptic integral.
 */
class SymmetricProjectionIntegratorTest {
    private static final double G = 9.81;
    private static final double L = 1.0;
    private static final double THETA0 = 1.0;

    /** The pendulum's equation; counts evaluations. */
    private static final class Pendulum implements OrdinaryDifferentialEquation {
        long evaluations;

        @Override
        public int getDimension() {
            return 4;
        }

        @Override
        public double[] computeDerivatives(double t, double[] y) {
            evaluations++;
            double x = y[0];
            double z = y[1];
            double vx = y[2];
            double vz = y[3];
            double lambda = (vx * vx + vz * vz - G * z) / (x * x + z * z);
            return new double[] {vx, vz, -lambda * x, -G - lambda * z};
        }
    }

    /** {@code g₁ = (|x|² − L²)/2}, {@code g₂ = x·v}. */
    private static final ConstraintManifold CIRCLE = new ConstraintManifold() {
        @Override
        public int constraints() {
            return 2;
        }

        @Override
        public void residuals(double t, double[] y, double[] out) {
            out[0] = 0.5 * (y[0] * y[0] + y[1] * y[1] - L * L);
            out[1] = y[0] * y[2] + y[1] * y[3];
        }

        @Override
        public void gradients(double t, double[] y, double[][] out) {
            out[0][0] = y[0];
            out[0][1] = y[1];
            out[0][2] = 0;
            out[0][3] = 0;
            out[1][0] = y[2];
            out[1][1] = y[3];
            out[1][2] = y[0];
            out[1][3] = y[1];
        }

        @Override
        public double tolerance(int i) {
            // rounding of a sum of squares of order L² (resp. products of L and the speed √(gL))
            return i == 0 ? 1e-15 * L * L : 1e-15 * L * Math.sqrt(G * L);
        }
    };

    private static final double[] SCALE = {L, L, Math.sqrt(G * L), Math.sqrt(G * L)};

    private static double[] start() {
        return new double[] {L * Math.sin(THETA0), -L * Math.cos(THETA0), 0, 0};
    }

    private static double energy(double[] y) {
        return 0.5 * (y[2] * y[2] + y[3] * y[3]) + G * y[1];
    }

    /** The exact position at time t (Lawden §5.2, from memory). */
    private static double[] exactPosition(double t) {
        double k = Math.sin(THETA0 / 2);
        double m = k * k;
        double w0 = Math.sqrt(G / L);
        double bigK = LegendreEllipticIntegral.bigK(m);
        double sn = JacobiEllipticBuilder.build(m).valuesN(bigK - w0 * t).sn();
        double theta = 2 * Math.asin(k * sn);
        return new double[] {L * Math.sin(theta), -L * Math.cos(theta)};
    }

    private static double positionError(MidpointComposition c, double h, double tEnd) {
        SymmetricProjectionIntegrator integ = new SymmetricProjectionIntegrator(h, c, CIRCLE, SCALE);
        ODEStateAndDerivative end = integ.integrate(new Pendulum(), new ODEState(0, start()), tEnd);
        double[] y = end.getPrimaryState();
        double[] exact = exactPosition(tEnd);
        return Math.hypot(y[0] - exact[0], y[1] - exact[1]);
    }

    /**
     * Halving the step divides the error by {@code 2^p}. A symmetric method's error expands in even
     * powers of h, {@code e = C h^p (1 + D h² + …)}, so at {@code ω₀h ≤ 0.07} the observed order differs
     * from p by about {@code log₂(1 + 0.75 D h²)}, a few hundredths for {@code D ~ ω₀²}; 0.1 allows it.
     */
    @ParameterizedTest
    @EnumSource(MidpointComposition.class)
    void halvingTheStepDividesTheErrorByTwoToTheOrder(MidpointComposition c) {
        double tEnd = 2.0;
        double h = 0.02;
        double e1 = positionError(c, h, tEnd);
        double e2 = positionError(c, h / 2, tEnd);
        double observed = Math.log(e1 / e2) / Math.log(2);
        assertEquals(c.order(), observed, 0.1, "observed order (errors " + e1 + ", " + e2 + ")");
    }

    /**
     * A step forward and a step back with {@code −h} return to the start: every part of the step is
     * solved to rounding, so what is left is the rounding of a few dozen evaluations, far below 1e-14
     * of the state's scale.
     */
    @ParameterizedTest
    @EnumSource(MidpointComposition.class)
    void aStepBackUndoesAStep(MidpointComposition c) {
        SymmetricProjectionIntegrator integ = new SymmetricProjectionIntegrator(0.05, c, CIRCLE, SCALE);
        Pendulum ode = new Pendulum();
        double[] y0 = integ.integrate(ode, new ODEState(0, start()), 0.37).getPrimaryState();
        integ.prepare(ode, 0.37, y0, 1.0);
        double[] y1 = integ.advance(0.37, y0, 0.05);
        double[] back = integ.advance(0.42, y1, -0.05);
        for (int i = 0; i < 4; i++) {
            assertTrue(Math.abs(y1[i] - y0[i]) > 1e-3 * SCALE[i] || i >= 2 && Math.abs(y1[i] - y0[i]) > 1e-4,
                "the step moves component " + i);
            assertEquals(y0[i], back[i], 1e-14 * SCALE[i], "component " + i + " after a step and its reverse");
        }
    }

    /** Every step end lies on the manifold to the rounding of the residuals (1e-12 of their scale). */
    @Test
    void everyStepEndsOnTheManifold() {
        SymmetricProjectionIntegrator integ = new SymmetricProjectionIntegrator(0.01, MidpointComposition.ORDER_4,
            CIRCLE, SCALE);
        Pendulum ode = new Pendulum();
        double[] y = start();
        integ.prepare(ode, 0, y, 100);
        double[] g = new double[2];
        double worst = 0;
        for (int i = 0; i < 2000; i++) {
            y = integ.advance(0.01 * i, y, 0.01);
            CIRCLE.residuals(0, y, g);
            worst = Math.max(worst, Math.max(Math.abs(g[0]) / (L * L), Math.abs(g[1]) / (L * Math.sqrt(G * L))));
        }
        assertTrue(worst <= 1e-12, "largest relative residual " + worst);
    }

    /**
     * 10⁵ midpoint steps (about 500 periods): the energy error's envelope over the last tenth of the run
     * is no larger than over the first tenth (a drift linear in time would make it ten times larger),
     * and it stays within {@code (ω₀ h)²} of the energy scale {@code g L}, the size of a second-order
     * method's local energy error (common practice).
     */
    @Test
    void theEnergyErrorStaysBoundedOverManySteps() {
        double h = 0.01;
        int steps = 100_000;
        SymmetricProjectionIntegrator integ = new SymmetricProjectionIntegrator(h, MidpointComposition.ORDER_2,
            CIRCLE, SCALE);
        Pendulum ode = new Pendulum();
        double[] y = start();
        integ.prepare(ode, 0, y, steps * h);
        double e0 = energy(y);
        double first = 0;
        double last = 0;
        for (int i = 0; i < steps; i++) {
            y = integ.advance(i * h, y, h);
            double de = Math.abs(energy(y) - e0) / (G * L);
            if (i < steps / 10) {
                first = Math.max(first, de);
            } else if (i >= steps - steps / 10) {
                last = Math.max(last, de);
            }
        }
        double w0h = Math.sqrt(G / L) * h;
        assertTrue(last <= 1.2 * first, "envelope first tenth " + first + ", last tenth " + last);
        assertTrue(last <= w0h * w0h, "energy error " + last + " against (ω₀h)² = " + w0h * w0h);
    }

    /**
     * The stages' simplified Newton iteration depends on nothing but the run: two integrators from the same
     * start give bit-identical states, and their Jacobian is kept over many stages (recomputed on fewer than one
     * step in five; at order 4 a step has three stages).
     */
    @ParameterizedTest
    @EnumSource(MidpointComposition.class)
    void rerunsAreBitIdenticalAndKeepTheJacobian(MidpointComposition c) {
        double[][] ends = new double[2][];
        long refreshes = 0;
        int steps = 2000;
        for (int run = 0; run < 2; run++) {
            SymmetricProjectionIntegrator integ = new SymmetricProjectionIntegrator(0.01, c, CIRCLE, SCALE);
            Pendulum ode = new Pendulum();
            double[] y = start();
            integ.prepare(ode, 0, y, 100);
            for (int i = 0; i < steps; i++) {
                y = integ.advance(0.01 * i, y, 0.01);
            }
            ends[run] = y;
            refreshes = integ.jacobianRefreshes();
        }
        for (int i = 0; i < 4; i++) {
            assertEquals(Double.doubleToRawLongBits(ends[0][i]), Double.doubleToRawLongBits(ends[1][i]),
                "component " + i + " of two identical runs");
        }
        assertTrue(refreshes >= 1 && refreshes < steps / 5, refreshes + " Jacobians in " + steps + " steps");
    }
}
