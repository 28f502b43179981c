package org.trundle.core;

/**
 * A run that failed numerically (non-finite derivative, integrator failure). It says why and carries
 * the last good state, at the end of the last accepted step. No NaN leaves the library: the run
 * stops with this exception instead.
 */
public class SimulationException extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final transient BallState lastGoodState;

    /**
     * @param message why the run failed
     * @param lastGoodState last good state
     * @param cause underlying exception, or null
     */
    public SimulationException(String message, BallState lastGoodState, Throwable cause) {
        super(message + " (last good state: " + lastGoodState + ")", cause);
        this.lastGoodState = lastGoodState;
    }

    /** @return the state at the end of the last accepted step */
    public BallState lastGoodState() {
        return lastGoodState;
    }
}
