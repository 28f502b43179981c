package org.trundle.core.engine;

import org.trundle.core.Wrench;

/** The {@link Wrench} an applied load sets: it writes the evaluation's force and torque workspaces. Internal. */
final class LoadWrench implements Wrench {
    private final double[] f;
    private final double[] tau;

    LoadWrench(double[] f, double[] tau) {
        this.f = f;
        this.tau = tau;
    }

    @Override
    public void force(double fx, double fy, double fz) {
        f[0] = fx;
        f[1] = fy;
        f[2] = fz;
    }

    @Override
    public void torque(double tx, double ty, double tz) {
        tau[0] = tx;
        tau[1] = ty;
        tau[2] = tz;
    }
}
