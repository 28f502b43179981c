package org.trundle.contact;

import org.trundle.core.Checks;
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
 * <p>Set-valued at zero spin: {@code sign(w)} is regularised as {@code w / max(|w|, ω_s)} with the
 * solver's smoothing spin {@link ContactContext#smoothingSpin()}, so the couple never reverses the
 * spin it opposes (inside the band the spin decays exponentially, at the rate
 * {@code δ_p F_n/(I ω_s)}). A ball at rest is held while the couple needed about the normal is at
 * most {@code δ_p F_n}.
 *
 * <p>Known limitation: the smoothing makes the couple viscous inside the band, so where the couple
 * needed to hold the spin about the normal falls within {@code δ_p F_n} while the ball keeps rolling
 * (a ball in a horizontal tube locking into a steady helix), the spin still drains at the rate set by
 * the smoothing parameter instead of locking: a numerical artefact, removed when the solver holds the
 * couple with an exact pivoting stick event. For a physical small-spin band use
 * {@link BandedPivoting} or {@link SpinCreepPivoting}.
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

    @Override
    public String name() {
        return "pivoting resistance(delta_p=" + length + " m)";
    }
}
