package org.trundle.core.check;

import java.util.Locale;

/**
 * The outcome of one invariant check on one case: the check's name, whether it holds, fails or
 * did not apply (for instance a reversibility check on a run that changed phase), the worst
 * deviation found and the bound it was held to (both in the check's documented unit, usually
 * dimensionless), and a detail line (where and when the worst deviation occurred, or why the check
 * did not apply).
 *
 * @param check name of the check
 * @param status holds, fails or not applicable
 * @param worst worst deviation found (NaN when not applicable)
 * @param bound the bound
 * @param detail details
 */
public record Verdict(String check, Status status, double worst, double bound, String detail) {

    /** Whether a check held. */
    public enum Status {
        /** The worst deviation is within the bound. */
        HOLDS,
        /** The worst deviation exceeds the bound (or is not finite). */
        FAILS,
        /** The check does not apply to this case (see the detail). */
        NOT_APPLICABLE
    }

    /**
     * A verdict from a measured deviation: holds when {@code worst ≤ bound}; a non-finite worst fails.
     *
     * @param check name
     * @param worst worst deviation
     * @param bound bound
     * @param detail details
     * @return the verdict
     */
    public static Verdict measured(String check, double worst, double bound, String detail) {
        return new Verdict(check, worst <= bound ? Status.HOLDS : Status.FAILS, worst, bound, detail);
    }

    /**
     * @param check name
     * @param reason why it does not apply
     * @return a not-applicable verdict
     */
    public static Verdict notApplicable(String check, String reason) {
        return new Verdict(check, Status.NOT_APPLICABLE, Double.NaN, Double.NaN, reason);
    }

    /** @return true unless the check failed */
    public boolean holds() {
        return status != Status.FAILS;
    }

    /** @return true when the check applied to the case */
    public boolean applied() {
        return status != Status.NOT_APPLICABLE;
    }

    /** @return one line: name, status, worst against bound, detail */
    public String describe() {
        if (status == Status.NOT_APPLICABLE) {
            return check + ": not applicable (" + detail + ")";
        }
        return String.format(Locale.ROOT, "%s: %s, worst %.3e vs bound %.1e%s", check,
            status == Status.HOLDS ? "holds" : "FAILS", worst, bound, detail.isEmpty() ? "" : " (" + detail + ")");
    }
}
