package org.trundle.core.engine;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.AppliedLoad;
import org.trundle.core.Ball;
import org.trundle.core.Compliance;
import org.trundle.core.ContactGeometry;
import org.trundle.core.BallState;
import org.trundle.core.ContactLaw;
import org.trundle.core.SolverSettings;
import org.trundle.core.Surface;

/**
 * The immutable problem a run solves: ball, patch, contact law, gravity, applied load and solver
 * settings, plus the solver's access to the contact context. Built by {@code Simulation}, which has
 * checked every part. Internal.
 *
 * @param ball the ball
 * @param surface the patch
 * @param law the contact law
 * @param gravity gravitational acceleration (m/s²)
 * @param load the applied load
 * @param settings solver settings
 * @param compliance the patch's compliant contact, or null for the rigid contact
 * @param access write access to contact contexts
 */
public record Model(Ball ball, Surface surface, ContactLaw law, Vector3D gravity, AppliedLoad load,
                    SolverSettings settings, Compliance compliance, ContextAccess access) {

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
