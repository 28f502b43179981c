package org.trundle.core.check.junit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.trundle.core.check.*;
import org.trundle.core.BallState;
import org.trundle.core.ContactGeometry;
import org.trundle.core.ContactLaw;
import org.trundle.core.Phase;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.Surface;

/**
 * The kit tested on itself with a test-only surface (a horizontal floor z = 0, no edges, written
 * here because core depends on no surface module) and a test-only law without friction or
 * couples: reproducibility from seed and index, consistency of sampled starts, the minimiser,
 * the verdict and probe classifications, and the {@link KitCases} annotation.
 */
class KitSelfTest {
    /** Test-only floor z = 0 with normal +z; a strip |y| ≤ 0.05 m when bounded. */
    static final class Floor implements Surface {
        private final boolean bounded;

        Floor(boolean bounded) {
            this.bounded = bounded;
        }

        @Override
        public void query(double t, double[] x, ContactGeometry out) {
            out.distance = x[2];
            out.point[0] = x[0];
            out.point[1] = x[1];
            out.point[2] = 0;
            out.normal[0] = 0;
            out.normal[1] = 0;
            out.normal[2] = 1;
            Arrays.fill(out.hessian, 0.0);
            out.curvature1 = 0;
            out.curvature2 = 0;
            out.patchMargin = bounded ? 0.05 - Math.abs(x[1]) : Double.POSITIVE_INFINITY;
            out.edge = x[1] < 0 ? 0 : 1;
        }

        @Override
        public boolean hasEdges() {
            return bounded;
        }

        @Override
        public double maxConcaveCurvature() {
            return 0;
        }

        @Override
        public String name() {
            return bounded ? "test strip" : "test floor";
        }
    }

    static final ContactLaw FRICTIONLESS = () -> "test frictionless";

    /** Cases on the test floor, for the annotation. */
    static final class FloorCases implements CaseSource {
        private final CaseSource recipe = CaseRecipe.builder().label("floor")
            .surfaces(SurfaceSampler.fixed(new Floor(true)))
            .laws(LawSampler.fixed(FRICTIONLESS))
            .gravity(GravitySampler.near(Vector3D.MINUS_K, 0.3, Interval.of(1, 20)))
            .starts(StartSampler.near(Vector3D.ZERO, 0.03)).duration(0.05).build();

        @Override
        public PropertyCase make(long seed, int index) {
            return recipe.make(seed, index);
        }
    }

    @Test
    void casesAreReproducibleFromSeedAndIndex() {
        CaseSource src = new FloorCases();
        assertEquals(src.make(11, 7).describe(), src.make(11, 7).describe());
        assertNotEquals(src.make(11, 7).describe(), src.make(11, 8).describe());
        assertNotEquals(src.make(11, 7).describe(), src.make(12, 7).describe());
        assertTrue(src.make(11, 7).describe().startsWith("seed=11 index=7 "));
    }

    @Test
    void startsAreConsistentAndAccepted() {
        int[] phases = new int[Phase.values().length];
        for (PropertyCase c : new FloorCases().list(3, 60)) {
            BallState s = c.start();
            double r = c.simulation().ball().radius();
            phases[s.phase().ordinal()]++;
            if (s.phase() == Phase.FLIGHT) {
                assertTrue(s.centre().getZ() >= r, c.describe());
            } else {
                assertEquals(r, s.centre().getZ(), 1e-12 * r, c.describe());
                assertEquals(0.0, s.velocity().getZ(), 1e-12, c.describe());
                assertTrue(Math.abs(s.centre().getY()) < 0.05, c.describe());
            }
            if (s.phase() == Phase.ROLLING) {
                // no slip: v = r w x n (design notes section 3)
                Vector3D slip = s.velocity().subtract(Vector3D.crossProduct(s.spin(), Vector3D.PLUS_K).scalarMultiply(r));
                assertEquals(0.0, slip.getNorm(), 1e-12 * s.velocity().getNorm() + 1e-15, c.describe());
            }
            RunResult res = c.simulation().run(s, c.duration());
            assertTrue(res.endState().time() > 0, c.describe());
        }
        assertTrue(phases[Phase.ROLLING.ordinal()] > 10 && phases[Phase.SLIDING.ordinal()] > 5
            && phases[Phase.FLIGHT.ordinal()] > 5, Arrays.toString(phases));
    }

    @Test
    void minimiserWalksToASimplerFailingCase() {
        // a deliberately false property: "the ball never travels more than 1 mm"
        Invariant travel = c -> {
            RunResult res = c.simulation().run(c.start(), c.duration());
            double d = res.endState().centre().distance(c.start().centre());
            return Verdict.measured("travels at most 1 mm", d, 1e-3, "");
        };
        PropertyCase c = new FloorCases().make(5, 0);
        Verdict v = travel.check(c);
        assertFalse(v.holds(), v.describe());
        Reduction red = Minimiser.defaults().minimise(c, v, travel);
        assertFalse(red.simplestVerdict().holds());
        assertFalse(red.moves().isEmpty(), red.describe());
        assertTrue(red.simplest().derived());
        assertTrue(red.simplest().duration() <= c.duration());
        assertTrue(red.simplest().start().velocity().getNorm() <= c.start().velocity().getNorm() + 1e-15);
        // simpler, yet still failing: near the threshold the minimiser could go no further
        assertTrue(red.simplestVerdict().worst() <= v.worst(), red.describe());
        assertTrue(red.describe().contains("seed=5 index=0"), red.describe());
    }

    @Test
    void verdictsAndProbesClassify() {
        assertFalse(Verdict.measured("x", Double.NaN, 1, "").holds());
        assertTrue(Verdict.measured("x", 1, 1, "").holds());
        assertTrue(Verdict.notApplicable("x", "why").holds());
        assertFalse(Verdict.notApplicable("x", "why").applied());
        assertEquals(Outcome.REJECTED, Robustness.probe("d", () -> {
            throw new IllegalArgumentException("radius must be positive, got -1");
        }).outcome());
        assertEquals(Outcome.FAILURE, Robustness.probe("d", () -> {
            throw new IllegalArgumentException();
        }).outcome());
        assertEquals(Outcome.FAILURE, Robustness.probe("d", () -> {
            throw new IllegalStateException("unexpected");
        }).outcome());
        PropertyCase c = new FloorCases().make(1, 1);
        assertEquals(Outcome.VALID, Robustness.probe(c.describe(), () -> c.simulation().run(c.start(), 0.01)).outcome());
        Simulation tight = c.simulation().withSettings(c.simulation().settings().withMaxEvaluations(50));
        Probe budget = Robustness.probe(c.describe(), () -> tight.run(c.start(), 1.0));
        assertEquals(Outcome.TYPED_STOP, budget.outcome(), budget.describe());
    }

    @ParameterizedTest(name = "{0}")
    @KitCases(source = FloorCases.class, seed = 21, count = 12)
    void frictionlessFloorConservesEnergy(PropertyCase c) {
        // frictionless contact and free flight do no work (common practice); impacts with the test
        // law's restitution 0 are excluded by the check itself
        PropertyAssertions.assertHolds(c, Invariants.energyConserved(1e-8), Invariants.budgetCloses(1e-8),
            Invariants.planeNormalSpin(1e-8), Invariants.scaling(2.0, 1e-8), Invariants.frameInvariant(1e-6));
    }
}
