package org.trundle.contact;

import org.trundle.core.Checks;

/**
 * Hertz contact of an elastic sphere on an elastic surface (H. Hertz 1882; K. L. Johnson,
 * Contact Mechanics, 1985, §4.2): contact-patch radius
 * <pre>
 *   a_c = (3 F R* / (4 E*))^(1/3),   1/R* = 1/r − κ,   1/E* = (1 − ν₁²)/E₁ + (1 − ν₂²)/E₂
 * </pre>
 * with {@code F} the normal load (N), {@code r} the ball radius (m), {@code κ} the surface's
 * curvature along the contact (1/m, positive concave toward the ball, as in Trundle's convention;
 * for a tube use its radius of curvature; for a plane 0), {@code E} Young's moduli (Pa) and
 * {@code ν} Poisson's ratios. Use with {@link PivotingResistance#hertzLength(double, double)}.
 */
public final class HertzContact {
    private HertzContact() {
    }

    /**
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
        Checks.nonNegative("load", load);
        Checks.positive("ball radius", ballRadius);
        Checks.finite("surface curvature", surfaceCurvature);
        Checks.positive("Young's modulus of the ball", youngBall);
        Checks.positive("Young's modulus of the surface", youngSurface);
        checkPoisson("Poisson's ratio of the ball", poissonBall);
        checkPoisson("Poisson's ratio of the surface", poissonSurface);
        double inv = 1.0 / ballRadius - surfaceCurvature;
        if (!(inv > 0)) {
            throw new IllegalArgumentException("ball of radius " + ballRadius
                + " m does not fit a surface of curvature " + surfaceCurvature + " 1/m");
        }
        double rStar = 1.0 / inv;
        double eStar = 1.0 / ((1 - poissonBall * poissonBall) / youngBall
            + (1 - poissonSurface * poissonSurface) / youngSurface);
        return Math.cbrt(3 * load * rStar / (4 * eStar));
    }

    private static void checkPoisson(String name, double nu) {
        if (!(nu >= 0 && nu <= 0.5)) {
            throw new IllegalArgumentException(name + " must lie in [0, 0.5], got " + nu);
        }
    }
}
