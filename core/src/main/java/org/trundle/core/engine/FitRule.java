package org.trundle.core.engine;

import java.util.Locale;

import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.Phase;

/**
 * Fit: {@code 1 − r κ₁} falls to zero where the ball touches, so it no longer fits the surface
 * there; the run ends with a geometry stop. Watched only on surfaces whose largest concave
 * curvature is not known in advance (the others are checked once when the simulation is built).
 */
final class FitRule extends SwitchRule {
    FitRule(Run run) {
        super(run);
    }

    @Override
    String label() {
        return "fit";
    }

    @Override
    boolean watches(Phase phase) {
        return phase.inContact() && Double.isNaN(run.surface.maxConcaveCurvature());
    }

    @Override
    double value(Snapshot s) {
        return s.fitMargin;
    }

    @Override
    EndReason react(Transitions x, BallState before) {
        run.slot.query(run.t, run.centreOf(run.y));
        run.stopMessage = String.format(Locale.ROOT,
            "ball of radius %s m no longer fits surface %s at the contact point: r*kappa = %s >= 1",
            run.r, run.surface.name(), run.r * run.dyn.geo.curvature1);
        return EndReason.GEOMETRY;
    }
}
