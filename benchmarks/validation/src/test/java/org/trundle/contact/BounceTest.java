package org.trundle.contact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Plane;

/**
 * Ball dropped from height h onto a plane with restitution e: the n-th rebound rises to
 * {@code e^(2n) h} and the bouncing ends after {@code sqrt(2h/g)(1+e)/(1−e)} (geometric series;
 * standard textbook result), less at most {@code 2 v_th/(g(1−e))} because the solver hands the ball
 * over to contact once the rebound speed is at most the settle speed {@code v_th}.
 */
class BounceTest {
    static final double G = 9.81;

    @ParameterizedTest(name = "e={0} h={1}")
    @CsvSource({"0.5, 0.1", "0.8, 0.05", "0.2, 0.3", "0.9, 0.01"})
    void reboundHeightsAndSettlingTime(double e, double h) {
        double r = 0.005;
        double vth = 0.005;
        Simulation sim = Simulation.builder().ball(Ball.solid(r, 0.004))
            .surface(new Plane(Vector3D.ZERO, Vector3D.PLUS_K)).law(new Coulomb(0.5, 0.4, e))
            .gravity(new Vector3D(0, 0, -G)).settings(SolverSettings.defaults().withSettleSpeed(vth)).build();
        List<Double> apexes = new ArrayList<>();
        double[] last = {Double.NaN, 0};
        BallState s0 = BallState.flying(new Vector3D(0, 0, r + h), Vector3D.ZERO, Vector3D.ZERO);
        RunResult res = sim.run(s0, 10.0, s -> { });
        List<RunEvent> impacts = res.eventsOf(EventKind.IMPACT);
        // the apex between impacts i and i+1 follows from the rebound speed of impact i
        for (RunEvent imp : impacts) {
            double up = imp.after().velocity().getZ();
            if (imp.phaseAfter() == Phase.FLIGHT) {
                apexes.add(up * up / (2 * G));
            }
        }
        assertTrue(apexes.size() >= 3, "bounces " + apexes.size());
        for (int n = 1; n <= apexes.size(); n++) {
            double ref = Math.pow(e, 2 * n) * h;
            assertEquals(ref, apexes.get(n - 1), 1e-8 * ref + 1e-15);
        }
        // impact times: t_1 = sqrt(2h/g), t_{n+1} - t_n = 2 e^n sqrt(2h/g)
        double t1 = Math.sqrt(2 * h / G);
        double tn = t1;
        for (int n = 0; n < impacts.size(); n++) {
            assertEquals(tn, impacts.get(n).time(), 1e-9 * t1);
            tn += 2 * Math.pow(e, n + 1) * t1;
        }
        RunEvent settle = impacts.get(impacts.size() - 1);
        assertTrue(settle.phaseAfter().inContact(), "last impact hands over to contact");
        double tSettle = t1 * (1 + e) / (1 - e);
        assertTrue(settle.time() <= tSettle + 1e-9, settle.time() + " > " + tSettle);
        assertTrue(settle.time() >= tSettle - 2 * vth / (G * (1 - e)) - 1e-9, "settled too early: " + settle.time());
        assertEquals(EndReason.REST, res.endReason());
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
        // all of the drop's potential energy m g h went into the impacts
        assertEquals(0.004 * G * h, res.energy().impactLoss(), 1e-8 * 0.004 * G * h);
        last[0] = 0;
    }
}
