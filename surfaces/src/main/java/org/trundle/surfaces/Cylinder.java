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
import org.trundle.core.SurfaceDomainException;
import org.trundle.core.TriangleMesh;

/**
 * A circular cylinder of radius {@code R} (m) about the axis through {@code origin} with unit
 * direction {@code a}, with the ball {@link Side#INSIDE} (a tube or bore) or {@link Side#OUTSIDE}
 * (a rod or roller), optionally bounded to axial positions {@code from ≤ s ≤ to} (m, measured from
 * {@code origin} along {@code a}) with open ends.
 *
 * <p>Geometry (closed form). With {@code w = x − o}, axial coordinate {@code s = w·a}, radial
 * vector {@code w − s a} of length {@code ρ} and unit {@code e_ρ}, and {@code P⊥ = I − a aᵀ − e_ρ e_ρᵀ}
 * (the projector on the circumferential direction):
 * <ul>
 *   <li>inside: {@code d = R − ρ}, {@code n = −e_ρ}, {@code H = −P⊥/ρ}, curvatures {@code 1/R, 0};</li>
 *   <li>outside: {@code d = ρ − R}, {@code n = e_ρ}, {@code H = P⊥/ρ}, curvatures {@code 0, −1/R};</li>
 *   <li>closest point {@code p = o + s a + R e_ρ}; patch margin {@code min(s − from, to − s)}
 *       (edges {@code "from"} and {@code "to"}).</li>
 * </ul>
 * Coordinates ({@link #coordinates()}): {@code axial} (m, {@code s} of the closest point) and
 * {@code azimuth} (rad, round the axis, right-handed about {@code a}, from world down {@code −e_z}
 * projected normal to the axis, or from {@code +e_x} projected for an axis within about 5.7° of
 * vertical). The mesh spans {@code [from, to]}, cut to the requested box where a bound is open.
 * The axis itself ({@code ρ = 0}) has no closest point; a query there throws
 * {@link SurfaceDomainException}.
 *
 * <p>Immutable and thread-safe.
 */
public final class Cylinder implements Surface {
    /** Edge index of the lower axial bound. */
    public static final int EDGE_FROM = 0;
    /** Edge index of the upper axial bound. */
    public static final int EDGE_TO = 1;

    private final double ox;
    private final double oy;
    private final double oz;
    private final double ax;
    private final double ay;
    private final double az;
    private final double radius;
    /** 1/R (1/m). */
    private final double curvature;
    /** −1 inside, +1 outside: the normal's sense relative to the outward radial direction. */
    private final double sign;
    /** The projector {@code I − a aᵀ} onto the plane normal to the axis, upper triangle. */
    private final double pxx;
    private final double pxy;
    private final double pxz;
    private final double pyy;
    private final double pyz;
    private final double pzz;
    private final Side side;
    private final double from;
    private final double to;
    private final AxisFrame frame;

    /**
     * An unbounded cylinder.
     *
     * @param origin a point of the axis (m)
     * @param axis axis direction (any length, not zero)
     * @param radius radius R (m)
     * @param side which side the ball is on
     */
    public Cylinder(Vector3D origin, Vector3D axis, double radius, Side side) {
        this(origin, axis, radius, side, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);
    }

    /**
     * A cylinder bounded to {@code from ≤ s ≤ to} along the axis.
     *
     * @param origin a point of the axis (m)
     * @param axis axis direction (any length, not zero)
     * @param radius radius R (m)
     * @param side which side the ball is on
     * @param from lower axial bound (m), may be {@link Double#NEGATIVE_INFINITY}
     * @param to upper axial bound (m), may be {@link Double#POSITIVE_INFINITY}
     */
    public Cylinder(Vector3D origin, Vector3D axis, double radius, Side side, double from, double to) {
        Checks.finite("origin", origin);
        Vector3D a = Checks.direction("axis", axis);
        this.radius = Checks.positive("radius", radius);
        this.curvature = 1.0 / radius;
        if (side == null) {
            throw new IllegalArgumentException("side must be given, got null");
        }
        if (Double.isNaN(from) || Double.isNaN(to) || !(from < to)) {
            throw new IllegalArgumentException("cylinder bounds must satisfy from < to, got from = " + from
                + ", to = " + to);
        }
        this.side = side;
        this.from = from;
        this.to = to;
        ox = origin.getX();
        oy = origin.getY();
        oz = origin.getZ();
        ax = a.getX();
        ay = a.getY();
        az = a.getZ();
        frame = new AxisFrame(a, null, "reference");
        sign = side == Side.INSIDE ? -1.0 : 1.0;
        pxx = 1 - ax * ax;
        pxy = -ax * ay;
        pxz = -ax * az;
        pyy = 1 - ay * ay;
        pyz = -ay * az;
        pzz = 1 - az * az;
    }

    /** @return radius R (m) */
    public double radius() {
        return radius;
    }

    /** @return the side the ball is on */
    public Side side() {
        return side;
    }

    /** @return the axis point (m) */
    public Vector3D origin() {
        return new Vector3D(ox, oy, oz);
    }

    /** @return the unit axis direction */
    public Vector3D axis() {
        return new Vector3D(ax, ay, az);
    }

    /** @return lower axial bound (m) */
    public double from() {
        return from;
    }

    /** @return upper axial bound (m) */
    public double to() {
        return to;
    }

    @Override
    public void query(double t, double[] x, ContactGeometry out) {
        double wx = x[0] - ox;
        double wy = x[1] - oy;
        double wz = x[2] - oz;
        double s = wx * ax + wy * ay + wz * az;
        double rx = wx - s * ax;
        double ry = wy - s * ay;
        double rz = wz - s * az;
        double rho = Math.sqrt(rx * rx + ry * ry + rz * rz);
        if (!(rho > 1e-12 * radius)) {
            throw new SurfaceDomainException("query point on the axis of " + name()
                + " has no closest point (distance from the axis " + rho + " m)");
        }
        double inv = 1.0 / rho;
        double ex = rx * inv;
        double ey = ry * inv;
        double ez = rz * inv;
        out.point[0] = ox + s * ax + radius * ex;
        out.point[1] = oy + s * ay + radius * ey;
        out.point[2] = oz + s * az + radius * ez;
        double sign = this.sign;
        out.normal[0] = sign * ex;
        out.normal[1] = sign * ey;
        out.normal[2] = sign * ez;
        out.distance = sign * (rho - radius);
        // H = sign * (I - a a^T - e e^T) / rho
        double f = sign * inv;
        out.setHessian(
            f * (pxx - ex * ex), f * (pxy - ex * ey), f * (pxz - ex * ez),
            f * (pyy - ey * ey), f * (pyz - ey * ez),
            f * (pzz - ez * ez));
        if (side == Side.INSIDE) {
            out.curvature1 = curvature;
            out.curvature2 = 0.0;
        } else {
            out.curvature1 = 0.0;
            out.curvature2 = -curvature;
        }
        double lo = s - from;
        double hi = to - s;
        out.setMargin(lo, EDGE_FROM, hi, EDGE_TO);
    }

    @Override
    public TriangleMesh mesh(Box extent, int resolution) {
        int n = GridMesh.cells(resolution);
        double lo = from;
        double hi = to;
        if (!Double.isFinite(lo) || !Double.isFinite(hi)) {
            if (extent == null) {
                throw new IllegalArgumentException(name() + " is unbounded along its axis: its mesh needs a box, got null");
            }
            double[] r = extent.rangeAlong(origin(), axis());
            lo = Math.max(lo, r[0]);
            hi = Math.min(hi, r[1]);
            if (!(lo < hi)) {
                return TriangleMesh.empty();
            }
        }
        return GridMesh.of((s, phi, out) -> frame.point(ox, oy, oz, s, radius, phi, out),
            lo, hi, n, false, -Math.PI, Math.PI, n, true);
    }

    @Override
    public List<SurfaceCoordinate> coordinates() {
        return List.of(new SurfaceCoordinate("axial", "m", "position along the axis from the origin"), AxisFrame.AZIMUTH);
    }

    @Override
    public void coordinatesAt(double t, double[] x, ContactGeometry work, double[] out) {
        double wx = x[0] - ox;
        double wy = x[1] - oy;
        double wz = x[2] - oz;
        out[0] = wx * ax + wy * ay + wz * az;
        out[1] = frame.azimuth(wx, wy, wz);
    }

    @Override
    public boolean hasEdges() {
        return Double.isFinite(from) || Double.isFinite(to);
    }

    @Override
    public String edgeName(int edge) {
        return edge == EDGE_FROM ? "from" : "to";
    }

    @Override
    public double maxConcaveCurvature() {
        return side == Side.INSIDE ? 1.0 / radius : 0.0;
    }

    /**
     * Slabs holding the patch: the axial range and the radius about the axis.
     *
     * @return the slabs (m)
     */
    @Override
    public List<Slab> extent() {
        return Extents.aboutAxis(new Vector3D(ox, oy, oz), new Vector3D(ax, ay, az), from, to, radius);
    }

    @Override
    public String name() {
        return String.format(Locale.ROOT, "cylinder(%s, R=%g m, origin=(%g, %g, %g), axis=(%g, %g, %g), from=%g, to=%g)",
            side.label(), radius, ox, oy, oz, ax, ay, az, from, to);
    }
}
