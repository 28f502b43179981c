package org.trundle.core.engine;

/**
 * The rigid forces of two rolling (no-slip) contacts on patches that stand still, in closed form: the fast
 * path of {@link ContactForceSolver} for a ball in a V-groove or on two rails (design notes §9, "Several
 * contacts"). Plain doubles, no linear-algebra library, no allocation.
 *
 * <p><b>Equations.</b> Ball of radius {@code r} (m), mass {@code m} (kg), inertia {@code I = k m r²}
 * (kg·m²); contact {@code i = 1, 2} at {@code p_i = c − r n_i} with the unit normal {@code n_i} toward the
 * ball and the distance Hessian {@code H_i} at the centre (1/m). Newton–Euler with the contact forces
 * {@code F_i} (N):
 * <pre>
 *   m a = m g + F_app + F₁ + F₂,        I α = τ − r n₁ × F₁ − r n₂ × F₂
 * </pre>
 * and per contact the differentiated no-slip constraint (the contact point stays still,
 * {@code v − r ω × n_i = 0}, with {@code ṅ_i = H_i v}):
 * <pre>
 *   a − r α × n_i = β_i := r ω × (H_i v)        (m/s²)
 * </pre>
 * <b>Motion.</b> With the chord direction {@code e = n₁ − n₂} (the contact points differ by {@code −r e}),
 * its unit {@code ê}, the mean normal {@code n̄ = (n₁ + n₂)/2} ({@code ê·n̄ = 0}, {@code |n̄|² = 1 − |e|²/4})
 * and {@code u = ê × n̄}: the difference of the two constraints, {@code α × e = (β₂ − β₁)/r}, fixes the part
 * of {@code α} across the chord, {@code α⊥ = e × (β₂ − β₁)/(r |e|²)}; their mean gives
 * {@code a = (β₁ + β₂)/2 + r α × n̄}. The one free rate is the angular acceleration {@code s = α·ê} about
 * the chord, and the contact forces, which act on the chord line, have no moment about it:
 * {@code r u·(m a − m g − F_app) + ê·(I α − τ) = 0}, so
 * <pre>
 *   s = [ ê·τ + m r u·(g + F_app/m − β̄ − r α⊥ × n̄) ] / (I + m r² |n̄|²),      β̄ = (β₁ + β₂)/2
 * </pre>
 * — the ball turns about the chord with the inertia {@code I + m r_e²}, {@code r_e = r |n̄|} its distance from
 * the centre: on two rails {@code d} apart {@code r_e = √(r² − d²/4)}, in a V of half-angle {@code γ}
 * {@code r_e = r sin γ}, and down a slope {@code a = g sinθ/(1 + k r²/r_e²)} (the textbook law; e.g. any
 * rigid-body dynamics text, rolling on rails).
 *
 * <p><b>Forces.</b> The total {@code F = m(a − g) − F_app} and the total moment {@code T = I α − τ} give
 * {@code F₁ = F/2 + d}, {@code F₂ = F/2 − d} with {@code e × d = −T/r − n̄ × F}, so
 * {@code d = (b × e)/|e|² + t ê}, {@code b = −T/r − n̄ × F}. The squeeze {@code t} along the chord is
 * statically indeterminate; it is fixed by exactly the rule of {@link ContactForceSolver} — the split that asks
 * least of friction, {@code ê·P₁F₁ − ê·P₂F₂ = 0} ({@code P_i = 1 − n_i n_iᵀ}), which is the stationarity of
 * {@code Σ|P_i F_i|²} along the squeeze — so the two give the same forces to rounding:
 * <pre>
 *   t = (m ρ + |e| n̄·F) / (4 |n̄|²)
 * </pre>
 * Here {@code ρ = ê·(β₁ − β₂)} is zero on the constraint manifold (the chord constraint has no acceleration
 * of its own); off it, at the integrator's drift, the general solver satisfies the constraints projected onto
 * the consistent ones, {@code β₁ − ê ρ/2} and {@code β₂ + ê ρ/2}, and its regularised squeeze row gives
 * {@code m ρ/2} instead of zero on the right; both are reproduced here, so the two solvers agree off the
 * manifold too ({@code ContactForceSolverTest} compares them on seeded random geometry).
 *
 * <p>Near-parallel normals (the chord undefined: two patches that meet tangentially) and near-antipodal ones
 * (a ball pinched between facing walls: the tangential weight cannot see the squeeze, and {@code r_e → 0})
 * are refused ({@code solve} returns false) and left to the general solver.
 *
 * <p>The code writes every {@code ê} as {@code e/|e|} ({@code σ = s/|e|}, {@code ρ' = ρ/|e|}), so that no square
 * root is taken and the three reciprocals ({@code 1/|e|²}, {@code 1/|n̄|²}, {@code 1/(I + m r² |n̄|²)}) are
 * independent of each other.
 *
 * <p>Source: derived here from the constrained Newton–Euler equations above (the rolling radius about the
 * chord is the textbook one, e.g. J. L. Meriam and L. G. Kraige, Engineering Mechanics: Dynamics, plane
 * motion of rigid bodies; from memory). An instance holds only the ball's constants and writes only into the
 * caller's arrays, so it may be shared; the static projections hold nothing.
 */
final class RollingPair {
    /**
     * Smallest {@code |e|²} and {@code |n̄|²} (dimensionless, of 4 and 1) solved here: normals closer than
     * about 0.06 rad to parallel or to antipodal go to the general solver, where the closed form's divisions
     * would lose digits.
     */
    static final double DEGENERATE = 1e-3;

    private final double r;
    private final double m;
    private final double inertia;
    private final double invR;
    private final double invM;
    /** m r² (kg·m²). */
    private final double mrr;

    /**
     * @param radius ball radius r (m)
     * @param mass ball mass m (kg)
     * @param inertia moment of inertia I (kg·m²)
     */
    RollingPair(double radius, double mass, double inertia) {
        this.r = radius;
        this.m = mass;
        this.inertia = inertia;
        this.invR = 1.0 / radius;
        this.invM = 1.0 / mass;
        this.mrr = mass * radius * radius;
    }

    /**
     * Solves for the accelerations and both contact forces.
     *
     * @param n1 unit normal of contact 1, toward the ball
     * @param h1 distance Hessian of contact 1 at the centre, row-major (1/m)
     * @param n2 unit normal of contact 2
     * @param h2 distance Hessian of contact 2
     * @param v centre velocity (m/s)
     * @param w spin (rad/s)
     * @param g gravitational acceleration (m/s²)
     * @param fApp applied force (N)
     * @param tau applied torque plus the laws' contact couples (N·m)
     * @param acc output: centre acceleration a (m/s²)
     * @param angAcc output: angular acceleration α (rad/s²)
     * @param f1 output: contact force of contact 1 (N)
     * @param f2 output: contact force of contact 2 (N)
     * @return false, with the outputs untouched, when the normals are nearly parallel or antipodal
     */
    boolean solve(double[] n1, double[] h1, double[] n2, double[] h2, double[] v, double[] w, double[] g,
                  double[] fApp, double[] tau, double[] acc, double[] angAcc, double[] f1, double[] f2) {
        double ex = n1[0] - n2[0];
        double ey = n1[1] - n2[1];
        double ez = n1[2] - n2[2];
        double ee = ex * ex + ey * ey + ez * ez;
        double mx = 0.5 * (n1[0] + n2[0]);
        double my = 0.5 * (n1[1] + n2[1]);
        double mz = 0.5 * (n1[2] + n2[2]);
        double mm = mx * mx + my * my + mz * mz;
        if (!(ee >= 4 * DEGENERATE && mm >= DEGENERATE)) {
            return false;
        }
        // three independent reciprocals (no square root: every ê is written as e/|e| and the |e| cancel)
        double invEe = 1.0 / ee;
        double invMm = 1.0 / mm;
        double invJ = 1.0 / (inertia + mrr * mm);
        double vx = v[0];
        double vy = v[1];
        double vz = v[2];
        double wx = w[0];
        double wy = w[1];
        double wz = w[2];
        // β_i = r ω × (H_i v)
        double p1x = h1[0] * vx + h1[1] * vy + h1[2] * vz;
        double p1y = h1[3] * vx + h1[4] * vy + h1[5] * vz;
        double p1z = h1[6] * vx + h1[7] * vy + h1[8] * vz;
        double p2x = h2[0] * vx + h2[1] * vy + h2[2] * vz;
        double p2y = h2[3] * vx + h2[4] * vy + h2[5] * vz;
        double p2z = h2[6] * vx + h2[7] * vy + h2[8] * vz;
        double b1x = r * (wy * p1z - wz * p1y);
        double b1y = r * (wz * p1x - wx * p1z);
        double b1z = r * (wx * p1y - wy * p1x);
        double b2x = r * (wy * p2z - wz * p2y);
        double b2y = r * (wz * p2x - wx * p2z);
        double b2z = r * (wx * p2y - wy * p2x);
        // ρ' = ρ/|e| = e·(β₁ − β₂)/|e|²; Δ = β₂ − β₁ + ê ρ = β₂ − β₁ + e ρ' (the consistent difference)
        double rho = (ex * (b1x - b2x) + ey * (b1y - b2y) + ez * (b1z - b2z)) * invEe;
        double dx = b2x - b1x + ex * rho;
        double dy = b2y - b1y + ey * rho;
        double dz = b2z - b1z + ez * rho;
        // α⊥ = e × Δ / (r |e|²)
        double inv = invEe * invR;
        double ax = (ey * dz - ez * dy) * inv;
        double ay = (ez * dx - ex * dz) * inv;
        double az = (ex * dy - ey * dx) * inv;
        // a₀ = β̄ + r α⊥ × n̄
        double a0x = 0.5 * (b1x + b2x) + r * (ay * mz - az * my);
        double a0y = 0.5 * (b1y + b2y) + r * (az * mx - ax * mz);
        double a0z = 0.5 * (b1z + b2z) + r * (ax * my - ay * mx);
        // e × n̄ = |e| u
        double qx = ey * mz - ez * my;
        double qy = ez * mx - ex * mz;
        double qz = ex * my - ey * mx;
        double gx = g[0] + fApp[0] * invM;
        double gy = g[1] + fApp[1] * invM;
        double gz = g[2] + fApp[2] * invM;
        // σ = s/|e|: α = α⊥ + σ e, a = a₀ + r σ (e × n̄)
        double sigma = (ex * tau[0] + ey * tau[1] + ez * tau[2]
            + m * r * (qx * (gx - a0x) + qy * (gy - a0y) + qz * (gz - a0z))) * invEe * invJ;
        double alx = ax + sigma * ex;
        double aly = ay + sigma * ey;
        double alz = az + sigma * ez;
        double rs = r * sigma;
        double acx = a0x + rs * qx;
        double acy = a0y + rs * qy;
        double acz = a0z + rs * qz;
        // total contact force F and moment T about the centre
        double fx = m * (acx - gx);
        double fy = m * (acy - gy);
        double fz = m * (acz - gz);
        double tx = inertia * alx - tau[0];
        double ty = inertia * aly - tau[1];
        double tz = inertia * alz - tau[2];
        // b = −T/r − n̄ × F; d = (b × e)/|e|² + t ê, t ê = (m ρ' + n̄·F) e / (4 |n̄|²)
        double bx = -tx * invR - (my * fz - mz * fy);
        double by = -ty * invR - (mz * fx - mx * fz);
        double bz = -tz * invR - (mx * fy - my * fx);
        double t = (m * rho + mx * fx + my * fy + mz * fz) * 0.25 * invMm;
        double ix = (by * ez - bz * ey) * invEe + t * ex;
        double iy = (bz * ex - bx * ez) * invEe + t * ey;
        double iz = (bx * ey - by * ex) * invEe + t * ez;
        f1[0] = 0.5 * fx + ix;
        f1[1] = 0.5 * fy + iy;
        f1[2] = 0.5 * fz + iz;
        f2[0] = 0.5 * fx - ix;
        f2[1] = 0.5 * fy - iy;
        f2[2] = 0.5 * fz - iz;
        acc[0] = acx;
        acc[1] = acy;
        acc[2] = acz;
        angAcc[0] = alx;
        angAcc[1] = aly;
        angAcc[2] = alz;
        return true;
    }

    /**
     * The velocity projection onto two rolling contacts on still patches, in closed form: the allowed motions
     * are the rotations about the chord, {@code ψ = (r e × n₁, e)} ({@code v = r ω × n₁ = r ω × n₂} for
     * {@code ω} along {@code e = n₁ − n₂}), so the projection orthogonal in the kinetic-energy metric
     * {@code M = diag(m 1, I 1)} is
     * <pre>
     *   (v, ω) ← ψ κ,     κ = (m r (e × n₁)·v + I e·ω) / (m r² |e × n₁|² + I |e|²)
     * </pre>
     * — the same as the general {@code ν − M⁻¹Jᵀ(J M⁻¹ Jᵀ)⁺ J ν} of the six stacked no-slip rows (whose null
     * space is spanned by {@code ψ}), without the pseudo-inverse (common practice: the M-orthogonal projection
     * onto a one-dimensional subspace).
     *
     * @param r ball radius (m)
     * @param m ball mass (kg)
     * @param inertia moment of inertia (kg·m²)
     * @param n1 unit normal of contact 1
     * @param n2 unit normal of contact 2
     * @param y full-layout state whose velocity and spin are replaced
     * @return false, with {@code y} untouched, when the normals are nearly parallel or antipodal
     */
    static boolean projectVelocity(double r, double m, double inertia, double[] n1, double[] n2, double[] y) {
        double ex = n1[0] - n2[0];
        double ey = n1[1] - n2[1];
        double ez = n1[2] - n2[2];
        if (!nondegenerate(n1, n2)) {
            return false;
        }
        // e × n₁
        double qx = ey * n1[2] - ez * n1[1];
        double qy = ez * n1[0] - ex * n1[2];
        double qz = ex * n1[1] - ey * n1[0];
        int v = StateMapper.V;
        int w = StateMapper.W;
        double kappa = (m * r * (qx * y[v] + qy * y[v + 1] + qz * y[v + 2]) + inertia * (ex * y[w] + ey * y[w + 1] + ez * y[w + 2]))
            / (m * r * r * (qx * qx + qy * qy + qz * qz) + inertia * (ex * ex + ey * ey + ez * ez));
        y[v] = r * qx * kappa;
        y[v + 1] = r * qy * kappa;
        y[v + 2] = r * qz * kappa;
        y[w] = ex * kappa;
        y[w + 1] = ey * kappa;
        y[w + 2] = ez * kappa;
        return true;
    }

    /**
     * One Gauss–Newton step of the centre onto two surfaces, {@code d_i(c) = r}: the least-norm step
     * {@code Δc = Nᵀ (N Nᵀ)⁻¹ (r − d)} with the rows {@code n₁, n₂}, the 2×2 inverse written out,
     * {@code Δc = λ₁ n₁ + λ₂ n₂}, {@code λ₁ = (ρ₁ − c ρ₂)/(1 − c²)}, {@code λ₂ = (ρ₂ − c ρ₁)/(1 − c²)},
     * {@code c = n₁·n₂} (the general projection's pseudo-inverse is this inverse when the normals are apart).
     *
     * @param n1 unit normal of surface 1
     * @param res1 its residual {@code r − d₁} (m)
     * @param n2 unit normal of surface 2
     * @param res2 its residual {@code r − d₂} (m)
     * @param y full-layout state whose centre moves
     * @return false, with {@code y} untouched, when the normals are nearly parallel or antipodal
     */
    static boolean stepPosition(double[] n1, double res1, double[] n2, double res2, double[] y) {
        if (!nondegenerate(n1, n2)) {
            return false;
        }
        double cc = n1[0] * n2[0] + n1[1] * n2[1] + n1[2] * n2[2];
        double det = 1.0 / (1 - cc * cc);
        double l1 = (res1 - cc * res2) * det;
        double l2 = (res2 - cc * res1) * det;
        int c = StateMapper.C;
        y[c] += l1 * n1[0] + l2 * n2[0];
        y[c + 1] += l1 * n1[1] + l2 * n2[1];
        y[c + 2] += l1 * n1[2] + l2 * n2[2];
        return true;
    }

    /** Whether two normals are far enough from parallel and from antipodal for the closed forms ({@link #DEGENERATE}). */
    private static boolean nondegenerate(double[] n1, double[] n2) {
        double ex = n1[0] - n2[0];
        double ey = n1[1] - n2[1];
        double ez = n1[2] - n2[2];
        double mx = n1[0] + n2[0];
        double my = n1[1] + n2[1];
        double mz = n1[2] + n2[2];
        return ex * ex + ey * ey + ez * ez >= 4 * DEGENERATE && mx * mx + my * my + mz * mz >= 4 * DEGENERATE;
    }
}
