package org.trundle.core.sweep;

import java.util.List;

/**
 * A finite, ordered set of parameter points: the runs of a {@link Sweep}. Point {@code i} must be
 * the same on every call (a pure function of the index), which is what makes a sweep's output
 * independent of the thread count.
 *
 * <p>Implementations are immutable and thread-safe: {@link Grid}, {@link RandomSample}.
 */
public interface ParameterSpace {
    /** @return the parameter names, in the order of {@link ParameterPoint#value(int)} */
    List<String> names();

    /** @return the number of points */
    int size();

    /**
     * @param index point index, {@code 0 ≤ index < size()}
     * @return the point
     * @throws IndexOutOfBoundsException for an index outside the space
     */
    ParameterPoint point(int index);
}
