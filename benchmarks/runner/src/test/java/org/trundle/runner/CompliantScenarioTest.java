package org.trundle.runner;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.trundle.scenario.ScenarioFiles;

/**
 * {@code contact.compliant}: a steel ball dropped on a compliant steel floor (invented check) bounces with
 * impact and lift-off events, the damping's work is reported, and the budget closes; the key needs both
 * materials and a restitution of at least 0.1.
 */
class CompliantScenarioTest {
    static final String DROP = "{\n"
        + "  \"description\": \"Invented check: a 10 mm steel ball dropped 5 cm onto a compliant steel floor\",\n"
        + "  \"ball\": {\"radius\": 0.005, \"mass\": 0.0041,"
        + " \"material\": {\"youngs_modulus\": 210e9, \"poisson_ratio\": 0.3}},\n"
        + "  \"surface\": {\"type\": \"plane\", \"origin\": [0, 0, 0], \"normal\": [0, 0, 1],"
        + " \"material\": {\"youngs_modulus\": 210e9, \"poisson_ratio\": 0.3}},\n"
        + "  \"contact\": {\"law\": \"coulomb\", \"static_friction\": 0.3, \"kinetic_friction\": 0.3,"
        + " \"restitution\": 0.8, \"compliant\": true},\n"
        + "  \"start\": {\"position\": [0, 0, 0.055], \"velocity\": [0, 0, 0], \"spin\": [0, 0, 0]},\n"
        + "  \"run\": {\"duration\": 0.2, \"sample_interval\": 0.01}\n"
        + "}\n";

    @TempDir
    Path dir;

    @Test
    void compliantFloorBouncesWithDampingBooked() throws IOException {
        Path out = dir.resolve("drop");
        Cli.Result r = Cli.run("run", Cli.write(dir, "drop.json", DROP).toString(), "--out", out.toString(), "--no-plot");
        assertEquals(0, r.code(), r.err());
        JsonNode s = ScenarioFiles.JSON.readTree(out.resolve("summary.json").toFile());
        JsonNode ev = s.get("events");
        assertEquals("impact", ev.get(0).get("kind").asText());
        assertEquals("lift_off", ev.get(1).get("kind").asText());
        // free fall through 5 cm (common practice): the contact begins at sqrt(2h/g)
        assertEquals(Math.sqrt(2 * 0.05 / 9.81), ev.get(0).get("time").asDouble(), 1e-9);
        double m = 0.0041;
        double v1sq = 2 * 9.81 * 0.05;
        // the damping takes about (1 - e^2) of the impact's kinetic energy (exact without gravity; gravity's
        // impulse over the 30 microsecond contact changes it by far less than 1e-3)
        assertEquals(0.5 * m * v1sq * (1 - 0.64), s.get("energy").get("contact_damping_loss").asDouble(),
            1e-3 * 0.5 * m * v1sq);
        assertTrue(s.get("energy").get("relative_residual").asDouble() < 1e-6);
        // an elastic impact at 0.99 m/s peaks at K δ_m^{3/2} = 431 N (Johnson 1985, §11.4); the run's largest
        // normal force, taken at step ends during the 30 µs contact, is of that size (the samples every 0.01 s
        // miss the impact, so the wall loads of contacts.csv see only its event instants)
        double peak = s.get("max_normal_force").asDouble();
        assertTrue(peak > 200 && peak < 650, "largest normal force " + peak + " N");
    }

    @Test
    void compliantNeedsMaterialsAndRestitution() {
        String noMaterials = DROP.replace(", \"material\": {\"youngs_modulus\": 210e9, \"poisson_ratio\": 0.3}}", "}")
            .replace(" \"material\": {\"youngs_modulus\": 210e9, \"poisson_ratio\": 0.3}}", "}");
        Cli.Result r = Cli.run("run", Cli.write(dir, "a.json", noMaterials).toString(), "--out", dir.resolve("a").toString());
        assertEquals(2, r.code(), r.out() + r.err());
        assertTrue(r.err().contains("contact.compliant needs ball.material and surface.material"), r.err());
        String low = DROP.replace("\"restitution\": 0.8", "\"restitution\": 0.05");
        Cli.Result r2 = Cli.run("run", Cli.write(dir, "b.json", low).toString(), "--out", dir.resolve("b").toString());
        assertEquals(2, r2.code(), r2.out() + r2.err());
        assertTrue(r2.err().contains("contact.compliant needs contact.restitution of at least 0.1"), r2.err());
    }

    /**
     * {@code compliant-v-groove-liner.json} (invented data): the ball dropped down the bisector of a compliant 90°
     * groove meets both walls when it has fallen 20 mm, at {@code sqrt(2h/g)} (free fall; common practice), and
     * leaves both at one instant; the walls carry equal loads on every row of {@code contacts.csv} that has both
     * (symmetry); the budget closes with friction and damping counted. With frictionless walls the rebound is the
     * restitution 0.6 ({@link org.trundle.core.Compliance}: exact without gravity; gravity's impulse over the contact
     * time {@code t_c} changes it by at most {@code g t_c / v}).
     */
    @Test
    void linerGrooveExampleMeetsBothWallsAtOnce() throws IOException {
        Path out = dir.resolve("liner");
        Cli.Result r = Cli.run("run", "../scenarios/compliant-v-groove-liner.json", "--out", out.toString(), "--no-plot");
        assertEquals(0, r.code(), r.err());
        JsonNode s = ScenarioFiles.JSON.readTree(out.resolve("summary.json").toFile());
        JsonNode ev = s.get("events");
        assertEquals("impact", ev.get(0).get("kind").asText());
        assertEquals("impact", ev.get(1).get("kind").asText());
        assertEquals("liner.left", ev.get(0).get("patch").asText());
        assertEquals("liner.right", ev.get(1).get("patch").asText());
        assertEquals(ev.get(0).get("time").asDouble(), ev.get(1).get("time").asDouble());
        // the impact events fire at a normal gap of 1e-9 r, some 1e-11 s before the touch
        assertEquals(Math.sqrt(2 * 0.02 / 9.81), ev.get(0).get("time").asDouble(), 1e-9);
        assertEquals("lift_off", ev.get(2).get("kind").asText());
        assertEquals("lift_off", ev.get(3).get("kind").asText());
        assertEquals(ev.get(2).get("time").asDouble(), ev.get(3).get("time").asDouble());
        assertTrue(s.get("energy").get("relative_residual").asDouble() < 1e-6);
        assertTrue(s.get("energy").get("contact_damping_loss").asDouble() > 0);
        assertTrue(s.get("energy").get("friction_loss").asDouble() > 0);
        java.util.Map<String, double[]> byTime = new java.util.HashMap<>();
        int both = 0;
        List<String> rows = Files.readAllLines(out.resolve("contacts.csv"));
        for (String line : rows.subList(1, rows.size())) {
            String[] f = line.split(",");
            double[] pair = byTime.computeIfAbsent(f[0], k -> new double[] {Double.NaN, Double.NaN});
            pair[f[1].equals("liner.left") ? 0 : 1] = Double.parseDouble(f[3]);
            assertEquals("compliant", f[2], line);
        }
        for (double[] pair : byTime.values()) {
            if (!Double.isNaN(pair[0]) && !Double.isNaN(pair[1])) {
                both++;
                assertEquals(pair[0], pair[1], 1e-9 * Math.max(pair[0], 1e-9));
            }
        }
        assertTrue(both > 20, "rows with both walls: " + both);

        String frictionless = Files.readString(Path.of("../scenarios/compliant-v-groove-liner.json"))
            .replace("\"static_friction\": 0.3, \"kinetic_friction\": 0.25, \"restitution\": 0.6,",
                "\"static_friction\": 0, \"kinetic_friction\": 0, \"restitution\": 0.6,");
        Path out2 = dir.resolve("frictionless");
        Cli.Result r2 = Cli.run("run", Cli.write(dir, "frictionless.json", frictionless).toString(), "--out",
            out2.toString(), "--no-plot");
        assertEquals(0, r2.code(), r2.err());
        JsonNode e2 = ScenarioFiles.JSON.readTree(out2.resolve("summary.json").toFile()).get("events");
        double vIn = -e2.get(0).get("velocity").get(2).asDouble();
        double vOut = e2.get(2).get("velocity").get(2).asDouble();
        double tc = e2.get(2).get("time").asDouble() - e2.get(0).get("time").asDouble();
        assertEquals(0.6, vOut / vIn, 9.81 * tc / vIn);
    }

    /**
     * {@code compliant-bumper.json} (invented data): a ball rolling on a rigid floor meets a compliant bumper while it
     * still touches the floor (a rigid and a compliant contact at once): the bumper's contact begins and ends with its
     * own events, the ball comes back (its velocity along the floor reversed), and the budget closes with the floor's
     * impact and friction losses and the bumper's damping counted.
     */
    @Test
    void bumperExampleBouncesOffTheCompliantPatchWhileOnTheRigidFloor() throws IOException {
        Path out = dir.resolve("bumper");
        Cli.Result r = Cli.run("run", "../scenarios/compliant-bumper.json", "--out", out.toString(), "--no-plot");
        assertEquals(0, r.code(), r.err());
        JsonNode s = ScenarioFiles.JSON.readTree(out.resolve("summary.json").toFile());
        JsonNode ev = s.get("events");
        assertEquals("impact", ev.get(0).get("kind").asText());
        assertEquals("bumper", ev.get(0).get("patch").asText());
        // rolling at 0.4 m/s, the contact begins when the centre is a radius from the bumper: after 20 mm, 0.05 s
        // (uniform rolling on a level floor; common practice; the event fires 1e-9 r early)
        assertEquals(0.05, ev.get(0).get("time").asDouble(), 1e-9);
        assertEquals("rolling", s.get("phases").get(0).get("phase").asText());
        boolean released = false;
        for (JsonNode e : ev) {
            released |= e.get("kind").asText().equals("lift_off") && e.get("patch").asText().equals("bumper");
        }
        assertTrue(released, ev.toString());
        assertTrue(s.get("end_state").get("velocity").get(0).asDouble() < 0, s.get("end_state").toString());
        assertTrue(s.get("energy").get("contact_damping_loss").asDouble() > 0);
        assertTrue(s.get("energy").get("relative_residual").asDouble() < 1e-6);
        // contacts.csv names each contact's own mode: the rigid floor's rolling or sliding, the bumper's compliant,
        // both in the rows of one sample while the ball presses the bumper and still touches the floor
        Map<String, Set<String>> patchesAt = new HashMap<>();
        List<String> rows = Files.readAllLines(out.resolve("contacts.csv"));
        for (String line : rows.subList(1, rows.size())) {
            String[] f = line.split(",");
            if (f[1].equals("bumper")) {
                assertEquals("compliant", f[2], line);
            } else {
                assertTrue(f[2].equals("rolling") || f[2].equals("sliding"), line);
            }
            patchesAt.computeIfAbsent(f[0], k -> new HashSet<>()).add(f[1]);
        }
        assertTrue(patchesAt.values().stream().anyMatch(p -> p.size() == 2), "no sample with both contacts");
    }
}
