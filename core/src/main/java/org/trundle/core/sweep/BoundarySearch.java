package org.trundle.core.sweep;

import java.util.List;
import java.util.Objects;
import java.util.function.Function;

/**
 * Bisection on one parameter for the value where a user-defined outcome of a run changes, such as
 * the slowest entry speed that still brings the ball back out of a tube.
 *
 * <p>Given ends {@code a < b} whose runs have different outcomes {@code O(a) ≠ O(b)}, each step runs
 * the midpoint {@code m} and keeps the half whose ends still differ: {@code a ← m} when
 * {@code O(m) = O(a)}, else {@code b ← m}. After {@code ⌈log₂((b − a)/tol)⌉} steps the bracket is no
 * wider than {@code tol} and contains a point where the outcome changes (bisection method; any
 * numerical-analysis text, e.g. Burden &amp; Faires, Numerical Analysis, §2.1). When the outcome
 * changes more than once inside {@code [a, b]} the search finds one of the changes, the one its
 * halvings lead to. Outcomes are compared with {@link Objects#equals}; the outcome function sees
 * failed runs too, so a failure can be an outcome of its own.
 *
 * <p>Runs are made one at a time on the calling thread, so the result does not depend on any
 * thread count. Immutable and thread-safe.
 */
public final class BoundarySearch {
    private final String parameter;
    private final double low;
    private final double high;
    private final double tolerance;

    private BoundarySearch(String parameter, double low, double high, double tolerance) {
        ParameterPoint.checkName(parameter);
        if (!Double.isFinite(low) || !Double.isFinite(high) || !(low < high)) {
            throw new IllegalArgumentException("search bounds of " + parameter + " must be finite with low < high, got low = "
                + low + ", high = " + high);
        }
        if (!(tolerance > 0) || !Double.isFinite(tolerance)) {
            throw new IllegalArgumentException("search tolerance must be finite and positive, got " + tolerance);
        }
        this.parameter = parameter;
        this.low = low;
        this.high = high;
        this.tolerance = tolerance;
    }

    /**
     * @param parameter name of the parameter searched (the one name of the points the factory sees)
     * @param low lower end of the search interval
     * @param high upper end, {@code > low}
     * @param tolerance largest width of the final bracket (units of the parameter), {@code > 0}
     * @return the search
     */
    public static BoundarySearch of(String parameter, double low, double high, double tolerance) {
        return new BoundarySearch(parameter, low, high, tolerance);
    }

    /**
     * Runs the search.
     *
     * @param factory builds the run for a one-parameter point
     * @param outcome the outcome of a run (successful or failed); must not return null
     * @return the final bracket
     * @throws IllegalArgumentException when the outcomes at both ends are equal (no change to find)
     */
    public Boundary find(RunFactory factory, Function<SweepRun, ?> outcome) {
        return find(factory, outcome, new Cancellation());
    }

    /**
     * Runs the search until the bracket is narrow enough or {@code cancel} is set.
     *
     * @param factory builds the run for a one-parameter point
     * @param outcome the outcome of a run (successful or failed); must not return null
     * @param cancel cancellation flag; when set the current bracket is returned
     * @return the final bracket (wider than the tolerance only when cancelled)
     * @throws IllegalArgumentException when the outcomes at both ends are equal (no change to find)
     */
    public Boundary find(RunFactory factory, Function<SweepRun, ?> outcome, Cancellation cancel) {
        if (factory == null || outcome == null || cancel == null) {
            throw new IllegalArgumentException("factory, outcome and cancellation must be given");
        }
        List<String> names = List.of(parameter);
        int[] count = {0};
        Function<Double, SweepRun> runAt = x -> {
            SweepRun r = Sweep.runPoint(factory, new ParameterPoint(count[0]++, names, new double[] {x}), () -> false);
            return r;
        };
        double a = low;
        double b = high;
        SweepRun ra = runAt.apply(a);
        SweepRun rb = runAt.apply(b);
        Object oa = outcomeOf(outcome, ra);
        Object ob = outcomeOf(outcome, rb);
        if (Objects.equals(oa, ob)) {
            throw new IllegalArgumentException("outcome is " + oa + " at both ends of the search on " + parameter
                + " (" + a + " and " + b + "): no change to bracket");
        }
        while (b - a > tolerance && !cancel.isCancelled()) {
            double m = a + 0.5 * (b - a);
            if (m <= a || m >= b) {
                break; // adjacent doubles: the bracket cannot shrink further
            }
            SweepRun rm = runAt.apply(m);
            Object om = outcomeOf(outcome, rm);
            if (Objects.equals(om, oa)) {
                a = m;
                ra = rm;
            } else {
                b = m;
                rb = rm;
                ob = om;
            }
        }
        return new Boundary(parameter, a, b, oa, ob, count[0], ra, rb);
    }

    private static Object outcomeOf(Function<SweepRun, ?> outcome, SweepRun r) {
        Object o = outcome.apply(r);
        if (o == null) {
            throw new IllegalArgumentException("outcome function returned null for " + r);
        }
        return o;
    }
}
