package org.trundle.scenario;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.EndReason;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.sweep.SweepRun;

/**
 * One run of a sweep reduced to a flat row where it ran — what every sweep executor returns, so
 * the local threads and Apache Spark write the same rows by construction. Columns, in order:
 * {@code index}; the parameters (by their dotted paths); {@code outcome} ({@link Outcome});
 * {@code end_reason} ({@code duration}, {@code exit}, {@code rest}, {@code budget}, {@code failed});
 * {@code exit_edge}; {@code end_time} (s); {@code exit_time} (s); {@code exit_x, exit_y, exit_z} (m,
 * centre at the exit); {@code exit_vx, exit_vy, exit_vz} (m/s); {@code exit_speed} (m/s);
 * {@code end_x, end_y, end_z} (m, centre at the end); {@code events} (count); {@code message}
 * (the failure reason, or the library's end message).
 *
 * <p>A column that does not apply (exit columns of a run that did not leave the patch; every figure
 * of a failed run) is absent: {@link #value(int)} gives {@code null}, the CSV an empty field.
 *
 * <p>Immutable and serializable.
 */
public final class SweepRow implements Serializable {
    private static final long serialVersionUID = 1L;

    /** The kind of a column's values. */
    public enum Kind {
        /** {@link Integer}. */
        INT,
        /** {@link Double}, finite. */
        DOUBLE,
        /** {@link String}. */
        TEXT
    }

    /** Columns after the parameters, with their kinds. */
    private static final String[] TAIL = {"outcome", "end_reason", "exit_edge", "end_time", "exit_time", "exit_x",
        "exit_y", "exit_z", "exit_vx", "exit_vy", "exit_vz", "exit_speed", "end_x", "end_y", "end_z", "events",
        "message"};
    private static final Kind[] TAIL_KINDS = {Kind.TEXT, Kind.TEXT, Kind.TEXT, Kind.DOUBLE, Kind.DOUBLE, Kind.DOUBLE,
        Kind.DOUBLE, Kind.DOUBLE, Kind.DOUBLE, Kind.DOUBLE, Kind.DOUBLE, Kind.DOUBLE, Kind.DOUBLE, Kind.DOUBLE,
        Kind.DOUBLE, Kind.INT, Kind.TEXT};
    /** Number of figures (end_time … end_z). */
    private static final int FIGURES = 12;

    private final int index;
    private final double[] parameters;
    private final String outcome;
    private final String endReason;
    private final String exitEdge;
    /** end_time, exit_time, exit position (3), exit velocity (3), exit speed, end position (3); null if absent. */
    private final Double[] figures;
    private final int events;
    private final String message;

    private SweepRow(int index, double[] parameters, String outcome, String endReason, String exitEdge,
        Double[] figures, int events, String message) {
        this.index = index;
        this.parameters = parameters;
        this.outcome = outcome;
        this.endReason = endReason;
        this.exitEdge = exitEdge;
        this.figures = figures;
        this.events = events;
        this.message = message;
    }

    /**
     * Reduces a run to its row.
     *
     * @param run a delivered run
     * @return its row
     */
    public static SweepRow of(SweepRun run) {
        double[] p = run.point().values();
        Double[] f = new Double[FIGURES];
        if (!run.isSuccess()) {
            return new SweepRow(run.index(), p, Outcome.of(run), "failed", null, f, 0, run.failure().orElse(""));
        }
        RunResult r = run.result().orElseThrow();
        RunEvent exit = r.exit().orElse(null);
        f[0] = r.endState().time();
        if (exit != null) {
            Vector3D c = exit.before().centre();
            Vector3D v = exit.before().velocity();
            f[1] = exit.time();
            f[2] = c.getX();
            f[3] = c.getY();
            f[4] = c.getZ();
            f[5] = v.getX();
            f[6] = v.getY();
            f[7] = v.getZ();
            f[8] = v.getNorm();
        }
        Vector3D e = r.endState().centre();
        f[9] = e.getX();
        f[10] = e.getY();
        f[11] = e.getZ();
        String reason = r.endReason() == EndReason.GEOMETRY ? "failed" : r.endReason().label();
        return new SweepRow(run.index(), p, Outcome.of(run), reason, exit == null ? null : exit.edge(), f,
            r.events().size(), r.message());
    }

    /**
     * @param names parameter names
     * @return the column names: index, the parameters, then the fixed columns
     */
    public static List<String> columns(List<String> names) {
        List<String> c = new ArrayList<>();
        c.add("index");
        c.addAll(names);
        c.addAll(Arrays.asList(TAIL));
        return c;
    }

    /**
     * @param parameters number of parameters
     * @return the kind of each column, in {@link #columns} order
     */
    public static List<Kind> kinds(int parameters) {
        List<Kind> k = new ArrayList<>();
        k.add(Kind.INT);
        for (int i = 0; i < parameters; i++) {
            k.add(Kind.DOUBLE);
        }
        k.addAll(Arrays.asList(TAIL_KINDS));
        return k;
    }

    /**
     * @param names parameter names
     * @return the CSV header line (no newline)
     */
    public static String header(List<String> names) {
        return String.join(",", columns(names));
    }

    /** @return number of columns */
    public int width() {
        return 1 + parameters.length + TAIL.length;
    }

    /**
     * @param column column position, in {@link #columns} order
     * @return its value ({@link Integer}, {@link Double} or {@link String}), null when absent
     */
    public Object value(int column) {
        if (column == 0) {
            return index;
        }
        int c = column - 1;
        if (c < parameters.length) {
            return parameters[c];
        }
        c -= parameters.length;
        switch (c) {
            case 0:
                return outcome;
            case 1:
                return endReason;
            case 2:
                return exitEdge;
            case FIGURES + 3:
                return events;
            case FIGURES + 4:
                return message.isEmpty() ? null : message;
            default:
                if (c < 0 || c > FIGURES + 4) {
                    throw new IndexOutOfBoundsException("column " + column + " outside 0.." + (width() - 1));
                }
                return figures[c - 3];
        }
    }

    /** @return all values, in column order (nulls where absent) */
    public Object[] values() {
        Object[] v = new Object[width()];
        for (int i = 0; i < v.length; i++) {
            v[i] = value(i);
        }
        return v;
    }

    /**
     * The CSV line of the row (no newline): parameters as their shortest exact decimals
     * ({@link Decimals#shortest}), other numbers as {@link Double#toString(double)} gives them (exact,
     * round-trip), absent values empty, the message quoted.
     *
     * @return the line
     */
    public String csv() {
        return csv(values(), parameters.length);
    }

    /**
     * The CSV line of a row given by its values, as {@link #values()} gives them (for executors
     * that carry rows in their own form, such as Spark).
     *
     * @param values the values in column order ({@link Integer}, {@link Double}, {@link String},
     *     null where absent)
     * @param parameters number of parameters
     * @return the line (no newline)
     */
    public static String csv(Object[] values, int parameters) {
        StringBuilder b = new StringBuilder();
        for (int c = 0; c < values.length; c++) {
            if (c > 0) {
                b.append(',');
            }
            Object v = values[c];
            if (v == null) {
                continue;
            }
            if (c >= 1 && c <= parameters) {
                b.append(Decimals.shortest((Double) v));
            } else if (c == values.length - 1) {
                b.append(quote((String) v));
            } else {
                b.append(v);
            }
        }
        return b.toString();
    }

    private static String quote(String s) {
        if (s.isEmpty()) {
            return "";
        }
        return "\"" + s.replace("\"", "\"\"") + "\"";
    }

    /** @return the run's index in the sweep */
    public int index() {
        return index;
    }

    /**
     * @param i parameter position
     * @return its value
     */
    public double parameter(int i) {
        return parameters[i];
    }

    /** @return the outcome class ({@link Outcome}) */
    public String outcome() {
        return outcome;
    }

    /** @return whether the run failed */
    public boolean failed() {
        return "failed".equals(endReason);
    }

    /** @return simulated end time (s), empty for a failed run */
    public java.util.OptionalDouble endTime() {
        return figures[0] == null ? java.util.OptionalDouble.empty() : java.util.OptionalDouble.of(figures[0]);
    }

    /** @return the failure reason or end message ("" when none) */
    public String message() {
        return message;
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof SweepRow)) {
            return false;
        }
        return Arrays.equals(values(), ((SweepRow) o).values()); // Double.equals compares bits
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(values());
    }

    @Override
    public String toString() {
        return csv();
    }
}
