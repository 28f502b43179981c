package org.trundle.runner;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import javax.imageio.ImageIO;

import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.trundle.scenario.ScenarioFiles;

/**
 * The runner's {@code sweep --engine spark}: found through the service loader with this module on
 * the class path, the Spark CSV parts equal the local {@code sweep.csv} line for line, and both
 * engines write the same {@code sweep-report.html} byte for byte.
 */
class SparkEngineCommandTest {
    @TempDir
    Path dir;

    private static String[] run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Main.execute(new PrintStream(out, true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8), args);
        return new String[] {Integer.toString(code), out.toString(StandardCharsets.UTF_8),
            err.toString(StandardCharsets.UTF_8)};
    }

    @Test
    void sparkEngineWritesTheLocalRows() throws IOException {
        ObjectNode doc = (ObjectNode) ScenarioFiles.read(Path.of("../scenarios/return-tube-sweep.json"));
        doc.set("sweep", ScenarioFiles.parse("{\"start.speed\": {\"from\": 0.2, \"to\": 1.6, \"count\": 8},"
            + " \"start.elevation_deg\": [-60, -15]}"));
        Path f = dir.resolve("tube.json");
        Files.writeString(f, doc.toString());
        String[] local = run("sweep", f.toString(), "--out", dir.resolve("local").toString(), "--no-progress",
            "--duration", "0.2");
        assertEquals("0", local[0], local[2]);
        Path full = dir.resolve("spark");
        Files.createDirectory(full);
        Files.writeString(full.resolve("keep.txt"), "not ours");
        String[] refused = run("sweep", f.toString(), "--out", full.toString(), "--engine", "spark",
            "--master", "local[2]");
        assertEquals("2", refused[0], refused[2]);
        assertTrue(refused[2].contains("is not empty"), refused[2]);
        String[] forced = run("sweep", f.toString(), "--out", full.toString(), "--engine", "spark",
            "--master", "local[2]", "--force");
        assertEquals("2", forced[0], forced[2]);
        assertTrue(forced[2].contains("--force goes with --engine local"), forced[2]);
        Files.delete(full.resolve("keep.txt")); // an empty folder is fine

        String[] spark = run("sweep", f.toString(), "--out", full.toString(), "--engine", "spark",
            "--master", "local[2]", "--partitions", "3", "--duration", "0.2");
        assertEquals("0", spark[0], spark[2]);
        assertTrue(spark[1].contains("16 runs over start.speed, start.elevation_deg on spark (local[2])"), spark[1]);
        List<String> expect = Files.readAllLines(dir.resolve("local/sweep.csv"));
        List<String> got = new ArrayList<>();
        try (Stream<Path> parts = Files.list(full.resolve("sweep-csv"))) {
            for (Path p : parts.filter(p -> p.getFileName().toString().startsWith("part-")).sorted().toList()) {
                got.addAll(Files.readAllLines(p));
            }
        }
        assertEquals(expect, got);
        assertNotNull(ImageIO.read(full.resolve("regime-map.png").toFile()));
        assertTrue(Files.isDirectory(full.resolve("rows.parquet")));
        assertArrayEquals(Files.readAllBytes(dir.resolve("local/sweep-report.html")),
            Files.readAllBytes(full.resolve("sweep-report.html")), "the same report whatever the engine");

        // --no-plot: no picture, everything else the same, as with the local engine
        Path plain = dir.resolve("spark-no-plot");
        String[] noPlot = run("sweep", f.toString(), "--out", plain.toString(), "--engine", "spark",
            "--master", "local[2]", "--partitions", "2", "--duration", "0.2", "--no-plot");
        assertEquals("0", noPlot[0], noPlot[2]);
        assertTrue(!Files.exists(plain.resolve("regime-map.png")), "--no-plot draws no regime-map.png");
        assertArrayEquals(Files.readAllBytes(dir.resolve("local/sweep-report.html")),
            Files.readAllBytes(plain.resolve("sweep-report.html")));
        assertTrue(Files.isDirectory(plain.resolve("sweep-csv")) && Files.isDirectory(plain.resolve("rows.parquet")));
    }
}
