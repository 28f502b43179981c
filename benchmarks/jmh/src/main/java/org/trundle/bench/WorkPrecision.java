package org.trundle.bench;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.bench.baseline.VerticalTubeRolling;
import org.trundle.core.RunResult;
import org.trundle.core.SolverSettings;

/**
 * Work–precision table of the vertical-tube scenario ({@link VerticalTubeCase}): for relative
 * tolerances 1e-6 … 1e-12, the relative error of the height frequency reached after
 * {@value #PERIODS} periods (see {@link VerticalTubeCase#frequencyError}) against the
 * right-hand-side evaluations spent, for the library (all kernel calls of the run, including event
 * functions and output) and for the hand-derived baseline. Reference frequency
 * {@code Ω sqrt(k/(1+k))} (Gualtieri, Tokieda et al., Am. J. Phys. 74 (2006) 497–501).
 * A second table gives the same counts for the curved guides of {@link CurvedCases} (torus groove,
 * spline chute), whose error is the end-position distance from a run at tolerance 1e-13 (no closed
 * form), with the evaluations per accepted step of every case (the cost must not rise per step as
 * the tolerance is loosened; only event checks near a root, fixed per simulated second, add to it).
 *
 * <p>Usage: {@code java -cp benchmarks/jmh/target/trundle-benchmarks.jar org.trundle.bench.WorkPrecision [out.md]}; writes a
 * Markdown table to the file (or to standard output without an argument). Wall times are the
 * best of three runs after a warm-up pass of the whole table, indicative only.
 */
public final class WorkPrecision {
    /** Height periods per run. */
    public static final int PERIODS = 20;

    private WorkPrecision() {
    }

    /**
     * @param args optional output file
     * @throws IOException when the file cannot be written
     */
    public static void main(String[] args) throws IOException {
        table(); // warm-up pass (JIT), discarded
        String md = table();
        if (args.length > 0) {
            Files.writeString(Path.of(args[0]), md, StandardCharsets.UTF_8);
        } else {
            PrintStream out = new PrintStream(System.out, true, StandardCharsets.UTF_8);
            out.print(md);
        }
    }

    private static String table() {
        StringBuilder md = new StringBuilder();
        md.append(String.format(Locale.ROOT, "| tolerance | library freq. error | library RHS evals | library steps"
            + " | library evals/step | library ms | baseline freq. error | baseline RHS evals | baseline ms |%n"));
        md.append("|---|---|---|---|---|---|---|---|---|\n");
        double duration = PERIODS * VerticalTubeCase.period();
        for (int e = 6; e <= 12; e++) {
            double tol = Math.pow(10, -e);
            VerticalTubeCase tube = new VerticalTubeCase(SolverSettings.defaults().withTolerance(tol));
            RunResult res = null;
            double libMs = Double.POSITIVE_INFINITY;
            for (int rep = 0; rep < 3; rep++) {
                long t0 = System.nanoTime();
                res = tube.simulation().run(tube.start(), duration);
                libMs = Math.min(libMs, (System.nanoTime() - t0) / 1e6);
            }
            double fLib = VerticalTubeCase.frequencyError(res.endState().centre().getZ(),
                res.endState().velocity().getZ(), PERIODS);
            VerticalTubeRolling base = null;
            double[] end = null;
            double baseMs = Double.POSITIVE_INFINITY;
            for (int rep = 0; rep < 3; rep++) {
                base = tube.baseline();
                long t0 = System.nanoTime();
                end = base.integrate(tube.baselineStart(), duration, tol, null);
                baseMs = Math.min(baseMs, (System.nanoTime() - t0) / 1e6);
            }
            double fBase = VerticalTubeCase.frequencyError(end[2], end[5], PERIODS);
            md.append(String.format(Locale.ROOT, "| 1e-%d | %.2e | %d | %d | %.2f | %.2f | %.2e | %d | %.2f |%n", e,
                Math.abs(fLib), res.evaluations(), res.steps(), (double) res.evaluations() / res.steps(), libMs, Math.abs(fBase), base.evaluations(), baseMs));
        }
        md.append(String.format(Locale.ROOT, "%nCurved guides, %.1f s each (end-position error against tolerance 1e-13):%n%n",
            CurvedCases.DURATION));
        md.append("| case | tolerance | end-position error (m) | RHS evals | steps | evals/step | ms |\n");
        md.append("|---|---|---|---|---|---|---|\n");
        for (CurvedCases c : CurvedCases.values()) {
            Vector3D ref = c.run(SolverSettings.defaults().withTolerance(1e-13)).endState().centre();
            for (int e = 12; e >= 6; e--) {
                SolverSettings set = SolverSettings.defaults().withTolerance(Math.pow(10, -e));
                RunResult res = null;
                double ms = Double.POSITIVE_INFINITY;
                for (int rep = 0; rep < 3; rep++) {
                    long t0 = System.nanoTime();
                    res = c.run(set);
                    ms = Math.min(ms, (System.nanoTime() - t0) / 1e6);
                }
                md.append(String.format(Locale.ROOT, "| %s | 1e-%d | %.2e | %d | %d | %.2f | %.2f |%n",
                    c.name().toLowerCase(Locale.ROOT).replace('_', ' '), e, res.endState().centre().distance(ref),
                    res.evaluations(), res.steps(), (double) res.evaluations() / res.steps(), ms));
            }
        }
        return md.toString();
    }
}
