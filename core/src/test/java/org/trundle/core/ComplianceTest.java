package org.trundle.core;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.events.ODEEventDetector;
import org.hipparchus.ode.events.ODEEventHandler;
import org.hipparchus.ode.events.AbstractODEDetector;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The compliant contact law on its own: the damping factor solves the restitution relation, matches Hunt
 * &amp; Crossley's first-order value near e = 1, and an isolated impact integrated here (Hipparchus
 * Dormand–Prince, tight tolerance) rebounds with the requested restitution for any stiffness, mass and speed.
 */
class ComplianceTest {

    @ParameterizedTest
    @ValueSource(doubles = {0.1, 0.3, 0.5, 0.8, 0.95, 0.999})
    void dampingFactorSolvesTheRelation(double e) {
        double x = Compliance.dampingFactorFor(e);
        double lhs = x * (1 + e);
        double rhs = Math.log1p(x) - Math.log1p(-e * x);
        assertEquals(lhs, rhs, 1e-12 * lhs);
    }

    /** Hunt &amp; Crossley (1975): c v₀ = 3(1 − e)/2 to first order in 1 − e; the next term is O((1 − e)²). */
    @Test
    void firstOrderIsHuntCrossley() {
        for (double oneMinusE : new double[] {1e-2, 1e-3, 1e-4, 1e-6}) {
            double x = Compliance.dampingFactorFor(1 - oneMinusE);
            double hc = 1.5 * oneMinusE;
            assertEquals(hc, x, 2 * oneMinusE * oneMinusE);
        }
        assertEquals(0.0, Compliance.dampingFactorFor(1.0));
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.2, 0.6, 0.9})
    void isolatedImpactReboundsWithTheRestitution(double e) {
        Compliance c = Compliance.of(1.2e10, e);
        for (double[] mv : new double[][] {{4e-3, 1.0}, {0.1, 0.05}, {1e-4, 7.0}}) {
            double m = mv[0];
            double v0 = mv[1];
            double k = c.stiffness(0.005, 0, 0);
            OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
                @Override
                public int getDimension() {
                    return 2;
                }

                @Override
                public double[] computeDerivatives(double t, double[] y) {
                    return new double[] {y[1], -c.force(k, y[0], y[1], v0) / m};
                }
            };
            // contact time scale (Johnson 1985, §11.4): δ* = (5 m v0²/(4K))^{2/5}, t* = δ*/v0
            double dStar = Math.pow(5 * m * v0 * v0 / (4 * k), 0.4);
            double tStar = dStar / v0;
            DormandPrince853Integrator integ = new DormandPrince853Integrator(0, tStar, 1e-14 * dStar, 1e-13);
            integ.addEventDetector(new Separation(tStar));
            ODEStateAndDerivative end = integ.integrate(ode, new ODEState(0, new double[] {0, v0}), 100 * tStar);
            assertEquals(-e * v0, end.getPrimaryState()[1], 1e-9 * v0, "m=" + m + " v0=" + v0);
        }
    }

    @Test
    void badInputIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> Compliance.of(1e9, 0.05));
        assertThrows(IllegalArgumentException.class, () -> Compliance.of(-1, 0.5));
        assertThrows(IllegalArgumentException.class, () -> Compliance.of(1e9, 1.1));
        assertEquals(0.0, Compliance.of(1e9, 0.5).force(1e9, -1e-6, 1, 1));
    }

    /**
     * Compliance per patch: the run's compliance goes to every patch without its own, a patch's own wins, and a
     * moving compliant patch is accepted (its contact acts relative to the motion).
     */
    @Test
    void eachPatchTakesItsOwnComplianceOrTheRuns() {
        Compliance run = Compliance.of(1e9, 0.5);
        Compliance own = Compliance.of(2e9, 0.8);
        Simulation sim = Simulation.builder().ball(Ball.solid(0.005, 0.004)).law(() -> "plain").noGravity()
            .compliance(run).patch(Patch.of("a", new FloorForTests(1.0)))
            .patch(Patch.of("b", new FloorForTests(1.0)).withCompliance(own)).build();
        assertSame(run, sim.model().patches().get(0).compliance());
        assertSame(own, sim.model().patches().get(1).compliance());
        Simulation mixed = Simulation.builder().ball(Ball.solid(0.005, 0.004)).law(() -> "plain").noGravity()
            .patch(Patch.of("rigid", new FloorForTests(1.0)))
            .patch(Patch.of("soft", new FloorForTests(1.0)).withCompliance(own)).build();
        assertNull(mixed.model().patches().get(0).compliance());
        assertTrue(mixed.model().compliant());
        Simulation moving = Simulation.builder().ball(Ball.solid(0.005, 0.004)).law(() -> "plain").noGravity()
            .compliance(run).surface(new FloorForTests(1.0))
            .motion(SurfaceMotion.translation(new Vector3D(0.1, 0, 0))).build();
        assertSame(run, moving.model().patches().get(0).compliance());
    }

    /** Stops when the approach returns to zero. */
    private static final class Separation extends AbstractODEDetector<Separation> {
        Separation(double tStar) {
            this((s, forward) -> tStar / 50, 100, new BracketingNthOrderBrentSolver(0, 1e-15 * tStar, 0, 5),
                (s, d, inc) -> Action.STOP);
        }

        private Separation(AdaptableInterval check, int iter, BracketingNthOrderBrentSolver solver, ODEEventHandler h) {
            super(check, iter, solver, h);
        }

        @Override
        protected Separation create(AdaptableInterval check, int iter,
                                    org.hipparchus.analysis.solvers.BracketedUnivariateSolver<org.hipparchus.analysis.UnivariateFunction> solver,
                                    ODEEventHandler h) {
            return new Separation(check, iter, (BracketingNthOrderBrentSolver) solver, h);
        }

        @Override
        public double g(ODEStateAndDerivative s) {
            // positive until the ball moves out; then the approach, which falls through zero at separation
            return s.getPrimaryState()[1] < 0 ? s.getPrimaryState()[0] : 1.0;
        }
    }
}
