package org.trundle.core;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * The per-phase integrated layout of {@link Dynamics}: which components each phase integrates,
 * that compact and full states map onto each other, that the compact right-hand side is the full
 * one restricted to the layout, and how the solver tells a law with couples from one without.
 */
class LayoutTest {
    private static final ContactLaw PLAIN = () -> "plain";
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
            Dynamics.layout(Phase.ROLLING, false, false), "rolling derives v, no losses, no load");
        assertArrayEquals(new int[] {0, 1, 2, 6, 7, 8, 9, 10, 11, 12, 14, 15, 16, 17, 18},
            Dynamics.layout(Phase.ROLLING, true, true), "rolling with couples and a load");
        assertArrayEquals(new int[] {0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 18},
            Dynamics.layout(Phase.SLIDING, false, false), "sliding books its friction loss");
        assertEquals(Dynamics.DIM, Dynamics.layout(Phase.SLIDING, true, true).length, "sliding with all: full");
        assertArrayEquals(new int[] {0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 17, 18},
            Dynamics.layout(Phase.FLIGHT, true, true), "flight has no contact losses");
    }

    @ParameterizedTest
    @EnumSource(value = Phase.class, names = {"ROLLING", "SLIDING", "FLIGHT"})
    void compactAndFullStatesRoundTripAndTheCompactDerivativeIsTheFullOneRestricted(Phase phase) {
        SplittableRandom rnd = new SplittableRandom(7);
        Ball ball = Ball.solid(0.01, 0.02);
        Dynamics dyn = new Dynamics(ball, new FloorForTests(1.0), COUPLED, new double[] {0, 0, -9.81},
            (t, c, v, q, w, f, tau) -> f[0] = 1e-3 * v[0]);
        dyn.phase = phase;
        dyn.stickEps = 1e-9;
        double[] full = new double[Dynamics.DIM];
        for (int i = 0; i < full.length; i++) {
            full[i] = rnd.nextDouble() - 0.5;
        }
        full[2] = 0.01;
        full[5] = 0;
        int[] layout = Dynamics.layout(phase, true, true);
        double[] compact = dyn.beginSegment(layout, full);
        assertEquals(layout.length, dyn.getDimension());
        double[] back = dyn.expand(compact, new double[Dynamics.DIM]);
        assertArrayEquals(full, back, "expand(compress(y)) = y");
        double[] fullDot = new double[Dynamics.DIM];
        dyn.evaluate(0.0, full, fullDot);
        double[] compactDot = dyn.computeDerivatives(0.0, compact);
        for (int i = 0; i < layout.length; i++) {
            assertEquals(fullDot[layout[i]], compactDot[i], 0.0, "component " + layout[i]);
        }
        assertEquals(phase == Phase.ROLLING, dyn.derivedVelocity());
    }

    @Test
    void aLawAddsCouplesWhenItOrOneOfItsPartsOverridesAddCouples() {
        assertFalse(Dynamics.addsCouples(PLAIN));
        assertTrue(Dynamics.addsCouples(COUPLED));
        assertFalse(Dynamics.addsCouples(PLAIN.and(() -> "other")));
        assertTrue(Dynamics.addsCouples(PLAIN.and(COUPLED)));
    }
}
