package org.trundle.contact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
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
import org.trundle.surfaces.Plane;

/** Coulomb sliding and sticking on a level plane, and rolling resistance. */
class PlaneFrictionTest {
    static final double G = 9.81;

    private static Simulation plane(Ball ball, org.trundle.core.ContactLaw law) {
        return Simulation.builder().ball(ball).surface(new Plane(Vector3D.ZERO, Vector3D.PLUS_K)).law(law)
            .gravity(new Vector3D(0, 0, -G)).build();
    }

    /**
     * Ball launched without spin on a level plane with kinetic friction μ: slides until
     * {@code t = k v0/((1+k) μ g)} ({@code 2v0/(7μg)} solid), then rolls at {@code v0/(1+k)}
     * ({@code 5v0/7}), having covered {@code 12 v0²/(49 μ g)} for a solid ball (standard textbook
     * result, the billiard / bowling-ball problem).
     */
    @ParameterizedTest(name = "k={0} mu={1} v0={2}")
    @CsvSource({"0.4, 0.2, 2.0", "0.4, 0.05, 0.5", "0.6666666666666666, 0.3, 1.0", "0.25, 0.5, 3.0"})
    void launchedWithoutSpinSlidesThenRolls(double k, double mu, double v0) {
        double r = 0.02;
        Simulation sim = plane(Ball.of(r, 0.17, k), new Coulomb(mu, mu, 0.0));
        BallState s0 = BallState.of(0, new Vector3D(0, 0, r), new Vector3D(v0, 0, 0), Rotation.IDENTITY,
            Vector3D.ZERO, Phase.SLIDING);
        RunResult res = sim.run(s0, 2.0 * k * v0 / ((1 + k) * mu * G) + 0.5);
        List<RunEvent> sticks = res.eventsOf(EventKind.STICK);
        assertEquals(1, sticks.size(), res.events().toString());
        RunEvent stick = sticks.get(0);
        double tRef = k * v0 / ((1 + k) * mu * G);
        // the stick event fires when the slip has fallen to eps = 1e-8 V (SolverSettings), i.e.
        // eps/|ds/dt| early, which is 1e-8 of the sliding time here (|s0| = V = v0)
        // (bound 1e-9: ten times the integrator's relative tolerance, accumulated slip error)
        assertEquals(tRef - 1e-8 * tRef, stick.time(), 1e-9 * tRef);
        assertEquals(v0 / (1 + k), stick.after().velocity().getX(), 1e-8 * v0);
        double xRef = v0 * tRef - 0.5 * mu * G * tRef * tRef;
        assertEquals(xRef, stick.after().centre().getX(), 1e-8 * xRef);
        if (k == 0.4) {
            assertEquals(12 * v0 * v0 / (49 * mu * G), xRef, 1e-12 * xRef);
        }
        assertEquals(Phase.ROLLING, res.endState().phase());
        // friction work: the energy lost equals the drop in kinetic energy, k/(1+k) of the initial one
        double lost = res.energy().slidingFrictionLoss();
        assertEquals(0.5 * 0.17 * v0 * v0 * k / (1 + k), lost, 1e-8 * lost);
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
    }

    /**
     * Any initial spin: the contact-point slip keeps its direction and falls at
     * {@code (1+k) μ g / k}; rolling starts at {@code t = k|u0|/((1+k) μ g)} with velocity
     * {@code (v0 + k r ω0 × n)/(1+k)}; the spin about the normal is unchanged (angular momentum about
     * the contact point is conserved; G. Coriolis, Théorie mathématique des effets du jeu de billard,
     * 1835).
     */
    @ParameterizedTest(name = "w0=({0},{1},{2})")
    @CsvSource({"0, 80, 0", "0, -150, 0", "60, 30, 25", "-40, 0, -100"})
    void anySpinRollsAtTheCoriolisVelocity(double wx, double wy, double wz) {
        double r = 0.02;
        double k = 0.4;
        double mu = 0.2;
        Simulation sim = plane(Ball.of(r, 0.17, k), new Coulomb(mu, mu, 0.0));
        Vector3D v0 = new Vector3D(1.2, 0.4, 0);
        Vector3D w0 = new Vector3D(wx, wy, wz);
        Vector3D n = Vector3D.PLUS_K;
        BallState s0 = BallState.of(0, new Vector3D(0, 0, r), v0, Rotation.IDENTITY, w0, Phase.SLIDING);
        Vector3D u0 = v0.subtract(Vector3D.crossProduct(w0, n).scalarMultiply(r));
        double tRef = k * u0.getNorm() / ((1 + k) * mu * G);
        Vector3D vRef = v0.add(Vector3D.crossProduct(w0, n).scalarMultiply(k * r)).scalarMultiply(1 / (1 + k));
        RunResult res = sim.run(s0, tRef + 0.2);
        RunEvent stick = res.eventsOf(EventKind.STICK).get(0);
        // early by eps/|ds/dt| = 1e-8 V / |ds/dt|, V = max(|v0|, r|w0|, sqrt(g r))
        double speedScale = Math.max(Math.max(v0.getNorm(), r * w0.getNorm()), Math.sqrt(G * r));
        double early = 1e-8 * speedScale * tRef / u0.getNorm();
        assertEquals(tRef - early, stick.time(), 1e-9 * tRef);
        assertTrue(stick.after().velocity().subtract(vRef).getNorm() < 1e-8 * v0.getNorm(),
            "velocity " + stick.after().velocity() + " vs " + vRef);
        assertEquals(wz, stick.after().spin().getZ(), 1e-9 * Math.max(1, Math.abs(wz)));
        // straight-line slip: the slip direction at the stick instant is the initial one
        Vector3D dv = stick.before().velocity().subtract(v0);
        assertTrue(Vector3D.angle(dv, u0.negate()) < 1e-7, "friction direction turned");
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
    }

    /**
     * Rolling resistance of length δ on a level plane: the couple −δ F_n ŵ acts about the contact
     * point, whose moment of inertia is (1+k) m r², so the centre decelerates at
     * {@code (δ/r) g/(1+k)} and stops after {@code v0² (1+k) r / (2 δ g)} (derived: angular momentum
     * about the contact point, d/dt[(1+k) m r v] = −δ m g). The run ends at rest.
     */
    @Test
    void rollingResistanceStopsTheBall() {
        double r = 0.01;
        double k = 0.4;
        double delta = 2e-4;
        double v0 = 0.3;
        Simulation sim = plane(Ball.of(r, 0.03, k), new Coulomb(0.5, 0.4, 0.0).and(new RollingResistance(delta)));
        RunResult res = sim.run(sim.rollingStart(new Vector3D(0, 0, r), new Vector3D(v0, 0, 0)), 10.0);
        assertEquals(EndReason.REST, res.endReason(), res.events().toString());
        double decel = delta / r * G / (1 + k);
        double tStop = v0 / decel;
        double xStop = v0 * v0 / (2 * decel);
        // the rest test fires at speed fraction 1e-5 of the speed scale: time short by <= 1e-5 tStop,
        // distance by ~1e-10; the smoothing band adds nothing before then.
        assertEquals(tStop, res.endState().time(), 2e-5 * tStop);
        assertEquals(xStop, res.endState().centre().getX(), 1e-8 * xStop);
        assertEquals(Phase.REST, res.endState().phase());
        assertTrue(res.eventsOf(EventKind.SLIP).isEmpty());
        double ke0 = 0.5 * 0.03 * v0 * v0 * (1 + k);
        assertEquals(ke0, res.energy().rollingResistanceLoss(), 1e-6 * ke0);
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
    }
}
