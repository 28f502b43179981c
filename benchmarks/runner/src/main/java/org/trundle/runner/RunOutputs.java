package org.trundle.runner;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import com.fasterxml.jackson.databind.node.ObjectNode;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EnergyBudget;
import org.trundle.core.PhaseSpan;
import org.trundle.core.RunEvent;
import org.trundle.core.RunObserver;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.SimulationException;
import org.trundle.core.SolverSettings;
import org.trundle.core.Surface;
import org.trundle.report.HtmlReport;
import org.trundle.report.RunPlot;
import org.trundle.report.RunRecorder;
import org.trundle.scenario.Scenario;
import org.trundle.scenario.ScenarioException;
import org.trundle.scenario.ScenarioFiles;

/**
 * Runs one scenario and writes its outputs into the {@code --out} folder: {@code summary.json}
 * ({@link SummaryJson}), {@code trajectory.csv} ({@link RunRecorder}), {@code run.png}
 * ({@link RunPlot}) and {@code report.html} ({@link HtmlReport}), and with materials given
 * {@code contacts.csv} ({@link ContactsCsv}, the wall loads) and their peaks in {@code summary.json}'s
 * {@code wall_loads}; then prints a short text summary.
 */
final class RunOutputs {
    /**
     * What a run produced.
     *
     * @param result the result, or null when the library stopped the run with an exception
     * @param failure why it failed, or null
     * @param recorder the recorded samples and events
     * @param plotted whether run.png was drawn
     */
    record Report(RunResult result, String failure, RunRecorder recorder, boolean plotted) {
        /** @return 0, or {@link Main#FAILED} when the run failed (exception or geometry stop) */
        int exitCode() {
            return result == null || result.endReason() == EndReason.GEOMETRY ? Main.FAILED : 0;
        }
    }

    private RunOutputs() {
    }

    /**
     * @param sc the scenario
     * @return unit "up": opposite to gravity, or +z without gravity
     */
    static Vector3D up(Scenario sc) {
        Vector3D g = sc.simulation().gravity();
        return g.getNorm() > 0 ? g.normalize().negate() : Vector3D.PLUS_K;
    }

    /**
     * @param sc the scenario, checked
     * @param dir the output folder, checked
     * @param demo whether this is the demo (its folder may be replaced)
     * @param plot whether to draw run.png
     * @return the run's outcome
     * @throws IOException when an output cannot be written
     */
    static Report execute(Scenario sc, Path dir, boolean demo, boolean plot) throws IOException {
        // the picture's libraries load and initialise on a second core while the run is computed
        Thread plotPreparation = null;
        if (plot) {
            plotPreparation = new Thread(() -> {
                try {
                    RunPlot.prepare();
                } catch (RuntimeException e) {
                    // the real drawing reports whatever fails here, on the file it writes
                }
            }, "plot-preparation");
            plotPreparation.setDaemon(true);
            plotPreparation.start();
        }
        Simulation sim = sc.simulation();
        checkRows(sc);
        Vector3D up = up(sc);
        // wall coordinates only for one surface that stands still: a scene's or a moving patch's closest
        // point would need the patch in contact and its pose at the sample time
        Surface wall = sim.patches().size() == 1 && sim.motion().stationary() ? sim.surface() : null;
        RunRecorder rec = new RunRecorder(dir.resolve("trajectory.csv"), up, () -> OutputFolder.create(dir, demo),
            wall);
        ContactsCsv contacts = sc.wallLoads().map(w -> new ContactsCsv(dir.resolve("contacts.csv"), w, rec)).orElse(null);
        RunObserver observer = contacts != null ? contacts : rec;
        RunResult result = null;
        String failure = null;
        BallState lastGood = null;
        try {
            result = sim.run(sc.start(), sc.duration(), observer);
        } catch (java.io.UncheckedIOException e) {
            throw e.getCause();
        } catch (SimulationException e) {
            if (e.getCause() instanceof java.io.UncheckedIOException) {
                // the library wraps what its observer throws: a recorder that could not write is
                // an output error, not a failure of the run
                throw ((java.io.UncheckedIOException) e.getCause()).getCause();
            }
            lastGood = e.lastGoodState();
            failure = failureText(e);
        } catch (IllegalArgumentException e) {
            if (rec.validatedStart() == null) {
                throw new ScenarioException("start: " + e.getMessage());
            }
            failure = failureText(e);
        } catch (RuntimeException e) {
            // whatever stopped the run part-way, the summary still says what it has
            failure = failureText(e);
        }
        if (failure != null) {
            if (rec.validatedStart() == null) {
                OutputFolder.create(dir, demo);
            }
            rec.close();
            if (contacts != null) {
                contacts.close();
            }
        }
        ObjectNode summary;
        String[] title = {headline(sc), result != null ? "Result: " + endText(result) : "Result: the run failed: "
            + failure};
        if (result != null) {
            summary = SummaryJson.of(sc.description(), result);
        } else {
            BallState last = lastGood != null ? lastGood : rec.lastState() != null ? rec.lastState() : rec.validatedStart();
            summary = SummaryJson.failed(sc.description(), failure, last != null ? last : sc.start(), rec.events());
        }
        if (contacts != null) {
            summary.set("wall_loads", contacts.summary());
        }
        addNotes(summary, sc);
        ScenarioFiles.JSON.writeValue(dir.resolve("summary.json").toFile(), summary);
        if (plot) {
            awaitQuietly(plotPreparation);
            RunPlot.write(dir.resolve("run.png"), title, rec, sim.patches(), up, sim.ball().radius());
        }
        HtmlReport.writeRun(dir.resolve("report.html"), title[0], title[1], rec, result, sim.patches(), up,
            sim.ball().radius());
        return new Report(result, failure, rec, plot);
    }

    /** Waits for the plot preparation; an interruption only means the picture starts cold. */
    private static void awaitQuietly(Thread t) {
        try {
            t.join();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    /**
     * Adds {@code warnings} (implausible values, always present, possibly empty) and, when
     * {@code start.on_surface: true} moved the start, {@code placement} ({@code moved} m,
     * {@code from} and {@code to}: the centre as given and as placed, m).
     */
    static void addNotes(ObjectNode summary, Scenario sc) {
        com.fasterxml.jackson.databind.node.ArrayNode w = summary.putArray("warnings");
        sc.warnings().forEach(w::add);
        if (sc.placed()) {
            ObjectNode p = summary.putObject("placement");
            p.put("moved", sc.placement().distance());
            p.set("from", SummaryJson.vec(sc.placement().given()));
            p.set("to", SummaryJson.vec(sc.placement().centre()));
        }
    }

    /**
     * Prints the scenario's warnings on standard error, one {@code trundle: warning:} line each.
     *
     * @param err standard error
     * @param sc the scenario
     */
    static void warn(PrintWriter err, Scenario sc) {
        for (String w : sc.warnings()) {
            err.println("trundle: warning: " + w);
        }
        err.flush();
    }

    /** A library exception as one line: its message, or its type when it has none. */
    private static String failureText(RuntimeException e) {
        if (e instanceof SimulationException) {
            return e.getMessage();
        }
        String m = e.getMessage();
        return e.getClass().getSimpleName() + (m == null ? "" : ": " + m.replace('\n', ' '));
    }

    /**
     * The most rows a run can write to {@code trajectory.csv}, estimated before it starts: one per
     * sample interval over the duration, plus the start and the end (event rows come on top, at
     * most {@code maxEvents}); with a sample interval of 0 (every step) the run's evaluation budget
     * bounds the steps, at 12 evaluations per Dormand–Prince 8(5,3) step.
     *
     * @param sc the scenario
     * @return the estimate (may be infinite)
     */
    static double estimateRows(Scenario sc) {
        SolverSettings set = sc.simulation().settings();
        if (set.sampleInterval() > 0) {
            return Math.floor(sc.duration() / set.sampleInterval()) + 2;
        }
        return Math.ceil(set.maxEvaluations() / 12.0) + 2;
    }

    /** Refuses, before anything is written, a run whose trajectory would pass the row cap. */
    static void checkRows(Scenario sc) {
        double rows = estimateRows(sc);
        if (rows > sc.maxRows()) {
            throw new ScenarioException(String.format(Locale.ROOT, "the run would write about %.3g trajectory rows"
                + " (run.duration %s s / run.sample_interval %s s), more than the cap of %d; raise the sample"
                + " interval, or the cap with run.max_rows or --max-rows", rows, sc.duration(),
                sc.simulation().settings().sampleInterval(), sc.maxRows()));
        }
    }

    /** The first sentence of the description (or "Trundle run"), for the picture's title. */
    static String headline(Scenario sc) {
        String d = sc.description().isEmpty() ? "Trundle run" : sc.description();
        int cut = d.indexOf(". ");
        return cut > 0 ? d.substring(0, cut + 1) : d;
    }

    static String endText(RunResult r) {
        switch (r.endReason()) {
            case EXIT: {
                RunEvent e = r.exit().orElseThrow();
                return String.format(Locale.ROOT, "left through edge \"%s\" at t = %.4f s, speed %.4f m/s", e.edge(),
                    e.time(), e.before().velocity().getNorm());
            }
            case DURATION:
                return String.format(Locale.ROOT, "still %s at the end, t = %.4f s", r.endState().phase().label(),
                    r.endState().time());
            case REST:
                return String.format(Locale.ROOT, "came to rest at t = %.4f s", r.endState().time());
            case BUDGET:
                return String.format(Locale.ROOT, "stopped at t = %.4f s: %s", r.endState().time(), r.message());
            case LEFT_FOR_GOOD:
                return String.format(Locale.ROOT, "left for good at t = %.4f s: in flight on a path that meets no"
                    + " patch again, speed %.4f m/s", r.endState().time(), r.endState().velocity().getNorm());
            case GEOMETRY:
            default:
                return String.format(Locale.ROOT, "failed at t = %.4f s: %s", r.endState().time(), r.message());
        }
    }

    /**
     * Prints the text summary of a run.
     *
     * @param out where to print
     * @param sc the scenario
     * @param o the outcome
     * @param dir the output folder
     */
    static void print(PrintWriter out, Scenario sc, Report o, Path dir) {
        if (!sc.description().isEmpty()) {
            out.println("Scenario: " + sc.description());
        }
        if (sc.placed()) {
            out.println(String.format(Locale.ROOT, "Placed:   start centre moved %.3e m along the surface normal onto the"
                + " surface, from %s to %s m", sc.placement().distance(), vec(sc.placement().given()),
                vec(sc.placement().centre())));
        }
        if (o.result() == null) {
            out.println("Result:   the run failed: " + o.failure());
        } else {
            RunResult r = o.result();
            out.println("Result:   " + SummaryJson.endReason(r.endReason()) + " - " + endText(r));
            RunEvent exit = r.exit().orElse(null);
            if (exit != null) {
                out.println("Exit:     position " + vec(exit.before().centre()) + " m, velocity "
                    + vec(exit.before().velocity()) + " m/s, spin " + vec(exit.before().spin()) + " rad/s");
            } else if (r.endReason() != EndReason.EXIT) {
                out.println("End:      position " + vec(r.endState().centre()) + " m, velocity "
                    + vec(r.endState().velocity()) + " m/s");
            }
            StringBuilder ev = new StringBuilder();
            for (RunEvent e : r.events()) {
                ev.append(ev.length() == 0 ? "" : ", ").append(e.kind().label())
                    .append(String.format(Locale.ROOT, " %.4f s", e.time()));
            }
            out.println("Events:   " + (ev.length() == 0 ? "none" : ev));
            StringBuilder ph = new StringBuilder();
            for (PhaseSpan p : r.phases()) {
                ph.append(ph.length() == 0 ? "" : ", ").append(String.format(Locale.ROOT,
                    "%s %.4f-%.4f s (centre path %.4f m)", p.phase().label(), p.start(), p.end(), p.centrePath()));
            }
            out.println("Phases:   " + ph);
            out.println("Energy:   " + energyText(r.energy()));
            out.println(String.format(Locale.ROOT,
                "Checks:   largest normal force %.4g N, largest distance error %.2e m",
                r.maxNormalForce(), r.maxDistanceError()));
        }
        out.println("Files:    " + String.join(", ", List.of(dir.resolve("summary.json").toString(),
            dir.resolve("trajectory.csv").toString())) + (Files.exists(dir.resolve("contacts.csv")) ? ", "
            + dir.resolve("contacts.csv") : "") + (o.plotted() ? ", " + dir.resolve("run.png")
            : " (no picture: --no-plot)") + ", " + dir.resolve("report.html"));
        out.flush();
    }

    /**
     * The energy account in one line: initial and final energy, every loss kind the budget books
     * (sliding friction, rolling resistance, pivoting resistance, other couples, impacts, and a compliant
     * contact's damping when there is any), the work of applied loads, the drive work of moving surfaces
     * when there is any, and the residual.
     *
     * @param e the budget
     * @return the text
     */
    static String energyText(EnergyBudget e) {
        return String.format(Locale.ROOT, "initial %.6e J, final %.6e J; losses: friction %.3e J, rolling resistance"
            + " %.3e J, pivoting resistance %.3e J, other couples %.3e J, impacts %.3e J%s; applied work %.3e J%s;"
            + " budget residual %.1e of scale", e.initial(), e.fin(), e.slidingFrictionLoss(), e.rollingResistanceLoss(),
            e.pivotingResistanceLoss(), e.otherCoupleLoss(), e.impactLoss(), e.contactDampingLoss() != 0
                ? String.format(Locale.ROOT, ", contact damping %.3e J", e.contactDampingLoss()) : "",
            e.appliedWork(), e.driveWork() != 0
                ? String.format(Locale.ROOT, "; drive work of moving surfaces %.3e J", e.driveWork()) : "",
            e.relativeResidual());
    }

    static String vec(Vector3D v) {
        return String.format(Locale.ROOT, "[%.5g, %.5g, %.5g]", v.getX(), v.getY(), v.getZ());
    }
}
