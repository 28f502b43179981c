package org.trundle.surfaces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceDomainException;

/**
 * Closed-form surfaces checked against central finite differences of their own distance field
 * (normal = ∇d, H = ∇²d; common practice), plus curvature/edge facts that follow from elementary
 * differential geometry (Meusnier's theorem for the circumferential curvature; common practice).
 */
class AnalyticSurfaceGeometryTest {
    static final long SEED = 20261202L;
    static final int CASES = 12;

    static Stream<Arguments> cases() {
        return Stream.of("sphere", "cone", "torus", "cylinder", "placed").flatMap(kind ->
            IntStream.range(0, CASES).mapToObj(i -> Arguments.of(kind, SEED, i)));
    }

    static Vector3D randomUnit(SplittableRandom rnd) {
        double z = rnd.nextDouble(-1, 1);
        double phi = rnd.nextDouble(0, 2 * Math.PI);
        double s = Math.sqrt(1 - z * z);
        return new Vector3D(s * Math.cos(phi), s * Math.sin(phi), z);
    }

    /** A surface and a query point near it, drawn from seeded random parameters. */
    static Object[] draw(String kind, long seed, int index) {
        SplittableRandom rnd = new SplittableRandom(seed + 7919L * index + kind.hashCode());
        Side side = rnd.nextBoolean() ? Side.INSIDE : Side.OUTSIDE;
        Vector3D o = new Vector3D(rnd.nextDouble(-0.2, 0.2), rnd.nextDouble(-0.2, 0.2), rnd.nextDouble(-0.2, 0.2));
        Vector3D a = randomUnit(rnd);
        Vector3D u = a.orthogonal();
        Vector3D v = Vector3D.crossProduct(a, u);
        double phi = rnd.nextDouble(-Math.PI, Math.PI);
        Vector3D er = u.scalarMultiply(Math.cos(phi)).add(v.scalarMultiply(Math.sin(phi)));
        switch (kind) {
            case "sphere": {
                double bigR = rnd.nextDouble(0.05, 0.5);
                Surface s = new Sphere(o, bigR, side, a, 0.0, rnd.nextDouble(1.0, 3.0));
                double rho = side == Side.INSIDE ? bigR * rnd.nextDouble(0.4, 0.95) : bigR * rnd.nextDouble(1.05, 1.6);
                Vector3D x = o.add(rho, randomUnit(rnd));
                return new Object[] {s, x.toArray(), bigR};
            }
            case "cone": {
                double alpha = rnd.nextDouble(0.25, 1.3);
                Surface s = new Cone(o, a, alpha, side, 0.01, 1.0);
                double t = rnd.nextDouble(0.05, 0.6);
                Vector3D p = o.add(t * Math.cos(alpha), a).add(t * Math.sin(alpha), er);
                Vector3D nOut = a.scalarMultiply(-Math.sin(alpha)).add(er.scalarMultiply(Math.cos(alpha)));
                double d = rnd.nextDouble(0.05, 0.6) * t * Math.sin(alpha) * (side == Side.INSIDE ? -1 : 1);
                return new Object[] {s, p.add(d, nOut).toArray(), t};
            }
            case "torus":
            case "placed": {
                double bigR = rnd.nextDouble(0.1, 0.5);
                double b = bigR * rnd.nextDouble(0.1, 0.6);
                Surface s = new Torus(o, a, bigR, b, side);
                double psi = rnd.nextDouble(-Math.PI, Math.PI);
                double ell = side == Side.INSIDE ? b * rnd.nextDouble(0.2, 0.9) : b * rnd.nextDouble(1.1, 1.8);
                Vector3D x = o.add(bigR, er).add(ell * Math.cos(psi), er).add(ell * Math.sin(psi), a);
                if (kind.equals("placed")) {
                    Rotation q = new Rotation(randomUnit(rnd), rnd.nextDouble(0, Math.PI), RotationConvention.VECTOR_OPERATOR);
                    Vector3D tr = new Vector3D(rnd.nextDouble(-1, 1), rnd.nextDouble(-1, 1), rnd.nextDouble(-1, 1));
                    return new Object[] {new Placed(s, q, tr), q.applyTo(x).add(tr).toArray(), b};
                }
                return new Object[] {s, x.toArray(), b};
            }
            default: {
                double bigR = rnd.nextDouble(0.01, 0.2);
                Surface s = new Cylinder(o, a, bigR, side);
                double rho = side == Side.INSIDE ? bigR * rnd.nextDouble(0.3, 0.9) : bigR * rnd.nextDouble(1.1, 2.0);
                return new Object[] {s, o.add(rnd.nextDouble(-1, 1), a).add(rho, er).toArray(), bigR};
            }
        }
    }

    @ParameterizedTest(name = "{0} seed={1} case={2}")
    @MethodSource("cases")
    void normalAndHessianMatchFiniteDifferences(String kind, long seed, int index) {
        Object[] c = draw(kind, seed, index);
        double worst = GeometryAssertions.checkAgainstFiniteDifferences((Surface) c[0], (double[]) c[1], (Double) c[2]);
        assertTrue(worst < 2e-5);
    }

    @Test
    void sphereCurvaturesAndCap() {
        // a bowl of radius 0.3 m: inside curvature +1/R (design notes convention), cap edge at 60°
        Sphere bowl = new Sphere(new Vector3D(0, 0, 0.3), 0.3, Side.INSIDE, Vector3D.MINUS_K, 0.0, Math.PI / 3);
        ContactGeometry g = GeometryAssertions.query(bowl, new double[] {0.0, 0.0, 0.01});
        assertEquals(1 / 0.3, g.curvature1, 1e-12);
        assertEquals(1 / 0.3, g.curvature2, 1e-12);
        assertEquals(0.01, g.distance, 1e-15);
        assertEquals(0.3 * Math.PI / 3, g.patchMargin, 1e-12);
        assertEquals("polar_to", bowl.edgeName(g.edge));
        assertThrows(SurfaceDomainException.class, () -> GeometryAssertions.query(bowl, new double[] {0, 0, 0.3}));
    }

    @Test
    void coneCurvatureAndMargins() {
        double alpha = 0.5;
        Cone funnel = new Cone(Vector3D.ZERO, Vector3D.PLUS_K, alpha, Side.INSIDE, 0.02, 0.2);
        // a point on the wall at slant distance 0.1 m: circumferential curvature cos α/(t sin α)
        double t = 0.1;
        double[] p = {t * Math.sin(alpha), 0, t * Math.cos(alpha)};
        ContactGeometry g = GeometryAssertions.query(funnel, p);
        assertEquals(0.0, g.distance, 1e-15);
        assertEquals(Math.cos(alpha) / (t * Math.sin(alpha)), g.curvature1, 1e-12);
        assertEquals(0.0, g.curvature2, 0.0);
        assertEquals(t - 0.02 / Math.cos(alpha), g.patchMargin, 1e-14);
        assertEquals("from", funnel.edgeName(g.edge));
        assertEquals(Math.cos(alpha) * Math.cos(alpha) / (0.02 * Math.sin(alpha)), funnel.maxConcaveCurvature(), 1e-12);
    }

    @Test
    void coneApexIsExcludedAndNamed() {
        Cone dome = new Cone(new Vector3D(1, 2, 3), Vector3D.MINUS_K, 0.7, Side.OUTSIDE);
        // above the apex of a downward-opening cone the closest point is the apex itself
        SurfaceDomainException e = assertThrows(SurfaceDomainException.class,
            () -> GeometryAssertions.query(dome, new double[] {1.001, 2, 3.1}));
        assertTrue(e.getMessage().contains("apex (1.00000, 2.00000, 3.00000)"), e.getMessage());
        IllegalArgumentException bad = assertThrows(IllegalArgumentException.class,
            () -> new Cone(Vector3D.ZERO, Vector3D.PLUS_K, 0.5, Side.INSIDE, -0.1, 1));
        assertTrue(bad.getMessage().contains("from = -0.1"), bad.getMessage());
        IllegalArgumentException angle = assertThrows(IllegalArgumentException.class,
            () -> new Cone(Vector3D.ZERO, Vector3D.PLUS_K, 2.0, Side.INSIDE));
        assertTrue(angle.getMessage().contains("halfAngle") && angle.getMessage().contains("2.0"), angle.getMessage());
    }

    @Test
    void torusCurvaturesAndGroove() {
        // raceway groove: lower half of a tube of radius 0.01 m on a ring of radius 0.1 m
        Torus groove = new Torus(Vector3D.ZERO, Vector3D.PLUS_K, Vector3D.PLUS_I, 0.1, 0.01, Side.INSIDE,
            -Math.PI, Math.PI, -Math.PI, 0.0);
        ContactGeometry g = GeometryAssertions.query(groove, new double[] {0.101, 0, -0.004});
        double psi = Math.atan2(-0.004, 0.001);
        assertEquals(100.0, g.curvature1, 1e-10);
        assertEquals(Math.cos(psi) / (0.1 + 0.01 * Math.cos(psi)), g.curvature2, 1e-10);
        assertEquals(0.01 - Math.hypot(0.001, 0.004), g.distance, 1e-15);
        assertEquals(-0.01 * psi, g.patchMargin, 1e-12);
        assertEquals("tube_to", groove.edgeName(g.edge));
        // outside, on the inner equator: saddle with concave circumferential curvature 1/(R - b)
        Torus ring = new Torus(Vector3D.ZERO, Vector3D.PLUS_K, 0.1, 0.01, Side.OUTSIDE);
        ContactGeometry h = GeometryAssertions.query(ring, new double[] {0.085, 0, 0});
        assertEquals(1 / 0.09, h.curvature1, 1e-10);
        assertEquals(-100.0, h.curvature2, 1e-10);
        assertEquals(1 / 0.09, ring.maxConcaveCurvature(), 1e-12);
        assertThrows(SurfaceDomainException.class, () -> GeometryAssertions.query(ring, new double[] {0.1, 0, 0}));
        assertThrows(IllegalArgumentException.class, () -> new Torus(Vector3D.ZERO, Vector3D.PLUS_K, 0.1, 0.2, Side.INSIDE));
        // a quarter-ring raceway, azimuth 0..90 degrees from +x about +z: at azimuth 30 degrees on
        // the bottom of the tube the margin is the arc (R + b cos psi)·30° to the azimuthFrom edge
        Torus quarter = new Torus(Vector3D.ZERO, Vector3D.PLUS_K, Vector3D.PLUS_I, 0.1, 0.01, Side.INSIDE,
            0.0, 0.5 * Math.PI, -Math.PI, Math.PI);
        double phi = Math.toRadians(30);
        ContactGeometry q = GeometryAssertions.query(quarter, new double[] {0.1 * Math.cos(phi), 0.1 * Math.sin(phi), -0.005});
        assertEquals(0.1 * phi, q.patchMargin, 1e-12);
        assertEquals("azimuth_from", quarter.edgeName(q.edge));
        assertTrue(quarter.hasEdges());
    }

    @Test
    void placedCylinderEqualsCylinderWithMovedAxis() {
        Rotation q = new Rotation(new Vector3D(1, 2, 3), 0.8, RotationConvention.VECTOR_OPERATOR);
        Vector3D t = new Vector3D(0.3, -0.1, 2.0);
        Surface placed = new Placed(new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, 0.05, Side.INSIDE), q, t);
        Surface direct = new Cylinder(t, q.applyTo(Vector3D.PLUS_K), 0.05, Side.INSIDE);
        double[] x = t.add(q.applyTo(new Vector3D(0.02, -0.01, 0.4))).toArray();
        ContactGeometry a = GeometryAssertions.query(placed, x);
        ContactGeometry b = GeometryAssertions.query(direct, x);
        for (int i = 0; i < 3; i++) {
            assertEquals(b.point[i], a.point[i], 1e-14);
            assertEquals(b.normal[i], a.normal[i], 1e-14);
        }
        for (int i = 0; i < 9; i++) {
            assertEquals(b.hessian[i], a.hessian[i], 1e-12);
        }
        assertEquals(b.distance, a.distance, 1e-15);
    }

    @Test
    void directionsOfAnyFiniteSizeWork() {
        // issue 18 item 8: an axis (0, 0, 1e200) once became {0; 0; 0}, a 1e300 torus axis threw
        // the math library's exception; directions are now normalised with scaling
        Cylinder huge = new Cylinder(Vector3D.ZERO, new Vector3D(0, 0, 1e200), 0.015, Side.INSIDE);
        assertEquals(0.004, GeometryAssertions.query(huge, new double[] {0.011, 0, 0.2}).distance, 1e-15);
        Plane floor = new Plane(Vector3D.ZERO, new Vector3D(0, 0, 1e200));
        assertEquals(0.25, GeometryAssertions.query(floor, new double[] {1, 2, 0.25}).distance, 1e-15);
        Plane tiny = new Plane(Vector3D.ZERO, new Vector3D(0, 0, 1e-160));
        assertEquals(0.25, GeometryAssertions.query(tiny, new double[] {1, 2, 0.25}).distance, 1e-15);
        Torus big = new Torus(Vector3D.ZERO, new Vector3D(0, 0, 1e300), new Vector3D(1e300, 0, 0), 0.1, 0.01,
            Side.INSIDE, -Math.PI, Math.PI, -Math.PI, Math.PI);
        Torus plain = new Torus(Vector3D.ZERO, Vector3D.PLUS_K, Vector3D.PLUS_I, 0.1, 0.01, Side.INSIDE,
            -Math.PI, Math.PI, -Math.PI, Math.PI);
        double[] x = {0.104, 0.01, -0.003};
        assertEquals(GeometryAssertions.query(plain, x).distance, GeometryAssertions.query(big, x).distance, 0.0);
        IllegalArgumentException parallel = assertThrows(IllegalArgumentException.class, () -> new Torus(Vector3D.ZERO,
            new Vector3D(0, 0, 1e300), new Vector3D(0, 0, -1e300), 0.1, 0.01, Side.INSIDE, -1, 1, -Math.PI, Math.PI));
        assertTrue(parallel.getMessage().contains("torus reference direction must not be parallel"), parallel.getMessage());
        IllegalArgumentException zero = assertThrows(IllegalArgumentException.class,
            () -> new Torus(Vector3D.ZERO, Vector3D.ZERO, 0.1, 0.01, Side.INSIDE));
        assertTrue(zero.getMessage().startsWith("axis must be a non-zero direction"), zero.getMessage());
    }

    @Test
    void insideConeReachingTheApexIsRejected() {
        // issue 18 item 11: the concave curvature cos²α/(s sin α) has no bound at the apex, so no
        // ball fits an inside cone with from = 0; it is rejected when built, naming from
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
            () -> new Cone(Vector3D.ZERO, Vector3D.PLUS_K, 0.5, Side.INSIDE));
        assertTrue(e.getMessage().contains("from > 0") && e.getMessage().contains("from = 0"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new Cone(Vector3D.ZERO, Vector3D.PLUS_K, 0.5, Side.INSIDE, 0.0, 1.0));
        assertEquals(0.0, new Cone(Vector3D.ZERO, Vector3D.PLUS_K, 0.5, Side.OUTSIDE).maxConcaveCurvature());
    }
}
