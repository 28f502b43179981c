package org.trundle.bench;

import java.util.List;
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
import org.trundle.contact.Coulomb;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.core.sweep.Axis;
import org.trundle.core.sweep.Grid;
import org.trundle.core.sweep.RunSpec;
import org.trundle.core.sweep.Sweep;
import org.trundle.core.sweep.SweepRun;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Side;

/**
 * Full runs on curved guides (invented example data, default solver settings): a ball rolling round
 * a toroidal ring groove (major radius 50 mm, groove radius 6 mm, 4 mm ball, 0.5 s), a ball rolling
 * down a helical spline chute (tube radius 12 mm, 3 turns of radius 60 mm, pitch 40 mm; 0.5 s), and a
 * 1,000-run sweep (vertical return tube, Coulomb friction, 0.2 s each) through the library's sweep
 * API on 2 threads. Each setup checks its run closes its energy budget to 1e-8 of the energy scale
 * (DESIGN.md §8), so the benchmark never times a wrong run.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class CurvedRunBenchmark {

    /** The scenarios, built and checked once per trial. */
    @State(Scope.Thread)
    public static class Scenarios {
        Simulation groove;
        BallState grooveStart;
        Simulation chute;
        BallState chuteStart;
        Sweep sweep;
        Simulation tube;

        /** Builds and checks the runs. */
        @Setup(Level.Trial)
        public void setUp() {
            Ball ball = Ball.solid(0.004, 0.0021);
            Vector3D g = new Vector3D(0, 0, -9.81);
            groove = CurvedCases.TORUS_GROOVE.simulation(SolverSettings.defaults());
            grooveStart = CurvedCases.TORUS_GROOVE.start(groove);
            check(groove.run(grooveStart, 0.5), "torus groove");
            chute = CurvedCases.SPLINE_CHUTE.simulation(SolverSettings.defaults());
            chuteStart = CurvedCases.SPLINE_CHUTE.start(chute);
            check(chute.run(chuteStart, 0.5), "spline chute");

            tube = Simulation.builder().ball(ball)
                .surface(new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, 0.015, Side.INSIDE, -0.3, 0.0))
                .law(new Coulomb(0.6, 0.5, 0.4)).gravity(g).build();
            sweep = Sweep.over(Grid.of(Axis.linear("speed", 0.3, 1.5, 40), Axis.linear("angle_deg", -60, 30, 25)))
                .threads(2);
            List<SweepRun> runs = sweep.runAll(this::tubeRun);
            if (runs.size() != 1000 || runs.stream().anyMatch(r -> !r.isSuccess())) {
                throw new IllegalStateException("sweep setup failed");
            }
        }

        RunSpec tubeRun(org.trundle.core.sweep.ParameterPoint p) {
            double a = Math.toRadians(p.get("angle_deg"));
            double s = p.get("speed");
            return new RunSpec(tube, tube.rollingStart(new Vector3D(0.011, 0, -0.15),
                new Vector3D(0, s * Math.cos(a), s * Math.sin(a))), 0.2);
        }

        private static void check(RunResult r, String what) {
            if (!(r.energy().relativeResidual() < 1e-8) || r.steps() < 10) {
                throw new IllegalStateException(what + " run fails its check: " + r.endReason() + " " + r.energy());
            }
        }
    }

    /**
     * @param s scenarios
     * @return the run
     */
    @Benchmark
    public RunResult torusGroove(Scenarios s) {
        return s.groove.run(s.grooveStart, 0.5);
    }

    /**
     * @param s scenarios
     * @return the run
     */
    @Benchmark
    public RunResult splineChute(Scenarios s) {
        return s.chute.run(s.chuteStart, 0.5);
    }

    /**
     * @param s scenarios
     * @return the runs
     */
    @Benchmark
    public List<SweepRun> sweepOf1000(Scenarios s) {
        return s.sweep.runAll(s::tubeRun);
    }
}
