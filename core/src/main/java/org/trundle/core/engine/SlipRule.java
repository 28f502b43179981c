package org.trundle.core.engine;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;

/**
 * Slip onset while rolling: the grip minus the tangential force rolling needs,
 * {@code μ_s F_n − |F_t,roll|} for Coulomb (N), falls to zero; sliding starts against
 * {@code F_t,roll} (design notes §4). Watched only when the law's grip is finite. One rule per position
 * of the contact set: with several contacts each rolling contact is watched on its own (its needed
 * friction {@code |P_i F_i|} against {@code μ_s N_i}) and only that contact starts to slide.
 */
final class SlipRule extends FlowSpacedRule {
    /** Position in the contact set watched. */
    private final int position;

    SlipRule(Run run, int position) {
        super(run);
        this.position = position;
    }

    @Override
    String label() {
        return position == 0 ? "slip" : "slip of contact " + position;
    }

    @Override
    boolean watches(Phase phase) {
        ContactSet set = run.contacts;
        if (set.multi()) {
            if (!phase.inContact() || position >= set.count() || set.at(position).mode != Mode.ROLLING) {
                return false;
            }
            run.dyn.phase = phase;
            run.dyn.evaluate(run.t, run.y);
            return Double.isFinite(run.dyn.contactGrip[position]);
        }
        if (phase != Phase.ROLLING || position != 0) {
            return false;
        }
        run.dyn.evaluate(run.t, run.y);
        return Double.isFinite(run.dyn.grip);
    }

    @Override
    double value(Snapshot s) {
        return position == 0 ? s.gripMargin : s.contactGripMargin[position];
    }

    @Override
    EndReason react(Transitions x, BallState before) {
        if (run.contacts.multi()) {
            x.startSliding(run.contacts.at(position), before);
            return null;
        }
        run.dyn.phase = Phase.ROLLING;
        run.dyn.evaluate(run.t, run.y);
        x.setSlideDirectionFromRolling();
        x.setDerivedVelocity();
        run.changePhase(Phase.SLIDING);
        run.log(EventKind.SLIP, before, null, Vector3D.ZERO);
        return null;
    }
}
