package org.trundle.core;

/**
 * Numerical settings of the solver, with defaults suited to ball-handling problems on the
 * millimetre-to-metre and millisecond-to-minute scales. Immutable; {@code withX} copies.
 *
 * <p>The speed scale of a run is {@code V = max(|v₀|, r|ω₀|, √(|g| r), 1e-3 m/s)}.
 * <ul>
 *   <li>{@code tolerance} (default 1e-10): relative tolerance of the Dormand–Prince 8(5,3)
 *       integrator; absolute tolerances are this times the problem's scales (ball radius for
 *       lengths, {@code V} for velocities, {@code V/r} for spins, the energy scale for energies).</li>
 *   <li>{@code maxCheckInterval} (s, default 1e-3): time between two evaluations of an event
 *       function near its root; an event whose function changes sign twice within it may be
 *       missed, so it must be below the shortest phase of interest. Far from a root the detectors
 *       check less often, at half the earliest time a local model of their function (a bound on
 *       its rate, or its measured rate and curvature) allows it to reach zero, and at least at
 *       every step end.</li>
 *   <li>{@code eventTimeTolerance} (s, default 1e-12): convergence of event times.</li>
 *   <li>{@code sampleInterval} (s, default 0): interval of output samples; 0 means one per accepted
 *       step.</li>
 *   <li>{@code stopAtExit} (default true): end the run when the contact point leaves the patch;
 *       otherwise continue in flight.</li>
 *   <li>{@code maxEvaluations} (default 20,000,000) and {@code maxEvents} (default 100,000): the
 *       budget; a run that exhausts it ends with {@link EndReason#BUDGET}.</li>
 *   <li>{@code stickSpeedFraction} (default 1e-8): the stick threshold {@code ε = fraction·V} of the
 *       sliding phase; sliding ends when {@code |s|} falls to {@code ε} and the remaining slip is
 *       removed by a sticking impulse booked as friction loss. The stick instant is early by
 *       {@code ε/|ds/dt|}, that is {@code ε/|s₀|} of the sliding time from an initial slip {@code s₀}; the threshold sits 100 times above the velocity tolerance so that the stick root is located on a smooth stretch of the slip, before its kink.</li>
 *   <li>{@code settleSpeed} (m/s, default 0, meaning {@code 0.01 √(|g| r)}, at least 1e-6 m/s): an
 *       impact whose rebound normal speed is at or below it hands the ball over to rolling or
 *       sliding (where that phase's normal force is positive), so that bouncing settles in finite
 *       time.</li>
 *   <li>{@code restSpeedFraction} (default 1e-5): a ball in contact whose speed {@code |v| + r|ω|}
 *       falls to {@code fraction·V} is tested for static equilibrium (grip and holding couples of
 *       the law); if it holds, the run ends with {@link EndReason#REST}.</li>
 *   <li>{@code smoothingSpinFraction} (default 1e-3): the smoothing spin
 *       {@link ContactContext#smoothingSpin()} {@code = fraction·V/r} of set-valued couples that
 *       may stick while the ball keeps moving (pivoting resistance).</li>
 *   <li>{@code projectionThreshold} (default 0, meaning "follow the tolerance": the threshold is
 *       then {@code tolerance}): distance residual {@code |d − r|}, as a fraction of the ball
 *       radius, above which the centre is projected back onto the offset surface at the end of a
 *       step (the quaternion norm is renormalised past ten times that). A fixed threshold below
 *       the integrator's local error restarts the integration on almost every step at a loose
 *       tolerance, so the default follows it and loosening the tolerance always makes a run
 *       cheaper.</li>
 *   <li>{@code contactTolerance} (default 1e-6): largest gap or penetration of a contact start, as
 *       a fraction of the ball radius, and largest normal or slip speed of a rolling start, as a
 *       fraction of {@code V}.</li>
 * </ul>
 */
public final class SolverSettings {
    private final double tolerance;
    private final double maxCheckInterval;
    private final double eventTimeTolerance;
    private final double sampleInterval;
    private final boolean stopAtExit;
    private final long maxEvaluations;
    private final int maxEvents;
    private final double stickSpeedFraction;
    private final double settleSpeed;
    private final double restSpeedFraction;
    private final double smoothingSpinFraction;
    private final double projectionThreshold;
    private final double contactTolerance;

    private SolverSettings(double tolerance, double maxCheckInterval, double eventTimeTolerance, double sampleInterval, boolean stopAtExit, long maxEvaluations, int maxEvents, double stickSpeedFraction, double settleSpeed, double restSpeedFraction, double smoothingSpinFraction, double projectionThreshold, double contactTolerance) {
        this.tolerance = Checks.positive("tolerance", tolerance);
        this.maxCheckInterval = Checks.positive("maxCheckInterval", maxCheckInterval);
        this.eventTimeTolerance = Checks.positive("eventTimeTolerance", eventTimeTolerance);
        this.sampleInterval = Checks.nonNegative("sampleInterval", sampleInterval);
        this.stopAtExit = stopAtExit;
        if (maxEvaluations <= 0) {
            throw new IllegalArgumentException("maxEvaluations must be positive, got " + maxEvaluations);
        }
        this.maxEvaluations = maxEvaluations;
        if (maxEvents <= 0) {
            throw new IllegalArgumentException("maxEvents must be positive, got " + maxEvents);
        }
        this.maxEvents = maxEvents;
        this.stickSpeedFraction = Checks.positive("stickSpeedFraction", stickSpeedFraction);
        this.settleSpeed = Checks.nonNegative("settleSpeed", settleSpeed);
        this.restSpeedFraction = Checks.positive("restSpeedFraction", restSpeedFraction);
        this.smoothingSpinFraction = Checks.positive("smoothingSpinFraction", smoothingSpinFraction);
        this.projectionThreshold = Checks.nonNegative("projectionThreshold", projectionThreshold);
        this.contactTolerance = Checks.positive("contactTolerance", contactTolerance);
        if (tolerance >= 1e-2) {
            throw new IllegalArgumentException("tolerance must be below 1e-2, got " + tolerance);
        }
    }

    /** @return the default settings */
    public static SolverSettings defaults() {
        return new SolverSettings(1e-10, 1e-3, 1e-12, 0.0, true, 20_000_000L, 100_000, 1e-8, 0.0, 1e-5, 1e-3, 0.0, 1e-6);
    }

    /** @return relative integration tolerance, in (0, 1e-2) */
    public double tolerance() {
        return tolerance;
    }

    /** @return largest interval between event-function checks (s) */
    public double maxCheckInterval() {
        return maxCheckInterval;
    }

    /** @return event time convergence (s) */
    public double eventTimeTolerance() {
        return eventTimeTolerance;
    }

    /** @return sample interval (s); 0 for one sample per accepted step */
    public double sampleInterval() {
        return sampleInterval;
    }

    /** @return whether a run ends at the patch exit */
    public boolean stopAtExit() {
        return stopAtExit;
    }

    /** @return evaluation budget (right-hand-side and event-function evaluations) */
    public long maxEvaluations() {
        return maxEvaluations;
    }

    /** @return event budget (logged events) */
    public int maxEvents() {
        return maxEvents;
    }

    /** @return stick threshold as a fraction of the speed scale */
    public double stickSpeedFraction() {
        return stickSpeedFraction;
    }

    /** @return settle speed (m/s); 0 for the automatic value */
    public double settleSpeed() {
        return settleSpeed;
    }

    /** @return rest speed threshold as a fraction of the speed scale */
    public double restSpeedFraction() {
        return restSpeedFraction;
    }

    /** @return couple smoothing spin as a fraction of the speed scale over the radius */
    public double smoothingSpinFraction() {
        return smoothingSpinFraction;
    }

    /** @return projection threshold as a fraction of the ball radius, as set (0: follow the tolerance) */
    public double projectionThreshold() {
        return projectionThreshold;
    }

    /**
     * @return the projection threshold in force, as a fraction of the ball radius: the set value,
     *     or the tolerance when it is 0
     */
    public double effectiveProjectionThreshold() {
        return projectionThreshold > 0 ? projectionThreshold : tolerance;
    }

    /** @return contact start tolerance as a fraction of the ball radius (lengths) or of the speed scale (speeds) */
    public double contactTolerance() {
        return contactTolerance;
    }

    /**
     * @param v new value: relative integration tolerance, in (0, 1e-2)
     * @return a copy with that value
     */
    public SolverSettings withTolerance(double v) {
        return new SolverSettings(v, maxCheckInterval, eventTimeTolerance, sampleInterval, stopAtExit, maxEvaluations, maxEvents, stickSpeedFraction, settleSpeed, restSpeedFraction, smoothingSpinFraction, projectionThreshold, contactTolerance);
    }

    /**
     * @param v new value: largest interval between event-function checks (s)
     * @return a copy with that value
     */
    public SolverSettings withMaxCheckInterval(double v) {
        return new SolverSettings(tolerance, v, eventTimeTolerance, sampleInterval, stopAtExit, maxEvaluations, maxEvents, stickSpeedFraction, settleSpeed, restSpeedFraction, smoothingSpinFraction, projectionThreshold, contactTolerance);
    }

    /**
     * @param v new value: event time convergence (s)
     * @return a copy with that value
     */
    public SolverSettings withEventTimeTolerance(double v) {
        return new SolverSettings(tolerance, maxCheckInterval, v, sampleInterval, stopAtExit, maxEvaluations, maxEvents, stickSpeedFraction, settleSpeed, restSpeedFraction, smoothingSpinFraction, projectionThreshold, contactTolerance);
    }

    /**
     * @param v new value: sample interval (s); 0 for one sample per accepted step
     * @return a copy with that value
     */
    public SolverSettings withSampleInterval(double v) {
        return new SolverSettings(tolerance, maxCheckInterval, eventTimeTolerance, v, stopAtExit, maxEvaluations, maxEvents, stickSpeedFraction, settleSpeed, restSpeedFraction, smoothingSpinFraction, projectionThreshold, contactTolerance);
    }

    /**
     * @param v new value: whether a run ends at the patch exit
     * @return a copy with that value
     */
    public SolverSettings withStopAtExit(boolean v) {
        return new SolverSettings(tolerance, maxCheckInterval, eventTimeTolerance, sampleInterval, v, maxEvaluations, maxEvents, stickSpeedFraction, settleSpeed, restSpeedFraction, smoothingSpinFraction, projectionThreshold, contactTolerance);
    }

    /**
     * @param v new value: evaluation budget (right-hand-side and event-function evaluations)
     * @return a copy with that value
     */
    public SolverSettings withMaxEvaluations(long v) {
        return new SolverSettings(tolerance, maxCheckInterval, eventTimeTolerance, sampleInterval, stopAtExit, v, maxEvents, stickSpeedFraction, settleSpeed, restSpeedFraction, smoothingSpinFraction, projectionThreshold, contactTolerance);
    }

    /**
     * @param v new value: event budget (logged events)
     * @return a copy with that value
     */
    public SolverSettings withMaxEvents(int v) {
        return new SolverSettings(tolerance, maxCheckInterval, eventTimeTolerance, sampleInterval, stopAtExit, maxEvaluations, v, stickSpeedFraction, settleSpeed, restSpeedFraction, smoothingSpinFraction, projectionThreshold, contactTolerance);
    }

    /**
     * @param v new value: stick threshold as a fraction of the speed scale
     * @return a copy with that value
     */
    public SolverSettings withStickSpeedFraction(double v) {
        return new SolverSettings(tolerance, maxCheckInterval, eventTimeTolerance, sampleInterval, stopAtExit, maxEvaluations, maxEvents, v, settleSpeed, restSpeedFraction, smoothingSpinFraction, projectionThreshold, contactTolerance);
    }

    /**
     * @param v new value: settle speed (m/s); 0 for the automatic value
     * @return a copy with that value
     */
    public SolverSettings withSettleSpeed(double v) {
        return new SolverSettings(tolerance, maxCheckInterval, eventTimeTolerance, sampleInterval, stopAtExit, maxEvaluations, maxEvents, stickSpeedFraction, v, restSpeedFraction, smoothingSpinFraction, projectionThreshold, contactTolerance);
    }

    /**
     * @param v new value: rest speed threshold as a fraction of the speed scale
     * @return a copy with that value
     */
    public SolverSettings withRestSpeedFraction(double v) {
        return new SolverSettings(tolerance, maxCheckInterval, eventTimeTolerance, sampleInterval, stopAtExit, maxEvaluations, maxEvents, stickSpeedFraction, settleSpeed, v, smoothingSpinFraction, projectionThreshold, contactTolerance);
    }

    /**
     * @param v new value: couple smoothing spin as a fraction of the speed scale over the radius
     * @return a copy with that value
     */
    public SolverSettings withSmoothingSpinFraction(double v) {
        return new SolverSettings(tolerance, maxCheckInterval, eventTimeTolerance, sampleInterval, stopAtExit, maxEvaluations, maxEvents, stickSpeedFraction, settleSpeed, restSpeedFraction, v, projectionThreshold, contactTolerance);
    }

    /**
     * @param v new value: projection threshold as a fraction of the ball radius, or 0 to follow the tolerance
     * @return a copy with that value
     */
    public SolverSettings withProjectionThreshold(double v) {
        return new SolverSettings(tolerance, maxCheckInterval, eventTimeTolerance, sampleInterval, stopAtExit, maxEvaluations, maxEvents, stickSpeedFraction, settleSpeed, restSpeedFraction, smoothingSpinFraction, v, contactTolerance);
    }

    /**
     * @param v new value: contact start tolerance as a fraction of the ball radius (lengths) or of the speed scale (speeds)
     * @return a copy with that value
     */
    public SolverSettings withContactTolerance(double v) {
        return new SolverSettings(tolerance, maxCheckInterval, eventTimeTolerance, sampleInterval, stopAtExit, maxEvaluations, maxEvents, stickSpeedFraction, settleSpeed, restSpeedFraction, smoothingSpinFraction, projectionThreshold, v);
    }
}
