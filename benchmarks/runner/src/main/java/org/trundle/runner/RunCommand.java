package org.trundle.runner;

import java.nio.file.Path;
import java.util.concurrent.Callable;

import com.fasterxml.jackson.databind.JsonNode;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import org.trundle.scenario.Scenario;
import org.trundle.scenario.ScenarioFiles;
import org.trundle.scenario.ScenarioPath;

/** {@code trundle run SCENARIO.json --out DIR}: one run of a scenario. */
@Command(name = "run", mixinStandardHelpOptions = true,
    description = {"Runs one scenario and writes summary.json, trajectory.csv and run.png into --out.",
        "A sweep section, if any, is ignored (use the sweep command)."})
final class RunCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "SCENARIO.json", description = "scenario file (JSON; SI units)")
    Path scenario;

    @Option(names = "--out", paramLabel = "DIR", required = true,
        description = "output folder (created; must be empty unless --force)")
    Path out;

    @Option(names = "--force", description = "write into a non-empty --out folder, replacing the runner's files")
    boolean force;

    @Option(names = "--duration", paramLabel = "SECONDS",
        description = "simulated time in seconds (s), replacing run.duration")
    Double duration;

    @Option(names = "--sample-interval", paramLabel = "SECONDS",
        description = "trajectory sample interval in seconds (s), replacing run.sample_interval; 0 = every step")
    Double sampleInterval;

    @Option(names = "--no-plot", description = "draw no picture (run.png); the run and its files are otherwise the same")
    boolean noPlot;

    @Option(names = "--max-rows", paramLabel = "N",
        description = "most rows trajectory.csv may get, replacing run.max_rows (default 2000000); a run that would"
            + " write more is refused before it starts")
    Long maxRows;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** Created by picocli. */
    RunCommand() {
    }

    /**
     * Applies the command-line replacements of run keys.
     *
     * @param doc the document
     * @param duration run.duration (s) or null
     * @param sampleInterval run.sample_interval (s) or null
     * @return the document to use
     */
    static JsonNode override(JsonNode doc, Double duration, Double sampleInterval) {
        JsonNode d = doc;
        if (duration != null) {
            d = ScenarioPath.parse("run.duration").set(d, duration);
        }
        if (sampleInterval != null) {
            d = ScenarioPath.parse("run.sample_interval").set(d, sampleInterval);
        }
        return d;
    }

    @Override
    public Integer call() throws Exception {
        OutputFolder.check(out, force);
        JsonNode doc = override(ScenarioFiles.read(scenario), duration, sampleInterval);
        if (maxRows != null) {
            doc = ScenarioPath.parse("run.max_rows").set(doc, maxRows);
        }
        Scenario sc = Scenario.parse(doc);
        RunOutputs.warn(spec.commandLine().getErr(), sc);
        RunOutputs.Report o = RunOutputs.execute(sc, out, false, !noPlot);
        if (doc.has("sweep")) {
            spec.commandLine().getOut().println("Note:     the sweep section is ignored by run (use: trundle sweep)");
        }
        RunOutputs.print(spec.commandLine().getOut(), sc, o, out);
        return o.exitCode();
    }
}
