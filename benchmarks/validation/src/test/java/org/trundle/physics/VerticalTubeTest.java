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
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Side;

/**
 * Ball rolling without slip on the inside wall of a vertical tube.
 *
 * <p>Reference: the centre's angular speed Ω about the axis is constant, the height oscillates
 * harmonically with angular frequency {@code λ = Ω sqrt(k/(1+k))} about the mean height
 * {@code z0 − g/(kΩ²) − r ω_r(0)/Ω}, the normal force is {@code m ρ Ω²} and {@code ω_r − Ω z/r} is
 * conserved (M. Gualtieri, T. Tokieda et al., "Golfer's dilemma", Am. J. Phys. 74 (2006) 497–501;
 * J. E. Littlewood, A Mathematician's Miscellany (1953); derivable from Newton–Euler with the no-slip
 * constraint).
 */
class VerticalTubeTest {
    static final double G = 9.81;

    @ParameterizedTest(name = "k={0} R={1} r={2} u={3} w_r={4} w_n={5}")
    @CsvSource({
        "0.4, 0.015, 0.004, 0.8, 0.0, 0.0",
        "0.6666666666666666, 0.015, 0.004, 0.8, 0.0, 0.0",
        "0.4, 0.05, 0.01, 1.5, 20.0, 0.0",
        "0.25, 0.02, 0.002, 0.5, -30.0, 40.0"
    })
    void heightOscillatesHarmonically(double k, double bigR, double r, double u, double spinR, double spinN) {
        Ball ball = Ball.of(r, 0.001, k);
        Cylinder tube = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, bigR, Side.INSIDE);
        Simulation sim = Simulation.builder().ball(ball).surface(tube).law(new PureRolling())
            .gravity(new Vector3D(0, 0, -G))
            .settings(SolverSettings.defaults().withSampleInterval(1e-3)).build();
        double rho = bigR - r;
        double z0 = 0.0;
        Vector3D c = new Vector3D(rho, 0, z0);
        // rolling start with tangential speed u, plus an extra spin about the outward radial
        // direction (e_x) and about the normal (-e_x): both keep v = r w x n since e_x is parallel to n.
        BallState s0 = sim.rollingStart(c, new Vector3D(0, u, 0), spinN);
        s0 = s0.withSpin(s0.spin().add(new Vector3D(spinR, 0, 0)));
        // the radial spin makes the start velocity the no-slip one only if we recompute v
        double omega = u / rho;
        double lambda = omega * Math.sqrt(k / (1 + k));
        double wr0 = s0.spin().getX();
        double mean = z0 - G / (k * omega * omega) - r * wr0 / omega;
        double amp = z0 - mean;
        double period = 2 * Math.PI / lambda;
        double duration = 3 * period;
        List<Sample> samples = new ArrayList<>();
        RunResult res = sim.run(s0, duration, samples::add);
        assertEquals(EndReason.DURATION, res.endReason());
        double scaleZ = Math.max(Math.abs(amp), r);
        double worstZ = 0;
        double worstOmega = 0;
        double worstFn = 0;
        double worstInvariant = 0;
        double inv0 = wr0 - omega * z0 / r;
        for (Sample s : samples) {
            double t = s.time();
            Vector3D p = s.state().centre();
            double zRef = mean + amp * Math.cos(lambda * t);
            worstZ = Math.max(worstZ, Math.abs(p.getZ() - zRef) / scaleZ);
            Vector3D v = s.state().velocity();
            double om = (p.getX() * v.getY() - p.getY() * v.getX()) / (p.getX() * p.getX() + p.getY() * p.getY());
            worstOmega = Math.max(worstOmega, Math.abs(om - omega) / omega);
            worstFn = Math.max(worstFn, Math.abs(s.normalForce() - ball.mass() * rho * omega * omega)
                / (ball.mass() * rho * omega * omega));
            Vector3D er = new Vector3D(p.getX(), p.getY(), 0).normalize();
            double inv = s.state().spin().dotProduct(er) - omega * p.getZ() / r;
            worstInvariant = Math.max(worstInvariant, Math.abs(inv - inv0) / Math.max(Math.abs(inv0), omega * scaleZ / r));
        }
        assertTrue(samples.size() > 100);
        assertTrue(worstZ < 1e-6, "height error " + worstZ);
        assertTrue(worstOmega < 1e-6, "orbital speed error " + worstOmega);
        assertTrue(worstFn < 1e-6, "normal force error " + worstFn);
        assertTrue(worstInvariant < 1e-6, "invariant error " + worstInvariant);
        assertTrue(res.maxDistanceError() < 1e-9 * r, "distance residual " + res.maxDistanceError());
        assertTrue(res.energy().relativeResidual() < 1e-8, "energy " + res.energy());
        System.out.println("evals=" + res.evaluations() + " steps=" + res.steps() + " z=" + worstZ
            + " E=" + res.energy().relativeResidual() + " d=" + res.maxDistanceError() / r);
    }
}
