package org.trundle.docs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.HertzContact;
import org.trundle.contact.PureRolling;
import org.trundle.contact.WallLoad;
import org.trundle.contact.WallLoads;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.Material;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.core.Surface;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Side;

/**
 * Keeps the README's wall-loads example compiling and running (a copy kept in sync by hand): a steel ball
 * rolling along the bottom of a horizontal acrylic bore presses with {@code m g} (statics; common practice),
 * and the reported patch is the exact Hertz solution for that load in the bore.
 */
class ReadmeWallLoadsExampleTest {
    @Test
    void readmeWallLoadsExampleRuns() {
        Ball ball = Ball.solid(0.004, 0.0021);
        Surface tube = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_I, 0.015, Side.INSIDE);
        Simulation sim = Simulation.builder().ball(ball).surface(tube).law(new PureRolling())
            .gravity(new Vector3D(0, 0, -9.81)).settings(SolverSettings.defaults().withSampleInterval(0.1)).build();
        BallState start = sim.rollingStart(new Vector3D(0, 0, -0.011), new Vector3D(0.3, 0, 0));
        List<WallLoad> seen = new ArrayList<>();

        WallLoads loads = new WallLoads("tube", tube, ball.radius(), Material.STEEL, Material.ACRYLIC);
        RunResult r = sim.run(start, 2.0, sample -> loads.of(sample).ifPresent(w ->
            System.out.println(w.time() + " s: " + w.normalForce() + " N, p0 = " + w.maxPressure() + " Pa")));

        sim.run(start, 2.0, sample -> loads.of(sample).ifPresent(seen::add));
        assertFalse(seen.isEmpty());
        double p = 0.0021 * 9.81;
        double p0 = HertzContact.solve(p, 0.004, Material.STEEL, 1 / 0.015, Vector3D.PLUS_J, 0.0, Vector3D.PLUS_I,
            Material.ACRYLIC).maxPressure();
        for (WallLoad w : seen) {
            assertEquals(p, w.normalForce(), 1e-9 * p);
            assertEquals(p0, w.maxPressure(), 1e-9 * p0);
            // the ellipse is long round the bore (across the direction of travel x)
            assertEquals(0, w.majorAxis().getX(), 1e-9);
        }
        assertEquals(2.0, r.endState().time(), 1e-12);
    }
}
