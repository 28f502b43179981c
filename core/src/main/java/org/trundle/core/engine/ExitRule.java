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
 * ({@code stopAtExit}) or goes on in flight. Watched in contact on patches with edges.
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
