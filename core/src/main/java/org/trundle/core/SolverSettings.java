package org.trundle.core;

/**
 * Numerical settings of the solver, with defaults suited to ball-handling problems on the
 * millimetre-to-metre and millisecond-to-minute scales. Immutable; {@code withX} copies.
 *
 * <ul>
 *   <li>{@code tolerance} (default 1e-10): relative tolerance of the Dormand–Prince 8(5,3)
 *       integrator; absolute tolerances are this times the problem's scales (ball radius for
 *       lengths, the speed scale for velocities, speed/radius for spins, the energy scale for
 *       energies).</li>
 *   <li>{@code maxCheckInterval} (s, default 1e-3): largest time between two evaluations of the
 *       event functions; an event whose function changes sign twice within it may be missed, so it
 *       must be below the shortest phase of interest.</li>
 *   <li>{@code eventTimeTolerance} (s, default 1e-12): convergence of event times.</li>
 *   <li>{@code sampleInterval} (s, default 0): interval of output samples; 0 means one per accepted
 *       step.</li>
 *   <li>{@code stopAtExit} (default true): end the run when the contact point leaves the patch;
 *       otherwise continue in flight.</li>
 *   <li>{@code maxEvaluations} (default 20,000,000) and {@code maxEvents} (default 100,000): the
 *       budget; a run that exhausts it ends with {@link EndReason#BUDGET}.</li>
 *   <li>{@code stickSpeedFraction} (default 1e-8): the stick threshold {@code ε} of the sliding
 *       phase as a fraction of the speed scale {@code V = max(|v₀|, r|ω₀|, √(|g| r), 1e-3 m/s)};
 *       sliding ends when {@code |s|} falls to {@code ε}, the remaining slip is removed by a
 *       sticking impulse booked as friction loss.</li>
 *   <li>{@code settleSpeed} (m/s, default 0, meaning {@code 0.01 √(|g| r)}, at least 1e-6 m/s): an
 *       impact whose rebound normal speed is at or below it hands the ball over to rolling or
 *       sliding (where that phase's normal force is positive), so that bouncing settles in finite
 *       time.</li>
 *   <li>{@code projectionThreshold} (default 1e-11): distance residual {@code |d − r|}, as a
 *       fraction of the ball radius, above which the centre is projected back onto the offset
 *       surface at the end of a step.</li>
 *   <li>{@code contactTolerance} (default 1e-6): largest gap or penetration of a contact start, as
 *       a fraction of the ball radius.</li>
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
    private final double projectionThreshold;
    private final double contactTolerance;

    private SolverSettings(double tolerance, double maxCheckInterval, double eventTimeTolerance,
                           double sampleInterval, boolean stopAtExit, long maxEvaluations, int maxEvents,
                           double stickSpeedFraction, double settleSpeed, double projectionThreshold,
                           double contactTolerance) {
        this.tolerance = Checks.positive("tolerance", tolerance);
        if (tolerance >= 1e-2) {
            throw new IllegalArgumentException("tolerance must be below 1e-2, got " + tolerance);
        }
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
        this.projectionThreshold = Checks.positive("projectionThreshold", projectionThreshold);
        this.contactTolerance = Checks.positive("contactTolerance", contactTolerance);
    }

    /** @return the default settings */
    public static SolverSettings defaults() {
        return new SolverSettings(1e-10, 1e-3, 1e-12, 0.0, true, 20_000_000L, 100_000, 1e-8, 0.0, 1e-11, 1e-6);
    }

    /** @return relative integration tolerance */
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

    /** @return sample interval (s); 0 for one sample per step */
    public double sampleInterval() {
        return sampleInterval;
    }

    /** @return whether a run ends at the patch exit */
    public boolean stopAtExit() {
        return stopAtExit;
    }

    /** @return evaluation budget */
    public long maxEvaluations() {
        return maxEvaluations;
    }

    /** @return event budget */
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

    /** @return projection threshold as a fraction of the ball radius */
    public double projectionThreshold() {
        return projectionThreshold;
    }

    /** @return contact start tolerance as a fraction of the ball radius */
    public double contactTolerance() {
        return contactTolerance;
    }

    /**
     * @param v relative tolerance, in (0, 1e-2)
     * @return a copy
     */
    public SolverSettings withTolerance(double v) {
        return new SolverSettings(v, maxCheckInterval, eventTimeTolerance, sampleInterval, stopAtExit,
            maxEvaluations, maxEvents, stickSpeedFraction, settleSpeed, projectionThreshold, contactTolerance);
    }

    /**
     * @param v max check interval (s)
     * @return a copy
     */
    public SolverSettings withMaxCheckInterval(double v) {
        return new SolverSettings(tolerance, v, eventTimeTolerance, sampleInterval, stopAtExit,
            maxEvaluations, maxEvents, stickSpeedFraction, settleSpeed, projectionThreshold, contactTolerance);
    }

    /**
     * @param v event time tolerance (s)
     * @return a copy
     */
    public SolverSettings withEventTimeTolerance(double v) {
        return new SolverSettings(tolerance, maxCheckInterval, v, sampleInterval, stopAtExit,
            maxEvaluations, maxEvents, stickSpeedFraction, settleSpeed, projectionThreshold, contactTolerance);
    }

    /**
     * @param v sample interval (s), 0 for every step
     * @return a copy
     */
    public SolverSettings withSampleInterval(double v) {
        return new SolverSettings(tolerance, maxCheckInterval, eventTimeTolerance, v, stopAtExit,
            maxEvaluations, maxEvents, stickSpeedFraction, settleSpeed, projectionThreshold, contactTolerance);
    }

    /**
     * @param v whether to stop at the exit
     * @return a copy
     */
    public SolverSettings withStopAtExit(boolean v) {
        return new SolverSettings(tolerance, maxCheckInterval, eventTimeTolerance, sampleInterval, v,
            maxEvaluations, maxEvents, stickSpeedFraction, settleSpeed, projectionThreshold, contactTolerance);
    }

    /**
     * @param v evaluation budget
     * @return a copy
     */
    public SolverSettings withMaxEvaluations(long v) {
        return new SolverSettings(tolerance, maxCheckInterval, eventTimeTolerance, sampleInterval, stopAtExit,
            v, maxEvents, stickSpeedFraction, settleSpeed, projectionThreshold, contactTolerance);
    }

    /**
     * @param v event budget
     * @return a copy
     */
    public SolverSettings withMaxEvents(int v) {
        return new SolverSettings(tolerance, maxCheckInterval, eventTimeTolerance, sampleInterval, stopAtExit,
            maxEvaluations, v, stickSpeedFraction, settleSpeed, projectionThreshold, contactTolerance);
    }

    /**
     * @param v stick threshold fraction
     * @return a copy
     */
    public SolverSettings withStickSpeedFraction(double v) {
        return new SolverSettings(tolerance, maxCheckInterval, eventTimeTolerance, sampleInterval, stopAtExit,
            maxEvaluations, maxEvents, v, settleSpeed, projectionThreshold, contactTolerance);
    }

    /**
     * @param v settle speed (m/s), 0 for automatic
     * @return a copy
     */
    public SolverSettings withSettleSpeed(double v) {
        return new SolverSettings(tolerance, maxCheckInterval, eventTimeTolerance, sampleInterval, stopAtExit,
            maxEvaluations, maxEvents, stickSpeedFraction, v, projectionThreshold, contactTolerance);
    }

    /**
     * @param v projection threshold fraction of r
     * @return a copy
     */
    public SolverSettings withProjectionThreshold(double v) {
        return new SolverSettings(tolerance, maxCheckInterval, eventTimeTolerance, sampleInterval, stopAtExit,
            maxEvaluations, maxEvents, stickSpeedFraction, settleSpeed, v, contactTolerance);
    }

    /**
     * @param v contact start tolerance fraction of r
     * @return a copy
     */
    public SolverSettings withContactTolerance(double v) {
        return new SolverSettings(tolerance, maxCheckInterval, eventTimeTolerance, sampleInterval, stopAtExit,
            maxEvaluations, maxEvents, stickSpeedFraction, settleSpeed, projectionThreshold, v);
    }
}
