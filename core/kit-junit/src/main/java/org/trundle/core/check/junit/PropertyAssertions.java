package org.trundle.core.check.junit;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Assertions;
import org.trundle.core.check.Invariant;
import org.trundle.core.check.Minimiser;
import org.trundle.core.check.PropertyCase;
import org.trundle.core.check.Reduction;
import org.trundle.core.check.Verdict;

/**
 * Assertions over invariants. On a failure the {@link Minimiser} walks the case toward a simpler
 * one that still fails, and the assertion message holds both (with their one-line descriptions,
 * seed and index first) and both verdicts.
 */
public final class PropertyAssertions {
    private PropertyAssertions() {
    }

    /**
     * Asserts that each invariant holds (or does not apply) on the case; stops at the first failure.
     *
     * @param c the case
     * @param invariants the invariants
     * @return the verdicts, in order (for reporting worst deviations)
     */
    public static List<Verdict> assertHolds(PropertyCase c, Invariant... invariants) {
        return assertHolds(c, Minimiser.defaults(), invariants);
    }

    /**
     * As {@link #assertHolds(PropertyCase, Invariant...)} with a given minimiser.
     *
     * @param c the case
     * @param minimiser the minimiser used on failure
     * @param invariants the invariants
     * @return the verdicts, in order
     */
    public static List<Verdict> assertHolds(PropertyCase c, Minimiser minimiser, Invariant... invariants) {
        List<Verdict> out = new ArrayList<>();
        for (Invariant inv : invariants) {
            Verdict v = inv.check(c);
            out.add(v);
            if (!v.holds()) {
                Reduction red = minimiser.minimise(c, v, inv);
                Assertions.fail(red.describe());
            }
        }
        return out;
    }
}
