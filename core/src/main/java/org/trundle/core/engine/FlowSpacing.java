package org.trundle.core.engine;

/**
 * Check spacing of a rule whose function {@code f} (normal force; grip minus needed tangential
 * force) has no cheap analytic bound on its rate: a local model is fitted to the rule's last three
 * checks in the segment (values computed anyway, so no extra evaluation): the quadratic through
 * them gives the rate {@code ḟ} and the curvature {@code f̈} now. The pessimistic model
 * {@code f + ḟ τ − ½|f̈| τ² = 0} gives the earliest time {@code τ₀} the function could reach zero;
 * the next check is at {@code τ₀/2}, and never sooner than the configured interval (so a rule is
 * never checked less often than with a fixed interval near a root; until three checks exist, the
 * configured interval is used). Common practice for event location (check spacing from a local
 * model of the event function).
 */
final class FlowSpacing {
    private final double[] ht = new double[3];
    private final double[] hf = new double[3];
    private int count;

    /** Forgets the history (a new segment). */
    void reset() {
        count = 0;
    }

    /**
     * Records a check and returns the time to the next one.
     *
     * @param ts time of the check (s)
     * @param f the function's value there
     * @param minInterval the configured interval (s)
     * @return the interval to the next check (s)
     */
    double next(double ts, double f, double minInterval) {
        if (ts > ht[2] || count == 0) {
            ht[0] = ht[1];
            hf[0] = hf[1];
            ht[1] = ht[2];
            hf[1] = hf[2];
            ht[2] = ts;
            hf[2] = f;
            count++;
        } else if (ts < ht[2]) {
            // not in time order (should not happen within a segment): start the history afresh
            count = 1;
            ht[2] = ts;
            hf[2] = f;
        }
        if (!(f > 0) || count < 3) {
            return minInterval;
        }
        double dab = (hf[1] - hf[0]) / (ht[1] - ht[0]);
        double dbc = (hf[2] - hf[1]) / (ht[2] - ht[1]);
        double dabc = (dbc - dab) / (ht[2] - ht[0]);
        double rate = dbc + dabc * (ht[2] - ht[1]);
        double curv = 2 * Math.abs(dabc);
        double tau;
        if (curv > 0) {
            tau = (rate + Math.sqrt(rate * rate + 2 * curv * f)) / curv;
        } else {
            tau = rate < 0 ? f / -rate : Double.POSITIVE_INFINITY;
        }
        if (!(tau >= 0)) {
            return minInterval;
        }
        return Math.max(minInterval, 0.5 * tau);
    }
}
