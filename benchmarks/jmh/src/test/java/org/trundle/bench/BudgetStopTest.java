package org.trundle.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.trundle.core.EndReason;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.SolverSettings;

/**
 * A run that uses up its evaluation budget ends with {@link EndReason#BUDGET} and a finite end
 * state at or before the last accepted step, with and without an observer (common practice: a
 * budget is a typed stop, never an internal exception).
 */
class BudgetStopTest {
    @Test
    void exhaustedBudgetEndsTheRunCleanly() {
        VerticalTubeCase tube = new VerticalTubeCase(SolverSettings.defaults().withMaxEvaluations(1000));
        RunResult quiet = tube.simulation().run(tube.start(), 1.0);
        assertEquals(EndReason.BUDGET, quiet.endReason(), quiet.message());
        assertTrue(quiet.endState().time() > 0 && quiet.endState().time() < 1.0, "end time " + quiet.endState().time());

        List<Sample> samples = new ArrayList<>();
        RunResult observed = tube.simulation().run(tube.start(), 1.0, samples::add);
        assertEquals(EndReason.BUDGET, observed.endReason());
        // the observer does not change the integration: same end state, bit for bit
        assertEquals(quiet.endState().centre(), observed.endState().centre());
        assertEquals(quiet.endState().time(), observed.endState().time());
        assertTrue(samples.size() > 10, "samples " + samples.size());
        assertTrue(samples.get(samples.size() - 1).time() <= observed.endState().time());
    }
}
