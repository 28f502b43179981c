package org.trundle.core.engine;

/**
 * The constraint manifold of a rolling or flight segment on its compact layout (every layout starts
 * with the centre, then the velocity outside rolling, then the quaternion; see {@link StateMapper#layout}),
 * for the {@link SymmetricProjectionIntegrator}:
 * <ul>
 *   <li>rolling: the contact constraint {@code g₁(c) = d(c) − r} with gradient {@code n(c)} on the centre
 *       (the distance field's gradient is the normal, design notes §2), and the unit quaternion
 *       {@code g₂ = (|q|² − 1)/2} with gradient {@code q}. The rolling velocity constraint needs no
 *       projection: the layout derives the velocity, {@code v = r ω × n(c)}, so it holds exactly;</li>
 *   <li>flight: the unit quaternion only.</li>
 * </ul>
 * Both constraints are invariants of the exact flow ({@code ċ = r ω × n} keeps {@code d} constant; the
 * quaternion equation is skew). The time-reversing map of both phases, {@code ω ↦ −ω} (and
 * {@code v ↦ −v} in flight), leaves the constraints and their gradients alone, as the symmetric
 * projection's reversibility needs. The distance constraint is the active slot's, the one contact the
 * right-hand side evaluates; when several simultaneous contacts reach {@link Dynamics}, each touching slot
 * adds its own {@code d_i(c) − r} row here. Internal to the solver.
 */
final class ContactManifold implements ConstraintManifold {
    private final Run run;
    private final boolean rolling;
    /** Offset of the quaternion in the compact layout. */
    private final int q;
    private final double distanceTolerance;
    private final double[] centre = new double[3];

    /**
     * @param run the run (its active slot answers the distance queries)
     * @param rolling true for the rolling layout, false for flight
     */
    ContactManifold(Run run, boolean rolling) {
        this.run = run;
        this.rolling = rolling;
        this.q = rolling ? 3 : 6;
        // rounding of a distance query, d(c) − r, for centres within a few metres: far below the 1e-12 r
        // the option promises, far above the rounding of the largest coordinates of a ball-handling part
        this.distanceTolerance = 1e-14 * run.r;
    }

    @Override
    public int constraints() {
        return rolling ? 2 : 1;
    }

    @Override
    public void residuals(double t, double[] y, double[] out) {
        double qn = 0.5 * (y[q] * y[q] + y[q + 1] * y[q + 1] + y[q + 2] * y[q + 2] + y[q + 3] * y[q + 3] - 1);
        if (rolling) {
            out[0] = query(t, y).distance - run.r;
            out[1] = qn;
        } else {
            out[0] = qn;
        }
    }

    @Override
    public void gradients(double t, double[] y, double[][] out) {
        int row = 0;
        if (rolling) {
            double[] n = query(t, y).normal;
            double[] g = out[0];
            java.util.Arrays.fill(g, 0.0);
            g[0] = n[0];
            g[1] = n[1];
            g[2] = n[2];
            row = 1;
        }
        double[] g = out[row];
        java.util.Arrays.fill(g, 0.0);
        for (int i = 0; i < 4; i++) {
            g[q + i] = y[q + i];
        }
    }

    @Override
    public double tolerance(int i) {
        return rolling && i == 0 ? distanceTolerance : 1e-15;
    }

    private org.trundle.core.ContactGeometry query(double t, double[] y) {
        centre[0] = y[0];
        centre[1] = y[1];
        centre[2] = y[2];
        run.slot.query(t, centre);
        return run.slot.geo;
    }
}
