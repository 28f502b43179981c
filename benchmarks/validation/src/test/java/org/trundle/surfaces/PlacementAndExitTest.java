package org.trundle.surfaces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.core.Surface;

/**
 * Rigid placement is a change of frame: a run on a placed surface with rotated gravity equals the
 * original run carried by the same rigid motion (Galilean invariance of the equations of motion;
 * common practice). And the patch edges end a run with an exit event naming the edge.
 */
class PlacementAndExitTest {
    static final Vector3D G = new Vector3D(0, 0, -9.81);

    static List<Vector3D> centres(Surface s, Vector3D gravity, Vector3D c, Vector3D v) {
        Simulation sim = Simulation.builder().ball(Ball.solid(0.01, 0.01)).surface(s).law(new PureRolling()).gravity(gravity)
            .settings(SolverSettings.defaults().withSampleInterval(1e-3)).build();
        List<Vector3D> out = new ArrayList<>();
        RunResult res = sim.run(sim.rollingStart(c, v, 5.0), 0.5, (Sample x) -> out.add(x.state().centre()));
        assertEquals(EndReason.DURATION, res.endReason(), res.message());
        return out;
    }

    @Test
    void placedTorusRunIsTheRotatedRun() {
        Surface torus = new Torus(Vector3D.ZERO, Vector3D.PLUS_K, 0.2, 0.04, Side.INSIDE);
        Rotation q = new Rotation(new Vector3D(1, -2, 0.5), 0.9, RotationConvention.VECTOR_OPERATOR);
        Vector3D t = new Vector3D(0.5, 1.0, -0.3);
        Surface placed = new Placed(torus, q, t);
        Vector3D c = new Vector3D(0.2, 0, -0.03);
        Vector3D v = new Vector3D(0, 0.7, 0);
        List<Vector3D> a = centres(torus, G, c, v);
        List<Vector3D> b = centres(placed, q.applyTo(G), q.applyTo(c).add(t), q.applyTo(v));
        assertEquals(a.size(), b.size());
        double worst = 0;
        for (int i = 0; i < a.size(); i++) {
            worst = Math.max(worst, q.applyTo(a.get(i)).add(t).distance(b.get(i)));
        }
        System.out.printf("placed torus vs rotated run: %.2e m over %d samples%n", worst, a.size());
        // the two runs differ only by rounding in the frame change (which can perturb the
        // integrator's step choices): judged against 1e-9 of the tube radius
        assertTrue(worst < 1e-9 * 0.04, "placed run differs by " + worst + " m");
    }

    @Test
    void ballLeavesABowlCapThroughItsRim() {
        // a shallow cap of a 0.3 m sphere, rim at 40 degrees from the bottom (invented numbers)
        Sphere cap = new Sphere(new Vector3D(0, 0, 0.3), 0.3, Side.INSIDE, Vector3D.MINUS_K, 0.0, Math.toRadians(40));
        Simulation sim = Simulation.builder().ball(Ball.solid(0.01, 0.01)).surface(cap).law(new PureRolling()).gravity(G)
            .settings(SolverSettings.defaults().withSampleInterval(1e-3)).build();
        BallState s0 = sim.rollingStart(new Vector3D(0, 0, 0.01), new Vector3D(1.5, 0, 0));
        RunResult res = sim.run(s0, 2.0);
        assertEquals(EndReason.EXIT, res.endReason(), res.message());
        RunEvent exit = res.exit().orElseThrow();
        // at the exit the contact point is on the rim: polar angle 40 degrees seen from the centre
        Vector3D c = exit.before().centre();
        Vector3D e = c.subtract(new Vector3D(0, 0, 0.3)).normalize();
        double theta = Vector3D.angle(e, Vector3D.MINUS_K);
        System.out.println("bowl exit: " + exit + " polar angle " + Math.toDegrees(theta));
        assertEquals("polar_to", exit.edge());
        assertEquals(Math.toRadians(40), theta, 1e-9);
    }
}
