package org.trundle.core.engine;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.BallState;
import org.trundle.core.LossKind;
import org.trundle.core.Phase;

/**
 * The one mapping between the domain state {@link BallState} and the solver's arrays, and the
 * per-phase integrated layouts.
 *
 * <p>Full layout ({@link #DIM} = 21): centre c (m) [0,3), velocity v (m/s) [3,6), quaternion q
 * [6,10), spin ω (rad/s) [10,13), dissipated work by {@link LossKind} (J) [13,17), applied-load work
 * (J) [17], centre path length (m) [18], work of a compliant contact's damping (J) [19] (booked as
 * {@link LossKind#CONTACT_DAMPING}), work done on the ball by moving patches (J) [20].
 *
 * <p>Quaternion convention: the array holds the Hamilton quaternion, scalar first, body to world
 * ({@code x_world = q x_body q*}, {@code q̇ = ½ (0, ω) ⊗ q}); Hipparchus' {@link Rotation} stores the
 * conjugate of these components. This class is the only place that conjugates.
 *
 * <p>Internal to the solver.
 */
public final class StateMapper {
    /** Index of the centre. */
    public static final int C = 0;
    /** Index of the velocity. */
    public static final int V = 3;
    /** Index of the quaternion. */
    public static final int Q = 6;
    /** Index of the spin. */
    public static final int W = 10;
    /** Index of the dissipated work by loss kind. */
    public static final int LOSS = 13;
    /** Index of the applied-load work. */
    public static final int APPLIED = 17;
    /** Index of the centre path length. */
    public static final int PATH = 18;
    /** Index of the compliant contact's damping work ({@link LossKind#CONTACT_DAMPING}). */
    public static final int DAMPING = 19;
    /** Index of the drive work of moving patches. */
    public static final int DRIVE = 20;
    /** Length of the full layout. */
    public static final int DIM = 21;

    private static final int[] IDENTITY = java.util.stream.IntStream.range(0, DIM).toArray();

    private StateMapper() {
    }

    /**
     * Packs a ball state into a new full-layout array (work components zero).
     *
     * @param s the state
     * @return a new array
     */
    public static double[] toArray(BallState s) {
        double[] y = new double[DIM];
        put(y, C, s.centre());
        put(y, V, s.velocity());
        Rotation q = s.orientation();
        y[Q] = q.getQ0();
        y[Q + 1] = -q.getQ1();
        y[Q + 2] = -q.getQ2();
        y[Q + 3] = -q.getQ3();
        put(y, W, s.spin());
        return y;
    }

    /**
     * The domain state of a full-layout array with a given centre velocity (while rolling the
     * velocity slot is not integrated, so the caller passes the derived one).
     *
     * @param t time (s)
     * @param y full-layout state
     * @param phase phase
     * @param vx velocity x (m/s)
     * @param vy velocity y (m/s)
     * @param vz velocity z (m/s)
     * @return the state
     */
    static BallState toState(double t, double[] y, Phase phase, double vx, double vy, double vz) {
        Rotation q = rotation(y, Q, true);
        return BallState.of(t, new Vector3D(y[C], y[C + 1], y[C + 2]), new Vector3D(vx, vy, vz), q,
            new Vector3D(y[W], y[W + 1], y[W + 2]), phase);
    }

    /**
     * The body-to-world rotation of a quaternion held in this class's convention.
     *
     * @param a the array
     * @param at index of the quaternion's scalar part
     * @param normalise whether to divide by the norm (else the components are taken as they are)
     * @return Hipparchus' rotation (the conjugate components)
     */
    static Rotation rotation(double[] a, int at, boolean normalise) {
        return new Rotation(a[at], -a[at + 1], -a[at + 2], -a[at + 3], normalise);
    }

    /**
     * The domain state of a full-layout array, its velocity read from the array.
     *
     * @param t time (s)
     * @param y full-layout state
     * @param phase phase
     * @return the state
     */
    public static BallState toBallState(double t, double[] y, Phase phase) {
        return toState(t, y, phase, y[V], y[V + 1], y[V + 2]);
    }

    private static void put(double[] a, int at, Vector3D v) {
        a[at] = v.getX();
        a[at + 1] = v.getY();
        a[at + 2] = v.getZ();
    }

    /**
     * The components integrated in a phase (full indices, in compact order): centre, velocity
     * (not while rolling), quaternion, spin, then the sliding loss (sliding), the couple losses
     * (contact phases, when the law has couples), the applied work (when there is a load), the
     * path length and the drive work (contact phases on a moving patch).
     *
     * @param phase the phase
     * @param couples whether the law adds couples
     * @param loaded whether there is an applied load
     * @param moving whether the patch moves
     * @return the layout (the shared identity array when it is the full layout)
     */
    static int[] layout(Phase phase, boolean couples, boolean loaded, boolean moving) {
        int[] out = new int[DIM];
        int n = 0;
        for (int i = C; i < LOSS; i++) {
            if (phase != Phase.ROLLING || i < V || i >= Q) {
                out[n++] = i;
            }
        }
        if (phase == Phase.SLIDING) {
            out[n++] = LOSS + LossKind.SLIDING_FRICTION.ordinal();
        }
        if (phase.inContact() && couples) {
            out[n++] = LOSS + LossKind.ROLLING_RESISTANCE.ordinal();
            out[n++] = LOSS + LossKind.PIVOTING_RESISTANCE.ordinal();
            out[n++] = LOSS + LossKind.OTHER.ordinal();
        }
        if (loaded) {
            out[n++] = APPLIED;
        }
        out[n++] = PATH;
        if (moving && phase.inContact()) {
            out[n++] = DRIVE;
        }
        return n == DIM ? IDENTITY : java.util.Arrays.copyOf(out, n);
    }

    /**
     * @param i a full-layout index
     * @return the component's name for messages ("velocity y", "loss rolling resistance", …)
     */
    static String componentName(int i) {
        String[] axis = {"x", "y", "z"};
        if (i < V) {
            return "centre " + axis[i - C];
        } else if (i < Q) {
            return "velocity " + axis[i - V];
        } else if (i < W) {
            return "quaternion q" + (i - Q);
        } else if (i < LOSS) {
            return "spin " + axis[i - W];
        } else if (i < APPLIED) {
            return "loss " + LossKind.values()[i - LOSS].name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ');
        }
        switch (i) {
            case APPLIED:
                return "applied work";
            case PATH:
                return "path length";
            case DAMPING:
                return "contact damping work";
            default:
                return "drive work";
        }
    }

    /** @return the full layout (identity map) */
    static int[] identity() {
        return IDENTITY;
    }

    /**
     * The quaternion norm of a full-layout state.
     *
     * @param y state
     * @return |q|
     */
    static double quaternionNorm(double[] y) {
        return Math.sqrt(y[Q] * y[Q] + y[Q + 1] * y[Q + 1] + y[Q + 2] * y[Q + 2] + y[Q + 3] * y[Q + 3]);
    }
}
