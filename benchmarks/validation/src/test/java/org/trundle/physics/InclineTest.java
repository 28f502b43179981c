package org.trundle.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.EndReason;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Plane;

/**
 * Sphere rolling without slip down an incline of angle θ: the centre accelerates along the line
 * of steepest descent at {@code a = g sinθ/(1+k)} (5/7 g sinθ solid, 3/5 g sinθ thin shell) —
 * standard textbook result (e.g. any undergraduate mechanics text, rolling without slipping).
 */
class InclineTest {
    @ParameterizedTest(name = "k={0} theta={1} deg")
    @CsvSource({"0.4, 10", "0.4, 35", "0.6666666666666666, 20", "0.6666666666666666, 60"})
    void accelerationIsGSinThetaOverOnePlusK(double k, double thetaDeg) {
        double g = 9.81;
        double th = Math.toRadians(thetaDeg);
        // incline through the origin, rising along +x; gravity -z
        Vector3D normal = new Vector3D(-Math.sin(th), 0, Math.cos(th));
        Ball ball = Ball.of(0.01, 0.05, k);
        Simulation sim = Simulation.builder().ball(ball).surface(new Plane(Vector3D.ZERO, normal))
            .law(new PureRolling()).gravity(new Vector3D(0, 0, -g))
            .settings(SolverSettings.defaults().withSampleInterval(0.01)).build();
        Vector3D c0 = normal.scalarMultiply(0.01);
        Vector3D down = new Vector3D(-Math.cos(th), 0, -Math.sin(th));
        Vector3D across = Vector3D.PLUS_J;
        Vector3D v0 = across.scalarMultiply(0.3).add(0.1, down);
        List<Sample> samples = new ArrayList<>();
        RunResult res = sim.run(sim.rollingStart(c0, v0), 1.0, samples::add);
        assertEquals(EndReason.DURATION, res.endReason());
        double aRef = g * Math.sin(th) / (1 + k);
        double worst = 0;
        for (Sample s : samples) {
            double t = s.time();
            Vector3D d = s.state().centre().subtract(c0);
            double along = d.dotProduct(down);
            double acrossPos = d.dotProduct(across);
            double refAlong = 0.1 * t + 0.5 * aRef * t * t;
            worst = Math.max(worst, Math.abs(along - refAlong) / (0.5 * aRef));
            worst = Math.max(worst, Math.abs(acrossPos - 0.3 * t) / (0.5 * aRef));
        }
        assertTrue(worst < 1e-9, "relative position error " + worst);
        // normal force m g cos(theta), no slip needed force k m g sin(theta)/(1+k)
        Sample last = samples.get(samples.size() - 1);
        assertEquals(ball.mass() * g * Math.cos(th), last.normalForce(), 1e-9 * ball.mass() * g);
        assertEquals(k * ball.mass() * g * Math.sin(th) / (1 + k), last.frictionForce().getNorm(), 1e-9 * ball.mass() * g);
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
    }
}
