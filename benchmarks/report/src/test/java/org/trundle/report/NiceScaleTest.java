package org.trundle.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.math.BigDecimal;
import java.util.HashSet;
import java.util.Set;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;

/** Axis ticks at 1-2-5 steps (common practice for chart axes) and time axes whose labels never overlap. */
class NiceScaleTest {

    /** Seeded ranges over many decades (our own sampler). */
    static Stream<Arguments> ranges() {
        SplittableRandom r = new SplittableRandom(20261202L);
        return IntStream.range(0, 300).mapToObj(i -> {
            double scale = Math.pow(10, r.nextInt(-6, 7));
            double a = (r.nextDouble() * 2 - 1) * scale;
            double b = a + r.nextDouble() * scale * (r.nextBoolean() ? 1 : 0.01);
            return Arguments.of(a, b, 2 + r.nextInt(11));
        });
    }

    @ParameterizedTest
    @MethodSource("ranges")
    void stepsAreRoundAndTicksCoverTheRange(double min, double max, int maxTicks) {
        NiceScale s = NiceScale.of(min, max, maxTicks);
        double m = s.step() / Math.pow(10, Math.floor(Math.log10(s.step()) + 1e-12));
        assertTrue(Math.abs(m - 1) < 1e-9 || Math.abs(m - 2) < 1e-9 || Math.abs(m - 5) < 1e-9, "mantissa " + m);
        assertTrue(s.count() - 1 <= maxTicks, s + " has " + (s.count() - 1) + " intervals for at most " + maxTicks);
        assertTrue(s.low() <= min && s.high() >= max, s + " covers " + min + " .. " + max);
        Set<String> labels = new HashSet<>();
        for (int k = 0; k < s.count(); k++) {
            String label = s.label(k);
            assertTrue(labels.add(label), "labels are distinct: " + label + " twice in " + s);
            assertEquals(s.tick(k), new BigDecimal(label).doubleValue(), s.step() * 1e-9, "label " + label + " reads back");
        }
    }

    @Test
    void threeAndFiveSecondRunsGetRoundTimeTicksEndingAtTheEnd() {
        NiceScale three = NiceScale.of(0, 3, 8);
        assertEquals(0.5, three.step(), 0.0);
        assertEquals(3, three.high(), 0.0);
        NiceScale five = NiceScale.of(0, 5, 8);
        assertEquals(1, five.step(), 0.0);
        assertEquals(5, five.high(), 0.0);
        assertEquals("5", five.label(five.count() - 1));
        NiceScale odd = NiceScale.of(0, 4.86, 8);
        assertEquals(5, odd.high(), 0.0, "the axis ends at the next round tick after the data");
        assertEquals("0.3", NiceScale.of(0, 1, 10).label(3), "0.1 * 3 is printed 0.3, not 0.30000000000000004");
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.0123, 0.1143, 0.3, 1, 2.1672, 3, 4.86, 5, 7.5, 60, 3000})
    void timeAxisLabelsNeverTouch(double duration) {
        BufferedImage img = new BufferedImage(500, 330, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        ChartFrame f = new ChartFrame(g, 0, 0, 500, 330, "t", "time t (s)", "y", 0, duration, 0, 1);
        g.setFont(ChartFrame.LABEL);
        FontMetrics fm = g.getFontMetrics(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
        NiceScale s = f.xScale();
        for (int k = 0; k + 1 < s.count(); k++) {
            double gap = f.x(s.tick(k + 1)) - f.x(s.tick(k));
            double half = 0.5 * (fm.stringWidth(s.label(k)) + fm.stringWidth(s.label(k + 1)));
            assertTrue(gap >= half + 8, "labels " + s.label(k) + " and " + s.label(k + 1) + " at " + gap + " px");
        }
        assertTrue(s.high() >= duration && s.high() - duration < s.step(), s + " for " + duration + " s");
        g.dispose();
    }
}
