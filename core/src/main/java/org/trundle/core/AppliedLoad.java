package org.trundle.core;

/**
 * A user-supplied force and torque on the ball as a function of time and state (air drag, a
 * magnet, an air jet, Magnus lift). Zero by default ({@link #NONE}).
 *
 * <p>The solver calls {@link #apply} with a read-only {@link StateView} of the ball (time, centre,
 * velocity, angular velocity, orientation as Hipparchus' {@code Rotation}) and a {@link Wrench} to
 * set the force (N, world frame, applied at the centre) and the torque about the centre (N·m), both
 * zero on entry. Both objects are reused for every call of a run: use them only during the call.
 * A linear drag, for example:
 *
 * <pre>{@code
 * AppliedLoad drag = (s, out) -> out.force(-b * s.velocity(0), -b * s.velocity(1), -b * s.velocity(2));
 * }</pre>
 *
 * <p>Implementations must be deterministic, allocate nothing if speed matters (the component
 * accessors of {@code StateView} and the three-number setters of {@code Wrench} allocate nothing),
 * and be thread-safe (a sweep shares them across threads). A force or torque that is not finite
 * stops the run with a {@link SimulationException} naming the load.
 */
@FunctionalInterface
public interface AppliedLoad {
    /** No applied load. */
    AppliedLoad NONE = (state, out) -> { };

    /**
     * @param state the ball's state at this evaluation (valid only during the call)
     * @param out where to set the force and torque (zero on entry)
     */
    void apply(StateView state, Wrench out);
}
