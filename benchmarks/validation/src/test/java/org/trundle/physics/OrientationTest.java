package org.trundle.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.surfaces.Plane;

/**
 * The reported orientation follows the spin with the documented convention (body to world,
 * {@link RotationConvention#VECTOR_OPERATOR}): a ball spinning at ω about a fixed axis for a time
 * t has turned by the angle ωt about that axis, right-handed (rigid-body kinematics, common
 * practice). Found by the kit's frame-invariance check: the orientation used to come out inverted.
 */
class OrientationTest {
    @Test
    void freeSpinTurnsRightHanded() {
        Simulation sim = Simulation.builder().ball(Ball.solid(0.01, 0.01))
            .surface(new Plane(new Vector3D(0, 0, -1), Vector3D.PLUS_K)).law(new PureRolling()).noGravity()
            // a (zero) applied load: a flight with a load never ends as left for good, so the spin runs its time
            .load((state, out) -> { }).build();
        Vector3D axis = new Vector3D(1, 2, 2).normalize();
        double w = 3.0;
        double t = 0.4;
        Rotation q0 = new Rotation(Vector3D.PLUS_J, 0.3, RotationConvention.VECTOR_OPERATOR);
        BallState start = BallState.flying(Vector3D.ZERO, Vector3D.ZERO, axis.scalarMultiply(w)).withOrientation(q0);
        RunResult res = sim.run(start, t);
        Rotation expected = new Rotation(axis, w * t, RotationConvention.VECTOR_OPERATOR).applyTo(q0);
        assertEquals(0.0, Rotation.distance(expected, res.endState().orientation()), 1e-9);
    }
}
