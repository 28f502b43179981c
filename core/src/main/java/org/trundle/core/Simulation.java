package org.trundle.core;

import org.trundle.core.internal.Checks;

import java.util.List;

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
 * <p>A scene of several patches ({@link Builder#patch}) is run the same way: the ball touches one
 * patch at a time; where its contact point crosses an edge onto a neighbouring patch that continues
 * the surface it is handed over (event {@code handover}); leaving every patch is flight (event
 * {@code exit}), in which impacts are found against every patch; a flight start needs no closest
 * point. A simulation built with one {@link Builder#surface} is a one-patch scene.
 *
 * <p>Immutable and thread-safe: each {@link #run} owns its workspaces, so one simulation may run
 * many starts in parallel with identical results to sequential runs.
 */
public final class Simulation {
    /** Id of the one patch of a simulation built with {@link Builder#surface}. */
    public static final String SINGLE_PATCH = "surface";

    private final Ball ball;
    private final List<Patch> patches;
    /** Whether the scene was given as patches (else: one surface, with an optional motion). */
    private final boolean scene;
    private final Surface surface;
    private final SurfaceMotion motion;
    private final ContactLaw law;
    private final Vector3D gravity;
    private final AppliedLoad load;
    private final SolverSettings settings;
    /** The run's compliant contact (of every patch without its own), or null. */
    private final Compliance compliance;
    /** The immutable problem handed to the engine. */
    private final Model model;

    private Simulation(Builder b) {
        if (b.ball == null) {
            throw new IllegalArgumentException("ball must be given, got null");
        }
        if (b.surface == null && b.patches.isEmpty()) {
            throw new IllegalArgumentException("surface must be given, got null");
        }
        if (b.surface != null && !b.patches.isEmpty()) {
            throw new IllegalArgumentException("give either one surface or a scene of patches, got a surface and "
                + b.patches.size() + " patches");
        }
        if (b.law == null) {
            throw new IllegalArgumentException("contact law must be given, got null");
        }
        if (b.gravity == null) {
            throw new IllegalArgumentException("gravity must be given, got none: call gravity(g) with the "
                + "acceleration in m/s² (for Earth with z up, new Vector3D(0, 0, -9.81)), or noGravity() for a run "
                + "without gravity");
        }
        this.ball = b.ball;
        this.scene = !b.patches.isEmpty();
        this.patches = scene ? List.copyOf(b.patches)
            : List.of(new Patch(SINGLE_PATCH, b.surface, b.motion, null));
        this.surface = patches.get(0).surface();
        this.motion = patches.get(0).motion();
        this.law = b.law;
        java.util.Set<String> ids = new java.util.HashSet<>();
        for (Patch p : patches) {
            if (!ids.add(p.id())) {
                throw new IllegalArgumentException("patch ids must be unique, got \"" + p.id() + "\" twice");
            }
        }
        this.gravity = Checks.finite("gravity", b.gravity);
        this.load = b.load == null ? AppliedLoad.NONE : b.load;
        this.settings = b.settings == null ? SolverSettings.defaults() : b.settings;
        this.compliance = b.compliance;
        for (Patch p : patches) {
            double kmax = p.surface().maxConcaveCurvature();
            // NaN: unknown in advance, checked during the run; +∞: no ball fits (Surface#maxConcaveCurvature)
            if (!Double.isNaN(kmax) && !(ball.radius() * kmax < 1.0)) {
                throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "ball of radius %s m does not fit surface %s: r*kappa_max = %s >= 1 "
                        + "(smallest concave radius of curvature %s m)",
                    ball.radius(), p.surface().name(), ball.radius() * kmax, 1.0 / kmax));
            }
        }
        List<Patch> resolved = new java.util.ArrayList<>();
        for (Patch p : patches) {
            ContactLaw l = p.law() != null ? p.law() : law;
            l.restitution().ifPresent(e -> {
                if (!(e >= 0 && e <= 1)) {
                    throw new IllegalArgumentException("restitution must lie in [0, 1], got " + e);
                }
            });
            Patch withLaw = p.withLaw(l);
            resolved.add(p.compliance() != null || compliance == null ? withLaw : withLaw.withCompliance(compliance));
        }
        this.model = new Model(ball, resolved, law, gravity, load, settings, ContextAccessor.INSTANCE);
    }

    /** @return the immutable model the engine runs (internal use: {@code RightHandSide}) */
    Model model() {
        return model;
    }

    /**
     * @return a new builder; gravity has no default (give it with {@link Builder#gravity} or say
     *     {@link Builder#noGravity}), the applied load defaults to none, the settings to
     *     {@link SolverSettings#defaults()}
     */
    public static Builder builder() {
        return new Builder();
    }

    /** @return a builder holding this simulation's configuration */
    public Builder toBuilder() {
        Builder b = new Builder().ball(ball).law(law).gravity(gravity).load(load).settings(settings)
            .compliance(compliance);
        if (scene) {
            patches.forEach(b::patch);
        } else {
            b.surface(surface).motion(motion);
        }
        return b;
    }

    /** @return the ball */
    public Ball ball() {
        return ball;
    }

    /** @return the surface (of the first patch in a scene) */
    public Surface surface() {
        return surface;
    }

    /**
     * @return the scene's patches as given (a simulation built with one surface has one patch,
     *     id {@value #SINGLE_PATCH})
     */
    public List<Patch> patches() {
        return patches;
    }

    /** @return the surface's rigid motion (of the first patch in a scene; {@link SurfaceMotion#NONE} when it stands still) */
    public SurfaceMotion motion() {
        return motion;
    }

    /**
     * @return the run's compliant contact ({@link Builder#compliance}: every patch without its own
     *     {@link Patch#compliance()} is compliant with it), or empty when the run gives none
     */
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
     * A consistent rolling start at time 0 with a given spin about the normal. A centre touching several
     * patches (a ball in a V-groove, on two rails, between two races) gets the spin that rolls without slip at
     * every contact and {@code normalSpin} is not used (the contacts fix the spin); when the velocity allows no
     * such spin (a ball at rest between a turning race and a still one) it rolls on the patch touched most
     * closely and the run starts the others sliding. On a moving surface
     * the spin rolls relative to the surface under the ball: {@code ω = Ω + (n × (v − u(c)))/r + ω_n n},
     * so that the contact point moves with the surface, {@code v − r ω × n = u(p)}, with {@code Ω} the
     * surface's spin and {@code u} its velocity field at time 0.
     *
     * @param centre centre (m), at distance r from the surface
     * @param velocity centre velocity (m/s), tangent to the surface
     * @param normalSpin spin about the normal relative to the surface, {@code (ω − Ω)·n} (rad/s)
     * @return the start state
     */
    public BallState rollingStart(Vector3D centre, Vector3D velocity, double normalSpin) {
        Checks.finite("centre", centre);
        Checks.finite("velocity", velocity);
        Checks.finite("normalSpin", normalSpin);
        Patch touched = patches.get(0);
        ContactGeometry g = null;
        RuntimeException failure = null;
        for (Patch p : patches) {
            try {
                ContactGeometry gp = geometryAt(p, centre, 0.0);
                if (g == null || Math.abs(gp.distance - ball.radius()) < Math.abs(g.distance - ball.radius())) {
                    g = gp;
                    touched = p;
                }
            } catch (SurfaceDomainException e) {
                failure = e;
            }
        }
        if (g == null) {
            throw new IllegalArgumentException("centre " + centre + " has no contact normal: " + failure.getMessage(),
                failure);
        }
        java.util.List<Patch> touchedPatches = new java.util.ArrayList<>();
        java.util.List<ContactGeometry> several = touchedGeometry(centre, touchedPatches);
        if (several.size() > 1) {
            BallState s = severalContactsStart(centre, velocity, several, touchedPatches);
            if (s != null) {
                return s;
            }
            // the velocity cannot roll on every patch: roll on the one touched most closely (the run's start
            // lets the others slip)
        }
        SurfaceMotion motion = touched.motion();
        Vector3D n = new Vector3D(g.normal[0], g.normal[1], g.normal[2]);
        Vector3D relative = velocity;
        Vector3D surfaceSpin = Vector3D.ZERO;
        if (!motion.stationary()) {
            MotionState pose = new MotionState();
            motion.at(0.0, pose);
            double[] u = new double[3];
            pose.velocityAt(centre.toArray(), u);
            relative = velocity.subtract(new Vector3D(u));
            surfaceSpin = new Vector3D(pose.spin);
        }
        Vector3D spin = Vector3D.crossProduct(n, relative).scalarMultiply(1.0 / ball.radius())
            .add(normalSpin, n).add(surfaceSpin);
        return BallState.of(0.0, centre, velocity, org.hipparchus.geometry.euclidean.threed.Rotation.IDENTITY,
            spin, Phase.ROLLING);
    }

    /**
     * The geometry of every patch that touches a ball centred at {@code centre} at time 0 (distance r within the
     * contact tolerance, contact point on the patch), scene order; the patches into {@code touchedPatches}.
     */
    private java.util.List<ContactGeometry> touchedGeometry(Vector3D centre, java.util.List<Patch> touchedPatches) {
        java.util.List<ContactGeometry> out = new java.util.ArrayList<>();
        if (patches.size() < 2) {
            return out;
        }
        double tol = settings.contactTolerance() * ball.radius();
        for (Patch p : patches) {
            try {
                ContactGeometry gp = geometryAt(p, centre, 0.0);
                if (Math.abs(gp.distance - ball.radius()) <= tol && gp.patchMargin >= 0) {
                    out.add(gp);
                    touchedPatches.add(p);
                }
            } catch (SurfaceDomainException e) {
                // no closest point here: not touched
            }
        }
        return out;
    }

    /**
     * A rolling start touching several patches at once: the spin that rolls without slip at every contact,
     * {@code v − u_i(c) = r (ω − Ω_i) × n_i} for each patch (its velocity field {@code u_i} and spin {@code Ω_i}
     * at time 0; zero for a still patch), in the least-squares sense:
     * {@code Σ (1 − n_i n_iᵀ) ω = Σ n_i × t_i} with {@code t_i = (v − u_i(c))/r + Ω_i × n_i} (the normal equations of
     * {@code min Σ |ω × n_i − t_i|²}; exact when the velocity is one the contacts allow, e.g. along a groove or
     * the rails, or the cage speed between two races; the spin is then fixed by the contacts, so no spin about
     * a normal can be given; minimum-norm, so with antipodal contacts the spin about their common normal is zero).
     * When no spin rolls on every patch (the velocity is not one they allow) this returns null and the start rolls
     * on the patch touched most closely, the others slipping from the start.
     */
    private BallState severalContactsStart(Vector3D centre, Vector3D velocity, java.util.List<ContactGeometry> geos,
                                           java.util.List<Patch> touched) {
        double r = ball.radius();
        double[][] a = new double[3][3];
        double[] b = new double[3];
        int count = geos.size();
        Vector3D[] normals = new Vector3D[count];
        Vector3D[][] rels = new Vector3D[count][];
        for (int p = 0; p < count; p++) {
            double[] nn = geos.get(p).normal;
            Vector3D n = new Vector3D(nn[0], nn[1], nn[2]);
            normals[p] = n;
            rels[p] = relativeTo(touched.get(p), centre, velocity);
            for (int i = 0; i < 3; i++) {
                for (int j = 0; j < 3; j++) {
                    a[i][j] += (i == j ? 1 : 0) - nn[i] * nn[j];
                }
            }
            Vector3D target = rels[p][0].scalarMultiply(1.0 / r).add(Vector3D.crossProduct(rels[p][1], n));
            Vector3D rhs = Vector3D.crossProduct(n, target);
            b[0] += rhs.getX();
            b[1] += rhs.getY();
            b[2] += rhs.getZ();
        }
        // minimum-norm least squares (SVD): with antipodal contacts (a ball between two races) the spin about the
        // common normal is free and taken as zero
        double[] w = new org.hipparchus.linear.SingularValueDecomposition(
            new org.hipparchus.linear.Array2DRowRealMatrix(a)).getSolver()
            .solve(new org.hipparchus.linear.ArrayRealVector(b)).toArray();
        Vector3D spin = new Vector3D(w);
        // the run's start check uses the contact tolerance times its speed scale, at least this
        double tolSpeed = settings.contactTolerance()
            * Math.max(Math.max(velocity.getNorm(), Math.sqrt(gravity.getNorm() * r)), 1e-3);
        for (int p = 0; p < count; p++) {
            Vector3D n = normals[p];
            Vector3D relative = rels[p][0];
            Vector3D patchSpin = rels[p][1];
            Vector3D slip = relative.subtract(Vector3D.crossProduct(spin.subtract(patchSpin), n).scalarMultiply(r));
            if (slip.subtract(n.scalarMultiply(slip.dotProduct(n))).getNorm() > tolSpeed) {
                return null;
            }
        }
        return BallState.of(0.0, centre, velocity, org.hipparchus.geometry.euclidean.threed.Rotation.IDENTITY,
            spin, Phase.ROLLING);
    }

    /** The velocity relative to a patch at time 0, {@code v − u(c)}, and the patch's spin Ω (zero for a still one). */
    private static Vector3D[] relativeTo(Patch patch, Vector3D centre, Vector3D velocity) {
        SurfaceMotion motion = patch.motion();
        if (motion.stationary()) {
            return new Vector3D[] {velocity, Vector3D.ZERO};
        }
        MotionState pose = new MotionState();
        motion.at(0.0, pose);
        double[] u = new double[3];
        pose.velocityAt(centre.toArray(), u);
        return new Vector3D[] {velocity.subtract(new Vector3D(u)), new Vector3D(pose.spin)};
    }

    /**
     * Queries the surface (of the first patch in a scene), where it is at time {@code t}, at a point
     * (convenience for setup code; allocates).
     *
     * @param x query point (m)
     * @param t time (s)
     * @return the contact geometry
     */
    public ContactGeometry geometryAt(Vector3D x, double t) {
        return geometryAt(patches.get(0), x, t);
    }

    private static ContactGeometry geometryAt(Patch p, Vector3D x, double t) {
        Surface surface = p.surface();
        SurfaceMotion motion = p.motion();
        ContactGeometry g = new ContactGeometry();
        g.scratch = surface.newScratch();
        if (motion.stationary()) {
            surface.query(t, x.toArray(), g);
        } else {
            MotionState pose = new MotionState();
            motion.at(t, pose);
            pose.query(surface, t, x.toArray(), g);
        }
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
        private SurfaceMotion motion = SurfaceMotion.NONE;
        private final List<Patch> patches = new java.util.ArrayList<>();
        private ContactLaw law;
        private Vector3D gravity;
        private AppliedLoad load = AppliedLoad.NONE;
        private SolverSettings settings = SolverSettings.defaults();
        private Compliance compliance;

        private Builder() {
        }

        /**
         * Makes the contact compliant on every patch that gives no compliance of its own
         * ({@link Patch#withCompliance}; for a simulation of one {@link #surface}, that patch): instead of the
         * rigid constraints, the ball moves as in flight under gravity, applied loads and the force of every
         * compliant patch it presses ({@link Compliance}: Hertz law with Hunt–Crossley damping; each patch's
         * law gives the friction, regularised below the settle speed, and its couples), summed. Each compliant
         * contact starts with its own {@code impact} event (its damping set from the normal speed relative to
         * the patch then) and ends with its own {@code lift_off} event; the phase stays {@code flight}; samples
         * report one contact per patch pressed. A moving compliant patch acts relative to its motion (approach,
         * slip and the law's spin relative to the patch) and the power it puts in is booked as drive work.
         *
         * <p>A scene may mix compliant and rigid patches, and the ball may touch both kinds at once: during a
         * rigid contact phase (rolling or sliding on rigid patches) the wrench of the compliant patches it presses
         * (force and couple about the centre) acts as an applied load in the rigid closed forms, its damping,
         * friction and drive work booked as in flight; the rest test is not watched while a compliant contact is
         * under way. A scene with a compliant patch integrates every state component in every phase.
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
         * Adds a patch to the scene (instead of one {@link #surface}).
         *
         * @param p the patch
         * @return this builder
         */
        public Builder patch(Patch p) {
            if (p == null) {
                throw new IllegalArgumentException("patch must be given, got null");
            }
            this.patches.add(p);
            return this;
        }

        /**
         * @param m the surface's rigid motion (the surface is given at its rest pose, where it is at
         *     {@code m}'s identity); {@link SurfaceMotion#NONE} or null for a still surface
         * @return this builder
         */
        public Builder motion(SurfaceMotion m) {
            this.motion = m;
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
         * Sets the gravitational acceleration. It has no default: a simulation built without
         * {@code gravity} or {@link #noGravity()} is refused, so that a forgotten gravity is not taken
         * for zero (the scenario runner's default is {@code (0, 0, −9.81)} m/s², z up).
         *
         * @param g gravitational acceleration (m/s²), any direction, finite (checked by {@link #build()});
         *     {@link Vector3D#ZERO} for none
         * @return this builder
         */
        public Builder gravity(Vector3D g) {
            this.gravity = g;
            return this;
        }

        /**
         * Says that the run has no gravity (the same as {@code gravity(Vector3D.ZERO)}): free flight
         * is straight, and contact needs a load or an inward curvature to hold the ball.
         *
         * @return this builder
         */
        public Builder noGravity() {
            this.gravity = Vector3D.ZERO;
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
