package org.trundle.core.sweep;

/**
 * The result of a {@link BoundarySearch}: a bracket {@code [low, high]} of the parameter, no wider
 * than the requested tolerance, with the outcome of the run at each end (they differ), the number
 * of runs made and the outcome-defining runs at both ends.
 *
 * @param parameter parameter name
 * @param low lower end of the bracket
 * @param high upper end of the bracket
 * @param outcomeAtLow outcome of the run at {@code low}
 * @param outcomeAtHigh outcome of the run at {@code high}
 * @param runs number of runs made, the two initial ends included
 * @param lowRun the run at {@code low}
 * @param highRun the run at {@code high}
 */
public record Boundary(String parameter, double low, double high, Object outcomeAtLow, Object outcomeAtHigh,
                       int runs, SweepRun lowRun, SweepRun highRun) {
    /** @return the midpoint of the bracket, the best single estimate of the boundary */
    public double estimate() {
        return 0.5 * (low + high);
    }

    /** @return the width of the bracket, {@code high − low} */
    public double width() {
        return high - low;
    }
}
