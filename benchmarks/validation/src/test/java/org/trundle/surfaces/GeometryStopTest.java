package org.trundle.surfaces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.ContactGeometry;
import org.trundle.core.EndReason;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;

/**
 * Geometry limits that can only be met during a run end it as a typed stop with the last good
 * state and a message naming the surface: a ball reaching the excluded apex of a conical dome, and
 * a ball rolling into a narrowing tube where {@code r·κ} reaches 1 (design notes §2).
 */
class GeometryStopTest {

    @Test
    void ballRollingOverTheApexOfAConicalDomeStops() {
        Cone dome = new Cone(new Vector3D(0, 0, 0.1), Vector3D.MINUS_K, 1.2, Side.OUTSIDE);
        Ball ball = Ball.solid(0.005, 0.002);
        Simulation sim = Simulation.builder().ball(ball).surface(dome).law(new PureRolling())
            .gravity(new Vector3D(0, 0, -9.81)).settings(SolverSettings.defaults().withSampleInterval(1e-3)).build();
        // start on the flank 2 cm from the apex, rolling up toward it (invented numbers)
        double alpha = 1.2;
        double t = 0.02;
        Vector3D p = new Vector3D(t * Math.sin(alpha), 0, 0.1 - t * Math.cos(alpha));
        Vector3D n = new Vector3D(Math.cos(alpha), 0, Math.sin(alpha));
        Vector3D up = new Vector3D(-Math.sin(alpha), 0, Math.cos(alpha));
        BallState s0 = sim.rollingStart(p.add(0.005, n), up.scalarMultiply(1.0));
        RunResult res = sim.run(s0, 0.5);
        assertEquals(EndReason.GEOMETRY, res.endReason(), res.message());
        assertTrue(res.message().contains("apex (0.00000, 0.00000, 0.100000)"), res.message());
        assertTrue(Double.isFinite(res.endState().centre().getX()));
    }

    @Test
    void ballRollingIntoANarrowingTubeStopsWhenItNoLongerFits() {
        // an invented tapered tube, radius 0.03 m down to 0.008 m over 0.3 m, its floor level at z = -0.03 m
        double[] radii = {0.03, 0.0225, 0.015, 0.008};
        Vector3D[] pts = new Vector3D[4];
        for (int i = 0; i < 4; i++) {
            pts[i] = new Vector3D(0.1 * i, 0, radii[i] - 0.03);
        }
        SplineTube taper = new SplineTube(pts, radii, Side.INSIDE);
        assertTrue(Double.isNaN(taper.maxConcaveCurvature()));
        Ball ball = Ball.solid(0.01, 0.004);
        Simulation sim = Simulation.builder().ball(ball).surface(taper).law(new PureRolling())
            .gravity(new Vector3D(0, 0, -9.81)).settings(SolverSettings.defaults().withSampleInterval(1e-3)).build();
        ContactGeometry g = sim.geometryAt(new Vector3D(0.02, 0, -0.02), 0);
        Vector3D n = new Vector3D(g.normal[0], g.normal[1], g.normal[2]);
        Vector3D c = new Vector3D(g.point[0], g.point[1], g.point[2]).add(0.01, n);
        Vector3D v = new Vector3D(0.8, 0, 0);
        BallState s0 = sim.rollingStart(c, v.subtract(v.dotProduct(n), n));
        RunResult res = sim.run(s0, 1.0);
        assertEquals(EndReason.GEOMETRY, res.endReason(), res.message());
        // where the bore closes to the ball's radius the centre reaches the centreline as r*kappa
        // reaches 1; whichever the solver meets first (the fit event, or the centreline while the
        // ball leaves the narrowing wall), the run ends as a typed geometry stop naming the surface
        assertTrue((res.message().contains("no longer fits") || res.message().contains("on the centreline"))
            && res.message().contains("splineTube(inside"), res.message());
        assertTrue(res.endState().centre().getX() > 0.25 && res.endState().centre().getX() < 0.3,
            "stops in the narrowing: x = " + res.endState().centre().getX());
        System.out.println("taper stop at x = " + res.endState().centre().getX() + " m: " + res.message());
    }
}
