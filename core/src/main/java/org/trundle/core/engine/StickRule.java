package org.trundle.core.engine;

import static org.trundle.core.engine.StateMapper.V;
import static org.trundle.core.engine.StateMapper.W;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;

/**
 * Stick while sliding: the slip speed {@code |s|} falls to the stick threshold {@code ε} (m/s); the
 * rest of the slip is removed by a sticking impulse and the grip test chooses rolling or sliding
 * (design notes §4). One rule per position of the contact set: with several contacts each sliding
 * contact is watched on its own, and the velocity is projected onto the constraints with that contact
 * rolling ({@link Transitions#stickContact}).
 */
final class StickRule extends SwitchRule {
    private final double[] gv = new double[3];
    private final double[] ghv = new double[3];
    private final double[] gw = new double[3];
    private final double[] gwd = new double[3];
    private final double[] ga = new double[3];
    private final double[] gb = new double[3];
    private final double[] full = new double[StateMapper.DIM];
    /** Position in the contact set watched (0: the active slot). */
    private final int position;
    /** Local model of the slip speed while it is not falling (or on a moving patch). */
    private final FlowSpacing spacing = new FlowSpacing();

    StickRule(Run run, int position) {
        super(run);
        this.position = position;
    }

    @Override
    String label() {
        return position == 0 ? "stick" : "stick of contact " + position;
    }

    @Override
    boolean watches(Phase phase) {
        ContactSet set = run.contacts;
        if (set.multi()) {
            return phase.inContact() && position < set.count() && set.at(position).mode == Mode.SLIDING;
        }
        return phase == Phase.SLIDING && position == 0;
    }

    @Override
    double value(Snapshot s) {
        return (position == 0 ? s.slipSpeed : s.contactSlipSpeed[position]) - run.stickEps;
    }

    @Override
    void beginSegment() {
        spacing.reset();
    }

    /**
     * The slip speed {@code |s|} falls to zero with a kink and bounces back, so a step may pass both
     * roots of {@code |s| − ε} between two checks; while {@code |s|} decreases, the next check is
     * set at half the time {@code (|s| − ε)/|d|s|/dt|} the slip needs to reach the band at its
     * current rate (at most the configured interval), so checks close in geometrically on the root
     * and never step over it. While {@code |s|} grows (or on a moving patch, where the rate below
     * does not apply) the slip must first turn round before it can fall to the band: the spacing then
     * comes from the local model of {@link FlowSpacing} through the last three checks (half the
     * earliest time a pessimistic quadratic could reach the band, never less than the configured
     * interval), as for lift-off and slip onset. A steady skid (slip growing under a small friction)
     * is then no longer checked at every configured interval.
     */
    @Override
    double checkInterval(ODEStateAndDerivative s) {
        Dynamics dyn = run.dyn;
        // sliding integrates the full mechanical state: c, v, q, ω sit at their full indices
        double[] ys = dyn.expand(s.getPrimaryState(), full);
        double[] yd = s.getPrimaryDerivative();
        dyn.evaluate(s.getTime(), ys);
        boolean multi = dyn.multi();
        double sp = multi ? dyn.contactSlipSpeed[position] : dyn.slipSpeed;
        double gap = sp - run.stickEps;
        double max = run.set.maxCheckInterval();
        double modelled = spacing.next(s.getTime(), gap, max);
        if (!(gap > 0)) {
            return max;
        }
        ContactSlot slot = multi ? run.contacts.at(position) : null;
        if (multi && slot.moving) {
            // the slip rate below is that of a still patch
            return modelled;
        }
        double[] n = multi ? slot.geo.normal : dyn.geo.normal;
        double[] h = multi ? slot.geo.hessian : dyn.geo.hessian;
        double[] slip = multi ? dyn.contactSlip[position] : dyn.slip;
        for (int i = 0; i < 3; i++) {
            gv[i] = ys[V + i];
            gw[i] = ys[W + i];
            gwd[i] = yd[W + i];
        }
        Vec.mulSym(h, gv, ghv);
        Vec.cross(gwd, n, ga);
        Vec.cross(gw, ghv, gb);
        double rate = 0;
        double r = run.r;
        for (int i = 0; i < 3; i++) {
            double sdot = yd[V + i] - r * ga[i] - r * gb[i];
            rate += slip[i] * sdot / sp;
        }
        if (!(rate < 0)) {
            return modelled;
        }
        return Math.min(max, Math.max(0.5 * gap / -rate, run.set.eventTimeTolerance()));
    }

    @Override
    EndReason react(Transitions x, BallState before) {
        if (run.contacts.multi()) {
            x.stickContact(run.contacts.at(position), before);
            return null;
        }
        Vector3D j = x.stickImpulse();
        Phase next = x.contactPhaseAfterStick();
        if (next == Phase.SLIDING) {
            // the grip cannot hold rolling: keep sliding from zero slip, no event
            run.setPhase(Phase.SLIDING);
            return null;
        }
        run.changePhase(next);
        run.log(next == Phase.ROLLING ? EventKind.STICK : EventKind.LIFT_OFF, before, null, j);
        return null;
    }
}
