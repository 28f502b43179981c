package org.trundle.core.engine;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.AppliedLoad;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.ContactLaw;
import org.trundle.core.Patch;
import org.trundle.core.SolverSettings;

/**
 * The immutable problem a run solves: ball, the scene's patches (each with its surface, motion and
 * law, the run's law filled in where a patch has none), gravity, applied load and solver settings,
 * plus the solver's access to the contact context. Built by {@code Simulation}, which has checked
 * every part. Internal.
 *
 * @param ball the ball
 * @param patches the scene, at least one patch, every law set
 * @param law the run's contact law
 * @param gravity gravitational acceleration (m/s²)
 * @param load the applied load
 * @param settings solver settings
 * @param access write access to contact contexts
 */
public record Model(Ball ball, List<Patch> patches, ContactLaw law, Vector3D gravity, AppliedLoad load,
                    SolverSettings settings, ContextAccess access) {

    /** Copies the list. */
    public Model {
        patches = List.copyOf(patches);
    }

    /**
     * Mechanical energy {@code ½ m|v|² + ½ I|ω|² − m g·c} (J), potential zero at the origin.
     *
     * @param s a state
     * @return the energy (J)
     */
    public double energy(BallState s) {
        return s.kineticEnergy(ball) - ball.mass() * gravity.dotProduct(s.centre());
    }
}
