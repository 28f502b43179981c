package org.trundle.core.engine;

/**
 * Leaves the integration when the running thread has been interrupted ({@link Thread#interrupt()});
 * {@link Engine} turns it into a {@link org.trundle.core.SimulationInterruptedException} carrying
 * the last good state. The thread's interrupt status is left set. Internal.
 */
final class Interrupted extends RuntimeException {
    private static final long serialVersionUID = 1L;
    static final Interrupted INSTANCE = new Interrupted();

    private Interrupted() {
        super("thread interrupted", null, false, false);
    }

    /** Throws when the current thread's interrupt status is set (the status stays set). */
    static void check() {
        if (Thread.currentThread().isInterrupted()) {
            throw INSTANCE;
        }
    }
}
