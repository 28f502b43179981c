package org.trundle.core.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;

import org.trundle.core.RunObserver;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.SimulationException;

/**
 * Runs every point of a {@link ParameterSpace} through a {@link RunFactory} on a number of worker
 * threads and streams the outcomes to a consumer in index order.
 *
 * <pre>{@code
 * Grid grid = Grid.of(Axis.linear("speed", 0.2, 1.2, 11), Axis.linear("angle", -60, 0, 7));
 * SweepSummary s = Sweep.over(grid).threads(2)
 *     .run(p -> new RunSpec(sim, startFor(p.get("speed"), p.get("angle")), 1.0),
 *          run -> System.out.println(run));
 * }</pre>
 *
 * <p><b>Determinism.</b> Each run is independent (a {@link org.trundle.core.Simulation} owns no
 * per-run state), the factory is a pure function of the point, and the consumer is called on the
 * calling thread in index order {@code 0, 1, 2, …}; so the sequence of outcomes is bit-identical
 * whatever the thread count. Workers run at most a window of {@code 4 × threads} points ahead of
 * the consumer, which bounds the memory held.
 *
 * <p><b>Failures.</b> An exception thrown by the factory or by the run (an inconsistent start, a
 * {@link org.trundle.core.SimulationException}) is recorded as a failed {@link SweepRun} with its
 * reason and the sweep goes on. An {@link Error} stops the sweep and is rethrown, as is an
 * exception thrown by the consumer or the progress callback.
 *
 * <p><b>Cancellation.</b> After {@link Cancellation#cancel()} no new run starts and runs in flight
 * are abandoned at their next output sample; the consumer has then received a prefix of the index
 * order, and {@link SweepSummary#cancelled()} is true.
 *
 * <p><b>Executors.</b> A sweep runs on a {@link ThreadedExecutor} ({@link #executor()}); the same
 * space with a {@link PointTask} that reduces each run to a flat row can run on any
 * {@link SweepExecutor} (the {@code trundle-spark} module runs it on Apache Spark).
 *
 * <p>Immutable: {@code threads}, {@code progress} and {@code cancellation} return copies.
 */
public final class Sweep {
    private final ParameterSpace space;
    private final int threads;
    private final SweepProgress progress;
    private final Cancellation cancellation;

    private Sweep(ParameterSpace space, int threads, SweepProgress progress, Cancellation cancellation) {
        if (space == null) {
            throw new IllegalArgumentException("parameter space must be given, got null");
        }
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, got " + threads);
        }
        this.space = space;
        this.threads = threads;
        this.progress = progress == null ? SweepProgress.NONE : progress;
        this.cancellation = cancellation == null ? new Cancellation() : cancellation;
    }

    /**
     * A sweep over a space on all available processors, without progress reports.
     *
     * @param space the points to run
     * @return the sweep
     */
    public static Sweep over(ParameterSpace space) {
        return new Sweep(space, Runtime.getRuntime().availableProcessors(), SweepProgress.NONE, null);
    }

    /**
     * @param n number of worker threads, at least 1
     * @return a copy running on n threads
     */
    public Sweep threads(int n) {
        return new Sweep(space, n, progress, cancellation);
    }

    /**
     * @param p progress callback, called on the calling thread
     * @return a copy reporting progress to p
     */
    public Sweep progress(SweepProgress p) {
        return new Sweep(space, threads, p, cancellation);
    }

    /**
     * @param c cancellation flag to watch
     * @return a copy that stops when c is set
     */
    public Sweep cancellation(Cancellation c) {
        return new Sweep(space, threads, progress, c);
    }

    /** @return the space */
    public ParameterSpace space() {
        return space;
    }

    /** @return number of worker threads */
    public int threadCount() {
        return threads;
    }

    /**
     * Runs the sweep, blocking until every run is delivered or the sweep is cancelled.
     *
     * @param factory builds each point's run
     * @param consumer receives each outcome, in index order, on the calling thread
     * @return what was done
     */
    public SweepSummary run(RunFactory factory, Consumer<SweepRun> consumer) {
        if (factory == null || consumer == null) {
            throw new IllegalArgumentException("factory and consumer must be given, got " + factory + ", " + consumer);
        }
        PointTask<SweepRun> task = new PointTask<>() {
            @Override
            public SweepRun run(ParameterPoint point, BooleanSupplier abandoned) {
                return runPoint(factory, point, abandoned);
            }

            @Override
            public boolean failed(SweepRun row) {
                return !row.isSuccess();
            }
        };
        return executor().execute(space, task, consumer);
    }

    /** @return the local executor this sweep runs on (its threads, progress and cancellation) */
    public ThreadedExecutor executor() {
        return new ThreadedExecutor(threads, progress, cancellation);
    }

    /**
     * Runs the sweep and collects the outcomes in index order.
     *
     * @param factory builds each point's run
     * @return the outcomes (a prefix of the space when cancelled)
     */
    public List<SweepRun> runAll(RunFactory factory) {
        List<SweepRun> out = new ArrayList<>();
        run(factory, out::add);
        return out;
    }

    /**
     * Runs one point on the calling thread and records the outcome: the building block of a
     * {@link PointTask} that reduces a run to a row where it runs. Failures (the factory threw or
     * returned nothing, the run threw) are recorded with their reason, never thrown; {@link Error}s
     * are thrown.
     *
     * @param factory builds the point's run
     * @param p the point
     * @param abandoned polled at every output sample; when it turns true the run is given up
     * @return the outcome, or {@code null} when the run was abandoned
     */
    public static SweepRun runPoint(RunFactory factory, ParameterPoint p, BooleanSupplier abandoned) {
        RunSpec spec;
        try {
            spec = factory.create(p);
            if (spec == null) {
                return SweepRun.failed(p, "the run factory returned no run for " + p);
            }
        } catch (RuntimeException e) {
            return SweepRun.failed(p, SweepRun.reasonOf(e));
        }
        RunObserver watch = new RunObserver() {
            @Override
            public void sample(Sample s) {
                if (abandoned.getAsBoolean()) {
                    throw new Abandoned();
                }
            }
        };
        try {
            RunResult r = spec.simulation().run(spec.start(), spec.duration(), watch);
            return SweepRun.succeeded(p, r);
        } catch (SimulationException e) {
            // the run wraps what its observer throws, the abandonment too
            return e.getCause() instanceof Abandoned ? null : SweepRun.failed(p, SweepRun.reasonOf(e));
        } catch (RuntimeException e) {
            return SweepRun.failed(p, SweepRun.reasonOf(e));
        }
    }

    /** Thrown through a run to abandon it on cancellation. */
    private static final class Abandoned extends RuntimeException {
        private static final long serialVersionUID = 1L;

        Abandoned() {
            super("run abandoned on cancellation", null, false, false);
        }
    }
}
