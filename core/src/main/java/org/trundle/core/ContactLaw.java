package org.trundle.core;

import java.util.OptionalDouble;

/**
 * A contact law (the extension point for friction and contact couples). The solver owns the
 * constraints and the phase machine; a law only answers, for the current contact:
 *
 * <ul>
 *   <li>{@link #gripLimit}: the largest tangential force (N) the contact can transmit without slip;
 *       rolling holds while the force the no-slip constraint needs stays within it (Coulomb:
 *       {@code μ_s F_n}; pure rolling: unlimited);</li>
 *   <li>{@link #slidingFriction}: the magnitude (N) of the friction force while sliding, acting
 *       against the slip (Coulomb: {@code μ_k F_n});</li>
 *   <li>{@link #addCouples}: contact couples such as rolling and pivoting resistance, in rolling and
 *       sliding alike;</li>
 *   <li>{@link #restitution}: the normal coefficient of restitution {@code e} for impacts.</li>
 * </ul>
 *
 * <p>At an impact the solver calls {@link #gripLimit} and {@link #slidingFriction} with the normal
 * impulse (N·s) in place of the normal force ({@link ContactContext#isImpulse()}), so a law meant
 * for impacts must be homogeneous of degree one in the normal load, as Coulomb's law is.
 *
 * <p>Laws combine with {@link #and}: grips take the smaller, sliding forces and couples add, and at
 * most one part may set the restitution. Implementations are immutable and thread-safe.
 */
public interface ContactLaw {

    /**
     * @param c the contact
     * @return largest tangential force without slip (N, ≥ 0); {@link Double#POSITIVE_INFINITY}
     *     for unlimited grip
     */
    default double gripLimit(ContactContext c) {
        return Double.POSITIVE_INFINITY;
    }

    /**
     * @param c the contact (slip velocity available)
     * @return magnitude of the sliding friction force (N, ≥ 0)
     */
    default double slidingFriction(ContactContext c) {
        return 0.0;
    }

    /**
     * Adds this law's contact couples through {@link ContactContext#addCouple}.
     *
     * @param c the contact
     */
    default void addCouples(ContactContext c) {
    }

    /**
     * Whether {@link #addCouples} may add anything. A law that never adds couples says
     * {@code false}: the solver then skips the couple calls and leaves the couple losses out of the
     * integrated state while rolling, which makes runs cheaper. The default, {@code true}, is
     * always correct.
     *
     * @return whether this law may add contact couples
     */
    default boolean addsCouples() {
        return true;
    }

    /**
     * Largest couple (N·m) about a tangent axis that the contact can hold against a ball at rest
     * (zero rolling spin); used by the rest test. Rolling resistance of length {@code δ}:
     * {@code δ F_n}.
     *
     * @param c the contact
     * @return holding couple (N·m, ≥ 0)
     */
    default double rollingHoldLimit(ContactContext c) {
        return 0.0;
    }

    /**
     * Largest couple (N·m) about the normal that the contact can hold against a ball at rest;
     * used by the rest test. Pivoting resistance of length {@code δ_p}: {@code δ_p F_n}.
     *
     * @param c the contact
     * @return holding couple (N·m, ≥ 0)
     */
    default double pivotHoldLimit(ContactContext c) {
        return 0.0;
    }

    /**
     * Whether the law's couple about the normal is set-valued at zero relative normal spin
     * {@code s = (ω − ω_surface)·n} while the ball rolls (a Coulomb pivoting couple
     * {@code −δ_p F_n sgn(s)}). The solver then holds {@code s} at zero with an exact pivoting stick
     * while the couple needed for that is within {@link #pivotStickLimit}, instead of relying on the
     * regularisation of {@link ContactContext#smoothingSpin()}. Asked once per run; default {@code false}.
     *
     * @return whether the solver should watch for a pivoting stick
     */
    default boolean hasPivotStick() {
        return false;
    }

    /**
     * The set-valued part of the couple about the normal while rolling: the largest couple (N·m) the
     * contact supplies at zero relative normal spin, {@code δ_p F_n} for Coulomb pivoting; zero for a
     * law whose couple about the normal is single-valued (viscous, spin creep). While held, the solver
     * replaces the law's couple about the normal with the couple that keeps the relative normal spin
     * zero, and releases the hold when that couple exceeds this limit.
     *
     * @param c the contact
     * @return the stick limit (N·m, ≥ 0)
     */
    default double pivotStickLimit(ContactContext c) {
        return 0.0;
    }

    /** @return the normal coefficient of restitution in [0, 1], or empty when this law does not set it */
    default OptionalDouble restitution() {
        return OptionalDouble.empty();
    }

    /** @return a short name with the parameters, for messages and summaries */
    String name();

    /**
     * @param other another law
     * @return the combination of both (grip: the smaller; sliding force and couples: the sum)
     * @throws IllegalArgumentException when both set a restitution
     */
    default ContactLaw and(ContactLaw other) {
        return new CombinedLaw(this, other);
    }
}
