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
 * A tube of constant or smoothly varying radius about a C⁴ centreline: bent tubes, helical chutes.
 * The centreline {@code C(u)} is the natural quintic spline ({@link QuinticSpline}, per coordinate)
 * through the given points, parameterised by cumulative chord length {@code u} (m); the radius
 * {@code R(u)} is the natural cubic spline ({@link CubicSpline}, C²; a varying radius keeps curvature
 * steps at the knots, the quintic is not used for it yet: see the README's limits) through the radii given at the points. The ball is
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
 * from the knot or interval midpoint with the smallest signed {@code ℓ − R} (the cross-section the
 * point lies in, not the wall of a neighbouring turn of a helix).
 *
 * <p>Geometry with {@code e = (x − C)/ℓ}, {@code σ = +1} outside and {@code −1} inside:
 * {@code p = C + R e}, {@code n = σ e}, {@code d = σ (ℓ − R)}, and, differentiating {@code e} with
 * the foot's dependence {@code ∇u = −(C' + R' e)/G'},
 * <pre>  H = σ [P + v vᵀ/G'] / ℓ,   P = I − e eᵀ,  v = P C' = C' + R' e</pre>
 * whose tangential eigenvalues {@code h₁ = σ/ℓ} (normal to {@code v}) and
 * {@code h₂ = σ (1 + |v|²/G')/ℓ} give the principal curvatures {@code κ = −h/(1 − d h)} (from
 * {@code H = W (I + d W)⁻¹}). No frame is needed for this (an angle frame, {@link AngleFrame},
 * serves only the angular bounds of an open tube and the {@code angle} coordinate); the patch margin
 * is the distance of the foot from the nearer end, {@code min(u − u₀, u_N − u)·|C'(u)|} (m, to
 * first order in the distance from the end).
 *
 * <p>Angles round the centreline: {@code θ = atan2(e·(t × r), e·r)} in {@code (−π, π]}, with
 * {@code t} the unit tangent (from the first point toward the last), {@code r(u)} the frame's
 * reference normal and {@code e} the direction from the centreline to the point: θ runs
 * right-handed about the direction of travel, from {@code r} toward {@code t × r}. For a chute
 * running away from the viewer with a downward reference, positive angles are on the viewer's left.
 *
 * <p>Coordinates ({@link #coordinates()}): {@code arc_length} (m, along the centreline from the
 * first point to the foot, by 5-point Gauss–Legendre quadrature of {@code |C'|} on each frame
 * sample interval, common practice) and {@code angle} (rad, θ above). The mesh spans the whole
 * length and the open tube's angle range.
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

    private final QuinticSpline cx;
    private final QuinticSpline cy;
    private final QuinticSpline cz;
    private final CubicSpline radius;
    private final boolean constantRadius;
    private final double constRadius;
    private final Side side;
    private final double length;
    private final double maxConcave;
    private final boolean angular;
    private final double angleFrom;
    private final double angleTo;
    private final AngleFrame angleFrame;
    /** Unit reference direction of the projected-reference frame (null for a rotation-minimising one). */
    private final double[] ref;
    /** Arc length (m) from the first point to each frame sample. */
    private final double[] arc;
    /** Rotation-minimising frame samples: parameter, point, unit tangent, reference normal. */
    private final double[] fu;
    private final double[] fx;
    private final double[] ft;
    private final double[] fr;

    /** Per-run scratch: centreline and radius values with derivatives. */
    private static final class Work {
        final double[] v = new double[12];
        final double[] f = new double[6];
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
     * An open tube whose angle is measured from the reference projected onto each cross-section
     * ({@link AngleFrame#PROJECTED_REFERENCE}); see the full constructor.
     *
     * @param points centreline points (m), at least 2, consecutive points distinct
     * @param radii tube radius at each point (m), positive
     * @param side which side the ball is on
     * @param reference direction of {@code θ = 0} (never along the tangent), or null for a closed
     *     tube
     * @param angleFrom lower angular bound (rad), {@code ≥ −π}
     * @param angleTo upper angular bound (rad), {@code ≤ π}, {@code > angleFrom}
     */
    public SplineTube(Vector3D[] points, double[] radii, Side side, Vector3D reference, double angleFrom, double angleTo) {
        this(points, radii, side, reference, angleFrom, angleTo, AngleFrame.PROJECTED_REFERENCE);
    }

    /**
     * An open tube (a chute or half-pipe): only the wall whose angle about the centreline lies in
     * {@code angleFrom ≤ θ ≤ angleTo} exists. The angle is measured in the plane normal to the
     * centreline from the reference normal {@code r(u)} of the chosen {@link AngleFrame}, toward
     * {@code t × r} ({@code t} the unit tangent): either the reference projected onto each
     * cross-section (the walls stay where the builder put them), or a rotation-minimising frame
     * started from the projected reference at the first point and carried along the curve by the
     * double-reflection method (W. Wang, B. Jüttler, D. Zheng, Y. Liu, "Computation of rotation
     * minimizing frames", ACM Trans. Graphics 27 (2008) 2), not the Frenet frame, which flips at
     * inflections. Without a reference the tube is closed and its {@code angle} coordinate uses a
     * rotation-minimising frame from an arbitrary first normal. Margin to an angular edge: the arc
     * length {@code R·Δθ} (m).
     *
     * @param points centreline points (m), at least 2, consecutive points distinct
     * @param radii tube radius at each point (m), positive
     * @param side which side the ball is on
     * @param reference direction of {@code θ = 0} (for the projected frame, never within about
     *     0.06° of the tangent), or null for a closed tube
     * @param angleFrom lower angular bound (rad), {@code ≥ −π}
     * @param angleTo upper angular bound (rad), {@code ≤ π}, {@code > angleFrom}
     * @param angleFrame how the angle is measured along the tube
     */
    public SplineTube(Vector3D[] points, double[] radii, Side side, Vector3D reference, double angleFrom, double angleTo,
                      AngleFrame angleFrame) {
        if (points == null || points.length < 2) {
            throw new IllegalArgumentException("spline tube needs at least 2 centreline points, got "
                + (points == null ? "null" : points.length));
        }
        if (radii == null || radii.length != points.length) {
            throw new IllegalArgumentException("spline tube needs one radius per point, got "
                + (radii == null ? "null" : radii.length) + " radii for " + points.length + " points");
        }
        if (side == null || angleFrame == null) {
            throw new IllegalArgumentException("side and angleFrame must be given, got side = " + side
                + ", angleFrame = " + angleFrame);
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
        this.cx = new QuinticSpline(u, xs, "spline tube x");
        this.cy = new QuinticSpline(u, ys, "spline tube y");
        this.cz = new QuinticSpline(u, zs, "spline tube z");
        this.radius = new CubicSpline(u, radii, "spline tube radius");
        this.constantRadius = constant;
        this.constRadius = radii[0];
        this.side = side;
        this.length = u[n - 1];
        // fit check data, sampled at 64 points per interval: the centreline curvature κ_c must
        // satisfy R κ_c < 1; concave curvatures are 1/R inside and κ_c/(1 − R κ_c) outside
        double[] w = new double[12];
        double[] prev = new double[6];
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
                // between samples: the turn of the tangent over the chord must also stay below 1/R,
                // which catches a centreline that stops and turns back (collinear points that double
                // back have κ_c = 0 at every sample, yet a half turn between two of them)
                double sp = Math.sqrt(sp2);
                if (j > 0) {
                    double dot = (prev[3] * w[1] + prev[4] * w[4] + prev[5] * w[7]) / sp;
                    double qx = (prev[4] * w[7] - prev[5] * w[4]) / sp;
                    double qy = (prev[5] * w[1] - prev[3] * w[7]) / sp;
                    double qz = (prev[3] * w[4] - prev[4] * w[1]) / sp;
                    double ds = Math.sqrt((w[0] - prev[0]) * (w[0] - prev[0]) + (w[3] - prev[1]) * (w[3] - prev[1])
                        + (w[6] - prev[2]) * (w[6] - prev[2]));
                    double turn = Math.atan2(Math.sqrt(qx * qx + qy * qy + qz * qz), dot);
                    if (r * turn > ds) {
                        throw new IllegalArgumentException(String.format(Locale.ROOT,
                            "spline tube centreline turns by %g degrees within %g m near u = %g m: it turns back or bends "
                                + "more sharply than its radius %g m allows", Math.toDegrees(turn), ds, t, r));
                    }
                }
                prev[0] = w[0];
                prev[1] = w[3];
                prev[2] = w[6];
                prev[3] = w[1] / sp;
                prev[4] = w[4] / sp;
                prev[5] = w[7] / sp;
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
        Vector3D refUnit = reference == null ? null : Checks.direction("spline tube reference direction", reference);
        this.angleFrame = refUnit == null ? AngleFrame.ROTATION_MINIMISING : angleFrame;
        this.ref = refUnit == null || this.angleFrame == AngleFrame.ROTATION_MINIMISING ? null : refUnit.toArray();
        int m = (n - 1) * FRAME_SAMPLES + 1;
        fu = new double[m];
        fx = new double[3 * m];
        ft = new double[3 * m];
        fr = new double[3 * m];
        Vector3D refv = refUnit;
        arc = new double[m];
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
            if (j > 0) {
                arc[j] = arc[j - 1] + arcLength(fu[j - 1], t, w);
            }
            if (ref != null) {
                double rt = ref[0] * ft[3 * j] + ref[1] * ft[3 * j + 1] + ref[2] * ft[3 * j + 2];
                if (!(Math.sqrt(Math.max(0.0, 1 - rt * rt)) > 1e-3)) {
                    throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "spline tube reference direction %s runs along the centreline's tangent near u = %g m: "
                            + "the projected-reference angle frame is undefined there (choose another reference, or the "
                            + "rotation-minimising angle frame)", reference, t));
                }
            }
            if (j == 0) {
                Vector3D t0 = new Vector3D(ft[0], ft[1], ft[2]);
                Vector3D r0 = refv == null ? t0.orthogonal() : refv.subtract(refv.dotProduct(t0), t0);
                if (!(r0.getNorm() > 1e-12)) {
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
     * The angle frame's reference normal at parameter {@code u}, the direction of angle 0 (the
     * projected reference, or the rotation-minimising frame's normal; allocates, for tests and setup
     * code).
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
        double tx = w[1] / sp;
        double ty = w[4] / sp;
        double tz = w[7] / sp;
        if (ref != null) {
            double rt = ref[0] * tx + ref[1] * ty + ref[2] * tz;
            double rx = ref[0] - rt * tx;
            double ry = ref[1] - rt * ty;
            double rz = ref[2] - rt * tz;
            double nr = Math.sqrt(rx * rx + ry * ry + rz * rz);
            f[0] = rx / nr;
            f[1] = ry / nr;
            f[2] = rz / nr;
            return;
        }
        reflect(fx, ft, fr, 3 * j, w[0], w[3], w[6], tx, ty, tz, f, 0);
    }

    /** Gauss–Legendre 5-point nodes on [-1, 1] and weights (common practice). */
    private static final double[] GL_X = {0.0, -0.5384693101056831, 0.5384693101056831, -0.9061798459386640, 0.9061798459386640};
    private static final double[] GL_W = {0.5688888888888889, 0.4786286704993665, 0.4786286704993665, 0.2369268850561891,
        0.2369268850561891};

    /** Arc length of the centreline between parameters a and b (m), 5-point Gauss–Legendre; overwrites w. */
    private double arcLength(double a, double b, double[] w) {
        double half = 0.5 * (b - a);
        double mid = 0.5 * (a + b);
        double sum = 0;
        for (int k = 0; k < GL_X.length; k++) {
            cx.evaluate(mid + half * GL_X[k], w, 0);
            cy.evaluate(mid + half * GL_X[k], w, 3);
            cz.evaluate(mid + half * GL_X[k], w, 6);
            sum += GL_W[k] * Math.sqrt(w[1] * w[1] + w[4] * w[4] + w[7] * w[7]);
        }
        return half * sum;
    }

    /**
     * @param u chord-length parameter (m), clamped to the tube
     * @return the arc length of the centreline from the first point to {@code u} (m)
     */
    public double arcLength(double u) {
        double c = Math.max(fu[0], Math.min(fu[fu.length - 1], u));
        int j = java.util.Arrays.binarySearch(fu, c);
        if (j >= 0) {
            return arc[j];
        }
        j = -j - 2;
        return arc[j] + arcLength(fu[j], c, new double[12]);
    }

    /**
     * @param u chord-length parameter (m)
     * @return the centreline point {@code C(u)} (m)
     */
    public Vector3D centre(double u) {
        double[] w = new double[12];
        eval(u, w);
        return new Vector3D(w[0], w[3], w[6]);
    }

    /**
     * @param u chord-length parameter (m)
     * @return the unit tangent {@code C'/|C'|} at {@code u}, from the first point toward the last
     */
    public Vector3D tangent(double u) {
        double[] w = new double[12];
        eval(u, w);
        return new Vector3D(w[1], w[4], w[7]).normalize();
    }

    /** @return how the angle round the centreline is measured */
    public AngleFrame angleFrame() {
        return angleFrame;
    }

    /**
     * The angle frame at u: writes the reference normal r to {@code fn[0..2]} and {@code t × r} to
     * {@code fn[3..5]} and returns |C'(u)|; w holds the centreline at u on return.
     */
    private double crossSection(double u, double[] w, double[] fn) {
        frame(u, w, fn);
        double speed = Math.sqrt(w[1] * w[1] + w[4] * w[4] + w[7] * w[7]);
        double tx = w[1] / speed;
        double ty = w[4] / speed;
        double tz = w[7] / speed;
        fn[3] = ty * fn[2] - tz * fn[1];
        fn[4] = tz * fn[0] - tx * fn[2];
        fn[5] = tx * fn[1] - ty * fn[0];
        return speed;
    }

    /** Angle θ (rad) of the unit direction e about the centreline at u; w holds the centreline at u on return. */
    private double angle(double u, double ex, double ey, double ez, double[] w, double[] fn) {
        crossSection(u, w, fn);
        return Math.atan2(ex * fn[3] + ey * fn[4] + ez * fn[5], ex * fn[0] + ey * fn[1] + ez * fn[2]);
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
                // signed ℓ − R: the cross-section the point lies in (or nearest outside), not the
                // nearest wall of a neighbouring turn
                double dd = Math.sqrt(dx * dx + dy * dy + dz * dz) - w[9];
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
        // κ = −h/(1 − d h) with h = σ a/ℓ, written as −σ a/(ℓ − σ d a): no 1/ℓ, so the curvature
        // stays accurate as the centre nears the centreline (where a ball of the bore's radius sits)
        double a2 = 1 + (vx * vx + vy * vy + vz * vz) / gp;
        double k1 = -sigma / (ell - sigma * d);
        double k2 = -sigma * a2 / (ell - sigma * d * a2);
        out.curvature1 = Math.max(k1, k2);
        out.curvature2 = Math.min(k1, k2);
        double speed = Math.sqrt(w[1] * w[1] + w[4] * w[4] + w[7] * w[7]);
        double lo = (u - cx.first()) * speed;
        double hi = (cx.last() - u) * speed;
        out.setMargin(lo, EDGE_FROM, hi, EDGE_TO);
        if (angular) {
            double theta = angle(u, ex, ey, ez, w, work.f);
            double a0 = r * (theta - angleFrom);
            double a1 = r * (angleTo - theta);
            out.tightenMargin(a0, EDGE_ANGLE_FROM);
            out.tightenMargin(a1, EDGE_ANGLE_TO);
        }
    }

    @Override
    public TriangleMesh mesh(Box extent, int resolution) {
        int n = GridMesh.cells(resolution);
        double[] w = new double[12];
        double[] f = new double[6];
        return GridMesh.of((u, theta, out) -> {
            double sp = crossSection(u, w, f);
            // the envelope's foot direction: e·t = −R'/|C'| (from G(u) = 0 at x = C + R e)
            double et = -w[10] / sp;
            double en = Math.sqrt(Math.max(0.0, 1 - et * et));
            double c = en * Math.cos(theta);
            double s = en * Math.sin(theta);
            double r = w[9];
            out[0] = w[0] + r * (et * w[1] / sp + c * f[0] + s * f[3]);
            out[1] = w[3] + r * (et * w[4] / sp + c * f[1] + s * f[4]);
            out[2] = w[6] + r * (et * w[7] / sp + c * f[2] + s * f[5]);
        }, cx.first(), cx.last(), n, false, angleFrom, angleTo, n, !angular);
    }

    @Override
    public List<SurfaceCoordinate> coordinates() {
        return List.of(new SurfaceCoordinate("arc_length", "m", "length along the centreline from the first point to the foot"),
            new SurfaceCoordinate("angle", "rad",
                "angle round the centreline in (-pi, pi], right-handed about the direction of travel, from the frame's reference"));
    }

    @Override
    public void coordinatesAt(double t, double[] x, ContactGeometry work, double[] out) {
        query(t, x, work);
        Work k = (Work) work.scratch;
        double u = work.hint[0];
        double[] w = k.v;
        eval(u, w);
        double ex = x[0] - w[0];
        double ey = x[1] - w[3];
        double ez = x[2] - w[6];
        out[0] = arcLength(u);
        out[1] = angle(u, ex, ey, ez, w, k.f);
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
                return "angle_from";
            default:
                return "angle_to";
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

    /**
     * Slabs holding the patch: along each world axis, the range of that centreline coordinate grown
     * by the largest radius. A patch point is {@code p = C(u) + R(u) e} with {@code |e| = 1} and
     * {@code u} between the end points, so {@code |p_k − C_k(u)| ≤ max |R|}; each coordinate
     * spline's range and the radius spline's are bounded rigorously from their Bernstein control
     * points ({@link QuinticSpline#bounds()}, {@link CubicSpline#bounds()}; interpolating splines
     * overshoot their knots, and these bounds hold the overshoot). An open tube keeps these slabs
     * (its wall is part of the closed tube's).
     *
     * @return three slabs (m), along x, y and z
     */
    @Override
    public List<Slab> extent() {
        double[] r = radius.bounds();
        double reach = Math.max(Math.abs(r[0]), Math.abs(r[1]));
        double[] x = cx.bounds();
        double[] y = cy.bounds();
        double[] z = cz.bounds();
        return List.of(new Slab(Vector3D.PLUS_I, x[0] - reach, x[1] + reach),
            new Slab(Vector3D.PLUS_J, y[0] - reach, y[1] + reach),
            new Slab(Vector3D.PLUS_K, z[0] - reach, z[1] + reach));
    }

    @Override
    public String name() {
        return String.format(Locale.ROOT, "splineTube(%s, %d points, length %g m, radius %s)",
            side.label(), cx.size(), length, constantRadius ? String.format(Locale.ROOT, "%g m", constRadius) : "varying");
    }
}
