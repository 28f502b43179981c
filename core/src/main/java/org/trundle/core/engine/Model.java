package org.trundle.core.engine;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.AppliedLoad;
import org.trundle.core.Ball;
import org.trundle.core.Compliance;
import org.trundle.core.ContactGeometry;
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
 * @param compliance the compliant contact of a one-patch scene that stands still, or null for the rigid contact
 * @param access write access to contact contexts
 */
public record Model(Ball ball, List<Patch> patches, ContactLaw law, Vector3D gravity, AppliedLoad load,
                    SolverSettings settings, Compliance compliance, ContextAccess access) {

    /** Copies the list. */
    public Model {
        patches = List.copyOf(patches);
    }

    /**
     * Mechanical energy {@code ½ m|v|² + ½ I|ω|² − m g·c} (J), potential zero at the origin, plus with a
     * compliant contact the elastic energy stored in it, {@code (2/5) K δ^{5/2}}.
     *
     * @param s a state
     * @return the energy (J)
     */
    public double energy(BallState s) {
        double e = s.kineticEnergy(ball) - ball.mass() * gravity.dotProduct(s.centre());
        if (compliance != null) {
            ContactGeometry g = new ContactGeometry();
            // a compliant contact belongs to a scene of one patch that stands still (checked by Simulation)
            org.trundle.core.Surface surface = patches.get(0).surface();
            g.scratch = surface.newScratch();
            surface.query(s.time(), s.centre().toArray(), g);
            double delta = ball.radius() - g.distance;
            if (delta > 0 && g.patchMargin >= 0) {
                e += Compliance.elasticEnergy(compliance.stiffness(ball.radius(), g.curvature1, g.curvature2), delta);
            }
        }
        return e;
    }
}
