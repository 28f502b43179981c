package org.trundle.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.surfaces.Plane;

/**
 * Timing of the flights that leave for good: a ball flying away from a plane in zero gravity with
 * a duration of 10⁶ s and, through the API, of 3e99 s must end at once
 * ({@link EndReason#LEFT_FOR_GOOD}) instead of stepping through empty space. Each duration is run
 * once cold (a fresh JVM: class loading and interpretation included) and then 1,000 times warm;
 * wall time and the thread's CPU time are printed (the CPU time is the figure to trust on a
 * shared machine).
 *
 * <p>Usage: {@code java -cp benchmarks/jmh/target/trundle-benchmarks.jar org.trundle.bench.FlightEndCheck};
 * exits with status 1 when a run does not end left for good or a cold run takes a second or more.
 */
public final class FlightEndCheck {
    private FlightEndCheck() {
    }

    /**
     * @param args none
     */
    public static void main(String[] args) {
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        Simulation sim = Simulation.builder().ball(Ball.solid(0.01, 0.02)).surface(new Plane(Vector3D.ZERO, Vector3D.PLUS_K))
            .law(new PureRolling()).gravity(Vector3D.ZERO).build();
        BallState start = BallState.flying(new Vector3D(0, 0, 0.05), new Vector3D(0.3, 0, 0.2), Vector3D.ZERO);
        boolean ok = true;
        for (double duration : new double[] {1e6, 3e99}) {
            long w0 = System.nanoTime();
            long c0 = mx.getCurrentThreadCpuTime();
            RunResult r = sim.run(start, duration);
            double wall = (System.nanoTime() - w0) * 1e-9;
            double cpu = (mx.getCurrentThreadCpuTime() - c0) * 1e-9;
            int warm = 1000;
            long w1 = System.nanoTime();
            long c1 = mx.getCurrentThreadCpuTime();
            for (int i = 0; i < warm; i++) {
                r = sim.run(start, duration);
            }
            double wallWarm = (System.nanoTime() - w1) * 1e-9 / warm;
            double cpuWarm = (mx.getCurrentThreadCpuTime() - c1) * 1e-9 / warm;
            System.out.println(String.format(Locale.ROOT,
                "duration %.0e s: %s at t = %s s, %d evaluations; cold run %.3f s wall, %.3f s CPU;"
                    + " warm run %.1f µs wall, %.1f µs CPU (mean of %d)",
                duration, r.endReason().label(), r.endState().time(), r.evaluations(), wall, cpu, wallWarm * 1e6,
                cpuWarm * 1e6, warm));
            ok &= r.endReason() == EndReason.LEFT_FOR_GOOD && wall < 1.0;
        }
        if (!ok) {
            System.exit(1);
        }
    }
}
