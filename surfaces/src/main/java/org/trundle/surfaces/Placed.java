package org.trundle.surfaces;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.Box;
import org.trundle.core.internal.Checks;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Slab;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceCoordinate;
import org.trundle.core.TriangleMesh;

/**
 * Any surface placed in the world by a rigid transform {@code x_world = Q x_local + t}: the rotation
 * {@code Q} (applied as {@link Rotation#applyTo(Vector3D)}, local → world) and the translation
 * {@code t} (m) are held once here, not inside the placed surface.
 *
 * <p>A query maps the point to the local frame, {@code x_l = Qᵀ (x − t)}, queries the local surface,
 * and maps the results back: {@code p = Q p_l + t}, {@code n = Q n_l}, {@code H = Q H_l Qᵀ}; the
 * distance, curvatures and patch margin are invariant under rigid motion. The local query's
 * workspace (with its own hint) lives in the run's {@link ContactGeometry#scratch}, so the wrapper
 * allocates nothing per query.
 *
 * <p>The mesh is the local surface's mesh moved by the transform (the requested world box is
 * handed to the local surface as the local box that holds it, so an unbounded patch may overhang
 * the world box); the coordinates are the local surface's, of the point mapped to the local frame.
 *
 * <p>Immutable and thread-safe when the placed surface is.
 */
public final class Placed implements Surface {
    private final Surface local;
    private final Rotation rotation;
    private final double tx;
    private final double ty;
    private final double tz;
    /** Row-major rotation matrix Q (local → world). */
    private final double[] q = new double[9];

    /** Per-run workspace of the local query. */
    private static final class Work {
        final ContactGeometry geo = new ContactGeometry();
        final double[] x = new double[3];
        final double[] tmp = new double[9];
    }

    /**
     * @param local the surface in its own frame
     * @param rotation rotation Q from the local frame to the world frame
     * @param translation position t of the local origin in the world (m)
     */
    public Placed(Surface local, Rotation rotation, Vector3D translation) {
        if (local == null) {
            throw new IllegalArgumentException("placed surface must be given, got null");
        }
        if (rotation == null) {
            throw new IllegalArgumentException("rotation must be given, got null");
        }
        Checks.finite("translation", translation);
        this.local = local;
        this.rotation = rotation;
        Vector3D c0 = rotation.applyTo(Vector3D.PLUS_I);
        Vector3D c1 = rotation.applyTo(Vector3D.PLUS_J);
        Vector3D c2 = rotation.applyTo(Vector3D.PLUS_K);
        Vector3D[] cols = {c0, c1, c2};
        for (int j = 0; j < 3; j++) {
            q[j] = cols[j].getX();
            q[3 + j] = cols[j].getY();
            q[6 + j] = cols[j].getZ();
        }
        tx = translation.getX();
        ty = translation.getY();
        tz = translation.getZ();
    }

    /** @return the surface in its own frame */
    public Surface local() {
        return local;
    }

    /** @return the rotation local → world */
    public Rotation rotation() {
        return rotation;
    }

    /** @return the translation (m) */
    public Vector3D translation() {
        return new Vector3D(tx, ty, tz);
    }

    @Override
    public Object newScratch() {
        Work w = new Work();
        w.geo.scratch = local.newScratch();
        return w;
    }

    @Override
    public void query(double t, double[] x, ContactGeometry out) {
        Work w = out.scratch instanceof Work ? (Work) out.scratch : null;
        if (w == null) {
            // a workspace made without newScratch(): make ours once and keep it for the run
            w = (Work) newScratch();
            out.scratch = w;
        }
        ContactGeometry g = w.geo;
        if (!out.hintValid) {
            g.hintValid = false;
        }
        toLocal(x, w.x);
        local.query(t, w.x, g);
        rotate(g.point, out.point);
        out.point[0] += tx;
        out.point[1] += ty;
        out.point[2] += tz;
        rotate(g.normal, out.normal);
        // H = Q H_l Q^T
        double[] h = g.hessian;
        double[] m = w.tmp;
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                m[3 * i + j] = q[3 * i] * h[j] + q[3 * i + 1] * h[3 + j] + q[3 * i + 2] * h[6 + j];
            }
        }
        for (int i = 0; i < 3; i++) {
            for (int j = i; j < 3; j++) {
                double v = m[3 * i] * q[3 * j] + m[3 * i + 1] * q[3 * j + 1] + m[3 * i + 2] * q[3 * j + 2];
                out.hessian[3 * i + j] = v;
                out.hessian[3 * j + i] = v;
            }
        }
        out.distance = g.distance;
        out.curvature1 = g.curvature1;
        out.curvature2 = g.curvature2;
        out.patchMargin = g.patchMargin;
        out.edge = g.edge;
        out.hintValid = true;
    }

    /** x_l = Qᵀ (x − t). */
    private void toLocal(double[] x, double[] o) {
        double dx = x[0] - tx;
        double dy = x[1] - ty;
        double dz = x[2] - tz;
        o[0] = q[0] * dx + q[3] * dy + q[6] * dz;
        o[1] = q[1] * dx + q[4] * dy + q[7] * dz;
        o[2] = q[2] * dx + q[5] * dy + q[8] * dz;
    }

    private void rotate(double[] v, double[] o) {
        double a = v[0];
        double b = v[1];
        double c = v[2];
        o[0] = q[0] * a + q[1] * b + q[2] * c;
        o[1] = q[3] * a + q[4] * b + q[5] * c;
        o[2] = q[6] * a + q[7] * b + q[8] * c;
    }

    @Override
    public TriangleMesh mesh(Box extent, int resolution) {
        Box local = null;
        if (extent != null) {
            List<Vector3D> corners = new ArrayList<>(8);
            Vector3D lo = extent.min();
            Vector3D hi = extent.max();
            Vector3D t = translation();
            for (int i = 0; i < 8; i++) {
                Vector3D c = new Vector3D((i & 1) == 0 ? lo.getX() : hi.getX(), (i & 2) == 0 ? lo.getY() : hi.getY(),
                    (i & 4) == 0 ? lo.getZ() : hi.getZ());
                corners.add(rotation.applyInverseTo(c.subtract(t)));
            }
            double pad = 1e-9 * Math.max(extent.size(0), Math.max(extent.size(1), extent.size(2)));
            local = Box.around(corners, pad);
        }
        return this.local.mesh(local, resolution).transformed(rotation, translation());
    }

    @Override
    public List<SurfaceCoordinate> coordinates() {
        return local.coordinates();
    }

    @Override
    public void coordinatesAt(double t, double[] x, ContactGeometry work, double[] out) {
        Work w = work.scratch instanceof Work ? (Work) work.scratch : null;
        if (w == null) {
            w = (Work) newScratch();
            work.scratch = w;
        }
        if (!work.hintValid) {
            w.geo.hintValid = false;
        }
        toLocal(x, w.x);
        local.coordinatesAt(t, w.x, w.geo, out);
        work.hintValid = true;
    }

    @Override
    public boolean hasEdges() {
        return local.hasEdges();
    }

    @Override
    public String edgeName(int edge) {
        return local.edgeName(edge);
    }

    @Override
    public double maxConcaveCurvature() {
        return local.maxConcaveCurvature();
    }

    /**
     * Slabs holding the patch: the placed surface's slabs, moved by the transform.
     *
     * @return the slabs (m)
     */
    @Override
    public List<Slab> extent() {
        List<Slab> out = new ArrayList<>();
        for (Slab s : local.extent()) {
            out.add(s.moved(rotation, new Vector3D(tx, ty, tz)));
        }
        return List.copyOf(out);
    }

    @Override
    public String name() {
        return String.format(Locale.ROOT, "placed(%s, rotation q=(%g, %g, %g, %g), translation=(%g, %g, %g))",
            local.name(), rotation.getQ0(), rotation.getQ1(), rotation.getQ2(), rotation.getQ3(), tx, ty, tz);
    }
}
