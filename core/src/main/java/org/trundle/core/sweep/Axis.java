package org.trundle.core.sweep;

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
     * {@code v_i = from + (to − from)·i/(count − 1)}, with the last value exactly {@code to}.
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
        for (int i = 0; i < count; i++) {
            v[i] = count == 1 ? from : from + (to - from) * i / (count - 1);
        }
        if (count > 1) {
            v[count - 1] = to;
        }
        return new Axis(name, v);
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
