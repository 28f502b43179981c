package org.trundle.core.sweep;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.SplittableRandom;

/**
 * {@code count} points drawn uniformly and independently from a box of parameter ranges, with a
 * seeded {@link SplittableRandom}: the same seed gives the same points, in the same order, on every
 * machine and thread count. Each point is drawn parameter by parameter, in range order, from one
 * generator started at the seed, so point {@code i} is the i-th draw of the sequence.
 *
 * <p>Immutable and thread-safe (the points are drawn once, at construction).
 */
public final class RandomSample implements ParameterSpace {
    private final List<String> names;
    private final long seed;
    private final double[][] points;

    /**
     * One parameter's range for sampling: values uniform in {@code [low, high)}
     * ({@code low} itself when {@code low == high}).
     *
     * @param name parameter name
     * @param low lower bound
     * @param high upper bound, {@code ≥ low}
     */
    public record Range(String name, double low, double high) {
        /** Checks the bounds. */
        public Range {
            ParameterPoint.checkName(name);
            if (!Double.isFinite(low) || !Double.isFinite(high) || high < low) {
                throw new IllegalArgumentException("range of " + name + " must be finite with low <= high, got low = "
                    + low + ", high = " + high);
            }
        }
    }

    private RandomSample(long seed, int count, List<Range> ranges) {
        if (count < 1) {
            throw new IllegalArgumentException("random sample count must be at least 1, got " + count);
        }
        if (ranges == null || ranges.isEmpty()) {
            throw new IllegalArgumentException("a random sample needs at least one range, got none");
        }
        List<String> n = new ArrayList<>();
        HashSet<String> seen = new HashSet<>();
        for (Range r : ranges) {
            if (r == null) {
                throw new IllegalArgumentException("range must be given, got null");
            }
            if (!seen.add(r.name())) {
                throw new IllegalArgumentException("range name must be unique, got " + r.name() + " twice");
            }
            n.add(r.name());
        }
        this.names = List.copyOf(n);
        this.seed = seed;
        SplittableRandom rnd = new SplittableRandom(seed);
        points = new double[count][ranges.size()];
        for (int i = 0; i < count; i++) {
            for (int j = 0; j < ranges.size(); j++) {
                Range r = ranges.get(j);
                points[i][j] = r.high() > r.low() ? rnd.nextDouble(r.low(), r.high()) : r.low();
            }
        }
    }

    /**
     * @param seed seed of the generator
     * @param count number of points, at least 1
     * @param ranges one range per parameter
     * @return the sample
     */
    public static RandomSample of(long seed, int count, List<Range> ranges) {
        return new RandomSample(seed, count, ranges);
    }

    /** @return the seed */
    public long seed() {
        return seed;
    }

    @Override
    public List<String> names() {
        return names;
    }

    @Override
    public int size() {
        return points.length;
    }

    @Override
    public ParameterPoint point(int index) {
        if (index < 0 || index >= points.length) {
            throw new IndexOutOfBoundsException("sample point " + index + " outside 0.." + (points.length - 1));
        }
        return new ParameterPoint(index, names, points[index]);
    }
}
