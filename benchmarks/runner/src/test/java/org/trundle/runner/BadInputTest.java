package org.trundle.runner;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import org.trundle.scenario.ScenarioFiles;

/**
 * Every kind of bad input gives exit code 2, one line on standard error naming the problem, no
 * stack trace, and nothing in {@code --out}.
 */
class BadInputTest {
    @TempDir
    Path dir;

    private void assertRejected(String json, String expected) {
        assertRejected(json, expected, "run");
    }

    private void assertRejected(String json, String expected, String cmd) {
        Path f = Cli.write(dir, "bad.json", json);
        Path out = dir.resolve("out");
        Cli.Result r = cmd.equals("sweep") ? Cli.run(cmd, f.toString(), "--out", out.toString(), "--no-progress")
            : Cli.run(cmd, f.toString(), "--out", out.toString());
        assertEquals(2, r.code(), cmd + ": " + r.err());
        assertEquals(1, r.err().strip().lines().count(), "one line: " + r.err());
        assertTrue(r.err().startsWith("trundle: error: "), r.err());
        assertTrue(r.err().contains(expected), "expected \"" + expected + "\" in: " + r.err());
        assertTrue(r.err().length() < 1100, "a bounded line: " + r.err().length());
        assertFalse(r.err().contains("\tat ") || r.err().contains("Exception"), "no stack trace: " + r.err());
        assertFalse(Files.exists(out), "nothing written to --out");
    }

    @Test
    void malformedJsonGivesLineAndColumn() {
        assertRejected("{\n  \"ball\": { \"radius\": 0.004,, \"mass\": 1 }\n}", "malformed JSON at line 2, column 29: Unexpected character (',' (code 44))");
        assertRejected(Cli.demoWith("\"inertia\": \"solid\" }", "\"inertia\": \"solid\" "),
            "malformed JSON at line 13, column 1: Unexpected end-of-input: expected close marker for Object (start"
                + " marker at [line: 1, column: 1])");
        assertRejected("", "malformed JSON");
    }

    @Test
    void duplicateKeyIsMalformed() {
        assertRejected(Cli.demoWith("\"radius\": 0.004,", "\"radius\": 0.004, \"radius\": 0.005,"),
            "Duplicate field 'radius'");
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "top level     | \"gravity\": [0, 0, -9.81],  | \"gravity\": [0, 0, -9.81], \"gravty\": 1, "
            + "| unknown key gravty; valid keys at the top level: description, ball, surface, surfaces, contact, gravity, start, run, sweep",
        "ball          | \"inertia\": \"solid\"       | \"inertia\": \"solid\", \"colour\": \"red\" "
            + "| unknown key ball.colour; valid keys in ball: radius, mass, inertia",
        "cylinder      | \"side\": \"inside\",        | \"side\": \"inside\", \"radus\": 1, "
            + "| unknown key surface.radus; valid keys in surface: type, origin, axis, radius, side, from, to",
        "rolling law   | \"law\": \"coulomb\"         | \"law\": \"rolling\" "
            + "| unknown key contact.static_friction; valid keys in contact: law, restitution, rolling_resistance, pivoting_resistance",
        "start         | \"spin\": \"rolling\"        | \"spin\": \"rolling\", \"phase\": 1 "
            + "| unknown key start.phase; valid keys in start: position, velocity, speed, elevation_deg, azimuth_deg, spin, on_surface",
        "run           | \"stop_at_exit\": true      | \"stop_at_exit\": true, \"steps\": 3 "
            + "| unknown key run.steps; valid keys in run: duration, tolerance, sample_interval, stop_at_exit, max_check_interval",
    })
    void unknownKeyListsTheValidOnes(String where, String from, String to, String message) {
        assertRejected(Cli.demoWith(from.strip(), to.strip()), message.strip());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "ball.radius     | \"radius\": 0.004,                   | | missing key ball.radius",
        "surface.radius  | \"radius\": 0.015,                   | | missing key surface.radius",
        "surface.type    | \"type\": \"cylinder\",              | | missing key surface.type",
        "contact.law     | \"law\": \"coulomb\",                | | missing key contact.law",
        "kinetic         | \"kinetic_friction\": 0.3,           | | missing key contact.kinetic_friction",
        "start.position  | \"position\": [0.011, 0, -0.002],    | | missing key start.position",
        "run.duration    | \"duration\": 2.0,                   | | missing key run.duration",
    })
    void missingKeyIsNamed(String what, String from, String to, String message) {
        assertRejected(Cli.demoWith(from.strip(), to == null ? "" : to), message.strip());
    }

    @Test
    void missingSectionAndVelocityAreNamed() {
        assertRejected("{\"ball\": {\"radius\": 0.004, \"mass\": 0.002}}", "missing key surface (an object { ... })");
        assertRejected(Cli.demoWith("\"speed\": 0.9, \"elevation_deg\": -15, \"azimuth_deg\": 90,", ""),
            "missing key start.velocity");
        assertRejected(Cli.demoWith(",\n               \"spin\": \"rolling\"", ""), "missing key start.spin");
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "string radius   | \"radius\": 0.004    | \"radius\": \"4 mm\"  | ball.radius must be a number (m), got the string \"4 mm\"",
        "short vector    | \"axis\": [0, 0, 1]  | \"axis\": [0, 1]      | surface.axis must be a vector of 3 numbers [x, y, z], got an array of 2 elements",
        "vector element  | \"axis\": [0, 0, 1]  | \"axis\": [0, \"z\", 1] | surface.axis[1] must be a number, got the string \"z\"",
        "bool            | \"stop_at_exit\": true | \"stop_at_exit\": \"yes\" | run.stop_at_exit must be true or false, got the string \"yes\"",
        "side            | \"side\": \"inside\"  | \"side\": \"in\"      | surface.side must be one of \"inside\", \"outside\", got \"in\"",
        "law             | \"law\": \"coulomb\"  | \"law\": 3            | contact.law must be one of \"rolling\", \"coulomb\", got the number 3",
        "inertia         | \"inertia\": \"solid\" | \"inertia\": true    | ball.inertia must be \"solid\", \"hollow\" or a number k = I/(m r^2), got the boolean true",
        "spin            | \"spin\": \"rolling\" | \"spin\": 5           | start.spin must be \"rolling\" or a vector [x, y, z] (rad/s), got the number 5",
        "section         | \"run\":     { \"duration\": 2.0, \"tolerance\": 1e-10, \"sample_interval\": 0.001, \"stop_at_exit\": true } | \"run\": 3 | run must be an object { ... }, got the number 3",
    })
    void wrongTypeIsNamed(String what, String from, String to, String message) {
        assertRejected(Cli.demoWith(from.strip(), to.strip()), message.strip());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "negative radius   | \"radius\": 0.004          | \"radius\": -0.004          | ball.radius must be positive (m), got -0.004",
        "zero mass         | \"mass\": 0.0021           | \"mass\": 0                 | ball.mass must be positive (kg), got 0.0",
        "inertia factor    | \"inertia\": \"solid\"     | \"inertia\": 0.9            | ball.inertia must be \"solid\", \"hollow\" or a factor k = I/(m r^2) in (0, 2/3], got 0.9",
        "restitution       | \"restitution\": 0.5       | \"restitution\": 1.5        | contact.restitution must lie in [0.0, 1.0], got 1.5",
        "negative friction | \"kinetic_friction\": 0.3  | \"kinetic_friction\": -0.3  | contact.kinetic_friction must not be negative, got -0.3",
        "duration          | \"duration\": 2.0          | \"duration\": 0             | run.duration must be positive (s), got 0.0",
        "tolerance         | \"tolerance\": 1e-10       | \"tolerance\": 0.5          | run.tolerance must be below 1e-2, got 0.5",
        "sample interval   | \"sample_interval\": 0.001 | \"sample_interval\": -1     | run.sample_interval must not be negative (s), got -1.0",
        "bounds            | \"from\": -0.25            | \"from\": 0.1               | surface.from must be below surface.to, got from = 0.1 m, to = 0.0 m",
        "zero axis         | \"axis\": [0, 0, 1]        | \"axis\": [0, 0, 0]         | surface.axis must be a non-zero direction, got [0, 0, 0]",
        "mu_k > mu_s       | \"kinetic_friction\": 0.3  | \"kinetic_friction\": 0.6   | contact.kinetic_friction = 0.6 exceeds contact.static_friction = 0.4; Coulomb friction needs mu_k <= mu_s",
    })
    void outOfRangeIsNamed(String what, String from, String to, String message) {
        assertRejected(Cli.demoWith(from.strip(), to.strip()), message.strip());
    }

    @Test
    void ballThatDoesNotFitIsRefused() {
        assertRejected(Cli.demoWith("\"radius\": 0.004", "\"radius\": 0.016", "[0.011, 0, -0.002]", "[0.001, 0, -0.002]"),
            "ball does not fit: ball of radius 0.016 m does not fit surface cylinder(inside, R=0.0150000 m");
    }

    @Test
    void contactStartNotOnTheSurfaceIsRefused() {
        assertRejected(Cli.demoWith("\"spin\": \"rolling\"", "\"spin\": \"rolling\", \"on_surface\": true",
            "[0.011, 0, -0.002]", "[0.010, 0, -0.002]"),
            "start.position: contact start not on the surface: centre {0.01; 0; -0.002} is 0.00500000 m from the surface;"
            + " placing it at the ball radius 0.00400000 m would move it 0.00100 m, more than the 0.000400 m allowed (the"
            + " contact tolerance is 4.00e-09 m, 1e-06 of the radius); start.placement_limit (m) allows a larger move;"
            + " leave out start.on_surface for a flight start");
        assertRejected(Cli.demoWith("[0.011, 0, -0.002]", "[0.011, 0, 0.002]"),
            "start.position: contact start not on the surface: the contact point lies 0.002");
        assertRejected(Cli.demoWith("[0.011, 0, -0.002]", "[0.012, 0, -0.002]"),
            "start.position: the ball penetrates the surface: its centre is 0.002999999999999999 m from it, less than the"
            + " ball radius 0.004 m");
        assertRejected(Cli.demoWith("\"speed\": 0.9, \"elevation_deg\": -15, \"azimuth_deg\": 90",
            "\"velocity\": [0.1, 0.5, 0]"), "start.velocity: a contact start must move along the surface, but the"
            + " velocity has a normal component -0.1 m/s");
        assertRejected(Cli.demoWith("[0.011, 0, -0.002]", "[0.005, 0, -0.002]"),
            "start.spin: \"rolling\" needs a contact start, but the ball starts in flight (its centre is"
            + " 0.009999999999999998 m from the surface, the ball radius is 0.004 m, beyond the contact tolerance 4.0E-9"
            + " m); give the spin as a vector (rad/s), or set start.on_surface: true to move a centre up to 4.0E-4 m away"
            + " onto the surface");
    }

    @Test
    void velocityGivenTwiceIsRefused() {
        assertRejected(Cli.demoWith("\"speed\": 0.9,", "\"speed\": 0.9, \"velocity\": [0, 1, 0],"),
            "give either start.velocity or start.speed with start.elevation_deg and start.azimuth_deg, not both");
    }

    @Test
    void badSweepSectionsAreNamed() {
        String base = ScenarioFiles.demoText().replace("\"run\":", "\"sweep\": SWEEP,\n  \"run\":");
        assertRejected(base.replace("SWEEP", "{\"start.sped\": [1, 2]}"),
            "sweep point 0 (start.sped = 1.0): unknown key start.sped; valid keys in start:", "sweep");
        assertRejected(base.replace("SWEEP", "{\"start.position[3]\": [1, 2]}"),
            "sweep parameter start.position[3]: start.position has no element [3] (it has 3)", "sweep");
        assertRejected(base.replace("SWEEP", "{\"start.speed\": {\"from\": 0.1, \"to\": 1, \"count\": 2.5}}"),
            "sweep.start.speed.count must be a whole number, got 2.5", "sweep");
        assertRejected(base.replace("SWEEP", "{\"start.speed\": {\"from\": -1, \"to\": 1, \"count\": 3}}"),
            "sweep point 0 (start.speed = -1.0): start.speed must not be negative (m/s), got -1.0", "sweep");
        assertRejected(base.replace("SWEEP", "{\"start.speed\": {\"from\": 0.1, \"to\": 1}, \"random\": {\"samples\": 3}}"),
            "missing key sweep.random.seed", "sweep");
        assertRejected(base.replace("SWEEP", "{\"spin\": [1]}"),
            "unknown key sweep.spin; valid keys in sweep: a dotted parameter path (like start.velocity[2]), random, labels", "sweep");
        assertRejected(base.replace("SWEEP", "{\"start.spin\": [1]}"),
            "sweep parameter start.spin must name a number in the scenario, but it is the string \"rolling\"", "sweep");
        assertRejected(base.replace("SWEEP", "{}"), "the sweep section names no parameter", "sweep");
    }

    @Test
    void sweepWithoutSweepSectionIsRefused() {
        Path f = Cli.write(dir, "plain.json", ScenarioFiles.demoText());
        Cli.Result r = Cli.run("sweep", f.toString(), "--out", dir.resolve("o").toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("the scenario has no sweep section"), r.err());
    }

    @Test
    void nonEmptyOutputFolderNeedsForce() throws IOException {
        Path f = Cli.write(dir, "ok.json", Cli.demoWith("\"duration\": 2.0", "\"duration\": 0.01"));
        Path out = Files.createDirectories(dir.resolve("busy"));
        Files.writeString(out.resolve("notes.txt"), "mine");
        Cli.Result r = Cli.run("run", f.toString(), "--out", out.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("is not empty; choose another folder or add --force"), r.err());
        assertFalse(Files.exists(out.resolve("summary.json")));
        Cli.Result demo = Cli.run("demo", "--out", out.toString());
        assertEquals(2, demo.code(), "the demo does not replace a folder it did not write");
        Cli.Result forced = Cli.run("run", f.toString(), "--out", out.toString(), "--force");
        assertEquals(0, forced.code(), forced.err());
        assertTrue(Files.exists(out.resolve("summary.json")));
        assertEquals("mine", Files.readString(out.resolve("notes.txt")));
    }

    /** Issue 18, item 10: each of these exited 1 with an exception's text; now 2 with one line. */
    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "speed 1e308       | \"speed\": 0.9          | \"speed\": 1e308         | start: a speed of 1.0E308 m/s is too large to compute with",
        "tolerance 1e-300  | \"tolerance\": 1e-10    | \"tolerance\": 1e-300    | run.tolerance must be at least 1.0E-14",
        "duration 4.9e-324 | \"duration\": 2.0       | \"duration\": 4.9e-324   | run.duration must be at least 1.0E-9 s",
        "rows              | \"sample_interval\": 0.001 | \"sample_interval\": 1e-12 | the run would write about 2.00e+12 trajectory rows",
    })
    void numbersBeyondWhatARunCanUseAreBadInput(String what, String from, String to, String message) {
        assertRejected(Cli.demoWith(from.strip(), to.strip()), message.strip());
    }

    @Test
    void sweepIndexAndRangeOverflowsAreBadInput() {
        String base = ScenarioFiles.demoText().replace("\"run\":", "\"sweep\": SWEEP,\n  \"run\":");
        assertRejected(base.replace("SWEEP", "{\"start.position[99999999999]\": [1, 2]}"),
            "index [99999999999] is too large", "sweep");
        assertRejected(base.replace("SWEEP", "{\"start.speed\": {\"from\": -1e308, \"to\": 1e308},"
            + " \"random\": {\"samples\": 3, \"seed\": 1}}"), "a width beyond the largest double", "sweep");
        assertRejected(base.replace("SWEEP", "{\"start.speed\": [0.5], \"labels\": {\"exit_tp\": \"top\"}}"),
            "unknown key sweep.labels.exit_tp: not an outcome of this scenario; outcomes: exit_from, exit_to, duration,"
                + " rest, budget, left_for_good, failed", "sweep");
    }

    @Test
    void fileProblemsAreOneLine() throws IOException {
        Path latin = dir.resolve("latin.json");
        Files.write(latin, Cli.demoWith("Demo with", "D\u00e9mo with").getBytes(java.nio.charset.StandardCharsets.ISO_8859_1));
        Cli.Result r = Cli.run("run", latin.toString(), "--out", dir.resolve("o").toString());
        assertEquals(2, r.code());
        assertEquals("trundle: error: scenario file " + latin + " is not UTF-8 text: byte 0xE9 at offset 21 (line 2) is"
            + " not valid UTF-8; save the file as UTF-8", r.err().strip());
        Path yaml = Cli.write(dir, "alias.yaml", "description: &d hello\nball: *d\n");
        Cli.Result a = Cli.run("run", yaml.toString(), "--out", dir.resolve("o").toString());
        assertEquals(2, a.code());
        assertEquals("trundle: error: YAML alias *d at line 2, column 7: scenario files take no anchors and aliases;"
            + " write the value out in full", a.err().strip());
        if (Files.isReadable(Path.of("/dev/zero"))) {
            Cli.Result z = Cli.run("run", "/dev/zero", "--out", dir.resolve("o").toString());
            assertEquals(2, z.code());
            assertEquals("trundle: error: scenario file /dev/zero is larger than 1048576 bytes (1 MiB), the most a"
                + " scenario file may hold", z.err().strip());
        }
        assertFalse(Files.exists(dir.resolve("o")));
    }

    @Test
    void outputFoldersThatCannotBeWrittenAreBadInput() throws IOException {
        Path f = Cli.write(dir, "ok.json", Cli.demoWith("\"duration\": 2.0", "\"duration\": 0.01"));
        Path link = dir.resolve("dangling");
        Files.createSymbolicLink(link, dir.resolve("missing-target"));
        Cli.Result d = Cli.run("run", f.toString(), "--out", link.toString());
        assertEquals(2, d.code(), d.err());
        assertEquals("trundle: error: --out " + link + " is a symbolic link to " + dir.resolve("missing-target")
            + ", which does not exist; create the folder it points to or choose another --out", d.err().strip());
        Path file = Cli.write(dir, "plain.txt", "x");
        Cli.Result p = Cli.run("run", f.toString(), "--out", file.resolve("sub").toString());
        assertEquals(2, p.code(), p.err());
        assertEquals("trundle: error: --out " + file.resolve("sub") + " cannot be created: " + file
            + " is a file, not a folder", p.err().strip());
        Path locked = Files.createDirectories(dir.resolve("locked"));
        Files.setPosixFilePermissions(locked, java.nio.file.attribute.PosixFilePermissions.fromString("r-xr-xr-x"));
        try {
            org.junit.jupiter.api.Assumptions.assumeFalse(Files.isWritable(locked), "the super-user may write anywhere");
            Cli.Result ro = Cli.run("run", f.toString(), "--out", locked.resolve("out").toString());
            assertEquals(2, ro.code(), ro.err());
            assertEquals("trundle: error: --out " + locked.resolve("out") + " cannot be written: permission denied on "
                + locked + "; choose a folder you may write", ro.err().strip());
        } finally {
            Files.setPosixFilePermissions(locked, java.nio.file.attribute.PosixFilePermissions.fromString("rwxr-xr-x"));
        }
    }

    /** The output folder is checked before the sweep's points (a 10⁷-point sweep takes a while to check). */
    @Test
    void sweepChecksTheOutputFolderFirst() throws IOException {
        String bad = ScenarioFiles.demoText().replace("\"run\":", "\"sweep\": {\"start.speed\": [0.5, -1]},\n  \"run\":");
        Path f = Cli.write(dir, "sweep.json", bad);
        Path out = Files.createDirectories(dir.resolve("busy"));
        Files.writeString(out.resolve("notes.txt"), "mine");
        Cli.Result r = Cli.run("sweep", f.toString(), "--out", out.toString(), "--no-progress");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("is not empty; choose another folder or add --force"), r.err());
    }

    @Test
    void missingFileAndBadOptionsAreOneLine() {
        Cli.Result r = Cli.run("run", dir.resolve("nope.json").toString(), "--out", dir.resolve("o").toString());
        assertEquals(2, r.code());
        assertTrue(r.err().startsWith("trundle: error: no such scenario file:"), r.err());
        Cli.Result o = Cli.run("run", "x.json");
        assertEquals(2, o.code());
        assertEquals(1, o.err().strip().lines().count(), o.err());
        assertTrue(o.err().contains("Missing required option: '--out=DIR'"), o.err());
        Cli.Result t = Cli.run("sweep", "x.json", "--out", "o", "--threads", "two");
        assertEquals(2, t.code());
        assertTrue(t.err().contains("--threads"), t.err());
    }
}
