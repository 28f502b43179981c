package org.trundle.core.sweep;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.Arrays;

/**
 * One named parameter of a {@link Grid} and the values it takes, in order.
 *
 * <p>Immutable.
 */
public final class Axis implements java.io.Serializable {
    private static final long serialVersionUID = 1L;
    private final String name;
    private final double[] values;
    /** Powers of ten that are exact doubles. */
    private static final double[] POW10 = {1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13,
        1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22};

    private Axis(String name, double[] values) {
        this.name = ParameterPoint.checkName(name);
        if (values == null || values.length == 0) {
            throw new IllegalArgumentException("axis " + name + " needs at least one value, got none");
        }
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw new IllegalArgumentException("axis " + name + " value " + i + " must be finite, got " + values[i]);
            }
        }
        this.values = values.clone();
    }

    /**
     * An axis with explicit values.
     *
     * @param name parameter name
     * @param values the values, finite, at least one, in the order they are run
     * @return the axis
     */
    public static Axis of(String name, double... values) {
        return new Axis(name, values);
    }

    /**
     * {@code count} evenly spaced values from {@code from} to {@code to}, both included:
     * {@code v_i = from + (to − from)·i/(count − 1)}, with the last value exactly {@code to}. Each
     * value is computed from its index (never by repeated addition), in decimal where the bounds and
     * the step are short decimals, so that 0.2 to 1.6 in 29 values gives exactly the doubles
     * nearest 0.25, 0.3, … 0.8 ….
     *
     * @param name parameter name
     * @param from first value
     * @param to last value
     * @param count number of values, at least 1 (1 gives {@code from} only)
     * @return the axis
     */
    public static Axis linear(String name, double from, double to, int count) {
        if (count < 1) {
            throw new IllegalArgumentException("axis " + name + " count must be at least 1, got " + count);
        }
        if (!Double.isFinite(from) || !Double.isFinite(to)) {
            throw new IllegalArgumentException("axis " + name + " bounds must be finite, got from = " + from
                + ", to = " + to);
        }
        double[] v = new double[count];
        if (!decimalSteps(from, to, v)) {
            for (int i = 0; i < count; i++) {
                v[i] = count == 1 ? from : from + (to - from) * i / (count - 1);
            }
        }
        if (count > 1) {
            v[count - 1] = to;
        }
        return new Axis(name, v);
    }

    /**
     * Fills {@code v} with {@code from + i·step} computed exactly in decimal when the bounds (as
     * their shortest decimals) and the step are short decimals: value {@code i} is the integer
     * {@code A + i·S} over {@code 10^k}, one correctly rounded division, so a grid from 0.2 by 0.05
     * gives 0.8 and not 0.7999999999999999 (and prints as such). Each value depends on its index
     * alone.
     *
     * @return false when the decimals are too long for that (the caller interpolates in binary)
     */
    private static boolean decimalSteps(double from, double to, double[] v) {
        if (v.length < 2) {
            v[0] = from;
            return true;
        }
        BigDecimal a = new BigDecimal(Double.toString(from));
        BigDecimal b = new BigDecimal(Double.toString(to));
        BigDecimal step;
        try {
            step = b.subtract(a).divide(BigDecimal.valueOf(v.length - 1L));
        } catch (ArithmeticException notAShortDecimal) {
            return false;
        }
        int k = Math.max(0, Math.max(a.scale(), step.scale()));
        if (k > 22) {
            return false; // 10^k is exact in a double up to 10^22
        }
        BigInteger first = a.movePointRight(k).toBigIntegerExact();
        BigInteger inc = step.movePointRight(k).toBigIntegerExact();
        BigInteger last = first.add(inc.multiply(BigInteger.valueOf(v.length - 1L)));
        BigInteger exact = BigInteger.ONE.shiftLeft(53);
        if (first.abs().compareTo(exact) >= 0 || last.abs().compareTo(exact) >= 0) {
            return false;
        }
        long f = first.longValueExact();
        long d = inc.longValueExact();
        double scale = POW10[k];
        for (int i = 0; i < v.length; i++) {
            v[i] = (f + i * d) / scale;
        }
        return true;
    }

    /** @return the parameter name */
    public String name() {
        return name;
    }

    /** @return number of values */
    public int size() {
        return values.length;
    }

    /**
     * @param i index, {@code 0 ≤ i < size()}
     * @return the i-th value
     */
    public double value(int i) {
        return values[i];
    }

    /** @return a copy of the values */
    public double[] values() {
        return values.clone();
    }

    @Override
    public String toString() {
        return name + "=" + Arrays.toString(values);
    }
}
