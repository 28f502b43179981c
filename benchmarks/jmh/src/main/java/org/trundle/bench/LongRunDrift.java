package org.trundle.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Locale;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.Integrator;
import org.trundle.core.RunObserver;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Side;
import org.trundle.surfaces.Sphere;

/**
 * Energy drift of long conservative rolling runs (issue 16, target 5): the vertical tube
 * ({@link VerticalTubeCase}), the ring groove of {@link CurvedCases#TORUS_GROOVE} and a ball in a bowl (invented example data: a solid ball of radius 10 mm
 * and mass 30 g inside a spherical bowl of radius 50 mm, started 30° up the side with a horizontal
 * speed of 0.3 m/s across it, so that it circles and its orbit precesses), pure rolling, integrated with
 * Dormand–Prince 8(5,3) at the default tolerance and with the symmetric projection option
 * ({@link Integrator#SYMMETRIC_PROJECTION}, orders 4 and 6, fixed step h) over the same simulated time.
 *
 * <p>Measured: the relative energy error {@code |E(t) − E₀| / K₀} ({@code K₀} the start's kinetic
 * energy) at samples every {@code 10 h} (step ends of the symmetric method); its envelope, the largest
 * value in each of the windows {@code [T/2^{j+1}, T/2^j)}, j = 0 … 7; the growth exponent, the
 * least-squares slope of {@code log envelope} against {@code log t} over those windows (about 1 for an
 * error that grows linearly in time, 0.5 for a random walk of rounding, 0 for a bounded one); and the
 * cost per simulated second: right-hand-side evaluations and CPU time of the running thread
 * ({@link ThreadMXBean}; the machine is shared, so wall time is not reported).
 *
 * <p>Usage: {@code java -cp benchmarks/jmh/target/trundle-benchmarks.jar org.trundle.bench.LongRunDrift
 * [steps [h [cases]]]} (defaults 1,000,000 steps of 1 ms: 1000 s simulated per case; cases a comma-separated
 * list of "vertical tube", "bowl", "ring groove", default all three). Each run is preceded by a
 * warm-up run of a tenth of its time. Prints a Markdown table.
 */
public final class LongRunDrift {
    private static final int WINDOWS = 8;

    private LongRunDrift() {
    }

    /**
     * @param args optional number of symmetric steps (default 1,000,000), step h (s, default 1e-3) and cases
     *     (comma-separated, default all)
     */
    public static void main(String[] args) {
        long steps = args.length > 0 ? Long.parseLong(args[0]) : 1_000_000L;
        double h = args.length > 1 ? Double.parseDouble(args[1]) : 1e-3;
        if (steps < 1000) {
            throw new IllegalArgumentException("steps must be at least 1000, got " + steps);
        }
        if (!(h > 0)) {
            throw new IllegalArgumentException("h must be positive, got " + h);
        }
        double duration = steps * h;
        System.out.printf(Locale.ROOT, "%d symmetric steps of %s s: %.0f s simulated per case%n%n", steps, h, duration);
        System.out.println("| case | integrator | growth exponent | envelope, first window | envelope, last window"
            + " | RHS evals / sim. s | CPU ms / sim. s | steps | end |");
        System.out.println("|---|---|---|---|---|---|---|---|---|");
        String[] cases = args.length > 2 ? args[2].split(",") : new String[] {"vertical tube", "bowl", "ring groove"};
        for (String name : cases) {
            for (int order : new int[] {0, 4, 6}) {
                SolverSettings set = SolverSettings.defaults().withMaxEvaluations(Long.MAX_VALUE / 4)
                    .withSampleInterval(10 * h);
                if (order > 0) {
                    set = set.withIntegrator(Integrator.SYMMETRIC_PROJECTION).withFixedStep(h).withSymmetricOrder(order);
                }
                Simulation sim;
                BallState start;
                if (name.equals("bowl")) {
                    Ball ball = Ball.solid(0.01, 0.03);
                    sim = Simulation.builder().ball(ball).surface(new Sphere(Vector3D.ZERO, 0.05, Side.INSIDE))
                        .law(new PureRolling()).gravity(new Vector3D(0, 0, -9.81)).settings(set).build();
                    double rho = 0.04;
                    double a = Math.toRadians(30);
                    start = sim.rollingStart(new Vector3D(rho * Math.sin(a), 0, -rho * Math.cos(a)),
                        new Vector3D(0, 0.3, 0));
                } else if (name.equals("ring groove")) {
                    sim = CurvedCases.TORUS_GROOVE.simulation(set);
                    start = CurvedCases.TORUS_GROOVE.start(sim);
                } else if (name.equals("vertical tube")) {
                    VerticalTubeCase tube = new VerticalTubeCase(set);
                    sim = tube.simulation();
                    start = tube.start();
                } else {
                    throw new IllegalArgumentException("case must be \"vertical tube\", \"bowl\" or \"ring groove\", got \""
                        + name + "\"");
                }
                row(name, order > 0 ? "symmetric, order " + order + ", h = " + h + " s"
                    : "Dormand–Prince 8(5,3), tol 1e-10", sim, start, duration);
            }
        }
    }

    private static void row(String name, String method, Simulation sim, BallState start, double duration) {
        // warm-up: the same run over a tenth of the time (at least a second), so the measured one runs compiled code
        sim.run(start, Math.max(1.0, 0.1 * duration));
        Envelope env = new Envelope(sim, start, duration);
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        long cpu0 = mx.getCurrentThreadCpuTime();
        RunResult res = sim.run(start, duration, env);
        double cpu = (mx.getCurrentThreadCpuTime() - cpu0) / 1e6;
        System.out.printf(Locale.ROOT, "| %s | %s | %.3f | %.2e | %.2e | %.0f | %.1f | %d | %s |%n", name, method,
            env.slope(), env.max[WINDOWS - 1], env.max[0], res.evaluations() / duration, cpu / duration, res.steps(),
            res.endReason().label());
    }

    /** Keeps the largest relative energy error per window {@code [T/2^{j+1}, T/2^j)}. */
    private static final class Envelope implements RunObserver {
        private final Simulation sim;
        private final double e0;
        private final double k0;
        private final double t0;
        private final double span;
        final double[] max = new double[WINDOWS];

        Envelope(Simulation sim, BallState start, double span) {
            this.sim = sim;
            this.e0 = sim.energy(start);
            this.k0 = start.kineticEnergy(sim.ball());
            this.t0 = start.time();
            this.span = span;
        }

        @Override
        public void sample(Sample s) {
            double t = s.time() - t0;
            if (!(t > 0)) {
                return;
            }
            int j = (int) Math.floor(Math.log(span / t) / Math.log(2));
            if (j < 0 || j >= WINDOWS) {
                return;
            }
            max[j] = Math.max(max[j], Math.abs(sim.energy(s.state()) - e0) / k0);
        }

        /** Least-squares slope of log(max) against log(window midpoint). */
        double slope() {
            double sx = 0;
            double sy = 0;
            double sxx = 0;
            double sxy = 0;
            int n = 0;
            for (int j = 0; j < WINDOWS; j++) {
                if (max[j] > 0) {
                    double x = Math.log(0.75 * span / Math.pow(2, j));
                    double y = Math.log(max[j]);
                    sx += x;
                    sy += y;
                    sxx += x * x;
                    sxy += x * y;
                    n++;
                }
            }
            return (n * sxy - sx * sy) / (n * sxx - sx * sx);
        }
    }
}
