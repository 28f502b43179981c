package org.trundle.core.engine;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.trundle.core.StateView;

/**
 * The {@link StateView} an applied load reads: it reads the evaluation's own workspaces (centre,
 * velocity, quaternion, spin) without copying, so a call costs one time store. Internal; one per
 * {@link Dynamics}.
 */
final class LoadView implements StateView {
    private final double[] c;
    private final double[] v;
    private final double[] q;
    private final double[] w;
    private double t;

    LoadView(double[] c, double[] v, double[] q, double[] w) {
        this.c = c;
        this.v = v;
        this.q = q;
        this.w = w;
    }

    /** @param time the evaluation's time (s) */
    void at(double time) {
        this.t = time;
    }

    @Override
    public double time() {
        return t;
    }

    @Override
    public double centre(int axis) {
        return c[axis];
    }

    @Override
    public double velocity(int axis) {
        return v[axis];
    }

    @Override
    public double spin(int axis) {
        return w[axis];
    }

    @Override
    public Rotation orientation() {
        // the integrated components as they are (unit to within the projection threshold), as loads saw them before
        return StateMapper.rotation(q, 0, false);
    }

    @Override
    public String toString() {
        return "state at t = " + t + " s";
    }
}
