package org.trundle.spark;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicLong;
import java.util.stream.Stream;

import com.fasterxml.jackson.databind.node.ObjectNode;
import org.apache.spark.sql.SparkSession;
import org.trundle.core.sweep.ThreadedExecutor;
import org.trundle.scenario.ScenarioFiles;
import org.trundle.scenario.SweepJob;
import org.trundle.scenario.SweepRow;

/**
 * Measurements (not tests) of the Spark engine on this machine, printed as Markdown lines:
 * <ul>
 * <li>{@code speed N}: N runs of 0.2 s of the invented return-tube scenario (a random sample over
 * entry speed and angle) on the local-thread executor (2 threads) and on Spark {@code local[2]},
 * both producing the same rows; wall time of the rows alone (local: rows counted; Spark: the
 * Dataset counted) and of the whole job with its outputs (local: {@code sweep.csv} written;
 * Spark: {@link SparkSweep#run}: Parquet, CSV and regime map).</li>
 * <li>{@code memory N DURATION}: {@link SparkSweep#run} over N points of DURATION s, with the
 * JVM's live heap (used heap right after a requested full collection) sampled every 2 s, its peak
 * printed per quarter of the run (flat: the same in every quarter); in
 * {@code local[2]} the driver and the executors share this JVM, so the peak bounds the driver's.</li>
 * </ul>
 * Run with the JVM options of {@code target/trundle-spark.args}:
 * {@code java @benchmarks/spark/target/trundle-spark.args org.trundle.spark.SparkSweepCampaign speed 100000}.
 */
public final class SparkSweepCampaign {
    private SparkSweepCampaign() {
    }

    /**
     * @param args {@code speed N} or {@code memory N DURATION}
     * @throws IOException when a scenario or output cannot be read or written
     */
    public static void main(String[] args) throws IOException {
        String mode = args.length > 0 ? args[0] : "speed";
        int n = args.length > 1 ? Integer.parseInt(args[1]) : 100_000;
        double duration = args.length > 2 ? Double.parseDouble(args[2]) : 0.2;
        SweepJob job = tube(n, duration);
        SparkSession spark = SparkSession.builder().master("local[2]").appName("trundle spark campaign")
            .config("spark.ui.enabled", "false").getOrCreate();
        Path tmp = Files.createTempDirectory("trundle-spark-campaign");
        try {
            if (mode.equals("speed")) {
                speed(spark, job, tmp);
            } else {
                memory(spark, job, tmp);
            }
        } finally {
            spark.stop();
            try (Stream<Path> all = Files.walk(tmp)) {
                all.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }

    /**
     * @param n number of points
     * @param duration simulated time per run (s)
     * @return the return-tube scenario as a random sample of n points
     */
    static SweepJob tube(int n, double duration) {
        ObjectNode doc = (ObjectNode) ScenarioFiles.read(Path.of(System.getProperty("trundle.scenario",
            "benchmarks/scenarios/return-tube-sweep.json")));
        ((ObjectNode) doc.get("run")).put("duration", duration);
        doc.set("sweep", ScenarioFiles.parse("{\"start.speed\": {\"from\": 0.2, \"to\": 1.6},"
            + " \"start.elevation_deg\": {\"from\": -75, \"to\": -5}, \"random\": {\"samples\": " + n
            + ", \"seed\": 2026}}"));
        return SweepJob.of(doc);
    }

    private static void speed(SparkSession spark, SweepJob job, Path tmp) throws IOException {
        int parts = SparkSweep.defaultPartitions(spark, job.size());
        SparkSweep.rows(spark, tube(200, 0.2), 2).count(); // warm both paths up
        new ThreadedExecutor(2, null, null).execute(tube(200, 0.2).space(), tube(200, 0.2), r -> { });

        AtomicLong sink = new AtomicLong();
        long t0 = System.nanoTime();
        new ThreadedExecutor(2, null, null).execute(job.space(), job, r -> sink.addAndGet(r.index()));
        double local = (System.nanoTime() - t0) * 1e-9;
        t0 = System.nanoTime();
        long count = SparkSweep.rows(spark, job, parts).count();
        double onSpark = (System.nanoTime() - t0) * 1e-9;

        t0 = System.nanoTime();
        try (var w = Files.newBufferedWriter(tmp.resolve("sweep.csv"))) {
            w.write(SweepRow.header(job.names()));
            w.write('\n');
            new ThreadedExecutor(2, null, null).execute(job.space(), job, r -> {
                try {
                    w.write(r.csv());
                    w.write('\n');
                } catch (IOException e) {
                    throw new java.io.UncheckedIOException(e);
                }
            });
        }
        double localFull = (System.nanoTime() - t0) * 1e-9;
        t0 = System.nanoTime();
        SparkSweep.run(spark, job, tmp.resolve("spark").toString(), parts);
        double sparkFull = (System.nanoTime() - t0) * 1e-9;
        System.out.printf(Locale.ROOT, "| %d runs of %.1f s | rows only | local 2 threads %.1f s | Spark local[2], %d"
            + " partitions %.1f s (%d rows) | ratio %.2f |%n", job.size(), 0.2, local, parts, onSpark, count,
            onSpark / local);
        System.out.printf(Locale.ROOT, "| %d runs of %.1f s | with outputs | local 2 threads + sweep.csv %.1f s |"
            + " Spark local[2] Parquet + CSV + map %.1f s | ratio %.2f |%n", job.size(), 0.2, localFull, sparkFull,
            sparkFull / localFull);
    }

    private static void memory(SparkSession spark, SweepJob job, Path tmp) throws IOException {
        var mem = ManagementFactory.getMemoryMXBean();
        java.util.List<long[]> samples = java.util.Collections.synchronizedList(new java.util.ArrayList<>());
        long t0 = System.nanoTime();
        Thread sampler = new Thread(() -> {
            while (!Thread.currentThread().isInterrupted()) {
                System.gc();
                samples.add(new long[] {System.nanoTime() - t0, mem.getHeapMemoryUsage().getUsed()});
                try {
                    Thread.sleep(2000);
                } catch (InterruptedException e) {
                    return;
                }
            }
        }, "heap-sampler");
        sampler.setDaemon(true);
        sampler.start();
        int parts = SparkSweep.defaultPartitions(spark, job.size());
        SparkSweep.run(spark, job, tmp.resolve("spark").toString(), parts);
        sampler.interrupt();
        double t = (System.nanoTime() - t0) * 1e-9;
        // live heap per quarter of the run: flat means the same figure in every quarter
        double[] quarter = new double[4];
        synchronized (samples) {
            for (long[] sm : samples) {
                int q = (int) Math.min(3, 4 * (sm[0] * 1e-9) / t);
                quarter[q] = Math.max(quarter[q], sm[1] / 1048576.0);
            }
        }
        System.out.printf(Locale.ROOT, "| %d points | Spark local[2], %d partitions | %.0f s | peak live heap per quarter"
            + " of the run %.0f / %.0f / %.0f / %.0f MB (max heap %.0f MB) |%n", job.size(), parts, t, quarter[0],
            quarter[1], quarter[2], quarter[3], Runtime.getRuntime().maxMemory() / 1048576.0);
    }
}
