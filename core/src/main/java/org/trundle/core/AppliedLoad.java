package org.trundle.core;

/**
 * A user-supplied force and torque on the ball as a function of time and state (air drag, a
 * magnet, an air jet, Magnus lift). Zero by default ({@link #NONE}).
 *
 * <p>The arrays are the solver's workspaces: read {@code centre}, {@code velocity},
 * {@code orientation} (unit quaternion, scalar first, Hamilton convention, body to world: the conjugate of the components Hipparchus' {@code Rotation} stores) and {@code spin}; write the
 * force (N, world frame, applied at the centre) into {@code force} and the torque about the centre
 * (N·m) into {@code torque}, both zero on entry. Implementations must be deterministic, allocate
 * nothing if speed matters, and be thread-safe (a sweep shares them across threads).
 */
@FunctionalInterface
public interface AppliedLoad {
    /** No applied load. */
    AppliedLoad NONE = (t, c, v, q, w, f, tau) -> { };

    /**
     * @param t time (s)
     * @param centre centre (m)
     * @param velocity centre velocity (m/s)
     * @param orientation quaternion (q0, q1, q2, q3)
     * @param spin angular velocity (rad/s)
     * @param force output force (N), zero on entry
     * @param torque output torque (N·m), zero on entry
     */
    void apply(double t, double[] centre, double[] velocity, double[] orientation, double[] spin,
               double[] force, double[] torque);
}
