package org.trundle.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Side;
import org.trundle.surfaces.Sphere;

/**
 * Where a rolling ball leaves a curved wall, against the closed forms of two textbook problems
 * (rolling without slip, energy conserved, the wall's push {@code N} from the centripetal balance;
 * common practice, e.g. the "ball rolling off a hemisphere" and "loop-the-loop" exercises of
 * introductory mechanics texts, worked here from memory). With {@code ρ} the radius of the centre's
 * circle and {@code I = k m r²}:
 *
 * <ul>
 *   <li>off the top of a sphere (outside, {@code ρ = R + r}), starting at the top with speed
 *       {@code u}: {@code cos θ = (2 + (1+k) u²/(g ρ)) / (3 + k)}, θ from the top ({@code 10/17}
 *       for a solid ball started from rest);</li>
 *   <li>inside a horizontal tube (a vertical loop, {@code ρ = R − r}), starting at the bottom with
 *       speed {@code u} too small to go round: {@code cos φ = (2 g ρ − (1+k) u²) / ((3 + k) g ρ)}, φ
 *       from the bottom (the wall lets go above the axis).</li>
 * </ul>
 *
 * The lift-off is located by the root of the normal force, whose checks the engine spaces from a
 * local model of that function; the cosine must match to 1e-9 (measured: 1e-11 or better; the
 * integration tolerance is 1e-10 and the event-time tolerance 1e-12 s).
 */
class LiftOffTest {
    private static final double G = 9.81;

    @ParameterizedTest(name = "sphere R={0} r={1} k={2} u={3}")
    @CsvSource({"0.05, 0.01, 0.4, 1e-3", "0.05, 0.01, 0.4, 0.2", "0.3, 0.02, 0.6666666666666666, 0.5",
        "0.02, 0.015, 0.2, 0.05"})
    void offTheTopOfASphere(double bigR, double r, double k, double u) {
        Ball ball = Ball.of(r, 0.05, k);
        Simulation sim = Simulation.builder().ball(ball).surface(new Sphere(Vector3D.ZERO, bigR, Side.OUTSIDE))
            .law(new PureRolling()).gravity(new Vector3D(0, 0, -G)).build();
        double rho = bigR + r;
        BallState start = sim.rollingStart(new Vector3D(0, 0, rho), new Vector3D(u, 0, 0));
        RunEvent lift = firstLiftOff(sim.run(start, 5.0));
        Vector3D c = lift.before().centre();
        double cosTheta = c.getZ() / c.getNorm();
        double expected = (2 + (1 + k) * u * u / (G * rho)) / (3 + k);
        assertEquals(expected, cosTheta, 1e-9 * expected, "cos(theta) at lift-off");
        assertEquals(Phase.FLIGHT, lift.after().phase());
    }

    @ParameterizedTest(name = "tube R={0} r={1} k={2} u/sqrt(g rho)={3}")
    @CsvSource({"0.05, 0.01, 0.4, 1.8", "0.05, 0.01, 0.4, 1.3", "0.2, 0.004, 0.6666666666666666, 1.5",
        "0.015, 0.004, 0.4, 1.6"})
    void insideAVerticalLoop(double bigR, double r, double k, double uScaled) {
        Ball ball = Ball.of(r, 0.05, k);
        Simulation sim = Simulation.builder().ball(ball)
            .surface(new Cylinder(Vector3D.ZERO, Vector3D.PLUS_J, bigR, Side.INSIDE))
            .law(new PureRolling()).gravity(new Vector3D(0, 0, -G)).build();
        double rho = bigR - r;
        double u = uScaled * Math.sqrt(G * rho);
        double expected = (2 * G * rho - (1 + k) * u * u) / ((3 + k) * G * rho);
        assertTrue(expected > -1 && expected < 0, "the case must leave the wall above the axis: " + expected);
        BallState start = sim.rollingStart(new Vector3D(0, 0, -rho), new Vector3D(u, 0, 0));
        RunEvent lift = firstLiftOff(sim.run(start, 5.0));
        Vector3D c = lift.before().centre();
        double cosPhi = -c.getZ() / Math.hypot(c.getX(), c.getZ());
        assertEquals(expected, cosPhi, 1e-9, "cos(phi) at lift-off");
    }

    private static RunEvent firstLiftOff(RunResult res) {
        List<RunEvent> lifts = res.eventsOf(EventKind.LIFT_OFF);
        assertTrue(!lifts.isEmpty(), "no lift-off; run ended by " + res.endReason() + " " + res.message());
        return lifts.get(0);
    }
}
