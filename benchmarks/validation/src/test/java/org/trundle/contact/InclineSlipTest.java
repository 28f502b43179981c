package org.trundle.contact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.trundle.core.Ball;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Plane;

/**
 * Ball released from rest on an incline of angle θ. Rolling needs a friction force
 * {@code k m g sinθ/(1+k)}, so it holds while {@code μ_s ≥ k tanθ/(1+k)}; below that the ball slides
 * from the start with {@code a = g(sinθ − μ_k cosθ)} and angular acceleration
 * {@code μ_k g cosθ/(k r)}; with more grip it rolls at {@code g sinθ/(1+k)} (standard textbook
 * result).
 */
class InclineSlipTest {
    static final double G = 9.81;

    @ParameterizedTest(name = "k={0} theta={1} mu_s={2} mu_k={3}")
    @CsvSource({"0.4, 40, 0.2, 0.15", "0.4, 40, 0.3, 0.25", "0.6666666666666666, 30, 0.2, 0.2",
        "0.6666666666666666, 30, 0.3, 0.1", "0.4, 60, 0.45, 0.4", "0.4, 60, 0.5, 0.4"})
    void slidesOrRollsByTheGripCriterion(double k, double thetaDeg, double muS, double muK) {
        double th = Math.toRadians(thetaDeg);
        double r = 0.01;
        Vector3D normal = new Vector3D(-Math.sin(th), 0, Math.cos(th));
        Vector3D down = new Vector3D(-Math.cos(th), 0, -Math.sin(th));
        Simulation sim = Simulation.builder().ball(Ball.of(r, 0.05, k)).surface(new Plane(Vector3D.ZERO, normal))
            .law(new Coulomb(muS, muK, 0.0)).gravity(new Vector3D(0, 0, -G))
            .settings(SolverSettings.defaults().withSampleInterval(0.01)).build();
        Vector3D c0 = normal.scalarMultiply(r);
        List<Sample> samples = new ArrayList<>();
        RunResult res = sim.run(sim.rollingStart(c0, Vector3D.ZERO), 0.5, samples::add);
        boolean shouldSlide = muS < k * Math.tan(th) / (1 + k);
        double a = shouldSlide ? G * (Math.sin(th) - muK * Math.cos(th)) : G * Math.sin(th) / (1 + k);
        double alpha = shouldSlide ? muK * G * Math.cos(th) / (k * r) : a / r;
        assertEquals(shouldSlide, !res.eventsOf(EventKind.SLIP).isEmpty(), res.events().toString());
        assertTrue(res.eventsOf(EventKind.STICK).isEmpty());
        Vector3D axis = Vector3D.crossProduct(normal, down);
        double worst = 0;
        for (Sample s : samples) {
            double t = s.time();
            assertEquals(shouldSlide ? Phase.SLIDING : Phase.ROLLING, s.state().phase());
            double x = s.state().centre().subtract(c0).dotProduct(down);
            worst = Math.max(worst, Math.abs(x - 0.5 * a * t * t) / (0.5 * a));
            double w = s.state().spin().dotProduct(axis);
            worst = Math.max(worst, Math.abs(w - alpha * t) / alpha);
        }
        assertTrue(worst < 1e-9, "relative error " + worst);
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
    }
}
