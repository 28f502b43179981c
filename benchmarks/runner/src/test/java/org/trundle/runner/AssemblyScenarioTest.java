package org.trundle.runner;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.trundle.scenario.ScenarioFiles;

/**
 * The shipped assembly examples run to their end and name the patches their type expands into. The bearing
 * ({@code benchmarks/scenarios/bearing-inner-race.json}, invented data): the ball leaves the turning inner race for
 * the outer one; every contact's Hertz ellipse is long across the groove, i.e. along the bearing's axis, because
 * the groove conforms closely to the ball across it and curves away round the bearing (the design notes' "in a
 * groove, long across it"; K. L. Johnson, Contact Mechanics, 1985, §4.2: the major axis lies along the smaller
 * relative curvature). The energy budget closes to 1e-8 of its scale (the library's documented bound).
 */
class AssemblyScenarioTest {
    @TempDir
    Path dir;

    @Test
    void bearingExampleHandsTheBallFromTheTurningInnerRaceToTheOuterRace() throws IOException {
        Path out = dir.resolve("bearing");
        Cli.Result r = Cli.run("run", "../scenarios/bearing-inner-race.json", "--out", out.toString(), "--no-plot");
        assertEquals(0, r.code(), r.err() + r.out());
        JsonNode s = ScenarioFiles.JSON.readTree(out.resolve("summary.json").toFile());
        assertEquals("duration", s.get("end_reason").asText());
        assertTrue(Math.abs(s.get("energy").get("relative_residual").asDouble()) < 1e-8, s.get("energy").toString());
        assertTrue(s.get("energy").get("drive_work").asDouble() != 0, "the turning inner race does work on the ball");
        List<String> rows = Files.readAllLines(out.resolve("contacts.csv"));
        Set<String> seen = new TreeSet<>();
        String first = rows.get(1).split(",")[1];
        for (String row : rows.subList(1, rows.size())) {
            String[] v = row.split(",", -1);
            seen.add(v[1]);
            assertTrue(Double.parseDouble(v[3]) > 0, row);
            assertEquals(1.0, Math.abs(Double.parseDouble(v[9])), 1e-9, "major axis along the bearing axis: " + row);
            assertTrue(Double.parseDouble(v[6]) > 3 * Double.parseDouble(v[7]), "a long ellipse: " + row);
        }
        assertEquals("inner", first);
        assertEquals(Set.of("inner", "outer"), seen);
        JsonNode w = s.get("wall_loads");
        assertTrue(w.get("inner").get("max_normal_force").asDouble() > 0);
        assertTrue(w.get("outer").get("max_pressure_time").asDouble() > w.get("inner").get("max_normal_force_time")
            .asDouble(), w.toString());
        boolean impactOnOuter = false;
        for (JsonNode e : s.get("events")) {
            impactOnOuter |= e.get("kind").asText().equals("impact") && e.get("patch").asText().equals("outer");
        }
        assertTrue(impactOnOuter, s.get("events").toString());
    }
}
