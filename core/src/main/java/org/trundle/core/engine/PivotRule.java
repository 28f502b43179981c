package org.trundle.core.engine;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;

/**
 * The exact pivoting stick while rolling, for a law whose couple about the normal is set-valued at
 * zero spin ({@link org.trundle.core.ContactLaw#hasPivotStick()}, Coulomb pivoting
 * {@code M = −δ_p F_n sgn(ω·n)}). Two roles, by the slot's hold:
 * <ul>
 *   <li>free: the spin about the normal {@code s = ω·n} (rad/s) enters the band {@code |s| < ω_b} in
 *       which the law's Coulomb couple is regularised ({@link #band}: the smoothing spin
 *       {@code ω_s}, at least {@code ε/r}); the function is {@code σ s − ω_b} with {@code σ} the sign
 *       {@code s} has at the segment start (or, starting within the band, the sign it is driven to,
 *       that of minus the needed couple), so that it is smooth. The band, not zero, is the trigger: when
 *       the needed couple is within {@code δ_p F_n} the regularised couple would stop {@code s} inside the
 *       band at {@code (|M_needed|/(δ_p F_n)) ω_s}, never at zero, and the helix would drain from
 *       there (the smoothing leak). Reaction: {@link Transitions#pivotStick()} removes the rest of
 *       {@code s} (at most {@code ω_b}) and takes the hold when the couple needed is within
 *       {@code δ_p F_n};</li>
 *   <li>held: {@code δ_p F_n − |M_needed|} (N·m) falls to zero, where {@code M_needed = −I ω·(H v) −
 *       τ_app·n} is the contact couple about the normal that keeps {@code ω·n} constant
 *       ({@code d(ω·n)/dt = τ·n/I + ω·(H v)}); reaction: the hold is released.</li>
 * </ul>
 * While held, {@link Dynamics} replaces the law's couple about the normal by {@code M_needed}; the
 * rest of the motion is unchanged (the couple about the normal does not enter the tangential force).
 *
 * <p>With several contacts the rule watches the one rolling contact while every other slides
 * ({@link ContactSet#pivotSlot}); {@code M_needed} then also balances the other contacts' moments about its
 * normal ({@code Dynamics.pivotHold}). Two rolling contacts on still patches need no hold: their no-slip
 * constraints {@code v + r n_i × ω = 0} give {@code ω × (n_1 − n_2) = 0}, so {@code ω} lies along the chord and
 * {@code ω·n_i = |ω| (n_1 − n_2)·n_i/|n_1 − n_2|} with {@code (n_1 − n_2)·n_1 = 1 − n_1·n_2 > 0}: the spin
 * about a normal is zero only when the ball is at rest (the rest rule's business), and away from zero the
 * Coulomb couple is single-valued and exact.
 *
 * <p>Limit: only on a patch that stands still. On a moving patch ({@link ContactSlot#pivotStick} is
 * false there) the hold is not taken; the law's regularised couple acts on the relative spin
 * {@code (ω − Ω)·n} as for any other law. A hold taken on one patch ends at a hand-over
 * ({@link ContactSet#activate}); the next patch may take its own.
 */
final class PivotRule extends SwitchRule {
    /** The sign of the free spin about the normal watched in this segment. */
    private double sign = 1;
    /** Whether this segment started held. */
    private boolean held;

    PivotRule(Run run) {
        super(run);
    }

    @Override
    String label() {
        return held ? "pivot release" : "pivot stick";
    }

    @Override
    boolean watches(Phase phase) {
        return phase.inContact() && run.contacts.pivotSlot() != null;
    }

    @Override
    void beginSegment() {
        ContactSlot slot = run.contacts.pivotSlot();
        held = slot != null && slot.pivotHeld;
        if (held || slot == null) {
            return;
        }
        Dynamics dyn = run.dyn;
        dyn.phase = run.phase();
        dyn.evaluate(run.t, run.y);
        double s = dyn.normalSpin;
        if (Math.abs(s) > band(run)) {
            sign = Math.signum(s);
        } else {
            sign = dyn.pivotNeeded > 0 ? -1 : 1;
        }
    }

    @Override
    double value(Snapshot s) {
        return held ? s.pivotMargin : sign * s.normalSpin - band(run);
    }

    /**
     * The band of the spin about the normal within which a Coulomb pivoting couple is regularised:
     * the smoothing spin {@code ω_s} ({@code smoothingSpinFraction} of the speed scale over the radius),
     * at least the stick spin {@code ε/r}.
     *
     * @param run the run
     * @return the band (rad/s)
     */
    static double band(Run run) {
        return Math.max(run.set.smoothingSpinFraction() * run.speedScale, run.stickEps) / run.r;
    }

    @Override
    EndReason react(Transitions x, BallState before) {
        ContactSlot slot = run.contacts.pivotSlot();
        if (held) {
            slot.pivotHeld = false;
            slot.pivotReleasedAt = run.t;
            run.logOn(slot.id, EventKind.PIVOT_RELEASE, before, null, Vector3D.ZERO, null, null);
            return null;
        }
        if (x.pivotStick()) {
            run.logOn(slot.id, EventKind.PIVOT_STICK, before, null, Vector3D.ZERO, null, null);
        }
        return null;
    }
}
