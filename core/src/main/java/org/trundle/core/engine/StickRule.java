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
 * (design notes §4).
 */
final class StickRule extends SwitchRule {
    private final double[] gv = new double[3];
    private final double[] ghv = new double[3];
    private final double[] gw = new double[3];
    private final double[] gwd = new double[3];
    private final double[] ga = new double[3];
    private final double[] gb = new double[3];
    private final double[] full = new double[StateMapper.DIM];

    StickRule(Run run) {
        super(run);
    }

    @Override
    String label() {
        return "stick";
    }

    @Override
    boolean watches(Phase phase) {
        return phase == Phase.SLIDING;
    }

    @Override
    double value(Snapshot s) {
        return s.slipSpeed - run.stickEps;
    }

    /**
     * The slip speed {@code |s|} falls to zero with a kink and bounces back, so a step may pass both
     * roots of {@code |s| − ε} between two checks; while {@code |s|} decreases, the next check is
     * set at half the time {@code (|s| − ε)/|d|s|/dt|} the slip needs to reach the band at its
     * current rate, so checks close in geometrically on the root and never step over it.
     */
    @Override
    double checkInterval(ODEStateAndDerivative s) {
        Dynamics dyn = run.dyn;
        // sliding integrates the full mechanical state: c, v, q, ω sit at their full indices
        double[] ys = dyn.expand(s.getPrimaryState(), full);
        double[] yd = s.getPrimaryDerivative();
        dyn.evaluate(s.getTime(), ys);
        double sp = dyn.slipSpeed;
        double gap = sp - run.stickEps;
        double max = run.set.maxCheckInterval();
        if (!(gap > 0)) {
            return max;
        }
        double[] n = dyn.geo.normal;
        double[] h = dyn.geo.hessian;
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
            rate += dyn.slip[i] * sdot / sp;
        }
        if (!(rate < 0)) {
            return max;
        }
        return Math.min(max, Math.max(0.5 * gap / -rate, run.set.eventTimeTolerance()));
    }

    @Override
    EndReason react(Transitions x, BallState before) {
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
