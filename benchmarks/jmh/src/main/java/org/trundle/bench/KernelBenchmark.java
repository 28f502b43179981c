package org.trundle.bench;

import java.util.concurrent.TimeUnit;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.trundle.bench.baseline.VerticalTubeRolling;
import org.trundle.contact.Coulomb;
import org.trundle.contact.PureRolling;
import org.trundle.core.BallState;
import org.trundle.core.ContactLaw;
import org.trundle.core.Phase;
import org.trundle.core.RightHandSide;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Side;

/**
 * Cost of one right-hand-side evaluation, called directly (not through the integrator, whose own
 * array work is Hipparchus'): the library kernel {@link RightHandSide#evaluate} per contact law
 * and phase in the vertical tube of {@link VerticalTubeCase}, and the hand-derived
 * {@link VerticalTubeRolling} equations for comparison. Run with {@code -prof gc} to see the
 * allocation per call ({@code gc.alloc.rate.norm}, B/op), which should be about 0.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
public class KernelBenchmark {

    /** The contact law and phase of a kernel case; add a case by adding a constant. */
    public enum LawCase {
        /** Pure rolling (unbounded grip), rolling phase: the vertical-tube rolling case. */
        PURE_ROLLING {
            @Override
            ContactLaw law() {
                return new PureRolling();
            }

            @Override
            Phase phase() {
                return Phase.ROLLING;
            }
        },
        /** Coulomb friction, rolling phase (the grip limit is evaluated too). */
        COULOMB_ROLLING {
            @Override
            ContactLaw law() {
                return new Coulomb(0.3, 0.25, 0.5);
            }

            @Override
            Phase phase() {
                return Phase.ROLLING;
            }
        },
        /** Coulomb friction, sliding phase (a ball slipping on the tube wall). */
        COULOMB_SLIDING {
            @Override
            ContactLaw law() {
                return new Coulomb(0.3, 0.25, 0.5);
            }

            @Override
            Phase phase() {
                return Phase.SLIDING;
            }
        };

        abstract ContactLaw law();

        abstract Phase phase();
    }

    /** Per-thread library kernel and its input state. */
    @State(Scope.Thread)
    public static class LawState {
        /** Which law and phase. */
        @Param
        public LawCase law;

        RightHandSide rhs;
        double[] y;
        double[] yDot;
        double t = 0.01;

        /** Builds the kernel and a state on the tube wall (rolling start, or slipping start for sliding). */
        @Setup
        public void setUp() {
            Cylinder tube = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, VerticalTubeCase.TUBE_RADIUS, Side.INSIDE);
            Simulation sim = Simulation.builder().ball(new VerticalTubeCase().ball()).surface(tube).law(law.law())
                .gravity(new Vector3D(0, 0, -VerticalTubeCase.G)).settings(SolverSettings.defaults()).build();
            Vector3D c = new Vector3D(VerticalTubeCase.orbitRadius(), 0, -0.001);
            BallState s = sim.rollingStart(c, new Vector3D(0, VerticalTubeCase.SPEED, -0.2));
            if (law.phase() == Phase.SLIDING) {
                // same centre velocity, a quarter of the rolling spin: the contact point slips
                s = BallState.of(0, c, s.velocity(), Rotation.IDENTITY, s.spin().scalarMultiply(0.25), Phase.SLIDING);
            }
            rhs = new RightHandSide(sim, law.phase());
            y = RightHandSide.toArray(s);
            yDot = new double[rhs.dimension()];
        }
    }

    /** Per-thread hand-derived baseline and its input state. */
    @State(Scope.Thread)
    public static class HandState {
        VerticalTubeRolling base;
        double[] y;
        double[] yDot;

        /** Builds the baseline at the same rolling start as the library's pure-rolling case. */
        @Setup
        public void setUp() {
            VerticalTubeCase tc = new VerticalTubeCase();
            BallState s = tc.simulation().rollingStart(new Vector3D(VerticalTubeCase.orbitRadius(), 0, -0.001),
                new Vector3D(0, VerticalTubeCase.SPEED, -0.2));
            y = VerticalTubeCase.baselineState(s);
            yDot = new double[VerticalTubeRolling.DIM];
            base = tc.baseline();
        }
    }

    /**
     * @param s the kernel state
     * @return the derivative array (sunk by JMH)
     */
    @Benchmark
    public double[] libraryKernel(LawState s) {
        s.rhs.evaluate(s.t, s.y, s.yDot);
        return s.yDot;
    }

    /**
     * @param s the baseline state
     * @return the derivative array (sunk by JMH)
     */
    @Benchmark
    public double[] handDerivedKernel(HandState s) {
        s.base.evaluate(s.y, s.yDot);
        return s.yDot;
    }
}
