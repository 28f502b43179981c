package org.trundle.contact;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.internal.Checks;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Material;

/**
 * The exact Hertz solution for an elastic ball pressed on an elastic curved wall (H. Hertz 1882;
 * K. L. Johnson, Contact Mechanics, Cambridge University Press 1985, §4.2).
 *
 * <p><b>Geometry.</b> The ball (radius {@code r}) has curvature {@code 1/r} in every direction; the
 * wall has principal curvatures {@code κ₁, κ₂} along orthogonal tangent directions {@code d₁, d₂},
 * positive where the wall is concave toward the ball (Trundle's convention; the inside of a tube of
 * radius {@code R} has {@code 1/R} round it and 0 along it). The relative curvatures in the two
 * principal planes are {@code ρᵢ = 1/r − κᵢ}, and the gap near the contact is
 * {@code h = A x² + B y²} with {@code A = ½ min ρᵢ}, {@code B = ½ max ρᵢ}, {@code x} along the
 * direction of the smaller relative curvature. The ball fits only where {@code r κᵢ < 1} in both
 * planes; otherwise the contact is not a Hertz point contact and the solution throws.
 *
 * <p><b>Equations</b> (Johnson 1985, eqs. 4.36–4.40), with {@code e² = 1 − (b/a)²} and the complete
 * elliptic integrals {@code K(e)}, {@code E(e)}:
 * <pre>
 *   B/A = [(a/b)² E(e) − K(e)] / [K(e) − E(e)]
 *   a³  = 3P (K − E) / (2π E* e² A),   b = a √(1 − e²)
 *   p₀  = 3P / (2π a b),   δ = (p₀/E*) b K(e),   P = K_H δ^{3/2}
 *   1/E* = (1 − ν₁²)/E₁ + (1 − ν₂²)/E₂
 * </pre>
 * The major axis {@code a} lies along the direction of the smaller relative curvature: a ball in a
 * bore has its ellipse long round the bore, a ball in a groove long across the groove.
 *
 * <p><b>Numerics.</b> With {@code β = b/a} and Carlson's symmetric integrals
 * ({@code K = R_F(0, β², 1)}; {@code K − E = (e²/3) R_D(0, β², 1)};
 * {@code E − β² K = (e² β²/3) R_D(0, 1, β²)}; NIST DLMF 19.25.1) the ratio equation becomes
 * {@code B/A = R_D(0, 1, β²) / R_D(0, β², 1)} and {@code a³ = P R_D(0, β², 1)/(2π E* A)}, which have
 * no cancellation near the circle ({@code e → 0}); the circular limit {@code β = 1} gives exactly
 * {@code a³ = 3PR/(4E*)}, {@code δ = a²/R} with {@code 1/R = 2A}. {@code β} is found by a bracketing
 * root find on {@code ln β} (the Illinois false-position method, allocation-free); the integrals
 * are Carlson's duplication algorithm ({@code CarlsonIntegrals}, the method of Hipparchus'
 * {@code CarlsonEllipticIntegral} written out without allocation and checked against it; no curve fits). Elongations beyond
 * {@code b/a = 1e-12} are rejected.
 *
 * <p>All methods are static and thread-safe; {@link #meanRadius} allocates nothing (no solver object per
 * call), {@link #solve} only small values (its result and the direction vectors).
 */
public final class HertzContact {
    /** Smallest axis ratio b/a solved for; beyond it the contact is treated as a line contact and rejected. */
    static final double MIN_AXIS_RATIO = 1e-12;

    private HertzContact() {
    }

    /**
     * Contact-patch radius for a circular (or equivalent-radius) contact, the historical entry point:
     * {@code a_c = (3 F R* / (4 E*))^{1/3}} with {@code 1/R* = 1/r − κ}. It is the exact solution
     * when the wall's two principal curvatures are equal ({@code κ}); for a wall curved in one
     * direction only use {@link #solve} for the ellipse.
     *
     * @param load normal load F (N), ≥ 0
     * @param ballRadius ball radius r (m)
     * @param surfaceCurvature surface curvature κ (1/m), with {@code r κ < 1}
     * @param youngBall Young's modulus of the ball (Pa)
     * @param poissonBall Poisson's ratio of the ball, in [0, 0.5]
     * @param youngSurface Young's modulus of the surface (Pa)
     * @param poissonSurface Poisson's ratio of the surface, in [0, 0.5]
     * @return contact-patch radius a_c (m)
     */
    public static double contactRadius(double load, double ballRadius, double surfaceCurvature,
                                       double youngBall, double poissonBall, double youngSurface,
                                       double poissonSurface) {
        Material ball = material("ball", youngBall, poissonBall);
        Material wall = material("surface", youngSurface, poissonSurface);
        Checks.finite("surface curvature", surfaceCurvature);
        return solve(load, ballRadius, ball, surfaceCurvature, Vector3D.PLUS_I, surfaceCurvature, Vector3D.PLUS_J,
            wall).semiMajor();
    }

    /**
     * The exact Hertz patch of a ball on a wall with given principal curvatures and directions.
     *
     * @param load normal load P (N), finite and ≥ 0
     * @param ballRadius ball radius r (m), finite and positive
     * @param ball the ball's material
     * @param curvature1 wall's principal curvature κ₁ along {@code direction1} (1/m), positive concave toward
     *     the ball, {@code r κ₁ < 1}
     * @param direction1 tangent direction of κ₁ (world frame; normalised here)
     * @param curvature2 wall's principal curvature κ₂ along {@code direction2} (1/m), {@code r κ₂ < 1}
     * @param direction2 tangent direction of κ₂, orthogonal to {@code direction1}
     * @param wall the wall's material
     * @return the patch
     * @throws IllegalArgumentException naming the parameter and value for bad input, and when the ball
     *     does not fit the wall ({@code r κ ≥ 1})
     */
    public static HertzPatch solve(double load, double ballRadius, Material ball, double curvature1,
                                   Vector3D direction1, double curvature2, Vector3D direction2, Material wall) {
        Checks.nonNegative("load", load);
        Checks.positive("ball radius", ballRadius);
        Checks.finite("curvature1", curvature1);
        Checks.finite("curvature2", curvature2);
        Vector3D d1 = Checks.direction("direction1", direction1);
        Vector3D d2 = Checks.direction("direction2", direction2);
        if (Math.abs(Vector3D.dotProduct(d1, d2)) > 1e-6) {
            throw new IllegalArgumentException("principal directions must be orthogonal, got direction1 = "
                + direction1 + ", direction2 = " + direction2);
        }
        requireMaterial("ball material", ball);
        requireMaterial("wall material", wall);
        double rho1 = relativeCurvature(ballRadius, curvature1, "curvature1");
        double rho2 = relativeCurvature(ballRadius, curvature2, "curvature2");
        double eStar = ball.contactModulus(wall);
        // the major axis lies along the smaller relative curvature
        boolean firstIsMajor = rho1 <= rho2;
        // the patch under a unit load: a, b and p₀ scale with P^{1/3}, δ with P^{2/3}
        double beta = axisRatio(Math.max(rho1, rho2) / Math.min(rho1, rho2));
        double unitA = unitSemiMajor(Math.min(rho1, rho2), beta, eStar);
        double unitB = beta * unitA;
        double unitP0 = 3.0 / (2 * Math.PI * unitA * unitB);
        double unitDelta = unitP0 / eStar * unitB * CarlsonIntegrals.rF(0.0, beta * beta, 1.0);
        double s = Math.cbrt(load);
        double a = unitA * s;
        double b = unitB * s;
        double p0 = unitP0 * s;
        double delta = unitDelta * s * s;
        double stiffness = 1.0 / (unitDelta * Math.sqrt(unitDelta));
        return new HertzPatch(load, a, b, firstIsMajor ? d1 : d2, firstIsMajor ? d2 : d1, p0, delta, stiffness, eStar);
    }

    /**
     * The exact Hertz patch at a contact the solver reports: the principal directions are taken from
     * the distance Hessian {@code H} (its eigenvectors in the tangent plane; the larger curvature
     * {@code κ₁} belongs to the smaller eigenvalue, {@code h = −κ/(1 − dκ)}), the curvatures from
     * {@link ContactGeometry#curvature1} and {@link ContactGeometry#curvature2}.
     *
     * @param load normal load P (N), ≥ 0
     * @param ballRadius ball radius r (m)
     * @param ball the ball's material
     * @param g the contact geometry (normal, Hessian, principal curvatures)
     * @param wall the wall's material
     * @return the patch
     */
    public static HertzPatch solve(double load, double ballRadius, Material ball, ContactGeometry g, Material wall) {
        if (g == null) {
            throw new IllegalArgumentException("contact geometry must be given, got null");
        }
        Vector3D n = Checks.direction("contact normal", new Vector3D(g.normal[0], g.normal[1], g.normal[2]));
        Vector3D t1 = n.orthogonal();
        Vector3D t2 = Vector3D.crossProduct(n, t1);
        double[] h = g.hessian;
        double p = quad(h, t1, t1);
        double q = quad(h, t1, t2);
        double r = quad(h, t2, t2);
        // direction of the smaller eigenvalue of [[p, q], [q, r]]
        double theta = 0.5 * Math.atan2(2 * q, p - r) + 0.5 * Math.PI;
        Vector3D d1 = new Vector3D(Math.cos(theta), t1, Math.sin(theta), t2);
        Vector3D d2 = Vector3D.crossProduct(n, d1);
        return solve(load, ballRadius, ball, g.curvature1, d1, g.curvature2, d2, wall);
    }

    /**
     * Mean contact radius {@code c = √(ab)} (m) of the exact patch, without the directions (used by
     * the spin-creep law on every evaluation).
     *
     * @param load normal load P (N), ≥ 0
     * @param ballRadius ball radius r (m)
     * @param curvature1 wall's first principal curvature (1/m)
     * @param curvature2 wall's second principal curvature (1/m)
     * @param contactModulus the pair's contact modulus E* (Pa)
     * @return c (m)
     */
    public static double meanRadius(double load, double ballRadius, double curvature1, double curvature2,
                                    double contactModulus) {
        Checks.nonNegative("load", load);
        Checks.positive("ball radius", ballRadius);
        Checks.positive("contact modulus", contactModulus);
        double rho1 = relativeCurvature(ballRadius, curvature1, "curvature1");
        double rho2 = relativeCurvature(ballRadius, curvature2, "curvature2");
        double beta = axisRatio(Math.max(rho1, rho2) / Math.min(rho1, rho2));
        return unitSemiMajor(Math.min(rho1, rho2), beta, contactModulus) * Math.sqrt(beta) * Math.cbrt(load);
    }

    /**
     * Axis ratio {@code β = b/a} in (0, 1] that solves
     * {@code B/A = R_D(0, 1, β²) / R_D(0, β², 1)} (the Hertz ratio equation in Carlson form).
     *
     * @param ratio B/A ≥ 1
     * @return β
     */
    static double axisRatio(double ratio) {
        if (ratio <= 1) {
            return 1.0;
        }
        double logRatio = Math.log(ratio);
        double lo = Math.log(MIN_AXIS_RATIO);
        double fLo = logRatioOfAxes(lo) - logRatio;
        if (fLo < 0) {
            throw new IllegalArgumentException("relative curvature ratio B/A = " + ratio
                + " gives a contact ellipse longer than 1e12 times its width (a line contact), outside the Hertz point-contact solution");
        }
        return Math.exp(logAxisRatio(logRatio, lo, fLo));
    }

    /**
     * The root {@code u = ln β} of {@code ln(B/A)(u) = logRatio} in {@code [lo, 0]}, where the function
     * falls from {@code logRatio + fLo ≥ logRatio} to 0: the Illinois variant of the false-position
     * method (M. Dowell &amp; P. Jarratt, BIT 11 (1971) 168), with a bisection whenever an estimate leaves the
     * bracket; it keeps the root bracketed, converges superlinearly, and allocates nothing (unlike a
     * Hipparchus solver object per call). Stops when the estimate moves by less than {@code 1e-15 (1 + |u|)}
     * or the bracket is that narrow.
     */
    private static double logAxisRatio(double logRatio, double lo, double fLo) {
        double a = lo;
        double fa = fLo;
        double b = 0.0;
        double fb = -logRatio;
        double c = Double.NaN;
        int side = 0;
        for (int i = 0; i < 200; i++) {
            double prev = c;
            c = (a * fb - b * fa) / (fb - fa);
            if (!(c > a && c < b)) {
                c = 0.5 * (a + b);
            }
            double fc = logRatioOfAxes(c) - logRatio;
            if (fc == 0 || Math.abs(c - prev) <= 1e-15 * (1 + Math.abs(c)) || b - a <= 1e-15 * (1 + Math.abs(c))) {
                return c;
            }
            if (fc > 0) {
                a = c;
                fa = fc;
                if (side == 1) {
                    fb *= 0.5;
                }
                side = 1;
            } else {
                b = c;
                fb = fc;
                if (side == -1) {
                    fa *= 0.5;
                }
                side = -1;
            }
        }
        return c;
    }

    /** {@code ln(B/A)} as a function of {@code u = ln β}. */
    private static double logRatioOfAxes(double u) {
        double m1 = Math.exp(2 * u);
        return Math.log(CarlsonIntegrals.rD(0.0, 1.0, m1) / CarlsonIntegrals.rD(0.0, m1, 1.0));
    }

    /**
     * Semi-major axis under a unit load, {@code a = (R_D(0, β², 1)/(2π E* A))^{1/3}} for {@code P = 1 N}
     * ({@code A = ρ_min/2}); b = β a.
     */
    private static double unitSemiMajor(double rhoMin, double beta, double eStar) {
        return Math.cbrt(CarlsonIntegrals.rD(0.0, beta * beta, 1.0) / (2 * Math.PI * eStar * 0.5 * rhoMin));
    }

    private static double relativeCurvature(double ballRadius, double curvature, String name) {
        Checks.finite(name, curvature);
        double rho = 1.0 / ballRadius - curvature;
        if (!(rho > 0)) {
            throw new IllegalArgumentException("ball of radius " + ballRadius + " m does not fit a wall of " + name
                + " " + curvature + " 1/m: r*kappa = " + ballRadius * curvature
                + " >= 1 (a conforming contact, outside the Hertz point-contact solution)");
        }
        return rho;
    }

    private static double quad(double[] h, Vector3D u, Vector3D v) {
        double ux = u.getX();
        double uy = u.getY();
        double uz = u.getZ();
        return ux * (h[0] * v.getX() + h[1] * v.getY() + h[2] * v.getZ())
            + uy * (h[3] * v.getX() + h[4] * v.getY() + h[5] * v.getZ())
            + uz * (h[6] * v.getX() + h[7] * v.getY() + h[8] * v.getZ());
    }

    private static Material material(String body, double young, double poisson) {
        Checks.positive("Young's modulus of the " + body, young);
        if (!(poisson >= 0 && poisson <= 0.5)) {
            throw new IllegalArgumentException("Poisson's ratio of the " + body + " must lie in [0, 0.5], got " + poisson);
        }
        return Material.of(young, poisson);
    }

    private static void requireMaterial(String name, Material m) {
        if (m == null) {
            throw new IllegalArgumentException(name + " must be given, got null");
        }
    }
}
