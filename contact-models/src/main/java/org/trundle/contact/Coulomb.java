package org.trundle.contact;

import java.util.OptionalDouble;

import org.trundle.core.internal.Checks;
import org.trundle.core.ContactContext;
import org.trundle.core.ContactLaw;

/**
 * Coulomb friction with a static coefficient {@code μ_s} and a kinetic one {@code μ_k ≤ μ_s}
 * (dimensionless), and a normal restitution {@code e}.
 *
 * <p>Rolling holds while the tangential force the no-slip constraint needs stays within
 * {@code μ_s F_n}; sliding friction is {@code F_t = −μ_k F_n ŝ} (C. A. de Coulomb, 1785; any
 * mechanics text). At an impact with normal impulse {@code J_n} the tangential impulse sticks when
 * it needs at most {@code μ_s J_n}, otherwise it is {@code μ_k J_n} against the slip.
 *
 * <p>Immutable and thread-safe.
 */
public final class Coulomb implements ContactLaw {
    private final double staticFriction;
    private final double kineticFriction;
    private final double restitution;

    /**
     * @param staticFriction μ_s ≥ 0
     * @param kineticFriction μ_k in [0, μ_s]
     * @param restitution e in [0, 1]
     */
    public Coulomb(double staticFriction, double kineticFriction, double restitution) {
        this.staticFriction = Checks.nonNegative("static friction", staticFriction);
        this.kineticFriction = Checks.nonNegative("kinetic friction", kineticFriction);
        if (kineticFriction > staticFriction) {
            throw new IllegalArgumentException("kinetic friction must not exceed static friction, got mu_k = "
                + kineticFriction + " > mu_s = " + staticFriction);
        }
        Checks.nonNegative("restitution", restitution);
        if (restitution > 1) {
            throw new IllegalArgumentException("restitution must lie in [0, 1], got " + restitution);
        }
        this.restitution = restitution;
    }

    /** @return μ_s */
    public double staticFriction() {
        return staticFriction;
    }

    /** @return μ_k */
    public double kineticFriction() {
        return kineticFriction;
    }

    @Override
    public double gripLimit(ContactContext c) {
        return staticFriction * Math.max(c.normalForce(), 0.0);
    }

    @Override
    public double slidingFriction(ContactContext c) {
        return kineticFriction * Math.max(c.normalForce(), 0.0);
    }

    @Override
    public OptionalDouble restitution() {
        return OptionalDouble.of(restitution);
    }

    /** Adds no couples: rolling integrates no couple losses. */
    @Override
    public boolean addsCouples() {
        return false;
    }

    @Override
    public String name() {
        return "coulomb(mu_s=" + staticFriction + ", mu_k=" + kineticFriction + ", e=" + restitution + ")";
    }
}
