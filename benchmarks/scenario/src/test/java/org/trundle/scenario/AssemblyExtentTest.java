package org.trundle.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.Patch;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;

/**
 * A {@code v_groove} with a {@code length} reports its walls' extents (each wall plane, its apex and rim
 * half-spaces and its axial range), so a ball flying along the groove past its far end is left for good.
 * Level 60° groove along x from 0 to 0.2 m, ball of radius 4 mm in free fall {@code c₀ + v₀ t + ½ g t²}
 * (common practice) from 50 mm above the apex line: each wall's coordinate along its normal starts at
 * {@code 0.05 sin 30° = 25 mm} and falls as {@code ½ g t² sin 30°}, so the ball touches both walls at
 * {@code t_w = √(2 (0.025 − r)/(g sin 30°)) ≈ 0.093 s} (the leave check grows the walls by the reach
 * {@code r′ = r (1 + 1e-6)}), while it is past the far end for good from {@code t_a = (0.2 + r′ − x₀)/u}.
 */
class AssemblyExtentTest {
    private static final double G = 9.81;
    private static final double REACH = 0.004 * (1 + 1e-6);

    private static Simulation groove() {
        return ScenarioParsingTest.parse("{\n\"ball\": {\"radius\": 0.004, \"mass\": 0.0021},\n"
            + "\"surface\": {\"type\": \"v_groove\", \"included_angle_deg\": 60, \"length\": 0.2, \"wall_width\": 0.05},\n"
            + "\"contact\": {\"law\": \"rolling\"},\n"
            + "\"start\": {\"position\": [0.1, 0, 0.05], \"velocity\": [0, 0, 0], \"spin\": [0, 0, 0]},\n"
            + "\"run\": {\"duration\": 1}\n}").simulation();
    }

    private static double wallTime() {
        return Math.sqrt(2 * (0.025 - 0.004) / (G * 0.5));
    }

    /** Past the end (t_a = 0.03 s) before it could reach a wall (t_w ≈ 0.093 s): left at once. */
    @Test
    void flyingPastTheGroovesEndIsLeftAtOnce() {
        Simulation s = groove();
        for (Patch p : s.patches()) {
            assertFalse(p.surface().extent().isEmpty(), p.id());
        }
        double x0 = 0.15;
        double u = (0.2 + REACH - x0) / 0.03;
        RunResult res = s.run(BallState.flying(new Vector3D(x0, 0, 0.05), new Vector3D(u, 0, 0), Vector3D.ZERO), 1.0);
        assertEquals(EndReason.LEFT_FOR_GOOD, res.endReason(), res.message());
        assertEquals(0.0, res.endState().time());
    }

    /** Still over the groove when it could reach the walls (t_a = 0.16 s > t_w): it lands in the groove at t_w. */
    @Test
    void fallingIntoTheGrooveIsNotLeft() {
        double x0 = 0.05;
        RunResult res = groove().run(BallState.flying(new Vector3D(x0, 0, 0.05), new Vector3D(1.0, 0, 0),
            Vector3D.ZERO), 0.1);
        assertNotEquals(EndReason.LEFT_FOR_GOOD, res.endReason(), res.message());
        assertEquals(wallTime(), res.eventsOf(EventKind.IMPACT).get(0).time(), 1e-9);
    }
}
