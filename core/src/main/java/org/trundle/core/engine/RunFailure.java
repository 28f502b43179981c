package org.trundle.core.engine;

/**
 * Why a run cannot go on: a derivative that is not finite, or an answer from user code (a surface's
 * geometry, a contact law's force bound) that breaks its contract. Internal and without a stack
 * trace: {@link Engine} turns it into a {@link org.trundle.core.SimulationException} carrying the
 * last good state; it never leaves the engine.
 */
final class RunFailure extends RuntimeException {
    private static final long serialVersionUID = 1L;

    RunFailure(String message) {
        super(message, null, false, false);
    }
}
