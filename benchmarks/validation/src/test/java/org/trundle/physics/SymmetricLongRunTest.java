package org.trundle.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.Integrator;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Side;
import org.trundle.surfaces.Sphere;

/**
 * The long-run option ({@link Integrator#SYMMETRIC_PROJECTION}) in whole runs, against closed forms:
 * the vertical tube's height frequency {@code λ = Ω sqrt(k/(1+k))}, {@code Ω = u/(R − r)} (Gualtieri,
 * Tokieda et al., Am. J. Phys. 74 (2006) 497–501), its exit time through the top, and the lift-off
 * angle off the top of a sphere, {@code cos θ = 10/17} for a solid ball started from rest (common
 * practice, worked from memory as in {@link LiftOffTest}).
 */
class SymmetricLongRunTest {
    private static final double G = 9.81;
    private static final double R_TUBE = 0.015;
    private static final double R_BALL = 0.004;
    private static final double U = 0.8;

    private static SolverSettings symmetric(double h, int order) {
        return SolverSettings.defaults().withIntegrator(Integrator.SYMMETRIC_PROJECTION).withFixedStep(h)
            .withSymmetricOrder(order);
    }

    private static Simulation tube(SolverSettings set, double zMin, double zMax) {
        Cylinder c = zMax > zMin ? new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, R_TUBE, Side.INSIDE, zMin, zMax)
            : new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, R_TUBE, Side.INSIDE);
        return Simulation.builder().ball(Ball.solid(R_BALL, 0.0021)).surface(c).law(new PureRolling())
            .gravity(new Vector3D(0, 0, -G)).settings(set).build();
    }

    private static double lambda() {
        double k = Ball.SOLID;
        return U / (R_TUBE - R_BALL) * Math.sqrt(k / (1 + k));
    }

    /** Relative height-frequency error after N whole periods, from the phase reached (as VerticalTubeCase). */
    private static double frequencyError(SolverSettings set, int periods) {
        Simulation sim = tube(set, 0, 0);
        double rho = R_TUBE - R_BALL;
        BallState start = sim.rollingStart(new Vector3D(rho, 0, 0), new Vector3D(0, U, 0));
        double lam = lambda();
        RunResult res = sim.run(start, periods * 2 * Math.PI / lam);
        assertEquals(EndReason.DURATION, res.endReason(), res.message());
        assertTrue(res.maxDistanceError() <= 1e-12 * R_BALL, "distance residual " + res.maxDistanceError());
        double k = Ball.SOLID;
        double omega = U / rho;
        double mean = -G / (k * omega * omega);
        BallState end = res.endState();
        double theta = Math.atan2(-end.velocity().getZ() / lam, end.centre().getZ() - mean);
        return theta / (2 * Math.PI * periods);
    }

    /**
     * In the tube the frequency error falls as {@code h⁴} at order 4 and {@code h²} at order 2: halving the
     * step divides it by 16 (resp. 4). The observed order of a symmetric method differs from p by the
     * {@code O(h²)} term of its even error expansion, a few hundredths at {@code Ω h ≤ 0.07}; 0.2 allows it
     * and the phase read-out's second-order amplitude term. The distance residual stays below 1e-12 r.
     */
    @Test
    void theTubeFrequencyConvergesAtTheMethodsOrder() {
        for (int order : new int[] {2, 4}) {
            double e1 = frequencyError(symmetric(1e-3, order), 10);
            double e2 = frequencyError(symmetric(5e-4, order), 10);
            double observed = Math.log(Math.abs(e1 / e2)) / Math.log(2);
            assertEquals(order, observed, 0.2, "observed order (frequency errors " + e1 + ", " + e2 + ")");
        }
    }

    /**
     * The exit through the top of a finite tube is still an event: its time matches the closed form
     * {@code z(t) = z̄ + (z₀ − z̄) cos λt + (w₀/λ) sin λt} to the method's own error (order 4,
     * {@code h = 2.5e-4 s}: {@code (Ω h)⁴ ≈ 1e-6} relative in the phase per unit of phase, a few
     * nanoseconds here), as with Dormand–Prince in {@code TubeExitTest}.
     */
    @Test
    void theExitIsStillAnEvent() {
        double rho = R_TUBE - R_BALL;
        double w0 = 0.4;
        double z0 = -0.005;
        Simulation sim = tube(symmetric(2.5e-4, 4), -0.3, 0.0);
        RunResult res = sim.run(sim.rollingStart(new Vector3D(rho, 0, z0), new Vector3D(0, U, w0)), 2.0);
        assertEquals(EndReason.EXIT, res.endReason(), res.message());
        double k = Ball.SOLID;
        double omega = U / rho;
        double lam = lambda();
        double mean = z0 - G / (k * omega * omega);
        double phase = Math.atan2(w0 / lam, z0 - mean);
        double tRef = new BracketingNthOrderBrentSolver(1e-14, 5).solve(100,
            t -> mean + (z0 - mean) * Math.cos(lam * t) + w0 / lam * Math.sin(lam * t), 0.0,
            (phase < 0 ? phase + 2 * Math.PI : phase) / lam);
        RunEvent exit = res.exit().orElseThrow();
        assertEquals(tRef, exit.time(), 1e-8);
        assertEquals(0.0, exit.before().centre().getZ(), 1e-9);
    }

    /**
     * Off the top of a sphere a solid ball started from rest leaves at {@code cos θ = 10/17}: the lift-off is
     * located on the step's cubic Hermite extension, whose error {@code O((ω h)⁴)} is far below 1e-7 at
     * {@code ω h ≈ 0.013} (ω = sqrt(g/(R + r))).
     */
    @Test
    void theLiftOffIsStillAnEvent() {
        double bigR = 0.05;
        double r = 0.01;
        Simulation sim = Simulation.builder().ball(Ball.solid(r, 0.05))
            .surface(new Sphere(Vector3D.ZERO, bigR, Side.OUTSIDE)).law(new PureRolling())
            .gravity(new Vector3D(0, 0, -G)).settings(symmetric(1e-3, 4)).build();
        BallState start = sim.rollingStart(new Vector3D(0, 0, bigR + r), new Vector3D(1e-3, 0, 0));
        List<RunEvent> lifts = sim.run(start, 5.0).eventsOf(EventKind.LIFT_OFF);
        assertTrue(!lifts.isEmpty(), "no lift-off");
        Vector3D c = lifts.get(0).before().centre();
        double rho = bigR + r;
        double u = 1e-3;
        double k = Ball.SOLID;
        double expected = (2 + (1 + k) * u * u / (G * rho)) / (3 + k);
        assertEquals(expected, c.getZ() / c.getNorm(), 1e-7, "cos(theta) at lift-off");
    }

    /**
     * 2·10⁴ steps in the tube (20 s, about 125 height periods): the energy error's envelope over the last
     * quarter is no larger than over the first quarter (linear drift would make it four times larger, as
     * Dormand–Prince's does in {@code LongRunDrift}).
     */
    @Test
    void theEnergyErrorStaysBoundedInTheTube() {
        Simulation sim = tube(symmetric(1e-3, 4).withSampleInterval(1e-2).withMaxEvaluations(100_000_000L), 0, 0);
        double rho = R_TUBE - R_BALL;
        BallState start = sim.rollingStart(new Vector3D(rho, 0, 0), new Vector3D(0, U, 0));
        double e0 = sim.energy(start);
        double k0 = start.kineticEnergy(sim.ball());
        double duration = 20.0;
        double[] env = new double[4];
        RunResult res = sim.run(start, duration, s -> {
            int q = (int) Math.min(3, Math.floor(4 * s.time() / duration));
            env[q] = Math.max(env[q], Math.abs(sim.energy(s.state()) - e0) / k0);
        });
        assertEquals(EndReason.DURATION, res.endReason(), res.message());
        assertTrue(env[3] <= 1.2 * env[0], "envelope first quarter " + env[0] + ", last quarter " + env[3]);
    }
}
