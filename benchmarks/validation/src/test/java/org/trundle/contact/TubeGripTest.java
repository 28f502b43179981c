package org.trundle.contact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.trundle.core.Ball;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Side;

/**
 * Ball started on the wall of a vertical tube with no vertical velocity and no spin about the
 * normal. Rolling needs {@code μ_s ≥ (g + λ² A)/(ρ Ω²)} with {@code λ² = kΩ²/(1+k)} and the height
 * amplitude {@code A = g/(kΩ²)}, i.e. {@code (2+k) g / ((1+k) ρ Ω²)}, worst at the lowest point
 * (derived from the vertical-tube solution: the wall's vertical friction is
 * {@code m(g − λ²(z − z̄))} and its normal force {@code m ρ Ω²}; Gualtieri, Tokieda et al.,
 * Am. J. Phys. 74 (2006) 497). Above it the ball rolls down and back up to the top of a finite tube
 * and leaves it with no slip event; well below it, it slips.
 */
class TubeGripTest {
    static final double G = 9.81;

    @ParameterizedTest(name = "k={0} u={1} grip factor={2}")
    @CsvSource({"0.4, 0.8, 1.02", "0.4, 0.8, 0.9", "0.4, 0.8, 0.5", "0.6666666666666666, 1.2, 1.02",
        "0.6666666666666666, 1.2, 0.8"})
    void rollsAboveTheThresholdAndSlipsBelow(double k, double u, double factor) {
        double r = 0.004;
        double bigR = 0.015;
        double rho = bigR - r;
        double omega = u / rho;
        double muNeeded = (2 + k) * G / ((1 + k) * rho * omega * omega);
        double muS = factor * muNeeded;
        Cylinder tube = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, bigR, Side.INSIDE, -0.5, 0.0);
        Simulation sim = Simulation.builder().ball(Ball.of(r, 0.002, k)).surface(tube)
            .law(new Coulomb(muS, 0.8 * muS, 0.3)).gravity(new Vector3D(0, 0, -G)).build();
        double z0 = -1e-3;
        RunResult res = sim.run(sim.rollingStart(new Vector3D(rho, 0, z0), new Vector3D(0, u, 0)), 1.0);
        if (factor > 1) {
            assertTrue(res.eventsOf(EventKind.SLIP).isEmpty(), res.events().toString());
            // it comes back up: the height oscillation returns to z0 at the top; with z0 just below
            // the end it would need an upward speed to leave, so the run goes on to the duration
            assertEquals(EndReason.DURATION, res.endReason());
            assertTrue(res.maxNormalForce() > 0);
            assertEquals(0.002 * rho * omega * omega, res.maxNormalForce(), 1e-8 * res.maxNormalForce());
        } else {
            assertFalse(res.eventsOf(EventKind.SLIP).isEmpty(), "expected a slip");
            RunEvent slip = res.eventsOf(EventKind.SLIP).get(0);
            // the slip starts where the needed friction first exceeds mu_s F_n: on the way down,
            // below the start height
            assertTrue(slip.before().centre().getZ() < z0);
            // exactly where g - lambda^2 (z - zbar) = mu_s rho Omega^2
            double lambda2 = k * omega * omega / (1 + k);
            double zbar = z0 - G / (k * omega * omega);
            double zSlip = zbar + (G - muS * rho * omega * omega) / lambda2;
            assertEquals(zSlip, slip.before().centre().getZ(), 1e-8 * (z0 - zbar));
        }
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
    }
}
