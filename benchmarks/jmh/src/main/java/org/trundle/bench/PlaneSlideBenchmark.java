package org.trundle.bench;

import java.util.Locale;
import java.util.concurrent.TimeUnit;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.openjdk.jmh.annotations.AuxCounters;
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
import org.trundle.core.EventKind;
import org.trundle.core.Phase;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.surfaces.Plane;

/**
 * A sliding-to-rolling run on a level plane (invented example data): a solid ball of radius 4 mm
 * launched at 1 m/s without spin, Coulomb friction {@code μ_k = 0.25}, default solver settings,
 * over twice the sliding time. Throughput mode (runs per second) with right-hand-side evaluations
 * and simulated seconds per wall second as auxiliary counters.
 *
 * <p>The trial setup checks the run against the textbook result: while sliding,
 * {@code v̇ = −μ_k g} and {@code r ω̇ = μ_k g / k}, so slip ends at
 * {@code t* = k v₀ / ((1+k) μ_k g)} and the ball then rolls at {@code v₀/(1+k)} (5/7 of the launch
 * speed for a solid ball; standard textbook result, e.g. the billiard-ball problem in any
 * undergraduate mechanics text). Both to 1e-6 relative: the stick threshold
 * {@code ε = 1e-8 V} shifts {@code t*} by {@code ε/(μ_k g (1+1/k))}, about 1e-8 relative.
 */
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
public class PlaneSlideBenchmark {
    static final double V0 = 1.0;
    static final double MU = 0.25;
    static final double G = 9.81;

    /** The scenario, checked once per trial. */
    @State(Scope.Thread)
    public static class Scenario {
        Simulation sim;
        BallState start;
        double duration;

        /** Builds and checks the run. */
        @Setup(Level.Trial)
        public void setUp() {
            Ball ball = Ball.solid(0.004, 0.0021);
            sim = Simulation.builder().ball(ball).surface(new Plane(Vector3D.ZERO, Vector3D.PLUS_K))
                .law(new Coulomb(0.3, MU, 0.5)).gravity(new Vector3D(0, 0, -G)).build();
            start = BallState.of(0, new Vector3D(0, 0, 0.004), new Vector3D(V0, 0, 0), Rotation.IDENTITY,
                Vector3D.ZERO, Phase.SLIDING);
            double k = ball.inertiaFactor();
            double tStick = k * V0 / ((1 + k) * MU * G);
            duration = 2 * tStick;
            RunResult res = sim.run(start, duration);
            RunEvent stick = res.eventsOf(EventKind.STICK).stream().findFirst()
                .orElseThrow(() -> new IllegalStateException("no stick event: " + res.events()));
            double vEnd = res.endState().velocity().getNorm();
            double eT = Math.abs(stick.time() - tStick) / tStick;
            double eV = Math.abs(vEnd - V0 / (1 + k)) / (V0 / (1 + k));
            System.out.printf(Locale.ROOT, "%n[accuracy check] stick time error %.3g, rolling speed error %.3g,"
                + " evaluations %d, steps %d%n", eT, eV, res.evaluations(), res.steps());
            if (!(eT < 1e-6 && eV < 1e-6)) {
                throw new IllegalStateException("plane run off the textbook result: " + eT + ", " + eV);
            }
        }
    }

    /** Work counters, normalised by JMH to per-second rates. */
    @State(Scope.Thread)
    @AuxCounters(AuxCounters.Type.OPERATIONS)
    public static class Work {
        /** Right-hand-side evaluations. */
        public long planeEvaluations;
        /** Simulated time (s). */
        public double planeSimulatedSeconds;

        /** Zeroes the counters before each iteration. */
        @Setup(Level.Iteration)
        public void reset() {
            planeEvaluations = 0;
            planeSimulatedSeconds = 0;
        }
    }

    /**
     * @param s scenario
     * @param w counters
     * @return the result (sunk by JMH)
     */
    @Benchmark
    public RunResult slideThenRoll(Scenario s, Work w) {
        RunResult res = s.sim.run(s.start, s.duration);
        w.planeEvaluations += res.evaluations();
        w.planeSimulatedSeconds += s.duration;
        return res;
    }
}
