package org.trundle.core.engine;

import static org.trundle.core.engine.StateMapper.V;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;
import org.trundle.core.SurfaceDomainException;

/**
 * Impact in flight on one patch of the scene (one rule per patch, so that a patch whose unbounded
 * continuation the ball is inside cannot hide the others): the distance minus the radius,
 * {@code d − r} (m), falls to zero while the ball approaches, on the patch (a ball that left a tube through its end does not hit the wall's
 * continuation). The function is offset by a slack of {@code 1e-9 r} so that it is strictly
 * positive when a flight starts on the surface; the reaction rewinds to {@code d = r} and applies
 * the impact impulses (design notes §6). With a compliant contact the event only marks the start of the
 * contact (no rewind, no impulse): it records the normal speed that sets the contact's damping, and the
 * rule rests until {@link ReleaseRule} sees the ball leave.
 */
final class ImpactRule extends SwitchRule {
    /** The patch this rule watches (one impact rule per patch of the scene). */
    private final ContactSlot slot;

    ImpactRule(Run run, ContactSlot slot) {
        super(run);
        this.slot = slot;
    }

    @Override
    String label() {
        return "impact on " + slot.id;
    }

    @Override
    boolean watches(Phase phase) {
        return phase == Phase.FLIGHT && !run.touching;
    }

    @Override
    double value(Snapshot s) {
        return s.slotDistance[slot.index] - run.r + run.impactSlack;
    }

    @Override
    boolean confirms(ODEStateAndDerivative s) {
        // flight integrates the full mechanical state: c, v sit at their full indices
        double[] ys = s.getPrimaryState();
        try {
            slot.query(s.getTime(), run.centreOf(ys));
        } catch (SurfaceDomainException e) {
            return false;
        }
        double vn = ContactKinematics.relativeNormalSpeed(slot, s.getTime(), slot.geo.normal, ys);
        return !(slot.geo.patchMargin < 0 || vn >= 0);
    }

    @Override
    void prepare(Transitions x) {
        run.activate(slot);
        if (run.compliance == null) {
            x.rewindToContact();
        }
    }

    @Override
    EndReason react(Transitions x, BallState before) {
        if (run.compliance != null) {
            // a compliant contact begins: its damping is set from the normal speed now
            slot.query(run.t, run.centreOf(run.y));
            double vn = -ContactKinematics.normalPart(run.y, V, slot.geo.normal);
            run.dyn.touchSpeed = Math.max(vn, run.settleSpeed);
            run.touching = true;
            run.log(EventKind.IMPACT, before, null, Vector3D.ZERO);
            return null;
        }
        Vector3D j = x.impact();
        run.log(EventKind.IMPACT, before, null, j);
        return null;
    }
}
