package org.trundle.contact;

import org.trundle.core.internal.Checks;
import org.trundle.core.ContactContext;
import org.trundle.core.ContactLaw;
import org.trundle.core.LossKind;

/**
 * Pivoting (spin) resistance as a couple about the contact normal with its own length
 * {@code δ_p} (m):
 * <pre>
 *   τ_p = −δ_p F_n sign((ω − ω_surface)·n) n
 * </pre>
 * For a Hertz contact patch of radius {@code a_c} in full slip, {@code δ_p = (3π/16) μ a_c}
 * (K. L. Johnson, Contact Mechanics, 1985, §5.8): see {@link #hertzLength(double, double)} and
 * {@link HertzContact}.
 *
 * <p>Set-valued at zero spin ({@link #hasPivotStick()}): while rolling, the solver holds the spin
 * about the normal at zero with an exact pivoting stick as long as the couple needed for that is
 * within {@code δ_p F_n} ({@link #pivotStickLimit}), and releases it when not (a ball in a horizontal
 * tube locks into a steady helix). Away from the hold, and while sliding, {@code sign(w)} is
 * regularised as {@code w / max(|w|, ω_s)} with the solver's smoothing spin
 * {@link ContactContext#smoothingSpin()}, so the couple never reverses the spin it opposes; the
 * stick event fires before the band matters. A ball at rest is held while the couple needed about
 * the normal is at most {@code δ_p F_n}. For a physical small-spin band use {@link BandedPivoting}
 * or {@link SpinCreepPivoting}.
 *
 * <p>Immutable and thread-safe.
 */
public final class PivotingResistance implements ContactLaw {
    private final double length;

    /**
     * @param length pivoting-resistance length δ_p (m), ≥ 0
     */
    public PivotingResistance(double length) {
        this.length = Checks.nonNegative("pivoting resistance length", length);
    }

    /**
     * {@code δ_p = (3π/16) μ a_c} for a Hertz contact patch of radius {@code a_c} in full slip
     * (Johnson 1985).
     *
     * @param friction friction coefficient μ, ≥ 0
     * @param contactRadius contact-patch radius a_c (m), ≥ 0
     * @return δ_p (m)
     */
    public static double hertzLength(double friction, double contactRadius) {
        Checks.nonNegative("friction", friction);
        Checks.nonNegative("contact radius", contactRadius);
        return 3 * Math.PI / 16 * friction * contactRadius;
    }

    /** @return δ_p (m) */
    public double length() {
        return length;
    }

    @Override
    public void addCouples(ContactContext c) {
        double fn = c.normalForce();
        if (!(fn > 0) || length == 0) {
            return;
        }
        double wn = c.normalSpin();
        double f = -length * fn * wn / Math.max(Math.abs(wn), c.smoothingSpin());
        c.addCouple(f * c.normal(0), f * c.normal(1), f * c.normal(2), LossKind.PIVOTING_RESISTANCE);
    }

    @Override
    public double pivotHoldLimit(ContactContext c) {
        return length * Math.max(c.normalForce(), 0.0);
    }

    /** @return true for a positive length: the couple is set-valued at zero spin about the normal */
    @Override
    public boolean hasPivotStick() {
        return length > 0;
    }

    @Override
    public double pivotStickLimit(ContactContext c) {
        return pivotHoldLimit(c);
    }

    @Override
    public String name() {
        return "pivoting resistance(delta_p=" + length + " m)";
    }
}
