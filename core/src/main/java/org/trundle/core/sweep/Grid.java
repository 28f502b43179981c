package org.trundle.core.sweep;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;

/**
 * The Cartesian product of one or more {@link Axis axes}, in row-major order: the last axis varies
 * fastest. Point {@code i} of a grid over axes of sizes {@code n_0, …, n_{d−1}} takes from axis
 * {@code j} the value of index {@code (i / (n_{j+1}·…·n_{d−1})) mod n_j}.
 *
 * <p>Immutable and thread-safe.
 */
public final class Grid implements ParameterSpace, java.io.Serializable {
    private static final long serialVersionUID = 1L;
    private final List<Axis> axes;
    private final List<String> names;
    private final int size;

    private Grid(List<Axis> axes) {
        if (axes == null || axes.isEmpty()) {
            throw new IllegalArgumentException("a grid needs at least one axis, got none");
        }
        List<String> n = new ArrayList<>();
        HashSet<String> seen = new HashSet<>();
        long s = 1;
        for (Axis a : axes) {
            if (a == null) {
                throw new IllegalArgumentException("grid axis must be given, got null");
            }
            if (!seen.add(a.name())) {
                throw new IllegalArgumentException("grid axis name must be unique, got " + a.name() + " twice");
            }
            n.add(a.name());
            s *= a.size();
            if (s > Integer.MAX_VALUE) {
                throw new IllegalArgumentException("grid has too many points (more than " + Integer.MAX_VALUE + ")");
            }
        }
        this.axes = List.copyOf(axes);
        this.names = List.copyOf(n);
        this.size = (int) s;
    }

    /**
     * @param axes the axes, first slowest
     * @return the grid
     */
    public static Grid of(Axis... axes) {
        return new Grid(axes == null ? null : List.of(axes));
    }

    /**
     * @param axes the axes, first slowest
     * @return the grid
     */
    public static Grid of(List<Axis> axes) {
        return new Grid(axes);
    }

    /** @return the axes */
    public List<Axis> axes() {
        return axes;
    }

    @Override
    public List<String> names() {
        return names;
    }

    @Override
    public int size() {
        return size;
    }

    @Override
    public ParameterPoint point(int index) {
        if (index < 0 || index >= size) {
            throw new IndexOutOfBoundsException("grid point " + index + " outside 0.." + (size - 1));
        }
        double[] v = new double[axes.size()];
        int rest = index;
        for (int j = axes.size() - 1; j >= 0; j--) {
            Axis a = axes.get(j);
            v[j] = a.value(rest % a.size());
            rest /= a.size();
        }
        return new ParameterPoint(index, names, v);
    }
}
