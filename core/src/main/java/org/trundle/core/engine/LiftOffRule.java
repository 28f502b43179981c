package org.trundle.core.engine;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;

/** Lift-off: the normal force {@code F_n} (N) falls to zero in contact; the ball flies. */
final class LiftOffRule extends FlowSpacedRule {
    LiftOffRule(Run run) {
        super(run);
    }

    @Override
    String label() {
        return "lift-off";
    }

    @Override
    boolean watches(Phase phase) {
        return phase.inContact();
    }

    @Override
    double value(Snapshot s) {
        return s.normalForce;
    }

    @Override
    EndReason react(Transitions x, BallState before) {
        if (run.phase() == Phase.ROLLING) {
            x.setDerivedVelocity();
        }
        run.changePhase(Phase.FLIGHT);
        run.log(EventKind.LIFT_OFF, before, null, Vector3D.ZERO);
        return null;
    }
}
