package org.trundle.report;

import java.awt.Color;

import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.markers.Marker;
import org.knowm.xchart.style.markers.SeriesMarkers;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;

/** Colours, markers and the common chart style of the runner's pictures. */
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

    static Marker eventMarker(EventKind k) {
        switch (k) {
            case EXIT:
                return SeriesMarkers.DIAMOND;
            case SLIP:
                return SeriesMarkers.TRIANGLE_DOWN;
            case STICK:
                return SeriesMarkers.TRIANGLE_UP;
            case LIFT_OFF:
                return SeriesMarkers.SQUARE;
            case IMPACT:
                return SeriesMarkers.CIRCLE;
            case REST:
            default:
                return SeriesMarkers.CROSS;
        }
    }

    static Color eventColor(EventKind k) {
        switch (k) {
            case EXIT:
                return new Color(0xb0, 0x10, 0x30);
            case IMPACT:
                return new Color(0x40, 0x20, 0x70);
            default:
                return new Color(0x20, 0x20, 0x20);
        }
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
