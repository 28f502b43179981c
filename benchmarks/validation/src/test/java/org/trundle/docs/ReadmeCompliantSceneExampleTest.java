package org.trundle.docs;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.Coulomb;
import org.trundle.contact.HertzStiffness;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.Compliance;
import org.trundle.core.ContactLaw;
import org.trundle.core.EventKind;
import org.trundle.core.Material;
import org.trundle.core.Patch;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.surfaces.VGroove;

/**
 * Keeps the README's compliant-groove example compiling and running (a copy kept in sync by hand): a steel ball
 * dropped down the bisector of a 90° groove whose two walls are compliant meets both walls at the same instant, after
 * falling 5 cm in {@code sqrt(2h/g)} (free fall; common practice; the impact events fire at a normal gap of
 * 1e-9 r, some 1e-11 s early), and leaves both at one instant.
 */
class ReadmeCompliantSceneExampleTest {
    @Test
    void readmeCompliantGrooveExampleRuns() {
        Ball ball = Ball.solid(0.005, 0.0041);
        ContactLaw law = new Coulomb(0.3, 0.25, 0.6);
        Vector3D g = new Vector3D(0, 0, -9.81);

        VGroove v = new VGroove(Vector3D.ZERO, Vector3D.PLUS_I, Vector3D.PLUS_K, Math.toRadians(90));
        Compliance liner = HertzStiffness.compliance(Material.STEEL, Material.ACRYLIC, 0.6);
        Simulation sim = Simulation.builder().ball(ball).law(law).gravity(g)
            .patch(Patch.of("left", v.plusWall()).withCompliance(liner))
            .patch(Patch.of("right", v.minusWall()).withCompliance(liner))
            .build();

        BallState drop = BallState.flying(v.restingCentre(0.005, 0).add(new Vector3D(0, 0, 0.05)), Vector3D.ZERO,
            Vector3D.ZERO);
        RunResult r = sim.run(drop, 0.2);
        List<RunEvent> ev = r.events();
        assertEquals(EventKind.IMPACT, ev.get(0).kind());
        assertEquals(EventKind.IMPACT, ev.get(1).kind());
        assertEquals(List.of("left", "right"), List.of(ev.get(0).patch(), ev.get(1).patch()));
        assertEquals(Math.sqrt(2 * 0.05 / 9.81), ev.get(0).time(), 1e-9);
        assertEquals(ev.get(0).time(), ev.get(1).time());
        assertEquals(EventKind.LIFT_OFF, ev.get(2).kind());
        assertEquals(ev.get(2).time(), ev.get(3).time());
    }
}
