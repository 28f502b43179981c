package org.trundle.surfaces;

import java.util.Arrays;

/**
 * A natural cubic interpolating spline {@code y(u)} through knots {@code (u_i, y_i)}: C², cubic on
 * each interval, zero second derivative at both ends. The second derivatives {@code M_i} at the
 * knots solve the tridiagonal system
 * {@code h_{i−1} M_{i−1} + 2(h_{i−1} + h_i) M_i + h_i M_{i+1} = 6[(y_{i+1} − y_i)/h_i − (y_i − y_{i−1})/h_{i−1}]}
 * with {@code M_0 = M_{n−1} = 0} (common practice; the same spline as Hipparchus'
 * {@code SplineInterpolator}). Beyond the end knots the end cubics are continued.
 *
 * <p>Evaluation writes value, first and second derivative into a caller's array and allocates
 * nothing. Immutable and thread-safe.
 */
public final class CubicSpline {
    private final double[] u;
    private final double[] y;
    private final double[] m;

    /**
     * @param knots strictly increasing finite parameters, at least 2
     * @param values finite values at the knots, same length
     * @param name parameter name used in error messages
     */
    public CubicSpline(double[] knots, double[] values, String name) {
        if (knots == null || values == null || knots.length < 2 || knots.length != values.length) {
            throw new IllegalArgumentException(name + ": need at least 2 knots and as many values, got "
                + (knots == null ? "null" : knots.length) + " knots and " + (values == null ? "null" : values.length) + " values");
        }
        int n = knots.length;
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(knots[i]) || !Double.isFinite(values[i])) {
                throw new IllegalArgumentException(name + ": knot " + i + " must be finite, got (" + knots[i] + ", " + values[i] + ")");
            }
            if (i > 0 && !(knots[i] > knots[i - 1])) {
                throw new IllegalArgumentException(name + ": knots must be strictly increasing, got " + knots[i - 1]
                    + " then " + knots[i] + " at index " + i);
            }
        }
        this.u = knots.clone();
        this.y = values.clone();
        this.m = new double[n];
        if (n > 2) {
            // Thomas algorithm on the interior unknowns M_1..M_{n-2}
            int k = n - 2;
            double[] diag = new double[k];
            double[] rhs = new double[k];
            double[] up = new double[k];
            for (int i = 1; i <= k; i++) {
                double h0 = u[i] - u[i - 1];
                double h1 = u[i + 1] - u[i];
                diag[i - 1] = 2 * (h0 + h1);
                up[i - 1] = h1;
                rhs[i - 1] = 6 * ((y[i + 1] - y[i]) / h1 - (y[i] - y[i - 1]) / h0);
            }
            for (int i = 1; i < k; i++) {
                double lo = u[i + 1] - u[i];
                double f = lo / diag[i - 1];
                diag[i] -= f * up[i - 1];
                rhs[i] -= f * rhs[i - 1];
            }
            m[k] = rhs[k - 1] / diag[k - 1];
            for (int i = k - 2; i >= 0; i--) {
                m[i + 1] = (rhs[i] - up[i] * m[i + 2]) / diag[i];
            }
        }
    }

    /** @return the number of knots */
    public int size() {
        return u.length;
    }

    /** @return the first knot parameter */
    public double first() {
        return u[0];
    }

    /** @return the last knot parameter */
    public double last() {
        return u[u.length - 1];
    }

    /**
     * @param i knot index
     * @return the knot parameter {@code u_i}
     */
    public double knot(int i) {
        return u[i];
    }

    /** @return a copy of the knot parameters */
    public double[] knots() {
        return u.clone();
    }

    /**
     * Index of the interval holding {@code t} (clamped to the first and last interval).
     *
     * @param t parameter
     * @return interval index in {@code [0, n − 2]}
     */
    public int interval(double t) {
        int i = Arrays.binarySearch(u, t);
        if (i < 0) {
            i = -i - 2;
        }
        return Math.max(0, Math.min(u.length - 2, i));
    }

    /**
     * A rigorous enclosure of the spline's values on {@code [first(), last()]}: on each interval the
     * cubic {@code y_i + y'_i x + M_i x²/2 + (M_{i+1} − M_i) x³/(6h)} ({@code x = u − u_i}) is bounded
     * by its Bernstein control points ({@link BernsteinHull}; the spline may overshoot its knot
     * values, this holds the overshoot).
     *
     * @return {@code {low, high}}, {@code low ≤ y(t) ≤ high} for every {@code t} between the end knots
     */
    public double[] bounds() {
        double[] range = {Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY};
        double[] a = new double[4];
        for (int i = 0; i < u.length - 1; i++) {
            double h = u[i + 1] - u[i];
            double slope = (y[i + 1] - y[i]) / h - h * (2 * m[i] + m[i + 1]) / 6;
            a[0] = y[i];
            a[1] = slope * h;
            a[2] = 0.5 * m[i] * h * h;
            a[3] = (m[i + 1] - m[i]) * h * h / 6;
            BernsteinHull.widen(a, range);
        }
        return range;
    }

    /**
     * Evaluates the spline.
     *
     * @param t parameter
     * @param out receives {@code y(t), y'(t), y''(t)} at {@code out[offset..offset+2]}
     * @param offset where to write in {@code out}
     */
    public void evaluate(double t, double[] out, int offset) {
        int i = interval(t);
        double h = u[i + 1] - u[i];
        double a = (u[i + 1] - t) / h;
        double b = (t - u[i]) / h;
        double mi = m[i];
        double mj = m[i + 1];
        out[offset] = a * y[i] + b * y[i + 1] + ((a * a * a - a) * mi + (b * b * b - b) * mj) * h * h / 6;
        out[offset + 1] = (y[i + 1] - y[i]) / h - (3 * a * a - 1) / 6 * h * mi + (3 * b * b - 1) / 6 * h * mj;
        out[offset + 2] = a * mi + b * mj;
    }
}
