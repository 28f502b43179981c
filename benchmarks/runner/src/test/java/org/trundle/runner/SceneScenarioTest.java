package org.trundle.runner;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.trundle.report.RunRecorder;
import org.trundle.scenario.ScenarioFiles;

/**
 * The scene keys of a scenario ({@code surfaces} with ids, a {@code motion}, a {@code contact} per
 * patch) and what the outputs say about them: {@code events[].patch}, a hand-over's {@code from} and
 * {@code to}, the {@code contacts} column of {@code trajectory.csv} and {@code energy.drive_work}.
 * The scenario is the invented example {@code benchmarks/scenarios/bore-to-floor.json}.
 */
class SceneScenarioTest {
    @TempDir
    Path dir;

    @Test
    void boreToTurntableScenarioReportsPatchesHandOverContactsAndDriveWork() throws IOException {
        Path scenario = Path.of("../scenarios/bore-to-floor.json");
        Path out = dir.resolve("scene");
        Cli.Result r = Cli.run("run", scenario.toString(), "--out", out.toString());
        assertEquals(0, r.code(), r.err() + r.out());
        JsonNode s = ScenarioFiles.JSON.readTree(out.resolve("summary.json").toFile());
        JsonNode ev = s.get("events");
        assertEquals("handover", ev.get(0).get("kind").asText(), ev.toString());
        assertEquals("bore", ev.get(0).get("from").asText());
        assertEquals("lip", ev.get(0).get("to").asText());
        assertEquals("lip", ev.get(0).get("patch").asText());
        List<String> impactPatches = new ArrayList<>();
        for (JsonNode e : ev) {
            if (e.get("kind").asText().equals("impact")) {
                impactPatches.add(e.get("patch").asText());
            }
        }
        assertTrue(!impactPatches.isEmpty() && impactPatches.get(0).equals("table"), ev.toString());
        assertTrue(s.get("energy").has("drive_work"), s.get("energy").toString());
        assertTrue(s.get("energy").get("drive_work").asDouble() != 0, "the turning table does work on the ball");
        List<String> rows = Files.readAllLines(out.resolve("trajectory.csv"));
        assertEquals(RunRecorder.HEADER + "," + RunRecorder.EXTRA, rows.get(0));
        int col = List.of((RunRecorder.HEADER + "," + RunRecorder.EXTRA).split(",")).indexOf("contacts");
        java.util.Set<String> seen = new java.util.TreeSet<>();
        for (String row : rows.subList(1, rows.size())) {
            String[] v = row.split(",", -1);
            seen.add(v[col]);
            assertEquals(v[10].equals("flight"), v[col].isEmpty(), row);
        }
        assertTrue(seen.containsAll(List.of("bore", "lip", "table", "")), seen.toString());
    }
}
