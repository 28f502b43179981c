package org.trundle.contact;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Material;
import org.trundle.core.MotionState;
import org.trundle.core.Patch;
import org.trundle.core.Sample;
import org.trundle.core.SampleContact;
import org.trundle.core.Simulation;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceMotion;

/**
 * Turns a run's samples into the loads the walls see: for each contact of a sample on a patch with a known
 * material, the normal and friction force of that contact and the exact Hertz patch under that normal force
 * at the local principal curvatures of that patch's wall (semi-axes, orientation, maximum pressure, approach;
 * {@link HertzContact#solve}). Use it inside a {@code RunObserver}'s {@code sample} method:
 * <pre>
 *   WallLoads loads = new WallLoads("tube", tube, ball.radius(), Material.STEEL, Material.ACRYLIC);
 *   sim.run(start, 2.0, sample -&gt; loads.of(sample).ifPresent(System.out::println));
 *
 *   // a scene: one load per touching patch that has a material
 *   WallLoads scene = WallLoads.forScene(sim, Material.STEEL, Map.of("left", Material.ALUMINIUM,
 *       "right", Material.ALUMINIUM));
 *   sim.run(start, 2.0, sample -&gt; scene.loads(sample).forEach(System.out::println));
 * </pre>
 *
 * <p>The curvatures are those of each patch's wall at its contact, from the patch's geometry at the sample's
 * centre (a moving patch is queried at its pose at the sample's time; curvatures do not change under a rigid
 * motion, the ellipse's axes turn with the patch). The forces of a contact are the sample's: a sample touching
 * its contacts' own forces and modes ({@link Sample#touches()}: a ball in a V-groove or on two rails gives one
 * load per wall). A sample made by hand without per-contact data is taken as on the one patch of a calculator made
 * for one patch, and refused otherwise rather than split by guess.
 *
 * <p>Not thread-safe (a geometry workspace per patch); make one per run.
 */
public final class WallLoads {
    /** One patch with a material: its geometry workspace and pose workspace. */
    private static final class Wall {
        final String id;
        final Surface surface;
        final SurfaceMotion motion;
        final Material material;
        final ContactGeometry geo = new ContactGeometry();
        final MotionState pose = new MotionState();

        Wall(String id, Surface surface, SurfaceMotion motion, Material material) {
            this.id = id;
            this.surface = surface;
            this.motion = motion;
            this.material = material;
            this.geo.scratch = surface.newScratch();
        }

        /** Queries the wall at the centre c (m) at time t (s), at the patch's pose then. */
        void query(double t, double[] c) {
            if (motion.stationary()) {
                surface.query(t, c, geo);
            } else {
                motion.at(t, pose);
                pose.query(surface, t, c, geo);
            }
        }
    }

    private final double ballRadius;
    private final Material ball;
    private final Map<String, Wall> walls;
    /** Made for a run on one patch: every contact is on it, whatever id the run gives the patch. */
    private final boolean onePatchRun;

    private WallLoads(double ballRadius, Material ball, List<Wall> walls, boolean onePatchRun) {
        if (!(ballRadius > 0 && ballRadius < Double.POSITIVE_INFINITY)) {
            throw new IllegalArgumentException("ball radius must be finite and positive, got " + ballRadius);
        }
        if (ball == null) {
            throw new IllegalArgumentException("ball material must be given, got null");
        }
        this.ballRadius = ballRadius;
        this.ball = ball;
        this.onePatchRun = onePatchRun;
        this.walls = new LinkedHashMap<>();
        for (Wall w : walls) {
            this.walls.put(w.id, w);
        }
    }

    /**
     * The loads on the one still patch of a run (for example a run of {@code Simulation.builder().surface(...)}):
     * every contact of a sample is taken to be on this patch, reported under the id given here.
     *
     * @param patch the patch's id (reported with each load)
     * @param surface the patch's surface
     * @param ballRadius ball radius r (m)
     * @param ball the ball's material
     * @param wall the wall's material
     */
    public WallLoads(String patch, Surface surface, double ballRadius, Material ball, Material wall) {
        this(ballRadius, ball, List.of(checked(patch, surface, SurfaceMotion.NONE, wall)), true);
    }

    private static Wall checked(String patch, Surface surface, SurfaceMotion motion, Material wall) {
        if (patch == null || surface == null || wall == null) {
            throw new IllegalArgumentException("patch id, surface and wall material must be given, got "
                + patch + ", " + surface + ", " + wall);
        }
        return new Wall(patch, surface, motion == null ? SurfaceMotion.NONE : motion, wall);
    }

    /**
     * The loads on the patches of a simulation's scene that have a material (moving patches included).
     *
     * @param sim the simulation (its ball radius and patches)
     * @param ball the ball's material
     * @param walls the material of each patch that should report loads, by patch id (at least one; patches left
     *     out report none)
     * @return the calculator, for one run
     * @throws IllegalArgumentException naming an id that is not a patch of the scene, or a missing material
     */
    public static WallLoads forScene(Simulation sim, Material ball, Map<String, Material> walls) {
        if (sim == null || walls == null || walls.isEmpty()) {
            throw new IllegalArgumentException("a simulation and the material of at least one patch must be given, got "
                + sim + ", " + walls);
        }
        List<Wall> list = new ArrayList<>();
        for (Patch p : sim.patches()) {
            Material m = walls.get(p.id());
            if (m != null) {
                list.add(checked(p.id(), p.surface(), p.motion(), m));
            }
        }
        for (String id : walls.keySet()) {
            if (list.stream().noneMatch(w -> w.id.equals(id))) {
                List<String> ids = sim.patches().stream().map(Patch::id).toList();
                throw new IllegalArgumentException("wall material given for patch \"" + id
                    + "\", which is not a patch of the scene " + ids);
            }
        }
        return new WallLoads(sim.ball().radius(), ball, list, false);
    }

    /**
     * The loads of every contact of a sample on a patch with a material, in the order the sample lists its
     * contacts ({@link Sample#touches()}: each contact's own normal and friction force and mode).
     *
     * @param s a sample of a run on these patches
     * @return one load per such contact that presses with a positive force; empty in flight
     * @throws IllegalArgumentException for a sample without per-contact data that cannot be assigned to one patch
     */
    public List<WallLoad> loads(Sample s) {
        List<SampleContact> touches = s.touches();
        if (touches.isEmpty()) {
            if (s.contactPoint() == null || !(s.normalForce() > 0)) {
                return List.of();
            }
            if (!onePatchRun) {
                throw new IllegalArgumentException("the sample at t = " + s.time() + " s touches " + s.contacts()
                    + " but carries no per-contact forces (Sample.touches); the loads of each wall need them");
            }
            // a sample made by hand without patch ids, on the one patch of this calculator
            Wall w = walls.get(patch());
            return List.of(load(s, w, s.normalForce(), s.frictionForce(), s.state().phase().label()));
        }
        List<WallLoad> out = new ArrayList<>(touches.size());
        for (SampleContact c : touches) {
            Wall w = onePatchRun && touches.size() == 1 ? walls.get(patch()) : walls.get(c.patch());
            if (w != null && c.normalForce() > 0) {
                out.add(load(s, w, c.normalForce(), c.frictionForce(), c.modeLabel()));
            }
        }
        return out;
    }

    private WallLoad load(Sample s, Wall w, double normalForce, Vector3D friction, String mode) {
        w.query(s.time(), s.state().centre().toArray());
        HertzPatch h = HertzContact.solve(normalForce, ballRadius, ball, w.geo, w.material);
        return new WallLoad(s.time(), w.id, mode, normalForce, friction == null ? 0.0 : friction.getNorm(), h);
    }

    /**
     * The load of a sample's first contact on a patch with a material.
     *
     * @param s a sample of a run on these patches
     * @return the load, or empty when the sample is not in contact with such a patch or presses with no force
     */
    public Optional<WallLoad> of(Sample s) {
        List<WallLoad> all = loads(s);
        return all.isEmpty() ? Optional.empty() : Optional.of(all.get(0));
    }

    /** @return the id of the first patch with a material */
    public String patch() {
        return walls.keySet().iterator().next();
    }

    /** @return the ids of the patches that report loads, in scene order */
    public List<String> patches() {
        return List.copyOf(walls.keySet());
    }
}
