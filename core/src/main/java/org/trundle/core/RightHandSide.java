package org.trundle.core;

import org.trundle.core.engine.Dynamics;
import org.trundle.core.engine.StateMapper;

/**
 * Direct access to the solver's right-hand-side kernel for one fixed phase, for benchmarks and
 * for users who couple Trundle's dynamics to their own integrator. The kernel allocates nothing
 * per call.
 *
 * <p>The state array's layout ({@link #dimension()} components: the ball's kinematic state and
 * the energy ledger) is internal to the solver and may change between versions: make arrays with
 * {@link #toArray(BallState)} and read them back with {@link #toBallState}, never by index. In the
 * rolling phase the centre's derivative is the no-slip velocity {@code r ω × n(c)}.
 *
 * <p>Not thread-safe: one instance per thread (it owns the workspaces).
 */
public final class RightHandSide {
    private final Dynamics dyn;

    /**
     * @param sim the simulation (ball, surface, law, gravity, load)
     * @param phase the phase whose equations to evaluate
     */
    public RightHandSide(Simulation sim, Phase phase) {
        this.dyn = new Dynamics(sim.model(), phase,
            1e-8 * Math.max(1e-3, Math.sqrt(sim.gravity().getNorm() * sim.ball().radius())));
    }

    /** @return the state dimension */
    public int dimension() {
        return StateMapper.DIM;
    }

    /**
     * Evaluates the derivatives.
     *
     * @param t time (s)
     * @param y state array
     * @param yDot output derivative array
     * @throws ArithmeticException when the derivative is not finite (the message names the
     *     component and its likely source) or the law returns a NaN or negative force bound
     */
    public void evaluate(double t, double[] y, double[] yDot) {
        dyn.evaluateChecked(t, y, yDot);
    }

    /** @return the normal force (N) of the last evaluation */
    public double normalForce() {
        return dyn.normalForce();
    }

    /**
     * Reads a ball state out of an array of this layout (the work components are not part of it).
     *
     * @param t time (s)
     * @param y state array, as made by {@link #toArray(BallState)} and integrated
     * @param phase the phase to give the state
     * @return the state
     */
    public static BallState toBallState(double t, double[] y, Phase phase) {
        return StateMapper.toBallState(t, y, phase);
    }

    /**
     * Packs a ball state into the array layout (work components zero).
     *
     * @param s the state
     * @return a new state array
     */
    public static double[] toArray(BallState s) {
        return StateMapper.toArray(s);
    }
}
