package org.trundle.surfaces;

import java.util.List;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.Box;
import org.trundle.core.internal.Checks;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Slab;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceCoordinate;
import org.trundle.core.TriangleMesh;

/**
 * An unbounded plane through {@code origin} with unit normal {@code n} pointing to the ball's side.
 *
 * <p>Geometry (closed form): {@code d(x) = (x − o)·n}, closest point {@code p = x − d n}, normal
 * {@code n}, distance Hessian {@code H = 0}, principal curvatures {@code 0}. No edges.
 *
 * <p>Coordinates ({@link #coordinates()}): {@code u} and {@code v} (m), the closest point's offsets
 * from {@code origin} along the in-plane unit directions {@code e_u} (the reference projected into
 * the plane; by default world down {@code −e_z} projected, or {@code +e_x} for a plane within about
 * 5.7° of horizontal) and {@code e_v = n × e_u}. The mesh is a rectangle of the plane covering its
 * cross-section with the requested box.
 *
 * <p>Immutable and thread-safe.
 */
public final class Plane implements Surface {
    private final double ox;
    private final double oy;
    private final double oz;
    private final double nx;
    private final double ny;
    private final double nz;
    private final AxisFrame frame;

    /**
     * @param origin a point of the plane (m)
     * @param normal normal toward the ball's side (any length, not zero)
     */
    public Plane(Vector3D origin, Vector3D normal) {
        this(origin, normal, null);
    }

    /**
     * @param origin a point of the plane (m)
     * @param normal normal toward the ball's side (any length, not zero)
     * @param reference direction of the {@code u} coordinate (projected into the plane; not along
     *     the normal), or null for the default
     */
    public Plane(Vector3D origin, Vector3D normal, Vector3D reference) {
        Checks.finite("origin", origin);
        Vector3D n = Checks.direction("normal", normal);
        frame = new AxisFrame(n, reference, "reference");
        ox = origin.getX();
        oy = origin.getY();
        oz = origin.getZ();
        nx = n.getX();
        ny = n.getY();
        nz = n.getZ();
    }

    @Override
    public void query(double t, double[] x, ContactGeometry out) {
        double d = (x[0] - ox) * nx + (x[1] - oy) * ny + (x[2] - oz) * nz;
        out.distance = d;
        out.point[0] = x[0] - d * nx;
        out.point[1] = x[1] - d * ny;
        out.point[2] = x[2] - d * nz;
        out.normal[0] = nx;
        out.normal[1] = ny;
        out.normal[2] = nz;
        java.util.Arrays.fill(out.hessian, 0.0);
        out.curvature1 = 0;
        out.curvature2 = 0;
        out.patchMargin = Double.POSITIVE_INFINITY;
        out.edge = 0;
    }

    @Override
    public TriangleMesh mesh(Box extent, int resolution) {
        int n = GridMesh.cells(resolution);
        if (extent == null) {
            throw new IllegalArgumentException("a plane is unbounded: its mesh needs a box, got null");
        }
        Vector3D o = new Vector3D(ox, oy, oz);
        double[] u = extent.rangeAlong(o, new Vector3D(frame.cx, frame.cy, frame.cz));
        double[] v = extent.rangeAlong(o, new Vector3D(frame.bx, frame.by, frame.bz));
        return GridMesh.of((a, b, out) -> {
            out[0] = ox + a * frame.cx + b * frame.bx;
            out[1] = oy + a * frame.cy + b * frame.by;
            out[2] = oz + a * frame.cz + b * frame.bz;
        }, u[0], u[1], n, false, v[0], v[1], n, false);
    }

    @Override
    public List<SurfaceCoordinate> coordinates() {
        return List.of(new SurfaceCoordinate("u", "m", "offset from the origin along the in-plane reference direction"),
            new SurfaceCoordinate("v", "m", "offset from the origin along normal x reference"));
    }

    @Override
    public void coordinatesAt(double t, double[] x, ContactGeometry work, double[] out) {
        double wx = x[0] - ox;
        double wy = x[1] - oy;
        double wz = x[2] - oz;
        out[0] = wx * frame.cx + wy * frame.cy + wz * frame.cz;
        out[1] = wx * frame.bx + wy * frame.by + wz * frame.bz;
    }

    @Override
    public double maxConcaveCurvature() {
        return 0.0;
    }

    /**
     * Slabs holding the patch: the plane itself: the slab of zero thickness {@code x·n = o·n}.
     *
     * @return the slabs (m)
     */
    @Override
    public List<Slab> extent() {
        return List.of(Slab.about(new Vector3D(nx, ny, nz), new Vector3D(ox, oy, oz), 0.0, 0.0));
    }

    @Override
    public String name() {
        return String.format(Locale.ROOT, "plane(origin=(%g, %g, %g), normal=(%g, %g, %g))", ox, oy, oz, nx, ny, nz);
    }
}
