package org.trundle.docs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.PureRolling;
import org.trundle.contact.WallLoad;
import org.trundle.contact.WallLoads;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.Material;
import org.trundle.core.Patch;
import org.trundle.core.Phase;
import org.trundle.core.Sample;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.core.SurfaceMotion;
import org.trundle.surfaces.Plane;

/**
 * Keeps the README's scene wall-loads example compiling and running (a copy kept in sync by hand): a steel ball
 * rolling on an aluminium turntable (a moving patch) beside a still steel floor patch it never reaches. On the
 * level table the normal force is {@code m g} (statics; common practice) and the patch is the ball-on-flat Hertz
 * solution {@code c = (3 P r/(4 E*))^{1/3}}, {@code p₀ = 3P/(2π c²)}, {@code δ = c²/r} (K. L. Johnson, Contact
 * Mechanics, 1985, ch. 4), with E* of steel on aluminium; 1e-9 relative (closed forms).
 */
class ReadmeSceneWallLoadsExampleTest {
    @Test
    void readmeSceneWallLoadsExampleRuns() {
        Ball ball = Ball.solid(0.005, 0.004);
        List<WallLoad> seen = new ArrayList<>();

        Simulation sim = Simulation.builder().ball(ball).law(new PureRolling()).gravity(new Vector3D(0, 0, -9.81))
            .patch(new Patch("table", new Plane(Vector3D.ZERO, Vector3D.PLUS_K),
                SurfaceMotion.rotation(Vector3D.PLUS_K, Vector3D.ZERO, 3.0), null))
            .patch(Patch.of("floor", new Plane(new Vector3D(0, 0, -0.2), Vector3D.PLUS_K)))
            .settings(SolverSettings.defaults().withSampleInterval(0.01)).build();
        WallLoads loads = WallLoads.forScene(sim, Material.STEEL,
            Map.of("table", Material.ALUMINIUM, "floor", Material.STEEL));
        BallState start = sim.rollingStart(new Vector3D(0.05, 0, 0.005), new Vector3D(0, 0.1, 0));
        sim.run(start, 1.0, sample -> seen.addAll(loads.loads(sample)));   // one load per touching patch

        assertTrue(seen.size() > 90, "a load per sample: " + seen.size());
        double p = 0.004 * 9.81;
        double eStar = 1 / ((1 - 0.3 * 0.3) / 210e9 + (1 - 0.33 * 0.33) / 70e9);   // steel on aluminium
        double c = Math.cbrt(3 * p * 0.005 / (4 * eStar));
        for (WallLoad w : seen) {
            assertEquals("table", w.patch());
            assertEquals(p, w.normalForce(), 1e-9 * p);
            assertEquals(c, w.semiMajor(), 1e-9 * c);
            assertEquals(c, w.semiMinor(), 1e-9 * c);
            assertEquals(3 * p / (2 * Math.PI * c * c), w.maxPressure(), 1e-9 * w.maxPressure());
            assertEquals(c * c / 0.005, w.approach(), 1e-9 * w.approach());
        }
        assertEquals(List.of("table", "floor"), loads.patches());
    }

    @Test
    void unknownPatchesAndUnsplitForcesAreRefused() {
        Simulation sim = Simulation.builder().ball(Ball.solid(0.005, 0.004)).law(new PureRolling())
            .gravity(new Vector3D(0, 0, -9.81)).patch(Patch.of("left", new Plane(Vector3D.ZERO, Vector3D.PLUS_K)))
            .patch(Patch.of("right", new Plane(Vector3D.ZERO, Vector3D.PLUS_I))).build();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
            () -> WallLoads.forScene(sim, Material.STEEL, Map.of("lift", Material.STEEL)));
        assertTrue(e.getMessage().contains("\"lift\", which is not a patch of the scene [left, right]"), e.getMessage());
        WallLoads loads = WallLoads.forScene(sim, Material.STEEL, Map.of("left", Material.STEEL));
        BallState s = BallState.flying(new Vector3D(0.005, 0, 0.005), Vector3D.ZERO, Vector3D.ZERO).withPhase(Phase.ROLLING);
        Sample twoWithOneForce = new Sample(s, 1.0, Vector3D.ZERO, Vector3D.ZERO, Vector3D.ZERO, false,
            List.of("left", "right"));
        IllegalArgumentException two = assertThrows(IllegalArgumentException.class, () -> loads.loads(twoWithOneForce));
        assertTrue(two.getMessage().contains("touches [left, right] but carries no per-contact forces"),
            two.getMessage());
    }
}
