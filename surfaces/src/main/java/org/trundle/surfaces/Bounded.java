package org.trundle.surfaces;

import java.util.ArrayList;
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
 * Any surface cut to a patch with edges: by half-spaces (keep the side of a plane a normal points
 * to), by an axial range along an axis, or by an angular range about an axis. Leaving the patch
 * through one of these edges is an {@code exit} event naming the edge, as for the built-in
 * surfaces; this is how a custom {@link ImplicitSurface} (which has no edges of its own) is made to
 * end:
 * <pre>{@code
 * Surface chute = Bounded.of(implicitTube)
 *     .plane("entry", Vector3D.ZERO, Vector3D.PLUS_I)             // keep x >= 0
 *     .plane("far_end", new Vector3D(0.3, 0, 0), Vector3D.MINUS_I) // keep x <= 0.3
 *     .build();
 * }</pre>
 *
 * <p>Each bound is a signed margin of the contact point {@code p} (the inner surface's closest
 * point), positive inside, zero on the edge (m): a plane through {@code q} with unit normal
 * {@code m}, {@code (p − q)·m}; an axial range about the axis through {@code o} along unit
 * {@code a}, {@code (p − o)·a − from} and {@code to − (p − o)·a} (edges {@code "axial_from"},
 * {@code "axial_to"}); an angular range, the arc {@code ρ (φ − from)} and {@code ρ (to − φ)} at the
 * distance {@code ρ} of {@code p} from the axis, with {@code φ} the azimuth of {@code p} about
 * {@code a} from the reference projected normal to the axis, right-handed, in {@code (−π, π]}
 * (edges {@code "angle_from"}, {@code "angle_to"}). The patch margin is the smallest of these and
 * the inner surface's own. The geometry (point, normal, Hessian, curvatures) is the inner
 * surface's, unchanged.
 *
 * <p>Edge indices: the inner surface's keep theirs; this wrapper's are {@link #FIRST_EDGE} and up,
 * in the order the bounds were added. The mesh is the inner surface's mesh without the triangles
 * that leave the bounds (so it reaches each edge to within one mesh cell); the coordinates are the
 * inner surface's. Immutable and thread-safe when the inner surface is.
 */
public final class Bounded implements Surface {
    /** Index of this wrapper's first edge (the inner surface's edges lie below it). */
    public static final int FIRST_EDGE = 1 << 16;

    private final Surface inner;
    /** Per bound: kind (0 plane, 1 axial from, 2 axial to, 3 angle from, 4 angle to). */
    private final int[] kind;
    /** Per bound: origin, unit direction (normal or axis), reference (angle bounds), bound value. */
    private final double[][] data;
    private final AxisFrame[] frames;
    private final String[] names;

    private Bounded(Builder b) {
        this.inner = b.inner;
        int n = b.kind.size();
        kind = new int[n];
        data = new double[n][];
        frames = new AxisFrame[n];
        names = b.names.toArray(new String[0]);
        for (int i = 0; i < n; i++) {
            kind[i] = b.kind.get(i);
            data[i] = b.data.get(i);
            frames[i] = b.frames.get(i);
        }
    }

    /**
     * Starts bounding a surface.
     *
     * @param inner the surface to bound
     * @return a builder; add at least one bound
     */
    public static Builder of(Surface inner) {
        if (inner == null) {
            throw new IllegalArgumentException("surface to bound must be given, got null");
        }
        return new Builder(inner);
    }

    /** Collects the bounds of a {@link Bounded} surface. Not thread-safe. */
    public static final class Builder {
        private final Surface inner;
        private final List<Integer> kind = new ArrayList<>();
        private final List<double[]> data = new ArrayList<>();
        private final List<AxisFrame> frames = new ArrayList<>();
        private final List<String> names = new ArrayList<>();

        private Builder(Surface inner) {
            this.inner = inner;
        }

        /**
         * Keeps the side of a plane that {@code normal} points to.
         *
         * @param edge the edge's name (snake_case, unique), reported by exit events
         * @param point a point of the plane (m)
         * @param normal normal toward the kept side (any length, not zero)
         * @return this builder
         */
        public Builder plane(String edge, Vector3D point, Vector3D normal) {
            Checks.finite("point", point);
            Vector3D m = Checks.direction("normal", normal);
            add(edge, 0, new double[] {point.getX(), point.getY(), point.getZ(), m.getX(), m.getY(), m.getZ(), 0}, null);
            return this;
        }

        /**
         * Keeps {@code from ≤ (p − origin)·a ≤ to} (edges {@code "axial_from"}, {@code "axial_to"}).
         *
         * @param origin a point of the axis (m)
         * @param axis axis direction (any length, not zero)
         * @param from lower bound (m), may be {@link Double#NEGATIVE_INFINITY}
         * @param to upper bound (m), {@code > from}, may be {@link Double#POSITIVE_INFINITY}
         * @return this builder
         */
        public Builder axialRange(Vector3D origin, Vector3D axis, double from, double to) {
            Checks.finite("origin", origin);
            Vector3D a = Checks.direction("axis", axis);
            if (Double.isNaN(from) || Double.isNaN(to) || !(from < to)) {
                throw new IllegalArgumentException("axial range must satisfy from < to, got from = " + from + ", to = " + to);
            }
            double[] d = {origin.getX(), origin.getY(), origin.getZ(), a.getX(), a.getY(), a.getZ(), 0};
            if (from > Double.NEGATIVE_INFINITY) {
                d[6] = from;
                add("axial_from", 1, d.clone(), null);
            }
            if (to < Double.POSITIVE_INFINITY) {
                d[6] = to;
                add("axial_to", 2, d.clone(), null);
            }
            return this;
        }

        /**
         * Keeps the azimuths {@code from ≤ φ ≤ to} about an axis (edges {@code "angle_from"},
         * {@code "angle_to"}).
         *
         * @param origin a point of the axis (m)
         * @param axis axis direction (any length, not zero); φ runs right-handed about it
         * @param reference direction of φ = 0 (projected normal to the axis; not along it)
         * @param from lower bound (rad), {@code ≥ −π}
         * @param to upper bound (rad), {@code ≤ π}, {@code > from}
         * @return this builder
         */
        public Builder angularRange(Vector3D origin, Vector3D axis, Vector3D reference, double from, double to) {
            Checks.finite("origin", origin);
            Vector3D a = Checks.direction("axis", axis);
            if (reference == null) {
                throw new IllegalArgumentException("reference must be given, got null");
            }
            if (!(from >= -Math.PI && from < to && to <= Math.PI)) {
                throw new IllegalArgumentException("angular range must satisfy -pi <= from < to <= pi, got from = " + from
                    + ", to = " + to);
            }
            AxisFrame f = new AxisFrame(a, reference, "reference");
            add("angle_from", 3, new double[] {origin.getX(), origin.getY(), origin.getZ(), 0, 0, 0, from}, f);
            add("angle_to", 4, new double[] {origin.getX(), origin.getY(), origin.getZ(), 0, 0, 0, to}, f);
            return this;
        }

        private void add(String edge, int k, double[] d, AxisFrame f) {
            if (edge == null || !edge.matches("[a-z][a-z0-9_]*")) {
                throw new IllegalArgumentException("edge name must be snake_case, got " + edge);
            }
            if (names.contains(edge)) {
                throw new IllegalArgumentException("edge name " + edge + " is already used by another bound");
            }
            names.add(edge);
            kind.add(k);
            data.add(d);
            frames.add(f);
        }

        /** @return the bounded surface */
        public Bounded build() {
            if (kind.isEmpty()) {
                throw new IllegalArgumentException("bounded surface needs at least one bound, got none");
            }
            return new Bounded(this);
        }
    }

    /** @return the surface inside the bounds */
    public Surface inner() {
        return inner;
    }

    /** Signed margin (m) of bound i at the point (x, y, z). */
    private double margin(int i, double x, double y, double z) {
        double[] d = data[i];
        double wx = x - d[0];
        double wy = y - d[1];
        double wz = z - d[2];
        switch (kind[i]) {
            case 0:
                return wx * d[3] + wy * d[4] + wz * d[5];
            case 1:
                return wx * d[3] + wy * d[4] + wz * d[5] - d[6];
            case 2:
                return d[6] - (wx * d[3] + wy * d[4] + wz * d[5]);
            default:
                AxisFrame f = frames[i];
                double s = wx * f.ax + wy * f.ay + wz * f.az;
                double rx = wx - s * f.ax;
                double ry = wy - s * f.ay;
                double rz = wz - s * f.az;
                double rho = Math.sqrt(rx * rx + ry * ry + rz * rz);
                double phi = f.azimuth(wx, wy, wz);
                return kind[i] == 3 ? rho * (phi - d[6]) : rho * (d[6] - phi);
        }
    }

    @Override
    public void query(double t, double[] x, ContactGeometry out) {
        inner.query(t, x, out);
        double px = out.point[0];
        double py = out.point[1];
        double pz = out.point[2];
        for (int i = 0; i < kind.length; i++) {
            out.tightenMargin(margin(i, px, py, pz), FIRST_EDGE + i);
        }
    }

    @Override
    public boolean hasEdges() {
        return true;
    }

    @Override
    public String edgeName(int edge) {
        return edge >= FIRST_EDGE && edge - FIRST_EDGE < names.length ? names[edge - FIRST_EDGE] : inner.edgeName(edge);
    }

    @Override
    public double maxConcaveCurvature() {
        return inner.maxConcaveCurvature();
    }

    @Override
    public Object newScratch() {
        return inner.newScratch();
    }

    @Override
    public TriangleMesh mesh(Box extent, int resolution) {
        return inner.mesh(extent, resolution).keep(p -> {
            for (int i = 0; i < kind.length; i++) {
                if (margin(i, p.getX(), p.getY(), p.getZ()) < -1e-12 * Math.max(1.0, p.getNorm())) {
                    return false;
                }
            }
            return true;
        });
    }

    @Override
    public List<SurfaceCoordinate> coordinates() {
        return inner.coordinates();
    }

    @Override
    public void coordinatesAt(double t, double[] x, ContactGeometry work, double[] out) {
        inner.coordinatesAt(t, x, work, out);
    }

    /**
     * Slabs holding the patch: the inner surface's slabs and this wrapper's own (every patch point
     * has a non-negative margin for each bound): a plane bound through {@code q} with normal
     * {@code m} gives the half-open slab {@code x·m ≥ q·m}; an axial range gives
     * {@code x·a ≥ o·a + from} and {@code x·a ≤ o·a + to}. An angular range adds none (the cut
     * wedge is not a slab; the inner surface's slabs still hold the patch). An inner surface with
     * no slabs (an implicit surface) gets its extent from the bounds alone.
     *
     * @return the slabs (m)
     */
    @Override
    public List<Slab> extent() {
        List<Slab> out = new ArrayList<>(inner.extent());
        for (int i = 0; i < kind.length; i++) {
            double[] d = data[i];
            if (kind[i] > 2) {
                continue;
            }
            Vector3D dir = new Vector3D(d[3], d[4], d[5]);
            double at = d[0] * d[3] + d[1] * d[4] + d[2] * d[5];
            if (kind[i] == 0) {
                out.add(new Slab(dir, at, Double.POSITIVE_INFINITY));
            } else if (kind[i] == 1) {
                out.add(new Slab(dir, at + d[6], Double.POSITIVE_INFINITY));
            } else {
                out.add(new Slab(dir, Double.NEGATIVE_INFINITY, at + d[6]));
            }
        }
        return List.copyOf(out);
    }

    @Override
    public String name() {
        return String.format(Locale.ROOT, "bounded(%s, edges %s)", inner.name(), String.join(", ", names));
    }
}
