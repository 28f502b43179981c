package org.trundle.core.sweep;

import java.util.concurrent.atomic.AtomicBoolean;

/**
 * A flag that stops a {@link Sweep} (or a {@link BoundarySearch}) from any thread: after
 * {@link #cancel()} no new run starts and the runs in flight are abandoned at their next output
 * sample. Thread-safe; one-way (it cannot be reset).
 */
public final class Cancellation {
    private final AtomicBoolean cancelled = new AtomicBoolean();

    /** A flag that is not yet set. */
    public Cancellation() {
    }

    /** Sets the flag. */
    public void cancel() {
        cancelled.set(true);
    }

    /** @return whether {@link #cancel()} was called */
    public boolean isCancelled() {
        return cancelled.get();
    }
}
