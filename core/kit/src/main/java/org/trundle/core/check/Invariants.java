package org.trundle.core.check;

import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.function.BiFunction;
import java.util.function.UnaryOperator;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.internal.Checks;
import org.trundle.core.ContactGeometry;
import org.trundle.core.ContactLaw;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.MotionState;
import org.trundle.core.Patch;
import org.trundle.core.Phase;
import org.trundle.core.RunEvent;
import org.trundle.core.Sample;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.core.SurfaceMotion;

/**
 * The kit's invariant checks. Each returns an {@link Invariant} whose verdict reports the worst
 * deviation in a documented dimensionless unit against a bound the caller chooses from the
 * numerics (the integrator's relative tolerance, default 1e-10, times the growth the check allows).
 *
 * <p>Scales: energies are judged against the run's {@code E_scale} ({@link
 * org.trundle.core.EnergyBudget#scale()}); lengths against the ball radius {@code r}; speeds
 * against the case's speed scale {@code V} ({@link PropertyCase#speedScale()}); spins against
 * {@code V/r}.
 */
public final class Invariants {
    private Invariants() {
    }

    // ------------------------------------------------------------------ energy

    /**
     * Energy conservation for non-dissipative laws (pure rolling, frictionless sliding): rolling
     * without slip does no work, since the contact point is at rest (common practice; any text on
     * non-holonomic rolling). Worst deviation: {@code max |E(t) − E(0)| / E_scale} over the samples
     * up to the first impact (an impact with restitution below 1 dissipates by design).
     *
     * @param bound bound on the relative drift
     * @return the invariant
     */
    public static Invariant energyConserved(double bound) {
        Checks.positive("bound", bound);
        return c -> {
            Trajectory tr = Trajectory.run(c.simulation(), c.start(), c.duration());
            double tImpact = firstTime(tr.result.events(), EventKind.IMPACT);
            Simulation sim = c.simulation();
            double scale = tr.result.energy().scale();
            double e0 = sim.energy(c.start());
            double worst = 0;
            double at = 0;
            for (Sample s : tr.samples) {
                if (s.time() > tImpact) {
                    break;
                }
                double dev = Math.abs(sim.energy(s.state()) - e0) / scale;
                if (!(dev <= worst)) {
                    worst = dev;
                    at = s.time();
                }
            }
            return Verdict.measured("energy conserved", worst, bound,
                String.format(Locale.ROOT, "worst at t=%.6g s, end %s", at, tr.result.endReason().label()));
        };
    }

    /**
     * Energy never rises under a dissipative law (friction, rolling and pivoting resistance,
     * inelastic impacts, all of which only remove energy): worst deviation
     * {@code max over t of (E(t) − max_{t' ≤ t} E(t')) / E_scale}, zero when it never rises.
     *
     * @param bound bound on the relative rise (the integration tolerance's share)
     * @return the invariant
     */
    public static Invariant energyNeverRises(double bound) {
        Checks.positive("bound", bound);
        return c -> {
            Trajectory tr = Trajectory.run(c.simulation(), c.start(), c.duration());
            Simulation sim = c.simulation();
            double scale = tr.result.energy().scale();
            double peak = sim.energy(c.start());
            double worst = 0;
            double at = 0;
            for (Sample s : tr.samples) {
                double e = sim.energy(s.state());
                double rise = (e - peak) / scale;
                if (!(rise <= worst)) {
                    worst = rise;
                    at = s.time();
                }
                peak = Math.max(peak, e);
            }
            return Verdict.measured("energy never rises", worst, bound,
                String.format(Locale.ROOT, "worst at t=%.6g s, end %s", at, tr.result.endReason().label()));
        };
    }

    /**
     * The energy budget closes: {@code |E₁ − E₀ + losses − applied work| / E_scale}
     * ({@link org.trundle.core.EnergyBudget#relativeResidual()}), and no loss is negative by more
     * than the bound.
     *
     * @param bound bound on the relative residual
     * @return the invariant
     */
    public static Invariant budgetCloses(double bound) {
        Checks.positive("bound", bound);
        return c -> {
            var res = c.simulation().run(c.start(), c.duration());
            var b = res.energy();
            double neg = Math.max(0, -Math.min(Math.min(b.slidingFrictionLoss(), b.rollingResistanceLoss()),
                Math.min(Math.min(b.pivotingResistanceLoss(), b.otherCoupleLoss()), b.impactLoss()))) / b.scale();
            return Verdict.measured("energy budget closes", Math.max(b.relativeResidual(), neg), bound, b.toString());
        };
    }

    /**
     * Determinism: two runs of the same case give bit-identical results (same inputs, same
     * outputs: the project's rule). Worst deviation: the number of samples, events and end-state
     * that differ between the runs (states compared bit for bit: time, centre, velocity,
     * orientation quaternion, spin and phase; events by kind, time bits and phase after).
     *
     * @return the invariant (bound 0)
     */
    public static Invariant deterministic() {
        return c -> {
            Trajectory a = Trajectory.run(c.simulation(), c.start(), c.duration());
            Trajectory b = Trajectory.run(c.simulation(), c.start(), c.duration());
            int bad = Math.abs(a.samples.size() - b.samples.size());
            String first = bad == 0 ? "" : "sample counts " + a.samples.size() + " vs " + b.samples.size();
            for (int i = 0; i < Math.min(a.samples.size(), b.samples.size()); i++) {
                if (!sameBits(a.samples.get(i).state(), b.samples.get(i).state())) {
                    first = bad == 0 ? "sample " + i + ": " + a.samples.get(i) + " vs " + b.samples.get(i) : first;
                    bad++;
                }
            }
            boolean sameEvents = a.result.events().size() == b.result.events().size();
            for (int i = 0; sameEvents && i < a.result.events().size(); i++) {
                RunEvent x = a.result.events().get(i);
                RunEvent y = b.result.events().get(i);
                sameEvents = x.kind() == y.kind() && x.phaseAfter() == y.phaseAfter()
                    && Double.doubleToLongBits(x.time()) == Double.doubleToLongBits(y.time());
            }
            if (!sameEvents) {
                first = bad == 0 ? "events " + a.result.events() + " vs " + b.result.events() : first;
                bad++;
            }
            if (!sameBits(a.result.endState(), b.result.endState())) {
                first = bad == 0 ? "end " + a.result.endState() + " vs " + b.result.endState() : first;
                bad++;
            }
            return Verdict.measured("deterministic", bad, 0, bad == 0 ? a.samples.size() + " samples" : first);
        };
    }

    // ------------------------------------------------------------------ constraints

    /**
     * The distance residual in contact stays small: {@link org.trundle.core.RunResult#maxDistanceError()}
     * over the ball radius.
     *
     * @param bound bound on {@code max |d − r| / r}
     * @return the invariant
     */
    public static Invariant distanceResidual(double bound) {
        Checks.positive("bound", bound);
        return c -> {
            var res = c.simulation().run(c.start(), c.duration());
            return Verdict.measured("distance residual", res.maxDistanceError() / c.simulation().ball().radius(),
                bound, "end " + res.endReason().label());
        };
    }

    /**
     * The phase log is explained: consecutive phase spans differ, and each change of phase at time
     * {@code t} has a logged event at {@code t} that leaves the earlier phase and enters the later
     * one (the phase machine switches only at located events; design notes §1). Worst deviation:
     * the number of unexplained changes.
     *
     * @return the invariant (bound 0)
     */
    public static Invariant phaseChangesHaveCauses() {
        return c -> {
            var res = c.simulation().run(c.start(), c.duration());
            var spans = res.phases();
            int bad = 0;
            String first = "";
            for (int i = 1; i < spans.size(); i++) {
                var a = spans.get(i - 1);
                var b = spans.get(i);
                double at = b.start();
                boolean caused = a.phase() != b.phase() && res.events().stream().anyMatch(ev -> ev.time() == at
                    && ev.phaseAfter() == b.phase() && ev.before().phase() == a.phase());
                if (!caused) {
                    if (bad == 0) {
                        first = a.phase().label() + " -> " + b.phase().label() + " at t=" + at + " s";
                    }
                    bad++;
                }
            }
            return Verdict.measured("phase changes have causes", bad, 0, bad == 0 ? spans.size() + " spans"
                : "first unexplained: " + first + "; events " + res.events());
        };
    }

    // ------------------------------------------------------------------ reversibility

    /**
     * Time reversibility of pure rolling. The rolling equations are invariant under
     * {@code t → −t, v → −v, ω → −ω} (the no-slip constraint and Newton–Euler are; a law without
     * dissipation adds nothing odd in time), so running forward for {@code T}, reversing velocity
     * and spin and running {@code T} again must return to the start (orientation included) with
     * velocity and spin reversed.
     *
     * <p>Duration from the shape: on non-integrable shapes errors grow exponentially, so
     * {@code T = min(case duration, turns·τ)} with {@code τ = 1/(‖H‖ V)} the time the centre needs
     * to turn by one radian on the offset surface ({@code ‖H‖} the Frobenius norm of the distance
     * Hessian at the start centre; on a plane {@code τ} is infinite and the case duration is used).
     * Applies to rolling starts whose forward run has no event and ends at its duration.
     *
     * <p>Worst deviation: the largest of {@code |c_back − c₀|/r}, {@code |v_back + v₀|/V},
     * {@code r|ω_back + ω₀|/V} and the orientation angle between {@code q_back} and {@code q₀}
     * (rad).
     *
     * @param turns number of characteristic times, positive
     * @param bound bound on the worst deviation
     * @return the invariant
     */
    public static Invariant timeReversible(double turns, double bound) {
        Checks.positive("turns", turns);
        Checks.positive("bound", bound);
        String name = "time reversible";
        return c -> {
            BallState s0 = c.start();
            if (s0.phase() != Phase.ROLLING) {
                return Verdict.notApplicable(name, "start is " + s0.phase().label() + ", not rolling");
            }
            Simulation sim = c.simulation();
            double r = sim.ball().radius();
            double v = c.speedScale();
            ContactGeometry g = sim.geometryAt(s0.centre(), s0.time());
            double h = 0;
            for (double x : g.hessian) {
                h += x * x;
            }
            h = Math.sqrt(h);
            double tau = h > 0 ? 1.0 / (h * v) : Double.POSITIVE_INFINITY;
            double t = Math.min(c.duration(), turns * tau);
            var fwd = sim.run(s0, t);
            if (fwd.endReason() != EndReason.DURATION || !fwd.events().isEmpty()) {
                return Verdict.notApplicable(name, "forward run ended " + fwd.endReason().label() + " with "
                    + fwd.events().size() + " events");
            }
            BallState e = fwd.endState();
            BallState back0 = BallState.of(s0.time(), e.centre(), e.velocity().negate(), e.orientation(),
                e.spin().negate(), Phase.ROLLING);
            var back = sim.run(back0, e.time() - s0.time());
            BallState b = back.endState();
            if (back.endReason() != EndReason.DURATION || !back.events().isEmpty()) {
                return Verdict.measured(name, Double.POSITIVE_INFINITY, bound, "reversed run ended "
                    + back.endReason().label() + " with events " + back.events());
            }
            double dc = b.centre().distance(s0.centre()) / r;
            double dv = b.velocity().add(s0.velocity()).getNorm() / v;
            double dw = r * b.spin().add(s0.spin()).getNorm() / v;
            double dq = Rotation.distance(b.orientation(), s0.orientation());
            double worst = Math.max(Math.max(dc, dv), Math.max(dw, dq));
            return Verdict.measured(name, worst, bound, String.format(Locale.ROOT,
                "T=%.4g s (%.3g characteristic times): centre %.2e r, velocity %.2e V, spin %.2e V/r, orientation %.2e rad",
                t, Double.isFinite(tau) ? t / tau : 0.0, dc, dv, dw, dq));
        };
    }

    // ------------------------------------------------------------------ frame invariance

    /**
     * Frame invariance with a rigid motion drawn from the case's seed and index (a uniformly
     * random axis, an angle in [0, 2π), a translation of up to 0.1 m).
     *
     * @param bound bound on the worst deviation (see {@link #frameInvariant(Rotation, Vector3D, double)})
     * @return the invariant
     */
    public static Invariant frameInvariant(double bound) {
        return c -> {
            SplittableRandom rnd = Draws.forCase(c.seed() ^ 0x5DEECE66DL, c.index());
            Rotation rot = new Rotation(Draws.unitVector(rnd), 2 * Math.PI * rnd.nextDouble(),
                RotationConvention.VECTOR_OPERATOR);
            Vector3D b = Draws.inBall(rnd, Vector3D.ZERO, 0.1);
            return frameInvariant(rot, b, bound).check(c);
        };
    }

    /**
     * Frame invariance: moving the surface (and its motion, if it moves; in a scene every patch
     * and its motion), the gravity and the start
     * together by the rigid motion {@code x ↦ R x + b} moves the trajectory the same way (Newton–Euler and the contact
     * conditions are Euclidean-invariant: common practice). Both runs are sampled at 16 equal
     * intervals; worst deviation over the samples and the end state: the largest of
     * {@code |R c + b − c'|/r}, {@code |R v − v'|/V}, {@code r|R ω − ω'|/V} and the orientation
     * angle (rad); a different end reason or event sequence is a failure (infinite deviation).
     * The two runs' step choices differ at the tolerance (the relative part of the error norm is
     * per component, so not rotation-invariant), and on integrable shapes such differences grow
     * linearly with the angle turned, so the verdict's deviation is the worst one divided by the
     * number of characteristic times {@code max(1, T ‖H‖ V)} (see
     * {@link #timeReversible(double, double)}); the detail gives the raw value.
     *
     * @param rotation R
     * @param translation b (m)
     * @param bound bound on the worst deviation
     * @return the invariant
     */
    public static Invariant frameInvariant(Rotation rotation, Vector3D translation, double bound) {
        Checks.finite("translation", translation);
        return symmetry("frame invariant", sim -> movedRigidly(sim, rotation, translation),
            s -> BallState.of(s.time(), rotation.applyTo(s.centre()).add(translation), rotation.applyTo(s.velocity()),
                rotation.applyTo(s.orientation()), rotation.applyTo(s.spin()), s.phase()), bound);
    }

    /**
     * A symmetry of the equations of motion, given by the caller: the run of the transformed scene
     * {@code scene(sim)} from the mapped start {@code map(s₀)} must be the map of the run,
     * {@code map(s(t))} at every time {@code t} (the map keeps the time; it may use it, as a Galilean boost
     * does). {@link #frameInvariant(Rotation, Vector3D, double)} and {@link #galilean(Vector3D, double)} are
     * such checks; a map that is not a symmetry of the case fails it, which is how a test shows that a check
     * can fail (frame invariance with a patch's motion left behind, for instance).
     *
     * <p>Both runs are sampled at 16 equal intervals (the case's simulation with that sample interval is
     * what {@code scene} receives); worst deviation over the samples and the end state: the largest of
     * {@code |c_map − c'|/r}, {@code |v_map − v'|/V}, {@code r|ω_map − ω'|/V} and the angle between the
     * orientations (rad); a different end reason or event sequence is a failure (infinite deviation), except
     * that one run may end left for good while the other runs to its duration through the same events (the
     * solver proves a flight has left for good only where the patches stand still, and a transformed scene may
     * make a moving patch still or a still one move): then the samples up to the earlier end are compared (not
     * applicable when there is none after the start). The
     * two runs' step choices differ at the tolerance (the error norm is per component, relative to the
     * state's own size, so a transformed state is stepped differently), and on integrable shapes such
     * differences grow linearly with the angle turned, so the verdict's deviation is the worst one divided
     * by the number of characteristic times {@code max(1, T ‖H‖ V)} (see {@link #timeReversible(double,
     * double)}); the detail gives the raw value.
     *
     * @param name the check's name in verdicts
     * @param scene gives the transformed simulation
     * @param map maps a state of the case's run to the state the transformed run must have at the same time
     * @param bound bound on the worst deviation
     * @return the invariant
     */
    public static Invariant symmetry(String name, UnaryOperator<Simulation> scene, UnaryOperator<BallState> map,
                                     double bound) {
        Checks.positive("bound", bound);
        if (name == null || scene == null || map == null) {
            throw new IllegalArgumentException("name, scene and map must be given, got " + name + ", " + scene + ", "
                + map);
        }
        return c -> {
            Simulation sim = sampled(c.simulation(), c.simulation().settings().withSampleInterval(c.duration() / 16));
            return compareMapped(name, c, sim, scene.apply(sim), map, bound);
        };
    }

    // ------------------------------------------------------------------ Galilean invariance

    /**
     * Galilean invariance: seen from a frame moving at the constant velocity {@code w}, with positions
     * {@code x' = x − w t}, every patch moves with its own motion and, on top of it, at {@code −w}; gravity
     * is the same; the run from the start {@code (c₀ − w t₀, v₀ − w, q₀, ω₀)} must be
     * {@code (c(t) − w t, v(t) − w, q(t), ω(t))} (Newton's laws hold alike in all inertial frames:
     * H. Goldstein, C. Poole, J. Safko, Classical Mechanics, 3rd ed., 2002, §1.1; the contact conditions
     * involve only the velocity relative to the patch, {@code v − u}, and spins, which the boost leaves
     * alone). Deviation and samples as in {@link #symmetry}.
     *
     * <p>What the boost leaves unequal, and so the check's cases should avoid: applied loads that depend on
     * the absolute velocity (drag in still air becomes drag in a wind); the solver's speed scale
     * {@code V = max(|v₀|, r|ω₀|, …)}, which changes with {@code |v₀|}, and so its thresholds: the stick
     * threshold and the settle speed are far below the bound, but the smoothing band of a law's
     * regularised couples ({@code 10⁻³ V/r}) is not, so laws with couples at small relative spin may
     * differ by their band.
     *
     * @param boost the frame's velocity w (m/s)
     * @param bound bound on the worst deviation
     * @return the invariant
     */
    public static Invariant galilean(Vector3D boost, double bound) {
        Checks.finite("boost", boost);
        return symmetry("galilean", sim -> rebuilt(sim, sim.gravity(),
            p -> p.withMotion(new BoostedMotion(p.motion(), boost))), s -> boosted(s, boost), bound);
    }

    /**
     * Galilean invariance in the frame that moves with a patch translating at a constant velocity (a belt):
     * the boost {@code w} is that patch's velocity, so in the new frame the patch stands still
     * ({@link org.trundle.core.SurfaceMotion#NONE}: the solver's still-patch path) while every other patch
     * moves at {@code −w} on top of its own motion; the run must be the run with the belt moving, shifted
     * by {@code −w t} (see {@link #galilean(Vector3D, double)} for the source and what the boost leaves
     * unequal). Not applicable when the patch's motion is not a uniform translation over the run (its
     * rotation the identity, spin, spin rate and acceleration zero and its velocity the same at the start,
     * middle and end).
     *
     * @param patchId the id of the translating patch
     * @param bound bound on the worst deviation
     * @return the invariant
     * @throws IllegalArgumentException (when checked) if the case has no patch of that id
     */
    public static Invariant galileanWithPatch(String patchId, double bound) {
        Checks.positive("bound", bound);
        String name = "galilean with " + patchId;
        return c -> {
            Patch belt = null;
            for (Patch p : c.simulation().patches()) {
                if (p.id().equals(patchId)) {
                    belt = p;
                }
            }
            if (belt == null) {
                throw new IllegalArgumentException("patchId " + patchId + " names no patch of the case; its patches: "
                    + c.simulation().patches().stream().map(Patch::id).toList());
            }
            double t0 = c.start().time();
            double[] times = {t0, t0 + 0.5 * c.duration(), t0 + c.duration()};
            MotionState m = new MotionState();
            belt.motion().at(t0, m);
            Vector3D w = new Vector3D(m.velocity);
            Vector3D rest = new Vector3D(m.offset).subtract(t0, w);
            for (double t : times) {
                belt.motion().at(t, m);
                String why = uniformTranslation(m, w, rest, t);
                if (why != null) {
                    return Verdict.notApplicable(name, "patch " + patchId + " (" + belt.motion().name()
                        + ") is not a uniform translation: " + why + " at t=" + t + " s");
                }
            }
            Patch still = belt;
            Simulation sim = sampled(c.simulation(), c.simulation().settings().withSampleInterval(c.duration() / 16));
            Simulation other = rebuilt(sim, sim.gravity(), p -> p.id().equals(still.id())
                ? new Patch(p.id(), rest.getNorm() == 0 ? p.surface()
                    : new RigidlyMovedSurface(p.surface(), Rotation.IDENTITY, rest), SurfaceMotion.NONE, p.law(),
                    p.compliance())
                : p.withMotion(new BoostedMotion(p.motion(), w)));
            return compareMapped(name, c, sim, other, s -> boosted(s, w), bound);
        };
    }

    /** Null when the pose is {@code x = x₀ + rest + w t} with constant rates; otherwise what differs. */
    private static String uniformTranslation(MotionState m, Vector3D w, Vector3D rest, double t) {
        double[] id = {1, 0, 0, 0, 1, 0, 0, 0, 1};
        for (int i = 0; i < 9; i++) {
            if (m.rotation[i] != id[i]) {
                return "rotation is not the identity";
            }
        }
        for (int i = 0; i < 3; i++) {
            if (m.spin[i] != 0 || m.spinRate[i] != 0) {
                return "it spins";
            }
            if (m.acceleration[i] != 0) {
                return "it accelerates";
            }
        }
        if (!new Vector3D(m.velocity).equals(w)) {
            return "velocity " + new Vector3D(m.velocity) + " m/s, not " + w + " m/s";
        }
        Vector3D expected = rest.add(t, w);
        double scale = rest.getNorm() + w.getNorm() * Math.abs(t);
        if (!(new Vector3D(m.offset).distance(expected) <= 1e-12 * scale)) {
            return "offset " + new Vector3D(m.offset) + " m, not " + expected + " m";
        }
        return null;
    }

    /** The state seen from the frame moving at w: {@code (c − w t, v − w, q, ω)}. */
    private static BallState boosted(BallState s, Vector3D w) {
        return BallState.of(s.time(), s.centre().subtract(s.time(), w), s.velocity().subtract(w), s.orientation(),
            s.spin(), s.phase());
    }

    /**
     * Runs the case on {@code sim} and the mapped start on {@code other}; the verdict compares the mapped
     * samples and end state with the other run's (see {@link #symmetry}).
     */
    private static Verdict compareMapped(String name, PropertyCase c, Simulation sim, Simulation other,
                                         UnaryOperator<BallState> map, double bound) {
        BallState s0 = c.start();
        Trajectory a = Trajectory.run(sim, s0, c.duration());
        Trajectory b = Trajectory.run(other, map.apply(s0), c.duration());
        // one run may end early, left for good, where the other's patch moves (the solver proves that only of
        // still patches): then the runs are compared up to that end, with the same events
        boolean leftEarly = a.result.endReason() != b.result.endReason()
            && (a.result.endReason() == EndReason.LEFT_FOR_GOOD || b.result.endReason() == EndReason.LEFT_FOR_GOOD)
            && (a.result.endReason() == EndReason.DURATION || b.result.endReason() == EndReason.DURATION);
        String mismatch = leftEarly ? compareEvents(a, b) : compareLogs(a, b);
        if (mismatch != null) {
            return Verdict.measured(name, Double.POSITIVE_INFINITY, bound, mismatch);
        }
        double r = sim.ball().radius();
        double v = c.speedScale();
        double worst = 0;
        double at = 0;
        List<Sample> ra = a.regular();
        List<Sample> rb = b.regular();
        int n = Math.min(ra.size(), rb.size());
        if (leftEarly && n < 2) {
            // the first sample is the start itself: nothing after it to compare
            Trajectory early = a.result.endReason() == EndReason.LEFT_FOR_GOOD ? a : b;
            return Verdict.notApplicable(name, String.format(Locale.ROOT, "one run left for good at t=%.6g s, before"
                + " its first sample after the start; the other ran to its duration", early.result.endState().time()));
        }
        for (int i = 0; i <= (leftEarly ? n - 1 : n); i++) {
            BallState x = i < n ? ra.get(i).state() : a.result.endState();
            BallState y = i < n ? rb.get(i).state() : b.result.endState();
            BallState mx = map.apply(x);
            double dev = Math.max(Math.max(mx.centre().distance(y.centre()) / r, mx.velocity().distance(y.velocity()) / v),
                Math.max(r * mx.spin().distance(y.spin()) / v, Rotation.distance(mx.orientation(), y.orientation())));
            if (!(dev <= worst)) {
                worst = dev;
                at = x.time();
            }
        }
        double turns = turns(c);
        return Verdict.measured(name, worst / turns, bound, String.format(Locale.ROOT,
            "raw worst %.3e at t=%.6g s over %d samples, %.3g characteristic times, end %s%s", worst, at,
            leftEarly ? n : n + 1, turns, a.result.endReason().label(),
            leftEarly ? " (the other run: " + b.result.endReason().label() + "; compared up to the earlier end)" : ""));
    }

    // ------------------------------------------------------------------ scaling

    /**
     * Dimensional scaling: a {@link ScalableLaw} is rebuilt with its lengths times {@code λ}; any
     * other law is used as it is, which is right for laws without a length parameter (pure
     * rolling, Coulomb).
     *
     * @param lambda length factor λ, positive
     * @param bound bound on the worst deviation
     * @return the invariant
     * @see #scaling(double, BiFunction, double)
     */
    public static Invariant scaling(double lambda, double bound) {
        return scaling(lambda, (law, l) -> law instanceof ScalableLaw ? ((ScalableLaw) law).scaled(l) : law, bound);
    }

    /**
     * Dimensional scaling: with gravity and masses unchanged, multiplying every length by
     * {@code λ} (ball radius, surface, start centre, any length of the law) and every time by
     * {@code √λ} (so velocities by {@code √λ} and spins by {@code 1/√λ}) leaves the equations of
     * motion invariant (accelerations {@code v²/R} and {@code g} are unchanged; a standard
     * dimensional-analysis argument, e.g. Froude similarity — common practice). The scaled run
     * must retrace the scaled trajectory. The solver's own settings are scale-covariant (its
     * tolerances are relative to {@code r} and {@code V}; the check scales the absolute times
     * {@code maxCheckInterval}, {@code eventTimeTolerance} and a non-zero {@code settleSpeed}),
     * except for its floors ({@code V ≥ 1e-3 m/s}, settle speed ≥ 1e-6 m/s): keep cases above
     * them.
     *
     * <p>Worst deviation over 16 equally spaced samples and the end state: the largest of
     * {@code |c'/λ − c|/r}, {@code |v'/√λ − v|/V}, {@code r|√λ ω' − ω|/V}, divided (as in
     * {@link #frameInvariant(Rotation, Vector3D, double)}) by the number of characteristic times; a
     * different end reason or event sequence is a failure.
     *
     * @param lambda length factor λ, positive
     * @param scaleLaw gives the law with its lengths multiplied by λ (identity for laws without
     *     lengths)
     * @param bound bound on the worst deviation
     * @return the invariant
     */
    public static Invariant scaling(double lambda, BiFunction<ContactLaw, Double, ContactLaw> scaleLaw, double bound) {
        Checks.positive("lambda", lambda);
        Checks.positive("bound", bound);
        String name = "scaling x" + lambda;
        double st = Math.sqrt(lambda);
        return c -> {
            Simulation sim = sampled(c.simulation(), c.simulation().settings().withSampleInterval(c.duration() / 16));
            SolverSettings s = sim.settings();
            SolverSettings ss = s.withSampleInterval(s.sampleInterval() * st)
                .withMaxCheckInterval(s.maxCheckInterval() * st)
                .withEventTimeTolerance(s.eventTimeTolerance() * st)
                .withSettleSpeed(s.settleSpeed() * st);
            Ball b = sim.ball();
            Simulation big = sim.toBuilder().ball(Ball.of(b.radius() * lambda, b.mass(), b.inertiaFactor()))
                .surface(new ScaledSurface(sim.surface(), lambda)).law(scaleLaw.apply(sim.law(), lambda))
                .settings(ss).build();
            BallState s0 = c.start();
            BallState b0 = BallState.of(s0.time() * st, s0.centre().scalarMultiply(lambda),
                s0.velocity().scalarMultiply(st), s0.orientation(), s0.spin().scalarMultiply(1 / st), s0.phase());
            Trajectory x = Trajectory.run(sim, s0, c.duration());
            Trajectory y = Trajectory.run(big, b0, c.duration() * st);
            String mismatch = compareLogs(x, y);
            if (mismatch != null) {
                return Verdict.measured(name, Double.POSITIVE_INFINITY, bound, mismatch);
            }
            double r = b.radius();
            double v = c.speedScale();
            List<Sample> rx = x.regular();
            List<Sample> ry = y.regular();
            int n = Math.min(rx.size(), ry.size());
            double worst = 0;
            double at = 0;
            for (int i = 0; i <= n; i++) {
                BallState p = i < n ? rx.get(i).state() : x.result.endState();
                BallState q = i < n ? ry.get(i).state() : y.result.endState();
                double dev = Math.max(Math.max(
                    q.centre().scalarMultiply(1 / lambda).distance(p.centre()) / r,
                    q.velocity().scalarMultiply(1 / st).distance(p.velocity()) / v),
                    r * q.spin().scalarMultiply(st).distance(p.spin()) / v);
                if (!(dev <= worst)) {
                    worst = dev;
                    at = p.time();
                }
            }
            double turns = turns(c);
            return Verdict.measured(name, worst / turns, bound, String.format(Locale.ROOT,
                "raw worst %.3e at t=%.6g s over %d samples, %.3g characteristic times, end %s", worst, at, n + 1,
                turns, x.result.endReason().label()));
        };
    }

    // ------------------------------------------------------------------ rolling integrals

    /**
     * On a plane the spin about the normal, {@code ω·n}, is conserved by every law without a
     * couple about the normal (pure rolling, Coulomb friction in rolling, sliding and impacts,
     * rolling resistance): every contact force acts at the contact point {@code c − r n}, so its
     * torque {@code −r n × F} has no normal component, and {@code n} is constant (the first of the
     * linear integrals of rolling on a plane: A. V. Borisov, I. S. Mamaev, A. A. Kilin, "Rolling of
     * a ball on a surface. New integrals and hierarchy of dynamics", Regular and Chaotic Dynamics
     * 7 (2002) 201–219). Worst deviation {@code r |ω·n − ω₀·n| / V} over all samples; not
     * applicable when the surface's normal is not constant along the run.
     *
     * @param bound bound on the worst deviation
     * @return the invariant
     */
    public static Invariant planeNormalSpin(double bound) {
        Checks.positive("bound", bound);
        String name = "plane normal spin";
        return c -> {
            Simulation sim = c.simulation();
            Trajectory tr = Trajectory.run(sim, c.start(), c.duration());
            Vector3D n0 = normalAt(sim, c.start().centre());
            Vector3D n1 = normalAt(sim, tr.result.endState().centre());
            if (n0.distance(n1) > 1e-12) {
                return Verdict.notApplicable(name, "normal not constant: " + n0 + " -> " + n1);
            }
            double w0 = c.start().spin().dotProduct(n0);
            double scale = c.speedScale() / sim.ball().radius();
            double worst = 0;
            double at = 0;
            for (Sample s : tr.samples) {
                double dev = Math.abs(s.state().spin().dotProduct(n0) - w0) / scale;
                if (!(dev <= worst)) {
                    worst = dev;
                    at = s.time();
                }
            }
            return Verdict.measured(name, worst, bound, String.format(Locale.ROOT, "worst at t=%.6g s", at));
        };
    }

    /**
     * The rolling integrals of a ball rolling on a circular cylinder whose axis is parallel to
     * gravity (or with zero gravity), on either side: the orbital rate {@code Ω = φ'} about the axis
     * and {@code ω·e_ρ + σ Ω (z − z₀)/r} are conserved, with {@code e_ρ} the outward radial unit
     * vector, {@code z} the axial coordinate and {@code σ = n·e_ρ} ({@code −1} inside, {@code +1}
     * outside). Derivation (no slip, Newton–Euler): the tangential force's azimuthal part
     * vanishes, so {@code Ω} is constant; {@code d(ω·e_ρ)/dt = Ω ω·e_φ = −σ Ω ż/r}. For the inside
     * this is the integral {@code ω_r − Ω z/r} of M. Gualtieri, T. Tokieda et al., "Golfer's
     * dilemma", Am. J. Phys. 74 (2006) 497–501 (cf. the Routh integrals in Borisov, Mamaev, Kilin,
     * Regular and Chaotic Dynamics 7 (2002) 201). Checked over the initial rolling stretch of the
     * run; worst deviation: the larger of {@code ρ|Ω − Ω₀|/V} and {@code r|I − I₀|/V}. Not applicable
     * when gravity is not along the axis or the start is not rolling.
     *
     * @param axisPoint a point of the cylinder's axis (m)
     * @param axis axis direction (any length, not zero)
     * @param bound bound on the worst deviation
     * @return the invariant
     */
    public static Invariant cylinderIntegrals(Vector3D axisPoint, Vector3D axis, double bound) {
        Checks.finite("axis point", axisPoint);
        Vector3D a = Checks.direction("axis", axis);
        Checks.positive("bound", bound);
        String name = "cylinder rolling integrals";
        return c -> {
            Simulation sim = c.simulation();
            Vector3D g = sim.gravity();
            if (Vector3D.crossProduct(g, a).getNorm() > 1e-12 * g.getNorm()) {
                return Verdict.notApplicable(name, "gravity " + g + " is not along the axis " + a);
            }
            if (c.start().phase() != Phase.ROLLING) {
                return Verdict.notApplicable(name, "start is not rolling");
            }
            Trajectory tr = Trajectory.run(sim, c.start(), c.duration());
            double r = sim.ball().radius();
            double v = c.speedScale();
            double z0 = c.start().centre().subtract(axisPoint).dotProduct(a);
            double omega0 = Double.NaN;
            double inv0 = Double.NaN;
            double worst = 0;
            double at = 0;
            int used = 0;
            for (Sample s : tr.samples) {
                BallState st = s.state();
                if (st.phase() != Phase.ROLLING) {
                    break;
                }
                Vector3D w = st.centre().subtract(axisPoint);
                double z = w.dotProduct(a);
                Vector3D radial = w.subtract(z, a);
                double rho = radial.getNorm();
                Vector3D er = radial.scalarMultiply(1 / rho);
                double sigma = Math.signum(normalAt(sim, st.centre()).dotProduct(er));
                double omega = Vector3D.crossProduct(er, st.velocity()).dotProduct(a) / rho;
                double inv = st.spin().dotProduct(er) + sigma * omega * (z - z0) / r;
                if (used == 0) {
                    omega0 = omega;
                    inv0 = inv;
                }
                used++;
                double dev = Math.max(rho * Math.abs(omega - omega0) / v, r * Math.abs(inv - inv0) / v);
                if (!(dev <= worst)) {
                    worst = dev;
                    at = s.time();
                }
            }
            if (used < 3) {
                return Verdict.notApplicable(name, "rolling lasted only " + used + " samples");
            }
            return Verdict.measured(name, worst, bound, String.format(Locale.ROOT,
                "worst at t=%.6g s over %d rolling samples", at, used));
        };
    }

    // ------------------------------------------------------------------ helpers

    /**
     * Number of characteristic times in a case, {@code max(1, T ‖H‖ V)}: the radians the centre
     * turns through on the offset surface, from the distance Hessian at the start centre.
     */
    static double turns(PropertyCase c) {
        ContactGeometry g = c.simulation().geometryAt(c.start().centre(), c.start().time());
        double h = 0;
        for (double x : g.hessian) {
            h += x * x;
        }
        return Math.max(1.0, c.duration() * Math.sqrt(h) * c.speedScale());
    }

    private static boolean sameBits(BallState x, BallState y) {
        Rotation p = x.orientation();
        Rotation q = y.orientation();
        double[] u = {x.time(), p.getQ0(), p.getQ1(), p.getQ2(), p.getQ3()};
        double[] w = {y.time(), q.getQ0(), q.getQ1(), q.getQ2(), q.getQ3()};
        boolean same = x.phase() == y.phase() && x.centre().equals(y.centre()) && x.velocity().equals(y.velocity())
            && x.spin().equals(y.spin());
        for (int i = 0; same && i < u.length; i++) {
            same = Double.doubleToLongBits(u[i]) == Double.doubleToLongBits(w[i]);
        }
        return same;
    }

    /** The simulation with every patch, its motion and the gravity moved by {@code x ↦ R x + b}. */
    private static Simulation movedRigidly(Simulation sim, Rotation rotation, Vector3D translation) {
        return rebuilt(sim, rotation.applyTo(sim.gravity()), p -> new Patch(p.id(),
            new RigidlyMovedSurface(p.surface(), rotation, translation),
            p.motion().stationary() ? p.motion() : new RigidlyMovedMotion(p.motion(), rotation, translation),
            p.law(), p.compliance()));
    }

    /** The simulation with gravity {@code g} and every patch replaced by {@code f} of it (ids, laws kept by f). */
    private static Simulation rebuilt(Simulation sim, Vector3D g, UnaryOperator<Patch> f) {
        List<Patch> patches = sim.patches();
        if (patches.size() == 1 && patches.get(0).id().equals(Simulation.SINGLE_PATCH)) {
            Patch p = f.apply(patches.get(0));
            return sim.toBuilder().surface(p.surface()).motion(p.motion()).gravity(g).build();
        }
        Simulation.Builder mb = Simulation.builder().ball(sim.ball()).law(sim.law()).load(sim.load())
            .settings(sim.settings()).gravity(g);
        sim.compliance().ifPresent(mb::compliance);
        for (Patch p : patches) {
            mb.patch(f.apply(p));
        }
        return mb.build();
    }

    private static Simulation sampled(Simulation sim, SolverSettings s) {
        return sim.withSettings(s);
    }

    private static Vector3D normalAt(Simulation sim, Vector3D x) {
        ContactGeometry g = sim.geometryAt(x, 0.0);
        return new Vector3D(g.normal[0], g.normal[1], g.normal[2]);
    }

    private static double firstTime(List<RunEvent> events, EventKind kind) {
        for (RunEvent e : events) {
            if (e.kind() == kind) {
                return e.time();
            }
        }
        return Double.POSITIVE_INFINITY;
    }

    /** Null when both runs ended the same way through the same event kinds; otherwise a description. */
    private static String compareLogs(Trajectory a, Trajectory b) {
        if (a.result.endReason() != b.result.endReason()) {
            return "end reasons differ: " + a.result.endReason().label() + " vs " + b.result.endReason().label()
                + " (" + a.result.message() + " / " + b.result.message() + ")";
        }
        return compareEvents(a, b);
    }

    /** Null when both runs went through the same event kinds and phases; otherwise a description. */
    private static String compareEvents(Trajectory a, Trajectory b) {
        List<RunEvent> ea = a.result.events();
        List<RunEvent> eb = b.result.events();
        boolean same = ea.size() == eb.size();
        for (int i = 0; same && i < ea.size(); i++) {
            same = ea.get(i).kind() == eb.get(i).kind() && ea.get(i).phaseAfter() == eb.get(i).phaseAfter();
        }
        return same ? null : "event logs differ: " + ea + " vs " + eb;
    }
}
