package org.trundle.spark;

import java.io.IOException;

import org.apache.hadoop.conf.Configuration;
import org.apache.spark.SparkConf;
import org.apache.spark.sql.SparkSession;
import org.trundle.scenario.ScenarioException;
import org.trundle.scenario.SweepEngine;
import org.trundle.scenario.SweepJob;

/**
 * The {@code spark} {@link SweepEngine}, found by the runner's {@code sweep --engine spark} through
 * {@link java.util.ServiceLoader} when this module and Spark are on the class path. It opens a
 * Spark session on the given master (or the one {@code spark-submit} configured), runs
 * {@link SparkSweep#run}, and stops the session if it opened it.
 *
 * <p>Default partitions: {@link SparkSweep#defaultPartitions}: 4 × Spark's default parallelism (the
 * cores of the cluster), so that slow points do not leave cores idle at the end, and more when needed
 * to keep each partition at most {@value SparkSweep#POINTS_PER_PARTITION} points (a task's memory
 * stays flat however large the sweep); at most one per point.
 */
public final class SparkSweepEngine implements SweepEngine {
    /** Created by the service loader. */
    public SparkSweepEngine() {
    }

    @Override
    public String name() {
        return "spark";
    }

    @Override
    public Report run(SweepJob job, String out, Options options) throws IOException {
        SparkConf conf = new SparkConf();
        String master = options.master();
        if (master == null && !conf.contains("spark.master")) {
            throw new ScenarioException("--master is needed outside spark-submit, e.g. --master local[2] (this machine,"
                + " 2 cores) or --master spark://HOST:7077");
        }
        if (out.indexOf(':') < 0 || out.startsWith("file:")) {
            SparkSweep.checkOutput(out, new Configuration()); // a local folder: refuse before starting Spark
        }
        SparkSession.Builder b = SparkSession.builder().appName("trundle sweep").config(conf);
        if (master != null) {
            b = b.master(master);
        }
        if ((master != null ? master : conf.get("spark.master")).startsWith("local")) {
            b = b.config("spark.ui.enabled", "false");
        }
        boolean existing = SparkSession.getActiveSession().isDefined();
        SparkSession spark = b.getOrCreate();
        try {
            int partitions = options.partitions() > 0 ? options.partitions()
                : SparkSweep.defaultPartitions(spark, job.size());
            return SparkSweep.run(spark, job, out, partitions, options.picture());
        } finally {
            if (!existing) {
                spark.stop();
            }
        }
    }
}
