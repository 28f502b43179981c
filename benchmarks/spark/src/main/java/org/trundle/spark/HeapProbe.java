package org.trundle.spark;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeSet;

import javax.management.ObjectName;

import org.apache.spark.SparkStageInfo;
import org.apache.spark.SparkStatusTracker;

/**
 * Samples live heap while a Spark job runs: a measuring aid of {@link SparkSweepCampaign}, not part of
 * the engine.
 *
 * <p>Every {@code period} the probe requests a full collection in this JVM (the driver) and reads its
 * used heap, which right after a full collection is the live heap in bytes (plus the collector's region
 * slack); when an executor runs in a JVM of its own ({@code local-cluster} master, a child process of
 * this one) it asks that JVM for a class histogram ({@code jcmd PID GC.class_histogram}, which runs a
 * full collection first) and takes its total bytes. Each sample is labelled with the names of the
 * Spark stages then active ({@link SparkSweep#STAGE_ROWS} and its siblings), or "no stage running"
 * (planning, writing the regime map's picture). At each new peak it keeps the top of the class
 * histogram, so the report can say what the peak is made of.
 */
final class HeapProbe implements Runnable {
    /** One sample: time since start (s), driver and executor live heap (bytes; executor −1 if none), phase. */
    record Sample(double time, long driver, long executor, String phase) {
    }

    private static final int TOP = 12;
    private static final double MIB = 1048576.0;

    private final SparkStatusTracker status;
    private final long periodMillis;
    private final long start = System.nanoTime();
    private final List<Sample> samples = new ArrayList<>();
    private volatile boolean stop;
    private long driverPeak = -1;
    private long executorPeak = -1;
    private String driverTop = "";
    private String executorTop = "";
    private String driverPeakPhase = "";
    private String executorPeakPhase = "";

    HeapProbe(SparkStatusTracker status, long periodMillis) {
        this.status = status;
        this.periodMillis = periodMillis;
    }

    @Override
    public void run() {
        while (!stop) {
            String phase = phase();
            System.gc();
            long driver = ManagementFactory.getMemoryMXBean().getHeapMemoryUsage().getUsed();
            long executor = -1;
            String executorHistogram = null;
            long pid = executorPid();
            if (pid > 0) {
                executorHistogram = jcmdHistogram(pid);
                executor = total(executorHistogram);
            }
            synchronized (this) {
                samples.add(new Sample((System.nanoTime() - start) * 1e-9, driver, executor, phase));
                if (driver > driverPeak) {
                    driverPeak = driver;
                    driverPeakPhase = phase;
                    driverTop = top(selfHistogram());
                }
                if (executor > executorPeak) {
                    executorPeak = executor;
                    executorPeakPhase = phase;
                    executorTop = top(executorHistogram);
                }
            }
            try {
                Thread.sleep(periodMillis);
            } catch (InterruptedException e) {
                return;
            }
        }
    }

    /** Stops sampling after the sample in progress. */
    void stop() {
        stop = true;
    }

    /** @return the samples so far, in time order */
    synchronized List<Sample> samples() {
        return List.copyOf(samples);
    }

    /**
     * The peak of each phase, in order of first appearance.
     *
     * @return phase → {driver peak, executor peak} in bytes (executor −1 when not sampled)
     */
    synchronized Map<String, long[]> peaksByPhase() {
        Map<String, long[]> m = new LinkedHashMap<>();
        for (Sample s : samples) {
            long[] p = m.computeIfAbsent(s.phase(), k -> new long[] {-1, -1});
            p[0] = Math.max(p[0], s.driver());
            p[1] = Math.max(p[1], s.executor());
        }
        return m;
    }

    /** @return a Markdown block: what the driver's and the executor's peaks are made of */
    synchronized String peaks() {
        StringBuilder b = new StringBuilder();
        b.append(String.format(Locale.ROOT, "driver peak %.0f MB during \"%s\"; top of its class histogram:%n",
            driverPeak / MIB, driverPeakPhase)).append(driverTop);
        if (executorPeak >= 0) {
            b.append(String.format(Locale.ROOT, "executor peak %.0f MB during \"%s\"; top of its class histogram:%n",
                executorPeak / MIB, executorPeakPhase)).append(executorTop);
        }
        return b.toString();
    }

    private String phase() {
        TreeSet<String> names = new TreeSet<>();
        for (int id : status.getActiveStageIds()) {
            scala.Option<SparkStageInfo> info = status.getStageInfo(id);
            if (info.isDefined()) {
                names.add(info.get().name());
            }
        }
        return names.isEmpty() ? "no stage running" : String.join(" + ", names);
    }

    /** The executor's JVM: a java child process of this one (local-cluster's worker starts it), else −1. */
    private static long executorPid() {
        return ProcessHandle.current().descendants()
            .filter(p -> p.info().command().map(c -> c.endsWith("/java")).orElse(false))
            .mapToLong(ProcessHandle::pid).findFirst().orElse(-1);
    }

    private static String jcmdHistogram(long pid) {
        Path jcmd = Path.of(System.getProperty("java.home"), "bin", "jcmd");
        try {
            Process p = new ProcessBuilder(Files.isExecutable(jcmd) ? jcmd.toString() : "jcmd",
                Long.toString(pid), "GC.class_histogram").redirectErrorStream(true).start();
            String text = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            return p.waitFor() == 0 ? text : null;
        } catch (IOException e) {
            return null;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return null;
        }
    }

    private static String selfHistogram() {
        try {
            return (String) ManagementFactory.getPlatformMBeanServer().invoke(
                new ObjectName("com.sun.management:type=DiagnosticCommand"), "gcClassHistogram",
                new Object[] {new String[0]}, new String[] {String[].class.getName()});
        } catch (javax.management.JMException e) {
            return null;
        }
    }

    /** The total bytes of a class histogram (its last line, {@code Total COUNT BYTES}), or −1. */
    private static long total(String histogram) {
        if (histogram == null) {
            return -1;
        }
        for (String line : histogram.split("\n")) {
            String t = line.trim();
            if (t.startsWith("Total")) {
                String[] f = t.split("\\s+");
                return Long.parseLong(f[f.length - 1]);
            }
        }
        return -1;
    }

    /** The first {@value #TOP} classes of a histogram as indented lines: bytes (MB), instances, class. */
    private static String top(String histogram) {
        if (histogram == null) {
            return "    (no histogram)\n";
        }
        StringBuilder b = new StringBuilder();
        int k = 0;
        for (String line : histogram.split("\n")) {
            String[] f = line.trim().split("\\s+");
            if (f.length >= 4 && f[0].endsWith(":") && k < TOP) {
                b.append(String.format(Locale.ROOT, "    %8.1f MB %10s  %s%n", Long.parseLong(f[2]) / MIB, f[1], f[3]));
                k++;
            }
        }
        return b.toString();
    }
}
