package org.trundle.core;

/**
 * A run stopped because its thread was interrupted ({@link Thread#interrupt()}). The run checks the
 * interrupt status at every accepted step and at every new state its event detectors examine, so it
 * stops within one step of the interrupt; it carries the last good state like any other
 * {@link SimulationException}. The thread's interrupt status is left set, so that the caller (an
 * executor shutting down, say) still sees it.
 */
public class SimulationInterruptedException extends SimulationException {
    private static final long serialVersionUID = 1L;

    /**
     * @param message where the run stopped
     * @param lastGoodState last good state
     */
    public SimulationInterruptedException(String message, BallState lastGoodState) {
        super(message, lastGoodState, null);
    }
}
