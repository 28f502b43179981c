package org.trundle.surfaces;

import java.util.Arrays;

import org.trundle.core.TriangleMesh;

/**
 * A triangle mesh of a parametric patch {@code x(α, β)} over a rectangle of its two coordinates,
 * each split into equal cells, two triangles per cell; a coordinate that runs a full turn is
 * closed (its last column joins the first, no seam vertices). Triangles with two equal vertices
 * (a pole, a cone's apex) are left out. Package-private.
 */
final class GridMesh {
    /** A parametric patch: writes the point at coordinates (α, β) (m). */
    interface Patch {
        void point(double alpha, double beta, double[] out);
    }

    private GridMesh() {
    }

    /**
     * @param patch the parametrisation
     * @param a0 first coordinate's lower end
     * @param a1 its upper end
     * @param na its number of cells, at least 1
     * @param closeA whether it runs a full turn (then {@code a1} is {@code a0} again)
     * @param b0 second coordinate's lower end
     * @param b1 its upper end
     * @param nb its number of cells, at least 1
     * @param closeB whether it runs a full turn
     * @return the mesh
     */
    static TriangleMesh of(Patch patch, double a0, double a1, int na, boolean closeA,
                           double b0, double b1, int nb, boolean closeB) {
        int ca = closeA ? na : na + 1;
        int cb = closeB ? nb : nb + 1;
        double[] v = new double[3 * ca * cb];
        double[] p = new double[3];
        for (int i = 0; i < ca; i++) {
            double a = i == na ? a1 : a0 + (a1 - a0) * i / na;
            for (int j = 0; j < cb; j++) {
                double b = j == nb ? b1 : b0 + (b1 - b0) * j / nb;
                patch.point(a, b, p);
                System.arraycopy(p, 0, v, 3 * (i * cb + j), 3);
            }
        }
        int[] t = new int[6 * na * nb];
        int n = 0;
        for (int i = 0; i < na; i++) {
            int i1 = (i + 1) % ca;
            for (int j = 0; j < nb; j++) {
                int j1 = (j + 1) % cb;
                int q00 = i * cb + j;
                int q10 = i1 * cb + j;
                int q01 = i * cb + j1;
                int q11 = i1 * cb + j1;
                n = add(t, n, v, q00, q10, q11);
                n = add(t, n, v, q00, q11, q01);
            }
        }
        return TriangleMesh.of(v, Arrays.copyOf(t, n));
    }

    private static int add(int[] t, int n, double[] v, int a, int b, int c) {
        if (same(v, a, b) || same(v, b, c) || same(v, a, c)) {
            return n;
        }
        t[n] = a;
        t[n + 1] = b;
        t[n + 2] = c;
        return n + 3;
    }

    private static boolean same(double[] v, int a, int b) {
        return v[3 * a] == v[3 * b] && v[3 * a + 1] == v[3 * b + 1] && v[3 * a + 2] == v[3 * b + 2];
    }

    /**
     * @param resolution the caller's cells per coordinate
     * @return it, when at least 2
     */
    static int cells(int resolution) {
        if (resolution < 2 || resolution > 100_000) {
            throw new IllegalArgumentException("mesh resolution must lie in [2, 100000] cells, got " + resolution);
        }
        return resolution;
    }
}
