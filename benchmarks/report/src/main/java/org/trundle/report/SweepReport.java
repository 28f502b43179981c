package org.trundle.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.trundle.scenario.Outcome;
import org.trundle.scenario.Units;
import org.trundle.scenario.SweepRow;

/**
 * The HTML report of a sweep ({@code sweep-report.html}, one self-contained file like
 * {@link HtmlReport}): the regime map — one point per run at its parameter values (for one
 * parameter: end time against it), coloured by outcome as in {@code regime-map.png} — whose points
 * open their run's row of {@code sweep.csv} with units. At most {@link #MAX_POINTS} runs are kept
 * (the first by index order of delivery); the outcome counts cover all runs.
 */
public final class SweepReport {
    /** Most runs shown as points. */
    static final int MAX_POINTS = 20_000;

    private final List<String> names;
    private final Map<String, String> labels;
    private final String[] columns;
    private final List<Object[]> points = new ArrayList<>();
    private final Map<String, Integer> counts = new TreeMap<>();
    private long total;

    /**
     * @param names parameter names
     * @param labels legend texts by outcome
     * @param header the sweep.csv header line
     */
    public SweepReport(List<String> names, Map<String, String> labels, String header) {
        this.names = names;
        this.labels = labels;
        this.columns = header.split(",", -1);
    }

    /**
     * @param row a delivered run's row (its {@link SweepRow#csv()} line is what a click shows)
     */
    public void add(SweepRow row) {
        total++;
        String o = row.outcome();
        counts.merge(o, 1, Integer::sum);
        if (points.size() >= MAX_POINTS) {
            return;
        }
        double x = row.parameter(0);
        double y = names.size() > 1 ? row.parameter(1) : row.endTime().orElse(Double.NaN);
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            return;
        }
        points.add(new Object[] {x, y, o, cells(row.csv())});
    }

    /**
     * @param file the HTML file
     * @param title the title
     * @param subtitle a line under it
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
        Map<String, Integer> order = new LinkedHashMap<>(counts);
        for (Map.Entry<String, Integer> e : order.entrySet()) {
            outcomes.putObject(e.getKey()).put("label", labels.getOrDefault(e.getKey(), Outcome.describe(e.getKey())))
                .put("count", e.getValue()).put("color", Palette.rgb(Palette.outcome(e.getKey(), i++)));
        }
        ArrayNode pts = data.putArray("points");
        for (Object[] p : points) {
            ObjectNode o = pts.addObject().put("x", (double) p[0]).put("y", (double) p[1]).put("o", (String) p[2]);
            ArrayNode row = o.putArray("row");
            for (String c : (String[]) p[3]) {
                row.add(c);
            }
        }
        data.put("left_out", total - points.size());
        HtmlReport.write(file, title, data);
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
