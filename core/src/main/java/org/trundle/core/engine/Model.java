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
 * @param access write access to contact contexts
 */
public record Model(Ball ball, List<Patch> patches, ContactLaw law, Vector3D gravity, AppliedLoad load,
                    SolverSettings settings, ContextAccess access) {

    /** Copies the list. */
    public Model {
        patches = List.copyOf(patches);
    }

    /** @return whether any patch of the scene has a compliant contact */
    public boolean compliant() {
        for (Patch p : patches) {
            if (p.compliance() != null) {
                return true;
            }
        }
        return false;
    }

    /**
     * Mechanical energy {@code ½ m|v|² + ½ I|ω|² − m g·c} (J), potential zero at the origin, plus the elastic
     * energy stored in every compliant patch the ball presses (approach {@code δ = r − d > 0}, contact point on the
     * patch, where the patch is at the state's time), {@code Σ (2/5) K_i δ_i^{5/2}}.
     *
     * @param s a state
     * @return the energy (J)
     */
    public double energy(BallState s) {
        double e = s.kineticEnergy(ball) - ball.mass() * gravity.dotProduct(s.centre());
        for (Patch p : patches) {
            Compliance c = p.compliance();
            if (c == null) {
                continue;
            }
            ContactGeometry g = new ContactGeometry();
            org.trundle.core.Surface surface = p.surface();
            g.scratch = surface.newScratch();
            try {
                if (p.motion().stationary()) {
                    surface.query(s.time(), s.centre().toArray(), g);
                } else {
                    org.trundle.core.MotionState pose = new org.trundle.core.MotionState();
                    p.motion().at(s.time(), pose);
                    pose.query(surface, s.time(), s.centre().toArray(), g);
                }
            } catch (org.trundle.core.SurfaceDomainException ex) {
                // no closest point: the ball is nowhere near this patch's wall
                continue;
            }
            double delta = ball.radius() - g.distance;
            if (delta > 0 && g.patchMargin >= 0) {
                e += Compliance.elasticEnergy(c.stiffness(ball.radius(), g.curvature1, g.curvature2), delta);
            }
        }
        return e;
    }
}
