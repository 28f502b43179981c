package org.trundle.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.trundle.scenario.SweepRow;

/**
 * What the sweep report keeps (the first plotted runs by index, counts over all runs) and that its
 * streamed page holds the rows as {@link SweepRow#csv} writes them, with no {@code </script} inside the
 * data. Rows are made by hand in {@link SweepRow#columns} order (invented values).
 */
class SweepReportTest {
    private static final List<String> ONE = List.of("start.speed");
    private static final String DATA_OPEN = "<script id=\"trundle-data\" type=\"application/json\">";

    @TempDir
    Path dir;

    /** A row of a one-parameter sweep: index, speed, outcome, end time (null: failed), message. */
    private static Object[] row(int index, double speed, String outcome, Double endTime, String message) {
        Object[] v = new Object[SweepRow.columns(ONE).size()];
        v[0] = index;
        v[1] = speed;
        v[2] = outcome;
        v[3] = endTime == null ? "failed" : "duration";
        v[5] = endTime;
        v[v.length - 2] = endTime == null ? 0 : 1;
        v[v.length - 1] = message;
        return v;
    }

    @Test
    void keepsTheFirstPlottedRunsByIndexAndCountsThemAll() {
        SweepReport r = new SweepReport(ONE, Map.of(), SweepRow.header(ONE), 2);
        List<Object[]> rows = List.of(row(0, 0.1, "failed", null, "did not fit"), row(1, 0.2, "duration", 0.5, null),
            row(2, 0.3, "failed", null, "did not fit"), row(3, 0.4, "duration", 0.5, null),
            row(4, 0.5, "duration", 0.5, null));
        List<Boolean> shown = new ArrayList<>();
        for (Object[] v : rows) {
            r.count((String) v[2], 1);
            shown.add(r.show(v));
        }
        assertEquals(List.of(false, true, false, true, false), shown, "rows 1 and 3: the first two with an end time");
        assertTrue(r.full());
        assertEquals(2, r.points());
        assertFalse(SweepReport.plotted(row(5, 0.6, "duration", Double.NaN, null), 1), "a NaN end time has no point");
        assertFalse(SweepReport.plotted(row(5, Double.POSITIVE_INFINITY, "duration", 0.5, null), 1));
        assertTrue(SweepReport.plotted(row(5, 0.6, "duration", 0.5, null), 1));
    }

    @Test
    void thePageHoldsTheRowsAndNoScriptEndInsideItsData() throws IOException {
        SweepReport r = new SweepReport(ONE, Map.of("duration", "still <rolling>"), SweepRow.header(ONE));
        String message = "end \"quoted\", then </script><b>bold</b>";
        Object[] a = row(0, 0.25, "duration", 1.5, message);
        Object[] b = row(1, 0.5, "failed", null, "no fit");
        for (Object[] v : List.of(a, b)) {
            r.count((String) v[2], 1);
            r.show(v);
        }
        Path f = dir.resolve("sweep-report.html");
        r.write(f, SweepReport.title(ONE, 2), SweepReport.subtitle("Invented <test>."));
        String page = Files.readString(f, StandardCharsets.UTF_8);
        int open = page.indexOf(DATA_OPEN) + DATA_OPEN.length();
        int close = page.indexOf("</script>", open);
        String json = page.substring(open, close);
        assertFalse(json.contains("<"), "every < of the data is escaped");
        JsonNode data = HtmlReport.JSON.readTree(json);
        assertEquals("Regime map: start.speed (2 runs)", data.get("title").asText());
        assertEquals("Invented <test>. Click a point to see its run's row of the sweep table.",
            data.get("subtitle").asText());
        assertEquals(1, data.get("points").size(), "the failed run has no end time, so no point");
        JsonNode p = data.get("points").get(0);
        assertEquals(0.25, p.get("x").asDouble());
        assertEquals(1.5, p.get("y").asDouble());
        List<String> cells = new ArrayList<>();
        p.get("row").forEach(c -> cells.add(c.asText()));
        assertEquals(SweepReport.cells(SweepRow.csv(a, 1)).length, cells.size());
        assertEquals(message, cells.get(cells.size() - 1), "the message comes back whole");
        assertEquals(1, data.get("left_out").asLong());
        assertEquals(1, data.get("outcomes").get("failed").get("count").asLong());
        assertEquals("still <rolling>", data.get("outcomes").get("duration").get("label").asText());
        assertTrue(page.endsWith("</html>\n"), "the page is written to its end");
    }

    @Test
    void badInputIsRefusedWithItsValue() {
        String header = SweepRow.header(ONE);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
            () -> new SweepReport(ONE, Map.of(), header, -1));
        assertTrue(e.getMessage().contains("maxPoints") && e.getMessage().contains("-1"), e.getMessage());
        SweepReport r = new SweepReport(ONE, Map.of(), header);
        e = assertThrows(IllegalArgumentException.class, () -> r.show(new Object[3]));
        assertTrue(e.getMessage().contains("values") && e.getMessage().contains("3"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> r.count("duration", -2));
        assertTrue(e.getMessage().contains("-2"), e.getMessage());
    }
}
