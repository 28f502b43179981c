package org.trundle.surfaces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.Coulomb;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.ContactGeometry;
import org.trundle.core.EndReason;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.StartPlacement;
import org.trundle.core.Surface;

/**
 * {@link StartPlacement} moves a start centre onto the offset surface along the normal (issue 17,
 * item 4). References: the distance from a point to a plane, a circular cylinder and a sphere
 * (elementary analytic geometry, common practice), against which the one-step placement is exact
 * to rounding; a helical spline chute, where placement iterates, is checked by the surface's own
 * distance after placement and by a run that starts from it.
 */
class StartPlacementTest {
    static final double R = 0.004;
    static final Ball BALL = Ball.solid(R, 0.0021);
    static final Vector3D DOWN = new Vector3D(0, 0, -9.81);

    static Simulation sim(Surface s) {
        return Simulation.builder().ball(BALL).surface(s).law(new Coulomb(0.4, 0.3, 0.5)).gravity(DOWN).build();
    }

    @Test
    void planeCylinderAndSphereArePlacedExactlyAlongTheNormal() {
        // plane z = 0, normal +z: the placed centre is the given one with z = r
        StartPlacement p = StartPlacement.onSurface(sim(new Plane(Vector3D.ZERO, Vector3D.PLUS_K)),
            new Vector3D(0.3, -0.2, R + 7e-4), 1e-3);
        assertEquals(new Vector3D(0.3, -0.2, R), p.centre());
        assertEquals(7e-4, p.distance(), 1e-18);
        // inside a vertical bore of radius 15 mm: the centre goes radially to R_bore - r from the axis
        Cylinder bore = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, 0.015, Side.INSIDE, -0.3, 0.0);
        Vector3D given = new Vector3D(0.0108, 0.0012, -0.1);
        StartPlacement c = StartPlacement.onSurface(sim(bore), given, 1e-3);
        double rho = Math.hypot(given.getX(), given.getY());
        Vector3D expect = new Vector3D(given.getX() * (0.015 - R) / rho, given.getY() * (0.015 - R) / rho, -0.1);
        assertEquals(0, c.centre().distance(expect), 1e-17);
        assertEquals(Math.abs(rho - (0.015 - R)), c.distance(), 1e-17);
        // in a spherical bowl of radius 50 mm: on the sphere of radius 50 mm - r about the centre
        Sphere bowl = new Sphere(Vector3D.ZERO, 0.05, Side.INSIDE);
        Vector3D g2 = new Vector3D(0.01, 0.02, -0.0405);
        StartPlacement b = StartPlacement.onSurface(sim(bowl), g2, 1e-3);
        assertEquals(0, b.centre().distance(g2.normalize().scalarMultiply(0.05 - R)), 1e-17);
    }

    @Test
    void aCentreAlreadyWithinTheContactToleranceIsNotMoved() {
        Simulation s = sim(new Plane(Vector3D.ZERO, Vector3D.PLUS_K));
        Vector3D c = new Vector3D(0, 0, R * (1 + 1e-7));
        StartPlacement p = StartPlacement.onSurface(s, c, 0.0);
        assertEquals(c, p.centre());
        assertEquals(0.0, p.distance());
    }

    @Test
    void aCentreTooFarIsRefusedNamingTheContactTolerance() {
        Simulation s = sim(new Plane(Vector3D.ZERO, Vector3D.PLUS_K));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
            () -> StartPlacement.onSurface(s, new Vector3D(0, 0, R + 2e-3), 1e-3));
        assertTrue(e.getMessage().contains("would move it 0.00200 m, more than the 0.00100 m allowed (the contact"
            + " tolerance is 4.00e-09 m, 1e-06 of the radius)"), e.getMessage());
    }

    /** Issue 17's check: a start 0.1 mm off a spline tube, placed, runs. */
    @Test
    void aStartATenthOfAMillimetreOffAHelicalChuteIsPlacedAndRuns() {
        // an invented two-turn helix: radius 0.1 m, pitch 50 mm, 24 mm bore, 16 points a turn
        Vector3D[] line = new Vector3D[33];
        for (int i = 0; i < line.length; i++) {
            double a = 2 * Math.PI * i / 16;
            line[i] = new Vector3D(0.1 * Math.cos(a), 0.1 * Math.sin(a), -0.05 * i / 16);
        }
        Simulation s = sim(new SplineTube(line, 0.012, Side.INSIDE));
        // the wall below the second centreline point, then 0.1 mm off it along the normal
        StartPlacement onWall = StartPlacement.onSurface(s, line[2].add(new Vector3D(0, 0, -0.008)), 1e-3);
        ContactGeometry g = s.geometryAt(onWall.centre(), 0);
        Vector3D n = new Vector3D(g.normal[0], g.normal[1], g.normal[2]);
        Vector3D off = onWall.centre().add(1e-4, n);
        StartPlacement p = StartPlacement.onSurface(s, off, 5e-4);
        double gap = s.geometryAt(p.centre(), 0).distance - R;
        assertTrue(Math.abs(gap) <= 1e-3 * 1e-6 * R, "on the offset surface to a thousandth of the tolerance: " + gap);
        // the distance function has unit gradient, so the move is the gap to first order in the
        // wall's curvature times the gap (1e-4 m x 1/(8 mm) ~ 1e-2 relative, squared: 1e-4)
        assertEquals(1e-4, p.distance(), 1e-8);
        BallState start = s.rollingStart(p.centre(), Vector3D.ZERO);
        RunResult r = s.run(start, 0.2);
        assertNotEquals(EndReason.GEOMETRY, r.endReason(), r.message());
        assertTrue(r.endState().time() > 0.19 || r.endReason() == EndReason.EXIT, r.endReason() + " " + r.message());
        // without placement the library refuses the contact start 0.1 mm off
        assertThrows(IllegalArgumentException.class, () -> s.run(s.rollingStart(off, Vector3D.ZERO), 1e-3));
    }
}
