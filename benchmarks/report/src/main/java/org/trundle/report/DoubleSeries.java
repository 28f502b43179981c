package org.trundle.report;

import java.util.Arrays;

/** A growable array of doubles (plot data held by the runner, not by the library). */
final class DoubleSeries {
    private double[] data = new double[256];
    private int size;

    void add(double v) {
        if (size == data.length) {
            data = Arrays.copyOf(data, size * 2);
        }
        data[size++] = v;
    }

    int size() {
        return size;
    }

    double get(int i) {
        return data[i];
    }

    double[] toArray() {
        return Arrays.copyOf(data, size);
    }
}
