package org.trundle.report;

import java.awt.Color;

import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.style.Styler;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;

/** Colours, event marks and the common chart style of the pictures (colours and shapes of our own). */
final class Palette {
    private Palette() {
    }

    static Color phase(Phase p) {
        switch (p) {
            case ROLLING:
                return new Color(0x1f, 0x5f, 0xa8);
            case SLIDING:
                return new Color(0xd9, 0x6a, 0x10);
            case FLIGHT:
                return new Color(0x2f, 0x9e, 0x55);
            case REST:
            default:
                return new Color(0x70, 0x70, 0x78);
        }
    }

    /**
     * Draws an event's mark: a shape per kind (exit: diamond; slip: down triangle; stick: up triangle;
     * lift-off: square; impact: ring; rest: cross), centred at {@code (x, y)} px.
     *
     * @param g where to draw
     * @param k the kind
     * @param x centre column (px)
     * @param y centre row (px)
     */
    static void drawEvent(java.awt.Graphics2D g, EventKind k, double x, double y) {
        double r = 5;
        java.awt.geom.Path2D.Double p = new java.awt.geom.Path2D.Double();
        switch (k) {
            case EXIT:
                p.moveTo(x, y - r - 1);
                p.lineTo(x + r + 1, y);
                p.lineTo(x, y + r + 1);
                p.lineTo(x - r - 1, y);
                p.closePath();
                break;
            case SLIP:
                p.moveTo(x - r, y - r * 0.7);
                p.lineTo(x + r, y - r * 0.7);
                p.lineTo(x, y + r);
                p.closePath();
                break;
            case STICK:
                p.moveTo(x - r, y + r * 0.7);
                p.lineTo(x + r, y + r * 0.7);
                p.lineTo(x, y - r);
                p.closePath();
                break;
            case LIFT_OFF:
                p.append(new java.awt.geom.Rectangle2D.Double(x - r * 0.8, y - r * 0.8, 1.6 * r, 1.6 * r), false);
                break;
            case IMPACT:
                p.append(new java.awt.geom.Ellipse2D.Double(x - r, y - r, 2 * r, 2 * r), false);
                break;
            case REST:
            default:
                p.moveTo(x - r, y - r);
                p.lineTo(x + r, y + r);
                p.moveTo(x - r, y + r);
                p.lineTo(x + r, y - r);
                break;
        }
        java.awt.Stroke keep = g.getStroke();
        g.setStroke(new java.awt.BasicStroke(1.6f));
        if (k != EventKind.REST && k != EventKind.IMPACT) {
            g.setColor(new Color(255, 255, 255, 200));
            g.fill(p);
        }
        g.setColor(eventColor(k));
        g.draw(p);
        g.setStroke(keep);
    }

    static Color eventColor(EventKind k) {
        switch (k) {
            case EXIT:
                return new Color(0xb0, 0x10, 0x30);
            case IMPACT:
                return new Color(0x5a, 0x2a, 0x90);
            case SLIP:
                return new Color(0xa0, 0x4a, 0x00);
            case STICK:
                return new Color(0x10, 0x40, 0x80);
            default:
                return new Color(0x20, 0x20, 0x20);
        }
    }

    /**
     * @param a world axis 0, 1, 2 (x, y, z)
     * @return its colour in the 3-D views
     */
    static Color axis(int a) {
        return a == 0 ? new Color(0xb8, 0x3b, 0x2e) : a == 1 ? new Color(0x2e, 0x8a, 0x44) : new Color(0x2c, 0x55, 0xb0);
    }

    /**
     * @param c a colour
     * @return its 0xRRGGBB value
     */
    static int rgb(Color c) {
        return c.getRGB() & 0xffffff;
    }

    /** Outcome colours of the regime map (fixed per outcome name, others in turn). */
    static Color outcome(String outcome, int fallbackIndex) {
        switch (outcome) {
            case "exit_to":
                return new Color(0x2f, 0x9e, 0x55);
            case "exit_from":
                return new Color(0xc0, 0x39, 0x2b);
            case "duration":
                return new Color(0x1f, 0x5f, 0xa8);
            case "rest":
                return new Color(0xe0, 0xb0, 0x20);
            case "budget":
                return new Color(0x90, 0x50, 0xa0);
            case "left_for_good":
                return new Color(0x8a, 0x9b, 0xa8);
            case "failed":
                return new Color(0x30, 0x30, 0x30);
            default:
                Color[] more = {new Color(0x17, 0xa2, 0xb8), new Color(0xe8, 0x6e, 0xa8), new Color(0x8c, 0x6d, 0x31)};
                return more[fallbackIndex % more.length];
        }
    }

    static XYChart chart(int w, int h, String title, String xTitle, String yTitle) {
        XYChart c = new XYChartBuilder().width(w).height(h).title(title).xAxisTitle(xTitle).yAxisTitle(yTitle).build();
        org.knowm.xchart.style.XYStyler s = c.getStyler();
        s.setChartBackgroundColor(Color.WHITE);
        s.setPlotBackgroundColor(Color.WHITE);
        s.setPlotBorderVisible(true);
        s.setLegendPosition(Styler.LegendPosition.OutsideS);
        s.setLegendLayout(Styler.LegendLayout.Horizontal);
        s.setLegendBackgroundColor(new Color(255, 255, 255, 220));
        s.setChartTitleBoxVisible(false);
        s.setPlotGridLinesColor(new Color(0xdd, 0xdd, 0xdd));
        c.getStyler().setMarkerSize(8);
        return c;
    }
}
