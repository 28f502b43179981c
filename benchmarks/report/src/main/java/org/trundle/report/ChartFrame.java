package org.trundle.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.Shape;
import java.awt.geom.AffineTransform;
import java.awt.geom.Rectangle2D;

/**
 * One framed panel of a picture: a title, an x and a y axis with {@link NiceScale} ticks and axis
 * titles (with units), and the mapping from data to pixels. Tick counts follow the panel's size and
 * the width of the labels, so labels never overlap.
 */
final class ChartFrame {
    static final Font TITLE = new Font(Font.SANS_SERIF, Font.BOLD, 14);
    static final Font LABEL = new Font(Font.SANS_SERIF, Font.PLAIN, 12);
    static final Color INK = new Color(0x22, 0x24, 0x2a);
    static final Color GRID = new Color(0xe3, 0xe5, 0xea);

    private final int px;
    private final int py;
    private final int pw;
    private final int ph;
    private final NiceScale xs;
    private final NiceScale ys;

    /**
     * Lays out the panel and draws its frame, grid, ticks and titles.
     *
     * @param g where to draw
     * @param x left of the panel (px)
     * @param y top of the panel (px)
     * @param w panel width (px)
     * @param h panel height (px)
     * @param title panel title
     * @param xTitle x axis title with unit
     * @param yTitle y axis title with unit
     * @param xmin least x value shown
     * @param xmax greatest x value shown
     * @param ymin least y value shown
     * @param ymax greatest y value shown
     */
    ChartFrame(Graphics2D g, int x, int y, int w, int h, String title, String xTitle, String yTitle, double xmin,
               double xmax, double ymin, double ymax) {
        g.setFont(LABEL);
        FontMetrics fm = g.getFontMetrics();
        int left = 16 + fm.getHeight() + fm.stringWidth("-0.0000");
        px = x + left;
        py = y + 28;
        pw = w - left - 14;
        ph = h - 28 - 2 * fm.getHeight() - 14;
        ys = NiceScale.of(ymin, ymax, Math.max(2, ph / (2 * fm.getHeight() + 4)));
        xs = fitX(fm, xmin, xmax);
        g.setColor(Color.WHITE);
        g.fillRect(px, py, pw, ph);
        g.setStroke(new BasicStroke(1f));
        for (int k = 0; k < xs.count(); k++) {
            int sx = (int) Math.round(x(xs.tick(k)));
            g.setColor(GRID);
            g.drawLine(sx, py, sx, py + ph);
            g.setColor(INK);
            g.drawLine(sx, py + ph, sx, py + ph + 4);
            String s = xs.label(k);
            g.drawString(s, sx - fm.stringWidth(s) / 2, py + ph + 4 + fm.getAscent());
        }
        for (int k = 0; k < ys.count(); k++) {
            int sy = (int) Math.round(y(ys.tick(k)));
            g.setColor(GRID);
            g.drawLine(px, sy, px + pw, sy);
            g.setColor(INK);
            g.drawLine(px - 4, sy, px, sy);
            String s = ys.label(k);
            g.drawString(s, px - 6 - fm.stringWidth(s), sy + fm.getAscent() / 2 - 1);
        }
        g.setColor(INK);
        g.drawRect(px, py, pw, ph);
        g.drawString(xTitle, px + (pw - fm.stringWidth(xTitle)) / 2, py + ph + 6 + fm.getHeight() + fm.getAscent());
        AffineTransform keep = g.getTransform();
        g.rotate(-Math.PI / 2);
        g.drawString(yTitle, -(py + (ph + fm.stringWidth(yTitle)) / 2), x + 4 + fm.getAscent());
        g.setTransform(keep);
        g.setFont(TITLE);
        g.drawString(title, px, y + 18);
        g.setFont(LABEL);
    }

    /** The x scale with as many ticks as fit without their labels touching. */
    private NiceScale fitX(FontMetrics fm, double xmin, double xmax) {
        int intervals = Math.max(2, pw / 50);
        while (true) {
            NiceScale s = NiceScale.of(xmin, xmax, intervals);
            int widest = 0;
            for (int k = 0; k < s.count(); k++) {
                widest = Math.max(widest, fm.stringWidth(s.label(k)));
            }
            double spacing = pw / (double) (s.count() - 1);
            if (spacing >= widest + 12 || intervals == 2) {
                return s;
            }
            intervals--;
        }
    }

    /** @return the x scale */
    NiceScale xScale() {
        return xs;
    }

    /** @return the y scale */
    NiceScale yScale() {
        return ys;
    }

    /**
     * @param v an x value
     * @return its pixel column
     */
    double x(double v) {
        return px + (v - xs.low()) / (xs.high() - xs.low()) * pw;
    }

    /**
     * @param v a y value
     * @return its pixel row
     */
    double y(double v) {
        return py + ph - (v - ys.low()) / (ys.high() - ys.low()) * ph;
    }

    /** @return the plot area, for clipping */
    Shape area() {
        return new Rectangle2D.Double(px, py, pw, ph);
    }

    /**
     * Draws a small legend box in the top right corner of the plot area.
     *
     * @param g where to draw
     * @param names entry texts
     * @param colors line colours, one per entry
     */
    void legend(Graphics2D g, String[] names, Color[] colors) {
        g.setFont(LABEL);
        FontMetrics fm = g.getFontMetrics();
        int w = 0;
        for (String n : names) {
            w = Math.max(w, fm.stringWidth(n));
        }
        int bw = w + 40;
        int bh = names.length * fm.getHeight() + 8;
        int bx = px + pw - bw - 6;
        int by = py + 6;
        g.setColor(new Color(255, 255, 255, 225));
        g.fillRect(bx, by, bw, bh);
        g.setColor(GRID);
        g.drawRect(bx, by, bw, bh);
        for (int i = 0; i < names.length; i++) {
            int ly = by + 4 + i * fm.getHeight() + fm.getAscent();
            g.setColor(colors[i]);
            g.setStroke(new BasicStroke(2.2f));
            g.drawLine(bx + 6, ly - fm.getAscent() / 2 + 1, bx + 28, ly - fm.getAscent() / 2 + 1);
            g.setColor(INK);
            g.drawString(names[i], bx + 34, ly);
        }
        g.setStroke(new BasicStroke(1f));
    }
}
