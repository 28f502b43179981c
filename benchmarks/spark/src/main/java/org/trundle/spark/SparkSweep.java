package org.trundle.spark;

import java.io.IOException;
import java.nio.file.Files;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.UUID;

import org.apache.hadoop.conf.Configuration;
import org.apache.hadoop.fs.FileStatus;
import org.apache.hadoop.fs.FileSystem;
import org.apache.hadoop.fs.Path;
import org.apache.spark.SparkContext;
import org.apache.spark.TaskContext;
import org.apache.spark.api.java.function.FilterFunction;
import org.apache.spark.api.java.function.MapPartitionsFunction;
import org.apache.spark.sql.Column;
import org.apache.spark.sql.Dataset;
import org.apache.spark.sql.Encoders;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.RowFactory;
import org.apache.spark.sql.SparkSession;
import org.apache.spark.sql.functions;
import org.apache.spark.sql.types.DataType;
import org.apache.spark.sql.types.DataTypes;
import org.apache.spark.sql.types.StructField;
import org.apache.spark.sql.types.StructType;
import org.apache.spark.storage.StorageLevel;
import org.trundle.core.sweep.ParameterSpace;
import org.trundle.report.RegimeMap;
import org.trundle.report.SweepReport;
import org.trundle.scenario.Scenario;
import org.trundle.scenario.ScenarioException;
import org.trundle.scenario.SweepEngine;
import org.trundle.scenario.SweepJob;
import org.trundle.scenario.SweepRow;

/**
 * Runs a {@link SweepJob} on Apache Spark and writes its rows.
 *
 * <p><b>Work.</b> The point indices {@code 0 … n−1} are split into {@code partitions} contiguous
 * ranges ({@code SparkSession.range}); each task re-parses the scenario from its JSON text, runs its
 * points one after another and reduces each run to its {@link SweepRow} on the spot ({@link
 * SweepJob#run}, the code the local threads run), streaming the rows into a Dataset. A failed run
 * is a row with outcome {@code failed} and its reason, never a failed task. A task that Spark
 * cancels gives up its run in flight at the next output sample.
 *
 * <p><b>Outputs</b>, under the output folder: {@code rows.parquet/} (the rows, one file per
 * partition), {@code sweep-csv/} (the same rows as {@link SweepRow#csv()} lines, part files in index
 * order, the header at the top of the first: concatenated, they are the local {@code sweep.csv} byte
 * for byte), {@code regime-map.png} (for one or two parameters) and {@code sweep-report.html} (the
 * {@link SweepReport}: the same bytes as the local engine's for the same sweep). The computed rows are kept on the
 * executors' local disks ({@code persist(DISK_ONLY)}, dropped at the end) while the Parquet files and
 * then the CSV are written from them, partition by partition: each partition is a contiguous index
 * range in order, so the CSV needs no shuffle or sort, and each point runs once (a lost executor's
 * partitions are recomputed, with the same rows). The outcome counts and the regime map are Spark
 * aggregations over the Parquet rows. The driver holds only aggregates: the outcome counts and, for
 * the regime map, one marker per run up to {@value #EXACT_MAP} runs, else one per outcome and cell of
 * a {@value #CELLS}×{@value #CELLS} lattice over the parameter ranges (a {@code groupBy} on the
 * cells), streamed to it a partition at a time; and, for the report, the first
 * {@value SweepReport#MAX_POINTS} plotted rows by index ({@link #reportRows}: taken from the kept
 * rows a partition at a time in index order, each partition cut on its executor to its first
 * {@value SweepReport#MAX_POINTS} plotted rows, so the driver holds at most that many rows of one
 * partition at a time and no later partition is read once the report is full).
 *
 * <p><b>Completeness.</b> Everything is written into a sibling folder
 * {@code <out>.partial-<id>} which is renamed to {@code <out>} in one step at the end (atomic on a
 * local file system and HDFS; not on object stores, where the rename is a copy). A failed or
 * cancelled job deletes the partial folder when it can; if the driver is killed it stays, named
 * {@code .partial-}; so a folder named {@code <out>} is always complete.
 *
 * <p><b>Stage names.</b> The jobs of each step carry a readable call site ({@link #STAGE_ROWS},
 * {@link #STAGE_CSV}, {@link #STAGE_REPORT}, {@link #STAGE_COUNTS}, {@link #STAGE_MAP}) as their name in Spark's status
 * and user interface; the caller's call site is restored afterwards.
 */
public final class SparkSweep {
    /** Largest sweep whose regime map gets one marker per run. */
    public static final int EXACT_MAP = 20_000;
    /** Cells per axis of the regime-map lattice of larger sweeps. */
    public static final int CELLS = 250;
    /**
     * Most points per partition when the partition count is not given: a task's output files, its
     * share of the rows kept on disk and the work redone when it is retried stay bounded however large
     * the sweep (a task streams its rows and never holds its partition in memory).
     */
    public static final int POINTS_PER_PARTITION = 20_000;

    /**
     * The default partition count: {@code max(4 p, ⌈n / }{@value #POINTS_PER_PARTITION}{@code ⌉)} with
     * {@code p} Spark's default parallelism (the cluster's cores), at most one per point. Four per core
     * keep cores busy at the end when some points are slow; the size bound keeps each task's files and
     * retries bounded however large the sweep.
     *
     * @param spark the session
     * @param n number of points
     * @return the partition count, at least 1
     */
    public static int defaultPartitions(SparkSession spark, int n) {
        int byCores = 4 * spark.sparkContext().defaultParallelism();
        int bySize = (int) ((n + (long) POINTS_PER_PARTITION - 1) / POINTS_PER_PARTITION);
        return Math.max(1, Math.min(Math.max(byCores, bySize), Math.max(n, 1)));
    }

    /** Name of the Spark jobs and stages that run the points and write the Parquet rows. */
    public static final String STAGE_ROWS = "trundle sweep: runs to Parquet";
    /** Name of the Spark jobs and stages that write the CSV in index order (range partitioning, sort). */
    public static final String STAGE_CSV = "trundle sweep: CSV in index order";
    /** Name of the Spark jobs and stages that take the report's first rows. */
    public static final String STAGE_REPORT = "trundle sweep: report points";
    /** Name of the Spark jobs and stages that count the outcomes. */
    public static final String STAGE_COUNTS = "trundle sweep: outcome counts";
    /** Name of the Spark jobs and stages that aggregate the regime map's markers. */
    public static final String STAGE_MAP = "trundle sweep: regime map";

    private static final String CALL_SITE_SHORT = "callSite.short";
    private static final String CALL_SITE_LONG = "callSite.long";

    private SparkSweep() {
    }

    /**
     * The Spark schema of a sweep's rows: {@link SweepRow#columns} with their kinds (int, double,
     * string), all nullable.
     *
     * @param names parameter names
     * @return the schema
     */
    public static StructType schema(List<String> names) {
        List<String> cols = SweepRow.columns(names);
        List<SweepRow.Kind> kinds = SweepRow.kinds(names.size());
        StructField[] f = new StructField[cols.size()];
        for (int i = 0; i < f.length; i++) {
            DataType t = switch (kinds.get(i)) {
                case INT -> DataTypes.IntegerType;
                case DOUBLE -> DataTypes.DoubleType;
                case TEXT -> DataTypes.StringType;
            };
            f[i] = DataTypes.createStructField(cols.get(i), t, i != 0);
        }
        return DataTypes.createStructType(f);
    }

    /**
     * The rows of a sweep as a Dataset, computed lazily by the executors.
     *
     * @param spark the session
     * @param job the sweep
     * @param partitions number of partitions, at least 1
     * @return the rows, partition {@code k} holding a contiguous range of indices in order
     */
    public static Dataset<Row> rows(SparkSession spark, SweepJob job, int partitions) {
        if (partitions < 1) {
            throw new ScenarioException("--partitions must be at least 1, got " + partitions);
        }
        int n = job.size();
        MapPartitionsFunction<Long, Row> work = indices -> {
            TaskContext task = TaskContext.get();
            ParameterSpace space = job.space();
            return new Iterator<>() {
                @Override
                public boolean hasNext() {
                    return indices.hasNext();
                }

                @Override
                public Row next() {
                    if (!indices.hasNext()) {
                        throw new NoSuchElementException();
                    }
                    int i = Math.toIntExact(indices.next());
                    SweepRow r = job.run(space.point(i), () -> task != null && task.isInterrupted());
                    if (r == null) {
                        throw new IllegalStateException("sweep task cancelled at point " + i);
                    }
                    return RowFactory.create(r.values());
                }
            };
        };
        return spark.range(0, n, 1, Math.min(partitions, Math.max(n, 1)))
            .mapPartitions(work, Encoders.row(schema(job.names())));
    }

    /**
     * Runs the sweep and writes its outputs (see the class comment).
     *
     * @param spark the session
     * @param job the sweep
     * @param out output folder (path or URI of any Hadoop file system); it must not exist or be empty
     * @param partitions number of partitions, at least 1
     * @return what was written
     * @throws IOException when the outputs cannot be written
     */
    public static SweepEngine.Report run(SparkSession spark, SweepJob job, String out, int partitions)
        throws IOException {
        return run(spark, job, out, partitions, SweepReport.MAX_POINTS, true);
    }

    /**
     * {@link #run(SparkSession, SweepJob, String, int)}, drawing {@code regime-map.png} or not ({@code --no-plot}).
     *
     * @param spark the session
     * @param job the sweep
     * @param out output folder (path or URI of any Hadoop file system); it must not exist or be empty
     * @param partitions number of partitions, at least 1
     * @param picture whether to draw the regime map's picture
     * @return what was written
     * @throws IOException when the outputs cannot be written
     */
    public static SweepEngine.Report run(SparkSession spark, SweepJob job, String out, int partitions, boolean picture)
        throws IOException {
        return run(spark, job, out, partitions, SweepReport.MAX_POINTS, picture);
    }

    /**
     * {@link #run(SparkSession, SweepJob, String, int)} with the report's most points given (tests).
     *
     * @param spark the session
     * @param job the sweep
     * @param out output folder
     * @param partitions number of partitions, at least 1
     * @param reportPoints most runs shown as points in {@code sweep-report.html}
     * @return what was written
     * @throws IOException when the outputs cannot be written
     */
    static SweepEngine.Report run(SparkSession spark, SweepJob job, String out, int partitions, int reportPoints)
        throws IOException {
        return run(spark, job, out, partitions, reportPoints, true);
    }

    private static SweepEngine.Report run(SparkSession spark, SweepJob job, String out, int partitions,
        int reportPoints, boolean picture) throws IOException {
        Path target = checkOutput(out, spark.sparkContext().hadoopConfiguration());
        FileSystem fs = target.getFileSystem(spark.sparkContext().hadoopConfiguration());
        Path partial = new Path(target.getParent(), target.getName() + ".partial-" + UUID.randomUUID());
        boolean done = false;
        try {
            Map<String, Long> counts = write(spark, job, partial, partitions, reportPoints, picture, fs);
            if (fs.exists(target)) {
                fs.delete(target, false); // the empty folder
            }
            if (!fs.rename(partial, target)) {
                throw new IOException("cannot rename " + partial + " to " + target);
            }
            done = true;
            List<String> files = new ArrayList<>();
            for (FileStatus s : fs.listStatus(target)) {
                files.add(s.getPath().toString());
            }
            files.sort(null);
            return new SweepEngine.Report(job.size(), counts, files);
        } finally {
            if (!done) {
                try {
                    fs.delete(partial, true);
                } catch (IOException | RuntimeException e) {
                    // best effort: the folder's name says it is partial
                }
            }
        }
    }

    /**
     * Checks that the output location is new or an empty folder.
     *
     * @param out output folder (path or URI)
     * @param conf Hadoop configuration
     * @return the location, qualified
     * @throws IOException when the file system cannot be read
     * @throws ScenarioException when it exists and is not an empty folder
     */
    public static Path checkOutput(String out, Configuration conf) throws IOException {
        Path target = new Path(out);
        FileSystem fs = target.getFileSystem(conf);
        target = fs.makeQualified(target);
        if (fs.exists(target) && (!fs.getFileStatus(target).isDirectory() || fs.listStatus(target).length > 0)) {
            throw new ScenarioException("--out " + out + " must not exist or be an empty folder for the spark engine,"
                + " which writes a complete folder in one step");
        }
        return target;
    }

    private static Map<String, Long> write(SparkSession spark, SweepJob job, Path folder, int partitions,
        int reportPoints, boolean picture, FileSystem fs) throws IOException {
        SparkContext sc = spark.sparkContext();
        String shortSite = sc.getLocalProperty(CALL_SITE_SHORT);
        String longSite = sc.getLocalProperty(CALL_SITE_LONG);
        try {
            return stages(spark, job, folder, partitions, reportPoints, picture, fs);
        } finally {
            sc.setLocalProperty(CALL_SITE_SHORT, shortSite);
            sc.setLocalProperty(CALL_SITE_LONG, longSite);
        }
    }

    private static Map<String, Long> stages(SparkSession spark, SweepJob job, Path folder, int partitions,
        int reportPoints, boolean picture, FileSystem fs) throws IOException {
        SparkContext sc = spark.sparkContext();
        sc.setCallSite(STAGE_ROWS);
        String parquet = new Path(folder, "rows.parquet").toString();
        Dataset<Row> computed = rows(spark, job, partitions).persist(StorageLevel.DISK_ONLY());
        List<String> names = job.names();
        SweepReport report = new SweepReport(names, job.labels(), SweepRow.header(names), reportPoints);
        try {
            computed.write().parquet(parquet);
            sc.setCallSite(STAGE_CSV);
            writeCsv(computed, job, new Path(folder, "sweep-csv"), fs);
            sc.setCallSite(STAGE_REPORT);
            Iterator<Row> shown = reportRows(computed, names.size(), reportPoints).toLocalIterator();
            while (!report.full() && shown.hasNext()) {
                report.show(values(shown.next()));
            }
        } finally {
            computed.unpersist(false);
        }
        Dataset<Row> rows = spark.read().schema(schema(job.names())).parquet(parquet);
        sc.setCallSite(STAGE_COUNTS);
        Map<String, Long> counts = new LinkedHashMap<>();
        for (Row r : rows.groupBy("outcome").count().orderBy("outcome").collectAsList()) {
            counts.put(r.getString(0), r.getLong(1));
            report.count(r.getString(0), r.getLong(1));
        }
        String title = SweepReport.title(names, job.size());
        copyIn(fs, new Path(folder, "sweep-report.html"), "sweep-report", ".html",
            f -> report.write(f, title, SweepReport.subtitle(Scenario.parse(job.document()).description())));
        if (picture && names.size() <= 2) {
            sc.setCallSite(STAGE_MAP);
            RegimeMap map = new RegimeMap(names, job.labels());
            Column x = rows.col(quote(names.get(0)));
            Column y = names.size() > 1 ? rows.col(quote(names.get(1))) : rows.col("end_time");
            Dataset<Row> pts = rows.where(y.isNotNull()).select(rows.col("outcome"), x.as("x"), y.as("y"),
                rows.col("index"));
            if (job.size() > EXACT_MAP) {
                pts = lattice(pts);
            }
            Iterator<Row> it = pts.orderBy("index").toLocalIterator();
            while (it.hasNext()) {
                Row r = it.next();
                map.add(r.getString(0), r.getDouble(1), r.getDouble(2));
            }
            copyIn(fs, new Path(folder, "regime-map.png"), "trundle-regime-map", ".png",
                f -> map.write(f, title, job.spec().random()));
        }
        return counts;
    }

    /** Writes a file on the driver's disk and moves it to the output's file system. */
    private static void copyIn(FileSystem fs, Path to, String prefix, String suffix, LocalWriter writer)
        throws IOException {
        java.nio.file.Path local = Files.createTempFile(prefix, suffix);
        try {
            writer.write(local);
            fs.copyFromLocalFile(true, true, new Path(local.toUri()), to);
        } finally {
            Files.deleteIfExists(local);
        }
    }

    /** Writes one local file. */
    private interface LocalWriter {
        void write(java.nio.file.Path file) throws IOException;
    }

    /**
     * The rows {@code sweep-report.html} shows as points, for a Dataset whose partitions are contiguous
     * index ranges in order (as {@link #rows} makes them): in each partition, its first {@code most} rows that
     * {@link SweepReport#plotted have a point}. Read a partition at a time ({@code toLocalIterator}) until
     * {@code most} rows are read, they are the sweep's first {@code most} plotted rows by index, and the
     * driver holds at most one partition's {@code most} rows at a time; partitions after the report is full
     * are never read.
     *
     * @param rows the rows, partitions in index order
     * @param parameters number of parameters
     * @param most most rows per partition, at least 0
     * @return the rows, in index order within each partition
     */
    static Dataset<Row> reportRows(Dataset<Row> rows, int parameters, int most) {
        FilterFunction<Row> plotted = r -> SweepReport.plotted(values(r), parameters);
        MapPartitionsFunction<Row, Row> first = it -> new Iterator<>() {
            private int taken;

            @Override
            public boolean hasNext() {
                return taken < most && it.hasNext();
            }

            @Override
            public Row next() {
                if (!hasNext()) {
                    throw new NoSuchElementException();
                }
                taken++;
                return it.next();
            }
        };
        return rows.filter(plotted).mapPartitions(first, Encoders.row(rows.schema()));
    }

    /** A Spark row's values in column order, as {@link SweepRow#values()} gives them. */
    private static Object[] values(Row r) {
        Object[] v = new Object[r.length()];
        for (int c = 0; c < v.length; c++) {
            v[c] = r.get(c);
        }
        return v;
    }

    /**
     * Writes the rows as CSV lines, one part file per partition; the rows' partitions are contiguous index
     * ranges in order, so the part files are in index order with no shuffle or sort.
     */
    private static void writeCsv(Dataset<Row> rows, SweepJob job, Path csv, FileSystem fs) throws IOException {
        int np = job.names().size();
        String header = SweepRow.header(job.names());
        MapPartitionsFunction<Row, String> toCsv = it -> {
            boolean first = TaskContext.getPartitionId() == 0;
            return new Iterator<>() {
                private boolean headerDue = first;

                @Override
                public boolean hasNext() {
                    return headerDue || it.hasNext();
                }

                @Override
                public String next() {
                    if (headerDue) {
                        headerDue = false;
                        return header;
                    }
                    return SweepRow.csv(values(it.next()), np);
                }
            };
        };
        rows.mapPartitions(toCsv, Encoders.STRING()).write().text(csv.toString());
        for (FileStatus f : fs.listStatus(csv)) {
            String name = f.getPath().getName();
            if (name.startsWith("part-") && name.endsWith(".txt")) {
                fs.rename(f.getPath(), new Path(csv, name.substring(0, name.length() - 4) + ".csv"));
            }
        }
    }

    /** One point per outcome and lattice cell (at the cell's centre), ordered by its first run. */
    private static Dataset<Row> lattice(Dataset<Row> pts) {
        Row r = pts.agg(functions.min("x"), functions.max("x"), functions.min("y"), functions.max("y")).first();
        if (r.isNullAt(0)) {
            return pts;
        }
        Column cx = cell(pts.col("x"), r.getDouble(0), r.getDouble(1)).as("x");
        Column cy = cell(pts.col("y"), r.getDouble(2), r.getDouble(3)).as("y");
        return pts.groupBy(pts.col("outcome"), cx, cy).agg(functions.min("index").as("index"))
            .select("outcome", "x", "y", "index");
    }

    private static Column cell(Column v, double lo, double hi) {
        if (!(hi > lo)) {
            return functions.lit(lo);
        }
        double w = (hi - lo) / CELLS;
        Column k = functions.least(functions.floor(v.minus(lo).divide(w)), functions.lit(CELLS - 1));
        return k.plus(0.5).multiply(w).plus(lo);
    }

    private static String quote(String name) {
        return "`" + name.replace("`", "``") + "`";
    }
}
