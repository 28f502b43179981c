package org.trundle.contact;

import org.trundle.core.internal.Checks;
import org.trundle.core.ContactContext;
import org.trundle.core.ContactLaw;
import org.trundle.core.LossKind;

/**
 * Pivoting resistance with a small-spin band: a couple about the contact normal that is viscous
 * below saturation and Coulomb above,
 * <pre>
 *   M = −min(c_v |s|, δ_p F_n) sgn(s) n,    s = (ω − ω_surface)·n
 * </pre>
 * with {@code c_v} the pivoting damping (N·m·s), {@code δ_p} the pivoting-resistance length (m) and
 * {@code s} the relative spin about the normal (rad/s). Either parameter alone gives a pure law:
 * {@link #viscous(double)} ({@code δ_p = ∞}: {@code M = −c_v s}, exponential decay of the spin) and
 * {@link #coulomb(double)} ({@code c_v = ∞}: {@code M = −δ_p F_n sgn(s)}, the law of
 * {@link PivotingResistance}). The viscous band is what a rolling elastic contact does below
 * saturation (spin creep, J. J. Kalker, Three-Dimensional Elastic Bodies in Rolling Contact, Kluwer
 * 1990; K. L. Johnson, Contact Mechanics, 1985, ch. 8); {@link SpinCreepPivoting} sets {@code c_v}
 * from the Hertz patch.
 *
 * <p>The couple works only against the spin about the normal: the power it dissipates,
 * {@code −M·(ω − ω_surface) = min(c_v|s|, δ_p F_n)|s| ≥ 0}, is booked as
 * {@link LossKind#PIVOTING_RESISTANCE}. With {@code c_v} finite the law is single-valued and
 * needs no regularisation; the pure Coulomb form ({@code c_v = ∞}) is set-valued at {@code s = 0}:
 * while rolling the solver holds it with an exact pivoting stick ({@link #hasPivotStick()},
 * {@link #pivotStickLimit}); away from the hold, and while sliding, it is regularised with the
 * solver's smoothing spin {@code ω_s} ({@link ContactContext#smoothingSpin()}), that is
 * {@code c_v = δ_p F_n / ω_s}.
 * A ball at rest is held while the couple needed about the normal is at most {@code δ_p F_n} (static
 * friction holds a twist of a contact at rest; the viscous band describes rolling contacts).
 *
 * <p>Immutable and thread-safe.
 */
public final class BandedPivoting implements ContactLaw {
    private final double damping;
    private final double length;

    /**
     * @param damping pivoting damping c_v (N·m·s), positive; {@link Double#POSITIVE_INFINITY} for the pure
     *     Coulomb law
     * @param length pivoting-resistance length δ_p (m), positive; {@link Double#POSITIVE_INFINITY} for the
     *     pure viscous law
     * @throws IllegalArgumentException naming the parameter and value when out of range, or when both
     *     are infinite
     */
    public BandedPivoting(double damping, double length) {
        if (!(damping > 0)) {
            throw new IllegalArgumentException("pivoting damping must be positive (or +infinity for pure Coulomb), got "
                + damping);
        }
        if (!(length > 0)) {
            throw new IllegalArgumentException(
                "pivoting resistance length must be positive (or +infinity for pure viscous), got " + length);
        }
        if (Double.isInfinite(damping) && Double.isInfinite(length)) {
            throw new IllegalArgumentException("pivoting damping and pivoting resistance length cannot both be infinite");
        }
        this.damping = damping;
        this.length = length;
    }

    /**
     * Purely viscous pivoting, {@code M = −c_v s n}.
     *
     * @param damping c_v (N·m·s), finite and positive
     * @return the law
     */
    public static BandedPivoting viscous(double damping) {
        return new BandedPivoting(Checks.positive("pivoting damping", damping), Double.POSITIVE_INFINITY);
    }

    /**
     * Purely Coulomb pivoting, {@code M = −δ_p F_n sgn(s) n}.
     *
     * @param length δ_p (m), finite and positive
     * @return the law
     */
    public static BandedPivoting coulomb(double length) {
        return new BandedPivoting(Double.POSITIVE_INFINITY, Checks.positive("pivoting resistance length", length));
    }

    /**
     * Viscous below saturation, Coulomb above.
     *
     * @param damping c_v (N·m·s), finite and positive
     * @param length δ_p (m), finite and positive
     * @return the law
     */
    public static BandedPivoting banded(double damping, double length) {
        return new BandedPivoting(Checks.positive("pivoting damping", damping),
            Checks.positive("pivoting resistance length", length));
    }

    /** @return c_v (N·m·s); infinite for the pure Coulomb law */
    public double damping() {
        return damping;
    }

    /** @return δ_p (m); infinite for the pure viscous law */
    public double length() {
        return length;
    }

    @Override
    public void addCouples(ContactContext c) {
        double m = couple(damping, length, c);
        if (m != 0) {
            c.addCouple(m * c.normal(0), m * c.normal(1), m * c.normal(2), LossKind.PIVOTING_RESISTANCE);
        }
    }

    /**
     * The banded couple about the normal for a given damping (shared with {@link SpinCreepPivoting}).
     *
     * @return M (N·m), the component along the normal
     */
    static double couple(double damping, double length, ContactContext c) {
        double fn = c.normalForce();
        if (!(fn > 0)) {
            return 0.0;
        }
        double s = c.normalSpin();
        if (s == 0) {
            return 0.0;
        }
        double limit = length * fn;
        if (Double.isInfinite(damping)) {
            // pure Coulomb: regularised with the solver's smoothing spin away from the pivoting stick
            return -limit * s / Math.max(Math.abs(s), c.smoothingSpin());
        }
        double viscous = damping * Math.abs(s);
        return -Math.min(viscous, limit) * Math.signum(s);
    }

    /** @return true: this law adds a couple about the normal */
    @Override
    public boolean addsCouples() {
        return true;
    }

    /** @return true for the pure Coulomb law ({@code c_v = ∞}), whose couple is set-valued at zero spin */
    @Override
    public boolean hasPivotStick() {
        return Double.isInfinite(damping);
    }

    @Override
    public double pivotStickLimit(ContactContext c) {
        return Double.isInfinite(damping) ? length * Math.max(c.normalForce(), 0.0) : 0.0;
    }

    @Override
    public double pivotHoldLimit(ContactContext c) {
        return Double.isInfinite(length) ? 0.0 : length * Math.max(c.normalForce(), 0.0);
    }

    @Override
    public String name() {
        return "banded pivoting(c_v=" + damping + " N m s, delta_p=" + length + " m)";
    }
}
