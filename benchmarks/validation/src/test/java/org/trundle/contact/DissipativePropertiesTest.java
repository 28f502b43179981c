package org.trundle.contact;

import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Named;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.ContactLaw;
import org.trundle.core.PhaseSpan;
import org.trundle.core.Phase;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.Surface;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Plane;
import org.trundle.surfaces.Side;

/**
 * Properties of every dissipative run, over seeded random cases (planes and cylinders, Coulomb
 * friction with rolling and pivoting resistance and restitution, rolling, sliding and flight
 * starts): mechanical energy never rises (by more than the integration tolerance allows: 1e-8 of
 * {@code E_scale} — common practice for a dissipative system), the energy budget closes to 1e-8 of
 * {@code E_scale}, and every phase
 * change in the log has an event of a named kind as its cause, with consecutive phases different.
 */
class DissipativePropertiesTest {
    static final long SEED = 0x5eed_0004L;
    static final int CASES = 200;

    static Stream<Arguments> cases() {
        return IntStream.range(0, CASES).mapToObj(i -> {
            SplittableRandom rnd = new SplittableRandom(SEED + 104729L * i);
            double r = 0.002 + 0.02 * rnd.nextDouble();
            Ball ball = Ball.of(r, 0.001 + 0.1 * rnd.nextDouble(), 0.2 + 0.45 * rnd.nextDouble());
            double muS = 0.05 + rnd.nextDouble();
            double muK = muS * rnd.nextDouble();
            double e = rnd.nextDouble();
            ContactLaw law = new Coulomb(muS, muK, e)
                .and(new RollingResistance(r * 0.01 * rnd.nextDouble()))
                .and(new PivotingResistance(r * 0.01 * rnd.nextDouble()));
            Vector3D gravity = new Vector3D(0.3 * (rnd.nextDouble() - 0.5), 0.3 * (rnd.nextDouble() - 0.5), -1)
                .normalize().scalarMultiply(9.81);
            Surface surface;
            Vector3D c;
            Vector3D n;
            Vector3D t1;
            int kind = i % 3;
            if (kind == 0) {
                surface = new Plane(Vector3D.ZERO, Vector3D.PLUS_K);
                n = Vector3D.PLUS_K;
                t1 = Vector3D.PLUS_I;
                c = new Vector3D(0, 0, r);
            } else if (kind == 1) {
                double bigR = r * (1.5 + 5 * rnd.nextDouble());
                surface = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_I, bigR, Side.INSIDE);
                n = Vector3D.PLUS_K;
                t1 = Vector3D.PLUS_J;
                c = new Vector3D(0, 0, -(bigR - r));
            } else {
                double bigR = r * (1.5 + 5 * rnd.nextDouble());
                surface = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, bigR, Side.INSIDE);
                n = Vector3D.MINUS_I;
                t1 = Vector3D.PLUS_J;
                c = new Vector3D(bigR - r, 0, 0);
            }
            Vector3D t2 = Vector3D.crossProduct(n, t1);
            double speed = 0.05 + 1.5 * rnd.nextDouble();
            Vector3D v = t1.scalarMultiply(speed * (rnd.nextDouble() - 0.3)).add(speed * (rnd.nextDouble() - 0.5), t2);
            Simulation sim = Simulation.builder().ball(ball).surface(surface).law(law).gravity(gravity).build();
            BallState start;
            int startKind = (i / 3) % 3;
            Vector3D spin = new Vector3D(rnd.nextDouble() - 0.5, rnd.nextDouble() - 0.5, rnd.nextDouble() - 0.5)
                .scalarMultiply(2 * speed / r);
            if (startKind == 0) {
                start = sim.rollingStart(c, v, spin.getZ());
            } else if (startKind == 1) {
                start = BallState.of(0, c, v, Rotation.IDENTITY, spin, Phase.SLIDING);
            } else {
                // off the wall toward the inside of the tube, never past its axis
                start = BallState.flying(c.add(0.4 * r * rnd.nextDouble(), n), v.add(-0.3 * speed, n), spin);
            }
            String label = "seed=" + SEED + " case=" + i + " " + surface.name() + " " + law.name() + " start="
                + start.phase().label();
            return Arguments.of(Named.of(label, sim), start);
        });
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void energyNeverRisesBudgetClosesPhasesHaveCauses(Simulation sim, BallState start) {
        List<double[]> energy = new ArrayList<>();
        RunResult res = sim.run(start, 0.2, s -> energy.add(new double[] {s.time(), sim.energy(s.state())}));
        double scale = res.energy().scale();
        double peak = energy.get(0)[1];
        for (double[] e : energy) {
            assertTrue(e[1] <= peak + 1e-8 * scale, "energy rose by " + (e[1] - peak) / scale + " E_scale at t=" + e[0]);
            peak = Math.max(peak, e[1]);
        }
        assertTrue(res.energy().relativeResidual() < 1e-8, "budget " + res.energy());
        List<PhaseSpan> spans = res.phases();
        for (int i = 1; i < spans.size(); i++) {
            PhaseSpan a = spans.get(i - 1);
            PhaseSpan b = spans.get(i);
            assertNotEquals(a.phase(), b.phase(), "consecutive phases equal: " + spans);
            double at = b.start();
            boolean caused = res.events().stream().anyMatch(ev -> ev.time() == at && ev.phaseAfter() == b.phase()
                && ev.before().phase() == a.phase());
            assertTrue(caused, "no event causes " + a.phase() + " -> " + b.phase() + " at " + at + ": " + res.events());
        }
        for (RunEvent ev : res.events()) {
            assertTrue(ev.kind() != null);
        }
    }
}
