package org.trundle.core.engine;

import static org.trundle.core.engine.StateMapper.C;
import static org.trundle.core.engine.StateMapper.DIM;
import static org.trundle.core.engine.StateMapper.LOSS;
import static org.trundle.core.engine.StateMapper.Q;
import static org.trundle.core.engine.StateMapper.V;
import static org.trundle.core.engine.StateMapper.W;

import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.BallState;
import org.trundle.core.EventKind;
import org.trundle.core.LossKind;
import org.trundle.core.Phase;
import org.trundle.core.RunEvent;

/**
 * The operations the switch rules react with (design notes §4, §6): the choice of a contact mode
 * (grip test, normal force), sticking and impact impulses, the rewind of a flight to the instant of
 * contact, the projection onto the constraints, and the validation of a start. They act on the
 * {@link Run}'s current time and state.
 */
final class Transitions {
    private final Run run;
    private final Dynamics dyn;
    private final double r;
    private final double m;
    private final double k;
    private final double inertia;

    /** Whether a start is being validated (phase changes open no span yet). */
    private boolean starting;

    Transitions(Run run) {
        this.run = run;
        this.dyn = run.dyn;
        this.r = run.r;
        this.m = run.m;
        this.k = run.k;
        this.inertia = run.inertia;
    }

    // ---------------------------------------------------------------- start

    /**
     * Validates a start of the requested phase at the run's state (contact starts are projected
     * onto the surface) and returns the phase the run starts in; a start that cannot hold its
     * phase logs its switch (lift-off or slip) at the start time.
     */
    Phase startPhase(Phase requested) {
        double t = run.t;
        double[] y = run.y;
        double tolLen = run.set.contactTolerance() * r;
        boolean rigidStart = requested != Phase.FLIGHT;
        if (run.compliant) {
            // a compliant patch's contact is a force: a start pressing one is a contact already under way (its
            // damping set from the settle speed); a start touching no rigid patch integrates as flight, one
            // touching a rigid patch starts that rigid contact with the compliant wrench as a load
            rigidStart = false;
            for (ContactSlot s : run.slots) {
                if (s.compliance == null) {
                    try {
                        s.query(t, run.centreOf(y));
                    } catch (org.trundle.core.SurfaceDomainException e) {
                        continue;
                    }
                    rigidStart |= requested != Phase.FLIGHT && Math.abs(s.geo.distance - r) <= tolLen
                        && s.geo.patchMargin >= 0;
                    continue;
                }
                double d;
                try {
                    s.query(t, run.centreOf(y));
                    d = s.geo.distance;
                } catch (org.trundle.core.SurfaceDomainException e) {
                    continue;
                }
                double gap = d - r;
                if (gap < -tolLen) {
                    throw run.reject(String.format(Locale.ROOT,
                        "start centre penetrates surface %s: distance %s m is below the ball radius %s m",
                        s.surface.name(), d, r));
                }
                s.pressing = gap < 0 && s.geo.patchMargin >= 0;
            }
        }
        if (!rigidStart && run.compliant) {
            requested = Phase.FLIGHT;
        }
        if (requested == Phase.FLIGHT) {
            // a flight start needs no closest point: only a bound that shows no patch is penetrated
            for (ContactSlot s : run.slots) {
                double d = s.distanceBound(t, run.centreOf(y), r - tolLen, 1e-3 * r);
                if (d - r < -tolLen) {
                    throw run.reject(String.format(Locale.ROOT,
                        "start centre penetrates surface %s: distance %s m is below the ball radius %s m",
                        s.surface.name(), d, r));
                }
            }
            return Phase.FLIGHT;
        }
        ContactSlot touched = null;
        if (run.slots.length > 1) {
            java.util.List<ContactSlot> all = touchingAll(t, y, tolLen);
            all.removeIf(s -> s.compliance != null);
            if (all.size() > 1) {
                return startSeveral(requested, all);
            }
            touched = all.isEmpty() ? null : all.get(0);
        }
        if (touched != null) {
            run.activate(touched);
        }
        run.slot.query(t, run.centreOf(y));
        double gap = dyn.geo.distance - r;
        String name = run.surface.name();
        if (Math.abs(gap) > tolLen) {
            throw run.reject(String.format(Locale.ROOT,
                "start centre is %s m from surface %s, but a %s start needs distance r = %s m (tolerance %s m);"
                    + " use a flight start for a ball off the surface",
                dyn.geo.distance, name, requested.label(), r, tolLen));
        }
        if (dyn.geo.patchMargin < 0) {
            throw run.reject(String.format(Locale.ROOT,
                "start contact point lies outside the patch of surface %s by %s m (edge %s)",
                name, -dyn.geo.patchMargin, run.surface.edgeName(dyn.geo.edge)));
        }
        double vn = ContactKinematics.relativeNormalSpeed(run.slot, t, dyn.geo.normal, y);
        double tolSpeed = run.set.contactTolerance() * run.speedScale;
        if (Math.abs(vn) > tolSpeed) {
            throw run.reject(String.format(Locale.ROOT,
                "start velocity has a normal component %s m/s on surface %s (tolerance %s m/s);"
                    + " a contact start must move tangentially",
                vn, name, tolSpeed));
        }
        projectOntoSurface(true);
        double[] s = slipOf(y);
        double slip = Vec.norm(s);
        if (requested == Phase.ROLLING || requested == Phase.REST) {
            if (slip > tolSpeed) {
                throw run.reject(String.format(Locale.ROOT,
                    "start velocity violates the no-slip condition v = r w x n by %s m/s (tolerance %s m/s);"
                        + " build a rolling start with Simulation.rollingStart(centre, velocity)",
                    slip, tolSpeed));
            }
        }
        Phase p = chooseContactPhase(slip <= run.stickEps || requested != Phase.SLIDING);
        if (p == Phase.FLIGHT) {
            BallState s0 = run.toState(t, run.y, requested == Phase.SLIDING ? Phase.SLIDING : Phase.ROLLING);
            run.events.add(new RunEvent(EventKind.LIFT_OFF, s0, run.toState(t, run.y, Phase.FLIGHT), null,
                Vector3D.ZERO, run.slot.id, null, null));
        } else if (p == Phase.SLIDING && requested != Phase.SLIDING) {
            BallState s0 = run.toState(t, run.y, Phase.ROLLING);
            run.events.add(new RunEvent(EventKind.SLIP, s0, run.toState(t, run.y, Phase.SLIDING), null,
                Vector3D.ZERO, run.slot.id, null, null));
        }
        return p;
    }

    /** Every patch the centre touches (distance r within {@code tol}, contact point on the patch), scene order. */
    private java.util.List<ContactSlot> touchingAll(double t, double[] y, double tol) {
        java.util.List<ContactSlot> out = new java.util.ArrayList<>();
        for (ContactSlot s : run.slots) {
            try {
                s.query(t, run.centreOf(y));
            } catch (org.trundle.core.SurfaceDomainException e) {
                continue;
            }
            if (Math.abs(s.geo.distance - r) <= tol && s.geo.patchMargin >= 0) {
                out.add(s);
            }
        }
        return out;
    }

    /**
     * A contact start touching several patches at once (issue 12): the velocity must be tangential to each
     * surface (relative to a moving one) and, for a rolling start, without slip at one contact point at least
     * (within the contact tolerance; a contact that slips starts sliding, event slip); then the centre is projected onto every surface, the velocity onto every contact's
     * constraints, and the modes settle ({@link #settleContacts}).
     */
    private Phase startSeveral(Phase requested, java.util.List<ContactSlot> touched) {
        double t = run.t;
        double[] y = run.y;
        if (touched.size() > ContactForceSolver.MAX_CONTACTS) {
            throw run.reject(String.format(Locale.ROOT, "start touches %d patches at once; at most %d contacts are"
                + " solved together", touched.size(), ContactForceSolver.MAX_CONTACTS));
        }
        double tolSpeed = run.set.contactTolerance() * run.speedScale;
        for (ContactSlot s : touched) {
            s.query(t, run.centreOf(y));
            double vn = ContactKinematics.relativeNormalSpeed(s, t, s.geo.normal, y);
            if (Math.abs(vn) > tolSpeed) {
                throw run.reject(String.format(Locale.ROOT,
                    "start velocity has a normal component %s m/s on surface %s of patch %s (tolerance %s m/s);"
                        + " a contact start must move tangentially to every surface it touches",
                    vn, s.surface.name(), s.id, tolSpeed));
            }
        }
        run.activate(touched.get(0));
        run.setPhase(Phase.ROLLING);
        for (int i = 1; i < touched.size(); i++) {
            run.contacts.add(touched.get(i), Mode.ROLLING);
        }
        projectPositionOnContacts(t, y);
        boolean rollsSomewhere = false;
        for (ContactSlot s : touched) {
            s.query(t, run.centreOf(y));
            rollsSomewhere |= Vec.norm(relativeSlip(s, y)) <= tolSpeed;
        }
        for (ContactSlot s : touched) {
            s.query(t, run.centreOf(y));
            double[] sl = relativeSlip(s, y);
            double sp = Vec.norm(sl);
            if (requested != Phase.SLIDING && sp > tolSpeed && !rollsSomewhere) {
                throw run.reject(String.format(Locale.ROOT,
                    "start velocity violates the no-slip condition at patch %s by %s m/s (tolerance %s m/s);"
                        + " a ball touching several patches rolls about the line through its contact points:"
                        + " build the start with Simulation.rollingStart(centre, velocity)",
                    s.id, sp, tolSpeed));
            }
            // a rolling start must roll on one patch at least; another whose surface moves differently under the
            // ball (a turning race and a still one) may slip there: that contact starts sliding (event slip)
            if ((requested == Phase.SLIDING && sp > run.stickEps) || (requested != Phase.SLIDING && sp > tolSpeed)) {
                for (int i = 0; i < 3; i++) {
                    s.slideDir[i] = sl[i] / sp;
                }
                run.contacts.setMode(s, Mode.SLIDING);
            }
        }
        BallState s0 = run.toState(t, y, requested == Phase.SLIDING ? Phase.SLIDING : Phase.ROLLING);
        starting = true;
        try {
            settleContacts();
        } finally {
            starting = false;
        }
        Phase p = run.phase();
        if (p == Phase.FLIGHT) {
            run.events.add(new RunEvent(EventKind.LIFT_OFF, s0, run.toState(t, run.y, Phase.FLIGHT), null,
                Vector3D.ZERO, touched.get(0).id, null, null));
        } else if (requested != Phase.SLIDING) {
            for (ContactSlot s : touched) {
                if (s.mode == Mode.SLIDING) {
                    run.events.add(new RunEvent(EventKind.SLIP, s0, run.toState(t, run.y, p), null,
                        Vector3D.ZERO, s.id, null, null));
                }
            }
        }
        return p;
    }

    /**
     * The neighbour that continues the surface where the contact point leaves the active patch: a
     * patch other than the active one whose surface is at distance r from the centre (within the
     * contact tolerance) and whose patch holds the contact point a little ahead along the centre's
     * motion (one millionth of a radius, so that a join exactly on both edges hands over forward).
     *
     * @return the neighbour, or null when the ball leaves every patch there
     */
    ContactSlot neighbour() {
        return neighbourOf(run.slot, false);
    }

    /**
     * The neighbour that continues the surface where the contact point leaves the patch of {@code from}: as
     * {@link #neighbour()}, among the patches not touched now; with {@code sameNormal} (one contact of
     * several) its normal must also be the leaving contact's (to 1e-6: a join with a tangent-continuous wall),
     * so that the other touched walls' own continuations are not taken for it, and a crease is met by a touch
     * or an impact instead.
     *
     * @param from the slot whose contact point leaves its patch
     * @param sameNormal whether the neighbour's normal must be the leaving contact's
     * @return the neighbour, or null when the contact ends there
     */
    ContactSlot neighbourOf(ContactSlot from, boolean sameNormal) {
        double t = run.t;
        double[] y = run.y;
        double tol = run.set.contactTolerance() * r;
        double[] c = {y[C], y[C + 1], y[C + 2]};
        double vx = y[V];
        double vy = y[V + 1];
        double vz = y[V + 2];
        double sp = Math.sqrt(vx * vx + vy * vy + vz * vz);
        double step = sp > 0 ? 1e-6 * r / sp : 0.0;
        double[] ahead = {c[0] + vx * step, c[1] + vy * step, c[2] + vz * step};
        double[] n0 = null;
        if (sameNormal) {
            from.query(t, c);
            n0 = from.geo.normal.clone();
        }
        for (ContactSlot s : run.slots) {
            if (s == from || s.mode != Mode.APART) {
                continue;
            }
            try {
                s.query(t, c);
                if (!(Math.abs(s.geo.distance - r) <= tol)) {
                    continue;
                }
                if (n0 != null) {
                    double[] n = s.geo.normal;
                    double dx = n[0] - n0[0];
                    double dy = n[1] - n0[1];
                    double dz = n[2] - n0[2];
                    if (!(dx * dx + dy * dy + dz * dz <= 1e-12)) {
                        continue;
                    }
                }
                s.query(t, ahead);
            } catch (org.trundle.core.SurfaceDomainException e) {
                continue;
            }
            if (s.geo.patchMargin >= 0) {
                return s;
            }
        }
        return null;
    }

    // ---------------------------------------------------------------- modes

    /**
     * Chooses rolling, sliding or flight for a ball on the surface with no normal velocity.
     * With {@code rollingCandidate} the slip is removed (tiny, by a sticking impulse) and the grip
     * test decides between rolling and sliding.
     */
    Phase chooseContactPhase(boolean rollingCandidate) {
        if (rollingCandidate) {
            stickImpulse();
            return contactPhaseAfterStick();
        }
        dyn.phase = Phase.SLIDING;
        double[] s = slipOf(run.y);
        double sp = Vec.norm(s);
        for (int i = 0; i < 3; i++) {
            dyn.slideDir0[i] = s[i] / sp;
        }
        dyn.evaluate(run.t, run.y);
        return presses(dyn.normalForce) ? Phase.SLIDING : Phase.FLIGHT;
    }

    /**
     * Whether a contact's normal force holds it: positive beyond rounding, {@code N > 1e-12 m |g|} (N). A wall the
     * motion leaves exactly unloaded (a vertical wall met under gravity along it, a wall pressed only by a friction
     * that has just stopped) has {@code N = 0} in one frame and ±1e-19 N in a turned one; without the margin the
     * choice between contact and flight there would depend on the frame the scene is described in.
     *
     * @param normalForce the normal force (N)
     * @return whether the contact holds
     */
    boolean presses(double normalForce) {
        return normalForce > forceFloor();
    }

    /** @return the normal force below which a contact is taken as unloaded, {@code 1e-12 m |g|} (N) */
    double forceFloor() {
        double[] g = run.g;
        return 1e-12 * m * Math.sqrt(g[0] * g[0] + g[1] * g[1] + g[2] * g[2]);
    }

    /** Rolling if the grip holds the no-slip state, else sliding; flight if the normal force would be negative. */
    Phase contactPhaseAfterStick() {
        dyn.phase = Phase.ROLLING;
        dyn.evaluate(run.t, run.y);
        if (!presses(dyn.normalForce)) {
            return Phase.FLIGHT;
        }
        if (dyn.neededTangential <= dyn.grip) {
            return Phase.ROLLING;
        }
        setSlideDirectionFromRolling();
        return Phase.SLIDING;
    }

    /** The slide direction at the onset of sliding: against the tangential force rolling needed. */
    void setSlideDirectionFromRolling() {
        double f = dyn.neededTangential;
        for (int i = 0; i < 3; i++) {
            dyn.slideDir0[i] = f > 0 ? -dyn.friction[i] / f : 0.0;
        }
        if (!(f > 0)) {
            // no preferred direction: any tangent will do, pick one deterministically
            double[] n = dyn.geo.normal;
            double[] a = Math.abs(n[0]) < 0.9 ? new double[] {1, 0, 0} : new double[] {0, 1, 0};
            Vec.cross(n, a, dyn.slideDir0);
            Vec.scale(dyn.slideDir0, 1.0 / Vec.norm(dyn.slideDir0));
        }
    }

    /** Whether the ball, at the start of a contact segment, is already slow enough and held at rest. */
    boolean restsNow() {
        dyn.phase = run.phase();
        dyn.evaluate(run.t, run.y);
        return speedMeasure(run.t, dyn.vel, run.y) <= run.restSpeed
            && dyn.canRest(run.t, run.y, 1e-9);
    }

    /**
     * The speed measure {@code |v − u(c)| + r|ω − Ω|} (m/s) relative to the patch, with centre
     * velocity {@code v}; {@code |v| + r|ω|} on a still patch.
     */
    double speedMeasure(double t, double[] v, double[] y) {
        if (!run.slot.moving) {
            return ContactKinematics.speedMeasure(r, v, y);
        }
        double[] vr = new double[3];
        double[] wr = new double[3];
        double[] yv = y.clone();
        System.arraycopy(v, 0, yv, V, 3);
        ContactKinematics.relative(run.slot, t, yv, vr, wr);
        return Vec.norm(vr) + r * Vec.norm(wr);
    }

    // ---------------------------------------------------------------- pivoting stick

    /**
     * The pivoting stick at the run's state (rolling, law with a set-valued pivoting couple): the
     * spin about the normal is removed by an angular impulse about the normal (its energy booked as
     * pivoting loss; the no-slip velocity does not change) and, when the couple needed to keep it
     * at zero is within the law's pivoting couple, the hold begins.
     *
     * @return whether the spin is now held
     */
    boolean pivotStick() {
        double[] y = run.y;
        ContactSlot slot = run.contacts.pivotSlot();
        if (slot == null) {
            return false;
        }
        dyn.phase = run.phase();
        dyn.evaluate(run.t, y);
        double[] n = slot.geo.normal;
        double sn = dyn.normalSpin;
        double before = run.kinetic(y);
        for (int i = 0; i < 3; i++) {
            y[W + i] -= sn * n[i];
        }
        y[LOSS + LossKind.PIVOTING_RESISTANCE.ordinal()] += before - run.kinetic(y);
        // H n = 0, so the needed couple −I ω·(H v) is the same with the spin about n removed
        boolean hold = Math.abs(dyn.pivotNeeded) <= dyn.pivotLimit && dyn.pivotLimit > 0;
        slot.pivotHeld = hold;
        return hold;
    }

    /**
     * Before a rolling segment of a law with a set-valued pivoting couple: takes the hold when the
     * spin about the normal is already within {@link PivotRule#band} and the needed couple within
     * the limit (not at the instant of a release), drops it when the needed couple is past the limit.
     *
     * @return the event to log, or null
     */
    EventKind pivotCheck() {
        ContactSlot slot = run.contacts.pivotSlot();
        if (slot == null || !run.phase().inContact()) {
            return null;
        }
        dyn.phase = run.phase();
        dyn.evaluate(run.t, run.y);
        double margin = dyn.pivotLimit - Math.abs(dyn.pivotNeeded);
        if (slot.pivotHeld) {
            if (margin < 0) {
                slot.pivotHeld = false;
                slot.pivotReleasedAt = run.t;
                return EventKind.PIVOT_RELEASE;
            }
            return null;
        }
        if (Math.abs(dyn.normalSpin) <= PivotRule.band(run) && margin > 0 && run.t != slot.pivotReleasedAt) {
            return pivotStick() ? EventKind.PIVOT_STICK : null;
        }
        return null;
    }

    // ---------------------------------------------------------------- impulses

    /** Removes the contact-point slip by the impulse {@code J = −k m s/(1+k)}; books the loss. */
    Vector3D stickImpulse() {
        double[] y = run.y;
        run.slot.query(run.t, run.centreOf(y));
        double[] s = slipOf(y);
        double f = -k * m / (1 + k);
        double[] j = {f * s[0], f * s[1], f * s[2]};
        double before = run.kinetic(y);
        double drive = driveOf(j, y);
        applyImpulse(j);
        y[LOSS + LossKind.SLIDING_FRICTION.ordinal()] += before - run.kinetic(y) + drive;
        run.impulseDrive += drive;
        return new Vector3D(j[0], j[1], j[2]);
    }

    /**
     * The impact rule fires at a penetration of {@code impactSlack} (so that its function is
     * strictly positive when a flight starts on the surface); this moves the flight state back
     * along its own motion, {@code δt = (r − d)/|v_n|}, to the instant of contact {@code d = r}.
     */
    void rewindToContact() {
        double[] y = run.y;
        run.slot.query(run.t, run.centreOf(y));
        double vn = ContactKinematics.relativeNormalSpeed(run.slot, run.t, dyn.geo.normal, y);
        double pen = r - dyn.geo.distance;
        if (!(vn < 0) || !(pen > 0)) {
            return;
        }
        double dt = pen / -vn;
        double[] yd = new double[DIM];
        dyn.phase = Phase.FLIGHT;
        dyn.evaluate(run.t, y, yd);
        for (int i = 0; i < 3; i++) {
            y[C + i] += -y[V + i] * dt + 0.5 * yd[V + i] * dt * dt;
            y[V + i] -= yd[V + i] * dt;
        }
        run.t -= dt;
    }

    /**
     * Impact at re-contact: restitution and friction impulses, then the settling hand-over to
     * rolling or sliding when the rebound is slow and that phase's normal force is positive.
     *
     * @return the impulse (N·s)
     */
    Vector3D impact() {
        double[] y = run.y;
        run.slot.query(run.t, run.centreOf(y));
        double[] n = dyn.geo.normal.clone();
        double vn = ContactKinematics.relativeNormalSpeed(run.slot, run.t, n, y);
        double[] s = slipOf(y);
        double jn = -(1 + run.restitution) * m * vn;
        double f = -k * m / (1 + k);
        double[] jt = {f * s[0], f * s[1], f * s[2]};
        double[] w = {y[W], y[W + 1], y[W + 2]};
        if (run.slot.moving) {
            double[] vr = new double[3];
            ContactKinematics.relative(run.slot, run.t, y, vr, w);
        }
        run.model.access().set(dyn.ctx, run.ball, dyn.geo, jn, Phase.SLIDING, s, w, true);
        double gripJ = run.law.gripLimit(dyn.ctx);
        if (!(gripJ >= 0)) {
            throw dyn.badBound("grip limit", gripJ, "N·s");
        }
        double jtn = Vec.norm(jt);
        if (jtn > gripJ) {
            double slideJ = run.law.slidingFriction(dyn.ctx);
            if (!(slideJ >= 0 && slideJ < Double.POSITIVE_INFINITY)) {
                throw dyn.badBound("sliding friction", slideJ, "N·s");
            }
            double sp = Vec.norm(s);
            for (int i = 0; i < 3; i++) {
                jt[i] = sp > 0 ? -slideJ * s[i] / sp : 0.0;
            }
        }
        double[] j = {jn * n[0] + jt[0], jn * n[1] + jt[1], jn * n[2] + jt[2]};
        double before = run.kinetic(y);
        double drive = driveOf(j, y);
        applyImpulse(j);
        projectOntoSurface(false);
        double vn1 = ContactKinematics.relativeNormalSpeed(run.slot, run.t, n, y);
        run.impactLoss += before - run.kinetic(y) + drive;
        run.impulseDrive += drive;
        if (vn1 <= run.settleSpeed) {
            double[] saved = y.clone();
            double ke = run.kinetic(y);
            double[] settle = {-m * vn1 * n[0], -m * vn1 * n[1], -m * vn1 * n[2]};
            double settleDrive = driveOf(settle, y);
            for (int i = 0; i < 3; i++) {
                y[V + i] -= vn1 * n[i];
            }
            double settleLoss = ke - run.kinetic(y) + settleDrive;
            double lossBefore = y[LOSS + LossKind.SLIDING_FRICTION.ordinal()];
            double driveBefore = run.impulseDrive;
            double[] sl = slipOf(y);
            Phase next = chooseContactPhase(Vec.norm(sl) <= run.stickEps);
            if (next != Phase.FLIGHT) {
                run.impactLoss += settleLoss;
                run.impulseDrive += settleDrive;
                run.changePhase(next);
                return new Vector3D(j[0], j[1], j[2]).add(-m * vn1, new Vector3D(n[0], n[1], n[2]));
            }
            run.y = saved;
            saved[LOSS + LossKind.SLIDING_FRICTION.ordinal()] = lossBefore;
            run.impulseDrive = driveBefore;
        }
        run.setPhase(Phase.FLIGHT);
        return new Vector3D(j[0], j[1], j[2]);
    }

    /**
     * The work {@code J·u(p)} an impulse at the contact point receives from a moving patch (the part
     * of the kinetic energy change that is drive work, not loss); 0 on a still patch.
     */
    private double driveOf(double[] j, double[] y) {
        if (!run.slot.moving) {
            return 0.0;
        }
        double[] c = {y[C], y[C + 1], y[C + 2]};
        double[] up = ContactKinematics.patchVelocityAtContact(run.slot, run.t, c, r, dyn.geo.normal);
        return j[0] * up[0] + j[1] * up[1] + j[2] * up[2];
    }

    /** Applies an impulse J at the contact point: {@code Δv = J/m}, {@code Δω = −r n × J / I}. */
    private void applyImpulse(double[] j) {
        double[] y = run.y;
        double[] n = dyn.geo.normal;
        for (int i = 0; i < 3; i++) {
            y[V + i] += j[i] / m;
        }
        double[] nxj = new double[3];
        Vec.cross(n, j, nxj);
        for (int i = 0; i < 3; i++) {
            y[W + i] -= r * nxj[i] / inertia;
        }
    }

    // ---------------------------------------------------------------- several contacts

    /**
     * Constraint drift of a state with several contacts, as the snapshot measures it: the largest distance
     * residual {@code |d_i − r|} over (projection threshold · r), the largest slip of a rolling contact over
     * (projection threshold · speed scale), and the quaternion-norm drift.
     */
    double multiDrift(double ts, double[] ys) {
        dyn.phase = run.phase();
        dyn.evaluate(ts, ys);
        double thr = run.set.effectiveProjectionThreshold();
        double d = 0;
        ContactSet set = run.contacts;
        for (int k = 0; k < set.count(); k++) {
            d = Math.max(d, Math.abs(dyn.contactDistance[k] - r) / (thr * r));
            if (set.at(k).mode == Mode.ROLLING) {
                d = Math.max(d, dyn.contactSlipSpeed[k] / (thr * run.speedScale));
            }
        }
        double qd = Math.abs(StateMapper.quaternionNorm(ys) - 1) / (Snapshots.QUATERNION_DRIFT * (thr / 1e-10));
        return Math.max(d, qd);
    }

    /**
     * Moves the centre onto every touched surface at once: Gauss–Newton on {@code d_i(c) = r} with
     * {@code ∂d_i/∂c = n_iᵀ}, the least-norm step {@code Δc = Nᵀ (N Nᵀ)⁺ (r − d)} (pseudo-inverse, so two
     * parallel walls at the same gap are handled), a few iterations (one for planes).
     */
    void projectPositionOnContacts(double ts, double[] ys) {
        ContactSet set = run.contacts;
        int count = set.count();
        if (count == 2 && projectPositionOnTwo(ts, ys)) {
            return;
        }
        double[][] rows = new double[count][];
        double[] res = new double[count];
        double[] unit = {1, 1, 1};
        for (int iter = 0; iter < 6; iter++) {
            double worst = 0;
            for (int k = 0; k < count; k++) {
                ContactSlot s = set.at(k);
                s.query(ts, run.centreOf(ys));
                rows[k] = s.geo.normal.clone();
                res[k] = r - s.geo.distance;
                worst = Math.max(worst, Math.abs(res[k]));
            }
            if (worst <= 1e-15 * r) {
                return;
            }
            double[] step = LeastNorm.solve(rows, unit, res);
            for (int i = 0; i < 3; i++) {
                ys[C + i] += step[i];
            }
        }
    }

    /**
     * {@link #projectPositionOnContacts} for two contacts in closed form ({@link RollingPair#stepPosition}), no
     * allocation; false (nothing moved) when their normals are nearly parallel or antipodal.
     */
    private boolean projectPositionOnTwo(double ts, double[] ys) {
        ContactSlot a = run.contacts.at(0);
        ContactSlot b = run.contacts.at(1);
        for (int iter = 0; iter < 6; iter++) {
            a.query(ts, run.centreOf(ys));
            b.query(ts, run.centreOf(ys));
            double ra = r - a.geo.distance;
            double rb = r - b.geo.distance;
            if (Math.max(Math.abs(ra), Math.abs(rb)) <= 1e-15 * r) {
                return true;
            }
            if (!RollingPair.stepPosition(a.geo.normal, ra, b.geo.normal, rb, ys)) {
                // the general iteration goes on from here
                return false;
            }
        }
        return true;
    }

    /**
     * The velocity projection onto the constraints of every contact, orthogonal in the kinetic-energy metric
     * ({@code M = diag(m 1, I 1)}): with {@code J} the stacked constraint rows (a rolling contact: its
     * contact-point velocity {@code v + r n_i × ω}, three rows; a sliding contact: its normal speed
     * {@code n_i·v}, one row), {@code ν ← ν − M⁻¹Jᵀ (J M⁻¹ Jᵀ)⁺ J ν}. This is the smallest change of kinetic
     * energy that meets the constraints, the impulses {@code Jᵀλ} acting at the contact points (a sticking
     * or plastic impulse per contact, solved together; the pseudo-inverse takes the squeeze between two
     * rolling contacts as zero). The geometry must be queried at the state's centre.
     *
     * @return the work those impulses receive from moving patches, {@code Σ J_i·u(p_i)} (J; 0 on still patches)
     */
    double projectVelocityOnContacts(double[] ys) {
        ContactSet set = run.contacts;
        if (set.rollingPair() && RollingPair.projectVelocity(r, m, inertia, set.at(0).geo.normal,
            set.at(1).geo.normal, ys)) {
            // two rolling contacts on still patches: the closed form, no work from the patches
            return 0.0;
        }
        int count = set.count();
        java.util.List<double[]> jr = new java.util.ArrayList<>();
        java.util.List<Integer> owner = new java.util.ArrayList<>();
        java.util.List<Double> goal = new java.util.ArrayList<>();
        for (int k = 0; k < count; k++) {
            ContactSlot s = set.at(k);
            double[] n = s.geo.normal;
            double[] c0 = {ys[C], ys[C + 1], ys[C + 2]};
            if (s.mode == Mode.SLIDING) {
                jr.add(new double[] {n[0], n[1], n[2], 0, 0, 0});
                owner.add(k);
                // the normal speed relative to the patch: n·v = n·u(c)
                double[] uc = new double[3];
                if (s.moving) {
                    s.poseAt(run.t).velocityAt(c0, uc);
                }
                goal.add(Vec.dot(n, uc));
                continue;
            }
            // the contact point moves with the patch: v + r n × ω = u(p)
            double[] up = ContactKinematics.patchVelocityAtContact(s, run.t, c0, r, n);
            for (int c = 0; c < 3; c++) {
                double[] e = {c == 0 ? 1 : 0, c == 1 ? 1 : 0, c == 2 ? 1 : 0};
                double[] en = new double[3];
                Vec.cross(e, n, en);
                jr.add(new double[] {e[0], e[1], e[2], r * en[0], r * en[1], r * en[2]});
                owner.add(k);
                goal.add(up[c]);
            }
        }
        double[][] rows = jr.toArray(new double[0][]);
        double[] target = new double[rows.length];
        for (int p = 0; p < rows.length; p++) {
            target[p] = goal.get(p);
        }
        double[] minv = {1 / m, 1 / m, 1 / m, 1 / inertia, 1 / inertia, 1 / inertia};
        double[] b = new double[rows.length];
        for (int p = 0; p < rows.length; p++) {
            double[] row = rows[p];
            b[p] = row[0] * ys[V] + row[1] * ys[V + 1] + row[2] * ys[V + 2]
                + row[3] * ys[W] + row[4] * ys[W + 1] + row[5] * ys[W + 2] - target[p];
        }
        double[] lambda = LeastNorm.multipliers(rows, minv, b);
        double drive = 0;
        for (int p = 0; p < rows.length; p++) {
            double[] row = rows[p];
            for (int i = 0; i < 6; i++) {
                double d = minv[i] * row[i] * lambda[p];
                ys[(i < 3 ? V : W - 3) + i] -= d;
            }
            // the impulse at the contact point is −λ along the row's linear part; its work on the patch's velocity
            drive -= lambda[p] * target[p];
        }
        return drive;
    }

    /**
     * Settles the modes of several contacts after a change (a contact reached, released, stuck, handed over, or
     * a start): a rolling contact whose slip exceeds the stick threshold slides along its slip, unless its law's
     * grip is unbounded (pure rolling: the projection then stops the slip, as the impulse of an impact would;
     * a hand-over onto walls that move otherwise, a conveyor groove, makes such slip); the velocity is
     * projected onto the constraints (the energy removed booked as sliding friction, as for the sticking
     * impulse of one contact); then, repeatedly, a contact whose normal force is not positive is released
     * (the most negative first) and a rolling contact that needs more friction than its grip slides against
     * the friction it needed (the largest excess first), until every contact holds. With one contact left the
     * single-contact engine takes over (rolling: the velocity is set to the no-slip {@code r ω × n}).
     *
     * @return the patch ids released on the way (no events are logged for them)
     */
    java.util.List<String> settleContacts() {
        double[] y = run.y;
        ContactSet set = run.contacts;
        java.util.List<String> released = new java.util.ArrayList<>();
        // contacts set sliding against the friction they needed in this settle (their slip starts at zero), and
        // sliding contacts stuck in it because their slip was within the band (logged as stick at the end)
        java.util.List<ContactSlot> forced = new java.util.ArrayList<>(2);
        java.util.List<ContactSlot> stuck = new java.util.ArrayList<>(2);
        if (!set.multi() && set.count() == 1 && set.active().mode == Mode.SLIDING) {
            // one sliding contact keeps its held direction in the right-hand side: the slot takes it over
            System.arraycopy(dyn.slideDir0, 0, set.active().slideDir, 0, 3);
        }
        boolean gripKnown = false;
        for (int k = 0; k < set.count(); k++) {
            ContactSlot s = set.at(k);
            s.query(run.t, run.centreOf(y));
            if (s.mode == Mode.ROLLING) {
                double[] sl = relativeSlip(s, y);
                double sp = Vec.norm(sl);
                if (sp > run.stickEps && set.multi()) {
                    if (!gripKnown) {
                        dyn.phase = run.phase();
                        dyn.evaluate(run.t, y);
                        gripKnown = true;
                    }
                    if (dyn.contactGrip[k] == Double.POSITIVE_INFINITY) {
                        // unbounded grip (pure rolling): the velocity projection below stops the slip by
                        // impulses, booked, as at an impact; a bounded grip cannot without a normal impulse
                        continue;
                    }
                }
                if (sp > run.stickEps) {
                    for (int i = 0; i < 3; i++) {
                        s.slideDir[i] = sl[i] / sp;
                    }
                    set.setMode(s, Mode.SLIDING);
                }
            }
        }
        for (int round = 0; round < 4 * ContactForceSolver.MAX_CONTACTS; round++) {
            if (set.count() == 0) {
                break;
            }
            double[] g = run.g;
            double heightBefore = -(g[0] * y[C] + g[1] * y[C + 1] + g[2] * y[C + 2]);
            projectPositionOnContacts(run.t, y);
            // the projection's change of potential energy m g·Δc, booked with the velocity projection's below
            double liftWork = m * (-(g[0] * y[C] + g[1] * y[C + 1] + g[2] * y[C + 2]) - heightBefore);
            y[LOSS + LossKind.SLIDING_FRICTION.ordinal()] -= liftWork;
            for (int k = 0; k < set.count(); k++) {
                set.at(k).query(run.t, run.centreOf(y));
            }
            double before = run.kinetic(y);
            double drive = projectVelocityOnContacts(y);
            y[LOSS + LossKind.SLIDING_FRICTION.ordinal()] += before - run.kinetic(y) + drive;
            run.impulseDrive += drive;
            if (!set.multi()) {
                break;
            }
            // a sliding contact whose slip the projection has brought within the stick band sticks too: its own
            // stick rule would start below its threshold and never see the slip fall through it, and Coulomb
            // friction along a held direction inside the band chatters about the threshold (design notes §4)
            ContactSlot joins = null;
            for (int k = 0; k < set.count() && joins == null; k++) {
                ContactSlot s = set.at(k);
                if (s.mode == Mode.SLIDING && !forced.contains(s) && !stuck.contains(s)
                    && Vec.norm(relativeSlip(s, y)) <= run.stickEps) {
                    joins = s;
                }
            }
            if (joins != null) {
                stuck.add(joins);
                set.setMode(joins, Mode.ROLLING);
                continue;
            }
            dyn.phase = run.phase();
            dyn.evaluate(run.t, y);
            // a contact whose normal force is not positive is released; "not positive" up to rounding relative to
            // the contacts' forces, so that a wall left exactly unloaded by the others' modes (a ball pressed against
            // a wall only by the floor's sliding friction, the floor sticking) is released in every frame
            double total = 0;
            for (int k = 0; k < set.count(); k++) {
                total += Math.abs(dyn.contactNormal[k]);
            }
            int worst = -1;
            double low = 1e-12 * total + forceFloor();
            for (int k = 0; k < set.count(); k++) {
                if (dyn.contactNormal[k] <= low) {
                    low = dyn.contactNormal[k];
                    worst = k;
                }
            }
            if (worst >= 0) {
                ContactSlot s = set.at(worst);
                released.add(s.id);
                set.remove(s);
                run.syncActive();
                continue;
            }
            int slips = -1;
            double excess = 1;
            for (int k = 0; k < set.count(); k++) {
                double gl = dyn.contactGrip[k];
                if (set.at(k).mode == Mode.ROLLING && dyn.contactNeeded[k] > gl) {
                    double ratio = gl > 0 ? dyn.contactNeeded[k] / gl : Double.POSITIVE_INFINITY;
                    if (ratio > excess || slips < 0) {
                        excess = ratio;
                        slips = k;
                    }
                }
            }
            if (slips >= 0) {
                forced.add(set.at(slips));
                slideAgainstNeeded(slips);
                continue;
            }
            break;
        }
        finishSettle();
        for (ContactSlot s : stuck) {
            if (s.mode == Mode.ROLLING && set.positionOf(s) >= 0) {
                run.logOn(s.id, EventKind.STICK, run.toState(run.t, y, run.phase()), null, Vector3D.ZERO, null, null);
            }
        }
        return released;
    }

    /** The slip of the contact point relative to a patch, {@code P((v − u(c)) − r (ω − Ω) × n)} (queried geometry). */
    private double[] relativeSlip(ContactSlot s, double[] ys) {
        double[] sl = new double[3];
        if (s.moving) {
            double[] vr = new double[3];
            double[] wr = new double[3];
            ContactKinematics.relative(s, run.t, ys, vr, wr);
            ContactKinematics.slip(r, vr, 0, wr, 0, s.geo.normal, sl);
        } else {
            ContactKinematics.slip(r, ys, V, ys, W, s.geo.normal, sl);
        }
        return sl;
    }

    /** After a change of several contacts: one left is the single-contact engine's again. */
    private void finishSettle() {
        ContactSet set = run.contacts;
        run.syncActive();
        if (set.count() == 0) {
            phaseTo(Phase.FLIGHT);
            return;
        }
        if (!set.multi()) {
            ContactSlot s = set.active();
            // the single contact keeps its hold direction in the right-hand side
            System.arraycopy(s.slideDir, 0, dyn.slideDir0, 0, 3);
            Phase p = s.mode == Mode.SLIDING ? Phase.SLIDING : Phase.ROLLING;
            phaseTo(p);
            if (p == Phase.ROLLING) {
                setDerivedVelocity();
                // the grip test of the one contact left (its own rule watches only from above)
                Phase q = contactPhaseAfterStick();
                if (q != p) {
                    phaseTo(q);
                }
            }
            return;
        }
        phaseTo(set.phase());
    }

    /** Sets the global phase: at the start without a phase span (the run opens its first span after). */
    private void phaseTo(Phase p) {
        if (starting) {
            run.setPhase(p);
        } else {
            run.changePhase(p);
        }
    }

    /** Sets the contact at position k sliding against the friction rolling needed there. */
    private void slideAgainstNeeded(int k) {
        ContactSlot s = run.contacts.at(k);
        double[] f = dyn.contactFriction[k];
        double fn = Vec.norm(f);
        if (fn > 0) {
            for (int i = 0; i < 3; i++) {
                s.slideDir[i] = -f[i] / fn;
            }
        } else {
            double[] n = s.geo.normal;
            double[] a = Math.abs(n[0]) < 0.9 ? new double[] {1, 0, 0} : new double[] {0, 1, 0};
            Vec.cross(n, a, s.slideDir);
            Vec.scale(s.slideDir, 1.0 / Vec.norm(s.slideDir));
        }
        run.contacts.setMode(s, Mode.SLIDING);
    }

    /**
     * One contact of several ends: lift-off (its normal force fell to zero) or exit (its contact point left
     * the patch); the event names that patch; the others settle ({@link #settleContacts}).
     */
    void release(ContactSlot s, EventKind kind, String edge, BallState before) {
        run.contacts.remove(s);
        run.syncActive();
        settleContacts();
        run.logOn(s.id, kind, before, null, Vector3D.ZERO, edge, null);
    }

    /**
     * One contact of several leaves its patch where a neighbour continues the surface (a groove or rails made
     * of segments): the neighbour takes its place and mode, no impulse, and the contacts settle
     * ({@link #settleContacts}; a continuation with the same normal changes nothing). Event {@code handover}
     * on the patch entered, from the patch left.
     */
    void handOverContact(ContactSlot out, ContactSlot in, String edge, BallState before) {
        run.contacts.replace(out, in);
        run.syncActive();
        in.query(run.t, run.centreOf(run.y));
        settleContacts();
        run.logOn(in.id, EventKind.HANDOVER, before, null, Vector3D.ZERO, edge, out.id);
    }

    /** Slip onset at one contact of several: it slides against the friction rolling needed there. */
    void startSliding(ContactSlot s, BallState before) {
        dyn.phase = run.phase();
        dyn.evaluate(run.t, run.y);
        slideAgainstNeeded(run.contacts.positionOf(s));
        run.changePhase(run.contacts.phase());
        run.logOn(s.id, EventKind.SLIP, before, null, Vector3D.ZERO, null, null);
    }

    /**
     * Stick at one contact of several: it is set rolling, and the velocity projection of
     * {@link #settleContacts} removes the rest of its slip (and the grip test may send it sliding again, with
     * no event, as for one contact).
     */
    void stickContact(ContactSlot s, BallState before) {
        run.contacts.setMode(s, Mode.ROLLING);
        double[] v0 = {run.y[V], run.y[V + 1], run.y[V + 2]};
        settleContacts();
        if (s.mode == Mode.ROLLING) {
            Vector3D j = new Vector3D(m * (run.y[V] - v0[0]), m * (run.y[V + 1] - v0[1]), m * (run.y[V + 2] - v0[2]));
            run.logOn(s.id, EventKind.STICK, before, null, j, null, null);
        }
    }

    /**
     * The ball, touching one or two patches, reaches another (design notes §9): with the relative normal speed
     * {@code u = −n_j·v} at most the settle speed it is a gentle touch (event {@code touch}): the normal
     * velocity into the wall is removed and the contact begins; faster, it is an impact (event {@code impact}):
     * the impulse of one contact ({@link #impact}'s restitution and friction) at the new wall, then the
     * velocity into the walls already touched removed by plastic impulses there (solved together,
     * {@link #projectVelocityOnContacts}); when the rebound from the new wall is at most the settle speed the
     * new contact begins, else the ball leaves it. Then the modes settle ({@link #settleContacts}).
     * On a moving patch the normal speed, slip and impulses are relative to it, and the impulses' work on the
     * patch's velocity is booked as drive work.
     */
    void reach(ContactSlot j, BallState before) {
        double[] y = run.y;
        ContactSet set = run.contacts;
        if (run.phase() == Phase.ROLLING && !set.multi()) {
            setDerivedVelocity();
        }
        j.query(run.t, run.centreOf(y));
        double[] n = j.geo.normal.clone();
        double vn = ContactKinematics.relativeNormalSpeed(j, run.t, n, y);
        double before0 = run.kinetic(y);
        double[] cj = {y[C], y[C + 1], y[C + 2]};
        double[] upj = ContactKinematics.patchVelocityAtContact(j, run.t, cj, r, n);
        Vector3D impulse;
        EventKind kind;
        boolean joins;
        double drive;
        if (-vn <= run.settleSpeed) {
            kind = EventKind.TOUCH;
            double[] jn = {-m * vn * n[0], -m * vn * n[1], -m * vn * n[2]};
            for (int i = 0; i < 3; i++) {
                y[V + i] += jn[i] / m;
            }
            drive = Vec.dot(jn, upj);
            impulse = new Vector3D(jn[0], jn[1], jn[2]);
            joins = true;
        } else {
            kind = EventKind.IMPACT;
            double[] s = relativeSlip(j, y);
            double e = j.law.restitution().orElse(0.0);
            double jnMag = -(1 + e) * m * vn;
            double f = -k * m / (1 + k);
            double[] jt = {f * s[0], f * s[1], f * s[2]};
            double[] w = {y[W], y[W + 1], y[W + 2]};
            if (j.moving) {
                double[] vr = new double[3];
                ContactKinematics.relative(j, run.t, y, vr, w);
            }
            if (!j.contextReady) {
                run.model.access().set(j.ctx, run.ball, j.geo, 0.0, Phase.ROLLING, new double[3], w, false);
                j.contextReady = true;
            }
            run.model.access().set(j.ctx, run.ball, j.geo, jnMag, Phase.SLIDING, s, w, true);
            double gripJ = j.law.gripLimit(j.ctx);
            if (!(gripJ >= 0)) {
                throw new RunFailure("contact law " + j.law.name() + " returned grip limit " + gripJ
                    + " N·s at normal impulse " + jnMag + " N·s; it must be a number >= 0");
            }
            if (Vec.norm(jt) > gripJ) {
                double slideJ = j.law.slidingFriction(j.ctx);
                if (!(slideJ >= 0 && slideJ < Double.POSITIVE_INFINITY)) {
                    throw new RunFailure("contact law " + j.law.name() + " returned sliding friction " + slideJ
                        + " N·s at normal impulse " + jnMag + " N·s; it must be a number >= 0 and finite");
                }
                double sp = Vec.norm(s);
                for (int i = 0; i < 3; i++) {
                    jt[i] = sp > 0 ? -slideJ * s[i] / sp : 0.0;
                }
            }
            double[] jv = {jnMag * n[0] + jt[0], jnMag * n[1] + jt[1], jnMag * n[2] + jt[2]};
            double[] nxj = new double[3];
            Vec.cross(n, jv, nxj);
            for (int i = 0; i < 3; i++) {
                y[V + i] += jv[i] / m;
                y[W + i] -= r * nxj[i] / inertia;
            }
            drive = Vec.dot(jv, upj);
            // the walls already touched hold: no velocity into them (plastic impulses, solved together)
            drive += pressOnlyOutOf(y);
            double vn1 = ContactKinematics.relativeNormalSpeed(j, run.t, n, y);
            joins = vn1 <= run.settleSpeed;
            impulse = new Vector3D(jv[0], jv[1], jv[2]);
        }
        run.impactLoss += before0 - run.kinetic(y) + drive;
        run.impulseDrive += drive;
        if (joins) {
            set.add(j, Mode.ROLLING);
            double lossBefore = y[LOSS + LossKind.SLIDING_FRICTION.ordinal()];
            settleContacts();
            // the settling of a new contact is part of the impact's loss
            double settled = y[LOSS + LossKind.SLIDING_FRICTION.ordinal()] - lossBefore;
            y[LOSS + LossKind.SLIDING_FRICTION.ordinal()] = lossBefore;
            run.impactLoss += settled;
        } else {
            settleContacts();
        }
        run.logOn(j.id, kind, before, null, impulse, null, null);
    }

    /**
     * After an impact from flight that left the ball in contact: any other patch that the ball already
     * touches (distance r within the contact tolerance, contact point on the patch) and moves into is reached
     * at once ({@link #reach}), so that a ball landing where two walls meet (the bottom of a groove) does not
     * start its contact segment inside the second wall, where no root of the impact function would be left.
     *
     * @param before the state before the impact (for the events)
     */
    void reachPressed(BallState before) {
        reachPressedRigid(before);
    }

    /**
     * Begins a compliant contact on a patch (queried at the run's state): its damping is set from the normal speed
     * relative to the patch now (at least the settle speed), and an {@code impact} event on it is logged (no impulse).
     *
     * @param s a compliant slot whose contact is not under way
     * @param before the state before (for the event)
     */
    void beginCompliant(ContactSlot s, BallState before) {
        s.query(run.t, run.centreOf(run.y));
        double[] full = run.phase().inContact() ? run.y.clone() : run.y;
        if (run.phase() == Phase.ROLLING && !run.contacts.multi()) {
            run.slot.query(run.t, run.centreOf(full));
            ContactKinematics.rollingVelocity(run.slot, run.t, r, run.dyn.geo.normal, full);
            s.query(run.t, run.centreOf(full));
        }
        double vn = -ContactKinematics.relativeNormalSpeed(s, run.t, s.geo.normal, full);
        s.touchSpeed = Math.max(vn, run.settleSpeed);
        s.pressing = true;
        run.logOn(s.id, EventKind.IMPACT, before, null, Vector3D.ZERO, null, null);
    }

    private void reachPressedRigid(BallState before) {
        if (run.slots.length < 2 || !run.phase().inContact()) {
            return;
        }
        double tol = run.set.contactTolerance() * r;
        for (ContactSlot s : run.slots) {
            if (s.mode != Mode.APART || run.contacts.count() >= ContactForceSolver.MAX_CONTACTS) {
                continue;
            }
            double[] full = run.y.clone();
            if (run.phase() == Phase.ROLLING && !run.contacts.multi()) {
                run.slot.query(run.t, run.centreOf(full));
                ContactKinematics.rollingVelocity(run.slot, run.t, r, run.dyn.geo.normal, full);
            }
            try {
                s.query(run.t, run.centreOf(full));
            } catch (org.trundle.core.SurfaceDomainException e) {
                continue;
            }
            if (s.geo.distance - r <= tol && s.geo.patchMargin >= 0
                && ContactKinematics.normalPart(full, V, s.geo.normal) <= 0) {
                if (s.compliance != null) {
                    if (!s.pressing) {
                        beginCompliant(s, before);
                    }
                    continue;
                }
                reach(s, before);
            }
        }
    }

    /**
     * Removes any velocity into the walls already touched (contacts whose normal speed is negative after an
     * impulse elsewhere), by the projection of {@link #projectVelocityOnContacts} restricted to their normal
     * rows: the walls the ball moves away from are left alone.
     */
    private double pressOnlyOutOf(double[] y) {
        ContactSet set = run.contacts;
        int count = set.count();
        java.util.List<double[]> into = new java.util.ArrayList<>();
        java.util.List<Double> speeds = new java.util.ArrayList<>();
        java.util.List<double[]> points = new java.util.ArrayList<>();
        double[] c0 = {y[C], y[C + 1], y[C + 2]};
        for (int k = 0; k < count; k++) {
            ContactSlot s = set.at(k);
            s.query(run.t, run.centreOf(y));
            double vn = ContactKinematics.relativeNormalSpeed(s, run.t, s.geo.normal, y);
            if (vn < 0) {
                into.add(s.geo.normal.clone());
                speeds.add(vn);
                points.add(ContactKinematics.patchVelocityAtContact(s, run.t, c0, r, s.geo.normal));
            }
        }
        if (into.isEmpty()) {
            return 0.0;
        }
        double[][] rows = into.toArray(new double[0][]);
        double[] b = new double[rows.length];
        for (int p = 0; p < rows.length; p++) {
            b[p] = speeds.get(p);
        }
        // normal impulses act through the centre: Δv = −Nᵀ (N Nᵀ)⁺ (N v − N u), the spin is unchanged
        double[] dv = LeastNorm.solve(rows, new double[] {1, 1, 1}, b);
        for (int i = 0; i < 3; i++) {
            y[V + i] -= dv[i];
        }
        // the drive work of those impulses: split Δv by wall (least-norm multipliers) is not needed on still walls
        double work = 0;
        if (points.stream().anyMatch(u -> Vec.norm(u) > 0)) {
            double[] lambda = LeastNorm.multipliers(rows, new double[] {1, 1, 1}, b);
            for (int p = 0; p < rows.length; p++) {
                for (int i = 0; i < 3; i++) {
                    work -= m * lambda[p] * rows[p][i] * points.get(p)[i];
                }
            }
        }
        return work;
    }

    // ---------------------------------------------------------------- kinematics on the run state

    /** Slip velocity of the contact point, tangential part, from the state's v and ω (uses dyn.geo; allocates). */
    double[] slipOf(double[] ys) {
        double[] s = new double[3];
        if (run.slot.moving) {
            double[] vr = new double[3];
            double[] wr = new double[3];
            ContactKinematics.relative(run.slot, run.t, ys, vr, wr);
            ContactKinematics.slip(r, vr, 0, wr, 0, dyn.geo.normal, s);
            return s;
        }
        ContactKinematics.slip(r, ys, V, ys, W, dyn.geo.normal, s);
        return s;
    }

    /**
     * A rolling contact handed over to a neighbour (one contact; {@link #projectOntoSurface} done on the
     * neighbour): velocity and spin are kept, so on a neighbour that moves otherwise than the patch left (a still
     * tube into a spinning one, a floor onto a belt) the contact point slips by
     * {@code s = P(v − u(p)) − r (ω − Ω) × n}; where both move alike {@code s} is rounding and the no-slip
     * velocity is only re-derived. A tangent join gives no normal impulse, so a bounded grip cannot stop that slip
     * at once: the ball slides on, against its slip, until friction stops it (a {@code stick} event); an unbounded
     * grip (pure rolling) stops it by the impulse {@code J = −k m s/(1+k)} ({@link #stickImpulse}, its loss and
     * drive work booked), as at an impact (design notes §6, §9). Imposing the neighbour's no-slip velocity instead
     * would change the kinetic energy with nothing booked.
     *
     * @return the phase to go on in: rolling, or sliding with its direction set
     */
    Phase handOverRolling() {
        double[] y = run.y;
        run.slot.query(run.t, run.centreOf(y));
        double[] s = slipOf(y);
        double sp = Vec.norm(s);
        if (!(sp > run.stickEps)) {
            setDerivedVelocity();
            return Phase.ROLLING;
        }
        dyn.phase = Phase.ROLLING;
        dyn.evaluate(run.t, y);
        if (dyn.grip == Double.POSITIVE_INFINITY) {
            stickImpulse();
            setDerivedVelocity();
            return Phase.ROLLING;
        }
        for (int i = 0; i < 3; i++) {
            dyn.slideDir0[i] = s[i] / sp;
        }
        dyn.phase = Phase.SLIDING;
        return Phase.SLIDING;
    }

    /** Sets the velocity slot of the run's state to the no-slip velocity r ω × n. */
    void setDerivedVelocity() {
        if (run.contacts.multi()) {
            // several contacts integrate the velocity
            return;
        }
        double[] y = run.y;
        run.slot.query(run.t, run.centreOf(y));
        ContactKinematics.rollingVelocity(run.slot, run.t, r, dyn.geo.normal, y);
    }

    /**
     * Moves the centre to distance r along the normal and, with {@code removeNormal}, removes the
     * normal velocity.
     */
    void projectOntoSurface(boolean removeNormal) {
        double[] y = run.y;
        run.slot.query(run.t, run.centreOf(y));
        double dr = r - dyn.geo.distance;
        double[] n = dyn.geo.normal;
        for (int i = 0; i < 3; i++) {
            y[C + i] += dr * n[i];
        }
        run.slot.query(run.t, run.centreOf(y));
        if (removeNormal) {
            ContactKinematics.removeRelativeNormalPart(run.slot, run.t, dyn.geo.normal, y);
        }
    }

    /**
     * The projection of a contact state back onto the constraints (a new array), applied where
     * the drift measure has reached 1: the centre moves along the normal to {@code d = r}, the
     * quaternion is normalised, and the velocity is set to the no-slip {@code r ω × n} (rolling) or
     * stripped of its normal part (sliding).
     */
    double[] projected(double ts, double[] ys) {
        if (run.contacts.multi()) {
            // several contacts: the centre onto every surface, the quaternion normalised, the velocity onto
            // every contact's constraints (the energy this changes is at the integration tolerance, not booked)
            double[] p = ys.clone();
            double qn = StateMapper.quaternionNorm(p);
            for (int i = 0; i < 4; i++) {
                p[Q + i] /= qn;
            }
            projectPositionOnContacts(ts, p);
            for (int k = 0; k < run.contacts.count(); k++) {
                run.contacts.at(k).query(ts, run.centreOf(p));
            }
            projectVelocityOnContacts(p);
            return p;
        }
        run.slot.query(ts, run.centreOf(ys));
        double[] p = ys.clone();
        double dr = r - dyn.geo.distance;
        for (int i = 0; i < 3; i++) {
            p[C + i] += dr * dyn.geo.normal[i];
        }
        double qn = StateMapper.quaternionNorm(p);
        for (int i = 0; i < 4; i++) {
            p[Q + i] /= qn;
        }
        run.slot.query(ts, run.centreOf(p));
        double[] n = dyn.geo.normal;
        if (run.phase() == Phase.ROLLING) {
            ContactKinematics.rollingVelocity(run.slot, ts, r, n, p);
        } else {
            ContactKinematics.removeRelativeNormalPart(run.slot, ts, n, p);
        }
        return p;
    }
}
