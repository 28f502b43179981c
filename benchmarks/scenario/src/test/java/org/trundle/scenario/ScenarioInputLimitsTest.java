package org.trundle.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * What a scenario file may hold, and how its reader says no: size and length caps, UTF-8 only, a
 * byte-order mark read alike in JSON and YAML, no YAML aliases, parser messages free of the
 * parser's own option names, long values cut in messages, numbers that overflow refused as input
 * (issue 18, items 3 and 10).
 */
class ScenarioInputLimitsTest {
    @TempDir
    Path dir;

    static final String YAML_DEMO = "ball: {radius: 0.004, mass: 0.0021}\n"
        + "surface: {type: cylinder, side: inside, radius: 0.015, origin: [0, 0, 0], axis: [0, 0, 1], from: -0.25,"
        + " to: 0.0}\n"
        + "contact: {law: rolling}\n"
        + "start: {position: [0.011, 0, -0.002], velocity: [0, 0.9, 0], spin: rolling}\n"
        + "run: {duration: 0.1}\n";

    private String message(Runnable r) {
        ScenarioException e = assertThrows(ScenarioException.class, r::run);
        assertFalse(e.getMessage().contains("\n"), "one line");
        return e.getMessage();
    }

    private Path file(String name, byte[] content) throws IOException {
        Path p = dir.resolve(name);
        Files.write(p, content);
        return p;
    }

    @Test
    void oversizedFilesAreRefusedAfterOneMebibyte() throws IOException {
        byte[] big = new byte[Texts.MAX_FILE_BYTES + 10];
        java.util.Arrays.fill(big, (byte) ' ');
        Path p = file("big.json", big);
        String m = message(() -> ScenarioFiles.read(p));
        assertTrue(m.contains("is larger than 1048576 bytes (1 MiB)"), m);
        Path zero = Path.of("/dev/zero");
        if (Files.isReadable(zero)) {
            String z = message(() -> ScenarioFiles.read(zero)); // an endless file is read to the cap only
            assertTrue(z.contains("is larger than 1048576 bytes"), z);
        }
        assertTrue(message(() -> ScenarioFiles.read(dir)).contains("is a folder, not a file"));
    }

    @Test
    void nonUtf8FilesAreNamedAsSuch() throws IOException {
        Path p = file("latin1.json", "{\"description\": \"caf\u00e9\"}".getBytes(StandardCharsets.ISO_8859_1));
        assertEquals("scenario file " + p + " is not UTF-8 text: byte 0xE9 at offset 20 (line 1) is not valid UTF-8;"
            + " save the file as UTF-8", message(() -> ScenarioFiles.read(p)));
    }

    @Test
    void aByteOrderMarkReadsAlikeInJsonAndYaml() throws IOException {
        byte[] bom = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF};
        String json = ScenarioFiles.demoText();
        Path j = file("bom.json", concat(bom, json.getBytes(StandardCharsets.UTF_8)));
        Path y = file("bom.yaml", concat(bom, YAML_DEMO.getBytes(StandardCharsets.UTF_8)));
        assertEquals(ScenarioFiles.parse(json), ScenarioFiles.read(j));
        JsonNode yaml = ScenarioFiles.read(y);
        assertEquals(0.004, yaml.get("ball").get("radius").doubleValue(), 0.0);
        assertEquals(yaml, ScenarioFiles.read(file("plain.yaml", YAML_DEMO.getBytes(StandardCharsets.UTF_8))));
    }

    private static byte[] concat(byte[] a, byte[] b) {
        byte[] c = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, c, a.length, b.length);
        return c;
    }

    @Test
    void yamlAliasesAreRefusedWithAMessage() throws IOException {
        Path p = file("alias.yaml", ("description: &d hello\n" + YAML_DEMO.replace("contact: {law: rolling}",
            "contact: {law: *d}")).getBytes(StandardCharsets.UTF_8));
        String m = message(() -> ScenarioFiles.read(p));
        assertEquals("YAML alias *d at line 4, column 16: scenario files take no anchors and aliases; write the value"
            + " out in full", m);
        Path key = file("key.yaml", "base: &b 1\n*b : 2\n".getBytes(StandardCharsets.UTF_8));
        assertTrue(message(() -> ScenarioFiles.read(key)).startsWith("YAML alias at line 2, column 3: scenario files take no anchors and aliases"));
        Path two = file("two.yaml", (YAML_DEMO + "---\n" + YAML_DEMO).getBytes(StandardCharsets.UTF_8));
        assertEquals("malformed YAML at line 7, column 1: more after the end of the document (a scenario file holds one)",
            message(() -> ScenarioFiles.read(two)));
    }

    @Test
    void parserMessagesNameNoParserOptions() {
        String[][] cases = {
            {"{\"ball\": NaN}", "Non-standard token 'NaN' (scenario numbers must be finite)"},
            {"{ // note\n \"ball\": 1 }", "(comments are not allowed in JSON)"},
            {"{\"ball\": 007}", "malformed JSON at line 1"},
            {"{'ball': 1}", "was expecting double-quote to start field name"},
            {"{} {}", "more after the end of the document (a scenario file holds one)"},
        };
        for (String[] c : cases) {
            String m = message(() -> ScenarioFiles.parse(c[0]));
            assertTrue(m.contains(c[1]), m);
            for (String leak : List.of("Feature", "Constraints", "`", "ALLOW_")) {
                assertFalse(m.contains(leak), "no parser option name (" + leak + "): " + m);
            }
        }
    }

    @Test
    void nestingKeysAndStringsHaveCaps() {
        String deep = "[".repeat(1500) + "]".repeat(1500);
        assertEquals("malformed JSON: objects and lists nested deeper than 32 levels",
            message(() -> ScenarioFiles.parse(deep)));
        String m = message(() -> ScenarioFiles.parse("{\"ball\": {\"" + "k".repeat(150) + "\": 1}}"));
        assertTrue(m.startsWith("key ball." + "k".repeat(55) + "... (") && m.endsWith("has 150 characters; keys may have"
            + " at most 100"), m);
        String s = message(() -> ScenarioFiles.parse("{\"description\": \"" + "x".repeat(5000) + "\"}"));
        assertEquals("description is a string of 5000 characters; strings may have at most 4096", s);
        String huge = message(() -> ScenarioFiles.parse("{\"description\": \"" + "x".repeat(500_000) + "\"}"));
        assertEquals("malformed JSON: a string longer than 4096 characters", huge);
    }

    @Test
    void longValuesAreCutInMessages() {
        String value = "y".repeat(3000);
        String m = message(() -> Scenario.parse(ScenarioFiles.parse(ScenarioFiles.demoText()
            .replace("\"inertia\": \"solid\"", "\"inertia\": \"" + value + "\""))));
        assertTrue(m.contains("got \"" + "y".repeat(60) + "... (2940 more characters)\""), m);
        assertTrue(m.length() < 200, m);
        String token = message(() -> ScenarioFiles.parse("{\"ball\": " + "z".repeat(3000) + "}"));
        assertTrue(token.length() < 300 && token.contains("more characters"), token);
        assertTrue(new ScenarioException("a".repeat(5000)).getMessage().length() < 1100, "the last guard");
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "speed 1e308      | \"speed\": 0.9        | \"speed\": 1e308       | start: a speed of 1.0E308 m/s is too large to compute with",
        "velocity 1e200   | \"speed\": 0.9, \"elevation_deg\": -15, \"azimuth_deg\": 90 | \"velocity\": [0, 1e200, 0] | start: a speed of 1.0E200 m/s is too large",
        "tolerance 1e-300 | \"tolerance\": 1e-10  | \"tolerance\": 1e-300  | run.tolerance must be at least 1.0E-14 (finer than double precision allows), got 1.0E-300",
        "duration 4.9e-324 | \"duration\": 2.0    | \"duration\": 4.9e-324 | run.duration must be at least 1.0E-9 s (a thousand times the event-time tolerance), got 4.9E-324",
        "max_rows         | \"duration\": 2.0     | \"duration\": 2.0, \"max_rows\": 2.5 | run.max_rows must be a whole number from 1 to 1e15, got 2.5",
    })
    void numbersThatOverflowAreBadInput(String what, String from, String to, String expected) {
        String json = ScenarioFiles.demoText().replace(from.strip(), to.strip());
        assertTrue(message(() -> Scenario.parse(ScenarioFiles.parse(json))).startsWith(expected.strip()));
    }

    static final String SWEEP_BASE = ScenarioFiles.demoText().replace("\"run\":", "\"sweep\": SWEEP,\n  \"run\":");

    @Test
    void sweepIndicesAndRangesThatOverflowAreBadInput() {
        String idx = message(() -> SweepSpec.parse(ScenarioFiles.parse(SWEEP_BASE.replace("SWEEP",
            "{\"start.position[99999999999]\": [1, 2]}"))));
        assertEquals("sweep parameter \"start.position[99999999999]\": index [99999999999] is too large (no list in a"
            + " scenario has more than 1048576 elements)", idx);
        String rnd = message(() -> SweepSpec.parse(ScenarioFiles.parse(SWEEP_BASE.replace("SWEEP",
            "{\"start.speed\": {\"from\": -1e308, \"to\": 1e308}, \"random\": {\"samples\": 3, \"seed\": 1}}"))));
        assertEquals("sweep.start.speed spans from -1.0E308 to 1.0E308, a width beyond the largest double (about"
            + " 1.8e308); give a narrower range", rnd);
        String grid = message(() -> SweepSpec.parse(ScenarioFiles.parse(SWEEP_BASE.replace("SWEEP",
            "{\"start.speed\": {\"from\": -1e308, \"to\": 1e308, \"count\": 3}}"))));
        assertTrue(grid.startsWith("sweep.start.speed spans from -1.0E308"), grid);
    }

    @Test
    void labelsMustNameOutcomesOldEdgeSpellingsIncluded() {
        String m = message(() -> SweepSpec.parse(ScenarioFiles.parse(SWEEP_BASE.replace("SWEEP",
            "{\"start.speed\": [0.5], \"labels\": {\"exit_tp\": \"out of the top\"}}"))));
        assertEquals("unknown key sweep.labels.exit_tp: not an outcome of this scenario; outcomes: exit_from, exit_to,"
            + " duration, rest, budget, left_for_good, failed", m);
        String chute = SWEEP_BASE.replace("SWEEP", "{\"start.speed\": [0.5], \"labels\": LABELS}")
            .replace("{ \"type\": \"cylinder\", \"side\": \"inside\", \"radius\": 0.015,\n"
                + "               \"origin\": [0, 0, 0], \"axis\": [0, 0, 1], \"from\": -0.25, \"to\": 0.0 }",
                "{ \"type\": \"spline_tube\", \"centerline\": [[0, 0, 0], [0, 0.1, -0.01], [0, 0.2, -0.03]],"
                    + " \"radius\": 0.015, \"reference\": [0, 0, -1], \"angle_from_deg\": -100, \"angle_to_deg\": 100 }");
        String lower = message(() -> SweepSpec.parse(ScenarioFiles.parse(chute.replace("LABELS",
            "{\"exit_anglefrom\": \"over a lip\"}"))));
        assertTrue(lower.startsWith("unknown key sweep.labels.exit_anglefrom: not an outcome of this scenario;"
            + " outcomes: exit_from, exit_to, exit_angle"), lower);
        SweepSpec camel = SweepSpec.parse(ScenarioFiles.parse(chute.replace("LABELS",
            "{\"exit_angleFrom\": \"over one lip\", \"exit_angle_to\": \"over the other\", \"rest\": \"stops\"}")));
        String from = outcomeOfEdge(chute.replace("LABELS", "{}"), 2);
        String to = outcomeOfEdge(chute.replace("LABELS", "{}"), 3);
        assertEquals(Map.of(from, "over one lip", to, "over the other", "rest", "stops"), camel.labels());
        String longLabel = message(() -> SweepSpec.parse(ScenarioFiles.parse(SWEEP_BASE.replace("SWEEP",
            "{\"start.speed\": [0.5], \"labels\": {\"rest\": \"" + "r".repeat(200) + "\"}}"))));
        assertEquals("sweep.labels.rest is a legend label of 200 characters; labels may have at most 80", longLabel);
    }

    /** The outcome name of an edge as the surface spells it (camelCase before, snake_case after the rename). */
    private static String outcomeOfEdge(String doc, int edge) {
        return "exit_" + SurfaceFactory.create(Section.root(ScenarioFiles.parse(doc)).section("surface")).edgeName(edge);
    }
}
