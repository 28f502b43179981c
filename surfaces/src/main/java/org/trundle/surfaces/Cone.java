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
 * A circular cone (one nappe) with apex {@code A}, unit axis {@code a} pointing from the apex into
 * the opening, and half-angle {@code α} (rad, measured from the axis, {@code 0 < α < π/2}), with the
 * ball {@link Side#INSIDE} (a funnel) or {@link Side#OUTSIDE} (a conical dome), bounded to axial
 * positions {@code from ≤ s ≤ to} (m) of the contact point, measured from the apex along {@code a}.
 *
 * <p>Geometry (closed form). With {@code w = x − A}, {@code s = w·a}, radial distance {@code ρ} and
 * unit {@code e_ρ}, and {@code P⊥ = I − a aᵀ − e_ρ e_ρᵀ} (the circumferential projector), the foot on
 * the generator lies at slant distance {@code t = s cos α + ρ sin α} from the apex:
 * <ul>
 *   <li>closest point {@code p = A + t (cos α a + sin α e_ρ)};</li>
 *   <li>outside: {@code d = ρ cos α − s sin α}, {@code n = −sin α a + cos α e_ρ},
 *       {@code H = cos α P⊥/ρ}, curvatures {@code 0, −cos α/(t sin α)};</li>
 *   <li>inside: {@code d = s sin α − ρ cos α}, {@code n = sin α a − cos α e_ρ},
 *       {@code H = −cos α P⊥/ρ}, curvatures {@code cos α/(t sin α), 0};</li>
 *   <li>patch margin along the generator {@code min(t − from/cos α, to/cos α − t)} (edges
 *       {@code "from"} and {@code "to"}).</li>
 * </ul>
 * Coordinates ({@link #coordinates()}): {@code axial} (m, the closest point's position along the
 * axis from the apex, the coordinate of {@code from} and {@code to}) and {@code azimuth} (rad, round
 * the axis as for {@link Cylinder}). The mesh spans {@code [from, to]}, cut to the requested box
 * where {@code to} is open.
 * (The circumferential normal curvature {@code cos α/ρ_p}, {@code ρ_p = t sin α}, is Meusnier's
 * theorem; common practice.) The apex is excluded: where the closest point would be the apex
 * ({@code t ≤ 0}) or the query point lies on the axis, the query throws
 * {@link SurfaceDomainException} naming the apex. On the inside the concave curvature grows without
 * bound toward the apex, so no ball fits an inside cone with {@code from = 0}: the constructor
 * rejects it (bound a funnel at a positive {@code from}).
 *
 * <p>Immutable and thread-safe.
 */
public final class Cone implements Surface {
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
    private final double alpha;
    private final double sinA;
    private final double cosA;
    private final Side side;
    private final double from;
    private final double to;
    private final AxisFrame frame;

    /**
     * A cone unbounded away from the apex ({@code from = 0}, {@code to = ∞}); an outside cone only
     * (an inside one needs {@code from > 0}).
     *
     * @param apex apex A (m)
     * @param axis axis direction from the apex into the opening (any length, not zero)
     * @param halfAngle half-angle α from the axis (rad), {@code 0 < α < π/2}
     * @param side which side the ball is on
     */
    public Cone(Vector3D apex, Vector3D axis, double halfAngle, Side side) {
        this(apex, axis, halfAngle, side, 0.0, Double.POSITIVE_INFINITY);
    }

    /**
     * A cone bounded to {@code from ≤ s ≤ to} along the axis.
     *
     * @param apex apex A (m)
     * @param axis axis direction from the apex into the opening (any length, not zero)
     * @param halfAngle half-angle α from the axis (rad), {@code 0 < α < π/2}
     * @param side which side the ball is on
     * @param from lower axial bound of the contact point (m), {@code ≥ 0}
     * @param to upper axial bound (m), {@code > from}, may be {@link Double#POSITIVE_INFINITY}
     */
    public Cone(Vector3D apex, Vector3D axis, double halfAngle, Side side, double from, double to) {
        Checks.finite("apex", apex);
        Vector3D a = Checks.direction("axis", axis);
        if (!(halfAngle > 0 && halfAngle < 0.5 * Math.PI)) {
            throw new IllegalArgumentException("cone halfAngle must lie in (0, pi/2) rad, got " + halfAngle);
        }
        if (side == null) {
            throw new IllegalArgumentException("side must be given, got null");
        }
        if (!(from >= 0 && from < to) || from == Double.POSITIVE_INFINITY) {
            throw new IllegalArgumentException("cone bounds must satisfy 0 <= from < to (the apex side is s = 0), got from = "
                + from + ", to = " + to);
        }
        if (side == Side.INSIDE && from == 0.0) {
            throw new IllegalArgumentException("an inside cone needs from > 0, got from = 0: its concave curvature "
                + "cos^2(alpha)/(s sin(alpha)) grows without bound toward the apex, so no ball fits there; "
                + "bound the funnel at the smallest axial position a ball may reach");
        }
        frame = new AxisFrame(a, null, "reference");
        this.alpha = halfAngle;
        this.sinA = Math.sin(halfAngle);
        this.cosA = Math.cos(halfAngle);
        this.side = side;
        this.from = from;
        this.to = to;
        ox = apex.getX();
        oy = apex.getY();
        oz = apex.getZ();
        ax = a.getX();
        ay = a.getY();
        az = a.getZ();
    }

    /** @return the apex (m) */
    public Vector3D apex() {
        return new Vector3D(ox, oy, oz);
    }

    /** @return the unit axis direction (from the apex into the opening) */
    public Vector3D axis() {
        return new Vector3D(ax, ay, az);
    }

    /** @return half-angle α from the axis (rad) */
    public double halfAngle() {
        return alpha;
    }

    /** @return the side the ball is on */
    public Side side() {
        return side;
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
        double slant = s * cosA + rho * sinA;
        double scale = Math.abs(s) + rho;
        if (!(slant > 1e-12 * scale) || !(rho > 1e-12 * scale)) {
            throw new SurfaceDomainException(String.format(Locale.ROOT,
                "query point (%g, %g, %g) m has no closest point on %s other than the excluded apex (%g, %g, %g) "
                    + "(slant distance of the foot %g m, distance from the axis %g m)",
                x[0], x[1], x[2], name(), ox, oy, oz, slant, rho));
        }
        double ex = rx / rho;
        double ey = ry / rho;
        double ez = rz / rho;
        double ga = slant * cosA;
        double gr = slant * sinA;
        out.point[0] = ox + ga * ax + gr * ex;
        out.point[1] = oy + ga * ay + gr * ey;
        out.point[2] = oz + ga * az + gr * ez;
        double sign = side == Side.INSIDE ? -1.0 : 1.0;
        out.normal[0] = sign * (-sinA * ax + cosA * ex);
        out.normal[1] = sign * (-sinA * ay + cosA * ey);
        out.normal[2] = sign * (-sinA * az + cosA * ez);
        out.distance = sign * (rho * cosA - s * sinA);
        double f = sign * cosA / rho;
        out.setHessian(
            f * (1 - ax * ax - ex * ex), -f * (ax * ay + ex * ey), -f * (ax * az + ex * ez),
            f * (1 - ay * ay - ey * ey), -f * (ay * az + ey * ez),
            f * (1 - az * az - ez * ez));
        double k = cosA / gr;
        if (side == Side.INSIDE) {
            out.curvature1 = k;
            out.curvature2 = 0.0;
        } else {
            out.curvature1 = 0.0;
            out.curvature2 = -k;
        }
        double lo = slant - from / cosA;
        double hi = to / cosA - slant;
        out.setMargin(lo, EDGE_FROM, hi, EDGE_TO);
    }

    @Override
    public TriangleMesh mesh(Box extent, int resolution) {
        int n = GridMesh.cells(resolution);
        double hi = to;
        if (!Double.isFinite(hi)) {
            if (extent == null) {
                throw new IllegalArgumentException(name() + " is open at its wide end: its mesh needs a box, got null");
            }
            hi = Math.min(hi, extent.rangeAlong(apex(), axis())[1]);
            if (!(from < hi)) {
                return TriangleMesh.empty();
            }
        }
        double tan = sinA / cosA;
        return GridMesh.of((s, phi, out) -> frame.point(ox, oy, oz, s, s * tan, phi, out),
            from, hi, n, false, -Math.PI, Math.PI, n, true);
    }

    @Override
    public List<SurfaceCoordinate> coordinates() {
        return List.of(new SurfaceCoordinate("axial", "m", "position of the closest point along the axis from the apex"), AxisFrame.AZIMUTH);
    }

    @Override
    public void coordinatesAt(double t, double[] x, ContactGeometry work, double[] out) {
        double wx = x[0] - ox;
        double wy = x[1] - oy;
        double wz = x[2] - oz;
        double s = wx * ax + wy * ay + wz * az;
        double rx = wx - s * ax;
        double ry = wy - s * ay;
        double rz = wz - s * az;
        double rho = Math.sqrt(rx * rx + ry * ry + rz * rz);
        out[0] = Math.max(0.0, s * cosA + rho * sinA) * cosA;
        out[1] = frame.azimuth(wx, wy, wz);
    }

    @Override
    public boolean hasEdges() {
        return true;
    }

    @Override
    public String edgeName(int edge) {
        return edge == EDGE_FROM ? "from" : "to";
    }

    /**
     * Largest concave curvature on the patch: on the inside {@code cos²α/(from·sin α)} at the lower
     * bound ({@code from > 0} there), 0 on the outside.
     *
     * @return the largest concave curvature (1/m)
     */
    @Override
    public double maxConcaveCurvature() {
        if (side == Side.OUTSIDE) {
            return 0.0;
        }
        return cosA * cosA / (from * sinA);
    }

    /**
     * Slabs holding the patch: the axial range from the apex and, when bounded, the opening's radius {@code to·tan α}.
     *
     * @return the slabs (m)
     */
    @Override
    public List<Slab> extent() {
        return Extents.aboutAxis(new Vector3D(ox, oy, oz), new Vector3D(ax, ay, az), from, to, to * sinA / cosA);
    }

    @Override
    public String name() {
        return String.format(Locale.ROOT,
            "cone(%s, apex=(%g, %g, %g), axis=(%g, %g, %g), halfAngle=%g rad, from=%g, to=%g)",
            side.label(), ox, oy, oz, ax, ay, az, alpha, from, to);
    }
}
