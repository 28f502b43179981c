package org.trundle.core;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * One logged event of a run: its time (s), kind, the state at the instant (before any jump), the
 * state right after it (after an impact impulse or a phase change), the phase entered, the patch
 * edge crossed (exits only) and the impulse the wall gave the ball (impacts and sticking, N·s).
 *
 * <p>Immutable.
 */
public final class RunEvent {
    private final EventKind kind;
    private final BallState before;
    private final BallState after;
    private final String edge;
    private final Vector3D impulse;

    /**
     * @param kind event kind
     * @param before state at the instant, before any jump
     * @param after state right after the event
     * @param edge name of the edge crossed, or null
     * @param impulse impulse on the ball (N·s), zero when none
     */
    public RunEvent(EventKind kind, BallState before, BallState after, String edge, Vector3D impulse) {
        this.kind = kind;
        this.before = before;
        this.after = after;
        this.edge = edge;
        this.impulse = impulse == null ? Vector3D.ZERO : impulse;
    }

    /** @return event time (s) */
    public double time() {
        return before.time();
    }

    /** @return the kind */
    public EventKind kind() {
        return kind;
    }

    /** @return state at the instant, in the phase left */
    public BallState before() {
        return before;
    }

    /** @return state right after the event, in the phase entered */
    public BallState after() {
        return after;
    }

    /** @return the phase entered */
    public Phase phaseAfter() {
        return after.phase();
    }

    /** @return name of the patch edge crossed (exits), or null */
    public String edge() {
        return edge;
    }

    /** @return impulse given to the ball by the wall (N·s); zero vector when none */
    public Vector3D impulse() {
        return impulse;
    }

    @Override
    public String toString() {
        return kind.label() + " at t=" + before.time() + " s -> " + after.phase().label()
            + (edge != null ? " (edge " + edge + ")" : "");
    }
}
