package org.trundle.core.engine;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.BallState;
import org.trundle.core.EnergyBudget;
import org.trundle.core.PhaseSpan;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;

/**
 * The last check of a run before its result leaves the engine: every number in it is finite.
 * {@link BallState} already refuses a non-finite time, centre, velocity or spin; this adds the
 * orientation, the impulses, the phase spans, the energy budget and the residuals. Internal.
 */
final class Results {
    private Results() {
    }

    /** @return the name of the first number of the result that is not finite, or null */
    static String nonFinite(RunResult res) {
        if (!finite(res.endState().orientation())) {
            return "end orientation";
        }
        for (RunEvent e : res.events()) {
            if (!finite(e.before().orientation()) || !finite(e.after().orientation()) || !finite(e.impulse())) {
                return e.kind().label() + " event at t = " + e.time() + " s";
            }
        }
        for (PhaseSpan p : res.phases()) {
            if (!Double.isFinite(p.start() + p.end() + p.centrePath())) {
                return "phase span " + p;
            }
        }
        EnergyBudget b = res.energy();
        double sum = b.initial() + b.fin() + b.totalLoss() + b.appliedWork() + b.scale() + b.relativeResidual();
        if (!Double.isFinite(sum)) {
            return "energy budget " + b;
        }
        if (!Double.isFinite(res.maxDistanceError() + res.maxNormalForce())) {
            return "residuals: distance " + res.maxDistanceError() + " m, normal force " + res.maxNormalForce() + " N";
        }
        return null;
    }

    private static boolean finite(Rotation q) {
        return Double.isFinite(q.getQ0() + q.getQ1() + q.getQ2() + q.getQ3());
    }

    private static boolean finite(Vector3D v) {
        return v == null || Double.isFinite(v.getX() + v.getY() + v.getZ());
    }
}
