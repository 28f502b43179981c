package org.trundle.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.Coulomb;
import org.trundle.contact.WallLoad;
import org.trundle.contact.WallLoads;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.Material;
import org.trundle.core.Patch;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.VGroove;

/**
 * The loads each wall of a V-groove carries while a ball rolls down it on both walls at once.
 *
 * <p>Across the groove the ball does not accelerate, and the friction that rolling down the groove needs acts
 * along the groove (in both walls' planes, normal to the cross-section), so each wall's normal force comes from
 * the statics of the cross-section: {@code N = m g cos θ / (2 sin(α/2))} for a groove of included angle α on a
 * slope θ (textbook statics, from memory). Each wall is flat, so its Hertz patch is Johnson's ball-on-flat solution
 * under N: {@code c = (3 N r / (4 E*))^{1/3}}, {@code p₀ = 3N/(2π c²)}, {@code δ = c²/r} (K. L. Johnson, Contact
 * Mechanics, 1985, ch. 4). Tolerance 1e-9 relative: the forces come from the solver's linear system at round-off
 * (the rolling constraint keeps the centre on the groove's line to the projection tolerance), the Hertz values
 * from closed forms.
 */
class GrooveWallLoadsTest {
    @Test
    void eachWallOfAGrooveCarriesItsShareFromStaticsAndItsHertzPatchFromJohnson() {
        double r = 0.005;
        double m = 0.004;
        double g = 9.81;
        double theta = Math.toRadians(10);
        double alpha = Math.toRadians(60);
        Vector3D down = new Vector3D(Math.cos(theta), 0, -Math.sin(theta));
        Vector3D up = new Vector3D(Math.sin(theta), 0, Math.cos(theta));
        VGroove groove = new VGroove(Vector3D.ZERO, down, up, alpha);
        Simulation sim = Simulation.builder().ball(Ball.solid(r, m)).law(new Coulomb(0.5, 0.4, 0.0))
            .gravity(new Vector3D(0, 0, -g))
            .patch(Patch.of("left", groove.minusWall())).patch(Patch.of("right", groove.plusWall()))
            .settings(SolverSettings.defaults().withSampleInterval(0.01)).build();
        WallLoads loads = WallLoads.forScene(sim, Material.STEEL,
            Map.of("left", Material.ALUMINIUM, "right", Material.ALUMINIUM));
        BallState start = sim.rollingStart(groove.restingCentre(r, 0.01), Vector3D.ZERO);
        List<List<WallLoad>> perSample = new ArrayList<>();
        sim.run(start, 0.3, sample -> perSample.add(loads.loads(sample)));

        double n = m * g * Math.cos(theta) / (2 * Math.sin(alpha / 2));
        double eStar = 1 / ((1 - 0.3 * 0.3) / 210e9 + (1 - 0.33 * 0.33) / 70e9);   // steel on aluminium
        double c = Math.cbrt(3 * n * r / (4 * eStar));
        double p0 = 3 * n / (2 * Math.PI * c * c);
        assertTrue(perSample.size() > 25, "samples: " + perSample.size());
        for (List<WallLoad> both : perSample) {
            assertEquals(List.of("left", "right"), both.stream().map(WallLoad::patch).sorted().toList(),
                "every sample touches both walls");
            for (WallLoad w : both) {
                assertEquals(n, w.normalForce(), 1e-9 * n, w.toString());
                assertEquals(c, w.semiMajor(), 1e-9 * c, w.toString());
                assertEquals(c, w.semiMinor(), 1e-9 * c, w.toString());
                assertEquals(p0, w.maxPressure(), 1e-9 * p0, w.toString());
                assertEquals(c * c / r, w.approach(), 1e-9 * c * c / r, w.toString());
            }
        }
    }
}
