package org.trundle.core;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * Read-only view of the ball's state handed to an {@link AppliedLoad}: time {@code t} (s), centre
 * {@code c} (m), centre velocity {@code v} (m/s), angular velocity {@code ω} (rad/s) and orientation,
 * all in the world frame. While rolling the velocity is the no-slip velocity derived from the spin.
 *
 * <p>The solver fills one view per run and refills it before each call: it is valid only during
 * {@link AppliedLoad#apply}; keep the values, never the view. The component accessors
 * ({@code centre(axis)}, axis 0, 1, 2 for x, y, z) allocate nothing; {@link #centre()},
 * {@link #velocity()}, {@link #spin()} and {@link #orientation()} build a new value on each call.
 *
 * <p>Orientation: {@link #orientation()} is the body-to-world rotation as Hipparchus' {@link Rotation}
 * holds it, the same value as {@link BallState#orientation()}: a body-frame vector {@code b} is
 * {@code orientation().applyTo(b)} in the world frame
 * ({@link org.hipparchus.geometry.euclidean.threed.RotationConvention#VECTOR_OPERATOR}).
 */
public interface StateView {
    /** @return time t (s) */
    double time();

    /**
     * @param axis 0, 1 or 2 for x, y, z
     * @return that component of the centre (m)
     */
    double centre(int axis);

    /**
     * @param axis 0, 1 or 2 for x, y, z
     * @return that component of the centre velocity (m/s)
     */
    double velocity(int axis);

    /**
     * @param axis 0, 1 or 2 for x, y, z
     * @return that component of the angular velocity (rad/s, world frame)
     */
    double spin(int axis);

    /**
     * @return the body-to-world rotation (a new value; see the class comment for its convention), built from
     *     the integrated quaternion without renormalising it (its norm is 1 to within the projection
     *     threshold, {@link SolverSettings#effectiveProjectionThreshold()})
     */
    Rotation orientation();

    /** @return the centre c (m), a new vector */
    default Vector3D centre() {
        return new Vector3D(centre(0), centre(1), centre(2));
    }

    /** @return the centre velocity v (m/s), a new vector */
    default Vector3D velocity() {
        return new Vector3D(velocity(0), velocity(1), velocity(2));
    }

    /** @return the angular velocity ω (rad/s, world frame), a new vector */
    default Vector3D spin() {
        return new Vector3D(spin(0), spin(1), spin(2));
    }
}
