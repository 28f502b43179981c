package org.trundle.core.engine;

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
 * the impact impulses (design notes §6). On a compliant patch the event only marks the start of that
 * patch's contact (no rewind, no impulse): it records the normal speed relative to the patch that sets the
 * contact's damping, and the rule rests until the patch's {@link ReleaseRule} sees the ball leave; the other
 * patches' rules go on watching (a ball dropped into a compliant groove presses both walls). A compliant patch
 * is also watched during a rigid contact phase: reached then, its contact begins and its wrench joins the phase's
 * applied load ({@code Dynamics}); a rigid patch reached while compliant contacts are under way is an ordinary
 * rigid impact.
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

    /** Whether this segment is a contact phase (the ball touches another patch and may reach this one). */
    private boolean inContact;

    @Override
    boolean watches(Phase phase) {
        if (phase == Phase.FLIGHT) {
            inContact = false;
            return !slot.pressing;
        }
        // in contact: a patch not touched yet may be reached (a second or third rigid contact, or a compliant
        // patch whose contact is not under way)
        inContact = true;
        if (slot.compliance != null) {
            return phase.inContact() && !slot.pressing;
        }
        return phase.inContact() && slot.mode == Mode.APART
            && run.contacts.count() < ContactForceSolver.MAX_CONTACTS;
    }

    /**
     * In flight: {@code d − r + slack}. In contact with another patch: the same plus how far the closest
     * point lies outside this patch, {@code max(0, −margin)} (m), so that the function stays positive while
     * the ball passes this surface's continuation beyond the patch (a tangent join the ball is handed over
     * at, whose continuation it may touch) and is continuous where the closest point enters the patch.
     */
    @Override
    double value(Snapshot s) {
        double v = s.slotDistance[slot.index] - run.r + run.impactSlack;
        return inContact ? v + Math.max(0.0, -s.slotMargin[slot.index]) : v;
    }

    /**
     * In contact: the function changes no faster than the centre moves plus the closest point moves over the
     * patch, {@code |v|(2 + r‖H‖)} with {@code |v| ≤} the speed measure; half the time that needs to reach zero,
     * never less than the configured interval.
     */
    @Override
    double checkInterval(ODEStateAndDerivative s) {
        if (!inContact) {
            return run.set.maxCheckInterval();
        }
        Snapshot sn = run.snapshots.at(s);
        double gap = value(sn);
        if (!(gap > 0)) {
            return run.set.maxCheckInterval();
        }
        double rate = sn.speed * (2 + run.r * sn.slotHessianNorm[slot.index]) + 1e-300;
        return Math.max(run.set.maxCheckInterval(), 0.5 * gap / rate);
    }

    @Override
    boolean confirms(ODEStateAndDerivative s) {
        // flight integrates the full mechanical state: c, v sit at their full indices; a contact layout may
        // leave the velocity out (rolling): take the full state
        double[] ys = inContact ? run.snapshots.fullState(s) : s.getPrimaryState();
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
        if (inContact) {
            // the ball keeps its contacts; the new one is added at the instant found (no rewind)
            return;
        }
        run.activate(slot);
        if (slot.compliance == null) {
            x.rewindToContact();
        }
    }

    @Override
    EndReason react(Transitions x, BallState before) {
        if (inContact) {
            if (slot.compliance != null) {
                // a compliant patch reached during a rigid contact: its wrench joins the rigid phase's load
                x.beginCompliant(slot, before);
                return null;
            }
            x.reach(slot, before);
            return null;
        }
        if (slot.compliance != null) {
            // a compliant contact begins on this patch: its damping is set from the normal speed relative to it now
            x.beginCompliant(slot, before);
            // another compliant patch met at the same instant (a ball dropped down a groove's bisector meets both
            // walls at once): its impact function is not positive at the next segment's start, where no fall
            // through zero would be left to find, so its contact begins now too
            for (ContactSlot other : run.slots) {
                if (other == slot || other.compliance == null || other.pressing) {
                    continue;
                }
                try {
                    other.query(run.t, run.centreOf(run.y));
                } catch (SurfaceDomainException e) {
                    continue;
                }
                if (other.geo.distance - run.r + run.impactSlack <= 0 && other.geo.patchMargin >= 0) {
                    x.beginCompliant(other, before);
                }
            }
            return null;
        }
        Vector3D j = x.impact();
        run.log(EventKind.IMPACT, before, null, j);
        // a ball landing where two still walls meet touches the second one at once
        x.reachPressed(before);
        return null;
    }

}
