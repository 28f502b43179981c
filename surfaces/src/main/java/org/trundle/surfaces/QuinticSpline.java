package org.trundle.surfaces;

import java.util.Arrays;

/**
 * A natural quintic interpolating spline {@code y(u)} through knots {@code (u_i, y_i)}: C⁴, quintic
 * on each interval, with {@code y''' = y'''' = 0} at both ends (the natural end conditions of the
 * spline of degree 5, which among all C³ interpolants minimises {@code ∫ (y''')² du}; C. de Boor,
 * A Practical Guide to Splines, 1978, ch. XIV, from memory). Its curvature is C², so a surface built
 * on it has no jump in its distance Hessian at the knots (a natural cubic's second derivative
 * has a kink there and its third derivative jumps).
 *
 * <p>Construction: on each interval the spline is the quintic Hermite interpolant of the values,
 * first and second derivatives {@code (y, d, s)} at its two ends (so it is C² by construction);
 * continuity of {@code y'''} and {@code y''''} at each interior knot and the four end conditions give
 * a block-tridiagonal system in {@code (d_i, s_i)}, solved by block elimination with 2×2 blocks.
 * With two knots the spline is the straight line. Beyond the end knots the end quintics are
 * continued.
 *
 * <p>Evaluation writes value, first and second derivative into a caller's array and allocates
 * nothing. Immutable and thread-safe.
 */
public final class QuinticSpline {
    private final double[] u;
    /** Power-form coefficients per interval, six each, in the local variable {@code u − u_i}. */
    private final double[] c;

    /**
     * @param knots strictly increasing finite parameters, at least 2
     * @param values finite values at the knots, same length
     * @param name parameter name used in error messages
     */
    public QuinticSpline(double[] knots, double[] values, String name) {
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
        double[] y = values;
        double[] d = new double[n];
        double[] s = new double[n];
        if (n == 2) {
            d[0] = (y[1] - y[0]) / (u[1] - u[0]);
            d[1] = d[0];
        } else {
            solve(y, d, s);
        }
        this.c = new double[6 * (n - 1)];
        for (int i = 0; i < n - 1; i++) {
            double h = u[i + 1] - u[i];
            double dy = y[i + 1] - y[i];
            int o = 6 * i;
            c[o] = y[i];
            c[o + 1] = d[i];
            c[o + 2] = 0.5 * s[i];
            c[o + 3] = (10 * dy / h - 6 * d[i] - 4 * d[i + 1] - 1.5 * s[i] * h + 0.5 * s[i + 1] * h) / (h * h);
            c[o + 4] = (-15 * dy / h + 8 * d[i] + 7 * d[i + 1] + 1.5 * s[i] * h - s[i + 1] * h) / (h * h * h);
            c[o + 5] = (6 * dy / h - 3 * d[i] - 3 * d[i + 1] - 0.5 * s[i] * h + 0.5 * s[i + 1] * h) / (h * h * h * h);
        }
    }

    /**
     * Solves for the knot derivatives {@code d_i = y'(u_i)} and {@code s_i = y''(u_i)}: at each knot
     * two equations {@code A_i z_{i−1} + B_i z_i + C_i z_{i+1} = r_i} in {@code z = (d, s)}
     * (continuity of y''' and y'''' inside, both zero at the ends), each row scaled by a power of
     * the local interval so the blocks are of order one; block forward elimination and back
     * substitution.
     */
    private void solve(double[] y, double[] d, double[] s) {
        int n = u.length;
        double[][] a = new double[n][4];
        double[][] b = new double[n][4];
        double[][] cc = new double[n][4];
        double[][] r = new double[n][2];
        for (int i = 0; i < n; i++) {
            if (i == 0) {
                double h = u[1] - u[0];
                double q = (y[1] - y[0]) / h;
                // y'''(u_0+) = 0, scaled by h²; y''''(u_0+) = 0, scaled by h³
                set(b[0], -36, -9 * h, 192, 36 * h);
                set(cc[0], -24, 3 * h, 168, -24 * h);
                r[0][0] = -60 * q;
                r[0][1] = 360 * q;
            } else if (i == n - 1) {
                double h = u[i] - u[i - 1];
                double q = (y[i] - y[i - 1]) / h;
                set(a[i], -24, -3 * h, -168, -24 * h);
                set(b[i], -36, 9 * h, -192, 36 * h);
                r[i][0] = -60 * q;
                r[i][1] = -360 * q;
            } else {
                double hl = u[i] - u[i - 1];
                double hr = u[i + 1] - u[i];
                double m = 0.5 * (hl + hr);
                double ql = (y[i] - y[i - 1]) / hl;
                double qr = (y[i + 1] - y[i]) / hr;
                double l = m / hl;
                double rr = m / hr;
                // y''' continuity, scaled by m²; y'''' continuity, scaled by m³
                set(a[i], -24 * l * l, -3 * l * m, -168 * l * l * l, -24 * l * l * m);
                set(b[i], -36 * l * l + 36 * rr * rr, 9 * l * m + 9 * rr * m,
                    -192 * l * l * l - 192 * rr * rr * rr, 36 * l * l * m - 36 * rr * rr * m);
                set(cc[i], 24 * rr * rr, -3 * rr * m, -168 * rr * rr * rr, 24 * rr * rr * m);
                r[i][0] = -60 * l * l * ql + 60 * rr * rr * qr;
                r[i][1] = -360 * l * l * l * ql - 360 * rr * rr * rr * qr;
            }
        }
        // forward elimination: B'_i = B_i − A_i B'_{i−1}⁻¹ C_{i−1}, r'_i = r_i − A_i B'_{i−1}⁻¹ r'_{i−1}
        double[] inv = new double[4];
        double[] m = new double[4];
        for (int i = 1; i < n; i++) {
            invert(b[i - 1], inv, i - 1);
            mul(a[i], inv, m);
            double[] mc = new double[4];
            mul(m, cc[i - 1], mc);
            for (int k = 0; k < 4; k++) {
                b[i][k] -= mc[k];
            }
            r[i][0] -= m[0] * r[i - 1][0] + m[1] * r[i - 1][1];
            r[i][1] -= m[2] * r[i - 1][0] + m[3] * r[i - 1][1];
        }
        double[] z = new double[2];
        for (int i = n - 1; i >= 0; i--) {
            double x0 = r[i][0];
            double x1 = r[i][1];
            if (i < n - 1) {
                x0 -= cc[i][0] * d[i + 1] + cc[i][1] * s[i + 1];
                x1 -= cc[i][2] * d[i + 1] + cc[i][3] * s[i + 1];
            }
            invert(b[i], inv, i);
            z[0] = inv[0] * x0 + inv[1] * x1;
            z[1] = inv[2] * x0 + inv[3] * x1;
            d[i] = z[0];
            s[i] = z[1];
        }
    }

    private static void set(double[] m, double m00, double m01, double m10, double m11) {
        m[0] = m00;
        m[1] = m01;
        m[2] = m10;
        m[3] = m11;
    }

    private static void mul(double[] p, double[] q, double[] out) {
        out[0] = p[0] * q[0] + p[1] * q[2];
        out[1] = p[0] * q[1] + p[1] * q[3];
        out[2] = p[2] * q[0] + p[3] * q[2];
        out[3] = p[2] * q[1] + p[3] * q[3];
    }

    private void invert(double[] m, double[] out, int knot) {
        double det = m[0] * m[3] - m[1] * m[2];
        if (!(Math.abs(det) > 0) || !Double.isFinite(det)) {
            throw new IllegalArgumentException("quintic spline system is singular at knot " + knot + " (u = " + u[knot] + ")");
        }
        out[0] = m[3] / det;
        out[1] = -m[1] / det;
        out[2] = -m[2] / det;
        out[3] = m[0] / det;
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
     * quintic's Bernstein control points bound it ({@link BernsteinHull}; the spline may overshoot
     * its knot values, this holds the overshoot).
     *
     * @return {@code {low, high}}, {@code low ≤ y(t) ≤ high} for every {@code t} between the end knots
     */
    public double[] bounds() {
        double[] range = {Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY};
        double[] a = new double[6];
        for (int i = 0; i < u.length - 1; i++) {
            double h = u[i + 1] - u[i];
            double hk = 1;
            for (int k = 0; k < 6; k++) {
                a[k] = c[6 * i + k] * hk;
                hk *= h;
            }
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
        double x = t - u[i];
        int o = 6 * i;
        double c0 = c[o];
        double c1 = c[o + 1];
        double c2 = c[o + 2];
        double c3 = c[o + 3];
        double c4 = c[o + 4];
        double c5 = c[o + 5];
        out[offset] = c0 + x * (c1 + x * (c2 + x * (c3 + x * (c4 + x * c5))));
        out[offset + 1] = c1 + x * (2 * c2 + x * (3 * c3 + x * (4 * c4 + x * 5 * c5)));
        out[offset + 2] = 2 * c2 + x * (6 * c3 + x * (12 * c4 + x * 20 * c5));
    }

    /**
     * The third and fourth derivatives (for tests of the continuity at the knots).
     *
     * @param t parameter
     * @param fromRight at a knot, take the interval to its right (else the one to its left)
     * @return {@code {y'''(t), y''''(t)}}
     */
    public double[] highDerivatives(double t, boolean fromRight) {
        int i = interval(t);
        if (!fromRight && i > 0 && t == u[i]) {
            i--;
        }
        double x = t - u[i];
        int o = 6 * i;
        return new double[] {6 * c[o + 3] + x * (24 * c[o + 4] + x * 60 * c[o + 5]), 24 * c[o + 4] + x * 120 * c[o + 5]};
    }
}
