package org.trundle.contact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.trundle.core.Ball;
import org.trundle.core.ContactContext;
import org.trundle.core.ContactGeometry;
import org.trundle.core.ContactLaw;
import org.trundle.core.LossKind;
import org.trundle.core.Material;
import org.trundle.core.Phase;

/**
 * Every law of this module against its formula, on a context prepared by hand (no solver): grip
 * limit, sliding friction, couples and the power they book, hold limits, restitution, and the
 * combination with {@code and}. Seeded random contacts ({@link #SEED}) where the formula holds for
 * any contact.
 */
class LawFormulaTest {
    static final long SEED = 0x1aa5_0013L;
    static final int CASES = 40;

    /** One random contact: ball, normal, normal force, slip, relative spin. */
    record Contact(Ball ball, Vector3D normal, double normalForce, Vector3D slip, Vector3D spin) {
        ContactContext context(Phase phase) {
            ContactGeometry g = new ContactGeometry();
            g.normal[0] = normal.getX();
            g.normal[1] = normal.getY();
            g.normal[2] = normal.getZ();
            ContactContext c = new ContactContext();
            c.prepare(ball, g, normalForce, phase, slip.toArray(), spin.toArray());
            return c;
        }

        Vector3D couple(ContactLaw law) {
            ContactContext c = context(Phase.SLIDING);
            law.addCouples(c);
            return new Vector3D(c.couple(0), c.couple(1), c.couple(2));
        }

        double loss(ContactLaw law, LossKind kind) {
            ContactContext c = context(Phase.SLIDING);
            law.addCouples(c);
            return c.lossRate(kind);
        }

        double normalSpin() {
            return Vector3D.dotProduct(spin, normal);
        }

        Vector3D rollingSpin() {
            return spin.subtract(normalSpin(), normal);
        }
    }

    static Stream<Arguments> contacts() {
        return IntStream.range(0, CASES).mapToObj(i -> {
            SplittableRandom rnd = new SplittableRandom(SEED + 7919L * i);
            Ball ball = Ball.of(0.001 + 0.02 * rnd.nextDouble(), 0.001 + rnd.nextDouble(), 0.2 + 0.45 * rnd.nextDouble());
            Vector3D n = new Vector3D(rnd.nextDouble() - 0.5, rnd.nextDouble() - 0.5, rnd.nextDouble() - 0.5).normalize();
            Vector3D t = n.orthogonal();
            Vector3D slip = new Vector3D(rnd.nextDouble() - 0.5, t, rnd.nextDouble() - 0.5, Vector3D.crossProduct(n, t));
            Vector3D spin = new Vector3D(100 * (rnd.nextDouble() - 0.5), 100 * (rnd.nextDouble() - 0.5),
                100 * (rnd.nextDouble() - 0.5));
            double fn = 10 * rnd.nextDouble();
            return Arguments.of("seed=" + SEED + " case=" + i, new Contact(ball, n, fn, slip, spin));
        });
    }

    /** Coulomb (C. A. de Coulomb 1785; any mechanics text): grip μ_s F_n, sliding μ_k F_n, restitution e. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("contacts")
    void coulombLimits(String label, Contact k) {
        Coulomb law = new Coulomb(0.7, 0.45, 0.6);
        ContactContext c = k.context(Phase.SLIDING);
        assertEquals(0.7 * k.normalForce(), law.gripLimit(c), 1e-15 * k.normalForce());
        assertEquals(0.45 * k.normalForce(), law.slidingFriction(c), 1e-15 * k.normalForce());
        assertEquals(0.6, law.restitution().getAsDouble(), 0.0);
        assertEquals(Vector3D.ZERO, k.couple(law));
        assertFalse(addsCouples(law));
    }

    /** Pure rolling: unbounded grip, no sliding force, no couple. */
    @Test
    void pureRollingHasUnboundedGrip() {
        Contact k = new Contact(Ball.solid(0.01, 0.03), Vector3D.PLUS_K, 2, Vector3D.ZERO, new Vector3D(1, 2, 3));
        PureRolling law = new PureRolling(0.3);
        assertEquals(Double.POSITIVE_INFINITY, law.gripLimit(k.context(Phase.ROLLING)), 0.0);
        assertEquals(0.0, law.slidingFriction(k.context(Phase.ROLLING)), 0.0);
        assertEquals(0.3, law.restitution().getAsDouble(), 0.0);
        assertEquals(0.0, new PureRolling().restitution().getAsDouble(), 0.0);
        assertFalse(addsCouples(law));
        assertThrows(IllegalArgumentException.class, () -> new PureRolling(1.5));
    }

    /**
     * Rolling resistance (design notes §5; K. L. Johnson, Contact Mechanics, 1985, ch. 8):
     * {@code τ = −δ F_n ŵ_t}, dissipating {@code δ F_n |w_t|}, booked as rolling resistance; holds a
     * couple up to {@code δ F_n}.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("contacts")
    void rollingResistanceCouple(String label, Contact k) {
        double delta = 1e-4;
        RollingResistance law = new RollingResistance(delta);
        Vector3D wt = k.rollingSpin();
        Vector3D expected = wt.normalize().scalarMultiply(-delta * k.normalForce());
        assertVector(expected, k.couple(law), 1e-13 * (1 + expected.getNorm()));
        assertEquals(delta * k.normalForce() * wt.getNorm(), k.loss(law, LossKind.ROLLING_RESISTANCE),
            1e-12 * (1 + delta * k.normalForce() * wt.getNorm()));
        assertEquals(0.0, k.loss(law, LossKind.PIVOTING_RESISTANCE), 0.0);
        assertEquals(delta * k.normalForce(), law.rollingHoldLimit(k.context(Phase.ROLLING)), 1e-18);
        assertTrue(addsCouples(law));
    }

    /**
     * Pivoting resistance (design notes §5): {@code τ = −δ_p F_n sgn(s) n} outside the smoothing band
     * (here |s| ≫ 1e-3 rad/s, the default smoothing spin), booked as pivoting resistance.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("contacts")
    void pivotingResistanceCouple(String label, Contact k) {
        double dp = 2e-4;
        PivotingResistance law = new PivotingResistance(dp);
        double s = k.normalSpin();
        Vector3D expected = k.normal().scalarMultiply(-dp * k.normalForce() * Math.signum(s));
        assertVector(expected, k.couple(law), 1e-13 * (1 + expected.getNorm()));
        assertEquals(dp * k.normalForce() * Math.abs(s), k.loss(law, LossKind.PIVOTING_RESISTANCE), 1e-12);
        assertEquals(dp * k.normalForce(), law.pivotHoldLimit(k.context(Phase.ROLLING)), 1e-18);
        assertTrue(addsCouples(law));
        // the Hertz full-slip length (3π/16) μ a (Johnson 1985, §5.8)
        assertEquals(3 * Math.PI / 16 * 0.4 * 1e-4, PivotingResistance.hertzLength(0.4, 1e-4), 1e-20);
    }

    /**
     * The banded law {@code M = −min(c_v|s|, δ_p F_n) sgn(s)} (the pivoting law of the spin issue):
     * viscous below the saturation spin {@code s* = δ_p F_n / c_v}, Coulomb above; power
     * {@code min(c_v|s|, δ_p F_n)|s|} booked as pivoting resistance; the pure forms.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("contacts")
    void bandedPivotingCouple(String label, Contact k) {
        double s = k.normalSpin();
        double fn = k.normalForce();
        double dp = 1e-3;
        // saturation placed at half and at twice the spin: both branches are exercised
        for (double factor : new double[] {0.5, 2.0}) {
            double cv = dp * fn / (factor * Math.abs(s));
            BandedPivoting law = BandedPivoting.banded(cv, dp);
            double m = Math.min(cv * Math.abs(s), dp * fn);
            assertEquals(factor < 1 ? dp * fn : cv * Math.abs(s), m, 1e-12 * m);
            Vector3D expected = k.normal().scalarMultiply(-m * Math.signum(s));
            assertVector(expected, k.couple(law), 1e-13 * (1 + m));
            assertEquals(m * Math.abs(s), k.loss(law, LossKind.PIVOTING_RESISTANCE), 1e-12 * (1 + m * Math.abs(s)));
        }
        BandedPivoting viscous = BandedPivoting.viscous(3e-5);
        assertVector(k.normal().scalarMultiply(-3e-5 * s), k.couple(viscous), 1e-16);
        assertEquals(0.0, viscous.pivotHoldLimit(k.context(Phase.ROLLING)), 0.0);
        BandedPivoting coulomb = BandedPivoting.coulomb(dp);
        assertVector(k.couple(new PivotingResistance(dp)), k.couple(coulomb), 0.0);
        assertEquals(dp * fn, coulomb.pivotHoldLimit(k.context(Phase.ROLLING)), 1e-18);
        assertTrue(addsCouples(viscous));
    }

    /** No load, no couple; zero spin, no couple; bad parameters are refused by name. */
    @Test
    void bandedPivotingEdges() {
        Contact unloaded = new Contact(Ball.solid(0.01, 0.03), Vector3D.PLUS_K, 0, Vector3D.ZERO, new Vector3D(0, 0, 5));
        assertEquals(Vector3D.ZERO, unloaded.couple(BandedPivoting.banded(1e-3, 1e-3)));
        Contact still = new Contact(Ball.solid(0.01, 0.03), Vector3D.PLUS_K, 3, Vector3D.ZERO, new Vector3D(4, 0, 0));
        assertEquals(Vector3D.ZERO, still.couple(BandedPivoting.banded(1e-3, 1e-3)));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> BandedPivoting.viscous(-1));
        assertTrue(e.getMessage().contains("pivoting damping") && e.getMessage().contains("-1"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> BandedPivoting.coulomb(Double.NaN));
        assertTrue(e.getMessage().contains("pivoting resistance length"), e.getMessage());
        assertThrows(IllegalArgumentException.class,
            () -> new BandedPivoting(Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY));
    }

    /**
     * Spin creep (J. J. Kalker 1990; K. L. Johnson 1985, §8.2; from memory): on a flat,
     * {@code c_v = G c⁴ C₃₃ / V} with {@code c = (3 F_n r / 4E*)^{1/3}} (Johnson 1985, §4.2) and the
     * rolling speed {@code V = |v|} of a ball rolling without slip ({@code H = 0}); above saturation the
     * Coulomb couple; below the speed floor the floor.
     */
    @Test
    void spinCreepDampingOnAFlat() {
        double r = 0.005;
        double fn = 2.0;
        Ball ball = Ball.solid(r, 0.004);
        Vector3D spin = new Vector3D(12, -30, 0.8);   // rolling at |v| = r |ω_t|, spin 0.8 rad/s about n = z
        Contact k = new Contact(ball, Vector3D.PLUS_K, fn, Vector3D.ZERO, spin);
        SpinCreepPivoting law = new SpinCreepPivoting(Material.STEEL, Material.GLASS, Double.POSITIVE_INFINITY);
        double eStar = Material.STEEL.contactModulus(Material.GLASS);
        double g = Material.STEEL.combinedShearModulus(Material.GLASS);
        double c = Math.cbrt(3 * fn * r / (4 * eStar));
        double v = r * Math.hypot(12, 30);
        ContactContext ctx = k.context(Phase.ROLLING);
        assertEquals(v, SpinCreepPivoting.rollingSpeed(ctx), 1e-15 * v);
        double cv = g * Math.pow(c, 4) * SpinCreepPivoting.C33_CIRCULAR / v;
        assertEquals(cv, law.damping(ctx), 1e-12 * cv);
        assertVector(new Vector3D(0, 0, -cv * 0.8), k.couple(law), 1e-12 * cv);
        assertEquals(cv * 0.64, k.loss(law, LossKind.PIVOTING_RESISTANCE), 1e-12 * cv);
        // saturation at δ_p F_n
        SpinCreepPivoting saturated = new SpinCreepPivoting(Material.STEEL, Material.GLASS, 0.1 * cv * 0.8 / fn,
            SpinCreepPivoting.C33_CIRCULAR, SpinCreepPivoting.DEFAULT_MIN_ROLLING_SPEED);
        assertVector(new Vector3D(0, 0, -0.1 * cv * 0.8), k.couple(saturated), 1e-12 * cv);
        // a ball barely rolling: the floor V_min sets the damping
        Contact slow = new Contact(ball, Vector3D.PLUS_K, fn, Vector3D.ZERO, new Vector3D(0.01, 0, 0.8));
        assertEquals(g * Math.pow(c, 4) / 1e-3, law.damping(slow.context(Phase.ROLLING)), 1e-12 * cv * 100);
        assertTrue(addsCouples(law));
    }

    /**
     * The rolling speed is the mean speed of the contact point over the two surfaces: inside a tube of
     * radius R (Hessian {@code −(1/(R − r)) e_φ e_φᵀ}) a ball circling at centre speed {@code v} moves its
     * contact point over the wall at {@code v R/(R − r)} (kinematics of the contact point
     * {@code p = c − r n}, design notes §3).
     */
    @Test
    void rollingSpeedInsideATube() {
        double r = 0.004;
        double bigR = 0.015;
        Ball ball = Ball.solid(r, 0.002);
        ContactGeometry geo = new ContactGeometry();
        geo.normal[2] = 1;          // ball at the bottom of a tube along x
        double h = -1 / (bigR - r);
        geo.setHessian(0, 0, 0, h, 0, 0);
        geo.curvature1 = 1 / bigR;
        geo.curvature2 = 0;
        double v = 0.3;             // centre velocity along y (round the tube): v = r ω × n gives ω = (−v/r, 0, 0)
        Vector3D spin = new Vector3D(-v / r, 0, 0);
        ContactContext ctx = new ContactContext();
        ctx.prepare(ball, geo, 1.0, Phase.ROLLING, new double[3], spin.toArray());
        assertEquals(v * bigR / (bigR - r), SpinCreepPivoting.rollingSpeed(ctx), 1e-14);
        // and the damping uses the exact elliptic patch of the bore
        double cv = new SpinCreepPivoting(Material.STEEL, Material.ACRYLIC, Double.POSITIVE_INFINITY).damping(ctx);
        HertzPatch patch = HertzContact.solve(1.0, r, Material.STEEL, 1 / bigR, Vector3D.PLUS_J, 0, Vector3D.PLUS_I,
            Material.ACRYLIC);
        double c = patch.meanRadius();
        assertEquals(Material.STEEL.combinedShearModulus(Material.ACRYLIC) * c * c * c * c / (v * bigR / (bigR - r)),
            cv, 1e-12 * cv);
    }

    /**
     * The spin-creep law's cache of the unit-load patch gives exactly the direct value, when the
     * curvatures change between calls and when they repeat (bit for bit: runs stay deterministic).
     */
    @Test
    void spinCreepCacheGivesTheDirectValue() {
        SpinCreepPivoting law = new SpinCreepPivoting(Material.STEEL, Material.NYLON, Double.POSITIVE_INFINITY);
        double eStar = Material.STEEL.contactModulus(Material.NYLON);
        double g = Material.STEEL.combinedShearModulus(Material.NYLON);
        double r = 0.003;
        Ball ball = Ball.solid(r, 0.001);
        double[][] curvatures = {{50, 0}, {50, 0}, {20, -10}, {50, 0}, {0, 0}, {0, 0}};
        double[] loads = {0.3, 1.7, 0.3, 0.01, 2, 2};
        for (int i = 0; i < curvatures.length; i++) {
            ContactGeometry geo = new ContactGeometry();
            geo.normal[2] = 1;
            geo.curvature1 = curvatures[i][0];
            geo.curvature2 = curvatures[i][1];
            ContactContext ctx = new ContactContext();
            ctx.prepare(ball, geo, loads[i], Phase.ROLLING, new double[3], new double[] {0, 100, 3});
            double c = HertzContact.meanRadius(loads[i], r, curvatures[i][0], curvatures[i][1], eStar);
            double c2 = c * c;   // the law's order of operations, so the comparison can be exact
            double expected = g * c2 * c2 * SpinCreepPivoting.C33_CIRCULAR / SpinCreepPivoting.rollingSpeed(ctx);
            assertEquals(expected, law.damping(ctx), 0.0, "call " + i);
        }
    }

    /**
     * Combination with {@code and} (the ContactLaw contract): grips take the smaller, sliding forces
     * and couples add, hold limits add, one restitution at most.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("contacts")
    void combination(String label, Contact k) {
        ContactLaw law = new Coulomb(0.6, 0.4, 0.5).and(new RollingResistance(1e-4)).and(BandedPivoting.banded(2e-6, 3e-4));
        ContactContext c = k.context(Phase.SLIDING);
        assertEquals(0.6 * k.normalForce(), law.gripLimit(c), 1e-15);
        assertEquals(0.4 * k.normalForce(), law.slidingFriction(c), 1e-15);
        Vector3D sum = k.couple(new RollingResistance(1e-4)).add(k.couple(BandedPivoting.banded(2e-6, 3e-4)));
        assertVector(sum, k.couple(law), 1e-14 * (1 + sum.getNorm()));
        assertEquals(k.loss(new RollingResistance(1e-4), LossKind.ROLLING_RESISTANCE),
            k.loss(law, LossKind.ROLLING_RESISTANCE), 1e-15);
        assertEquals(k.loss(BandedPivoting.banded(2e-6, 3e-4), LossKind.PIVOTING_RESISTANCE),
            k.loss(law, LossKind.PIVOTING_RESISTANCE), 1e-15);
        assertEquals(1e-4 * k.normalForce(), law.rollingHoldLimit(c), 1e-18);
        assertEquals(3e-4 * k.normalForce(), law.pivotHoldLimit(c), 1e-18);
        assertEquals(0.5, law.restitution().getAsDouble(), 0.0);
        ContactLaw wideGrip = new ContactLaw() {
            @Override
            public double gripLimit(ContactContext cc) {
                return 0.9 * cc.normalForce();
            }

            @Override
            public String name() {
                return "grip 0.9";
            }
        };
        assertEquals(0.6 * k.normalForce(), wideGrip.and(new Coulomb(0.6, 0.4, 0.5)).gripLimit(c), 1e-15);
        assertThrows(IllegalArgumentException.class, () -> new Coulomb(0.6, 0.4, 0.5).and(new PureRolling(0.2)));
    }

    /** Whether the law declares that it adds couples ({@link ContactLaw#addsCouples()}, read once by the solver). */
    static boolean addsCouples(ContactLaw law) {
        return law.addsCouples();
    }

    static void assertVector(Vector3D expected, Vector3D actual, double tol) {
        assertEquals(0.0, expected.distance(actual), tol, "expected " + expected + " got " + actual);
    }
}
