package org.trundle.core;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/** Rotation at a constant rate about a fixed axis; see {@link SurfaceMotion#rotation}. */
final class RotatingMotion implements SurfaceMotion {
    private final double[] a;
    private final double[] o;
    private final double rate;
    private final String name;

    RotatingMotion(Vector3D axis, Vector3D origin, double rate) {
        this.a = axis.toArray();
        this.o = origin.toArray();
        this.rate = rate;
        this.name = "rotation(axis=" + axis + ", origin=" + origin + ", rate=" + rate + " rad/s)";
    }

    @Override
    public void at(double t, MotionState out) {
        double th = rate * t;
        double c = Math.cos(th);
        double s = Math.sin(th);
        double v = 1 - c;
        double x = a[0];
        double y = a[1];
        double z = a[2];
        double[] m = out.rotation;
        // Rodrigues' formula R = c I + s [a]x + (1 - c) a aᵀ (common practice)
        m[0] = c + v * x * x;
        m[1] = v * x * y - s * z;
        m[2] = v * x * z + s * y;
        m[3] = v * x * y + s * z;
        m[4] = c + v * y * y;
        m[5] = v * y * z - s * x;
        m[6] = v * x * z - s * y;
        m[7] = v * y * z + s * x;
        m[8] = c + v * z * z;
        // x = R (x0 - o) + o, so D = o - R o; the patch is still: D' = -Omega x (R o) = -Omega x (o - D)
        double rox = m[0] * o[0] + m[1] * o[1] + m[2] * o[2];
        double roy = m[3] * o[0] + m[4] * o[1] + m[5] * o[2];
        double roz = m[6] * o[0] + m[7] * o[1] + m[8] * o[2];
        out.offset[0] = o[0] - rox;
        out.offset[1] = o[1] - roy;
        out.offset[2] = o[2] - roz;
        out.spin[0] = rate * x;
        out.spin[1] = rate * y;
        out.spin[2] = rate * z;
        out.spinRate[0] = 0;
        out.spinRate[1] = 0;
        out.spinRate[2] = 0;
        // u(x) = Omega x (x - D) + D' must vanish on the axis: D' = -Omega x (o - D)
        double wx = out.spin[0];
        double wy = out.spin[1];
        double wz = out.spin[2];
        double px = o[0] - out.offset[0];
        double py = o[1] - out.offset[1];
        double pz = o[2] - out.offset[2];
        double dx = -(wy * pz - wz * py);
        double dy = -(wz * px - wx * pz);
        double dz = -(wx * py - wy * px);
        out.velocity[0] = dx;
        out.velocity[1] = dy;
        out.velocity[2] = dz;
        // D'' = d/dt(-Omega x (o - D)) = Omega x D'
        out.acceleration[0] = wy * dz - wz * dy;
        out.acceleration[1] = wz * dx - wx * dz;
        out.acceleration[2] = wx * dy - wy * dx;
    }

    @Override
    public String name() {
        return name;
    }
}
