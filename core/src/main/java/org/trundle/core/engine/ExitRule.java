package org.trundle.core.engine;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;

/**
 * Patch exit: the patch margin of the contact point (m) falls to zero. When a neighbouring patch of
 * the scene continues the surface there ({@link Transitions#neighbour}) the contact is handed over
 * to it (event {@code handover}); otherwise the ball leaves every patch: the run ends there
 * ({@code stopAtExit}) or goes on in flight. Watched in contact on patches with edges. With several
 * contacts it watches the active one (the first touched): its exit ends that contact and the others go
 * on, and one that is already past its own edge (walls ending together) leaves at once as well; the edges of
 * the other touched patches are not watched while the first one touches (a limit of this version).
 */
final class ExitRule extends SwitchRule {
    ExitRule(Run run) {
        super(run);
    }

    @Override
    String label() {
        return "exit";
    }

    @Override
    boolean watches(Phase phase) {
        return phase.inContact() && run.surface.hasEdges();
    }

    @Override
    double value(Snapshot s) {
        return s.patchMargin;
    }

    /**
     * The contact point {@code p = c − r n} moves at {@code |ṗ| = |(I − r H) v| ≤ |v| (1 + r‖H‖)},
     * so it cannot reach the patch edge, {@code margin} away, sooner than
     * {@code margin / (|v| (1 + r‖H‖))}; half of that (and never less than the configured
     * interval) is a safe time to the next check.
     */
    @Override
    double checkInterval(ODEStateAndDerivative s) {
        Snapshot sn = run.snapshots.at(s);
        double margin = value(sn);
        if (!(margin > 0)) {
            return run.set.maxCheckInterval();
        }
        // |v| + r|ω| bounds |v| from above (the velocity itself is not integrated while rolling)
        double reach = margin / (sn.speed * (1 + run.r * sn.hessianNorm) + 1e-300);
        return Math.max(run.set.maxCheckInterval(), 0.5 * reach);
    }

    @Override
    EndReason react(Transitions x, BallState before) {
        run.slot.query(run.t, run.centreOf(run.y));
        String edge = run.surface.edgeName(run.dyn.geo.edge);
        if (run.contacts.multi()) {
            // one contact of several leaves its patch: the others go on (no hand-over while touching several)
            x.release(run.slot, EventKind.EXIT, edge, before);
            // walls that end together (a groove's or two rails' ends): the contact that goes on may be past its
            // own edge already, and an event search never sees a value that starts negative, so it leaves now
            if (run.phase().inContact() && run.surface.hasEdges()) {
                run.slot.query(run.t, run.centreOf(run.y));
                if (run.slot.geo.patchMargin < 0) {
                    return react(x, before);
                }
            }
            return null;
        }
        if (run.phase() == Phase.ROLLING) {
            x.setDerivedVelocity();
        }
        ContactSlot next = run.slots.length > 1 ? x.neighbour() : null;
        if (next != null) {
            // a neighbour continues the surface: the contact moves on, no impulse, same mode
            String from = run.slot.id;
            run.activate(next);
            x.projectOntoSurface(true);
            if (run.phase() == Phase.ROLLING) {
                x.setDerivedVelocity();
            }
            run.log(EventKind.HANDOVER, before, null, Vector3D.ZERO, edge, from);
            // the neighbour may not hold the ball (a convex lip taken too fast): then it lifts off at once
            // (its lift-off rule watches only a normal force that falls through zero)
            run.dyn.phase = run.phase();
            run.dyn.evaluate(run.t, run.y);
            if (!(run.dyn.normalForce > 0)) {
                BallState at = run.toState(run.t, run.y, run.phase());
                run.changePhase(Phase.FLIGHT);
                run.log(EventKind.LIFT_OFF, at, null, Vector3D.ZERO);
            }
            return null;
        }
        if (run.set.stopAtExit()) {
            run.log(EventKind.EXIT, before, before, Vector3D.ZERO, edge);
            return EndReason.EXIT;
        }
        run.changePhase(Phase.FLIGHT);
        run.log(EventKind.EXIT, before, null, Vector3D.ZERO, edge);
        return null;
    }
}
