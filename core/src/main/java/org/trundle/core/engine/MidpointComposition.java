package org.trundle.core.engine;

/**
 * Symmetric compositions of the implicit midpoint rule {@code Φ_h}: a step is
 * {@code Φ_{γ_s h} ∘ … ∘ Φ_{γ_1 h}} with palindromic weights {@code γ} summing to 1, so the composition is
 * symmetric again and its order rises by two per level (E. Hairer, C. Lubich, G. Wanner, Geometric
 * Numerical Integration, 2nd ed., Springer 2006, §II.4 and §V.3; from memory).
 *
 * <ul>
 *   <li>{@link #ORDER_2}: the midpoint rule itself.</li>
 *   <li>{@link #ORDER_4}: the "triple jump" {@code γ₁ = γ₃ = 1/(2 − 2^{1/3})}, {@code γ₂ = 1 − 2γ₁}
 *       (H. Yoshida, Phys. Lett. A 150 (1990) 262; M. Suzuki, Phys. Lett. A 146 (1990) 319; from memory).</li>
 *   <li>{@link #ORDER_6}: Yoshida's seven-stage composition, his solution A
 *       {@code w₁ = −1.17767998417887}, {@code w₂ = 0.235573213359357}, {@code w₃ = 0.784513610477560},
 *       {@code w₀ = 1 − 2(w₁ + w₂ + w₃)}, applied as {@code w₃ w₂ w₁ w₀ w₁ w₂ w₃} (Yoshida 1990, table 1; from
 *       memory; the order test of {@code SymmetricProjectionIntegratorTest} confirms the digits).</li>
 * </ul>
 *
 * <p>Internal to the solver.
 */
enum MidpointComposition {
    /** The implicit midpoint rule (order 2, one stage). */
    ORDER_2(2, new double[] {1.0}),
    /** The triple jump (order 4, three stages). */
    ORDER_4(4, tripleJump()),
    /** Yoshida's solution A (order 6, seven stages). */
    ORDER_6(6, yoshidaSix());

    private final int order;
    private final double[] weights;

    MidpointComposition(int order, double[] weights) {
        this.order = order;
        this.weights = weights;
    }

    /** @return the classical order of the composition */
    int order() {
        return order;
    }

    /** @return the number of midpoint stages per step */
    int stages() {
        return weights.length;
    }

    /**
     * @param i stage index
     * @return the fraction {@code γ_i} of the step that stage {@code i} advances
     */
    double weight(int i) {
        return weights[i];
    }

    /**
     * The composition of a given order.
     *
     * @param order 2, 4 or 6
     * @return the composition
     * @throws IllegalArgumentException for another order, naming it
     */
    static MidpointComposition ofOrder(int order) {
        for (MidpointComposition c : values()) {
            if (c.order == order) {
                return c;
            }
        }
        throw new IllegalArgumentException("order of the symmetric integrator must be 2, 4 or 6, got " + order);
    }

    private static double[] tripleJump() {
        double g1 = 1.0 / (2.0 - Math.cbrt(2.0));
        return new double[] {g1, 1.0 - 2.0 * g1, g1};
    }

    private static double[] yoshidaSix() {
        double w1 = -1.17767998417887;
        double w2 = 0.235573213359357;
        double w3 = 0.784513610477560;
        double w0 = 1.0 - 2.0 * (w1 + w2 + w3);
        return new double[] {w3, w2, w1, w0, w1, w2, w3};
    }
}
