package org.trundle.check;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.hipparchus.geometry.euclidean.threed.Line;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.Coulomb;
import org.trundle.core.Ball;
import org.trundle.core.MotionState;
import org.trundle.core.Patch;
import org.trundle.core.Simulation;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceMotion;
import org.trundle.core.check.Draws;
import org.trundle.core.check.Interval;
import org.trundle.core.check.Invariants;
import org.trundle.core.check.MotionSampler;
import org.trundle.core.check.PatchSampler;
import org.trundle.core.check.PropertyCase;
import org.trundle.core.check.Verdict;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Plane;
import org.trundle.surfaces.Side;

/**
 * The kit's motion samplers draw what their Javadoc says (rigid-body kinematics, common practice): a turntable
 * spins about the given axis at a rate whose magnitude lies in its interval, through a point within the spread;
 * a belt translates in its plane at a speed in its interval; a spinning body turns about the axis its function
 * gives; both senses are drawn; the same stream draws the same motion; bad input is refused naming the
 * parameter. 400 seeded draws each.
 */
class MotionSamplerTest {
    static final Ball BALL = Ball.solid(0.005, 0.004);
    static final Surface FLOOR = new Plane(Vector3D.ZERO, Vector3D.PLUS_K);
    static final int DRAWS = 400;

    static MotionState at(SurfaceMotion m, double t) {
        MotionState s = new MotionState();
        m.at(t, s);
        return s;
    }

    @Test
    void turntableTurnsAboutItsAxisThroughAPointOfTheRegion() {
        Vector3D axis = new Vector3D(0, 1, 2);
        Vector3D a = axis.normalize();
        Vector3D centre = new Vector3D(0.05, 0, 0);
        MotionSampler s = MotionSampler.turntable(axis, centre, 0.03, Interval.of(2, 8));
        int positive = 0;
        for (int i = 0; i < DRAWS; i++) {
            SurfaceMotion m = s.draw(Draws.forCase(11, i), BALL, FLOOR);
            MotionState st = at(m, 0.2);
            Vector3D spin = new Vector3D(st.spin);
            double rate = spin.dotProduct(a);
            assertTrue(Vector3D.crossProduct(spin, a).getNorm() <= 1e-15, "spin " + spin + " not along " + a);
            assertTrue(Math.abs(rate) >= 2 && Math.abs(rate) <= 8, "rate " + rate);
            positive += rate > 0 ? 1 : 0;
            // the fixed points of the motion, u(x) = 0, form the axis line: it passes within the spread of the centre
            double[] u = new double[3];
            st.velocityAt(centre.toArray(), u);
            // |u(centre)| = |Ω| · distance of the centre from the axis
            assertTrue(new Vector3D(u).getNorm() <= Math.abs(rate) * 0.03 * (1 + 1e-12), "axis too far: " + m.name());
        }
        assertTrue(positive > DRAWS / 3 && positive < 2 * DRAWS / 3, positive + " of " + DRAWS + " turned positively");
    }

    @Test
    void beltTravelsInItsPlaneAtASpeedOfItsInterval() {
        Vector3D n = new Vector3D(1, 1, 0);
        MotionSampler s = MotionSampler.belt(n, Interval.of(0.1, 1.0));
        Vector3D e = n.normalize();
        Vector3D sum = Vector3D.ZERO;
        for (int i = 0; i < DRAWS; i++) {
            MotionState st = at(s.draw(Draws.forCase(12, i), BALL, FLOOR), 0.3);
            Vector3D u = new Vector3D(st.velocity);
            assertTrue(Math.abs(u.dotProduct(e)) <= 1e-15, "velocity " + u + " leaves the plane");
            assertTrue(u.getNorm() >= 0.1 * (1 - 1e-15) && u.getNorm() <= 1.0 * (1 + 1e-15), "speed " + u.getNorm());
            assertEquals(0, new Vector3D(st.spin).getNorm());
            assertEquals(0, new Vector3D(st.offset).subtract(0.3, u).getNorm(), 1e-15);
            sum = sum.add(u.normalize());
        }
        // directions uniform in the plane: the mean unit direction is near zero (its spread is 1/√(2N) ≈ 0.035)
        assertTrue(sum.getNorm() / DRAWS < 0.15, "mean direction " + sum.scalarMultiply(1.0 / DRAWS));
    }

    @Test
    void spinningTurnsTheDrawnSurfaceAboutItsOwnAxisAndTheSameStreamDrawsTheSameMotion() {
        Cylinder tube = new Cylinder(new Vector3D(0.1, 0, 0), new Vector3D(1, 0, -1), 0.02, Side.INSIDE, 0, 0.1);
        MotionSampler s = MotionSampler.spinning(
            t -> new Line(((Cylinder) t).origin(), ((Cylinder) t).origin().add(((Cylinder) t).axis()), 1e-12),
            Interval.of(5, 40));
        for (int i = 0; i < DRAWS; i++) {
            MotionState st = at(s.draw(Draws.forCase(13, i), BALL, tube), 0.1);
            Vector3D spin = new Vector3D(st.spin);
            assertTrue(Vector3D.crossProduct(spin, tube.axis()).getNorm() <= 1e-14 * spin.getNorm(), "spin " + spin);
            double[] u = new double[3];
            st.velocityAt(tube.origin().add(0.05, tube.axis()).toArray(), u);
            // rounding of Ω × (x − o) for |x − o| ≈ 0.07 m: a few ulps of |Ω| · 0.1 m
            assertTrue(new Vector3D(u).getNorm() <= 1e-14 * spin.getNorm() * 0.1,
                "a point of the axis moves at " + new Vector3D(u).getNorm() + " m/s");
            MotionState again = at(s.draw(Draws.forCase(13, i), BALL, tube), 0.1);
            assertArrayEquals(st.rotation, again.rotation, 0.0);
            assertArrayEquals(st.offset, again.offset, 0.0);
        }
        PatchSampler still = (rnd, b, surface) -> Patch.of("lower", tube);
        Patch p = still.withMotion(s).draw(new SplittableRandom(5), BALL, FLOOR);
        assertEquals("lower", p.id());
        assertTrue(!p.motion().stationary() && p.surface() == tube, p.toString());
    }

    @Test
    void badInputIsRefusedNamingTheParameter() {
        IllegalArgumentException rate = assertThrows(IllegalArgumentException.class,
            () -> MotionSampler.turntable(Vector3D.PLUS_K, Vector3D.ZERO, 0.0, Interval.of(-1, 1)));
        assertTrue(rate.getMessage().contains("rate"), rate.getMessage());
        IllegalArgumentException speed = assertThrows(IllegalArgumentException.class,
            () -> MotionSampler.belt(Vector3D.PLUS_K, Interval.of(-0.5, 0.5)));
        assertTrue(speed.getMessage().contains("speed"), speed.getMessage());
        IllegalArgumentException axis = assertThrows(IllegalArgumentException.class,
            () -> MotionSampler.turntable(Vector3D.ZERO, Vector3D.ZERO, 0.0, Interval.of(1, 2)));
        assertTrue(axis.getMessage().contains("axis"), axis.getMessage());
        IllegalArgumentException spread = assertThrows(IllegalArgumentException.class,
            () -> MotionSampler.turntable(Vector3D.PLUS_K, Vector3D.ZERO, -1, Interval.of(1, 2)));
        assertTrue(spread.getMessage().contains("spread"), spread.getMessage());
        assertThrows(IllegalArgumentException.class, () -> ((PatchSampler) (rnd, b, s) -> null).withMotion(null));
    }

    /**
     * The Galilean check in a patch's frame names a missing patch, and does not apply to a patch that turns (a
     * turntable is not a uniform translation).
     */
    @Test
    void galileanWithAPatchNamesAMissingPatchAndSkipsATurningOne() {
        Simulation sim = Simulation.builder().ball(BALL).law(new Coulomb(0.5, 0.4, 0.3))
            .gravity(new Vector3D(0, 0, -9.81))
            .patch(Patch.of("floor", FLOOR).withMotion(SurfaceMotion.rotation(Vector3D.PLUS_K, Vector3D.ZERO, 3)))
            .patch(Patch.of("wall", new Plane(new Vector3D(0.5, 0, 0), Vector3D.MINUS_I))).build();
        PropertyCase c = PropertyCase.of(1, 0, "turntable and wall", sim,
            sim.rollingStart(new Vector3D(0.1, 0, 0.005), new Vector3D(0, 0.2, 0)), 0.05);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
            () -> Invariants.galileanWithPatch("belt", 1e-6).check(c));
        assertTrue(e.getMessage().contains("belt") && e.getMessage().contains("floor"), e.getMessage());
        Verdict v = Invariants.galileanWithPatch("floor", 1e-6).check(c);
        assertTrue(!v.applied() && v.detail().contains("rotation"), v.describe());
    }
}
