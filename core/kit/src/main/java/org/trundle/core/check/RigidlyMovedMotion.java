package org.trundle.core.check;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.MotionState;
import org.trundle.core.SurfaceMotion;

/**
 * The motion of a {@link RigidlyMovedSurface}: a patch at rest pose {@code S} moving by
 * {@code x = R_m(t) x₀ + D(t)}, seen after the fixed rigid map {@code x ↦ R x + b} of the whole
 * scene, moves its rest pose {@code R S + b} by {@code R' = R R_m Rᵀ},
 * {@code D' = R D + b − R' b}; its spin is {@code R Ω}, and the rates of {@code D'} follow by
 * differentiation ({@code Ḋ' = R Ḋ − Ω' × R' b},
 * {@code D̈' = R D̈ − Ω̇' × R' b − Ω' × (Ω' × R' b)}). Kit-internal, used by the frame-invariance check.
 */
final class RigidlyMovedMotion implements SurfaceMotion {
    private final SurfaceMotion base;
    private final double[] m = new double[9];
    private final double[] b;
    private final ThreadLocal<MotionState> inner = ThreadLocal.withInitial(MotionState::new);

    RigidlyMovedMotion(SurfaceMotion base, Rotation rotation, Vector3D translation) {
        this.base = base;
        double[][] a = rotation.getMatrix();
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                m[3 * i + j] = a[i][j];
            }
        }
        this.b = translation.toArray();
    }

    private void rotate(double[] v, double[] out) {
        double x = m[0] * v[0] + m[1] * v[1] + m[2] * v[2];
        double y = m[3] * v[0] + m[4] * v[1] + m[5] * v[2];
        double z = m[6] * v[0] + m[7] * v[1] + m[8] * v[2];
        out[0] = x;
        out[1] = y;
        out[2] = z;
    }

    private static void cross(double[] a, double[] c, double[] out) {
        double x = a[1] * c[2] - a[2] * c[1];
        double y = a[2] * c[0] - a[0] * c[2];
        double z = a[0] * c[1] - a[1] * c[0];
        out[0] = x;
        out[1] = y;
        out[2] = z;
    }

    @Override
    public void at(double t, MotionState out) {
        MotionState s = inner.get();
        base.at(t, s);
        // R' = R Rm Rᵀ
        double[] rm = s.rotation;
        double[] tmp = new double[9];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                double sum = 0;
                for (int l = 0; l < 3; l++) {
                    sum += m[3 * i + l] * rm[3 * l + j];
                }
                tmp[3 * i + j] = sum;
            }
        }
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                double sum = 0;
                for (int l = 0; l < 3; l++) {
                    sum += tmp[3 * i + l] * m[3 * j + l];
                }
                out.rotation[3 * i + j] = sum;
            }
        }
        double[] rb = new double[3];
        double[] o = out.rotation;
        rb[0] = o[0] * b[0] + o[1] * b[1] + o[2] * b[2];
        rb[1] = o[3] * b[0] + o[4] * b[1] + o[5] * b[2];
        rb[2] = o[6] * b[0] + o[7] * b[1] + o[8] * b[2];
        rotate(s.offset, out.offset);
        rotate(s.spin, out.spin);
        rotate(s.spinRate, out.spinRate);
        rotate(s.velocity, out.velocity);
        rotate(s.acceleration, out.acceleration);
        double[] w = new double[3];
        double[] ww = new double[3];
        cross(out.spin, rb, w);
        cross(out.spin, w, ww);
        double[] aw = new double[3];
        cross(out.spinRate, rb, aw);
        for (int i = 0; i < 3; i++) {
            out.offset[i] += b[i] - rb[i];
            out.velocity[i] -= w[i];
            out.acceleration[i] -= aw[i] + ww[i];
        }
    }

    @Override
    public String name() {
        return base.name() + " (moved)";
    }
}
