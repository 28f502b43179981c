package org.trundle.core;

/**
 * Where dissipated energy is booked in the {@link EnergyBudget}.
 */
public enum LossKind {
    /** Work of the sliding friction force against the slip velocity. */
    SLIDING_FRICTION,
    /** Work of the rolling-resistance couple against the rolling part of the relative spin. */
    ROLLING_RESISTANCE,
    /** Work of the pivoting-resistance couple against the spin about the normal. */
    PIVOTING_RESISTANCE,
    /** Work of any other contact couple. */
    OTHER,
    /** Work of the damping of a compliant contact's normal force ({@link Compliance}, Hunt–Crossley). */
    CONTACT_DAMPING
}
