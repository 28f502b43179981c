package org.trundle.core.engine;

import org.trundle.core.Ball;
import org.trundle.core.ContactContext;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Phase;

/**
 * The solver's write access to a {@link ContactContext}, whose mutators are not part of the public
 * API: the core package implements it and hands it to the engine through {@link Model}. Internal.
 */
public interface ContextAccess {
    /**
     * Sets every value a law reads and clears the couples.
     *
     * @param c the context
     * @param b ball
     * @param g geometry workspace
     * @param fn normal force (N) or impulse (N·s)
     * @param p phase evaluated
     * @param slip slip velocity (m/s)
     * @param relSpin spin relative to the surface (rad/s)
     * @param impulse whether impulse bounds are asked
     */
    void set(ContactContext c, Ball b, ContactGeometry g, double fn, Phase p, double[] slip, double[] relSpin,
             boolean impulse);

    /**
     * The rolling hot path: zero slip, the given relative spin, couples cleared when asked.
     *
     * @param c the context
     * @param fn normal force (N)
     * @param wx relative spin x (rad/s)
     * @param wy relative spin y (rad/s)
     * @param wz relative spin z (rad/s)
     * @param clearCouples whether to clear the couples and loss rates
     */
    void setRolling(ContactContext c, double fn, double wx, double wy, double wz, boolean clearCouples);

    /**
     * @param c the context
     * @return the summed couple (N·m), the context's own array (read only)
     */
    double[] torque(ContactContext c);

    /**
     * @param c the context
     * @return loss rates (W) by loss kind, the context's own array (read only)
     */
    double[] lossRate(ContactContext c);

    /**
     * @param c the context
     * @param smoothingSpin smoothing spin of set-valued couples (rad/s)
     * @param stickSpin stick threshold as a spin (rad/s)
     */
    void setSpins(ContactContext c, double smoothingSpin, double stickSpin);
}
