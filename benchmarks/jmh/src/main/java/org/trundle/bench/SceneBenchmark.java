package org.trundle.bench;

import java.util.concurrent.TimeUnit;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.Patch;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.SurfaceMotion;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Plane;
import org.trundle.surfaces.Side;

/**
 * Runs of the new core's additions beside the existing suite: a two-patch scene (a ball rolling down
 * a vertical bore made of two coaxial tubes joined end to end, one hand-over) against the same run in
 * one long tube, and a ball orbiting on a turntable (a moving surface). Throughput in runs per
 * second; the setup refuses to measure unless the scene run hands over exactly once.
 */
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
public class SceneBenchmark {
    /** The scenarios. */
    @State(Scope.Thread)
    public static class Scenes {
        Simulation twoTubes;
        Simulation oneTube;
        BallState tubeStart;
        Simulation turntable;
        BallState tableStart;

        /** Builds the scenes and checks the hand-over. */
        @Setup(Level.Trial)
        public void setUp() {
            double radius = 0.015;
            Ball ball = Ball.solid(0.004, 0.0021);
            Vector3D g = new Vector3D(0, 0, -9.81);
            twoTubes = Simulation.builder().ball(ball)
                .patch(Patch.of("upper", new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, radius, Side.INSIDE, -0.025, 0.0)))
                .patch(Patch.of("lower", new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, radius, Side.INSIDE, -1.0, -0.025)))
                .law(new PureRolling()).gravity(g).build();
            oneTube = Simulation.builder().ball(ball)
                .surface(new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, radius, Side.INSIDE, -1.0, 0.0))
                .law(new PureRolling()).gravity(g).build();
            tubeStart = twoTubes.rollingStart(new Vector3D(radius - 0.004, 0, -0.02), new Vector3D(0, 0.8, -0.3));
            RunResult r = twoTubes.run(tubeStart, 0.06);
            if (r.endReason() != EndReason.DURATION || r.eventsOf(EventKind.HANDOVER).size() != 1) {
                throw new IllegalStateException("scene run: " + r.endReason() + " " + r.events());
            }
            turntable = Simulation.builder().ball(Ball.solid(0.01, 0.02))
                .surface(new Plane(Vector3D.ZERO, Vector3D.PLUS_K))
                .motion(SurfaceMotion.rotation(Vector3D.PLUS_K, Vector3D.ZERO, 3.0))
                .law(new PureRolling()).gravity(g).build();
            tableStart = turntable.rollingStart(new Vector3D(0.05, 0, 0.01), new Vector3D(0, 0.1, 0));
        }
    }

    /**
     * @param s the scenes
     * @return the result
     */
    @Benchmark
    public RunResult twoTubesHandOver(Scenes s) {
        return s.twoTubes.run(s.tubeStart, 0.06);
    }

    /**
     * @param s the scenes
     * @return the result
     */
    @Benchmark
    public RunResult oneLongTube(Scenes s) {
        return s.oneTube.run(s.tubeStart, 0.06);
    }

    /**
     * @param s the scenes
     * @return the result
     */
    @Benchmark
    public RunResult turntableOrbit(Scenes s) {
        return s.turntable.run(s.tableStart, 1.0);
    }
}
