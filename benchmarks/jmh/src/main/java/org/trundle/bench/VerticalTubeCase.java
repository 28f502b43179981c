package org.trundle.bench;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.bench.baseline.VerticalTubeRolling;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Side;

/**
 * The vertical-tube rolling scenario shared by the benchmarks, the baseline comparison test and
 * the work–precision table (invented example data): a solid ball of radius 4 mm and mass 2.1 g
 * rolling without slip on the inside of a vertical bore of radius 15 mm, started at height 0 with
 * a horizontal centre speed of 0.8 m/s and no spin about the radial direction, under
 * {@code g = 9.81 m/s²}.
 *
 * <p>Reference values (Gualtieri, Tokieda et al., Am. J. Phys. 74 (2006) 497–501, and the hand
 * derivation in {@link VerticalTubeRolling}): orbital rate {@code Ω = u/ρ} with
 * {@code ρ = R − r}, height frequency {@code λ = Ω sqrt(k/(1+k))}, mean height
 * {@code −g/(kΩ²)} (for {@code z₀ = 0}, {@code ω_r(0) = 0}), amplitude equal to minus the mean.
 *
 * <p>Immutable.
 */
public final class VerticalTubeCase {
    /** Gravitational acceleration (m/s²). */
    public static final double G = 9.81;
    /** Tube radius R (m). */
    public static final double TUBE_RADIUS = 0.015;
    /** Ball radius r (m). */
    public static final double BALL_RADIUS = 0.004;
    /** Ball mass m (kg). */
    public static final double MASS = 0.0021;
    /** Start centre speed u (m/s), horizontal. */
    public static final double SPEED = 0.8;

    private final Ball ball;
    private final Simulation simulation;
    private final BallState start;

    /** The scenario with the library's default solver settings. */
    public VerticalTubeCase() {
        this(SolverSettings.defaults());
    }

    /**
     * @param settings solver settings of the library run
     */
    public VerticalTubeCase(SolverSettings settings) {
        ball = Ball.solid(BALL_RADIUS, MASS);
        Cylinder tube = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, TUBE_RADIUS, Side.INSIDE);
        simulation = Simulation.builder().ball(ball).surface(tube).law(new PureRolling())
            .gravity(new Vector3D(0, 0, -G)).settings(settings).build();
        start = simulation.rollingStart(new Vector3D(TUBE_RADIUS - BALL_RADIUS, 0, 0), new Vector3D(0, SPEED, 0));
    }

    /** @return the ball */
    public Ball ball() {
        return ball;
    }

    /** @return the library simulation, as a user would configure it */
    public Simulation simulation() {
        return simulation;
    }

    /** @return the consistent rolling start state */
    public BallState start() {
        return start;
    }

    /** @return the start state in the baseline's 13-component layout (c, v, q, ω) */
    public double[] baselineStart() {
        return baselineState(start);
    }

    /**
     * A ball state in the baseline's 13-component layout: centre, velocity, the Hamilton quaternion
     * body to world scalar first (Hipparchus' {@code Rotation} stores its conjugate, so the vector
     * part changes sign), spin.
     *
     * @param s the state
     * @return a new array
     */
    public static double[] baselineState(BallState s) {
        Rotation q = s.orientation();
        Vector3D c = s.centre();
        Vector3D v = s.velocity();
        Vector3D w = s.spin();
        return new double[] {c.getX(), c.getY(), c.getZ(), v.getX(), v.getY(), v.getZ(),
            q.getQ0(), -q.getQ1(), -q.getQ2(), -q.getQ3(), w.getX(), w.getY(), w.getZ()};
    }

    /** @return a fresh hand-derived baseline for this scenario */
    public VerticalTubeRolling baseline() {
        return new VerticalTubeRolling(BALL_RADIUS, ball.inertiaFactor(), G);
    }

    /** @return centre distance from the axis ρ = R − r (m) */
    public static double orbitRadius() {
        return TUBE_RADIUS - BALL_RADIUS;
    }

    /** @return orbital rate Ω = u/ρ (rad/s) */
    public static double orbitalRate() {
        return SPEED / orbitRadius();
    }

    /** @return analytic height frequency λ = Ω sqrt(k/(1+k)) (rad/s) */
    public static double heightFrequency() {
        double k = Ball.SOLID;
        return orbitalRate() * Math.sqrt(k / (1 + k));
    }

    /** @return analytic mean height −g/(kΩ²) (m) */
    public static double meanHeight() {
        double om = orbitalRate();
        return -G / (Ball.SOLID * om * om);
    }

    /** @return height oscillation period 2π/λ (s) */
    public static double period() {
        return 2 * Math.PI / heightFrequency();
    }

    /**
     * Relative error of the height frequency from a state reached after a whole number of periods.
     * With {@code z − z̄ = A cos θ}, {@code ż = −λ A sin θ}, the phase reached is
     * {@code θ = atan2(−ż/λ, z − z̄)}; after {@code N} exact periods it should be {@code 2πN}, so the
     * mean frequency error is {@code θ/(2πN)} (first order in the phase error; amplitude errors
     * enter only at second order).
     *
     * @param z height at the end (m)
     * @param vz vertical velocity at the end (m/s)
     * @param periods number N of whole periods simulated
     * @return signed relative frequency error (numerical minus analytic, over analytic)
     */
    public static double frequencyError(double z, double vz, int periods) {
        double lam = heightFrequency();
        double theta = Math.atan2(-vz / lam, z - meanHeight());
        return theta / (2 * Math.PI * periods);
    }
}
