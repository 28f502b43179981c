package org.trundle.core;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * Where an {@link AppliedLoad} puts its result: a force (N, world frame, applied at the ball's
 * centre) and a torque about the centre (N·m, world frame). Both are zero when the load is called;
 * each call of {@code force} or {@code torque} replaces the value set before. Valid only during
 * {@link AppliedLoad#apply}, like the {@link StateView}.
 */
public interface Wrench {
    /**
     * Sets the force.
     *
     * @param fx x component (N)
     * @param fy y component (N)
     * @param fz z component (N)
     */
    void force(double fx, double fy, double fz);

    /**
     * Sets the torque about the centre.
     *
     * @param tx x component (N·m)
     * @param ty y component (N·m)
     * @param tz z component (N·m)
     */
    void torque(double tx, double ty, double tz);

    /**
     * Sets the force.
     *
     * @param f the force (N)
     */
    default void force(Vector3D f) {
        force(f.getX(), f.getY(), f.getZ());
    }

    /**
     * Sets the torque about the centre.
     *
     * @param t the torque (N·m)
     */
    default void torque(Vector3D t) {
        torque(t.getX(), t.getY(), t.getZ());
    }
}
