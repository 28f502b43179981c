package org.trundle.core.engine;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;

/**
 * Rest: the speed measure {@code |v| + r|ω|} (m/s) falls to the rest speed and the contact can hold
 * the ball in static equilibrium (grip and holding couples of the law); the run ends at rest.
 */
final class RestRule extends SwitchRule {
    RestRule(Run run) {
        super(run);
    }

    @Override
    String label() {
        return "rest";
    }

    @Override
    boolean watches(Phase phase) {
        // rest ignores a compliant wrench: not watched while a compliant contact is under way
        return phase.inContact() && !run.pressingAny();
    }

    @Override
    double value(Snapshot s) {
        return s.speed - run.restSpeed;
    }

    /**
     * The speed measure changes at most at {@code |a| + r|α|}, so it cannot fall to the rest speed
     * sooner than {@code (speed − restSpeed)/(|a| + r|α|)} while the accelerations stay at that
     * level; half of that (never less than the configured interval) is the time to the next check.
     */
    @Override
    double checkInterval(ODEStateAndDerivative s) {
        Snapshot sn = run.snapshots.at(s);
        double gap = value(sn);
        if (!(gap > 0)) {
            return run.set.maxCheckInterval();
        }
        return Math.max(run.set.maxCheckInterval(), 0.5 * gap / (sn.acceleration + 1e-300));
    }

    @Override
    boolean confirms(ODEStateAndDerivative s) {
        return run.dyn.canRest(s.getTime(), run.snapshots.fullState(s), 1e-9);
    }

    @Override
    EndReason react(Transitions x, BallState before) {
        if (run.phase() == Phase.ROLLING) {
            x.setDerivedVelocity();
        }
        run.changePhase(Phase.REST);
        run.log(EventKind.REST, before, null, Vector3D.ZERO);
        return EndReason.REST;
    }
}
