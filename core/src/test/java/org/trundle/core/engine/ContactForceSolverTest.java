package org.trundle.core.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The several-contact constraint solver on geometry given by hand (no run): a ball on two parallel rails
 * and in a V-groove on a slope, sliding in a groove, and one contact against the closed form of design
 * notes §3. Frame of the slope: x down the slope along the rails or groove, z normal to the slope.
 */
class ContactForceSolverTest {
    private static final double R = 0.01;
    private static final double M = 0.03;
    private static final double G = 9.81;

    /** Gravity on a slope of angle θ (x down the slope, z out of it). */
    private static double[] gravity(double theta) {
        return new double[] {G * Math.sin(theta), 0, -G * Math.cos(theta)};
    }

    /** Distance Hessian at the centre of a cylinder of axis x, for a centre at (y, z) from the axis at distance ρ. */
    private static double[] cylinderHessian(double y, double z) {
        double rho = Math.hypot(y, z);
        double ny = y / rho;
        double nz = z / rho;
        // (1 − x̂x̂ᵀ − ρ̂ρ̂ᵀ)/ρ
        return new double[] {0, 0, 0, 0, (1 - ny * ny) / rho, -ny * nz / rho, 0, -ny * nz / rho, (1 - nz * nz) / rho};
    }

    /**
     * Rails: two cylinders of radius {@code rc} along x; the contact points {@code d} apart. Rolling down
     * the rails, a ball rolls about the chord through both contacts at distance
     * {@code r_e = √(r² − d²/4)} from its centre, so {@code a = g sinθ / (1 + k r²/r_e²)} (energy method,
     * textbook rolling-on-rails result, e.g. J. L. Meriam &amp; L. G. Kraige, Engineering Mechanics:
     * Dynamics, rigid-body plane motion chapter; common practice), and each rail carries
     * {@code N = m g cosθ r/(2 r_e)} from the statics across the rails (the walls push along their normals).
     */
    @ParameterizedTest
    @ValueSource(doubles = {0.0, 0.4})
    void railsGiveTheTextbookAccelerationAndNormalForces(double speed) {
        double k = 0.4;
        double theta = Math.toRadians(12);
        double d = 0.012;
        double rc = 0.003;
        double re = Math.sqrt(R * R - d * d / 4);
        double dist = R + rc;
        double axisHalf = d / 2 * dist / R;
        double h = Math.sqrt(dist * dist - axisHalf * axisHalf);
        // centre at (0, 0, h); rail axes at y = ±axisHalf, z = 0
        double[] n1 = {0, axisHalf / dist, h / dist};
        double[] n2 = {0, -axisHalf / dist, h / dist};
        ContactForceSolver s = new ContactForceSolver(R, M, k);
        s.addRolling(n1, cylinderHessian(axisHalf, h));
        s.addRolling(n2, cylinderHessian(-axisHalf, h));
        double[] v = {speed, 0, 0};
        // rolling about the chord: r ω × n = v at both contacts
        double[] w = {0, speed / re, 0};
        assertTrue(s.solve(v, w, gravity(theta), new double[3], new double[3]));
        double expected = G * Math.sin(theta) / (1 + k * R * R / (re * re));
        assertEquals(expected, s.acceleration()[0], 1e-12 * expected);
        assertEquals(0, s.acceleration()[1], 1e-12 * expected);
        assertEquals(0, s.acceleration()[2], 1e-12 * expected);
        double n = M * G * Math.cos(theta) * R / (2 * re);
        assertEquals(n, s.normalForce(0), 1e-12 * n);
        assertEquals(n, s.normalForce(1), 1e-12 * n);
        // the friction each rail needs is along the rails only, half of m (g sinθ − a)
        double t = M * (G * Math.sin(theta) - expected) / 2;
        assertEquals(t, s.tangentialForce(0), 1e-12 * n);
        assertEquals(-t, s.force(1)[0], 1e-12 * n);
        // α about the chord: a = α r_e
        assertEquals(expected / re, s.angularAcceleration()[1], 1e-12 * expected / re);
    }

    /**
     * V-groove of included angle 60° on a 10° slope, k = 2/5: the ball rolls about the chord at
     * {@code r_e = r sin 30°}, so {@code a = g sinθ/(1 + k/sin²30°) = g sinθ/2.6}; each wall carries
     * {@code N = m g cosθ/(2 sin 30°)} (statics across the groove; common practice).
     */
    @Test
    void vGrooveRollsAboutTheChord() {
        double k = 0.4;
        double theta = Math.toRadians(10);
        double gamma = Math.toRadians(30);
        ContactForceSolver s = vGroove(k, gamma);
        assertTrue(s.solve(new double[3], new double[3], gravity(theta), new double[3], new double[3]));
        double re = R * Math.sin(gamma);
        double expected = G * Math.sin(theta) / (1 + k * R * R / (re * re));
        assertEquals(expected, s.acceleration()[0], 1e-12 * expected);
        assertEquals(G * Math.sin(theta) / 2.6, s.acceleration()[0], 1e-12 * expected);
        double n = M * G * Math.cos(theta) / (2 * Math.sin(gamma));
        assertEquals(n, s.normalForce(0), 1e-12 * n);
        assertEquals(n, s.normalForce(1), 1e-12 * n);
    }

    /**
     * Where rolling needs more friction than {@code μ_s N} on each wall: the needed friction per wall is
     * {@code m g sinθ (k/sin²γ)/(2(1 + k/sin²γ))} against {@code N = m g cosθ/(2 sin γ)}, so a V-groove holds
     * rolling while {@code tanθ ≤ μ_s (1 + k/sin²γ)/(k/sin γ)} (derived here from the two results above).
     */
    @Test
    void grooveGripRatioFollowsFromStatics() {
        double k = 0.4;
        double gamma = Math.toRadians(30);
        double mu = 0.2;
        double q = k / (Math.sin(gamma) * Math.sin(gamma));
        double critical = Math.atan(mu * (1 + q) / (q * Math.sin(gamma)));
        for (double factor : new double[] {0.9, 1.0, 1.1}) {
            double theta = critical * factor;
            ContactForceSolver s = vGroove(k, gamma);
            assertTrue(s.solve(new double[3], new double[3], gravity(theta), new double[3], new double[3]));
            for (int i = 0; i < 2; i++) {
                double ratio = s.tangentialForce(i) / (mu * s.normalForce(i));
                assertEquals(factor == 1.0 ? 1.0 : Math.tan(theta) / Math.tan(critical), ratio, 1e-12);
            }
        }
    }

    /**
     * Both walls sliding with friction ratio μ against a slip down the groove: the normal constraints give
     * {@code N = m g cosθ/(2 sin γ)} and {@code a = g (sinθ − μ cosθ/sin γ)} (Coulomb friction; common practice).
     */
    @Test
    void slidingInAGroove() {
        double theta = Math.toRadians(40);
        double gamma = Math.toRadians(35);
        double mu = 0.15;
        double[][] n = grooveNormals(gamma);
        ContactForceSolver s = new ContactForceSolver(R, M, 0.4);
        double[] down = {1, 0, 0};
        s.addSliding(n[0], new double[9], mu, down);
        s.addSliding(n[1], new double[9], mu, down);
        double[] v = {0.5, 0, 0};
        assertTrue(s.solve(v, new double[] {0, 3, 0}, gravity(theta), new double[3], new double[3]));
        double expected = G * (Math.sin(theta) - mu * Math.cos(theta) / Math.sin(gamma));
        assertEquals(expected, s.acceleration()[0], 1e-12 * G);
        double nf = M * G * Math.cos(theta) / (2 * Math.sin(gamma));
        assertEquals(nf, s.normalForce(0), 1e-12 * nf);
        assertEquals(nf, s.normalForce(1), 1e-12 * nf);
        assertEquals(mu * nf, s.tangentialForce(0), 1e-12 * nf);
    }

    /**
     * One rolling contact on random curved geometry and a random rolling state agrees with the closed form
     * of design notes §3 ({@code F_n = m(−vᵀHv − n·g) − n·F_app},
     * {@code F_t = k m/(1+k)[(τ×n)/(kmr) + r P(ω×Hv) − P g − P F_app/m]}), and one sliding contact with
     * §4 ({@code F_n} the same with the actual velocity).
     */
    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3, 4, 5, 6, 7, 8})
    void oneContactMatchesTheClosedForm(long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double k = 0.2 + 0.4 * rnd.nextDouble();
        double[] n = unitVector(rnd);
        double[] h = new double[9];
        for (int i = 0; i < 3; i++) {
            for (int j = i; j < 3; j++) {
                h[3 * i + j] = 50 * (rnd.nextDouble() - 0.5);
                h[3 * j + i] = h[3 * i + j];
            }
        }
        double[] w = {rnd.nextDouble() * 40 - 20, rnd.nextDouble() * 40 - 20, rnd.nextDouble() * 40 - 20};
        double[] v = new double[3];
        ContactKinematics.noSlipVelocity(R, w[0], w[1], w[2], n, v, 0);
        double[] g = {rnd.nextDouble() * 4 - 2, rnd.nextDouble() * 4 - 2, -G};
        double[] fApp = {rnd.nextDouble() * 0.1, -0.05, 0.02};
        double[] tau = {1e-4 * rnd.nextDouble(), -2e-4, 3e-4 * rnd.nextDouble()};
        ContactForceSolver s = new ContactForceSolver(R, M, k);
        s.addRolling(n, h);
        assertTrue(s.solve(v, w, g, fApp, tau));
        double[] hv = new double[3];
        Vec.mulSym(h, v, hv);
        double fn = M * (-Vec.dot(v, hv) - Vec.dot(n, g)) - Vec.dot(n, fApp);
        double[] tn = new double[3];
        Vec.cross(tau, n, tn);
        double[] whv = new double[3];
        Vec.cross(w, hv, whv);
        double[] ft = new double[3];
        for (int i = 0; i < 3; i++) {
            ft[i] = tn[i] / (k * M * R) + R * whv[i] - g[i] - fApp[i] / M;
        }
        double ftn = Vec.dot(ft, n);
        double scale = M * G;
        for (int i = 0; i < 3; i++) {
            double expected = k * M / (1 + k) * (ft[i] - ftn * n[i]) + fn * n[i];
            assertEquals(expected, s.force(0)[i], 1e-12 * scale, "component " + i);
        }
        // sliding: same normal force with the actual velocity
        double[] vs = {v[0] + 0.3, v[1] - 0.2, v[2]};
        double vn = Vec.dot(vs, n);
        for (int i = 0; i < 3; i++) {
            vs[i] -= vn * n[i];
        }
        double[] slip = new double[3];
        ContactKinematics.slip(R, vs, 0, w, 0, n, slip);
        Vec.scale(slip, 1.0 / Vec.norm(slip));
        s.clear();
        s.addSliding(n, h, 0.3, slip);
        assertTrue(s.solve(vs, w, g, fApp, tau));
        Vec.mulSym(h, vs, hv);
        double fnSlide = M * (-Vec.dot(vs, hv) - Vec.dot(n, g)) - Vec.dot(n, fApp);
        assertEquals(fnSlide, s.normalForce(0), 1e-12 * scale);
        assertEquals(0.3 * Math.abs(fnSlide), s.tangentialForce(0), 1e-12 * scale);
    }

    /**
     * A ball pinched at rest between two parallel walls that stand still, gravity along the walls: rolling
     * on both facing walls locks the ball ({@code v = 0}, spin only about the normal), so {@code a = 0} and
     * the walls carry the weight by friction, half each (moment balance about the centre); the squeeze is
     * invisible to the tangential weight and the plain minimum norm sets it to zero (statics; common practice).
     */
    @Test
    void pinchedBallIsHeldByFrictionHalfEach() {
        ContactForceSolver s = new ContactForceSolver(R, M, 0.4);
        double[] h = new double[9];
        s.addRolling(new double[] {0, 1, 0}, h);
        s.addRolling(new double[] {0, -1, 0}, h);
        assertTrue(s.solve(new double[3], new double[3], new double[] {0, 0, -G}, new double[3], new double[3]));
        assertEquals(0, Vec.norm(s.acceleration()), 1e-12 * G);
        assertEquals(M * G / 2, s.force(0)[2], 1e-12 * M * G);
        assertEquals(M * G / 2, s.force(1)[2], 1e-12 * M * G);
        assertEquals(0, s.normalForce(0), 1e-12 * M * G);
        assertEquals(0, s.normalForce(1), 1e-12 * M * G);
    }

    /**
     * The closed form of two rolling contacts on still patches ({@link RollingPair}, what {@code solve} takes)
     * against the general linear system ({@code solveGeneral}: EJML LU with the squeeze rows) on seeded random
     * geometry: normals 10° to 170° apart, random symmetric distance Hessians (|H| up to 100 1/m, i.e.
     * curvature radii down to about the ball's), random spin, gravity, applied force and couple; in half the
     * cases the state is on the constraint manifold ({@code ω} along the chord, {@code v = r ω × n₁}), in the
     * other half it is not (random {@code v}, {@code ω}: the general solver's answer off the manifold is
     * reproduced too). Forces, accelerations, normal and tangential forces agree to 1e-12 of their scale: both
     * are exact up to rounding (the worst force difference of the 200 cases is 2e-14 of the scale, the LU's
     * rounding), so 1e-12 leaves a margin of fifty while any wrong term shows at order one (dropping the
     * off-manifold term ρ fails every second case).
     */
    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void twoRollingContactsClosedFormMatchesTheGeneralSolve(long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double k = 0.2 + 0.47 * rnd.nextDouble();
        double[][] normals = RollingPairTest.normals(rnd);
        double[] n1 = normals[0];
        double[] n2 = normals[1];
        double[] h1 = symmetric(rnd, 100);
        double[] h2 = symmetric(rnd, 100);
        double[] w;
        double[] v = new double[3];
        if (seed % 2 == 0) {
            double[] chord = {n1[0] - n2[0], n1[1] - n2[1], n1[2] - n2[2]};
            double spin = 40 * rnd.nextDouble() - 20;
            Vec.scale(chord, spin / Vec.norm(chord));
            w = chord;
            ContactKinematics.noSlipVelocity(R, w[0], w[1], w[2], n1, v, 0);
        } else {
            w = new double[] {rnd.nextDouble() * 40 - 20, rnd.nextDouble() * 40 - 20, rnd.nextDouble() * 40 - 20};
            v = new double[] {rnd.nextDouble() - 0.5, rnd.nextDouble() - 0.5, rnd.nextDouble() - 0.5};
        }
        double[] g = {rnd.nextDouble() * 4 - 2, rnd.nextDouble() * 4 - 2, -G};
        double[] fApp = {0.2 * rnd.nextDouble() - 0.1, 0.2 * rnd.nextDouble() - 0.1, 0.2 * rnd.nextDouble() - 0.1};
        double[] tau = {1e-3 * rnd.nextDouble(), -2e-3 * rnd.nextDouble(), 1e-3 * (rnd.nextDouble() - 0.5)};
        ContactForceSolver closed = new ContactForceSolver(R, M, k);
        ContactForceSolver general = new ContactForceSolver(R, M, k);
        for (ContactForceSolver s : new ContactForceSolver[] {closed, general}) {
            s.addRolling(n1, h1);
            s.addRolling(n2, h2);
        }
        assertTrue(closed.solve(v, w, g, fApp, tau));
        assertTrue(general.solveGeneral(v, w, g, fApp, tau));
        assertSameSolution(general, closed, 2, 1e-12);
    }

    /**
     * Every contact sliding: the closed form ({@code solveSliding}, Cramer's rule on the normal forces, what
     * {@code solve} takes) against the general linear system ({@code solveGeneral}) on seeded random geometry: two
     * contacts for odd seeds, three for even ones; random unit normals (kept at least 10° from parallel or
     * antipodal to each other), tangential slip directions, friction ratios 0 to 1, random Hessians (|H| up to
     * 100 1/m), state, gravity, applied force and couple; a third of the contacts on a "moving patch" with a given
     * normal right-hand side. Both are exact up to rounding (the general system carries the same equations plus
     * identity rows), so forces and accelerations agree to 1e-12 of their scale unless the system is
     * ill-conditioned, which the closed form then leaves to the general system (same answer, checked bit for
     * bit). A wrong sign or a dropped term shows at order one.
     */
    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void slidingContactsClosedFormMatchesTheGeneralSolve(long seed) {
        SplittableRandom rnd = new SplittableRandom(seed * 7919 + 3);
        double k = 0.2 + 0.47 * rnd.nextDouble();
        int count = seed % 2 == 0 ? 3 : 2;
        double[][] n = new double[count][];
        for (int i = 0; i < count; i++) {
            double[] c;
            boolean apart;
            do {
                c = unitVector(rnd);
                apart = true;
                for (int j = 0; j < i; j++) {
                    apart &= Math.abs(Vec.dot(c, n[j])) < Math.cos(Math.toRadians(10));
                }
            } while (!apart);
            n[i] = c;
        }
        double[][] load = randomState(rnd);
        double[] w = load[0];
        double[] v = load[1];
        double[] g = load[2];
        double[] fApp = load[3];
        double[] tau = load[4];
        ContactForceSolver closed = new ContactForceSolver(R, M, k);
        ContactForceSolver general = new ContactForceSolver(R, M, k);
        for (int i = 0; i < count; i++) {
            double[] t = unitVector(rnd);
            double along = Vec.dot(t, n[i]);
            double[] slip = {t[0] - along * n[i][0], t[1] - along * n[i][1], t[2] - along * n[i][2]};
            Vec.scale(slip, 1 / Vec.norm(slip));
            double[] h = symmetric(rnd, 100);
            double mu = rnd.nextDouble();
            boolean moving = rnd.nextInt(3) == 0;
            double betaN = 5 * (rnd.nextDouble() - 0.5);
            for (ContactForceSolver s : new ContactForceSolver[] {closed, general}) {
                if (moving) {
                    s.addSliding(n[i], h, mu, slip, betaN);
                } else {
                    s.addSliding(n[i], h, mu, slip);
                }
            }
        }
        assertEquals(general.solveGeneral(v, w, g, fApp, tau), closed.solve(v, w, g, fApp, tau));
        assertSameSolution(general, closed, count, 1e-12);
    }

    /**
     * A groove on a slope whose minus wall grips (rolling) and whose plus wall slides with friction ratio μ, the
     * ball moving down at {@code v} with the spin of rolling about its minus contact alone,
     * {@code ω = (v/r) n₁ × x̂} (no spin about that wall's normal). The plus wall then slips along the groove,
     * {@code s = v (1 − c) x̂} ({@code c = n₁·n₂}), so its friction is {@code −μ N₂ x̂}. Newton–Euler (common
     * practice; derived here): the centre stays in the groove and the spin about the groove's axis cannot change,
     * so the minus wall's force in the cross-section is normal and both walls carry
     * {@code N = m g cosθ/(2 sin γ)}; about the rolling axis through the minus contact, the plus wall's friction
     * has the lever {@code r (1 − c)}, so {@code (1 + k) m a = m g sinθ − μ N (1 − c)}, and the minus wall needs
     * the friction {@code μ N c − k m a} along the groove. Exact to rounding: 1e-12 of the scales.
     */
    @Test
    void grooveWithOneSlidingWallFollowsNewtonEuler() {
        double theta = Math.toRadians(25);
        double gamma = Math.toRadians(40);
        double mu = 0.3;
        double k = 0.4;
        double speed = 0.7;
        double[][] n = grooveNormals(gamma);
        double[] n1 = n[0];
        double[] n2 = n[1];
        double[] w = new double[3];
        Vec.cross(n1, new double[] {1, 0, 0}, w);
        Vec.scale(w, speed / R);
        double[] v = {speed, 0, 0};
        ContactForceSolver s = new ContactForceSolver(R, M, k);
        s.addRolling(n1, new double[9]);
        s.addSliding(n2, new double[9], mu, new double[] {1, 0, 0});
        assertTrue(s.solve(v, w, gravity(theta), new double[3], new double[3]));
        double c = Vec.dot(n1, n2);
        double nf = M * G * Math.cos(theta) / (2 * Math.sin(gamma));
        double a = (M * G * Math.sin(theta) - mu * nf * (1 - c)) / ((1 + k) * M);
        assertEquals(a, s.acceleration()[0], 1e-12 * G);
        assertEquals(0.0, s.acceleration()[1], 1e-12 * G);
        assertEquals(0.0, s.acceleration()[2], 1e-12 * G);
        assertEquals(nf, s.normalForce(0), 1e-12 * nf);
        assertEquals(nf, s.normalForce(1), 1e-12 * nf);
        assertEquals(mu * nf * c - k * M * a, s.force(0)[0], 1e-12 * nf);
        assertEquals(Math.abs(mu * nf * c - k * M * a), s.tangentialForce(0), 1e-12 * nf);
        assertEquals(-mu * nf, s.force(1)[0], 1e-12 * nf);
        // the spin about the groove's axis does not change; the rolling axis n₁ × x̂ turns at a/r
        assertEquals(0.0, s.angularAcceleration()[0], 1e-12 * G / R);
        double[] axis = new double[3];
        Vec.cross(n1, new double[] {1, 0, 0}, axis);
        assertEquals(a / R, Vec.dot(s.angularAcceleration(), axis), 1e-12 * G / R);
    }

    /**
     * One rolling and one sliding contact: the closed form ({@link RollingSlidingPair}, what {@code solve} takes)
     * against the general linear system ({@code solveGeneral}) on seeded random geometry: random unit normals at
     * least 10° from parallel or antipodal, the rolling contact first for odd seeds and second for even ones, a
     * tangential slip direction, friction ratio 0 to 1.5, random Hessians (|H| up to 100 1/m), state off the
     * constraint manifold, gravity, applied force and couple; a third of the contacts on a "moving patch" with a
     * given right-hand side. There is no squeeze mode (one rolling contact), so both are exact up to rounding and
     * agree to 1e-12 of the force and acceleration scales, except near the friction paradox where {@code D}
     * of {@link RollingSlidingPair} is small and both lose digits: there the tolerance is divided by
     * {@code |D|/|u|} (the system's conditioning; the closed form declines, to the general system bit for bit,
     * below 1e-8). Measured: the worst difference of the 200 cases is 2.6e-14 of the scale (at {@code |D|/|u|} =
     * 0.0097, the smallest of the sample 0.0089), and the difference times {@code |D|/|u|} at most 8.5e-16, so the
     * tolerance leaves a margin of over a thousand. A wrong term shows at order one: flipping the sign of the
     * couple's lever in {@code a⁰}, dropping {@code (n₁·u)(n₂ − n₁)} from {@code a¹}, or dropping the couple from
     * the rolling contact's tangential force each fails all 200 seeds.
     */
    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void rollingAndSlidingClosedFormMatchesTheGeneralSolve(long seed) {
        SplittableRandom rnd = new SplittableRandom(seed * 104729 + 11);
        double k = 0.2 + 0.47 * rnd.nextDouble();
        double[] nRoll = unitVector(rnd);
        double[] nSlide;
        do {
            nSlide = unitVector(rnd);
        } while (!(Math.abs(Vec.dot(nRoll, nSlide)) < Math.cos(Math.toRadians(10))));
        double[] t = unitVector(rnd);
        double along = Vec.dot(t, nSlide);
        double[] slip = {t[0] - along * nSlide[0], t[1] - along * nSlide[1], t[2] - along * nSlide[2]};
        Vec.scale(slip, 1 / Vec.norm(slip));
        double mu = 1.5 * rnd.nextDouble();
        double[] hRoll = symmetric(rnd, 100);
        double[] hSlide = symmetric(rnd, 100);
        boolean movingRoll = rnd.nextInt(3) == 0;
        boolean movingSlide = rnd.nextInt(3) == 0;
        double[] betaRoll = {5 * (rnd.nextDouble() - 0.5), 5 * (rnd.nextDouble() - 0.5), 5 * (rnd.nextDouble() - 0.5)};
        double betaN = 5 * (rnd.nextDouble() - 0.5);
        double[][] load = randomState(rnd);
        double[] w = load[0];
        double[] v = load[1];
        double[] g = load[2];
        double[] fApp = load[3];
        double[] tau = load[4];
        ContactForceSolver closed = new ContactForceSolver(R, M, k);
        ContactForceSolver general = new ContactForceSolver(R, M, k);
        boolean rollFirst = seed % 2 == 1;
        for (ContactForceSolver s : new ContactForceSolver[] {closed, general}) {
            for (int pos = 0; pos < 2; pos++) {
                if ((pos == 0) == rollFirst) {
                    if (movingRoll) {
                        s.addRolling(nRoll, hRoll, betaRoll);
                    } else {
                        s.addRolling(nRoll, hRoll);
                    }
                } else if (movingSlide) {
                    s.addSliding(nSlide, hSlide, mu, slip, betaN);
                } else {
                    s.addSliding(nSlide, hSlide, mu, slip);
                }
            }
        }
        assertEquals(general.solveGeneral(v, w, g, fApp, tau), closed.solve(v, w, g, fApp, tau));
        // the conditioning of the one scalar equation: |D|/|u| of RollingSlidingPair
        double[] u = {nSlide[0] - mu * slip[0], nSlide[1] - mu * slip[1], nSlide[2] - mu * slip[2]};
        double[] sum = {nRoll[0] + nSlide[0], nRoll[1] + nSlide[1], nRoll[2] + nSlide[2]};
        double cond = Math.min(1.0, Math.abs((1 - Vec.dot(nRoll, nSlide)) * Vec.dot(sum, u)) / Vec.norm(u));
        assertSameSolution(general, closed, 2, 1e-12 / cond);
    }

    /**
     * A ball at the friction paradox of one rolling and one sliding contact ({@code (1 + c) = μ ŝ·n₁}, so
     * {@code D = 0} in {@link RollingSlidingPair}): the closed form declines and the general system decides, bit
     * for bit the same as calling it directly; the same geometry with less friction is taken by the closed form.
     */
    @Test
    void rollingAndSlidingAtTheFrictionParadoxAreLeftToTheGeneralSolve() {
        double[] n1 = {0, 0, 1};
        double[] n2 = {1, 0, 0};
        double[] slip = {0, 0, 1};
        // (n₁ + n₂)·u = 1 − μ ŝ·n₁ vanishes at μ = 1
        double[] v = {0, 0.1, 0};
        for (double mu : new double[] {1.0, 0.3}) {
            ContactForceSolver closed = new ContactForceSolver(R, M, 0.4);
            ContactForceSolver general = new ContactForceSolver(R, M, 0.4);
            for (ContactForceSolver s : new ContactForceSolver[] {closed, general}) {
                s.addRolling(n1, new double[9]);
                s.addSliding(n2, new double[9], mu, slip);
            }
            double[] acc = new double[3];
            double[] f = new double[3];
            boolean taken = new RollingSlidingPair(R, M, 0.4 * M * R * R).solve(n1, new double[3], n2, 0, mu, slip,
                gravity(0.3), new double[3], new double[3], acc, acc.clone(), f, f.clone());
            assertEquals(mu < 1, taken);
            assertEquals(general.solveGeneral(v, new double[3], gravity(0.3), new double[3], new double[3]),
                closed.solve(v, new double[3], gravity(0.3), new double[3], new double[3]));
            for (int i = 0; i < 2; i++) {
                double tol = mu < 1 ? 1e-12 * M * G : 0.0;
                assertEquals(general.normalForce(i), closed.normalForce(i), tol);
                for (int c = 0; c < 3; c++) {
                    assertEquals(general.force(i)[c], closed.force(i)[c], tol);
                }
            }
        }
    }

    /**
     * Two sliding contacts pressing along one line (antipodal normals, a ball pinched between two parallel walls):
     * the closed form's determinant vanishes, so it declines and the general system's minimum-norm forces decide,
     * bit for bit the same as calling that system directly.
     */
    @Test
    void antipodalSlidingContactsAreLeftToTheGeneralSolve() {
        double[] n1 = {0, 0, 1};
        double[] n2 = {0, 0, -1};
        double[] slip = {1, 0, 0};
        ContactForceSolver closed = new ContactForceSolver(R, M, 0.4);
        ContactForceSolver general = new ContactForceSolver(R, M, 0.4);
        for (ContactForceSolver s : new ContactForceSolver[] {closed, general}) {
            s.addSliding(n1, new double[9], 0.3, slip);
            s.addSliding(n2, new double[9], 0.3, slip);
        }
        double[] v = {0.2, 0, 0};
        assertEquals(general.solveGeneral(v, new double[3], gravity(0.3), new double[3], new double[3]),
            closed.solve(v, new double[3], gravity(0.3), new double[3], new double[3]));
        for (int i = 0; i < 2; i++) {
            assertEquals(general.normalForce(i), closed.normalForce(i), 0.0);
            for (int c = 0; c < 3; c++) {
                assertEquals(general.acceleration()[c], closed.acceleration()[c], 0.0);
            }
        }
    }

    /**
     * The closed form's forces (each contact's components, normal and tangential parts) agree with the general
     * system's to {@code tol} times the force scale (the largest force, at least m g), and the accelerations to
     * {@code tol} times {@code |a| + r|α| + g} (α over r).
     */
    private static void assertSameSolution(ContactForceSolver general, ContactForceSolver closed, int count,
                                           double tol) {
        double fScale = M * G;
        for (int i = 0; i < count; i++) {
            fScale = Math.max(fScale, Vec.norm(general.force(i)));
        }
        for (int i = 0; i < count; i++) {
            for (int c = 0; c < 3; c++) {
                assertEquals(general.force(i)[c], closed.force(i)[c], tol * fScale, "force " + i + " component " + c);
            }
            assertEquals(general.normalForce(i), closed.normalForce(i), tol * fScale, "normal force " + i);
            assertEquals(general.tangentialForce(i), closed.tangentialForce(i), tol * fScale, "tangential " + i);
        }
        double aScale = Vec.norm(general.acceleration()) + R * Vec.norm(general.angularAcceleration()) + G;
        for (int c = 0; c < 3; c++) {
            assertEquals(general.acceleration()[c], closed.acceleration()[c], tol * aScale, "a " + c);
            assertEquals(general.angularAcceleration()[c], closed.angularAcceleration()[c], tol * aScale / R,
                "alpha " + c);
        }
    }

    /**
     * A random state and load off the constraint manifold, drawn in this order: spin ω (±20 rad/s), velocity v
     * (±0.5 m/s), gravity (±2 m/s² sideways, −g down), applied force (±0.1 N) and couple (up to 2e-3 N·m).
     */
    private static double[][] randomState(SplittableRandom rnd) {
        double[] w = {rnd.nextDouble() * 40 - 20, rnd.nextDouble() * 40 - 20, rnd.nextDouble() * 40 - 20};
        double[] v = {rnd.nextDouble() - 0.5, rnd.nextDouble() - 0.5, rnd.nextDouble() - 0.5};
        double[] g = {rnd.nextDouble() * 4 - 2, rnd.nextDouble() * 4 - 2, -G};
        double[] fApp = {0.2 * rnd.nextDouble() - 0.1, 0.2 * rnd.nextDouble() - 0.1, 0.2 * rnd.nextDouble() - 0.1};
        double[] tau = {1e-3 * rnd.nextDouble(), -2e-3 * rnd.nextDouble(), 1e-3 * (rnd.nextDouble() - 0.5)};
        return new double[][] {w, v, g, fApp, tau};
    }

    static java.util.stream.LongStream seeds() {
        return java.util.stream.LongStream.rangeClosed(1, 200);
    }

    /** Nearly parallel and antipodal normals are left to the general solver (same answer as it). */
    @ParameterizedTest
    @ValueSource(doubles = {1.0, 179.0})
    void degenerateNormalsFallBackToTheGeneralSolve(double degrees) {
        double a = Math.toRadians(degrees);
        double[] n1 = {0, 0, 1};
        double[] n2 = {0, Math.sin(a), Math.cos(a)};
        double[] h = new double[9];
        double[] acc = new double[3];
        double[] f = new double[3];
        assertTrue(!new RollingPair(R, M, 0.4 * M * R * R).solve(n1, h, n2, h, new double[3], new double[3],
            gravity(0.1), new double[3], new double[3], acc, acc.clone(), f, f.clone()));
        ContactForceSolver closed = new ContactForceSolver(R, M, 0.4);
        ContactForceSolver general = new ContactForceSolver(R, M, 0.4);
        for (ContactForceSolver s : new ContactForceSolver[] {closed, general}) {
            s.addRolling(n1, h);
            s.addRolling(n2, h);
        }
        assertEquals(general.solveGeneral(new double[3], new double[3], gravity(0.1), new double[3], new double[3]),
            closed.solve(new double[3], new double[3], gravity(0.1), new double[3], new double[3]));
        for (int i = 0; i < 2; i++) {
            for (int c = 0; c < 3; c++) {
                assertEquals(general.force(i)[c], closed.force(i)[c], 0.0);
            }
        }
    }

    private static double[] symmetric(SplittableRandom rnd, double size) {
        double[] h = new double[9];
        for (int i = 0; i < 3; i++) {
            for (int j = i; j < 3; j++) {
                h[3 * i + j] = size * (rnd.nextDouble() - 0.5);
                h[3 * j + i] = h[3 * i + j];
            }
        }
        return h;
    }

    private static ContactForceSolver vGroove(double k, double gamma) {
        double[][] n = grooveNormals(gamma);
        ContactForceSolver s = new ContactForceSolver(R, M, k);
        s.addRolling(n[0], new double[9]);
        s.addRolling(n[1], new double[9]);
        return s;
    }

    /** Inward normals of a groove along x with walls at half-angle γ from the slope normal z. */
    private static double[][] grooveNormals(double gamma) {
        return new double[][] {{0, -Math.cos(gamma), Math.sin(gamma)}, {0, Math.cos(gamma), Math.sin(gamma)}};
    }

    private static double[] unitVector(SplittableRandom rnd) {
        double[] u = {rnd.nextGaussian(), rnd.nextGaussian(), rnd.nextGaussian()};
        Vec.scale(u, 1.0 / Vec.norm(u));
        return u;
    }
}
