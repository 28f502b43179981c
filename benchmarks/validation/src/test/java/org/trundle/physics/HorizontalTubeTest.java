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
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Side;

/**
 * Small oscillations of a ball rolling at the bottom of a horizontal tube of radius R: angular
 * frequency {@code ω² = g/((1+k)(R−r))} — standard textbook result (ball rolling in a cylindrical
 * trough). The period is measured from the upward zero crossings of the transverse coordinate.
 */
class HorizontalTubeTest {
    @ParameterizedTest(name = "k={0} R={1} r={2}")
    @CsvSource({"0.4, 0.05, 0.01", "0.6666666666666666, 0.02, 0.004", "0.3, 0.5, 0.02"})
    void smallOscillationFrequency(double k, double bigR, double r) {
        double g = 9.81;
        Ball ball = Ball.of(r, 0.01, k);
        Cylinder tube = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_I, bigR, Side.INSIDE);
        Simulation sim = Simulation.builder().ball(ball).surface(tube).law(new PureRolling())
            .gravity(new Vector3D(0, 0, -g)).build();
        double rho = bigR - r;
        double omegaRef = Math.sqrt(g / ((1 + k) * rho));
        sim = sim.withSettings(SolverSettings.defaults().withSampleInterval(2 * Math.PI / omegaRef / 1000));
        // amplitude 1e-4 rad: the anharmonic frequency shift is ~ theta0^2/16 = 6e-10
        double theta0 = 1e-4;
        double speed = theta0 * rho * omegaRef;
        Vector3D c = new Vector3D(0, 0, -rho);
        List<double[]> ys = new ArrayList<>();
        RunResult res = sim.run(sim.rollingStart(c, new Vector3D(0, speed, 0)), 10 * 2 * Math.PI / omegaRef,
            s -> ys.add(new double[] {s.time(), s.state().centre().getY()}));
        List<Double> crossings = new ArrayList<>();
        for (int i = 1; i < ys.size(); i++) {
            double[] a = ys.get(i - 1);
            double[] b = ys.get(i);
            if (a[1] < 0 && b[1] >= 0) {
                crossings.add(a[0] + (b[0] - a[0]) * (-a[1]) / (b[1] - a[1]));
            }
        }
        assertTrue(crossings.size() >= 8, "crossings " + crossings.size());
        double period = (crossings.get(crossings.size() - 1) - crossings.get(0)) / (crossings.size() - 1);
        // crossings are interpolated linearly between samples 1/1000 period apart; at a zero crossing
        // of a sine the linear-interpolation error is third order in the spacing (~1e-9 of a period),
        // far below the 1e-6 bound.
        assertEquals(2 * Math.PI / omegaRef, period, 1e-6 * 2 * Math.PI / omegaRef);
        assertTrue(res.energy().relativeResidual() < 1e-8);
    }
}
