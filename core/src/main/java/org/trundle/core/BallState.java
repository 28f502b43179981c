package org.trundle.core;

import org.trundle.core.internal.Checks;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * Immutable kinematic state of the ball: time {@code t} (s), centre {@code c} (m), centre
 * velocity {@code v} (m/s), orientation {@code q} (a unit quaternion mapping body-frame vectors
 * to the world frame, {@link org.hipparchus.geometry.euclidean.threed.RotationConvention#VECTOR_OPERATOR}),
 * angular velocity {@code ω} (rad/s, world frame) and the active {@link Phase}.
 *
 * <p>Copies with one field changed are made by the {@code withX} methods.
 */
public final class BallState {
    private final double time;
    private final Vector3D centre;
    private final Vector3D velocity;
    private final Rotation orientation;
    private final Vector3D spin;
    private final Phase phase;

    private BallState(double time, Vector3D centre, Vector3D velocity, Rotation orientation,
                      Vector3D spin, Phase phase) {
        this.time = Checks.finite("time", time);
        this.centre = Checks.finite("centre", centre);
        this.velocity = Checks.finite("velocity", velocity);
        if (orientation == null) {
            throw new IllegalArgumentException("orientation must be given, got null");
        }
        this.orientation = orientation;
        this.spin = Checks.finite("spin", spin);
        if (phase == null) {
            throw new IllegalArgumentException("phase must be given, got null");
        }
        this.phase = phase;
    }

    /**
     * @param time time t (s)
     * @param centre centre c (m)
     * @param velocity centre velocity v (m/s)
     * @param orientation body-to-world rotation
     * @param spin angular velocity ω (rad/s, world frame)
     * @param phase phase the state is in (for a start: the phase asked for)
     * @return the state
     */
    public static BallState of(double time, Vector3D centre, Vector3D velocity, Rotation orientation,
                               Vector3D spin, Phase phase) {
        return new BallState(time, centre, velocity, orientation, spin, phase);
    }

    /**
     * A state in flight at {@code t = 0} with identity orientation.
     *
     * @param centre centre (m)
     * @param velocity velocity (m/s)
     * @param spin angular velocity (rad/s)
     * @return the state
     */
    public static BallState flying(Vector3D centre, Vector3D velocity, Vector3D spin) {
        return new BallState(0, centre, velocity, Rotation.IDENTITY, spin, Phase.FLIGHT);
    }

    /** @return time t (s) */
    public double time() {
        return time;
    }

    /** @return centre c (m) */
    public Vector3D centre() {
        return centre;
    }

    /** @return centre velocity v (m/s) */
    public Vector3D velocity() {
        return velocity;
    }

    /** @return body-to-world orientation */
    public Rotation orientation() {
        return orientation;
    }

    /** @return angular velocity ω (rad/s, world frame) */
    public Vector3D spin() {
        return spin;
    }

    /** @return the phase */
    public Phase phase() {
        return phase;
    }

    /**
     * @param t new time (s)
     * @return a copy at time t
     */
    public BallState withTime(double t) {
        return new BallState(t, centre, velocity, orientation, spin, phase);
    }

    /**
     * @param c new centre (m)
     * @return a copy with centre c
     */
    public BallState withCentre(Vector3D c) {
        return new BallState(time, c, velocity, orientation, spin, phase);
    }

    /**
     * @param v new velocity (m/s)
     * @return a copy with velocity v
     */
    public BallState withVelocity(Vector3D v) {
        return new BallState(time, centre, v, orientation, spin, phase);
    }

    /**
     * @param q new orientation
     * @return a copy with orientation q
     */
    public BallState withOrientation(Rotation q) {
        return new BallState(time, centre, velocity, q, spin, phase);
    }

    /**
     * @param w new angular velocity (rad/s)
     * @return a copy with spin w
     */
    public BallState withSpin(Vector3D w) {
        return new BallState(time, centre, velocity, orientation, w, phase);
    }

    /**
     * @param p new phase
     * @return a copy in phase p
     */
    public BallState withPhase(Phase p) {
        return new BallState(time, centre, velocity, orientation, spin, p);
    }

    /**
     * Kinetic energy {@code ½ m |v|² + ½ k m r² |ω|²} (J).
     *
     * @param ball the ball
     * @return kinetic energy (J)
     */
    public double kineticEnergy(Ball ball) {
        return 0.5 * ball.mass() * velocity.getNormSq() + 0.5 * ball.momentOfInertia() * spin.getNormSq();
    }

    @Override
    public String toString() {
        return String.format(java.util.Locale.ROOT, "t=%.9g s %s c=%s v=%s w=%s", time, phase.label(),
            centre, velocity, spin);
    }
}
