package org.trundle.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.trundle.contact.Coulomb;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.Patch;
import org.trundle.core.Phase;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.SampleContact;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Side;
import org.trundle.surfaces.Torus;

/**
 * Two rolling contacts on curved walls that turn the ball: circular rails, two coaxial tori side by side (axis
 * vertical, tube radius 3 mm, 16 mm apart, mean radius 0.1 m), a solid ball (r = 10 mm) rolling round on top at
 * 0.3 m/s for 2 s — about one lap (invented data). The contacts' distance Hessians turn the chord through both
 * contact points as the ball goes round, so the constraint accelerations {@code β_i = r ω × (H_i v)} are not zero
 * and the closed form of two rolling contacts works with its off-chord terms, on the compact layout with the
 * velocity derived from the spin. Checks: rolling without slip does no work on a level track, so the speed stays
 * the start speed (energy conservation; common practice) and the energy budget closes; the centre is held at the
 * mean radius and at the height {@code √((r + ρ)² − s²/4)} above the tube circles (geometry of the two contacts);
 * both contacts roll throughout with positive normal forces, the outer rail carrying more (it supplies the
 * centripetal force). Tolerances: the integrator tolerance is 1e-11, so 1e-9 of the speed and of the radius over
 * a lap leaves two orders of margin while a wrong constraint term drifts the speed at order one.
 */
class CircularRailsTest {
    private static final double R = 0.01;
    private static final double RHO = 0.003;
    private static final double SPACING = 0.016;
    private static final double MEAN = 0.1;
    private static final double SPEED = 0.3;

    @ParameterizedTest
    @ValueSource(doubles = {1e-11, 1e-9})
    void ballRollsRoundAtConstantSpeed(double tolerance) {
        Torus inner = new Torus(Vector3D.ZERO, Vector3D.PLUS_K, MEAN - SPACING / 2, RHO, Side.OUTSIDE);
        Torus outer = new Torus(Vector3D.ZERO, Vector3D.PLUS_K, MEAN + SPACING / 2, RHO, Side.OUTSIDE);
        Simulation sim = Simulation.builder().ball(Ball.of(R, 0.03, 0.4)).patch(Patch.of("inner", inner))
            .patch(Patch.of("outer", outer)).law(new Coulomb(0.5, 0.5, 0.0)).gravity(new Vector3D(0, 0, -9.81))
            .settings(SolverSettings.defaults().withTolerance(tolerance).withSampleInterval(0.05)).build();
        double h = Math.sqrt((R + RHO) * (R + RHO) - SPACING * SPACING / 4);
        BallState start = sim.rollingStart(new Vector3D(MEAN, 0, h), new Vector3D(0, SPEED, 0));
        List<Sample> samples = new ArrayList<>();
        RunResult res = sim.run(start, 2.0, samples::add);
        assertEquals(EndReason.DURATION, res.endReason(), res.toString());
        assertTrue(res.events().isEmpty(), res.events().toString());
        double scale = tolerance * 100;
        assertTrue(samples.size() > 30);
        for (Sample s : samples) {
            BallState b = s.state();
            assertEquals(SPEED, b.velocity().getNorm(), scale * SPEED, "speed at t = " + s.time());
            assertEquals(MEAN, Math.hypot(b.centre().getX(), b.centre().getY()), scale * MEAN, "radius");
            assertEquals(h, b.centre().getZ(), scale * MEAN, "height");
            assertEquals(2, s.touches().size());
            SampleContact in = s.touches().get(s.contacts().indexOf("inner"));
            SampleContact out = s.touches().get(s.contacts().indexOf("outer"));
            assertEquals(Phase.ROLLING, in.mode());
            assertEquals(Phase.ROLLING, out.mode());
            assertTrue(in.normalForce() > 0 && out.normalForce() > in.normalForce(),
                in.normalForce() + " N inner, " + out.normalForce() + " N outer");
        }
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
    }
}
