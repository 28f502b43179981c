package org.trundle.core.check;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.MotionState;
import org.trundle.core.SurfaceMotion;

/**
 * A patch's motion seen from a frame moving at the constant velocity {@code w} ({@code x' = x − w t}):
 * a patch at {@code x = R(t) x₀ + D(t)} is at {@code x' = R(t) x₀ + D(t) − w t}, so the offset becomes
 * {@code D − w t} and its velocity {@code Ḋ − w}; rotation, spin, spin rate and acceleration are unchanged
 * (a Galilean boost; common practice). A still patch becomes a translation at {@code −w}. Kit-internal,
 * used by the Galilean checks; allocation-free.
 */
final class BoostedMotion implements SurfaceMotion {
    private final SurfaceMotion base;
    private final double wx;
    private final double wy;
    private final double wz;

    BoostedMotion(SurfaceMotion base, Vector3D boost) {
        this.base = base;
        this.wx = boost.getX();
        this.wy = boost.getY();
        this.wz = boost.getZ();
    }

    @Override
    public void at(double t, MotionState out) {
        base.at(t, out);
        out.offset[0] -= wx * t;
        out.offset[1] -= wy * t;
        out.offset[2] -= wz * t;
        out.velocity[0] -= wx;
        out.velocity[1] -= wy;
        out.velocity[2] -= wz;
    }

    @Override
    public String name() {
        return base.name() + " seen from a frame moving at (" + wx + ", " + wy + ", " + wz + ") m/s";
    }
}
