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
 * A surface of revolution about the axis through {@code origin} with unit direction {@code a}, its
 * profile given as points {@code (z_i, R_i)} (axial position along {@code a} from {@code origin}, m;
 * radius, m) interpolated by a natural quintic spline {@code R(z)} ({@link QuinticSpline}, C⁴, so the
 * curvature has no jumps at the knots): funnels,
 * flared tube mouths, cups. The ball is {@link Side#INSIDE} (toward the axis) or
 * {@link Side#OUTSIDE}; the patch is {@code z_0 ≤ z ≤ z_{n−1}} (edges {@code "from"}, {@code "to"}).
 *
 * <p>Closest point. In the meridian half-plane of the query point (axial {@code s}, radial
 * {@code ρ}) the foot {@code (z, R(z))} solves {@code F(z) = (z − s) + (R(z) − ρ) R'(z) = 0}, found by
 * Newton's method {@code z ← z − F/F'}, {@code F' = 1 + R'² + (R − ρ) R''}, seeded from the previous
 * foot of the run ({@link ContactGeometry#hint}{@code [0]}), so that a query costs O(1); without a
 * seed, from the nearest of a scan over the knots and interval midpoints.
 *
 * <p>Geometry at the foot, with {@code q = √(1 + R'²)}, meridian tangent {@code t = (a + R' e_ρ)/q},
 * outward normal {@code m = (e_ρ − R' a)/q}, {@code σ = +1} outside and {@code −1} inside:
 * {@code n = σ m}, {@code d = (x − p)·n}; Weingarten eigenvalues {@code W_m = −σ R''/q³} (meridian)
 * and {@code W_φ = σ/(q R)} (circumferential, Meusnier's theorem; common practice); distance Hessian
 * {@code H = W_m/(1 + d W_m) t tᵀ + σ/(q ρ) e_φ e_φᵀ} (the second term equals
 * {@code W_φ/(1 + d W_φ)}); principal curvatures {@code −W_m}, {@code −W_φ}. The patch margin is the
 * axial distance of the foot from the nearer end (m).
 *
 * <p>Coordinates ({@link #coordinates()}): {@code axial} (m, the foot's {@code z}) and
 * {@code azimuth} (rad, round the axis as for {@link Cylinder}). The mesh spans the profile.
 *
 * <p>The axis ({@code ρ = 0}) has no closest point; a query there, or one beyond a centre of
 * curvature of the profile, throws {@link SurfaceDomainException}. Immutable and thread-safe.
 */
public final class SurfaceOfRevolution implements Surface {
    /** Edge index of the first profile point. */
    public static final int EDGE_FROM = 0;
    /** Edge index of the last profile point. */
    public static final int EDGE_TO = 1;
    private static final int MAX_ITER = 50;

    private final double ox;
    private final double oy;
    private final double oz;
    private final double ax;
    private final double ay;
    private final double az;
    private final QuinticSpline profile;
    private final Side side;
    private final double length;
    private final double maxConcave;
    private final AxisFrame frame;

    /**
     * @param origin a point of the axis, where {@code z = 0} (m)
     * @param axis axis direction (any length, not zero)
     * @param axial profile axial positions {@code z_i} (m), strictly increasing, at least 2
     * @param radius profile radii {@code R_i} (m), positive, as many as {@code axial}
     * @param side which side the ball is on
     */
    public SurfaceOfRevolution(Vector3D origin, Vector3D axis, double[] axial, double[] radius, Side side) {
        Checks.finite("origin", origin);
        Vector3D a = Checks.direction("axis", axis);
        if (side == null) {
            throw new IllegalArgumentException("side must be given, got null");
        }
        this.profile = new QuinticSpline(axial, radius, "surface of revolution profile");
        for (int i = 0; i < radius.length; i++) {
            Checks.positive("profile radius[" + i + "]", radius[i]);
        }
        frame = new AxisFrame(a, null, "reference");
        this.side = side;
        this.length = profile.last() - profile.first();
        ox = origin.getX();
        oy = origin.getY();
        oz = origin.getZ();
        ax = a.getX();
        ay = a.getY();
        az = a.getZ();
        // largest concave curvature, sampled densely (64 points per interval) over the patch
        double sigma = side == Side.INSIDE ? -1.0 : 1.0;
        double kmax = 0;
        double[] e = new double[3];
        for (int i = 0; i < profile.size() - 1; i++) {
            for (int j = 0; j <= 64; j++) {
                double z = profile.knot(i) + (profile.knot(i + 1) - profile.knot(i)) * j / 64.0;
                profile.evaluate(z, e, 0);
                if (!(e[0] > 0)) {
                    throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "surface of revolution profile spline must stay positive, got R(%g) = %g m", z, e[0]));
                }
                double q = Math.sqrt(1 + e[1] * e[1]);
                kmax = Math.max(kmax, Math.max(sigma * e[2] / (q * q * q), -sigma / (q * e[0])));
            }
        }
        this.maxConcave = kmax;
    }

    /** @return the side the ball is on */
    public Side side() {
        return side;
    }

    /** @return the profile spline R(z) */
    public QuinticSpline profile() {
        return profile;
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
        if (!(rho > 1e-12 * length)) {
            throw new SurfaceDomainException("query point on the axis of " + name()
                + " has no closest point (distance from the axis " + rho + " m)");
        }
        double[] e = out.hint;
        double z;
        if (out.hintValid) {
            z = e[0];
        } else {
            z = profile.first();
            double best = Double.POSITIVE_INFINITY;
            for (int i = 0; i < 2 * profile.size() - 1; i++) {
                double zi = (i % 2 == 0) ? profile.knot(i / 2) : 0.5 * (profile.knot(i / 2) + profile.knot(i / 2 + 1));
                profile.evaluate(zi, e, 1);
                double dd = (zi - s) * (zi - s) + (e[1] - rho) * (e[1] - rho);
                if (dd < best) {
                    best = dd;
                    z = zi;
                }
            }
        }
        double tol = 1e-14 * length;
        boolean converged = false;
        for (int it = 0; it < MAX_ITER; it++) {
            profile.evaluate(z, e, 1);
            double f = (z - s) + (e[1] - rho) * e[2];
            double fp = 1 + e[2] * e[2] + (e[1] - rho) * e[3];
            if (!(fp > 0)) {
                throw new SurfaceDomainException(String.format(Locale.ROOT,
                    "query point (%g, %g, %g) m lies beyond a centre of curvature of %s (no unique foot near z = %g m)",
                    x[0], x[1], x[2], name(), z));
            }
            double dz = -f / fp;
            double cap = 0.5 * length;
            if (dz > cap) {
                dz = cap;
            } else if (dz < -cap) {
                dz = -cap;
            }
            z += dz;
            if (Math.abs(dz) <= tol) {
                converged = true;
                break;
            }
        }
        if (!converged || !Double.isFinite(z)) {
            throw new SurfaceDomainException(String.format(Locale.ROOT,
                "closest point on %s did not converge for query point (%g, %g, %g) m", name(), x[0], x[1], x[2]));
        }
        profile.evaluate(z, e, 1);
        double bigR = e[1];
        double rp = e[2];
        double rpp = e[3];
        e[0] = z;
        out.hintValid = true;
        double erx = rx / rho;
        double ery = ry / rho;
        double erz = rz / rho;
        double q = Math.sqrt(1 + rp * rp);
        double sigma = side == Side.INSIDE ? -1.0 : 1.0;
        out.point[0] = ox + z * ax + bigR * erx;
        out.point[1] = oy + z * ay + bigR * ery;
        out.point[2] = oz + z * az + bigR * erz;
        double nx = sigma * (erx - rp * ax) / q;
        double ny = sigma * (ery - rp * ay) / q;
        double nz = sigma * (erz - rp * az) / q;
        out.normal[0] = nx;
        out.normal[1] = ny;
        out.normal[2] = nz;
        double d = (x[0] - out.point[0]) * nx + (x[1] - out.point[1]) * ny + (x[2] - out.point[2]) * nz;
        out.distance = d;
        double wm = -sigma * rpp / (q * q * q);
        double den = 1 + d * wm;
        if (!(den > 0)) {
            throw new SurfaceDomainException(String.format(Locale.ROOT,
                "query point (%g, %g, %g) m lies beyond the profile's centre of curvature on %s", x[0], x[1], x[2], name()));
        }
        double hm = wm / den;
        double hf = sigma / (q * rho);
        double tx = (ax + rp * erx) / q;
        double ty = (ay + rp * ery) / q;
        double tz = (az + rp * erz) / q;
        out.setHessian(
            hm * tx * tx + hf * (1 - ax * ax - erx * erx), hm * tx * ty - hf * (ax * ay + erx * ery),
            hm * tx * tz - hf * (ax * az + erx * erz),
            hm * ty * ty + hf * (1 - ay * ay - ery * ery), hm * ty * tz - hf * (ay * az + ery * erz),
            hm * tz * tz + hf * (1 - az * az - erz * erz));
        double km = -wm;
        double kf = -sigma / (q * bigR);
        out.curvature1 = Math.max(km, kf);
        out.curvature2 = Math.min(km, kf);
        double lo = z - profile.first();
        double hi = profile.last() - z;
        out.setMargin(lo, EDGE_FROM, hi, EDGE_TO);
    }

    @Override
    public TriangleMesh mesh(Box extent, int resolution) {
        int n = GridMesh.cells(resolution);
        double[] e = new double[3];
        return GridMesh.of((z, phi, out) -> {
            profile.evaluate(z, e, 0);
            frame.point(ox, oy, oz, z, e[0], phi, out);
        }, profile.first(), profile.last(), n, false, -Math.PI, Math.PI, n, true);
    }

    @Override
    public List<SurfaceCoordinate> coordinates() {
        return List.of(new SurfaceCoordinate("axial", "m", "profile position z of the closest point along the axis from the origin"),
            AxisFrame.AZIMUTH);
    }

    @Override
    public void coordinatesAt(double t, double[] x, ContactGeometry work, double[] out) {
        query(t, x, work);
        out[0] = work.hint[0];
        out[1] = frame.azimuth(x[0] - ox, x[1] - oy, x[2] - oz);
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
     * Largest concave principal curvature on the patch, sampled at 64 points per profile interval
     * (the solver also checks at every step).
     *
     * @return the largest concave curvature (1/m)
     */
    @Override
    public double maxConcaveCurvature() {
        return maxConcave;
    }

    /**
     * Slabs holding the patch: the axial range {@code z_0 ≤ (x − o)·a ≤ z_{n−1}} and the radial reach
     * {@code max |R(z)|} on that range about the axis ({@link Extents#aboutAxis}), the reach bounded
     * rigorously from the profile's Bernstein control points ({@link QuinticSpline#bounds()}; the
     * interpolating spline may bulge beyond its largest knot radius, this holds the bulge).
     *
     * @return the slabs (m)
     */
    @Override
    public List<Slab> extent() {
        double[] r = profile.bounds();
        double reach = Math.max(Math.abs(r[0]), Math.abs(r[1]));
        return Extents.aboutAxis(new Vector3D(ox, oy, oz), new Vector3D(ax, ay, az), profile.first(), profile.last(), reach);
    }

    @Override
    public String name() {
        return String.format(Locale.ROOT,
            "revolution(%s, %d profile points z=[%g, %g] m, origin=(%g, %g, %g), axis=(%g, %g, %g))",
            side.label(), profile.size(), profile.first(), profile.last(), ox, oy, oz, ax, ay, az);
    }
}
