package org.trundle.runner;

import org.trundle.scenario.Decimals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import org.trundle.scenario.ScenarioFiles;

/**
 * Options and console lines of issues 17 and 18: {@code --no-plot}, the energy line with every
 * loss kind, the trajectory row cap, grid values printed in their shortest exact form, and a
 * summary for a run that fails part-way.
 */
class RunOptionsTest {
    @TempDir
    Path dir;

    @Test
    void noPlotSkipsEveryPicture() throws IOException {
        Path f = Cli.write(dir, "run.json", Cli.demoWith("\"duration\": 2.0", "\"duration\": 0.05"));
        Path out = dir.resolve("run");
        Cli.Result r = Cli.run("run", f.toString(), "--out", out.toString(), "--no-plot");
        assertEquals(0, r.code(), r.err());
        assertTrue(Files.exists(out.resolve("summary.json")) && Files.exists(out.resolve("trajectory.csv")));
        assertFalse(Files.exists(out.resolve("run.png")));
        assertTrue(r.out().contains("(no picture: --no-plot)"), r.out());
        Path s = Cli.write(dir, "sweep.json", SweepCommandTest.sweepOf("{\"start.speed\": [0.5, 0.9]}"));
        Path sout = dir.resolve("sweep");
        Cli.Result rs = Cli.run("sweep", s.toString(), "--out", sout.toString(), "--no-plot", "--no-progress");
        assertEquals(0, rs.code(), rs.err());
        assertTrue(Files.exists(sout.resolve("sweep.csv")));
        assertFalse(Files.exists(sout.resolve("regime-map.png")));
    }

    /**
     * A ball rolling on a level floor against rolling resistance loses its energy to it: the console
     * line names that loss with the value summary.json books (issue 17, item 3).
     */
    @Test
    void energyLineListsEveryLossKind() throws IOException {
        String json = "{\"ball\": {\"radius\": 0.01, \"mass\": 0.03},"
            + " \"surface\": {\"type\": \"plane\", \"origin\": [0, 0, 0], \"normal\": [0, 0, 1]},"
            + " \"contact\": {\"law\": \"rolling\", \"rolling_resistance\": 0.0005, \"pivoting_resistance\": 0.0002},"
            + " \"start\": {\"position\": [0, 0, 0.01], \"velocity\": [0.3, 0, 0], \"spin\": \"rolling\"},"
            + " \"run\": {\"duration\": 0.2, \"sample_interval\": 0.01}}";
        Path f = Cli.write(dir, "rr.json", json);
        Path out = dir.resolve("rr");
        Cli.Result r = Cli.run("run", f.toString(), "--out", out.toString(), "--no-plot");
        assertEquals(0, r.code(), r.err());
        JsonNode e = ScenarioFiles.JSON.readTree(out.resolve("summary.json").toFile()).get("energy");
        double rolling = e.get("rolling_resistance_loss").doubleValue();
        assertTrue(rolling > 0, "rolling resistance takes energy");
        String line = r.out().lines().filter(l -> l.startsWith("Energy:")).findFirst().orElseThrow();
        assertTrue(line.contains(String.format(java.util.Locale.ROOT, "rolling resistance %.3e J", rolling)), line);
        for (String kind : List.of("friction ", "pivoting resistance ", "other couples ", "impacts ", "applied work ")) {
            assertTrue(line.contains(kind), kind + " in " + line);
        }
    }

    /** Issue 18, item 2: the rows a run would write are estimated before it starts and capped. */
    @Test
    void trajectoryRowsAreCappedBeforeTheRunStarts() throws IOException {
        Path f = Cli.write(dir, "rows.json", Cli.demoWith("\"duration\": 2.0", "\"duration\": 0.05"));
        Cli.Result refused = Cli.run("run", f.toString(), "--out", dir.resolve("a").toString(), "--max-rows", "40");
        assertEquals(2, refused.code());
        assertEquals("trundle: error: the run would write about 52.0 trajectory rows (run.duration 0.05 s /"
            + " run.sample_interval 0.001 s), more than the cap of 40; raise the sample interval, or the cap with"
            + " run.max_rows or --max-rows", refused.err().strip());
        assertFalse(Files.exists(dir.resolve("a")), "nothing written");
        Cli.Result raised = Cli.run("run", f.toString(), "--out", dir.resolve("b").toString(), "--max-rows", "60",
            "--no-plot");
        assertEquals(0, raised.code(), raised.err());
        assertTrue(Files.readAllLines(dir.resolve("b").resolve("trajectory.csv")).size() <= 60 + 1);
        Path key = Cli.write(dir, "key.json", Cli.demoWith("\"duration\": 2.0", "\"duration\": 0.05, \"max_rows\": 40"));
        assertEquals(2, Cli.run("run", key.toString(), "--out", dir.resolve("c").toString()).code());
    }

    /** Issue 17, item 7: 0.2 to 1.6 in 29 values prints 0.8, not 0.7999999999999998. */
    @Test
    void gridValuesPrintInTheirShortestExactForm() throws IOException {
        Path f = Cli.write(dir, "grid.json", SweepCommandTest.sweepOf(
            "{\"start.speed\": {\"from\": 0.2, \"to\": 1.6, \"count\": 29}}").replace("\"duration\": 0.5",
            "\"duration\": 0.001"));
        Path out = dir.resolve("grid");
        Cli.Result r = Cli.run("sweep", f.toString(), "--out", out.toString(), "--no-plot", "--no-progress");
        assertEquals(0, r.code(), r.err());
        List<String> rows = Files.readAllLines(out.resolve("sweep.csv"));
        for (int i = 0; i < 29; i++) {
            String v = rows.get(i + 1).split(",")[1];
            String expected = new java.math.BigDecimal("0.2").add(new java.math.BigDecimal("0.05")
                .multiply(java.math.BigDecimal.valueOf(i))).stripTrailingZeros().toPlainString();
            assertEquals(expected.contains(".") ? expected : expected + ".0", v, "row " + i);
        }
    }

    @Test
    void shortestDecimalsReadBackExactly() {
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(17);
        for (int i = 0; i < 20_000; i++) {
            double v = Double.longBitsToDouble(rnd.nextLong());
            if (!Double.isFinite(v)) {
                continue;
            }
            String s = Decimals.shortest(v);
            assertEquals(v, Double.parseDouble(s), 0.0, s);
            assertTrue(s.replaceAll("[^0-9]", "").length() <= Double.toString(v).replaceAll("[^0-9]", "").length() + 1, s);
        }
        assertEquals("0.8", Decimals.shortest(0.8));
        assertEquals("2.0E23", Decimals.shortest(2e23));
    }

    /**
     * Issue 18, items 2 and 6: a run the library stops part-way with an exception (here a spline
     * centreline that doubles back, which leaves the closest point undefined mid-run) still leaves
     * its summary.json (end reason failed, the last recorded state, the events so far) and the
     * trajectory recorded until then, with exit code 1.
     */
    @Test
    void aRunThatFailsPartWayStillWritesItsSummary() throws IOException {
        String json = "{\"ball\": {\"radius\": 0.004, \"mass\": 0.002},"
            + " \"surface\": {\"type\": \"spline_tube\", \"centerline\": [[0,0,0],[0.1,0,0],[0,0,0],[0.1,0,0]],"
            + " \"radius\": 0.012},"
            + " \"contact\": {\"law\": \"rolling\"},"
            + " \"start\": {\"position\": [0.01, 0, -0.004], \"velocity\": [0.5, 0, 0], \"spin\": [0, 0, 0]},"
            + " \"run\": {\"duration\": 1.0, \"sample_interval\": 0.001}}";
        Path f = Cli.write(dir, "back.json", json);
        Path out = dir.resolve("back");
        Cli.Result r = Cli.run("run", f.toString(), "--out", out.toString(), "--no-plot");
        assertEquals(1, r.code(), r.err());
        JsonNode s = ScenarioFiles.JSON.readTree(out.resolve("summary.json").toFile());
        assertEquals("failed", s.get("end_reason").asText());
        assertTrue(s.get("end_time").doubleValue() > 0.1, s.toString());
        assertTrue(s.get("events").size() >= 1, "the impact before the failure");
        List<String> rows = Files.readAllLines(out.resolve("trajectory.csv"));
        assertTrue(rows.size() > 100 && rows.get(rows.size() - 1).endsWith("end"), "rows until the failure");
    }
}
