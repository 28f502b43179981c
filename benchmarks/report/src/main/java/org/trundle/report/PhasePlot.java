package org.trundle.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.Shape;
import java.awt.geom.Path2D;
import java.util.List;
import java.util.function.ToDoubleFunction;

import org.trundle.core.Phase;
import org.trundle.core.RunEvent;

/**
 * Draws one quantity of a {@link SampleDigest} against time (or against another column) into a
 * {@link ChartFrame}: a line through the buckets' representatives, coloured by phase, with the
 * least–greatest envelope of each bucket behind it once buckets hold more than one sample.
 */
final class PhasePlot {
    /** Most events marked in one panel (the rest are counted in the summary, not drawn). */
    static final int MAX_EVENTS = 2000;

    private PhasePlot() {
    }

    /**
     * @param d the digest
     * @param i a kept row
     * @return the phase of that row
     */
    static Phase phaseAt(SampleDigest d, int i) {
        return Phase.values()[(int) d.get(i, SampleDigest.Column.PHASE)];
    }

    /**
     * @param d the digest
     * @param c a column
     * @param enveloped whether to include the buckets' envelopes
     * @return {least, greatest} of the column's finite values, or null when there are none
     */
    static double[] range(SampleDigest d, SampleDigest.Column c, boolean enveloped) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < d.size(); i++) {
            double a = enveloped ? d.low(i, c) : d.get(i, c);
            double b = enveloped ? d.high(i, c) : d.get(i, c);
            if (Double.isFinite(a)) {
                lo = Math.min(lo, a);
            }
            if (Double.isFinite(b)) {
                hi = Math.max(hi, b);
            }
        }
        return lo <= hi ? new double[] {lo, hi} : null;
    }

    /**
     * Draws column {@code c} against time, coloured by phase (or in {@code color} when given).
     *
     * @param g where to draw
     * @param f the frame
     * @param d the digest
     * @param c an enveloped column
     * @param color a fixed colour, or null to colour by phase
     */
    static void drawAgainstTime(Graphics2D g, ChartFrame f, SampleDigest d, SampleDigest.Column c, Color color) {
        Shape clip = g.getClip();
        g.clip(f.area());
        int n = d.size();
        if (d.stride() > 1) {
            g.setStroke(new BasicStroke(1f));
            for (int i = 0; i < n; i++) {
                Color base = color != null ? color : Palette.phase(phaseAt(d, i));
                g.setColor(new Color(base.getRed(), base.getGreen(), base.getBlue(), 70));
                double x = f.x(d.get(i, SampleDigest.Column.T));
                g.draw(new java.awt.geom.Line2D.Double(x, f.y(d.low(i, c)), x, f.y(d.high(i, c))));
            }
        }
        drawLine(g, f, d, i -> d.get(i, SampleDigest.Column.T), i -> d.get(i, c), color, false, false);
        g.setClip(clip);
    }

    /**
     * Draws a polyline through the kept rows, one path per stretch of constant colour.
     *
     * @param g where to draw
     * @param f the frame
     * @param d the digest
     * @param xs x value of row i
     * @param ys y value of row i
     * @param color a fixed colour, or null to colour by phase
     * @param yWraps whether y is an angle that wraps (break the line where it jumps by more than π)
     * @param xWraps the same for x
     */
    static void drawLine(Graphics2D g, ChartFrame f, SampleDigest d, ToDoubleFunction<Integer> xs,
                         ToDoubleFunction<Integer> ys, Color color, boolean yWraps, boolean xWraps) {
        int n = d.size();
        g.setStroke(new BasicStroke(2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        Path2D.Double p = new Path2D.Double();
        Color current = null;
        boolean open = false;
        for (int i = 0; i + 1 < n; i++) {
            Color col = color != null ? color : Palette.phase(phaseAt(d, i));
            double x0 = xs.applyAsDouble(i);
            double y0 = ys.applyAsDouble(i);
            double x1 = xs.applyAsDouble(i + 1);
            double y1 = ys.applyAsDouble(i + 1);
            boolean ok = Double.isFinite(x0) && Double.isFinite(y0) && Double.isFinite(x1) && Double.isFinite(y1)
                && !(yWraps && Math.abs(y1 - y0) > Math.PI) && !(xWraps && Math.abs(x1 - x0) > Math.PI);
            if (!col.equals(current) || !ok) {
                if (open) {
                    g.setColor(current);
                    g.draw(p);
                    p.reset();
                    open = false;
                }
                current = col;
            }
            if (!ok) {
                continue;
            }
            if (!open) {
                p.moveTo(f.x(x0), f.y(y0));
                open = true;
            }
            p.lineTo(f.x(x1), f.y(y1));
        }
        if (open) {
            g.setColor(current);
            g.draw(p);
        }
        if (n == 1) {
            g.setColor(color != null ? color : Palette.phase(phaseAt(d, 0)));
            g.fill(new java.awt.geom.Ellipse2D.Double(f.x(xs.applyAsDouble(0)) - 2, f.y(ys.applyAsDouble(0)) - 2, 4, 4));
        }
        g.setStroke(new BasicStroke(1f));
    }

    /**
     * Marks events against time.
     *
     * @param g where to draw
     * @param f the frame
     * @param events the events
     * @param value the plotted value at an event (from its state before)
     */
    static void markEvents(Graphics2D g, ChartFrame f, List<RunEvent> events, ToDoubleFunction<RunEvent> value) {
        Shape clip = g.getClip();
        g.clip(f.area());
        int shown = 0;
        for (RunEvent e : events) {
            if (shown++ >= MAX_EVENTS) {
                break;
            }
            Palette.drawEvent(g, e.kind(), f.x(e.time()), f.y(value.applyAsDouble(e)));
        }
        g.setClip(clip);
    }
}
