package org.trundle.runner;

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
 * Wall loads with materials given: {@code contacts.csv} and the peaks in {@code summary.json}, for a steel
 * ball rolling down a steel incline (invented check). Rolling down a slope θ the normal force is
 * {@code m g cosθ} (statics across the slope; common practice), and a ball on a flat under load {@code P}
 * has the Hertz patch radius {@code c = (3 P r/(4 E*))^{1/3}}, maximum pressure {@code p₀ = 3P/(2π c²)} and
 * approach {@code c²/r} (K. L. Johnson, Contact Mechanics, 1985, ch. 4).
 */
class WallLoadsTest {
    static final String INCLINE = "{\n"
        + "  \"description\": \"Invented check: a 10 mm steel ball rolling down a 20 degree steel incline\",\n"
        + "  \"ball\": {\"radius\": 0.005, \"mass\": 0.004, \"inertia\": 0.4,\n"
        + "           \"material\": {\"youngs_modulus\": 210e9, \"poisson_ratio\": 0.3}},\n"
        + "  \"surface\": {\"type\": \"plane\", \"origin\": [0, 0, 0], \"normal\": [-0.3420201433256687, 0, 0.9396926207859084],\n"
        + "              \"material\": {\"youngs_modulus\": 210e9, \"poisson_ratio\": 0.3}},\n"
        + "  \"contact\": {\"law\": \"rolling\"},\n"
        + "  \"start\": {\"on_surface\": true, \"spin\": \"rolling\", \"position\": [-0.0017101007166283435, 0, 0.004698463103929542],"
        + " \"velocity\": [0, 0, 0]},\n"
        + "  \"run\": {\"duration\": 0.2, \"sample_interval\": 0.01}\n"
        + "}\n";

    @TempDir
    Path dir;

    @Test
    void rollingBallLoadsTheInclineAsHertzSays() throws IOException {
        Path f = Cli.write(dir, "incline.json", INCLINE);
        Path out = dir.resolve("incline");
        Cli.Result r = Cli.run("run", f.toString(), "--out", out.toString());
        assertEquals(0, r.code(), r.err());
        List<String> rows = Files.readAllLines(out.resolve("contacts.csv"));
        assertEquals(ContactsCsv.HEADER, rows.get(0));
        assertEquals(1 + 22, rows.size(), "a row per sample: every 0.01 s from 0 to 0.2 s, and the closing sample at 0.2 s");
        double theta = Math.toRadians(20);
        double p = 0.004 * 9.81 * Math.cos(theta);
        double eStar = 1 / (2 * (1 - 0.09) / 210e9);
        double c = Math.cbrt(3 * p * 0.005 / (4 * eStar));
        for (String row : rows.subList(1, rows.size())) {
            String[] v = row.split(",", -1);
            assertEquals("surface", v[1]);
            assertEquals("rolling", v[2]);
            assertEquals(p, Double.parseDouble(v[3]), 1e-9 * p);
            // friction needed to roll: m g sinθ k/(1+k) (design notes §3)
            double ft = 0.004 * 9.81 * Math.sin(theta) * 0.4 / 1.4;
            assertEquals(ft, Double.parseDouble(v[4]), 1e-9 * ft);
            assertEquals(3 * p / (2 * Math.PI * c * c), Double.parseDouble(v[5]), 1e-9 * 3 * p / (2 * Math.PI * c * c));
            assertEquals(c, Double.parseDouble(v[6]), 1e-9 * c);
            assertEquals(c, Double.parseDouble(v[7]), 1e-9 * c);
            assertEquals(c * c / 0.005, Double.parseDouble(v[8]), 1e-9 * c * c / 0.005);
            double axisNorm = Math.sqrt(Math.pow(Double.parseDouble(v[9]), 2) + Math.pow(Double.parseDouble(v[10]), 2)
                + Math.pow(Double.parseDouble(v[11]), 2));
            assertEquals(1, axisNorm, 1e-12);
        }
        JsonNode s = ScenarioFiles.JSON.readTree(out.resolve("summary.json").toFile());
        JsonNode w = s.get("wall_loads").get("surface");
        assertEquals(p, w.get("max_normal_force").asDouble(), 1e-9 * p);
        assertTrue(w.get("max_normal_force_time").asDouble() >= 0);
        assertEquals(3 * p / (2 * Math.PI * c * c), w.get("max_pressure").asDouble(), 1e-9 * 3 * p / (2 * Math.PI * c * c));
    }

    @Test
    void oneMaterialAloneIsRefusedAndNoMaterialsWriteNoContactsFile() throws IOException {
        String half = INCLINE.replace(",\n              \"material\": {\"youngs_modulus\": 210e9, \"poisson_ratio\": 0.3}}", "}");
        Path f = Cli.write(dir, "half.json", half);
        Cli.Result r = Cli.run("run", f.toString(), "--out", dir.resolve("half").toString());
        assertEquals(2, r.code(), r.out() + r.err());
        assertTrue(r.err().contains("surface.material is missing"), r.err());
        String none = half.replace(",\n           \"material\": {\"youngs_modulus\": 210e9, \"poisson_ratio\": 0.3}}", "}");
        Path g = Cli.write(dir, "none.json", none);
        Cli.Result r2 = Cli.run("run", g.toString(), "--out", dir.resolve("none").toString());
        assertEquals(0, r2.code(), r2.err());
        assertFalse(Files.exists(dir.resolve("none").resolve("contacts.csv")));
        String bad = INCLINE.replace("\"poisson_ratio\": 0.3}},\n  \"contact\"", "\"poisson_ratio\": 0.7}},\n  \"contact\"");
        Cli.Result r3 = Cli.run("run", Cli.write(dir, "bad.json", bad).toString(), "--out", dir.resolve("bad").toString());
        assertTrue(r3.err().contains("surface.material.poisson_ratio must lie in [0, 0.5], got 0.7"), r3.err());
    }
}
