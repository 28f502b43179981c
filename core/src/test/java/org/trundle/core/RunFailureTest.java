package org.trundle.core;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.Consumer;
import java.util.stream.Stream;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every failure of a run is a {@link SimulationException} with the cause and the last good state,
 * and no result holds a number that is not finite (issue 18, items 4, 6, 7). The reference motion
 * is uniform rolling on a level floor without gravity along it: {@code x = v₀ t}, {@code ω = v₀/r}
 * (common practice), so the last good state of a failed run can be checked against it.
 */
class RunFailureTest {
    static final double R = 0.01;
    static final double V0 = 0.1;
    static final double G = 9.81;
    /** Where the hostile test surfaces and laws turn bad: centre x beyond this (m). */
    static final double BREAK_X = 0.02;

    private static Simulation floor(Surface surface, ContactLaw law, AppliedLoad load) {
        return Simulation.builder().ball(Ball.solid(R, 0.02)).surface(surface).law(law).load(load)
            .gravity(new Vector3D(0, 0, -G)).build();
    }

    private static BallState rolling(Simulation sim) {
        return sim.rollingStart(new Vector3D(0, 0, R), new Vector3D(V0, 0, 0));
    }

    /** The last good state lies on the reference motion, before the input turned bad. */
    private static void onReference(SimulationException e) {
        BallState s = e.lastGoodState();
        assertTrue(s.time() >= 0 && s.centre().getX() <= BREAK_X + 1e-12, e.getMessage());
        assertEquals(V0 * s.time(), s.centre().getX(), 1e-12, e.getMessage());
        assertEquals(R, s.centre().getZ(), 1e-12);
        assertEquals(V0, s.velocity().getX(), 1e-12);
        assertEquals(V0 / R, s.spin().getY(), 1e-9);
    }

    /** A floor whose answers turn bad past x = BREAK_X, in the way {@code spoil} says. */
    private static Surface spoiledFloor(String what, Consumer<ContactGeometry> spoil) {
        FloorForTests base = new FloorForTests(Double.POSITIVE_INFINITY);
        return new Surface() {
            @Override
            public void query(double t, double[] x, ContactGeometry out) {
                base.query(t, x, out);
                if (x[0] > BREAK_X) {
                    spoil.accept(out);
                }
            }

            @Override
            public double maxConcaveCurvature() {
                return 0;
            }

            @Override
            public String name() {
                return "floor with " + what;
            }
        };
    }

    static Stream<Arguments> brokenSurfaces() {
        return Stream.of(
            Arguments.of("NaN normal", (Consumer<ContactGeometry>) g -> g.normal[0] = Double.NaN),
            Arguments.of("zero normal", (Consumer<ContactGeometry>) g -> g.normal[2] = 0),
            Arguments.of("long normal", (Consumer<ContactGeometry>) g -> g.normal[2] = 2),
            Arguments.of("NaN distance", (Consumer<ContactGeometry>) g -> g.distance = Double.NaN),
            Arguments.of("infinite distance", (Consumer<ContactGeometry>) g -> g.distance = Double.POSITIVE_INFINITY),
            Arguments.of("NaN Hessian", (Consumer<ContactGeometry>) g -> g.hessian[4] = Double.NaN),
            Arguments.of("NaN curvature", (Consumer<ContactGeometry>) g -> g.curvature1 = Double.NaN),
            Arguments.of("NaN patch margin", (Consumer<ContactGeometry>) g -> g.patchMargin = Double.NaN));
    }

    /**
     * A surface whose geometry turns NaN, infinite or non-unit mid-run stops the run with the
     * surface named; it never ends "duration" with a NaN residual, nor spends its budget.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("brokenSurfaces")
    void brokenSurfaceIsATypedStop(String what, Consumer<ContactGeometry> spoil) {
        Simulation sim = floor(spoiledFloor(what, spoil), () -> "unbounded grip", AppliedLoad.NONE);
        SimulationException e = assertThrows(SimulationException.class, () -> sim.run(rolling(sim), 1.0));
        assertTrue(e.getMessage().contains("floor with " + what), e.getMessage());
        onReference(e);
    }

    /** The same surfaces met in flight (a ball thrown along the floor, landing past BREAK_X). */
    @ParameterizedTest(name = "{0}")
    @MethodSource("brokenSurfaces")
    void brokenSurfaceInFlightIsATypedStop(String what, Consumer<ContactGeometry> spoil) {
        Simulation sim = floor(spoiledFloor(what, spoil), () -> "unbounded grip", AppliedLoad.NONE);
        BallState start = BallState.flying(new Vector3D(0, 0, 2 * R), new Vector3D(V0, 0, 0), Vector3D.ZERO);
        SimulationException e = assertThrows(SimulationException.class, () -> sim.run(start, 1.0));
        assertTrue(e.getMessage().contains("floor with " + what), e.getMessage());
        assertTrue(e.lastGoodState().centre().getX() <= BREAK_X + 1e-12, e.getMessage());
    }

    /** A law that answers well until the contact point passes BREAK_X. */
    private abstract static class TurningLaw implements ContactLaw {
        boolean bad(ContactContext c) {
            return c.geometry().point[0] > BREAK_X;
        }

        @Override
        public boolean addsCouples() {
            return true;
        }
    }

    static Stream<Arguments> brokenLaws() {
        return Stream.of(
            Arguments.of("NaN grip", "grip limit NaN", new TurningLaw() {
                @Override
                public double gripLimit(ContactContext c) {
                    return bad(c) ? Double.NaN : Double.POSITIVE_INFINITY;
                }

                @Override
                public String name() {
                    return "NaN grip";
                }
            }),
            Arguments.of("negative grip", "grip limit -1.0", new TurningLaw() {
                @Override
                public double gripLimit(ContactContext c) {
                    return bad(c) ? -1.0 : Double.POSITIVE_INFINITY;
                }

                @Override
                public String name() {
                    return "negative grip";
                }
            }),
            Arguments.of("NaN couple", "couple [NaN", new TurningLaw() {
                @Override
                public void addCouples(ContactContext c) {
                    c.addCouple(bad(c) ? Double.NaN : 0.0, 0, 0, LossKind.OTHER);
                }

                @Override
                public String name() {
                    return "NaN couple";
                }
            }),
            Arguments.of("infinite couple", "couple [0.0, Infinity", new TurningLaw() {
                @Override
                public void addCouples(ContactContext c) {
                    c.addCouple(0, bad(c) ? Double.POSITIVE_INFINITY : 0.0, 0, LossKind.OTHER);
                }

                @Override
                public String name() {
                    return "infinite couple";
                }
            }));
    }

    /** A law's NaN or negative grip, or a couple that is not finite, stops the run naming the law. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("brokenLaws")
    void brokenLawIsATypedStop(String what, String says, ContactLaw law) {
        Simulation sim = floor(new FloorForTests(Double.POSITIVE_INFINITY), law, AppliedLoad.NONE);
        SimulationException e = assertThrows(SimulationException.class, () -> sim.run(rolling(sim), 1.0));
        assertTrue(e.getMessage().contains("contact law " + what), e.getMessage());
        assertTrue(e.getMessage().contains(says), e.getMessage());
        onReference(e);
    }

    /** A sliding law whose friction is NaN, infinite or negative: refused at once (friction must oppose the slip). */
    @ParameterizedTest(name = "sliding friction {0}")
    @MethodSource("badFrictions")
    void badSlidingFrictionIsATypedStop(double friction) {
        ContactLaw law = new ContactLaw() {
            @Override
            public double gripLimit(ContactContext c) {
                return 0;
            }

            @Override
            public double slidingFriction(ContactContext c) {
                return friction;
            }

            @Override
            public String name() {
                return "friction " + friction;
            }
        };
        Simulation sim = floor(new FloorForTests(Double.POSITIVE_INFINITY), law, AppliedLoad.NONE);
        BallState start = BallState.of(0, new Vector3D(0, 0, R), new Vector3D(V0, 0, 0),
            org.hipparchus.geometry.euclidean.threed.Rotation.IDENTITY, Vector3D.ZERO, Phase.SLIDING);
        SimulationException e = assertThrows(SimulationException.class, () -> sim.run(start, 1.0));
        assertTrue(e.getMessage().contains("returned sliding friction " + friction), e.getMessage());
        assertEquals(0.0, e.lastGoodState().time());
        assertEquals(start.centre(), e.lastGoodState().centre());
    }

    static Stream<Double> badFrictions() {
        return Stream.of(Double.NaN, Double.POSITIVE_INFINITY, -0.01);
    }

    /** Exceptions thrown by user code come out as the cause of a SimulationException with the last good state. */
    @Test
    void userExceptionsAreWrappedWithTheirCause() {
        RuntimeException boom = new IllegalArgumentException("user code refuses");
        ContactLaw law = new ContactLaw() {
            @Override
            public double gripLimit(ContactContext c) {
                if (c.geometry().point[0] > BREAK_X) {
                    throw boom;
                }
                return Double.POSITIVE_INFINITY;
            }

            @Override
            public boolean addsCouples() {
                return false;
            }

            @Override
            public String name() {
                return "throwing law";
            }
        };
        FloorForTests plain = new FloorForTests(Double.POSITIVE_INFINITY);
        Simulation byLaw = floor(plain, law, AppliedLoad.NONE);
        SimulationException e = assertThrows(SimulationException.class, () -> byLaw.run(rolling(byLaw), 1.0));
        assertSame(boom, e.getCause());
        onReference(e);

        Simulation byLoad = floor(plain, () -> "grip", (s, out) -> {
            if (s.centre(0) > BREAK_X) {
                throw boom;
            }
        });
        e = assertThrows(SimulationException.class, () -> byLoad.run(rolling(byLoad), 1.0));
        assertSame(boom, e.getCause());
        onReference(e);

        Simulation bySurface = floor(spoiledFloor("throwing", g -> {
            throw boom;
        }), () -> "grip", AppliedLoad.NONE);
        e = assertThrows(SimulationException.class, () -> bySurface.run(rolling(bySurface), 1.0));
        assertSame(boom, e.getCause());
        onReference(e);

        Simulation plainSim = floor(plain, () -> "grip", AppliedLoad.NONE);
        RunObserver observer = s -> {
            if (s.state().centre().getX() > BREAK_X) {
                throw boom;
            }
        };
        e = assertThrows(SimulationException.class, () -> plainSim.run(rolling(plainSim), 1.0, observer));
        assertSame(boom, e.getCause());
        assertTrue(e.getMessage().contains("user code refuses"), e.getMessage());
        onReference(e);
    }

    /** An inconsistent start is still rejected before the run, with an IllegalArgumentException of the engine's own. */
    @Test
    void inconsistentStartIsStillARejection() {
        Simulation sim = floor(new FloorForTests(Double.POSITIVE_INFINITY), () -> "grip", AppliedLoad.NONE);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
            () -> sim.run(BallState.flying(new Vector3D(0, 0, 0.5 * R), Vector3D.ZERO, Vector3D.ZERO), 1.0));
        assertTrue(e.getMessage().contains("penetrates"), e.getMessage());
        assertFalse(RuntimeException.class.cast(e) instanceof SimulationException);
    }

    /**
     * Numbers past the range of double: a mass of 1e308 kg under gravity overflows the normal force
     * at the start; the failure names it and keeps the start as the last good state.
     */
    @Test
    void overflowAtTheStartKeepsTheStart() {
        Simulation sim = Simulation.builder().ball(Ball.solid(R, 1e308)).surface(new FloorForTests(Double.POSITIVE_INFINITY))
            .law(() -> "grip").gravity(new Vector3D(0, 0, -G)).build();
        BallState start = rolling(sim);
        SimulationException e = assertThrows(SimulationException.class, () -> sim.run(start, 1.0));
        assertTrue(e.getMessage().contains("normal force"), e.getMessage());
        assertEquals(start.centre(), e.lastGoodState().centre());
        assertEquals(0.0, e.lastGoodState().time());
    }

    /** A ball whose moment of inertia or inverse mass leaves the range of double is refused when made. */
    @Test
    void ballOutsideTheRangeOfDoubleIsRefused() {
        for (double[] rm : new double[][] {{1e300, 1}, {0.01, 4.9e-324}, {1e-160, 1}, {1e155, 1e10}}) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Ball.solid(rm[0], rm[1]));
            assertTrue(e.getMessage().contains("moment of inertia"), e.getMessage());
        }
        // large but representable: accepted
        assertEquals(0.4e200, Ball.solid(1e100, 1).momentOfInertia(), 1e186);
    }

    /** A budget used up by the start's own checks ends the run with a budget stop, never an internal exception. */
    @Test
    void budgetSpentAtTheStartIsABudgetStop() {
        Simulation sim = floor(new FloorForTests(Double.POSITIVE_INFINITY), () -> "grip", AppliedLoad.NONE)
            .withSettings(SolverSettings.defaults().withMaxEvaluations(1));
        RunResult res = sim.run(rolling(sim), 1.0);
        assertEquals(EndReason.BUDGET, res.endReason());
        assertEquals(0.0, res.endState().time());
    }

    /**
     * An interrupt of the running thread ends the run at once with a typed stop carrying the last
     * good state (the last step end before the interrupt), and leaves the interrupt status set.
     */
    @Test
    void interruptStopsTheRun() {
        Simulation sim = floor(new FloorForTests(Double.POSITIVE_INFINITY), () -> "grip", AppliedLoad.NONE)
            .withSettings(SolverSettings.defaults().withSampleInterval(1e-3));
        double[] interruptedAt = {Double.NaN};
        int[] samplesAfter = {0};
        RunObserver interrupter = s -> {
            if (!Double.isNaN(interruptedAt[0])) {
                samplesAfter[0]++;
            } else if (s.state().time() >= 0.5) {
                interruptedAt[0] = s.state().time();
                Thread.currentThread().interrupt();
            }
        };
        try {
            SimulationInterruptedException e = assertThrows(SimulationInterruptedException.class,
                () -> sim.run(rolling(sim), 1e6, interrupter));
            assertTrue(Thread.currentThread().isInterrupted());
            assertEquals(0, samplesAfter[0], "samples after the interrupt");
            double t = e.lastGoodState().time();
            assertTrue(t > 0 && t <= interruptedAt[0], e.getMessage());
            assertEquals(V0 * t, e.lastGoodState().centre().getX(), 1e-12);
            assertNull(e.getCause());
        } finally {
            Thread.interrupted();
        }
    }

    /** An interrupt already set when the run is asked for stops it before its first step, in flight too. */
    @Test
    void interruptBeforeTheRunStopsAtTheStart() {
        Simulation sim = Simulation.builder().ball(Ball.solid(R, 0.02)).surface(new FloorForTests(Double.POSITIVE_INFINITY))
            .law(() -> "grip").noGravity().build();
        BallState start = BallState.flying(new Vector3D(0, 0, 2 * R), new Vector3D(0, 0, 1), Vector3D.ZERO);
        Thread.currentThread().interrupt();
        try {
            SimulationInterruptedException e = assertThrows(SimulationInterruptedException.class,
                () -> sim.run(start, 1e99));
            assertEquals(0.0, e.lastGoodState().time());
            assertTrue(Thread.currentThread().isInterrupted());
        } finally {
            Thread.interrupted();
        }
    }

    /** The kernel's own failure type never leaves the library through {@link RightHandSide} either. */
    @Test
    void rightHandSideFailsWithAnArithmeticException() {
        Simulation sim = floor(spoiledFloor("NaN normal", g -> g.normal[0] = Double.NaN), () -> "grip", AppliedLoad.NONE);
        RightHandSide rhs = new RightHandSide(sim, Phase.ROLLING);
        double[] y = RightHandSide.toArray(rolling(sim));
        y[0] = 2 * BREAK_X;
        ArithmeticException e = assertThrows(ArithmeticException.class, () -> rhs.evaluate(0, y, new double[rhs.dimension()]));
        assertTrue(e.getMessage().contains("floor with NaN normal"), e.getMessage());
    }

    /**
     * A load that drives the speed to infinity in finite time: {@code m dv/dt = m v²/L} gives
     * {@code v = v₀/(1 − v₀ (t − t₀)/L)}, which blows up at {@code t₀ + L/v₀} (separation of
     * variables, common practice). The steps shrink towards the blow-up until they cannot advance
     * the time: the failure names the step size underflow, the time and the phase in our words and
     * keeps the integrator's exception as the cause.
     */
    @Test
    void stepSizeUnderflowIsNamed() {
        double m = 0.02;
        AppliedLoad runaway = (state, out) -> out.force(0, 0, m * state.velocity(2) * state.velocity(2) / 1.0);
        Simulation sim = Simulation.builder().ball(Ball.solid(R, m)).surface(new FloorForTests(Double.POSITIVE_INFINITY))
            .law(() -> "grip").load(runaway).gravity(Vector3D.ZERO).build();
        BallState s0 = BallState.of(1.0, new Vector3D(0, 0, 0.1), new Vector3D(0, 0, 1.0),
            org.hipparchus.geometry.euclidean.threed.Rotation.IDENTITY, Vector3D.ZERO, Phase.FLIGHT);
        SimulationException e = assertThrows(SimulationException.class, () -> sim.run(s0, 5.0));
        String msg = e.getMessage();
        assertTrue(msg.contains("step size underflow") && msg.contains("phase flight"), msg);
        assertFalse(msg.contains("minimal step size"), msg);
        assertTrue(e.getCause() instanceof org.hipparchus.exception.MathRuntimeException, String.valueOf(e.getCause()));
        // the last good state is next to the blow-up at t = 2 s (where the integration error of
        // the runaway speed shifts it by far less than the 1e-6 s allowed here)
        BallState last = e.lastGoodState();
        assertEquals(2.0, last.time(), 1e-6, msg);
        assertTrue(last.velocity().getZ() > 1e6 && Double.isFinite(last.velocity().getZ()), msg);
    }
}
