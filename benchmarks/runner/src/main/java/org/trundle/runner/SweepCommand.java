package org.trundle.runner;

import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.ServiceLoader;
import java.util.TreeMap;
import java.util.concurrent.Callable;

import com.fasterxml.jackson.databind.JsonNode;
import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;
import org.trundle.core.sweep.ParameterSpace;
import org.trundle.core.sweep.SweepExecutor;
import org.trundle.core.sweep.ThreadedExecutor;
import org.trundle.core.sweep.SweepSummary;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import org.trundle.scenario.Scenario;
import org.trundle.scenario.ScenarioFiles;
import org.trundle.scenario.SweepEngine;
import org.trundle.scenario.SweepJob;
import org.trundle.report.RegimeMap;
import org.trundle.report.SweepReport;
import org.trundle.scenario.ScenarioException;

/** {@code trundle sweep SCENARIO.json --out DIR}: the runs of a scenario's sweep section. */
@Command(name = "sweep", mixinStandardHelpOptions = true,
    description = {"Runs the scenario once per point of its sweep section, in parallel, and writes sweep.csv (one row"
        + " per run, the same rows on any thread count), regime-map.png and sweep-report.html (the regime map in a"
        + " browser: click a point for its run's row) into --out."})
final class SweepCommand implements Callable<Integer>, Main.ErrStream {
    @Parameters(index = "0", paramLabel = "SCENARIO.json", description = "scenario file with a sweep section (JSON; SI)")
    Path scenario;

    @Option(names = "--out", paramLabel = "DIR", required = true,
        description = "output folder (created; must be empty unless --force)")
    Path out;

    @Option(names = "--force", description = "write into a non-empty --out folder, replacing the runner's files")
    boolean force;

    @Option(names = "--threads", paramLabel = "N", description = "worker threads (default: all ${sys:trundle.cores} cores)")
    Integer threads;

    @Option(names = "--no-progress", description = "do not draw the progress bar")
    boolean noProgress;

    @Option(names = "--engine", paramLabel = "NAME", defaultValue = "local",
        description = "where the runs go: local (threads of this JVM, default) or spark (Apache Spark; needs the"
            + " trundle-spark module and Spark on the class path, see the README)")
    String engine;

    @Option(names = "--master", paramLabel = "URL",
        description = "with --engine spark: the Spark master, e.g. local[2] or spark://HOST:7077")
    String master;

    @Option(names = "--partitions", paramLabel = "N",
        description = "with --engine spark: number of parts the points are split into (default 4 per core)")
    Integer partitions;

    @Option(names = "--duration", paramLabel = "SECONDS",
        description = "simulated time per run in seconds (s), replacing run.duration")
    Double duration;

    @Option(names = "--no-plot", description = "draw no picture (regime-map.png); sweep.csv is the same")
    boolean noPlot;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    private PrintStream err = System.err;

    static {
        System.setProperty("trundle.cores", Integer.toString(Runtime.getRuntime().availableProcessors()));
    }

    /** Created by picocli. */
    SweepCommand() {
    }

    @Override
    public void errStream(PrintStream e) {
        this.err = e;
    }

    @Override
    public Integer call() throws Exception {
        int n = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
        if (n < 1) {
            throw new ScenarioException("--threads must be at least 1, got " + n);
        }
        OutputFolder.check(out, force); // before the points are checked: that may take a while
        JsonNode doc = RunCommand.override(ScenarioFiles.read(scenario), duration, null);
        RunOutputs.warn(spec.commandLine().getErr(), Scenario.parse(doc));
        SweepJob job = SweepJob.of(doc);
        if (!engine.equals("local")) {
            return distributed(job);
        }
        if (master != null || partitions != null) {
            throw new ScenarioException("--master and --partitions go with --engine spark, not with --engine local");
        }
        ParameterSpace space = job.space();
        for (int i = 0; i < space.size(); i++) {
            job.scenario(i); // every point checked before anything is written
        }
        OutputFolder.create(out, false);
        Map<String, Long> counts = new TreeMap<>();
        RegimeMap map = noPlot ? null : new RegimeMap(space.names(), job.labels());
        SweepReport html = new SweepReport(space.names(), job.labels(), SweepTable.header(space.names()));
        SweepSummary summary;
        ProgressBar bar = noProgress ? null : new ProgressBarBuilder().setTaskName("sweep").setInitialMax(space.size())
            .setStyle(ProgressBarStyle.ASCII).setUpdateIntervalMillis(250)
            .setConsumer(new ConsoleProgressBarConsumer(err)).build();
        SweepExecutor executor = new ThreadedExecutor(n, (done, total) -> {
            if (bar != null) {
                bar.stepTo(done);
            }
        }, null);
        try (SweepTable table = new SweepTable(out.resolve("sweep.csv"), space.names())) {
            summary = executor.execute(space, job, row -> {
                table.accept(row);
                if (map != null) {
                    map.add(row);
                }
                html.add(row);
                counts.merge(row.outcome(), 1L, Long::sum);
            });
        } finally {
            if (bar != null) {
                bar.close();
            }
        }
        String title = SweepReport.title(space.names(), space.size());
        boolean drawn = !noPlot && space.names().size() <= 2;
        if (drawn) {
            map.write(out.resolve("regime-map.png"), title, job.spec().random());
        }
        Scenario base = Scenario.parse(doc);
        html.write(out.resolve("sweep-report.html"), title, SweepReport.subtitle(base.description()));
        PrintWriter w = header(job);
        w.println("Sweep:    " + summary.delivered() + " runs over " + String.join(", ", space.names()) + " on " + n
            + " thread" + (n == 1 ? "" : "s") + (job.spec().random() ? " (random sample)" : " (grid)"));
        w.println("Outcomes: " + outcomes(counts));
        w.println("Files:    " + out.resolve("sweep.csv") + ", " + out.resolve("sweep-report.html")
            + (drawn ? ", " + out.resolve("regime-map.png")
            : noPlot ? " (no picture: --no-plot)" : " (the regime map is drawn for one or two parameters only)"));
        w.flush();
        return 0;
    }

    /** The sweep on an engine found through the service loader. */
    private int distributed(SweepJob job) throws java.io.IOException {
        if (threads != null || force) {
            throw new ScenarioException((threads != null ? "--threads" : "--force") + " goes with --engine local;"
                + " the " + engine + " engine takes --master and --partitions and needs a new or empty --out folder");
        }
        SweepEngine found = null;
        List<String> names = new ArrayList<>();
        for (SweepEngine e : ServiceLoader.load(SweepEngine.class)) {
            names.add(e.name());
            if (e.name().equals(engine)) {
                found = e;
            }
        }
        if (found == null) {
            throw new ScenarioException("no sweep engine named " + engine + " on the class path (found: local"
                + (names.isEmpty() ? "" : ", " + String.join(", ", names)) + ")." + (engine.equals("spark")
                ? " Build it with: mvn -B -ntp package -DskipTests; then run: java @benchmarks/spark/target/trundle-spark.args"
                    + " org.trundle.runner.Main sweep SCENARIO.json --engine spark --master local[2] --out DIR"
                : ""));
        }
        SweepEngine.Report r = found.run(job, out.toString(), new SweepEngine.Options(master,
            partitions == null ? 0 : partitions, !noPlot));
        PrintWriter w = header(job);
        w.println("Sweep:    " + r.runs() + " runs over " + String.join(", ", job.names()) + " on " + engine
            + (master == null ? "" : " (" + master + ")") + (job.spec().random() ? " (random sample)" : " (grid)"));
        w.println("Outcomes: " + outcomes(r.outcomes()));
        w.println("Files:    " + String.join(", ", r.files()));
        w.flush();
        return 0;
    }

    private PrintWriter header(SweepJob job) {
        PrintWriter w = spec.commandLine().getOut();
        Scenario base = Scenario.parse(job.document());
        if (!base.description().isEmpty()) {
            w.println("Scenario: " + base.description());
        }
        return w;
    }

    private static String outcomes(Map<String, Long> counts) {
        StringBuilder b = new StringBuilder();
        counts.forEach((k, v) -> b.append(b.length() == 0 ? "" : ", ").append(k).append(' ').append(v));
        return b.toString();
    }
}
