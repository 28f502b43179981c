package org.trundle.core.engine;

import static org.trundle.core.engine.StateMapper.APPLIED;
import static org.trundle.core.engine.StateMapper.C;
import static org.trundle.core.engine.StateMapper.DAMPING;
import static org.trundle.core.engine.StateMapper.DIM;
import static org.trundle.core.engine.StateMapper.DRIVE;
import static org.trundle.core.engine.StateMapper.LOSS;
import static org.trundle.core.engine.StateMapper.PATH;
import static org.trundle.core.engine.StateMapper.Q;
import static org.trundle.core.engine.StateMapper.V;
import static org.trundle.core.engine.StateMapper.W;
import static org.trundle.core.engine.Vec.cross;
import static org.trundle.core.engine.Vec.dot;
import static org.trundle.core.engine.Vec.mulSym;
import static org.trundle.core.engine.Vec.norm;
import static org.trundle.core.engine.Vec.zero;

import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.trundle.core.AppliedLoad;
import org.trundle.core.Ball;
import org.trundle.core.Compliance;
import org.trundle.core.ContactContext;
import org.trundle.core.ContactGeometry;
import org.trundle.core.ContactLaw;
import org.trundle.core.LossKind;
import org.trundle.core.MotionState;
import org.trundle.core.Phase;

/**
 * The right-hand side of one phase, on primitive arrays, allocation-free.
 *
 * <p>State layout: see {@link StateMapper} (full layout) and {@link StateMapper#layout} (the
 * components integrated per phase); this class is also the integrator's equation, on the compact
 * layout of the current segment. It evaluates the one contact of the {@link ContactSet}'s primary
 * slot with the closed form below (the fast path); when the ball touches several patches at once
 * ({@link ContactSet#multi()}) the forces come from {@link ContactForceSolver} instead (see
 * {@code multiForces}).
 *
 * <p>Several contacts (issue 12; design notes §9): the velocity is integrated (full layout; two rolling
 * contacts on still patches derive it from the spin, {@code v = r ω × n₀}, on the compact rolling layout) and the
 * solve enforces, per rolling contact {@code i}, {@code a − r α × n_i = r ω × (H_i v)} and per sliding
 * contact {@code n_i·a = −vᵀ H_i v}, with Newton–Euler {@code m a = m g + F_app + Σ F_i},
 * {@code I α = τ − r Σ n_i × F_i}; the squeeze between two rolling contacts, which the motion cannot
 * decide, is taken as the split that asks least of friction ({@code min Σ |P_i F_i|²}). The constraints
 * drift at the integration error and are restored by the projection onto every contact's manifold
 * (centre onto every surface; velocity onto every contact's constraints, orthogonally in the
 * kinetic-energy metric; {@link Transitions#projected}) when the drift measure (distance residuals and
 * the slip of rolling contacts against the projection threshold) reaches 1. A law's sliding friction is
 * taken proportional to the normal force there (its ratio at the load {@code m|g|}; exact for Coulomb),
 * and the laws' couples are evaluated at the normal forces of a first solve without them. On a moving
 * patch the constraints are relative to it (see {@code movingContact}) and the drive power is integrated.
 *
 * <p>Rolling (design notes §3): with {@code n}, {@code H} at the centre and the no-slip velocity
 * {@code v = r ω × n}, the constraints {@code n·v = 0}, {@code v − r ω × n = 0} differentiated with
 * {@code ṅ = H v} and Newton–Euler ({@code m a = m g + F + F_app}, {@code I α = −r n × F + τ}) give
 * for the isotropic ball
 * <pre>
 *   F_n = m(−vᵀ H v − n·g) − n·F_app
 *   F_t = k m/(1+k) · [ (τ × n)/(k m r) + r P(ω × H v) − P g − P F_app/m ]
 * </pre>
 * and the centre moves with {@code ċ = r ω × n(c)}, which keeps {@code d(c)} a first integral
 * of the exact flow and the slip identically zero.
 *
 * <p>Sliding (§4): {@code F_n} from the normal constraint with the actual {@code v}; friction
 * {@code −f ŝ} with {@code f} from the law, {@code ŝ} the slip direction; below the stick
 * threshold {@code ε} the direction is held at {@code d₀}: at the onset of sliding the
 * direction opposite the force rolling needed, afterwards the slip direction at the end of the last
 * accepted step, so that the motion is smooth through the band. Flight: gravity and applied loads only.
 *
 * <p>Internal to the solver; public only for {@code RightHandSide}.
 */
public final class Dynamics implements OrdinaryDifferentialEquation {

    private final double r;
    private final double m;
    private final double k;
    private final double inertia;
    private final double invMass;
    private final double invInertia;
    /** 1/(k m r) and k m/(1+k): the rolling coefficients. */
    private final double coupleFactor;
    private final double rollingMass;
    private final double[] g;
    /** The contact slot evaluated (the active one; see {@link #setSlot}). */
    private ContactSlot slot;
    /** Whether the patch moves (then the motion terms of design notes §9 enter). */
    private boolean moving;
    private ContactLaw law;
    private final AppliedLoad load;
    /** The scene's compliant patches' slots (empty for a rigid scene). */
    private ContactSlot[] compliantSlots;
    /** Slip speed (m/s) below which a compliant contact's friction is viscous (regularised Coulomb). */
    double compliantSlipSpeed = 1e-3;
    /** Whether the last flight evaluation found the ball pressing a compliant patch. */
    boolean pressing;
    /** Per slot index: whether the last flight evaluation found the ball pressing that compliant patch. */
    final boolean[] compliantOn;
    /** Per slot index: the compliant contact's normal force (N) of the last flight evaluation. */
    final double[] compliantNormal;
    /** Per slot index: the compliant contact's friction force on the ball (N) of the last flight evaluation. */
    final double[][] compliantFriction;
    /** Per slot index: the compliant contact's slip velocity (m/s) relative to the patch. */
    private final double[][] compliantSlip;
    /** The compliant contact reported as the sample's first (the active slot if pressed, else the first pressed). */
    ContactSlot compliantPrimary;
    /**
     * Whether this evaluation is a rigid contact phase while compliant patches are pressed: their wrench then acts as
     * an applied force and torque about the centre ({@link #fApp}, {@link #tApp}), added after the user's load.
     */
    private boolean compliantWrench;
    /** Whether {@link #fApp}/{@link #tApp} may hold a compliant wrench of an earlier evaluation (then zeroed). */
    private boolean appliedDirty;
    /** Power (W) of the user's applied load alone, when a compliant wrench shares {@link #fApp}. */
    private double userPower;
    // losses and drive power (W) of the compliant contacts of the last evaluation
    private double compSlide;
    private double compRoll;
    private double compPivot;
    private double compOther;
    private double compDamp;
    private double compDrive;
    private final double[] patchVelocityAtPoint = new double[3];
    /** A compliant contact's velocity and spin relative to its moving patch (apart from the rigid contact's). */
    private final double[] compRelVel = new double[3];
    private final double[] compRelSpin = new double[3];
    /** Damping power (W) of the last compliant evaluation. */

    ContactGeometry geo;
    ContactContext ctx;
    private final Ball ball;
    private final ContextAccess access;

    Phase phase = Phase.FLIGHT;
    final double[] slideDir0 = new double[3];
    double stickEps;

    // results of the last evaluation
    double normalForce;
    double neededTangential;
    double grip;
    double slipSpeed;
    final double[] friction = new double[3];
    final double[] vel = new double[3];
    /** Slip velocity of the last sliding evaluation (not written while rolling, where it is zero). */
    final double[] slip = new double[3];

    // loss rates (W) of the last evaluation, by kind
    private double lossRoll;
    private double lossPivot;
    private double lossSlide;
    private double lossOther;
    /** Power (W) the moving patch puts into the ball, {@code F·u(p) + τ_c·Ω}, of the last evaluation. */
    private double drivePower;
    /** Total derivative of the patch velocity at the centre along the centre's path, {@code d u(c)/dt} (moving patches). */
    final double[] surfaceAcceleration = new double[3];
    /** Speed measure relative to a moving patch, {@code |v − u(c)| + r|ω − Ω|} (m/s), of the last contact evaluation. */
    double relativeSpeed;
    private final double[] relSpin = new double[3];
    private final double[] relVel = new double[3];

    long evaluations;
    long budget = Long.MAX_VALUE;

    // several contacts (issue 12): the run's contact set, the solver, and results per position
    /** The run's contacts, or null for a right-hand side outside a run (one contact). */
    private ContactSet contacts;
    private final ContactForceSolver solver;
    /** Load (N) at which a law's sliding friction per newton is taken with several contacts: m|g|, at least m·1 m/s². */
    private final double referenceLoad;
    /** Normal force N (N) per position, of the last several-contact evaluation. */
    final double[] contactNormal = new double[ContactForceSolver.MAX_CONTACTS];
    /** Tangential force (N) per position: needed by rolling, the law's friction while sliding. */
    final double[] contactNeeded = new double[ContactForceSolver.MAX_CONTACTS];
    /** Grip (N) per position, rolling contacts; NaN while sliding. */
    final double[] contactGrip = new double[ContactForceSolver.MAX_CONTACTS];
    /** Slip speed (m/s) per position (a constraint residual for a rolling contact). */
    final double[] contactSlipSpeed = new double[ContactForceSolver.MAX_CONTACTS];
    /** Centre distance from each touched surface (m), per position. */
    final double[] contactDistance = new double[ContactForceSolver.MAX_CONTACTS];
    /** Patch margin (m) per position. */
    final double[] contactMargin = new double[ContactForceSolver.MAX_CONTACTS];
    /** Slip velocity (m/s) per position. */
    final double[][] contactSlip = new double[ContactForceSolver.MAX_CONTACTS][3];
    /** Friction force on the ball (N) per position. */
    final double[][] contactFriction = new double[ContactForceSolver.MAX_CONTACTS][3];
    private final double[][] contactDir = new double[ContactForceSolver.MAX_CONTACTS][3];
    private final double[] contactRatio = new double[ContactForceSolver.MAX_CONTACTS];
    /** Spin relative to each contact's patch (rad/s). */
    private final double[][] contactSpin = new double[ContactForceSolver.MAX_CONTACTS][3];
    /** Moving patches: velocity relative to the patch at the centre (m/s). */
    private final double[][] contactRelVel = new double[ContactForceSolver.MAX_CONTACTS][3];
    /** Moving patches: the patch velocity at the contact point u(p) (m/s). */
    private final double[][] contactUp = new double[ContactForceSolver.MAX_CONTACTS][3];
    /** Moving patches: the rolling constraint's right-hand side β (m/s²). */
    private final double[][] contactBeta = new double[ContactForceSolver.MAX_CONTACTS][3];
    /** Moving patches: the normal constraint's right-hand side β_n (m/s²). */
    private final double[] contactBetaN = new double[ContactForceSolver.MAX_CONTACTS];
    private final double[] zeroSlip = new double[3];

    // workspaces
    private final double[] c = new double[3];
    private final double[] w = new double[3];
    private final double[] q = new double[4];
    private final double[] fApp = new double[3];
    private final double[] tApp = new double[3];
    /** What an applied load reads and writes: views of the workspaces above, refilled by time only. */
    private final LoadView loadView = new LoadView(c, vel, q, w);
    private final LoadWrench loadOut = new LoadWrench(fApp, tApp);
    private final double[] hv = new double[3];
    private final double[] tmp = new double[3];
    private final double[] force = new double[3];
    private final double[] tau = new double[3];
    private final double[] scratchDot = new double[DIM];
    /** Whether there is an applied load (without one, the load arrays stay zero and are never asked). */
    private final boolean loaded;
    /** Whether the law may add couples (without, the couple calls and loss reads are skipped while rolling). */
    private boolean couples;
    /**
     * Whether the active slot's law has a set-valued couple about the normal and its patch stands still
     * (the pivoting stick is watched; on a moving patch it is not, see {@link PivotRule}).
     */
    boolean pivotStick;
    /** Spin about the normal ω·n (rad/s) of the last rolling evaluation; only with {@link #pivotStick}. */
    double normalSpin;
    /**
     * The contact couple about the normal (N·m) that keeps {@code ω·n} constant, of the last rolling
     * evaluation: {@code −I ω·(H v) − τ_app·n}; only with {@link #pivotStick}.
     */
    double pivotNeeded;
    /** The law's set-valued pivoting couple (N·m) of the last rolling evaluation; only with {@link #pivotStick}. */
    double pivotLimit;
    /**
     * Whether the last evaluation set {@link #normalSpin}, {@link #pivotNeeded} and {@link #pivotLimit} for the
     * contact that may hold its spin about the normal ({@link ContactSet#pivotSlot}).
     */
    boolean pivotValid;
    /** With several contacts: per position, the law's couple about that contact's normal (N·m). */
    private final double[] contactCoupleN = new double[ContactForceSolver.MAX_CONTACTS];
    /** The rest test on moving patches: the gravity in their common frame (m/s²). */
    private final double[] restGravity = new double[3];
    /** The rest test on moving patches: velocity field and frame acceleration of two patches at the centre. */
    private final double[][] restFrame = new double[4][3];
    /** With several contacts: the change of the angular acceleration (rad/s²) made by a pivoting hold. */
    private final double[] pivotFix = new double[3];
    /** Receives the state and results of an integrator stage evaluated at the same time as the one before. */
    interface StageObserver {
        void stage(double t, double[] compact, double[] full, double[] fullDot);
    }

    /** Told about repeated-time stages (the step end of Dormand–Prince 8(5,3)); null for none. */
    StageObserver stageObserver;
    private double lastStageTime = Double.NaN;

    /** Compact derivative returned to Hipparchus, which copies it (ExpandableODE.computeDerivatives). */
    private double[] compactDot = new double[DIM];

    /** Integrated layout of the current segment: compact index to full index (identity by default). */
    private int[] map = IDENTITY;
    private boolean derived;
    /**
     * Full-layout workspace of the right-hand side: the components left out of the layout keep
     * their segment-start values here, the others are overwritten at every evaluation.
     */
    private final double[] full = new double[DIM];
    private final double[] fullDot = new double[DIM];
    private static final int[] IDENTITY = StateMapper.identity();

    /**
     * The right-hand side of a model's single patch, with its own contact slot (for
     * {@code RightHandSide}).
     *
     * @param model the model
     * @param phase the phase to evaluate
     * @param stickSpeed the stick threshold ε of the sliding phase (m/s)
     */
    public Dynamics(Model model, Phase phase, double stickSpeed) {
        this(model, new ContactSlot(0, model.patches().get(0)));
        this.phase = phase;
        this.stickEps = stickSpeed;
        // outside a run no impact event begins the contact: a compliant patch's force acts wherever it is pressed
        slot.pressing = slot.compliance != null;
    }

    Dynamics(Model model, ContactSlot slot) {
        this(model.ball(), slot, model.gravity().toArray(), model.load(), model.access(), model.patches().size());
    }

    private Dynamics(Ball ball, ContactSlot slot, double[] gravity, AppliedLoad load, ContextAccess access,
                     int patchCount) {
        this.compliantSlots = slot.compliance != null ? new ContactSlot[] {slot} : new ContactSlot[0];
        this.compliantOn = new boolean[patchCount];
        this.compliantNormal = new double[patchCount];
        this.compliantFriction = new double[patchCount][3];
        this.compliantSlip = new double[patchCount][3];
        this.ball = ball;
        this.r = ball.radius();
        this.m = ball.mass();
        this.k = ball.inertiaFactor();
        this.inertia = ball.momentOfInertia();
        this.invMass = 1.0 / m;
        this.invInertia = 1.0 / inertia;
        this.coupleFactor = 1.0 / (k * m * r);
        this.rollingMass = k * m / (1 + k);
        this.g = gravity.clone();
        this.access = access;
        this.load = load;
        this.loaded = load != AppliedLoad.NONE;
        this.solver = new ContactForceSolver(r, m, k);
        this.referenceLoad = m * Math.max(norm(g), 1.0);
        setSlot(slot);
    }

    /**
     * Evaluates the run's contact set: with more than one patch touched the forces come from the
     * several-contact solve.
     *
     * @param set the run's contacts
     */
    void setContacts(ContactSet set) {
        this.contacts = set;
    }

    /**
     * Takes the run's slots: the compliant ones among them act in flight while {@link ContactSlot#pressing}.
     *
     * @param all every slot of the run, in scene order
     */
    void setSlots(ContactSlot[] all) {
        java.util.List<ContactSlot> out = new java.util.ArrayList<>();
        for (ContactSlot s : all) {
            if (s.compliance != null) {
                out.add(s);
            }
        }
        this.compliantSlots = out.toArray(new ContactSlot[0]);
    }

    /** @return whether the last evaluations see several contacts (the velocity is then integrated) */
    boolean multi() {
        return contacts != null && contacts.multi();
    }

    /**
     * Evaluates another contact slot from now on (a hand-over, an impact on another patch).
     *
     * @param s the slot
     */
    void setSlot(ContactSlot s) {
        this.slot = s;
        this.moving = s.moving;
        this.law = s.law;
        this.geo = s.geo;
        this.ctx = s.ctx;
        this.couples = s.couples;
        this.pivotStick = s.pivotStick;
        if (!s.contextReady) {
            // the ball and the geometry workspace never change: the hot path sets only the contact values
            access.set(ctx, ball, geo, 0.0, Phase.ROLLING, slip, w, false);
            s.contextReady = true;
        }
    }

    @Override
    public int getDimension() {
        return map.length;
    }

    @Override
    public double[] computeDerivatives(double t, double[] y) {
        // Hipparchus copies the returned array into its own (ExpandableODE), so one workspace serves
        double[] yDot = compactDot;
        if (map == IDENTITY) {
            evaluate(t, y, yDot);
            if (t == lastStageTime && stageObserver != null) {
                stageObserver.stage(t, y, y, yDot);
            }
            lastStageTime = t;
            return yDot;
        }
        // the left-out components of the workspace hold their segment-start values (beginSegment);
        // the mechanical part is copied with fixed offsets (every layout starts with c, [v,] q, ω)
        double[] f = full;
        double[] fd = fullDot;
        int n = map.length;
        int head;
        if (derived) {
            f[0] = y[0];
            f[1] = y[1];
            f[2] = y[2];
            for (int i = 0; i < 7; i++) {
                f[Q + i] = y[3 + i];
            }
            head = 10;
        } else {
            for (int i = 0; i < LOSS; i++) {
                f[i] = y[i];
            }
            head = LOSS;
        }
        for (int i = head; i < n; i++) {
            f[map[i]] = y[i];
        }
        evaluate(t, f, fd);
        if (derived) {
            yDot[0] = fd[0];
            yDot[1] = fd[1];
            yDot[2] = fd[2];
            for (int i = 0; i < 7; i++) {
                yDot[3 + i] = fd[Q + i];
            }
        } else {
            for (int i = 0; i < LOSS; i++) {
                yDot[i] = fd[i];
            }
        }
        for (int i = head; i < n; i++) {
            yDot[i] = fd[map[i]];
        }
        if (t == lastStageTime && stageObserver != null) {
            stageObserver.stage(t, y, f, fd);
        }
        lastStageTime = t;
        return yDot;
    }

    /**
     * Sets the integrated layout of a segment starting at the full state {@code start}.
     *
     * @return the compact start state
     */
    double[] beginSegment(int[] layout, double[] start) {
        map = layout;
        derived = layout[V] != V;
        compactDot = new double[layout.length];
        lastStageTime = Double.NaN;
        System.arraycopy(start, 0, full, 0, DIM);
        return compress(start);
    }

    /** The compact form of a full state in the current layout (a new array). */
    double[] compress(double[] fullState) {
        double[] out = new double[map.length];
        for (int i = 0; i < map.length; i++) {
            out[i] = fullState[map[i]];
        }
        return out;
    }

    /** Writes the full form of a compact state into {@code out}; left-out components keep their segment-start values. */
    double[] expand(double[] compact, double[] out) {
        if (map == IDENTITY) {
            System.arraycopy(compact, 0, out, 0, DIM);
            return out;
        }
        System.arraycopy(full, 0, out, 0, DIM);
        for (int i = 0; i < map.length; i++) {
            out[map[i]] = compact[i];
        }
        return out;
    }

    /** Whether the current layout leaves the velocity out (rolling: derived from the spin). */
    boolean derivedVelocity() {
        return derived;
    }

    /** The full derivative written by the last {@link #evaluate(double, double[])}. */
    double[] lastDerivative() {
        return scratchDot;
    }

    /** @return the normal force (N) of the last evaluation */
    public double normalForce() {
        return normalForce;
    }

    /** Counts one unit of work that is not an evaluation (an event check in flight) against the budget. */
    void countCheck() {
        if (++evaluations > budget) {
            throw new BudgetExhausted();
        }
    }

    /** Evaluates the phase's forces without keeping derivatives (event functions, samples). */
    void evaluate(double t, double[] y) {
        evaluate(t, y, scratchDot);
    }

    /**
     * Evaluates the derivative of a full-layout state for a caller outside the engine
     * ({@code RightHandSide}), where the engine's own failure type must not escape.
     *
     * @param t time (s)
     * @param y full-layout state
     * @param yDot output derivative (full layout)
     * @throws ArithmeticException when the derivative is not finite or a law or surface breaks its
     *     contract, with the engine's message
     */
    public void evaluateChecked(double t, double[] y, double[] yDot) {
        try {
            evaluate(t, y, yDot);
        } catch (RunFailure e) {
            throw new ArithmeticException(e.getMessage());
        }
    }

    /**
     * Evaluates the derivative of a full-layout state.
     *
     * @param t time (s)
     * @param y full-layout state
     * @param yDot output derivative (full layout), or null for the forces only
     */
    public void evaluate(double t, double[] y, double[] yDot) {
        if (++evaluations > budget) {
            throw new BudgetExhausted();
        }
        c[0] = y[C];
        c[1] = y[C + 1];
        c[2] = y[C + 2];
        w[0] = y[W];
        w[1] = y[W + 1];
        w[2] = y[W + 2];
        if (!Double.isFinite(c[0] + c[1] + c[2])) {
            // an integrator stage past the range of double: say so before a surface sees the point
            throw nonFiniteCentre(t, c);
        }
        if (loaded) {
            q[0] = y[Q];
            q[1] = y[Q + 1];
            q[2] = y[Q + 2];
            q[3] = y[Q + 3];
            fApp[0] = 0;
            fApp[1] = 0;
            fApp[2] = 0;
            tApp[0] = 0;
            tApp[1] = 0;
            tApp[2] = 0;
        }
        lossRoll = 0;
        lossPivot = 0;
        lossSlide = 0;
        lossOther = 0;
        drivePower = 0;
        pressing = false;
        compSlide = 0;
        compRoll = 0;
        compPivot = 0;
        compOther = 0;
        compDamp = 0;
        compDrive = 0;
        compliantWrench = phase != Phase.FLIGHT && anyPressed();
        if (!loaded && (appliedDirty || compliantWrench)) {
            fApp[0] = 0;
            fApp[1] = 0;
            fApp[2] = 0;
            tApp[0] = 0;
            tApp[1] = 0;
            tApp[2] = 0;
        }
        appliedDirty = compliantWrench;
        pivotValid = false;
        // one method per phase keeps each small enough for the JIT to inline its callees
        if (phase != Phase.FLIGHT && contacts != null && contacts.multi()) {
            multiForces(t, y, yDot);
            if (yDot != null) {
                checkFinite(t, yDot);
            }
            return;
        }
        if (phase == Phase.ROLLING || phase == Phase.REST) {
            if (moving) {
                rollingOnMovingPatch(t, y, yDot);
            } else {
                rollingForces(t, y, yDot);
            }
            if (yDot != null) {
                checkFinite(t, yDot);
            }
            return;
        } else if (phase == Phase.SLIDING) {
            if (moving) {
                slidingOnMovingPatch(t, y);
            } else {
                slidingForces(t, y);
            }
        } else {
            flightForces(t, y);
        }
        if (yDot == null) {
            return;
        }
        // alpha = (-r n x F + tau)/I, with the contact force F applied at c - r n
        double fx = force[0];
        double fy = force[1];
        double fz = force[2];
        double vx = vel[0];
        double vy = vel[1];
        double vz = vel[2];
        double wx = w[0];
        double wy = w[1];
        double wz = w[2];
        double fax = fApp[0];
        double fay = fApp[1];
        double faz = fApp[2];
        double ix = tau[0];
        double iy = tau[1];
        double iz = tau[2];
        if (phase != Phase.FLIGHT) {
            // (a compliant contact's force adds its own couple about the centre in compliantForces)
            double[] n = geo.normal;
            double nx = n[0];
            double ny = n[1];
            double nz = n[2];
            ix -= r * (ny * fz - nz * fy);
            iy -= r * (nz * fx - nx * fz);
            iz -= r * (nx * fy - ny * fx);
        }
        double applied = compliantWrench ? userPower
            : fax * vx + fay * vy + faz * vz + tApp[0] * wx + tApp[1] * wy + tApp[2] * wz;
        yDot[C] = vx;
        yDot[C + 1] = vy;
        yDot[C + 2] = vz;
        yDot[V] = g[0] + (fx + fax) * invMass;
        yDot[V + 1] = g[1] + (fy + fay) * invMass;
        yDot[V + 2] = g[2] + (fz + faz) * invMass;
        rotationRates(y, wx, wy, wz, ix * invInertia, iy * invInertia, iz * invInertia, yDot);
        yDot[LOSS + LossKind.SLIDING_FRICTION.ordinal()] = lossSlide + compSlide;
        yDot[LOSS + LossKind.ROLLING_RESISTANCE.ordinal()] = lossRoll + compRoll;
        yDot[LOSS + LossKind.PIVOTING_RESISTANCE.ordinal()] = lossPivot + compPivot;
        yDot[LOSS + LossKind.OTHER.ordinal()] = lossOther + compOther;
        yDot[APPLIED] = applied;
        yDot[PATH] = Math.sqrt(vx * vx + vy * vy + vz * vz);
        yDot[DAMPING] = compDamp;
        yDot[DRIVE] = drivePower + compDrive;
        checkFinite(t, yDot);
    }

    /**
     * Writes the orientation and spin rates: {@code q̇ = ½ (0, ω) ⊗ q} (Hamilton product, scalar
     * first) and {@code ω̇ = α}.
     */
    private static void rotationRates(double[] y, double wx, double wy, double wz,
                                      double alx, double aly, double alz, double[] yDot) {
        double q0 = y[Q];
        double q1 = y[Q + 1];
        double q2 = y[Q + 2];
        double q3 = y[Q + 3];
        yDot[Q] = -0.5 * (wx * q1 + wy * q2 + wz * q3);
        yDot[Q + 1] = 0.5 * (q0 * wx + wy * q3 - wz * q2);
        yDot[Q + 2] = 0.5 * (q0 * wy + wz * q1 - wx * q3);
        yDot[Q + 3] = 0.5 * (q0 * wz + wx * q2 - wy * q1);
        yDot[W] = alx;
        yDot[W + 1] = aly;
        yDot[W + 2] = alz;
    }

    /** Throws {@link RunFailure} naming the first non-finite component of a derivative and its likely source. */
    private void checkFinite(double t, double[] yDot) {
        // one test for all: a sum of finite numbers of this size is finite, and NaN or ±∞ spread
        // (three partial sums, so that the additions do not form one long dependency chain)
        double s0 = 0;
        double s1 = 0;
        double s2 = 0;
        for (int i = 0; i < 18; i += 3) {
            s0 += yDot[i];
            s1 += yDot[i + 1];
            s2 += yDot[i + 2];
        }
        double sum = s0 + s1 + s2 + yDot[18] + yDot[19] + yDot[20];
        if (!Double.isFinite(sum)) {
            for (int i = 0; i < DIM; i++) {
                if (!Double.isFinite(yDot[i])) {
                    throw new RunFailure("non-finite derivative of " + StateMapper.componentName(i) + " = " + yDot[i]
                        + " at t = " + t + " s in phase " + phase.label() + ": " + diagnose());
                }
            }
        }
    }

    /** The likely source of a non-finite derivative, from what the last evaluation used (failure path only). */
    private String diagnose() {
        if (phase != Phase.FLIGHT && !(Vec.allFinite(geo.normal) && Vec.allFinite(geo.hessian))) {
            return "surface " + slot.surface.name() + " returned normal " + java.util.Arrays.toString(geo.normal)
                + " and distance Hessian " + java.util.Arrays.toString(geo.hessian) + " at centre "
                + java.util.Arrays.toString(c) + " m";
        }
        if (loaded && !(Vec.allFinite(fApp) && Vec.allFinite(tApp))) {
            return "the applied load returned force " + java.util.Arrays.toString(fApp) + " N and torque "
                + java.util.Arrays.toString(tApp) + " N·m";
        }
        if (phase != Phase.FLIGHT && !(Vec.allFinite(access.torque(ctx)) && Vec.allFinite(access.lossRate(ctx)))) {
            return "contact law " + law.name() + " added couple " + java.util.Arrays.toString(access.torque(ctx))
                + " N·m with loss rates " + java.util.Arrays.toString(access.lossRate(ctx)) + " W";
        }
        if (phase != Phase.FLIGHT && !Double.isFinite(normalForce)) {
            return "the normal force F_n = m(-v.Hv - n.g) - n.F_app is " + normalForce + " N (mass " + m
                + " kg, radius " + r + " m, speed " + norm(vel) + " m/s): the numbers exceed the range of double";
        }
        return "the numbers of the run (speed " + norm(vel) + " m/s, spin " + norm(w) + " rad/s, normal force "
            + normalForce + " N, contact couple " + (phase == Phase.FLIGHT ? 0.0 : norm(access.torque(ctx)))
            + " N·m, mass " + m + " kg, radius " + r + " m) exceed the range of double";
    }

    /** A centre that is not finite (an integrator stage whose numbers overflowed), for the failure. */
    static RunFailure nonFiniteCentre(double t, double[] centre) {
        return new RunFailure("the centre reached " + java.util.Arrays.toString(centre) + " m at t = " + t
            + " s: the numbers of the run (its speeds, spins, forces or couples) exceed the range of double");
    }

    /**
     * A contact law's force, impulse or couple bound that is NaN or negative (sliding friction: or
     * infinite), which would let friction drive the motion it opposes.
     */
    RunFailure badBound(String what, double value, String unit) {
        if (!Double.isFinite(ctx.normalForce())) {
            // the law was handed a broken normal force: name where that came from
            return new RunFailure(diagnose());
        }
        boolean impulse = ctx.isImpulse();
        return new RunFailure("contact law " + law.name() + " returned " + what + " " + value + " " + unit
            + " at normal " + (impulse ? "impulse " : "force ") + ctx.normalForce() + (impulse ? " N·s" : " N")
            + "; it must be a number >= 0" + (what.startsWith("sliding") ? " and finite" : ""));
    }

    /**
     * Rolling: no-slip velocity, constraint forces and couples (results in the fields). Written
     * with local scalars: the JIT cannot keep array elements in registers across stores to other
     * arrays that might alias them, and this is the hot path of most runs.
     */
    private void rollingForces(double t, double[] y, double[] yDot) {
        slot.query(t, c);
        double[] n = geo.normal;
        double nx = n[0];
        double ny = n[1];
        double nz = n[2];
        double wx = w[0];
        double wy = w[1];
        double wz = w[2];
        ContactKinematics.noSlipVelocity(r, wx, wy, wz, n, vel, 0);
        double vx = vel[0];
        double vy = vel[1];
        double vz = vel[2];
        loadAndCompliant(t);
        double fax = fApp[0];
        double fay = fApp[1];
        double faz = fApp[2];
        double[] h = geo.hessian;
        double hvx = h[0] * vx + h[1] * vy + h[2] * vz;
        double hvy = h[3] * vx + h[4] * vy + h[5] * vz;
        double hvz = h[6] * vx + h[7] * vy + h[8] * vz;
        double vHv = vx * hvx + vy * hvy + vz * hvz;
        double gx = g[0];
        double gy = g[1];
        double gz = g[2];
        double fn = m * (-vHv - (nx * gx + ny * gy + nz * gz)) - (nx * fax + ny * fay + nz * faz);
        access.setRolling(ctx, fn, wx, wy, wz, couples);
        double tx = tApp[0];
        double ty = tApp[1];
        double tz = tApp[2];
        if (couples) {
            law.addCouples(ctx);
            double[] ct = access.torque(ctx);
            tx += ct[0];
            ty += ct[1];
            tz += ct[2];
        }
        double pivotLossFix = 0;
        if (pivotStick) {
            // d(ω·n)/dt = τ·n/I + ω·(H v) (the contact force has no moment about n): the couple
            // about the normal that keeps ω·n constant; it does not enter the tangential force
            double sn = wx * nx + wy * ny + wz * nz;
            double tAppN = loaded || compliantWrench ? tApp[0] * nx + tApp[1] * ny + tApp[2] * nz : 0.0;
            double needed = -inertia * (wx * hvx + wy * hvy + wz * hvz) - tAppN;
            normalSpin = sn;
            pivotNeeded = needed;
            pivotLimit = law.pivotStickLimit(ctx);
            pivotValid = true;
            if (slot.pivotHeld) {
                // held: the law's couple about the normal (single-valued parts vanish at zero spin)
                // is replaced by the needed one, and its power with it
                double lawN = tx * nx + ty * ny + tz * nz - tAppN;
                double d = needed - lawN;
                tx += d * nx;
                ty += d * ny;
                tz += d * nz;
                pivotLossFix = (lawN - needed) * sn;
            }
        }
        tau[0] = tx;
        tau[1] = ty;
        tau[2] = tz;
        // a = (tau x n)/(k m r) + r (w x Hv) - g - fApp/m, projected on the tangent plane
        double s1 = coupleFactor;
        double im = invMass;
        double ax = (ty * nz - tz * ny) * s1 + r * (wy * hvz - wz * hvy) - gx - fax * im;
        double ay = (tz * nx - tx * nz) * s1 + r * (wz * hvx - wx * hvz) - gy - fay * im;
        double az = (tx * ny - ty * nx) * s1 + r * (wx * hvy - wy * hvx) - gz - faz * im;
        double an = ax * nx + ay * ny + az * nz;
        double kf = rollingMass;
        double fx = kf * (ax - an * nx);
        double fy = kf * (ay - an * ny);
        double fz = kf * (az - an * nz);
        friction[0] = fx;
        friction[1] = fy;
        friction[2] = fz;
        normalForce = fn;
        neededTangential = Math.sqrt(fx * fx + fy * fy + fz * fz);
        double gl = law.gripLimit(ctx);
        if (!(gl >= 0)) {
            throw badBound("grip limit", gl, "N");
        }
        grip = gl;
        slipSpeed = 0;
        if (couples) {
            double[] lr = access.lossRate(ctx);
            lossRoll = lr[LossKind.ROLLING_RESISTANCE.ordinal()];
            lossPivot = lr[LossKind.PIVOTING_RESISTANCE.ordinal()] + pivotLossFix;
            lossOther = lr[LossKind.OTHER.ordinal()] + lr[LossKind.SLIDING_FRICTION.ordinal()];
        }
        force[0] = fn * nx + fx;
        force[1] = fn * ny + fy;
        force[2] = fn * nz + fz;
        if (yDot == null) {
            return;
        }
        // the derivative from the locals (the general tail below reads them back from the arrays):
        // alpha = (tau - r n x F)/I with n x F = n x F_t
        double ix = tx - r * (ny * fz - nz * fy);
        double iy = ty - r * (nz * fx - nx * fz);
        double iz = tz - r * (nx * fy - ny * fx);
        yDot[C] = vx;
        yDot[C + 1] = vy;
        yDot[C + 2] = vz;
        yDot[V] = gx + (fn * nx + fx + fax) * im;
        yDot[V + 1] = gy + (fn * ny + fy + fay) * im;
        yDot[V + 2] = gz + (fn * nz + fz + faz) * im;
        rotationRates(y, wx, wy, wz, ix * invInertia, iy * invInertia, iz * invInertia, yDot);
        yDot[LOSS + LossKind.SLIDING_FRICTION.ordinal()] = compSlide;
        yDot[LOSS + LossKind.ROLLING_RESISTANCE.ordinal()] = lossRoll + compRoll;
        yDot[LOSS + LossKind.PIVOTING_RESISTANCE.ordinal()] = lossPivot + compPivot;
        yDot[LOSS + LossKind.OTHER.ordinal()] = lossOther + compOther;
        yDot[APPLIED] = compliantWrench ? userPower
            : loaded ? fax * vx + fay * vy + faz * vz + tApp[0] * wx + tApp[1] * wy + tApp[2] * wz : 0;
        yDot[PATH] = Math.sqrt(vx * vx + vy * vy + vz * vz);
        yDot[DAMPING] = compDamp;
        yDot[DRIVE] = compDrive;
    }

    /**
     * Rolling on a moving patch (design notes §9): with the patch's spin {@code Ω}, its velocity field
     * {@code u}, the relative spin {@code w = ω − Ω} and {@code ṅ = Ω × n + H v_rel}, the no-slip
     * velocity is {@code v = u(c) + r w × n} and, with {@code A = du(c)/dt = Ω̇ × (c − D) − Ω × Ḋ + D̈ + Ω × v},
     * <pre>
     *   F_n = m(n·A + r n·(w × ṅ) − n·g) − n·F_app
     *   F_t = k m/(1+k) · [ (τ × n)/(k m r) + r P(w × ṅ) + P A − r P(Ω̇ × n) − P g − P F_app/m ]
     * </pre>
     * (the closed form of §3 with the surface terms; it reduces to it for a still patch). Couples
     * act on the relative spin; the drive power is {@code F·u(p) + τ_c·Ω}.
     */
    private void rollingOnMovingPatch(double t, double[] y, double[] yDot) {
        slot.query(t, c);
        MotionState ps = slot.poseAt(t);
        double[] n = geo.normal;
        double nx = n[0];
        double ny = n[1];
        double nz = n[2];
        double ox = ps.spin[0];
        double oy = ps.spin[1];
        double oz = ps.spin[2];
        double rx = w[0] - ox;
        double ry = w[1] - oy;
        double rz = w[2] - oz;
        double qx = c[0] - ps.offset[0];
        double qy = c[1] - ps.offset[1];
        double qz = c[2] - ps.offset[2];
        double dvx = ps.velocity[0];
        double dvy = ps.velocity[1];
        double dvz = ps.velocity[2];
        double ucx = oy * qz - oz * qy + dvx;
        double ucy = oz * qx - ox * qz + dvy;
        double ucz = ox * qy - oy * qx + dvz;
        double vrx = r * (ry * nz - rz * ny);
        double vry = r * (rz * nx - rx * nz);
        double vrz = r * (rx * ny - ry * nx);
        double vx = ucx + vrx;
        double vy = ucy + vry;
        double vz = ucz + vrz;
        vel[0] = vx;
        vel[1] = vy;
        vel[2] = vz;
        relativeSpeed = Math.sqrt(vrx * vrx + vry * vry + vrz * vrz) + r * Math.sqrt(rx * rx + ry * ry + rz * rz);
        loadAndCompliant(t);
        double fax = fApp[0];
        double fay = fApp[1];
        double faz = fApp[2];
        double[] h = geo.hessian;
        double ndx = oy * nz - oz * ny + h[0] * vrx + h[1] * vry + h[2] * vrz;
        double ndy = oz * nx - ox * nz + h[3] * vrx + h[4] * vry + h[5] * vrz;
        double ndz = ox * ny - oy * nx + h[6] * vrx + h[7] * vry + h[8] * vrz;
        double[] sr = ps.spinRate;
        double acx = sr[1] * qz - sr[2] * qy - (oy * dvz - oz * dvy) + ps.acceleration[0] + (oy * vz - oz * vy);
        double acy = sr[2] * qx - sr[0] * qz - (oz * dvx - ox * dvz) + ps.acceleration[1] + (oz * vx - ox * vz);
        double acz = sr[0] * qy - sr[1] * qx - (ox * dvy - oy * dvx) + ps.acceleration[2] + (ox * vy - oy * vx);
        surfaceAcceleration[0] = acx;
        surfaceAcceleration[1] = acy;
        surfaceAcceleration[2] = acz;
        double wnx = ry * ndz - rz * ndy;
        double wny = rz * ndx - rx * ndz;
        double wnz = rx * ndy - ry * ndx;
        double gx = g[0];
        double gy = g[1];
        double gz = g[2];
        double na = nx * acx + ny * acy + nz * acz + r * (nx * wnx + ny * wny + nz * wnz);
        double fn = m * (na - (nx * gx + ny * gy + nz * gz)) - (nx * fax + ny * fay + nz * faz);
        access.setRolling(ctx, fn, rx, ry, rz, couples);
        double tx = tApp[0];
        double ty = tApp[1];
        double tz = tApp[2];
        double cx = 0;
        double cy = 0;
        double cz = 0;
        if (couples) {
            law.addCouples(ctx);
            double[] ct = access.torque(ctx);
            cx = ct[0];
            cy = ct[1];
            cz = ct[2];
            tx += cx;
            ty += cy;
            tz += cz;
        }
        tau[0] = tx;
        tau[1] = ty;
        tau[2] = tz;
        double s1 = coupleFactor;
        double im = invMass;
        double bx = (ty * nz - tz * ny) * s1 + r * wnx + acx - r * (sr[1] * nz - sr[2] * ny) - gx - fax * im;
        double by = (tz * nx - tx * nz) * s1 + r * wny + acy - r * (sr[2] * nx - sr[0] * nz) - gy - fay * im;
        double bz = (tx * ny - ty * nx) * s1 + r * wnz + acz - r * (sr[0] * ny - sr[1] * nx) - gz - faz * im;
        double bn = bx * nx + by * ny + bz * nz;
        double kf = rollingMass;
        double fx = kf * (bx - bn * nx);
        double fy = kf * (by - bn * ny);
        double fz = kf * (bz - bn * nz);
        friction[0] = fx;
        friction[1] = fy;
        friction[2] = fz;
        normalForce = fn;
        neededTangential = Math.sqrt(fx * fx + fy * fy + fz * fz);
        grip = law.gripLimit(ctx);
        slipSpeed = 0;
        if (couples) {
            double[] lr = access.lossRate(ctx);
            lossRoll = lr[LossKind.ROLLING_RESISTANCE.ordinal()];
            lossPivot = lr[LossKind.PIVOTING_RESISTANCE.ordinal()];
            lossOther = lr[LossKind.OTHER.ordinal()] + lr[LossKind.SLIDING_FRICTION.ordinal()];
        }
        double fcx = fn * nx + fx;
        double fcy = fn * ny + fy;
        double fcz = fn * nz + fz;
        force[0] = fcx;
        force[1] = fcy;
        force[2] = fcz;
        // u(p) = u(c) - r Omega x n
        double upx = ucx - r * (oy * nz - oz * ny);
        double upy = ucy - r * (oz * nx - ox * nz);
        double upz = ucz - r * (ox * ny - oy * nx);
        drivePower = fcx * upx + fcy * upy + fcz * upz + cx * ox + cy * oy + cz * oz;
        if (yDot == null) {
            return;
        }
        double ix = tx - r * (ny * fz - nz * fy);
        double iy = ty - r * (nz * fx - nx * fz);
        double iz = tz - r * (nx * fy - ny * fx);
        yDot[C] = vx;
        yDot[C + 1] = vy;
        yDot[C + 2] = vz;
        yDot[V] = gx + (fcx + fax) * im;
        yDot[V + 1] = gy + (fcy + fay) * im;
        yDot[V + 2] = gz + (fcz + faz) * im;
        rotationRates(y, w[0], w[1], w[2], ix * invInertia, iy * invInertia, iz * invInertia, yDot);
        yDot[LOSS + LossKind.SLIDING_FRICTION.ordinal()] = compSlide;
        yDot[LOSS + LossKind.ROLLING_RESISTANCE.ordinal()] = lossRoll + compRoll;
        yDot[LOSS + LossKind.PIVOTING_RESISTANCE.ordinal()] = lossPivot + compPivot;
        yDot[LOSS + LossKind.OTHER.ordinal()] = lossOther + compOther;
        yDot[APPLIED] = compliantWrench ? userPower
            : loaded ? fax * vx + fay * vy + faz * vz + tApp[0] * w[0] + tApp[1] * w[1] + tApp[2] * w[2] : 0;
        yDot[PATH] = Math.sqrt(vx * vx + vy * vy + vz * vz);
        yDot[DAMPING] = compDamp;
        yDot[DRIVE] = drivePower + compDrive;
        checkFinite(t, yDot);
    }

    /**
     * Sliding on a moving patch (design notes §9): slip {@code s = P(v − u(c) − r (ω − Ω) × n)}, normal
     * force from {@code n·(v − u(c)) = 0} differentiated, {@code n·a = n·A − ṅ·(v − u(c))}; friction
     * against the slip, couples on the relative spin, drive power {@code F·u(p) + τ_c·Ω}.
     */
    private void slidingOnMovingPatch(double t, double[] y) {
        slot.query(t, c);
        MotionState ps = slot.poseAt(t);
        double[] n = geo.normal;
        System.arraycopy(y, V, vel, 0, 3);
        double[] om = ps.spin;
        for (int i = 0; i < 3; i++) {
            relSpin[i] = w[i] - om[i];
        }
        ps.velocityAt(c, tmp);
        for (int i = 0; i < 3; i++) {
            relVel[i] = vel[i] - tmp[i];
        }
        ContactKinematics.slip(r, relVel, 0, relSpin, 0, n, slip);
        relativeSpeed = norm(relVel) + r * norm(relSpin);
        loadAndCompliant(t);
        // ndot = Omega x n + H v_rel
        mulSym(geo.hessian, relVel, hv);
        double ndx = om[1] * n[2] - om[2] * n[1] + hv[0];
        double ndy = om[2] * n[0] - om[0] * n[2] + hv[1];
        double ndz = om[0] * n[1] - om[1] * n[0] + hv[2];
        double qx = c[0] - ps.offset[0];
        double qy = c[1] - ps.offset[1];
        double qz = c[2] - ps.offset[2];
        double[] sr = ps.spinRate;
        double[] dv = ps.velocity;
        double acx = sr[1] * qz - sr[2] * qy - (om[1] * dv[2] - om[2] * dv[1]) + ps.acceleration[0]
            + (om[1] * vel[2] - om[2] * vel[1]);
        double acy = sr[2] * qx - sr[0] * qz - (om[2] * dv[0] - om[0] * dv[2]) + ps.acceleration[1]
            + (om[2] * vel[0] - om[0] * vel[2]);
        double acz = sr[0] * qy - sr[1] * qx - (om[0] * dv[1] - om[1] * dv[0]) + ps.acceleration[2]
            + (om[0] * vel[1] - om[1] * vel[0]);
        surfaceAcceleration[0] = acx;
        surfaceAcceleration[1] = acy;
        surfaceAcceleration[2] = acz;
        double na = n[0] * acx + n[1] * acy + n[2] * acz
            - (ndx * relVel[0] + ndy * relVel[1] + ndz * relVel[2]);
        double fn = m * (na - dot(n, g)) - dot(n, fApp);
        double[] ct = slidingContact(fn, relSpin);
        // u(p) = u(c) - r Omega x n, with u(c) = vel - relVel
        double upx = vel[0] - relVel[0] - r * (om[1] * n[2] - om[2] * n[1]);
        double upy = vel[1] - relVel[1] - r * (om[2] * n[0] - om[0] * n[2]);
        double upz = vel[2] - relVel[2] - r * (om[0] * n[1] - om[1] * n[0]);
        drivePower = force[0] * upx + force[1] * upy + force[2] * upz + ct[0] * om[0] + ct[1] * om[1] + ct[2] * om[2];
    }

    /** Sliding: normal constraint force, friction against the slip, couples (results in the fields). */
    private void slidingForces(double t, double[] y) {
        slot.query(t, c);
        double[] n = geo.normal;
        System.arraycopy(y, V, vel, 0, 3);
        ContactKinematics.slip(r, vel, 0, w, 0, n, slip);
        loadAndCompliant(t);
        mulSym(geo.hessian, vel, hv);
        double vHv = dot(vel, hv);
        double fn = m * (-vHv - dot(n, g)) - dot(n, fApp);
        slidingContact(fn, w);
    }

    /**
     * The sliding contact once the normal force and the slip are known: friction {@code −f ŝ} from the
     * law (direction held at {@code d₀} inside the stick band), the law's couples on the given
     * (relative) spin, contact force and loss rates into the fields.
     *
     * @return the law's couple (N·m), the context's array
     */
    private double[] slidingContact(double fn, double[] spin) {
        double[] n = geo.normal;
        double sp = norm(slip);
        double[] dir = tmp;
        if (sp >= stickEps) {
            for (int i = 0; i < 3; i++) {
                dir[i] = slip[i] / sp;
            }
        } else {
            // inside the stick band the friction keeps the direction d0 it had on entering
            // (kept up to date at each step end by the engine), so that the motion stays
            // smooth through the band and the stick root is located on a smooth stretch
            System.arraycopy(slideDir0, 0, dir, 0, 3);
        }
        access.set(ctx, ball, geo, fn, Phase.SLIDING, slip, spin, false);
        double f = law.slidingFriction(ctx);
        if (!(f >= 0 && f < Double.POSITIVE_INFINITY)) {
            throw badBound("sliding friction", f, "N");
        }
        law.addCouples(ctx);
        double[] ct = access.torque(ctx);
        for (int i = 0; i < 3; i++) {
            friction[i] = -f * dir[i];
            tau[i] = ct[i] + tApp[i];
            force[i] = fn * n[i] + friction[i];
        }
        normalForce = fn;
        neededTangential = f;
        grip = Double.NaN;
        slipSpeed = sp;
        lossSlide = -dot(friction, slip);
        double[] lr = access.lossRate(ctx);
        lossRoll = lr[LossKind.ROLLING_RESISTANCE.ordinal()];
        lossPivot = lr[LossKind.PIVOTING_RESISTANCE.ordinal()];
        lossOther = lr[LossKind.OTHER.ordinal()] + lr[LossKind.SLIDING_FRICTION.ordinal()];
        return ct;
    }

    /** Calls the applied load on the workspaces ({@code c}, {@code vel}, {@code q}, {@code w} filled; forces zeroed). */
    private void applyLoad(double t) {
        loadView.at(t);
        load.apply(loadView, loadOut);
    }

    /** Flight: applied loads only (results in the fields). */
    private void flightForces(double t, double[] y) {
        System.arraycopy(y, V, vel, 0, 3);
        if (loaded) {
            applyLoad(t);
        }
        zero(force);
        zero(friction);
        zero(slip);
        System.arraycopy(tApp, 0, tau, 0, 3);
        normalForce = 0;
        neededTangential = 0;
        grip = Double.NaN;
        slipSpeed = 0;
        if (compliantSlots.length > 0) {
            compliantForces(t, force, tau, true);
        }
    }

    /** Whether a compliant patch's contact is under way (its force then acts). */
    private boolean anyPressed() {
        for (ContactSlot s : compliantSlots) {
            if (s.pressing) {
                return true;
            }
        }
        return false;
    }

    /**
     * A rigid contact phase's applied load: the user's load, and while compliant patches are pressed their wrench
     * about the centre (force and couple, {@link #compliantForces}), added to {@link #fApp} and {@link #tApp}; the
     * user's load's own power is kept apart ({@link #userPower}: the compliant wrench's work is elastic energy,
     * damping, friction and drive, booked by kind). Needs {@link #vel} and {@link #w} of this evaluation.
     */
    private void loadAndCompliant(double t) {
        if (loaded) {
            applyLoad(t);
        }
        if (compliantWrench) {
            userPower = loaded ? dot(fApp, vel) + dot(tApp, w) : 0.0;
            compliantForces(t, fApp, tApp, false);
        }
    }

    /**
     * The forces of the compliant patches the ball presses, in flight ({@link Compliance}), summed. For each
     * compliant patch whose contact is under way ({@link ContactSlot#pressing}) with the approach
     * {@code δ = r − d > 0} and the closest point on the patch: the normal force
     * {@code F_n = K δ^{3/2}(1 + χ δ̇/v₀)} (clamped at zero; {@code K} from the wall's principal curvatures at the
     * foot point, {@code δ̇ = −n·(v − u(c))} relative to the patch, {@code v₀} the relative normal speed at which this
     * contact began), the patch law's friction {@code f(F_n)} against the slip of the contact point relative to the
     * patch, {@code s = P((v − u(c)) − r (ω − Ω) × n)}, regularised below the slip speed {@code ε_c}:
     * {@code F_t = −f s / max(|s|, ε_c)} (viscous below {@code ε_c}, Coulomb above), and the law's couples on the
     * relative spin. Each force acts at {@code c − r n_i} (couple {@code −r n_i × F_i}; the approach, a few
     * micrometres, is neglected in the lever arm). The damping power {@code (F_n − K δ^{3/2}) δ̇} is booked as
     * contact damping; the elastic part is stored in the contact and counted in the energy ({@link Model#energy}).
     * A moving patch ({@code u}, {@code Ω} its velocity field and spin) puts in the power
     * {@code F·u(p) + τ_c·Ω}, {@code u(p) = u(c) − r Ω × n}, booked as drive work, so that the budget closes.
     */
    private void compliantForces(double t, double[] forceOut, double[] torqueOut, boolean flight) {
        compliantPrimary = null;
        for (ContactSlot s : compliantSlots) {
            compliantOn[s.index] = false;
            compliantNormal[s.index] = 0;
            if (s.pressing) {
                compliantContact(t, s, forceOut, torqueOut);
            }
        }
        ContactSlot p = compliantPrimary;
        if (flight && p != null) {
            int i = p.index;
            normalForce = compliantNormal[i];
            System.arraycopy(compliantFriction[i], 0, friction, 0, 3);
            System.arraycopy(compliantSlip[i], 0, slip, 0, 3);
            slipSpeed = norm(slip);
            neededTangential = norm(friction);
        }
    }

    /** One compliant contact's force and couple about the centre, added to the two arrays; see {@link #compliantForces}. */
    private void compliantContact(double t, ContactSlot s, double[] forceOut, double[] torqueOut) {
        s.query(t, c);
        ContactGeometry sg = s.geo;
        double delta = r - sg.distance;
        if (!(delta > 0) || sg.patchMargin < 0) {
            return;
        }
        pressing = true;
        compliantOn[s.index] = true;
        if (compliantPrimary == null || s == slot) {
            compliantPrimary = s;
        }
        double[] n = sg.normal;
        double[] rv = vel;
        double[] rw = w;
        double[] om = null;
        if (s.moving) {
            MotionState ps = s.poseAt(t);
            om = ps.spin;
            double[] up = patchVelocityAtPoint;
            ps.velocityAt(c, up);
            rv = compRelVel;
            rw = compRelSpin;
            for (int i = 0; i < 3; i++) {
                rv[i] = vel[i] - up[i];
                rw[i] = w[i] - om[i];
            }
            // u(p) = u(c) − r Ω × n
            up[0] -= r * (om[1] * n[2] - om[2] * n[1]);
            up[1] -= r * (om[2] * n[0] - om[0] * n[2]);
            up[2] -= r * (om[0] * n[1] - om[1] * n[0]);
        }
        // the integrator's trial stages of a long flight step may land deep in the wall and very fast: hold
        // the law at an approach of one radius and its damping term at an approach rate of ten times the impact
        // speed there (without the hold such a trial stage could overflow). The rate hold can bind in accepted
        // states too: a contact that began grazing (a small v₀, so a large Hunt–Crossley c = χ/v₀) and is then
        // pressed fast, as a ball rattling between two compliant walls does; the damping power is booked with
        // the true rate, (F_n − K δ^{3/2}) δ̇, so that the budget closes either way
        delta = Math.min(delta, r);
        double trueRate = -dot(rv, n);
        double rate = Math.min(trueRate, 10 * s.touchSpeed);
        Compliance comp = s.compliance;
        double kh;
        if (sg.curvature1 == s.stiffnessCurvature1 && sg.curvature2 == s.stiffnessCurvature2) {
            kh = s.stiffness;
        } else {
            // a stiffness is a function of the ball radius and the wall's curvatures only (Compliance.Stiffness)
            kh = comp.stiffness(r, sg.curvature1, sg.curvature2);
            s.stiffnessCurvature1 = sg.curvature1;
            s.stiffnessCurvature2 = sg.curvature2;
            s.stiffness = kh;
        }
        double elastic = kh * delta * Math.sqrt(delta);
        double fn = comp.force(kh, delta, rate, s.touchSpeed);
        double[] sl = compliantSlip[s.index];
        ContactKinematics.slip(r, rv, 0, rw, 0, n, sl);
        double sp = norm(sl);
        access.set(s.ctx, ball, sg, fn, Phase.SLIDING, sl, rw, false);
        double f = fn > 0 ? s.law.slidingFriction(s.ctx) : 0.0;
        if (!(f >= 0 && f < Double.POSITIVE_INFINITY)) {
            throw badBound("sliding friction", f, "N");
        }
        double visc = f / Math.max(sp, compliantSlipSpeed);
        double[] fr = compliantFriction[s.index];
        double fx = 0;
        double fy = 0;
        double fz = 0;
        for (int i = 0; i < 3; i++) {
            fr[i] = -visc * sl[i];
        }
        fx = fn * n[0] + fr[0];
        fy = fn * n[1] + fr[1];
        fz = fn * n[2] + fr[2];
        forceOut[0] += fx;
        forceOut[1] += fy;
        forceOut[2] += fz;
        torqueOut[0] -= r * (n[1] * fz - n[2] * fy);
        torqueOut[1] -= r * (n[2] * fx - n[0] * fz);
        torqueOut[2] -= r * (n[0] * fy - n[1] * fx);
        if (s.couples && fn > 0) {
            s.law.addCouples(s.ctx);
            double[] ct = access.torque(s.ctx);
            for (int i = 0; i < 3; i++) {
                torqueOut[i] += ct[i];
            }
            double[] lr = access.lossRate(s.ctx);
            compRoll += lr[LossKind.ROLLING_RESISTANCE.ordinal()];
            compPivot += lr[LossKind.PIVOTING_RESISTANCE.ordinal()];
            compOther += lr[LossKind.OTHER.ordinal()] + lr[LossKind.SLIDING_FRICTION.ordinal()];
            if (om != null) {
                compDrive += ct[0] * om[0] + ct[1] * om[1] + ct[2] * om[2];
            }
        }
        if (om != null) {
            double[] up = patchVelocityAtPoint;
            compDrive += fx * up[0] + fy * up[1] + fz * up[2];
        }
        compliantNormal[s.index] = fn;
        compSlide += visc * sp * sp;
        compDamp += (fn - elastic) * trueRate;
    }

    /**
     * Static-equilibrium test for a ball (nearly) at rest on the surface: with {@code a = 0},
     * {@code α = 0}, the contact must supply {@code F = −(m g + F_app)} and the couple
     * {@code τ_c = r n × F_t − τ_app}; rest holds when {@code F_n > 0}, {@code |F_t|} is within the
     * grip and the tangential and normal parts of {@code τ_c} are within the law's holding limits
     * (each with a tolerance of {@code slack} times {@code m|g|} or {@code m|g|r}). On a moving patch
     * rest is rest relative to the patch: the ball moves with it, so the contact must also supply
     * {@code m a_s(c)} (the patch's acceleration at the centre,
     * {@code Ω̇ × (c − D) + Ω × (Ω × (c − D)) + D̈}) and the couple {@code I Ω̇}.
     */
    boolean canRest(double t, double[] y, double slack) {
        loadAtRest(t, y);
        if (contacts != null && contacts.multi()) {
            return canRestOnSeveral(t, slack);
        }
        slot.query(t, c);
        double[] n = geo.normal;
        double[] f = tmp;
        for (int i = 0; i < 3; i++) {
            f[i] = -(m * g[i] + fApp[i]);
        }
        if (moving) {
            // the frame's acceleration at the centre acts as the body force −m a_F(c) (see canRestOnSeveral)
            double[] aF = restFrame[1];
            frameFields(slot.poseAt(t), restFrame[0], aF);
            f[0] += m * aF[0];
            f[1] += m * aF[1];
            f[2] += m * aF[2];
        }
        double fn = dot(f, n);
        if (!(fn > 0)) {
            return false;
        }
        for (int i = 0; i < 3; i++) {
            f[i] -= fn * n[i];
        }
        zero(slip);
        zero(hv);
        access.set(ctx, ball, geo, fn, Phase.ROLLING, slip, hv, false);
        double scaleF = slack * m * Math.max(norm(g), 1e-300) + slack * norm(fApp);
        double gl = law.gripLimit(ctx);
        if (!(gl >= 0)) {
            throw badBound("grip limit", gl, "N");
        }
        if (norm(f) > gl + scaleF) {
            return false;
        }
        cross(n, f, tau);
        for (int i = 0; i < 3; i++) {
            tau[i] = r * tau[i] - tApp[i];
        }
        if (moving) {
            double[] sr = slot.poseAt(t).spinRate;
            for (int i = 0; i < 3; i++) {
                tau[i] += inertia * sr[i];
            }
        }
        double tn = dot(tau, n);
        double tt = Math.sqrt(Math.max(0.0, dot(tau, tau) - tn * tn));
        double scaleT = scaleF * r + slack * norm(tApp);
        double holdRoll = law.rollingHoldLimit(ctx);
        double holdPivot = law.pivotHoldLimit(ctx);
        if (!(holdRoll >= 0)) {
            throw badBound("rolling hold limit", holdRoll, "N·m");
        }
        if (!(holdPivot >= 0)) {
            throw badBound("pivoting hold limit", holdPivot, "N·m");
        }
        return tt <= holdRoll + scaleT && Math.abs(tn) <= holdPivot + scaleT;
    }

    // ------------------------------------------------------------ several contacts

    /**
     * Several contacts at once (issue 12; design notes §9): every touching slot's geometry at the centre, the
     * forces and accelerations from {@link ContactForceSolver} (rolling contacts: full force; sliding contacts:
     * normal force, friction {@code μ_i N_i} against the slip), the laws' couples at the normal forces of a
     * first solve without them, then the solve with them. The velocity is integrated (full layout), except for
     * two rolling contacts on still patches ({@link ContactSet#rollingPair}), where it is derived from the spin
     * as with one contact, {@code v = r ω × n₀} (the active slot's normal; compact rolling layout), and the
     * closed form of {@link RollingPair} solves, reading the geometry in place: the constraints are held by the
     * solve at acceleration level and by the projection onto every contact's manifold
     * ({@link Transitions#projected}). Results per position into the {@code contact*} arrays; position
     * 0 (the active slot) also into the single-contact fields.
     */
    private void multiForces(double t, double[] y, double[] yDot) {
        ContactSet set = contacts;
        int count = set.count();
        // two rolling contacts on still patches: the velocity is derived, v = r ω × n₀, before the applied load
        // and the compliant patches see it (the velocity slot is not integrated then)
        boolean derive = set.rollingPair();
        if (derive) {
            ContactSlot s0 = set.at(0);
            s0.query(t, c);
            ContactKinematics.noSlipVelocity(r, w[0], w[1], w[2], s0.geo.normal, vel, 0);
        } else {
            vel[0] = y[V];
            vel[1] = y[V + 1];
            vel[2] = y[V + 2];
        }
        loadAndCompliant(t);
        boolean anyCouples = false;
        for (int k = 0; k < count; k++) {
            ContactSlot s = set.at(k);
            contactCoupleN[k] = 0;
            if (k > 0 || !derive) {
                s.query(t, c);
            }
            readyContext(s);
            contactDistance[k] = s.geo.distance;
            contactMargin[k] = s.geo.patchMargin;
            anyCouples |= s.couples;
            double[] sl = contactSlip[k];
            double[] spin = contactSpin[k];
            if (s.moving) {
                movingContact(t, s, k);
            } else {
                System.arraycopy(w, 0, spin, 0, 3);
                ContactKinematics.slip(r, vel, 0, w, 0, s.geo.normal, sl);
            }
            if (s.mode == Mode.SLIDING) {
                double sp = norm(sl);
                contactSlipSpeed[k] = sp;
                double[] dir = contactDir[k];
                if (sp >= stickEps) {
                    for (int i = 0; i < 3; i++) {
                        dir[i] = sl[i] / sp;
                    }
                } else {
                    System.arraycopy(s.slideDir, 0, dir, 0, 3);
                }
                // the law's friction per newton at the reference load (exact for Coulomb's f = μ N)
                access.set(s.ctx, ball, s.geo, referenceLoad, Phase.SLIDING, sl, spin, false);
                double f = s.law.slidingFriction(s.ctx);
                if (!(f >= 0 && f < Double.POSITIVE_INFINITY)) {
                    throw badBound("sliding friction", f, "N");
                }
                contactRatio[k] = f / referenceLoad;
            } else {
                contactSlipSpeed[k] = norm(sl);
            }
        }
        System.arraycopy(tApp, 0, tau, 0, 3);
        solveContacts(count);
        if (anyCouples) {
            for (int k = 0; k < count; k++) {
                ContactSlot s = set.at(k);
                if (!s.couples) {
                    continue;
                }
                double fn = solver.normalForce(k);
                double[] spin = contactSpin[k];
                if (s.mode == Mode.SLIDING) {
                    access.set(s.ctx, ball, s.geo, fn, Phase.SLIDING, contactSlip[k], spin, false);
                } else {
                    access.setRolling(s.ctx, fn, spin[0], spin[1], spin[2], true);
                }
                s.law.addCouples(s.ctx);
                double[] ct = access.torque(s.ctx);
                double[] lr = access.lossRate(s.ctx);
                for (int i = 0; i < 3; i++) {
                    tau[i] += ct[i];
                }
                contactCoupleN[k] = dot(ct, s.geo.normal);
                if (s.moving) {
                    // the couple's power on the patch's spin is drive work (design notes §9)
                    drivePower += dot(ct, s.pose.spin);
                }
                lossRoll += lr[LossKind.ROLLING_RESISTANCE.ordinal()];
                lossPivot += lr[LossKind.PIVOTING_RESISTANCE.ordinal()];
                lossOther += lr[LossKind.OTHER.ordinal()] + lr[LossKind.SLIDING_FRICTION.ordinal()];
            }
            solveContacts(count);
        }
        double fx = 0;
        double fy = 0;
        double fz = 0;
        for (int k = 0; k < count; k++) {
            ContactSlot s = set.at(k);
            double[] n = s.geo.normal;
            double[] f = solver.force(k);
            double fn = solver.normalForce(k);
            double[] fr = contactFriction[k];
            for (int i = 0; i < 3; i++) {
                fr[i] = f[i] - fn * n[i];
            }
            fx += f[0];
            fy += f[1];
            fz += f[2];
            contactNormal[k] = fn;
            contactNeeded[k] = solver.tangentialForce(k);
            if (s.moving) {
                drivePower += dot(f, contactUp[k]);
            }
            if (s.mode == Mode.SLIDING) {
                contactGrip[k] = Double.NaN;
                lossSlide -= dot(fr, contactSlip[k]);
            } else {
                double[] spin = contactSpin[k];
                access.setRolling(s.ctx, fn, spin[0], spin[1], spin[2], false);
                double gl = s.law.gripLimit(s.ctx);
                if (!(gl >= 0)) {
                    throw badBound("grip limit", gl, "N");
                }
                contactGrip[k] = gl;
            }
        }
        pivotHold(set, contactNormal);
        // position 0 in the single-contact fields (samples, the ledger, the rules of the active slot)
        normalForce = contactNormal[0];
        neededTangential = contactNeeded[0];
        grip = contactGrip[0];
        slipSpeed = contactSlipSpeed[0];
        System.arraycopy(contactFriction[0], 0, friction, 0, 3);
        System.arraycopy(contactSlip[0], 0, slip, 0, 3);
        force[0] = fx;
        force[1] = fy;
        force[2] = fz;
        if (yDot == null) {
            return;
        }
        double[] a = solver.acceleration();
        double[] al = solver.angularAcceleration();
        double vx = vel[0];
        double vy = vel[1];
        double vz = vel[2];
        yDot[C] = vx;
        yDot[C + 1] = vy;
        yDot[C + 2] = vz;
        yDot[V] = a[0];
        yDot[V + 1] = a[1];
        yDot[V + 2] = a[2];
        rotationRates(y, w[0], w[1], w[2], al[0] + pivotFix[0], al[1] + pivotFix[1], al[2] + pivotFix[2], yDot);
        yDot[LOSS + LossKind.SLIDING_FRICTION.ordinal()] = lossSlide + compSlide;
        yDot[LOSS + LossKind.ROLLING_RESISTANCE.ordinal()] = lossRoll + compRoll;
        yDot[LOSS + LossKind.PIVOTING_RESISTANCE.ordinal()] = lossPivot + compPivot;
        yDot[LOSS + LossKind.OTHER.ordinal()] = lossOther + compOther;
        yDot[APPLIED] = compliantWrench ? userPower : loaded ? dot(fApp, vel) + dot(tApp, w) : 0;
        yDot[PATH] = Math.sqrt(vx * vx + vy * vy + vz * vz);
        yDot[DAMPING] = compDamp;
        yDot[DRIVE] = drivePower + compDrive;
    }

    /**
     * With several contacts, the exact pivoting stick of the one rolling contact whose spin about its normal is
     * free ({@link ContactSet#pivotSlot}: every other contact slides). Its couple about its normal {@code n}
     * enters nothing else: not its own no-slip constraint ({@code α × n} has no part along {@code n}), not a
     * sliding contact's normal constraint ({@code n_j·(α × n_j) = 0}) nor its friction ({@code μ N_j} against
     * the slip). So, as for one contact, {@code d(ω·n)/dt = τ·n/I + ω·(H v)} and the couple that keeps
     * {@code ω·n} constant is {@code M = −I ω·(H v) − (τ·n − M_law)}, with {@code τ·n = I α·n} the solve's total
     * and {@code M_law} the law's couple about {@code n}. Sets {@link #normalSpin}, {@link #pivotNeeded},
     * {@link #pivotLimit}; while held, the law's couple about {@code n} is replaced by {@code M} (the change of
     * the angular acceleration in {@link #pivotFix}) and its power with it in the pivoting loss.
     */
    private void pivotHold(ContactSet set, double[] normals) {
        pivotFix[0] = 0;
        pivotFix[1] = 0;
        pivotFix[2] = 0;
        ContactSlot s = set.pivotSlot();
        if (s == null) {
            return;
        }
        int k = set.positionOf(s);
        double[] n = s.geo.normal;
        double[] h = s.geo.hessian;
        double hvx = h[0] * vel[0] + h[1] * vel[1] + h[2] * vel[2];
        double hvy = h[3] * vel[0] + h[4] * vel[1] + h[5] * vel[2];
        double hvz = h[6] * vel[0] + h[7] * vel[1] + h[8] * vel[2];
        double sn = dot(w, n);
        double lawN = contactCoupleN[k];
        double needed = -inertia * (w[0] * hvx + w[1] * hvy + w[2] * hvz) - (inertia * dot(solver.angularAcceleration(), n) - lawN);
        double[] spin = contactSpin[k];
        access.setRolling(s.ctx, normals[k], spin[0], spin[1], spin[2], false);
        normalSpin = sn;
        pivotNeeded = needed;
        pivotLimit = s.law.pivotStickLimit(s.ctx);
        pivotValid = true;
        if (s.pivotHeld) {
            double d = (needed - lawN) / inertia;
            pivotFix[0] = d * n[0];
            pivotFix[1] = d * n[1];
            pivotFix[2] = d * n[2];
            lossPivot += (lawN - needed) * sn;
        }
    }

    /**
     * A contact of several on a moving patch (design notes §9), into the per-position workspaces: the velocity
     * and spin relative to the patch ({@code v − u(c)}, {@code w = ω − Ω}), the slip
     * {@code s = P((v − u(c)) − r w × n)}, {@code ṅ = Ω × n + H (v − u(c))}, the patch's velocity field
     * differentiated along the centre's path {@code A = Ω̇ × (c − D) − Ω × Ḋ + D̈ + Ω × v}, the constraints'
     * right-hand sides {@code β = A − r Ω̇ × n + r w × ṅ} (rolling) and {@code β_n = n·A − ṅ·(v − u(c))}
     * (sliding), and the patch velocity at the contact point {@code u(p) = u(c) − r Ω × n} (drive power).
     */
    private void movingContact(double t, ContactSlot s, int k) {
        MotionState ps = s.poseAt(t);
        double[] n = s.geo.normal;
        double[] om = ps.spin;
        double[] sr = ps.spinRate;
        double[] dv = ps.velocity;
        double[] uc = contactUp[k];
        ps.velocityAt(c, uc);
        double[] rv = contactRelVel[k];
        double[] spin = contactSpin[k];
        for (int i = 0; i < 3; i++) {
            rv[i] = vel[i] - uc[i];
            spin[i] = w[i] - om[i];
        }
        ContactKinematics.slip(r, rv, 0, spin, 0, n, contactSlip[k]);
        double[] h = s.geo.hessian;
        double ndx = om[1] * n[2] - om[2] * n[1] + h[0] * rv[0] + h[1] * rv[1] + h[2] * rv[2];
        double ndy = om[2] * n[0] - om[0] * n[2] + h[3] * rv[0] + h[4] * rv[1] + h[5] * rv[2];
        double ndz = om[0] * n[1] - om[1] * n[0] + h[6] * rv[0] + h[7] * rv[1] + h[8] * rv[2];
        double qx = c[0] - ps.offset[0];
        double qy = c[1] - ps.offset[1];
        double qz = c[2] - ps.offset[2];
        double ax = sr[1] * qz - sr[2] * qy - (om[1] * dv[2] - om[2] * dv[1]) + ps.acceleration[0]
            + (om[1] * vel[2] - om[2] * vel[1]);
        double ay = sr[2] * qx - sr[0] * qz - (om[2] * dv[0] - om[0] * dv[2]) + ps.acceleration[1]
            + (om[2] * vel[0] - om[0] * vel[2]);
        double az = sr[0] * qy - sr[1] * qx - (om[0] * dv[1] - om[1] * dv[0]) + ps.acceleration[2]
            + (om[0] * vel[1] - om[1] * vel[0]);
        double[] b = contactBeta[k];
        b[0] = ax - r * (sr[1] * n[2] - sr[2] * n[1]) + r * (spin[1] * ndz - spin[2] * ndy);
        b[1] = ay - r * (sr[2] * n[0] - sr[0] * n[2]) + r * (spin[2] * ndx - spin[0] * ndz);
        b[2] = az - r * (sr[0] * n[1] - sr[1] * n[0]) + r * (spin[0] * ndy - spin[1] * ndx);
        contactBetaN[k] = n[0] * ax + n[1] * ay + n[2] * az - (ndx * rv[0] + ndy * rv[1] + ndz * rv[2]);
        // u(p) = u(c) − r Ω × n, in place of u(c)
        uc[0] -= r * (om[1] * n[2] - om[2] * n[1]);
        uc[1] -= r * (om[2] * n[0] - om[0] * n[2]);
        uc[2] -= r * (om[0] * n[1] - om[1] * n[0]);
    }

    /** Loads the solver with the touching contacts and solves with the couple {@link #tau}. */
    private void solveContacts(int count) {
        ContactForceSolver sv = solver;
        if (contacts.rollingPair()) {
            // the common case (groove, rails): the closed form, the geometry read in place
            ContactSlot a = contacts.at(0);
            ContactSlot b = contacts.at(1);
            if (!sv.solveRollingPair(a.geo.normal, a.geo.hessian, b.geo.normal, b.geo.hessian, vel, w, g, fApp, tau)) {
                throw cannotHold(count);
            }
            return;
        }
        sv.clear();
        for (int k = 0; k < count; k++) {
            ContactSlot s = contacts.at(k);
            if (s.mode == Mode.SLIDING) {
                if (s.moving) {
                    sv.addSliding(s.geo.normal, s.geo.hessian, contactRatio[k], contactDir[k], contactBetaN[k]);
                } else {
                    sv.addSliding(s.geo.normal, s.geo.hessian, contactRatio[k], contactDir[k]);
                }
            } else if (s.moving) {
                sv.addRolling(s.geo.normal, s.geo.hessian, contactBeta[k]);
            } else {
                sv.addRolling(s.geo.normal, s.geo.hessian);
            }
        }
        if (!sv.solve(vel, w, g, fApp, tau)) {
            throw cannotHold(count);
        }
    }

    /** The failure of a several-contact solve, naming the contacts and their modes. */
    private RunFailure cannotHold(int count) {
        StringBuilder ids = new StringBuilder();
        for (int k = 0; k < count; k++) {
            ids.append(k == 0 ? "" : ", ").append(contacts.at(k).id).append(" (")
                .append(contacts.at(k).mode.name().toLowerCase(java.util.Locale.ROOT)).append(')');
        }
        return new RunFailure("the contacts on " + ids + " cannot all hold: their constraint system is singular"
            + " beyond the squeeze between rolling contacts");
    }

    /** Gives a slot's law context the ball and the slot's geometry workspace, once. */
    private void readyContext(ContactSlot s) {
        if (!s.contextReady) {
            access.set(s.ctx, ball, s.geo, 0.0, Phase.ROLLING, zeroSlip, w, false);
            s.contextReady = true;
        }
    }

    /** The state of a rest test into the workspaces, and the applied load there. */
    private void loadAtRest(double t, double[] y) {
        System.arraycopy(y, C, c, 0, 3);
        System.arraycopy(y, Q, q, 0, 4);
        System.arraycopy(y, W, w, 0, 3);
        System.arraycopy(y, V, vel, 0, 3);
        zero(fApp);
        zero(tApp);
        applyLoad(t);
    }

    /**
     * The rest test with several contacts: with {@code v = 0}, {@code ω = 0} and every contact rolling, the
     * solve must give no motion ({@code |a| + r|α|} within {@code slack} times {@code |g| + |F_app|/m}), every
     * normal force positive and every contact's friction within its grip (with the same slack). The holding
     * couples of the laws are not asked (at zero spin they are not needed).
     *
     * <p>On moving patches rest is relative to them, and it is defined only when every touched patch moves as
     * one rigid body at this instant ({@link #commonFrame}): in that frame, at zero relative velocity, the
     * Coriolis force and the curvature terms vanish and the frame acts as the body force
     * {@code −m a_F(c)}, {@code a_F(c) = D̈ + Ω̇ × q + Ω × (Ω × q)}, {@code q = c − D}, and the couple
     * {@code −I Ω̇} (the ball turning with the frame; d'Alembert, any rigid-body dynamics text), so the test is the
     * still one under the gravity {@code g − a_F(c)} and the torque {@code τ_app − I Ω̇}. Patches that move
     * apart (or a moving and a still one) have no common rest: no rest.
     */
    private boolean canRestOnSeveral(double t, double slack) {
        double[] gUse = g;
        System.arraycopy(tApp, 0, tau, 0, 3);
        for (int k = 0; k < contacts.count(); k++) {
            if (contacts.at(k).moving) {
                if (!commonFrame(t, restGravity, tau)) {
                    return false;
                }
                gUse = restGravity;
                break;
            }
        }
        zero(vel);
        zero(w);
        int count = contacts.count();
        solver.clear();
        for (int k = 0; k < count; k++) {
            ContactSlot s = contacts.at(k);
            s.query(t, c);
            readyContext(s);
            solver.addRolling(s.geo.normal, s.geo.hessian);
        }
        if (!solver.solve(vel, w, gUse, fApp, tau)) {
            return false;
        }
        double scaleA = slack * (norm(gUse) + norm(fApp) / m) + 1e-300;
        double moving = norm(solver.acceleration()) + r * norm(solver.angularAcceleration());
        if (!(moving <= scaleA)) {
            return false;
        }
        for (int k = 0; k < count; k++) {
            ContactSlot s = contacts.at(k);
            double fn = solver.normalForce(k);
            if (!(fn > 0)) {
                return false;
            }
            access.setRolling(s.ctx, fn, 0, 0, 0, true);
            double gl = s.law.gripLimit(s.ctx);
            if (!(gl >= 0)) {
                throw badBound("grip limit", gl, "N");
            }
            if (solver.tangentialForce(k) > gl + m * scaleA) {
                return false;
            }
        }
        return true;
    }

    /**
     * Whether every touched patch moves as one rigid body at time {@code t} at the centre {@code c}: the same
     * velocity field value {@code u(c)}, spin {@code Ω}, spin rate {@code Ω̇} and frame acceleration
     * {@code a_F(c)} (to 1e-12 of their scales, so two patches given the same motion pass and patches that move
     * apart do not). If so, writes the rest test's gravity {@code g − a_F(c)} into {@code gOut} and subtracts
     * {@code I Ω̇} from {@code tauInOut}.
     */
    private boolean commonFrame(double t, double[] gOut, double[] tauInOut) {
        int count = contacts.count();
        double[] u0 = restFrame[0];
        double[] a0 = restFrame[1];
        double[] uk = restFrame[2];
        double[] ak = restFrame[3];
        MotionState p0 = contacts.at(0).poseAt(t);
        frameFields(p0, u0, a0);
        double uScale = norm(u0) + norm(p0.spin) * r + 1e-300;
        double aScale = norm(a0) + norm(g) + norm(p0.spinRate) * r + 1e-300;
        for (int k = 1; k < count; k++) {
            MotionState pk = contacts.at(k).poseAt(t);
            frameFields(pk, uk, ak);
            if (distance(u0, uk) > 1e-12 * uScale || distance(p0.spin, pk.spin) * r > 1e-12 * uScale
                || distance(a0, ak) > 1e-12 * aScale || distance(p0.spinRate, pk.spinRate) * r > 1e-12 * aScale) {
                return false;
            }
        }
        for (int i = 0; i < 3; i++) {
            gOut[i] = g[i] - a0[i];
            tauInOut[i] -= inertia * p0.spinRate[i];
        }
        return true;
    }

    /** The velocity field {@code u(c)} and the frame acceleration {@code a_F(c)} of a patch pose at the centre. */
    private void frameFields(MotionState ps, double[] u, double[] a) {
        ps.velocityAt(c, u);
        double[] om = ps.spin;
        double[] sr = ps.spinRate;
        double qx = c[0] - ps.offset[0];
        double qy = c[1] - ps.offset[1];
        double qz = c[2] - ps.offset[2];
        double ux = om[1] * qz - om[2] * qy;
        double uy = om[2] * qx - om[0] * qz;
        double uz = om[0] * qy - om[1] * qx;
        a[0] = sr[1] * qz - sr[2] * qy + om[1] * uz - om[2] * uy + ps.acceleration[0];
        a[1] = sr[2] * qx - sr[0] * qz + om[2] * ux - om[0] * uz + ps.acceleration[1];
        a[2] = sr[0] * qy - sr[1] * qx + om[0] * uy - om[1] * ux + ps.acceleration[2];
    }

    private static double distance(double[] a, double[] b) {
        double x = a[0] - b[0];
        double y = a[1] - b[1];
        double z = a[2] - b[2];
        return Math.sqrt(x * x + y * y + z * z);
    }

    /** Thrown when the evaluation budget is used up. */
    static final class BudgetExhausted extends RuntimeException {
        private static final long serialVersionUID = 1L;

        BudgetExhausted() {
            super("evaluation budget exhausted", null, false, false);
        }
    }
}
