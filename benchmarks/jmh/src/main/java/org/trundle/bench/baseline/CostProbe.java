package org.trundle.bench.baseline;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.BracketedUnivariateSolver;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.events.ODEEventDetector;
import org.hipparchus.ode.events.ODEEventHandler;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;

/**
 * Variants of the hand-derived baseline run that add, one at a time, a cost the general library
 * pays or used to pay, so that the library/baseline ratio can be decomposed: a longer state
 * vector (the library's full 19-component layout, 13 of motion plus 6 of energy and path
 * bookkeeping, which it integrated in every phase until it learned to integrate only what moves:
 * 11 components while rolling without couples or loads) and one event detector checked every
 * {@code maxCheck} seconds (a fixed check interval, as the library's lift-off detector had before
 * its checks were spaced by a local model; here with a trivial event function that never
 * vanishes). Not a model of
 * anything; a measuring aid for the benchmarks.
 */
public final class CostProbe {
    private CostProbe() {
    }

    /**
     * Integrates the baseline equations with optional padding and an optional detector.
     *
     * @param base the baseline equations
     * @param y0 start state (13 components)
     * @param duration simulated time (s)
     * @param tolerance relative tolerance
     * @param dimension state dimension, at least 13 (extra components have zero derivative and
     *     absolute tolerance {@code tolerance × 1e-3})
     * @param maxCheck event check interval (s) of one never-firing detector, or 0 for none
     * @return the end state (first 13 components)
     */
    public static double[] integrate(VerticalTubeRolling base, double[] y0, double duration, double tolerance,
                                     int dimension, double maxCheck) {
        if (dimension < VerticalTubeRolling.DIM) {
            throw new IllegalArgumentException("dimension must be at least 13, got " + dimension);
        }
        double r = base.ballRadius();
        double v = Math.sqrt(y0[3] * y0[3] + y0[4] * y0[4] + y0[5] * y0[5]);
        double w = Math.sqrt(y0[10] * y0[10] + y0[11] * y0[11] + y0[12] * y0[12]);
        // the same speed scale as VerticalTubeRolling.integrate, gravity 9.81 m/s²
        double speed = Math.max(Math.max(v, r * w), Math.max(Math.sqrt(9.81 * r), 1e-3));
        double[] abs = new double[dimension];
        double[] rel = new double[dimension];
        for (int i = 0; i < dimension; i++) {
            rel[i] = tolerance;
            double s = i < 3 ? r : i < 6 ? speed : i < 10 ? 1.0 : i < 13 ? speed / r : 1e-3;
            abs[i] = tolerance * s;
        }
        OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return dimension;
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                double[] yDot = new double[dimension];
                base.evaluate(y, yDot);
                return yDot;
            }
        };
        DormandPrince853Integrator integ = new DormandPrince853Integrator(0.0, duration + 1e-300, abs, rel);
        if (maxCheck > 0) {
            integ.addEventDetector(new NeverDetector(maxCheck));
        }
        double[] start = new double[dimension];
        System.arraycopy(y0, 0, start, 0, VerticalTubeRolling.DIM);
        return integ.integrate(ode, new ODEState(0.0, start), duration).getPrimaryState();
    }

    /** A detector whose function {@code |v|² + 1} never vanishes, checked every {@code maxCheck} s. */
    private static final class NeverDetector implements ODEEventDetector {
        private final double maxCheck;
        private final BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(0.0, 1e-12, 0.0, 5);

        NeverDetector(double maxCheck) {
            this.maxCheck = maxCheck;
        }

        @Override
        public AdaptableInterval getMaxCheckInterval() {
            return AdaptableInterval.of(maxCheck);
        }

        @Override
        public int getMaxIterationCount() {
            return 100;
        }

        @Override
        public BracketedUnivariateSolver<UnivariateFunction> getSolver() {
            return solver;
        }

        @Override
        public ODEEventHandler getHandler() {
            return (s, d, increasing) -> Action.CONTINUE;
        }

        @Override
        public double g(ODEStateAndDerivative s) {
            double[] y = s.getPrimaryState();
            return y[3] * y[3] + y[4] * y[4] + y[5] * y[5] + 1.0;
        }
    }
}
