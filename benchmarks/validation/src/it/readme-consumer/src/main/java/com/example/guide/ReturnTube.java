package com.example.guide;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.Surface;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Side;

public class ReturnTube {
    public static void main(String[] args) {
        Ball ball = Ball.solid(0.004, 0.0021);                       // radius 4 mm, mass 2.1 g
        Surface tube = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K,  // vertical bore, 15 mm radius,
            0.015, Side.INSIDE, -0.3, 0.0);                          // open ends at z = -0.3 m and 0
        Simulation sim = Simulation.builder()
            .ball(ball).surface(tube).law(new PureRolling())
            .gravity(new Vector3D(0, 0, -9.81))
            .build();
        BallState start = sim.rollingStart(new Vector3D(0.011, 0, -0.001), new Vector3D(0, 0.8, -0.3));
        RunResult result = sim.run(start, 3.0);
        result.exit().ifPresent(e -> System.out.println("left through " + e.edge() + " at " + e.time() + " s"));
    }
}
