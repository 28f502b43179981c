package org.trundle.scenario;

import org.trundle.core.EndReason;
import org.trundle.core.RunResult;
import org.trundle.core.sweep.SweepRun;

/**
 * The outcome class of a sweep run, as named in {@code sweep.csv} and the regime map:
 * {@code exit_<edge>} (left the patch through that edge, e.g. {@code exit_to}), {@code duration}
 * (still on or over the surface when the duration ran out), {@code rest}, {@code budget},
 * {@code left_for_good} (in flight on a path that meets no patch again), or
 * {@code failed} (the run could not be made, or the library stopped it).
 */
public final class Outcome {
    private Outcome() {
    }

    /**
     * @param run a sweep run
     * @return its outcome name
     */
    public static String of(SweepRun run) {
        if (!run.isSuccess()) {
            return "failed";
        }
        RunResult r = run.result().orElseThrow();
        if (r.endReason() == EndReason.GEOMETRY) {
            return "failed";
        }
        if (r.endReason() == EndReason.EXIT) {
            return "exit_" + r.exit().map(e -> e.edge()).orElse("edge");
        }
        return r.endReason().label();
    }

    /**
     * @param outcome an outcome name
     * @return the default legend text
     */
    public static String describe(String outcome) {
        if (outcome.startsWith("exit_")) {
            return "left through edge \"" + outcome.substring(5) + "\"";
        }
        switch (outcome) {
            case "duration":
                return "still moving at the end";
            case "rest":
                return "came to rest";
            case "budget":
                return "budget exhausted";
            case "left_for_good":
                return "flew off for good";
            default:
                return "failed";
        }
    }
}
