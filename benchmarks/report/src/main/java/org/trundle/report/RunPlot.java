package org.trundle.report;

import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import javax.imageio.ImageIO;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;
import org.trundle.core.RunEvent;
import org.trundle.core.Patch;
import org.trundle.core.Simulation;
import org.trundle.core.Surface;

/**
 * The picture of a run (PNG), drawn with Java 2D from the recorder's bounded {@link SampleDigest}:
 * a title with the outcome and a legend line; then height of the centre along {@code −g}, speed of
 * the centre and the contact forces against time (coloured by phase, events marked, axes at round
 * 1-2-5 steps); then a 3-D view of the surface's own triangle mesh with the centre path and world
 * axes ({@link SceneView}); and, when the surface names two coordinates, the track of the contact
 * point on the unrolled wall (second coordinate against the first).
 */
public final class RunPlot {
    private static final int W = 1500;
    private static final int ROW1 = 330;
    private static final int ROW2 = 560;

    private RunPlot() {
    }

    /**
     * Loads and initialises what {@link #write} needs (Java 2D's rasteriser, the fonts, the PNG
     * encoder) by drawing and encoding a tiny throw-away picture, so that a caller can do it on a
     * second thread while the run is computed (a cold first picture costs a few hundred
     * milliseconds). Writes no file; the picture {@link #write} draws does not depend on it.
     */
    public static void prepare() {
        {
            try {
                BufferedImage img = new BufferedImage(64, 48, BufferedImage.TYPE_INT_RGB);
                Graphics2D g = img.createGraphics();
                g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
                g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
                for (Font f : new Font[] {ChartFrame.TITLE, ChartFrame.LABEL, new Font(Font.SANS_SERIF, Font.BOLD, 16)}) {
                    g.setFont(f);
                    g.drawString("t (s) 0.125 -9.5e-3 height |v| F_n", 2, 20);
                }
                g.setStroke(new java.awt.BasicStroke(2f, java.awt.BasicStroke.CAP_ROUND, java.awt.BasicStroke.JOIN_ROUND));
                java.awt.geom.Path2D.Double p = new java.awt.geom.Path2D.Double();
                p.moveTo(1, 1);
                for (int i = 0; i < 200; i++) {
                    p.lineTo(i % 60, (i * 7) % 45);
                }
                g.draw(p);
                g.setColor(new Color(100, 120, 140, 77));
                g.fillPolygon(new int[] {1, 30, 12}, new int[] {2, 8, 40}, 3);
                g.dispose();
                ImageIO.write(img, "png", new java.io.ByteArrayOutputStream());
            } catch (IOException | RuntimeException e) {
                // only a warm-up: the real picture reports its own errors
            }
        }
    }

    /**
     * @param file PNG to write
     * @param title title lines (scenario description; outcome)
     * @param rec the recorded run
     * @param surface the surface (drawn from its mesh)
     * @param up unit up direction (opposite to gravity)
     * @param ballRadius ball radius (m), for the box around the path
     * @throws IOException when the file cannot be written
     */
    public static void write(Path file, String[] title, RunRecorder rec, Surface surface, Vector3D up, double ballRadius)
        throws IOException {
        write(file, title, rec, List.of(Patch.of(Simulation.SINGLE_PATCH, surface)), up, ballRadius);
    }

    /**
     * The same for a scene: every patch is drawn (a moving one at its pose at the first sample).
     *
     * @param file PNG to write
     * @param title title lines (scenario description; outcome)
     * @param rec the recorded run
     * @param patches the scene's patches (drawn from their meshes)
     * @param up unit up direction (opposite to gravity)
     * @param ballRadius ball radius (m), for the box around the path
     * @throws IOException when the file cannot be written
     */
    public static void write(Path file, String[] title, RunRecorder rec, List<Patch> patches, Vector3D up,
                             double ballRadius) throws IOException {
        SampleDigest d = rec.digest();
        List<RunEvent> events = rec.events();
        int top = 16 + 24 * title.length + 28;
        BufferedImage img = new BufferedImage(W, top + ROW1 + ROW2 + 10, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setColor(new Color(0xf6, 0xf7, 0xf9));
        g.fillRect(0, 0, img.getWidth(), img.getHeight());
        g.setColor(ChartFrame.INK);
        for (int i = 0; i < title.length; i++) {
            g.setFont(new Font(Font.SANS_SERIF, i == 0 ? Font.BOLD : Font.PLAIN, i == 0 ? 16 : 15));
            g.drawString(clip(title[i], 170), 16, 26 + 24 * i);
        }
        legend(g, 16, top - 14, d);
        if (d.size() > 0) {
            double t0 = d.get(0, SampleDigest.Column.T);
            double t1 = Math.max(d.get(d.size() - 1, SampleDigest.Column.T), t0);
            timePanel(g, 0, top, "Height of the centre", "height h (m, along -g)", d, SampleDigest.Column.HEIGHT, t0, t1,
                events, e -> e.before().centre().dotProduct(up));
            timePanel(g, W / 3, top, "Speed of the centre", "speed |v| (m/s)", d, SampleDigest.Column.SPEED, t0, t1,
                events, e -> e.before().velocity().getNorm());
            forcePanel(g, 2 * W / 3, top, d, t0, t1);
        }
        boolean wall = rec.coordinateTitles() != null && PhasePlot.range(d, SampleDigest.Column.U, false) != null;
        PatchMeshes mesh = PatchMeshes.of(patches, d, ballRadius, PatchMeshes.PICTURE_RESOLUTION);
        String note = mesh.note() != null ? mesh.note()
            : mesh.mesh().triangleCount() + " mesh triangles of " + patches.get(0).surface().name();
        new SceneView(up).draw(g, 8, top + ROW1 + 4, wall ? 3 * W / 5 - 12 : W - 16, ROW2 - 8,
            "Path of the centre on the surface (3-D view)", mesh.mesh(), d, events, clip(note, 110));
        if (wall) {
            wallPanel(g, 3 * W / 5, top + ROW1, 2 * W / 5, ROW2, d, rec.coordinateTitles());
        }
        g.dispose();
        writePng(img, file);
    }

    /** PNG with fast deflate (level about 1 instead of the writer's default 4): a few % larger, much quicker. */
    private static void writePng(BufferedImage img, Path file) throws IOException {
        javax.imageio.ImageWriter w = ImageIO.getImageWritersByFormatName("png").next();
        javax.imageio.ImageWriteParam p = w.getDefaultWriteParam();
        p.setCompressionMode(javax.imageio.ImageWriteParam.MODE_EXPLICIT);
        p.setCompressionQuality(0.85f);
        java.nio.file.Files.deleteIfExists(file);
        try (javax.imageio.stream.ImageOutputStream out = ImageIO.createImageOutputStream(file.toFile())) {
            w.setOutput(out);
            w.write(null, new javax.imageio.IIOImage(img, null, null), p);
        } finally {
            w.dispose();
        }
    }

    private static void timePanel(Graphics2D g, int x, int y, String title, String yTitle, SampleDigest d,
                                  SampleDigest.Column c, double t0, double t1, List<RunEvent> events,
                                  java.util.function.ToDoubleFunction<RunEvent> value) {
        double[] r = PhasePlot.range(d, c, true);
        double[] yr = padded(r);
        ChartFrame f = new ChartFrame(g, x, y, W / 3, ROW1, title, "time t (s)", yTitle, t0, t1, yr[0], yr[1]);
        PhasePlot.drawAgainstTime(g, f, d, c, null);
        PhasePlot.markEvents(g, f, events, value);
    }

    private static void forcePanel(Graphics2D g, int x, int y, SampleDigest d, double t0, double t1) {
        double[] a = PhasePlot.range(d, SampleDigest.Column.NORMAL, true);
        double[] b = PhasePlot.range(d, SampleDigest.Column.FRICTION, true);
        double lo = Math.min(a == null ? 0 : a[0], b == null ? 0 : b[0]);
        double hi = Math.max(a == null ? 0 : a[1], b == null ? 0 : b[1]);
        double[] yr = padded(new double[] {Math.min(lo, 0), hi});
        ChartFrame f = new ChartFrame(g, x, y, W / 3, ROW1, "Contact forces", "time t (s)", "force (N)", t0, t1, yr[0],
            yr[1]);
        Color normal = new Color(0x33, 0x36, 0x40);
        Color friction = new Color(0xc8, 0x5a, 0x14);
        PhasePlot.drawAgainstTime(g, f, d, SampleDigest.Column.NORMAL, normal);
        PhasePlot.drawAgainstTime(g, f, d, SampleDigest.Column.FRICTION, friction);
        f.legend(g, new String[] {"normal force F_n", "friction force |F_t|"}, new Color[] {normal, friction});
    }

    private static void wallPanel(Graphics2D g, int x, int y, int w, int h, SampleDigest d, String[] titles) {
        // an angle round the wall reads best across, a length along it upward
        boolean swap = titles[1].endsWith("(rad)") && titles[0].endsWith("(m)");
        SampleDigest.Column cx = swap ? SampleDigest.Column.V : SampleDigest.Column.U;
        SampleDigest.Column cy = swap ? SampleDigest.Column.U : SampleDigest.Column.V;
        String tx = swap ? titles[1] : titles[0];
        String ty = swap ? titles[0] : titles[1];
        double[] xr = padded(PhasePlot.range(d, cx, false));
        double[] yr = padded(PhasePlot.range(d, cy, false));
        ChartFrame f = new ChartFrame(g, x, y, w, h, "Track on the unrolled wall (closest point)", tx, ty, xr[0], xr[1],
            yr[0], yr[1]);
        java.awt.Shape clip = g.getClip();
        g.clip(f.area());
        PhasePlot.drawLine(g, f, d, i -> d.get(i, cx), i -> d.get(i, cy), null, ty.endsWith("(rad)"), tx.endsWith("(rad)"));
        g.setClip(clip);
    }

    /** A range with a 4 % margin (or a small one around a constant). */
    private static double[] padded(double[] r) {
        if (r == null) {
            return new double[] {-1, 1};
        }
        double span = r[1] - r[0];
        double pad = span > 0 ? 0.04 * span : Math.max(Math.abs(r[0]) * 0.1, 1e-3);
        return new double[] {r[0] - pad, r[1] + pad};
    }

    /** The legend line: phase colours, event marks, and the sampling note. */
    private static void legend(Graphics2D g, int x, int y, SampleDigest d) {
        g.setFont(ChartFrame.LABEL);
        FontMetrics fm = g.getFontMetrics();
        int cx = x;
        for (Phase p : Phase.values()) {
            g.setColor(Palette.phase(p));
            g.setStroke(new java.awt.BasicStroke(3f));
            g.drawLine(cx, y - 4, cx + 22, y - 4);
            g.setColor(ChartFrame.INK);
            g.drawString(p.label(), cx + 27, y);
            cx += 40 + fm.stringWidth(p.label());
        }
        cx += 20;
        for (EventKind k : EventKind.values()) {
            Palette.drawEvent(g, k, cx + 6, y - 4);
            g.setColor(ChartFrame.INK);
            g.drawString(k.label(), cx + 16, y);
            cx += 32 + fm.stringWidth(k.label());
        }
        g.setStroke(new java.awt.BasicStroke(1f));
        String s = d.stride() > 1
            ? String.format(Locale.ROOT, "%d samples drawn as %d buckets of %d (shaded: least to greatest per bucket)",
                d.count(), d.size(), d.stride())
            : d.count() + " samples";
        g.drawString(s, W - 16 - fm.stringWidth(s), y);
    }

    private static String clip(String s, int n) {
        return s.length() <= n ? s : s.substring(0, n - 3) + "...";
    }
}
