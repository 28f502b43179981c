package org.trundle.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.EndReason;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Side;

/**
 * A ball started rolling upward in a finite vertical tube leaves through the top: the exit event's
 * time, position, velocity and spin match the analytic vertical-tube solution
 * {@code z(t) = z̄ + (z0 − z̄) cos λt + (w0/λ) sin λt}, {@code z̄ = z0 − g/(kΩ²)},
 * {@code λ = Ω sqrt(k/(1+k))} (Gualtieri, Tokieda et al., Am. J. Phys. 74 (2006) 497; derivable from
 * Newton–Euler with no slip), and the last trajectory sample before the exit.
 */
class TubeExitTest {
    @Test
    void leavesThroughTheTopWithTheAnalyticState() {
        double g = 9.81;
        double r = 0.004;
        double bigR = 0.015;
        double k = 0.4;
        Ball ball = Ball.solid(r, 0.0021);
        Cylinder tube = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, bigR, Side.INSIDE, -0.3, 0.0);
        Simulation sim = Simulation.builder().ball(ball).surface(tube).law(new PureRolling())
            .gravity(new Vector3D(0, 0, -g)).settings(SolverSettings.defaults().withSampleInterval(1e-4)).build();
        double rho = bigR - r;
        double u = 0.8;
        double w0 = 0.4;
        double z0 = -0.005;
        double omega = u / rho;
        double lambda = omega * Math.sqrt(k / (1 + k));
        double mean = z0 - g / (k * omega * omega);
        List<Sample> samples = new ArrayList<>();
        RunResult res = sim.run(sim.rollingStart(new Vector3D(rho, 0, z0), new Vector3D(0, u, w0)), 2.0, samples::add);
        assertEquals(EndReason.EXIT, res.endReason());
        RunEvent exit = res.exit().orElseThrow();
        assertEquals("to", exit.edge());
        double tRef = new BracketingNthOrderBrentSolver(1e-14, 5).solve(100,
            t -> mean + (z0 - mean) * Math.cos(lambda * t) + w0 / lambda * Math.sin(lambda * t), 0.0,
            firstMaxTime(lambda, z0 - mean, w0));
        assertEquals(tRef, exit.time(), 1e-9);
        assertEquals(0.0, exit.before().centre().getZ(), 1e-10);
        double vzRef = -(z0 - mean) * lambda * Math.sin(lambda * tRef) + w0 * Math.cos(lambda * tRef);
        assertEquals(vzRef, exit.before().velocity().getZ(), 1e-8 * u);
        // orbital speed constant, so the tangential speed is still u
        Vector3D v = exit.before().velocity();
        assertEquals(u, Math.hypot(v.getX(), v.getY()), 1e-8 * u);
        // the exit state is consistent with the no-slip spin: v = r w x n
        Vector3D p = exit.before().centre();
        Vector3D n = new Vector3D(-p.getX(), -p.getY(), 0).normalize();
        Vector3D vRoll = Vector3D.crossProduct(exit.before().spin(), n).scalarMultiply(r);
        assertTrue(vRoll.subtract(v).getNorm() < 1e-9 * u);
        // the last sample before the exit lies just below the top, within one sample interval
        Sample last = samples.stream().filter(s -> !s.event() && s.time() < exit.time()).reduce((a, b) -> b).orElseThrow();
        assertTrue(exit.time() - last.time() <= 1e-4 + 1e-12);
        assertTrue(last.state().centre().getZ() < 0);
    }

    private static double firstMaxTime(double lambda, double a, double b) {
        // z - mean = a cos + (b/lambda) sin peaks at lambda t = atan2(b/lambda, a) (mod 2 pi)
        double phase = Math.atan2(b / lambda, a);
        if (phase < 0) {
            phase += 2 * Math.PI;
        }
        return phase / lambda;
    }
}
