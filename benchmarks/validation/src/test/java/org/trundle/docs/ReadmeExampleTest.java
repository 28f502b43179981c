package org.trundle.docs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.StartPlacement;
import org.trundle.core.Surface;
import org.trundle.core.sweep.Axis;
import org.trundle.core.sweep.Grid;
import org.trundle.core.sweep.RunFactory;
import org.trundle.core.sweep.RunSpec;
import org.trundle.core.sweep.Sweep;
import org.trundle.core.sweep.SweepRun;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Side;

/** Keeps the README's Java examples (a run, a placed start, a sweep) compiling and running (copies kept in sync by hand). */
class ReadmeExampleTest {
    @Test
    void readmeExampleRuns() {
        Ball ball = Ball.solid(0.004, 0.0021);                       // radius 4 mm, mass 2.1 g
        Surface tube = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K,  // vertical bore, 15 mm radius,
            0.015, Side.INSIDE, -0.3, 0.0);                          // open ends at z = -0.3 m and 0
        Simulation sim = Simulation.builder()
            .ball(ball).surface(tube).law(new PureRolling())
            .gravity(new Vector3D(0, 0, -9.81))
            .build();
        BallState start = sim.rollingStart(new Vector3D(0.011, 0, -0.001), new Vector3D(0, 0.8, -0.3));
        RunResult result = sim.run(start, 3.0);
        result.exit().ifPresent(e -> System.out.println("left through " + e.edge() + " at " + e.time() + " s"));

        StartPlacement placed = StartPlacement.onSurface(sim, new Vector3D(0.0109, 0, -0.001), 0.4e-3);
        BallState onWall = sim.rollingStart(placed.centre(), new Vector3D(0, 0.8, -0.3));  // placed.distance(): 1e-4 m
        assertEquals(1e-4, placed.distance(), 1e-15);
        assertEquals(start.centre().getX(), onWall.centre().getX(), 1e-17);

        Grid grid = Grid.of(Axis.linear("speed", 0.3, 1.5, 13), Axis.linear("angle_deg", -60, 0, 7));
        RunFactory entries = p -> {
            double a = Math.toRadians(p.get("angle_deg"));
            Vector3D v = new Vector3D(0, p.get("speed") * Math.cos(a), p.get("speed") * Math.sin(a));
            return new RunSpec(sim, sim.rollingStart(new Vector3D(0.011, 0, -0.001), v), 2.0);
        };
        List<SweepRun> runs = Sweep.over(grid).threads(2).runAll(entries);
        long comeBack = runs.stream().filter(r -> r.result().flatMap(RunResult::exit)
            .map(e -> e.edge().equals("to")).orElse(false)).count();

        assertEquals(91, runs.size());
        assertTrue(comeBack > 0 && comeBack < 91, "some entries come back out, some do not: " + comeBack);
        assertEquals(EndReason.EXIT, result.endReason());
        assertEquals("to", result.exit().orElseThrow().edge());
        assertTrue(result.exit().orElseThrow().before().centre().getZ() > -1e-9);
    }
}
