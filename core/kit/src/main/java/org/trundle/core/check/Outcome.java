package org.trundle.core.check;

/**
 * The four outcomes of a robustness probe. Only {@link #FAILURE} is a defect.
 */
public enum Outcome {
    /** The run returned a result with only finite numbers and a normal end (duration, exit, rest). */
    VALID,
    /** The library refused the input with an {@link IllegalArgumentException} carrying a message. */
    REJECTED,
    /** The run stopped in a typed way with a message: end reason budget or geometry, or a
     *  {@link org.trundle.core.SimulationException} with a finite last good state. */
    TYPED_STOP,
    /** Anything else: a non-finite number in a result, a typed stop without a message or without a
     *  finite last good state, an exception of another type (a
     *  {@link org.trundle.core.SurfaceDomainException} out of a run among them), or an exception
     *  without a message. */
    FAILURE;

    /** @return the lower-case name */
    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
