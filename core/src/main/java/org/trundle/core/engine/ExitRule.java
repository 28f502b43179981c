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
 * ({@code stopAtExit}) or goes on in flight. Watched in contact on patches with edges. One rule per
 * position of the contact set (0: the active slot), as for {@link LiftOffRule}: with several contacts the
 * exit of any touched patch is handed over to a neighbour that continues it ({@link Transitions#neighbourOf},
 * {@link Transitions#handOverContact}: a groove or rails made of segments) or else ends that contact while the
 * others go on, and a
 * contact that goes on already past its own edge (walls ending together, where both margins cross zero in the
 * same step and the search locates one) leaves at once as well.
 */
final class ExitRule extends SwitchRule {
    /** Position in the contact set watched. */
    private final int position;

    ExitRule(Run run, int position) {
        super(run);
        this.position = position;
    }

    @Override
    String label() {
        return position == 0 ? "exit" : "exit of contact " + position;
    }

    @Override
    boolean watches(Phase phase) {
        if (!phase.inContact()) {
            return false;
        }
        if (position == 0) {
            return run.surface.hasEdges();
        }
        return position < run.contacts.count() && run.contacts.at(position).surface.hasEdges();
    }

    @Override
    double value(Snapshot s) {
        return position == 0 ? s.patchMargin : s.contactMargin[position];
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
        if (position > 0 || !(margin > 0)) {
            // the other contacts' Hessians are not in the snapshot: the configured interval
            return run.set.maxCheckInterval();
        }
        // |v| + r|ω| bounds |v| from above (the velocity itself is not integrated while rolling)
        double reach = margin / (sn.speed * (1 + run.r * sn.hessianNorm) + 1e-300);
        return Math.max(run.set.maxCheckInterval(), 0.5 * reach);
    }

    @Override
    EndReason react(Transitions x, BallState before) {
        if (run.contacts.multi()) {
            releasePastEdges(x, run.contacts.at(position), before);
            // the last one left may be past its edge as well: it leaves by the single-contact rules below
            if (run.contacts.multi() || !run.phase().inContact() || !run.surface.hasEdges()) {
                return null;
            }
            run.slot.query(run.t, run.centreOf(run.y));
            if (!(run.slot.geo.patchMargin < 0)) {
                return null;
            }
        }
        run.slot.query(run.t, run.centreOf(run.y));
        String edge = run.surface.edgeName(run.dyn.geo.edge);
        if (run.phase() == Phase.ROLLING) {
            x.setDerivedVelocity();
        }
        ContactSlot next = run.slots.length > 1 ? x.neighbour() : null;
        if (next != null) {
            // a neighbour continues the surface: the contact moves on, no impulse, same mode unless the
            // neighbour moves otherwise (Transitions.handOverRolling)
            String from = run.slot.id;
            run.activate(next);
            x.projectOntoSurface(true);
            if (run.phase() == Phase.ROLLING) {
                // a neighbour moving otherwise than the patch left: the contact point slips on it
                run.changePhase(x.handOverRolling());
            }
            run.log(EventKind.HANDOVER, before, null, Vector3D.ZERO, edge, from);
            // the neighbour may not hold the ball (a convex lip taken too fast): then it lifts off at once
            // (its lift-off rule watches only a normal force that falls through zero)
            run.dyn.phase = run.phase();
            run.dyn.evaluate(run.t, run.y);
            if (!x.presses(run.dyn.normalForce)) {
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

    /**
     * With several contacts: the contact {@code leaving} leaves its patch, then every other contact that is
     * already past its own edge (walls that end together: an event search never sees a value that starts
     * negative), while more than one contact remains.
     */
    private void releasePastEdges(Transitions x, ContactSlot leaving, BallState before) {
        ContactSlot s = leaving;
        java.util.List<ContactSlot> entered = new java.util.ArrayList<>(2);
        while (s != null) {
            s.query(run.t, run.centreOf(run.y));
            String edge = s.surface.edgeName(s.geo.edge);
            ContactSlot next = x.neighbourOf(s, true);
            if (next != null) {
                x.handOverContact(s, next, edge, before);
                entered.add(next);
            } else {
                x.release(s, EventKind.EXIT, edge, before);
            }
            s = null;
            if (run.contacts.multi()) {
                for (int k = 0; k < run.contacts.count(); k++) {
                    ContactSlot o = run.contacts.at(k);
                    // a patch just entered may start a rounding short of its own edge: it is not leaving
                    if (o.surface.hasEdges() && !entered.contains(o)) {
                        o.query(run.t, run.centreOf(run.y));
                        if (o.geo.patchMargin < 0) {
                            s = o;
                            break;
                        }
                    }
                }
            }
        }
    }
}
