package org.trundle.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.markers.SeriesMarkers;
import org.trundle.scenario.Outcome;
import org.trundle.scenario.SweepRow;
import org.trundle.scenario.Units;

/**
 * The regime map of a sweep (PNG): for two parameters, one square per grid run (a dot per random
 * run) at its parameter values, coloured by {@link Outcome}; for one parameter, the end time
 * against the parameter, coloured the same way.
 */
public final class RegimeMap {
    private final List<String> names;
    private final Map<String, String> labels;
    private final Map<String, List<double[]>> byOutcome = new LinkedHashMap<>();
    private final List<java.util.Set<Double>> seen = new ArrayList<>();

    /**
     * @param names parameter names
     * @param labels legend texts by outcome (others get a default)
     */
    public RegimeMap(List<String> names, Map<String, String> labels) {
        this.names = names;
        this.labels = labels;
        for (int i = 0; i < names.size(); i++) {
            seen.add(new java.util.HashSet<>());
        }
    }

    /** @param row a delivered run's row */
    public void add(SweepRow row) {
        double endTime = row.endTime().orElse(Double.NaN);
        double b = names.size() > 1 ? row.parameter(1) : endTime;
        if (Double.isNaN(b)) {
            return;
        }
        add(row.outcome(), row.parameter(0), b);
    }

    /**
     * Adds one marker (a run, or an aggregate of runs of one outcome in one cell).
     *
     * @param outcome its outcome
     * @param x the first parameter's value
     * @param y the second parameter's value, or the end time (s) for a one-parameter sweep
     */
    public void add(String outcome, double x, double y) {
        byOutcome.computeIfAbsent(outcome, k -> new ArrayList<>()).add(new double[] {x, y});
        seen.get(0).add(x);
        if (names.size() > 1) {
            seen.get(1).add(y);
        }
    }

    /**
     * @param file PNG to write
     * @param title chart title
     * @param random whether the runs were random samples
     * @throws IOException when the file cannot be written
     */
    public void write(Path file, String title, boolean random) throws IOException {
        boolean two = names.size() > 1;
        XYChart c = Palette.chart(1000, 760, title, Units.label(names.get(0)), two ? Units.label(names.get(1)) : "end time (s)");
        c.getStyler().setLegendPosition(Styler.LegendPosition.OutsideE);
        c.getStyler().setLegendLayout(Styler.LegendLayout.Vertical);
        c.getStyler().setMarkerSize(7);
        int cells = byOutcome.values().stream().mapToInt(List::size).sum();
        boolean tiles = two && !random && cells <= MAX_TILES;
        double[] ex = tiles ? edges(seen.get(0)) : null;
        double[] ey = tiles ? edges(seen.get(1)) : null;
        double[] xv = tiles ? sorted(seen.get(0)) : null;
        double[] yv = tiles ? sorted(seen.get(1)) : null;
        int i = 0;
        int tile = 0;
        for (Map.Entry<String, List<double[]>> e : byOutcome.entrySet()) {
            java.awt.Color color = Palette.outcome(e.getKey(), i++);
            String label = labels.getOrDefault(e.getKey(), Outcome.describe(e.getKey())) + " (" + e.getKey() + ", "
                + e.getValue().size() + ")";
            List<Double> xs = new ArrayList<>();
            List<Double> ys = new ArrayList<>();
            for (double[] p : e.getValue()) {
                xs.add(p[0]);
                ys.add(p[1]);
                if (tiles) {
                    int a = java.util.Arrays.binarySearch(xv, p[0]);
                    int b = java.util.Arrays.binarySearch(yv, p[1]);
                    XYSeries t = c.addSeries("tile " + tile++, new double[] {ex[a], ex[a + 1], ex[a + 1], ex[a], ex[a]},
                        new double[] {ey[b], ey[b], ey[b + 1], ey[b + 1], ey[b]});
                    t.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.PolygonArea);
                    t.setMarker(SeriesMarkers.NONE);
                    t.setFillColor(color);
                    t.setLineColor(java.awt.Color.WHITE);
                    t.setLineWidth(0.6f);
                    t.setShowInLegend(false);
                }
            }
            if (tiles) { // the tiles show the runs; this one-point series (on a tile of its colour) is the legend entry
                xs = xs.subList(0, 1);
                ys = ys.subList(0, 1);
            }
            XYSeries s = c.addSeries(label, xs, ys);
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            s.setMarker(tiles ? SeriesMarkers.SQUARE : SeriesMarkers.CIRCLE);
            s.setMarkerColor(color);
        }
        if (tiles) {
            c.getStyler().setXAxisMin(ex[0]);
            c.getStyler().setXAxisMax(ex[ex.length - 1]);
            c.getStyler().setYAxisMin(ey[0]);
            c.getStyler().setYAxisMax(ey[ey.length - 1]);
        }
        if (byOutcome.isEmpty()) {
            c.addSeries("no runs", new double[] {0}, new double[] {0});
        }
        BitmapEncoder.saveBitmap(c, file.toString(), BitmapEncoder.BitmapFormat.PNG);
    }

    /** Largest grid drawn as tiles (one chart series each); larger grids are drawn as markers. */
    private static final int MAX_TILES = 4000;

    private static double[] sorted(java.util.Set<Double> v) {
        return v.stream().mapToDouble(Double::doubleValue).sorted().toArray();
    }

    /** Cell edges: midway between neighbouring values, half a spacing beyond the ends. */
    private static double[] edges(java.util.Set<Double> values) {
        double[] v = sorted(values);
        double[] e = new double[v.length + 1];
        if (v.length == 1) {
            double h = Math.max(Math.abs(v[0]) * 0.05, 0.5);
            e[0] = v[0] - h;
            e[1] = v[0] + h;
            return e;
        }
        for (int i = 1; i < v.length; i++) {
            e[i] = 0.5 * (v[i - 1] + v[i]);
        }
        e[0] = v[0] - (e[1] - v[0]);
        e[v.length] = v[v.length - 1] + (v[v.length - 1] - e[v.length - 1]);
        return e;
    }
}
