package org.trundle.surfaces;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import org.hipparchus.CalculusFieldElement;
import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Phase;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.core.Surface;

/**
 * Seeded property tests of pure rolling on every surface: mechanical energy is conserved (relative
 * to {@code E_scale}, see {@link org.trundle.core.EnergyBudget#relativeResidual()}), and the linear
 * rolling integrals of the symmetric surfaces stay constant (Routh's integrals; A. V. Borisov,
 * I. S. Mamaev, A. A. Kilin, "Rolling of a ball on a surface. New integrals and hierarchy of
 * dynamics", Regular and Chaotic Dynamics 7 (2002) 201):
 * <ul>
 *   <li>plane: {@code ω·n};</li>
 *   <li>cone, vertical axis: {@code h = ρ² φ'} and {@code ω·n + (n·e_ρ) h/(r ρ sin α)};</li>
 *   <li>sphere: {@code ω·e} and {@code e_z·[(I + m r²) ω − m r² (ω·e) e]}; with zero gravity the
 *       whole vector;</li>
 *   <li>torus (vertical axis): {@code (ω·n, h)} follow the linear system
 *       {@code d(ω·n)/ds = −h (ρ κ₁ + z')/(r ρ²)}, {@code dh/ds = k r ρ κ₁ (ω·n)/(1+k)} in the arc
 *       length {@code s} of the centre's meridian (integrated here by RK4 along the sampled path).</li>
 * </ul>
 */
class RollingIntegralsTest {
    static final long SEED = 5150L;
    static final int CASES = 4;
    static final double G = 9.81;

    static Stream<Arguments> cases() {
        return Stream.of("plane", "sphereIn", "sphereOut", "sphereZeroG", "coneIn", "coneOut", "torusIn", "torusOut",
            "placedCylinder", "ellipticTube", "revolutionCup", "helixTube", "openChute").flatMap(k -> IntStream.range(0, CASES).mapToObj(i -> Arguments.of(k, SEED, i)));
    }

    /** Everything one case needs. */
    static final class Setup {
        Surface surface;
        Vector3D gravity = new Vector3D(0, 0, -G);
        Vector3D near;
        Vector3D velocity;
        double normalSpin;
        double duration = 0.5;
        double alpha;
        double bigR;
        double tubeRadius;
    }

    static Setup setup(String kind, SplittableRandom rnd, double r) {
        Setup s = new Setup();
        double az = rnd.nextDouble(-Math.PI, Math.PI);
        Vector3D er = new Vector3D(Math.cos(az), Math.sin(az), 0);
        Vector3D ef = new Vector3D(-Math.sin(az), Math.cos(az), 0);
        s.normalSpin = rnd.nextDouble(-40, 40);
        switch (kind) {
            case "plane": {
                Vector3D n = new Vector3D(rnd.nextDouble(-0.3, 0.3), rnd.nextDouble(-0.3, 0.3), 1).normalize();
                s.surface = new Plane(Vector3D.ZERO, n);
                s.near = Vector3D.ZERO;
                s.velocity = new Vector3D(rnd.nextDouble(-1, 1), rnd.nextDouble(-1, 1), 0);
                break;
            }
            case "sphereIn":
            case "sphereZeroG": {
                s.bigR = 0.3;
                s.surface = new Sphere(new Vector3D(0, 0, s.bigR), s.bigR, Side.INSIDE);
                double th = rnd.nextDouble(0, 0.8);
                s.near = new Vector3D(0, 0, s.bigR).add(s.bigR, er.scalarMultiply(Math.sin(th)).add(new Vector3D(0, 0, -Math.cos(th))));
                s.velocity = ef.scalarMultiply(rnd.nextDouble(-0.6, 0.6)).add(er.scalarMultiply(rnd.nextDouble(-0.3, 0.3)));
                if (kind.equals("sphereZeroG")) {
                    s.gravity = Vector3D.ZERO;
                }
                break;
            }
            case "sphereOut": {
                s.bigR = 0.3;
                s.surface = new Sphere(Vector3D.ZERO, s.bigR, Side.OUTSIDE);
                double th = rnd.nextDouble(0.05, 0.3);
                s.near = er.scalarMultiply(s.bigR * Math.sin(th)).add(new Vector3D(0, 0, s.bigR * Math.cos(th)));
                s.velocity = ef.scalarMultiply(rnd.nextDouble(-0.3, 0.3));
                s.duration = 0.3;
                break;
            }
            case "coneIn": {
                s.alpha = rnd.nextDouble(0.4, 1.0);
                s.surface = new Cone(Vector3D.ZERO, Vector3D.PLUS_K, s.alpha, Side.INSIDE, 0.02, 10);
                double t = rnd.nextDouble(0.1, 0.2);
                s.near = er.scalarMultiply(t * Math.sin(s.alpha)).add(new Vector3D(0, 0, t * Math.cos(s.alpha)));
                double orbit = Math.sqrt(G / Math.tan(s.alpha) * t * Math.sin(s.alpha) / 1.4);
                s.velocity = ef.scalarMultiply(orbit * rnd.nextDouble(0.8, 1.2))
                    .add(rnd.nextDouble(-0.1, 0.1), new Vector3D(Math.sin(s.alpha), er).add(Math.cos(s.alpha), Vector3D.PLUS_K));
                break;
            }
            case "coneOut": {
                s.alpha = rnd.nextDouble(0.6, 1.2);
                s.surface = new Cone(new Vector3D(0, 0, 0.3), Vector3D.MINUS_K, s.alpha, Side.OUTSIDE, 0.02, 10);
                double t = rnd.nextDouble(0.05, 0.1);
                s.near = new Vector3D(0, 0, 0.3).add(er.scalarMultiply(t * Math.sin(s.alpha))).add(-t * Math.cos(s.alpha), Vector3D.PLUS_K);
                s.velocity = ef.scalarMultiply(rnd.nextDouble(-0.2, 0.2));
                s.duration = 0.3;
                break;
            }
            case "torusIn":
            case "torusOut": {
                s.bigR = 0.2;
                s.tubeRadius = 0.04;
                boolean in = kind.equals("torusIn");
                s.surface = new Torus(Vector3D.ZERO, Vector3D.PLUS_K, s.bigR, s.tubeRadius, in ? Side.INSIDE : Side.OUTSIDE);
                double psi = (in ? -0.5 * Math.PI : 0.5 * Math.PI) + rnd.nextDouble(-0.4, 0.4);
                s.near = er.scalarMultiply(s.bigR + s.tubeRadius * Math.cos(psi)).add(s.tubeRadius * Math.sin(psi), Vector3D.PLUS_K);
                s.velocity = ef.scalarMultiply(in ? rnd.nextDouble(-0.8, 0.8) : rnd.nextDouble(-0.2, 0.2))
                    .add(rnd.nextDouble(-0.1, 0.1), Vector3D.PLUS_K);
                s.duration = in ? 0.5 : 0.15;
                break;
            }
            case "placedCylinder": {
                Rotation q = new Rotation(Vector3D.PLUS_I, 0.5 * Math.PI + rnd.nextDouble(-0.2, 0.2), RotationConvention.VECTOR_OPERATOR);
                s.surface = new Placed(new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, 0.05, Side.INSIDE), q, new Vector3D(0, 0, 0.05));
                s.near = new Vector3D(rnd.nextDouble(-0.01, 0.01), 0, 0);
                s.velocity = new Vector3D(rnd.nextDouble(-0.5, 0.5), rnd.nextDouble(-0.5, 0.5), 0);
                break;
            }
            case "revolutionCup": {
                // an invented flared cup, axis vertical
                s.surface = new SurfaceOfRevolution(Vector3D.ZERO, Vector3D.PLUS_K, new double[] {0, 0.02, 0.05, 0.08, 0.1},
                    new double[] {0.03, 0.032, 0.04, 0.055, 0.07}, Side.INSIDE);
                s.near = er.scalarMultiply(0.04).add(0.05, Vector3D.PLUS_K);
                s.velocity = ef.scalarMultiply(rnd.nextDouble(0.5, 0.9)).add(rnd.nextDouble(-0.1, 0.1), Vector3D.PLUS_K);
                s.duration = 0.3;
                break;
            }
            case "helixTube":
            case "openChute": {
                // an invented helical chute: radius 0.2 m, pitch 0.15 m, tube radius 0.02 m
                Vector3D[] pts = new Vector3D[25];
                for (int i = 0; i < pts.length; i++) {
                    double th = i * Math.PI / 6;
                    pts[i] = new Vector3D(0.2 * Math.cos(th), 0.2 * Math.sin(th), 0.15 * th / (2 * Math.PI));
                }
                double th = rnd.nextDouble(6.0, 8.0);
                Vector3D c = new Vector3D(0.2 * Math.cos(th), 0.2 * Math.sin(th), 0.15 * th / (2 * Math.PI));
                Vector3D tangent = new Vector3D(-0.2 * Math.sin(th), 0.2 * Math.cos(th), 0.15 / (2 * Math.PI)).normalize();
                if (kind.equals("helixTube")) {
                    s.surface = new SplineTube(pts, 0.02, Side.INSIDE);
                } else {
                    double[] radii = new double[pts.length];
                    java.util.Arrays.fill(radii, 0.02);
                    s.surface = new SplineTube(pts, radii, Side.INSIDE, Vector3D.MINUS_K, -0.5 * Math.PI, 0.5 * Math.PI);
                }
                s.near = c.add(0.02, new Vector3D(0, 0, -1).subtract(-tangent.getZ(), tangent).normalize());
                s.velocity = tangent.scalarMultiply(-rnd.nextDouble(0.3, 0.8));
                s.duration = 0.3;
                break;
            }
            default: {
                ImplicitFunction f = new ImplicitFunction() {
                    @Override
                    public <T extends CalculusFieldElement<T>> T value(T x, T y, T z) {
                        return x.divide(0.03).square().add(y.divide(0.02).square()).subtract(1.0);
                    }
                };
                s.surface = ImplicitSurface.of(f).label("elliptic tube 0.03 x 0.02 m").side(Side.INSIDE).lengthScale(0.02).maxConcaveCurvature(0.03 / (0.02 * 0.02)).build();
                s.near = new Vector3D(0.03 * Math.cos(az), 0.02 * Math.sin(az), 0);
                s.velocity = new Vector3D(-0.03 * Math.sin(az), 0.02 * Math.cos(az), 0).normalize().scalarMultiply(rnd.nextDouble(0.4, 0.8));
                s.duration = 0.2;
                break;
            }
        }
        return s;
    }

    @ParameterizedTest(name = "{0} seed={1} case={2}")
    @MethodSource("cases")
    void energyAndRollingIntegrals(String kind, long seed, int index) {
        SplittableRandom rnd = new SplittableRandom(seed * 31 + index * 1009L + kind.hashCode());
        double r = kind.equals("ellipticTube") ? 0.005 : 0.01;
        double k = rnd.nextBoolean() ? 0.4 : 2.0 / 3.0;
        Ball ball = Ball.of(r, 0.02, k);
        Setup s = setup(kind, rnd, r);
        Simulation sim = Simulation.builder().ball(ball).surface(s.surface).law(new PureRolling()).gravity(s.gravity)
            .settings(SolverSettings.defaults().withSampleInterval(1e-3)).build();
        ContactGeometry g0 = sim.geometryAt(s.near, 0);
        Vector3D n0 = new Vector3D(g0.normal[0], g0.normal[1], g0.normal[2]);
        Vector3D centre = new Vector3D(g0.point[0], g0.point[1], g0.point[2]).add(r, n0);
        Vector3D v = s.velocity.subtract(s.velocity.dotProduct(n0), n0);
        BallState start = sim.rollingStart(centre, v, s.normalSpin);
        List<Sample> samples = new ArrayList<>();
        RunResult res = sim.run(start, s.duration, samples::add);
        double e = res.energy().relativeResidual();
        assertTrue(e < 1e-8, kind + ": energy residual " + e + " " + res.energy());
        List<double[]> rows = new ArrayList<>();
        ContactGeometry g = new ContactGeometry();
        g.scratch = s.surface.newScratch();
        for (Sample sm : samples) {
            if (sm.state().phase() != Phase.ROLLING) {
                continue;
            }
            Vector3D c = sm.state().centre();
            s.surface.query(sm.time(), c.toArray(), g);
            Vector3D n = new Vector3D(g.normal[0], g.normal[1], g.normal[2]);
            Vector3D w = sm.state().spin();
            Vector3D cv = sm.state().velocity();
            double rho = Math.hypot(c.getX(), c.getY());
            double h = c.getX() * cv.getY() - c.getY() * cv.getX();
            double wn = w.dotProduct(n);
            switch (kind) {
                case "plane":
                    rows.add(new double[] {wn});
                    break;
                case "coneIn":
                case "coneOut": {
                    Vector3D erc = new Vector3D(c.getX() / rho, c.getY() / rho, 0);
                    rows.add(new double[] {h, wn + n.dotProduct(erc) * h / (r * rho * Math.sin(s.alpha))});
                    break;
                }
                case "sphereIn":
                case "sphereOut":
                case "sphereZeroG": {
                    Vector3D sc = ((Sphere) s.surface).centre();
                    Vector3D eu = c.subtract(sc).normalize();
                    double we = w.dotProduct(eu);
                    double inertia = k * r * r;
                    Vector3D m = w.scalarMultiply(inertia + r * r).subtract(r * r * we, eu);
                    if (kind.equals("sphereZeroG")) {
                        rows.add(new double[] {we, m.getX(), m.getY(), m.getZ()});
                    } else {
                        rows.add(new double[] {we, m.getZ()});
                    }
                    break;
                }
                case "torusIn":
                case "torusOut":
                    rows.add(new double[] {wn, h, rho, c.getZ()});
                    break;
                default:
                    break;
            }
        }
        assertTrue(samples.size() > 50, "samples " + samples.size());
        if (rows.isEmpty()) {
            System.out.printf("%s case %d: energy %.2e, end %s%n", kind, index, e, res.endReason());
            return;
        }
        if (kind.startsWith("torus")) {
            checkTorus(kind, index, rows, s, r, k, e, res);
            return;
        }
        double[] first = rows.get(0);
        double[] worst = new double[first.length];
        double[] scale = new double[first.length];
        for (double[] row : rows) {
            for (int i = 0; i < row.length; i++) {
                scale[i] = Math.max(scale[i], Math.abs(row[i]));
            }
        }
        // scales: a spin integral is judged against the largest spin magnitude seen, h against its size
        double spinScale = 0;
        for (Sample sm : samples) {
            spinScale = Math.max(spinScale, sm.state().spin().getNorm());
        }
        for (double[] row : rows) {
            for (int i = 0; i < row.length; i++) {
                double sc = kind.startsWith("cone") && i == 0 ? Math.max(scale[0], 1e-12) : spinScale * (kind.startsWith("sphere") && i > 0 ? (k + 1) * r * r : 1);
                worst[i] = Math.max(worst[i], Math.abs(row[i] - first[i]) / sc);
            }
        }
        double w = 0;
        for (double x : worst) {
            w = Math.max(w, x);
        }
        System.out.printf("%s case %d: energy %.2e, integrals drift %.2e over %d rolling samples, end %s%n",
            kind, index, e, w, rows.size(), res.endReason());
        assertTrue(w < 1e-8, kind + ": rolling integral drift " + java.util.Arrays.toString(worst));
    }

    /** Integrates the torus system in s by RK4 along the sampled path and compares with the run. */
    static void checkTorus(String kind, int index, List<double[]> rows, Setup s, double r, double k, double e, RunResult res) {
        boolean in = kind.equals("torusIn");
        double bp = in ? s.tubeRadius - r : s.tubeRadius + r;
        double sigma = in ? -1 : 1;
        // s = -sigma b' psi, so that n = -z' e_rho + rho' e_z is the normal toward the ball
        double[] y = {rows.get(0)[0], rows.get(0)[1]};
        double psiPrev = Math.atan2(rows.get(0)[3], rows.get(0)[2] - s.bigR);
        double psiUnwrapped = psiPrev;
        double wnScale = 0;
        double hScale = 0;
        for (double[] row : rows) {
            wnScale = Math.max(wnScale, Math.abs(row[0]));
            hScale = Math.max(hScale, Math.abs(row[1]));
        }
        wnScale = Math.max(wnScale, hScale / (r * s.bigR));
        double worst = 0;
        for (int i = 1; i < rows.size(); i++) {
            double psi = Math.atan2(rows.get(i)[3], rows.get(i)[2] - s.bigR);
            double dpsi = Math.IEEEremainder(psi - psiPrev, 2 * Math.PI);
            psiPrev = psi;
            // RK4 in psi from psiUnwrapped to psiUnwrapped + dpsi, 4 sub-steps
            int sub = 4;
            double hstep = dpsi / sub;
            for (int j = 0; j < sub; j++) {
                double p0 = psiUnwrapped + j * hstep;
                double[] k1 = torusRhs(p0, y, s.bigR, bp, sigma, r, k);
                double[] k2 = torusRhs(p0 + 0.5 * hstep, add(y, k1, 0.5 * hstep), s.bigR, bp, sigma, r, k);
                double[] k3 = torusRhs(p0 + 0.5 * hstep, add(y, k2, 0.5 * hstep), s.bigR, bp, sigma, r, k);
                double[] k4 = torusRhs(p0 + hstep, add(y, k3, hstep), s.bigR, bp, sigma, r, k);
                y[0] += hstep / 6 * (k1[0] + 2 * k2[0] + 2 * k3[0] + k4[0]);
                y[1] += hstep / 6 * (k1[1] + 2 * k2[1] + 2 * k3[1] + k4[1]);
            }
            psiUnwrapped += dpsi;
            worst = Math.max(worst, Math.max(Math.abs(y[0] - rows.get(i)[0]) / wnScale, Math.abs(y[1] - rows.get(i)[1]) / hScale));
        }
        System.out.printf("%s case %d: energy %.2e, (w.n, h) vs linear system in s: %.2e over %d samples, final tube angle %.2f rad, end %s%n",
            kind, index, e, worst, rows.size(), psiUnwrapped, res.endReason());
        assertTrue(worst < 1e-8, kind + ": torus rolling system mismatch " + worst);
    }

    static double[] add(double[] y, double[] d, double f) {
        return new double[] {y[0] + f * d[0], y[1] + f * d[1]};
    }

    /** d(ω·n, h)/dψ = ds/dψ · d(ω·n, h)/ds with ds/dψ = −σ b'. */
    static double[] torusRhs(double psi, double[] y, double bigR, double bp, double sigma, double r, double k) {
        double rho = bigR + bp * Math.cos(psi);
        double dsdpsi = -sigma * bp;
        // derivatives w.r.t. s: rho' = -b' sin psi / ds/dpsi, z' = b' cos psi / ds/dpsi
        double zp = bp * Math.cos(psi) / dsdpsi;
        double kappa1 = sigma / bp;
        double dwn = -y[1] * (rho * kappa1 + zp) / (r * rho * rho);
        double dh = k * r * rho * kappa1 * y[0] / (1 + k);
        return new double[] {dwn * dsdpsi, dh * dsdpsi};
    }
}
