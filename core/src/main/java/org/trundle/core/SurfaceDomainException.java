package org.trundle.core;

/**
 * Thrown by a {@link Surface} for a query point where its closest point is not defined (on a
 * cylinder's axis, at a cone's apex, beyond a spline's ends). The solver turns it into a typed
 * stop of the run with the last good state.
 */
public class SurfaceDomainException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /**
     * @param message what went wrong, naming the surface and the numbers
     */
    public SurfaceDomainException(String message) {
        super(message);
    }
}
