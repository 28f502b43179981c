package org.trundle.core.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.locks.Condition;
import java.util.concurrent.locks.ReentrantLock;
import java.util.function.Consumer;

import org.trundle.core.RunObserver;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;

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
        return new Execution(factory).execute(consumer);
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
     * Runs one point on the calling thread; failures are recorded, never thrown (except
     * {@link Error}s and the private abandonment signal).
     */
    static SweepRun runOne(RunFactory factory, ParameterPoint p, java.util.function.BooleanSupplier abandon) {
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
                if (abandon.getAsBoolean()) {
                    throw new Abandoned();
                }
            }
        };
        try {
            RunResult r = spec.simulation().run(spec.start(), spec.duration(), watch);
            return SweepRun.succeeded(p, r);
        } catch (Abandoned e) {
            throw e;
        } catch (RuntimeException e) {
            return SweepRun.failed(p, SweepRun.reasonOf(e));
        }
    }

    /** Thrown through a run to abandon it on cancellation. */
    static final class Abandoned extends RuntimeException {
        private static final long serialVersionUID = 1L;

        Abandoned() {
            super("run abandoned on cancellation", null, false, false);
        }
    }

    /** One execution: the shared window of results between workers and the consumer. */
    private final class Execution {
        private final RunFactory factory;
        private final int total = space.size();
        private final int window = Math.max(4 * threads, 1);
        private final SweepRun[] slots = new SweepRun[window];
        private final ReentrantLock lock = new ReentrantLock();
        private final Condition changed = lock.newCondition();
        private int nextClaim;
        private int delivered;
        private volatile boolean stop;
        private Throwable error;

        Execution(RunFactory factory) {
            this.factory = factory;
        }

        SweepSummary execute(Consumer<SweepRun> consumer) {
            List<Thread> workers = new ArrayList<>();
            for (int i = 0; i < Math.min(threads, Math.max(total, 1)); i++) {
                Thread t = new Thread(this::work, "trundle-sweep-" + i);
                t.setDaemon(true);
                workers.add(t);
                t.start();
            }
            int failed = 0;
            try {
                while (delivered < total) {
                    SweepRun next;
                    lock.lock();
                    try {
                        while ((next = slots[delivered % window]) == null && error == null
                            && !cancellation.isCancelled()) {
                            changed.awaitUninterruptibly();
                        }
                        if (error != null) {
                            break;
                        }
                        if (next == null) {
                            break; // cancelled with no further contiguous result
                        }
                        slots[delivered % window] = null;
                    } finally {
                        lock.unlock();
                    }
                    if (cancellation.isCancelled()) {
                        break;
                    }
                    consumer.accept(next);
                    if (!next.isSuccess()) {
                        failed++;
                    }
                    lock.lock();
                    try {
                        delivered++;
                        changed.signalAll();
                    } finally {
                        lock.unlock();
                    }
                    progress.update(delivered, total);
                }
            } finally {
                lock.lock();
                try {
                    stop = true;
                    changed.signalAll();
                } finally {
                    lock.unlock();
                }
                for (Thread t : workers) {
                    joinQuietly(t);
                }
            }
            if (error != null) {
                if (error instanceof Error) {
                    throw (Error) error;
                }
                throw (RuntimeException) error;
            }
            return new SweepSummary(total, delivered, failed, delivered < total);
        }

        private void work() {
            while (true) {
                int i;
                lock.lock();
                try {
                    while (!stop && !cancellation.isCancelled() && nextClaim < total && nextClaim >= delivered + window) {
                        changed.awaitUninterruptibly();
                    }
                    if (stop || cancellation.isCancelled() || nextClaim >= total || error != null) {
                        changed.signalAll();
                        return;
                    }
                    i = nextClaim++;
                } finally {
                    lock.unlock();
                }
                SweepRun r;
                try {
                    r = runOne(factory, space.point(i), () -> stop || cancellation.isCancelled());
                } catch (Abandoned e) {
                    lock.lock();
                    try {
                        changed.signalAll();
                    } finally {
                        lock.unlock();
                    }
                    return;
                } catch (RuntimeException | Error e) {
                    lock.lock();
                    try {
                        if (error == null) {
                            error = e;
                        }
                        changed.signalAll();
                    } finally {
                        lock.unlock();
                    }
                    return;
                }
                lock.lock();
                try {
                    slots[i % window] = r;
                    changed.signalAll();
                } finally {
                    lock.unlock();
                }
            }
        }
    }

    private static void joinQuietly(Thread t) {
        boolean interrupted = false;
        while (t.isAlive()) {
            try {
                t.join();
            } catch (InterruptedException e) {
                interrupted = true;
            }
        }
        if (interrupted) {
            Thread.currentThread().interrupt();
        }
    }
}
