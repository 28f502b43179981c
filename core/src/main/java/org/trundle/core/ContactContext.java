package org.trundle.core;

/**
 * What a {@link ContactLaw} sees of the contact at one instant, and where it adds its couples.
 *
 * <p>Read: the ball, the contact geometry, the normal force {@code F_n} (N, or the normal impulse
 * in N·s when the law is asked for impulse bounds at an impact, see {@link #isImpulse()}), the
 * slip velocity {@code s = v − r ω × n} of the contact point (m/s), the relative spin
 * {@code ω − ω_surface} (rad/s), and the phase. Write: {@link #addCouple} adds a couple (N·m) acting
 * on the ball, booked under a {@link LossKind}.
 *
 * <p>A mutable view owned by one run and reused on every call, so that the right-hand side
 * allocates nothing; a law must not keep a reference to it.
 */
public final class ContactContext {
    private Ball ball;
    private ContactGeometry geometry;
    private double normalForce;
    private boolean impulse;
    private Phase phase = Phase.ROLLING;
    private double smoothingSpin = 1e-3;
    private double stickSpin = 1e-9;
    private final double[] slip = new double[3];
    private final double[] relativeSpin = new double[3];
    final double[] torque = new double[3];
    final double[] lossRate = new double[LossKind.values().length];
    private boolean rollingSlipZero;

    /** Creates an empty context (the solver makes one per run). */
    public ContactContext() {
    }

    void set(Ball b, ContactGeometry g, double fn, Phase p, double[] s, double[] relSpin, boolean isImpulse) {
        this.ball = b;
        this.geometry = g;
        this.normalForce = fn;
        this.phase = p;
        this.impulse = isImpulse;
        rollingSlipZero = false;
        slip[0] = s[0];
        slip[1] = s[1];
        slip[2] = s[2];
        relativeSpin[0] = relSpin[0];
        relativeSpin[1] = relSpin[1];
        relativeSpin[2] = relSpin[2];
        torque[0] = 0;
        torque[1] = 0;
        torque[2] = 0;
        // element by element: for four entries this is cheaper than Arrays.fill
        for (int i = 0; i < lossRate.length; i++) {
            lossRate[i] = 0.0;
        }
    }

    /**
     * The rolling contact of the solver's hot path: no slip, no impulse, the given spin; the ball
     * and geometry stay those of the last {@link #set}. Couples and loss rates are cleared only
     * when the law may add them.
     */
    void setRolling(double fn, double wx, double wy, double wz, boolean clearCouples) {
        this.normalForce = fn;
        if (phase != Phase.ROLLING || impulse) {
            this.phase = Phase.ROLLING;
            this.impulse = false;
        }
        // the slip stays zero from one rolling call to the next; any other use resets it
        if (!rollingSlipZero) {
            slip[0] = 0;
            slip[1] = 0;
            slip[2] = 0;
            rollingSlipZero = true;
        }
        relativeSpin[0] = wx;
        relativeSpin[1] = wy;
        relativeSpin[2] = wz;
        if (clearCouples) {
            torque[0] = 0;
            torque[1] = 0;
            torque[2] = 0;
            for (int i = 0; i < lossRate.length; i++) {
                lossRate[i] = 0.0;
            }
        }
    }

    /**
     * Prepares the context outside the solver (for testing a law on its own).
     *
     * @param b ball
     * @param g contact geometry
     * @param fn normal force (N)
     * @param p phase
     * @param s slip velocity (m/s)
     * @param relSpin relative spin (rad/s)
     */
    public void prepare(Ball b, ContactGeometry g, double fn, Phase p, double[] s, double[] relSpin) {
        set(b, g, fn, p, s, relSpin, false);
    }

    /**
     * Spin (rad/s) below which set-valued couples (rolling and pivoting resistance) are
     * regularised: a couple law uses {@code w / max(|w|, smoothingSpin())} in place of the unit
     * vector {@code ŵ}, so that inside the band the couple is proportional to the spin and can never
     * reverse the motion it opposes. Set by the solver from
     * {@link SolverSettings#smoothingSpinFraction()} times the speed scale over the radius.
     *
     * @return smoothing spin (rad/s, &gt; 0)
     */
    public double smoothingSpin() {
        return smoothingSpin;
    }

    void setSmoothingSpin(double w) {
        this.smoothingSpin = w;
    }

    /**
     * The stick threshold expressed as a spin, {@code ε/r} (rad/s), with {@code ε} the sliding
     * phase's stick speed ({@link SolverSettings#stickSpeedFraction()}). A couple whose sticking
     * means the ball has stopped (rolling resistance on a static surface: zero rolling spin with no
     * slip is zero speed) regularises with this much narrower band: the solver's rest test fires
     * before the band is reached, so the band never makes the run stiff.
     *
     * @return stick spin (rad/s, &gt; 0)
     */
    public double stickSpin() {
        return stickSpin;
    }

    void setStickSpin(double w) {
        this.stickSpin = w;
    }

    /** @return the ball */
    public Ball ball() {
        return ball;
    }

    /** @return the contact geometry (read only) */
    public ContactGeometry geometry() {
        return geometry;
    }

    /** @return normal force F_n (N), or normal impulse (N·s) when {@link #isImpulse()} */
    public double normalForce() {
        return normalForce;
    }

    /** @return true when the law is asked for impulse bounds at an impact */
    public boolean isImpulse() {
        return impulse;
    }

    /** @return the phase being evaluated (rolling or sliding) */
    public Phase phase() {
        return phase;
    }

    /**
     * @param i component 0..2
     * @return component i of the unit normal toward the ball
     */
    public double normal(int i) {
        return geometry.normal[i];
    }

    /**
     * @param i component 0..2
     * @return component i of the contact-point slip velocity s (m/s); zero while rolling
     */
    public double slip(int i) {
        return slip[i];
    }

    /** @return slip speed |s| (m/s) */
    public double slipSpeed() {
        return Math.sqrt(slip[0] * slip[0] + slip[1] * slip[1] + slip[2] * slip[2]);
    }

    /**
     * @param i component 0..2
     * @return component i of the spin relative to the surface (rad/s)
     */
    public double relativeSpin(int i) {
        return relativeSpin[i];
    }

    /** @return spin about the normal, (ω − ω_surface)·n (rad/s) */
    public double normalSpin() {
        double[] n = geometry.normal;
        return relativeSpin[0] * n[0] + relativeSpin[1] * n[1] + relativeSpin[2] * n[2];
    }

    /**
     * The sum of the couples added since the context was last prepared (for testing a law on its
     * own and for observers of a single law).
     *
     * @param i component 0..2
     * @return component i of the contact couple (N·m)
     */
    public double couple(int i) {
        return torque[i];
    }

    /**
     * The power dissipated by the couples booked under {@code kind} since the context was last
     * prepared, {@code −τ·(ω − ω_surface)} summed over those couples.
     *
     * @param kind loss kind
     * @return dissipated power (W); positive when the couples oppose the relative spin
     */
    public double lossRate(LossKind kind) {
        return lossRate[kind.ordinal()];
    }

    /**
     * Adds a contact couple acting on the ball and books the power it dissipates,
     * {@code −τ·(ω − ω_surface)}, under {@code kind}.
     *
     * @param tx couple x (N·m)
     * @param ty couple y (N·m)
     * @param tz couple z (N·m)
     * @param kind where the dissipated energy is booked
     */
    public void addCouple(double tx, double ty, double tz, LossKind kind) {
        torque[0] += tx;
        torque[1] += ty;
        torque[2] += tz;
        lossRate[kind.ordinal()] -= tx * relativeSpin[0] + ty * relativeSpin[1] + tz * relativeSpin[2];
    }
}
