package org.trundle.core.engine;

import static org.trundle.core.engine.StateMapper.DIM;
import static org.trundle.core.engine.StateMapper.V;
import static org.trundle.core.engine.StateMapper.W;

import java.util.Arrays;

import org.hipparchus.ode.ODEStateAndDerivative;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Phase;

/**
 * A small cache of {@link Snapshot}s of the last states the detectors asked about: one evaluation
 * per state serves every rule. Keys are the integrator's compact state and time, the phase and the
 * contact set's generation (a hand-over or a contact added at the same state is another evaluation);
 * Hipparchus hands the same state object to every detector in turn, so an identity shortcut
 * answers most asks without comparing arrays.
 */
final class Snapshots {
    private static final int CACHE = 4;

    /**
     * Drift of the quaternion norm {@code ||q| − 1|} above which the step-end handler restarts the
     * integrator only to normalise it, at a distance threshold of 1e-10 r; it scales with the
     * distance threshold in force
     * ({@link org.trundle.core.SolverSettings#effectiveProjectionThreshold()}).
     * The norm does not enter the equations of motion (the spin is integrated on its own and every
     * output state is normalised), so a tight threshold (1e-12 formerly) restarted the integration
     * on most steps for no gain in accuracy; the quaternion is still normalised whenever a
     * projection happens anyway.
     */
    static final double QUATERNION_DRIFT = 1e-9;

    private final Run run;
    private final Dynamics dyn;
    private final double r;
    /** Distance threshold in force, as a fraction of the radius. */
    private final double distanceThreshold;
    /** Quaternion norm threshold in force. */
    private final double quaternionThreshold;
    private final double[][] cacheY = new double[CACHE][DIM];
    private final double[] cacheTime = {Double.NaN, Double.NaN, Double.NaN, Double.NaN};
    private final Phase[] cachePhase = new Phase[CACHE];
    /** The contact set's generation each entry was evaluated with (a switch at the same state changes it). */
    private final long[] cacheContacts = new long[CACHE];
    private final int[] cacheLength = new int[CACHE];
    /** Bumped whenever a slot is reused, so that the identity shortcut never reads stale values. */
    private final long[] cacheGeneration = new long[CACHE];
    private final Snapshot[] values = new Snapshot[CACHE];
    private ODEStateAndDerivative lastState;
    private int lastStateSlot;
    private long lastStateGeneration;
    private int cacheNext;
    /** Full-layout workspace (the integrator's states are compact). */
    private final double[] eventFull = new double[DIM];
    private final double[] probeCentre = new double[3];

    Snapshots(Run run) {
        this.run = run;
        this.dyn = run.dyn;
        this.r = run.r;
        this.distanceThreshold = run.set.effectiveProjectionThreshold();
        this.quaternionThreshold = QUATERNION_DRIFT * (distanceThreshold / 1e-10);
        for (int i = 0; i < CACHE; i++) {
            values[i] = new Snapshot(run.slots.length);
        }
    }

    /**
     * @param s a state of the current segment
     * @return its snapshot, evaluated if not cached (valid until four more states are asked about)
     */
    Snapshot at(ODEStateAndDerivative s) {
        Phase phase = run.phase();
        int slot;
        long contacts = run.contacts.generation();
        if (s == lastState && cacheGeneration[lastStateSlot] == lastStateGeneration
            && cachePhase[lastStateSlot] == phase && cacheContacts[lastStateSlot] == contacts) {
            slot = lastStateSlot;
        } else {
            slot = slotOf(s, phase);
            lastState = s;
            lastStateSlot = slot;
            lastStateGeneration = cacheGeneration[slot];
        }
        return values[slot];
    }

    /** @return the compact integrator state keying the snapshot last returned by {@link #at} (it starts with the centre) */
    double[] lastKey() {
        return cacheY[lastStateSlot];
    }

    private int slotOf(ODEStateAndDerivative s, Phase phase) {
        double[] ys = s.getPrimaryState();
        double ts = s.getTime();
        int len = ys.length;
        for (int i = 0; i < CACHE; i++) {
            if (cachePhase[i] == phase && cacheTime[i] == ts && cacheLength[i] == len
                && cacheContacts[i] == run.contacts.generation() && Arrays.equals(ys, 0, len, cacheY[i], 0, len)) {
                return i;
            }
        }
        // a new state: an event check, or a step end; a run in a long flight makes many of these per step
        Interrupted.check();
        int slot = nextSlot(ts, ys, phase);
        evaluate(ts, dyn.expand(ys, eventFull), values[slot], phase);
        return slot;
    }

    private int nextSlot(double ts, double[] ys, Phase phase) {
        int slot = cacheNext;
        cacheGeneration[slot]++;
        cacheNext = (cacheNext + 1) % CACHE;
        System.arraycopy(ys, 0, cacheY[slot], 0, ys.length);
        cacheLength[slot] = ys.length;
        cacheTime[slot] = ts;
        cachePhase[slot] = phase;
        cacheContacts[slot] = run.contacts.generation();
        return slot;
    }

    /**
     * Dormand–Prince 8(5,3) evaluates its last two main stages at the step end, the second at the
     * step's end state itself (first same as last); the detectors ask about that state next, so
     * its snapshot is taken from that evaluation instead of a new one (a state that differs in the
     * last bit just misses the cache and is evaluated).
     */
    void stageAtStepEnd(double ts, double[] compact, double[] full, double[] fullDot) {
        Phase phase = run.phase();
        if (phase.inContact()) {
            fill(ts, full, fullDot, values[nextSlot(ts, compact, phase)], phase);
        }
    }

    private void evaluate(double ts, double[] ys, Snapshot v, Phase phase) {
        dyn.phase = phase;
        if (phase.inContact()) {
            dyn.evaluate(ts, ys);
        } else {
            double[] c = run.centreOf(ys);
            if (!Double.isFinite(c[0] + c[1] + c[2])) {
                throw Dynamics.nonFiniteCentre(ts, c);
            }
            // an event check in flight is work too: it counts against the evaluation budget
            dyn.countCheck();
            for (ContactSlot s : run.slots) {
                v.slotDistance[s.index] = s.distanceBound(ts, c, 2 * r, 1e-3 * r);
            }
        }
        fill(ts, ys, dyn.lastDerivative(), v, phase);
    }

    /** Fills a snapshot from what the last evaluation left in {@code dyn}, for full state ys and derivative yd. */
    private void fill(double ts, double[] ys, double[] yd, Snapshot v, Phase phase) {
        boolean contact = phase.inContact();
        if (contact) {
            v.normalForce = dyn.normalForce;
            v.gripMargin = dyn.grip - dyn.neededTangential;
            v.slipSpeed = dyn.slipSpeed;
            if (phase == Phase.SLIDING) {
                v.slip[0] = dyn.slip[0];
                v.slip[1] = dyn.slip[1];
                v.slip[2] = dyn.slip[2];
            }
            if (run.slot.moving) {
                // relative to the patch: |v − u(c)| + r|ω − Ω| and |a − du(c)/dt| + r|α − Ω̇|
                v.speed = dyn.relativeSpeed;
                double[] as = dyn.surfaceAcceleration;
                double[] sr = run.slot.pose.spinRate;
                double ax = yd[V] - as[0];
                double ay = yd[V + 1] - as[1];
                double az = yd[V + 2] - as[2];
                double bx = yd[W] - sr[0];
                double by = yd[W + 1] - sr[1];
                double bz = yd[W + 2] - sr[2];
                v.acceleration = Math.sqrt(ax * ax + ay * ay + az * az) + r * Math.sqrt(bx * bx + by * by + bz * bz);
            } else {
                v.speed = ContactKinematics.speedMeasure(r, dyn.vel, ys);
                v.acceleration = Math.sqrt(yd[V] * yd[V] + yd[V + 1] * yd[V + 1] + yd[V + 2] * yd[V + 2])
                    + r * Math.sqrt(yd[W] * yd[W] + yd[W + 1] * yd[W + 1] + yd[W + 2] * yd[W + 2]);
            }
            if (dyn.pivotValid) {
                v.normalSpin = dyn.normalSpin;
                v.pivotMargin = dyn.pivotLimit - Math.abs(dyn.pivotNeeded);
            }
        }
        v.patchMargin = dyn.geo.patchMargin;
        v.distance = dyn.geo.distance;
        double hn = 0;
        double[] h = dyn.geo.hessian;
        for (int i = 0; i < 9; i++) {
            hn += h[i] * h[i];
        }
        v.hessianNorm = Math.sqrt(hn);
        v.fitMargin = 1.0 - r * dyn.geo.curvature1;
        double[] n = dyn.geo.normal;
        double n2 = n[0] * n[0] + n[1] * n[1] + n[2] * n[2];
        if (!(Math.abs(n2 - 1) <= UNIT_NORMAL && Double.isFinite(v.distance + v.hessianNorm)
            && !Double.isNaN(v.patchMargin) && !Double.isNaN(v.fitMargin))) {
            throw brokenGeometry(ys, n2);
        }
        v.normal[0] = n[0];
        v.normal[1] = n[1];
        v.normal[2] = n[2];
        v.drift = contact ? drift(ys, v.distance) : 0.0;
        if (contact && dyn.multi()) {
            fillContacts(ys, v);
        }
        if (contact && run.slots.length > 1) {
            otherPatches(ts, ys[0], ys[1], ys[2], v);
        }
        double vx = contact ? dyn.vel[0] : ys[V];
        double vy = contact ? dyn.vel[1] : ys[V + 1];
        double vz = contact ? dyn.vel[2] : ys[V + 2];
        v.kinetic = run.kinetic(vx, vy, vz, ys);
    }

    /** Several contacts: the per-contact values, the residuals and the drift over every contact. */
    private void fillContacts(double[] ys, Snapshot v) {
        int count = run.contacts.count();
        double err = 0;
        double largest = 0;
        double slipDrift = 0;
        for (int k = 0; k < count; k++) {
            v.contactNormalForce[k] = dyn.contactNormal[k];
            v.contactGripMargin[k] = dyn.contactGrip[k] - dyn.contactNeeded[k];
            v.contactSlipSpeed[k] = dyn.contactSlipSpeed[k];
            System.arraycopy(dyn.contactSlip[k], 0, v.contactSlip[k], 0, 3);
            v.contactMargin[k] = dyn.contactMargin[k];
            err = Math.max(err, Math.abs(dyn.contactDistance[k] - r));
            largest = Math.max(largest, dyn.contactNormal[k]);
            if (run.contacts.at(k).mode == Mode.ROLLING) {
                slipDrift = Math.max(slipDrift, dyn.contactSlipSpeed[k]);
            }
        }
        v.contactDistanceError = err;
        v.contactLargestForce = largest;
        v.drift = Math.max(Math.max(err / (distanceThreshold * r), slipDrift / (distanceThreshold * run.speedScale)),
            Math.abs(StateMapper.quaternionNorm(ys) - 1) / quaternionThreshold);
    }

    /**
     * Contact phases of a scene: a lower bound of the distance of every patch not touched (exact within two
     * radii), with its patch margin and Hessian norm where exact, for the in-contact impact test.
     */
    private void otherPatches(double ts, double x, double y, double z, Snapshot v) {
        double[] c = probeCentre;
        c[0] = x;
        c[1] = y;
        c[2] = z;
        for (ContactSlot s : run.slots) {
            if (s.mode != Mode.APART) {
                continue;
            }
            double d;
            try {
                d = s.distanceBound(ts, c, 2 * r, 1e-3 * r);
            } catch (org.trundle.core.SurfaceDomainException e) {
                // no closest point near the centre: the patch is not within reach here
                d = Double.POSITIVE_INFINITY;
            }
            v.slotDistance[s.index] = d;
            boolean exact = d <= 2 * r;
            v.slotMargin[s.index] = exact ? s.geo.patchMargin : 0.0;
            double hn = 0;
            if (exact) {
                double[] h = s.geo.hessian;
                for (int i = 0; i < 9; i++) {
                    hn += h[i] * h[i];
                }
            }
            v.slotHessianNorm[s.index] = Math.sqrt(hn);
        }
    }

    /**
     * How far from 1 the squared length of a surface's normal may be: far above the rounding of any
     * normalisation (1e-15), far below an error that matters (the rolling centre moves at
     * {@code r ω × n}, so a normal off unit length by ε changes the speed by ε).
     */
    static final double UNIT_NORMAL = 1e-6;

    /** A surface answer that breaks the {@code Surface} contract, described for the failure. */
    private RunFailure brokenGeometry(double[] ys, double n2) {
        ContactGeometry g = dyn.geo;
        StringBuilder what = new StringBuilder();
        if (!(Math.abs(n2 - 1) <= UNIT_NORMAL)) {
            what.append(", normal ").append(Arrays.toString(g.normal)).append(" of length ").append(Math.sqrt(n2))
                .append(" (must be a unit vector)");
        }
        if (!Double.isFinite(g.distance)) {
            what.append(", distance ").append(g.distance).append(" m (must be finite)");
        }
        if (!Vec.allFinite(g.hessian)) {
            what.append(", distance Hessian ").append(Arrays.toString(g.hessian)).append(" 1/m (must be finite)");
        }
        if (Double.isNaN(g.curvature1)) {
            what.append(", curvature NaN");
        }
        if (Double.isNaN(g.patchMargin)) {
            what.append(", patch margin NaN");
        }
        return new RunFailure("surface " + run.surface.name() + " returned a broken geometry at centre ("
            + ys[0] + ", " + ys[1] + ", " + ys[2] + ") m: " + (what.length() > 0 ? what.substring(2)
            : "a distance Hessian too large for its norm to be a finite number"));
    }

    /**
     * Constraint drift of a contact state relative to the projection thresholds (see
     * {@link Snapshot#drift}). Rolling has no slip drift: its velocity is derived, {@code v = r ω × n}.
     */
    double drift(double[] ys, double distance) {
        double d = Math.abs(distance - r) / (distanceThreshold * r);
        return Math.max(d, Math.abs(StateMapper.quaternionNorm(ys) - 1) / quaternionThreshold);
    }

    /**
     * The full-layout state (a new array) of an integrator state of the current segment; while
     * rolling, its velocity slot holds the no-slip {@code r ω × n} (normal from the snapshot).
     */
    double[] fullState(ODEStateAndDerivative s) {
        double[] out = dyn.expand(s.getPrimaryState(), new double[DIM]);
        if (dyn.derivedVelocity()) {
            Snapshot sn = at(s);
            ContactKinematics.rollingVelocity(run.slot, s.getTime(), r, sn.normal, out);
        }
        return out;
    }
}
