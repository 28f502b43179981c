package org.trundle.contact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Material;

/**
 * The exact Hertz solution against closed forms, an independent numerical reference and handbook
 * approximations; each check names its source.
 */
class HertzContactTest {
    private static final Material STEEL = Material.STEEL;

    /**
     * Ball on a flat, K. L. Johnson, Contact Mechanics, 1985, ch. 4 (§4.2, eqs. 4.22–4.23):
     * {@code c = (3PR/4E*)^{1/3}}, {@code p₀ = 3P/(2πc²)}, approach {@code c²/R}. Worked case: a
     * 10 mm diameter steel ball on a steel flat under 10 N (E = 210 GPa, ν = 0.3): c ≈ 68.8 µm,
     * p₀ ≈ 1.01 GPa, δ ≈ 0.95 µm; 0.1 % (the solution is exact, so it meets this at rounding level).
     */
    @Test
    void steelBallOnSteelFlat() {
        double p = 10;
        double r = 0.005;
        HertzPatch patch = HertzContact.solve(p, r, STEEL, 0, Vector3D.PLUS_I, 0, Vector3D.PLUS_J, STEEL);
        double eStar = 1 / (2 * (1 - 0.09) / 210e9);
        double c = Math.cbrt(3 * p * r / (4 * eStar));
        assertEquals(c, patch.semiMajor(), 1e-3 * c);
        assertEquals(c, patch.semiMinor(), 1e-3 * c);
        assertEquals(3 * p / (2 * Math.PI * c * c), patch.maxPressure(), 1e-3 * patch.maxPressure());
        assertEquals(c * c / r, patch.approach(), 1e-3 * c * c / r);
        // the worked numbers themselves (hand calculation from the formulas above)
        assertEquals(68.8e-6, patch.semiMajor(), 0.1e-6);
        assertEquals(1.01e9, patch.maxPressure(), 0.01e9);
        assertEquals(0.947e-6, patch.approach(), 0.002e-6);
        // stiffness of P = K δ^{3/2} for a sphere on a flat: K = (4/3) E* √R (Johnson 1985, eq. 4.23)
        assertEquals(4.0 / 3.0 * eStar * Math.sqrt(r), patch.stiffness(), 1e-12 * patch.stiffness());
        assertEquals(0.0, patch.eccentricity(), 0.0);
    }

    /**
     * The historical entry point keeps its closed form {@code (3 F R* / (4 E*))^{1/3}}, {@code 1/R* = 1/r − κ}
     * (Johnson 1985, §4.2), for a flat, a concave and a convex sphere.
     */
    @ParameterizedTest(name = "kappa={0}")
    @CsvSource({"0", "40", "-25"})
    void contactRadiusKeepsItsClosedForm(double kappa) {
        double r = 0.004;
        double f = 3.5;
        double eStar = 1 / ((1 - 0.3 * 0.3) / 210e9 + (1 - 0.37 * 0.37) / 3e9);
        double expected = Math.cbrt(3 * f / (1 / r - kappa) / (4 * eStar));
        assertEquals(expected, HertzContact.contactRadius(f, r, kappa, 210e9, 0.3, 3e9, 0.37), 1e-13 * expected);
    }

    /**
     * Elliptic cases: the ratio {@code B/A = [(a/b)² E(e) − K(e)]/[K(e) − E(e)]} and
     * {@code a³ = 3P(K − E)/(2π E* e² A)}, {@code δ = (p₀/E*) b K(e)} (Johnson 1985, §4.2) recomputed from the
     * solved eccentricity with K and E by adaptive Gauss–Legendre quadrature of their defining integrals
     * (a general-purpose reference, Hipparchus' integrator, not the Carlson forms the solver uses), and
     * with Hipparchus' Legendre-form integrals; 1e-10.
     */
    @ParameterizedTest(name = "r={0} kappa1={1} kappa2={2}")
    @CsvSource({
        "0.004, 66.66666666666667, 0",      // 8 mm ball in a 30 mm bore
        "0.005, 192.30769230769232, -50",   // 10 mm ball in a conforming groove of an inner race
        "0.01, 0, -200",                    // ball on the outside of a 5 mm radius rod
        "0.003, 100, 99.99"                 // almost circular
    })
    void ratioEquationHoldsWithQuadratureIntegrals(double r, double k1, double k2) {
        double p = 25;
        Material wall = Material.ACRYLIC;
        HertzPatch patch = HertzContact.solve(p, r, STEEL, k1, Vector3D.PLUS_J, k2, Vector3D.PLUS_K, wall);
        double rhoMin = Math.min(1 / r - k1, 1 / r - k2);
        double rhoMax = Math.max(1 / r - k1, 1 / r - k2);
        double bigA = rhoMin / 2;
        double bigB = rhoMax / 2;
        double e = patch.eccentricity();
        double e2 = e * e;
        double bigK = quadrature(th -> 1 / Math.sqrt(1 - e2 * Math.sin(th) * Math.sin(th)));
        double bigE = quadrature(th -> Math.sqrt(1 - e2 * Math.sin(th) * Math.sin(th)));
        double ab2 = Math.pow(patch.semiMajor() / patch.semiMinor(), 2);
        if (e2 > 1e-4) {
            // away from the circle the quotient of differences is well conditioned
            assertEquals(bigB / bigA, (ab2 * bigE - bigK) / (bigK - bigE), 1e-8 * bigB / bigA);
            double a3 = 3 * p * (bigK - bigE) / (2 * Math.PI * patch.contactModulus() * e2 * bigA);
            assertEquals(Math.cbrt(a3), patch.semiMajor(), 1e-9 * patch.semiMajor());
            assertEquals(bigK, LegendreEllipticIntegral.bigK(e2), 1e-12 * bigK);
            assertEquals(bigE, LegendreEllipticIntegral.bigE(e2), 1e-12 * bigE);
        }
        assertEquals(patch.maxPressure() / patch.contactModulus() * patch.semiMinor() * bigK, patch.approach(),
            1e-10 * patch.approach());
        assertEquals(3 * p / (2 * Math.PI * patch.semiMajor() * patch.semiMinor()), patch.maxPressure(),
            1e-12 * patch.maxPressure());
    }

    /**
     * Independent check of the whole solution: the normal displacement of the elastic half-spaces under
     * the elliptic Hertz pressure (Boussinesq: {@code u = (1/(π E*)) ∬ p/ρ dA}, Johnson 1985, §3.2 and
     * §3.6), integrated numerically in polar coordinates about the field point, must equal
     * {@code δ − A x² − B y²} everywhere inside the ellipse (the contact condition). The radial
     * integral is done in closed form, the angular one by adaptive Gauss–Legendre quadrature
     * (Hipparchus); 1e-9 of δ.
     */
    @ParameterizedTest(name = "r={0} kappa1={1} kappa2={2}")
    @CsvSource({
        "0.004, 66.66666666666667, 0",
        "0.005, 192.30769230769232, -50",
        "0.005, 0, 0"
    })
    void surfaceDisplacementMatchesTheGap(double r, double k1, double k2) {
        double p = 40;
        HertzPatch patch = HertzContact.solve(p, r, STEEL, k1, Vector3D.PLUS_I, k2, Vector3D.PLUS_J, STEEL);
        double a = patch.semiMajor();
        double b = patch.semiMinor();
        double bigA = Math.min(1 / r - k1, 1 / r - k2) / 2;
        double bigB = Math.max(1 / r - k1, 1 / r - k2) / 2;
        double[][] points = {{0, 0}, {0.5, 0}, {0, 0.5}, {0.3, -0.6}, {-0.7, 0.2}, {0.9, 0.1}};
        for (double[] pt : points) {
            double x = pt[0] * a;
            double y = pt[1] * b;
            double u = patch.maxPressure() / (Math.PI * patch.contactModulus())
                * quadrature2pi(th -> radialIntegral(x, y, a, b, th));
            double expected = patch.approach() - bigA * x * x - bigB * y * y;
            assertEquals(expected, u, 1e-9 * patch.approach(), "at x/a=" + pt[0] + ", y/b=" + pt[1]);
        }
    }

    /**
     * Orientation (Johnson 1985, §4.2: the major axis lies along the direction of the smaller relative
     * curvature): a ball in a bore has its ellipse long round the bore, a ball in a groove long across
     * the groove.
     */
    @Test
    void ellipseLiesRoundTheBoreAndAcrossTheGroove() {
        Vector3D axis = new Vector3D(1, 2, 2).normalize();
        Vector3D round = Vector3D.crossProduct(axis, Vector3D.PLUS_K).normalize();
        HertzPatch bore = HertzContact.solve(5, 0.004, STEEL, 1 / 0.015, round, 0, axis, Material.ACRYLIC);
        assertEquals(1.0, Math.abs(Vector3D.dotProduct(bore.majorAxis(), round)), 1e-15);
        assertTrue(bore.semiMajor() > bore.semiMinor());
        // groove along `axis` with a convex bottom line (inner race): across it concave 1/(0.52 D)
        Vector3D across = round;
        HertzPatch groove = HertzContact.solve(5, 0.005, STEEL, 1 / 0.0052, across, -1 / 0.02, axis, STEEL);
        assertEquals(1.0, Math.abs(Vector3D.dotProduct(groove.majorAxis(), across)), 1e-15);
        // the same groove given with the curvatures in the other order
        HertzPatch swapped = HertzContact.solve(5, 0.005, STEEL, -1 / 0.02, axis, 1 / 0.0052, across, STEEL);
        assertEquals(1.0, Math.abs(Vector3D.dotProduct(swapped.majorAxis(), across)), 1e-15);
        assertEquals(groove.semiMajor(), swapped.semiMajor(), 0.0);
        // a convex rod (ball outside a cylinder): round the rod the relative curvature is larger, so long
        // along the rod
        HertzPatch rod = HertzContact.solve(5, 0.005, STEEL, 0, axis, -1 / 0.01, round, STEEL);
        assertEquals(1.0, Math.abs(Vector3D.dotProduct(rod.majorAxis(), axis)), 1e-15);
    }

    /**
     * The overload on a solver's contact geometry reads the principal directions from the distance
     * Hessian: inside a tube (axis along {@code u}) of radius R at the centre distance {@code d = r},
     * {@code H = −(1/(R − r)) e_φ e_φᵀ} (design notes §2), so the major axis is {@code e_φ}.
     */
    @Test
    void geometryOverloadFindsTheDirections() {
        double bigR = 0.015;
        double r = 0.004;
        Vector3D u = new Vector3D(0.3, -0.4, 0.5).normalize();
        Vector3D n = u.orthogonal();
        Vector3D ePhi = Vector3D.crossProduct(u, n);
        ContactGeometry g = new ContactGeometry();
        g.normal[0] = n.getX();
        g.normal[1] = n.getY();
        g.normal[2] = n.getZ();
        double h = -1 / (bigR - r);
        double[] e = {ePhi.getX(), ePhi.getY(), ePhi.getZ()};
        g.setHessian(h * e[0] * e[0], h * e[0] * e[1], h * e[0] * e[2], h * e[1] * e[1], h * e[1] * e[2], h * e[2] * e[2]);
        g.curvature1 = 1 / bigR;
        g.curvature2 = 0;
        g.distance = r;
        HertzPatch viaGeometry = HertzContact.solve(7, r, STEEL, g, Material.POLYCARBONATE);
        HertzPatch direct = HertzContact.solve(7, r, STEEL, 1 / bigR, ePhi, 0, u, Material.POLYCARBONATE);
        assertEquals(1.0, Math.abs(Vector3D.dotProduct(viaGeometry.majorAxis(), ePhi)), 1e-12);
        assertEquals(direct.semiMajor(), viaGeometry.semiMajor(), 0.0);
        assertEquals(direct.approach(), viaGeometry.approach(), 0.0);
    }

    /**
     * Force–approach law {@code P = K δ^{3/2}} with one K for every load (Johnson 1985, §4.2: a, b ∝
     * P^{1/3}, δ ∝ P^{2/3}); 1e-12.
     */
    @ParameterizedTest(name = "P={0}")
    @CsvSource({"0.01", "1", "37", "5000"})
    void forceFollowsTheThreeHalvesPowerOfTheApproach(double p) {
        HertzPatch patch = HertzContact.solve(p, 0.005, STEEL, 1 / 0.0052, Vector3D.PLUS_I, -1 / 0.02,
            Vector3D.PLUS_J, STEEL);
        HertzPatch unit = HertzContact.solve(1, 0.005, STEEL, 1 / 0.0052, Vector3D.PLUS_I, -1 / 0.02,
            Vector3D.PLUS_J, STEEL);
        assertEquals(p, patch.stiffness() * Math.pow(patch.approach(), 1.5), 1e-12 * p);
        assertEquals(unit.stiffness(), patch.stiffness(), 1e-12 * unit.stiffness());
        assertEquals(unit.semiMajor() * Math.cbrt(p), patch.semiMajor(), 1e-13 * patch.semiMajor());
        // zero load: a point, the same stiffness
        HertzPatch none = HertzContact.solve(0, 0.005, STEEL, 1 / 0.0052, Vector3D.PLUS_I, -1 / 0.02,
            Vector3D.PLUS_J, STEEL);
        assertEquals(0.0, none.semiMajor(), 0.0);
        assertEquals(unit.stiffness(), none.stiffness(), 0.0);
    }

    /**
     * Axis ratio a/b of the contact ellipse against values of the Hertz ratio equation
     * {@code B/A = [(a/b)² E(e) − K(e)]/[K(e) − E(e)]} solved offline with mpmath 1.3.0 (a general-purpose
     * arbitrary-precision library: {@code findroot} on {@code ellipk}/{@code ellipe}, 30 digits); 1e-12.
     */
    @ParameterizedTest(name = "B/A={0}")
    @CsvSource({"1.5, 1.3101029621127503765", "4, 2.5007063549273662958", "10, 4.4994473031554227643",
        "32.5, 9.3173207944719156937", "100, 18.187103004388932837"})
    void axisRatioMatchesAnArbitraryPrecisionReference(double ratio, double aOverB) {
        assertEquals(aOverB, 1 / HertzContact.axisRatio(ratio), 1e-12 * aOverB);
    }

    /**
     * Handbook approximations of the elliptic integrals at the solved eccentricity (B. J. Brewe and
     * B. J. Hamrock, J. Lubrication Technology 99 (1977) 485; from memory, stated accurate to a few
     * percent for {@code 1 ≤ α ≤ 100}): with {@code α = B/A}, {@code E(e) ≈ 1.0003 + 0.5968/α},
     * {@code K(e) ≈ 1.5277 + 0.6023 ln α}; 1 %. (Their fit for the axis ratio,
     * {@code a/b ≈ 1.0339 α^0.636}, and the simpler {@code α^{2/π}} drift from the exact ratio by 4–6 %
     * toward {@code α = 100}, as the mpmath values above show, so they are not used as checks.)
     */
    @ParameterizedTest(name = "B/A={0}")
    @CsvSource({"1.5", "4", "10", "32.5", "100"})
    void ellipticIntegralApproximationsOfTheHandbookAgree(double ratio) {
        double beta = HertzContact.axisRatio(ratio);
        double e2 = 1 - beta * beta;
        double bigE = LegendreEllipticIntegral.bigE(e2);
        double bigK = LegendreEllipticIntegral.bigK(e2);
        assertEquals(1.0003 + 0.5968 / ratio, bigE, 0.01 * bigE);
        assertEquals(1.5277 + 0.6023 * Math.log(ratio), bigK, 0.01 * bigK);
    }

    /** The README's example compiles and gives a patch long round the bore with a positive pressure. */
    @Test
    void readmeExample() {
        HertzPatch patch = HertzContact.solve(10.0, 0.004, Material.STEEL,
            1 / 0.015, Vector3D.PLUS_J, 0.0, Vector3D.PLUS_I, Material.ACRYLIC);  // 8 mm ball, 30 mm acrylic bore, 10 N
        double pMax = patch.maxPressure();
        double a = patch.semiMajor();
        double b = patch.semiMinor();
        assertTrue(pMax > 0 && a > b, patch.toString());
        assertEquals(Vector3D.PLUS_J, patch.majorAxis());
    }

    /** The circular limit is continuous: curvatures 1e-9 apart give the circle to ~1e-9. */
    @Test
    void circularLimitIsContinuous() {
        HertzPatch circle = HertzContact.solve(3, 0.004, STEEL, 20, Vector3D.PLUS_I, 20, Vector3D.PLUS_J, STEEL);
        HertzPatch near = HertzContact.solve(3, 0.004, STEEL, 20 + 1e-7, Vector3D.PLUS_I, 20, Vector3D.PLUS_J, STEEL);
        assertEquals(circle.semiMajor(), near.semiMajor(), 1e-9 * circle.semiMajor());
        assertEquals(circle.semiMinor(), near.semiMinor(), 1e-9 * circle.semiMajor());
        assertEquals(circle.approach(), near.approach(), 1e-9 * circle.approach());
        assertEquals(1.0, HertzContact.axisRatio(1.0), 0.0);
    }

    /** A ball that does not fit ({@code r κ ≥ 1}, design notes §2) and bad input are refused by name. */
    @Test
    void nonFittingCurvatureAndBadInputAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
            () -> HertzContact.solve(1, 0.01, STEEL, 100, Vector3D.PLUS_I, 0, Vector3D.PLUS_J, STEEL));
        assertTrue(e.getMessage().contains("r*kappa = 1.0") && e.getMessage().contains("curvature1"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
            () -> HertzContact.solve(1, 0.01, STEEL, 0, Vector3D.PLUS_I, 150, Vector3D.PLUS_J, STEEL));
        assertTrue(e.getMessage().contains("curvature2"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
            () -> HertzContact.solve(-1, 0.01, STEEL, 0, Vector3D.PLUS_I, 0, Vector3D.PLUS_J, STEEL));
        assertTrue(e.getMessage().contains("load"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
            () -> HertzContact.solve(1, 0.01, STEEL, 0, Vector3D.PLUS_I, 0, new Vector3D(1, 1, 0), STEEL));
        assertTrue(e.getMessage().contains("orthogonal"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
            () -> HertzContact.solve(1, 0.01, null, 0, Vector3D.PLUS_I, 0, Vector3D.PLUS_J, STEEL));
        assertTrue(e.getMessage().contains("ball material"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Material.of(1e9, 0.6));
        assertTrue(e.getMessage().contains("Poisson") && e.getMessage().contains("0.6"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Material.of(-2, 0.3));
        assertTrue(e.getMessage().contains("Young") && e.getMessage().contains("-2"), e.getMessage());
    }

    /** Material moduli: {@code G = E/(2(1+ν))}, {@code 1/E* = Σ(1 − ν²)/E}, {@code 2/G = 1/G₁ + 1/G₂}. */
    @Test
    void materialModuli() {
        Material m = Material.of(200e9, 0.25);
        assertEquals(80e9, m.shearModulus(), 1e-3);
        assertEquals(200e9 / (2 * (1 - 0.0625)), m.contactModulus(m), 1e-3);
        Material soft = Material.of(3e9, 0.4);
        double g2 = 3e9 / 2.8;
        assertEquals(2 / (1 / 80e9 + 1 / g2), m.combinedShearModulus(soft), 1e-6);
        assertEquals(m.combinedShearModulus(soft), soft.combinedShearModulus(m), 1e-6);
    }

    private static double quadrature(java.util.function.DoubleUnaryOperator f) {
        IterativeLegendreGaussIntegrator integrator = new IterativeLegendreGaussIntegrator(16, 1e-14, 1e-300);
        return integrator.integrate(1_000_000, f::applyAsDouble, 0, Math.PI / 2);
    }

    private static double quadrature2pi(java.util.function.DoubleUnaryOperator f) {
        IterativeLegendreGaussIntegrator integrator = new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-300);
        return integrator.integrate(1_000_000, f::applyAsDouble, 0, 2 * Math.PI);
    }

    /**
     * {@code ∫₀^{s₊} √(1 − |x₀ + s t|²_Q) ds} along the direction θ from the field point (x, y), with
     * {@code Q = diag(1/a², 1/b²)}: the integrand is √(γ (s − s₋)(s₊ − s)), integrated in closed form.
     */
    private static double radialIntegral(double x, double y, double a, double b, double th) {
        double tx = Math.cos(th);
        double ty = Math.sin(th);
        double alpha = 1 - x * x / (a * a) - y * y / (b * b);
        double beta = x * tx / (a * a) + y * ty / (b * b);
        double gamma = tx * tx / (a * a) + ty * ty / (b * b);
        double d = Math.sqrt(beta * beta + alpha * gamma);
        double h = d / gamma;
        double psi0 = Math.asin(beta / d);
        double upper = Math.PI / 4;
        double lower = psi0 / 2 + Math.sin(2 * psi0) / 4;
        return Math.sqrt(gamma) * h * h * (upper - lower);
    }
}
