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
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.contact.HertzContact;
import org.trundle.contact.HertzPatch;
import org.trundle.core.Material;
import org.trundle.scenario.ScenarioFiles;

/**
 * The shipped assembly examples run to their end and name the patches their type expands into. The groove and the
 * rails: see their tests. The bearing
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

    /**
     * The same groove run past its end (0.25 m long, the ball starting 0.02 m along it): both walls end together,
     * so the ball leaves both at once when its centre is 0.25 m along, at {@code t = √(2 (0.25 − 0.02) / a)},
     * {@code a = g sin θ / (1 + k r²/r_e²)}, {@code r_e = r sin 45°} (rolling about the chord, textbook, from
     * memory), and the run ends there ({@code stop_at_exit}). It used to exit the first wall only and roll on the
     * second past the groove's end. Tolerance 1e-8 relative: the integration tolerance over about 140 steps.
     */
    @Test
    void grooveExampleLeavesBothWallsAtTheGroovesEnd() throws IOException {
        Path out = dir.resolve("groove-end");
        Cli.Result r = Cli.run("run", "../scenarios/v-groove-feeder.json", "--out", out.toString(), "--no-plot",
            "--duration", "1.5");
        assertEquals(0, r.code(), r.err() + r.out());
        double g = 9.81;
        double theta = Math.toRadians(10);
        double ratio = 0.4 / (Math.sin(Math.toRadians(45)) * Math.sin(Math.toRadians(45)));
        double a = g * Math.sin(theta) / (1 + ratio);
        double tExit = Math.sqrt(2 * (0.25 - 0.02) / a);
        JsonNode s = ScenarioFiles.JSON.readTree(out.resolve("summary.json").toFile());
        assertEquals("exit", s.get("end_reason").asText());
        assertEquals(tExit, s.get("end_time").asDouble(), 1e-8 * tExit);
        java.util.Set<String> left = new java.util.TreeSet<>();
        for (JsonNode e : s.get("events")) {
            assertEquals("exit", e.get("kind").asText(), e.toString());
            assertEquals(tExit, e.get("time").asDouble(), 1e-8 * tExit);
            left.add(e.get("patch").asText());
        }
        assertEquals(java.util.Set.of("left", "right"), left);
    }

    /**
     * {@code v-groove-feeder.json} (invented data): an 8 mm steel ball (m = 2.1 g, k = 2/5) rolls down a 90° aluminium
     * groove on a 10° slope on both walls at once. Per wall, from the statics of the cross-section (textbook statics,
     * from memory): {@code N = m g cos θ / (2 sin(α/2))}; the friction rolling needs, along the groove, split evenly:
     * {@code F = m g sin θ (k r²/r_e²) / (2 (1 + k r²/r_e²))}, {@code r_e = r sin(α/2)} (the rolling law about the
     * chord through the contacts; design notes §9); each wall flat, so its Hertz patch is Johnson's ball-on-flat
     * solution (K. L. Johnson, Contact Mechanics, 1985, ch. 4). The distance rolled is {@code a t²/2} with
     * {@code a = g sin θ / (1 + k r²/r_e²)}. Tolerances: 1e-9 relative on forces and Hertz values (closed forms at
     * round-off), 1e-8 on the distance (integration tolerance 1e-10 over 120 steps or so).
     */
    @Test
    void grooveExampleLoadsEachWallAsStaticsAndHertzSay() throws IOException {
        Path out = dir.resolve("groove");
        Cli.Result r = Cli.run("run", "../scenarios/v-groove-feeder.json", "--out", out.toString(), "--no-plot");
        assertEquals(0, r.code(), r.err() + r.out());
        double m = 0.0021;
        double g = 9.81;
        double rb = 0.004;
        double theta = Math.toRadians(10);
        double gamma = Math.toRadians(45);
        double ratio = 0.4 / (Math.sin(gamma) * Math.sin(gamma));
        double n = m * g * Math.cos(theta) / (2 * Math.sin(gamma));
        double f = m * g * Math.sin(theta) * ratio / (2 * (1 + ratio));
        double eStar = 1 / ((1 - 0.3 * 0.3) / 210e9 + (1 - 0.33 * 0.33) / 70e9);
        double c = Math.cbrt(3 * n * rb / (4 * eStar));
        List<String> rows = Files.readAllLines(out.resolve("contacts.csv"));
        assertEquals(2 * 122, rows.size() - 1, "two rows (left, right) per sample, every 5 ms from 0 to 0.6 s and the end");
        for (String row : rows.subList(1, rows.size())) {
            String[] v = row.split(",", -1);
            assertTrue(v[1].equals("left") || v[1].equals("right"), row);
            assertEquals("rolling", v[2], row);
            assertEquals(n, Double.parseDouble(v[3]), 1e-9 * n, row);
            assertEquals(f, Double.parseDouble(v[4]), 1e-9 * f, row);
            assertEquals(3 * n / (2 * Math.PI * c * c), Double.parseDouble(v[5]), 1e-9 * 3 * n / (2 * Math.PI * c * c), row);
            assertEquals(c, Double.parseDouble(v[6]), 1e-9 * c, row);
            assertEquals(c * c / rb, Double.parseDouble(v[8]), 1e-9 * c * c / rb, row);
        }
        JsonNode s = ScenarioFiles.JSON.readTree(out.resolve("summary.json").toFile());
        assertEquals("duration", s.get("end_reason").asText());
        double a = g * Math.sin(theta) / (1 + ratio);
        JsonNode end = s.get("end_state").get("position");
        double along = end.get(0).asDouble() * Math.cos(theta) - end.get(2).asDouble() * Math.sin(theta);
        assertEquals(0.02 + a * 0.36 / 2, along, 1e-8 * a * 0.36 / 2);
        assertEquals(n, s.get("wall_loads").get("left").get("max_normal_force").asDouble(), 1e-9 * n);
        assertEquals(n, s.get("wall_loads").get("right").get("max_normal_force").asDouble(), 1e-9 * n);
    }

    /**
     * {@code rails-slope.json} (invented data): a 10 mm steel ball (m = 4.1 g) on two 6 mm rails 12 mm apart on a 5°
     * slope. The contact normals lean from the vertical by φ with {@code sin φ = (S/2)/(r + ρ)}, so each rail
     * carries {@code N = m g cos θ / (2 cos φ)} (textbook statics, from memory); each rail's Hertz patch is the
     * ellipse of a ball on a cylinder (radius ρ, curvature 1/ρ across, 0 along; {@link HertzContact#solve}, checked
     * against Johnson in {@code HertzContactTest}), long along the rail. 1e-9 relative (closed forms).
     */
    @Test
    void railsExampleLoadsEachRailAsStaticsSays() throws IOException {
        Path out = dir.resolve("rails");
        Cli.Result r = Cli.run("run", "../scenarios/rails-slope.json", "--out", out.toString(), "--no-plot");
        assertEquals(0, r.code(), r.err() + r.out());
        double m = 0.0041;
        double theta = Math.toRadians(5);
        double cosPhi = Math.sqrt(1 - 0.75 * 0.75);
        double n = m * 9.81 * Math.cos(theta) / (2 * cosPhi);
        HertzPatch h = HertzContact.solve(n, 0.005, Material.of(210e9, 0.3), -1 / 0.003, Vector3D.PLUS_J, 0.0,
            Vector3D.PLUS_I, Material.of(210e9, 0.3));
        List<String> rows = Files.readAllLines(out.resolve("contacts.csv"));
        Set<String> seen = new TreeSet<>();
        for (String row : rows.subList(1, rows.size())) {
            String[] v = row.split(",", -1);
            seen.add(v[1]);
            assertEquals(n, Double.parseDouble(v[3]), 1e-9 * n, row);
            assertEquals(h.maxPressure(), Double.parseDouble(v[5]), 1e-9 * h.maxPressure(), row);
            assertEquals(h.semiMajor(), Double.parseDouble(v[6]), 1e-9 * h.semiMajor(), row);
            assertEquals(h.semiMinor(), Double.parseDouble(v[7]), 1e-9 * h.semiMinor(), row);
            // long along the rail: (cos 5°, 0, -sin 5°)
            double along = Double.parseDouble(v[9]) * Math.cos(theta) - Double.parseDouble(v[11]) * Math.sin(theta);
            assertEquals(1.0, Math.abs(along), 1e-9, row);
        }
        assertEquals(Set.of("left", "right"), seen);
        assertEquals(2 * 202, rows.size() - 1, "two rows per sample");
    }
}
