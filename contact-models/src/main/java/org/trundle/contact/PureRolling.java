package org.trundle.contact;

import java.util.OptionalDouble;

import org.trundle.core.internal.Checks;
import org.trundle.core.ContactLaw;

/**
 * Pure rolling: the no-slip constraint {@code v = r ω × n} with unbounded grip (the limit
 * {@code μ_s → ∞} of Coulomb friction), no contact couples. The wall supplies whatever tangential
 * force rolling needs (design notes §3). An impact on re-contact uses the given restitution and
 * stops the contact-point slip completely (unbounded grip).
 *
 * <p>Immutable and thread-safe.
 */
public final class PureRolling implements ContactLaw {
    private final double restitution;

    /** Pure rolling with restitution 0 (a landing ball does not rebound). */
    public PureRolling() {
        this(0.0);
    }

    /**
     * @param restitution normal coefficient of restitution e in [0, 1]
     */
    public PureRolling(double restitution) {
        Checks.nonNegative("restitution", restitution);
        if (restitution > 1) {
            throw new IllegalArgumentException("restitution must lie in [0, 1], got " + restitution);
        }
        this.restitution = restitution;
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
        return "pure rolling (e=" + restitution + ")";
    }
}
