package org.trundle.core.engine;

/**
 * The kinematics of a contact in one place (design notes §3, §4): the no-slip velocity of the
 * centre {@code v = r ω × n}, the tangential slip of the contact point {@code s = P(v − r ω × n)}
 * ({@code P = 1 − n nᵀ}), and the removal of the normal part of a velocity. Written on scalars and
 * caller-owned arrays, allocation-free, so the hot path and the switches share the same arithmetic.
 *
 * <p>Moving surfaces (issue 11, item 2) add the surface velocity at the contact point and the
 * surface spin here: {@code s = P(v − r ω × n − u(p))}, relative spin {@code ω − Ω}.
 */
final class ContactKinematics {
    private ContactKinematics() {
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
