package org.trundle.core;

/**
 * Output workspace of {@link SurfaceMotion#at}: the pose of a moving patch at one instant and its
 * rates (world frame, SI). A point {@code x₀} of the rest pose is at {@code x = R x₀ + D}.
 * <ul>
 *   <li>{@link #rotation} — {@code R}, row-major 3×3, proper orthogonal;</li>
 *   <li>{@link #offset} — {@code D} (m);</li>
 *   <li>{@link #spin} — the patch's angular velocity {@code Ω} (rad/s), {@code Ṙ = [Ω]× R};</li>
 *   <li>{@link #spinRate} — {@code Ω̇} (rad/s²);</li>
 *   <li>{@link #velocity} — {@code Ḋ} (m/s);</li>
 *   <li>{@link #acceleration} — {@code D̈} (m/s²).</li>
 * </ul>
 * The patch's velocity at a point x is {@code u = Ω × (x − D) + Ḋ}. A mutable workspace owned by one
 * run.
 */
public final class MotionState {
    /** Rotation R, row-major. */
    public final double[] rotation = new double[9];
    /** Offset D (m). */
    public final double[] offset = new double[3];
    /** Spin Ω (rad/s). */
    public final double[] spin = new double[3];
    /** Spin rate Ω̇ (rad/s²). */
    public final double[] spinRate = new double[3];
    /** Offset velocity Ḋ (m/s). */
    public final double[] velocity = new double[3];
    /** Offset acceleration D̈ (m/s²). */
    public final double[] acceleration = new double[3];

    private final double[] local = new double[3];
    private final double[] rh = new double[9];

    /** Creates a workspace at the rest pose. */
    public MotionState() {
        setIdentity();
    }

    /** Sets the rest pose with zero rates. */
    public void setIdentity() {
        java.util.Arrays.fill(rotation, 0.0);
        rotation[0] = 1;
        rotation[4] = 1;
        rotation[8] = 1;
        for (int i = 0; i < 3; i++) {
            offset[i] = 0;
            spin[i] = 0;
            spinRate[i] = 0;
            velocity[i] = 0;
            acceleration[i] = 0;
        }
    }

    /**
     * The patch's velocity at a point, {@code u = Ω × (x − D) + Ḋ} (m/s).
     *
     * @param x the point (m)
     * @param out output, length 3
     */
    public void velocityAt(double[] x, double[] out) {
        double px = x[0] - offset[0];
        double py = x[1] - offset[1];
        double pz = x[2] - offset[2];
        out[0] = spin[1] * pz - spin[2] * py + velocity[0];
        out[1] = spin[2] * px - spin[0] * pz + velocity[1];
        out[2] = spin[0] * py - spin[1] * px + velocity[2];
    }

    /**
     * Queries a surface given at its rest pose as placed at this pose: the query point is taken to
     * the rest pose, {@code x₀ = Rᵀ(x − D)}, and the closest point, normal and Hessian are brought
     * back ({@code p = R p₀ + D}, {@code n = R n₀}, {@code H = R H₀ Rᵀ}); distance, curvatures and
     * margin do not change under a rigid motion.
     *
     * @param surface the surface at its rest pose
     * @param t time (s), passed on to the surface
     * @param x query point (m), not modified
     * @param out workspace to fill
     */
    public void query(Surface surface, double t, double[] x, ContactGeometry out) {
        double[] m = rotation;
        double px = x[0] - offset[0];
        double py = x[1] - offset[1];
        double pz = x[2] - offset[2];
        local[0] = m[0] * px + m[3] * py + m[6] * pz;
        local[1] = m[1] * px + m[4] * py + m[7] * pz;
        local[2] = m[2] * px + m[5] * py + m[8] * pz;
        surface.query(t, local, out);
        rotate(out.point);
        out.point[0] += offset[0];
        out.point[1] += offset[1];
        out.point[2] += offset[2];
        rotate(out.normal);
        double[] h = out.hessian;
        // rh = R H
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                rh[3 * i + j] = m[3 * i] * h[j] + m[3 * i + 1] * h[3 + j] + m[3 * i + 2] * h[6 + j];
            }
        }
        // H = rh Rᵀ
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                h[3 * i + j] = rh[3 * i] * m[3 * j] + rh[3 * i + 1] * m[3 * j + 1] + rh[3 * i + 2] * m[3 * j + 2];
            }
        }
    }

    private void rotate(double[] v) {
        double[] m = rotation;
        double x = m[0] * v[0] + m[1] * v[1] + m[2] * v[2];
        double y = m[3] * v[0] + m[4] * v[1] + m[5] * v[2];
        double z = m[6] * v[0] + m[7] * v[1] + m[8] * v[2];
        v[0] = x;
        v[1] = y;
        v[2] = z;
    }
}
