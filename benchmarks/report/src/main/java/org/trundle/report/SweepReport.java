package org.trundle.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.JsonSerializable;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.jsontype.TypeSerializer;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.trundle.scenario.Outcome;
import org.trundle.scenario.SweepRow;
import org.trundle.scenario.Units;

/**
 * The HTML report of a sweep ({@code sweep-report.html}, one self-contained file like
 * {@link HtmlReport}): the regime map — one point per run at its parameter values (for one
 * parameter: end time against it), coloured by outcome as in {@code regime-map.png} — whose points
 * open their run's row of the sweep's table with units.
 *
 * <p><b>What is kept.</b> The points are the first {@code maxPoints} runs (default
 * {@value #MAX_POINTS}) in index order that have a point: a run whose {@code x} (the first parameter)
 * or {@code y} (the second parameter, or {@code end_time} for a one-parameter sweep) is absent or not
 * finite — a failed run of a one-parameter sweep — has none and takes no place ({@link #plotted}).
 * The outcome counts cover all runs. Every engine fills the report the same way: the local threads
 * {@link #add} each row as it is delivered in index order; an engine that aggregates elsewhere gives
 * the outcome counts ({@link #count}) and then {@link #show}s the plotted rows in index order until
 * the report is {@link #full()}. For the same sweep both write the same bytes.
 *
 * <p><b>Memory.</b> A point holds its two coordinates, its outcome and its CSV line (about
 * 0.4 kB for a two-parameter sweep: 7.3 MB for {@value #MAX_POINTS} points of the return-tube
 * sweep, measured); {@link #write} streams the points' JSON into the file, never building a JSON
 * tree of every cell or the page as one string.
 */
public final class SweepReport {
    /** Most runs shown as points by default. */
    public static final int MAX_POINTS = 20_000;

    private final List<String> names;
    private final Map<String, String> labels;
    private final String[] columns;
    private final int maxPoints;
    private final List<Point> points = new ArrayList<>();
    private final Map<String, Long> counts = new TreeMap<>();
    private long total;

    /** A run shown as a point: its coordinates, outcome and CSV line. */
    private record Point(double x, double y, String outcome, String line) {
    }

    /**
     * A report that keeps at most {@value #MAX_POINTS} points.
     *
     * @param names parameter names
     * @param labels legend texts by outcome
     * @param header the sweep.csv header line ({@link SweepRow#header})
     */
    public SweepReport(List<String> names, Map<String, String> labels, String header) {
        this(names, labels, header, MAX_POINTS);
    }

    /**
     * @param names parameter names, at least one
     * @param labels legend texts by outcome
     * @param header the sweep.csv header line ({@link SweepRow#header})
     * @param maxPoints most runs shown as points, at least 0
     */
    public SweepReport(List<String> names, Map<String, String> labels, String header, int maxPoints) {
        if (names.isEmpty()) {
            throw new IllegalArgumentException("names must hold at least one parameter, got " + names);
        }
        if (maxPoints < 0) {
            throw new IllegalArgumentException("maxPoints must be at least 0, got " + maxPoints);
        }
        this.names = List.copyOf(names);
        this.labels = Map.copyOf(labels);
        this.columns = header.split(",", -1);
        this.maxPoints = maxPoints;
    }

    /**
     * The title both engines give the report and the regime map.
     *
     * @param names parameter names
     * @param runs number of runs in the sweep
     * @return {@code Regime map: a x b (n runs)}
     */
    public static String title(List<String> names, long runs) {
        return "Regime map: " + String.join(" x ", names) + " (" + runs + " runs)";
    }

    /**
     * The line under the title.
     *
     * @param description the scenario's description (may be empty)
     * @return the description, then how to use the map
     */
    public static String subtitle(String description) {
        return (description.isEmpty() ? "" : description + " ") + "Click a point to see its run's row of the sweep table.";
    }

    /**
     * Whether a run has a point on the map: its {@code x} (the first parameter) and {@code y} (the second
     * parameter, or {@code end_time} for one parameter) are present and finite.
     *
     * @param values the row's values in column order, as {@link SweepRow#values()} gives them
     * @param parameters number of parameters
     * @return whether it is plotted
     */
    public static boolean plotted(Object[] values, int parameters) {
        return finite(values[1]) && finite(values[yColumn(parameters)]);
    }

    /**
     * @param parameters number of parameters
     * @return the column of the map's {@code y}: the second parameter, or {@code end_time}
     */
    private static int yColumn(int parameters) {
        return parameters > 1 ? 2 : SweepRow.columns(List.of("p")).indexOf("end_time");
    }

    private static boolean finite(Object v) {
        return v instanceof Double d && Double.isFinite(d);
    }

    /**
     * Counts a delivered run and shows it as a point if it is plotted and there is room. Rows must come
     * in index order for the points to be the first runs.
     *
     * @param row the run's row (its {@link SweepRow#csv()} line is what a click shows)
     */
    public void add(SweepRow row) {
        count(row.outcome(), 1);
        if (!full()) {
            show(row.values());
        }
    }

    /**
     * Adds runs to an outcome's count (the counts cover every run, shown or not).
     *
     * @param outcome the outcome ({@link Outcome})
     * @param runs number of runs, at least 0
     */
    public void count(String outcome, long runs) {
        if (outcome == null || runs < 0) {
            throw new IllegalArgumentException("outcome must be given and runs at least 0, got " + outcome + ", "
                + runs);
        }
        counts.merge(outcome, runs, Long::sum);
        total += runs;
    }

    /**
     * Shows a run as a point when it is {@link #plotted} and the report is not {@link #full()}; it is not
     * counted (see {@link #count}). Runs must come in index order.
     *
     * @param values the row's values in column order, as {@link SweepRow#values()} gives them
     * @return whether a point was added
     */
    public boolean show(Object[] values) {
        if (values.length != columns.length) {
            throw new IllegalArgumentException("values must hold one value per column (" + columns.length + "), got "
                + values.length);
        }
        int np = names.size();
        if (full() || !plotted(values, np)) {
            return false;
        }
        points.add(new Point((Double) values[1], (Double) values[yColumn(np)], (String) values[1 + np],
            SweepRow.csv(values, np)));
        return true;
    }

    /** @return whether the report holds its most points */
    public boolean full() {
        return points.size() >= maxPoints;
    }

    /** @return the number of points held */
    public int points() {
        return points.size();
    }

    /**
     * @param file the HTML file
     * @param title the title ({@link #title})
     * @param subtitle a line under it ({@link #subtitle})
     * @throws IOException when it cannot be written
     */
    public void write(Path file, String title, String subtitle) throws IOException {
        ObjectNode data = HtmlReport.JSON.createObjectNode();
        data.put("kind", "sweep");
        data.put("title", title);
        data.put("subtitle", subtitle);
        data.put("x_title", Units.label(names.get(0)));
        data.put("y_title", names.size() > 1 ? Units.label(names.get(1)) : "end time (s)");
        ArrayNode cols = data.putArray("columns");
        for (String c : columns) {
            cols.add(columnTitle(c));
        }
        ObjectNode outcomes = data.putObject("outcomes");
        int i = 0;
        for (Map.Entry<String, Long> e : counts.entrySet()) {
            outcomes.putObject(e.getKey()).put("label", labels.getOrDefault(e.getKey(), Outcome.describe(e.getKey())))
                .put("count", e.getValue()).put("color", Palette.rgb(Palette.outcome(e.getKey(), i++)));
        }
        data.putPOJO("points", new PointsJson());
        data.put("left_out", total - points.size());
        HtmlReport.write(file, title, data);
    }

    /**
     * The points as a JSON array, written straight to the page's generator when the page is written (the
     * same text a JSON tree of them would give, without the tree).
     */
    private final class PointsJson extends JsonSerializable.Base {
        @Override
        public void serialize(JsonGenerator g, SerializerProvider provider) throws IOException {
            g.writeStartArray();
            for (Point p : points) {
                g.writeStartObject();
                g.writeNumberField("x", p.x());
                g.writeNumberField("y", p.y());
                g.writeStringField("o", p.outcome());
                g.writeArrayFieldStart("row");
                for (String c : cells(p.line())) {
                    g.writeString(c);
                }
                g.writeEndArray();
                g.writeEndObject();
            }
            g.writeEndArray();
        }

        @Override
        public void serializeWithType(JsonGenerator g, SerializerProvider provider, TypeSerializer types)
            throws IOException {
            serialize(g, provider);
        }
    }

    /** A column title with its unit. */
    private String columnTitle(String c) {
        if (names.contains(c)) {
            return Units.label(c);
        }
        switch (c) {
            case "end_time":
            case "exit_time":
                return c + " (s)";
            case "exit_x":
            case "exit_y":
            case "exit_z":
            case "end_x":
            case "end_y":
            case "end_z":
                return c + " (m)";
            case "exit_vx":
            case "exit_vy":
            case "exit_vz":
            case "exit_speed":
                return c + " (m/s)";
            default:
                return c;
        }
    }

    /** Splits a CSV row (quoted cells with doubled quotes, as sweep.csv writes them). */
    static String[] cells(String row) {
        List<String> out = new ArrayList<>();
        StringBuilder b = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < row.length(); i++) {
            char ch = row.charAt(i);
            if (quoted) {
                if (ch == '"' && i + 1 < row.length() && row.charAt(i + 1) == '"') {
                    b.append('"');
                    i++;
                } else if (ch == '"') {
                    quoted = false;
                } else {
                    b.append(ch);
                }
            } else if (ch == '"') {
                quoted = true;
            } else if (ch == ',') {
                out.add(b.toString());
                b.setLength(0);
            } else {
                b.append(ch);
            }
        }
        out.add(b.toString());
        return out.toArray(new String[0]);
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "SweepReport(%d runs, %d points)", total, points.size());
    }
}
