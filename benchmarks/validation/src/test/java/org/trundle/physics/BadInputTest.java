package org.trundle.physics;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.trundle.contact.Coulomb;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.Phase;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Plane;
import org.trundle.surfaces.Side;

/** Bad input gets an IllegalArgumentException that names the parameter and the value. */
class BadInputTest {
    private static void rejects(Executable e, String... fragments) {
        IllegalArgumentException ex = assertThrows(IllegalArgumentException.class, e);
        for (String f : fragments) {
            assertTrue(ex.getMessage().contains(f), "message '" + ex.getMessage() + "' lacks '" + f + "'");
        }
    }

    private final Simulation tube = Simulation.builder().ball(Ball.solid(0.004, 0.002))
        .surface(new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, 0.015, Side.INSIDE)).law(new PureRolling())
        .gravity(new Vector3D(0, 0, -9.81)).build();

    @Test
    void ballParameters() {
        rejects(() -> Ball.solid(-0.004, 0.002), "radius", "-0.004");
        rejects(() -> Ball.solid(0.0, 0.002), "radius", "0.0");
        rejects(() -> Ball.solid(Double.NaN, 0.002), "radius", "NaN");
        rejects(() -> Ball.solid(0.004, 0.0), "mass", "0.0");
        rejects(() -> Ball.solid(0.004, Double.POSITIVE_INFINITY), "mass", "Infinity");
        rejects(() -> Ball.of(0.004, 0.002, 0.7), "k", "0.7");
        rejects(() -> Ball.of(0.004, 0.002, 0.0), "k", "0.0");
    }

    @Test
    void runParameters() {
        BallState s = tube.rollingStart(new Vector3D(0.011, 0, 0), new Vector3D(0, 0.5, 0));
        rejects(() -> tube.run(s, 0.0), "duration", "0.0");
        rejects(() -> tube.run(s, Double.NaN), "duration", "NaN");
        rejects(() -> SolverSettings.defaults().withTolerance(-1e-9), "tolerance", "-1.0E-9");
        rejects(() -> SolverSettings.defaults().withTolerance(Double.POSITIVE_INFINITY), "tolerance", "Infinity");
        rejects(() -> new Coulomb(0.3, 0.5, 0.2), "kinetic friction", "0.5", "0.3");
        rejects(() -> new Coulomb(0.6, 0.5, 1.5), "restitution", "1.5");
    }

    @Test
    void ballThatCannotFit() {
        rejects(() -> Simulation.builder().ball(Ball.solid(0.016, 0.002))
            .surface(new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, 0.015, Side.INSIDE)).law(new PureRolling()).noGravity().build(),
            "does not fit", "cylinder", "0.016");
        rejects(() -> Simulation.builder().ball(Ball.solid(0.015, 0.002))
            .surface(new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, 0.015, Side.INSIDE)).law(new PureRolling()).noGravity().build(),
            "does not fit");
    }

    @Test
    void contactStartOffTheSurface() {
        BallState s = tube.rollingStart(new Vector3D(0.0105, 0, 0), new Vector3D(0, 0.5, 0));
        rejects(() -> tube.run(s, 0.1), "start centre", "0.00449", "flight");
        // the same place is fine as a flight start
        tube.run(s.withPhase(Phase.FLIGHT), 0.01);
    }

    @Test
    void rollingStartThatSlips() {
        BallState s = BallState.of(0, new Vector3D(0.011, 0, 0), new Vector3D(0, 0.5, 0), Rotation.IDENTITY,
            Vector3D.ZERO, Phase.ROLLING);
        rejects(() -> tube.run(s, 0.1), "no-slip", "0.5", "rollingStart");
        BallState moving = tube.rollingStart(new Vector3D(0.011, 0, 0), new Vector3D(0.2, 0.5, 0));
        rejects(() -> tube.run(moving, 0.1), "normal component", "0.2");
    }

    @Test
    void surfaceParameters() {
        rejects(() -> new Cylinder(Vector3D.ZERO, Vector3D.ZERO, 0.015, Side.INSIDE), "axis");
        rejects(() -> new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, -1, Side.INSIDE), "radius", "-1");
        rejects(() -> new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, 1, Side.INSIDE, 0.5, 0.1), "from", "0.5");
        rejects(() -> new Plane(Vector3D.ZERO, new Vector3D(0, 0, Double.NaN)), "normal", "NaN");
    }
}
