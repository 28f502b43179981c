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
 * A sphere of radius {@code R} (m) about {@code centre}, with the ball {@link Side#INSIDE} (a bowl)
 * or {@link Side#OUTSIDE} (a dome), optionally bounded to a cap: polar angles
 * {@code polarFrom ≤ θ ≤ polarTo} (rad) measured at the centre from a unit {@code pole} direction.
 * A bowl of opening half-angle {@code β} is the cap {@code 0 ≤ θ ≤ β} about the pole {@code −e_z}.
 *
 * <p>Geometry (closed form). With {@code w = x − o}, {@code ρ = |w|}, {@code e = w/ρ} and the
 * tangential projector {@code P = I − e eᵀ}:
 * <ul>
 *   <li>inside: {@code d = R − ρ}, {@code n = −e}, {@code H = −P/ρ}, curvatures {@code 1/R, 1/R};</li>
 *   <li>outside: {@code d = ρ − R}, {@code n = e}, {@code H = P/ρ}, curvatures {@code −1/R, −1/R};</li>
 *   <li>closest point {@code p = o + R e}; polar angle {@code θ = atan2(|e × pole|, e·pole)}; patch
 *       margin the arc length {@code R·min(θ − polarFrom, polarTo − θ)} (edges {@code "polar_from"}
 *       and {@code "polar_to"}).</li>
 * </ul>
 * Coordinates ({@link #coordinates()}): {@code polar} (rad, {@code θ} above) and {@code azimuth}
 * (rad, about the pole, right-handed, from world down projected normal to the pole, or from
 * {@code +e_x} projected for a pole within about 5.7° of vertical). The mesh spans the cap.
 * The centre ({@code ρ = 0}) has no closest point; a query there throws
 * {@link SurfaceDomainException}.
 *
 * <p>Immutable and thread-safe.
 */
public final class Sphere implements Surface {
    /** Edge index of the lower polar bound. */
    public static final int EDGE_POLAR_FROM = 0;
    /** Edge index of the upper polar bound. */
    public static final int EDGE_POLAR_TO = 1;

    private final double ox;
    private final double oy;
    private final double oz;
    private final double px;
    private final double py;
    private final double pz;
    private final double radius;
    private final Side side;
    private final double polarFrom;
    private final double polarTo;
    private final AxisFrame frame;

    /**
     * A whole sphere (no edges).
     *
     * @param centre centre (m)
     * @param radius radius R (m)
     * @param side which side the ball is on
     */
    public Sphere(Vector3D centre, double radius, Side side) {
        this(centre, radius, side, Vector3D.MINUS_K, 0.0, Math.PI);
    }

    /**
     * A spherical cap {@code polarFrom ≤ θ ≤ polarTo} about {@code pole}.
     *
     * @param centre centre (m)
     * @param radius radius R (m)
     * @param side which side the ball is on
     * @param pole direction from the centre at which {@code θ = 0} (any length, not zero)
     * @param polarFrom lower polar bound (rad), in {@code [0, π)}
     * @param polarTo upper polar bound (rad), in {@code (polarFrom, π]}
     */
    public Sphere(Vector3D centre, double radius, Side side, Vector3D pole, double polarFrom, double polarTo) {
        Checks.finite("centre", centre);
        Vector3D a = Checks.direction("pole", pole);
        this.radius = Checks.positive("radius", radius);
        if (side == null) {
            throw new IllegalArgumentException("side must be given, got null");
        }
        if (!(polarFrom >= 0 && polarFrom < polarTo && polarTo <= Math.PI)) {
            throw new IllegalArgumentException("sphere cap bounds must satisfy 0 <= polarFrom < polarTo <= pi, got polarFrom = "
                + polarFrom + ", polarTo = " + polarTo);
        }
        frame = new AxisFrame(a, null, "reference");
        this.side = side;
        this.polarFrom = polarFrom;
        this.polarTo = polarTo;
        ox = centre.getX();
        oy = centre.getY();
        oz = centre.getZ();
        px = a.getX();
        py = a.getY();
        pz = a.getZ();
    }

    /** @return radius R (m) */
    public double radius() {
        return radius;
    }

    /** @return the side the ball is on */
    public Side side() {
        return side;
    }

    /** @return the centre (m) */
    public Vector3D centre() {
        return new Vector3D(ox, oy, oz);
    }

    /** @return the unit pole direction of the cap bounds */
    public Vector3D pole() {
        return new Vector3D(px, py, pz);
    }

    /** @return lower polar bound (rad) */
    public double polarFrom() {
        return polarFrom;
    }

    /** @return upper polar bound (rad) */
    public double polarTo() {
        return polarTo;
    }

    @Override
    public void query(double t, double[] x, ContactGeometry out) {
        double wx = x[0] - ox;
        double wy = x[1] - oy;
        double wz = x[2] - oz;
        double rho = Math.sqrt(wx * wx + wy * wy + wz * wz);
        if (!(rho > 1e-12 * radius)) {
            throw new SurfaceDomainException("query point at the centre of " + name()
                + " has no closest point (distance from the centre " + rho + " m)");
        }
        double ex = wx / rho;
        double ey = wy / rho;
        double ez = wz / rho;
        out.point[0] = ox + radius * ex;
        out.point[1] = oy + radius * ey;
        out.point[2] = oz + radius * ez;
        double sign = side == Side.INSIDE ? -1.0 : 1.0;
        out.normal[0] = sign * ex;
        out.normal[1] = sign * ey;
        out.normal[2] = sign * ez;
        out.distance = sign * (rho - radius);
        double f = sign / rho;
        out.setHessian(f * (1 - ex * ex), -f * ex * ey, -f * ex * ez, f * (1 - ey * ey), -f * ey * ez, f * (1 - ez * ez));
        double k = -sign / radius;
        out.curvature1 = k;
        out.curvature2 = k;
        if (polarFrom == 0.0 && polarTo == Math.PI) {
            out.patchMargin = Double.POSITIVE_INFINITY;
            out.edge = EDGE_POLAR_FROM;
            return;
        }
        double cx = ey * pz - ez * py;
        double cy = ez * px - ex * pz;
        double cz = ex * py - ey * px;
        double theta = Math.atan2(Math.sqrt(cx * cx + cy * cy + cz * cz), ex * px + ey * py + ez * pz);
        double lo = polarFrom == 0.0 ? Double.POSITIVE_INFINITY : radius * (theta - polarFrom);
        double hi = polarTo == Math.PI ? Double.POSITIVE_INFINITY : radius * (polarTo - theta);
        out.setMargin(lo, EDGE_POLAR_FROM, hi, EDGE_POLAR_TO);
    }

    @Override
    public TriangleMesh mesh(Box extent, int resolution) {
        int n = GridMesh.cells(resolution);
        return GridMesh.of((theta, phi, out) -> frame.point(ox, oy, oz, radius * Math.cos(theta), radius * Math.sin(theta), phi, out),
            polarFrom, polarTo, n, false, -Math.PI, Math.PI, n, true);
    }

    @Override
    public List<SurfaceCoordinate> coordinates() {
        return List.of(new SurfaceCoordinate("polar", "rad", "angle at the centre from the pole, in [0, pi]"),
            new SurfaceCoordinate("azimuth", "rad",
                "angle about the pole in (-pi, pi], right-handed, from the default reference (down, or +x for a vertical pole)"));
    }

    @Override
    public void coordinatesAt(double t, double[] x, ContactGeometry work, double[] out) {
        double wx = x[0] - ox;
        double wy = x[1] - oy;
        double wz = x[2] - oz;
        double cx = wy * pz - wz * py;
        double cy = wz * px - wx * pz;
        double cz = wx * py - wy * px;
        out[0] = Math.atan2(Math.sqrt(cx * cx + cy * cy + cz * cz), wx * px + wy * py + wz * pz);
        out[1] = frame.azimuth(wx, wy, wz);
    }

    @Override
    public boolean hasEdges() {
        return polarFrom > 0.0 || polarTo < Math.PI;
    }

    @Override
    public String edgeName(int edge) {
        return edge == EDGE_POLAR_FROM ? "polar_from" : "polar_to";
    }

    @Override
    public double maxConcaveCurvature() {
        return side == Side.INSIDE ? 1.0 / radius : 0.0;
    }

    /**
     * Slabs holding the patch: the sphere's box: the radius about the centre along three perpendicular directions.
     *
     * @return the slabs (m)
     */
    @Override
    public List<Slab> extent() {
        return Extents.aboutAxis(new Vector3D(ox, oy, oz), Vector3D.PLUS_K, -radius, radius, radius);
    }

    @Override
    public String name() {
        return String.format(Locale.ROOT,
            "sphere(%s, R=%g m, centre=(%g, %g, %g), pole=(%g, %g, %g), polarFrom=%g rad, polarTo=%g rad)",
            side.label(), radius, ox, oy, oz, px, py, pz, polarFrom, polarTo);
    }
}
