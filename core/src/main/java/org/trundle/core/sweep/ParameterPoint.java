package org.trundle.core.sweep;

import java.util.List;
import java.util.Locale;

/**
 * One point of a {@link ParameterSpace}: its index in the sweep and a value for each named
 * parameter (units are those of the quantity the name stands for).
 *
 * <p>Immutable.
 */
public final class ParameterPoint implements java.io.Serializable {
    private static final long serialVersionUID = 1L;
    private final int index;
    private final List<String> names;
    private final double[] values;

    /**
     * @param index index of the point in its space (≥ 0)
     * @param names parameter names (distinct)
     * @param values one finite value per name
     */
    public ParameterPoint(int index, List<String> names, double[] values) {
        if (index < 0) {
            throw new IllegalArgumentException("point index must not be negative, got " + index);
        }
        if (names == null || values == null || names.size() != values.length) {
            throw new IllegalArgumentException("a parameter point needs one value per name, got "
                + (names == null ? "no names" : names.size() + " names") + " and "
                + (values == null ? "no values" : values.length + " values"));
        }
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw new IllegalArgumentException("parameter " + names.get(i) + " must be finite, got " + values[i]);
            }
        }
        this.index = index;
        this.names = List.copyOf(names);
        this.values = values.clone();
    }

    static String checkName(String name) {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("parameter name must be a non-blank string, got \"" + name + "\"");
        }
        return name;
    }

    /** @return index of the point in its sweep */
    public int index() {
        return index;
    }

    /** @return the parameter names */
    public List<String> names() {
        return names;
    }

    /** @return number of parameters */
    public int size() {
        return values.length;
    }

    /**
     * @param i parameter position
     * @return the value of the i-th parameter
     */
    public double value(int i) {
        return values[i];
    }

    /**
     * @param name parameter name
     * @return its value
     * @throws IllegalArgumentException when the point has no parameter of that name
     */
    public double get(String name) {
        int i = names.indexOf(name);
        if (i < 0) {
            throw new IllegalArgumentException("no parameter named " + name + " in point " + this);
        }
        return values[i];
    }

    /** @return a copy of the values */
    public double[] values() {
        return values.clone();
    }

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder("#").append(index).append(" {");
        for (int i = 0; i < values.length; i++) {
            b.append(i == 0 ? "" : ", ").append(names.get(i)).append(" = ")
                .append(String.format(Locale.ROOT, "%s", values[i]));
        }
        return b.append('}').toString();
    }
}
