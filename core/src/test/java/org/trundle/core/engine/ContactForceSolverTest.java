package org.trundle.core.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
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
