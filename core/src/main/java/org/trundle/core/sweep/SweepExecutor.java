package org.trundle.core.sweep;

import java.util.function.Consumer;

/**
 * Executes a sweep described by data — a {@link ParameterSpace} (a grid, or a seeded
 * {@link RandomSample} whose point {@code i} comes from the seed and {@code i} alone) and a
 * {@link PointTask} that turns one point into one row — and delivers the rows, in index order, to
 * a sink. The executor decides where the points run: {@link ThreadedExecutor} on the threads of
 * this JVM (the default of {@link Sweep}); the {@code trundle-spark} module on an Apache Spark
 * cluster. Because each row is a pure function of its point, every executor gives the same rows.
 *
 * <p>An executor never materialises the space or holds all rows: it asks for points by index and
 * hands each row on as soon as the rows before it are delivered.
 */
public interface SweepExecutor {
    /**
     * Runs every point of the space (or a prefix of the index order, when cancelled).
     *
     * @param <R> the row type
     * @param space the points
     * @param task turns a point into its row
     * @param sink receives the rows in index order {@code 0, 1, 2, …}, on the calling thread
     * @return what was done
     */
    <R> SweepSummary execute(ParameterSpace space, PointTask<R> task, Consumer<? super R> sink);
}
