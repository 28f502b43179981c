package org.trundle.check;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.TreeMap;
import java.util.stream.Stream;

import org.hipparchus.geometry.euclidean.threed.Line;
import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Named;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.trundle.contact.PureRolling;
import org.trundle.core.BallState;
import org.trundle.core.EnergyBudget;
import org.trundle.core.Patch;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.core.Surface;
import org.trundle.core.check.CaseRecipe;
import org.trundle.core.check.CaseSource;
import org.trundle.core.check.Draws;
import org.trundle.core.check.Interval;
import org.trundle.core.check.Invariant;
import org.trundle.core.check.Invariants;
import org.trundle.core.check.LawSampler;
import org.trundle.core.check.MotionSampler;
import org.trundle.core.check.PatchSampler;
import org.trundle.core.check.PropertyCase;
import org.trundle.core.check.StartSampler;
import org.trundle.core.check.Verdict;
import org.trundle.core.check.junit.PropertyAssertions;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Placed;

/**
 * The property kit over two-patch scenes with a moving patch (invented scenarios): the chute of
 * {@link ScenePropertiesTest} (a tube tilted 45° down) above a floor that turns about a vertical axis
 * (a turntable, 2–8 rad/s either way) or travels in its own plane (a belt, 0.1–1 m/s in any direction), and
 * the chute itself spinning about its own axis (5–40 rad/s) above a still floor, and the chute continued by a
 * coaxial tube spinning about its axis (5–40 rad/s); pure rolling and Coulomb friction; rolling, sliding and
 * flight starts on the chute's wall (balls of 4–8 mm radius). The ball runs out of the chute and lands on the
 * floor, or is handed over to the spinning tube (where its contact point slips: an impulse or sliding, see
 * {@code Transitions.handOverRolling}; this family found the hand-over that imposed the spinning wall's no-slip
 * velocity with nothing booked, budget residuals up to 3e-2).
 *
 * <p>The checks, with the same bounds as for still scenes (the integrator's relative tolerance is 1e-10):
 * the energy budget closes with the drive work counted (1e-8 of {@code E_scale}), the distance residual stays
 * small and every phase change has its cause; determinism (bit-identical reruns); frame invariance with
 * every patch and its motion moved by the same rigid map (1e-6 per characteristic time, see
 * {@link Invariants#frameInvariant}); for the belt, Galilean invariance in the frame moving with the belt
 * (there the belt stands still and the chute travels backwards; Goldstein, Poole, Safko, Classical Mechanics,
 * 3rd ed., 2002, §1.1), and for the other families in a frame of a seeded constant velocity up to 0.5 m/s
 * (every patch then moves), 1e-6 per characteristic time, the frame check's bound, since both compare two
 * runs stepped differently at the tolerance (measured worst over the 48 cases: 1.1e-8 frame, 3.5e-9
 * Galilean, 9.4e-12 budget, 4.4e-10 distance residual). The ball leaves the chute and flies on ({@code stopAtExit} false), so it reaches the moving floor.
 *
 * <p>So that no check passes for want of anything to check, the test also shows that each could fail: the
 * drive work exceeds the budget's bound in most cases (leaving it out of the budget would fail it), and
 * frame invariance with the surfaces moved but their motions left behind fails in most cases.
 */
class MovingScenePropertiesTest {
    static final long SEED = 0x7e57_3071L;
    static final int CASES = 6;
    static final double BUDGET = 1e-8;
    static final double FRAME = 1e-6;

    record Family(String name, MotionSampler chuteMotion, PatchSampler floor, StartSampler starts) {
    }

    /** Rolling, sliding and flight starts anywhere on the chute's wall near its top. */
    static final StartSampler STARTS = ScenePropertiesTest.STARTS;

    /** A floor 1–8 ball radii below the chute's lower mouth, still. */
    static final PatchSampler FLOOR = ScenePropertiesTest.FLOOR;

    /** The chute's axis as a line. */
    static Line axisOf(Surface s) {
        Cylinder c = (Cylinder) s;
        return new Line(c.origin(), c.origin().add(c.axis()), 1e-12);
    }

    static final List<Family> FAMILIES = List.of(
        new Family("chute over a turntable", null, FLOOR.withMotion(MotionSampler.turntable(Vector3D.PLUS_K,
            new Vector3D(0.05, 0, 0), 0.03, Interval.of(2, 8))), STARTS),
        new Family("chute over a belt", null, FLOOR.withMotion(MotionSampler.belt(Vector3D.PLUS_K,
            Interval.of(0.1, 1.0))), STARTS),
        new Family("spinning chute over a floor", MotionSampler.spinning(MovingScenePropertiesTest::axisOf,
            Interval.of(5, 40)), FLOOR, STARTS.withPhases(2, 1, 0)),
        new Family("chute into a spinning tube", null, ScenePropertiesTest.LOWER_TUBE.withMotion(
            MotionSampler.spinning(MovingScenePropertiesTest::axisOf, Interval.of(5, 40))), STARTS.withPhases(2, 1, 0)));

    static final List<Named<LawSampler>> LAWS = List.of(
        Named.of("pure rolling", (rnd, b) -> new PureRolling(rnd.nextDouble())),
        Named.of("coulomb", (rnd, b) -> Catalogue.coulomb(rnd)));

    static Stream<Arguments> cases() {
        List<Arguments> out = new ArrayList<>();
        for (Family f : FAMILIES) {
            for (Named<LawSampler> l : LAWS) {
                CaseRecipe.Builder rb = ScenePropertiesTest.chuteScene(f.name() + " x " + l.getName(), f.floor(),
                    l.getPayload(), f.starts()).settings(SolverSettings.defaults().withStopAtExit(false));
                if (f.chuteMotion() != null) {
                    rb.motions(f.chuteMotion());
                }
                CaseSource src = rb.build();
                src.stream(SEED, CASES).forEach(c -> out.add(Arguments.of(Named.of(c.describe(), c))));
            }
        }
        return out.stream();
    }

    private static final VerdictTally APPLIED = new VerdictTally();
    /** Per family: cases, cases whose drive work exceeds the budget's bound, controls that failed. */
    private static final Map<String, int[]> CAN_FAIL = new TreeMap<>();

    private static synchronized void count(PropertyCase c, int slot, boolean failed) {
        int[] n = CAN_FAIL.computeIfAbsent(c.label(), k -> new int[4]);
        n[slot]++;
        n[slot + 1] += failed ? 1 : 0;
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void budgetWithDriveWorkResidualsAndCauses(PropertyCase c) {
        APPLIED.record(PropertyAssertions.assertHolds(c, Invariants.budgetCloses(BUDGET),
            Invariants.distanceResidual(1e-8), Invariants.phaseChangesHaveCauses()));
        // the budget without the drive work: E1 − E0 + losses − applied work
        EnergyBudget b = c.simulation().run(c.start(), c.duration()).energy();
        count(c, 0, Math.abs(b.residual() + b.driveWork()) / b.scale() > BUDGET);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void reRunsAreBitIdentical(PropertyCase c) {
        APPLIED.record(PropertyAssertions.assertHolds(c, Invariants.deterministic()));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void frameInvarianceCarriesTheMotion(PropertyCase c) {
        APPLIED.record(PropertyAssertions.assertHolds(c, Invariants.frameInvariant(FRAME)));
        count(c, 2, !controlHolds(c));
    }

    /** Whether the control holds; a start the moved scene refuses (not tangent to a patch left behind) fails it. */
    static boolean controlHolds(PropertyCase c) {
        try {
            return motionsLeftBehind().check(c).holds();
        } catch (IllegalArgumentException e) {
            return false;
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void galileanInTheBeltsFrame(PropertyCase c) {
        Invariant beltFrame = Invariants.galileanWithPatch("floor", FRAME);
        if (c.label().startsWith("chute over a belt")) {
            APPLIED.record(PropertyAssertions.assertHolds(c, beltFrame));
        } else {
            if (c.label().startsWith("chute over a turntable")) {
                Verdict v = beltFrame.check(c);
                assertFalse(v.applied(), "a turntable is no uniform translation: " + v.describe());
            }
            // any other constant boost: every patch then moves (the turntable turns and travels)
            Vector3D w = Draws.inBall(Draws.forCase(SEED ^ 0xb005L, c.index()), Vector3D.ZERO, 0.5);
            APPLIED.record(PropertyAssertions.assertHolds(c, Invariants.galilean(w, FRAME)));
        }
    }

    /**
     * The control: every surface and the gravity moved by a seeded rigid map (through the surfaces module's
     * {@link Placed}), the start and the expected states too, but every patch keeps its motion as given in
     * the unmoved frame (a turntable then turns about the old axis, a belt travels along the old direction).
     */
    static Invariant motionsLeftBehind() {
        return c -> {
            SplittableRandom rnd = Draws.forCase(SEED ^ 0x1eb1dL, c.index());
            Rotation rot = new Rotation(Draws.unitVector(rnd), 2 * Math.PI * rnd.nextDouble(),
                RotationConvention.VECTOR_OPERATOR);
            Vector3D shift = Draws.inBall(rnd, Vector3D.ZERO, 0.1);
            return Invariants.symmetry("frame invariant, motions left behind", sim -> {
                Simulation.Builder mb = Simulation.builder().ball(sim.ball()).law(sim.law()).settings(sim.settings())
                    .gravity(rot.applyTo(sim.gravity()));
                for (Patch p : sim.patches()) {
                    mb.patch(new Patch(p.id(), new Placed(p.surface(), rot, shift), p.motion(), p.law()));
                }
                return mb.build();
            }, s -> BallState.of(s.time(), rot.applyTo(s.centre()).add(shift), rot.applyTo(s.velocity()),
                rot.applyTo(s.orientation()), rot.applyTo(s.spin()), s.phase()), FRAME).check(c);
        };
    }

    /**
     * Every check applied to most cases; in every family the drive work matters to the budget and the
     * control fails in most cases, so the checks above could fail.
     */
    @AfterAll
    static void everyCheckAppliedAndCouldFail() {
        APPLIED.assertMostApplied();
        CAN_FAIL.forEach((label, n) -> {
            assertTrue(n[1] >= 0.5 * n[0], label + ": drive work above the budget's bound in " + n[1] + " of " + n[0]);
            assertTrue(n[3] >= 0.5 * n[2], label + ": motions left behind failed frame invariance in " + n[3] + " of "
                + n[2]);
        });
    }
}
