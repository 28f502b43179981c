package org.trundle.docs;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.EventKind;
import org.trundle.core.Patch;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Plane;
import org.trundle.surfaces.Tubes;

/** Keeps the README's scene example compiling and running (copy kept in sync by hand). */
class ReadmeSceneExampleTest {
    @Test
    void sceneExampleRuns() {
        Simulation.Builder scene = Simulation.builder().ball(Ball.solid(0.004, 0.0021))
            .law(new PureRolling()).gravity(new Vector3D(0, 0, -9.81))
            .settings(SolverSettings.defaults().withStopAtExit(false))
            .patch(Patch.of("floor", new Plane(new Vector3D(0, 0, -0.1), Vector3D.PLUS_K)));
        Tubes.withRoundedMouth("bore", Vector3D.ZERO, Vector3D.PLUS_I, 0.015, 0.2, 0.004).forEach(scene::patch);
        Simulation sim = scene.build();   // a horizontal bore with a rounded mouth at x = 0, a floor below

        // rolling along the bottom of the bore toward the mouth: onto the lip, off it, onto the floor
        RunResult res = sim.run(sim.rollingStart(new Vector3D(-0.1, 0, -0.011), new Vector3D(0.4, 0, 0)), 1.0);
        List<EventKind> kinds = res.events().stream().map(RunEvent::kind).toList();
        assertEquals(EventKind.HANDOVER, kinds.get(0), res.events().toString());
        assertEquals("bore.lip", res.events().get(0).to());
        assertEquals("floor", res.eventsOf(EventKind.IMPACT).get(0).patch(), res.events().toString());
    }
}
