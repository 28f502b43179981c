package org.trundle.runner;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import javax.imageio.ImageIO;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.trundle.core.RunEvent;

/** The sweep command: same rows on 1 and 2 threads, grid and random modes, rows equal to direct runs. */
class SweepCommandTest {
    @TempDir
    Path dir;

    static String sweepOf(String section) {
        return Cli.demoWith("\"run\":", "\"sweep\": " + section + ",\n  \"run\":", "\"duration\": 2.0", "\"duration\": 0.5");
    }

    private List<String> sweep(Path f, String name, int threads, boolean progress) throws IOException {
        Path out = dir.resolve(name);
        Cli.Result r = progress ? Cli.run("sweep", f.toString(), "--out", out.toString(), "--threads", "" + threads)
            : Cli.run("sweep", f.toString(), "--out", out.toString(), "--threads", "" + threads, "--no-progress");
        assertEquals(0, r.code(), r.err());
        assertNotNull(ImageIO.read(out.resolve("regime-map.png").toFile()));
        return Files.readAllLines(out.resolve("sweep.csv"));
    }

    @Test
    void gridRowsAreIdenticalOnOneAndTwoThreads() throws IOException {
        Path f = Cli.write(dir, "grid.json", sweepOf("{\"start.speed\": {\"from\": 0.3, \"to\": 1.3, \"count\": 3},"
            + " \"start.elevation_deg\": [-60, -15], \"labels\": {\"exit_to\": \"back out of the top\"}}"));
        List<String> one = sweep(f, "one", 1, true);
        List<String> two = sweep(f, "two", 2, false);
        assertEquals(one, two);
        assertEquals(7, one.size());
        assertEquals(SweepTable.header(List.of("start.speed", "start.elevation_deg")), one.get(0));
        // grid order: the first parameter varies slowest
        assertTrue(one.get(1).startsWith("0,0.3,-60.0,"), one.get(1));
        assertTrue(one.get(4).startsWith("3,0.8,-15.0,"), one.get(4));
        // the (0.9 m/s, -15 deg) run is the demo's: compare with a direct run of the library
        Path f2 = Cli.write(dir, "demo-point.json", sweepOf("{\"start.speed\": [0.9], \"start.elevation_deg\": [-15]}"));
        String[] row = sweep(f2, "point", 2, false).get(1).split(",", -1);
        RunEvent exit = DemoTest.directRun().exit().orElseThrow();
        assertEquals("exit_to", row[3]);
        assertEquals("exit", row[4]);
        assertEquals("to", row[5]);
        assertEquals(exit.time(), Double.parseDouble(row[7]), 0.0);
        assertEquals(exit.before().velocity().getZ(), Double.parseDouble(row[13]), 0.0);
        assertEquals(exit.before().velocity().getNorm(), Double.parseDouble(row[14]), 0.0);
    }

    @Test
    void randomSamplesAreSeededAndThreadCountIndependent() throws IOException {
        Path f = Cli.write(dir, "random.json", sweepOf("{\"start.speed\": {\"from\": 0.3, \"to\": 1.3},"
            + " \"contact.static_friction\": {\"from\": 0.3, \"to\": 0.8}, \"random\": {\"samples\": 6, \"seed\": 11}}"));
        List<String> one = sweep(f, "r1", 1, false);
        List<String> two = sweep(f, "r2", 2, false);
        assertEquals(one, two);
        assertEquals(7, one.size());
        for (String row : one.subList(1, 7)) {
            String[] c = row.split(",", -1);
            double v = Double.parseDouble(c[1]);
            double mu = Double.parseDouble(c[2]);
            assertTrue(v >= 0.3 && v < 1.3 && mu >= 0.3 && mu < 0.8, row);
        }
    }

    @Test
    void oneParameterSweepWritesOneRowPerValue() throws IOException {
        // the demo's entry made 2 mm, 10 cm and 20 cm below the rim: only the first comes back out
        Path f = Cli.write(dir, "one.json", sweepOf("{\"start.position[2]\": [-0.002, -0.1, -0.2]}"));
        List<String> rows = sweep(f, "single", 2, false);
        assertEquals(4, rows.size());
        assertEquals("index,start.position[2],outcome,end_reason,exit_edge,end_time,exit_time,exit_x,exit_y,exit_z,"
            + "exit_vx,exit_vy,exit_vz,exit_speed,end_x,end_y,end_z,events,message", rows.get(0));
        assertTrue(rows.get(1).startsWith("0,-0.002,exit_to,exit,to,"), rows.get(1));
        assertTrue(rows.get(2).startsWith("1,-0.1,duration,duration,,0.5,"), rows.get(2));
        assertTrue(rows.get(3).startsWith("2,-0.2,duration,duration,,0.5,"), rows.get(3));
    }

    @Test
    void threeParametersGiveRowsWithoutAMap() throws IOException {
        Path f = Cli.write(dir, "three.json", sweepOf("{\"start.speed\": [0.9, 1.0], \"start.elevation_deg\": [-15],"
            + " \"contact.static_friction\": [0.4]}"));
        Path out = dir.resolve("three");
        Cli.Result r = Cli.run("sweep", f.toString(), "--out", out.toString(), "--no-progress", "--duration", "0.05");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("the regime map is drawn for one or two parameters only"), r.out());
        List<String> rows = Files.readAllLines(out.resolve("sweep.csv"));
        assertEquals(3, rows.size());
        assertTrue(rows.get(1).startsWith("0,0.9,-15.0,0.4,duration,duration,,0.05,"), "--duration 0.05 s: " + rows.get(1));
        assertTrue(Files.notExists(out.resolve("regime-map.png")));
    }

    @Test
    void aMissingEngineSaysHowToRunItAndWritesNothing() {
        Path f = Cli.write(dir, "spark.json", sweepOf("{\"start.speed\": [0.9, 1.0]}"));
        Path out = dir.resolve("spark-out");
        Cli.Result r = Cli.run("sweep", f.toString(), "--out", out.toString(), "--engine", "spark", "--master", "local[2]");
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains("no sweep engine named spark on the class path")
            && r.err().contains("java @benchmarks/spark/target/trundle-spark.args org.trundle.runner.Main sweep"), r.err());
        assertTrue(Files.notExists(out));
        Cli.Result mixed = Cli.run("sweep", f.toString(), "--out", out.toString(), "--partitions", "3");
        assertEquals(2, mixed.code(), mixed.err());
        assertTrue(mixed.err().contains("--master and --partitions go with --engine spark"), mixed.err());
    }
}
