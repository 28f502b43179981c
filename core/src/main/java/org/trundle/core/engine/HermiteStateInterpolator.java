package org.trundle.core.engine;

import org.hipparchus.ode.EquationsMapper;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.sampling.AbstractODEStateInterpolator;

/**
 * The continuous extension of a fixed step of the {@link SymmetricProjectionIntegrator}: the cubic
 * Hermite polynomial through the states and derivatives at both ends of the step. With {@code θ} the
 * fraction of the step {@code h}:
 * <pre>
 *   y(θ) = (2θ³ − 3θ² + 1) y₀ + (θ³ − 2θ² + θ) h f₀ + (−2θ³ + 3θ²) y₁ + (θ³ − θ²) h f₁
 * </pre>
 * Its error is {@code O(h⁴)} (common practice), below the step's own error for the order-2 midpoint
 * rule and of the order-4 composition; event functions are root-found on it, samples read from it.
 *
 * <p>Internal to the solver.
 */
final class HermiteStateInterpolator extends AbstractODEStateInterpolator {
    private static final long serialVersionUID = 1L;

    HermiteStateInterpolator(boolean forward, ODEStateAndDerivative globalPrevious,
                             ODEStateAndDerivative globalCurrent, ODEStateAndDerivative softPrevious,
                             ODEStateAndDerivative softCurrent, EquationsMapper mapper) {
        super(forward, globalPrevious, globalCurrent, softPrevious, softCurrent, mapper);
    }

    @Override
    protected HermiteStateInterpolator create(boolean newForward, ODEStateAndDerivative newGlobalPrevious,
                                              ODEStateAndDerivative newGlobalCurrent,
                                              ODEStateAndDerivative newSoftPrevious,
                                              ODEStateAndDerivative newSoftCurrent, EquationsMapper newMapper) {
        return new HermiteStateInterpolator(newForward, newGlobalPrevious, newGlobalCurrent, newSoftPrevious,
            newSoftCurrent, newMapper);
    }

    @Override
    protected ODEStateAndDerivative computeInterpolatedStateAndDerivatives(EquationsMapper mapper, double time,
                                                                           double theta, double thetaH,
                                                                           double oneMinusThetaH) {
        ODEStateAndDerivative s0 = getGlobalPreviousState();
        ODEStateAndDerivative s1 = getGlobalCurrentState();
        double h = s1.getTime() - s0.getTime();
        double[] y0 = s0.getCompleteState();
        double[] f0 = s0.getCompleteDerivative();
        double[] y1 = s1.getCompleteState();
        double[] f1 = s1.getCompleteDerivative();
        double s = theta;
        double s2 = s * s;
        double s3 = s2 * s;
        double a0 = 2 * s3 - 3 * s2 + 1;
        double b0 = (s3 - 2 * s2 + s) * h;
        double a1 = 3 * s2 - 2 * s3;
        double b1 = (s3 - s2) * h;
        double da0 = (6 * s2 - 6 * s) / h;
        double db0 = 3 * s2 - 4 * s + 1;
        double da1 = -da0;
        double db1 = 3 * s2 - 2 * s;
        int n = y0.length;
        double[] y = new double[n];
        double[] yDot = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = a0 * y0[i] + b0 * f0[i] + a1 * y1[i] + b1 * f1[i];
            yDot[i] = da0 * y0[i] + db0 * f0[i] + da1 * y1[i] + db1 * f1[i];
        }
        return mapper.mapStateAndDerivative(time, y, yDot);
    }
}
