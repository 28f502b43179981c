package org.trundle.core.sweep;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;

/**
 * {@code count} points drawn uniformly and independently from a box of parameter ranges with a
 * counter-based generator ({@link CounterRandom}, SplitMix64): point {@code i} comes from the seed
 * and {@code i} alone, so the same seed gives the same points on every machine, thread count and
 * executor, and no point is drawn before it is asked for. With {@code m} ranges of non-zero width,
 * parameter {@code j} of point {@code i} is draw {@code i·m + r_j} of the generator ({@code r_j} the
 * rank of range {@code j} among those of non-zero width; a range with {@code low == high} gives
 * {@code low} and takes no draw). This numbering is that of one sequential
 * {@link java.util.SplittableRandom} started at the seed and drawn point by point, parameter by
 * parameter, so the points equal those of earlier versions, which drew them that way.
 *
 * <p>Immutable and thread-safe; holds the ranges only (memory independent of {@code count}).
 */
public final class RandomSample implements ParameterSpace, Serializable {
    private static final long serialVersionUID = 1L;
    private final List<String> names;
    private final CounterRandom random;
    private final List<Range> ranges;
    private final int[] draw;
    private final int drawsPerPoint;
    private final int count;

    /**
     * One parameter's range for sampling: values uniform in {@code [low, high)}
     * ({@code low} itself when {@code low == high}).
     *
     * @param name parameter name
     * @param low lower bound
     * @param high upper bound, {@code ≥ low}
     */
    public record Range(String name, double low, double high) implements Serializable {
        /** Checks the bounds. */
        public Range {
            ParameterPoint.checkName(name);
            if (!Double.isFinite(low) || !Double.isFinite(high) || high < low || !Double.isFinite(high - low)) {
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
        this.ranges = List.copyOf(ranges);
        this.random = new CounterRandom(seed);
        this.count = count;
        this.draw = new int[ranges.size()];
        int m = 0;
        for (int j = 0; j < ranges.size(); j++) {
            draw[j] = ranges.get(j).high() > ranges.get(j).low() ? m++ : -1;
        }
        this.drawsPerPoint = m;
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
        return random.seed();
    }

    /** @return the ranges, in parameter order */
    public List<Range> ranges() {
        return ranges;
    }

    @Override
    public List<String> names() {
        return names;
    }

    @Override
    public int size() {
        return count;
    }

    @Override
    public ParameterPoint point(int index) {
        if (index < 0 || index >= count) {
            throw new IndexOutOfBoundsException("sample point " + index + " outside 0.." + (count - 1));
        }
        double[] v = new double[draw.length];
        long first = (long) index * drawsPerPoint;
        for (int j = 0; j < v.length; j++) {
            Range r = ranges.get(j);
            v[j] = draw[j] < 0 ? r.low() : random.uniform(first + draw[j], r.low(), r.high());
        }
        return new ParameterPoint(index, names, v);
    }
}
