package org.trundle.core;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.engine.Engine;
import org.trundle.core.engine.Model;

/**
 * A configured ball–surface problem and its solver: the entry point of the library.
 *
 * <pre>{@code
 * Simulation sim = Simulation.builder()
 *     .ball(Ball.solid(0.004, 0.00105))
 *     .surface(someSurface)
 *     .law(someLaw)
 *     .gravity(new Vector3D(0, 0, -9.81))
 *     .build();
 * RunResult result = sim.run(sim.rollingStart(centre, velocity), 1.0);
 * }</pre>
 *
 * <p>The run integrates the hybrid system of {@link Phase}s with Hipparchus' Dormand–Prince
 * 8(5,3) integrator; every phase switch and the patch exit are located by event detection
 * (lift-off: {@code F_n = 0}; slip onset: grip minus needed tangential force {@code = 0}; stick:
 * slip speed {@code = ε}; exit: patch margin {@code = 0}; impact: {@code d − r = 0}), never by
 * checking once per step. In contact the centre is projected back to {@code d = r} when the
 * distance residual passes {@link SolverSettings#projectionThreshold()} (and the residual is
 * reported).
 *
 * <p>Immutable and thread-safe: each {@link #run} owns its workspaces, so one simulation may run
 * many starts in parallel with identical results to sequential runs.
 */
public final class Simulation {
    private final Ball ball;
    private final Surface surface;
    private final ContactLaw law;
    private final Vector3D gravity;
    private final AppliedLoad load;
    private final SolverSettings settings;
    /** The patch's compliant contact, or null for the rigid contact. */
    private final Compliance compliance;
    /** The immutable problem handed to the engine. */
    private final Model model;

    private Simulation(Builder b) {
        if (b.ball == null) {
            throw new IllegalArgumentException("ball must be given, got null");
        }
        if (b.surface == null) {
            throw new IllegalArgumentException("surface must be given, got null");
        }
        if (b.law == null) {
            throw new IllegalArgumentException("contact law must be given, got null");
        }
        this.ball = b.ball;
        this.surface = b.surface;
        this.law = b.law;
        this.gravity = Checks.finite("gravity", b.gravity);
        this.load = b.load == null ? AppliedLoad.NONE : b.load;
        this.settings = b.settings == null ? SolverSettings.defaults() : b.settings;
        this.compliance = b.compliance;
        double kmax = surface.maxConcaveCurvature();
        if (Double.isFinite(kmax) && ball.radius() * kmax >= 1.0) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                "ball of radius %s m does not fit surface %s: r*kappa_max = %s >= 1 "
                    + "(smallest concave radius of curvature %s m)",
                ball.radius(), surface.name(), ball.radius() * kmax, 1.0 / kmax));
        }
        law.restitution().ifPresent(e -> {
            if (!(e >= 0 && e <= 1)) {
                throw new IllegalArgumentException("restitution must lie in [0, 1], got " + e);
            }
        });
        this.model = new Model(ball, surface, law, gravity, load, settings, compliance, ContextAccessor.INSTANCE);
    }

    /** @return the immutable model the engine runs (internal use: {@code RightHandSide}) */
    Model model() {
        return model;
    }

    /** @return a new builder; gravity defaults to zero, the applied load to none */
    public static Builder builder() {
        return new Builder();
    }

    /** @return a builder holding this simulation's configuration */
    public Builder toBuilder() {
        return new Builder().ball(ball).surface(surface).law(law).gravity(gravity).load(load).settings(settings)
            .compliance(compliance);
    }

    /** @return the ball */
    public Ball ball() {
        return ball;
    }

    /** @return the surface */
    public Surface surface() {
        return surface;
    }

    /** @return the patch's compliant contact, or empty for the rigid contact */
    public java.util.Optional<Compliance> compliance() {
        return java.util.Optional.ofNullable(compliance);
    }

    /** @return the contact law */
    public ContactLaw law() {
        return law;
    }

    /** @return gravitational acceleration (m/s²) */
    public Vector3D gravity() {
        return gravity;
    }

    /** @return the applied load */
    public AppliedLoad load() {
        return load;
    }

    /** @return the solver settings */
    public SolverSettings settings() {
        return settings;
    }

    /**
     * @param s new settings
     * @return a copy with other settings
     */
    public Simulation withSettings(SolverSettings s) {
        return toBuilder().settings(s).build();
    }

    /**
     * Runs from {@code start} for {@code duration} seconds.
     *
     * @param start start state; its phase says what is asked for (rolling, sliding: the centre must
     *     be at distance r from the surface within {@link SolverSettings#contactTolerance()};
     *     flight: anywhere not penetrating)
     * @param duration simulated time (s), finite, positive and long enough to advance the clock
     *     (1000 units in the last place of the end time, the integrator's shortest interval)
     * @return the result
     * @throws IllegalArgumentException for an inconsistent start, naming the quantity and value
     * @throws SimulationException for every failure of the run, with the last good state: a number
     *     past the range of double, an answer from the surface or law that breaks its contract, an
     *     exception thrown by user code (the cause), an interrupt of the thread
     *     ({@link SimulationInterruptedException})
     */
    public RunResult run(BallState start, double duration) {
        return run(start, duration, RunObserver.NONE);
    }

    /**
     * Runs from {@code start} for {@code duration} seconds, streaming samples and events.
     *
     * @param start start state (see {@link #run(BallState, double)})
     * @param duration simulated time (s)
     * @param observer receives samples and events; what it throws ends the run with a
     *     {@link SimulationException} whose cause it is
     * @return the result
     * @throws IllegalArgumentException for an inconsistent start
     * @throws SimulationException for every failure of the run (see {@link #run(BallState, double)})
     */
    public RunResult run(BallState start, double duration, RunObserver observer) {
        Checks.positive("duration", duration);
        if (start == null) {
            throw new IllegalArgumentException("start state must be given, got null");
        }
        double shortest = Engine.shortestInterval(start.time(), start.time() + duration);
        if (!(duration >= shortest)) {
            throw new IllegalArgumentException("duration " + duration + " s is too short to advance the clock from t = "
                + start.time() + " s: the integrator needs at least " + shortest + " s");
        }
        return Engine.run(model, start, duration, observer == null ? RunObserver.NONE : observer);
    }

    /**
     * A consistent rolling start at time 0: spin {@code ω = (n × v)/r + ω_n n}, so that
     * {@code v = r ω × n}, with zero spin about the normal.
     *
     * @param centre centre (m), at distance r from the surface
     * @param velocity centre velocity (m/s), tangent to the surface
     * @return the start state
     */
    public BallState rollingStart(Vector3D centre, Vector3D velocity) {
        return rollingStart(centre, velocity, 0.0);
    }

    /**
     * A consistent rolling start at time 0 with a given spin about the normal.
     *
     * @param centre centre (m), at distance r from the surface
     * @param velocity centre velocity (m/s), tangent to the surface
     * @param normalSpin spin about the normal {@code ω·n} (rad/s)
     * @return the start state
     */
    public BallState rollingStart(Vector3D centre, Vector3D velocity, double normalSpin) {
        Checks.finite("centre", centre);
        Checks.finite("velocity", velocity);
        Checks.finite("normalSpin", normalSpin);
        ContactGeometry g;
        try {
            g = geometryAt(centre, 0.0);
        } catch (SurfaceDomainException e) {
            throw new IllegalArgumentException("centre " + centre + " has no contact normal: " + e.getMessage(), e);
        }
        Vector3D n = new Vector3D(g.normal[0], g.normal[1], g.normal[2]);
        Vector3D spin = Vector3D.crossProduct(n, velocity).scalarMultiply(1.0 / ball.radius())
            .add(normalSpin, n);
        return BallState.of(0.0, centre, velocity, org.hipparchus.geometry.euclidean.threed.Rotation.IDENTITY,
            spin, Phase.ROLLING);
    }

    /**
     * Queries the surface at a point (convenience for setup code; allocates).
     *
     * @param x query point (m)
     * @param t time (s)
     * @return the contact geometry
     */
    public ContactGeometry geometryAt(Vector3D x, double t) {
        ContactGeometry g = new ContactGeometry();
        g.scratch = surface.newScratch();
        surface.query(t, x.toArray(), g);
        return g;
    }

    /**
     * Mechanical energy {@code ½ m|v|² + ½ I|ω|² − m g·c} (J), potential zero at the origin.
     *
     * @param s a state
     * @return the energy (J)
     */
    public double energy(BallState s) {
        return model.energy(s);
    }

    /** Builder of a {@link Simulation}. */
    public static final class Builder {
        private Ball ball;
        private Surface surface;
        private ContactLaw law;
        private Vector3D gravity = Vector3D.ZERO;
        private AppliedLoad load = AppliedLoad.NONE;
        private SolverSettings settings = SolverSettings.defaults();
        private Compliance compliance;

        private Builder() {
        }

        /**
         * Makes the patch's contact compliant: instead of the rigid constraints, the ball moves as in flight
         * under gravity, applied loads and the compliant contact's force ({@link Compliance}: Hertz law with
         * Hunt–Crossley damping; the law gives the friction, regularised below the settle speed, and its
         * couples). The contact starts and ends with {@code impact} and {@code lift_off} events; the phase
         * stays {@code flight}; samples report the contact force while the ball presses the wall.
         *
         * @param c the compliant contact, or null for the rigid contact (the default)
         * @return this builder
         */
        public Builder compliance(Compliance c) {
            this.compliance = c;
            return this;
        }

        /**
         * @param b the ball
         * @return this builder
         */
        public Builder ball(Ball b) {
            this.ball = b;
            return this;
        }

        /**
         * @param s the surface
         * @return this builder
         */
        public Builder surface(Surface s) {
            this.surface = s;
            return this;
        }

        /**
         * @param l the contact law
         * @return this builder
         */
        public Builder law(ContactLaw l) {
            this.law = l;
            return this;
        }

        /**
         * @param g gravitational acceleration (m/s²), any direction
         * @return this builder
         */
        public Builder gravity(Vector3D g) {
            this.gravity = g;
            return this;
        }

        /**
         * @param l applied force and torque
         * @return this builder
         */
        public Builder load(AppliedLoad l) {
            this.load = l;
            return this;
        }

        /**
         * @param s solver settings
         * @return this builder
         */
        public Builder settings(SolverSettings s) {
            this.settings = s;
            return this;
        }

        /**
         * @return the simulation
         * @throws IllegalArgumentException when a part is missing or the ball cannot fit the surface
         */
        public Simulation build() {
            return new Simulation(this);
        }
    }
}
