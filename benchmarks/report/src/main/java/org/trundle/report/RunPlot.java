package org.trundle.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import javax.imageio.ImageIO;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.lines.SeriesLines;
import org.knowm.xchart.style.markers.SeriesMarkers;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;
import org.trundle.core.RunEvent;
import org.trundle.core.Surface;
import org.trundle.surfaces.Cylinder;

/**
 * The picture of a run (PNG): four panels — height of the centre along {@code −g} and speed
 * against time, coloured by phase with the events marked; the contact forces against time; and the
 * centre path in an oblique 3-D projection with the surface's outline where the runner knows one
 * (the rims and silhouette of a cylinder) — under a title line with the outcome.
 */
public final class RunPlot {
    private static final int W = 720;
    private static final int H = 470;
    private static final int MAX_POINTS = 6000;

    private RunPlot() {
    }

    /**
     * @param file PNG to write
     * @param title title lines (scenario description; outcome)
     * @param rec the recorded run
     * @param surface the surface (for its outline)
     * @param up unit up direction (opposite to gravity)
     * @throws IOException when the file cannot be written
     */
    public static void write(Path file, String[] title, RunRecorder rec, Surface surface, Vector3D up) throws IOException {
        double[] t = rec.time.toArray();
        XYChart height = phaseChart("Height of the centre", "time t (s)", "height h (m, along -g)", t,
            rec.height.toArray(), rec.phases);
        XYChart speed = phaseChart("Speed of the centre", "time t (s)", "speed |v| (m/s)", t, rec.speed.toArray(),
            rec.phases);
        addEdgeLevels(height, surface, up, t, rec.height.toArray());
        markEvents(height, rec.events, e -> e.before().centre().dotProduct(up));
        markEvents(speed, rec.events, e -> e.before().velocity().getNorm());
        XYChart forces = Palette.chart(W, H, "Contact forces", "time t (s)", "force (N)");
        int[] keep = decimate(t.length);
        addLine(forces, "normal force F_n", pick(t, keep), pick(rec.normalForce.toArray(), keep),
            new Color(0x30, 0x30, 0x30), true);
        addLine(forces, "friction force |F_t|", pick(t, keep), pick(rec.frictionForce.toArray(), keep),
            new Color(0xd9, 0x6a, 0x10), true);
        XYChart path = pathChart(rec, surface, up);
        BufferedImage[] panels = {
            BitmapEncoder.getBufferedImage(height), BitmapEncoder.getBufferedImage(speed),
            BitmapEncoder.getBufferedImage(forces), BitmapEncoder.getBufferedImage(path)};
        int top = 24 + 24 * title.length;
        BufferedImage img = new BufferedImage(2 * W, 2 * H + top, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, img.getWidth(), img.getHeight());
        g.setColor(new Color(0x20, 0x20, 0x20));
        for (int i = 0; i < title.length; i++) {
            g.setFont(new Font(Font.SANS_SERIF, i == 0 ? Font.BOLD : Font.PLAIN, i == 0 ? 17 : 16));
            g.drawString(clip(title[i], 150), 16, 28 + 24 * i);
        }
        for (int i = 0; i < 4; i++) {
            g.drawImage(panels[i], (i % 2) * W, top + (i / 2) * H, null);
        }
        g.dispose();
        ImageIO.write(img, "png", file.toFile());
    }

    /**
     * Loads and initialises what {@link #write} needs (the chart library, Java2D's rasteriser and
     * fonts, the PNG encoder) by drawing and encoding a throw-away chart, so that a caller can do it
     * on a second thread while the run is computed; {@link #write} then finds all of it ready.
     * Writes no file; the picture {@link #write} draws does not depend on whether this ran.
     */
    public static void prepare() {
        XYChart chart = Palette.chart(W, H, "warm-up", "t", "y");
        addLine(chart, "a", new double[] {0, 1}, new double[] {0, 1}, new Color(0x30, 0x30, 0x30), true);
        BufferedImage panel = BitmapEncoder.getBufferedImage(chart);
        Graphics2D g = panel.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 17));
        g.drawString("warm-up", 16, 28);
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 16));
        g.drawString("warm-up", 16, 52);
        g.dispose();
        try {
            ImageIO.write(panel, "png", new java.io.ByteArrayOutputStream());
        } catch (IOException e) {
            // an in-memory stream does not fail; if it did, write() would report it on the real file
        }
    }

    private static String clip(String s, int n) {
        return s.length() <= n ? s : s.substring(0, n - 3) + "...";
    }

    /** Indices to plot: all when few, else evenly spaced plus every phase change. */
    static int[] decimate(int n) {
        if (n <= MAX_POINTS) {
            int[] all = new int[n];
            for (int i = 0; i < n; i++) {
                all[i] = i;
            }
            return all;
        }
        int[] k = new int[MAX_POINTS];
        for (int i = 0; i < MAX_POINTS; i++) {
            k[i] = (int) Math.round((double) i * (n - 1) / (MAX_POINTS - 1));
        }
        return k;
    }

    static double[] pick(double[] a, int[] idx) {
        double[] o = new double[idx.length];
        for (int i = 0; i < idx.length; i++) {
            o[i] = a[idx[i]];
        }
        return o;
    }

    /** A line chart with one series per stretch of constant phase, coloured by phase. */
    private static XYChart phaseChart(String title, String xt, String yt, double[] x, double[] y, List<Phase> phases) {
        XYChart c = Palette.chart(W, H, title, xt, yt);
        addPhaseLines(c, x, y, phases, "");
        return c;
    }

    private static void addPhaseLines(XYChart c, double[] x, double[] y, List<Phase> phases, String prefix) {
        int n = x.length;
        if (n == 0) {
            return;
        }
        int step = Math.max(1, n / MAX_POINTS);
        Set<Phase> shown = EnumSet.noneOf(Phase.class);
        int segment = 0;
        int i = 0;
        while (i < n) {
            Phase p = phases.get(i);
            int j = i;
            while (j + 1 < n && phases.get(j + 1) == p) {
                j++;
            }
            // the stretch i..j, joined to the next point so the curve stays continuous
            int end = Math.min(j + 1, n - 1);
            List<Double> xs = new ArrayList<>();
            List<Double> ys = new ArrayList<>();
            for (int k = i; k <= end; k += step) {
                xs.add(x[k]);
                ys.add(y[k]);
            }
            if (xs.isEmpty() || xs.get(xs.size() - 1) != x[end]) {
                xs.add(x[end]);
                ys.add(y[end]);
            }
            if (xs.size() == 1) {
                xs.add(x[end]);
                ys.add(y[end]);
            }
            String name = shown.add(p) ? prefix + p.label() : prefix + p.label() + " #" + (++segment);
            XYSeries s = c.addSeries(name, xs, ys);
            s.setMarker(SeriesMarkers.NONE);
            s.setLineColor(Palette.phase(p));
            s.setLineStyle(new BasicStroke(2.2f));
            s.setShowInLegend(name.equals(prefix + p.label()));
            i = j + 1;
        }
    }

    private static void addLine(XYChart c, String name, double[] x, double[] y, Color color, boolean legend) {
        if (x.length == 0) {
            return;
        }
        XYSeries s = c.addSeries(name, x, y);
        s.setMarker(SeriesMarkers.NONE);
        s.setLineColor(color);
        s.setLineStyle(new BasicStroke(1.8f));
        s.setShowInLegend(legend);
    }

    private interface EventValue {
        double of(RunEvent e);
    }

    private static void markEvents(XYChart c, List<RunEvent> events, EventValue v) {
        for (EventKind k : EventKind.values()) {
            List<Double> xs = new ArrayList<>();
            List<Double> ys = new ArrayList<>();
            for (RunEvent e : events) {
                if (e.kind() == k) {
                    xs.add(e.time());
                    ys.add(v.of(e));
                }
            }
            if (!xs.isEmpty()) {
                XYSeries s = c.addSeries("event: " + k.label(), xs, ys);
                s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
                s.setMarker(Palette.eventMarker(k));
                s.setMarkerColor(Palette.eventColor(k));
            }
        }
    }

    /**
     * Dashed levels of a cylinder's rims in the height panel, when its axis is along gravity and the
     * rim lies within two height ranges of the path (a far rim would flatten the curve).
     */
    private static void addEdgeLevels(XYChart c, Surface surface, Vector3D up, double[] t, double[] h) {
        if (!(surface instanceof Cylinder) || t.length < 2) {
            return;
        }
        Cylinder cyl = (Cylinder) surface;
        if (Math.abs(Math.abs(cyl.axis().dotProduct(up)) - 1) > 1e-9) {
            return;
        }
        double hmin = java.util.Arrays.stream(h).min().orElse(0);
        double hmax = java.util.Arrays.stream(h).max().orElse(0);
        double span = Math.max(hmax - hmin, 1e-3);
        double[] bounds = {cyl.from(), cyl.to()};
        String[] names = {"from", "to"};
        for (int i = 0; i < 2; i++) {
            if (Double.isFinite(bounds[i])) {
                double level = cyl.origin().add(bounds[i], cyl.axis()).dotProduct(up);
                if (level < hmin - 2 * span || level > hmax + 2 * span) {
                    continue;
                }
                XYSeries s = c.addSeries("edge \"" + names[i] + "\"", new double[] {t[0], t[t.length - 1]},
                    new double[] {level, level});
                s.setMarker(SeriesMarkers.NONE);
                s.setLineColor(new Color(0x80, 0x80, 0x80));
                s.setLineStyle(SeriesLines.DASH_DASH);
            }
        }
    }

    /** The centre path in an oblique view: azimuth 35°, elevation 22° about the up direction. */
    private static XYChart pathChart(RunRecorder rec, Surface surface, Vector3D up) {
        Vector3D e1 = Math.abs(up.getX()) < 0.9 ? Vector3D.PLUS_I : Vector3D.PLUS_J;
        e1 = e1.subtract(e1.dotProduct(up), up).normalize();
        Vector3D e2 = Vector3D.crossProduct(up, e1);
        double az = Math.toRadians(35);
        double el = Math.toRadians(22);
        Vector3D toViewer = e1.scalarMultiply(Math.cos(el) * Math.cos(az)).add(Math.cos(el) * Math.sin(az), e2)
            .add(Math.sin(el), up);
        Vector3D sx = Vector3D.crossProduct(up, toViewer).normalize();
        Vector3D sy = Vector3D.crossProduct(toViewer, sx).normalize();
        int n = rec.time.size();
        double[] px = new double[n];
        double[] py = new double[n];
        for (int i = 0; i < n; i++) {
            Vector3D c = new Vector3D(rec.x.get(i), rec.y.get(i), rec.z.get(i));
            px[i] = c.dotProduct(sx);
            py[i] = c.dotProduct(sy);
        }
        XYChart c = Palette.chart(W, H, "Path of the centre (oblique 3-D view)", "screen x (m)", "screen y (m)");
        c.getStyler().setLegendVisible(true);
        List<double[][]> outline = outline(surface, rec);
        boolean first = true;
        for (double[][] poly : outline) {
            double[] ox = new double[poly.length];
            double[] oy = new double[poly.length];
            for (int i = 0; i < poly.length; i++) {
                Vector3D p = new Vector3D(poly[i][0], poly[i][1], poly[i][2]);
                ox[i] = p.dotProduct(sx);
                oy[i] = p.dotProduct(sy);
            }
            XYSeries s = c.addSeries(first ? "surface outline" : "outline " + c.getSeriesMap().size(), ox, oy);
            s.setMarker(SeriesMarkers.NONE);
            s.setLineColor(new Color(0xa0, 0xa0, 0xa8));
            s.setLineStyle(new BasicStroke(1.2f));
            s.setShowInLegend(first);
            first = false;
        }
        addPhaseLines(c, px, py, rec.phases, "");
        List<RunEvent> ev = rec.events;
        for (EventKind k : EventKind.values()) {
            List<Double> xs = new ArrayList<>();
            List<Double> ys = new ArrayList<>();
            for (RunEvent e : ev) {
                if (e.kind() == k) {
                    xs.add(e.before().centre().dotProduct(sx));
                    ys.add(e.before().centre().dotProduct(sy));
                }
            }
            if (!xs.isEmpty()) {
                XYSeries s = c.addSeries("event: " + k.label(), xs, ys);
                s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
                s.setMarker(Palette.eventMarker(k));
                s.setMarkerColor(Palette.eventColor(k));
            }
        }
        if (n > 0) {
            XYSeries s = c.addSeries("start", new double[] {px[0]}, new double[] {py[0]});
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            s.setMarker(SeriesMarkers.CIRCLE);
            s.setMarkerColor(new Color(0x20, 0x20, 0x20));
        }
        equalAspect(c, px, py, outline, sx, sy);
        return c;
    }

    /** Sets equal metres per pixel on both axes (approximately, from the plot area's size). */
    private static void equalAspect(XYChart c, double[] px, double[] py, List<double[][]> outline, Vector3D sx,
                                    Vector3D sy) {
        double xmin = Double.POSITIVE_INFINITY;
        double xmax = Double.NEGATIVE_INFINITY;
        double ymin = Double.POSITIVE_INFINITY;
        double ymax = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < px.length; i++) {
            xmin = Math.min(xmin, px[i]);
            xmax = Math.max(xmax, px[i]);
            ymin = Math.min(ymin, py[i]);
            ymax = Math.max(ymax, py[i]);
        }
        for (double[][] poly : outline) {
            for (double[] q : poly) {
                Vector3D p = new Vector3D(q[0], q[1], q[2]);
                xmin = Math.min(xmin, p.dotProduct(sx));
                xmax = Math.max(xmax, p.dotProduct(sx));
                ymin = Math.min(ymin, p.dotProduct(sy));
                ymax = Math.max(ymax, p.dotProduct(sy));
            }
        }
        if (!(xmax > xmin) && !(ymax > ymin)) {
            return;
        }
        double plotW = W - 110.0;
        double plotH = H - 110.0;
        double span = Math.max((xmax - xmin) / plotW, (ymax - ymin) / plotH) * 1.08;
        double cx = 0.5 * (xmin + xmax);
        double cy = 0.5 * (ymin + ymax);
        c.getStyler().setXAxisMin(cx - 0.5 * span * plotW);
        c.getStyler().setXAxisMax(cx + 0.5 * span * plotW);
        c.getStyler().setYAxisMin(cy - 0.5 * span * plotH);
        c.getStyler().setYAxisMax(cy + 0.5 * span * plotH);
        c.getStyler().setXAxisDecimalPattern("0.000");
        c.getStyler().setYAxisDecimalPattern("0.000");
    }

    /**
     * Outline polylines (world points, m) of surfaces the runner knows: a cylinder's two rims and
     * two axial lines, over its bounds or, where unbounded, over the axial range of the path.
     */
    static List<double[][]> outline(Surface surface, RunRecorder rec) {
        List<double[][]> out = new ArrayList<>();
        if (!(surface instanceof Cylinder)) {
            return out;
        }
        Cylinder cyl = (Cylinder) surface;
        Vector3D o = cyl.origin();
        Vector3D a = cyl.axis();
        double smin = Double.POSITIVE_INFINITY;
        double smax = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < rec.time.size(); i++) {
            double s = new Vector3D(rec.x.get(i), rec.y.get(i), rec.z.get(i)).subtract(o).dotProduct(a);
            smin = Math.min(smin, s);
            smax = Math.max(smax, s);
        }
        // the tube around the path: its real edges where they are near, else cut 1.5 path lengths away
        double reach = 1.5 * Math.max(smax - smin, 2 * cyl.radius());
        double lo = Math.max(cyl.from(), smin - reach);
        double hi = Math.min(cyl.to(), smax + reach);
        if (!(hi > lo)) {
            return out;
        }
        Vector3D u = Math.abs(a.getX()) < 0.9 ? Vector3D.PLUS_I : Vector3D.PLUS_J;
        u = u.subtract(u.dotProduct(a), a).normalize();
        Vector3D v = Vector3D.crossProduct(a, u);
        double rr = cyl.radius();
        for (double s : new double[] {lo, hi}) {
            double[][] ring = new double[73][];
            for (int i = 0; i <= 72; i++) {
                double th = 2 * Math.PI * i / 72;
                Vector3D p = o.add(s, a).add(rr * Math.cos(th), u).add(rr * Math.sin(th), v);
                ring[i] = p.toArray();
            }
            out.add(ring);
        }
        for (double th : new double[] {0.5 * Math.PI + Math.toRadians(35), -0.5 * Math.PI + Math.toRadians(35)}) {
            Vector3D d = u.scalarMultiply(rr * Math.cos(th)).add(rr * Math.sin(th), v);
            out.add(new double[][] {o.add(lo, a).add(d).toArray(), o.add(hi, a).add(d).toArray()});
        }
        return out;
    }

    /** @return a short text of a number with units for titles */
    static String num(double v, String unit) {
        return String.format(Locale.ROOT, "%.4g %s", v, unit);
    }
}
