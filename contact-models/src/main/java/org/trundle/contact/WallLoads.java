package org.trundle.contact;

import java.util.Optional;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Material;
import org.trundle.core.Sample;
import org.trundle.core.Surface;

/**
 * Turns a run's samples into the loads a wall sees: for each sample in contact with this patch, the normal
 * and friction force the sample reports and the exact Hertz patch under that normal force at the local
 * curvatures of the wall (semi-axes, orientation, maximum pressure, approach; {@link HertzContact#solve}).
 * Use it inside a {@code RunObserver}'s {@code sample} method:
 * <pre>
 *   WallLoads loads = new WallLoads("tube", tube, ball.radius(), Material.STEEL, Material.ACRYLIC);
 *   sim.run(start, 2.0, sample -&gt; loads.of(sample).ifPresent(System.out::println));
 * </pre>
 *
 * <p>The curvatures are those of the wall at the contact, from the surface's geometry at the sample's
 * centre. Not thread-safe (one geometry workspace); make one per run.
 */
public final class WallLoads {
    private final String patch;
    private final Surface surface;
    private final double ballRadius;
    private final Material ball;
    private final Material wall;
    private final ContactGeometry geo = new ContactGeometry();

    /**
     * @param patch the patch's id (reported with each load)
     * @param surface the patch's surface
     * @param ballRadius ball radius r (m)
     * @param ball the ball's material
     * @param wall the wall's material
     */
    public WallLoads(String patch, Surface surface, double ballRadius, Material ball, Material wall) {
        if (patch == null || surface == null || ball == null || wall == null) {
            throw new IllegalArgumentException("patch id, surface, ball material and wall material must be given, got "
                + patch + ", " + surface + ", " + ball + ", " + wall);
        }
        if (!(ballRadius > 0 && ballRadius < Double.POSITIVE_INFINITY)) {
            throw new IllegalArgumentException("ball radius must be finite and positive, got " + ballRadius);
        }
        this.patch = patch;
        this.surface = surface;
        this.ballRadius = ballRadius;
        this.ball = ball;
        this.wall = wall;
        this.geo.scratch = surface.newScratch();
    }

    /**
     * The wall's load at a sample.
     *
     * @param s a sample of a run on this patch
     * @return the load, or empty when the sample is not in contact or presses with no force
     */
    public Optional<WallLoad> of(Sample s) {
        if (s.contactPoint() == null || !(s.normalForce() > 0)) {
            return Optional.empty();
        }
        Vector3D c = s.state().centre();
        surface.query(s.time(), c.toArray(), geo);
        HertzPatch h = HertzContact.solve(s.normalForce(), ballRadius, ball, geo, wall);
        Vector3D f = s.frictionForce();
        return Optional.of(new WallLoad(s.time(), patch, s.state().phase().label(), s.normalForce(),
            f == null ? 0.0 : f.getNorm(), h));
    }

    /** @return the patch's id */
    public String patch() {
        return patch;
    }
}
