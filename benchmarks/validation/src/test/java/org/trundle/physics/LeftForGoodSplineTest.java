package org.trundle.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.core.Surface;
import org.trundle.surfaces.Bounded;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Side;
import org.trundle.surfaces.SplineTube;
import org.trundle.surfaces.SurfaceOfRevolution;

/**
 * Flights out of the spline surfaces and bounded patches end {@link EndReason#LEFT_FOR_GOOD} when
 * the free-fall parabola {@code c₀ + v₀ t + ½ g t²} (Galileo; common practice) clears the patch's
 * slabs grown by the reach {@code r (1 + 1e-6)}, and not before: a ball thrown up out of an
 * upright tube comes back, so it flies on and is only clear once it has dropped out of the bottom.
 * Each patch runs 0 ≤ axial ≤ 0.3 m; a straight spline tube's slabs are its centreline's range
 * grown by its radius. Seeded samplers of our own.
 */
class LeftForGoodSplineTest {
    private static final double R = 0.01;
    private static final double G = 9.81;
    private static final double REACH = R * (1 + 1e-6);
    private static final double BORE = 0.04;

    /** A patch along {@code axis} from 0 to 0.3 m, and how far past 0.3 m (or below 0) its slab reaches. */
    record Patch(String kind, Surface surface, double beyond) {
        @Override
        public String toString() {
            return kind;
        }
    }

    static List<Patch> patches(Vector3D axis) {
        // an uneven profile that stays at least the bore wide
        double[] z = {0.0, 0.02, 0.15, 0.3};
        double[] r = {0.05, 0.045, 0.06, 0.045};
        Vector3D[] line = {Vector3D.ZERO, new Vector3D(0.07, axis), new Vector3D(0.2, axis), new Vector3D(0.3, axis)};
        return List.of(
            new Patch("revolution", new SurfaceOfRevolution(Vector3D.ZERO, axis, z, r, Side.INSIDE), 0.0),
            new Patch("spline tube", new SplineTube(line, BORE, Side.INSIDE), BORE),
            new Patch("bounded by axial range", Bounded.of(new Cylinder(Vector3D.ZERO, axis, BORE, Side.INSIDE))
                .axialRange(Vector3D.ZERO, axis, 0, 0.3).build(), 0.0),
            new Patch("bounded by planes", Bounded.of(new Cylinder(Vector3D.ZERO, axis, BORE, Side.INSIDE))
                .plane("entry", Vector3D.ZERO, axis).plane("far_end", new Vector3D(0.3, axis), axis.negate()).build(), 0.0));
    }

    private static Simulation sim(Surface surface) {
        return Simulation.builder().ball(Ball.solid(R, 0.02)).surface(surface).law(new PureRolling())
            .gravity(new Vector3D(0, 0, -G)).settings(SolverSettings.defaults().withStopAtExit(false)).build();
    }

    static List<Object[]> horizontal() {
        List<Object[]> out = new ArrayList<>();
        for (Patch p : patches(Vector3D.PLUS_I)) {
            SplittableRandom rnd = new SplittableRandom(p.kind().hashCode());
            for (int k = 0; k < 4; k++) {
                out.add(new Object[] {p, rnd.nextDouble(0.2, 0.28), rnd.nextDouble(-0.005, 0.005),
                    rnd.nextDouble(-0.005, 0.005), rnd.nextDouble(3, 5)});
            }
        }
        return out;
    }

    /**
     * Flying along a horizontal bore (axis x) out of its far end at speed u, without touching the
     * wall (it falls at most 12 mm of the 30 mm clearance): clear once its centre is the reach past
     * the far slab, at {@code (0.3 + beyond + reach − x₀)/u}, the radial slabs still holding it.
     */
    @ParameterizedTest(name = "[{index}] {0} from x = {1}, seed hash of the kind")
    @MethodSource("horizontal")
    void flyingOutOfTheFarEndIsClearOnceBeyondReach(Patch p, double x0, double y0, double z0, double u) {
        RunResult res = sim(p.surface()).run(BallState.flying(new Vector3D(x0, y0, z0), new Vector3D(u, 0, 0),
            Vector3D.ZERO), 10.0);
        assertEquals(EndReason.LEFT_FOR_GOOD, res.endReason(), res.message());
        double t = (0.3 + p.beyond() + REACH - x0) / u;
        assertEquals(t, res.endState().time(), 1e-9);
        assertEquals(z0 - 0.5 * G * t * t, res.endState().centre().getZ(), 1e-9);
    }

    static List<Object[]> upright() {
        List<Object[]> out = new ArrayList<>();
        for (Patch p : patches(Vector3D.PLUS_K)) {
            SplittableRandom rnd = new SplittableRandom(p.kind().hashCode() + 1);
            for (int k = 0; k < 3; k++) {
                out.add(new Object[] {p, rnd.nextDouble(0.1, 0.25), rnd.nextDouble(2.4, 2.8)});
            }
        }
        return out;
    }

    /**
     * Thrown straight up inside an upright bore (axis z, 3 mm off the axis) it rises past the top
     * slab by more than the reach (to {@code z₀ + w²/2g ≥ 0.1 + 0.29 m}) but gravity brings it
     * back: it is not ended there. It falls through and out of the bottom, and is clear at the later
     * root of {@code z₀ + w t − ½ g t² = −beyond − reach}.
     */
    @ParameterizedTest(name = "[{index}] {0} from z = {1}, seed hash of the kind + 1")
    @MethodSource("upright")
    void thrownUpItComesBackAndLeavesThroughTheBottom(Patch p, double z0, double w) {
        RunResult res = sim(p.surface()).run(BallState.flying(new Vector3D(0.003, 0, z0), new Vector3D(0, 0, w),
            Vector3D.ZERO), 10.0);
        assertEquals(EndReason.LEFT_FOR_GOOD, res.endReason(), res.message());
        double c = z0 + p.beyond() + REACH;
        double t = (w + Math.sqrt(w * w + 2 * G * c)) / G;
        assertTrue(z0 + w * w / (2 * G) > 0.3 + p.beyond() + REACH, "rises clear of the top slab");
        assertTrue(res.endState().time() > w / G, "not ended before the top of its rise");
        assertEquals(t, res.endState().time(), 1e-9);
    }
}
