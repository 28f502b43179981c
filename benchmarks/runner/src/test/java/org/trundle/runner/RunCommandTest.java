package org.trundle.runner;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import org.trundle.scenario.ScenarioFiles;
import org.trundle.report.RunRecorder;

/**
 * The run command on a ball dropped onto a plane (a flight start): impact times and rebound
 * against free fall with a coefficient of restitution, the files' layout, and the command-line
 * replacements of run keys.
 */
class RunCommandTest {
    static final double G = 9.81;
    static final String DROP = "{\n"
        + "  \"description\": \"Invented check: a 20 mm ball dropped 0.1 m onto a floor\",\n"
        + "  \"ball\": {\"radius\": 0.01, \"mass\": 0.03, \"inertia\": 0.4},\n"
        + "  \"surface\": {\"type\": \"plane\", \"origin\": [0, 0, 0], \"normal\": [0, 0, 1]},\n"
        + "  \"contact\": {\"law\": \"rolling\", \"restitution\": 0.5},\n"
        + "  \"start\": {\"position\": [0, 0, 0.11], \"velocity\": [0.2, 0, 0], \"spin\": [0, 0, 0]},\n"
        + "  \"run\": {\"duration\": 1.0, \"sample_interval\": 0.001}\n"
        + "}\n";

    @TempDir
    Path dir;

    @Test
    void droppedBallBouncesAtTheFreeFallTimes() throws IOException {
        Path f = Cli.write(dir, "drop.json", DROP);
        Path out = dir.resolve("drop");
        Cli.Result r = Cli.run("run", f.toString(), "--out", out.toString(), "--duration", "0.3", "--sample-interval",
            "0.01");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("Result:   duration - still flight at the end, t = 0.3000 s"), r.out());
        JsonNode s = ScenarioFiles.JSON.readTree(out.resolve("summary.json").toFile());
        assertEquals("duration", s.get("end_reason").asText());
        assertEquals(0.3, s.get("end_time").asDouble(), 0.0);
        JsonNode ev = s.get("events");
        assertEquals(2, ev.size(), ev.toString());
        // free fall from height h = 0.1 m (gap between ball and floor): t1 = sqrt(2h/g); a rebound
        // at e v1 returns after 2 e v1/g (projectile motion, any mechanics textbook; Newton's
        // restitution law v' = -e v, common practice)
        double h = 0.1;
        double v1 = Math.sqrt(2 * G * h);
        double t1 = Math.sqrt(2 * h / G);
        double t2 = t1 + 2 * 0.5 * v1 / G;
        // event times converge to 1e-12 s (SolverSettings default); the free fall is integrated
        // exactly by an 8th-order method, so 1e-10 s bounds the difference
        assertEquals("impact", ev.get(0).get("kind").asText());
        assertEquals(t1, ev.get(0).get("time").asDouble(), 1e-10);
        assertEquals(-v1, ev.get(0).get("velocity").get(2).asDouble(), 1e-9);
        assertEquals(t2, ev.get(1).get("time").asDouble(), 1e-10);
        System.out.println("impact times " + ev.get(0).get("time").asDouble() + ", " + ev.get(1).get("time").asDouble()
            + " s; free fall " + t1 + ", " + t2 + " s");
        assertEquals(-0.5 * v1, ev.get(1).get("velocity").get(2).asDouble(), 1e-9);
        assertEquals(0.2 * t1, ev.get(0).get("position").get(0).asDouble(), 1e-10);
        double impactLoss = s.get("energy").get("impact_loss").asDouble();
        assertTrue(impactLoss > 0.03 * G * h * 0.75, "at least the normal restitution loss (1 - e^2) m g h");

        List<String> rows = Files.readAllLines(out.resolve("trajectory.csv"));
        assertEquals(RunRecorder.HEADER + "," + RunRecorder.EXTRA + ",wall_u_m,wall_v_m", rows.get(0),
            "the plane's two in-plane coordinates (m) close each row");
        assertEquals(1 + 31 + 2, rows.size(), "samples every 0.01 s from 0 to 0.3 s plus the two impact instants");
        long impacts = rows.stream().filter(l -> l.contains(",impact,")).count();
        assertEquals(2, impacts);
        String[] hit = rows.stream().filter(l -> l.contains(",impact,")).findFirst().orElseThrow().split(",", -1);
        // the foot of the centre on the floor z = 0 through the origin is (x, y, 0): its in-plane offsets
        // from the origin along any orthonormal pair satisfy u^2 + v^2 = x^2 + y^2 (plane geometry)
        List<String> header = List.of(rows.get(0).split(",", -1));
        double u = Double.parseDouble(hit[header.indexOf("wall_u_m")]);
        double v = Double.parseDouble(hit[header.indexOf("wall_v_m")]);
        double x = Double.parseDouble(hit[1]);
        double y = Double.parseDouble(hit[2]);
        assertEquals(Math.hypot(x, y), Math.hypot(u, v), 1e-15);
        assertEquals(t1, Double.parseDouble(hit[0]), 1e-10);
        assertEquals(0.01, Double.parseDouble(hit[3]), 1e-12, "centre at one radius above the floor");
        assertEquals("flight", hit[10]);
        assertEquals(0.5 * v1, Double.parseDouble(hit[6]), 1e-9, "the row shows the state after the impact");
        assertEquals("", hit[17], "no contact point in flight");
        assertTrue(Files.size(out.resolve("run.png")) > 10_000);
    }

    /** The same scenario written as YAML (same keys) gives the same summary; YAML errors carry line and column. */
    @Test
    void yamlScenarioWithTheSameKeys() throws IOException {
        String yaml = "description: Invented check, a 20 mm ball dropped 0.1 m onto a floor\n"
            + "ball: {radius: 0.01, mass: 0.03, inertia: 0.4}\n"
            + "surface: {type: plane, origin: [0, 0, 0], normal: [0, 0, 1]}\n"
            + "contact:\n  law: rolling\n  restitution: 0.5\n"
            + "start: {position: [0, 0, 0.11], velocity: [0.2, 0, 0], spin: [0, 0, 0]}\n"
            + "run: {duration: 1.0, sample_interval: 0.001}\n";
        Path fy = Cli.write(dir, "drop.yaml", yaml);
        Path fj = Cli.write(dir, "drop.json", DROP);
        Cli.Result ry = Cli.run("run", fy.toString(), "--out", dir.resolve("y").toString(), "--duration", "0.3");
        Cli.Result rj = Cli.run("run", fj.toString(), "--out", dir.resolve("j").toString(), "--duration", "0.3");
        assertEquals(0, ry.code(), ry.err());
        assertEquals(0, rj.code(), rj.err());
        JsonNode sy = ScenarioFiles.JSON.readTree(dir.resolve("y").resolve("summary.json").toFile());
        JsonNode sj = ScenarioFiles.JSON.readTree(dir.resolve("j").resolve("summary.json").toFile());
        assertEquals(sj.get("events"), sy.get("events"));
        assertEquals(sj.get("end_state"), sy.get("end_state"));
        Path bad = Cli.write(dir, "bad.yml", "ball: {radius: 0.01\nmass: 2\n");
        Cli.Result rb = Cli.run("run", bad.toString(), "--out", dir.resolve("b").toString());
        assertEquals(2, rb.code());
        assertTrue(rb.err().contains("malformed YAML at line 2, column 5"), rb.err());
        assertEquals(1, rb.err().strip().lines().count(), "one line");
    }

    @Test
    void helpNamesTheUnits() {
        Cli.Result root = Cli.run("--help");
        assertEquals(0, root.code());
        assertTrue(root.out().contains("run") && root.out().contains("sweep") && root.out().contains("demo"));
        Cli.Result run = Cli.run("run", "--help");
        assertEquals(0, run.code());
        assertTrue(run.out().contains("--duration=SECONDS") && run.out().contains("seconds (s)"), run.out());
        assertTrue(run.out().contains("--force"), run.out());
        Cli.Result sweep = Cli.run("sweep", "--help");
        assertTrue(sweep.out().contains("--threads=N") && sweep.out().contains("per run in seconds (s)"), sweep.out());
        Cli.Result demo = Cli.run("demo", "--help");
        assertTrue(demo.out().contains("default: trundle-demo"), demo.out());
    }
}
