package org.trundle.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.trundle.core.check.Outcome;
import org.trundle.core.check.Probe;
import org.trundle.core.check.Robustness;

/**
 * The bounded CI sample of the robustness campaign ({@link RobustnessCampaign}): every hostile case
 * ends in a valid result, a rejection with a message or a typed stop with a message — never a NaN
 * in a result, never an unexplained exception. The full campaign (10⁵ cases) runs with
 * {@code java -cp benchmarks/jmh/target/trundle-benchmarks.jar org.trundle.bench.RobustnessCampaign 100000}.
 */
class RobustnessCampaignTest {
    static final int CASES = 2500;

    @Test
    void hostileInputsNeverFailUnexplained() {
        Robustness.Tally tally = RobustnessCampaign.run(RobustnessCampaign.SEED, CASES);
        System.out.println(tally.summary());
        tally.reasons().forEach((kind, n) -> System.out.println("  " + n + "  " + kind));
        StringBuilder failures = new StringBuilder();
        for (Probe p : tally.failures()) {
            failures.append('\n').append(p.describe());
        }
        assertEquals(0, tally.count(Outcome.FAILURE), "failures:" + failures);
        assertEquals(CASES, tally.total());
        // the sample exercises every outcome, so the classification itself is tested
        assertTrue(tally.count(Outcome.VALID) > 0 && tally.count(Outcome.REJECTED) > 0
            && tally.count(Outcome.TYPED_STOP) > 0, tally.summary());
    }
}
