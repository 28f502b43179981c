package org.trundle.core;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

/** What an applied load sees and sets: the typed state view and the wrench. */
class AppliedLoadViewTest {
    private static final double R = 0.01;
    private static final double M = 0.02;

    private static Simulation flight(AppliedLoad load) {
        return Simulation.builder().ball(Ball.solid(R, M)).surface(new FloorForTests(Double.POSITIVE_INFINITY))
            .law(() -> "grip").noGravity().load(load).build();
    }

    /**
     * In force-free flight the view holds the exact motion at every evaluation (the integrator's stages
     * included, which are exact for this polynomial motion): a straight line at constant velocity and
     * the constant spin (common practice); to rounding.
     */
    @Test
    void theViewHoldsTheState() {
        Vector3D c0 = new Vector3D(0.1, -0.2, 1.0);
        Vector3D v0 = new Vector3D(0.5, 0.2, 1.0);
        Vector3D w = new Vector3D(3, -2, 5);
        double[] worst = new double[3];
        int[] calls = new int[1];
        double[] last = {-1};
        AppliedLoad watcher = (s, out) -> {
            double t = s.time();
            calls[0]++;
            last[0] = Math.max(last[0], t);
            worst[0] = Math.max(worst[0], s.centre().subtract(c0.add(t, v0)).getNorm());
            worst[1] = Math.max(worst[1], s.velocity().subtract(v0).getNorm() + s.spin().subtract(w).getNorm());
            worst[2] = Math.max(worst[2], Math.abs(s.centre(2) - s.centre().getZ()) + Math.abs(s.velocity(0) - v0.getX())
                + Math.abs(s.spin(1) - w.getY()));
        };
        flight(watcher).run(BallState.of(0, c0, v0, Rotation.IDENTITY, w, Phase.FLIGHT), 0.3);
        assertTrue(calls[0] > 10, "calls " + calls[0]);
        assertEquals(0.3, last[0], 1e-15);
        assertTrue(worst[0] < 1e-13, "centre " + worst[0]);
        assertTrue(worst[1] < 1e-13, "velocity and spin " + worst[1]);
        assertEquals(0.0, worst[2]);
    }

    /**
     * The orientation is Hipparchus' {@link Rotation} body to world, the same value as
     * {@link BallState#orientation()}: without spin it stays the start's rotation (a body vector maps
     * as {@code q0.applyTo}), never its inverse (the convention guard of the old array interface, whose
     * quaternion was the conjugate of Hipparchus' components).
     */
    @Test
    void theOrientationIsHipparchusBodyToWorld() {
        Rotation q0 = new Rotation(new Vector3D(1, 2, 2), 0.7, RotationConvention.VECTOR_OPERATOR);
        double[] worst = {0, Double.POSITIVE_INFINITY};
        AppliedLoad watcher = (s, out) -> {
            Rotation q = s.orientation();
            worst[0] = Math.max(worst[0], Rotation.distance(q0, q));
            worst[1] = Math.min(worst[1], Rotation.distance(q0.revert(), q));
            Vector3D body = Vector3D.PLUS_I;
            worst[0] = Math.max(worst[0], q.applyTo(body).subtract(q0.applyTo(body)).getNorm());
        };
        RunResult res = flight(watcher).run(BallState.of(0, new Vector3D(0, 0, 1), Vector3D.PLUS_I, q0, Vector3D.ZERO,
            Phase.FLIGHT), 0.2);
        assertTrue(worst[0] < 1e-15, "distance to the start rotation " + worst[0]);
        assertTrue(worst[1] > 1.0, "distance to its inverse " + worst[1]);
        assertTrue(Rotation.distance(q0, res.endState().orientation()) < 1e-15);
    }

    /**
     * A constant force F and torque τ set through the wrench: {@code c = c₀ + v₀ t + F t²/(2m)} and
     * {@code ω = ω₀ + τ t/I}, {@code I = (2/5) m r²} (Newton–Euler for a sphere, common practice); the
     * applied work is {@code F·Δc + τ·Δθ}.
     */
    @Test
    void theWrenchSetsForceAndTorque() {
        Vector3D f = new Vector3D(0.02, -0.01, 0.005);
        Vector3D tau = new Vector3D(0, 0, 2e-6);
        Simulation sim = flight((s, out) -> {
            out.force(f);
            out.torque(tau.getX(), tau.getY(), tau.getZ());
        });
        double t = 0.4;
        RunResult res = sim.run(BallState.flying(Vector3D.PLUS_K, new Vector3D(0.1, 0, 0), Vector3D.ZERO), t);
        Vector3D moved = new Vector3D(0.1 * t, 0, 0).add(f.scalarMultiply(t * t / (2 * M)));
        Vector3D expect = Vector3D.PLUS_K.add(moved);
        assertTrue(res.endState().centre().subtract(expect).getNorm() < 1e-12, res.endState().centre().toString());
        double inertia = 0.4 * M * R * R;
        assertEquals(tau.getZ() * t / inertia, res.endState().spin().getZ(), 1e-12);
        double work = f.dotProduct(moved) + tau.getZ() * 0.5 * tau.getZ() / inertia * t * t;
        assertEquals(work, res.energy().appliedWork(), 1e-12);
    }

    /**
     * The README's drag example: in flight without gravity a linear drag {@code F = −b v} slows the ball as
     * {@code v = v₀ e^{−bt/m}}, {@code x = v₀ (m/b)(1 − e^{−bt/m})} (common practice); 1e-9 relative, ten
     * times the integration tolerance.
     */
    @Test
    void readmeDragExample() {
        double b = 2e-4;                                           // linear drag coefficient (N·s/m), invented
        AppliedLoad drag = (s, out) -> out.force(-b * s.velocity(0), -b * s.velocity(1), -b * s.velocity(2));
        double t = 0.5;
        RunResult res = flight(drag).run(BallState.flying(Vector3D.PLUS_K, new Vector3D(2, 0, 0), Vector3D.ZERO), t);
        double decay = Math.exp(-b * t / M);
        assertEquals(2 * decay, res.endState().velocity().getX(), 1e-9 * 2);
        assertEquals(2 * M / b * (1 - decay), res.endState().centre().getX(), 1e-9 * 2 * M / b);
        assertTrue(res.energy().appliedWork() < 0);
    }
}
