package org.trundle.spark;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.Map;

import org.trundle.scenario.ScenarioException;
import org.trundle.scenario.ScenarioFiles;
import org.trundle.scenario.ScenarioPath;
import org.trundle.scenario.SweepEngine;
import org.trundle.scenario.SweepJob;

/**
 * Entry point for {@code spark-submit}:
 * {@code SCENARIO.json --out DIR_OR_URI [--partitions N] [--duration S] [--no-plot]} ({@code --no-plot}: no
 * {@code regime-map.png}). The scenario file is read
 * on the driver; the output may be any Hadoop file system URI ({@code hdfs://…}, {@code file:/…}).
 * The master comes from {@code spark-submit}. Exit codes as the runner's: 0 done, 1 the job failed,
 * 2 bad input.
 */
public final class SparkSweepMain {
    private SparkSweepMain() {
    }

    /**
     * @param args the arguments
     */
    public static void main(String[] args) {
        System.exit(run(args, System.out, System.err));
    }

    /**
     * @param args the arguments
     * @param out where the summary goes
     * @param err where errors go
     * @return the exit code
     */
    static int run(String[] args, PrintStream out, PrintStream err) {
        String scenario = null;
        String dir = null;
        int partitions = 0;
        Double duration = null;
        boolean picture = true;
        try {
            for (int i = 0; i < args.length; i++) {
                switch (args[i]) {
                    case "--out" -> dir = value(args, ++i, "--out");
                    case "--partitions" -> partitions = Integer.parseInt(value(args, ++i, "--partitions"));
                    case "--duration" -> duration = Double.valueOf(value(args, ++i, "--duration"));
                    case "--no-plot" -> picture = false;
                    default -> {
                        if (args[i].startsWith("-") || scenario != null) {
                            throw new ScenarioException("unexpected argument " + args[i] + "; usage: SCENARIO.json"
                                + " --out DIR_OR_URI [--partitions N] [--duration S] [--no-plot]");
                        }
                        scenario = args[i];
                    }
                }
            }
            if (scenario == null || dir == null) {
                throw new ScenarioException("usage: SCENARIO.json --out DIR_OR_URI [--partitions N] [--duration S] [--no-plot]");
            }
            var doc = ScenarioFiles.read(Path.of(scenario));
            if (duration != null) {
                doc = ScenarioPath.parse("run.duration").set(doc, duration);
            }
            SweepJob job = SweepJob.of(doc);
            SweepEngine.Report r = new SparkSweepEngine().run(job, dir, new SweepEngine.Options(null, partitions, picture));
            print(out, job, r);
            return 0;
        } catch (ScenarioException | NumberFormatException e) {
            err.println("trundle: " + e.getMessage());
            return 2;
        } catch (Exception e) {
            err.println("trundle: the sweep failed: " + e);
            return 1;
        }
    }

    private static String value(String[] args, int i, String option) {
        if (i >= args.length) {
            throw new ScenarioException(option + " needs a value");
        }
        return args[i];
    }

    /**
     * Prints the engine's summary lines.
     *
     * @param out where to
     * @param job the sweep
     * @param r what the engine did
     */
    static void print(PrintStream out, SweepJob job, SweepEngine.Report r) {
        StringBuilder b = new StringBuilder();
        for (Map.Entry<String, Long> e : r.outcomes().entrySet()) {
            b.append(b.length() == 0 ? "" : ", ").append(e.getKey()).append(' ').append(e.getValue());
        }
        out.println("Sweep:    " + r.runs() + " runs over " + String.join(", ", job.names()) + " on Spark");
        out.println("Outcomes: " + b);
        out.println("Files:    " + String.join(", ", r.files()));
    }
}
