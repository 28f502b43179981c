package org.trundle.core.sweep;

import org.trundle.core.ContactGeometry;
import org.trundle.core.Surface;

/**
 * Test-only surface: a plane inclined at angle θ about the y axis, rising along
 * {@code u = (cos θ, 0, sin θ)} with normal {@code n = (−sin θ, 0, cos θ)}, bounded above by the
 * edge {@code "top"} at distance {@code L} along {@code u} from the origin, unbounded below.
 */
final class Ramp implements Surface {
    final double ux;
    final double uz;
    final double nx;
    final double nz;
    final double length;

    Ramp(double angleRad, double length) {
        this.ux = Math.cos(angleRad);
        this.uz = Math.sin(angleRad);
        this.nx = -Math.sin(angleRad);
        this.nz = Math.cos(angleRad);
        this.length = length;
    }

    @Override
    public void query(double t, double[] x, ContactGeometry out) {
        double d = x[0] * nx + x[2] * nz;
        out.distance = d;
        out.point[0] = x[0] - d * nx;
        out.point[1] = x[1];
        out.point[2] = x[2] - d * nz;
        out.normal[0] = nx;
        out.normal[1] = 0;
        out.normal[2] = nz;
        java.util.Arrays.fill(out.hessian, 0.0);
        out.curvature1 = 0;
        out.curvature2 = 0;
        out.patchMargin = length - (x[0] * ux + x[2] * uz);
        out.edge = 0;
    }

    @Override
    public boolean hasEdges() {
        return true;
    }

    @Override
    public String edgeName(int edge) {
        return "top";
    }

    @Override
    public double maxConcaveCurvature() {
        return 0;
    }

    @Override
    public String name() {
        return "test ramp";
    }
}
