package org.trundle.surfaces;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.trundle.core.ContactGeometry;
import org.trundle.core.Surface;

/**
 * Checks of a surface's contact geometry against its own distance field by central finite
 * differences (common practice: the central difference has error O(h²) in the step h).
 */
final class GeometryAssertions {
    private GeometryAssertions() {
    }

    static ContactGeometry query(Surface s, double[] x) {
        ContactGeometry g = new ContactGeometry();
        g.scratch = s.newScratch();
        s.query(0.0, x, g);
        return g;
    }

    static double distance(Surface s, double[] x) {
        return query(s, x).distance;
    }

    /**
     * Normal = ∇d, H = ∇²d by central differences with step h = 1e-4·L (relative errors ~1e-7 for
     * the Hessian, ~1e-9 for the normal); consistency p = x − d n, |n| = 1, H n = 0, symmetric H,
     * and the tangential eigenvalues of H equal −κ/(1 − dκ) for the reported curvatures κ.
     *
     * @param s the surface
     * @param x query point
     * @param len length scale of the shape (m)
     * @return the largest relative finite-difference error seen
     */
    static double checkAgainstFiniteDifferences(Surface s, double[] x, double len) {
        ContactGeometry g = query(s, x);
        String where = s.name() + " at (" + x[0] + ", " + x[1] + ", " + x[2] + ")";
        double nn = Math.sqrt(g.normal[0] * g.normal[0] + g.normal[1] * g.normal[1] + g.normal[2] * g.normal[2]);
        assertTrue(Math.abs(nn - 1) < 1e-13, "unit normal " + nn + " " + where);
        for (int i = 0; i < 3; i++) {
            double pi = x[i] - g.distance * g.normal[i];
            assertTrue(Math.abs(pi - g.point[i]) < 1e-12 * len, "p = x - d n " + where);
        }
        double dp = distance(s, g.point);
        assertTrue(Math.abs(dp) < 1e-12 * len, "closest point on the surface: d(p) = " + dp + " " + where);
        double h = 1e-4 * len;
        double worst = 0;
        double[] y = new double[3];
        double d0 = g.distance;
        for (int i = 0; i < 3; i++) {
            System.arraycopy(x, 0, y, 0, 3);
            y[i] = x[i] + h;
            double dPlus = distance(s, y);
            y[i] = x[i] - h;
            double dMinus = distance(s, y);
            double grad = (dPlus - dMinus) / (2 * h);
            double e = Math.abs(grad - g.normal[i]);
            assertTrue(e < 1e-7, "normal[" + i + "] " + g.normal[i] + " vs FD " + grad + " " + where);
            worst = Math.max(worst, e);
            for (int j = 0; j < 3; j++) {
                double hij;
                if (i == j) {
                    hij = (dPlus - 2 * d0 + dMinus) / (h * h);
                } else {
                    System.arraycopy(x, 0, y, 0, 3);
                    y[i] += h;
                    y[j] += h;
                    double pp = distance(s, y);
                    y[j] -= 2 * h;
                    double pm = distance(s, y);
                    y[i] -= 2 * h;
                    double mm = distance(s, y);
                    y[j] += 2 * h;
                    double mp = distance(s, y);
                    hij = (pp - pm - mp + mm) / (4 * h * h);
                }
                double err = Math.abs(hij - g.hessian[3 * i + j]) * len;
                assertTrue(err < 2e-5, "H[" + i + "][" + j + "] " + g.hessian[3 * i + j] + " vs FD " + hij + " " + where);
                worst = Math.max(worst, err);
                assertTrue(Math.abs(g.hessian[3 * i + j] - g.hessian[3 * j + i]) * len < 1e-13, "symmetric H " + where);
            }
            double hn = g.hessian[3 * i] * g.normal[0] + g.hessian[3 * i + 1] * g.normal[1] + g.hessian[3 * i + 2] * g.normal[2];
            assertTrue(Math.abs(hn) * len < 1e-12, "H n = 0 " + where);
        }
        assertTrue(g.curvature1 >= g.curvature2, "curvature1 >= curvature2 " + where);
        // tangential eigenvalues of H: -k/(1 - d k) (H = W (I + dW)^-1 with W = -k); compare trace
        // and the second invariant
        double e1 = -g.curvature1 / (1 - d0 * g.curvature1);
        double e2 = -g.curvature2 / (1 - d0 * g.curvature2);
        double[] m = g.hessian;
        double tr = m[0] + m[4] + m[8];
        double m2 = m[0] * m[4] - m[1] * m[3] + m[0] * m[8] - m[2] * m[6] + m[4] * m[8] - m[5] * m[7];
        assertTrue(Math.abs(tr - (e1 + e2)) * len < 1e-11, "trace H " + tr + " vs curvatures " + (e1 + e2) + " " + where);
        assertTrue(Math.abs(m2 - e1 * e2) * len * len < 1e-10, "invariant of H " + m2 + " vs " + e1 * e2 + " " + where);
        return worst;
    }
}
