package org.trundle.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.Timeout.ThreadMode;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
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

    /**
     * Cases of the 10⁵-case campaign that once hung (a start exactly on a tube's or rod's edge with
     * a resistance length near 1e298 m: a first step of zero length, and the event search at its
     * start never ended). Each must end, with any outcome but a failure; the timeout turns a hang
     * into a failure instead of a blocked build.
     */
    @ParameterizedTest
    @ValueSource(ints = {9125, 22581, 22874, 38062, 39451, 40461, 40464, 40467, 40473, 40476, 54414})
    @Timeout(value = 60, unit = TimeUnit.SECONDS, threadMode = ThreadMode.SEPARATE_THREAD)
    void casesThatOnceHungEnd(int index) {
        Probe p = RobustnessCampaign.probe(RobustnessCampaign.SEED, index);
        assertTrue(p.outcome() != Outcome.FAILURE, p.describe());
    }
}
