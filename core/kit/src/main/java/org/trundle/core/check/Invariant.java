package org.trundle.core.check;

import java.util.ArrayList;
import java.util.List;

/**
 * A property that every case of some family must satisfy. {@link #check} runs the solver as needed
 * and returns a {@link Verdict}; it throws only what the solver throws (an exception is itself a
 * failure of the case). Factories of the kit's invariants are in {@link Invariants}; a lambda
 * serves for a user's own.
 */
@FunctionalInterface
public interface Invariant {
    /**
     * @param c the case
     * @return the verdict
     */
    Verdict check(PropertyCase c);

    /**
     * Checks several invariants in turn.
     *
     * @param c the case
     * @param invariants the invariants
     * @return the verdicts, in order
     */
    static List<Verdict> checkAll(PropertyCase c, List<Invariant> invariants) {
        List<Verdict> out = new ArrayList<>();
        for (Invariant i : invariants) {
            out.add(i.check(c));
        }
        return out;
    }
}
