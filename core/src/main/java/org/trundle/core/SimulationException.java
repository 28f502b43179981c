package org.trundle.core;

/**
 * A run that could not go on. It says why and carries the last good state (the end of the last
 * accepted step, or the start when the run failed before its first step). Every failure of
 * {@link Simulation#run} is one of these, so that no NaN and no unexplained exception leaves the
 * library:
 * <ul>
 *   <li>a derivative that is not finite (numbers beyond the range of {@code double}, such as a mass
 *       of 1e308 kg under gravity), with the quantity that overflowed named in the message;</li>
 *   <li>an answer from user code that breaks its contract: a {@link Surface} geometry that is not
 *       finite or whose normal is not a unit vector, a {@link ContactLaw} force bound that is NaN
 *       or negative, a couple or applied load that is not finite;</li>
 *   <li>an exception thrown by user code (contact law, applied load, surface, observer), which is
 *       the {@link #getCause() cause};</li>
 *   <li>an integrator failure;</li>
 *   <li>an interrupt of the running thread ({@link SimulationInterruptedException}).</li>
 * </ul>
 * A start that is inconsistent with the surface is rejected before the run with an
 * {@link IllegalArgumentException} instead; a stop the geometry forces (the ball no longer fits,
 * the surface is undefined where it goes) is a result with {@link EndReason#GEOMETRY}.
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

    /** @return the state at the end of the last accepted step (the start if there was none) */
    public BallState lastGoodState() {
        return lastGoodState;
    }
}
