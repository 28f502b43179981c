package org.trundle.scenario;

import java.util.List;

import org.trundle.contact.Coulomb;
import org.trundle.contact.PivotingResistance;
import org.trundle.contact.PureRolling;
import org.trundle.contact.RollingResistance;
import org.trundle.core.ContactLaw;

/**
 * Builds the {@link ContactLaw} of a scenario's {@code contact} section.
 *
 * <ul>
 *   <li>{@code law: "rolling"}: no slip, unbounded grip ({@link PureRolling}); keys
 *       {@code restitution}, {@code rolling_resistance}, {@code pivoting_resistance};</li>
 *   <li>{@code law: "coulomb"}: Coulomb friction ({@link Coulomb}); keys {@code static_friction}
 *       μs and {@code kinetic_friction} μk (dimensionless, {@code 0 ≤ μk ≤ μs}), {@code restitution},
 *       {@code rolling_resistance}, {@code pivoting_resistance}.</li>
 * </ul>
 * {@code restitution} e is in [0, 1], default 0. {@code rolling_resistance} and
 * {@code pivoting_resistance} are the couples' lengths (m, ≥ 0, default 0): a non-zero value adds
 * {@link RollingResistance} or {@link PivotingResistance} to the law.
 */
final class ContactFactory {
    private ContactFactory() {
    }

    /**
     * @param s the {@code contact} section
     * @return the law
     */
    static ContactLaw create(Section s) {
        String law = s.choice("law", List.of("rolling", "coulomb"));
        if (law.equals("rolling")) {
            s.allow("law", "restitution", "rolling_resistance", "pivoting_resistance");
        } else {
            s.allow("law", "static_friction", "kinetic_friction", "restitution", "rolling_resistance",
                "pivoting_resistance");
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
        if (pivoting > 0) {
            base = base.and(new PivotingResistance(pivoting));
        }
        return base;
    }
}
