package org.trundle.surfaces;

import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;

import org.trundle.core.Box;
import org.trundle.core.ContactGeometry;
import org.trundle.core.SurfaceDomainException;
import org.trundle.core.TriangleMesh;

/**
 * The zero set of an {@link ImplicitSurface}'s function inside a box, as a triangle mesh: the box
 * is split into cubes of side {@code h} (the longest box side over the resolution), each cube into
 * the six tetrahedra of the Kuhn (Freudenthal) triangulation along its main diagonal (conforming
 * across cubes), and each tetrahedron whose corners change sign gives one triangle or two
 * (marching tetrahedra; common practice). Each vertex, first placed on its edge by linear
 * interpolation of {@code f}, is then moved onto the surface by the surface's own Newton projection
 * (its closest point), so it lies on {@code f = 0} to the projection tolerance. Vertices whose
 * projection fails (a focal point) are dropped with their triangles. Package-private.
 */
final class MarchingTetrahedra {
    /** Corner offsets of a cube, bit 0 = x, bit 1 = y, bit 2 = z. */
    private static final int[][] KUHN = {
        {0, 1, 3, 7}, {0, 1, 5, 7}, {0, 2, 3, 7}, {0, 2, 6, 7}, {0, 4, 5, 7}, {0, 4, 6, 7}};

    private MarchingTetrahedra() {
    }

    static TriangleMesh of(ImplicitSurface surface, Box box, int resolution) {
        int res = GridMesh.cells(resolution);
        double h = Math.max(box.size(0), Math.max(box.size(1), box.size(2))) / res;
        int[] n = new int[3];
        for (int a = 0; a < 3; a++) {
            n[a] = Math.max(1, (int) Math.ceil(box.size(a) / h - 1e-9));
        }
        double[] lo = box.min().toArray();
        double[] hi = box.max().toArray();
        int nx = n[0] + 1;
        int ny = n[1] + 1;
        int nz = n[2] + 1;
        double[] f = new double[nx * ny * nz];
        for (int k = 0; k < nz; k++) {
            for (int j = 0; j < ny; j++) {
                for (int i = 0; i < nx; i++) {
                    double[] p = node(lo, hi, n, i, j, k);
                    f[(k * ny + j) * nx + i] = surface.value(p[0], p[1], p[2]);
                }
            }
        }
        Map<Long, Integer> edges = new HashMap<>();
        double[] v = new double[3 * 1024];
        int[] t = new int[3 * 1024];
        int nv = 0;
        int nt = 0;
        int[] corner = new int[4];
        long[] keys = new long[6];
        int[] tri = new int[6];
        long total = (long) nx * ny * nz;
        ContactGeometry work = new ContactGeometry();
        work.scratch = surface.newScratch();
        double[] q = new double[3];
        for (int k = 0; k < n[2]; k++) {
            for (int j = 0; j < n[1]; j++) {
                for (int i = 0; i < n[0]; i++) {
                    for (int[] tet : KUHN) {
                        int neg = 0;
                        for (int c = 0; c < 4; c++) {
                            int o = tet[c];
                            corner[c] = ((k + (o >> 2)) * ny + j + ((o >> 1) & 1)) * nx + i + (o & 1);
                            if (f[corner[c]] < 0) {
                                neg++;
                            }
                        }
                        if (neg == 0 || neg == 4) {
                            continue;
                        }
                        // order corners: negative ones first
                        int[] in = new int[4];
                        int a = 0;
                        int b = 3;
                        for (int c = 0; c < 4; c++) {
                            if (f[corner[c]] < 0) {
                                in[a++] = corner[c];
                            } else {
                                in[b--] = corner[c];
                            }
                        }
                        int count;
                        if (neg == 1 || neg == 3) {
                            int lone = neg == 1 ? in[0] : in[3];
                            int[] others = neg == 1 ? new int[] {in[1], in[2], in[3]} : new int[] {in[0], in[1], in[2]};
                            for (int c = 0; c < 3; c++) {
                                keys[c] = edgeKey(lone, others[c], total);
                            }
                            count = 1;
                        } else {
                            // negatives in[0], in[1]; positives in[2], in[3]: the cycle 02, 03, 13, 12
                            keys[0] = edgeKey(in[0], in[2], total);
                            keys[1] = edgeKey(in[0], in[3], total);
                            keys[2] = edgeKey(in[1], in[3], total);
                            keys[3] = keys[0];
                            keys[4] = keys[2];
                            keys[5] = edgeKey(in[1], in[2], total);
                            count = 2;
                        }
                        for (int c = 0; c < 3 * count; c++) {
                            long key = keys[c];
                            Integer idx = edges.get(key);
                            if (idx == null) {
                                int ea = (int) (key / total);
                                int eb = (int) (key % total);
                                double[] pa = nodeOf(lo, hi, n, ea, nx, ny);
                                double[] pb = nodeOf(lo, hi, n, eb, nx, ny);
                                double w = f[ea] / (f[ea] - f[eb]);
                                for (int d = 0; d < 3; d++) {
                                    q[d] = pa[d] + w * (pb[d] - pa[d]);
                                }
                                idx = -1;
                                try {
                                    work.hintValid = false;
                                    surface.query(0.0, q, work);
                                    if (nv * 3 + 3 > v.length) {
                                        v = Arrays.copyOf(v, 2 * v.length);
                                    }
                                    System.arraycopy(work.point, 0, v, 3 * nv, 3);
                                    idx = nv++;
                                } catch (SurfaceDomainException e) {
                                    // a focal point: no vertex here
                                }
                                edges.put(key, idx);
                            }
                            tri[c] = idx;
                        }
                        for (int c = 0; c < count; c++) {
                            int x = tri[3 * c];
                            int y = tri[3 * c + 1];
                            int z = tri[3 * c + 2];
                            if (x < 0 || y < 0 || z < 0 || x == y || y == z || x == z) {
                                continue;
                            }
                            if (nt + 3 > t.length) {
                                t = Arrays.copyOf(t, 2 * t.length);
                            }
                            t[nt++] = x;
                            t[nt++] = y;
                            t[nt++] = z;
                        }
                    }
                }
            }
        }
        return TriangleMesh.of(Arrays.copyOf(v, 3 * nv), Arrays.copyOf(t, nt));
    }

    /** One key per grid edge, the same from both of its ends. */
    private static long edgeKey(int a, int b, long total) {
        return Math.min(a, b) * total + Math.max(a, b);
    }

    private static double[] nodeOf(double[] lo, double[] hi, int[] n, int index, int nx, int ny) {
        int i = index % nx;
        int j = (index / nx) % ny;
        int k = index / (nx * ny);
        return node(lo, hi, n, i, j, k);
    }

    private static double[] node(double[] lo, double[] hi, int[] n, int i, int j, int k) {
        return new double[] {
            i == n[0] ? hi[0] : lo[0] + (hi[0] - lo[0]) * i / n[0],
            j == n[1] ? hi[1] : lo[1] + (hi[1] - lo[1]) * j / n[1],
            k == n[2] ? hi[2] : lo[2] + (hi[2] - lo[2]) * k / n[2]};
    }
}
