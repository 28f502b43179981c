package org.trundle.core.check;

import java.util.List;
import java.util.Locale;

import org.trundle.core.BallState;
import org.trundle.core.Patch;
import org.trundle.core.internal.Checks;
import org.trundle.core.Simulation;

/**
 * One sampled case of a property: the simulation (ball, surface, law, gravity, settings), the
 * start state and the simulated duration (s), with the seed and index it was made from and a
 * short label (for instance the surface × law pair).
 *
 * <p>{@link #describe()} gives one line that names everything needed to reproduce it:
 * {@code source.make(seed, index)} rebuilds it exactly.
 *
 * <p>Immutable; {@code withX} copies (the minimiser uses them and marks the copy as derived).
 */
public final class PropertyCase {
    private final long seed;
    private final int index;
    private final String label;
    private final Simulation simulation;
    private final BallState start;
    private final double duration;
    private final boolean derived;

    private PropertyCase(long seed, int index, String label, Simulation simulation, BallState start,
                         double duration, boolean derived) {
        if (simulation == null || start == null) {
            throw new IllegalArgumentException("simulation and start must be given, got " + simulation + ", " + start);
        }
        this.seed = seed;
        this.index = index;
        this.label = label == null ? "" : label;
        this.simulation = simulation;
        this.start = start;
        this.duration = Checks.positive("duration", duration);
        this.derived = derived;
    }

    /**
     * @param seed the seed it was made from
     * @param index its index
     * @param label a short label
     * @param simulation the simulation
     * @param start the start state
     * @param duration simulated duration (s)
     * @return the case
     */
    public static PropertyCase of(long seed, int index, String label, Simulation simulation, BallState start,
                                  double duration) {
        return new PropertyCase(seed, index, label, simulation, start, duration, false);
    }

    /** @return the seed */
    public long seed() {
        return seed;
    }

    /** @return the index */
    public int index() {
        return index;
    }

    /** @return the label */
    public String label() {
        return label;
    }

    /** @return the simulation */
    public Simulation simulation() {
        return simulation;
    }

    /** @return the start state */
    public BallState start() {
        return start;
    }

    /** @return the simulated duration (s) */
    public double duration() {
        return duration;
    }

    /** @return whether this case was changed after sampling (by the minimiser) */
    public boolean derived() {
        return derived;
    }

    /**
     * The solver's speed scale of this case, {@code V = max(|v₀|, r|ω₀|, √(|g| r), 1e-3 m/s)}
     * (as documented in {@link org.trundle.core.SolverSettings}), against which speed residuals
     * are judged.
     *
     * @return V (m/s)
     */
    public double speedScale() {
        double r = simulation.ball().radius();
        return Math.max(Math.max(start.velocity().getNorm(), r * start.spin().getNorm()),
            Math.max(Math.sqrt(simulation.gravity().getNorm() * r), 1e-3));
    }

    /**
     * @param s another start
     * @return a derived copy with that start
     */
    public PropertyCase withStart(BallState s) {
        return new PropertyCase(seed, index, label, simulation, s, duration, true);
    }

    /**
     * @param t another duration (s)
     * @return a derived copy with that duration
     */
    public PropertyCase withDuration(double t) {
        return new PropertyCase(seed, index, label, simulation, start, t, true);
    }

    /**
     * @param s another simulation
     * @return a derived copy with that simulation
     */
    public PropertyCase withSimulation(Simulation s) {
        return new PropertyCase(seed, index, label, s, start, duration, true);
    }

    /**
     * @return one line naming the seed, index and every input (in a scene every patch by its id, and the
     *     motion of each patch that moves)
     */
    public String describe() {
        return String.format(Locale.ROOT, "seed=%d index=%d%s %s | %s | %s | %s | g=%s | start %s | T=%.6g s",
            seed, index, derived ? " (simplified)" : "", label, simulation.ball(), patches(),
            simulation.law().name(), simulation.gravity(), start, duration);
    }

    /** The surface, or every patch as {@code id: surface}, each followed by its motion when it moves. */
    private String patches() {
        List<Patch> ps = simulation.patches();
        StringBuilder sb = new StringBuilder();
        for (Patch p : ps) {
            if (sb.length() > 0) {
                sb.append("; ");
            }
            if (ps.size() > 1) {
                sb.append(p.id()).append(": ");
            }
            sb.append(p.surface().name());
            if (!p.motion().stationary()) {
                sb.append(" moving by ").append(p.motion().name());
            }
        }
        return sb.toString();
    }

    @Override
    public String toString() {
        return describe();
    }
}
