package org.trundle.surfaces;

/**
 * A rigorous enclosure of a polynomial's values on an interval from its Bernstein coefficients.
 * A polynomial of degree {@code n} on {@code [0, 1]} written in the power basis,
 * {@code p(t) = Σ a_k t^k}, has the Bernstein coefficients
 * <pre>  b_j = Σ_{k ≤ j} [C(j, k) / C(n, k)] a_k,   j = 0..n</pre>
 * and, the Bernstein basis being non-negative and a partition of unity, {@code p(t)} lies between
 * the smallest and the largest {@code b_j} for every {@code t ∈ [0, 1]} (the convex-hull property;
 * G. Farin, Curves and Surfaces for CAGD, ch. 4 and 5, from memory). Interpolating splines
 * overshoot their knots, so their knot values alone do not bound them; this does. The enclosure is
 * widened by {@code 1e-12 Σ|a_k|}, far above the rounding of the conversion and of the spline's own
 * evaluation.
 */
final class BernsteinHull {
    /** Relative widening of the enclosure, for rounding. */
    private static final double PAD = 1e-12;

    private BernsteinHull() {
    }

    /**
     * Widens {@code range} to hold {@code p(t)} for {@code t ∈ [0, 1]}.
     *
     * @param a the power-basis coefficients {@code a_0..a_n} in {@code t ∈ [0, 1]}
     * @param range {@code {low, high}}, widened in place (start from {@code {+∞, −∞}})
     */
    static void widen(double[] a, double[] range) {
        int n = a.length - 1;
        double scale = 0;
        for (double ak : a) {
            scale += Math.abs(ak);
        }
        double pad = PAD * scale;
        for (int j = 0; j <= n; j++) {
            double b = 0;
            for (int k = 0; k <= j; k++) {
                b += binomial(j, k) / binomial(n, k) * a[k];
            }
            range[0] = Math.min(range[0], b - pad);
            range[1] = Math.max(range[1], b + pad);
        }
    }

    private static double binomial(int n, int k) {
        double c = 1;
        for (int i = 1; i <= k; i++) {
            c = c * (n - k + i) / i;
        }
        return c;
    }
}
