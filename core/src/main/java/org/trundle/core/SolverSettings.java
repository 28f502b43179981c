package org.trundle.core;

/**
 * Numerical settings of the solver, with defaults suited to ball-handling problems on the
 * millimetre-to-metre and millisecond-to-minute scales: four small groups, each an immutable
 * record that checks its own values.
 *
 * <ul>
 *   <li>{@link IntegrationSettings}: the method, the integrator's tolerance, the projection threshold,
 *       and the fixed step and order of the symmetric method for long runs;</li>
 *   <li>{@link EventSettings}: the spacing of event checks near a root and the event time convergence;</li>
 *   <li>{@link ContactThresholds}: the stick, settle, rest, smoothing and contact-start thresholds;</li>
 *   <li>{@link RunControl}: output sampling, the end at the patch exit, the budget.</li>
 * </ul>
 *
 * <p>Start from {@link #defaults()} and change single values with the {@code withX} copies
 * ({@code SolverSettings.defaults().withTolerance(1e-9).withMaxEvents(500)}), or a whole group with
 * {@link #withIntegration}, {@link #withEvents}, {@link #withContact}, {@link #withRun}. Each group's
 * Javadoc gives the meaning, unit and default of its values; the flat accessors ({@link #tolerance()},
 * ...) read through to the group.
 *
 * <p>The speed scale of a run is {@code V = max(|v₀|, r|ω₀|, √(|g| r), 1e-3 m/s)}.
 *
 * @param integration integration tolerance and projection
 * @param events event location
 * @param contact thresholds of the contact's switching rules
 * @param run output sampling, end at exit, budget
 */
public record SolverSettings(IntegrationSettings integration, EventSettings events, ContactThresholds contact,
        RunControl run) {
    /** Checks that every group is given. */
    public SolverSettings {
        given("integration", integration);
        given("events", events);
        given("contact", contact);
        given("run", run);
    }

    private static void given(String name, Object group) {
        if (group == null) {
            throw new IllegalArgumentException(name + " must be given, got null");
        }
    }

    /** @return the default settings (each group's defaults) */
    public static SolverSettings defaults() {
        return new SolverSettings(IntegrationSettings.defaults(), EventSettings.defaults(), ContactThresholds.defaults(),
                RunControl.defaults());
    }

    /**
     * @param v new integration group
     * @return a copy with that group
     */
    public SolverSettings withIntegration(IntegrationSettings v) {
        return new SolverSettings(v, events, contact, run);
    }

    /**
     * @param v new event location group
     * @return a copy with that group
     */
    public SolverSettings withEvents(EventSettings v) {
        return new SolverSettings(integration, v, contact, run);
    }

    /**
     * @param v new contact thresholds
     * @return a copy with that group
     */
    public SolverSettings withContact(ContactThresholds v) {
        return new SolverSettings(integration, events, v, run);
    }

    /**
     * @param v new run control group
     * @return a copy with that group
     */
    public SolverSettings withRun(RunControl v) {
        return new SolverSettings(integration, events, contact, v);
    }

    /** @return relative integration tolerance, in (0, 1e-2) */
    public double tolerance() {
        return integration.tolerance();
    }

    /** @return the integration method */
    public Integrator integrator() {
        return integration.integrator();
    }

    /** @return step of the symmetric method (s) */
    public double fixedStep() {
        return integration.fixedStep();
    }

    /** @return order of the symmetric method (2, 4 or 6) */
    public int symmetricOrder() {
        return integration.symmetricOrder();
    }

    /** @return projection threshold as a fraction of the ball radius, as set (0: follow the tolerance) */
    public double projectionThreshold() {
        return integration.projectionThreshold();
    }

    /**
     * @return the projection threshold in force, as a fraction of the ball radius: the set value,
     *     or the tolerance when it is 0
     */
    public double effectiveProjectionThreshold() {
        return integration.effectiveProjectionThreshold();
    }

    /** @return largest interval between event-function checks (s) */
    public double maxCheckInterval() {
        return events.maxCheckInterval();
    }

    /** @return event time convergence (s) */
    public double eventTimeTolerance() {
        return events.eventTimeTolerance();
    }

    /** @return stick threshold as a fraction of the speed scale */
    public double stickSpeedFraction() {
        return contact.stickSpeedFraction();
    }

    /** @return settle speed (m/s); 0 for the automatic value */
    public double settleSpeed() {
        return contact.settleSpeed();
    }

    /** @return rest speed threshold as a fraction of the speed scale */
    public double restSpeedFraction() {
        return contact.restSpeedFraction();
    }

    /** @return couple smoothing spin as a fraction of the speed scale over the radius */
    public double smoothingSpinFraction() {
        return contact.smoothingSpinFraction();
    }

    /** @return contact start tolerance as a fraction of the ball radius (lengths) or of the speed scale (speeds) */
    public double contactTolerance() {
        return contact.contactTolerance();
    }

    /** @return sample interval (s); 0 for one sample per accepted step */
    public double sampleInterval() {
        return run.sampleInterval();
    }

    /** @return whether a run ends at the patch exit */
    public boolean stopAtExit() {
        return run.stopAtExit();
    }

    /** @return evaluation budget (right-hand-side and event-function evaluations) */
    public long maxEvaluations() {
        return run.maxEvaluations();
    }

    /** @return event budget (logged events) */
    public int maxEvents() {
        return run.maxEvents();
    }

    /**
     * @param v new value: relative integration tolerance, in (0, 1e-2)
     * @return a copy with that value
     */
    public SolverSettings withTolerance(double v) {
        return withIntegration(integration.withTolerance(v));
    }

    /**
     * @param v new value: projection threshold as a fraction of the ball radius, or 0 to follow the tolerance
     * @return a copy with that value
     */
    public SolverSettings withProjectionThreshold(double v) {
        return withIntegration(integration.withProjectionThreshold(v));
    }

    /**
     * @param v new value: the integration method ({@link Integrator#SYMMETRIC_PROJECTION} for long
     *     conservative runs)
     * @return a copy with that value
     */
    public SolverSettings withIntegrator(Integrator v) {
        return withIntegration(integration.withIntegrator(v));
    }

    /**
     * @param v new value: step of the symmetric method (s), positive and finite
     * @return a copy with that value
     */
    public SolverSettings withFixedStep(double v) {
        return withIntegration(integration.withFixedStep(v));
    }

    /**
     * @param v new value: order of the symmetric method, 2, 4 or 6
     * @return a copy with that value
     */
    public SolverSettings withSymmetricOrder(int v) {
        return withIntegration(integration.withSymmetricOrder(v));
    }

    /**
     * @param v new value: largest interval between event-function checks (s)
     * @return a copy with that value
     */
    public SolverSettings withMaxCheckInterval(double v) {
        return withEvents(new EventSettings(v, events.eventTimeTolerance()));
    }

    /**
     * @param v new value: event time convergence (s)
     * @return a copy with that value
     */
    public SolverSettings withEventTimeTolerance(double v) {
        return withEvents(new EventSettings(events.maxCheckInterval(), v));
    }

    /**
     * @param v new value: stick threshold as a fraction of the speed scale
     * @return a copy with that value
     */
    public SolverSettings withStickSpeedFraction(double v) {
        return withContact(new ContactThresholds(v, contact.settleSpeed(), contact.restSpeedFraction(), contact.smoothingSpinFraction(), contact.contactTolerance()));
    }

    /**
     * @param v new value: settle speed (m/s); 0 for the automatic value
     * @return a copy with that value
     */
    public SolverSettings withSettleSpeed(double v) {
        return withContact(new ContactThresholds(contact.stickSpeedFraction(), v, contact.restSpeedFraction(), contact.smoothingSpinFraction(), contact.contactTolerance()));
    }

    /**
     * @param v new value: rest speed threshold as a fraction of the speed scale
     * @return a copy with that value
     */
    public SolverSettings withRestSpeedFraction(double v) {
        return withContact(new ContactThresholds(contact.stickSpeedFraction(), contact.settleSpeed(), v, contact.smoothingSpinFraction(), contact.contactTolerance()));
    }

    /**
     * @param v new value: couple smoothing spin as a fraction of the speed scale over the radius
     * @return a copy with that value
     */
    public SolverSettings withSmoothingSpinFraction(double v) {
        return withContact(new ContactThresholds(contact.stickSpeedFraction(), contact.settleSpeed(), contact.restSpeedFraction(), v, contact.contactTolerance()));
    }

    /**
     * @param v new value: contact start tolerance as a fraction of the ball radius (lengths) or of the speed scale (speeds)
     * @return a copy with that value
     */
    public SolverSettings withContactTolerance(double v) {
        return withContact(new ContactThresholds(contact.stickSpeedFraction(), contact.settleSpeed(), contact.restSpeedFraction(), contact.smoothingSpinFraction(), v));
    }

    /**
     * @param v new value: sample interval (s); 0 for one sample per accepted step
     * @return a copy with that value
     */
    public SolverSettings withSampleInterval(double v) {
        return withRun(new RunControl(v, run.stopAtExit(), run.maxEvaluations(), run.maxEvents()));
    }

    /**
     * @param v new value: whether a run ends at the patch exit
     * @return a copy with that value
     */
    public SolverSettings withStopAtExit(boolean v) {
        return withRun(new RunControl(run.sampleInterval(), v, run.maxEvaluations(), run.maxEvents()));
    }

    /**
     * @param v new value: evaluation budget (right-hand-side and event-function evaluations)
     * @return a copy with that value
     */
    public SolverSettings withMaxEvaluations(long v) {
        return withRun(new RunControl(run.sampleInterval(), run.stopAtExit(), v, run.maxEvents()));
    }

    /**
     * @param v new value: event budget (logged events)
     * @return a copy with that value
     */
    public SolverSettings withMaxEvents(int v) {
        return withRun(new RunControl(run.sampleInterval(), run.stopAtExit(), run.maxEvaluations(), v));
    }
}
