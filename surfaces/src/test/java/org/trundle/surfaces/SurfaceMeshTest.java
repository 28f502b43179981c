package org.trundle.surfaces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.stream.Stream;

import org.hipparchus.CalculusFieldElement;
import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.trundle.core.Box;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Surface;
import org.trundle.core.TriangleMesh;

/**
 * Every surface draws its patch: each mesh vertex lies on the surface (its signed distance from a
 * closest-point query, at most 1e-9 m for shapes of 0.01–1 m), and the mesh covers the patch
 * (its extremes along each patch coordinate reach the patch bounds within one mesh cell).
 */
class SurfaceMeshTest {
    static final int RES = 24;
    static final double ON_SURFACE = 1e-9;
    static final Box BOX = Box.of(new Vector3D(-0.2, -0.15, -0.25), new Vector3D(0.25, 0.2, 0.15));

    /** A tube of radius 0.02 m along z, written as an implicit function. */
    static final ImplicitFunction TUBE = new ImplicitFunction() {
        @Override
        public <T extends CalculusFieldElement<T>> T value(T x, T y, T z) {
            return x.square().add(y.square()).subtract(0.02 * 0.02);
        }
    };

    /**
     * One case: a surface and, per coordinate, the expected patch range {lo, hi} (NaN: not checked).
     */
    static Stream<Arguments> cases() {
        Rotation q = new Rotation(new Vector3D(1, -2, 0.5), 0.9, RotationConvention.VECTOR_OPERATOR);
        Vector3D[] helix = helix(0.1, 0.05, 2, 48);
        SplineTube chute = new SplineTube(helix, constant(helix.length, 0.012), Side.INSIDE, Vector3D.MINUS_K,
            Math.toRadians(-100), Math.toRadians(100));
        double len = chute.arcLength(chute.length());
        SplineTube flared = new SplineTube(new Vector3D[] {Vector3D.ZERO, new Vector3D(0.05, 0.02, 0),
            new Vector3D(0.1, 0, 0.03), new Vector3D(0.15, -0.02, 0.0)}, new double[] {0.01, 0.015, 0.012, 0.008}, Side.OUTSIDE);
        double[] ax = BOX.rangeAlong(Vector3D.ZERO, Vector3D.PLUS_I);
        double[] ay = BOX.rangeAlong(Vector3D.ZERO, Vector3D.PLUS_J);
        return Stream.of(
            Arguments.of("plane", new Plane(Vector3D.ZERO, Vector3D.PLUS_K), new double[][] {ax, ay}),
            Arguments.of("cylinder bounded", new Cylinder(new Vector3D(0.01, 0, 0), Vector3D.PLUS_K, 0.015, Side.INSIDE, -0.1, 0.05),
                new double[][] {{-0.1, 0.05}, {-Math.PI, Math.PI}}),
            Arguments.of("cylinder open", new Cylinder(Vector3D.ZERO, Vector3D.PLUS_I, 0.03, Side.OUTSIDE),
                new double[][] {ax, {-Math.PI, Math.PI}}),
            Arguments.of("cone", new Cone(new Vector3D(0, 0, -0.1), Vector3D.PLUS_K, 0.6, Side.INSIDE, 0.02, 0.15),
                new double[][] {{0.02, 0.15}, {-Math.PI, Math.PI}}),
            Arguments.of("cone open", new Cone(new Vector3D(0, 0, 0.1), Vector3D.MINUS_K, 0.6, Side.OUTSIDE, 0.01, Double.POSITIVE_INFINITY),
                new double[][] {{0.01, 0.1 - BOX.min().getZ()}, {-Math.PI, Math.PI}}),
            Arguments.of("sphere cap", new Sphere(Vector3D.ZERO, 0.1, Side.INSIDE, Vector3D.MINUS_K, 0.0, 1.2),
                new double[][] {{0.0, 1.2}, {-Math.PI, Math.PI}}),
            Arguments.of("sphere band", new Sphere(new Vector3D(0, 0.01, 0), 0.05, Side.OUTSIDE, new Vector3D(1, 1, 0), 0.3, 2.5),
                new double[][] {{0.3, 2.5}, {-Math.PI, Math.PI}}),
            Arguments.of("torus", new Torus(Vector3D.ZERO, Vector3D.PLUS_K, 0.1, 0.02, Side.INSIDE),
                new double[][] {{-Math.PI, Math.PI}, {-Math.PI, Math.PI}}),
            Arguments.of("torus groove", new Torus(Vector3D.ZERO, Vector3D.PLUS_K, Vector3D.PLUS_I, 0.1, 0.02, Side.INSIDE,
                -1.0, 2.0, -Math.PI, 0.0), new double[][] {{-1.0, 2.0}, {-Math.PI, 0.0}}),
            Arguments.of("revolution", new SurfaceOfRevolution(Vector3D.ZERO, Vector3D.PLUS_K, new double[] {-0.1, -0.02, 0.03, 0.1},
                new double[] {0.01, 0.012, 0.03, 0.08}, Side.INSIDE), new double[][] {{-0.1, 0.1}, {-Math.PI, Math.PI}}),
            Arguments.of("spline tube closed", new SplineTube(helix, constant(helix.length, 0.012), Side.INSIDE),
                new double[][] {{0, len}, {-Math.PI, Math.PI}}),
            Arguments.of("spline chute", chute, new double[][] {{0, len}, {Math.toRadians(-100), Math.toRadians(100)}}),
            Arguments.of("spline tube varying radius", flared, new double[][] {{0, flared.arcLength(flared.length())}, {-Math.PI, Math.PI}}),
            Arguments.of("placed cylinder", new Placed(new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, 0.02, Side.INSIDE, 0, 0.1), q,
                new Vector3D(0.05, -0.02, 0.01)), new double[][] {{0, 0.1}, {-Math.PI, Math.PI}}),
            Arguments.of("placed plane", new Placed(new Plane(Vector3D.ZERO, Vector3D.PLUS_K), q, new Vector3D(0.01, 0.02, -0.03)),
                new double[][] {{Double.NaN, Double.NaN}, {Double.NaN, Double.NaN}}),
            Arguments.of("implicit tube", ImplicitSurface.of(TUBE).label("tube").side(Side.INSIDE).lengthScale(0.02).build(),
                new double[0][]));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void meshLiesOnTheSurfaceAndCoversThePatch(String kind, Surface s, double[][] ranges) {
        TriangleMesh mesh = s.mesh(BOX, RES);
        assertFalse(mesh.isEmpty(), kind + ": empty mesh");
        ContactGeometry g = new ContactGeometry();
        g.scratch = s.newScratch();
        int n = s.coordinates().size();
        assertEquals(ranges.length, n, kind + ": coordinate count");
        double[] c = new double[Math.max(n, 1)];
        double[] lo = new double[n];
        double[] hi = new double[n];
        java.util.Arrays.fill(lo, Double.POSITIVE_INFINITY);
        java.util.Arrays.fill(hi, Double.NEGATIVE_INFINITY);
        double worst = 0;
        for (int i = 0; i < mesh.vertexCount(); i++) {
            double[] v = mesh.vertex(i).toArray();
            g.hintValid = false;
            s.query(0, v, g);
            worst = Math.max(worst, Math.abs(g.distance));
            if (n > 0) {
                g.hintValid = false;
                s.coordinatesAt(0, v, g, c);
                for (int k = 0; k < n; k++) {
                    lo[k] = Math.min(lo[k], c[k]);
                    hi[k] = Math.max(hi[k], c[k]);
                }
            }
        }
        assertTrue(worst <= ON_SURFACE, kind + ": a vertex lies " + worst + " m off the surface");
        for (int k = 0; k < n; k++) {
            if (Double.isNaN(ranges[k][0])) {
                continue; // a placed plane's box is the local box holding the world box: not checked here
            }
            double cell = (1 + 1e-9) * (ranges[k][1] - ranges[k][0]) / RES;
            assertEquals(ranges[k][0], lo[k], cell, kind + ": lowest " + s.coordinates().get(k).name());
            assertEquals(ranges[k][1], hi[k], cell, kind + ": highest " + s.coordinates().get(k).name());
        }
        if (n == 0) {
            // an implicit tube along z: its mesh reaches the box's z faces within one cube
            double h = 0.45 / RES;
            double zlo = Double.POSITIVE_INFINITY;
            double zhi = Double.NEGATIVE_INFINITY;
            for (int i = 0; i < mesh.vertexCount(); i++) {
                zlo = Math.min(zlo, mesh.coordinate(i, 2));
                zhi = Math.max(zhi, mesh.coordinate(i, 2));
            }
            assertEquals(BOX.min().getZ(), zlo, h, kind + ": lowest z");
            assertEquals(BOX.max().getZ(), zhi, h, kind + ": highest z");
        }
    }

    @Test
    void boundedImplicitTubeMeshStaysWithinItsPlanes() {
        Surface tube = ImplicitSurface.of(TUBE).label("tube").side(Side.INSIDE).lengthScale(0.02).build();
        Bounded cut = Bounded.of(tube).plane("bottom", new Vector3D(0, 0, -0.1), Vector3D.PLUS_K)
            .plane("top", new Vector3D(0, 0, 0.05), Vector3D.MINUS_K).build();
        TriangleMesh mesh = cut.mesh(BOX, RES);
        double zlo = Double.POSITIVE_INFINITY;
        double zhi = Double.NEGATIVE_INFINITY;
        ContactGeometry g = new ContactGeometry();
        g.scratch = cut.newScratch();
        for (int i = 0; i < mesh.vertexCount(); i++) {
            zlo = Math.min(zlo, mesh.coordinate(i, 2));
            zhi = Math.max(zhi, mesh.coordinate(i, 2));
            g.hintValid = false;
            cut.query(0, mesh.vertex(i).toArray(), g);
            assertTrue(Math.abs(g.distance) <= ON_SURFACE, "vertex off the surface by " + g.distance);
        }
        double h = 0.45 / RES;
        assertTrue(zlo >= -0.1 && zlo <= -0.1 + h, "lowest z " + zlo);
        assertTrue(zhi <= 0.05 && zhi >= 0.05 - h, "highest z " + zhi);
    }

    @Test
    void placedMeshIsTheLocalMeshMoved() {
        Rotation q = new Rotation(new Vector3D(0.3, 1, -1), 1.3, RotationConvention.VECTOR_OPERATOR);
        Vector3D t = new Vector3D(0.4, -0.2, 0.1);
        Sphere local = new Sphere(Vector3D.ZERO, 0.05, Side.OUTSIDE);
        TriangleMesh a = new Placed(local, q, t).mesh(null, 12);
        TriangleMesh b = local.mesh(null, 12);
        assertEquals(b.triangleCount(), a.triangleCount());
        for (int i = 0; i < a.vertexCount(); i++) {
            Vector3D expected = q.applyTo(b.vertex(i)).add(t);
            assertEquals(0.0, expected.distance(a.vertex(i)), 1e-15);
        }
    }

    @Test
    void unboundedPatchesNeedABoxAndBadResolutionsAreRejected() {
        IllegalArgumentException plane = assertThrows(IllegalArgumentException.class,
            () -> new Plane(Vector3D.ZERO, Vector3D.PLUS_K).mesh(null, 10));
        assertTrue(plane.getMessage().contains("box"), plane.getMessage());
        IllegalArgumentException res = assertThrows(IllegalArgumentException.class,
            () -> new Sphere(Vector3D.ZERO, 1, Side.INSIDE).mesh(null, 1));
        assertTrue(res.getMessage().contains("resolution") && res.getMessage().contains("1"), res.getMessage());
        // a cylinder whose range the box does not reach draws nothing
        assertTrue(new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, 0.01, Side.INSIDE, 5, Double.POSITIVE_INFINITY)
            .mesh(BOX, 8).isEmpty());
        // the core default says clearly that a surface cannot draw itself
        Surface bare = new Surface() {
            @Override
            public void query(double t, double[] x, ContactGeometry out) {
            }

            @Override
            public String name() {
                return "bare";
            }
        };
        UnsupportedOperationException none = assertThrows(UnsupportedOperationException.class, () -> bare.mesh(BOX, 8));
        assertTrue(none.getMessage().contains("bare"), none.getMessage());
        assertEquals(List.of(), bare.coordinates());
    }

    /** Points of a helix of radius a (m) and pitch p (m) descending along −z, turns turns, k points per turn. */
    static Vector3D[] helix(double a, double p, int turns, int k) {
        Vector3D[] pts = new Vector3D[turns * k + 1];
        for (int i = 0; i < pts.length; i++) {
            double phi = 2 * Math.PI * i / k;
            pts[i] = new Vector3D(a * Math.cos(phi), a * Math.sin(phi), -p * phi / (2 * Math.PI));
        }
        return pts;
    }

    static double[] constant(int n, double r) {
        double[] out = new double[n];
        java.util.Arrays.fill(out, r);
        return out;
    }
}
