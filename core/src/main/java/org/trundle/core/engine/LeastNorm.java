package org.trundle.core.engine;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;

/**
 * The weighted least-norm solution of a small underdetermined (or rank-deficient) linear system, for the
 * projections onto several contacts' constraints: among all {@code x} with {@code A x = b} (in the
 * least-squares sense when {@code b} is not in the range), the one minimising {@code xᵀ W x} for a diagonal
 * weight {@code W}: {@code x = W⁻¹ Aᵀ (A W⁻¹ Aᵀ)⁺ b}, with the Moore–Penrose pseudo-inverse from EJML's SVD
 * (common practice: the minimum-norm solution of constrained least squares). Used at switches and
 * projections only (it allocates), never on the hot path.
 */
final class LeastNorm {
    private LeastNorm() {
    }

    /**
     * @param rows the rows of A (p × n)
     * @param inverseWeight the diagonal of {@code W⁻¹} (n)
     * @param b the right-hand side (p)
     * @return x (n)
     */
    static double[] solve(double[][] rows, double[] inverseWeight, double[] b) {
        double[] lambda = multipliers(rows, inverseWeight, b);
        int p = rows.length;
        int n = inverseWeight.length;
        double[] x = new double[n];
        for (int c = 0; c < n; c++) {
            double s = 0;
            for (int i = 0; i < p; i++) {
                s += rows[i][c] * lambda[i];
            }
            x[c] = inverseWeight[c] * s;
        }
        return x;
    }

    /**
     * The multipliers {@code λ = (A W⁻¹ Aᵀ)⁺ b} of {@link #solve} ({@code x = W⁻¹ Aᵀ λ}): with {@code W} the mass
     * matrix they are the impulses per constraint row (over the mass).
     *
     * @param rows the rows of A (p × n)
     * @param inverseWeight the diagonal of {@code W⁻¹} (n)
     * @param b the right-hand side (p)
     * @return λ (p)
     */
    static double[] multipliers(double[][] rows, double[] inverseWeight, double[] b) {
        int p = rows.length;
        int n = inverseWeight.length;
        DMatrixRMaj aw = new DMatrixRMaj(p, p);
        for (int i = 0; i < p; i++) {
            for (int j = 0; j < p; j++) {
                double s = 0;
                for (int c = 0; c < n; c++) {
                    s += rows[i][c] * inverseWeight[c] * rows[j][c];
                }
                aw.set(i, j, s);
            }
        }
        DMatrixRMaj inv = new DMatrixRMaj(p, p);
        CommonOps_DDRM.pinv(aw, inv);
        double[] lambda = new double[p];
        for (int i = 0; i < p; i++) {
            double s = 0;
            for (int j = 0; j < p; j++) {
                s += inv.get(i, j) * b[j];
            }
            lambda[i] = s;
        }
        return lambda;
    }
}
