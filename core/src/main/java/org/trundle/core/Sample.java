package org.trundle.core;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * One output sample of a run: the state, and in contact the normal force (N), the tangential
 * friction force on the ball (N, world frame) and the contact point (m). In flight the forces are
 * zero and {@link #contactPoint()} and {@link #contactOnBall()} are null. {@code event} is true for
 * the samples written at the exact instant of an event. {@code contactOnBall} is the contact point
 * in the ball's body frame relative to its centre, {@code q*(−r n)q} (m), so a sequence of samples
 * traces the contact path on the ball (wear track) as well as on the surface.
 *
 * @param state the state
 * @param normalForce normal force F_n (N)
 * @param frictionForce tangential contact force on the ball (N)
 * @param contactPoint contact point p = c − r n (m), or null in flight
 * @param contactOnBall contact point in the body frame relative to the centre (m), or null in flight
 * @param event whether this sample is an event instant
 * @param contacts ids of the patches touched ({@link Patch#id()}), empty in flight
 */
public record Sample(BallState state, double normalForce, Vector3D frictionForce, Vector3D contactPoint,
                     Vector3D contactOnBall, boolean event, List<String> contacts) {
    /** Copies the list. */
    public Sample {
        contacts = contacts == null ? List.of() : List.copyOf(contacts);
    }

    /**
     * A sample without patch ids (touching no named patch).
     *
     * @param state the state
     * @param normalForce normal force F_n (N)
     * @param frictionForce tangential contact force on the ball (N)
     * @param contactPoint contact point (m), or null in flight
     * @param contactOnBall contact point in the body frame (m), or null in flight
     * @param event whether this sample is an event instant
     */
    public Sample(BallState state, double normalForce, Vector3D frictionForce, Vector3D contactPoint,
                  Vector3D contactOnBall, boolean event) {
        this(state, normalForce, frictionForce, contactPoint, contactOnBall, event, List.of());
    }

    /** @return time (s) */
    public double time() {
        return state.time();
    }
}
