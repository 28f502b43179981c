package org.trundle.surfaces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;

/** Rolling on a spherical bowl and inside a cone against closed-form results. */
class BowlAndConeOrbitTest {
    static final double G = 9.81;

    /**
     * Small oscillations of a ball rolling at the bottom of a spherical bowl:
     * {@code ω² = g/((1+k)(R−r))} (standard textbook result, e.g. the rolling-pendulum problem of
     * intermediate mechanics texts; from the energy {@code ½(1+k) m (R−r)² θ'² + m g (R−r)(1 − cos θ)}).
     * Measured from the zero crossings of the horizontal displacement, in x and in y.
     */
    @ParameterizedTest(name = "k={0} R={1} r={2} direction={3}")
    @CsvSource({
        "0.4, 0.2, 0.01, x",
        "0.4, 0.2, 0.01, y",
        "0.6666666666666666, 0.5, 0.03, x",
        "0.6666666666666666, 0.5, 0.03, y"
    })
    void smallOscillationFrequency(double k, double bigR, double r, String dir) {
        Ball ball = Ball.of(r, 0.01, k);
        Sphere bowl = new Sphere(new Vector3D(0, 0, bigR), bigR, Side.INSIDE, Vector3D.MINUS_K, 0.0, 1.0);
        double dt = 2e-4;
        Simulation sim = Simulation.builder().ball(ball).surface(bowl).law(new PureRolling())
            .gravity(new Vector3D(0, 0, -G)).settings(SolverSettings.defaults().withSampleInterval(dt)).build();
        double omega = Math.sqrt(G / ((1 + k) * (bigR - r)));
        // amplitude 1e-4 rad: the anharmonic frequency shift (~θ0²/16) is below 1e-9
        double u = 1e-4 * (bigR - r) * omega;
        Vector3D v = dir.equals("x") ? new Vector3D(u, 0, 0) : new Vector3D(0, u, 0);
        BallState s0 = sim.rollingStart(new Vector3D(0, 0, r), v);
        double period = 2 * Math.PI / omega;
        List<double[]> tx = new ArrayList<>();
        RunResult res = sim.run(s0, 4.2 * period, (Sample s) -> {
            Vector3D c = s.state().centre();
            tx.add(new double[] {s.time(), dir.equals("x") ? c.getX() : c.getY(), dir.equals("x") ? c.getY() : c.getX()});
        });
        assertEquals(EndReason.DURATION, res.endReason());
        List<Double> crossings = new ArrayList<>();
        double worstCross = 0;
        for (int i = 1; i < tx.size(); i++) {
            double[] a = tx.get(i - 1);
            double[] b = tx.get(i);
            worstCross = Math.max(worstCross, Math.abs(b[2]));
            if (a[1] > 0 && b[1] <= 0 || a[1] < 0 && b[1] >= 0) {
                crossings.add(a[0] - a[1] * (b[0] - a[0]) / (b[1] - a[1]));
            }
        }
        // the first crossing is the start (x = 0 at t = 0); use crossings 1..8 (half periods)
        assertTrue(crossings.size() >= 8, "crossings " + crossings.size());
        double halfPeriod = (crossings.get(crossings.size() - 1) - crossings.get(0)) / (crossings.size() - 1);
        double measured = Math.PI / halfPeriod;
        double rel = Math.abs(measured - omega) / omega;
        System.out.printf("bowl k=%.4f R=%.2f r=%.3f %s: omega=%.12f measured=%.12f rel=%.2e cross-motion=%.2e m%n",
            k, bigR, r, dir, omega, measured, rel, worstCross);
        assertTrue(rel < 1e-7, "bowl frequency relative error " + rel);
        // the motion stays in its vertical plane
        assertTrue(worstCross < 1e-9 * r, "motion out of plane " + worstCross);
        assertTrue(res.energy().relativeResidual() < 1e-8, "energy " + res.energy());
    }

    /**
     * Steady circular orbit inside a cone of half-angle α (from the axis), no spin about the
     * normal: {@code Ω² = g·cot α/((1+k) ρ)} with {@code ρ} the centre's distance from the axis
     * (no-slip Newton–Euler; cf. Campos, Fernández-Chapou, Salas-Brito, Vargas, Eur. J. Phys. 27
     * (2006) 567). The orbit radius must hold to 1e-8 relative over 50 revolutions.
     */
    @ParameterizedTest(name = "k={0} alpha={1} rho={2} r={3}")
    @CsvSource({
        "0.4, 0.5, 0.1, 0.01",
        "0.6666666666666666, 1.0, 0.05, 0.005",
        "0.4, 0.3, 0.2, 0.02"
    })
    void steadyOrbitInsideCone(double k, double alpha, double rho, double r) {
        Ball ball = Ball.of(r, 0.01, k);
        Cone funnel = new Cone(Vector3D.ZERO, Vector3D.PLUS_K, alpha, Side.INSIDE, 0.2 * rho / Math.tan(alpha), 10.0);
        double bigOmega = Math.sqrt(G / Math.tan(alpha) / ((1 + k) * rho));
        double period = 2 * Math.PI / bigOmega;
        Simulation sim = Simulation.builder().ball(ball).surface(funnel).law(new PureRolling())
            .gravity(new Vector3D(0, 0, -G)).settings(SolverSettings.defaults().withSampleInterval(period / 20)).build();
        double z = (r + rho * Math.cos(alpha)) / Math.sin(alpha);
        BallState s0 = sim.rollingStart(new Vector3D(rho, 0, z), new Vector3D(0, bigOmega * rho, 0), 0.0);
        double[] worst = new double[2];
        RunResult res = sim.run(s0, 50 * period, (Sample s) -> {
            Vector3D c = s.state().centre();
            worst[0] = Math.max(worst[0], Math.abs(Math.hypot(c.getX(), c.getY()) - rho) / rho);
            worst[1] = Math.max(worst[1], Math.abs(c.getZ() - z) / rho);
        });
        assertEquals(EndReason.DURATION, res.endReason());
        Vector3D c = res.endState().centre();
        double phase = Math.atan2(c.getY(), c.getX());
        System.out.printf("cone k=%.4f alpha=%.2f rho=%.3f: radius drift %.2e, height drift %.2e, end phase %.2e rad, evals %d%n",
            k, alpha, rho, worst[0], worst[1], phase, res.evaluations());
        assertTrue(worst[0] < 1e-8, "orbit radius drift " + worst[0]);
        assertTrue(worst[1] < 1e-8, "orbit height drift " + worst[1]);
        // after 50 revolutions the ball is back at azimuth 0
        assertTrue(Math.abs(phase) < 1e-6, "orbit phase " + phase);
    }
}
