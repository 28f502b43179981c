package org.trundle.core.engine;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;

/**
 * Slip onset while rolling: the grip minus the tangential force rolling needs,
 * {@code μ_s F_n − |F_t,roll|} for Coulomb (N), falls to zero; sliding starts against
 * {@code F_t,roll} (design notes §4). Watched only when the law's grip is finite.
 */
final class SlipRule extends FlowSpacedRule {
    SlipRule(Run run) {
        super(run);
    }

    @Override
    String label() {
        return "slip";
    }

    @Override
    boolean watches(Phase phase) {
        if (phase != Phase.ROLLING) {
            return false;
        }
        run.dyn.evaluate(run.t, run.y);
        return Double.isFinite(run.dyn.grip);
    }

    @Override
    double value(Snapshot s) {
        return s.gripMargin;
    }

    @Override
    EndReason react(Transitions x, BallState before) {
        run.dyn.phase = Phase.ROLLING;
        run.dyn.evaluate(run.t, run.y);
        x.setSlideDirectionFromRolling();
        x.setDerivedVelocity();
        run.changePhase(Phase.SLIDING);
        run.log(EventKind.SLIP, before, null, Vector3D.ZERO);
        return null;
    }
}
