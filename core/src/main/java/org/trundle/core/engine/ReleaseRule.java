package org.trundle.core.engine;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;

/**
 * The end of a compliant contact: the approach {@code r − d} (m) falls through zero as the ball leaves the
 * wall (the normal force has reached zero with it). Watched in flight while a compliant contact that began
 * with an impact event lasts; the reaction logs a {@code lift_off} event and lets {@link ImpactRule} watch
 * for the next contact.
 */
final class ReleaseRule extends SwitchRule {
    ReleaseRule(Run run) {
        super(run);
    }

    @Override
    String label() {
        return "release";
    }

    @Override
    boolean watches(Phase phase) {
        return phase == Phase.FLIGHT && run.compliance != null && run.touching;
    }

    @Override
    double value(Snapshot s) {
        return run.r - s.distance;
    }

    @Override
    EndReason react(Transitions x, BallState before) {
        run.touching = false;
        run.log(EventKind.LIFT_OFF, before, null, Vector3D.ZERO);
        return null;
    }
}
