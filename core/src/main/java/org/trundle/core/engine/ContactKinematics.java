package org.trundle.core.engine;

import org.trundle.core.MotionState;

/**
 * The kinematics of a contact in one place (design notes §3, §4): the no-slip velocity of the
 * centre {@code v = r ω × n}, the tangential slip of the contact point {@code s = P(v − r ω × n)}
 * ({@code P = 1 − n nᵀ}), and the removal of the normal part of a velocity. Written on scalars and
 * caller-owned arrays, allocation-free, so the hot path and the switches share the same arithmetic.
 *
 * <p>On a moving patch (design notes §9) everything is relative to the patch: with its velocity field
 * {@code u} and spin {@code Ω}, the slip is {@code s = P(v − r ω × n − u(p)) = P((v − u(c)) − r (ω − Ω) × n)},
 * the rolling velocity {@code v = u(c) + r (ω − Ω) × n}, the normal speed {@code n·(v − u(c))}. The
 * helpers that take a slot allocate a little; they serve the switches, never the right-hand side.
 */
final class ContactKinematics {
    private ContactKinematics() {
    }

    /**
     * The velocity and spin of a state relative to a moving patch at time {@code t}:
     * {@code v − u(c)} and {@code ω − Ω} (a still patch gives the state's own).
     *
     * @param slot the patch
     * @param t time (s)
     * @param y full-layout state (velocity slot filled)
     * @param vRel output relative centre velocity (m/s)
     * @param wRel output relative spin (rad/s)
     */
    static void relative(ContactSlot slot, double t, double[] y, double[] vRel, double[] wRel) {
        for (int i = 0; i < 3; i++) {
            vRel[i] = y[StateMapper.V + i];
            wRel[i] = y[StateMapper.W + i];
        }
        if (!slot.moving) {
            return;
        }
        MotionState pose = slot.poseAt(t);
        double[] u = new double[3];
        double[] c = {y[StateMapper.C], y[StateMapper.C + 1], y[StateMapper.C + 2]};
        pose.velocityAt(c, u);
        for (int i = 0; i < 3; i++) {
            vRel[i] -= u[i];
            wRel[i] -= pose.spin[i];
        }
    }

    /**
     * The patch velocity at the contact point {@code p = c − r n}: {@code u(p) = u(c) − r Ω × n}
     * (zero for a still patch).
     *
     * @param slot the patch
     * @param t time (s)
     * @param c centre (m)
     * @param r radius (m)
     * @param n unit normal
     * @return u(p) (m/s), a new array
     */
    static double[] patchVelocityAtContact(ContactSlot slot, double t, double[] c, double r, double[] n) {
        double[] u = new double[3];
        if (!slot.moving) {
            return u;
        }
        MotionState pose = slot.poseAt(t);
        pose.velocityAt(c, u);
        double[] om = pose.spin;
        u[0] -= r * (om[1] * n[2] - om[2] * n[1]);
        u[1] -= r * (om[2] * n[0] - om[0] * n[2]);
        u[2] -= r * (om[0] * n[1] - om[1] * n[0]);
        return u;
    }

    /**
     * Writes the no-slip centre velocity on a possibly moving patch into {@code y[V..V+2]}:
     * {@code v = u(c) + r (ω − Ω) × n}, which is {@code r ω × n} on a still patch.
     *
     * @param slot the patch
     * @param t time (s)
     * @param r radius (m)
     * @param n unit normal
     * @param y full-layout state (centre and spin read, velocity written)
     */
    static void rollingVelocity(ContactSlot slot, double t, double r, double[] n, double[] y) {
        int w = StateMapper.W;
        if (!slot.moving) {
            noSlipVelocity(r, y[w], y[w + 1], y[w + 2], n, y, StateMapper.V);
            return;
        }
        MotionState pose = slot.poseAt(t);
        double[] om = pose.spin;
        double[] u = new double[3];
        double[] c = {y[StateMapper.C], y[StateMapper.C + 1], y[StateMapper.C + 2]};
        pose.velocityAt(c, u);
        noSlipVelocity(r, y[w] - om[0], y[w + 1] - om[1], y[w + 2] - om[2], n, y, StateMapper.V);
        for (int i = 0; i < 3; i++) {
            y[StateMapper.V + i] += u[i];
        }
    }

    /**
     * Removes the normal component of the velocity relative to the patch, {@code n·(v − u(c))}.
     *
     * @param slot the patch
     * @param t time (s)
     * @param n unit normal
     * @param y full-layout state
     * @return the removed relative normal speed (m/s)
     */
    static double removeRelativeNormalPart(ContactSlot slot, double t, double[] n, double[] y) {
        if (!slot.moving) {
            double vn = normalPart(y, StateMapper.V, n);
            removeNormalPart(y, StateMapper.V, n);
            return vn;
        }
        double vn = relativeNormalSpeed(slot, t, n, y);
        for (int i = 0; i < 3; i++) {
            y[StateMapper.V + i] -= vn * n[i];
        }
        return vn;
    }

    /**
     * The normal speed relative to the patch, {@code n·(v − u(c))}.
     *
     * @param slot the patch
     * @param t time (s)
     * @param n unit normal
     * @param y full-layout state
     * @return n·(v − u(c)) (m/s)
     */
    static double relativeNormalSpeed(ContactSlot slot, double t, double[] n, double[] y) {
        double vn = normalPart(y, StateMapper.V, n);
        if (!slot.moving) {
            return vn;
        }
        double[] u = new double[3];
        double[] c = {y[StateMapper.C], y[StateMapper.C + 1], y[StateMapper.C + 2]};
        slot.poseAt(t).velocityAt(c, u);
        return vn - (u[0] * n[0] + u[1] * n[1] + u[2] * n[2]);
    }

    /**
     * Writes the no-slip centre velocity {@code r ω × n} into {@code out} (m/s).
     *
     * @param r ball radius (m)
     * @param wx spin x (rad/s)
     * @param wy spin y (rad/s)
     * @param wz spin z (rad/s)
     * @param n unit normal toward the ball
     * @param out output, length 3 (may be written at an offset)
     * @param at offset in {@code out}
     */
    static void noSlipVelocity(double r, double wx, double wy, double wz, double[] n, double[] out, int at) {
        out[at] = r * (wy * n[2] - wz * n[1]);
        out[at + 1] = r * (wz * n[0] - wx * n[2]);
        out[at + 2] = r * (wx * n[1] - wy * n[0]);
    }

    /**
     * Writes the tangential slip velocity of the contact point, {@code s = P(v − r ω × n)} (m/s).
     *
     * @param r ball radius (m)
     * @param v centre velocity, read from {@code v[vAt..vAt+2]}
     * @param vAt offset of the velocity
     * @param w spin, read from {@code w[wAt..wAt+2]}
     * @param wAt offset of the spin
     * @param n unit normal toward the ball
     * @param out output, length 3 (must not alias the inputs)
     */
    static void slip(double r, double[] v, int vAt, double[] w, int wAt, double[] n, double[] out) {
        double wx = w[wAt];
        double wy = w[wAt + 1];
        double wz = w[wAt + 2];
        double cx = wy * n[2] - wz * n[1];
        double cy = wz * n[0] - wx * n[2];
        double cz = wx * n[1] - wy * n[0];
        double sx = v[vAt] - r * cx;
        double sy = v[vAt + 1] - r * cy;
        double sz = v[vAt + 2] - r * cz;
        double sn = sx * n[0] + sy * n[1] + sz * n[2];
        out[0] = sx - sn * n[0];
        out[1] = sy - sn * n[1];
        out[2] = sz - sn * n[2];
    }

    /**
     * The normal component {@code v·n} of the velocity stored at {@code y[at..at+2]}.
     *
     * @param y array
     * @param at offset
     * @param n unit normal
     * @return v·n (m/s)
     */
    static double normalPart(double[] y, int at, double[] n) {
        return y[at] * n[0] + y[at + 1] * n[1] + y[at + 2] * n[2];
    }

    /**
     * Removes the normal component of the velocity stored at {@code y[at..at+2]}.
     *
     * @param y array
     * @param at offset
     * @param n unit normal
     */
    static void removeNormalPart(double[] y, int at, double[] n) {
        double vn = normalPart(y, at, n);
        for (int i = 0; i < 3; i++) {
            y[at + i] -= vn * n[i];
        }
    }

    /**
     * The speed measure {@code |v| + r|ω|} (m/s) of rest and of the rest rule.
     *
     * @param r radius (m)
     * @param v centre velocity
     * @param y state holding the spin at {@link StateMapper#W}
     * @return the speed measure
     */
    static double speedMeasure(double r, double[] v, double[] y) {
        double wx = y[StateMapper.W];
        double wy = y[StateMapper.W + 1];
        double wz = y[StateMapper.W + 2];
        return Vec.norm(v) + r * Math.sqrt(wx * wx + wy * wy + wz * wz);
    }
}
