package org.trundle.surfaces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.LongStream;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.trundle.core.Box;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Slab;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceDomainException;
import org.trundle.core.TriangleMesh;

/**
 * Every slab a surface reports ({@link Surface#extent()}) holds its whole patch: each vertex of its
 * own mesh and each closest point inside the patch (margin ≥ 0) of random query points lies in
 * every slab. The spline surfaces' slabs rest on the Bernstein convex-hull property (G. Farin,
 * Curves and Surfaces for CAGD, from memory), so they must hold where the interpolating splines
 * overshoot their knots; the samplers below draw uneven knot spacings that make them overshoot,
 * and one case is built to overshoot by a known margin. Seeded samplers of our own (JUnit 5).
 */
class ExtentHoldsPatchTest {
    /** Rounding allowance on {@code p·d} (m): coordinates are below 2 m, so their rounding is ~1e-16 m. */
    private static final double ROUND = 1e-13;
    private static final int QUERIES = 400;

    static LongStream seeds() {
        return LongStream.range(1, 21).map(i -> 0x9E3779B97F4A7C15L * i);
    }

    private static Vector3D unit(SplittableRandom rnd) {
        while (true) {
            Vector3D v = new Vector3D(rnd.nextDouble(-1, 1), rnd.nextDouble(-1, 1), rnd.nextDouble(-1, 1));
            double n = v.getNorm();
            if (n > 0.1 && n <= 1) {
                return v.normalize();
            }
        }
    }

    private static Vector3D point(SplittableRandom rnd, double half) {
        return new Vector3D(rnd.nextDouble(-half, half), rnd.nextDouble(-half, half), rnd.nextDouble(-half, half));
    }

    /** A profile with uneven knot spacing (so the quintic overshoots), retried until it stays positive. */
    static SurfaceOfRevolution revolution(SplittableRandom rnd) {
        while (true) {
            int n = 3 + rnd.nextInt(5);
            double[] z = new double[n];
            double[] r = new double[n];
            z[0] = rnd.nextDouble(-0.1, 0.1);
            r[0] = rnd.nextDouble(0.02, 0.08);
            for (int i = 1; i < n; i++) {
                z[i] = z[i - 1] + (rnd.nextBoolean() ? rnd.nextDouble(0.005, 0.02) : rnd.nextDouble(0.03, 0.1));
                r[i] = rnd.nextDouble(0.02, 0.08);
            }
            try {
                return new SurfaceOfRevolution(point(rnd, 0.5), unit(rnd), z, r, rnd.nextBoolean() ? Side.INSIDE : Side.OUTSIDE);
            } catch (IllegalArgumentException notPositive) {
                // the spline dipped to zero between knots: draw again
            }
        }
    }

    /** A bent tube from a random walk, constant or varying radius, sometimes open; retried until it fits. */
    static SplineTube tube(SplittableRandom rnd) {
        while (true) {
            int n = 3 + rnd.nextInt(5);
            Vector3D[] p = new Vector3D[n];
            double[] radii = new double[n];
            p[0] = point(rnd, 0.5);
            Vector3D dir = unit(rnd);
            boolean constant = rnd.nextBoolean();
            double r0 = rnd.nextDouble(0.01, 0.03);
            for (int i = 0; i < n; i++) {
                if (i > 0) {
                    dir = dir.add(0.6, unit(rnd)).normalize();
                    p[i] = p[i - 1].add(rnd.nextDouble(0.04, 0.15), dir);
                }
                radii[i] = constant ? r0 : rnd.nextDouble(0.01, 0.03);
            }
            Side side = rnd.nextBoolean() ? Side.INSIDE : Side.OUTSIDE;
            try {
                if (rnd.nextBoolean()) {
                    return new SplineTube(p, radii, side);
                }
                Vector3D ref = Vector3D.crossProduct(p[1].subtract(p[0]), unit(rnd));
                return new SplineTube(p, radii, side, ref, -2.0, 1.5, AngleFrame.ROTATION_MINIMISING);
            } catch (IllegalArgumentException tooBent) {
                // too tightly bent for its radius: draw again
            }
        }
    }

    /** A bounded cylinder or plane (the assembly walls), by axial range and half-spaces. */
    static Bounded bounded(SplittableRandom rnd) {
        Vector3D o = point(rnd, 0.05);
        Vector3D a = unit(rnd);
        Vector3D across = a.orthogonal();
        Surface inner = rnd.nextBoolean() ? new Cylinder(o, a, rnd.nextDouble(0.01, 0.05), Side.OUTSIDE)
            : new Plane(o, across);
        Vector3D inPlane = Vector3D.crossProduct(a, across);
        double from = rnd.nextDouble(-0.2, 0);
        double to = from + rnd.nextDouble(0.05, 0.3);
        Bounded.Builder b = Bounded.of(inner).axialRange(o, a, from, to);
        b.plane("apex", o, inPlane);
        if (rnd.nextBoolean()) {
            b.plane("rim", o.add(rnd.nextDouble(0.05, 0.2), inPlane), inPlane.negate());
        }
        return b.build();
    }

    static List<Object[]> cases() {
        List<Object[]> out = new ArrayList<>();
        seeds().forEach(seed -> {
            SplittableRandom rnd = new SplittableRandom(seed);
            out.add(new Object[] {"revolution " + seed, revolution(rnd)});
            out.add(new Object[] {"tube " + seed, tube(rnd)});
            out.add(new Object[] {"bounded " + seed, bounded(rnd)});
        });
        return out;
    }

    @ParameterizedTest(name = "[{index}] {0} (sampler seed)")
    @MethodSource("cases")
    void everySlabHoldsTheMeshAndTheClosestPoints(String kind, Surface s) {
        List<Slab> slabs = s.extent();
        assertFalse(slabs.isEmpty(), kind + " reports no extent");
        // the region drawn of an unbounded inner surface (the spline surfaces mesh their whole patch)
        Box box = Box.of(new Vector3D(-0.4, -0.4, -0.4), new Vector3D(0.4, 0.4, 0.4));
        TriangleMesh mesh = s.mesh(box, 64);
        assertTrue(mesh.vertexCount() > 0, kind + ": empty mesh");
        for (int i = 0; i < mesh.vertexCount(); i++) {
            assertInside(kind + " mesh vertex " + i, mesh.vertex(i), slabs);
        }
        SplittableRandom rnd = new SplittableRandom(kind.hashCode());
        ContactGeometry g = new ContactGeometry();
        g.scratch = s.newScratch();
        int inside = 0;
        for (int k = 0; k < QUERIES; k++) {
            // a query point near a mesh vertex, so most closest points fall on the patch
            Vector3D near = mesh.vertex(rnd.nextInt(mesh.vertexCount())).add(point(rnd, 0.03));
            g.hintValid = false;
            try {
                s.query(0, near.toArray(), g);
            } catch (SurfaceDomainException noFoot) {
                continue;
            }
            if (g.patchMargin >= 0) {
                inside++;
                assertInside(kind + " closest point of " + near, new Vector3D(g.point[0], g.point[1], g.point[2]), slabs);
            }
        }
        assertTrue(inside > QUERIES / 4, kind + ": only " + inside + " closest points on the patch");
    }

    private static void assertInside(String what, Vector3D p, List<Slab> slabs) {
        for (Slab sl : slabs) {
            double x = p.dotProduct(sl.direction());
            assertTrue(x >= sl.low() - ROUND && x <= sl.high() + ROUND,
                what + " at " + p + ": p·d = " + x + " outside slab [" + sl.low() + ", " + sl.high() + "] along "
                    + sl.direction());
        }
    }

    /**
     * Knots bunched then spread: the profile bulges well beyond its largest knot radius between the
     * spread knots (sampled), and the reported radial slabs still hold the bulge; they are not more
     * than the hull's looseness wider (within 50% of the sampled bulge).
     */
    @Test
    void radialSlabsHoldAProfileThatOvershootsItsKnots() {
        double[] z = {0.0, 0.005, 0.01, 0.2};
        double[] r = {0.05, 0.06, 0.075, 0.075};
        SurfaceOfRevolution s = new SurfaceOfRevolution(Vector3D.ZERO, Vector3D.PLUS_K, z, r, Side.INSIDE);
        double[] e = new double[3];
        double sampled = 0;
        for (int j = 0; j <= 20000; j++) {
            s.profile().evaluate(0.2 * j / 20000.0, e, 0);
            sampled = Math.max(sampled, e[0]);
        }
        assertTrue(sampled > 0.08, "the profile should overshoot its largest knot radius 0.075 m, got " + sampled);
        List<Slab> slabs = s.extent();
        assertEquals(3, slabs.size());
        assertEquals(0.0, slabs.get(0).low());
        assertEquals(0.2, slabs.get(0).high());
        for (Slab sl : slabs.subList(1, 3)) {
            assertTrue(sl.high() >= sampled && sl.high() < 1.5 * sampled, "radial slab " + sl + " vs sampled " + sampled);
            assertEquals(-sl.high(), sl.low());
        }
    }

    /**
     * Splines through points of a straight line are that line (natural splines reproduce lines), so
     * the hull is exact but for its rounding widening ({@code 1e-12 Σ|a_k|}, below 1e-12 m here).
     */
    @Test
    void aStraightTubesSlabsAreItsEndsGrownByItsRadius() {
        Vector3D[] p = {new Vector3D(0, 0, 0), new Vector3D(0.1, 0, 0), new Vector3D(0.25, 0, 0), new Vector3D(0.3, 0, 0)};
        List<Slab> slabs = new SplineTube(p, 0.02, Side.INSIDE).extent();
        assertEquals(-0.02, slabs.get(0).low(), 1e-12);
        assertEquals(0.32, slabs.get(0).high(), 1e-12);
        assertEquals(-0.02, slabs.get(1).low(), 1e-12);
        assertEquals(0.02, slabs.get(2).high(), 1e-12);
    }
}
