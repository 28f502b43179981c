package org.trundle.docs;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.EndReason;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.SurfaceMotion;
import org.trundle.surfaces.Plane;

/** Keeps the README's moving-surface example (a turntable) compiling and running (copy kept in sync by hand). */
class ReadmeMovingSurfaceExampleTest {
    @Test
    void turntableExampleRuns() {
        Simulation turntable = Simulation.builder()
            .ball(Ball.solid(0.01, 0.02)).surface(new Plane(Vector3D.ZERO, Vector3D.PLUS_K))
            .motion(SurfaceMotion.rotation(Vector3D.PLUS_K, Vector3D.ZERO, 3.0))   // 3 rad/s about z
            .law(new PureRolling()).gravity(new Vector3D(0, 0, -9.81))
            .build();
        RunResult orbit = turntable.run(turntable.rollingStart(new Vector3D(0.05, 0, 0.01), new Vector3D(0, 0.1, 0)), 5.0);
        // the ball's velocity turns at 2/7 of the table's rate, about a fixed centre
        double driven = orbit.energy().driveWork();

        assertEquals(EndReason.DURATION, orbit.endReason());
        // after 5 s the velocity has turned by 2/7 * 3 * 5 rad (Weltner's result, see MovingSurfaceTest)
        double turned = Math.atan2(-orbit.endState().velocity().getX(), orbit.endState().velocity().getY());
        assertEquals(Math.IEEEremainder(2.0 / 7 * 3.0 * 5.0, 2 * Math.PI), turned, 1e-9);
        // the speed is constant but the spin is not: the table's work is the change of kinetic energy
        assertEquals(orbit.energy().fin() - orbit.energy().initial(), driven, 1e-8 * orbit.energy().scale());
    }
}
