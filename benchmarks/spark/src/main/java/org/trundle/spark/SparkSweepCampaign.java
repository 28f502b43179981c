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
 * <li>{@code memory N DURATION [local|cluster] [PARTITIONS]}: {@link SparkSweep#run} over N points of
 * DURATION s ({@link SparkSweep#defaultPartitions} unless PARTITIONS is given), sampled by a
 * {@link HeapProbe} every 2 s: the live heap (after a requested full collection) of this JVM, the
 * driver, and, with {@code cluster}, of the executor. {@code local} is {@code local[2]}: driver and
 * executors share this JVM, so its figure is the sum. {@code cluster} is Spark's
 * {@code local-cluster[1,2,1024]}: a master and a worker in this JVM and one executor of 2 cores and
 * 1,024 MB in a JVM of its own, so the driver's figure is the driver's (plus the small master and
 * worker); it needs the environment variable {@code SPARK_HOME} naming a folder with an empty
 * {@code jars} folder in it (the worker builds the executor's class path from there and from
 * {@code spark.executor.extraClassPath}, which the campaign sets to its own class path). Printed: the
 * peak per quarter of the run, the peak per phase (the Spark stages active at the sample) and the top
 * of the class histogram at each JVM's peak.</li>
 * </ul>
 * Run with the JVM options of {@code target/trundle-spark.args}:
 * {@code java @benchmarks/spark/target/trundle-spark.args org.trundle.spark.SparkSweepCampaign speed 100000}.
 */
public final class SparkSweepCampaign {
    private SparkSweepCampaign() {
    }

    /**
     * @param args {@code speed N} or {@code memory N DURATION [local|cluster] [PARTITIONS]}
     * @throws IOException when a scenario or output cannot be read or written
     */
    public static void main(String[] args) throws IOException {
        String mode = args.length > 0 ? args[0] : "speed";
        int n = args.length > 1 ? Integer.parseInt(args[1]) : 100_000;
        double duration = args.length > 2 ? Double.parseDouble(args[2]) : 0.2;
        boolean cluster = args.length > 3 && args[3].equals("cluster");
        int partitions = args.length > 4 ? Integer.parseInt(args[4]) : 0;
        SweepJob job = tube(n, duration);
        SparkSession.Builder builder = SparkSession.builder().appName("trundle spark campaign")
            .config("spark.ui.enabled", "false");
        if (cluster) {
            String home = System.getenv("SPARK_HOME");
            if (home == null || !Files.isDirectory(Path.of(home, "jars"))) {
                throw new IllegalStateException("memory ... cluster needs SPARK_HOME naming a folder with a jars folder"
                    + " in it (it may be empty), got SPARK_HOME=" + home);
            }
            builder = builder.master("local-cluster[1,2,1024]")
                .config("spark.executor.extraClassPath", System.getProperty("java.class.path"))
                .config("spark.executorEnv.SPARK_SCALA_VERSION", "2.13");
        } else {
            builder = builder.master("local[2]");
        }
        SparkSession spark = builder.getOrCreate();
        Path tmp = Files.createTempDirectory("trundle-spark-campaign");
        try {
            if (mode.equals("speed")) {
                speed(spark, job, tmp);
            } else {
                memory(spark, job, tmp, cluster, partitions);
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

    private static void memory(SparkSession spark, SweepJob job, Path tmp, boolean cluster, int partitions)
        throws IOException {
        int parts = partitions > 0 ? partitions : SparkSweep.defaultPartitions(spark, job.size());
        if (cluster) { // the executor JVM starts with the first job: wait for it, so the first samples see it
            spark.range(0, 1, 1, 1).count();
        }
        HeapProbe probe = new HeapProbe(spark.sparkContext().statusTracker(), 2000);
        Thread sampler = new Thread(probe, "heap-probe");
        sampler.setDaemon(true);
        long t0 = System.nanoTime();
        sampler.start();
        SparkSweep.run(spark, job, tmp.resolve("spark").toString(), parts);
        double t = (System.nanoTime() - t0) * 1e-9;
        probe.stop();
        try {
            sampler.join();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        // live heap per quarter of the run: flat means the same figure in every quarter
        double[] driver = new double[4];
        double[] executor = new double[4];
        for (HeapProbe.Sample sm : probe.samples()) {
            int q = (int) Math.min(3, 4 * sm.time() / t);
            driver[q] = Math.max(driver[q], sm.driver() / 1048576.0);
            executor[q] = Math.max(executor[q], sm.executor() / 1048576.0);
        }
        String mode = cluster ? "Spark local-cluster[1,2,1024]" : "Spark local[2]";
        System.out.printf(Locale.ROOT, "| %d points | %s, %d partitions | %.0f s | %s live heap per quarter of the run"
            + " %.0f / %.0f / %.0f / %.0f MB (max heap %.0f MB) |%n", job.size(), mode, parts, t,
            cluster ? "driver" : "driver + executor", driver[0], driver[1], driver[2], driver[3],
            Runtime.getRuntime().maxMemory() / 1048576.0);
        if (cluster) {
            System.out.printf(Locale.ROOT, "| %d points | %s, %d partitions | %.0f s | executor live heap per quarter"
                + " of the run %.0f / %.0f / %.0f / %.0f MB |%n", job.size(), mode, parts, t, executor[0], executor[1],
                executor[2], executor[3]);
        }
        for (var e : probe.peaksByPhase().entrySet()) {
            long[] p = e.getValue();
            System.out.printf(Locale.ROOT, "|   phase \"%s\" | driver%s %.0f MB%s |%n", e.getKey(),
                cluster ? "" : " + executor", p[0] / 1048576.0,
                p[1] >= 0 ? String.format(Locale.ROOT, " | executor %.0f MB", p[1] / 1048576.0) : "");
        }
        System.out.print(probe.peaks());
    }
}
