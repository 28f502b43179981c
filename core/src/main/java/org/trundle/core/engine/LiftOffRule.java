package org.trundle.core.engine;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;

/**
 * Lift-off: the normal force {@code F_n} (N) of one contact falls to zero; with one contact the ball
 * flies. One rule per position of the contact set (0: the active slot); with several contacts the
 * contact at this position is released and the others go on ({@link Transitions#release}).
 */
final class LiftOffRule extends FlowSpacedRule {
    /** Position in the contact set watched. */
    private final int position;

    LiftOffRule(Run run, int position) {
        super(run);
        this.position = position;
    }

    @Override
    String label() {
        return position == 0 ? "lift-off" : "lift-off of contact " + position;
    }

    @Override
    boolean watches(Phase phase) {
        return phase.inContact() && (position == 0 || position < run.contacts.count());
    }

    @Override
    double value(Snapshot s) {
        return position == 0 ? s.normalForce : s.contactNormalForce[position];
    }

    @Override
    EndReason react(Transitions x, BallState before) {
        if (run.contacts.multi()) {
            x.release(run.contacts.at(position), EventKind.LIFT_OFF, null, before);
            return null;
        }
        if (run.phase() == Phase.ROLLING) {
            x.setDerivedVelocity();
        }
        run.changePhase(Phase.FLIGHT);
        run.log(EventKind.LIFT_OFF, before, null, Vector3D.ZERO);
        return null;
    }
}
