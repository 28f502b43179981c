package org.trundle.surfaces;

import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.Checks;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Surface;

/**
 * An unbounded plane through {@code origin} with unit normal {@code n} pointing to the ball's side.
 *
 * <p>Geometry (closed form): {@code d(x) = (x − o)·n}, closest point {@code p = x − d n}, normal
 * {@code n}, distance Hessian {@code H = 0}, principal curvatures {@code 0}. No edges.
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

    /**
     * @param origin a point of the plane (m)
     * @param normal normal toward the ball's side (any length, not zero)
     */
    public Plane(Vector3D origin, Vector3D normal) {
        Checks.finite("origin", origin);
        Vector3D n = Checks.direction("normal", normal);
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
    public double maxConcaveCurvature() {
        return 0.0;
    }

    @Override
    public String name() {
        return String.format(Locale.ROOT, "plane(origin=(%g, %g, %g), normal=(%g, %g, %g))", ox, oy, oz, nx, ny, nz);
    }
}
