package org.trundle.bench;

import java.util.concurrent.TimeUnit;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.trundle.contact.Coulomb;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.Patch;
import org.trundle.core.Phase;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.surfaces.Plane;
import org.trundle.surfaces.VGroove;

/**
 * A run with two contacts at once against the same run with one (issue 12's cost target: a V-groove run at
 * most twice a plane run of the same length and tolerance). A solid ball (r = 10 mm, m = 30 g, Coulomb
 * μ = 0.5) rolls from rest for 0.5 s down a 10° slope: in a 60° V-groove (two plane walls, the
 * closed form of two rolling contacts on the compact rolling layout) and on a plane (the single-contact closed
 * form on the rolling layout), at the default tolerance. Throughput in runs per second; the setup refuses to measure unless the
 * groove run keeps both contacts rolling to the end and the plane run rolls to the end. With the parameter
 * {@code mu = 0.02}, below the grip either needs (on the plane {@code μ ≥ (2/7) tanθ = 0.050}), both walls of the
 * groove and the plane slide from the start to the end instead (the closed form of sliding contacts, Cramer's rule
 * on the normal forces, against the single-contact sliding closed form). {@link #grooveRollingAndSliding} is the
 * groove whose minus wall is frictionless (Coulomb μ = 0 there, 0.5 on the plus wall): that wall slips at the start
 * and the ball rolls on the plus wall and slides on the minus one to the end (the closed form of one rolling and
 * one sliding contact), at the plane's own acceleration {@code (5/7) g sinθ}, so its cost compares with
 * {@link #planeOneContact} at {@code mu = 0.5}.
 */
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
public class SeveralContactsBenchmark {
    /** Simulated time of each run (s). */
    static final double DURATION = 0.5;
    /** Friction ratio of the sliding pair: below what rolling needs in the groove and on the plane. */
    static final double SLIDING_MU = 0.02;

    /** The two runs, rolling (μ = 0.5) or sliding (μ = {@value #SLIDING_MU}). */
    @State(Scope.Thread)
    public static class Runs {
        /** Coulomb friction ratio of both runs. */
        @Param({"0.5", "0.02"})
        public double mu;
        Simulation groove;
        BallState grooveStart;
        Simulation plane;
        BallState planeStart;

        /** Builds both runs and checks them once. */
        @Setup(Level.Trial)
        public void setUp() {
            groove = grooveRun(mu);
            grooveStart = grooveStart(groove);
            plane = planeRun(mu);
            planeStart = planeStart(plane);
            boolean sliding = mu < 0.05;
            check(groove.run(grooveStart, DURATION), "groove", sliding);
            check(plane.run(planeStart, DURATION), "plane", sliding);
        }
    }

    /** The groove with one frictionless wall, built and checked once. */
    @State(Scope.Thread)
    public static class MixedRuns {
        Simulation groove;
        BallState grooveStart;

        /** Builds the run and checks that it rolls on one wall and slides on the other to the end. */
        @Setup(Level.Trial)
        public void setUp() {
            groove = mixedGrooveRun();
            grooveStart = grooveStart(groove);
            RunResult r = groove.run(grooveStart, DURATION);
            if (r.endReason() != EndReason.DURATION || r.events().size() != 1
                || r.events().get(0).kind() != EventKind.SLIP || !"minus".equals(r.events().get(0).patch())
                || r.events().get(0).time() != 0) {
                throw new IllegalStateException("mixed groove run: " + r.endReason() + " " + r.events());
            }
        }
    }

    /**
     * @return the groove scene with a gripping plus wall (Coulomb μ = 0.5) and a frictionless minus wall
     *     (μ = 0)
     */
    static Simulation mixedGrooveRun() {
        VGroove v = new VGroove(Vector3D.ZERO, Vector3D.PLUS_I, Vector3D.PLUS_K, Math.toRadians(60));
        return Simulation.builder().ball(Ball.solid(0.01, 0.03))
            .patch(Patch.of("plus", v.plusWall()).withLaw(new Coulomb(0.5, 0.5, 0.0)))
            .patch(Patch.of("minus", v.minusWall()).withLaw(new Coulomb(0, 0, 0.0)))
            .law(new Coulomb(0.5, 0.5, 0.0)).gravity(slope()).build();
    }

    /** Rolling: no event to the end; sliding: one phase, sliding, with only the slip events at the start. */
    private static void check(RunResult r, String which, boolean sliding) {
        boolean ok = sliding
            ? r.phases().size() == 1 && r.phases().get(0).phase() == Phase.SLIDING
                && r.events().stream().allMatch(e -> e.kind() == EventKind.SLIP && e.time() == 0)
            : r.events().isEmpty();
        if (r.endReason() != EndReason.DURATION || !ok) {
            throw new IllegalStateException(which + " run: " + r.endReason() + " " + r.phases() + " " + r.events());
        }
    }

    private static Vector3D slope() {
        double theta = Math.toRadians(10);
        return new Vector3D(9.81 * Math.sin(theta), 0, -9.81 * Math.cos(theta));
    }

    /** @return the groove scene: two plane walls of a 60° V along x, opening up; Coulomb μ = 0.5 */
    static Simulation grooveRun() {
        return grooveRun(0.5);
    }

    /** @param mu Coulomb friction ratio (static and sliding) @return the groove scene */
    static Simulation grooveRun(double mu) {
        VGroove v = new VGroove(Vector3D.ZERO, Vector3D.PLUS_I, Vector3D.PLUS_K, Math.toRadians(60));
        return Simulation.builder().ball(Ball.solid(0.01, 0.03)).patch(Patch.of("plus", v.plusWall()))
            .patch(Patch.of("minus", v.minusWall())).law(new Coulomb(mu, mu, 0.0)).gravity(slope()).build();
    }

    /** @param sim the groove scene @return the ball at rest in the groove, touching both walls */
    static BallState grooveStart(Simulation sim) {
        VGroove v = new VGroove(Vector3D.ZERO, Vector3D.PLUS_I, Vector3D.PLUS_K, Math.toRadians(60));
        return sim.rollingStart(v.restingCentre(0.01, 0), Vector3D.ZERO);
    }

    /** @return the plane: z = 0 under the same tilted gravity; Coulomb μ = 0.5 */
    static Simulation planeRun() {
        return planeRun(0.5);
    }

    /** @param mu Coulomb friction ratio (static and sliding) @return the plane */
    static Simulation planeRun(double mu) {
        return Simulation.builder().ball(Ball.solid(0.01, 0.03)).surface(new Plane(Vector3D.ZERO, Vector3D.PLUS_K))
            .law(new Coulomb(mu, mu, 0.0)).gravity(slope()).build();
    }

    /** @param sim the plane @return the ball at rest on the plane */
    static BallState planeStart(Simulation sim) {
        return sim.rollingStart(new Vector3D(0, 0, 0.01), Vector3D.ZERO);
    }

    /**
     * @param s the runs
     * @return the result
     */
    @Benchmark
    public RunResult grooveTwoContacts(Runs s) {
        return s.groove.run(s.grooveStart, DURATION);
    }

    /**
     * @param s the runs
     * @return the result
     */
    @Benchmark
    public RunResult grooveRollingAndSliding(MixedRuns s) {
        return s.groove.run(s.grooveStart, DURATION);
    }

    /**
     * @param s the runs
     * @return the result
     */
    @Benchmark
    public RunResult planeOneContact(Runs s) {
        return s.plane.run(s.planeStart, DURATION);
    }
}
