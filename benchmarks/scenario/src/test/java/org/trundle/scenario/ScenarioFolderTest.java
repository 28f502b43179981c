package org.trundle.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;

/** The example scenarios shipped in benchmarks/scenarios stay valid, and say their data are invented. */
class ScenarioFolderTest {
    /** benchmarks/scenarios, seen from this module's folder (where the tests run). */
    private static final Path SCENARIOS = Path.of("..", "scenarios");

    @Test
    void everyShippedScenarioParses() throws IOException {
        List<Path> files;
        try (Stream<Path> s = Files.list(SCENARIOS)) {
            files = s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        }
        assertFalse(files.isEmpty());
        for (Path f : files) {
            JsonNode doc = ScenarioFiles.read(f);
            Scenario sc = Scenario.parse(doc);
            assertTrue(sc.description().contains("invented"), f + " says its data are invented");
            assertEquals(List.of(), sc.warnings(), f + " is in SI units and plausible");
            if (doc.has("sweep")) {
                SweepSpec sw = SweepSpec.parse(doc);
                assertTrue(sw.space().size() > 1, f.toString());
                sw.scenario(doc, sw.space().point(sw.space().size() - 1));
            }
        }
        assertTrue(files.contains(SCENARIOS.resolve("return-tube-sweep.json")));
        SweepSpec map = SweepSpec.parse(ScenarioFiles.read(SCENARIOS.resolve("return-tube-sweep.json")));
        assertEquals(List.of("start.speed", "start.elevation_deg"), map.space().names());
        assertTrue(Scenario.parse(ScenarioFiles.parse(ScenarioFiles.demoText())).description().contains("invented"));
    }
}
