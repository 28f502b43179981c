package org.trundle.core.engine;

import static org.trundle.core.engine.StateMapper.C;
import static org.trundle.core.engine.StateMapper.PATH;
import static org.trundle.core.engine.StateMapper.V;
import static org.trundle.core.engine.StateMapper.W;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.ContactLaw;
import org.trundle.core.EventKind;
import org.trundle.core.Integrator;
import org.trundle.core.Phase;
import org.trundle.core.PhaseSpan;
import org.trundle.core.RunEvent;
import org.trundle.core.RunObserver;
import org.trundle.core.Sample;
import org.trundle.core.SampleContact;
import org.trundle.core.Slab;
import org.trundle.core.SolverSettings;
import org.trundle.core.Surface;

/**
 * The state of one run that the loop, the segment, the switch rules and the transitions share:
 * the current time and state array, the contact set, the scales of the run, the event log and
 * phase spans, the ledger (residuals, extremes, impact loss, step count) and the last good state.
 * One per run, never shared between threads.
 */
final class Run {
    final Model model;
    final RunObserver observer;
    final SolverSettings set;
    final Ball ball;
    final double r;
    final double m;
    final double k;
    final double inertia;
    final double[] g;
    final ContactSet contacts;
    /** Every patch's slot, in scene order. */
    final ContactSlot[] slots;
    /** The active slot (the patch touched, or last touched) and its surface and law. */
    ContactSlot slot;
    Surface surface;
    ContactLaw law;
    final Dynamics dyn;
    final Snapshots snapshots;
    /** Whether any patch of the scene is compliant (flight then integrates the full layout). */
    final boolean compliant;
    private final double[] centreWork = new double[3];

    // scales of the run (set at the start)
    double speedScale;
    double stickEps;
    double settleSpeed;
    double impactSlack;
    double restSpeed;
    double restitution;
    double[] absTol;
    double[] relTol;

    /** The message of a typed stop a rule reacted with (geometry). */
    String stopMessage = "";
    /** The engine's own rejection of the start, the one {@link IllegalArgumentException} a run may throw. */
    IllegalArgumentException rejection;

    // where the run is
    double t;
    double[] y;
    double endTime;
    /** In free flight: the time from which no patch can be met again ({@link LeaveCheck}); +∞ otherwise. */
    double flightClear = Double.POSITIVE_INFINITY;
    /** Every patch's slabs ({@code Surface#extent}), asked on the first flight; null before. */
    List<List<Slab>> extents;

    final List<RunEvent> events = new ArrayList<>();
    final List<PhaseSpan> spans = new ArrayList<>();
    private double spanStart;
    /** The phase the current span was opened in. */
    private Phase spanPhase;
    private double spanPath;

    // ledger
    double maxDistanceError;
    double maxNormalForce;
    double maxKinetic;
    double extent;
    double[] c0;
    double impactLoss;
    /** Drive work received in impulses (impacts, sticking, settling) from a moving patch (J). */
    double impulseDrive;
    long steps;
    /**
     * Fixed step (s) of the symmetric integrator for rolling and flight segments, or 0 for Dormand–Prince
     * throughout (see {@code Segment#symmetricApplies}).
     */
    final double fixedStep;
    /** The symmetric integrator's base method. */
    final MidpointComposition composition;
    /** Step size (s) the next segment starts with, after a projection restart; 0: Hipparchus' own estimate. */
    double restartStep;
    int sampleIndex;
    double sampleT0;

    // the last accepted step end
    double[] lastGoodY;
    /** The last accepted step end, kept as the integrator's state until its full form is needed. */
    ODEStateAndDerivative lastGoodState;
    /** The normal at {@link #lastGoodState} (its rolling velocity {@code r ω × n} needs it). */
    final double[] lastGoodNormal = new double[3];
    double lastGoodT;
    Phase lastGoodPhase;

    Run(Model model, RunObserver observer) {
        this.model = model;
        this.observer = observer;
        this.set = model.settings();
        this.ball = model.ball();
        this.r = ball.radius();
        this.m = ball.mass();
        this.k = ball.inertiaFactor();
        this.inertia = ball.momentOfInertia();
        this.g = model.gravity().toArray();
        this.slots = new ContactSlot[model.patches().size()];
        for (int i = 0; i < slots.length; i++) {
            slots[i] = new ContactSlot(i, model.patches().get(i));
        }
        this.contacts = new ContactSet(slots);
        this.slot = slots[0];
        this.surface = slot.surface;
        this.law = slot.law;
        this.dyn = new Dynamics(model, slot);
        this.dyn.setContacts(contacts);
        this.dyn.setSlots(slots);
        this.compliant = model.compliant();
        this.restitution = law.restitution().orElse(0.0);
        this.snapshots = new Snapshots(this);
        this.dyn.stageObserver = snapshots::stageAtStepEnd;
        this.fixedStep = set.integrator() == Integrator.SYMMETRIC_PROJECTION ? set.fixedStep() : 0.0;
        this.composition = MidpointComposition.ofOrder(set.symmetricOrder());
    }

    /**
     * Makes {@code s} the active slot (the patch touched next): the contact set, the right-hand
     * side and the run's surface, law and restitution follow.
     *
     * @param s the slot
     */
    void activate(ContactSlot s) {
        if (s == slot) {
            return;
        }
        contacts.activate(s);
        dyn.setSlot(s);
        slot = s;
        surface = s.surface;
        law = s.law;
        restitution = law.restitution().orElse(0.0);
    }

    /**
     * Follows the contact set's active slot after a change of the touching slots (a release of the active
     * one among several): the right-hand side and the run's surface, law and restitution follow.
     */
    void syncActive() {
        ContactSlot s = contacts.active();
        if (s == slot) {
            return;
        }
        dyn.setSlot(s);
        slot = s;
        surface = s.surface;
        law = s.law;
        restitution = law.restitution().orElse(0.0);
    }

    /** @return the global phase (summary of the contact set) */
    Phase phase() {
        return contacts.phase();
    }

    /** Sets the global phase without closing a span (see {@link #changePhase}). */
    void setPhase(Phase p) {
        contacts.setPhase(p);
    }

    /**
     * The full state of the last accepted step end (expanded on first use, in the segment's layout,
     * with the normal kept at that step end: it evaluates nothing, so it cannot fail).
     */
    double[] lastGoodY() {
        if (lastGoodY == null) {
            double[] out = dyn.expand(lastGoodState.getPrimaryState(), new double[StateMapper.DIM]);
            if (dyn.derivedVelocity()) {
                ContactKinematics.noSlipVelocity(r, out[W], out[W + 1], out[W + 2], lastGoodNormal, out, V);
            }
            lastGoodY = out;
            lastGoodState = null;
        }
        return lastGoodY;
    }

    void restoreLastGood() {
        t = lastGoodT;
        y = lastGoodY().clone();
        setPhase(lastGoodPhase);
    }

    /**
     * The last good state for a failure, built without evaluating anything (its velocity slot
     * holds the rolling velocity already).
     *
     * @param start the run's start, for a failure before the start was validated
     * @return the state
     */
    BallState lastGoodBallState(BallState start) {
        if (lastGoodPhase == null) {
            return start;
        }
        try {
            return storedState(lastGoodT, lastGoodY(), lastGoodPhase);
        } catch (IllegalArgumentException e) {
            // a state past the range of double (BallState refuses it): the start is the last good one
            return start;
        }
    }

    /** A domain state with the velocity stored in the array (no evaluation). */
    BallState storedState(double ts, double[] ys, Phase p) {
        return StateMapper.toState(ts, ys, p, ys[V], ys[V + 1], ys[V + 2]);
    }

    /**
     * Records and returns the engine's own rejection of the start (so that the exception boundary
     * lets it through, where an {@link IllegalArgumentException} from user code is wrapped).
     */
    IllegalArgumentException reject(String message) {
        return reject(message, null);
    }

    IllegalArgumentException reject(String message, Throwable cause) {
        rejection = new IllegalArgumentException(message, cause);
        return rejection;
    }

    /**
     * The centre of a state array, copied into the run's workspace (no allocation). The result is
     * only valid until the next call.
     */
    double[] centreOf(double[] ys) {
        centreWork[0] = ys[C];
        centreWork[1] = ys[C + 1];
        centreWork[2] = ys[C + 2];
        return centreWork;
    }

    double kinetic(double[] ys) {
        return kinetic(ys[V], ys[V + 1], ys[V + 2], ys);
    }

    /** Kinetic energy (J) with centre velocity (vx, vy, vz) and the spin of {@code ys}. */
    double kinetic(double vx, double vy, double vz, double[] ys) {
        double v2 = vx * vx + vy * vy + vz * vz;
        double w2 = ys[W] * ys[W] + ys[W + 1] * ys[W + 1] + ys[W + 2] * ys[W + 2];
        return 0.5 * m * v2 + 0.5 * inertia * w2;
    }

    /** Domain state from the array state; rolling uses the no-slip velocity. */
    BallState toState(double ts, double[] ys, Phase p) {
        double vx = ys[V];
        double vy = ys[V + 1];
        double vz = ys[V + 2];
        if (p == Phase.ROLLING || p == Phase.REST) {
            Phase keep = dyn.phase;
            dyn.phase = Phase.ROLLING;
            dyn.evaluate(ts, ys);
            dyn.phase = keep;
            vx = dyn.vel[0];
            vy = dyn.vel[1];
            vz = dyn.vel[2];
        }
        return StateMapper.toState(ts, ys, p, vx, vy, vz);
    }

    void trackForce(double ts, double[] ys, Phase p) {
        if (p.inContact() || compliant) {
            Phase keep = dyn.phase;
            dyn.phase = p;
            dyn.evaluate(ts, ys);
            dyn.phase = keep;
            maxNormalForce = Math.max(maxNormalForce, dyn.normalForce);
            if (compliant) {
                for (double f : dyn.compliantNormal) {
                    maxNormalForce = Math.max(maxNormalForce, f);
                }
            }
            if (dyn.multi()) {
                for (int k = 1; k < contacts.count(); k++) {
                    maxNormalForce = Math.max(maxNormalForce, dyn.contactNormal[k]);
                }
            }
        }
    }

    void emitSample(double ts, double[] ys, Phase p, boolean isEvent) {
        if (observer == RunObserver.NONE) {
            return;
        }
        Phase keep = dyn.phase;
        dyn.phase = p;
        // output evaluations are neither counted nor budgeted, so that the integration, the
        // evaluation count and a budget stop do not depend on whether anyone observes the run
        long count = dyn.evaluations;
        long budget = dyn.budget;
        dyn.budget = Long.MAX_VALUE;
        dyn.evaluate(ts, ys);
        dyn.evaluations = count;
        dyn.budget = budget;
        dyn.phase = keep;
        // dyn.vel now holds the phase's velocity (the no-slip one while rolling, the state's otherwise)
        BallState s = StateMapper.toState(ts, ys, p, dyn.vel[0], dyn.vel[1], dyn.vel[2]);
        Vector3D fr = new Vector3D(dyn.friction[0], dyn.friction[1], dyn.friction[2]);
        Vector3D cp = null;
        Vector3D onBall = null;
        boolean touching = p != Phase.FLIGHT || dyn.pressing;
        if (p == Phase.FLIGHT && dyn.pressing) {
            observer.sample(compliantSample(s, ys, isEvent));
            return;
        }
        if (touching) {
            double[] n = dyn.geo.normal;
            cp = new Vector3D(ys[0] - r * n[0], ys[1] - r * n[1], ys[2] - r * n[2]);
            onBall = s.orientation().applyInverseTo(new Vector3D(-r * n[0], -r * n[1], -r * n[2]));
        }
        java.util.List<SampleContact> touches = java.util.List.of();
        java.util.List<String> ids = touching ? slot.contactIds : java.util.List.of();
        if (touching && contacts.multi()) {
            // several contacts: one entry each, in the order touched (the active slot first)
            int touched = contacts.count();
            SampleContact[] all = new SampleContact[touched];
            String[] names = new String[touched];
            for (int k = 0; k < touched; k++) {
                ContactSlot sk = contacts.at(k);
                double[] n = sk.geo.normal;
                double[] f = dyn.contactFriction[k];
                Mode mk = sk.mode;
                Phase pk = p == Phase.REST ? Phase.REST : mk == Mode.SLIDING ? Phase.SLIDING : Phase.ROLLING;
                all[k] = new SampleContact(sk.id, pk, dyn.contactNormal[k], new Vector3D(f[0], f[1], f[2]),
                    new Vector3D(ys[0] - r * n[0], ys[1] - r * n[1], ys[2] - r * n[2]), new Vector3D(n[0], n[1], n[2]));
                names[k] = sk.id;
            }
            touches = java.util.List.of(all);
            ids = java.util.List.of(names);
        } else if (touching) {
            double[] n = dyn.geo.normal;
            touches = java.util.List.of(new SampleContact(slot.id, p, dyn.normalForce, fr, cp,
                new Vector3D(n[0], n[1], n[2])));
        }
        if (dyn.pressing) {
            // compliant patches pressed during a rigid contact phase: one more contact each, after the rigid ones
            List<SampleContact> all = new ArrayList<>(touches);
            List<String> names = new ArrayList<>(ids);
            for (ContactSlot sk : slots) {
                if (dyn.compliantOn[sk.index]) {
                    all.add(compliantContactOf(sk, ys));
                    names.add(sk.id);
                }
            }
            touches = List.copyOf(all);
            ids = List.copyOf(names);
        }
        observer.sample(new Sample(s, touching ? dyn.normalForce : 0.0, fr, cp, onBall, isEvent, ids, touches));
    }

    /**
     * The sample of a flight state pressing compliant patches (after the evaluation): one contact per patch pressed,
     * scene order, the active one (or the first) as the sample's own contact.
     */
    private Sample compliantSample(BallState s, double[] ys, boolean isEvent) {
        java.util.List<SampleContact> touches = new java.util.ArrayList<>();
        java.util.List<String> ids = new java.util.ArrayList<>();
        ContactSlot primary = dyn.compliantPrimary;
        SampleContact first = null;
        for (ContactSlot sk : slots) {
            if (!dyn.compliantOn[sk.index]) {
                continue;
            }
            SampleContact one = compliantContactOf(sk, ys);
            if (sk == primary) {
                first = one;
            } else {
                touches.add(one);
                ids.add(sk.id);
            }
        }
        touches.add(0, first);
        ids.add(0, primary.id);
        double[] n = primary.geo.normal;
        Vector3D onBall = s.orientation().applyInverseTo(new Vector3D(-r * n[0], -r * n[1], -r * n[2]));
        return new Sample(s, first.normalForce(), first.frictionForce(), first.contactPoint(), onBall, isEvent, List.copyOf(ids),
            List.copyOf(touches));
    }

    /** A compliant patch's contact in a sample (after the evaluation): its own force, friction, point and normal. */
    private SampleContact compliantContactOf(ContactSlot sk, double[] ys) {
        double[] n = sk.geo.normal;
        double[] f = dyn.compliantFriction[sk.index];
        return new SampleContact(sk.id, Phase.FLIGHT, dyn.compliantNormal[sk.index], new Vector3D(f[0], f[1], f[2]),
            new Vector3D(ys[0] - r * n[0], ys[1] - r * n[1], ys[2] - r * n[2]), new Vector3D(n[0], n[1], n[2]));
    }

    /** @return whether a compliant contact is under way on any patch */
    boolean pressingAny() {
        for (ContactSlot s : slots) {
            if (s.pressing) {
                return true;
            }
        }
        return false;
    }

    void log(EventKind kind, BallState before, BallState after, Vector3D impulse) {
        log(kind, before, after, impulse, null);
    }

    void log(EventKind kind, BallState before, BallState after, Vector3D impulse, String edge) {
        log(kind, before, after, impulse, edge, null);
    }

    /** Logs an event on the active patch; {@code from} is the patch left by a hand-over, else null. */
    void log(EventKind kind, BallState before, BallState after, Vector3D impulse, String edge, String from) {
        logOn(slot.id, kind, before, after, impulse, edge, from);
    }

    /** Logs an event on the patch {@code patch} (a contact of several); {@code from} as for {@link #log}. */
    void logOn(String patch, EventKind kind, BallState before, BallState after, Vector3D impulse, String edge,
               String from) {
        Phase phase = phase();
        BallState a = after != null ? after : toState(t, y, phase);
        RunEvent e = new RunEvent(kind, before, a, edge, impulse, patch, from, from != null ? patch : null);
        events.add(e);
        trackForce(t, y, phase);
        emitSample(t, y, phase, true);
        observer.event(e);
    }

    /** Changes the global phase, closing the current phase span. */
    void changePhase(Phase next) {
        if (next != phase()) {
            closeSpan();
            setPhase(next);
            spanStart = t;
            spanPath = y[PATH];
            spanPhase = phase();
        }
    }

    void openSpan() {
        spanStart = t;
        spanPath = 0;
        spanPhase = phase();
    }

    /** Closes the current span, labelled with the phase it was opened in, and opens the next in the present phase. */
    void closeSpan() {
        Phase p = spanPhase != null ? spanPhase : phase();
        if (t > spanStart || spans.isEmpty()) {
            spans.add(new PhaseSpan(p, spanStart, t, y[PATH] - spanPath));
        }
        spanStart = t;
        spanPath = y[PATH];
        spanPhase = phase();
    }

    /**
     * Closes the current span when the global phase has changed without {@link #changePhase}: with several
     * contacts each contact's mode is set on its own ({@link ContactSet#setMode}) and the global phase is their
     * summary, so a contact that begins to slide while another rolls turns the phase to sliding at that switch.
     * Called at every switch instant (before each segment and at the end).
     */
    void syncSpan() {
        if (spanPhase != null && phase() != spanPhase) {
            closeSpan();
        }
    }
}
