package org.trundle.surfaces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.hipparchus.analysis.interpolation.SplineInterpolator;
import org.hipparchus.analysis.polynomials.PolynomialSplineFunction;
import org.junit.jupiter.api.Test;

/**
 * The natural quintic spline: it interpolates, is C⁴ at the knots (y''' and y'''' continuous, the
 * defining equations), reproduces quadratics exactly (they satisfy the natural end conditions),
 * and its third derivative has no jumps at the knots, where the natural cubic's (Hipparchus'
 * {@link SplineInterpolator}, a general-purpose reference library, on the same knots) does.
 */
class QuinticSplineTest {
    static final long SEED = 4242L;

    static double[] knots(SplittableRandom rnd, int n) {
        double[] u = new double[n];
        for (int i = 1; i < n; i++) {
            u[i] = u[i - 1] + rnd.nextDouble(0.05, 0.5);
        }
        return u;
    }

    @Test
    void interpolatesAndIsC4AtTheKnots() {
        SplittableRandom rnd = new SplittableRandom(SEED);
        for (int trial = 0; trial < 20; trial++) {
            int n = 3 + rnd.nextInt(30);
            double[] u = knots(rnd, n);
            double[] y = new double[n];
            for (int i = 0; i < n; i++) {
                y[i] = rnd.nextDouble(-1, 1);
            }
            QuinticSpline s = new QuinticSpline(u, y, "test");
            double[] e = new double[3];
            double scale = 1;
            for (int i = 0; i < n; i++) {
                s.evaluate(u[i], e, 0);
                assertEquals(y[i], e[0], 1e-12, "value at knot " + i);
                double[] hd = s.highDerivatives(u[i], true);
                scale = Math.max(scale, Math.max(Math.abs(hd[0]), Math.abs(hd[1])));
            }
            for (int i = 1; i < n - 1; i++) {
                double[] l = s.highDerivatives(u[i], false);
                double[] r = s.highDerivatives(u[i], true);
                assertEquals(l[0], r[0], 1e-9 * scale, "y''' jump at knot " + i + " of " + n);
                assertEquals(l[1], r[1], 1e-9 * scale, "y'''' jump at knot " + i + " of " + n);
                // value, slope and curvature are continuous by construction: check from both sides
                double[] a = new double[3];
                double[] b = new double[3];
                s.evaluate(Math.nextDown(u[i]), a, 0);
                s.evaluate(u[i], b, 0);
                assertEquals(a[2], b[2], 1e-9 * (1 + Math.abs(b[2])), "y'' at knot " + i);
            }
            // natural end conditions
            assertEquals(0.0, s.highDerivatives(u[0], true)[0], 1e-9 * scale);
            assertEquals(0.0, s.highDerivatives(u[0], true)[1], 1e-9 * scale);
            assertEquals(0.0, s.highDerivatives(u[n - 1], false)[0], 1e-9 * scale);
            assertEquals(0.0, s.highDerivatives(u[n - 1], false)[1], 1e-9 * scale);
        }
    }

    @Test
    void reproducesQuadraticsAndLines() {
        SplittableRandom rnd = new SplittableRandom(SEED + 1);
        double[] u = knots(rnd, 12);
        double[] y = new double[u.length];
        for (int i = 0; i < u.length; i++) {
            y[i] = 0.3 - 1.2 * u[i] + 0.7 * u[i] * u[i];
        }
        QuinticSpline s = new QuinticSpline(u, y, "quadratic");
        double[] e = new double[3];
        for (int i = 0; i < 200; i++) {
            double t = rnd.nextDouble(u[0], u[u.length - 1]);
            s.evaluate(t, e, 0);
            assertEquals(0.3 - 1.2 * t + 0.7 * t * t, e[0], 1e-12);
            assertEquals(-1.2 + 1.4 * t, e[1], 1e-11);
            assertEquals(1.4, e[2], 1e-10);
        }
        QuinticSpline line = new QuinticSpline(new double[] {1, 3}, new double[] {2, 6}, "line");
        line.evaluate(2.5, e, 0);
        assertEquals(5.0, e[0], 1e-15);
        assertEquals(2.0, e[1], 1e-15);
        assertEquals(0.0, e[2], 0.0);
    }

    @Test
    void itsThirdDerivativeIsContinuousWhereTheNaturalCubicJumps() {
        int n = 21;
        double[] u = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            u[i] = 3.0 * i / (n - 1);
            y[i] = Math.sin(u[i]);
        }
        QuinticSpline q = new QuinticSpline(u, y, "sin");
        PolynomialSplineFunction c = new SplineInterpolator().interpolate(u, y);
        PolynomialSplineFunction c3 = c.polynomialSplineDerivative().polynomialSplineDerivative().polynomialSplineDerivative();
        double jumpQ = 0;
        double jumpC = 0;
        for (int i = 1; i < n - 1; i++) {
            jumpQ = Math.max(jumpQ, Math.abs(q.highDerivatives(u[i], true)[0] - q.highDerivatives(u[i], false)[0]));
            jumpC = Math.max(jumpC, Math.abs(c3.value(u[i] + 1e-9) - c3.value(u[i] - 1e-9)));
        }
        double[] e = new double[3];
        double worstQ = 0;
        double worstC = 0;
        for (int i = 0; i <= 400; i++) {
            double t = 1.0 + i / 400.0;
            q.evaluate(t, e, 0);
            worstQ = Math.max(worstQ, Math.abs(e[0] - Math.sin(t)));
            worstC = Math.max(worstC, Math.abs(c.value(t) - Math.sin(t)));
        }
        System.out.printf("sin, h = 0.15: third-derivative jump at the knots quintic %.2e, natural cubic %.2e;"
            + " value error on [1, 2] quintic %.2e, cubic %.2e%n", jumpQ, jumpC, worstQ, worstC);
        // the cubic's third derivative jumps by about h |y''''| (common practice); the quintic's only by rounding
        assertTrue(jumpC > 0.05, "cubic jump " + jumpC);
        assertTrue(jumpQ < 1e-9, "quintic jump " + jumpQ);
        assertTrue(worstQ < worstC, "quintic error " + worstQ + " vs cubic " + worstC);
    }

    @Test
    void badKnotsAreNamed() {
        IllegalArgumentException bad = assertThrows(IllegalArgumentException.class,
            () -> new QuinticSpline(new double[] {0, 1, 1}, new double[] {0, 0, 0}, "profile"));
        assertTrue(bad.getMessage().contains("profile") && bad.getMessage().contains("index 2"), bad.getMessage());
    }
}
