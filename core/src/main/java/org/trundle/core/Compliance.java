package org.trundle.core;

import org.trundle.core.internal.Checks;

import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;

/**
 * A compliant normal contact: the Hertz force–approach law with Hunt–Crossley damping,
 * <pre>
 *   F = K δ^{3/2} (1 + c δ̇),   c = χ(e) / v₀
 * </pre>
 * with the approach {@code δ = r − d ≥ 0} (m), its rate {@code δ̇} (m/s, positive while the ball moves in),
 * the stiffness {@code K} (N/m^{3/2}) from the materials and the local principal curvatures of ball and
 * wall (the exact Hertz solution; see {@code org.trundle.contact.HertzStiffness}), and the damping set from
 * the coefficient of restitution {@code e} and the normal speed {@code v₀} at which this contact began
 * (K. H. Hunt &amp; F. R. E. Crossley, "Coefficient of restitution interpreted as damping in vibroimpact",
 * J. Appl. Mech. 42 (1975) 440–445). The force never pulls: it is clamped at zero.
 *
 * <p><b>Damping from restitution.</b> Without other forces the impact obeys
 * {@code m δ̇ dδ̇/dδ = −K δ^{3/2} (1 + c δ̇)}, which separates:
 * {@code m δ̇ dδ̇/(1 + c δ̇) = −K δ^{3/2} dδ}. Over the whole impact {@code δ} returns to zero, so the right
 * side integrates to zero and the speeds in ({@code v₀}) and out ({@code −e v₀}) satisfy exactly
 * <pre>
 *   χ (1 + e) = ln[(1 + χ)/(1 − e χ)],    χ = c v₀
 * </pre>
 * (derived here; it does not depend on {@code K} or {@code m}). Its positive root {@code χ < 1/e} is found
 * once by a bracketing Brent solve (Hipparchus); to first order in {@code 1 − e} it is Hunt &amp; Crossley's
 * own {@code χ = 3(1 − e)/2}, and for {@code e = 1} there is no damping. The relation is exact for the
 * isolated normal impact; gravity and friction during the impact change the rebound by the ratio of their
 * impulse to the contact impulse (tiny for stiff contacts). Restitutions from 0.1 to 1 are accepted: the
 * root crowds toward {@code 1/e} as {@code e} falls ({@code 1 − eχ ≈ (1 + 1/e) exp(−(1 + e)/e)}, about
 * {@code 2e-4} at {@code e = 0.1}), the force nearly vanishes while the ball moves out, and at
 * {@code e → 0} the model would need infinite damping; Hunt &amp; Crossley proposed it for restitutions
 * near 1.
 *
 * <p>The power the damping takes from the ball, {@code K δ^{3/2} c δ̇²} (W), is booked as
 * {@link LossKind#CONTACT_DAMPING}; the elastic energy {@code (2/5) K δ^{5/2}} (J) is stored in the contact
 * and returned.
 *
 * <p>Immutable and thread-safe.
 */
public final class Compliance {
    /** The stiffness of a contact as a function of the ball radius and the wall's principal curvatures. */
    @FunctionalInterface
    public interface Stiffness {
        /**
         * @param ballRadius ball radius r (m)
         * @param curvature1 wall's first principal curvature (1/m), positive concave toward the ball
         * @param curvature2 wall's second principal curvature (1/m)
         * @return K of {@code F = K δ^{3/2}} (N/m^{3/2}), finite and positive
         */
        double of(double ballRadius, double curvature1, double curvature2);
    }

    /** Smallest restitution accepted. */
    public static final double MIN_RESTITUTION = 0.1;

    private final Stiffness stiffness;
    private final double restitution;
    private final double dampingFactor;
    private final String description;

    private Compliance(Stiffness stiffness, double restitution, String description) {
        if (stiffness == null) {
            throw new IllegalArgumentException("stiffness must be given, got null");
        }
        if (!(restitution >= MIN_RESTITUTION && restitution <= 1)) {
            throw new IllegalArgumentException("compliant contact restitution must lie in [" + MIN_RESTITUTION
                + ", 1], got " + restitution);
        }
        this.stiffness = stiffness;
        this.restitution = restitution;
        this.dampingFactor = dampingFactorFor(restitution);
        this.description = description;
    }

    /**
     * A compliant contact of constant stiffness.
     *
     * @param stiffness K (N/m^{3/2}), finite and positive
     * @param restitution coefficient of restitution e in [0.1, 1]
     * @return the contact
     */
    public static Compliance of(double stiffness, double restitution) {
        double k = Checks.positive("compliant contact stiffness", stiffness);
        return new Compliance((r, k1, k2) -> k, restitution, "K=" + stiffness + " N/m^1.5, e=" + restitution);
    }

    /**
     * A compliant contact whose stiffness follows the local curvatures (e.g. the exact Hertz solution).
     *
     * @param stiffness the stiffness model
     * @param restitution coefficient of restitution e in [0.1, 1]
     * @return the contact
     */
    public static Compliance of(Stiffness stiffness, double restitution) {
        return new Compliance(stiffness, restitution, "stiffness " + stiffness + ", e=" + restitution);
    }

    /**
     * The stiffness at a contact, checked.
     *
     * @param ballRadius ball radius (m)
     * @param curvature1 first principal curvature (1/m)
     * @param curvature2 second principal curvature (1/m)
     * @return K (N/m^{3/2})
     */
    public double stiffness(double ballRadius, double curvature1, double curvature2) {
        double k = stiffness.of(ballRadius, curvature1, curvature2);
        if (!(k > 0 && k < Double.POSITIVE_INFINITY)) {
            throw new IllegalStateException("compliant contact stiffness must be finite and positive, got " + k
                + " for curvatures " + curvature1 + ", " + curvature2 + " 1/m");
        }
        return k;
    }

    /** @return the coefficient of restitution e */
    public double restitution() {
        return restitution;
    }

    /** @return the dimensionless damping factor χ(e) = c v₀ */
    public double dampingFactor() {
        return dampingFactor;
    }

    /**
     * The normal force {@code K δ^{3/2}(1 + χ δ̇/v₀)}, clamped at zero; zero when {@code δ ≤ 0}.
     *
     * @param k stiffness K (N/m^{3/2})
     * @param approach δ (m)
     * @param approachRate δ̇ (m/s), positive moving in
     * @param impactSpeed v₀ (m/s), positive: the normal speed at which this contact began
     * @return F (N)
     */
    public double force(double k, double approach, double approachRate, double impactSpeed) {
        if (!(approach > 0)) {
            return 0.0;
        }
        double f = k * approach * Math.sqrt(approach) * (1 + dampingFactor * approachRate / impactSpeed);
        return Math.max(f, 0.0);
    }

    /**
     * The elastic energy stored at approach δ, {@code (2/5) K δ^{5/2}} (J).
     *
     * @param k stiffness (N/m^{3/2})
     * @param approach δ (m)
     * @return energy (J); zero when {@code δ ≤ 0}
     */
    public static double elasticEnergy(double k, double approach) {
        return approach > 0 ? 0.4 * k * approach * approach * Math.sqrt(approach) : 0.0;
    }

    /**
     * Solves {@code χ (1 + e) = ln[(1 + χ)/(1 − e χ)]} for its positive root.
     *
     * @param e restitution in [0.1, 1]
     * @return χ ≥ 0 (0 for e = 1)
     */
    public static double dampingFactorFor(double e) {
        if (!(e >= MIN_RESTITUTION && e <= 1)) {
            throw new IllegalArgumentException("restitution must lie in [" + MIN_RESTITUTION + ", 1], got " + e);
        }
        if (e == 1) {
            return 0.0;
        }
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(1e-16, 1e-15, 0.0, 5);
        double hi = (1 - 1e-12) / e;
        return solver.solve(500, x -> relationOverSquare(x, e), 0.0, hi);
    }

    /**
     * {@code [ln((1 + χ)/(1 − eχ)) − χ(1 + e)]/χ²}: negative at 0 ({@code (e² − 1)/2}), growing without
     * bound toward {@code 1/e}; by its power series {@code Σ_{n≥2} ((−1)^{n+1} + eⁿ) χ^{n−2}/n} where that
     * converges fast ({@code χ ≤ 1/4}), free of the cancellation of the closed form near zero.
     */
    static double relationOverSquare(double x, double e) {
        if (x <= 0.25) {
            double sum = 0;
            double xp = 1;
            double ep = e;
            double sign = -1;
            for (int n = 2; n < 60; n++) {
                ep *= e;
                double term = (sign + ep) * xp / n;
                sum += term;
                xp *= x;
                sign = -sign;
                if (Math.abs(term) < 1e-18 * Math.abs(sum) && n > 4) {
                    break;
                }
            }
            return sum;
        }
        return (Math.log1p(x) - Math.log1p(-e * x) - x * (1 + e)) / (x * x);
    }

    @Override
    public String toString() {
        return "Compliance[" + description + "]";
    }
}
