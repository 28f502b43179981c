package org.trundle.check;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.trundle.core.check.Verdict;

/** Counts, per check, the cases it was run on and those it applied to, so that no check passes by not applying. */
final class VerdictTally {
    private final Map<String, int[]> counts = new TreeMap<>();

    /**
     * @param vs verdicts of one case
     * @return the verdicts
     */
    synchronized List<Verdict> record(List<Verdict> vs) {
        for (Verdict v : vs) {
            int[] n = counts.computeIfAbsent(v.check(), k -> new int[2]);
            n[0]++;
            n[1] += v.applied() ? 1 : 0;
        }
        return vs;
    }

    /** Asserts every check applied to at least half of its cases. */
    synchronized void assertMostApplied() {
        counts.forEach((k, n) -> assertTrue(n[1] >= 0.5 * n[0], k + " applied to " + n[1] + " of " + n[0]));
    }
}
