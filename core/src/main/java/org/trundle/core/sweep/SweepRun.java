package org.trundle.core.sweep;

import java.util.Optional;

import org.trundle.core.RunResult;

/**
 * The outcome of one run of a sweep: its parameter point and either the run's result or, for a
 * failed run (its set-up or the run threw), the reason.
 *
 * <p>Immutable.
 */
public final class SweepRun {
    private final ParameterPoint point;
    private final RunResult result;
    private final String failure;

    private SweepRun(ParameterPoint point, RunResult result, String failure) {
        this.point = point;
        this.result = result;
        this.failure = failure;
    }

    /**
     * @param point the point
     * @param result its result
     * @return a successful run
     */
    public static SweepRun succeeded(ParameterPoint point, RunResult result) {
        if (point == null || result == null) {
            throw new IllegalArgumentException("point and result must be given, got " + point + ", " + result);
        }
        return new SweepRun(point, result, null);
    }

    /**
     * @param point the point
     * @param reason why it failed (one line)
     * @return a failed run
     */
    public static SweepRun failed(ParameterPoint point, String reason) {
        if (point == null || reason == null) {
            throw new IllegalArgumentException("point and reason must be given, got " + point + ", " + reason);
        }
        return new SweepRun(point, null, reason);
    }

    /**
     * The failure reason of an exception: its class's simple name and its message, on one line.
     *
     * @param e the exception
     * @return the reason
     */
    static String reasonOf(Throwable e) {
        String m = e.getMessage();
        String s = e.getClass().getSimpleName() + (m == null ? "" : ": " + m);
        return s.replace('\n', ' ').replace('\r', ' ');
    }

    /** @return the parameter point */
    public ParameterPoint point() {
        return point;
    }

    /** @return the index of the run in the sweep */
    public int index() {
        return point.index();
    }

    /** @return true when the run produced a result */
    public boolean isSuccess() {
        return result != null;
    }

    /** @return the result, empty for a failed run */
    public Optional<RunResult> result() {
        return Optional.ofNullable(result);
    }

    /** @return the failure reason, empty for a successful run */
    public Optional<String> failure() {
        return Optional.ofNullable(failure);
    }

    @Override
    public String toString() {
        return point + (result != null ? " -> " + result.endReason().label() + " at t=" + result.endState().time()
            : " -> failed: " + failure);
    }
}
