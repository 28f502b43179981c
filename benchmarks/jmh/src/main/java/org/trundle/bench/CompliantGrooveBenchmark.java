package org.trundle.bench;

import java.util.List;
import java.util.concurrent.TimeUnit;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.trundle.contact.Coulomb;
import org.trundle.contact.HertzStiffness;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.Compliance;
import org.trundle.core.EventKind;
import org.trundle.core.Material;
import org.trundle.core.Patch;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.surfaces.Plane;
import org.trundle.surfaces.VGroove;

/**
 * The cost of the compliant contact against the rigid one, on one wall and on two at once: a 10 mm steel ball
 * (m = 4.1 g) dropped 10 cm, for 0.5 s (two bounces), onto a floor and down the bisector of a 90° V-groove
 * (frictionless walls, restitution 0.8), rigid (impulses) or compliant (steel on acrylic, Hertz with Hunt–Crossley
 * damping, each wall its own contact), at the default tolerance. Throughput in runs per second. The setup refuses
 * to measure unless every run meets its wall first at {@code sqrt(2h/g)} (free fall; common practice) to 1e-9 s and
 * a second time at {@code sqrt(2h/g) + 2 e v₁/g} (projectile motion): the rigid runs to 1e-9 s, the compliant ones
 * within 1e-3 s (they are later by about the contact time, 1e-4 s here; K. L. Johnson, Contact Mechanics, 1985,
 * §11.4).
 */
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
public class CompliantGrooveBenchmark {
    /** Simulated time of each run (s). */
    static final double DURATION = 0.5;
    private static final double R = 0.005;
    private static final double M = 0.0041;
    private static final double H = 0.1;
    private static final double E = 0.8;

    /** The four runs. */
    @State(Scope.Thread)
    public static class Runs {
        Simulation rigidFloor;
        Simulation compliantFloor;
        Simulation rigidGroove;
        Simulation compliantGroove;
        BallState floorDrop;
        BallState grooveDrop;

        /** Builds the runs and checks each once. */
        @Setup(Level.Trial)
        public void setUp() {
            Compliance acrylic = HertzStiffness.compliance(Material.STEEL, Material.ACRYLIC, E);
            rigidFloor = floor(null);
            compliantFloor = floor(acrylic);
            rigidGroove = groove(null);
            compliantGroove = groove(acrylic);
            floorDrop = BallState.flying(new Vector3D(0, 0, R + H), Vector3D.ZERO, Vector3D.ZERO);
            grooveDrop = BallState.flying(new Vector3D(0, 0, R / Math.sin(Math.PI / 4) + H), Vector3D.ZERO,
                Vector3D.ZERO);
            check(rigidFloor.run(floorDrop, DURATION), "rigid floor", 1e-9);
            check(compliantFloor.run(floorDrop, DURATION), "compliant floor", 1e-3);
            check(rigidGroove.run(grooveDrop, DURATION), "rigid groove", 1e-9);
            check(compliantGroove.run(grooveDrop, DURATION), "compliant groove", 1e-3);
        }
    }

    private static Simulation floor(Compliance c) {
        return Simulation.builder().ball(Ball.solid(R, M)).law(new Coulomb(0, 0, E))
            .gravity(new Vector3D(0, 0, -9.81)).patch(Patch.of("floor", new Plane(Vector3D.ZERO, Vector3D.PLUS_K))
                .withCompliance(c)).build();
    }

    private static Simulation groove(Compliance c) {
        VGroove v = new VGroove(Vector3D.ZERO, Vector3D.PLUS_I, Vector3D.PLUS_K, Math.toRadians(90));
        return Simulation.builder().ball(Ball.solid(R, M)).law(new Coulomb(0, 0, E))
            .gravity(new Vector3D(0, 0, -9.81)).patch(Patch.of("left", v.plusWall()).withCompliance(c))
            .patch(Patch.of("right", v.minusWall()).withCompliance(c)).build();
    }

    /** The first and the second meeting with the walls (the first impact event of each), against free fall. */
    private static void check(RunResult r, String which, double second) {
        List<RunEvent> impacts = r.eventsOf(EventKind.IMPACT);
        double t1 = Math.sqrt(2 * H / 9.81);
        double t2 = t1 + 2 * E * Math.sqrt(2 * 9.81 * H) / 9.81;
        double first = impacts.get(0).time();
        double again = impacts.stream().mapToDouble(RunEvent::time).filter(t -> t > first + 1e-3).findFirst()
            .orElse(Double.NaN);
        if (!(Math.abs(first - t1) <= 1e-9 && Math.abs(again - t2) <= second)) {
            throw new IllegalStateException(which + " run: impacts at " + first + " and " + again + " s, expected "
                + t1 + " and " + t2 + " s");
        }
    }

    /**
     * @param s the runs
     * @return the result
     */
    @Benchmark
    public RunResult rigidFloor(Runs s) {
        return s.rigidFloor.run(s.floorDrop, DURATION);
    }

    /**
     * @param s the runs
     * @return the result
     */
    @Benchmark
    public RunResult compliantFloor(Runs s) {
        return s.compliantFloor.run(s.floorDrop, DURATION);
    }

    /**
     * @param s the runs
     * @return the result
     */
    @Benchmark
    public RunResult rigidGroove(Runs s) {
        return s.rigidGroove.run(s.grooveDrop, DURATION);
    }

    /**
     * @param s the runs
     * @return the result
     */
    @Benchmark
    public RunResult compliantGroove(Runs s) {
        return s.compliantGroove.run(s.grooveDrop, DURATION);
    }
}
