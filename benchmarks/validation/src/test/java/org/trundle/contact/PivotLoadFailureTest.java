package org.trundle.contact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.core.AppliedLoad;
import org.trundle.core.Ball;
import org.trundle.core.EndReason;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.Simulation;
import org.trundle.core.SimulationException;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Plane;

/** Pivoting resistance, applied loads, and how runs fail. */
class PivotLoadFailureTest {
    static final double G = 9.81;
    final double r = 0.01;
    final Ball ball = Ball.solid(r, 0.03);

    private Simulation.Builder plane() {
        return Simulation.builder().ball(ball).surface(new Plane(Vector3D.ZERO, Vector3D.PLUS_K))
            .gravity(new Vector3D(0, 0, -G));
    }

    /**
     * Pivoting resistance δ_p on a level plane: the couple −δ_p m g sign(ω_n) n changes only the spin
     * about the normal, which falls linearly at {@code δ_p g/(k r²)} (derived from
     * {@code I dω_n/dt = −δ_p m g}) while the rolling velocity stays constant; where it enters the
     * smoothing band ({@code 1e-3} of the run's speed scale {@code max(|v₀|, r|ω₀|, √(g r))} over
     * {@code r}) the pivoting stick removes the rest and holds it at zero, so it never changes sign
     * and, well after the derived stop, is exactly zero.
     */
    @Test
    void pivotingResistanceStopsTheSpinAboutTheNormal() {
        double deltaP = 1e-5;
        Simulation sim = plane().law(new Coulomb(0.5, 0.4, 0).and(new PivotingResistance(deltaP)))
            .settings(SolverSettings.defaults().withSampleInterval(0.005)).build();
        double w0 = 2;
        List<Sample> samples = new ArrayList<>();
        RunResult res = sim.run(sim.rollingStart(new Vector3D(0, 0, r), new Vector3D(0.3, 0, 0), w0), 1.0, samples::add);
        double rate = deltaP * G / (0.4 * r * r);
        double smoothing = 1e-3 * Math.max(Math.max(0.3, r * w0), Math.sqrt(G * r)) / r;
        for (Sample s : samples) {
            double wn = s.state().spin().getZ();
            double ref = w0 - rate * s.time();
            // the sample at the stick event, on the band's edge, shows the state after it
            boolean stickEdge = s.event() && s.time() > 0;
            if (ref > smoothing && !stickEdge) {
                assertEquals(ref, wn, 1e-9 * w0, "at t=" + s.time());
            } else {
                assertTrue(wn >= 0 && wn <= smoothing + 1e-9 * w0, "spin reversed or grew: " + wn);
            }
            if (ref < -smoothing) {
                assertEquals(0.0, wn, 1e-12 * w0, "held by the pivoting stick at t=" + s.time());
            }
            assertEquals(0.3, s.state().velocity().getX(), 1e-9);
        }
        double lost = 0.5 * ball.momentOfInertia() * w0 * w0;
        assertEquals(lost, res.energy().pivotingResistanceLoss(), 1e-3 * lost);
        assertTrue(res.energy().relativeResidual() < 1e-8);
    }

    /**
     * A constant horizontal force F at the centre of a ball rolling on a level plane: the centre
     * accelerates at {@code F/((1+k) m)} (derived: the wall supplies the friction {@code −k F/(1+k)}
     * that keeps the no-slip condition) and the load's work {@code F Δx} is booked as applied work.
     */
    @Test
    void appliedForce() {
        double f = 0.02;
        AppliedLoad push = (s, out) -> out.force(f, 0, 0);
        Simulation sim = plane().law(new PureRolling()).load(push).build();
        RunResult res = sim.run(sim.rollingStart(new Vector3D(0, 0, r), new Vector3D(0.1, 0, 0)), 0.5);
        double a = f / (1.4 * 0.03);
        assertEquals(0.1 * 0.5 + 0.5 * a * 0.25, res.endState().centre().getX(), 1e-10);
        assertEquals(f * res.endState().centre().getX(), res.energy().appliedWork(), 1e-12);
        assertTrue(res.energy().relativeResidual() < 1e-8);
    }

    @Test
    void nonFiniteLoadStopsWithTheLastGoodState() {
        AppliedLoad bad = (s, out) -> out.force(s.time() > 0.05 ? Double.NaN : 0.0, 0, 0);
        Simulation sim = plane().law(new PureRolling()).build().toBuilder().load(bad).build();
        SimulationException e = assertThrows(SimulationException.class,
            () -> sim.run(sim.rollingStart(new Vector3D(0, 0, r), new Vector3D(0.1, 0, 0)), 0.5));
        assertTrue(e.getMessage().contains("non-finite"), e.getMessage());
        assertTrue(e.lastGoodState().time() <= 0.05 + 1e-12);
        assertTrue(Double.isFinite(e.lastGoodState().centre().getX()));
    }

    @Test
    void budgetEndsTheRunWithAReason() {
        Simulation sim = plane().law(new PureRolling())
            .settings(SolverSettings.defaults().withMaxEvaluations(500)).build();
        RunResult res = sim.run(sim.rollingStart(new Vector3D(0, 0, r), new Vector3D(0.1, 0.05, 0)), 100.0);
        assertEquals(EndReason.BUDGET, res.endReason());
        assertTrue(res.message().contains("500"));
        assertTrue(res.endState().time() > 0 && res.endState().time() < 100);
        assertTrue(Double.isFinite(res.endState().centre().getX()));
    }
}
