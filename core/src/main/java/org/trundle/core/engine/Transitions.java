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
        if (run.compliance != null) {
            // a compliant contact (a one-patch scene that stands still) is a force in flight: any start
            // integrates as flight; a start pressing the wall is a contact already under way (its damping
            // set from the settle speed)
            run.slot.query(t, run.centreOf(y));
            double gap = dyn.geo.distance - r;
            if (gap < -tolLen) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "start centre penetrates surface %s: distance %s m is below the ball radius %s m",
                    run.surface.name(), dyn.geo.distance, r));
            }
            run.touching = gap < 0 && dyn.geo.patchMargin >= 0;
            return Phase.FLIGHT;
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
        ContactSlot touched = run.slots.length > 1 ? touching(t, y, tolLen) : null;
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

    /**
     * The first patch the centre touches (distance r within {@code tol}, contact point on the
     * patch), or null.
     */
    private ContactSlot touching(double t, double[] y, double tol) {
        for (ContactSlot s : run.slots) {
            try {
                s.query(t, run.centreOf(y));
            } catch (org.trundle.core.SurfaceDomainException e) {
                continue;
            }
            if (Math.abs(s.geo.distance - r) <= tol && s.geo.patchMargin >= 0) {
                return s;
            }
        }
        return null;
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
        for (ContactSlot s : run.slots) {
            if (s == run.slot) {
                continue;
            }
            try {
                s.query(t, c);
                if (!(Math.abs(s.geo.distance - r) <= tol)) {
                    continue;
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
        return dyn.normalForce > 0 ? Phase.SLIDING : Phase.FLIGHT;
    }

    /** Rolling if the grip holds the no-slip state, else sliding; flight if the normal force would be negative. */
    Phase contactPhaseAfterStick() {
        dyn.phase = Phase.ROLLING;
        dyn.evaluate(run.t, run.y);
        if (!(dyn.normalForce > 0)) {
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
        dyn.phase = Phase.ROLLING;
        dyn.evaluate(run.t, y);
        double[] n = dyn.geo.normal;
        double sn = dyn.normalSpin;
        double before = run.kinetic(y);
        for (int i = 0; i < 3; i++) {
            y[W + i] -= sn * n[i];
        }
        y[LOSS + LossKind.PIVOTING_RESISTANCE.ordinal()] += before - run.kinetic(y);
        // H n = 0, so the needed couple −I ω·(H v) is the same with the spin about n removed
        boolean hold = Math.abs(dyn.pivotNeeded) <= dyn.pivotLimit && dyn.pivotLimit > 0;
        run.slot.pivotHeld = hold;
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
        ContactSlot slot = run.slot;
        if (!slot.pivotStick || run.phase() != Phase.ROLLING) {
            return null;
        }
        dyn.phase = Phase.ROLLING;
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

    /** Sets the velocity slot of the run's state to the no-slip velocity r ω × n. */
    void setDerivedVelocity() {
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
