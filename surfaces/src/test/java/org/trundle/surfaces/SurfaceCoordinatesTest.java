package org.trundle.surfaces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.Collectors;

import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Surface;

/**
 * Each surface's natural coordinates against the closed form of a point built from known
 * coordinates (placed off the surface along its normal, so the foot is what is measured).
 */
class SurfaceCoordinatesTest {
    static final long SEED = 1313L;
    static final double ANGLE = 1e-12;

    static double[] at(Surface s, Vector3D x) {
        ContactGeometry g = new ContactGeometry();
        g.scratch = s.newScratch();
        double[] out = new double[s.coordinates().size()];
        s.coordinatesAt(0, x.toArray(), g, out);
        return out;
    }

    static List<String> names(Surface s) {
        return s.coordinates().stream().map(c -> c.name() + " (" + c.unit() + ")").collect(Collectors.toList());
    }

    @Test
    void horizontalTubeAxialPositionAndAngleFromTheBottom() {
        // axis +x: angle 0 is straight down (−z), +90° is +y (right-handed about +x)
        Cylinder tube = new Cylinder(new Vector3D(0.1, 0, 0.2), Vector3D.PLUS_I, 0.015, Side.INSIDE);
        assertEquals(List.of("axial (m)", "azimuth (rad)"), names(tube));
        SplittableRandom rnd = new SplittableRandom(SEED);
        for (int i = 0; i < 50; i++) {
            double s = rnd.nextDouble(-1, 1);
            double phi = rnd.nextDouble(-Math.PI, Math.PI);
            double rho = rnd.nextDouble(0.005, 0.03);
            Vector3D x = new Vector3D(0.1 + s, rho * Math.sin(phi), 0.2 - rho * Math.cos(phi));
            double[] c = at(tube, x);
            assertEquals(s, c[0], 1e-15);
            assertEquals(phi, c[1], ANGLE);
        }
        // a vertical axis: angle 0 along +x, +90° along +y
        double[] v = at(new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, 0.01, Side.INSIDE), new Vector3D(0, 0.004, 0.3));
        assertEquals(0.5 * Math.PI, v[1], ANGLE);
        assertEquals(0.3, v[0], 1e-15);
    }

    @Test
    void coneAxialPositionOfTheFoot() {
        double alpha = 0.6;
        Cone funnel = new Cone(Vector3D.ZERO, Vector3D.PLUS_K, alpha, Side.INSIDE, 0.01, 0.5);
        SplittableRandom rnd = new SplittableRandom(SEED + 1);
        for (int i = 0; i < 50; i++) {
            double s = rnd.nextDouble(0.02, 0.4);
            double phi = rnd.nextDouble(-Math.PI, Math.PI);
            double d = rnd.nextDouble(0.001, 0.01);
            // foot at axial s, radius s tan α; x = foot + d n, n = sin α a − cos α e_ρ (inside)
            Vector3D er = new Vector3D(Math.cos(phi), Math.sin(phi), 0);
            Vector3D foot = new Vector3D(s, Vector3D.PLUS_K, s * Math.tan(alpha), er);
            Vector3D x = foot.add(d, new Vector3D(Math.sin(alpha), Vector3D.PLUS_K, -Math.cos(alpha), er));
            double[] c = at(funnel, x);
            assertEquals(s, c[0], 1e-14);
            assertEquals(phi, c[1], ANGLE);
        }
    }

    @Test
    void spherePolarAngleAndAzimuth() {
        // pole −z (a bowl): azimuth 0 along +x, increasing right-handed about −z, toward −y
        Sphere bowl = new Sphere(new Vector3D(0, 0, 0.1), 0.1, Side.INSIDE, Vector3D.MINUS_K, 0, 1.5);
        assertEquals(List.of("polar (rad)", "azimuth (rad)"), names(bowl));
        SplittableRandom rnd = new SplittableRandom(SEED + 2);
        for (int i = 0; i < 50; i++) {
            double th = rnd.nextDouble(0.01, 3.1);
            double phi = rnd.nextDouble(-Math.PI, Math.PI);
            double rho = rnd.nextDouble(0.05, 0.09);
            Vector3D e = new Vector3D(Math.sin(th) * Math.cos(phi), -Math.sin(th) * Math.sin(phi), -Math.cos(th));
            double[] c = at(bowl, new Vector3D(0, 0, 0.1).add(rho, e));
            assertEquals(th, c[0], ANGLE);
            assertEquals(phi, c[1], ANGLE);
        }
    }

    @Test
    void torusRingAndTubeAngles() {
        double big = 0.1;
        Torus ring = new Torus(Vector3D.ZERO, Vector3D.PLUS_K, Vector3D.PLUS_I, big, 0.02, Side.INSIDE,
            -Math.PI, Math.PI, -Math.PI, Math.PI);
        assertEquals(List.of("ring_angle (rad)", "tube_angle (rad)"), names(ring));
        SplittableRandom rnd = new SplittableRandom(SEED + 3);
        for (int i = 0; i < 50; i++) {
            double phi = rnd.nextDouble(-Math.PI, Math.PI);
            double psi = rnd.nextDouble(-Math.PI, Math.PI);
            double ell = rnd.nextDouble(0.005, 0.015);
            double rho = big + ell * Math.cos(psi);
            double[] c = at(ring, new Vector3D(rho * Math.cos(phi), rho * Math.sin(phi), ell * Math.sin(psi)));
            assertEquals(phi, c[0], ANGLE);
            assertEquals(psi, c[1], ANGLE);
        }
    }

    @Test
    void revolutionAxialPositionAndAzimuth() {
        // a straight profile: a cylinder of radius 0.02 m, z from −0.1 to 0.1
        SurfaceOfRevolution r = new SurfaceOfRevolution(Vector3D.ZERO, Vector3D.PLUS_K, new double[] {-0.1, 0, 0.1},
            new double[] {0.02, 0.02, 0.02}, Side.INSIDE);
        double[] c = at(r, new Vector3D(0.01 * Math.cos(2.0), 0.01 * Math.sin(2.0), 0.037));
        assertEquals(0.037, c[0], 1e-14);
        assertEquals(2.0, c[1], ANGLE);
    }

    @Test
    void planeInPlaneOffsets() {
        Plane floor = new Plane(new Vector3D(1, 2, 3), Vector3D.PLUS_K);
        assertEquals(List.of("u (m)", "v (m)"), names(floor));
        double[] c = at(floor, new Vector3D(1.5, 1.75, 3.2));
        assertEquals(0.5, c[0], 1e-15);
        assertEquals(-0.25, c[1], 1e-15);
        // a tilted plane with a reference: u along the reference's projection, v = n × u
        Plane ramp = new Plane(Vector3D.ZERO, new Vector3D(0, -1, 1), Vector3D.PLUS_I);
        double[] d = at(ramp, new Vector3D(0.3, 0.2, 0.2));
        assertEquals(0.3, d[0], 1e-15);
        assertEquals(Math.sqrt(0.08), d[1], 1e-15);
    }

    @Test
    void splineTubeArcLengthAndAngle() {
        // a straight tube along +x: the arc length is the distance along it; angle 0 is down (the
        // reference), +90° is t × (−z) = +y
        Vector3D[] line = {new Vector3D(0.2, 0, 0), new Vector3D(0.3, 0, 0), new Vector3D(0.5, 0, 0)};
        SplineTube straight = new SplineTube(line, new double[] {0.01, 0.01, 0.01}, Side.INSIDE, Vector3D.MINUS_K,
            -Math.PI, Math.PI);
        assertEquals(List.of("arc_length (m)", "angle (rad)"), names(straight));
        double[] c = at(straight, new Vector3D(0.37, 0.004 * Math.sin(1.1), -0.004 * Math.cos(1.1)));
        assertEquals(0.17, c[0], 1e-14);
        assertEquals(1.1, c[1], ANGLE);
        // a helix: arc length against Hipparchus' adaptive Gauss–Legendre integral of the
        // spline's speed (a general-purpose reference) and against the exact helix length,
        // to the spline's interpolation error
        Vector3D[] h = SurfaceMeshTest.helix(0.1, 0.05, 2, 48);
        SplineTube tube = new SplineTube(h, SurfaceMeshTest.constant(h.length, 0.012), Side.INSIDE);
        double u = 0.77 * tube.length();
        // reference: Hipparchus' adaptive Gauss–Legendre integral of |C'(u)|, C' from a
        // five-point central difference of the centreline (truncation ~h⁴|C⁽⁵⁾|/30, about 1e-10 here)
        double ref = new IterativeLegendreGaussIntegrator(5, 1e-11, 1e-13).integrate(1_000_000,
            v -> speed(tube, v), 0, u);
        assertEquals(ref, tube.arcLength(u), 1e-9);
        double exact = 4 * Math.PI * Math.hypot(0.1, 0.05 / (2 * Math.PI));
        assertEquals(exact, tube.arcLength(tube.length()), 1e-5 * exact);
        Vector3D x = tube.centre(u).add(0.005, tube.frameNormal(u));
        assertEquals(ref, at(tube, x)[0], 1e-9);
        assertEquals(0.0, at(tube, x)[1], ANGLE);
    }

    /** |C'(u)| by the five-point central difference of the centreline, step 1e-3 m. */
    static double speed(SplineTube t, double u) {
        double h = 1e-3;
        Vector3D d = t.centre(u - 2 * h).subtract(t.centre(u + 2 * h)).add(8, t.centre(u + h).subtract(t.centre(u - h)));
        return d.getNorm() / (12 * h);
    }

    @Test
    void placedAndBoundedSurfacesGiveTheirInnerCoordinates() {
        Rotation q = new Rotation(new Vector3D(1, 1, 0), 0.7, RotationConvention.VECTOR_OPERATOR);
        Vector3D t = new Vector3D(0.2, 0.1, -0.3);
        Cylinder local = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_I, 0.02, Side.INSIDE);
        Placed placed = new Placed(local, q, t);
        Vector3D xl = new Vector3D(0.12, 0.005, -0.01);
        double[] a = at(placed, q.applyTo(xl).add(t));
        double[] b = at(local, xl);
        assertEquals(b[0], a[0], 1e-15);
        assertEquals(b[1], a[1], 1e-14);
        Surface cut = Bounded.of(local).plane("end", new Vector3D(0.5, 0, 0), Vector3D.MINUS_I).build();
        assertEquals(local.coordinates(), cut.coordinates());
        assertEquals(b[1], at(cut, xl)[1], 0.0);
    }

    @Test
    void implicitSurfacesNameNoCoordinates() {
        Surface s = ImplicitSurface.of(SurfaceMeshTest.TUBE).label("tube").side(Side.INSIDE).lengthScale(0.02).build();
        assertTrue(s.coordinates().isEmpty());
        assertThrows(UnsupportedOperationException.class, () -> at(s, new Vector3D(0.01, 0, 0)));
    }
}
