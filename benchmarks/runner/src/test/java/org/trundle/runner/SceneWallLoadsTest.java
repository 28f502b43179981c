package org.trundle.runner;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.trundle.contact.HertzContact;
import org.trundle.contact.HertzPatch;
import org.trundle.core.Material;
import org.trundle.scenario.ScenarioFiles;

/**
 * Wall loads per patch in a scene (invented check): a 10 mm steel ball rolls along the bottom of a horizontal
 * 30 mm acrylic bore, leaves its end, drops onto a steel floor and runs on. Each patch reports its own rows with
 * its own material and its own curvatures.
 *
 * <ul>
 *   <li>Along the bore's bottom and on the floor the normal force is {@code m g} (statics: no acceleration
 *       along the normal on a straight path; common practice).</li>
 *   <li>On the floor (a flat) the Hertz patch is the ball-on-flat solution: contact radius
 *       {@code c = (3 P r/(4 E*))^{1/3}}, maximum pressure {@code p₀ = 3P/(2π c²)}, approach {@code c²/r}
 *       (K. L. Johnson, Contact Mechanics, 1985, ch. 4).</li>
 *   <li>In the bore the patch is the ellipse of a ball in a bore of radius R: {@link HertzContact#solve} with the
 *       principal curvatures 1/R round the bore and 0 along it (that solution is checked against Johnson's
 *       equations in {@code HertzContactTest}); here the check is that the bore's own curvatures and acrylic are
 *       used, not the floor's.</li>
 * </ul>
 * Tolerance 1e-9 relative: the forces are the solver's closed form at round-off, the Hertz values closed forms.
 */
class SceneWallLoadsTest {
    static final String SCENE = "{\n"
        + "  \"description\": \"Invented check: a steel ball leaves an acrylic bore and drops onto a steel floor\",\n"
        + "  \"ball\": {\"radius\": 0.005, \"mass\": 0.004, \"inertia\": \"solid\",\n"
        + "           \"material\": {\"youngs_modulus\": 210e9, \"poisson_ratio\": 0.3}},\n"
        + "  \"surfaces\": [\n"
        + "    {\"id\": \"bore\", \"type\": \"cylinder\", \"origin\": [0, 0, 0], \"axis\": [1, 0, 0], \"radius\": 0.015,\n"
        + "     \"side\": \"inside\", \"from\": -0.1, \"to\": 0,\n"
        + "     \"material\": {\"youngs_modulus\": 3.0e9, \"poisson_ratio\": 0.37}},\n"
        + "    {\"id\": \"floor\", \"type\": \"plane\", \"origin\": [0, 0, -0.06], \"normal\": [0, 0, 1],\n"
        + "     \"material\": {\"youngs_modulus\": 210e9, \"poisson_ratio\": 0.3}},\n"
        + "    {\"id\": \"wall\", \"type\": \"plane\", \"origin\": [1, 0, 0], \"normal\": [-1, 0, 0]}\n"
        + "  ],\n"
        + "  \"contact\": {\"law\": \"coulomb\", \"static_friction\": 0.5, \"kinetic_friction\": 0.4},\n"
        + "  \"start\": {\"position\": [-0.08, 0, -0.01], \"velocity\": [0.5, 0, 0], \"spin\": \"rolling\"},\n"
        + "  \"run\": {\"duration\": 0.6, \"sample_interval\": 0.005, \"stop_at_exit\": false}\n"
        + "}\n";

    @TempDir
    Path dir;

    @Test
    void eachPatchReportsItsOwnLoadsWithItsOwnMaterialAndCurvatures() throws IOException {
        Path out = dir.resolve("scene");
        Cli.Result r = Cli.run("run", Cli.write(dir, "scene.json", SCENE).toString(), "--out", out.toString());
        assertEquals(0, r.code(), r.err() + r.out());
        List<String> rows = Files.readAllLines(out.resolve("contacts.csv"));
        assertEquals(ContactsCsv.HEADER, rows.get(0));
        double m = 0.004;
        double g = 9.81;
        double p = m * g;
        double rBall = 0.005;
        double eSteel = 1 / (2 * (1 - 0.09) / 210e9);
        double c = Math.cbrt(3 * p * rBall / (4 * eSteel));
        HertzPatch inBore = HertzContact.solve(p, rBall, Material.of(210e9, 0.3), 1 / 0.015, Vector3D.PLUS_J, 0.0,
            Vector3D.PLUS_I, Material.of(3.0e9, 0.37));
        int bore = 0;
        int floor = 0;
        double lastBore = -1;
        double firstFloor = Double.POSITIVE_INFINITY;
        for (String row : rows.subList(1, rows.size())) {
            String[] v = row.split(",", -1);
            double t = Double.parseDouble(v[0]);
            assertEquals(p, Double.parseDouble(v[3]), 1e-9 * p, row);
            if (v[1].equals("bore")) {
                bore++;
                lastBore = t;
                assertEquals("rolling", v[2], row);
                assertEquals(0.0, Double.parseDouble(v[4]), 1e-12, "rolling straight at constant speed needs no friction");
                assertEquals(inBore.maxPressure(), Double.parseDouble(v[5]), 1e-9 * inBore.maxPressure(), row);
                assertEquals(inBore.semiMajor(), Double.parseDouble(v[6]), 1e-9 * inBore.semiMajor(), row);
                assertEquals(inBore.semiMinor(), Double.parseDouble(v[7]), 1e-9 * inBore.semiMinor(), row);
                assertEquals(inBore.approach(), Double.parseDouble(v[8]), 1e-9 * inBore.approach(), row);
                // the ellipse is long round the bore: its major axis lies across the bore's axis (x)
                assertEquals(0.0, Double.parseDouble(v[9]), 1e-9, row);
            } else {
                assertEquals("floor", v[1], row);
                floor++;
                firstFloor = Math.min(firstFloor, t);
                assertEquals(3 * p / (2 * Math.PI * c * c), Double.parseDouble(v[5]), 1e-9 * 3 * p / (2 * Math.PI * c * c));
                assertEquals(c, Double.parseDouble(v[6]), 1e-9 * c, row);
                assertEquals(c, Double.parseDouble(v[7]), 1e-9 * c, row);
                assertEquals(c * c / rBall, Double.parseDouble(v[8]), 1e-9 * c * c / rBall, row);
            }
        }
        assertTrue(bore > 10 && floor > 10, "rows on both patches: bore " + bore + ", floor " + floor);
        assertTrue(lastBore < firstFloor, "the bore's rows come before the floor's");
        JsonNode s = ScenarioFiles.JSON.readTree(out.resolve("summary.json").toFile());
        JsonNode w = s.get("wall_loads");
        assertEquals(List.of("bore", "floor"), iterate(w), "a patch without a material reports no loads");
        assertEquals(p, w.get("bore").get("max_normal_force").asDouble(), 1e-9 * p);
        assertEquals(inBore.maxPressure(), w.get("bore").get("max_pressure").asDouble(), 1e-9 * inBore.maxPressure());
        assertTrue(w.get("bore").get("max_pressure_time").asDouble() <= lastBore);
        assertEquals(3 * p / (2 * Math.PI * c * c), w.get("floor").get("max_pressure").asDouble(),
            1e-9 * 3 * p / (2 * Math.PI * c * c));
        assertTrue(w.get("floor").get("max_pressure_time").asDouble() >= firstFloor);
        assertTrue(inBore.maxPressure() < 3 * p / (2 * Math.PI * c * c) / 5,
            "an acrylic bore sees a far gentler patch than a steel floor");
    }

    @Test
    void sceneMaterialsGoTogether() throws IOException {
        String noBall = SCENE.replace(",\n           \"material\": {\"youngs_modulus\": 210e9, \"poisson_ratio\": 0.3}}", "}");
        Cli.Result r = Cli.run("run", Cli.write(dir, "a.json", noBall).toString(), "--out", dir.resolve("a").toString());
        assertEquals(2, r.code(), r.out() + r.err());
        assertTrue(r.err().contains("surfaces[].material (given for [bore, floor]) needs ball.material"), r.err());
        String noWall = SCENE.replace(",\n     \"material\": {\"youngs_modulus\": 3.0e9, \"poisson_ratio\": 0.37}", "")
            .replace(",\n     \"material\": {\"youngs_modulus\": 210e9, \"poisson_ratio\": 0.3}", "");
        Cli.Result r2 = Cli.run("run", Cli.write(dir, "b.json", noWall).toString(), "--out", dir.resolve("b").toString());
        assertEquals(2, r2.code(), r2.out() + r2.err());
        assertTrue(r2.err().contains("ball.material goes with the material of at least one patch"), r2.err());
        String bad = SCENE.replace("\"poisson_ratio\": 0.37", "\"poisson_ratio\": 0.6");
        Cli.Result r3 = Cli.run("run", Cli.write(dir, "c.json", bad).toString(), "--out", dir.resolve("c").toString());
        assertEquals(2, r3.code(), r3.out() + r3.err());
        assertTrue(r3.err().contains("surfaces[0].material.poisson_ratio must lie in [0, 0.5], got 0.6"), r3.err());
    }

    private static List<String> iterate(JsonNode o) {
        List<String> names = new java.util.ArrayList<>();
        o.fieldNames().forEachRemaining(names::add);
        return names;
    }
}
