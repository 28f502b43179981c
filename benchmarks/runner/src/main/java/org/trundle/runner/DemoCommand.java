package org.trundle.runner;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

import org.trundle.scenario.Scenario;
import org.trundle.scenario.ScenarioFiles;

/**
 * {@code trundle demo}: the built-in, invented parts-feeder case — an 8 mm steel ball fed at an
 * angle into the top of a 30 mm bore vertical transparent return tube — answering whether the ball
 * comes back out, when and how fast.
 */
@Command(name = "demo", mixinStandardHelpOptions = true,
    description = {"Runs the built-in demo (invented data): an 8 mm steel ball fed at an angle into the top of a 30 mm"
        + " bore vertical return tube. Does it come back out, when, how fast? Writes the usual run outputs plus"
        + " scenario.json (the demo's scenario, a starting point for your own) into --out."})
final class DemoCommand implements Callable<Integer> {
    /** The demo's default output folder. */
    static final String DEFAULT_OUT = "trundle-demo";

    @Option(names = "--out", paramLabel = "DIR", defaultValue = DEFAULT_OUT,
        description = "output folder (default: ${DEFAULT-VALUE}); an earlier demo's folder is replaced")
    Path out;

    @Option(names = "--force", description = "write into a non-empty folder that no earlier demo wrote")
    boolean force;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** Created by picocli. */
    DemoCommand() {
    }

    @Override
    public Integer call() throws Exception {
        String text = ScenarioFiles.demoText();
        Scenario sc = Scenario.parse(ScenarioFiles.parse(text));
        OutputFolder.checkDemo(out, force);
        RunOutputs.Report o = RunOutputs.execute(sc, out, true, true);
        Files.writeString(out.resolve("scenario.json"), text, StandardCharsets.UTF_8);
        PrintWriter w = spec.commandLine().getOut();
        w.println("Trundle demo (all data invented): does the ball come back out of the return tube?");
        if (o.result() != null) {
            w.println(answer(o.result(), RunOutputs.up(sc)));
        }
        RunOutputs.print(w, sc, o, out);
        w.println("          " + out.resolve("scenario.json") + " (the demo scenario; edit it and use: trundle run)");
        return o.exitCode();
    }

    /**
     * The demo's answer: the top of the tube is its edge "to", the bottom its edge "from".
     *
     * @param r the run's result
     * @param up unit up direction
     * @return two lines of text
     */
    static String answer(RunResult r, Vector3D up) {
        RunEvent exit = r.exit().orElse(null);
        if (exit == null) {
            return String.format(Locale.ROOT, "Answer:   no - after %.3f s simulated it is still in the tube (%s).",
                r.endState().time(), r.endState().phase().label());
        }
        Vector3D v = exit.before().velocity();
        double vUp = v.dotProduct(up);
        double vAround = v.subtract(vUp, up).getNorm();
        String where = "to".equals(exit.edge()) ? "yes - out of the top of the tube" : "no - it falls out of the bottom";
        return String.format(Locale.ROOT, "Answer:   %s at t = %.4f s, at %.4f m/s (%.4f m/s upward, %.4f m/s around"
            + " the bore), spinning at %.1f rad/s.", where, exit.time(), v.getNorm(), vUp, vAround,
            exit.before().spin().getNorm());
    }
}
