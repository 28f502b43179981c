package org.trundle.core;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

/** Core-only checks of the phase machine on a test floor, with test-only laws. */
class EngineTest {
    static final double G = 9.81;
    static final ContactLaw GRIP = () -> "unbounded grip";

    static final class Bouncy implements ContactLaw {
        private final double e;

        Bouncy(double e) {
            this.e = e;
        }

        @Override
        public OptionalDouble restitution() {
            return OptionalDouble.of(e);
        }

        @Override
        public String name() {
            return "bouncy(e=" + e + ")";
        }
    }

    private static Simulation floor(ContactLaw law, double halfWidth) {
        return Simulation.builder().ball(Ball.solid(0.01, 0.02)).surface(new FloorForTests(halfWidth)).law(law)
            .gravity(new Vector3D(0, 0, -G)).build();
    }

    /** Free flight is a parabola and the spin is constant (common practice). */
    @Test
    void flightIsAParabola() {
        Simulation sim = floor(GRIP, Double.POSITIVE_INFINITY);
        Vector3D w = new Vector3D(3, -2, 5);
        BallState s0 = BallState.flying(new Vector3D(0, 0, 1.0), new Vector3D(0.5, 0.2, 1.0), w);
        RunResult res = sim.run(s0, 0.3);
        assertEquals(EndReason.DURATION, res.endReason());
        BallState e = res.endState();
        assertEquals(0.15, e.centre().getX(), 1e-12);
        assertEquals(1.0 + 0.3 - 0.5 * G * 0.09, e.centre().getZ(), 1e-12);
        assertEquals(1.0 - G * 0.3, e.velocity().getZ(), 1e-12);
        assertTrue(e.spin().subtract(w).getNorm() < 1e-12);
        // the orientation turned by |w| t about w
        Rotation expect = new Rotation(w, w.getNorm() * 0.3, RotationConvention.VECTOR_OPERATOR);
        assertTrue(Rotation.distance(expect, e.orientation()) < 1e-9);
    }

    /** A drop from height h lands at sqrt(2h/g); with e = 0 and unbounded grip it stays (rest). */
    @Test
    void plasticLandingComesToRest() {
        Simulation sim = floor(GRIP, Double.POSITIVE_INFINITY);
        RunResult res = sim.run(BallState.flying(new Vector3D(0, 0, 0.01 + 0.2), Vector3D.ZERO, Vector3D.ZERO), 1.0);
        RunEvent impact = res.eventsOf(EventKind.IMPACT).get(0);
        assertEquals(Math.sqrt(2 * 0.2 / G), impact.time(), 1e-12);
        assertEquals(0.02 * Math.sqrt(2 * G * 0.2), impact.impulse().getZ(), 1e-12);
        assertEquals(EndReason.REST, res.endReason());
        assertEquals(0.02 * G * 0.2, res.energy().impactLoss(), 1e-12);
    }

    /**
     * Rolling in a straight line, the contact point traces a great circle on the ball: the angle
     * it has swept equals the distance rolled over the radius (rolling without slip, common practice).
     */
    @Test
    void contactPathOnTheBall() {
        Simulation sim = floor(GRIP, Double.POSITIVE_INFINITY)
            .withSettings(SolverSettings.defaults().withSampleInterval(0.01));
        java.util.List<Sample> samples = new java.util.ArrayList<>();
        sim.run(sim.rollingStart(new Vector3D(0, 0, 0.01), new Vector3D(0.05, 0, 0)), 0.5, samples::add);
        Vector3D first = samples.get(0).contactOnBall();
        for (Sample s : samples) {
            double angle = Vector3D.angle(first, s.contactOnBall());
            assertEquals(0.05 * s.time() / 0.01, angle, 1e-8);
            assertEquals(0.01, s.contactOnBall().getNorm(), 1e-12);
        }
    }

    /**
     * Each sample lists its contacts: on a floor with the ball rolling and the floor's normal up, one
     * contact on patch "surface" whose force and point repeat the single-contact fields, and none in flight
     * (the normal force of rolling on a level floor is m g, common practice).
     */
    @Test
    void samplesListTheirContacts() {
        Simulation sim = floor(GRIP, 0.1).withSettings(SolverSettings.defaults().withSampleInterval(0.01)
            .withStopAtExit(false));
        java.util.List<Sample> samples = new java.util.ArrayList<>();
        sim.run(sim.rollingStart(new Vector3D(0, 0, 0.01), new Vector3D(0.5, 0, 0)), 0.4, samples::add);
        int rolling = 0;
        int flying = 0;
        for (Sample s : samples) {
            if (s.state().phase() == Phase.FLIGHT) {
                assertTrue(s.touches().isEmpty());
                flying++;
                continue;
            }
            rolling++;
            assertEquals(1, s.touches().size());
            SampleContact c = s.touches().get(0);
            assertEquals(Simulation.SINGLE_PATCH, c.patch());
            assertEquals(Phase.ROLLING, c.mode());
            assertEquals(s.normalForce(), c.normalForce(), 0.0);
            assertEquals(0.02 * G, c.normalForce(), 1e-12);
            assertEquals(s.contactPoint(), c.contactPoint());
            assertEquals(s.frictionForce(), c.frictionForce());
            assertEquals(Vector3D.PLUS_K, c.normal());
        }
        assertTrue(rolling > 5 && flying > 5, rolling + " rolling and " + flying + " flying samples");
    }

    /** Rolling off the edge of the patch is an exit naming the edge. */
    @Test
    void exitNamesTheEdge() {
        Simulation sim = floor(GRIP, 0.1);
        RunResult res = sim.run(sim.rollingStart(new Vector3D(0, 0, 0.01), new Vector3D(-0.5, 0, 0)), 1.0);
        assertEquals(EndReason.EXIT, res.endReason());
        RunEvent exit = res.exit().orElseThrow();
        assertEquals("left", exit.edge());
        assertEquals(0.2, exit.time(), 1e-12);
        // continue in flight instead: the ball falls off the edge
        Simulation on = sim.withSettings(SolverSettings.defaults().withStopAtExit(false));
        RunResult fly = on.run(on.rollingStart(new Vector3D(0, 0, 0.01), new Vector3D(-0.5, 0, 0)), 0.5);
        assertEquals(EndReason.DURATION, fly.endReason());
        assertEquals(Phase.FLIGHT, fly.endState().phase());
        assertEquals(0.01 - 0.5 * G * 0.09, fly.endState().centre().getZ(), 1e-10);
    }

    /** The settle hand-over: a bouncing ball ends in contact; restitution must be in [0, 1]. */
    @Test
    void restitutionRange() {
        assertThrows(IllegalArgumentException.class, () -> floor(new Bouncy(1.2), 1.0));
        RunResult res = floor(new Bouncy(0.6), 1.0).run(
            BallState.flying(new Vector3D(0, 0, 0.05), Vector3D.ZERO, Vector3D.ZERO), 2.0);
        assertEquals(EndReason.REST, res.endReason());
        assertTrue(res.eventsOf(EventKind.IMPACT).size() > 3);
        assertTrue(res.energy().relativeResidual() < 1e-10);
    }

    @Test
    void settingsRejectBadValues() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
            () -> SolverSettings.defaults().withMaxCheckInterval(0));
        assertTrue(e.getMessage().contains("maxCheckInterval"));
        e = assertThrows(IllegalArgumentException.class, () -> SolverSettings.defaults().withMaxEvaluations(-1));
        assertTrue(e.getMessage().contains("maxEvaluations") && e.getMessage().contains("-1"));
        e = assertThrows(IllegalArgumentException.class, () -> Simulation.builder().build());
        assertTrue(e.getMessage().contains("ball"));
    }

    /**
     * A missing gravity is refused by name instead of being taken for zero; zero gravity is said
     * explicitly, and a run without it is straight free flight (common practice).
     */
    @Test
    void gravityMustBeGiven() {
        Simulation.Builder b = Simulation.builder().ball(Ball.solid(0.01, 0.02))
            .surface(new FloorForTests(Double.POSITIVE_INFINITY)).law(GRIP);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, b::build);
        assertTrue(e.getMessage().startsWith("gravity must be given, got none"), e.getMessage());
        assertTrue(e.getMessage().contains("noGravity()"), e.getMessage());
        IllegalArgumentException n = assertThrows(IllegalArgumentException.class, () -> b.gravity(null).build());
        assertTrue(n.getMessage().startsWith("gravity must be given"), n.getMessage());
        IllegalArgumentException nan = assertThrows(IllegalArgumentException.class,
            () -> b.gravity(new Vector3D(0, Double.NaN, 0)).build());
        assertTrue(nan.getMessage().startsWith("gravity must have finite components"), nan.getMessage());
        Simulation none = b.noGravity().build();
        assertEquals(Vector3D.ZERO, none.gravity());
        assertEquals(Vector3D.ZERO, b.gravity(Vector3D.ZERO).build().toBuilder().build().gravity());
        BallState s0 = BallState.flying(new Vector3D(0, 0, 1.0), new Vector3D(0.5, 0.2, 1.0), Vector3D.ZERO);
        BallState end = none.run(s0, 0.3).endState();
        assertEquals(1.3, end.centre().getZ(), 1e-12);
        assertEquals(0.15, end.centre().getX(), 1e-12);
    }

    /** A floor that reports a given largest concave curvature (the test floor's answers otherwise). */
    private static Surface floorReporting(double kmax) {
        FloorForTests base = new FloorForTests(Double.POSITIVE_INFINITY);
        return new Surface() {
            @Override
            public void query(double t, double[] x, ContactGeometry out) {
                base.query(t, x, out);
            }

            @Override
            public double maxConcaveCurvature() {
                return kmax;
            }

            @Override
            public String name() {
                return "floor reporting kappa_max " + kmax;
            }
        };
    }

    /**
     * The fit check {@code r κ_max < 1} (design notes §2): an unbounded curvature ({@code +∞}) fits
     * no ball and is refused by name; NaN means "unknown in advance" and is checked during the run.
     */
    @Test
    void unboundedCurvatureFitsNoBall() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Simulation.builder()
            .ball(Ball.solid(0.01, 0.02)).surface(floorReporting(Double.POSITIVE_INFINITY)).law(GRIP)
            .gravity(new Vector3D(0, 0, -G)).build());
        assertTrue(e.getMessage().contains("does not fit") && e.getMessage().contains("kappa_max Infinity"),
            e.getMessage());
        Simulation unknown = Simulation.builder().ball(Ball.solid(0.01, 0.02)).surface(floorReporting(Double.NaN))
            .law(GRIP).gravity(new Vector3D(0, 0, -G)).build();
        assertEquals(EndReason.DURATION, unknown.run(unknown.rollingStart(new Vector3D(0, 0, 0.01),
            new Vector3D(0.1, 0, 0)), 0.1).endReason());
    }
}
