package org.trundle.runner;

import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.Callable;

import com.fasterxml.jackson.databind.JsonNode;
import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;
import org.trundle.core.sweep.ParameterSpace;
import org.trundle.core.sweep.Sweep;
import org.trundle.core.sweep.SweepSummary;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import org.trundle.scenario.Scenario;
import org.trundle.scenario.ScenarioFiles;
import org.trundle.scenario.SweepSpec;
import org.trundle.report.RegimeMap;
import org.trundle.scenario.Outcome;
import org.trundle.scenario.ScenarioException;

/** {@code trundle sweep SCENARIO.json --out DIR}: the runs of a scenario's sweep section. */
@Command(name = "sweep", mixinStandardHelpOptions = true,
    description = {"Runs the scenario once per point of its sweep section, in parallel, and writes sweep.csv (one row"
        + " per run, the same rows on any thread count) and regime-map.png into --out."})
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
        SweepSpec sw = SweepSpec.parse(doc);
        ParameterSpace space = sw.space();
        for (int i = 0; i < space.size(); i++) {
            sw.scenario(doc, space.point(i)); // every point checked before anything is written
        }
        OutputFolder.create(out, false);
        Map<String, Integer> counts = new TreeMap<>();
        RegimeMap map = noPlot ? null : new RegimeMap(space.names(), sw.labels());
        SweepSummary summary;
        ProgressBar bar = noProgress ? null : new ProgressBarBuilder().setTaskName("sweep").setInitialMax(space.size())
            .setStyle(ProgressBarStyle.ASCII).setUpdateIntervalMillis(250)
            .setConsumer(new ConsoleProgressBarConsumer(err)).build();
        try (SweepTable table = new SweepTable(out.resolve("sweep.csv"), space.names())) {
            summary = Sweep.over(space).threads(n)
                .progress((done, total) -> {
                    if (bar != null) {
                        bar.stepTo(done);
                    }
                })
                .run(p -> sw.scenario(doc, p).runSpec(), run -> {
                    table.accept(run);
                    if (map != null) {
                        map.add(run);
                    }
                    counts.merge(Outcome.of(run), 1, Integer::sum);
                });
        } finally {
            if (bar != null) {
                bar.close();
            }
        }
        String title = "Regime map: " + String.join(" x ", space.names()) + " (" + space.size() + " runs)";
        boolean drawn = !noPlot && space.names().size() <= 2;
        if (drawn) {
            map.write(out.resolve("regime-map.png"), title, sw.random());
        }
        PrintWriter w = spec.commandLine().getOut();
        Scenario base = Scenario.parse(doc);
        if (!base.description().isEmpty()) {
            w.println("Scenario: " + base.description());
        }
        w.println("Sweep:    " + summary.delivered() + " runs over " + String.join(", ", space.names()) + " on " + n
            + " thread" + (n == 1 ? "" : "s") + (sw.random() ? " (random sample)" : " (grid)"));
        StringBuilder b = new StringBuilder();
        counts.forEach((k, v) -> b.append(b.length() == 0 ? "" : ", ").append(k).append(' ').append(v));
        w.println("Outcomes: " + b);
        w.println("Files:    " + out.resolve("sweep.csv") + (drawn ? ", " + out.resolve("regime-map.png")
            : noPlot ? " (no picture: --no-plot)" : " (the regime map is drawn for one or two parameters only)"));
        w.flush();
        return 0;
    }
}
