package org.trundle.core.check;

import java.util.List;

/**
 * What the {@link Minimiser} found: the original failing case and its verdict, the simplest case
 * it reached that still fails the same check and that verdict, the simplifying moves taken, and the
 * number of candidate cases it tried.
 *
 * @param original the original case
 * @param originalVerdict its verdict
 * @param simplest the simplest failing case found (the original when nothing simpler fails)
 * @param simplestVerdict its verdict
 * @param moves the accepted moves, in order
 * @param tried number of candidates checked
 */
public record Reduction(PropertyCase original, Verdict originalVerdict, PropertyCase simplest,
                        Verdict simplestVerdict, List<String> moves, int tried) {

    /** Defensive copy. */
    public Reduction {
        moves = List.copyOf(moves);
    }

    /** @return a multi-line report of both cases */
    public String describe() {
        return "property failed: " + originalVerdict.describe() + "\n  case: " + original.describe()
            + "\n  simplest failing case after " + moves.size() + " moves " + moves + " (" + tried + " tried): "
            + simplest.describe() + "\n  its verdict: " + simplestVerdict.describe();
    }
}
