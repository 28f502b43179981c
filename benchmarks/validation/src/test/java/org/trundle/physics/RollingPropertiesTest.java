package org.trundle.physics;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Named;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.EventKind;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.Surface;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Plane;
import org.trundle.surfaces.Side;

/**
 * Conservation properties of pure rolling over seeded random cases (radii, axes, gravity
 * directions, rolling starts) on planes and cylinders, inside and outside.
 *
 * <p>Pure rolling does no work (the contact point is at rest), so mechanical energy is conserved
 * (common practice; any text on non-holonomic rolling); the budget must close (to 1e-8 of
 * {@code E_scale}) whatever happens, and with no impacts the energy itself stays constant. The
 * distance residual must stay below 1e-9 r (the slip is zero by construction: the rolling velocity
 * is derived, {@code v = r ω × n}).
 * Each case's display name holds the seed and index, so a failure reproduces.
 */
class RollingPropertiesTest {
    static final long SEED = 0x7a11_2026L;
    static final int CASES = 200;

    static Stream<Arguments> cases() {
        return IntStream.range(0, CASES).mapToObj(i -> {
            SplittableRandom rnd = new SplittableRandom(SEED + 7919L * i);
            int kind = i % 3;
            double r = 0.001 + 0.02 * rnd.nextDouble();
            double k = 0.1 + (2.0 / 3.0 - 0.1) * rnd.nextDouble();
            Ball ball = Ball.of(r, 0.001 + rnd.nextDouble(), k);
            Vector3D axis = unit(rnd);
            Vector3D origin = new Vector3D(rnd.nextDouble() - 0.5, rnd.nextDouble() - 0.5, rnd.nextDouble() - 0.5);
            Vector3D gravity = unit(rnd).scalarMultiply(9.81 * rnd.nextDouble());
            Surface surface;
            Vector3D c;
            Vector3D n;
            Vector3D tangentA;
            Vector3D tangentB;
            if (kind == 0) {
                surface = new Plane(origin, axis);
                n = axis;
                c = origin.add(r, n);
                tangentA = n.orthogonal();
                tangentB = Vector3D.crossProduct(n, tangentA);
            } else {
                Side side = kind == 1 ? Side.INSIDE : Side.OUTSIDE;
                double bigR = kind == 1 ? r * (1.2 + 10 * rnd.nextDouble()) : 0.002 + 0.05 * rnd.nextDouble();
                surface = new Cylinder(origin, axis, bigR, side);
                Vector3D er = axis.orthogonal();
                double rho = side == Side.INSIDE ? bigR - r : bigR + r;
                c = origin.add(rho, er).add(0.1 * (rnd.nextDouble() - 0.5), axis);
                n = side == Side.INSIDE ? er.negate() : er;
                tangentA = axis;
                tangentB = Vector3D.crossProduct(n, axis);
            }
            double speed = 0.05 + 2 * rnd.nextDouble();
            double phi = 2 * Math.PI * rnd.nextDouble();
            Vector3D v = tangentA.scalarMultiply(speed * Math.cos(phi)).add(speed * Math.sin(phi), tangentB);
            double normalSpin = (rnd.nextDouble() - 0.5) * 4 * speed / r;
            Simulation sim = Simulation.builder().ball(ball).surface(surface).law(new PureRolling())
                .gravity(gravity).build();
            BallState start = sim.rollingStart(c, v, normalSpin);
            String label = "seed=" + SEED + " case=" + i + " " + surface.name() + " " + ball;
            return Arguments.of(Named.of(label, sim), start);
        });
    }

    private static Vector3D unit(SplittableRandom rnd) {
        while (true) {
            Vector3D v = new Vector3D(2 * rnd.nextDouble() - 1, 2 * rnd.nextDouble() - 1, 2 * rnd.nextDouble() - 1);
            double n = v.getNorm();
            if (n > 0.1 && n <= 1) {
                return v.scalarMultiply(1 / n);
            }
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void energyIsConservedAndResidualsStaySmall(Simulation sim, BallState start) {
        RunResult res = sim.run(start, 0.2);
        double r = sim.ball().radius();
        assertTrue(res.energy().relativeResidual() < 1e-8, "budget " + res.energy());
        if (res.eventsOf(EventKind.IMPACT).isEmpty()) {
            double drift = Math.abs(res.energy().fin() - res.energy().initial()) / res.energy().scale();
            assertTrue(drift < 1e-8, "energy drift " + drift);
        }
        assertTrue(res.maxDistanceError() < 1e-9 * r, "distance residual " + res.maxDistanceError() / r + " r");
    }
}
