package org.trundle.core.engine;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.trundle.core.Ball;
import org.trundle.core.ContactContext;
import org.trundle.core.ContactLaw;
import org.trundle.core.FloorForTests;
import org.trundle.core.LossKind;
import org.trundle.core.ModelsForTests;
import org.trundle.core.Phase;
import org.trundle.core.Simulation;

/**
 * The per-phase integrated layout ({@link StateMapper#layout}, {@link Dynamics}): which components each phase integrates,
 * that compact and full states map onto each other, that the compact right-hand side is the full
 * one restricted to the layout, and how a law says whether it adds couples.
 */
class LayoutTest {
    private static final ContactLaw PLAIN = new ContactLaw() {
        @Override
        public boolean addsCouples() {
            return false;
        }

        @Override
        public String name() {
            return "plain";
        }
    };
    private static final ContactLaw COUPLED = new ContactLaw() {
        @Override
        public void addCouples(ContactContext c) {
            c.addCouple(0, 0, 1e-6, LossKind.OTHER);
        }

        @Override
        public String name() {
            return "coupled";
        }
    };

    @Test
    void layoutsHoldWhatMovesInEachPhase() {
        assertArrayEquals(new int[] {0, 1, 2, 6, 7, 8, 9, 10, 11, 12, 18},
            StateMapper.layout(Phase.ROLLING, false, false, false), "rolling derives v, no losses, no load");
        assertArrayEquals(new int[] {0, 1, 2, 6, 7, 8, 9, 10, 11, 12, 14, 15, 16, 17, 18},
            StateMapper.layout(Phase.ROLLING, true, true, false), "rolling with couples and a load");
        assertArrayEquals(new int[] {0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 18},
            StateMapper.layout(Phase.SLIDING, false, false, false), "sliding books its friction loss");
        assertEquals(StateMapper.DIM - 2, StateMapper.layout(Phase.SLIDING, true, true, false).length,
            "sliding with all on a still patch: all but the compliant contact's damping and the drive work");
        assertEquals(StateMapper.DIM - 1, StateMapper.layout(Phase.SLIDING, true, true, true).length,
            "sliding with all on a moving patch: every component but the compliant contact's damping");
        assertArrayEquals(new int[] {0, 1, 2, 6, 7, 8, 9, 10, 11, 12, 18, 20},
            StateMapper.layout(Phase.ROLLING, false, false, true), "rolling on a moving patch books its drive work");
        assertArrayEquals(new int[] {0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 17, 18},
            StateMapper.layout(Phase.FLIGHT, true, true, false), "flight has no contact losses");
    }

    @ParameterizedTest
    @EnumSource(value = Phase.class, names = {"ROLLING", "SLIDING", "FLIGHT"})
    void compactAndFullStatesRoundTripAndTheCompactDerivativeIsTheFullOneRestricted(Phase phase) {
        SplittableRandom rnd = new SplittableRandom(7);
        Ball ball = Ball.solid(0.01, 0.02);
        Simulation sim = Simulation.builder().ball(ball).surface(new FloorForTests(1.0)).law(COUPLED)
            .gravity(new Vector3D(0, 0, -9.81)).load((s, out) -> out.force(1e-3 * s.velocity(0), 0, 0)).build();
        Dynamics dyn = new Dynamics(ModelsForTests.model(sim), phase, 1e-9);
        double[] full = new double[StateMapper.DIM];
        for (int i = 0; i < full.length; i++) {
            full[i] = rnd.nextDouble() - 0.5;
        }
        full[2] = 0.01;
        full[5] = 0;
        int[] layout = StateMapper.layout(phase, true, true, false);
        double[] compact = dyn.beginSegment(layout, full);
        assertEquals(layout.length, dyn.getDimension());
        double[] back = dyn.expand(compact, new double[StateMapper.DIM]);
        assertArrayEquals(full, back, "expand(compress(y)) = y");
        double[] fullDot = new double[StateMapper.DIM];
        dyn.evaluate(0.0, full, fullDot);
        double[] compactDot = dyn.computeDerivatives(0.0, compact);
        for (int i = 0; i < layout.length; i++) {
            assertEquals(fullDot[layout[i]], compactDot[i], 0.0, "component " + layout[i]);
        }
        assertEquals(phase == Phase.ROLLING, dyn.derivedVelocity());
    }

    @Test
    void aCombinationAddsCouplesWhenOneOfItsPartsDoesAndTheDefaultIsTheSafeTrue() {
        assertFalse(PLAIN.addsCouples());
        assertTrue(COUPLED.addsCouples());
        assertTrue(((ContactLaw) () -> "default").addsCouples(), "a law that does not say may add couples");
        assertFalse(PLAIN.and(PLAIN).addsCouples());
        assertTrue(PLAIN.and(COUPLED).addsCouples());
    }
}
