package org.trundle.contact;

import org.trundle.core.internal.Checks;
import org.trundle.core.ContactContext;
import org.trundle.core.ContactLaw;
import org.trundle.core.LossKind;

/**
 * Rolling resistance as a couple with lever arm {@code δ} (m), the rolling-resistance length
 * ({@code δ/r} is the dimensionless rolling-resistance coefficient):
 * <pre>
 *   τ_rr = −δ F_n ŵ_t,   w_t = P(ω − ω_surface),   P = I − n nᵀ
 * </pre>
 * It equals the moment of the normal force shifted forward by {@code δ} (common practice; see
 * e.g. K. L. Johnson, Contact Mechanics, Cambridge University Press 1985, ch. 8). On a level
 * plane it decelerates a rolling ball at {@code (δ/r) g/(1+k)}.
 *
 * <p>Set-valued at zero rolling spin: the unit vector {@code ŵ_t} is regularised as
 * {@code w_t / max(|w_t|, ω_ε)} with the solver's stick spin {@link ContactContext#stickSpin()}
 * (the stick speed over the radius), so the couple never reverses the motion it opposes; since
 * zero rolling spin without slip means the ball has stopped, the solver's rest test ends the run
 * before the band is reached, and a ball turning round on a slope crosses it in a negligible time. A ball
 * at rest is held while the couple needed is at most {@code δ F_n}
 * ({@link #rollingHoldLimit}), which the solver's rest test uses.
 *
 * <p>Typical lengths (common practice, from memory): steel ball on hardened steel 0.001–0.01 mm;
 * glass or hard plastic on glass or acrylic 0.01–0.05 mm; on wood 0.1–0.5 mm; on felt or cloth
 * 0.5–2 mm.
 *
 * <p>Immutable and thread-safe.
 */
public final class RollingResistance implements ContactLaw {
    private final double length;

    /**
     * @param length rolling-resistance length δ (m), ≥ 0
     */
    public RollingResistance(double length) {
        this.length = Checks.nonNegative("rolling resistance length", length);
    }

    /** @return δ (m) */
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
        double wx = c.relativeSpin(0) - wn * c.normal(0);
        double wy = c.relativeSpin(1) - wn * c.normal(1);
        double wz = c.relativeSpin(2) - wn * c.normal(2);
        double w = Math.sqrt(wx * wx + wy * wy + wz * wz);
        double f = -length * fn / Math.max(w, c.stickSpin());
        c.addCouple(f * wx, f * wy, f * wz, LossKind.ROLLING_RESISTANCE);
    }

    @Override
    public double rollingHoldLimit(ContactContext c) {
        return length * Math.max(c.normalForce(), 0.0);
    }

    @Override
    public String name() {
        return "rolling resistance(delta=" + length + " m)";
    }
}
