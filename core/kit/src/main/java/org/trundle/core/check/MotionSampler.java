package org.trundle.core.check;

import java.util.SplittableRandom;
import java.util.function.Function;

import org.hipparchus.geometry.euclidean.threed.Line;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.Ball;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceMotion;
import org.trundle.core.internal.Checks;

/**
 * Draws a rigid motion for a drawn surface (a turntable, a spinning drum, a belt). A lambda serves;
 * the factories below draw the three common ones from the case's random stream, so that a case stays
 * a function of its seed and index. Every rate is drawn as a magnitude from an interval and a sense
 * (±) with equal odds, so a sampler never favours one sense of turning or travel.
 *
 * <p>Velocity fields of the motions drawn (rigid-body kinematics, common practice; see
 * {@link SurfaceMotion}): a rotation at rate {@code Ω} about a unit axis {@code a} through {@code o}
 * moves a point {@code x} of the patch at {@code u(x) = Ω a × (x − o)}; a translation at velocity
 * {@code U} moves every point at {@code u = U}.
 */
@FunctionalInterface
public interface MotionSampler {
    /**
     * @param rnd the random source
     * @param ball the ball
     * @param surface the drawn surface (at its rest pose)
     * @return its motion
     */
    SurfaceMotion draw(SplittableRandom rnd, Ball ball, Surface surface);

    /**
     * A turntable: rotation about a fixed axis direction through a point drawn uniformly in a ball of
     * radius {@code spread} about {@code centre}, at a rate {@code Ω = ±|Ω|} with {@code |Ω|} from
     * {@code rate} (rad/s). A ball rolling without slip on a flat turntable about a vertical axis orbits
     * its centre at {@code kΩ/(1+k)} (design notes §9; a classic result of non-holonomic rolling).
     *
     * @param axis axis direction (any length &gt; 0; for a floor, its normal)
     * @param centre centre of the region of axis points (m)
     * @param spread radius of that region (m), ≥ 0
     * @param rate range of the rate's magnitude (rad/s)
     * @return the sampler
     */
    static MotionSampler turntable(Vector3D axis, Vector3D centre, double spread, Interval rate) {
        Vector3D a = Checks.direction("axis", axis);
        Checks.finite("centre", centre);
        Checks.nonNegative("spread", spread);
        checkMagnitudes("rate", rate);
        return (rnd, ball, surface) -> {
            Vector3D o = Draws.inBall(rnd, centre, spread);
            return SurfaceMotion.rotation(a, o, signed(rnd, rate));
        };
    }

    /**
     * A belt: translation at a constant velocity {@code U = |U| e} in the plane normal to {@code normal},
     * with the unit direction {@code e} drawn uniformly in that plane and {@code |U|} from {@code speed}
     * (m/s). A plane moving in its own plane keeps its shape, so the run in the frame moving with the belt
     * is the run on a still plane (see {@link Invariants#galileanWithPatch(String, double)}).
     *
     * @param normal normal of the belt's plane (any length &gt; 0)
     * @param speed range of the belt speed (m/s)
     * @return the sampler
     */
    static MotionSampler belt(Vector3D normal, Interval speed) {
        Vector3D n = Checks.direction("normal", normal);
        checkMagnitudes("speed", speed);
        return (rnd, ball, surface) -> SurfaceMotion.translation(Draws.tangent(rnd, n).scalarMultiply(speed.draw(rnd)));
    }

    /**
     * A spinning body of revolution (a drum or tube about its own axis, a race about the bearing axis):
     * rotation about the axis the function gives for the drawn surface, at a rate {@code Ω = ±|Ω|} with
     * {@code |Ω|} from {@code rate} (rad/s). The surface keeps its shape, so only the velocity field
     * {@code u(x) = Ω a × (x − o)} of its wall changes the run.
     *
     * @param axisOf the drawn surface's axis of revolution (a line: a point {@code o} on it and its direction
     *     {@code a})
     * @param rate range of the rate's magnitude (rad/s)
     * @return the sampler
     */
    static MotionSampler spinning(Function<Surface, Line> axisOf, Interval rate) {
        if (axisOf == null) {
            throw new IllegalArgumentException("axisOf must be given, got null");
        }
        checkMagnitudes("rate", rate);
        return (rnd, ball, surface) -> {
            Line axis = axisOf.apply(surface);
            return SurfaceMotion.rotation(axis.getDirection(), axis.getOrigin(), signed(rnd, rate));
        };
    }

    /** The magnitude from the interval with a random sense (two draws: magnitude, then sense). */
    private static double signed(SplittableRandom rnd, Interval magnitude) {
        double m = magnitude.draw(rnd);
        return rnd.nextBoolean() ? m : -m;
    }

    private static void checkMagnitudes(String name, Interval i) {
        if (i == null || !(i.lo() >= 0)) {
            throw new IllegalArgumentException(name + " must be an interval of magnitudes (lo >= 0), got " + i);
        }
    }
}
