package org.trundle.bench;

import java.util.concurrent.TimeUnit;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.trundle.contact.HertzContact;
import org.trundle.contact.HertzPatch;
import org.trundle.core.Material;

/**
 * Cost of the exact Hertz solution (root find on the complete elliptic integrals): {@link HertzContact#meanRadius}
 * (called on every right-hand-side evaluation by the spin-creep law) and {@link HertzContact#solve} (called per
 * sample and wall by the wall loads), for an 8 mm ball in a 30 mm bore (an ellipse with b/a about 0.55) and on a
 * torus groove of conformity 0.52 (b/a about 0.1). Run with {@code -prof gc}: {@code meanRadius} should allocate
 * 0 B/op, {@code solve} only its result.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@State(Scope.Thread)
public class HertzBenchmark {
    /** Normal load (N), from state so that it is not folded. */
    public double load = 0.05;
    /** Ball radius (m). */
    public double radius = 0.004;
    /** Bore curvature 1/R (1/m). */
    public double bore = 1 / 0.015;
    /** Groove curvature across a conformity-0.52 groove (1/m). */
    public double groove = 1 / (0.52 * 0.008);
    /** Steel on steel contact modulus E* (Pa). */
    public double eStar = Material.STEEL.contactModulus(Material.STEEL);

    /** @return c = √(ab) in the bore (m) */
    @Benchmark
    public double meanRadiusInBore() {
        return HertzContact.meanRadius(load, radius, bore, 0.0, eStar);
    }

    /** @return c = √(ab) in the groove (m) */
    @Benchmark
    public double meanRadiusInGroove() {
        return HertzContact.meanRadius(load, radius, groove, -1 / 0.019, eStar);
    }

    /** @return the full patch in the groove */
    @Benchmark
    public HertzPatch solveInGroove() {
        return HertzContact.solve(load, radius, Material.STEEL, groove, Vector3D.PLUS_I, -1 / 0.019, Vector3D.PLUS_J,
            Material.STEEL);
    }
}
