package org.trundle.bench;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceDomainException;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Plane;
import org.trundle.surfaces.Side;

/**
 * Cost of one contact-geometry query ({@link Surface#query}) per surface, over a ring of 64
 * ball-centre positions in contact with the surface (seeded, so every run queries the same
 * points). Run with {@code -prof gc} to see the allocation per call, which should be 0.
 *
 * <p>To add a surface, add one constant to {@link Shape} with its {@code make()} method; the query
 * points are found generically (random points in a 4 cm box, moved to {@code p + r n}).
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@State(Scope.Thread)
public class GeometryBenchmark {
    private static final int POINTS = 64;
    private static final double BALL_RADIUS = 0.004;

    /** The surfaces measured; one constant, one method each. */
    public enum Shape {
        /** A tilted plane through the origin. */
        PLANE {
            @Override
            Surface make() {
                return new Plane(Vector3D.ZERO, new Vector3D(0.1, -0.2, 1.0));
            }
        },
        /** The inside of a tilted bounded tube (radius 15 mm). */
        CYLINDER_INSIDE {
            @Override
            Surface make() {
                return new Cylinder(Vector3D.ZERO, new Vector3D(0.2, 0.1, 1.0), 0.015, Side.INSIDE, -0.5, 0.5);
            }
        },
        /** The outside of a tilted rod (radius 10 mm). */
        CYLINDER_OUTSIDE {
            @Override
            Surface make() {
                return new Cylinder(Vector3D.ZERO, new Vector3D(0.2, 0.1, 1.0), 0.010, Side.OUTSIDE);
            }
        };

        abstract Surface make();
    }

    /** Which surface. */
    @Param
    public Shape shape;

    private Surface surface;
    private ContactGeometry out;
    private double[][] points;
    private int next;

    /** Builds the surface, its per-run workspace and the ring of query points. */
    @Setup
    public void setUp() {
        surface = shape.make();
        out = new ContactGeometry();
        out.scratch = surface.newScratch();
        points = new double[POINTS][];
        SplittableRandom rnd = new SplittableRandom(20261202L);
        int found = 0;
        while (found < POINTS) {
            double[] x = {rnd.nextDouble(-0.02, 0.02), rnd.nextDouble(-0.02, 0.02), rnd.nextDouble(-0.02, 0.02)};
            try {
                surface.query(0, x, out);
            } catch (SurfaceDomainException e) {
                continue;
            }
            double[] c = new double[3];
            for (int i = 0; i < 3; i++) {
                c[i] = out.point[i] + BALL_RADIUS * out.normal[i];
            }
            points[found++] = c;
        }
    }

    /**
     * @return the signed distance of the last query (sunk by JMH)
     */
    @Benchmark
    public double query() {
        double[] x = points[next];
        next = (next + 1) & (POINTS - 1);
        surface.query(0.0, x, out);
        return out.distance + out.hessian[4];
    }
}
