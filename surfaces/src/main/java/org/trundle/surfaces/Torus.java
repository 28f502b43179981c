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
 * A ring torus about the axis through {@code centre} with unit direction {@code a}: major radius
 * {@code R} (m, centre to tube core circle) and minor radius {@code b} (m, tube radius),
 * {@code R > b}, with the ball {@link Side#INSIDE} the tube (a ring channel, a bent tube) or
 * {@link Side#OUTSIDE} it (a doughnut, the crown of a raceway), optionally bounded in azimuth
 * {@code azimuthFrom ≤ φ ≤ azimuthTo} (rad, about {@code a}, measured from a reference direction)
 * and in tube angle {@code tubeFrom ≤ ψ ≤ tubeTo} (rad, about the core circle, measured in the
 * meridian plane from the outward radial direction {@code e_ρ} toward {@code a}).
 * Tube-angle bounds cut a groove or a raceway out of the tube (for an axis {@code +e_z}, the lower
 * half of the tube is {@code −π ≤ ψ ≤ 0}).
 *
 * <p>Geometry (closed form). With {@code w = x − o}, axial coordinate {@code s = w·a}, radial
 * distance {@code ρ}, unit {@code e_ρ}, circumferential unit {@code e_φ = a × e_ρ}, the vector from
 * the core circle {@code u = (ρ − R) e_ρ + s a} of length {@code ℓ}, {@code e_u = u/ℓ =
 * cos ψ e_ρ + sin ψ a} and the meridian tangent {@code e_m = −sin ψ e_ρ + cos ψ a}:
 * <ul>
 *   <li>closest point {@code p = o + R e_ρ + b e_u};</li>
 *   <li>outside: {@code d = ℓ − b}, {@code n = e_u}, {@code H = e_m e_mᵀ/ℓ + (cos ψ/ρ) e_φ e_φᵀ};
 *       inside: {@code d = b − ℓ}, {@code n = −e_u}, {@code H} negated;</li>
 *   <li>principal curvatures (inside; negated outside): meridian {@code 1/b}, circumferential
 *       {@code cos ψ/(R + b cos ψ)} (Meusnier's theorem; common practice);</li>
 *   <li>patch margin: arc lengths {@code (R + b cos ψ)(φ − azimuthFrom)}, … , {@code b (tubeTo − ψ)}
 *       (edges {@code "azimuth_from"}, {@code "azimuth_to"}, {@code "tube_from"}, {@code "tube_to"}).</li>
 * </ul>
 * Coordinates ({@link #coordinates()}): {@code ring_angle} (rad, the azimuth {@code φ} about the
 * axis from the reference, right-handed) and {@code tube_angle} (rad, {@code ψ} above). Without a
 * reference, azimuth 0 is world down {@code −e_z} projected normal to the axis, or {@code +e_x}
 * projected for an axis within about 5.7° of vertical. The mesh spans the patch's angle ranges.
 * The axis ({@code ρ = 0}) and the core circle ({@code ℓ = 0}) have no closest point; a query there
 * throws {@link SurfaceDomainException}.
 *
 * <p>Immutable and thread-safe.
 */
public final class Torus implements Surface {
    /** Edge index of the lower azimuth bound. */
    public static final int EDGE_AZIMUTH_FROM = 0;
    /** Edge index of the upper azimuth bound. */
    public static final int EDGE_AZIMUTH_TO = 1;
    /** Edge index of the lower tube-angle bound. */
    public static final int EDGE_TUBE_FROM = 2;
    /** Edge index of the upper tube-angle bound. */
    public static final int EDGE_TUBE_TO = 3;

    private final double ox;
    private final double oy;
    private final double oz;
    private final double ax;
    private final double ay;
    private final double az;
    private final double cx;
    private final double cy;
    private final double cz;
    private final double bx;
    private final double by;
    private final double bz;
    private final double major;
    private final double minor;
    private final Side side;
    private final double azFrom;
    private final double azTo;
    private final double tubeFrom;
    private final double tubeTo;
    private final boolean azBounded;
    private final boolean tubeBounded;
    private final AxisFrame frame;

    /**
     * A whole torus (no edges).
     *
     * @param centre centre (m)
     * @param axis axis direction (any length, not zero)
     * @param majorRadius major radius R (m)
     * @param minorRadius minor (tube) radius b (m), {@code b < R}
     * @param side which side of the tube the ball is on
     */
    public Torus(Vector3D centre, Vector3D axis, double majorRadius, double minorRadius, Side side) {
        this(centre, axis, null, majorRadius, minorRadius, side, -Math.PI, Math.PI, -Math.PI, Math.PI);
    }

    /**
     * A torus patch bounded in azimuth and tube angle; a bound pair of {@code −π, π} leaves that
     * direction unbounded.
     *
     * @param centre centre (m)
     * @param axis axis direction (any length, not zero)
     * @param reference direction of azimuth 0 (projected on the plane normal to the axis; any
     *     length, not parallel to the axis); null picks one
     * @param majorRadius major radius R (m)
     * @param minorRadius minor (tube) radius b (m), {@code b < R}
     * @param side which side of the tube the ball is on
     * @param azimuthFrom lower azimuth bound (rad), {@code ≥ −π}
     * @param azimuthTo upper azimuth bound (rad), {@code ≤ π}, {@code > azimuthFrom}
     * @param tubeFrom lower tube-angle bound (rad), {@code ≥ −π}
     * @param tubeTo upper tube-angle bound (rad), {@code ≤ π}, {@code > tubeFrom}
     */
    public Torus(Vector3D centre, Vector3D axis, Vector3D reference, double majorRadius, double minorRadius,
                 Side side, double azimuthFrom, double azimuthTo, double tubeFrom, double tubeTo) {
        Checks.finite("centre", centre);
        Vector3D a = Checks.direction("axis", axis);
        this.major = Checks.positive("majorRadius", majorRadius);
        this.minor = Checks.positive("minorRadius", minorRadius);
        if (!(minorRadius < majorRadius)) {
            throw new IllegalArgumentException("torus minorRadius must be smaller than majorRadius (a ring torus), got minorRadius = "
                + minorRadius + ", majorRadius = " + majorRadius);
        }
        if (side == null) {
            throw new IllegalArgumentException("side must be given, got null");
        }
        if (!(azimuthFrom >= -Math.PI && azimuthFrom < azimuthTo && azimuthTo <= Math.PI)) {
            throw new IllegalArgumentException("torus azimuth bounds must satisfy -pi <= azimuthFrom < azimuthTo <= pi, got azimuthFrom = "
                + azimuthFrom + ", azimuthTo = " + azimuthTo);
        }
        if (!(tubeFrom >= -Math.PI && tubeFrom < tubeTo && tubeTo <= Math.PI)) {
            throw new IllegalArgumentException("torus tube-angle bounds must satisfy -pi <= tubeFrom < tubeTo <= pi, got tubeFrom = "
                + tubeFrom + ", tubeTo = " + tubeTo);
        }
        frame = new AxisFrame(a, reference, "torus reference direction");
        this.side = side;
        this.azFrom = azimuthFrom;
        this.azTo = azimuthTo;
        this.tubeFrom = tubeFrom;
        this.tubeTo = tubeTo;
        this.azBounded = azimuthFrom > -Math.PI || azimuthTo < Math.PI;
        this.tubeBounded = tubeFrom > -Math.PI || tubeTo < Math.PI;
        ox = centre.getX();
        oy = centre.getY();
        oz = centre.getZ();
        ax = a.getX();
        ay = a.getY();
        az = a.getZ();
        cx = frame.cx;
        cy = frame.cy;
        cz = frame.cz;
        bx = frame.bx;
        by = frame.by;
        bz = frame.bz;
    }

    /** @return major radius R (m) */
    public double majorRadius() {
        return major;
    }

    /** @return minor (tube) radius b (m) */
    public double minorRadius() {
        return minor;
    }

    /** @return the side of the tube the ball is on */
    public Side side() {
        return side;
    }

    /** @return the centre (m) */
    public Vector3D centre() {
        return new Vector3D(ox, oy, oz);
    }

    /** @return the unit axis */
    public Vector3D axis() {
        return new Vector3D(ax, ay, az);
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
        if (!(rho > 1e-12 * major)) {
            throw new SurfaceDomainException("query point on the axis of " + name()
                + " has no closest point (distance from the axis " + rho + " m)");
        }
        double erx = rx / rho;
        double ery = ry / rho;
        double erz = rz / rho;
        double q = rho - major;
        double ell = Math.sqrt(q * q + s * s);
        if (!(ell > 1e-12 * minor)) {
            throw new SurfaceDomainException("query point on the core circle of " + name()
                + " has no closest point (distance from the core circle " + ell + " m)");
        }
        double cosP = q / ell;
        double sinP = s / ell;
        double eux = cosP * erx + sinP * ax;
        double euy = cosP * ery + sinP * ay;
        double euz = cosP * erz + sinP * az;
        double emx = -sinP * erx + cosP * ax;
        double emy = -sinP * ery + cosP * ay;
        double emz = -sinP * erz + cosP * az;
        double efx = ay * erz - az * ery;
        double efy = az * erx - ax * erz;
        double efz = ax * ery - ay * erx;
        out.point[0] = ox + major * erx + minor * eux;
        out.point[1] = oy + major * ery + minor * euy;
        out.point[2] = oz + major * erz + minor * euz;
        double sign = side == Side.INSIDE ? -1.0 : 1.0;
        out.normal[0] = sign * eux;
        out.normal[1] = sign * euy;
        out.normal[2] = sign * euz;
        out.distance = sign * (ell - minor);
        double fm = sign / ell;
        double ff = sign * cosP / rho;
        out.setHessian(
            fm * emx * emx + ff * efx * efx, fm * emx * emy + ff * efx * efy, fm * emx * emz + ff * efx * efz,
            fm * emy * emy + ff * efy * efy, fm * emy * emz + ff * efy * efz,
            fm * emz * emz + ff * efz * efz);
        double km = -sign / minor;
        double kf = -sign * cosP / (major + minor * cosP);
        out.curvature1 = Math.max(km, kf);
        out.curvature2 = Math.min(km, kf);
        out.patchMargin = Double.POSITIVE_INFINITY;
        out.edge = EDGE_AZIMUTH_FROM;
        if (azBounded) {
            double phi = Math.atan2(erx * bx + ery * by + erz * bz, erx * cx + ery * cy + erz * cz);
            double rp = major + minor * cosP;
            out.tightenMargin(rp * (phi - azFrom), EDGE_AZIMUTH_FROM);
            out.tightenMargin(rp * (azTo - phi), EDGE_AZIMUTH_TO);
        }
        if (tubeBounded) {
            double psi = Math.atan2(sinP, cosP);
            out.tightenMargin(minor * (psi - tubeFrom), EDGE_TUBE_FROM);
            out.tightenMargin(minor * (tubeTo - psi), EDGE_TUBE_TO);
        }
    }

    @Override
    public TriangleMesh mesh(Box extent, int resolution) {
        int n = GridMesh.cells(resolution);
        return GridMesh.of((phi, psi, out) -> frame.point(ox, oy, oz, minor * Math.sin(psi), major + minor * Math.cos(psi), phi, out),
            azFrom, azTo, n, !azBounded, tubeFrom, tubeTo, n, !tubeBounded);
    }

    @Override
    public List<SurfaceCoordinate> coordinates() {
        return List.of(new SurfaceCoordinate("ring_angle", "rad", "azimuth about the axis from the reference, in (-pi, pi], right-handed"),
            new SurfaceCoordinate("tube_angle", "rad",
                "angle round the tube from the outward radial direction toward the axis, in (-pi, pi]"));
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
        out[0] = frame.azimuth(wx, wy, wz);
        out[1] = Math.atan2(s, Math.sqrt(rx * rx + ry * ry + rz * rz) - major);
    }

    @Override
    public boolean hasEdges() {
        return azBounded || tubeBounded;
    }

    @Override
    public String edgeName(int edge) {
        switch (edge) {
            case EDGE_AZIMUTH_FROM:
                return "azimuth_from";
            case EDGE_AZIMUTH_TO:
                return "azimuth_to";
            case EDGE_TUBE_FROM:
                return "tube_from";
            default:
                return "tube_to";
        }
    }

    /**
     * Largest concave curvature on the patch: {@code 1/b} inside the tube; outside, the
     * circumferential {@code −cos ψ/(R + b cos ψ)} at the smallest {@code cos ψ} of the patch
     * ({@code 1/(R − b)} on the inner equator), or 0 where the patch is nowhere concave.
     *
     * @return the largest concave curvature (1/m)
     */
    @Override
    public double maxConcaveCurvature() {
        if (side == Side.INSIDE) {
            return 1.0 / minor;
        }
        double cmin = tubeFrom <= -Math.PI || tubeTo >= Math.PI ? -1.0 : Math.min(Math.cos(tubeFrom), Math.cos(tubeTo));
        return cmin < 0 ? -cmin / (major + minor * cmin) : 0.0;
    }

    /**
     * Slabs holding the patch: the tube's radius about the mid-plane, and major plus minor radius about the axis.
     *
     * @return the slabs (m)
     */
    @Override
    public List<Slab> extent() {
        return Extents.aboutAxis(new Vector3D(ox, oy, oz), new Vector3D(ax, ay, az), -minor, minor, major + minor);
    }

    @Override
    public String name() {
        return String.format(Locale.ROOT,
            "torus(%s, R=%g m, b=%g m, centre=(%g, %g, %g), axis=(%g, %g, %g), azimuth=[%g, %g] rad, tube=[%g, %g] rad)",
            side.label(), major, minor, ox, oy, oz, ax, ay, az, azFrom, azTo, tubeFrom, tubeTo);
    }
}
