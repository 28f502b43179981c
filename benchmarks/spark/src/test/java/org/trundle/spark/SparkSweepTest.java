package org.trundle.spark;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.stream.Stream;

import javax.imageio.ImageIO;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.apache.spark.scheduler.SparkListener;
import org.apache.spark.scheduler.SparkListenerTaskStart;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.SparkSession;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.trundle.core.sweep.ThreadedExecutor;
import org.trundle.report.SweepReport;
import org.trundle.scenario.Scenario;
import org.trundle.scenario.ScenarioFiles;
import org.trundle.scenario.SweepJob;
import org.trundle.scenario.SweepRow;

/**
 * Spark {@code local[2]} against the local-thread executor on the invented return-tube scenario
 * (benchmarks/scenarios): the same rows bit for bit whatever the partition count, the same
 * {@code sweep-report.html} byte for byte, a failed run as a row, and no complete-looking output
 * after a cancelled job. One session for the class.
 */
class SparkSweepTest {
    private static SparkSession spark;
    private static SweepJob tube;
    private static List<SweepRow> local;

    @TempDir
    Path dir;

    /** The return-tube scenario as a 2,000-point random sample over entry speed and angle, runs of 0.2 s. */
    static JsonNode returnTube(String sweep) throws IOException {
        ObjectNode doc = (ObjectNode) ScenarioFiles.read(Path.of("../scenarios/return-tube-sweep.json"));
        ((ObjectNode) doc.get("run")).put("duration", 0.2);
        doc.set("sweep", ScenarioFiles.parse(sweep));
        return doc;
    }

    @BeforeAll
    static void start() throws IOException {
        spark = SparkSession.builder().master("local[2]").appName("trundle-spark-test")
            .config("spark.ui.enabled", "false").config("spark.sql.shuffle.partitions", "4")
            .config("spark.sql.warehouse.dir", "target/spark-warehouse").getOrCreate();
        tube = SweepJob.of(returnTube("{\"start.speed\": {\"from\": 0.2, \"to\": 1.6},"
            + " \"start.elevation_deg\": {\"from\": -75, \"to\": -5}, \"random\": {\"samples\": 2000, \"seed\": 11}}"));
        local = new ArrayList<>();
        new ThreadedExecutor(2, null, null).execute(tube.space(), tube, local::add);
    }

    @AfterAll
    static void stop() {
        spark.stop();
    }

    private static void assertSameRows(List<SweepRow> expected, List<Row> actual) {
        assertEquals(expected.size(), actual.size());
        List<Row> sorted = new ArrayList<>(actual);
        sorted.sort(Comparator.comparingInt(r -> r.getInt(0)));
        for (int i = 0; i < expected.size(); i++) {
            Object[] e = expected.get(i).values();
            Object[] a = new Object[e.length];
            for (int c = 0; c < a.length; c++) {
                a[c] = sorted.get(i).get(c);
            }
            // Double.equals compares the bits: bit-identical figures
            assertArrayEquals(e, a, "row " + i);
        }
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 3, 7})
    void sparkRowsEqualTheLocalRowsBitForBit(int partitions) {
        assertEquals(2000, local.size());
        assertTrue(local.stream().map(SweepRow::outcome).distinct().count() >= 2, "the sample spans several outcomes");
        assertSameRows(local, SparkSweep.rows(spark, tube, partitions).collectAsList());
    }

    /**
     * The local engine's {@code sweep-report.html} of rows delivered in index order: what the runner's
     * {@code sweep} command writes (the same class, title and subtitle).
     */
    private static byte[] localReport(SweepJob job, List<SweepRow> rows, int most, Path file) throws IOException {
        SweepReport html = new SweepReport(job.names(), job.labels(), SweepRow.header(job.names()), most);
        rows.forEach(html::add);
        html.write(file, SweepReport.title(job.names(), job.size()),
            SweepReport.subtitle(Scenario.parse(job.document()).description()));
        return Files.readAllBytes(file);
    }

    @ParameterizedTest
    @ValueSource(ints = {3, 7})
    void writtenParquetCsvAndReportHoldTheLocalRowsInIndexOrder(int partitions) throws IOException {
        Path out = dir.resolve("tube");
        var report = SparkSweep.run(spark, tube, out.toString(), partitions);
        assertEquals(2000, report.runs());
        assertEquals(2000L, report.outcomes().values().stream().mapToLong(Long::longValue).sum());
        assertSameRows(local, spark.read().parquet(out.resolve("rows.parquet").toString()).collectAsList());
        assertNotNull(ImageIO.read(out.resolve("regime-map.png").toFile()));
        List<String> lines = new ArrayList<>();
        try (Stream<Path> parts = Files.list(out.resolve("sweep-csv"))) {
            for (Path p : parts.filter(p -> p.getFileName().toString().startsWith("part-")).sorted().toList()) {
                assertTrue(p.toString().endsWith(".csv"), p.toString());
                lines.addAll(Files.readAllLines(p));
            }
        }
        List<String> expect = new ArrayList<>();
        expect.add(SweepRow.header(tube.names()));
        local.forEach(r -> expect.add(r.csv()));
        assertEquals(expect, lines, "the CSV parts, concatenated in order, are the local sweep.csv");
        assertArrayEquals(localReport(tube, local, SweepReport.MAX_POINTS, dir.resolve("local.html")),
            Files.readAllBytes(out.resolve("sweep-report.html")), "sweep-report.html is the local engine's, byte for byte");
        assertTrue(spark.sparkContext().getPersistentRDDs().isEmpty(), "the rows kept on disk are dropped");
        try (Stream<Path> siblings = Files.list(dir)) {
            assertEquals(List.of(dir.resolve("local.html"), out), siblings.sorted().toList(),
                "no partial folder left beside the output");
        }
    }

    @Test
    void aFailedRunIsARowWithItsReasonNotAFailedJob() throws IOException {
        // balls of radius 14, 15 and 16 mm in a 15 mm bore: the two larger ones do not fit
        SweepJob job = SweepJob.of(returnTube("{\"ball.radius\": [0.004, 0.014, 0.015, 0.016]}"));
        List<Row> rows = SparkSweep.rows(spark, job, 2).collectAsList();
        List<SweepRow> expect = new ArrayList<>();
        new ThreadedExecutor(1, null, null).execute(job.space(), job, expect::add);
        assertSameRows(expect, rows);
        Row bad = rows.get(3);
        assertEquals("failed", bad.getAs("outcome"));
        String reason = bad.getAs("message");
        assertTrue(reason.contains("sweep point 3") && reason.contains("radius"), reason);
        assertFalse("failed".equals(rows.get(0).getAs("outcome")), rows.get(0).toString());
    }

    /**
     * The report's points with a cap of 3 on a one-parameter sweep (y is the end time) whose failed runs
     * have no end time: the first three runs that have a point, whatever the partition count, and the same
     * bytes as the local report with the same cap.
     */
    @ParameterizedTest
    @ValueSource(ints = {1, 3, 7})
    void theReportShowsTheFirstPlottedRowsByIndex(int partitions) throws IOException {
        // only the 4 mm ball starts in contact as the scenario asks (rolling at 4 mm from the wall); the
        // others are failed runs without an end time
        SweepJob job = SweepJob.of(returnTube("{\"ball.radius\": [0.004, 0.016, 0.005, 0.004, 0.014, 0.004, 0.004]}"));
        List<SweepRow> expect = new ArrayList<>();
        new ThreadedExecutor(1, null, null).execute(job.space(), job, expect::add);
        List<Integer> plotted = expect.stream().filter(r -> r.endTime().isPresent()).map(SweepRow::index).toList();
        assertEquals(List.of(0, 3, 5, 6), plotted, "runs 1, 2 and 4 fail");

        List<Integer> cut = new ArrayList<>();
        SparkSweep.reportRows(SparkSweep.rows(spark, job, partitions), 1, 3).collectAsList()
            .forEach(r -> cut.add(r.getInt(0)));
        assertEquals(plotted.subList(0, 3), cut.subList(0, 3), "the first three plotted runs lead, in index order");
        assertTrue(cut.size() <= 3 * partitions, "each partition gives at most three rows: " + cut);

        Path out = dir.resolve("radius");
        SparkSweep.run(spark, job, out.toString(), partitions, 3);
        assertArrayEquals(localReport(job, expect, 3, dir.resolve("local.html")),
            Files.readAllBytes(out.resolve("sweep-report.html")));
    }

    @Test
    void aCancelledJobLeavesNoOutputFolder() throws Exception {
        SweepJob slow = SweepJob.of(returnTube("{\"start.speed\": {\"from\": 0.2, \"to\": 1.6},"
            + " \"start.elevation_deg\": {\"from\": -75, \"to\": -5}, \"random\": {\"samples\": 200000, \"seed\": 3}}"));
        AtomicBoolean cancelled = new AtomicBoolean();
        SparkListener canceller = new SparkListener() {
            @Override
            public void onTaskStart(SparkListenerTaskStart taskStart) {
                if (cancelled.compareAndSet(false, true)) {
                    spark.sparkContext().cancelAllJobs();
                }
            }
        };
        spark.sparkContext().addSparkListener(canceller);
        Path out = dir.resolve("cancelled");
        try {
            assertThrows(Exception.class, () -> SparkSweep.run(spark, slow, out.toString(), 4));
        } finally {
            spark.sparkContext().removeSparkListener(canceller);
        }
        assertTrue(cancelled.get());
        assertFalse(Files.exists(out), "a cancelled job leaves no output folder");
        assertTrue(spark.sparkContext().getPersistentRDDs().isEmpty(), "nor rows kept on the executors' disks");
        try (Stream<Path> left = Files.list(dir)) {
            assertEquals(List.of(), left.toList(), "and no partial folder");
        }
    }
}
