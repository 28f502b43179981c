package org.trundle.surfaces;

import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceDomainException;

/**
 * A tube of constant or smoothly varying radius about a C² centreline: bent tubes, helical chutes.
 * The centreline {@code C(u)} is the natural cubic spline ({@link CubicSpline}, per coordinate)
 * through the given points, parameterised by cumulative chord length {@code u} (m); the radius
 * {@code R(u)} is the natural cubic spline through the radii given at the points. The ball is
 * {@link Side#INSIDE} the tube or {@link Side#OUTSIDE} it (a bent rod); the patch runs from the
 * first point to the last (edges {@code "from"}, {@code "to"}, open ends).
 *
 * <p>The tube is the envelope of the spheres of radius {@code R(u)} about {@code C(u)}. The foot
 * parameter {@code u} of a query point {@code x} makes {@code ℓ(u) − R(u)} stationary,
 * {@code ℓ = |x − C(u)|}:
 * <pre>  G(u) = (x − C)·C' + R' ℓ = 0</pre>
 * (the design notes' condition {@code (x − C)·C'(s) = −R'(s)|x − C|}, here in the chord parameter;
 * with a constant radius the foot is radial from the nearest centreline point). It is solved by
 * Newton's method, {@code G' = −|C'|² + (x − C)·C'' + R'' ℓ − R' (e·C')}, seeded from the previous
 * foot of the run ({@link ContactGeometry#hint}{@code [0]}), so a query costs O(1); without a seed,
 * from the nearest knot or interval midpoint.
 *
 * <p>Geometry with {@code e = (x − C)/ℓ}, {@code σ = +1} outside and {@code −1} inside:
 * {@code p = C + R e}, {@code n = σ e}, {@code d = σ (ℓ − R)}, and, differentiating {@code e} with
 * the foot's dependence {@code ∇u = −(C' + R' e)/G'},
 * <pre>  H = σ [P + v vᵀ/G'] / ℓ,   P = I − e eᵀ,  v = P C' = C' + R' e</pre>
 * whose tangential eigenvalues {@code h₁ = σ/ℓ} (normal to {@code v}) and
 * {@code h₂ = σ (1 + |v|²/G')/ℓ} give the principal curvatures {@code κ = −h/(1 − d h)} (from
 * {@code H = W (I + d W)⁻¹}). No frame is needed for this (the rotation-minimising frame serves only
 * the angular bounds of an open tube, see the last constructor); the patch margin is the distance of the
 * foot from the nearer end, {@code min(u − u₀, u_N − u)·|C'(u)|} (m, to first order in the
 * distance from the end).
 *
 * <p>The centreline ({@code ℓ = 0}) has no closest point and a query there throws
 * {@link SurfaceDomainException}, as does one where the Newton iteration fails. Immutable and
 * thread-safe; the per-run Newton seed and scratch live in the run's workspace.
 */
public final class SplineTube implements Surface {
    /** Edge index of the first centreline point. */
    public static final int EDGE_FROM = 0;
    /** Edge index of the last centreline point. */
    public static final int EDGE_TO = 1;
    /** Edge index of the lower angular bound of an open tube (chute). */
    public static final int EDGE_ANGLE_FROM = 2;
    /** Edge index of the upper angular bound of an open tube (chute). */
    public static final int EDGE_ANGLE_TO = 3;
    /** Rotation-minimising frame samples per spline interval. */
    private static final int FRAME_SAMPLES = 16;
    private static final int MAX_ITER = 50;

    private final CubicSpline cx;
    private final CubicSpline cy;
    private final CubicSpline cz;
    private final CubicSpline radius;
    private final boolean constantRadius;
    private final double constRadius;
    private final Side side;
    private final double length;
    private final double maxConcave;
    private final boolean angular;
    private final double angleFrom;
    private final double angleTo;
    /** Rotation-minimising frame samples: parameter, point, unit tangent, reference normal. */
    private final double[] fu;
    private final double[] fx;
    private final double[] ft;
    private final double[] fr;

    /** Per-run scratch: centreline and radius values with derivatives. */
    private static final class Work {
        final double[] v = new double[12];
        final double[] f = new double[3];
    }

    /**
     * A tube of constant radius.
     *
     * @param points centreline points (m), at least 2, consecutive points distinct
     * @param radius tube radius (m)
     * @param side which side the ball is on
     */
    public SplineTube(Vector3D[] points, double radius, Side side) {
        this(points, constant(points, radius), side);
    }

    /**
     * A tube whose radius varies smoothly along the centreline.
     *
     * @param points centreline points (m), at least 2, consecutive points distinct
     * @param radii tube radius at each point (m), positive
     * @param side which side the ball is on
     */
    public SplineTube(Vector3D[] points, double[] radii, Side side) {
        this(points, radii, side, null, -Math.PI, Math.PI);
    }

    /**
     * An open tube (a chute or half-pipe): only the wall whose angle about the centreline lies in
     * {@code angleFrom ≤ θ ≤ angleTo} exists. The angle is measured in the plane normal to the
     * centreline from the reference normal {@code r(u)} of a rotation-minimising frame, toward
     * {@code t × r} ({@code t} the unit tangent). The frame starts at the first point from
     * {@code reference} projected normal to the tangent, and is carried along the curve by the
     * double-reflection method (W. Wang, B. Jüttler, D. Zheng, Y. Liu, "Computation of rotation
     * minimizing frames", ACM Trans. Graphics 27 (2008) 2), not the Frenet frame, which flips at
     * inflections. Margin to an angular edge: the arc length {@code R·Δθ} (m).
     *
     * @param points centreline points (m), at least 2, consecutive points distinct
     * @param radii tube radius at each point (m), positive
     * @param side which side the ball is on
     * @param reference direction of {@code θ = 0} at the first point (not along the tangent), or null
     *     for a closed tube
     * @param angleFrom lower angular bound (rad), {@code ≥ −π}
     * @param angleTo upper angular bound (rad), {@code ≤ π}, {@code > angleFrom}
     */
    public SplineTube(Vector3D[] points, double[] radii, Side side, Vector3D reference, double angleFrom, double angleTo) {
        if (points == null || points.length < 2) {
            throw new IllegalArgumentException("spline tube needs at least 2 centreline points, got "
                + (points == null ? "null" : points.length));
        }
        if (radii == null || radii.length != points.length) {
            throw new IllegalArgumentException("spline tube needs one radius per point, got "
                + (radii == null ? "null" : radii.length) + " radii for " + points.length + " points");
        }
        if (side == null) {
            throw new IllegalArgumentException("side must be given, got null");
        }
        int n = points.length;
        double[] u = new double[n];
        double[] xs = new double[n];
        double[] ys = new double[n];
        double[] zs = new double[n];
        boolean constant = true;
        for (int i = 0; i < n; i++) {
            if (points[i] == null || !Double.isFinite(points[i].getNorm())) {
                throw new IllegalArgumentException("spline tube point " + i + " must be finite, got " + points[i]);
            }
            if (!(radii[i] > 0) || !Double.isFinite(radii[i])) {
                throw new IllegalArgumentException("spline tube radius[" + i + "] must be finite and positive, got " + radii[i]);
            }
            constant &= radii[i] == radii[0];
            xs[i] = points[i].getX();
            ys[i] = points[i].getY();
            zs[i] = points[i].getZ();
            if (i > 0) {
                double chord = points[i].distance(points[i - 1]);
                if (!(chord > 0)) {
                    throw new IllegalArgumentException("spline tube points " + (i - 1) + " and " + i + " coincide: " + points[i]);
                }
                u[i] = u[i - 1] + chord;
            }
        }
        this.cx = new CubicSpline(u, xs, "spline tube x");
        this.cy = new CubicSpline(u, ys, "spline tube y");
        this.cz = new CubicSpline(u, zs, "spline tube z");
        this.radius = new CubicSpline(u, radii, "spline tube radius");
        this.constantRadius = constant;
        this.constRadius = radii[0];
        this.side = side;
        this.length = u[n - 1];
        // fit check data, sampled at 64 points per interval: the centreline curvature κ_c must
        // satisfy R κ_c < 1; concave curvatures are 1/R inside and κ_c/(1 − R κ_c) outside
        double[] w = new double[12];
        double kmax = 0;
        for (int i = 0; i < n - 1; i++) {
            for (int j = 0; j <= 64; j++) {
                double t = u[i] + (u[i + 1] - u[i]) * j / 64.0;
                eval(t, w);
                double sp2 = w[1] * w[1] + w[4] * w[4] + w[7] * w[7];
                double crx = w[4] * w[8] - w[7] * w[5];
                double cry = w[7] * w[2] - w[1] * w[8];
                double crz = w[1] * w[5] - w[4] * w[2];
                double kc = Math.sqrt(crx * crx + cry * cry + crz * crz) / (sp2 * Math.sqrt(sp2));
                double r = w[9];
                if (!(r > 0) || !(r * kc < 1)) {
                    throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "spline tube radius %g m at u = %g m must be positive and below the centreline's radius of curvature %g m",
                        r, t, 1 / kc));
                }
                kmax = Math.max(kmax, side == Side.INSIDE ? 1 / r : kc / (1 - r * kc));
            }
        }
        this.maxConcave = constant ? kmax : Double.NaN;
        if (!(angleFrom >= -Math.PI && angleFrom < angleTo && angleTo <= Math.PI)) {
            throw new IllegalArgumentException("spline tube angular bounds must satisfy -pi <= angleFrom < angleTo <= pi, got angleFrom = "
                + angleFrom + ", angleTo = " + angleTo);
        }
        this.angular = reference != null && (angleFrom > -Math.PI || angleTo < Math.PI);
        this.angleFrom = angleFrom;
        this.angleTo = angleTo;
        int m = (n - 1) * FRAME_SAMPLES + 1;
        fu = new double[m];
        fx = new double[3 * m];
        ft = new double[3 * m];
        fr = new double[3 * m];
        Vector3D ref = reference == null ? null : reference;
        if (ref != null && !Double.isFinite(ref.getNorm())) {
            throw new IllegalArgumentException("spline tube reference direction must be finite, got " + reference);
        }
        for (int j = 0; j < m; j++) {
            int i = Math.min(j / FRAME_SAMPLES, n - 2);
            int k = j - i * FRAME_SAMPLES;
            double t = j == m - 1 ? u[n - 1] : u[i] + (u[i + 1] - u[i]) * k / FRAME_SAMPLES;
            fu[j] = t;
            eval(t, w);
            double sp = Math.sqrt(w[1] * w[1] + w[4] * w[4] + w[7] * w[7]);
            fx[3 * j] = w[0];
            fx[3 * j + 1] = w[3];
            fx[3 * j + 2] = w[6];
            ft[3 * j] = w[1] / sp;
            ft[3 * j + 1] = w[4] / sp;
            ft[3 * j + 2] = w[7] / sp;
            if (j == 0) {
                Vector3D t0 = new Vector3D(ft[0], ft[1], ft[2]);
                Vector3D r0 = ref == null ? t0.orthogonal() : ref.subtract(ref.dotProduct(t0), t0);
                if (!(r0.getNorm() > 1e-12 * (ref == null ? 1 : ref.getNorm()))) {
                    throw new IllegalArgumentException("spline tube reference direction must not be along the first tangent, got "
                        + reference);
                }
                r0 = r0.normalize();
                fr[0] = r0.getX();
                fr[1] = r0.getY();
                fr[2] = r0.getZ();
            } else {
                reflect(fx, ft, fr, 3 * (j - 1), fx[3 * j], fx[3 * j + 1], fx[3 * j + 2], ft[3 * j], ft[3 * j + 1], ft[3 * j + 2],
                    fr, 3 * j);
            }
        }
    }

    /**
     * One double-reflection step of the rotation-minimising frame from sample {@code i} to the
     * point {@code x1} with unit tangent {@code t1}; writes the new reference normal to
     * {@code out[o..o+2]}.
     */
    private static void reflect(double[] px, double[] pt, double[] pr, int i, double x1, double y1, double z1,
                                double t1x, double t1y, double t1z, double[] out, int o) {
        double v1x = x1 - px[i];
        double v1y = y1 - px[i + 1];
        double v1z = z1 - px[i + 2];
        double c1 = v1x * v1x + v1y * v1y + v1z * v1z;
        double rx = pr[i];
        double ry = pr[i + 1];
        double rz = pr[i + 2];
        double tx = pt[i];
        double ty = pt[i + 1];
        double tz = pt[i + 2];
        if (c1 > 0) {
            double fr1 = 2 * (v1x * rx + v1y * ry + v1z * rz) / c1;
            rx -= fr1 * v1x;
            ry -= fr1 * v1y;
            rz -= fr1 * v1z;
            double ft1 = 2 * (v1x * tx + v1y * ty + v1z * tz) / c1;
            tx -= ft1 * v1x;
            ty -= ft1 * v1y;
            tz -= ft1 * v1z;
        }
        double v2x = t1x - tx;
        double v2y = t1y - ty;
        double v2z = t1z - tz;
        double c2 = v2x * v2x + v2y * v2y + v2z * v2z;
        if (c2 > 0) {
            double f2 = 2 * (v2x * rx + v2y * ry + v2z * rz) / c2;
            rx -= f2 * v2x;
            ry -= f2 * v2y;
            rz -= f2 * v2z;
        }
        // remove the tangential drift and renormalise (exact in exact arithmetic)
        double dt = rx * t1x + ry * t1y + rz * t1z;
        rx -= dt * t1x;
        ry -= dt * t1y;
        rz -= dt * t1z;
        double nr = Math.sqrt(rx * rx + ry * ry + rz * rz);
        out[o] = rx / nr;
        out[o + 1] = ry / nr;
        out[o + 2] = rz / nr;
    }

    /**
     * The rotation-minimising frame's reference normal at parameter {@code u} (allocates; for tests
     * and setup code).
     *
     * @param u chord-length parameter (m)
     * @return the unit reference normal {@code r(u)}
     */
    public Vector3D frameNormal(double u) {
        double[] w = new double[12];
        double[] f = new double[3];
        frame(u, w, f);
        return new Vector3D(f[0], f[1], f[2]);
    }

    /** Frame normal at u (w must hold the centreline at u after the call). */
    private void frame(double u, double[] w, double[] f) {
        int j = java.util.Arrays.binarySearch(fu, u);
        if (j < 0) {
            j = -j - 2;
        }
        j = Math.max(0, Math.min(fu.length - 1, j));
        eval(u, w);
        double sp = Math.sqrt(w[1] * w[1] + w[4] * w[4] + w[7] * w[7]);
        reflect(fx, ft, fr, 3 * j, w[0], w[3], w[6], w[1] / sp, w[4] / sp, w[7] / sp, f, 0);
    }

    private static double[] constant(Vector3D[] points, double radius) {
        if (points == null) {
            throw new IllegalArgumentException("spline tube points must be given, got null");
        }
        if (!(radius > 0) || !Double.isFinite(radius)) {
            throw new IllegalArgumentException("spline tube radius must be finite and positive, got " + radius);
        }
        double[] r = new double[points.length];
        java.util.Arrays.fill(r, radius);
        return r;
    }

    /** @return the side the ball is on */
    public Side side() {
        return side;
    }

    /** @return the centreline's chord length parameter range (m) */
    public double length() {
        return length;
    }

    @Override
    public Object newScratch() {
        return new Work();
    }

    private void eval(double u, double[] w) {
        cx.evaluate(u, w, 0);
        cy.evaluate(u, w, 3);
        cz.evaluate(u, w, 6);
        if (constantRadius) {
            w[9] = constRadius;
            w[10] = 0;
            w[11] = 0;
        } else {
            radius.evaluate(u, w, 9);
        }
    }

    @Override
    public void query(double t, double[] x, ContactGeometry out) {
        Work work = out.scratch instanceof Work ? (Work) out.scratch : null;
        if (work == null) {
            work = new Work();
            out.scratch = work;
        }
        double[] w = work.v;
        double u;
        if (out.hintValid) {
            u = out.hint[0];
        } else {
            u = 0;
            double best = Double.POSITIVE_INFINITY;
            int n = cx.size();
            for (int i = 0; i < 2 * n - 1; i++) {
                double ui = (i % 2 == 0) ? cx.knot(i / 2) : 0.5 * (cx.knot(i / 2) + cx.knot(i / 2 + 1));
                eval(ui, w);
                double dx = x[0] - w[0];
                double dy = x[1] - w[3];
                double dz = x[2] - w[6];
                double dd = Math.abs(Math.sqrt(dx * dx + dy * dy + dz * dz) - w[9]);
                if (dd < best) {
                    best = dd;
                    u = ui;
                }
            }
        }
        double tol = 1e-14 * length;
        boolean converged = false;
        double ell = 0;
        double gp = -1;
        for (int it = 0; it <= MAX_ITER; it++) {
            eval(u, w);
            double dx = x[0] - w[0];
            double dy = x[1] - w[3];
            double dz = x[2] - w[6];
            ell = Math.sqrt(dx * dx + dy * dy + dz * dz);
            if (!(ell > 1e-12 * w[9])) {
                throw new SurfaceDomainException(String.format(Locale.ROOT,
                    "query point (%g, %g, %g) m on the centreline of %s has no closest point", x[0], x[1], x[2], name()));
            }
            double dc = dx * w[1] + dy * w[4] + dz * w[7];
            double g = dc + w[10] * ell;
            gp = -(w[1] * w[1] + w[4] * w[4] + w[7] * w[7]) + dx * w[2] + dy * w[5] + dz * w[8] + w[11] * ell
                - w[10] * dc / ell;
            if (!(gp < 0)) {
                throw new SurfaceDomainException(String.format(Locale.ROOT,
                    "query point (%g, %g, %g) m lies beyond the centreline's centre of curvature on %s (near u = %g m)",
                    x[0], x[1], x[2], name(), u));
            }
            if (converged) {
                break;
            }
            double du = -g / gp;
            double cap = 0.25 * length;
            du = Math.max(-cap, Math.min(cap, du));
            u += du;
            // after a step below the tolerance, evaluate once more at the updated parameter
            converged = Math.abs(du) <= tol;
        }
        if (!converged || !Double.isFinite(u)) {
            throw new SurfaceDomainException(String.format(Locale.ROOT,
                "closest point on %s did not converge for query point (%g, %g, %g) m", name(), x[0], x[1], x[2]));
        }
        out.hint[0] = u;
        out.hintValid = true;
        double ex = (x[0] - w[0]) / ell;
        double ey = (x[1] - w[3]) / ell;
        double ez = (x[2] - w[6]) / ell;
        double r = w[9];
        double sigma = side == Side.INSIDE ? -1.0 : 1.0;
        out.point[0] = w[0] + r * ex;
        out.point[1] = w[3] + r * ey;
        out.point[2] = w[6] + r * ez;
        out.normal[0] = sigma * ex;
        out.normal[1] = sigma * ey;
        out.normal[2] = sigma * ez;
        double d = sigma * (ell - r);
        out.distance = d;
        double vx = w[1] + w[10] * ex;
        double vy = w[4] + w[10] * ey;
        double vz = w[7] + w[10] * ez;
        double f = sigma / ell;
        double c = f / gp;
        out.setHessian(
            f * (1 - ex * ex) + c * vx * vx, -f * ex * ey + c * vx * vy, -f * ex * ez + c * vx * vz,
            f * (1 - ey * ey) + c * vy * vy, -f * ey * ez + c * vy * vz,
            f * (1 - ez * ez) + c * vz * vz);
        double h1 = f;
        double h2 = f * (1 + (vx * vx + vy * vy + vz * vz) / gp);
        double k1 = -h1 / (1 - d * h1);
        double k2 = -h2 / (1 - d * h2);
        out.curvature1 = Math.max(k1, k2);
        out.curvature2 = Math.min(k1, k2);
        double speed = Math.sqrt(w[1] * w[1] + w[4] * w[4] + w[7] * w[7]);
        double lo = (u - cx.first()) * speed;
        double hi = (cx.last() - u) * speed;
        out.setMargin(lo, EDGE_FROM, hi, EDGE_TO);
        if (angular) {
            double[] fn = work.f;
            frame(u, w, fn);
            double tx = w[1] / speed;
            double ty = w[4] / speed;
            double tz = w[7] / speed;
            double bx = ty * fn[2] - tz * fn[1];
            double by = tz * fn[0] - tx * fn[2];
            double bz = tx * fn[1] - ty * fn[0];
            double theta = Math.atan2(ex * bx + ey * by + ez * bz, ex * fn[0] + ey * fn[1] + ez * fn[2]);
            double a0 = r * (theta - angleFrom);
            double a1 = r * (angleTo - theta);
            out.tightenMargin(a0, EDGE_ANGLE_FROM);
            out.tightenMargin(a1, EDGE_ANGLE_TO);
        }
    }

    @Override
    public boolean hasEdges() {
        return true;
    }

    @Override
    public String edgeName(int edge) {
        switch (edge) {
            case EDGE_FROM:
                return "from";
            case EDGE_TO:
                return "to";
            case EDGE_ANGLE_FROM:
                return "angleFrom";
            default:
                return "angleTo";
        }
    }

    /**
     * Largest concave curvature on the patch for a constant radius, sampled at 64 points per
     * interval: {@code 1/R} inside, {@code κ_c/(1 − R κ_c)} outside ({@code κ_c} the centreline
     * curvature); {@link Double#NaN} for a varying radius (the solver then checks at every step).
     *
     * @return the largest concave curvature (1/m)
     */
    @Override
    public double maxConcaveCurvature() {
        return maxConcave;
    }

    @Override
    public String name() {
        return String.format(Locale.ROOT, "splineTube(%s, %d points, length %g m, radius %s)",
            side.label(), cx.size(), length, constantRadius ? String.format(Locale.ROOT, "%g m", constRadius) : "varying");
    }
}
