package org.trundle.surfaces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.hipparchus.analysis.interpolation.SplineInterpolator;
import org.hipparchus.analysis.polynomials.PolynomialSplineFunction;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Surface;

/**
 * Spline-based surfaces against the closed-form cylinder and against finite differences of their
 * own distance fields; the cubic spline (a spline tube's radius) against Hipparchus' natural cubic
 * {@link SplineInterpolator} (a general-purpose reference library); the quintic: {@link QuinticSplineTest}.
 */
class SplineSurfaceGeometryTest {
    static final long SEED = 777L;

    @Test
    void splineMatchesHipparchusNaturalCubic() {
        SplittableRandom rnd = new SplittableRandom(SEED);
        double[] u = new double[9];
        double[] y = new double[9];
        for (int i = 0; i < u.length; i++) {
            u[i] = (i == 0 ? 0 : u[i - 1]) + rnd.nextDouble(0.1, 1.0);
            y[i] = rnd.nextDouble(-1, 1);
        }
        CubicSpline ours = new CubicSpline(u, y, "test");
        PolynomialSplineFunction ref = new SplineInterpolator().interpolate(u, y);
        PolynomialSplineFunction d1 = ref.polynomialSplineDerivative();
        PolynomialSplineFunction d2 = d1.polynomialSplineDerivative();
        double[] e = new double[3];
        for (int i = 0; i < 200; i++) {
            double t = rnd.nextDouble(u[0], u[u.length - 1]);
            ours.evaluate(t, e, 0);
            assertEquals(ref.value(t), e[0], 1e-13);
            assertEquals(d1.value(t), e[1], 1e-12);
            assertEquals(d2.value(t), e[2], 1e-11);
        }
        IllegalArgumentException bad = assertThrows(IllegalArgumentException.class,
            () -> new CubicSpline(new double[] {0, 1, 1}, new double[] {0, 0, 0}, "profile"));
        assertTrue(bad.getMessage().contains("profile") && bad.getMessage().contains("index 2"), bad.getMessage());
    }

    static void assertSameGeometry(Surface a, Surface b, double[] x, double len) {
        ContactGeometry ga = GeometryAssertions.query(a, x);
        ContactGeometry gb = GeometryAssertions.query(b, x);
        for (int i = 0; i < 3; i++) {
            assertEquals(ga.point[i], gb.point[i], 1e-12 * len, "point");
            assertEquals(ga.normal[i], gb.normal[i], 1e-12, "normal");
        }
        for (int i = 0; i < 9; i++) {
            assertEquals(ga.hessian[i], gb.hessian[i], 1e-10 / len, "hessian[" + i + "]");
        }
        assertEquals(ga.distance, gb.distance, 1e-12 * len);
        assertEquals(ga.curvature1, gb.curvature1, 1e-10 / len);
        assertEquals(ga.curvature2, gb.curvature2, 1e-10 / len);
    }

    @ParameterizedTest
    @EnumSource(Side.class)
    void constantProfileAndStraightTubeEqualTheCylinder(Side side) {
        double bigR = 0.015;
        Cylinder cyl = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, bigR, side);
        Surface rev = new SurfaceOfRevolution(Vector3D.ZERO, Vector3D.PLUS_K, new double[] {-1, -0.2, 0.3, 1},
            new double[] {bigR, bigR, bigR, bigR}, side);
        Surface tube = new SplineTube(new Vector3D[] {new Vector3D(0, 0, -1), new Vector3D(0, 0, 0.1), new Vector3D(0, 0, 1)},
            bigR, side);
        SplittableRandom rnd = new SplittableRandom(SEED + side.ordinal());
        for (int i = 0; i < 30; i++) {
            double phi = rnd.nextDouble(-Math.PI, Math.PI);
            double rho = bigR * (side == Side.INSIDE ? rnd.nextDouble(0.2, 0.9) : rnd.nextDouble(1.1, 2));
            double[] x = {rho * Math.cos(phi), rho * Math.sin(phi), rnd.nextDouble(-0.9, 0.9)};
            assertSameGeometry(cyl, rev, x, bigR);
            assertSameGeometry(cyl, tube, x, bigR);
        }
    }

    @ParameterizedTest
    @EnumSource(Side.class)
    void revolutionMatchesFiniteDifferences(Side side) {
        // an invented flared cup profile
        double[] z = {0.0, 0.02, 0.05, 0.08, 0.1};
        double[] r = {0.03, 0.032, 0.04, 0.055, 0.07};
        Surface cup = new SurfaceOfRevolution(new Vector3D(0.1, 0, 0), new Vector3D(0, 0.2, 1), z, r, side);
        SplittableRandom rnd = new SplittableRandom(SEED * 3 + side.ordinal());
        Vector3D a = new Vector3D(0, 0.2, 1).normalize();
        Vector3D e1 = a.orthogonal();
        Vector3D e2 = Vector3D.crossProduct(a, e1);
        QuinticSpline profile = new QuinticSpline(z, r, "cup");
        double[] e = new double[3];
        for (int i = 0; i < 20; i++) {
            double zz = rnd.nextDouble(0.005, 0.095);
            profile.evaluate(zz, e, 0);
            double phi = rnd.nextDouble(-Math.PI, Math.PI);
            double off = rnd.nextDouble(0.002, 0.008) * (side == Side.INSIDE ? -1 : 1);
            Vector3D er = e1.scalarMultiply(Math.cos(phi)).add(e2.scalarMultiply(Math.sin(phi)));
            Vector3D x = new Vector3D(0.1, 0, 0).add(zz, a).add(e[0] + off, er);
            GeometryAssertions.checkAgainstFiniteDifferences(cup, x.toArray(), 0.03);
        }
    }

    @ParameterizedTest
    @EnumSource(Side.class)
    void helicalAndFlaredTubesMatchFiniteDifferences(Side side) {
        // helical chute centreline (invented): radius 0.2 m, pitch 0.15 m, sampled every 30 degrees
        int n = 25;
        Vector3D[] pts = new Vector3D[n];
        double[] radii = new double[n];
        for (int i = 0; i < n; i++) {
            double th = i * Math.PI / 6;
            pts[i] = new Vector3D(0.2 * Math.cos(th), 0.2 * Math.sin(th), 0.15 * th / (2 * Math.PI));
            radii[i] = 0.02 + 0.005 * Math.sin(0.5 * th);
        }
        Surface constant = new SplineTube(pts, 0.02, side);
        Surface varying = new SplineTube(pts, radii, side);
        SplittableRandom rnd = new SplittableRandom(SEED * 5 + side.ordinal());
        for (Surface s : new Surface[] {constant, varying}) {
            for (int i = 0; i < 15; i++) {
                double th = rnd.nextDouble(1.0, 11.0);
                Vector3D c = new Vector3D(0.2 * Math.cos(th), 0.2 * Math.sin(th), 0.15 * th / (2 * Math.PI));
                double l = side == Side.INSIDE ? rnd.nextDouble(0.004, 0.012) : rnd.nextDouble(0.03, 0.04);
                // offset normal to the helix tangent, so that c stays the nearest centreline point
                Vector3D tangent = new Vector3D(-0.2 * Math.sin(th), 0.2 * Math.cos(th), 0.15 / (2 * Math.PI)).normalize();
                Vector3D dir = GeometryAssertionsSupport.randomUnit(rnd);
                dir = dir.subtract(dir.dotProduct(tangent), tangent).normalize();
                Vector3D x = c.add(l, dir);
                GeometryAssertions.checkAgainstFiniteDifferences(s, x.toArray(), 0.02);
            }
        }
    }

    @Test
    void rotationMinimisingFrameStaysPlanarThroughAnInflection() {
        // an invented S-shaped planar chute in the xy plane: the rotation-minimising frame started
        // from -z stays -z (the Frenet normal would flip at the inflection)
        Vector3D[] pts = new Vector3D[9];
        for (int i = 0; i < pts.length; i++) {
            double x = i * 0.1;
            pts[i] = new Vector3D(x, 0.1 * Math.sin(2 * Math.PI * x / 0.8), 0);
        }
        SplineTube chute = new SplineTube(pts, new double[] {0.02, 0.02, 0.02, 0.02, 0.02, 0.02, 0.02, 0.02, 0.02},
            Side.INSIDE, Vector3D.MINUS_K, -0.5 * Math.PI, 0.5 * Math.PI);
        for (int i = 0; i <= 50; i++) {
            double u = chute.length() * i / 50.0;
            Vector3D r = chute.frameNormal(u);
            assertEquals(-1.0, r.getZ(), 1e-12, "frame normal at u = " + u);
        }
        // the lower half of the tube (theta measured from straight down) is the wall: below the
        // centreline the foot is mid-wall, margin R·π/2 to either rim; above it, outside the patch
        ContactGeometry g = GeometryAssertions.query(chute, new double[] {0.4, 0.0, -0.01});
        assertEquals(0.02 * 0.5 * Math.PI, g.patchMargin, 1e-9);
        ContactGeometry h = GeometryAssertions.query(chute, new double[] {0.4, 0.0, 0.01});
        assertEquals(-0.02 * 0.5 * Math.PI, h.patchMargin, 1e-9);
        assertTrue(chute.edgeName(h.edge).startsWith("angle"), chute.edgeName(h.edge));
        assertTrue(chute.hasEdges());
    }

    @Test
    void aCentrelineThatTurnsBackIsRejected() {
        // collinear points that double back: the curvature is zero at every sample, yet the
        // centreline stops and reverses (issue 18 item 6's input); the tube would overlap itself
        Vector3D[] back = {Vector3D.ZERO, new Vector3D(0.1, 0, 0), Vector3D.ZERO, new Vector3D(0.1, 0, 0)};
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new SplineTube(back, 0.012, Side.INSIDE));
        assertTrue(e.getMessage().contains("turns back"), e.getMessage());
    }
}
