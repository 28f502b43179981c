package org.trundle.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.Coulomb;
import org.trundle.core.AppliedLoad;
import org.trundle.core.Ball;
import org.trundle.core.EndReason;
import org.trundle.core.Patch;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.VGroove;

/**
 * A velocity-dependent applied load on two rolling contacts: a solid ball (r = 10 mm, m = 30 g) rolling from rest
 * down a 60° V-groove on a 10° slope against a linear drag {@code F = −b v} at the centre (invented data). Rolling
 * about the chord at {@code r_e = r sin 30°}, the ball moves as a mass {@code m_e = m (1 + k r²/r_e²)} along the
 * groove under {@code m g sinθ − b v}, so {@code v(t) = v∞ (1 − e^{−t/τ})}, {@code v∞ = m g sinθ / b},
 * {@code τ = m_e / b} (first-order linear equation; common practice). The drag reads the velocity the solver
 * derives from the spin on this case's compact layout, so a stale velocity shows at once. Tolerance: integrator
 * tolerance 1e-11, so 1e-9 of {@code v∞} has two orders of margin.
 */
class GrooveDragTest {
    @Test
    void grooveBallApproachesItsTerminalSpeed() {
        double r = 0.01;
        double m = 0.03;
        double k = 0.4;
        double theta = Math.toRadians(10);
        double b = 0.39;
        VGroove v = new VGroove(Vector3D.ZERO, Vector3D.PLUS_I, Vector3D.PLUS_K, Math.toRadians(60));
        AppliedLoad drag = (s, out) -> out.force(-b * s.velocity(0), -b * s.velocity(1), -b * s.velocity(2));
        Simulation sim = Simulation.builder().ball(Ball.of(r, m, k)).patch(Patch.of("plus", v.plusWall()))
            .patch(Patch.of("minus", v.minusWall())).law(new Coulomb(0.5, 0.5, 0.0))
            .gravity(new Vector3D(9.81 * Math.sin(theta), 0, -9.81 * Math.cos(theta))).load(drag)
            .settings(SolverSettings.defaults().withTolerance(1e-11).withSampleInterval(0.05)).build();
        List<Sample> samples = new ArrayList<>();
        RunResult res = sim.run(sim.rollingStart(v.restingCentre(r, 0), Vector3D.ZERO), 0.5, samples::add);
        assertEquals(EndReason.DURATION, res.endReason(), res.toString());
        assertTrue(res.events().isEmpty(), res.events().toString());
        double vInf = m * 9.81 * Math.sin(theta) / b;
        double tau = m * (1 + k / 0.25) / b;
        assertTrue(samples.size() >= 10);
        for (Sample s : samples) {
            double expected = vInf * (1 - Math.exp(-s.time() / tau));
            assertEquals(expected, s.state().velocity().getX(), 1e-9 * vInf, "t = " + s.time());
            assertEquals(2, s.touches().size());
        }
        double end = vInf * (1 - Math.exp(-0.5 / tau));
        assertEquals(end, res.endState().velocity().getX(), 1e-9 * vInf);
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
    }
}
