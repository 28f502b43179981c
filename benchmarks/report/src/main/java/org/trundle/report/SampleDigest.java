package org.trundle.report;

import java.util.Arrays;

/**
 * A bounded, deterministic reduction of a run's samples for pictures: memory is fixed however long
 * the run is.
 *
 * <p>The samples are cut into consecutive buckets of {@code stride} samples each. A bucket keeps
 * the full row of its first sample (its representative) and, for the plotted quantities, the least
 * and greatest value over all its samples, so a spike between representatives still shows as an
 * envelope. When {@link #capacity()} buckets are full, neighbouring buckets are merged in pairs
 * (the earlier representative stays, the envelopes join) and the stride doubles; so a run of
 * {@code n} samples keeps between {@code capacity / 2} and {@code capacity} buckets once
 * {@code n > capacity}, and every sample when {@code n ≤ capacity}. The last sample is also kept on
 * its own, so the path reaches the end. The result depends only on the sequence of rows.
 */
public final class SampleDigest {
    /** Columns of a kept row. */
    public enum Column {
        /** Time (s). */
        T,
        /** Centre x (m). */
        X,
        /** Centre y (m). */
        Y,
        /** Centre z (m). */
        Z,
        /** Height of the centre along −g (m). */
        HEIGHT,
        /** Speed of the centre (m/s). */
        SPEED,
        /** Normal contact force (N). */
        NORMAL,
        /** Magnitude of the tangential contact force (N). */
        FRICTION,
        /** Orientation quaternion, scalar part. */
        QW,
        /** Orientation quaternion, x. */
        QX,
        /** Orientation quaternion, y. */
        QY,
        /** Orientation quaternion, z. */
        QZ,
        /** Phase ordinal ({@link org.trundle.core.Phase#ordinal()}). */
        PHASE,
        /** First surface coordinate (its unit), NaN when none. */
        U,
        /** Second surface coordinate (its unit), NaN when none. */
        V
    }

    /** The columns that also keep a least/greatest envelope per bucket. */
    static final Column[] ENVELOPED = {Column.HEIGHT, Column.SPEED, Column.NORMAL, Column.FRICTION};

    private static final int K = Column.values().length;
    private static final int E = ENVELOPED.length;

    private final int capacity;
    private final double[] rows;
    private final double[] low;
    private final double[] high;
    private final double[] last = new double[K];
    private int size;
    private long stride = 1;
    private long inBucket;
    private long count;

    /** @param capacity most buckets kept, even and at least 4 */
    public SampleDigest(int capacity) {
        if (capacity < 4 || capacity % 2 != 0) {
            throw new IllegalArgumentException("digest capacity must be even and at least 4, got " + capacity);
        }
        this.capacity = capacity;
        rows = new double[capacity * K];
        low = new double[capacity * E];
        high = new double[capacity * E];
    }

    /**
     * Adds one sample's row.
     *
     * @param row values in the order of {@link Column}, length {@code Column.values().length}
     */
    public void add(double[] row) {
        count++;
        System.arraycopy(row, 0, last, 0, K);
        if (size > 0 && inBucket < stride) {
            inBucket++;
            int b = size - 1;
            for (int e = 0; e < E; e++) {
                double v = row[ENVELOPED[e].ordinal()];
                low[b * E + e] = Math.min(low[b * E + e], v);
                high[b * E + e] = Math.max(high[b * E + e], v);
            }
            return;
        }
        if (size == capacity) {
            halve();
        }
        System.arraycopy(row, 0, rows, size * K, K);
        for (int e = 0; e < E; e++) {
            double v = row[ENVELOPED[e].ordinal()];
            low[size * E + e] = v;
            high[size * E + e] = v;
        }
        size++;
        inBucket = 1;
    }

    /** Merges neighbouring buckets in pairs and doubles the stride. */
    private void halve() {
        int half = size / 2;
        for (int i = 0; i < half; i++) {
            int a = 2 * i;
            int b = 2 * i + 1;
            System.arraycopy(rows, a * K, rows, i * K, K);
            for (int e = 0; e < E; e++) {
                low[i * E + e] = Math.min(low[a * E + e], low[b * E + e]);
                high[i * E + e] = Math.max(high[a * E + e], high[b * E + e]);
            }
        }
        size = half;
        stride *= 2;
        inBucket = stride; // the last merged bucket is full
    }

    /** @return the most buckets kept */
    public int capacity() {
        return capacity;
    }

    /** @return the number of samples added */
    public long count() {
        return count;
    }

    /** @return samples per bucket (1 while every sample is kept) */
    public long stride() {
        return stride;
    }

    /**
     * @return the number of kept rows: the buckets' representatives plus the last sample when it is
     *     not already the last representative
     */
    public int size() {
        if (size == 0) {
            return 0;
        }
        return inBucket > 1 ? size + 1 : size;
    }

    /**
     * @param i kept row index, below {@link #size()}
     * @param c the column
     * @return the value
     */
    public double get(int i, Column c) {
        if (i == size) {
            return last[c.ordinal()];
        }
        return rows[i * K + c.ordinal()];
    }

    /**
     * @param i kept row index
     * @param c an enveloped column (height, speed, normal or friction force)
     * @return the least value over the row's bucket
     */
    public double low(int i, Column c) {
        return i == size ? last[c.ordinal()] : low[i * E + envelopeIndex(c)];
    }

    /**
     * @param i kept row index
     * @param c an enveloped column
     * @return the greatest value over the row's bucket
     */
    public double high(int i, Column c) {
        return i == size ? last[c.ordinal()] : high[i * E + envelopeIndex(c)];
    }

    private static int envelopeIndex(Column c) {
        for (int e = 0; e < E; e++) {
            if (ENVELOPED[e] == c) {
                return e;
            }
        }
        throw new IllegalArgumentException("column " + c + " keeps no envelope; these do: " + Arrays.toString(ENVELOPED));
    }

    /**
     * @param c the column
     * @return the kept values of one column, in order
     */
    public double[] column(Column c) {
        double[] out = new double[size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = get(i, c);
        }
        return out;
    }

    /** @return a fresh row buffer for {@link #add} */
    public static double[] newRow() {
        return new double[K];
    }
}
