package org.trundle.scenario;

import java.util.List;
import java.util.Optional;

import org.trundle.contact.BandedPivoting;
import org.trundle.contact.Coulomb;
import org.trundle.contact.PivotingResistance;
import org.trundle.contact.PureRolling;
import org.trundle.contact.RollingResistance;
import org.trundle.contact.SpinCreepPivoting;
import org.trundle.core.ContactLaw;
import org.trundle.core.Material;

/**
 * Builds the {@link ContactLaw} of a scenario's {@code contact} section.
 *
 * <ul>
 *   <li>{@code law: "rolling"}: no slip, unbounded grip ({@link PureRolling}); keys
 *       {@code restitution}, {@code rolling_resistance} and the pivoting keys below;</li>
 *   <li>{@code law: "coulomb"}: Coulomb friction ({@link Coulomb}); keys {@code static_friction}
 *       μs and {@code kinetic_friction} μk (dimensionless, {@code 0 ≤ μk ≤ μs}), {@code restitution},
 *       {@code rolling_resistance} and the pivoting keys below.</li>
 * </ul>
 * {@code restitution} e is in [0, 1], default 0. {@code rolling_resistance} is the rolling couple's
 * length δ (m, ≥ 0, default 0): a non-zero value adds {@link RollingResistance}. The couple about the
 * normal, {@code M = −min(c_v |s|, δ_p F_n) sgn(s)} with {@code s} the spin about the normal:
 * <ul>
 *   <li>{@code pivoting_resistance} δp (m, ≥ 0, default 0) alone: Coulomb pivoting
 *       ({@link PivotingResistance}, held exactly at zero spin by the solver's pivoting stick);</li>
 *   <li>{@code pivoting_damping} c_v (N·m·s, ≥ 0, default 0) alone: viscous pivoting
 *       ({@link BandedPivoting#viscous}); both: the banded law ({@link BandedPivoting#banded});</li>
 *   <li>{@code spin_creep: true}: c_v from the exact Hertz patch and the rolling speed at each instant
 *       ({@link SpinCreepPivoting}, Kalker's linear theory), saturating at δp when
 *       {@code pivoting_resistance} is given; needs {@code ball.material} and
 *       {@code surface.material}, and excludes {@code pivoting_damping}.</li>
 * </ul>
 */
final class ContactFactory {
    private ContactFactory() {
    }

    /**
     * @param s the {@code contact} section
     * @param materials the ball's and the wall's material ({@code ball.material}, {@code surface.material}),
     *     or empty when the scenario gives none
     * @return the law
     */
    static ContactLaw create(Section s, Optional<Material[]> materials) {
        String law = s.choice("law", List.of("rolling", "coulomb"));
        if (law.equals("rolling")) {
            s.allow("law", "restitution", "rolling_resistance", "pivoting_resistance", "pivoting_damping",
                "spin_creep");
        } else {
            s.allow("law", "static_friction", "kinetic_friction", "restitution", "rolling_resistance",
                "pivoting_resistance", "pivoting_damping", "spin_creep");
        }
        double e = s.inRange("restitution", "", 0, 1, 0.0);
        double rolling = s.nonNegative("rolling_resistance", "m", 0.0);
        double pivoting = s.nonNegative("pivoting_resistance", "m", 0.0);
        ContactLaw base;
        if (law.equals("rolling")) {
            base = new PureRolling(e);
        } else {
            double mus = s.nonNegative("static_friction", "", Double.NaN);
            if (!s.has("static_friction")) {
                s.number("static_friction", ""); // throws the missing-key message
            }
            double muk = s.nonNegative("kinetic_friction", "", Double.NaN);
            if (!s.has("kinetic_friction")) {
                s.number("kinetic_friction", "");
            }
            if (muk > mus) {
                throw new ScenarioException(s.where("kinetic_friction") + " = " + muk + " exceeds "
                    + s.where("static_friction") + " = " + mus + "; Coulomb friction needs mu_k <= mu_s");
            }
            base = new Coulomb(mus, muk, e);
        }
        if (rolling > 0) {
            base = base.and(new RollingResistance(rolling));
        }
        ContactLaw pivot = pivotingLaw(s, materials, pivoting);
        return pivot == null ? base : base.and(pivot);
    }

    /** The couple about the normal from {@code pivoting_resistance}, {@code pivoting_damping}, {@code spin_creep}; null for none. */
    private static ContactLaw pivotingLaw(Section s, Optional<Material[]> materials, double length) {
        double damping = s.nonNegative("pivoting_damping", "N m s", 0.0);
        if (s.bool("spin_creep", false)) {
            if (damping > 0) {
                throw new ScenarioException(s.where("spin_creep") + " = true computes the pivoting damping from the"
                    + " Hertz patch; leave out " + s.where("pivoting_damping") + " = " + damping);
            }
            if (materials.isEmpty()) {
                throw new ScenarioException(s.where("spin_creep") + " = true needs ball.material and"
                    + " surface.material (each {\"youngs_modulus\": Pa, \"poisson_ratio\": nu}; in a scene: a patch's"
                    + " own contact, with ball.material and that patch's material); the scenario gives no such pair");
            }
            Material[] m = materials.get();
            return new SpinCreepPivoting(m[0], m[1], length > 0 ? length : Double.POSITIVE_INFINITY);
        }
        if (damping > 0 && length > 0) {
            return BandedPivoting.banded(damping, length);
        }
        if (damping > 0) {
            return BandedPivoting.viscous(damping);
        }
        return length > 0 ? new PivotingResistance(length) : null;
    }
}
