package org.trundle.core;

import org.trundle.core.internal.Checks;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * A rigid motion of a patch over time (a turntable, a rotating drum, a spinning race, a belt). The
 * patch's {@link Surface} describes it at its rest pose; at time {@code t} it is moved by the
 * rotation {@code R(t)} and then the translation {@code D(t)}: a point {@code x₀} of the rest pose
 * is at {@code x = R(t) x₀ + D(t)}. The velocity field of the patch is
 * {@code u(x, t) = Ω(t) × (x − D(t)) + Ḋ(t)} with {@code Ω} the patch's spin (world frame), and its
 * acceleration field {@code Ω̇ × (x − D) + Ω × (Ω × (x − D)) + D̈} (design notes §9; common
 * practice of rigid-body kinematics).
 *
 * <p>An implementation writes the pose and its rates at {@code t} into a {@link MotionState}
 * workspace; it must be immutable, thread-safe, allocation-free in {@link #at} and consistent
 * (the rates the derivatives of the pose), since the solver's constraint accelerations use them.
 */
@FunctionalInterface
public interface SurfaceMotion {
    /** The patch stays at its rest pose. */
    SurfaceMotion NONE = new SurfaceMotion() {
        @Override
        public void at(double t, MotionState out) {
            out.setIdentity();
        }

        @Override
        public boolean stationary() {
            return true;
        }

        @Override
        public String name() {
            return "still";
        }
    };

    /**
     * Writes the pose and its rates at time {@code t}.
     *
     * @param t time (s)
     * @param out workspace to fill (every field)
     */
    void at(double t, MotionState out);

    /** @return whether the patch never moves (the solver then skips every motion term) */
    default boolean stationary() {
        return false;
    }

    /** @return a short name with the parameters, for messages */
    default String name() {
        return "rigid motion";
    }

    /**
     * Rotation at a constant rate about a fixed axis (a turntable, a drum, a race):
     * {@code R(t)} turns by {@code rate·t} about {@code axis} through {@code origin}.
     *
     * @param axis rotation axis (any length &gt; 0; the sense gives the sign of the rate)
     * @param origin a point on the axis (m)
     * @param rate angular rate Ω (rad/s), any finite value
     * @return the motion
     */
    static SurfaceMotion rotation(Vector3D axis, Vector3D origin, double rate) {
        return new RotatingMotion(Checks.direction("axis", axis), Checks.finite("origin", origin),
            Checks.finite("rate", rate));
    }

    /**
     * Translation at a constant velocity (a belt: a plane moving in its own plane).
     *
     * @param velocity velocity of the patch (m/s)
     * @return the motion
     */
    static SurfaceMotion translation(Vector3D velocity) {
        Vector3D u = Checks.finite("velocity", velocity);
        return new SurfaceMotion() {
            @Override
            public void at(double t, MotionState out) {
                out.setIdentity();
                out.offset[0] = u.getX() * t;
                out.offset[1] = u.getY() * t;
                out.offset[2] = u.getZ() * t;
                out.velocity[0] = u.getX();
                out.velocity[1] = u.getY();
                out.velocity[2] = u.getZ();
            }

            @Override
            public String name() {
                return "translation(velocity=" + u + " m/s)";
            }
        };
    }
}
