package org.trundle.contact;

import org.trundle.core.internal.Checks;
import org.trundle.core.ContactContext;
import org.trundle.core.ContactGeometry;
import org.trundle.core.ContactLaw;
import org.trundle.core.LossKind;
import org.trundle.core.Material;

/**
 * Spin creep: the pivoting couple of a rolling elastic Hertz contact, viscous in the spin about the
 * normal below saturation and Coulomb above (the law of {@link BandedPivoting}) with the damping set
 * at each instant from the Hertz patch and the rolling speed,
 * <pre>
 *   M = −min(c_v |s|, δ_p F_n) sgn(s) n,    c_v = G c⁴ C₃₃ / max(V, V_min)
 * </pre>
 * the linear (small-creepage) theory of J. J. Kalker (Three-Dimensional Elastic Bodies in Rolling
 * Contact, Kluwer 1990; K. L. Johnson, Contact Mechanics, 1985, §8.2), where the spin creepage is
 * {@code s/V} and the couple {@code −G c⁴ C₃₃ s/V}:
 * <ul>
 *   <li>{@code c = √(ab)} the mean radius (m) of the exact Hertz patch under the current normal
 *       force and the wall's principal curvatures ({@link HertzContact#meanRadius});</li>
 *   <li>{@code G} the pair's combined shear modulus, {@code 2/G = 1/G₁ + 1/G₂}
 *       ({@link Material#combinedShearModulus}, Kalker 1990, from memory);</li>
 *   <li>{@code C₃₃} Kalker's spin coefficient, a function of the axis ratio and Poisson's ratio; about
 *       1.0 for a circular patch ({@link #C33_CIRCULAR}; Kalker's tables, from memory); a caller with
 *       an elongated patch passes its own value;</li>
 *   <li>{@code V} the rolling speed (m/s): the mean speed of the contact point over the two surfaces,
 *       {@code |(I − rH) v − s_t/2|} with {@code v = s_t + r ω × n} the centre velocity rebuilt from
 *       the slip {@code s_t} and the relative spin (static wall), {@code H} the distance Hessian (the
 *       contact point moves over the wall at {@code (I − rH) v} and over the ball at that less the
 *       slip);</li>
 *   <li>{@code V_min} a floor on the rolling speed (m/s): as {@code V → 0} the linear theory's
 *       damping grows without bound (a contact that barely rolls cannot creep: it sticks, and the
 *       couple saturates at {@code δ_p F_n}); the floor keeps the law finite and the run non-stiff
 *       when {@code δ_p} is infinite. Default {@link #DEFAULT_MIN_ROLLING_SPEED}, the floor of the
 *       solver's speed scale.</li>
 * </ul>
 * The power it dissipates, {@code min(c_v|s|, δ_p F_n)|s|}, is booked as
 * {@link LossKind#PIVOTING_RESISTANCE}. The linear theory holds for small spin creepage
 * ({@code c |s| / V ≪ 1}); above it the saturation {@code δ_p F_n} takes over (full slip:
 * {@code δ_p = (3π/16) μ c}, {@link PivotingResistance#hertzLength}).
 *
 * <p>Immutable and thread-safe.
 */
public final class SpinCreepPivoting implements ContactLaw {
    /** Kalker's spin coefficient C₃₃ for a circular patch, about 1.0 (Kalker 1990 tables, from memory). */
    public static final double C33_CIRCULAR = 1.0;
    /** Default floor of the rolling speed, 1e-3 m/s (the floor of the solver's speed scale). */
    public static final double DEFAULT_MIN_ROLLING_SPEED = 1e-3;

    private final Material ball;
    private final Material wall;
    private final double length;
    private final double c33;
    private final double minRollingSpeed;
    private final double contactModulus;
    private final double shearModulus;
    /**
     * The unit-load mean radius of the last curvatures seen (an immutable holder, replaced whole): on a
     * surface of constant curvature (plane, tube, sphere) every later call skips the root find. A race
     * between threads only costs a recomputation; the value is the same either way (deterministic).
     */
    private volatile UnitRadius last;

    /** Mean radius under a unit load for one ball radius and curvature pair. */
    private record UnitRadius(double ballRadius, double curvature1, double curvature2, double meanRadius) {
    }

    /**
     * Spin creep with {@code C₃₃ = 1.0} and the default speed floor.
     *
     * @param ball the ball's material
     * @param wall the wall's material
     * @param length saturation length δ_p (m), positive, or {@link Double#POSITIVE_INFINITY} for no
     *     saturation
     */
    public SpinCreepPivoting(Material ball, Material wall, double length) {
        this(ball, wall, length, C33_CIRCULAR, DEFAULT_MIN_ROLLING_SPEED);
    }

    /**
     * @param ball the ball's material
     * @param wall the wall's material
     * @param length saturation length δ_p (m), positive, or {@link Double#POSITIVE_INFINITY} for no
     *     saturation
     * @param c33 Kalker's spin coefficient C₃₃, finite and positive
     * @param minRollingSpeed floor V_min of the rolling speed (m/s), finite and positive
     */
    public SpinCreepPivoting(Material ball, Material wall, double length, double c33, double minRollingSpeed) {
        if (ball == null || wall == null) {
            throw new IllegalArgumentException("ball and wall materials must be given, got ball = " + ball + ", wall = "
                + wall);
        }
        if (!(length > 0)) {
            throw new IllegalArgumentException(
                "pivoting resistance length must be positive (or +infinity for no saturation), got " + length);
        }
        this.ball = ball;
        this.wall = wall;
        this.length = length;
        this.c33 = Checks.positive("C33", c33);
        this.minRollingSpeed = Checks.positive("minimum rolling speed", minRollingSpeed);
        this.contactModulus = ball.contactModulus(wall);
        this.shearModulus = ball.combinedShearModulus(wall);
    }

    /** @return δ_p (m) */
    public double length() {
        return length;
    }

    /** @return C₃₃ */
    public double c33() {
        return c33;
    }

    /** @return V_min (m/s) */
    public double minRollingSpeed() {
        return minRollingSpeed;
    }

    /**
     * The damping {@code c_v = G c⁴ C₃₃ / max(V, V_min)} (N·m·s) at this contact.
     *
     * @param c the contact
     * @return c_v (N·m·s); 0 without load
     */
    public double damping(ContactContext c) {
        double fn = c.normalForce();
        if (!(fn > 0)) {
            return 0.0;
        }
        ContactGeometry g = c.geometry();
        double r = c.ball().radius();
        UnitRadius u = last;
        if (u == null || u.ballRadius() != r || u.curvature1() != g.curvature1 || u.curvature2() != g.curvature2) {
            u = new UnitRadius(r, g.curvature1, g.curvature2,
                HertzContact.meanRadius(1.0, r, g.curvature1, g.curvature2, contactModulus));
            last = u;
        }
        // c = √(ab) scales with P^{1/3} (HertzContact.meanRadius computes it the same way)
        double mean = u.meanRadius() * Math.cbrt(fn);
        double c2 = mean * mean;
        return shearModulus * c2 * c2 * c33 / Math.max(rollingSpeed(c), minRollingSpeed);
    }

    /**
     * Rolling speed {@code V = |(I − rH) v − s_t/2|} (m/s), with {@code v = s_t + r ω × n}.
     *
     * @param c the contact
     * @return V (m/s)
     */
    public static double rollingSpeed(ContactContext c) {
        double r = c.ball().radius();
        double nx = c.normal(0);
        double ny = c.normal(1);
        double nz = c.normal(2);
        double wx = c.relativeSpin(0);
        double wy = c.relativeSpin(1);
        double wz = c.relativeSpin(2);
        double sx = c.slip(0);
        double sy = c.slip(1);
        double sz = c.slip(2);
        double vx = sx + r * (wy * nz - wz * ny);
        double vy = sy + r * (wz * nx - wx * nz);
        double vz = sz + r * (wx * ny - wy * nx);
        double[] h = c.geometry().hessian;
        double px = vx - r * (h[0] * vx + h[1] * vy + h[2] * vz) - 0.5 * sx;
        double py = vy - r * (h[3] * vx + h[4] * vy + h[5] * vz) - 0.5 * sy;
        double pz = vz - r * (h[6] * vx + h[7] * vy + h[8] * vz) - 0.5 * sz;
        return Math.sqrt(px * px + py * py + pz * pz);
    }

    @Override
    public void addCouples(ContactContext c) {
        double cv = damping(c);
        if (!(cv > 0)) {
            return;
        }
        double m = BandedPivoting.couple(cv, length, c);
        if (m != 0) {
            c.addCouple(m * c.normal(0), m * c.normal(1), m * c.normal(2), LossKind.PIVOTING_RESISTANCE);
        }
    }

    /** @return true: this law adds a couple about the normal */
    @Override
    public boolean addsCouples() {
        return true;
    }

    @Override
    public double pivotHoldLimit(ContactContext c) {
        return Double.isInfinite(length) ? 0.0 : length * Math.max(c.normalForce(), 0.0);
    }

    @Override
    public String name() {
        return "spin creep(ball " + ball + ", wall " + wall + ", C33=" + c33 + ", delta_p=" + length
            + " m, V_min=" + minRollingSpeed + " m/s)";
    }
}
