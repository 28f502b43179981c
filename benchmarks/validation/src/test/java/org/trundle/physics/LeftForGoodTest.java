package org.trundle.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.core.Surface;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Plane;
import org.trundle.surfaces.Side;
import org.trundle.surfaces.Sphere;

/**
 * A ball in free flight on a path that can never meet a patch again ends the run at once with
 * {@link EndReason#LEFT_FOR_GOOD}, at the first time from which that is certain; a path that can
 * still meet one flies on. Free flight is the parabola {@code c₀ + v₀ t + ½ g t²} (common practice).
 */
class LeftForGoodTest {
    private static final double R = 0.01;
    private static final double G = 9.81;

    private static Simulation sim(Surface surface, Vector3D gravity) {
        return Simulation.builder().ball(Ball.solid(R, 0.02)).surface(surface).law(new PureRolling())
            .gravity(gravity).settings(SolverSettings.defaults().withStopAtExit(false)).build();
    }

    /** Zero gravity, flying away from a plane: left at once, however long the duration (1e6 s, 3e99 s). */
    @ParameterizedTest
    @ValueSource(doubles = {1e6, 3e99})
    void flyingAwayFromAPlaneEndsAtOnce(double duration) {
        Simulation s = sim(new Plane(Vector3D.ZERO, Vector3D.PLUS_K), Vector3D.ZERO);
        RunResult res = s.run(BallState.flying(new Vector3D(0, 0, 0.05), new Vector3D(0.3, 0, 0.2), Vector3D.ZERO),
            duration);
        assertEquals(EndReason.LEFT_FOR_GOOD, res.endReason(), res.message());
        assertEquals(0.0, res.endState().time());
        assertTrue(res.message().contains("left for good"), res.message());
        assertTrue(res.evaluations() < 100, "evaluations " + res.evaluations());
    }

    /** Gravity pulls a ball thrown up from a floor back onto it: it lands, it has not left. */
    @Test
    void gravityBringsItBack() {
        Simulation s = sim(new Plane(Vector3D.ZERO, Vector3D.PLUS_K), new Vector3D(0, 0, -G));
        RunResult res = s.run(BallState.flying(new Vector3D(0, 0, 0.05), new Vector3D(0.3, 0, 2.0), Vector3D.ZERO), 1.0);
        assertTrue(res.endReason() != EndReason.LEFT_FOR_GOOD);
        // first impact at the root of 0.05 + 2 t − ½ g t² = R
        double tHit = (2.0 + Math.sqrt(4.0 + 2 * G * (0.05 - R))) / G;
        assertEquals(tHit, res.eventsOf(EventKind.IMPACT).get(0).time(), 1e-9);
    }

    /** Gravity along a vertical wall does not bring back a ball flying away from it. */
    @Test
    void awayFromAWallUnderGravity() {
        Simulation s = sim(new Plane(Vector3D.ZERO, Vector3D.PLUS_I), new Vector3D(0, 0, -G));
        RunResult res = s.run(BallState.flying(new Vector3D(0.05, 0, 0), new Vector3D(0.1, 0, 1.0), Vector3D.ZERO), 1e6);
        assertEquals(EndReason.LEFT_FOR_GOOD, res.endReason());
        assertEquals(0.0, res.endState().time());
    }

    /**
     * The same scene turned by rotations (each component of the turned gravity and wall normal rounded): gravity
     * is still perpendicular to the wall's normal up to rounding, so the ball has left for good at once in every
     * frame, as in the first (the end reason does not depend on the frame a scene is described in).
     */
    @ParameterizedTest
    @ValueSource(ints = {0, 1, 2, 3, 4, 5, 6, 7})
    void awayFromAWallUnderGravityInAnyFrame(int seed) {
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(seed);
        org.hipparchus.geometry.euclidean.threed.Rotation turn = new org.hipparchus.geometry.euclidean.threed.Rotation(
            new Vector3D(rnd.nextDouble() - 0.5, rnd.nextDouble() - 0.5, rnd.nextDouble() - 0.5), 3 * rnd.nextDouble(),
            org.hipparchus.geometry.euclidean.threed.RotationConvention.VECTOR_OPERATOR);
        Simulation s = sim(new Plane(Vector3D.ZERO, turn.applyTo(Vector3D.PLUS_I)), turn.applyTo(new Vector3D(0, 0, -G)));
        RunResult res = s.run(BallState.flying(turn.applyTo(new Vector3D(0.05, 0, 0)),
            turn.applyTo(new Vector3D(0.1, 0, 1.0)), Vector3D.ZERO), 1e6);
        assertEquals(EndReason.LEFT_FOR_GOOD, res.endReason(), res.message());
        assertEquals(0.0, res.endState().time());
    }

    /** An applied load could bring it back: the flight goes on to the duration. */
    @Test
    void aLoadKeepsItFlying() {
        Simulation s = Simulation.builder().ball(Ball.solid(R, 0.02)).surface(new Plane(Vector3D.ZERO, Vector3D.PLUS_K))
            .law(new PureRolling()).gravity(Vector3D.ZERO).load((state, out) -> { }).build();
        RunResult res = s.run(BallState.flying(new Vector3D(0, 0, 0.05), new Vector3D(0, 0, 0.2), Vector3D.ZERO), 0.5);
        assertEquals(EndReason.DURATION, res.endReason());
    }

    /**
     * Rolling out of the open end of a horizontal tube (axis x, 0 ≤ x ≤ 0.3 m) at speed u, the ball
     * falls in flight; it is clear of the tube for good once its centre is past the end by the
     * radius (the reach is r (1 + 1e-6)): at {@code t_exit + r (1 + 1e-6)/u}, before it has fallen
     * out of the tube's radial slab.
     */
    @Test
    void fallingOutOfATubeEndIsClearOnceBeyondReach() {
        double bigR = 0.015;
        double u = 0.5;
        Simulation s = sim(new Cylinder(Vector3D.ZERO, Vector3D.PLUS_I, bigR, Side.INSIDE, 0.0, 0.3),
            new Vector3D(0, 0, -G));
        RunResult res = s.run(s.rollingStart(new Vector3D(0.2, 0, -(bigR - R)), new Vector3D(u, 0, 0)), 10.0);
        assertEquals(EndReason.LEFT_FOR_GOOD, res.endReason(), res.message());
        double tExit = res.exit().orElseThrow().time();
        assertEquals(0.1 / u, tExit, 1e-9);
        assertEquals(tExit + R * (1 + 1e-6) / u, res.endState().time(), 1e-9);
        // the flight is the parabola from the exit
        double tau = res.endState().time() - tExit;
        assertEquals(-(bigR - R) - 0.5 * G * tau * tau, res.endState().centre().getZ(), 1e-9);
    }

    /** Below a dome and falling away from it: left at once; above it and falling onto it: it lands. */
    @Test
    void belowADomeFallingAwayEndsAboveItLands() {
        Simulation s = sim(new Sphere(Vector3D.ZERO, 0.1, Side.OUTSIDE), new Vector3D(0, 0, -G));
        RunResult below = s.run(BallState.flying(new Vector3D(0, 0, -0.2), new Vector3D(0.1, 0, 0), Vector3D.ZERO), 5.0);
        assertEquals(EndReason.LEFT_FOR_GOOD, below.endReason());
        assertEquals(0.0, below.endState().time());
        RunResult above = s.run(BallState.flying(new Vector3D(0, 0, 0.2), new Vector3D(0.01, 0, 0), Vector3D.ZERO), 1.0);
        assertTrue(above.eventsOf(EventKind.IMPACT).size() > 0);
    }
}
