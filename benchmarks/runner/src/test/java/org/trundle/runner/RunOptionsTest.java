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
            // a tube narrowing to 2 mm, narrower than the 4 mm ball: the run fails where the ball
            // reaches the centreline (a centreline that doubles back is now refused when built)
            + " \"surface\": {\"type\": \"spline_tube\", \"centerline\": [[0,0,0],[0.1,0,0],[0.2,0,0],[0.3,0,0]],"
            + " \"radius\": [0.012, 0.012, 0.012, 0.002]},"
            + " \"contact\": {\"law\": \"rolling\"},"
            + " \"start\": {\"position\": [0.01, 0, -0.004], \"velocity\": [1.0, 0, 0], \"spin\": [0, 0, 0]},"
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
        // the surface coordinate columns follow the event column
        int event = List.of(rows.get(0).split(",", -1)).indexOf("event");
        assertTrue(rows.size() > 100 && rows.get(rows.size() - 1).split(",", -1)[event].endsWith("end"),
            "rows until the failure");
    }

    /**
     * Issue 17, item 2: a scenario written in millimetres and grams (radius 4, mass 2.1, bore 15)
     * and friction in percent is legal and runs, with warnings on standard error and in
     * summary.json; the demo (SI) has none.
     */
    @Test
    void implausibleValuesAreWarnedAndStillRun() throws IOException {
        String mm = Cli.demoWith("\"radius\": 0.004, \"mass\": 0.0021", "\"radius\": 4, \"mass\": 2.1",
            "\"radius\": 0.015", "\"radius\": 15", "\"from\": -0.25", "\"from\": -250",
            "[0.011, 0, -0.002]", "[11, 0, -2]", "\"static_friction\": 0.4, \"kinetic_friction\": 0.3",
            "\"static_friction\": 40, \"kinetic_friction\": 30", "\"duration\": 2.0", "\"duration\": 0.05");
        Path f = Cli.write(dir, "mm.json", mm);
        Path out = dir.resolve("mm");
        Cli.Result r = Cli.run("run", f.toString(), "--out", out.toString(), "--no-plot");
        assertEquals(0, r.code(), r.err());
        List<String> lines = r.err().strip().lines().toList();
        assertEquals(List.of(
            "trundle: warning: ball: mass 2.1 kg and radius 4.0 m give a mean density of 0.00783 kg/m^3, outside what"
                + " any ball is made of (1 to 23,000 kg/m^3) (all values are read in SI units: m, kg, s)",
            "trundle: warning: contact.static_friction = 40.0 is above 2, more than any dry pair gives (is it in"
                + " percent?) (all values are read in SI units: m, kg, s)",
            "trundle: warning: contact.kinetic_friction = 30.0 is above 2, more than any dry pair gives (is it in"
                + " percent?) (all values are read in SI units: m, kg, s)"), lines);
        JsonNode w = ScenarioFiles.JSON.readTree(out.resolve("summary.json").toFile()).get("warnings");
        assertEquals(3, w.size());
        assertEquals(lines.get(0).substring("trundle: warning: ".length()), w.get(0).asText());
        Path demo = dir.resolve("demo");
        Cli.Result d = Cli.run("demo", "--out", demo.toString());
        assertEquals("", d.err());
        assertEquals(0, ScenarioFiles.JSON.readTree(demo.resolve("summary.json").toFile()).get("warnings").size());
    }

    /**
     * Issue 17, item 4: a start 0.1 mm off the wall of an invented helical chute, with
     * {@code start.on_surface: true}, is moved onto the wall, reported, and runs.
     */
    @Test
    void onSurfaceMovesANearbyStartOntoTheSurfaceAndSaysSo() throws IOException {
        StringBuilder line = new StringBuilder();
        for (int i = 0; i <= 32; i++) {
            double a = 2 * Math.PI * i / 16;
            line.append(i == 0 ? "" : ", ").append(String.format(java.util.Locale.ROOT, "[%.17g, %.17g, %.17g]",
                0.1 * Math.cos(a), 0.1 * Math.sin(a), -0.05 * i / 16));
        }
        double a2 = 2 * Math.PI * 2 / 16;
        // below the third centreline point: 12 mm bore radius - 4 mm ball radius = 8 mm, then 0.1 mm short of it
        String start = String.format(java.util.Locale.ROOT, "[%.17g, %.17g, %.17g]", 0.1 * Math.cos(a2),
            0.1 * Math.sin(a2), -0.05 * 2 / 16 - 0.0079);
        String json = "{\"description\": \"Invented helical chute\", \"ball\": {\"radius\": 0.004, \"mass\": 0.0021},"
            + " \"surface\": {\"type\": \"spline_tube\", \"centerline\": [" + line + "], \"radius\": 0.012},"
            + " \"contact\": {\"law\": \"coulomb\", \"static_friction\": 0.4, \"kinetic_friction\": 0.3},"
            + " \"start\": {\"position\": " + start + ", \"velocity\": [0, 0, 0], \"spin\": \"rolling\","
            + " \"on_surface\": ON},"
            + " \"run\": {\"duration\": 0.1, \"sample_interval\": 0.01}}";
        Path refused = Cli.write(dir, "off.json", json.replace("ON", "true").replace(", \"on_surface\": true", ""));
        Cli.Result flight = Cli.run("run", refused.toString(), "--out", dir.resolve("f").toString(), "--no-plot");
        assertEquals(2, flight.code(), "without on_surface the start is a flight start, and rolling needs contact");
        Path f = Cli.write(dir, "helix.json", json.replace("ON", "true"));
        Path out = dir.resolve("helix");
        Cli.Result r = Cli.run("run", f.toString(), "--out", out.toString(), "--no-plot");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("Placed:   start centre moved 1.2"), r.out());
        JsonNode p = ScenarioFiles.JSON.readTree(out.resolve("summary.json").toFile()).get("placement");
        // the given centre is 0.1 mm short of the wall straight down; the wall is tilted by the
        // helix's pitch and the centreline spline is not the exact helix, so the move is of that
        // size, and the placed centre lies on the offset surface (distance r to 1e-3 of the tolerance)
        double moved = p.get("moved").doubleValue();
        assertTrue(moved > 0.9e-4 && moved < 1.5e-4, "moved " + moved);
        org.trundle.scenario.Scenario sc = org.trundle.scenario.Scenario.parse(ScenarioFiles.read(f));
        double gap = sc.simulation().geometryAt(sc.start().centre(), 0).distance - 0.004;
        assertTrue(Math.abs(gap) < 1e-3 * 4e-9, "gap " + gap);
        assertEquals(sc.start().centre().getX(), p.get("to").get(0).doubleValue(), 0.0);
        assertEquals(moved, sc.placement().distance(), 0.0);
        Path tight = Cli.write(dir, "tight.json", json.replace("ON", "true, \"placement_limit\": 5e-5"));
        Cli.Result t = Cli.run("run", tight.toString(), "--out", dir.resolve("t").toString());
        assertEquals(2, t.code());
        assertTrue(t.err().contains("more than the 5.00e-05 m allowed (the contact tolerance is 4.00e-09 m, 1e-06 of the"
            + " radius)"), t.err());
    }
}
