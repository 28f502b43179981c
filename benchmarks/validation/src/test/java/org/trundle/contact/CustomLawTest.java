package org.trundle.contact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.core.Ball;
import org.trundle.core.ContactContext;
import org.trundle.core.ContactLaw;
import org.trundle.core.LossKind;
import org.trundle.core.Sample;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Plane;

/**
 * A law written in a test, outside the solver: a viscous couple about the normal,
 * {@code τ = −c (ω·n) n}. Adding it touches no solver code. On a level plane the spin about the normal
 * is decoupled from the rolling motion, so it decays as {@code ω_n(t) = ω_n(0) exp(−c t / I)} (derived
 * from {@code I dω_n/dt = −c ω_n}), while the rolling velocity stays constant; its loss is booked
 * under {@link LossKind#OTHER} and the budget closes.
 */
class CustomLawTest {
    /** Viscous spin damping with coefficient c (N·m·s). */
    static final class ViscousSpinDamping implements ContactLaw {
        private final double c;

        ViscousSpinDamping(double c) {
            this.c = c;
        }

        @Override
        public void addCouples(ContactContext ctx) {
            double f = -c * ctx.normalSpin();
            ctx.addCouple(f * ctx.normal(0), f * ctx.normal(1), f * ctx.normal(2), LossKind.OTHER);
        }

        @Override
        public String name() {
            return "viscous spin damping(c=" + c + " N m s)";
        }
    }

    @Test
    void aTestOnlyLawPlugsIn() {
        double r = 0.01;
        Ball ball = Ball.solid(r, 0.03);
        double c = 2e-7;
        ContactLaw law = new Coulomb(0.5, 0.4, 0.2).and(new ViscousSpinDamping(c));
        Simulation sim = Simulation.builder().ball(ball).surface(new Plane(Vector3D.ZERO, Vector3D.PLUS_K)).law(law)
            .gravity(new Vector3D(0, 0, -9.81)).settings(SolverSettings.defaults().withSampleInterval(0.01)).build();
        double wn0 = 40;
        List<Sample> samples = new ArrayList<>();
        var res = sim.run(sim.rollingStart(new Vector3D(0, 0, r), new Vector3D(0.2, 0.1, 0), wn0), 1.0, samples::add);
        double tau = ball.momentOfInertia() / c;
        for (Sample s : samples) {
            assertEquals(wn0 * Math.exp(-s.time() / tau), s.state().spin().getZ(), 1e-8 * wn0);
            assertEquals(0.2, s.state().velocity().getX(), 1e-9);
        }
        double lost = 0.5 * ball.momentOfInertia() * wn0 * wn0 * (1 - Math.exp(-2 * 1.0 / tau));
        assertEquals(lost, res.energy().otherCoupleLoss(), 1e-7 * lost);
        assertTrue(res.energy().relativeResidual() < 1e-8);
    }

    @Test
    void twoRestitutionsAreRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
            () -> new Coulomb(0.5, 0.4, 0.2).and(new PureRolling(0.5)));
        assertTrue(e.getMessage().contains("restitution"));
    }

    @Test
    void hertzPivotLength() {
        // steel ball of 4 mm radius on a steel plate under its own weight (2.1 g): E = 210 GPa,
        // nu = 0.3 (handbook values, from memory). a = (3 F R / (4 E*))^(1/3), E* = E / (2 (1 - nu^2)).
        double f = 0.0021 * 9.81;
        double eStar = 210e9 / (2 * (1 - 0.09));
        double aRef = Math.cbrt(3 * f * 0.004 / (4 * eStar));
        double a = HertzContact.contactRadius(f, 0.004, 0.0, 210e9, 0.3, 210e9, 0.3);
        assertEquals(aRef, a, 1e-15);
        assertEquals(3 * Math.PI / 16 * 0.1 * a, PivotingResistance.hertzLength(0.1, a), 1e-20);
        // concave tube wall of 15 mm radius: 1/R* = 1/r - 1/R
        double rStar = 1 / (1 / 0.004 - 1 / 0.015);
        assertEquals(Math.cbrt(3 * f * rStar / (4 * eStar)),
            HertzContact.contactRadius(f, 0.004, 1 / 0.015, 210e9, 0.3, 210e9, 0.3), 1e-15);
    }
}
