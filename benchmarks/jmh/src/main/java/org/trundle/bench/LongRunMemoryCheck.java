package org.trundle.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryMXBean;
import java.util.Locale;

import org.trundle.core.RunObserver;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.SolverSettings;

/**
 * Memory check of a long run with streamed output: the vertical-tube scenario
 * ({@link VerticalTubeCase}) run for a given number of accepted integration steps (default 10⁷),
 * with one output sample per step streamed to an observer that keeps only running extremes.
 * Meant to be started with a small heap ({@code -Xmx64m}): the library keeps only events and phase
 * spans in memory, so the run must complete and the heap in use after a full collection must not
 * grow from one checkpoint to the next.
 *
 * <p>Usage: {@code java -Xmx64m -cp benchmarks/jmh/target/trundle-benchmarks.jar org.trundle.bench.LongRunMemoryCheck [steps]}.
 * Prints one line per checkpoint (tenth of the run) with the heap in use after
 * {@code System.gc()}, and a summary; exits with status 1 when the run fails or the heap grows by
 * more than 8 MiB between the first and last checkpoint.
 */
public final class LongRunMemoryCheck {
    private LongRunMemoryCheck() {
    }

    /**
     * @param args optional number of steps (default 10,000,000)
     */
    public static void main(String[] args) {
        long target = args.length > 0 ? Long.parseLong(args[0]) : 10_000_000L;
        if (target < 10) {
            throw new IllegalArgumentException("steps must be at least 10, got " + target);
        }
        VerticalTubeCase probe = new VerticalTubeCase();
        RunResult shortRun = probe.simulation().run(probe.start(), VerticalTubeCase.period());
        double stepsPerSecond = shortRun.steps() / VerticalTubeCase.period();
        double duration = 1.02 * target / stepsPerSecond; // a little over, so that at least `target` steps are taken
        long evaluationsPerStep = shortRun.evaluations() / Math.max(1, shortRun.steps());
        SolverSettings set = SolverSettings.defaults().withMaxEvaluations(4 * target * (evaluationsPerStep + 1));
        VerticalTubeCase tube = new VerticalTubeCase(set);
        MemoryMXBean mem = ManagementFactory.getMemoryMXBean();
        long[] heap = new long[11];
        Observer obs = new Observer(target / 10, mem, heap);
        System.out.printf(Locale.ROOT, "long run: %.1f s simulated, at least %d steps, max heap %d MiB%n", duration,
            target, Runtime.getRuntime().maxMemory() >> 20);
        long t0 = System.nanoTime();
        RunResult res = tube.simulation().run(tube.start(), duration, obs);
        double wall = (System.nanoTime() - t0) / 1e9;
        System.gc();
        long endHeap = mem.getHeapMemoryUsage().getUsed();
        System.out.printf(Locale.ROOT, "end: %s after %d steps, %d samples, %d evaluations, %d events, %.1f s wall;"
                + " z in [%.6f, %.6f] m; heap in use after GC: first checkpoint %.1f MiB, end %.1f MiB;"
                + " distance residual %.2e m; energy residual %.2e%n",
            res.endReason().label(), res.steps(), obs.samples, res.evaluations(), res.events().size(), wall,
            obs.zMin, obs.zMax, heap[1] / 1048576.0, endHeap / 1048576.0, res.maxDistanceError(),
            res.energy().relativeResidual());
        boolean grew = heap[1] > 0 && endHeap - heap[1] > 8L << 20;
        if (grew || res.steps() < target) {
            System.out.println("memory check FAILED");
            System.exit(1);
        }
        System.out.println("memory check passed");
    }

    /** Keeps running extremes and takes heap readings at checkpoints. */
    private static final class Observer implements RunObserver {
        private final long every;
        private final MemoryMXBean mem;
        private final long[] heap;
        long samples;
        double zMin = Double.POSITIVE_INFINITY;
        double zMax = Double.NEGATIVE_INFINITY;

        Observer(long every, MemoryMXBean mem, long[] heap) {
            this.every = Math.max(1, every);
            this.mem = mem;
            this.heap = heap;
        }

        @Override
        public void sample(Sample s) {
            samples++;
            double z = s.state().centre().getZ();
            zMin = Math.min(zMin, z);
            zMax = Math.max(zMax, z);
            if (samples % every == 0) {
                int i = (int) Math.min(10, samples / every);
                System.gc();
                heap[i] = mem.getHeapMemoryUsage().getUsed();
                System.out.printf(Locale.ROOT, "  %d samples: heap in use after GC %.1f MiB%n", samples,
                    heap[i] / 1048576.0);
            }
        }
    }
}
