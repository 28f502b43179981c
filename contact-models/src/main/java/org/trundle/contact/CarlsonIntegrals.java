package org.trundle.contact;

/**
 * Carlson's symmetric elliptic integrals {@code R_F} and {@code R_D} by the duplication theorem, written out so
 * that they allocate nothing (Hipparchus' {@code CarlsonEllipticIntegral}, which computes the same integrals by the
 * same method, builds objects and arrays on every call; it is this class's reference in
 * {@code CarlsonIntegralsTest}).
 *
 * <p>Method (B. C. Carlson, "Numerical computation of real or complex elliptic integrals", Numer. Algorithms 10
 * (1995) 13; NIST DLMF §19.36(i)): with {@code λ = √x√y + √x√z + √y√z}, replace each argument {@code u} by
 * {@code (u + λ)/4} until the arguments agree to the truncation bound, then sum the series in the elementary
 * symmetric functions {@code E₂ … E₅} of the scaled deviations:
 * <pre>
 *   R_F = A^{−1/2} (1 − E₂/10 + E₃/14 + E₂²/24 − 3E₂E₃/44),                 X = (A₀ − x₀)/(4ᴺ A), Z = −(X + Y)
 *   R_D = 4^{−N} A^{−3/2} (1 − 3E₂/14 + E₃/6 + 9E₂²/88 − 3E₄/22 − 9E₂E₃/52 + 3E₅/26)
 *         + 3 Σ 4^{−m} / (√z_m (z_m + λ_m)),                               X = (A₀ − x₀)/(4ᴺ A), Z = −(X + Y)/3
 * </pre>
 * (DLMF 19.36.1 and 19.36.2), iterating until {@code 4^{−m} Q < |A_m|} with {@code Q} the truncation bound for a
 * relative error of about 1e-16. Arguments: non-negative, at most one zero ({@code R_D}: {@code z > 0}).
 * Package-private: only the Hertz solution uses them.
 */
final class CarlsonIntegrals {
    /** Relative truncation error aimed at. */
    private static final double R = 1e-16;
    /** {@code (3r)^{-1/6}}: Carlson's bound factor for {@code R_F}. */
    private static final double Q_F = Math.pow(3 * R, -1.0 / 6.0);
    /** {@code (r/4)^{-1/6}}: Carlson's bound factor for {@code R_D}. */
    private static final double Q_D = Math.pow(R / 4, -1.0 / 6.0);

    private CarlsonIntegrals() {
    }

    /**
     * @param x first argument, ≥ 0
     * @param y second argument, ≥ 0
     * @param z third argument, ≥ 0 (at most one argument zero)
     * @return {@code R_F(x, y, z) = ½ ∫₀^∞ dt / √((t + x)(t + y)(t + z))}
     */
    static double rF(double x, double y, double z) {
        double a0 = (x + y + z) / 3;
        double q = Q_F * Math.max(Math.abs(a0 - x), Math.max(Math.abs(a0 - y), Math.abs(a0 - z)));
        double xm = x;
        double ym = y;
        double zm = z;
        double am = a0;
        double fac = 1.0;
        while (fac * q >= Math.abs(am)) {
            double sx = Math.sqrt(xm);
            double sy = Math.sqrt(ym);
            double sz = Math.sqrt(zm);
            double lambda = sx * sy + sx * sz + sy * sz;
            xm = 0.25 * (xm + lambda);
            ym = 0.25 * (ym + lambda);
            zm = 0.25 * (zm + lambda);
            am = 0.25 * (am + lambda);
            fac *= 0.25;
        }
        double bx = (a0 - x) * fac / am;
        double by = (a0 - y) * fac / am;
        double bz = -(bx + by);
        double e2 = bx * by - bz * bz;
        double e3 = bx * by * bz;
        return (1 - e2 / 10 + e3 / 14 + e2 * e2 / 24 - 3 * e2 * e3 / 44) / Math.sqrt(am);
    }

    /**
     * @param x first argument, ≥ 0
     * @param y second argument, ≥ 0 (not both x and y zero)
     * @param z third argument, &gt; 0
     * @return {@code R_D(x, y, z) = (3/2) ∫₀^∞ dt / ((t + z) √((t + x)(t + y)(t + z)))}
     */
    static double rD(double x, double y, double z) {
        double a0 = (x + y + 3 * z) / 5;
        double q = Q_D * Math.max(Math.abs(a0 - x), Math.max(Math.abs(a0 - y), Math.abs(a0 - z)));
        double xm = x;
        double ym = y;
        double zm = z;
        double am = a0;
        double fac = 1.0;
        double sum = 0.0;
        while (fac * q >= Math.abs(am)) {
            double sx = Math.sqrt(xm);
            double sy = Math.sqrt(ym);
            double sz = Math.sqrt(zm);
            double lambda = sx * sy + sx * sz + sy * sz;
            sum += fac / (sz * (zm + lambda));
            xm = 0.25 * (xm + lambda);
            ym = 0.25 * (ym + lambda);
            zm = 0.25 * (zm + lambda);
            am = 0.25 * (am + lambda);
            fac *= 0.25;
        }
        double bx = (a0 - x) * fac / am;
        double by = (a0 - y) * fac / am;
        double bz = -(bx + by) / 3;
        double xy = bx * by;
        double z2 = bz * bz;
        double e2 = xy - 6 * z2;
        double e3 = (3 * xy - 8 * z2) * bz;
        double e4 = 3 * (xy - z2) * z2;
        double e5 = xy * z2 * bz;
        double series = 1 - 3 * e2 / 14 + e3 / 6 + 9 * e2 * e2 / 88 - 3 * e4 / 22 - 9 * e2 * e3 / 52 + 3 * e5 / 26;
        return fac * series / (am * Math.sqrt(am)) + 3 * sum;
    }
}
