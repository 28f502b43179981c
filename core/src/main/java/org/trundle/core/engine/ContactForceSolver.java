package org.trundle.core.engine;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;

/**
 * The rigid constraint forces of a ball touching several patches at once (design notes §9,
 * "Several contacts"): one small linear system for all contacts, allocation-free after construction.
 *
 * <p><b>Unknowns and equations.</b> Generalised velocity {@code ν = (v, ω)}, mass matrix
 * {@code M = diag(m 1, I 1)} with {@code I = k m r²}. Contact {@code i} touches at {@code p_i = c − r n_i}
 * ({@code n_i} the unit normal toward the ball, {@code H_i} the distance Hessian at the centre, so
 * {@code ṅ_i = H_i v}).
 * <ul>
 * <li>a <em>rolling</em> contact has three unknowns, its force {@code F_i}, and three constraints: the
 * contact point does not move, {@code J_i ν = v + r n_i × ω = 0}; differentiated,
 * {@code a − r α × n_i = r ω × (H_i v) =: β_i} (its normal component is the normal constraint
 * {@code n_i·a = −vᵀ H_i v} on the constraint manifold);</li>
 * <li>a <em>sliding</em> contact has one unknown, its normal force {@code N_i}, and the force
 * {@code F_i = N_i (n_i − μ_i ŝ_i)} with the law's sliding friction {@code f_i = μ_i N_i} against the
 * slip direction {@code ŝ_i}; its one constraint is {@code n_i·a = −vᵀ H_i v}.</li>
 * </ul>
 * With {@code G} the generalised directions of the unknown forces (a force {@code F} at {@code p_i} acts
 * as {@code (F, −r n_i × F)}), Newton–Euler {@code M ν̇ = f + G λ}, {@code f = (m g + F_app, τ)}, and the
 * stacked constraints {@code J ν̇ = β} give
 * <pre>
 *   (J M⁻¹ G) λ = β − J M⁻¹ f,     then   m a = m g + F_app + Σ F_i,   I α = τ − r Σ n_i × F_i
 * </pre>
 * ({@code τ} holds the applied torque and the laws' couples, evaluated by the caller).
 *
 * <p><b>The statically indeterminate split.</b> Two rigid rolling contacts can push on the ball with
 * equal and opposite forces along the chord {@code p_i − p_j} (a squeeze) without any effect on the
 * motion: {@code J M⁻¹ G} is singular, with one such mode per pair of rolling contacts (for three
 * rolling contacts not on one line the three chord modes span the whole null space). A rigid model
 * cannot decide the squeeze; this solver takes the split that <em>asks least of friction</em>: among all
 * force sets that produce the motion, the one minimising {@code Σ |P_i F_i|²}, the sum of the squared
 * tangential (friction) forces ({@code P_i = 1 − n_i n_iᵀ}). Walls then push along their normals except
 * where the motion itself needs friction, which reproduces the textbook statics of a ball on two rails or
 * in a V-groove (each wall's force normal in the cross-section), and no contact is asked for friction it
 * would not need, so slip is not predicted early by an arbitrary squeeze. This is the weighted
 * minimum-norm solution (Gauss' least-constraint form with the tangential compliance as weight); when a
 * chord is parallel to both normals (antipodal contacts, a ball pinched between two parallel walls) the
 * tangential weight cannot see the squeeze, and the plain minimum norm {@code Σ |F_i|²} decides it (a
 * negative normal force there is released by the caller's release rule). It is computed exactly: with
 * {@code Z} the chord modes and {@code C} the weight, {@code (J M⁻¹ G + Z Zᵀ C) λ = rhs} is regular and
 * its solution satisfies {@code J M⁻¹ G λ = rhs} and {@code Zᵀ C λ = 0} (the rhs has no component along
 * {@code Z}, which spans the left null space too).
 *
 * <p>A system singular beyond those modes (two sliding contacts pressing along one line, whose squeeze the
 * friction weight does not see) is solved for the minimum-norm forces (SVD pseudo-inverse, made on first use).
 *
 * <p><b>Storage.</b> EJML's fixed-size types stop at 6×6 and offer no 6×6 solve, while three contacts need
 * up to 9 unknowns, so the system lives in a {@link DMatrixRMaj} of the largest size, allocated once, with a
 * reused LU solver; every contact occupies three rows (a sliding contact's two spare rows are identity rows).
 *
 * <p><b>Two rolling contacts on still patches</b> (a groove, two rails: the common case) are solved in closed
 * form by {@link RollingPair} — the motion is a rotation about the chord through both contact points, so one
 * scalar equation and a few cross products give the same forces as the system below, squeeze rule included
 * (the unit tests compare the two on seeded random geometry) — unless their normals are nearly parallel or
 * antipodal. When every contact slides (still or moving patches, two or three contacts) only the normal forces
 * are unknown and a 2×2 or 3×3 system solved by Cramer's rule gives them ({@code solveSliding}). One rolling and
 * one sliding contact (a groove whose walls grip differently; still or moving patches) are solved in closed form by
 * {@link RollingSlidingPair}: the rolling constraint eliminated as in the single-contact closed form, one scalar
 * equation for the sliding normal force (declined where the sliding force direction makes it degenerate). Every
 * other case (two rolling contacts on moving patches, three contacts with one or more rolling) takes the general
 * system.
 *
 * <p>A single contact does not come here: the engine keeps the closed form of §3 for it (the fast path);
 * the unit tests check that this solver agrees with that closed form.
 *
 * <p>Not thread-safe: one instance per run.
 */
final class ContactForceSolver {
    /** Most contacts solved at once. */
    static final int MAX_CONTACTS = 3;
    /** Relative size below which a chord mode is invisible to the tangential weight (antipodal contacts). */
    private static final double ANTIPODAL = 1e-10;

    private final double r;
    private final double m;
    private final double inertia;
    /** The closed form of two rolling contacts on still patches (the common case: groove, rails). */
    private final RollingPair pair;
    /** The closed form of one rolling and one sliding contact (a groove whose walls grip differently). */
    private final RollingSlidingPair mixed;
    /** The rolling contact's β for {@link #mixed}. */
    private final double[] mixedBeta = new double[3];

    // inputs per contact
    private int count;
    private final double[][] normal = new double[MAX_CONTACTS][3];
    private final double[][] hessian = new double[MAX_CONTACTS][9];
    private final boolean[] rolling = new boolean[MAX_CONTACTS];
    private final double[] frictionRatio = new double[MAX_CONTACTS];
    private final double[][] slideDir = new double[MAX_CONTACTS][3];
    /** Whether the caller gave the constraint's right-hand side (a moving patch), and its value. */
    private final boolean[] given = new boolean[MAX_CONTACTS];
    private final double[][] givenBeta = new double[MAX_CONTACTS][3];

    // outputs
    private final double[] acc = new double[3];
    private final double[] angAcc = new double[3];
    private final double[][] force = new double[MAX_CONTACTS][3];
    private final double[] normalForce = new double[MAX_CONTACTS];
    private final double[] tangentialForce = new double[MAX_CONTACTS];

    // the linear system and workspaces
    private final DMatrixRMaj mat = new DMatrixRMaj(3 * MAX_CONTACTS, 3 * MAX_CONTACTS);
    private final DMatrixRMaj rhs = new DMatrixRMaj(3 * MAX_CONTACTS, 1);
    private final DMatrixRMaj sol = new DMatrixRMaj(3 * MAX_CONTACTS, 1);
    private final LinearSolverDense<DMatrixRMaj> lu = LinearSolverFactory_DDRM.lu(3 * MAX_CONTACTS);
    /**
     * The minimum-norm fallback for a system that is singular beyond the rolling squeeze modes (two sliding
     * contacts pressing along one line, as a ball between two races whose normals are antipodal): made on first
     * use only.
     */
    private LinearSolverDense<DMatrixRMaj> pinv;
    /** Relative LU quality below which the fallback solves. */
    private static final double SINGULAR = 1e-12;
    /**
     * Singular values below this fraction of the largest (times the size, EJML's convention) count as zero in the
     * minimum-norm fallback: a squeeze between contacts whose normals are antipodal up to rounding (a ball pinched
     * between a bearing's races) is indeterminate, and inverting its rounding-level singular value would give
     * forces of order 1/ε.
     */
    private static final double SINGULAR_VALUE = 1e-9;
    /**
     * Relative determinant (against the product of the rows' norms) below which the sliding closed form declines
     * in favour of the general system.
     */
    private static final double SLIDING_SINGULAR = 1e-8;
    /** Rows of J (linear and angular parts) and columns of G, per unknown. */
    private final double[][] jLin = new double[3 * MAX_CONTACTS][3];
    private final double[][] jAng = new double[3 * MAX_CONTACTS][3];
    private final double[][] gLin = new double[3 * MAX_CONTACTS][3];
    private final double[][] gAng = new double[3 * MAX_CONTACTS][3];
    private final boolean[] active = new boolean[3 * MAX_CONTACTS];
    private final double[] beta = new double[3 * MAX_CONTACTS];
    private final double[] mode = new double[3 * MAX_CONTACTS];
    private final double[] weighted = new double[3 * MAX_CONTACTS];
    private final double[] hv = new double[3];
    private final double[] tmp = new double[3];
    /** All-sliding closed form: the matrix n_i·u_j/m (row-major, up to 3×3), the u_j, the rhs and the N_i. */
    private final double[] slideMatrix = new double[MAX_CONTACTS * MAX_CONTACTS];
    private final double[] slideForceDir = new double[3 * MAX_CONTACTS];
    private final double[] slideRhs = new double[MAX_CONTACTS];
    private final double[] slideNormal = new double[MAX_CONTACTS];
    private final double[] unit = new double[3];

    /**
     * @param radius ball radius r (m)
     * @param mass ball mass m (kg)
     * @param inertiaFactor k in {@code I = k m r²}
     */
    ContactForceSolver(double radius, double mass, double inertiaFactor) {
        this.r = radius;
        this.m = mass;
        this.inertia = inertiaFactor * mass * radius * radius;
        this.pair = new RollingPair(radius, mass, inertia);
        this.mixed = new RollingSlidingPair(radius, mass, inertia);
    }

    /** Forgets the contacts of the last solve. */
    void clear() {
        count = 0;
    }

    /**
     * Adds a rolling contact.
     *
     * @param n unit normal toward the ball (copied)
     * @param h distance Hessian at the centre, row-major 3×3 (1/m, copied)
     */
    void addRolling(double[] n, double[] h) {
        int i = next();
        System.arraycopy(n, 0, normal[i], 0, 3);
        System.arraycopy(h, 0, hessian[i], 0, 9);
        rolling[i] = true;
        given[i] = false;
    }

    /**
     * Adds a rolling contact on a moving patch, whose differentiated no-slip constraint has the right-hand
     * side {@code β_i = A − r Ω̇ × n_i + r (ω − Ω) × ṅ_i} given by the caller (design notes §9: {@code A} the
     * patch's velocity field differentiated along the centre's path, {@code ṅ_i = Ω × n_i + H_i (v − u(c))});
     * it is {@code r ω × (H_i v)} on a still patch.
     *
     * @param n unit normal toward the ball (copied)
     * @param h distance Hessian at the centre (copied)
     * @param beta the constraint's right-hand side β_i (m/s², copied)
     */
    void addRolling(double[] n, double[] h, double[] beta) {
        addRolling(n, h);
        given[count - 1] = true;
        System.arraycopy(beta, 0, givenBeta[count - 1], 0, 3);
    }

    /**
     * Adds a sliding contact on a moving patch, whose normal constraint {@code n_i·a = β_n} has the right-hand
     * side {@code β_n = n_i·A − ṅ_i·(v − u(c))} given by the caller ({@code −vᵀ H_i v} on a still patch).
     *
     * @param n unit normal toward the ball (copied)
     * @param h distance Hessian at the centre (copied)
     * @param mu friction ratio μ = f/N
     * @param slip unit slip direction ŝ relative to the patch (copied)
     * @param betaN the normal constraint's right-hand side (m/s²)
     */
    void addSliding(double[] n, double[] h, double mu, double[] slip, double betaN) {
        addSliding(n, h, mu, slip);
        given[count - 1] = true;
        givenBeta[count - 1][0] = betaN;
    }

    /**
     * Adds a sliding contact whose friction is {@code μ N} against the slip direction.
     *
     * @param n unit normal toward the ball (copied)
     * @param h distance Hessian at the centre (copied)
     * @param mu friction ratio μ = f/N of the law (the sliding friction per newton of normal force)
     * @param slip unit slip direction ŝ (tangential; copied)
     */
    void addSliding(double[] n, double[] h, double mu, double[] slip) {
        int i = next();
        System.arraycopy(n, 0, normal[i], 0, 3);
        System.arraycopy(h, 0, hessian[i], 0, 9);
        rolling[i] = false;
        given[i] = false;
        frictionRatio[i] = mu;
        System.arraycopy(slip, 0, slideDir[i], 0, 3);
    }

    private int next() {
        if (count == MAX_CONTACTS) {
            throw new IllegalStateException("at most " + MAX_CONTACTS + " simultaneous contacts are solved, got one more");
        }
        return count++;
    }

    /** @return the number of contacts added for the current solve (0 after {@link #solveRollingPair}) */
    int count() {
        return count;
    }

    /**
     * Solves for the accelerations and the contact forces.
     *
     * @param v centre velocity (m/s)
     * @param w spin (rad/s)
     * @param g gravitational acceleration (m/s²)
     * @param fApp applied force (N)
     * @param tau applied torque plus the laws' contact couples (N·m)
     * @return false when the system is singular beyond the squeeze modes (contacts that cannot all hold)
     */
    boolean solve(double[] v, double[] w, double[] g, double[] fApp, double[] tau) {
        if (count == 2 && rolling[0] && rolling[1] && !given[0] && !given[1]
            && pair.solve(normal[0], hessian[0], normal[1], hessian[1], v, w, g, fApp, tau, acc, angAcc, force[0],
                force[1])) {
            return summarise();
        }
        if (allSliding() && solveSliding(v, g, fApp, tau)) {
            return summarise();
        }
        if (count == 2 && rolling[0] != rolling[1] && solveMixed(v, w, g, fApp, tau)) {
            return summarise();
        }
        return solveGeneral(v, w, g, fApp, tau);
    }

    /**
     * One rolling and one sliding contact (still or moving patches): the closed form of {@link RollingSlidingPair}
     * with the constraints' right-hand sides of the class comment ({@code β = r ω × (H v)} and {@code −vᵀ H v} on
     * still patches, the caller's on moving ones).
     *
     * @return false when it declines (the sliding force direction degenerate; nothing written)
     */
    private boolean solveMixed(double[] v, double[] w, double[] g, double[] fApp, double[] tau) {
        int i = rolling[0] ? 0 : 1;
        int j = 1 - i;
        double[] b1 = mixedBeta;
        rollingRhs(i, v, w, b1);
        double b2 = slidingRhs(j, v);
        return mixed.solve(normal[i], b1, normal[j], b2, frictionRatio[j], slideDir[j], g, fApp, tau, acc, angAcc,
            force[i], force[j]);
    }

    /**
     * Rolling contact i's constraint right-hand side {@code β_i = r ω × (H_i v)} on a still patch, the caller's on a
     * moving one.
     */
    private void rollingRhs(int i, double[] v, double[] w, double[] out) {
        if (given[i]) {
            System.arraycopy(givenBeta[i], 0, out, 0, 3);
            return;
        }
        Vec.mulSym(hessian[i], v, hv);
        Vec.cross(w, hv, out);
        Vec.scale(out, r);
    }

    /** Sliding contact i's normal constraint right-hand side {@code −vᵀ H_i v} on a still patch, the caller's on a moving one. */
    private double slidingRhs(int i, double[] v) {
        if (given[i]) {
            return givenBeta[i][0];
        }
        Vec.mulSym(hessian[i], v, hv);
        return -Vec.dot(v, hv);
    }

    private boolean allSliding() {
        for (int i = 0; i < count; i++) {
            if (rolling[i]) {
                return false;
            }
        }
        return count > 0;
    }

    /**
     * Every contact sliding (still or moving patches): the unknowns are the normal forces {@code N_i} alone, each
     * contact's force is {@code N_i u_i} with {@code u_i = n_i − μ_i ŝ_i}, and the normal constraints involve the
     * centre's acceleration only ({@code n_i·a = β_i}), so the system of the class comment shrinks to
     * {@code Σ_j (n_i·u_j / m) N_j = β_i − n_i·(g + F_app/m)}, two or three equations solved by Cramer's rule;
     * then {@code m a = m g + F_app + Σ N_j u_j}, {@code I α = τ − r Σ n_j × N_j u_j}. The same forces as the
     * general system (which carries two identity rows per sliding contact), without the 6×6 or 9×9 LU; when the
     * determinant is small against the product of the rows' norms (two contacts pressing along nearly one line)
     * it declines and the general system with its minimum-norm fallback decides.
     *
     * @return false when it declines (nothing written)
     */
    private boolean solveSliding(double[] v, double[] g, double[] fApp, double[] tau) {
        double invM = 1.0 / m;
        double gx = g[0] + fApp[0] * invM;
        double gy = g[1] + fApp[1] * invM;
        double gz = g[2] + fApp[2] * invM;
        double[] a = slideMatrix;
        double[] u = slideForceDir;
        for (int j = 0; j < count; j++) {
            double[] nj = normal[j];
            double mu = frictionRatio[j];
            double[] sj = slideDir[j];
            for (int k = 0; k < 3; k++) {
                u[3 * j + k] = nj[k] - mu * sj[k];
            }
        }
        double[] e = slideRhs;
        for (int i = 0; i < count; i++) {
            double[] ni = normal[i];
            for (int j = 0; j < count; j++) {
                a[3 * i + j] = (ni[0] * u[3 * j] + ni[1] * u[3 * j + 1] + ni[2] * u[3 * j + 2]) * invM;
            }
            e[i] = slidingRhs(i, v) - (ni[0] * gx + ni[1] * gy + ni[2] * gz);
        }
        double[] nf = slideNormal;
        if (count == 2) {
            double det = a[0] * a[4] - a[1] * a[3];
            double scale = Math.hypot(a[0], a[1]) * Math.hypot(a[3], a[4]);
            if (!(Math.abs(det) > SLIDING_SINGULAR * scale)) {
                return false;
            }
            nf[0] = (e[0] * a[4] - a[1] * e[1]) / det;
            nf[1] = (a[0] * e[1] - e[0] * a[3]) / det;
        } else {
            double c0 = a[4] * a[8] - a[5] * a[7];
            double c1 = a[5] * a[6] - a[3] * a[8];
            double c2 = a[3] * a[7] - a[4] * a[6];
            double det = a[0] * c0 + a[1] * c1 + a[2] * c2;
            double scale = Math.sqrt((a[0] * a[0] + a[1] * a[1] + a[2] * a[2]) * (a[3] * a[3] + a[4] * a[4] + a[5] * a[5])
                * (a[6] * a[6] + a[7] * a[7] + a[8] * a[8]));
            if (!(Math.abs(det) > SLIDING_SINGULAR * scale)) {
                return false;
            }
            nf[0] = (e[0] * c0 + a[1] * (a[5] * e[2] - e[1] * a[8]) + a[2] * (e[1] * a[7] - a[4] * e[2])) / det;
            nf[1] = (a[0] * (e[1] * a[8] - a[5] * e[2]) + e[0] * c1 + a[2] * (a[3] * e[2] - e[1] * a[6])) / det;
            nf[2] = (a[0] * (a[4] * e[2] - e[1] * a[7]) + a[1] * (e[1] * a[6] - a[3] * e[2]) + e[0] * c2) / det;
        }
        double invI = 1.0 / inertia;
        acc[0] = gx;
        acc[1] = gy;
        acc[2] = gz;
        for (int k = 0; k < 3; k++) {
            angAcc[k] = tau[k] * invI;
        }
        for (int i = 0; i < count; i++) {
            double[] f = force[i];
            double[] ni = normal[i];
            for (int k = 0; k < 3; k++) {
                f[k] = nf[i] * u[3 * i + k];
            }
            acc[0] += f[0] * invM;
            acc[1] += f[1] * invM;
            acc[2] += f[2] * invM;
            // α −= r n × F / I
            angAcc[0] -= r * (ni[1] * f[2] - ni[2] * f[1]) * invI;
            angAcc[1] -= r * (ni[2] * f[0] - ni[0] * f[2]) * invI;
            angAcc[2] -= r * (ni[0] * f[1] - ni[1] * f[0]) * invI;
        }
        return true;
    }

    /**
     * Solves two rolling contacts on patches that stand still, reading their geometry in place (nothing is
     * copied): the closed form of {@link RollingPair}, or the general system when the normals are nearly
     * parallel or antipodal. Replaces the contacts of the last solve; the results are read as after
     * {@link #solve}.
     *
     * @param n1 unit normal of contact 0, toward the ball
     * @param h1 distance Hessian of contact 0 at the centre (1/m)
     * @param n2 unit normal of contact 1
     * @param h2 distance Hessian of contact 1
     * @param v centre velocity (m/s)
     * @param w spin (rad/s)
     * @param g gravitational acceleration (m/s²)
     * @param fApp applied force (N)
     * @param tau applied torque plus the laws' contact couples (N·m)
     * @return false when the accelerations are not finite (or the general system is singular)
     */
    boolean solveRollingPair(double[] n1, double[] h1, double[] n2, double[] h2, double[] v, double[] w,
                             double[] g, double[] fApp, double[] tau) {
        if (pair.solve(n1, h1, n2, h2, v, w, g, fApp, tau, acc, angAcc, force[0], force[1])) {
            // no contact is stored: a later solve starts from clear() and adds its own
            count = 0;
            summarise(0, n1);
            summarise(1, n2);
            return finite();
        }
        clear();
        addRolling(n1, h1);
        addRolling(n2, h2);
        return solveGeneral(v, w, g, fApp, tau);
    }

    /**
     * Solves by the general linear system, whatever the contacts (no closed form is tried: not
     * {@link RollingPair}, {@link RollingSlidingPair} nor the all-sliding one): what {@link #solve} does for the
     * cases without a closed form, or where one declines; the tests compare the two.
     *
     * @param v centre velocity (m/s)
     * @param w spin (rad/s)
     * @param g gravitational acceleration (m/s²)
     * @param fApp applied force (N)
     * @param tau applied torque plus the laws' contact couples (N·m)
     * @return false when the system is singular beyond the squeeze modes
     */
    boolean solveGeneral(double[] v, double[] w, double[] g, double[] fApp, double[] tau) {
        int n = 3 * count;
        double invM = 1.0 / m;
        double invI = 1.0 / inertia;
        for (int i = 0; i < count; i++) {
            double[] ni = normal[i];
            if (rolling[i]) {
                rollingRhs(i, v, w, tmp);
            }
            for (int c = 0; c < 3; c++) {
                int row = 3 * i + c;
                if (rolling[i]) {
                    active[row] = true;
                    // J row: (e_c, r e_c × n); G column: (e_c, −r n × e_c) = (e_c, r e_c × n)
                    setUnit(jLin[row], c);
                    Vec.cross(jLin[row], ni, jAng[row]);
                    Vec.scale(jAng[row], r);
                    System.arraycopy(jLin[row], 0, gLin[row], 0, 3);
                    System.arraycopy(jAng[row], 0, gAng[row], 0, 3);
                    beta[row] = tmp[c];
                } else if (c == 0) {
                    active[row] = true;
                    System.arraycopy(ni, 0, jLin[row], 0, 3);
                    Vec.zero(jAng[row]);
                    double mu = frictionRatio[i];
                    double[] s = slideDir[i];
                    for (int k = 0; k < 3; k++) {
                        gLin[row][k] = ni[k] - mu * s[k];
                    }
                    // −r n × u
                    Vec.cross(gLin[row], ni, gAng[row]);
                    Vec.scale(gAng[row], r);
                    beta[row] = slidingRhs(i, v);
                } else {
                    active[row] = false;
                }
            }
        }
        mat.reshape(n, n);
        rhs.reshape(n, 1);
        sol.reshape(n, 1);
        for (int p = 0; p < n; p++) {
            if (!active[p]) {
                for (int q = 0; q < n; q++) {
                    mat.unsafe_set(p, q, p == q ? 1.0 : 0.0);
                }
                rhs.unsafe_set(p, 0, 0.0);
                continue;
            }
            double[] jl = jLin[p];
            double[] ja = jAng[p];
            for (int q = 0; q < n; q++) {
                double value = active[q] ? Vec.dot(jl, gLin[q]) * invM + Vec.dot(ja, gAng[q]) * invI : 0.0;
                mat.unsafe_set(p, q, value);
            }
            double free = jl[0] * (g[0] + fApp[0] * invM) + jl[1] * (g[1] + fApp[1] * invM)
                + jl[2] * (g[2] + fApp[2] * invM) + Vec.dot(ja, tau) * invI;
            rhs.unsafe_set(p, 0, beta[p] - free);
        }
        addSqueezeModes(n);
        if (lu.setA(mat) && lu.quality() > SINGULAR) {
            lu.solve(rhs, sol);
        } else {
            // a squeeze the weights do not see (two sliding contacts on one line): the minimum-norm forces,
            // which split it equally; a negative normal force is then released by the caller
            if (pinv == null) {
                pinv = LinearSolverFactory_DDRM.pseudoInverse(true);
                if (pinv instanceof org.ejml.dense.row.linsol.svd.SolvePseudoInverseSvd_DDRM svd) {
                    svd.setThreshold(SINGULAR_VALUE);
                }
            }
            if (!pinv.setA(mat)) {
                return false;
            }
            pinv.solve(rhs, sol);
        }
        // forces, then a and α
        for (int k = 0; k < 3; k++) {
            acc[k] = g[k] + fApp[k] * invM;
            angAcc[k] = tau[k] * invI;
        }
        for (int i = 0; i < count; i++) {
            double[] f = force[i];
            double[] ni = normal[i];
            if (rolling[i]) {
                f[0] = sol.unsafe_get(3 * i, 0);
                f[1] = sol.unsafe_get(3 * i + 1, 0);
                f[2] = sol.unsafe_get(3 * i + 2, 0);
            } else {
                double nf = sol.unsafe_get(3 * i, 0);
                for (int k = 0; k < 3; k++) {
                    f[k] = nf * gLin[3 * i][k];
                }
            }
            Vec.cross(ni, f, tmp);
            for (int k = 0; k < 3; k++) {
                acc[k] += f[k] * invM;
                angAcc[k] -= r * tmp[k] * invI;
            }
        }
        return summarise();
    }

    /** Each contact's normal and tangential force from its force; false when the accelerations are not finite. */
    private boolean summarise() {
        for (int i = 0; i < count; i++) {
            summarise(i, normal[i]);
        }
        return finite();
    }

    /** Contact i's normal and tangential force from its force and its normal. */
    private void summarise(int i, double[] ni) {
        double[] f = force[i];
        double fn = Vec.dot(f, ni);
        normalForce[i] = fn;
        double tx = f[0] - fn * ni[0];
        double ty = f[1] - fn * ni[1];
        double tz = f[2] - fn * ni[2];
        tangentialForce[i] = Math.sqrt(tx * tx + ty * ty + tz * tz);
    }

    /** @return whether the accelerations of the last solve are finite */
    private boolean finite() {
        for (int k = 0; k < 3; k++) {
            if (!Double.isFinite(acc[k]) || !Double.isFinite(angAcc[k])) {
                return false;
            }
        }
        return true;
    }

    /** Adds {@code z (C z)ᵀ} for the chord mode of every pair of rolling contacts. */
    private void addSqueezeModes(int n) {
        for (int i = 0; i < count; i++) {
            for (int j = i + 1; j < count; j++) {
                if (!rolling[i] || !rolling[j]) {
                    continue;
                }
                double[] ni = normal[i];
                double[] nj = normal[j];
                for (int k = 0; k < 3; k++) {
                    unit[k] = ni[k] - nj[k];
                }
                double len = Vec.norm(unit);
                if (!(len > 0)) {
                    continue;
                }
                Vec.scale(unit, 1.0 / len);
                java.util.Arrays.fill(mode, 0, n, 0.0);
                for (int k = 0; k < 3; k++) {
                    mode[3 * i + k] = unit[k];
                    mode[3 * j + k] = -unit[k];
                }
                // tangential weight C z = (P_i e, −P_j e)
                double ei = Vec.dot(unit, ni);
                double ej = Vec.dot(unit, nj);
                java.util.Arrays.fill(weighted, 0, n, 0.0);
                double seen = 0;
                for (int k = 0; k < 3; k++) {
                    double a = unit[k] - ei * ni[k];
                    double b = -(unit[k] - ej * nj[k]);
                    weighted[3 * i + k] = a;
                    weighted[3 * j + k] = b;
                    seen += a * a + b * b;
                }
                if (seen < ANTIPODAL) {
                    // antipodal contacts: the plain minimum norm
                    System.arraycopy(mode, 0, weighted, 0, n);
                }
                // scale the mode to the matrix so that the added block is well conditioned
                double scale = 1.0 / m;
                for (int p = 0; p < n; p++) {
                    if (mode[p] == 0) {
                        continue;
                    }
                    for (int q = 0; q < n; q++) {
                        if (weighted[q] != 0) {
                            mat.unsafe_set(p, q, mat.unsafe_get(p, q) + scale * mode[p] * weighted[q]);
                        }
                    }
                }
            }
        }
    }

    private static void setUnit(double[] out, int axis) {
        out[0] = axis == 0 ? 1 : 0;
        out[1] = axis == 1 ? 1 : 0;
        out[2] = axis == 2 ? 1 : 0;
    }

    /** @return the centre's acceleration a of the last solve (m/s²), live array */
    double[] acceleration() {
        return acc;
    }

    /** @return the angular acceleration α of the last solve (rad/s²), live array */
    double[] angularAcceleration() {
        return angAcc;
    }

    /**
     * @param i contact index
     * @return the contact force of contact i (N), world frame, live array
     */
    double[] force(int i) {
        return force[i];
    }

    /**
     * @param i contact index
     * @return the normal force {@code n_i·F_i} of contact i (N)
     */
    double normalForce(int i) {
        return normalForce[i];
    }

    /**
     * @param i contact index
     * @return the magnitude of the tangential (friction) force of contact i (N): for a rolling contact the
     *     friction the contact must supply, to compare with its grip
     */
    double tangentialForce(int i) {
        return tangentialForce[i];
    }
}
