package org.trundle.core;

/**
 * The phases of the hybrid ball–surface system; exactly one is active at a time.
 *
 * <ul>
 *   <li>{@link #ROLLING}: contact without slip, {@code v = r ω × n}; the full contact force
 *       follows from the normal and no-slip constraints.</li>
 *   <li>{@link #SLIDING}: contact with slip {@code s = v − r ω × n ≠ 0}; the tangential force
 *       is given by the contact law's sliding friction, opposing {@code s}.</li>
 *   <li>{@link #FLIGHT}: no contact; gravity and applied loads only.</li>
 *   <li>{@link #REST}: at rest in static equilibrium on the surface; a run ends in it.</li>
 * </ul>
 */
public enum Phase {
    /** Contact without slip. */
    ROLLING,
    /** Contact with slip. */
    SLIDING,
    /** No contact. */
    FLIGHT,
    /** At rest in static equilibrium. */
    REST;

    /** @return true for the two phases with contact (rolling, sliding) */
    public boolean inContact() {
        return this == ROLLING || this == SLIDING;
    }

    /** @return the lower-case name used in files and messages */
    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
