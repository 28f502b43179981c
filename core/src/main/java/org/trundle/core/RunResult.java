package org.trundle.core;

import java.util.List;
import java.util.Optional;

/**
 * The outcome of one run: why it ended (and a message for typed stops), the end state, the event
 * log, the per-phase summary, the energy budget, the largest constraint residuals and contact
 * force, and the work done (right-hand-side evaluations, accepted steps).
 *
 * <p>Residuals: {@link #maxDistanceError()} is the largest {@code |d(c) − r|} (m) seen at the end of
 * an accepted step in contact, before projection. There is no slip residual: while rolling the
 * velocity is not integrated but derived, {@code v = r ω × n}, so the no-slip constraint holds
 * exactly.
 *
 * <p>Immutable.
 *
 * @param endReason why the run ended
 * @param message details for typed stops, empty otherwise
 * @param endState the end state
 * @param events the event log, in time order
 * @param phases the phases visited, in time order
 * @param energy the energy budget
 * @param maxDistanceError largest distance residual (m)
 * @param maxNormalForce largest normal force (N) at step ends and events
 * @param evaluations right-hand-side evaluations: integrator stages, event functions, projections and
 *     switches (the evaluations made only to build output samples are not counted, so the count
 *     does not depend on the observer)
 * @param steps accepted integration steps
 */
public record RunResult(EndReason endReason, String message, BallState endState, List<RunEvent> events,
                        List<PhaseSpan> phases, EnergyBudget energy, double maxDistanceError,
                        double maxNormalForce, long evaluations, long steps) {

    /** Defensive copies of the lists. */
    public RunResult {
        events = List.copyOf(events);
        phases = List.copyOf(phases);
    }

    /** @return the exit event, when the ball left the patch */
    public Optional<RunEvent> exit() {
        return events.stream().filter(e -> e.kind() == EventKind.EXIT).findFirst();
    }

    /**
     * @param kind event kind
     * @return the events of that kind
     */
    public List<RunEvent> eventsOf(EventKind kind) {
        return events.stream().filter(e -> e.kind() == kind).toList();
    }
}
