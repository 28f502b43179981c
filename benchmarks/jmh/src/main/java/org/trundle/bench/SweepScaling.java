package org.trundle.bench;

import java.util.Locale;
import java.util.concurrent.atomic.AtomicLong;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.contact.Coulomb;
import org.trundle.core.Ball;
import org.trundle.core.Simulation;
import org.trundle.core.sweep.Axis;
import org.trundle.core.sweep.Grid;
import org.trundle.core.sweep.RunFactory;
import org.trundle.core.sweep.RunSpec;
import org.trundle.core.sweep.Sweep;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Side;

/**
 * The sweep target of the speed work: 10,000 runs of 0.2 s simulated time each (an invented
 * return-tube case: entry speed 0.3–1.5 m/s × entry angle −60…+30° from the horizontal, Coulomb
 * friction μs = 0.6, μk = 0.5, restitution 0.4), timed on 1 and on 2 threads through the library's
 * sweep API, after a warm-up. Prints a Markdown table; the rows of both runs are checked identical.
 *
 * <p>Usage: {@code java -cp benchmarks/jmh/target/trundle-benchmarks.jar org.trundle.bench.SweepScaling [runs-per-axis]}.
 */
public final class SweepScaling {
    private SweepScaling() {
    }

    /**
     * @param args optional: runs per axis (default 100, so 100 × 100 = 10,000 runs)
     */
    public static void main(String[] args) {
        int n = args.length > 0 ? Integer.parseInt(args[0]) : 100;
        Simulation sim = Simulation.builder().ball(Ball.solid(0.004, 0.0021))
            .surface(new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, 0.015, Side.INSIDE, -0.3, 0.0))
            .law(new Coulomb(0.6, 0.5, 0.4)).gravity(new Vector3D(0, 0, -9.81)).build();
        double rho = 0.011;
        RunFactory factory = p -> {
            double speed = p.get("speed");
            double angle = Math.toRadians(p.get("angle_deg"));
            Vector3D v = new Vector3D(0, speed * Math.cos(angle), speed * Math.sin(angle));
            return new RunSpec(sim, sim.rollingStart(new Vector3D(rho, 0, -0.15), v), 0.2);
        };
        Grid grid = Grid.of(Axis.linear("speed", 0.3, 1.5, n), Axis.linear("angle_deg", -60, 30, n));
        // warm-up
        Sweep.over(Grid.of(Axis.linear("speed", 0.3, 1.5, 20), Axis.linear("angle_deg", -60, 30, 20)))
            .threads(2).runAll(factory);
        long[] hash = new long[2];
        double[] seconds = new double[2];
        for (int threads = 1; threads <= 2; threads++) {
            AtomicLong h = new AtomicLong(17);
            long t0 = System.nanoTime();
            Sweep.over(grid).threads(threads).run(factory, run -> h.set(h.get() * 31 + run.result()
                .map(r -> Double.doubleToLongBits(r.endState().centre().getZ()) ^ r.evaluations()).orElse(-1L)));
            seconds[threads - 1] = (System.nanoTime() - t0) * 1e-9;
            hash[threads - 1] = h.get();
        }
        System.out.println("| sweep of " + grid.size() + " runs x 0.2 s (vertical tube, Coulomb) | value |");
        System.out.println("|---|---|");
        System.out.printf(Locale.ROOT, "| 1 thread | %.2f s |%n", seconds[0]);
        System.out.printf(Locale.ROOT, "| 2 threads | %.2f s (target < 5 s) |%n", seconds[1]);
        System.out.printf(Locale.ROOT, "| speed-up 2 vs 1 thread | %.2f (target >= 1.7) |%n", seconds[0] / seconds[1]);
        System.out.println("| rows identical on 1 and 2 threads | " + (hash[0] == hash[1]) + " |");
        if (hash[0] != hash[1]) {
            throw new IllegalStateException("sweep rows differ between 1 and 2 threads");
        }
    }
}
