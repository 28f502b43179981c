package org.trundle.core;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * One logged event of a run: its time (s), kind, the state at the instant (before any jump), the
 * state right after it (after an impact impulse or a phase change), the phase entered, the patch
 * edge crossed (exits only), the impulse the wall gave the ball (impacts and sticking, N·s), the
 * patch it happened on and, for a hand-over, the patch left and the patch entered.
 *
 * <p>Immutable.
 */
public final class RunEvent {
    private final EventKind kind;
    private final BallState before;
    private final BallState after;
    private final String edge;
    private final Vector3D impulse;
    private final String patch;
    private final String from;
    private final String to;

    /**
     * An event on no named patch (a one-patch run built before scenes existed).
     *
     * @param kind event kind
     * @param before state at the instant, before any jump
     * @param after state right after the event
     * @param edge name of the edge crossed, or null
     * @param impulse impulse on the ball (N·s), zero when none
     */
    public RunEvent(EventKind kind, BallState before, BallState after, String edge, Vector3D impulse) {
        this(kind, before, after, edge, impulse, null, null, null);
    }

    /**
     * @param kind event kind
     * @param before state at the instant, before any jump
     * @param after state right after the event
     * @param edge name of the edge crossed, or null
     * @param impulse impulse on the ball (N·s), zero when none
     * @param patch id of the patch the event happened on (for a hand-over: the patch entered), or null
     * @param from hand-over only: id of the patch left, else null
     * @param to hand-over only: id of the patch entered, else null
     */
    public RunEvent(EventKind kind, BallState before, BallState after, String edge, Vector3D impulse, String patch,
                    String from, String to) {
        this.patch = patch;
        this.from = from;
        this.to = to;
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

    /** @return id of the patch the event happened on (hand-over: the patch entered), or null */
    public String patch() {
        return patch;
    }

    /** @return hand-over: id of the patch left; otherwise null */
    public String from() {
        return from;
    }

    /** @return hand-over: id of the patch entered; otherwise null */
    public String to() {
        return to;
    }

    /** @return impulse given to the ball by the wall (N·s); zero vector when none */
    public Vector3D impulse() {
        return impulse;
    }

    @Override
    public String toString() {
        return kind.label() + " at t=" + before.time() + " s -> " + after.phase().label()
            + (patch != null ? " on " + patch : "") + (edge != null ? " (edge " + edge + ")" : "")
            + (from != null ? " from " + from + " to " + to : "");
    }
}
