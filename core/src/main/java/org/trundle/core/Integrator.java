package org.trundle.core;

/**
 * The integration method of a run (part of {@link IntegrationSettings}).
 *
 * <ul>
 *   <li>{@link #DORMAND_PRINCE} (default): Hipparchus' adaptive embedded Runge–Kutta method
 *       Dormand–Prince 8(5,3) at the settings' tolerance, with projection back onto the constraints
 *       when a step end has drifted past the projection threshold. Accurate and cheap over short and
 *       medium runs; over very long conservative runs its energy error grows about linearly in time.</li>
 *   <li>{@link #SYMMETRIC_PROJECTION}: for long conservative runs. Rolling and flight segments on a
 *       patch that stands still (with a rigid contact) take fixed steps of a symmetric composition of
 *       the implicit midpoint rule, of order 2, 4 (default) or 6, with symmetric projection onto the
 *       constraint manifold (centre at distance r from the surface, unit quaternion; the rolling
 *       velocity is derived from the spin, so it holds exactly): E. Hairer, "Symmetric projection
 *       methods for differential equations on manifolds", BIT 40 (2000) 726–734; E. Hairer, C. Lubich,
 *       G. Wanner, Geometric Numerical Integration, 2nd ed., Springer 2006, ch. V and XI (from memory).
 *       The method is reversible, so on a conservative rolling run (a pure-rolling law, no applied
 *       load, no moving patch) the energy error stays bounded instead of growing. Phase switches are
 *       still events: located on the step's cubic Hermite extension, after which the run goes on as
 *       usual. Sliding, compliant contacts, moving patches and several simultaneous contacts keep Dormand–Prince; with dissipative
 *       laws the option still runs, but the bound is about conservative motion. The step must resolve
 *       the fastest motion (a few dozen steps per period at order 4); the settings' tolerance still
 *       sets the event thresholds and the absolute scales, not the step.</li>
 * </ul>
 */
public enum Integrator {
    /** Adaptive Dormand–Prince 8(5,3) (default). */
    DORMAND_PRINCE("dormand-prince"),
    /** Fixed-step symmetric composition of the implicit midpoint rule with symmetric projection. */
    SYMMETRIC_PROJECTION("symmetric");

    private final String label;

    Integrator(String label) {
        this.label = label;
    }

    /** @return the short name used in scenario files ("dormand-prince", "symmetric") */
    public String label() {
        return label;
    }

    /**
     * @param label a short name, as {@link #label()} gives it
     * @return the integrator
     * @throws IllegalArgumentException for an unknown name, naming it and the choices
     */
    public static Integrator ofLabel(String label) {
        for (Integrator i : values()) {
            if (i.label.equals(label)) {
                return i;
            }
        }
        throw new IllegalArgumentException("integrator must be \"dormand-prince\" or \"symmetric\", got \"" + label + "\"");
    }
}
