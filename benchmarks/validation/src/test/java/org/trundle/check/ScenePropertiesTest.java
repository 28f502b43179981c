package org.trundle.check;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Named;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.trundle.contact.PureRolling;
import org.trundle.core.Patch;
import org.trundle.core.check.BallSampler;
import org.trundle.core.check.CaseRecipe;
import org.trundle.core.check.CaseSource;
import org.trundle.core.check.GravitySampler;
import org.trundle.core.check.Interval;
import org.trundle.core.check.Invariants;
import org.trundle.core.check.LawSampler;
import org.trundle.core.check.PatchSampler;
import org.trundle.core.check.PropertyCase;
import org.trundle.core.check.StartSampler;
import org.trundle.core.check.SurfaceSampler;
import org.trundle.core.check.junit.PropertyAssertions;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Plane;
import org.trundle.surfaces.Side;

/**
 * The property kit over scenes of two patches (invented scenarios): a chute (a tube tilted 45°
 * down, open at both ends) above a floor, and the same chute cut into two coaxial tubes end to end,
 * each with pure rolling and Coulomb friction, from rolling, sliding and flight starts anywhere on
 * the upper tube's wall (balls of 4–8 mm radius). The ball runs out of the chute and lands on the floor, or is handed over
 * to the lower tube. The checks, with the same bounds as for one surface (the integrator's relative
 * tolerance is 1e-10): the energy budget closes, the distance residual stays small and every phase
 * change has its cause (1e-8); frame invariance with every patch moved by the same rigid map
 * (1e-6 per characteristic time, see {@link Invariants#frameInvariant}); determinism (bit-identical
 * reruns).
 */
class ScenePropertiesTest {
    static final long SEED = 0x7e57_5ce2L;
    static final int CASES = 12;
    static final double G = 9.81;
    /** Chute axis: 45° down towards +x. */
    static final Vector3D AXIS = new Vector3D(1, 0, -1).normalize();

    record Family(String name, PatchSampler neighbour) {
    }

    /** The upper tube: length 8–16 r from the origin along the axis, bore 1.5–6 r. */
    static final SurfaceSampler CHUTE = (rnd, b) -> new Cylinder(Vector3D.ZERO, AXIS,
        b.radius() * Interval.log(1.5, 6).draw(rnd), Side.INSIDE, 0.0, b.radius() * Interval.of(6, 12).draw(rnd));

    /** A still floor 1–8 ball radii below the chute's lower mouth. */
    static final PatchSampler FLOOR = (rnd, b, s) -> {
        Cylinder c = (Cylinder) s;
        double low = c.radius() + c.axis().getZ() * -c.to() + b.radius() * Interval.of(1, 8).draw(rnd);
        return Patch.of("floor", new Plane(new Vector3D(0, 0, -low), Vector3D.PLUS_K));
    };

    /** A still tube continuing the chute, same bore, 4–12 ball radii long. */
    static final PatchSampler LOWER_TUBE = (rnd, b, s) -> {
        Cylinder c = (Cylinder) s;
        return Patch.of("lower", new Cylinder(Vector3D.ZERO, AXIS, c.radius(), Side.INSIDE, c.to(),
            c.to() + b.radius() * Interval.of(4, 12).draw(rnd)));
    };

    static final List<Family> FAMILIES = List.of(
        new Family("chute over floor", FLOOR),
        new Family("two tubes end to end", LOWER_TUBE));

    static final List<Named<LawSampler>> LAWS = List.of(
        Named.of("pure rolling", (rnd, b) -> new PureRolling(rnd.nextDouble())),
        Named.of("coulomb", (rnd, b) -> Catalogue.coulomb(rnd)));

    /** Starts anywhere on the upper tube's wall near its top, 0.05–0.5 m/s. */
    static final StartSampler STARTS = StartSampler.near(AXIS.scalarMultiply(0.02), 0.01)
        .withSpeed(Interval.of(0.05, 0.5));

    /**
     * The chute scene's recipe: balls of 4–8 mm radius, the chute, a neighbour, a law, gravity 9.81 m/s² down,
     * 0.3 s (shared with {@link MovingScenePropertiesTest}).
     */
    static CaseRecipe.Builder chuteScene(String label, PatchSampler neighbour, LawSampler law, StartSampler starts) {
        return CaseRecipe.builder().label(label).balls(BallSampler.defaults().withRadius(Interval.of(0.004, 0.008)))
            .surfaces(CHUTE).neighbour(neighbour).laws(law).gravity(GravitySampler.fixed(new Vector3D(0, 0, -G)))
            .starts(starts).duration(0.3);
    }

    static Stream<Arguments> cases() {
        List<Arguments> out = new ArrayList<>();
        for (Family f : FAMILIES) {
            for (Named<LawSampler> l : LAWS) {
                CaseSource src = chuteScene(f.name() + " x " + l.getName(), f.neighbour(), l.getPayload(), STARTS)
                    .build();
                src.stream(SEED, CASES).forEach(c -> out.add(Arguments.of(Named.of(c.describe(), c))));
            }
        }
        return out.stream();
    }

    private static final VerdictTally APPLIED = new VerdictTally();

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void budgetResidualsAndCauses(PropertyCase c) {
        APPLIED.record(PropertyAssertions.assertHolds(c, Invariants.budgetCloses(1e-8), Invariants.distanceResidual(1e-8),
            Invariants.phaseChangesHaveCauses()));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void frameInvarianceMovesEveryPatch(PropertyCase c) {
        APPLIED.record(PropertyAssertions.assertHolds(c, Invariants.frameInvariant(1e-6)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void reRunsAreBitIdentical(PropertyCase c) {
        APPLIED.record(PropertyAssertions.assertHolds(c, Invariants.deterministic()));
    }

    /** Every check applied to most cases, so that none passes by not applying. */
    @AfterAll
    static void everyCheckApplied() {
        APPLIED.assertMostApplied();
    }
}
