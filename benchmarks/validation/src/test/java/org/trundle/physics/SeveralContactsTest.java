package org.trundle.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.trundle.contact.Coulomb;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.ContactLaw;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.Patch;
import org.trundle.core.Phase;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.SampleContact;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.core.SurfaceMotion;
import org.trundle.surfaces.Bounded;
import org.trundle.surfaces.Rails;
import org.trundle.surfaces.VGroove;

/**
 * Full runs with two contacts at once (issue 12): a ball rolling down two parallel rails and down a V-groove,
 * sliding down a groove, the energy budget, and a ball dropped into a groove that gets its second contact on
 * the way. Frame: x along the rails or groove, z up from the apex plane; the slope is given by tilting
 * gravity, {@code g = (g sinθ, 0, −g cosθ)}.
 *
 * <p>Tolerances: the runs use the integrator tolerance 1e-11, and the velocity after 0.3 s of uniform
 * acceleration is compared with {@code a t}; its error is the integration error of a smooth motion, about the
 * tolerance times a few, so 1e-9 relative has two orders of margin and would catch any wrong force term
 * (the rolling radius enters at order one).
 */
class SeveralContactsTest {
    private static final double R = 0.01;
    private static final double M = 0.03;
    private static final double K = 0.4;
    private static final double G = 9.81;

    private static Vector3D gravity(double theta) {
        return new Vector3D(G * Math.sin(theta), 0, -G * Math.cos(theta));
    }

    private static Simulation scene(Vector3D gravity, ContactLaw law, org.trundle.core.Surface a,
                                    org.trundle.core.Surface b) {
        return Simulation.builder().ball(Ball.of(R, M, K)).patch(Patch.of("plus", a)).patch(Patch.of("minus", b))
            .law(law).gravity(gravity)
            .settings(SolverSettings.defaults().withTolerance(1e-11).withSampleInterval(0.01)).build();
    }

    private static VGroove groove60() {
        return new VGroove(Vector3D.ZERO, Vector3D.PLUS_I, Vector3D.PLUS_K, Math.toRadians(60));
    }

    /** A carriage translating along x from rest at the constant acceleration {@code acc} (m/s²). */
    private static SurfaceMotion carriage(double acc) {
        return new SurfaceMotion() {
            @Override
            public void at(double time, org.trundle.core.MotionState out) {
                out.setIdentity();
                out.offset[0] = 0.5 * acc * time * time;
                out.velocity[0] = acc * time;
                out.acceleration[0] = acc;
            }
        };
    }

    /** Samples with two contacts, in time order. */
    private static List<Sample> twoContactSamples(List<Sample> all) {
        List<Sample> out = new ArrayList<>();
        for (Sample s : all) {
            if (s.touches().size() == 2) {
                out.add(s);
            }
        }
        return out;
    }

    /**
     * Two parallel rails {@code S} apart, rail diameter 6 mm, slope 12°: the ball rolls about the chord through
     * both contacts, {@code r_e = √(r² − d²/4)}, so {@code a = g sinθ / (1 + k r²/r_e²)} (energy method; the
     * textbook result for a ball on rails, from memory: J. L. Meriam and L. G. Kraige, Engineering Mechanics:
     * Dynamics, plane motion of rigid bodies), and by statics across the rails each carries
     * {@code N = m g cosθ r/(2 r_e)} (each rail's force along its normal in the cross-section); the energy is
     * conserved (rolling without slip does no work) to 1e-8 of the energy scale.
     */
    @ParameterizedTest
    @ValueSource(doubles = {0.0, 0.3})
    void ballOnRailsRollsAtTheTextbookAcceleration(double v0) {
        double theta = Math.toRadians(12);
        Rails rails = new Rails(Vector3D.ZERO, Vector3D.PLUS_I, Vector3D.PLUS_K, 0.016, 0.006);
        Simulation sim = scene(gravity(theta), new Coulomb(0.5, 0.5, 0.0), rails.plusRail(), rails.minusRail());
        double re = rails.rollingRadius(R);
        double d = rails.contactSpacing(R);
        assertEquals(Math.sqrt(R * R - d * d / 4), re, 1e-15);
        List<Sample> samples = new ArrayList<>();
        double t = 0.3;
        RunResult res = sim.run(sim.rollingStart(rails.restingCentre(R, 0), new Vector3D(v0, 0, 0)), t,
            samples::add);
        assertEquals(EndReason.DURATION, res.endReason(), res.toString());
        assertTrue(res.events().isEmpty(), res.events().toString());
        double a = G * Math.sin(theta) / (1 + K * R * R / (re * re));
        assertEquals(v0 + a * t, res.endState().velocity().getX(), 1e-9 * a * t);
        assertEquals(v0 * t + 0.5 * a * t * t, res.endState().centre().getX(), 1e-9 * a * t * t);
        double n = M * G * Math.cos(theta) * R / (2 * re);
        List<Sample> two = twoContactSamples(samples);
        assertEquals(samples.size(), two.size());
        for (Sample s : two) {
            for (SampleContact c : s.touches()) {
                assertEquals(Phase.ROLLING, c.mode());
                assertEquals(n, c.normalForce(), 1e-9 * n, c.patch() + " at t = " + s.time());
            }
            assertEquals(List.of("plus", "minus"), s.contacts());
        }
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
    }

    /**
     * A V-groove of included angle 60° on a 10° slope with a solid ball (k = 2/5): the same law with
     * {@code r_e = r sin 30°}, {@code a = g sinθ/(1 + k/sin²30°) = g sinθ/2.6}, and each wall carries
     * {@code N = m g cosθ/(2 sin 30°)} (statics across the groove; common practice).
     */
    @Test
    void vGrooveRollsAboutTheChord() {
        double theta = Math.toRadians(10);
        VGroove v = groove60();
        Simulation sim = scene(gravity(theta), new Coulomb(0.5, 0.5, 0.0), v.plusWall(), v.minusWall());
        List<Sample> samples = new ArrayList<>();
        double t = 0.3;
        RunResult res = sim.run(sim.rollingStart(v.restingCentre(R, 0), Vector3D.ZERO), t, samples::add);
        assertEquals(EndReason.DURATION, res.endReason(), res.toString());
        double a = G * Math.sin(theta) / 2.6;
        assertEquals(a * t, res.endState().velocity().getX(), 1e-9 * a * t);
        assertEquals(v.rollingRadius(R), R * Math.sin(Math.toRadians(30)), 1e-15);
        double n = M * G * Math.cos(theta) / (2 * Math.sin(Math.toRadians(30)));
        for (Sample s : twoContactSamples(samples)) {
            for (SampleContact c : s.touches()) {
                assertEquals(n, c.normalForce(), 1e-9 * n);
            }
        }
        assertEquals(samples.size(), twoContactSamples(samples).size());
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
    }

    /**
     * Slip onset per wall in the 60° groove on a 10° slope: rolling needs on each wall the friction
     * {@code m g sinθ (q/(1+q))/2} ({@code q = k/sin²γ}) against {@code N = m g cosθ/(2 sin γ)}, so it holds while
     * {@code μ_s ≥ tanθ q sinγ/(1 + q)} (derived from the rolling solution above). Just above that μ_s the ball
     * rolls with no event; just below, both walls slip at the start, and the ball slides with
     * {@code a = g (sinθ − μ_k cosθ / sin(α/2))}, {@code α} the included angle (each wall's Coulomb friction
     * {@code μ_k N} against the slip down the groove; derived here), with the slip growing, and the energy budget
     * closes with the sliding work counted.
     */
    @ParameterizedTest
    @ValueSource(doubles = {1.01, 0.5})
    void slipStartsWhereTheNeededFrictionExceedsTheGripOnEachWall(double factor) {
        double theta = Math.toRadians(10);
        double gamma = Math.toRadians(30);
        double q = K / (Math.sin(gamma) * Math.sin(gamma));
        double critical = Math.tan(theta) * q * Math.sin(gamma) / (1 + q);
        double mu = critical * factor;
        VGroove v = groove60();
        Simulation sim = scene(gravity(theta), new Coulomb(mu, mu, 0.0), v.plusWall(), v.minusWall());
        double t = 0.3;
        List<Sample> samples = new ArrayList<>();
        RunResult res = sim.run(sim.rollingStart(v.restingCentre(R, 0), Vector3D.ZERO), t, samples::add);
        assertEquals(EndReason.DURATION, res.endReason(), res.toString());
        double a;
        if (factor > 1) {
            assertTrue(res.events().isEmpty(), res.events().toString());
            a = G * Math.sin(theta) / 2.6;
            assertEquals(Phase.ROLLING, res.endState().phase());
        } else {
            List<RunEvent> slips = res.eventsOf(EventKind.SLIP);
            assertEquals(2, slips.size(), res.events().toString());
            assertEquals(0.0, slips.get(0).time(), 0.0);
            assertEquals(List.of("plus", "minus"), List.of(slips.get(0).patch(), slips.get(1).patch()));
            assertEquals(Phase.SLIDING, res.endState().phase());
            a = G * (Math.sin(theta) - mu * Math.cos(theta) / Math.sin(gamma));
            for (SampleContact c : samples.get(samples.size() - 1).touches()) {
                assertEquals(Phase.SLIDING, c.mode());
                double n = M * G * Math.cos(theta) / (2 * Math.sin(gamma));
                assertEquals(n, c.normalForce(), 1e-9 * n);
                assertEquals(mu * n, c.frictionForce().getNorm(), 1e-9 * n);
            }
        }
        assertEquals(a * t, res.endState().velocity().getX(), 1e-9 * a * t);
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
        if (factor < 1) {
            assertTrue(res.energy().slidingFrictionLoss() > 0);
        }
    }

    /**
     * A groove whose walls grip differently: the 60° groove on a 10° slope with a gripping plus wall
     * (Coulomb μ = 0.5) and a frictionless minus wall (μ = 0), from rest or rolling. The minus wall cannot hold
     * the chord rolling, so it slips at the start (one {@code slip} event, on it) and the ball goes on rolling on
     * the plus wall and sliding on the minus one (the closed form of one rolling and one sliding contact). The
     * frictionless wall pushes along its normal, through the centre, so the ball rolls about its contact with the
     * plus wall as on a single plane: Newton–Euler about that contact (the centre moves along the groove, the
     * spin across the groove cannot change, so the plus wall's force in the cross-section is normal too) gives
     * {@code a = g sinθ/(1 + k)} (5/7 g sinθ for a solid ball) and, by statics across the groove, both walls
     * carry {@code N = m g cosθ/(2 sin 30°)} (common practice; derived here). The plus wall needs the friction
     * {@code m g sinθ k/(1 + k)}, well within {@code 0.5 N}. No work is done (rolling, and a frictionless slide),
     * so the energy is conserved to 1e-8 of its scale. Tolerances as above: 1e-9 relative on the integrated
     * velocity and position, integration tolerance 1e-11.
     */
    @ParameterizedTest
    @ValueSource(doubles = {0.0, 0.3})
    void aGrooveWithAFrictionlessWallRollsOnTheOtherAsOnAPlane(double v0) {
        double theta = Math.toRadians(10);
        VGroove v = groove60();
        Simulation sim = Simulation.builder().ball(Ball.of(R, M, K))
            .patch(Patch.of("plus", v.plusWall()).withLaw(new Coulomb(0.5, 0.5, 0.0)))
            .patch(Patch.of("minus", v.minusWall()).withLaw(new Coulomb(0, 0, 0.0)))
            .law(new Coulomb(0.5, 0.5, 0.0)).gravity(gravity(theta))
            .settings(SolverSettings.defaults().withTolerance(1e-11).withSampleInterval(0.01)).build();
        List<Sample> samples = new ArrayList<>();
        double t = 0.3;
        RunResult res = sim.run(sim.rollingStart(v.restingCentre(R, 0), new Vector3D(v0, 0, 0)), t, samples::add);
        assertEquals(EndReason.DURATION, res.endReason(), res.toString());
        List<RunEvent> events = res.events();
        assertEquals(1, events.size(), events.toString());
        assertEquals(EventKind.SLIP, events.get(0).kind(), events.toString());
        assertEquals("minus", events.get(0).patch(), events.toString());
        assertEquals(0.0, events.get(0).time(), 0.0);
        double a = G * Math.sin(theta) / (1 + K);
        assertEquals(v0 + a * t, res.endState().velocity().getX(), 1e-9 * (v0 + a * t));
        assertEquals(v0 * t + 0.5 * a * t * t, res.endState().centre().getX(), 1e-9 * (v0 * t + 0.5 * a * t * t));
        assertEquals(0.0, res.endState().velocity().getY(), 1e-9 * a * t);
        double n = M * G * Math.cos(theta) / (2 * Math.sin(Math.toRadians(30)));
        List<Sample> two = twoContactSamples(samples);
        assertEquals(samples.size(), two.size());
        for (Sample s : two.subList(1, two.size())) {
            SampleContact plus = s.touches().get(0);
            SampleContact minus = s.touches().get(1);
            assertEquals("plus", plus.patch());
            assertEquals(Phase.ROLLING, plus.mode(), "t = " + s.time());
            assertEquals(Phase.SLIDING, minus.mode(), "t = " + s.time());
            assertEquals(n, plus.normalForce(), 1e-9 * n, "t = " + s.time());
            assertEquals(n, minus.normalForce(), 1e-9 * n, "t = " + s.time());
            assertEquals(M * G * Math.sin(theta) * K / (1 + K), plus.frictionForce().getNorm(), 1e-9 * n);
            assertEquals(0.0, minus.frictionForce().getNorm(), 0.0);
        }
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
        assertEquals(0.0, res.energy().slidingFrictionLoss(), 0.0);
    }

    /**
     * A ball dropped into the groove off its centre line lands on one wall (impact on that patch), rolls or
     * slides down it, reaches the other wall (a second contact: an impact or a touch on that patch) and then
     * rolls with both contacts at {@code a = g sinθ/2.6} along the groove (as above). Dropped on the centre
     * line it meets both walls at the same instant: the second contact is taken at once (no penetration).
     */
    @ParameterizedTest
    @ValueSource(doubles = {-0.004, 0.0, 0.003})
    void ballDroppedIntoAGrooveGetsItsSecondContact(double offset) {
        double theta = Math.toRadians(10);
        VGroove v = groove60();
        Simulation sim = scene(gravity(theta), new Coulomb(0.5, 0.4, 0.0), v.plusWall(), v.minusWall());
        Vector3D rest = v.restingCentre(R, 0);
        BallState drop = BallState.flying(rest.add(new Vector3D(0, offset, 0.01)), Vector3D.ZERO, Vector3D.ZERO);
        List<Sample> samples = new ArrayList<>();
        RunResult res = sim.run(drop, 0.6, samples::add);
        assertEquals(EndReason.DURATION, res.endReason(), res.toString());
        List<RunEvent> events = res.events();
        assertTrue(events.size() >= 2, events.toString());
        assertEquals(EventKind.IMPACT, events.get(0).kind(), events.toString());
        String first = events.get(0).patch();
        RunEvent second = events.stream().filter(e -> (e.kind() == EventKind.IMPACT || e.kind() == EventKind.TOUCH)
            && !e.patch().equals(first)).findFirst().orElseThrow(() -> new AssertionError(events.toString()));
        assertTrue(offset == 0 ? second.time() == events.get(0).time() : second.time() > events.get(0).time());
        List<Sample> two = twoContactSamples(samples);
        assertTrue(two.size() > 10, "samples with two contacts: " + two.size());
        // the last samples roll with both contacts at the groove's acceleration
        Sample p = two.get(two.size() - 11);
        Sample q = two.get(two.size() - 1);
        double a = (q.state().velocity().getX() - p.state().velocity().getX()) / (q.time() - p.time());
        assertEquals(G * Math.sin(theta) / 2.6, a, 1e-9 * G);
        assertEquals(0.0, q.state().velocity().getY(), 1e-9);
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
    }

    /**
     * A groove whose second wall ends before the first: the minus wall (the second contact) ends 0.10 m along the
     * groove, the plus wall (the first) 0.20 m along. Rolling from rest on both at {@code a = g sinθ/2.6} (as
     * above), the contact point on the minus wall ({@code c − r n}, {@code n} normal to the axis, so at the centre's
     * axial coordinate) reaches its end at {@code t = √(2 · 0.10 / a)}: the minus contact exits there, with that
     * wall's edge named, and the ball goes on touching the plus wall alone. Tolerance 1e-8 relative: the event
     * search's time tolerance and the integration error over about 80 steps at tolerance 1e-11. (The second
     * contact's edge used to go unwatched while the first touched: the ball rolled on past the minus wall's end.)
     */
    @Test
    void aSecondWallThatEndsFirstIsLeftAtItsEnd() {
        double theta = Math.toRadians(10);
        VGroove v = groove60();
        org.trundle.core.Surface plus = Bounded.of(v.plusWall())
            .axialRange(Vector3D.ZERO, Vector3D.PLUS_I, -1, 0.20).build();
        org.trundle.core.Surface minus = Bounded.of(v.minusWall())
            .axialRange(Vector3D.ZERO, Vector3D.PLUS_I, -1, 0.10).build();
        Simulation sim = scene(gravity(theta), new Coulomb(0.5, 0.5, 0.0), plus, minus);
        List<Sample> samples = new ArrayList<>();
        RunResult res = sim.run(sim.rollingStart(v.restingCentre(R, 0), Vector3D.ZERO), 0.7, samples::add);
        double a = G * Math.sin(theta) / 2.6;
        double tEnd = Math.sqrt(2 * 0.10 / a);
        assertTrue(!res.events().isEmpty(), res + " " + samples.get(0) + " " + samples.get(samples.size() - 1));
        RunEvent exit = res.events().get(0);
        assertEquals(EventKind.EXIT, exit.kind(), res.events().toString());
        assertEquals("minus", exit.patch(), res.events().toString());
        assertEquals("axial_to", exit.edge(), res.events().toString());
        assertEquals(tEnd, exit.time(), 1e-8 * tEnd);
        assertEquals(0.10, exit.before().centre().getX(), 1e-8);
        Sample after = samples.stream().filter(s -> s.time() > tEnd + 0.01).findFirst().orElseThrow();
        assertEquals(List.of("plus"), after.contacts(), after.toString());
    }

    /**
     * The exact pivoting stick with two contacts: a ball rolls on a floor (no slip, Coulomb pivoting couple
     * {@code δ_p F_n}) along a frictionless side wall it is pressed against (sliding there, a force through the
     * centre, no moment about the floor's normal), spinning about the vertical at {@code ω₀}. The Coulomb couple
     * brings the spin down linearly, {@code ω_z(t) = ω₀ + (δ_p N_f/(k m r²)) t} for {@code ω₀ < 0}
     * ({@code N_f = m g_z}, the floor carrying the weight's normal part; Coulomb pivoting friction, from memory:
     * e.g. Leine and Glocker, Eur. J. Mech. A 22 (2003), the spin about the normal of a disk or ball on a plane),
     * to zero at {@code t* = k r² |ω₀|/(δ_p g_z)}, where the hold is taken ({@code pivot_stick} on the floor: no
     * moment about the normal is needed, within the couple) and the spin stays zero (it used to creep towards zero
     * in the regularised couple's band with several contacts). Along the wall the ball rolls at
     * {@code a = g_x/(1 + k)}. Tolerances: 1e-9 relative on the linear decay and the acceleration (integration
     * tolerance 1e-11); the stick fires at the edge of the smoothing band {@code |ω_z| = ω_b}, at
     * {@code t* − ω_b k r²/(δ_p g_z)}, to 1e-8 (the event search's tolerance); after it the spin is zero to
     * rounding (1e-12 rad/s).
     */
    @Test
    void theExactPivotingStickHoldsWithASecondContact() {
        double dp = 2e-4;
        double w0 = -20;
        Vector3D g = new Vector3D(1.2, 1.5, -9.6);
        org.trundle.core.Surface floor = new org.trundle.surfaces.Plane(Vector3D.ZERO, Vector3D.PLUS_K);
        org.trundle.core.Surface wall = new org.trundle.surfaces.Plane(new Vector3D(0, R, 0), Vector3D.MINUS_J);
        Simulation sim = Simulation.builder().ball(Ball.of(R, M, K))
            .patch(Patch.of("floor", floor).withLaw(new PureRolling()
                .and(new org.trundle.contact.PivotingResistance(dp))))
            .patch(Patch.of("wall", wall).withLaw(new Coulomb(0, 0, 0)))
            .law(new Coulomb(0, 0, 0)).gravity(g)
            .settings(SolverSettings.defaults().withTolerance(1e-11).withSampleInterval(0.01)).build();
        List<Sample> samples = new ArrayList<>();
        double v0 = 0.05;
        // rolling on the floor with the spin w0 about its normal (a rolling start would roll on the wall as well)
        BallState start = BallState.of(0, new Vector3D(0, 0, R), new Vector3D(v0, 0, 0),
            org.hipparchus.geometry.euclidean.threed.Rotation.IDENTITY, new Vector3D(0, v0 / R, w0), Phase.ROLLING);
        RunResult res = sim.run(start, 0.8, samples::add);
        assertEquals(EndReason.DURATION, res.endReason(), res.toString());
        double rate = dp * -g.getZ() / (K * R * R);
        double tStar = -w0 / rate;
        RunEvent stick = res.events().stream().filter(e -> e.kind() == EventKind.PIVOT_STICK).findFirst()
            .orElseThrow(() -> new AssertionError(res.events().toString()));
        assertEquals("floor", stick.patch());
        // the trigger: the edge of the smoothing band, ω_b = 1e-3 V / r with the speed scale
        // V = max(|v₀|, r|ω₀|, √(|g| r)) (ContactThresholds' documented defaults)
        double speedScale = Math.max(Math.max(v0, R * Math.hypot(v0 / R, w0)), Math.sqrt(g.getNorm() * R));
        double band = 1e-3 * speedScale / R;
        double tBand = tStar - band / rate;
        assertEquals(tBand, stick.time(), 1e-8 * tStar, stick + " vs " + tStar);
        double a = g.getX() / (1 + K);
        for (Sample s : samples) {
            double wz = s.state().spin().getZ();
            if (s.time() < stick.time()) {
                assertEquals(w0 + rate * s.time(), wz, 1e-9 * -w0, "t = " + s.time());
            } else {
                assertEquals(0.0, wz, 1e-12, "t = " + s.time());
            }
            assertEquals(v0 + a * s.time(), s.state().velocity().getX(), 1e-9 * (v0 + a * 0.8), "t = " + s.time());
            assertEquals(List.of("floor", "wall"), s.contacts());
        }
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
    }

    /**
     * A groove made of two segments joined 0.10 m along it (each wall cut in two bounded patches, the second pair
     * continuing the first): at the join both contacts are handed over to the next segment's walls
     * ({@code handover} events, no impulse) and the ball rolls on with both contacts as if the groove were whole,
     * {@code v = a t}, {@code x = a t²/2}, {@code a = g sinθ/2.6} (as above), to 1e-9, with the energy
     * conserved to 1e-8. (Several contacts used to be released at a join and taken again by touches and stick
     * impulses.)
     */
    @Test
    void bothContactsAreHandedOverWhereAGrooveIsJoined() {
        double theta = Math.toRadians(10);
        VGroove v = groove60();
        java.util.function.BiFunction<org.trundle.core.Surface, double[], org.trundle.core.Surface> cut = (w, r) ->
            Bounded.of(w).axialRange(Vector3D.ZERO, Vector3D.PLUS_I, r[0], r[1]).build();
        Simulation sim = Simulation.builder().ball(Ball.of(R, M, K))
            .patch(Patch.of("plus_a", cut.apply(v.plusWall(), new double[] {-1, 0.1})))
            .patch(Patch.of("minus_a", cut.apply(v.minusWall(), new double[] {-1, 0.1})))
            .patch(Patch.of("plus_b", cut.apply(v.plusWall(), new double[] {0.1, 1})))
            .patch(Patch.of("minus_b", cut.apply(v.minusWall(), new double[] {0.1, 1})))
            .law(new Coulomb(0.5, 0.5, 0.0)).gravity(gravity(theta))
            .settings(SolverSettings.defaults().withTolerance(1e-11).withSampleInterval(0.05)).build();
        List<Sample> samples = new ArrayList<>();
        double t = 0.9;
        RunResult res = sim.run(sim.rollingStart(v.restingCentre(R, 0), Vector3D.ZERO), t, samples::add);
        assertEquals(EndReason.DURATION, res.endReason(), res.toString());
        double a = G * Math.sin(theta) / 2.6;
        double tJoin = Math.sqrt(2 * 0.1 / a);
        java.util.Set<String> entered = new java.util.TreeSet<>();
        for (RunEvent e : res.events()) {
            assertEquals(EventKind.HANDOVER, e.kind(), res.events().toString());
            assertEquals(tJoin, e.time(), 1e-8 * tJoin);
            assertEquals(Vector3D.ZERO, e.impulse());
            entered.add(e.from() + ">" + e.to());
        }
        assertEquals(java.util.Set.of("minus_a>minus_b", "plus_a>plus_b"), entered);
        assertEquals(a * t, res.endState().velocity().getX(), 1e-9 * a * t);
        assertEquals(0.5 * a * t * t, res.endState().centre().getX(), 1e-9 * a * t * t);
        Sample last = samples.get(samples.size() - 1);
        assertEquals(java.util.Set.of("plus_b", "minus_b"), new java.util.HashSet<>(last.contacts()));
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
    }

    /**
     * A groove wall that moves (design notes §9): the plus wall slides along the groove at {@code V} like a belt,
     * the minus wall stands still. Rolling without slip on both, the ball's centre moves at {@code V/2} plus the
     * still groove's motion (the contact points move at {@code V} and 0; the constraints differentiated are
     * those of the still groove, since a plane translating at constant velocity adds no term), so
     * {@code v_x(t) = V/2 + g sinθ t/2.6}; the energy budget closes with the belt's drive work counted.
     */
    @Test
    void aBeltWallAndAStillWallCarryTheBallAtHalfTheBeltSpeed() {
        double theta = Math.toRadians(10);
        double belt = 0.2;
        VGroove v = groove60();
        Simulation sim = Simulation.builder().ball(Ball.of(R, M, K))
            .patch(Patch.of("plus", v.plusWall()).withMotion(SurfaceMotion.translation(new Vector3D(belt, 0, 0))))
            .patch(Patch.of("minus", v.minusWall())).law(new Coulomb(0.5, 0.5, 0.0)).gravity(gravity(theta))
            .settings(SolverSettings.defaults().withTolerance(1e-11).withSampleInterval(0.01)).build();
        List<Sample> samples = new ArrayList<>();
        double t = 0.3;
        RunResult res = sim.run(sim.rollingStart(v.restingCentre(R, 0), new Vector3D(belt / 2, 0, 0)), t,
            samples::add);
        assertEquals(EndReason.DURATION, res.endReason(), res.toString());
        assertTrue(res.events().isEmpty(), res.events().toString());
        double a = G * Math.sin(theta) / 2.6;
        assertEquals(belt / 2 + a * t, res.endState().velocity().getX(), 1e-9 * (belt + a * t));
        for (Sample s : samples) {
            assertEquals(2, s.touches().size());
        }
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
    }

    /**
     * A groove on a carriage accelerating at {@code A} along the groove: relative to the groove the ball rolls as
     * under the gravity {@code g − A} (d'Alembert), so in the ground frame {@code a = A + (g sinθ − A)/2.6}; this
     * checks the moving patches' constraint terms ({@code β = A} for a translating wall); the budget closes with
     * the carriage's drive work.
     */
    @Test
    void aGrooveOnAnAcceleratingCarriage() {
        double theta = Math.toRadians(10);
        double acc = 0.8;
        SurfaceMotion carriage = carriage(acc);
        VGroove v = groove60();
        Simulation sim = Simulation.builder().ball(Ball.of(R, M, K))
            .patch(Patch.of("plus", v.plusWall()).withMotion(carriage))
            .patch(Patch.of("minus", v.minusWall()).withMotion(carriage))
            .law(new Coulomb(0.5, 0.5, 0.0)).gravity(gravity(theta))
            .settings(SolverSettings.defaults().withTolerance(1e-11)).build();
        double t = 0.3;
        RunResult res = sim.run(sim.rollingStart(v.restingCentre(R, 0), Vector3D.ZERO), t);
        assertEquals(EndReason.DURATION, res.endReason(), res.toString());
        assertTrue(res.events().isEmpty(), res.events().toString());
        double a = acc + (G * Math.sin(theta) - acc) / 2.6;
        assertEquals(a * t, res.endState().velocity().getX(), 1e-9 * a * t);
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
        assertTrue(res.energy().driveWork() != 0);
    }

    /**
     * Rest relative to moving walls: the groove on a carriage accelerating along the groove at
     * {@code A = g sinθ} (the slope's pull exactly): in the carriage's frame the gravity along the groove is
     * {@code g sinθ − A = 0} (d'Alembert, as above), so a ball placed at rest in the groove stays at rest relative
     * to it; the run ends at rest at once, and the walls carry the ball as on a level groove,
     * {@code N = m g cosθ/(2 sin 30°)} each (statics across the groove; common practice), to 1e-12. With
     * {@code A = 0.999 g sinθ} the ball creeps down the groove and no rest is found in 0.3 s (it used to be that
     * no rest was ever found with several moving walls).
     */
    @ParameterizedTest
    @ValueSource(doubles = {1.0, 0.999})
    void aBallRestsInAGrooveOnACarriageThatCancelsTheSlope(double factor) {
        double theta = Math.toRadians(10);
        double acc = factor * G * Math.sin(theta);
        SurfaceMotion carriage = carriage(acc);
        VGroove v = groove60();
        Simulation sim = Simulation.builder().ball(Ball.of(R, M, K))
            .patch(Patch.of("plus", v.plusWall()).withMotion(carriage))
            .patch(Patch.of("minus", v.minusWall()).withMotion(carriage))
            .law(new Coulomb(0.5, 0.5, 0.0)).gravity(gravity(theta))
            .settings(SolverSettings.defaults().withTolerance(1e-11)).build();
        List<Sample> samples = new ArrayList<>();
        RunResult res = sim.run(sim.rollingStart(v.restingCentre(R, 0), Vector3D.ZERO), 0.3, samples::add);
        if (factor == 1.0) {
            assertEquals(EndReason.REST, res.endReason(), res.toString());
            assertEquals(0.0, res.endState().time());
            double n = M * G * Math.cos(theta) / (2 * Math.sin(Math.toRadians(30)));
            Sample last = samples.get(samples.size() - 1);
            assertEquals(2, last.touches().size(), last.toString());
            for (SampleContact c : last.touches()) {
                assertEquals(n, c.normalForce(), 1e-12 * n, c.toString());
            }
        } else {
            assertEquals(EndReason.DURATION, res.endReason(), res.toString());
        }
    }

    /**
     * Two contacts on a turning patch: a scene of two coincident turntables (the same plane, the same rotation)
     * touched at one point, so that the two contacts' constraints coincide (a system singular beyond the
     * squeeze modes, solved for the minimum-norm forces) and every term of a rotating patch enters the
     * constraints ({@code Ω × n}, {@code A} with the centripetal and Coriolis parts). The ball must move as on one
     * turntable: its velocity turns at {@code kΩ/(1+k)} about the centre {@code c₀ + ẑ × v₀/(kΩ/(1+k))} (W. Weltner,
     * Am. J. Phys. 47 (1979) 984; from memory; the same check as the one-contact turntable), to 1e-9 of the speed
     * and of the orbit radius over a quarter orbit, with both contacts listed in every sample.
     */
    @Test
    void twoContactsOnATurntableOrbitAsOne() {
        double omega = 3.0;
        double k = 0.4;
        Vector3D origin = new Vector3D(0.02, -0.01, 0);
        SurfaceMotion turn = SurfaceMotion.rotation(Vector3D.PLUS_K, origin, omega);
        org.trundle.surfaces.Plane table = new org.trundle.surfaces.Plane(Vector3D.ZERO, Vector3D.PLUS_K);
        Simulation sim = Simulation.builder().ball(Ball.of(R, M, k)).patch(Patch.of("table", table).withMotion(turn))
            .patch(Patch.of("twin", table).withMotion(turn)).law(new PureRolling())
            .gravity(new Vector3D(0, 0, -G)).settings(SolverSettings.defaults().withSampleInterval(0.05)).build();
        Vector3D c0 = new Vector3D(0.05, 0.01, R);
        Vector3D v0 = new Vector3D(-0.03, 0.08, 0);
        double rate = k * omega / (1 + k);
        Vector3D centre = c0.add(Vector3D.crossProduct(Vector3D.PLUS_K, v0).scalarMultiply(1 / rate));
        double radius = v0.getNorm() / Math.abs(rate);
        List<Sample> samples = new ArrayList<>();
        RunResult res = sim.run(sim.rollingStart(c0, v0), 0.5 * Math.PI / rate, samples::add);
        assertEquals(EndReason.DURATION, res.endReason(), res.toString());
        assertTrue(res.events().isEmpty(), res.events().toString());
        for (Sample s : samples) {
            assertEquals(2, s.touches().size());
            org.hipparchus.geometry.euclidean.threed.Rotation rot = new org.hipparchus.geometry.euclidean.threed.Rotation(
                Vector3D.PLUS_K, rate * s.time(), org.hipparchus.geometry.euclidean.threed.RotationConvention.VECTOR_OPERATOR);
            assertEquals(0, s.state().velocity().subtract(rot.applyTo(v0)).getNorm(), 1e-9 * v0.getNorm());
            assertEquals(0, s.state().centre().subtract(centre.add(rot.applyTo(c0.subtract(centre)))).getNorm(),
                1e-9 * radius);
        }
        assertTrue(res.energy().relativeResidual() < 1e-8, res.energy().toString());
    }

    /**
     * A groove of two segments (an invented feeder): the lower pair of walls slides along the groove toward the
     * upper pair at {@code U} (0.3 m/s), so a ball rolling down is handed over, both contacts at once, onto walls
     * whose contact points move. With unbounded grip (pure rolling) the slip is stopped at the join by impulses
     * along the groove at both contacts, which leave the angular momentum about the chord through the contact
     * points unchanged: {@code m r_e v + I ω = m r_e v' + I ω'} with {@code v = r_e ω} before and
     * {@code v' − U = r_e ω'} after, so {@code Δv = k r² U/(r_e² + k r²) = k U/(k + sin²γ)} ({@code r_e = r sin γ};
     * 4/9 of {@code U} for a solid ball in a 90° groove; common practice of impulsive rolling), to 1e-9 of
     * {@code U}, the ball still rolling and the budget closed with the drive work (1e-8 of {@code E_scale}). With
     * Coulomb friction the two contacts slide on (no normal impulse at a tangent join) until friction stops the slip.
     * (Pure rolling used to slide on frictionless, carried nowhere.)
     */
    @Test
    void rollingOntoGrooveWallsThatSlideTakesUpTheirSpeedByImpulses() {
        double th = Math.toRadians(10);
        double r = 0.005;
        double speed = -0.3;
        Ball ball = Ball.solid(r, 0.004);
        VGroove v = new VGroove(Vector3D.ZERO, Vector3D.PLUS_I, Vector3D.PLUS_K, Math.toRadians(90));
        double k = ball.inertiaFactor();
        double sin = Math.sin(v.halfAngle());
        for (boolean unbounded : new boolean[] {true, false}) {
            Simulation.Builder b = Simulation.builder().ball(ball)
                .law(unbounded ? new PureRolling() : new Coulomb(0.5, 0.4, 0.3))
                .gravity(new Vector3D(G * Math.sin(th), 0, -G * Math.cos(th)));
            String[] side = {"plus", "minus"};
            for (int w = 0; w < 2; w++) {
                b.patch(Patch.of("upper_" + side[w], Bounded.of(v.walls().get(w))
                    .axialRange(Vector3D.ZERO, Vector3D.PLUS_I, -1, 0.05).build()));
                b.patch(Patch.of("lower_" + side[w], Bounded.of(v.walls().get(w))
                    .axialRange(Vector3D.ZERO, Vector3D.PLUS_I, 0.05, 1).build())
                    .withMotion(SurfaceMotion.translation(new Vector3D(speed, 0, 0))));
            }
            Simulation sim = b.build();
            RunResult res = sim.run(sim.rollingStart(v.restingCentre(r, 0.0), new Vector3D(0.2, 0, 0)), 0.3);
            List<RunEvent> h = res.eventsOf(EventKind.HANDOVER);
            assertEquals(2, h.size(), res.events().toString());
            assertEquals(h.get(0).time(), h.get(1).time(), res.events().toString());
            double budget = res.energy().relativeResidual();
            assertTrue(budget < 1e-8, res.energy().toString());
            if (unbounded) {
                double dv = h.get(1).after().velocity().getX() - h.get(0).before().velocity().getX();
                double error = Math.abs(dv / speed - k / (k + sin * sin));
                System.out.printf("conveyor groove, pure rolling: dv/U %.12f against k/(k + sin^2 gamma) %.12f, budget"
                    + " %.2g%n", dv / speed, k / (k + sin * sin), budget);
                assertTrue(error < 1e-9, "velocity jump error " + error);
                assertEquals(Phase.ROLLING, h.get(1).after().phase());
            } else {
                assertEquals(Phase.SLIDING, h.get(1).after().phase(), res.events().toString());
                assertTrue(res.events().stream().anyMatch(e -> e.kind() == EventKind.STICK), res.events().toString());
            }
        }
    }
}
