package org.trundle.core.engine;

/**
 * The rigid forces of one rolling (no-slip) contact and one sliding contact at once, in closed form: the fast
 * path of {@link ContactForceSolver} for a groove whose walls grip differently (a polymer liner on one side and
 * steel on the other, one wall slipping while the other holds) or a ball in the crease of a funnel and a tube
 * (design notes §9, "Several contacts"). Plain doubles, no linear-algebra library, no allocation.
 *
 * <p><b>Equations.</b> Ball of radius {@code r} (m), mass {@code m} (kg), inertia {@code I = k m r²}
 * (kg·m²). Contact 1 rolls: unit normal {@code n₁} toward the ball, unknown force {@code F₁} (N, three
 * components), differentiated no-slip constraint {@code a − r α × n₁ = β₁} (m/s²; {@code β₁ = r ω × (H₁ v)} on a
 * still patch, the caller's value on a moving one). Contact 2 slides: normal {@code n₂}, unknown normal force
 * {@code N} (N), force {@code N u} with {@code u = n₂ − μ ŝ} ({@code μ} the law's friction ratio, {@code ŝ} the
 * unit slip direction), normal constraint {@code n₂·a = b₂} ({@code b₂ = −vᵀ H₂ v} on a still patch). With
 * {@code g' = g + F_app/m}:
 * <pre>
 *   m a = m g' + F₁ + N u,        I α = τ − r n₁ × F₁ − r N n₂ × u
 * </pre>
 * <b>Elimination.</b> For a given {@code N} the sliding force is a known load ({@code N u} with the couple
 * {@code −r N n₂ × u}) on a ball rolling at one contact, whose rolling constraint is solved exactly as the
 * single-contact closed form of design notes §3: the normal part gives {@code n₁·a = n₁·β₁}, the tangential
 * part {@code P₁ F₁ (1/m + r²/I) = P₁(β₁ − g' − N u/m) + (τ − r N n₂ × u) × n₁ /(k m r)}
 * ({@code P₁ = 1 − n₁ n₁ᵀ}, {@code (n₁ × F) × n₁ = P₁ F}). So the centre's acceleration is affine in {@code N},
 * {@code a = a⁰ + N a¹}, with
 * <pre>
 *   a⁰ = n₁ (n₁·β₁) + (P₁ g' + k P₁ β₁)/(1 + k) + τ × n₁ / ((1 + k) m r)
 *   a¹ = [ (1 − c) u + (n₁·u)(n₂ − n₁) ] / ((1 + k) m),        c = n₁·n₂
 * </pre>
 * (the second from {@code P₁ u − (n₂ × u) × n₁}: the ball pivots about the rolling contact, so the sliding
 * force, applied at the lever {@code r (n₁ − n₂)} from that point, moves the centre with the effective mass
 * {@code (1 + k) m}), and the sliding contact's normal constraint is one scalar equation:
 * <pre>
 *   N = (1 + k) m (b₂ − n₂·a⁰) / D,        D = (1 − c) (n₁ + n₂)·u
 * </pre>
 * then {@code a = a⁰ + N a¹}, {@code F₂ = N u}, {@code F₁} by its normal and tangential parts above (not as
 * {@code m (a − g') − F₂}, which would leave the rounding of the normal forces in the friction) and
 * {@code α = (τ − r n₁ × F₁ − r n₂ × F₂)/I}. One rolling contact has no squeeze mode (the squeeze needs two
 * rolling contacts), so these are exactly the forces of the general system of {@link ContactForceSolver}
 * ({@code ContactForceSolverTest} compares the two on seeded random geometry, moving patches included).
 *
 * <p><b>Where it declines.</b> {@code D} vanishes when the normals are parallel ({@code 1 − c = 0}: both
 * constraints at one point) or antipodal ({@code (n₁ + n₂)·u = 0} for {@code n₂ = −n₁}: a ball pinched between
 * facing walls, whose rolling about one contact does not move the other along its normal), and also where
 * friction jams the motion ({@code (1 + c) = μ ŝ·n₁}: the rolling contact's reaction to the sliding friction
 * cancels the normal push, the friction paradox of rigid bodies, e.g. F. Pfeiffer and C. Glocker, Multibody
 * Dynamics with Unilateral Contacts, 1996; from memory). There the rigid model does not decide {@code N}: when
 * {@code |D|} is below {@link #SINGULAR} times {@code |u|} the solve returns false and the general system (with
 * its minimum-norm fallback) decides. {@code 1 − c} is computed as {@code |n₁ − n₂|²/2}, which keeps its digits
 * for nearly parallel normals.
 *
 * <p>Source: derived here from the constrained Newton–Euler equations above (the single-contact elimination is
 * that of design notes §3; the rolling-about-the-contact effective mass {@code (1 + k) m} is the textbook one of a
 * ball rolling on a plane, common practice). An instance holds only the ball's constants and writes only into
 * the caller's arrays, so it may be shared.
 */
final class RollingSlidingPair {
    /**
     * Smallest {@code |D|/|u|} (dimensionless; its largest value is about 2.6) solved here: below it the normal
     * force would lose more than eight digits and the general system decides.
     */
    static final double SINGULAR = 1e-8;

    private final double r;
    private final double m;
    private final double inertia;
    private final double invM;
    private final double invI;
    /** k/(1 + k) with {@code k = I/(m r²)}. */
    private final double kShare;
    /** 1/(1 + k). */
    private final double oneShare;

    /**
     * @param radius ball radius r (m)
     * @param mass ball mass m (kg)
     * @param inertia moment of inertia I (kg·m²)
     */
    RollingSlidingPair(double radius, double mass, double inertia) {
        this.r = radius;
        this.m = mass;
        this.inertia = inertia;
        this.invM = 1.0 / mass;
        this.invI = 1.0 / inertia;
        double mrr = mass * radius * radius;
        this.kShare = inertia / (mrr + inertia);
        this.oneShare = mrr / (mrr + inertia);
    }

    /**
     * Solves for the accelerations and both contact forces.
     *
     * @param n1 unit normal of the rolling contact, toward the ball
     * @param beta1 the rolling contact's constraint right-hand side β₁ (m/s²)
     * @param n2 unit normal of the sliding contact
     * @param b2 the sliding contact's normal constraint right-hand side b₂ (m/s²)
     * @param mu the sliding contact's friction ratio μ = f/N
     * @param slip the sliding contact's unit slip direction ŝ
     * @param g gravitational acceleration (m/s²)
     * @param fApp applied force (N)
     * @param tau applied torque plus the laws' contact couples (N·m)
     * @param acc output: centre acceleration a (m/s²)
     * @param angAcc output: angular acceleration α (rad/s²)
     * @param f1 output: force of the rolling contact (N)
     * @param f2 output: force of the sliding contact (N)
     * @return false, with the outputs untouched, when {@code |D|} is below {@link #SINGULAR} times {@code |u|}
     */
    boolean solve(double[] n1, double[] beta1, double[] n2, double b2, double mu, double[] slip, double[] g,
                  double[] fApp, double[] tau, double[] acc, double[] angAcc, double[] f1, double[] f2) {
        double n1x = n1[0];
        double n1y = n1[1];
        double n1z = n1[2];
        double n2x = n2[0];
        double n2y = n2[1];
        double n2z = n2[2];
        // u = n₂ − μ ŝ
        double ux = n2x - mu * slip[0];
        double uy = n2y - mu * slip[1];
        double uz = n2z - mu * slip[2];
        double ex = n1x - n2x;
        double ey = n1y - n2y;
        double ez = n1z - n2z;
        double oneMinusC = 0.5 * (ex * ex + ey * ey + ez * ez);
        double n1u = n1x * ux + n1y * uy + n1z * uz;
        double d = oneMinusC * (n1u + n2x * ux + n2y * uy + n2z * uz);
        double uu = Math.sqrt(ux * ux + uy * uy + uz * uz);
        if (!(Math.abs(d) > SINGULAR * uu)) {
            return false;
        }
        double gx = g[0] + fApp[0] * invM;
        double gy = g[1] + fApp[1] * invM;
        double gz = g[2] + fApp[2] * invM;
        double bx = beta1[0];
        double by = beta1[1];
        double bz = beta1[2];
        // a⁰ = n₁(n₁·β₁) + P₁(g' + k β₁)/(1 + k) + τ × n₁/((1 + k) m r)
        double nb = n1x * bx + n1y * by + n1z * bz;
        double qx = oneShare * gx + kShare * bx;
        double qy = oneShare * gy + kShare * by;
        double qz = oneShare * gz + kShare * bz;
        double nq = n1x * qx + n1y * qy + n1z * qz;
        double lever = oneShare * invM / r;
        double a0x = n1x * (nb - nq) + qx + lever * (tau[1] * n1z - tau[2] * n1y);
        double a0y = n1y * (nb - nq) + qy + lever * (tau[2] * n1x - tau[0] * n1z);
        double a0z = n1z * (nb - nq) + qz + lever * (tau[0] * n1y - tau[1] * n1x);
        // N a¹ = N [(1 − c) u − (n₁·u) e]/((1 + k) m), N = (1 + k) m (b₂ − n₂·a⁰)/D: the (1 + k) m cancel
        double nf = (b2 - (n2x * a0x + n2y * a0y + n2z * a0z)) * m / (oneShare * d);
        double s = nf * oneShare * invM;
        double ax = a0x + s * (oneMinusC * ux - n1u * ex);
        double ay = a0y + s * (oneMinusC * uy - n1u * ey);
        double az = a0z + s * (oneMinusC * uz - n1u * ez);
        double f2x = nf * ux;
        double f2y = nf * uy;
        double f2z = nf * uz;
        // F₁ by its parts (§3), not as m(a − g') − F₂, which would leave the normal force's rounding in the
        // friction: n₁·F₁ = m n₁·(β₁ − g') − N n₁·u,  P₁F₁ = k m P₁(β₁ − g' − N u/m)/(1 + k) + (τ' × n₁)/((1 + k) r)
        // with the couple τ' = τ − r N n₂ × u
        double px = bx - gx - nf * ux * invM;
        double py = by - gy - nf * uy * invM;
        double pz = bz - gz - nf * uz * invM;
        double np = n1x * px + n1y * py + n1z * pz;
        double tpx = tau[0] - r * (n2y * f2z - n2z * f2y);
        double tpy = tau[1] - r * (n2z * f2x - n2x * f2z);
        double tpz = tau[2] - r * (n2x * f2y - n2y * f2x);
        double km = kShare * m;
        double tr = oneShare / r;
        double fn1 = m * np;
        double f1x = km * (px - n1x * np) + tr * (tpy * n1z - tpz * n1y) + n1x * fn1;
        double f1y = km * (py - n1y * np) + tr * (tpz * n1x - tpx * n1z) + n1y * fn1;
        double f1z = km * (pz - n1z * np) + tr * (tpx * n1y - tpy * n1x) + n1z * fn1;
        // I α = τ − r n₁ × F₁ − r n₂ × F₂
        angAcc[0] = (tau[0] - r * (n1y * f1z - n1z * f1y + n2y * f2z - n2z * f2y)) * invI;
        angAcc[1] = (tau[1] - r * (n1z * f1x - n1x * f1z + n2z * f2x - n2x * f2z)) * invI;
        angAcc[2] = (tau[2] - r * (n1x * f1y - n1y * f1x + n2x * f2y - n2y * f2x)) * invI;
        acc[0] = ax;
        acc[1] = ay;
        acc[2] = az;
        f1[0] = f1x;
        f1[1] = f1y;
        f1[2] = f1z;
        f2[0] = f2x;
        f2[1] = f2y;
        f2[2] = f2z;
        return true;
    }
}
