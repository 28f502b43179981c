package org.trundle.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.EndReason;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Side;

/**
 * Loosening the tolerance never costs more: a ball rolling on the inside wall of a vertical tube
 * (no switch on the way, so every evaluation belongs to the integrator or a projection restart),
 * run at relative tolerances 1e-12 … 1e-6. Counts, not times.
 *
 * <p>Bounds: a Dormand–Prince 8(5,3) step costs 11 new stages (the twelfth is the next step's
 * first, FSAL) plus 3 for the dense output the event checks read, 15 in all (Hairer, Nørsett &amp;
 * Wanner, Solving ODE I, 2nd ed., §II.10; from memory); a rejected step costs 11 more. At most one
 * rejection per eleven accepted steps is allowed: {@code 15 + 1 = 16} evaluations per accepted step.
 * A projection restart costs a fresh first stage and the detectors' initial checks, so restarts on
 * most steps (a projection threshold that ignores the tolerance) break that bound. The height
 * frequency {@code Ω sqrt(k/(1+k))} (Gualtieri, Tokieda et al., Am. J. Phys. 74 (2006) 497–501)
 * checks that the cheaper runs are still right to within a thousand times the tolerance over five
 * periods.
 */
class ToleranceCostTest {
    @Test
    void evaluationsFallAsTheToleranceIsLoosened() {
        double bigR = 0.015;
        double r = 0.004;
        double u = 0.8;
        double k = 0.4;
        Ball ball = Ball.solid(r, 0.0021);
        double rho = bigR - r;
        double omega = u / rho;
        double lambda = omega * Math.sqrt(k / (1 + k));
        double periods = 5;
        double duration = periods * 2 * Math.PI / lambda;
        long previous = Long.MAX_VALUE;
        for (int e = 12; e >= 6; e--) {
            double tol = Math.pow(10, -e);
            Simulation sim = Simulation.builder().ball(ball)
                .surface(new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, bigR, Side.INSIDE))
                .law(new PureRolling()).gravity(new Vector3D(0, 0, -9.81))
                .settings(SolverSettings.defaults().withTolerance(tol)).build();
            RunResult res = sim.run(sim.rollingStart(new Vector3D(rho, 0, 0), new Vector3D(0, u, 0)), duration);
            assertEquals(EndReason.DURATION, res.endReason());
            assertTrue(res.evaluations() <= previous,
                "tolerance " + tol + ": " + res.evaluations() + " evaluations, more than " + previous + " at a tighter one");
            previous = res.evaluations();
            double perStep = (double) res.evaluations() / res.steps();
            assertTrue(perStep <= 16, "tolerance " + tol + ": " + perStep + " evaluations per accepted step");
            // after whole periods the height is back at its start, 0, with zero vertical speed
            double zEnd = res.endState().centre().getZ();
            double amplitude = 9.81 / (k * omega * omega);
            assertTrue(Math.abs(zEnd) <= 1000 * tol * amplitude * periods * 2 * Math.PI + 1e-12,
                "tolerance " + tol + ": end height " + zEnd + " m after whole periods");
        }
    }
}
