package org.trundle.bench;

import java.util.Locale;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.AuxCounters;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.trundle.bench.baseline.CostProbe;
import org.trundle.bench.baseline.VerticalTubeRolling;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.RunResult;
import org.trundle.core.SolverSettings;

/**
 * Whole vertical-tube runs: the general library configured as a user would configure it
 * ({@link VerticalTubeCase}: default solver settings, tolerance 1e-10, default detectors, default
 * observer) against the hand-derived {@link VerticalTubeRolling} baseline integrated by the same
 * Hipparchus Dormand–Prince 8(5,3) at the same tolerance, over the same simulated time
 * ({@value #PERIODS} height periods, about 0.81 s).
 *
 * <p>Throughput mode: the primary score is runs per second, so the cost of generality is
 * {@code baseline score / library score} (the library's wall time over the baseline's). The
 * auxiliary counters give, per second of wall time, the right-hand-side evaluations
 * ({@code libraryEvaluations}, counting every kernel call of the run: integrator stages,
 * event functions, output samples, projections) and the simulated seconds
 * ({@code librarySimulatedSeconds}).
 *
 * <p>Two further baseline variants ({@link CostProbe}) add one cost of the library at a time, the
 * longer state and one event detector at the default check interval, to decompose the ratio.
 *
 * <p>The trial setup runs both once and refuses to measure unless they reached the same accuracy:
 * end states agree to 1e-9 (centre relative to the orbit radius, velocity relative to the start
 * speed, spin relative to speed/radius, quaternion absolute) and both height frequencies are within
 * 1e-9 of {@code Ω sqrt(k/(1+k))} (Gualtieri, Tokieda et al., Am. J. Phys. 74 (2006) 497–501).
 */
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
public class FullRunBenchmark {
    /** Height periods simulated per run. */
    public static final int PERIODS = 5;

    /** The scenario, checked once per trial. */
    @State(Scope.Thread)
    public static class Scenario {
        VerticalTubeCase tube;
        BallState start;
        double[] baseStart;
        double duration;
        double tolerance;

        /** Builds the scenario and checks that library and baseline reach the same accuracy. */
        @Setup(Level.Trial)
        public void setUp() {
            tube = new VerticalTubeCase();
            start = tube.start();
            baseStart = tube.baselineStart();
            duration = PERIODS * VerticalTubeCase.period();
            tolerance = SolverSettings.defaults().tolerance();
            RunResult res = tube.simulation().run(start, duration);
            if (res.endReason() != EndReason.DURATION) {
                throw new IllegalStateException("library run ended by " + res.endReason() + ": " + res.message());
            }
            VerticalTubeRolling base = tube.baseline();
            double[] b = base.integrate(baseStart, duration, tolerance, null);
            double[] agreement = agreement(res.endState(), b);
            double fLib = VerticalTubeCase.frequencyError(res.endState().centre().getZ(),
                res.endState().velocity().getZ(), PERIODS);
            double fBase = VerticalTubeCase.frequencyError(b[2], b[5], PERIODS);
            System.out.printf(Locale.ROOT, "%n[accuracy check] end-state agreement: centre %.3g, velocity %.3g,"
                    + " quaternion %.3g, spin %.3g; frequency error: library %.3g, baseline %.3g;"
                    + " evaluations per run: library %d (steps %d), baseline %d%n",
                agreement[0], agreement[1], agreement[2], agreement[3], fLib, fBase,
                res.evaluations(), res.steps(), base.evaluations());
            // same accuracy reached: both meet the 1e-9 frequency target against the analytic
            // solution (below); the end states agree to the integration level (the baseline has no
            // projection, so its own drift dominates their 1e-9-level difference)
            for (double a : agreement) {
                if (!(a < 1e-8)) {
                    throw new IllegalStateException("library and baseline disagree: " + a);
                }
            }
            if (!(Math.abs(fLib) < 1e-9 && Math.abs(fBase) < 1e-9)) {
                throw new IllegalStateException("frequency error too large: library " + fLib + ", baseline " + fBase);
            }
        }
    }

    /** Library work counters, normalised by JMH to per-second rates. */
    @State(Scope.Thread)
    @AuxCounters(AuxCounters.Type.OPERATIONS)
    public static class LibraryWork {
        /** Right-hand-side evaluations (all kernel calls of the run). */
        public long libraryEvaluations;
        /** Simulated time (s). */
        public double librarySimulatedSeconds;

        /** Zeroes the counters before each iteration. */
        @Setup(Level.Iteration)
        public void reset() {
            libraryEvaluations = 0;
            librarySimulatedSeconds = 0;
        }
    }

    /** Baseline work counters, normalised by JMH to per-second rates. */
    @State(Scope.Thread)
    @AuxCounters(AuxCounters.Type.OPERATIONS)
    public static class BaselineWork {
        /** Right-hand-side evaluations. */
        public long baselineEvaluations;
        /** Simulated time (s). */
        public double baselineSimulatedSeconds;

        /** Zeroes the counters before each iteration. */
        @Setup(Level.Iteration)
        public void reset() {
            baselineEvaluations = 0;
            baselineSimulatedSeconds = 0;
        }
    }

    /**
     * @param s scenario
     * @param w counters
     * @return the run result (sunk by JMH)
     */
    @Benchmark
    public RunResult library(Scenario s, LibraryWork w) {
        RunResult res = s.tube.simulation().run(s.start, s.duration);
        w.libraryEvaluations += res.evaluations();
        w.librarySimulatedSeconds += s.duration;
        return res;
    }

    /**
     * @param s scenario
     * @param w counters
     * @return the end state (sunk by JMH)
     */
    @Benchmark
    public double[] baseline(Scenario s, BaselineWork w) {
        VerticalTubeRolling base = s.tube.baseline();
        double[] end = base.integrate(s.baseStart, s.duration, s.tolerance, null);
        w.baselineEvaluations += base.evaluations();
        w.baselineSimulatedSeconds += s.duration;
        return end;
    }

    /**
     * The baseline with the library's full state length (19 components, the 6 extra ones idle; the
     * library itself now integrates 11 while rolling): the
     * integrator's own array work for a longer state.
     *
     * @param s scenario
     * @return the end state (sunk by JMH)
     */
    @Benchmark
    public double[] baselineWith19Components(Scenario s) {
        return CostProbe.integrate(s.tube.baseline(), s.baseStart, s.duration, s.tolerance, 19, 0.0);
    }

    /**
     * The baseline with one never-firing event detector checked at the library's default
     * interval ({@code SolverSettings.maxCheckInterval()}, 1 ms): the cost of Hipparchus' event
     * checks (one interpolated state per check) independent of what the event function computes.
     *
     * @param s scenario
     * @return the end state (sunk by JMH)
     */
    @Benchmark
    public double[] baselineWithOneDetector(Scenario s) {
        return CostProbe.integrate(s.tube.baseline(), s.baseStart, s.duration, s.tolerance, VerticalTubeRolling.DIM,
            SolverSettings.defaults().maxCheckInterval());
    }

    /**
     * End-state agreement between a library state and a baseline state (c, v, q, ω).
     *
     * @param lib library end state
     * @param b baseline end state
     * @return {centre / ρ, velocity / u, quaternion, spin / (u/r)} differences
     */
    static double[] agreement(BallState lib, double[] b) {
        double rho = VerticalTubeCase.orbitRadius();
        double u = VerticalTubeCase.SPEED;
        double r = VerticalTubeCase.BALL_RADIUS;
        double[] c = lib.centre().toArray();
        double[] v = lib.velocity().toArray();
        double[] w = lib.spin().toArray();
        // Hamilton components (Hipparchus' Rotation stores the conjugate)
        double[] q = {lib.orientation().getQ0(), -lib.orientation().getQ1(), -lib.orientation().getQ2(),
            -lib.orientation().getQ3()};
        return new double[] {diff(c, b, 0, 3) / rho, diff(v, b, 3, 3) / u, diff(q, b, 6, 4), diff(w, b, 10, 3) / (u / r)};
    }

    private static double diff(double[] a, double[] b, int at, int len) {
        double s = 0;
        for (int i = 0; i < len; i++) {
            s += (a[i] - b[at + i]) * (a[i] - b[at + i]);
        }
        return Math.sqrt(s);
    }
}
