package org.trundle.core.check;

import java.util.Locale;
import java.util.SplittableRandom;

/**
 * A closed range {@code [lo, hi]} of a real parameter (in the parameter's own unit) drawn either
 * uniformly or log-uniformly (uniform in {@code ln x}, for scale parameters such as radii and
 * masses that span decades). A degenerate range {@code lo = hi} always draws {@code lo}.
 *
 * <p>Immutable.
 */
public final class Interval {
    private final double lo;
    private final double hi;
    private final boolean logarithmic;

    private Interval(double lo, double hi, boolean logarithmic) {
        if (!Double.isFinite(lo) || !Double.isFinite(hi) || lo > hi) {
            throw new IllegalArgumentException("interval bounds must be finite with lo <= hi, got lo = " + lo
                + ", hi = " + hi);
        }
        if (logarithmic && !(lo > 0)) {
            throw new IllegalArgumentException("a log-uniform interval needs lo > 0, got lo = " + lo);
        }
        this.lo = lo;
        this.hi = hi;
        this.logarithmic = logarithmic;
    }

    /**
     * @param lo lower bound
     * @param hi upper bound, at least lo
     * @return a uniformly drawn interval
     */
    public static Interval of(double lo, double hi) {
        return new Interval(lo, hi, false);
    }

    /**
     * @param lo lower bound, positive
     * @param hi upper bound, at least lo
     * @return a log-uniformly drawn interval
     */
    public static Interval log(double lo, double hi) {
        return new Interval(lo, hi, true);
    }

    /**
     * @param value the only value
     * @return the degenerate interval {@code [value, value]}
     */
    public static Interval fixed(double value) {
        return new Interval(value, value, false);
    }

    /** @return lower bound */
    public double lo() {
        return lo;
    }

    /** @return upper bound */
    public double hi() {
        return hi;
    }

    /**
     * @param rnd the random source
     * @return a value in {@code [lo, hi]}
     */
    public double draw(SplittableRandom rnd) {
        double u = rnd.nextDouble();
        if (lo == hi) {
            return lo;
        }
        if (logarithmic) {
            return Math.min(hi, Math.exp(Math.log(lo) + u * (Math.log(hi) - Math.log(lo))));
        }
        return Math.min(hi, lo + u * (hi - lo));
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s[%g, %g]", logarithmic ? "log" : "", lo, hi);
    }
}
