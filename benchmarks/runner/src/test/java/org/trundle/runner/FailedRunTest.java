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

/**
 * A run the library cannot finish (issue 18, item 6) is reported with exit 1 and a complete
 * {@code summary.json} (end reason {@code failed}, the library's message, the last good state),
 * never a stack trace; a run that stopped part-way keeps its trajectory. Invented inputs.
 */
class FailedRunTest {
    @TempDir
    Path dir;

    private static String scenario(String ball, String surface, String start) {
        return "{\n"
            + "  \"description\": \"Invented check of a failed run\",\n"
            + "  \"ball\": " + ball + ",\n"
            + "  \"surface\": " + surface + ",\n"
            + "  \"contact\": {\"law\": \"coulomb\", \"static_friction\": 0.3, \"kinetic_friction\": 0.2,"
            + " \"restitution\": 0.5},\n"
            + "  \"gravity\": [0, 0, -9.81],\n"
            + "  \"start\": " + start + ",\n"
            + "  \"run\": {\"duration\": 0.5, \"sample_interval\": 0.01}\n"
            + "}\n";
    }

    /** A mass of 1e308 kg overflows the normal force at the start: failed, with the start as last good state. */
    @Test
    void overflowAtTheStart() throws IOException {
        Path f = Cli.write(dir, "heavy.json", scenario("{\"radius\": 0.01, \"mass\": 1e308, \"inertia\": \"solid\"}",
            "{\"type\": \"plane\", \"origin\": [0, 0, 0], \"normal\": [0, 0, 1]}",
            "{\"position\": [0, 0, 0.01], \"velocity\": [0.1, 0, 0], \"spin\": [0, 10, 0], \"on_surface\": true}"));
        Path out = dir.resolve("heavy");
        Cli.Result r = Cli.run("run", f.toString(), "--out", out.toString());
        assertEquals(Main.FAILED, r.code(), r.out() + r.err());
        assertTrue(r.out().contains("the run failed"), r.out() + r.err());
        JsonNode s = ScenarioFiles.JSON.readTree(out.resolve("summary.json").toFile());
        assertEquals("failed", s.get("end_reason").asText());
        assertTrue(s.get("end_message").asText().contains("normal force"), s.toString());
        assertEquals(0.0, s.get("end_time").asDouble());
        assertEquals(0.01, s.get("end_state").get("position").get(2).asDouble(), 1e-15);
    }

    /**
     * A spline tube narrowing to 2 mm, narrower than the 4 mm ball: the ball rolling into it reaches
     * the centreline, a point with no closest point; the run stops on the geometry and its summary is
     * complete (energy, phases), where the surface's exception used to escape the run's closing
     * bookkeeping and leave an empty trajectory. (The input first used here, a centreline that doubles
     * back on itself, is now refused when the surface is built.)
     */
    @Test
    void splineDoublingBack() throws IOException {
        Path f = Cli.write(dir, "back.json", scenario("{\"radius\": 0.004, \"mass\": 0.00105, \"inertia\": \"solid\"}",
            "{\"type\": \"spline_tube\", \"centerline\": [[0,0,0],[0.1,0,0],[0.2,0,0],[0.3,0,0]],"
                + " \"radius\": [0.012, 0.012, 0.012, 0.002]}",
            "{\"position\": [0.01, 0, -0.004], \"velocity\": [1.0, 0, 0], \"spin\": [0, 0, 0]}"));
        Path out = dir.resolve("back");
        Cli.Result r = Cli.run("run", f.toString(), "--out", out.toString());
        assertEquals(Main.FAILED, r.code(), r.out() + r.err());
        JsonNode s = ScenarioFiles.JSON.readTree(out.resolve("summary.json").toFile());
        assertEquals("failed", s.get("end_reason").asText());
        assertTrue(!s.get("end_message").asText().isBlank(), s.toString());
        assertTrue(s.get("energy").get("initial").isNumber(), s.toString());
        assertTrue(s.get("phases").size() > 0, s.toString());
        List<String> rows = Files.readAllLines(out.resolve("trajectory.csv"));
        assertTrue(rows.size() > 2, "header and samples up to the stop");
        assertTrue(Files.size(out.resolve("run.png")) > 0);
    }
}
