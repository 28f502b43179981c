package org.trundle.core.engine;

import java.util.Locale;

import org.hipparchus.exception.Localizable;
import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.ode.LocalizedODEFormats;
import org.trundle.core.Phase;

/**
 * Our own words for a failure of the Hipparchus integrator or its event search, naming what
 * failed, when and in which phase; the library's exception stays the cause (its text is in the
 * library's words and sometimes asks for a bug report to that library, which is not the user's
 * next step).
 */
final class IntegratorFailure {
    private IntegratorFailure() {
    }

    /**
     * The message of a failed run for an exception of the integrator.
     *
     * @param e the exception
     * @param t the time of the last good state (s)
     * @param phase the phase of the segment that failed
     * @return the message (without the "run failed at" prefix)
     */
    static String describe(MathRuntimeException e, double t, Phase phase) {
        Localizable what = e.getSpecifier();
        Object[] p = e.getParts();
        String where = String.format(Locale.ROOT, " (at t = %s s, phase %s)", t, phase.label());
        if (what == LocalizedODEFormats.MINIMAL_STEPSIZE_REACHED_DURING_INTEGRATION) {
            return "step size underflow: the error control asked for a step of " + part(p, 0)
                + " s, below the smallest step that advances the time (" + part(p, 1) + " s)" + where
                + "; the motion changes faster than the time can resolve (a force, couple or acceleration"
                + " too large or not smooth)";
        } else if (what == LocalizedODEFormats.FIND_ROOT) {
            Object d = p.length > 0 ? p[0] : null;
            String label = d instanceof SwitchDetector ? ((SwitchDetector) d).label() : String.valueOf(d);
            return "the event search could not locate the " + label + " switch between t = " + part(p, 1)
                + " s and t = " + part(p, 3) + " s" + where + "; its function did not change sign as sampled";
        } else if (what == LocalizedODEFormats.NAN_APPEARING_DURING_INTEGRATION) {
            return "a NaN appeared in the integrated state at t = " + part(p, 0) + " s" + where;
        } else if (what == LocalizedODEFormats.TOO_SMALL_INTEGRATION_INTERVAL) {
            return "the time left to integrate, " + part(p, 0) + " s, is below what the time can resolve ("
                + part(p, 1) + " s)" + where;
        }
        return "a computation of the integration library failed" + where + " (its own message is the cause's)";
    }

    private static String part(Object[] parts, int i) {
        return i < parts.length ? String.valueOf(parts[i]) : "?";
    }
}
