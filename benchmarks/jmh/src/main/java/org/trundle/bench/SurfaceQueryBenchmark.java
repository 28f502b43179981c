package org.trundle.bench;

import java.util.concurrent.TimeUnit;

import org.hipparchus.CalculusFieldElement;
import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Surface;
import org.trundle.surfaces.Cone;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.ImplicitFunction;
import org.trundle.surfaces.ImplicitSurface;
import org.trundle.surfaces.Placed;
import org.trundle.surfaces.Side;
import org.trundle.surfaces.Sphere;
import org.trundle.surfaces.SplineTube;
import org.trundle.surfaces.SurfaceOfRevolution;
import org.trundle.surfaces.Torus;

/**
 * Cost of one contact-geometry query per surface, as a run makes it: the query point moves a
 * little between calls (so Newton-based surfaces start from the previous foot, the run's hint).
 * Run with {@code java -cp benchmarks/jmh/target/trundle-benchmarks.jar org.openjdk.jmh.Main SurfaceQueryBenchmark
 * -prof gc -rf json}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class SurfaceQueryBenchmark {
    /** Which surface to query. */
    @Param({"cylinder", "implicitCylinder", "sphere", "cone", "torus", "placedTorus", "revolution", "splineTube"})
    public String surface;

    private Surface s;
    private ContactGeometry geo;
    private final double[] x = new double[3];
    private double[] base;
    private double phase;

    /** Builds the surface and a query point at distance 0.004 m from it. */
    @Setup(Level.Trial)
    public void setup() {
        ImplicitFunction cyl = new ImplicitFunction() {
            @Override
            public <T extends CalculusFieldElement<T>> T value(T px, T py, T pz) {
                return px.square().add(py.square()).subtract(0.015 * 0.015);
            }
        };
        Vector3D[] helix = new Vector3D[25];
        for (int i = 0; i < helix.length; i++) {
            double th = i * Math.PI / 6;
            helix[i] = new Vector3D(0.2 * Math.cos(th), 0.2 * Math.sin(th), 0.15 * th / (2 * Math.PI));
        }
        switch (surface) {
            case "cylinder":
                s = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, 0.015, Side.INSIDE);
                base = new double[] {0.011, 0.0, 0.1};
                break;
            case "implicitCylinder":
                s = ImplicitSurface.of(cyl).label("cylinder").side(Side.INSIDE).lengthScale(0.015).maxConcaveCurvature(1 / 0.015).build();
                base = new double[] {0.011, 0.0, 0.1};
                break;
            case "sphere":
                s = new Sphere(new Vector3D(0, 0, 0.2), 0.2, Side.INSIDE);
                base = new double[] {0.01, 0.0, 0.005};
                break;
            case "cone":
                s = new Cone(Vector3D.ZERO, Vector3D.PLUS_K, 0.5, Side.INSIDE, 0.01, 1);
                base = new double[] {0.05, 0.0, 0.1};
                break;
            case "torus":
                s = new Torus(Vector3D.ZERO, Vector3D.PLUS_K, 0.2, 0.015, Side.INSIDE);
                base = new double[] {0.2, 0.0, -0.011};
                break;
            case "placedTorus":
                s = new Placed(new Torus(Vector3D.ZERO, Vector3D.PLUS_K, 0.2, 0.015, Side.INSIDE),
                    new Rotation(Vector3D.PLUS_I, 0.3, RotationConvention.VECTOR_OPERATOR), new Vector3D(0.1, 0, 0));
                base = new double[] {0.3, -0.003, -0.01};
                break;
            case "revolution":
                s = new SurfaceOfRevolution(Vector3D.ZERO, Vector3D.PLUS_K, new double[] {0, 0.02, 0.05, 0.08, 0.1},
                    new double[] {0.03, 0.032, 0.04, 0.055, 0.07}, Side.INSIDE);
                base = new double[] {0.034, 0.0, 0.05};
                break;
            default:
                s = new SplineTube(helix, 0.02, Side.INSIDE);
                base = new double[] {0.2 * Math.cos(5.0), 0.2 * Math.sin(5.0) + 0.004, 0.15 * 5.0 / (2 * Math.PI)};
                break;
        }
        geo = new ContactGeometry();
        geo.scratch = s.newScratch();
    }

    /** @return the normal's first component (sunk by JMH) */
    @Benchmark
    public double query() {
        phase += 1e-3;
        double dx = 1e-5 * Math.sin(phase);
        x[0] = base[0] + dx;
        x[1] = base[1] + dx;
        x[2] = base[2] + 1e-3 * dx;
        s.query(0.0, x, geo);
        return geo.normal[0] + geo.hessian[4];
    }
}
