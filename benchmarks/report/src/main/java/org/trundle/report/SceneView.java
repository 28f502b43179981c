package org.trundle.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.geom.Line2D;
import java.util.Arrays;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.RunEvent;
import org.trundle.core.TriangleMesh;

/**
 * The 3-D panel of {@code run.png}: an orthographic view from azimuth 35° and elevation 22° about
 * the up direction, showing the surface's triangle mesh (translucent, shaded by the angle to a
 * light from the viewer's upper left), the centre path coloured by phase, the events, and a world
 * axis triad with its length. Triangles are drawn far to near (painter's order); the path is drawn
 * over them, so it is never hidden by the patch.
 */
final class SceneView {
    private static final Color PATCH = new Color(0x8f, 0xa8, 0xc4);
    private static final int SHADES = 16;

    private final Vector3D sx;
    private final Vector3D sy;
    private final Vector3D toViewer;

    /** @param up unit up direction (opposite to gravity) */
    SceneView(Vector3D up) {
        Vector3D e1 = Math.abs(up.getX()) < 0.9 ? Vector3D.PLUS_I : Vector3D.PLUS_J;
        e1 = e1.subtract(e1.dotProduct(up), up).normalize();
        Vector3D e2 = Vector3D.crossProduct(up, e1);
        double az = Math.toRadians(35);
        double el = Math.toRadians(22);
        toViewer = e1.scalarMultiply(Math.cos(el) * Math.cos(az)).add(Math.cos(el) * Math.sin(az), e2)
            .add(Math.sin(el), up);
        sx = Vector3D.crossProduct(up, toViewer).normalize();
        sy = Vector3D.crossProduct(toViewer, sx).normalize();
    }

    /**
     * Draws the panel.
     *
     * @param g where to draw
     * @param x left (px)
     * @param y top (px)
     * @param w width (px)
     * @param h height (px)
     * @param title panel title
     * @param mesh the patch's mesh (possibly empty)
     * @param d the recorded samples
     * @param events the events to mark
     * @param note a line under the title (what the mesh shows), or null
     */
    void draw(Graphics2D g, int x, int y, int w, int h, String title, TriangleMesh mesh, SampleDigest d,
              List<RunEvent> events, String note) {
        int n = d.size();
        double[] px = new double[n];
        double[] py = new double[n];
        double[] pz = new double[n];
        double xmin = Double.POSITIVE_INFINITY;
        double xmax = Double.NEGATIVE_INFINITY;
        double ymin = Double.POSITIVE_INFINITY;
        double ymax = Double.NEGATIVE_INFINITY;
        double[] lo = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
        double[] hi = {Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (int i = 0; i < n; i++) {
            Vector3D c = new Vector3D(d.get(i, SampleDigest.Column.X), d.get(i, SampleDigest.Column.Y),
                d.get(i, SampleDigest.Column.Z));
            px[i] = c.dotProduct(sx);
            py[i] = c.dotProduct(sy);
            pz[i] = c.dotProduct(toViewer);
            xmin = Math.min(xmin, px[i]);
            xmax = Math.max(xmax, px[i]);
            ymin = Math.min(ymin, py[i]);
            ymax = Math.max(ymax, py[i]);
            grow(lo, hi, c);
        }
        int nv = mesh.vertexCount();
        double[] vx = new double[nv];
        double[] vy = new double[nv];
        double[] vz = new double[nv];
        for (int i = 0; i < nv; i++) {
            Vector3D v = mesh.vertex(i);
            vx[i] = v.dotProduct(sx);
            vy[i] = v.dotProduct(sy);
            vz[i] = v.dotProduct(toViewer);
            xmin = Math.min(xmin, vx[i]);
            xmax = Math.max(xmax, vx[i]);
            ymin = Math.min(ymin, vy[i]);
            ymax = Math.max(ymax, vy[i]);
            grow(lo, hi, v);
        }
        g.setColor(Color.WHITE);
        g.fillRect(x, y, w, h);
        g.setColor(ChartFrame.INK);
        g.setFont(ChartFrame.TITLE);
        g.drawString(title, x + 12, y + 18);
        g.setFont(ChartFrame.LABEL);
        if (note != null) {
            g.drawString(note, x + 12, y + 36);
        }
        if (!(xmax >= xmin)) {
            return;
        }
        double size = Math.max(Math.max(hi[0] - lo[0], hi[1] - lo[1]), hi[2] - lo[2]);
        size = size > 0 ? size : 1e-3;
        double axisLength = niceLength(0.2 * size);
        Vector3D axisOrigin = new Vector3D(lo[0], lo[1], lo[2]);
        for (int a = 0; a < 3; a++) {
            Vector3D tip = axisOrigin.add(axisLength, unit(a));
            xmin = Math.min(xmin, tip.dotProduct(sx));
            xmax = Math.max(xmax, tip.dotProduct(sx));
            ymin = Math.min(ymin, tip.dotProduct(sy));
            ymax = Math.max(ymax, tip.dotProduct(sy));
        }
        int top = y + 44;
        int availW = w - 40;
        int availH = h - 44 - 20;
        double scale = Math.min(availW / Math.max(xmax - xmin, 1e-12), availH / Math.max(ymax - ymin, 1e-12));
        double cx = x + w / 2.0 - scale * 0.5 * (xmin + xmax);
        double cy = top + availH / 2.0 + scale * 0.5 * (ymin + ymax);
        Shape clip = g.getClip();
        g.clipRect(x, y + 40, w, h - 40);

        // items: triangles and path segments, sorted far to near
        int nt = mesh.triangleCount();
        double[] depth = new double[nt];
        Integer[] order = new Integer[nt];
        for (int t = 0; t < nt; t++) {
            depth[t] = (vz[mesh.corner(t, 0)] + vz[mesh.corner(t, 1)] + vz[mesh.corner(t, 2)]) / 3;
            order[t] = t;
        }
        Arrays.sort(order, (a, b) -> Double.compare(depth[a], depth[b]));
        Vector3D light = toViewer.add(0.5, sy).subtract(0.4, sx).normalize();
        BasicStroke pathStroke = new BasicStroke(2.2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
        Color[] shades = new Color[SHADES];
        for (int i = 0; i < SHADES; i++) {
            float f = 0.55f + 0.45f * i / (SHADES - 1);
            shades[i] = new Color(Math.min(1f, PATCH.getRed() / 255f * f), Math.min(1f, PATCH.getGreen() / 255f * f),
                Math.min(1f, PATCH.getBlue() / 255f * f), 0.30f);
        }
        Color edge = new Color(0x50, 0x60, 0x78, 40);
        int[] tx = new int[3];
        int[] ty = new int[3];
        Object aa = g.getRenderingHint(RenderingHints.KEY_ANTIALIASING);
        // triangles far to near without antialiasing (neighbours share edges; several times cheaper)
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_OFF);
        for (Integer item : order) {
            int k = item;
            int a = mesh.corner(k, 0);
            int b = mesh.corner(k, 1);
            int c = mesh.corner(k, 2);
            Vector3D va = mesh.vertex(a);
            Vector3D nrm = Vector3D.crossProduct(mesh.vertex(b).subtract(va), mesh.vertex(c).subtract(va));
            double lit = nrm.getNorm() > 0 ? Math.abs(nrm.normalize().dotProduct(light)) : 0.5;
            tx[0] = (int) Math.round(cx + scale * vx[a]);
            tx[1] = (int) Math.round(cx + scale * vx[b]);
            tx[2] = (int) Math.round(cx + scale * vx[c]);
            ty[0] = (int) Math.round(cy - scale * vy[a]);
            ty[1] = (int) Math.round(cy - scale * vy[b]);
            ty[2] = (int) Math.round(cy - scale * vy[c]);
            g.setColor(shades[(int) Math.round(lit * (SHADES - 1))]);
            g.fillPolygon(tx, ty, 3);
            g.setColor(edge);
            g.drawPolygon(tx, ty, 3);
        }
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, aa);
        // the path over the translucent patch, one polyline per stretch of one phase
        g.setStroke(pathStroke);
        java.awt.geom.Path2D.Double line = new java.awt.geom.Path2D.Double();
        Color current = null;
        for (int s = 0; s + 1 < n; s++) {
            Color col = Palette.phase(PhasePlot.phaseAt(d, s));
            if (!col.equals(current)) {
                if (current != null) {
                    g.setColor(current);
                    g.draw(line);
                }
                line.reset();
                line.moveTo(cx + scale * px[s], cy - scale * py[s]);
                current = col;
            }
            line.lineTo(cx + scale * px[s + 1], cy - scale * py[s + 1]);
        }
        if (current != null) {
            g.setColor(current);
            g.draw(line);
        }
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, aa);
        g.setStroke(new BasicStroke(1f));
        int shown = 0;
        for (RunEvent e : events) {
            if (shown++ >= PhasePlot.MAX_EVENTS) {
                break;
            }
            Vector3D c = e.before().centre();
            Palette.drawEvent(g, e.kind(), cx + scale * c.dotProduct(sx), cy - scale * c.dotProduct(sy));
        }
        if (n > 0) {
            g.setColor(ChartFrame.INK);
            g.fillOval((int) Math.round(cx + scale * px[0]) - 4, (int) Math.round(cy - scale * py[0]) - 4, 8, 8);
        }
        drawAxes(g, cx, cy, scale, axisOrigin, axisLength);
        g.setClip(clip);
        g.setColor(ChartFrame.INK);
        g.drawRect(x, y + 40, w - 1, h - 41);
    }

    private void drawAxes(Graphics2D g, double cx, double cy, double scale, Vector3D o, double length) {
        String[] names = {"x", "y", "z"};
        g.setStroke(new BasicStroke(2f));
        FontMetrics fm = g.getFontMetrics();
        double ox = cx + scale * o.dotProduct(sx);
        double oy = cy - scale * o.dotProduct(sy);
        for (int a = 0; a < 3; a++) {
            Vector3D tip = o.add(length, unit(a));
            double tx = cx + scale * tip.dotProduct(sx);
            double ty = cy - scale * tip.dotProduct(sy);
            g.setColor(Palette.axis(a));
            g.draw(new Line2D.Double(ox, oy, tx, ty));
            double dx = tx - ox;
            double dy = ty - oy;
            double len = Math.hypot(dx, dy);
            if (len > 1) {
                g.drawString(names[a], (float) (tx + 6 * dx / len - 3), (float) (ty + 6 * dy / len + 4));
            }
        }
        g.setColor(ChartFrame.INK);
        String s = "axes " + lengthText(length) + " from (" + coord(o.getX()) + ", " + coord(o.getY()) + ", "
            + coord(o.getZ()) + ") m";
        g.drawString(s, (float) (ox + 6), (float) (oy + fm.getHeight()));
        g.setStroke(new BasicStroke(1f));
    }

    private static String coord(double v) {
        return String.format(java.util.Locale.ROOT, "%.3g", v);
    }

    /** A length for the axis triad: 1, 2 or 5 times a power of ten, at most {@code l}. */
    static double niceLength(double l) {
        double p = Math.pow(10, Math.floor(Math.log10(l)));
        double m = l / p;
        return (m >= 5 ? 5 : m >= 2 ? 2 : 1) * p;
    }

    /** @return a length with a unit that reads well (mm below 1 m) */
    static String lengthText(double l) {
        if (l < 1) {
            return new java.math.BigDecimal(l * 1000).round(new java.math.MathContext(3)).stripTrailingZeros()
                .toPlainString() + " mm";
        }
        return new java.math.BigDecimal(l).round(new java.math.MathContext(3)).stripTrailingZeros().toPlainString() + " m";
    }

    private static Vector3D unit(int a) {
        return a == 0 ? Vector3D.PLUS_I : a == 1 ? Vector3D.PLUS_J : Vector3D.PLUS_K;
    }

    private static void grow(double[] lo, double[] hi, Vector3D p) {
        double[] c = {p.getX(), p.getY(), p.getZ()};
        for (int i = 0; i < 3; i++) {
            lo[i] = Math.min(lo[i], c[i]);
            hi[i] = Math.max(hi[i], c[i]);
        }
    }
}
