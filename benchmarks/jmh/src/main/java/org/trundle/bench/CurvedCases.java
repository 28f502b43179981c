package org.trundle.bench;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Side;
import org.trundle.surfaces.SplineTube;
import org.trundle.surfaces.Torus;

/**
 * The curved-guide runs of the benchmarks (invented example data, 4 mm steel-like ball, pure
 * rolling, 0.5 s): a ball rolling round a toroidal ring groove (major radius 50 mm, groove radius
 * 6 mm) and down a helical spline chute (tube radius 12 mm, 3 turns of radius 60 mm, pitch 40 mm).
 */
public enum CurvedCases {
    /** Ring groove: on the groove's floor, rolling along the ring at 0.6 m/s. */
    TORUS_GROOVE {
        @Override
        public Simulation simulation(SolverSettings settings) {
            return builder(settings).surface(new Torus(Vector3D.ZERO, Vector3D.PLUS_K, 0.05, 0.006, Side.INSIDE))
                .build();
        }

        @Override
        public BallState start(Simulation sim) {
            return sim.rollingStart(new Vector3D(0.05, 0, -0.002), new Vector3D(0, 0.6, 0.0));
        }
    },
    /** Spline chute: bottom of the tube wall near the top of the helix, 0.3 m/s along it. */
    SPLINE_CHUTE {
        @Override
        public Simulation simulation(SolverSettings settings) {
            return builder(settings).surface(new SplineTube(helix(), 0.012, Side.INSIDE)).build();
        }

        @Override
        public BallState start(Simulation sim) {
            Vector3D[] pts = helix();
            var geo = sim.geometryAt(pts[2].add(new Vector3D(0, 0, -0.011)), 0);
            Vector3D n0 = new Vector3D(geo.normal[0], geo.normal[1], geo.normal[2]);
            Vector3D foot = new Vector3D(geo.point[0], geo.point[1], geo.point[2]);
            Vector3D along = pts[3].subtract(pts[1]).normalize();
            Vector3D v = along.subtract(along.dotProduct(n0), n0).scalarMultiply(0.3);
            return sim.rollingStart(foot.add(0.004, n0), v);
        }
    };

    /** Simulated time of each run (s). */
    public static final double DURATION = 0.5;

    /**
     * @param settings solver settings
     * @return the simulation
     */
    public abstract Simulation simulation(SolverSettings settings);

    /**
     * @param sim this case's simulation
     * @return the start state
     */
    public abstract BallState start(Simulation sim);

    /**
     * @param settings solver settings
     * @return the result of one run of {@link #DURATION}
     */
    public RunResult run(SolverSettings settings) {
        Simulation sim = simulation(settings);
        return sim.run(start(sim), DURATION);
    }

    /** The chute's centre line: 37 points on 3 turns of a helix of radius 60 mm, 40 mm pitch, descending. */
    static Vector3D[] helix() {
        int n = 37;
        Vector3D[] pts = new Vector3D[n];
        for (int i = 0; i < n; i++) {
            double a = 2 * Math.PI * 3 * i / (n - 1);
            pts[i] = new Vector3D(0.06 * Math.cos(a), 0.06 * Math.sin(a), -0.12 * i / (n - 1));
        }
        return pts;
    }

    private static Simulation.Builder builder(SolverSettings settings) {
        return Simulation.builder().ball(Ball.solid(0.004, 0.0021)).law(new PureRolling())
            .gravity(new Vector3D(0, 0, -9.81)).settings(settings);
    }
}
