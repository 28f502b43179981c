package org.trundle.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.trundle.contact.Coulomb;
import org.trundle.contact.PureRolling;
import org.trundle.contact.RollingResistance;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.core.SurfaceMotion;
import org.trundle.surfaces.Plane;

/**
 * Balls on moving surfaces (design notes §9): a turntable and a belt.
 */
class MovingSurfaceTest {
    static final double G = 9.81;

    /**
     * A ball rolling without slip on a horizontal turntable turning at {@code Ω} moves on a circle:
     * its velocity turns at {@code kΩ/(1+k)} (2Ω/7 for a solid ball) at constant speed, about a fixed
     * centre {@code c₀ + ẑ × v₀ / (kΩ/(1+k))} predicted from the start (W. Weltner, Am. J. Phys. 47
     * (1979) 984; from memory). Checked over one whole orbit, relative to the speed and to the
     * orbit radius: 1e-9 (the integrator's relative tolerance is 1e-10; the orbit takes a few
     * hundred steps).
     */
    @ParameterizedTest(name = "k={0} Omega={1} rad/s")
    @CsvSource({"0.4, 3.0", "0.4, -5.0", "0.6666666666666666, 2.0"})
    void turntableOrbitTurnsAtKOmegaOverOnePlusKAboutAPredictedCentre(double k, double omega) {
        double r = 0.01;
        Ball ball = Ball.of(r, 0.02, k);
        Vector3D origin = new Vector3D(0.02, -0.01, 0);
        Simulation sim = Simulation.builder().ball(ball).surface(new Plane(Vector3D.ZERO, Vector3D.PLUS_K))
            .motion(SurfaceMotion.rotation(Vector3D.PLUS_K, origin, omega))
            .law(new PureRolling()).gravity(new Vector3D(0, 0, -G))
            .settings(SolverSettings.defaults().withSampleInterval(0.05)).build();
        Vector3D c0 = new Vector3D(0.05, 0.01, r);
        Vector3D v0 = new Vector3D(-0.03, 0.08, 0);
        double rate = k * omega / (1 + k);
        Vector3D centre = c0.add(Vector3D.crossProduct(Vector3D.PLUS_K, v0).scalarMultiply(1 / rate));
        double radius = v0.getNorm() / Math.abs(rate);
        List<Sample> samples = new ArrayList<>();
        BallState start = sim.rollingStart(c0, v0);
        RunResult res = sim.run(start, 2 * Math.PI / Math.abs(rate), samples::add);
        assertEquals(EndReason.DURATION, res.endReason(), res.message());
        assertTrue(res.events().isEmpty(), "no switch: " + res.events());
        double worstV = 0;
        double worstC = 0;
        for (Sample s : samples) {
            double t = s.time();
            Rotation turn = new Rotation(Vector3D.PLUS_K, rate * t, RotationConvention.VECTOR_OPERATOR);
            Vector3D vRef = turn.applyTo(v0);
            Vector3D cRef = centre.add(turn.applyTo(c0.subtract(centre)));
            worstV = Math.max(worstV, s.state().velocity().subtract(vRef).getNorm() / v0.getNorm());
            worstC = Math.max(worstC, s.state().centre().subtract(cRef).getNorm() / radius);
        }
        System.out.printf("turntable k=%s Omega=%s: velocity error %.3g, centre error %.3g over %d samples, budget %.3g%n",
            k, omega, worstV, worstC, samples.size(), res.energy().relativeResidual());
        assertTrue(samples.size() > 50);
        assertTrue(worstV < 1e-9, "relative velocity error " + worstV);
        assertTrue(worstC < 1e-9, "relative centre error " + worstC);
    }

    /**
     * A ball set down without speed or spin on a belt moving at {@code U} slides, sticks and rolls
     * on at {@code kU/(1+k)} (2U/7 for a solid ball): the angular momentum about the contact line is
     * conserved through the sliding (common practice; textbook exercise of rigid-body dynamics). The
     * energy budget closes with the drive work the belt does: 1e-8 of the energy scale, the bound
     * the property kit uses for the integrator's tolerance 1e-10.
     */
    @Test
    void ballDroppedOnABeltEndsRollingAtKUOverOnePlusKAndTheBudgetCloses() {
        double r = 0.01;
        double k = 0.4;
        double u = 0.5;
        Ball ball = Ball.of(r, 0.02, k);
        Simulation sim = Simulation.builder().ball(ball).surface(new Plane(Vector3D.ZERO, Vector3D.PLUS_K))
            .motion(SurfaceMotion.translation(new Vector3D(u, 0, 0)))
            .law(new Coulomb(0.4, 0.3, 0.5)).gravity(new Vector3D(0, 0, -G)).build();
        BallState start = BallState.of(0, new Vector3D(0, 0, r), Vector3D.ZERO, Rotation.IDENTITY, Vector3D.ZERO,
            Phase.SLIDING);
        RunResult res = sim.run(start, 0.5);
        assertEquals(EndReason.DURATION, res.endReason(), res.message());
        assertEquals(1, res.eventsOf(EventKind.STICK).size(), res.events().toString());
        Vector3D v = res.endState().velocity();
        assertEquals(k * u / (1 + k), v.getX(), 1e-9 * u);
        assertEquals(0, v.getY(), 1e-12 * u);
        assertTrue(res.energy().driveWork() > 0, "the belt does work on the ball");
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
    }

    /**
     * Energy budget with drive work on a turntable with Coulomb friction and rolling resistance, for
     * starts that slide, roll and fly onto it: {@code E₁ − E₀ + losses − applied − drive} within
     * 1e-8 of the energy scale (the kit's bound for the integrator's tolerance 1e-10).
     */
    @ParameterizedTest(name = "{0}")
    @CsvSource({"sliding", "rolling", "flight"})
    void energyBudgetClosesOnATurntableWithFriction(String kind) {
        double r = 0.005;
        Ball ball = Ball.solid(r, 0.004);
        Simulation sim = Simulation.builder().ball(ball).surface(new Plane(Vector3D.ZERO, Vector3D.PLUS_K))
            .motion(SurfaceMotion.rotation(Vector3D.PLUS_K, new Vector3D(0.01, 0, 0), 4.0))
            .law(new Coulomb(0.3, 0.2, 0.6).and(new RollingResistance(1e-4))).gravity(new Vector3D(0, 0, -G))
            .build();
        Vector3D c0 = new Vector3D(0.06, -0.02, r);
        BallState start;
        if (kind.equals("rolling")) {
            start = sim.rollingStart(c0, new Vector3D(0.1, 0.2, 0));
        } else if (kind.equals("sliding")) {
            start = BallState.of(0, c0, new Vector3D(-0.2, 0.1, 0), Rotation.IDENTITY, new Vector3D(3, -1, 20),
                Phase.SLIDING);
        } else {
            start = BallState.flying(c0.add(new Vector3D(0, 0, 0.01)), new Vector3D(0.1, 0.05, -0.2),
                new Vector3D(0, 10, 0));
        }
        RunResult res = sim.run(start, 1.0);
        assertTrue(res.endReason() == EndReason.DURATION || res.endReason() == EndReason.REST,
            res.endReason() + " " + res.message());
        System.out.println("turntable budget (" + kind + "): " + res.energy() + " events " + res.events().size());
        assertTrue(res.energy().driveWork() != 0, "the turntable does work");
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
    }
}
