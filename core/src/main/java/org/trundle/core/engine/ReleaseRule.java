package org.trundle.core.engine;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;

/**
 * The end of a compliant contact on one patch: the approach {@code r − d} (m) on that patch falls through zero
 * as the ball leaves the wall (the normal force has reached zero with it). One rule per compliant patch, watched
 * in flight while that patch's contact, begun with an impact event (or pressed at the start), lasts; the reaction
 * logs a {@code lift_off} event on the patch and lets its {@link ImpactRule} watch for the next contact. Watched in
 * every phase: during a rigid contact phase the compliant wrench acts as an applied load.
 */
final class ReleaseRule extends SwitchRule {
    /** The compliant patch this rule watches. */
    private final ContactSlot slot;

    ReleaseRule(Run run, ContactSlot slot) {
        super(run);
        this.slot = slot;
    }

    @Override
    String label() {
        return "release from " + slot.id;
    }

    @Override
    boolean watches(Phase phase) {
        return slot.pressing;
    }

    /** The patch's own distance in the snapshot (exact within two radii, so always while pressed). */
    @Override
    double value(Snapshot s) {
        return run.r - s.slotDistance[slot.index];
    }

    @Override
    EndReason react(Transitions x, BallState before) {
        slot.pressing = false;
        run.logOn(slot.id, EventKind.LIFT_OFF, before, null, Vector3D.ZERO, null, null);
        // another compliant patch left at the same instant (a groove's two walls after a drop down its bisector):
        // its release function is not positive at the next segment's start, so it is released now too
        for (ContactSlot other : run.slots) {
            if (other == slot || !other.pressing) {
                continue;
            }
            try {
                other.query(run.t, run.centreOf(run.y));
            } catch (org.trundle.core.SurfaceDomainException e) {
                continue;
            }
            if (run.r - other.geo.distance <= 0) {
                other.pressing = false;
                run.logOn(other.id, EventKind.LIFT_OFF, before, null, Vector3D.ZERO, null, null);
            }
        }
        return null;
    }
}
