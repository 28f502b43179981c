package org.trundle.core.check;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Slab;
import org.trundle.core.Surface;

/**
 * A surface carried by a rigid motion {@code x ↦ R x + b}: the query maps the point back,
 * {@code x₀ = Rᵀ(x − b)}, asks the base surface, and maps the answer forward (point
 * {@code R p₀ + b}, normal {@code R n₀}, Hessian {@code R H₀ Rᵀ}; distance, curvatures and patch
 * margin unchanged). Kit-internal, used by the frame-invariance check; allocation-free (the inner
 * workspace lives in the run's scratch).
 */
final class RigidlyMovedSurface implements Surface {
    private final Surface base;
    private final Rotation rotation;
    private final Vector3D translation;
    private final double[] m = new double[9];
    private final double bx;
    private final double by;
    private final double bz;

    RigidlyMovedSurface(Surface base, Rotation rotation, Vector3D translation) {
        this.base = base;
        this.rotation = rotation;
        this.translation = translation;
        double[][] a = rotation.getMatrix();
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                m[3 * i + j] = a[i][j];
            }
        }
        bx = translation.getX();
        by = translation.getY();
        bz = translation.getZ();
    }

    /** Per-run workspace: the base surface's geometry and a local point. */
    private static final class Work {
        final ContactGeometry inner = new ContactGeometry();
        final double[] x0 = new double[3];
    }

    @Override
    public Object newScratch() {
        Work w = new Work();
        w.inner.scratch = base.newScratch();
        return w;
    }

    @Override
    public void query(double t, double[] x, ContactGeometry out) {
        if (!(out.scratch instanceof Work)) {
            out.scratch = newScratch();
        }
        Work w = (Work) out.scratch;
        double dx = x[0] - bx;
        double dy = x[1] - by;
        double dz = x[2] - bz;
        // x0 = R^T (x - b)
        w.x0[0] = m[0] * dx + m[3] * dy + m[6] * dz;
        w.x0[1] = m[1] * dx + m[4] * dy + m[7] * dz;
        w.x0[2] = m[2] * dx + m[5] * dy + m[8] * dz;
        ContactGeometry g = w.inner;
        base.query(t, w.x0, g);
        for (int i = 0; i < 3; i++) {
            out.point[i] = m[3 * i] * g.point[0] + m[3 * i + 1] * g.point[1] + m[3 * i + 2] * g.point[2];
            out.normal[i] = m[3 * i] * g.normal[0] + m[3 * i + 1] * g.normal[1] + m[3 * i + 2] * g.normal[2];
        }
        out.point[0] += bx;
        out.point[1] += by;
        out.point[2] += bz;
        // H = R H0 R^T
        double[] h = g.hessian;
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                double s = 0;
                for (int a = 0; a < 3; a++) {
                    double ra = m[3 * i + a];
                    for (int b = 0; b < 3; b++) {
                        s += ra * h[3 * a + b] * m[3 * j + b];
                    }
                }
                out.hessian[3 * i + j] = s;
            }
        }
        out.distance = g.distance;
        out.curvature1 = g.curvature1;
        out.curvature2 = g.curvature2;
        out.patchMargin = g.patchMargin;
        out.edge = g.edge;
    }

    /** The base surface's slabs, carried by the motion. */
    @Override
    public List<Slab> extent() {
        List<Slab> out = new ArrayList<>();
        for (Slab s : base.extent()) {
            out.add(s.moved(rotation, translation));
        }
        return out;
    }

    @Override
    public String name() {
        return "moved(" + base.name() + ")";
    }

    @Override
    public boolean hasEdges() {
        return base.hasEdges();
    }

    @Override
    public String edgeName(int edge) {
        return base.edgeName(edge);
    }

    @Override
    public double maxConcaveCurvature() {
        return base.maxConcaveCurvature();
    }
}
