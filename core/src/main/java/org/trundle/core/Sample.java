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
 * <p>{@code touches} lists every contact of the sample, one {@link SampleContact} per touched patch (patch id,
 * mode, normal and friction force, contact point, normal), in the order of {@code contacts}. With one contact
 * it repeats the single-contact fields; with several at once (a ball in a V-groove or on two rails, issue 12)
 * the single-contact fields {@code normalForce}, {@code frictionForce}, {@code contactPoint} and
 * {@code contactOnBall} describe the first contact of the list (the one touched first), and {@code touches}
 * holds them all.
 *
 * @param state the state
 * @param normalForce normal force F_n (N)
 * @param frictionForce tangential contact force on the ball (N)
 * @param contactPoint contact point p = c − r n (m), or null in flight
 * @param contactOnBall contact point in the body frame relative to the centre (m), or null in flight
 * @param event whether this sample is an event instant
 * @param contacts ids of the patches touched ({@link Patch#id()}), empty in flight
 * @param touches every contact of the sample, in the order of {@code contacts}, empty in flight
 */
public record Sample(BallState state, double normalForce, Vector3D frictionForce, Vector3D contactPoint,
                     Vector3D contactOnBall, boolean event, List<String> contacts, List<SampleContact> touches) {
    /** Copies the lists. */
    public Sample {
        contacts = contacts == null ? List.of() : List.copyOf(contacts);
        touches = touches == null ? List.of() : List.copyOf(touches);
    }

    /**
     * A sample of at most one contact: {@code touches} is built from the single-contact fields (one entry
     * for the one patch id when the contact point is given, else empty; its mode is the state's phase).
     *
     * @param state the state
     * @param normalForce normal force F_n (N)
     * @param frictionForce tangential contact force on the ball (N)
     * @param contactPoint contact point p = c − r n (m), or null in flight
     * @param contactOnBall contact point in the body frame relative to the centre (m), or null in flight
     * @param event whether this sample is an event instant
     * @param contacts ids of the patches touched, empty in flight
     */
    public Sample(BallState state, double normalForce, Vector3D frictionForce, Vector3D contactPoint,
                  Vector3D contactOnBall, boolean event, List<String> contacts) {
        this(state, normalForce, frictionForce, contactPoint, contactOnBall, event, contacts,
            single(state, normalForce, frictionForce, contactPoint, contacts));
    }

    private static List<SampleContact> single(BallState state, double normalForce, Vector3D frictionForce,
                                              Vector3D contactPoint, List<String> contacts) {
        if (contactPoint == null || contacts == null || contacts.size() != 1 || state == null) {
            return List.of();
        }
        Vector3D toCentre = state.centre().subtract(contactPoint);
        double len = toCentre.getNorm();
        Vector3D n = len > 0 ? toCentre.scalarMultiply(1 / len) : Vector3D.ZERO;
        return List.of(new SampleContact(contacts.get(0), state.phase(), normalForce,
            frictionForce == null ? Vector3D.ZERO : frictionForce, contactPoint, n));
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
