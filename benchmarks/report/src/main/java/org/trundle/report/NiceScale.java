package org.trundle.report;

import java.math.BigDecimal;

/**
 * Axis ticks at round values: the step is 1, 2 or 5 times a power of ten, the smallest such step
 * that leaves at most {@code maxTicks} intervals over the range, and the axis runs from the
 * greatest multiple of the step at or below the low end to the least multiple at or above the high
 * end (so the ticks cover the whole range and the last tick is the axis end). Tick values are
 * computed from their index ({@code k · step}), never by repeated addition, and printed in the
 * shortest decimal form. (The 1-2-5 series of round steps is common practice for chart axes.)
 *
 * @param low the axis start (a multiple of {@code step})
 * @param high the axis end (a multiple of {@code step})
 * @param step the tick spacing
 */
public record NiceScale(double low, double high, double step) {
    private static final double[] MANTISSAS = {1, 2, 5};

    /**
     * @param min least data value (finite)
     * @param max greatest data value (finite, at least {@code min})
     * @param maxTicks most intervals wanted, at least 2 (a range across zero needs two)
     * @return the scale
     */
    public static NiceScale of(double min, double max, int maxTicks) {
        if (!Double.isFinite(min) || !Double.isFinite(max) || max < min) {
            throw new IllegalArgumentException("axis range must be finite with min <= max, got " + min + " .. " + max);
        }
        if (maxTicks < 2) {
            throw new IllegalArgumentException("maxTicks must be at least 2, got " + maxTicks);
        }
        double span = max - min;
        if (span <= Math.ulp(Math.max(Math.abs(min), Math.abs(max))) * 8) {
            double pad = Math.abs(min) > 0 ? Math.abs(min) * 0.1 : 1e-3;
            min -= pad;
            max += pad;
            span = max - min;
        }
        int exp = (int) Math.floor(Math.log10(span / maxTicks));
        for (int e = exp - 1; e <= exp + 2; e++) {
            for (double m : MANTISSAS) {
                double step = m * Math.pow(10, e);
                double lo = Math.floor(min / step) * step;
                double hi = Math.ceil(max / step) * step;
                if (Math.round((hi - lo) / step) <= maxTicks) {
                    return new NiceScale(lo, hi, step);
                }
            }
        }
        double step = Math.pow(10, exp + 3);
        return new NiceScale(Math.floor(min / step) * step, Math.ceil(max / step) * step, step);
    }

    /** @return the number of ticks (ends included) */
    public int count() {
        return (int) Math.round((high - low) / step) + 1;
    }

    /**
     * @param k tick index, 0 at {@link #low()}
     * @return the tick value {@code low + k·step}, computed from {@code k}
     */
    public double tick(int k) {
        long first = Math.round(low / step);
        return (first + k) * step;
    }

    /**
     * @param k tick index
     * @return the tick's label: the value rounded to the step's decimals, shortest form
     */
    public String label(int k) {
        int decimals = Math.max(0, -(int) Math.floor(Math.log10(step) + 1e-9));
        BigDecimal v = BigDecimal.valueOf(tick(k)).setScale(decimals, java.math.RoundingMode.HALF_EVEN);
        if (v.signum() == 0) {
            return "0";
        }
        String s = v.stripTrailingZeros().toPlainString();
        return s;
    }
}
