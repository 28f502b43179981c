package org.trundle.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.trundle.core.EndReason;
import org.trundle.core.RunResult;

/**
 * The two runs of {@link SeveralContactsBenchmark} are what they claim (no timing here): both roll to the end
 * without events, the groove at {@code g sinθ/2.6} and the plane at {@code (5/7) g sinθ} (the rolling
 * accelerations of a solid ball about the chord at {@code r sin 30°} and on a plane; common practice), and the
 * groove run needs at most twice the right-hand-side evaluations of the plane run (the work count behind the
 * issue's cost target; wall time is measured with JMH on an idle machine).
 */
class SeveralContactsBenchmarkTest {
    @Test
    void bothRunsRollToTheEndAtTheirAccelerations() {
        RunResult groove = SeveralContactsBenchmark.grooveRun().run(
            SeveralContactsBenchmark.grooveStart(SeveralContactsBenchmark.grooveRun()), SeveralContactsBenchmark.DURATION);
        RunResult plane = SeveralContactsBenchmark.planeRun().run(
            SeveralContactsBenchmark.planeStart(SeveralContactsBenchmark.planeRun()), SeveralContactsBenchmark.DURATION);
        assertEquals(EndReason.DURATION, groove.endReason());
        assertEquals(EndReason.DURATION, plane.endReason());
        assertTrue(groove.events().isEmpty() && plane.events().isEmpty());
        double gs = 9.81 * Math.sin(Math.toRadians(10));
        double t = SeveralContactsBenchmark.DURATION;
        assertEquals(gs / 2.6 * t, groove.endState().velocity().getX(), 1e-8 * gs * t);
        assertEquals(gs * 5 / 7 * t, plane.endState().velocity().getX(), 1e-8 * gs * t);
        assertTrue(groove.evaluations() <= 2 * plane.evaluations(),
            "evaluations: groove " + groove.evaluations() + ", plane " + plane.evaluations());
    }
}
