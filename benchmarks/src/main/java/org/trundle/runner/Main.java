package org.trundle.runner;

import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Side;

/**
 * Command-line entry point of the executable jar. For now it runs the built-in demo: an invented
 * parts-feeder case, an 8 mm steel ball rolling on the inside of a 30 mm bore vertical return tube.
 */
public final class Main {
    private Main() {
    }

    /**
     * @param args command line (ignored for now)
     */
    public static void main(String[] args) {
        // invented demo data: 8 mm steel ball (2.1 g), 30 mm bore tube 0.3 m long, top end at z = 0
        Ball ball = Ball.solid(0.004, 0.0021);
        Cylinder tube = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, 0.015, Side.INSIDE, -0.3, 0.0);
        Simulation sim = Simulation.builder().ball(ball).surface(tube).law(new PureRolling())
            .gravity(new Vector3D(0, 0, -9.81)).build();
        RunResult res = sim.run(sim.rollingStart(new Vector3D(0.011, 0, -0.001), new Vector3D(0, 0.8, -0.3)), 3.0);
        System.out.printf(Locale.ROOT, "end: %s at t = %.6f s%n", res.endReason().label(), res.endState().time());
        for (RunEvent e : res.events()) {
            System.out.println("event: " + e);
        }
        System.out.println("energy: " + res.energy());
    }
}
