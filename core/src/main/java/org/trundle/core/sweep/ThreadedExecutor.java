package org.trundle.core.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.locks.Condition;
import java.util.concurrent.locks.ReentrantLock;
import java.util.function.Consumer;

/**
 * The local {@link SweepExecutor}: runs the points on a number of worker threads of this JVM and
 * delivers the rows to the sink on the calling thread, in index order.
 *
 * <p>Workers claim indices in increasing order and run at most a window of {@code 4 × threads}
 * points ahead of the sink, which bounds the rows held. An exception thrown by the task or an
 * {@link Error} stops the sweep and is rethrown, as is one thrown by the sink or the progress
 * callback. After {@link Cancellation#cancel()} no new point starts and runs in flight are
 * abandoned (their task sees {@code abandoned} true); the sink has then received a prefix of the
 * index order and {@link SweepSummary#cancelled()} is true.
 *
 * <p>Immutable; one instance may run several sweeps one after another or at once.
 */
public final class ThreadedExecutor implements SweepExecutor {
    private final int threads;
    private final SweepProgress progress;
    private final Cancellation cancellation;

    /**
     * @param threads number of worker threads, at least 1
     * @param progress progress callback, called on the calling thread (null for none)
     * @param cancellation flag to watch (null for a fresh one)
     */
    public ThreadedExecutor(int threads, SweepProgress progress, Cancellation cancellation) {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, got " + threads);
        }
        this.threads = threads;
        this.progress = progress == null ? SweepProgress.NONE : progress;
        this.cancellation = cancellation == null ? new Cancellation() : cancellation;
    }

    /** @return number of worker threads */
    public int threadCount() {
        return threads;
    }

    @Override
    public <R> SweepSummary execute(ParameterSpace space, PointTask<R> task, Consumer<? super R> sink) {
        if (space == null || task == null || sink == null) {
            throw new IllegalArgumentException("space, task and sink must be given, got " + space + ", " + task
                + ", " + sink);
        }
        return new Execution<R>(space, task).execute(sink);
    }

    /** One execution: the shared window of rows between workers and the sink. */
    private final class Execution<R> {
        private final ParameterSpace space;
        private final PointTask<R> task;
        private final int total;
        private final int window = Math.max(4 * threads, 1);
        private final Object[] slots = new Object[window];
        private final ReentrantLock lock = new ReentrantLock();
        private final Condition changed = lock.newCondition();
        private int nextClaim;
        private int delivered;
        private volatile boolean stop;
        private Throwable error;

        Execution(ParameterSpace space, PointTask<R> task) {
            this.space = space;
            this.task = task;
            this.total = space.size();
        }

        SweepSummary execute(Consumer<? super R> sink) {
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
                    Object next;
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
                            break; // cancelled with no further contiguous row
                        }
                        slots[delivered % window] = null;
                    } finally {
                        lock.unlock();
                    }
                    if (cancellation.isCancelled()) {
                        break;
                    }
                    @SuppressWarnings("unchecked")
                    R row = (R) next;
                    sink.accept(row);
                    if (task.failed(row)) {
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
                R r;
                Throwable failure = null;
                try {
                    r = task.run(space.point(i), () -> stop || cancellation.isCancelled());
                    if (r == null && !stop && !cancellation.isCancelled()) {
                        failure = new IllegalStateException("the sweep task returned no row for point " + i
                            + " without being abandoned");
                    }
                } catch (RuntimeException | Error e) {
                    r = null;
                    failure = e;
                }
                lock.lock();
                try {
                    if (failure != null && error == null) {
                        error = failure;
                    }
                    if (r != null) {
                        slots[i % window] = r;
                    }
                    changed.signalAll();
                } finally {
                    lock.unlock();
                }
                if (r == null) {
                    return;
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
