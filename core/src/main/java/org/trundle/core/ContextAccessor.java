package org.trundle.core;

import org.trundle.core.engine.ContextAccess;

/** The engine's access to the package-private side of {@link ContactContext}. */
final class ContextAccessor implements ContextAccess {
    static final ContextAccessor INSTANCE = new ContextAccessor();

    private ContextAccessor() {
    }

    @Override
    public void set(ContactContext c, Ball b, ContactGeometry g, double fn, Phase p, double[] slip, double[] relSpin,
                    boolean impulse) {
        c.set(b, g, fn, p, slip, relSpin, impulse);
    }

    @Override
    public void setRolling(ContactContext c, double fn, double wx, double wy, double wz, boolean clearCouples) {
        c.setRolling(fn, wx, wy, wz, clearCouples);
    }

    @Override
    public double[] torque(ContactContext c) {
        return c.torque;
    }

    @Override
    public double[] lossRate(ContactContext c) {
        return c.lossRate;
    }

    @Override
    public void setSpins(ContactContext c, double smoothingSpin, double stickSpin) {
        c.setSmoothingSpin(smoothingSpin);
        c.setStickSpin(stickSpin);
    }
}
