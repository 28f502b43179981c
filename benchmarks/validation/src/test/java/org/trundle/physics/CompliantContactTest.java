package org.trundle.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.special.Beta;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.trundle.contact.Coulomb;
import org.trundle.contact.HertzStiffness;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.Compliance;
import org.trundle.core.ContactLaw;
import org.trundle.core.EventKind;
import org.trundle.core.LossKind;
import org.trundle.core.Material;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Plane;

/**
 * Runs with a compliant floor (Hertz law with Hunt–Crossley damping, {@link Compliance}): the contact force
 * follows the Hertz law during an impact, an elastic impact lasts Hertz's contact time, a damped one rebounds
 * with the restitution the damping was set from, the budget closes with the damping counted, and the
 * compliant bounce converges to the rigid one as the stiffness grows.
 */
class CompliantContactTest {
    private static final double R = 0.005;
    /** Steel ball of 10 mm: m = ρ (4/3) π r³ with ρ = 7850 kg/m³ (common practice). */
    private static final double M = 7850 * 4.0 / 3 * Math.PI * R * R * R;
    private static final Ball BALL = Ball.solid(R, M);
    private static final Plane FLOOR = new Plane(Vector3D.ZERO, Vector3D.PLUS_K);

    private static Simulation sim(Compliance c, ContactLaw law, Vector3D g, SolverSettings set) {
        return Simulation.builder().ball(BALL).surface(FLOOR).law(law).gravity(g).compliance(c).settings(set).build();
    }

    private static BallState thrown(double speed) {
        return BallState.flying(new Vector3D(0, 0, R + 1e-4), new Vector3D(0, 0, -speed), Vector3D.ZERO);
    }

    /**
     * Elastic impact of a sphere on a flat, no gravity (K. L. Johnson, Contact Mechanics, 1985, §11.4): the
     * largest approach is {@code δ_m = (5 m v²/(4K))^{2/5}}, the contact lasts
     * {@code t_c = (4/5) B(2/5, 1/2) δ_m/v ≈ 2.94 δ_m/v} (B the beta function; the time integral of the energy
     * equation), the ball leaves at the speed it came, and on every sample in contact {@code F = K δ^{3/2}}.
     */
    @Test
    void elasticImpactLastsHertzContactTime() {
        double v = 1.0;
        Compliance c = HertzStiffness.compliance(Material.STEEL, Material.STEEL, 1.0);
        double k = c.stiffness(R, 0, 0);
        double dStar = Math.pow(5 * M * v * v / (4 * k), 0.4);
        double tc = 0.8 * Math.exp(Beta.logBeta(0.4, 0.5)) * dStar / v;
        List<Sample> samples = new ArrayList<>();
        Simulation s = sim(c, new PureRolling(), Vector3D.ZERO,
            SolverSettings.defaults().withSampleInterval(tc / 50).withTolerance(1e-12));
        RunResult r = s.run(thrown(v), 2e-4 / v + 3 * tc, samples::add);
        List<RunEvent> ev = r.events();
        assertEquals(EventKind.IMPACT, ev.get(0).kind(), ev.toString());
        assertEquals(EventKind.LIFT_OFF, ev.get(1).kind(), ev.toString());
        // the impact event fires at a penetration of 1e-9 r (the rule's slack, so that a flight starting on the
        // wall does not hit it at once), that is slack/v after the contact began
        double duration = ev.get(1).time() - ev.get(0).time() + 1e-9 * R / v;
        System.out.printf("elastic Hertz impact: contact time %.6e s, theory %.6e s; delta* %.4e m%n", duration, tc, dStar);
        // the events are located to 1e-12 s, the motion integrated to the tolerance 1e-12
        assertEquals(tc, duration, 1e-8 * tc);
        // at the solver tolerance 1e-12 the rebound holds to about 1e-9 (the error grows with the tolerance: the
        // force's δ^{3/2} onset is not smooth, which costs the step that crosses the release some order)
        assertEquals(v, r.endState().velocity().getZ(), 1e-8 * v);
        int inContact = 0;
        for (Sample sm : samples) {
            double delta = R - sm.state().centre().getZ();
            if (delta > 0 && !sm.event()) {
                inContact++;
                assertEquals(k * Math.pow(delta, 1.5), sm.normalForce(), 1e-12 * k * Math.pow(dStar, 1.5));
            }
        }
        assertTrue(inContact > 40, "samples in contact: " + inContact);
        assertEquals(0, r.energy().relativeResidual(), 1e-8);
    }

    /**
     * Damped impacts without gravity rebound with the restitution e the damping was set from (the exact
     * relation of {@link Compliance}); the energy the damping took, booked as contact damping, is the kinetic
     * energy lost, {@code ½ m v² (1 − e²)}, and the budget closes.
     */
    @ParameterizedTest
    @ValueSource(doubles = {0.3, 0.7, 0.95})
    void dampedImpactReboundsWithTheRestitution(double e) {
        double v = 0.8;
        Compliance c = HertzStiffness.compliance(Material.STEEL, Material.ACRYLIC, e);
        Simulation s = sim(c, new PureRolling(), Vector3D.ZERO, SolverSettings.defaults().withTolerance(1e-12));
        RunResult r = s.run(thrown(v), 1e-3, x -> { });
        System.out.printf("e = %.2f: rebound %.12e, loss %.12e, expected %.12e, residual %.3e%n", e,
            r.endState().velocity().getZ() / v, r.energy().contactDampingLoss(), 0.5 * M * v * v * (1 - e * e),
            r.energy().relativeResidual());
        // at the solver tolerance 1e-12 the rebound, the loss and the budget hold to about 1e-9 (measured; they
        // grow in proportion to the tolerance, to about 1.5e-7 at the default 1e-10): asserted to 1e-8
        assertEquals(e * v, r.endState().velocity().getZ(), 1e-8 * v, r.events().toString());
        // the damping took the kinetic energy the ball lost (it spins not at all: a normal impact)
        double vOut = r.endState().velocity().getZ();
        double lost = 0.5 * M * (v * v - vOut * vOut);
        assertEquals(lost, r.energy().contactDampingLoss(), 1e-8 * 0.5 * M * v * v);
        assertEquals(0, r.energy().relativeResidual(), 1e-8);
    }

    /**
     * Dropped under gravity from 10 cm on a rigid floor with restitution e, the ball meets the floor again
     * after {@code 2 e v₁/g} (projectile motion; common practice). On a compliant floor the bounce takes a
     * contact time {@code ∝ K^{-2/5}} (Johnson 1985, §11.4), so the difference in the second impact's time falls
     * with K; at steel's stiffness it is below 1e-4 s.
     */
    @Test
    void compliantBounceConvergesToTheRigidOne() {
        double e = 0.8;
        double h = 0.1;
        Vector3D g = new Vector3D(0, 0, -9.81);
        BallState drop = BallState.flying(new Vector3D(0, 0, R + h), Vector3D.ZERO, Vector3D.ZERO);
        Simulation rigid = Simulation.builder().ball(BALL).surface(FLOOR).law(new Coulomb(0.3, 0.3, e)).gravity(g).build();
        RunResult rr = rigid.run(drop, 0.5, x -> { });
        double tRigid = rr.eventsOf(EventKind.IMPACT).get(1).time();
        double kSteel = HertzStiffness.of(Material.STEEL, Material.STEEL).of(R, 0, 0);
        double last = Double.POSITIVE_INFINITY;
        for (double factor : new double[] {1e-4, 1e-2, 1}) {
            Simulation soft = sim(Compliance.of(kSteel * factor, e), new Coulomb(0.3, 0.3, e), g, SolverSettings.defaults());
            RunResult rs = soft.run(drop, 0.5, x -> { });
            List<RunEvent> impacts = rs.events().stream().filter(x -> x.kind() == EventKind.IMPACT).toList();
            double diff = Math.abs(impacts.get(1).time() - tRigid);
            System.out.printf("K = %.3e N/m^1.5: second impact %.9f s, rigid %.9f s, difference %.3e s; evaluations %d"
                + " (rigid %d)%n", kSteel * factor, impacts.get(1).time(), tRigid, diff, rs.evaluations(), rr.evaluations());
            assertTrue(diff < last, "difference falls with K: " + diff + " after " + last);
            last = diff;
            assertEquals(0, rs.energy().relativeResidual(), 1e-7);
        }
        assertTrue(last < 1e-4, "steel: " + last);
    }
}
