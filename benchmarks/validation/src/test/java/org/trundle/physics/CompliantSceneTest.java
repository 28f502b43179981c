package org.trundle.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.special.Beta;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.trundle.contact.Coulomb;
import org.trundle.contact.HertzStiffness;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.Compliance;
import org.trundle.core.EventKind;
import org.trundle.core.Material;
import org.trundle.core.Patch;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.SampleContact;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.core.SurfaceMotion;
import org.trundle.surfaces.Plane;
import org.trundle.surfaces.VGroove;

/**
 * Compliant contact per patch in scenes: a ball dropped into a compliant V-groove presses both walls at once (each
 * wall its own Hertz–Hunt–Crossley contact, summed), and its vertical motion is a Hertz impact of the combined
 * stiffness; a compliant patch in a scene with a rigid one gives the one-patch answers; a moving compliant patch acts
 * relative to its motion (Galilean invariance) with the drive work booked; a rigid and a compliant contact act at once
 * (a ball rolling on a rigid floor into a compliant wall); reruns are bit-identical.
 */
class CompliantSceneTest {
    private static final double R = 0.005;
    /** Steel ball of 10 mm: m = ρ (4/3) π r³ with ρ = 7850 kg/m³ (common practice). */
    private static final double M = 7850 * 4.0 / 3 * Math.PI * R * R * R;
    private static final Ball BALL = Ball.solid(R, M);
    private static final SolverSettings TIGHT = SolverSettings.defaults().withTolerance(1e-12);

    private static Simulation groove(double includedDeg, Compliance c, Coulomb law, Vector3D g, SolverSettings set) {
        VGroove v = new VGroove(Vector3D.ZERO, Vector3D.PLUS_I, Vector3D.PLUS_K, Math.toRadians(includedDeg));
        return Simulation.builder().ball(BALL).law(law).gravity(g).settings(set).compliance(c)
            .patch(Patch.of("left", v.plusWall())).patch(Patch.of("right", v.minusWall())).build();
    }

    /**
     * A ball falling straight down the bisector of a symmetric V-groove of half-angle γ (frictionless, no gravity)
     * presses both walls from the same instant. Each wall's normal makes the angle β with the vertical,
     * {@code cos β = sin γ}; for a descent {@code z} below first touch each wall's approach is {@code δ = z sin γ}
     * and its rate {@code ż sin γ}, and the impact speed of each contact is {@code v sin γ}, so each wall pushes
     * {@code K (z sin γ)^{3/2}(1 + χ ż/v)} along its normal; the horizontal parts cancel and the vertical sum is
     * {@code K_eff z^{3/2}(1 + χ ż/v)} with {@code K_eff = 2 K sin^{5/2} γ} (derived here). That is the one-body
     * Hertz impact with Hunt–Crossley damping of {@link Compliance}: the contact lasts
     * {@code t_c = (4/5) B(2/5, 1/2) δ_m/v}, {@code δ_m = (5 m v²/(4 K_eff))^{2/5}} for {@code e = 1}
     * (K. L. Johnson, Contact Mechanics, 1985, §11.4), and the ball rebounds at {@code e v} (the exact relation of
     * {@link Compliance}, which does not depend on the stiffness). Both walls' forces follow the law on every
     * sample, equal by symmetry; the damping took {@code ½ m v² (1 − e²)} and the budget closes.
     */
    @ParameterizedTest(name = "included {0} deg, e = {1}")
    @CsvSource({"60, 1.0", "90, 1.0", "120, 1.0", "90, 0.7", "60, 0.4"})
    void vGrooveDropIsAHertzImpactOfTheCombinedStiffness(double includedDeg, double e) {
        double v = 0.8;
        double gamma = Math.toRadians(includedDeg / 2);
        double sg = Math.sin(gamma);
        Compliance c = HertzStiffness.compliance(Material.STEEL, Material.ACRYLIC, e);
        double k = c.stiffness(R, 0, 0);
        double kEff = 2 * k * Math.pow(sg, 2.5);
        double dStar = Math.pow(5 * M * v * v / (4 * kEff), 0.4);
        double tc = 0.8 * Math.exp(Beta.logBeta(0.4, 0.5)) * dStar / v;
        double z0 = R / sg;
        double gap = 1e-4;
        Simulation sim = groove(includedDeg, c, new Coulomb(0, 0, e), Vector3D.ZERO,
            TIGHT.withSampleInterval(tc / 50));
        List<Sample> samples = new ArrayList<>();
        BallState start = BallState.flying(new Vector3D(0, 0, z0 + gap), new Vector3D(0, 0, -v), Vector3D.ZERO);
        RunResult r = sim.run(start, gap / v + 3 * tc, samples::add);
        List<RunEvent> impacts = r.eventsOf(EventKind.IMPACT);
        List<RunEvent> lifts = r.eventsOf(EventKind.LIFT_OFF);
        assertEquals(2, impacts.size(), r.events().toString());
        assertEquals(2, lifts.size(), r.events().toString());
        assertTrue(!impacts.get(0).patch().equals(impacts.get(1).patch()), r.events().toString());
        // each impact event fires at a normal gap of 1e-9 r (the rule's slack), that is 1e-9 r/(v sin γ) before
        // the contact began; the release fires at zero approach
        double duration = lifts.get(0).time() - impacts.get(0).time() + 1e-9 * R / (v * sg);
        System.out.printf("V-groove %3.0f deg, e = %.1f: contact time %.9e s (theory, e = 1: %.9e s), rebound %.12f,"
                + " evaluations %d, residual %.2e%n", includedDeg, e, duration, tc, r.endState().velocity().getZ() / v,
            r.evaluations(), r.energy().relativeResidual());
        if (e == 1.0) {
            // events located to 1e-12 s, the motion integrated at tolerance 1e-12 (as the one-wall check)
            assertEquals(tc, duration, 1e-8 * tc);
        }
        // both walls leave at the same instant (symmetry; event location to 1e-12 s)
        assertEquals(lifts.get(0).time(), lifts.get(1).time(), 1e-11);
        // rebound e v: at tolerance 1e-12 the one-wall rebound holds to about 1e-9, asserted to 1e-8
        assertEquals(e * v, r.endState().velocity().getZ(), 1e-8 * v, r.events().toString());
        assertEquals(0, r.endState().velocity().getX(), 1e-12 * v);
        assertEquals(0, r.endState().velocity().getY(), 1e-12 * v);
        double lost = 0.5 * M * v * v * (1 - e * e);
        assertEquals(lost, r.energy().contactDampingLoss(), 1e-8 * 0.5 * M * v * v);
        assertEquals(0, r.energy().relativeResidual(), 1e-8);
        int inContact = 0;
        double peak = k * Math.pow(dStar * sg, 1.5);
        for (Sample s : samples) {
            double z = z0 - s.state().centre().getZ();
            if (z <= 0 || s.event()) {
                continue;
            }
            inContact++;
            List<SampleContact> both = s.touches();
            assertEquals(2, both.size(), "two walls pressed at t = " + s.state().time());
            double delta = z * sg;
            double rate = -s.state().velocity().getZ() * sg;
            double expected = k * Math.pow(delta, 1.5) * (1 + c.dampingFactor() * rate / (v * sg));
            for (SampleContact one : both) {
                // the samples' approach is the integrated state's; the force is the law evaluated there, to rounding
                assertEquals(expected, one.normalForce(), 1e-12 * peak, one.patch());
                assertEquals(1.0, one.normal().dotProduct(Vector3D.PLUS_K) / sg, 1e-12);
            }
            assertEquals(both.get(0).normalForce(), both.get(1).normalForce(), 1e-12 * peak);
        }
        assertTrue(inContact > 40, "samples in contact: " + inContact);
    }

    /**
     * A scene whose second patch is compliant and whose first is rigid and out of reach gives the answers of the
     * one-patch compliant run when the ball touches only the compliant patch: the same events at the same times, the
     * same end state and the same losses, bit for bit (the scene adds only the far patch's impact checks, which never
     * fire). A far patch the ball could reach some day (ahead of it) would change the free flights' horizon and with
     * it the integrator's largest step: the answers then agree to the integration tolerance only.
     */
    @Test
    void aCompliantPatchInASceneGivesTheOnePatchAnswers() {
        Compliance c = HertzStiffness.compliance(Material.STEEL, Material.ACRYLIC, 0.8);
        Coulomb law = new Coulomb(0.3, 0.25, 0.8);
        Vector3D g = new Vector3D(0, 0, -9.81);
        Plane floor = new Plane(Vector3D.ZERO, Vector3D.PLUS_K);
        // behind the ball, which travels away from it: a free flight can never reach it, so that it does not
        // lengthen the flights' horizon either (the engine ends a free flight where it is clear of every patch)
        Plane farWall = new Plane(new Vector3D(-0.5, 0, 0), Vector3D.PLUS_I);
        // thrown with backspin: it bounces, slips against friction on every contact, and travels +x
        BallState start = BallState.flying(new Vector3D(0, 0, R + 0.02), new Vector3D(0.3, 0.1, -0.5),
            new Vector3D(20, -60, 5));
        RunResult one = Simulation.builder().ball(BALL).surface(floor).law(law).gravity(g).compliance(c).build()
            .run(start, 0.3);
        RunResult scene = Simulation.builder().ball(BALL).law(law).gravity(g)
            .patch(Patch.of("far", farWall)).patch(Patch.of("floor", floor).withCompliance(c)).build()
            .run(start, 0.3);
        System.out.printf("one patch: %d events, end %s; scene: %d events, end %s%n", one.events().size(),
            one.endState().centre(), scene.events().size(), scene.endState().centre());
        assertTrue(one.eventsOf(EventKind.IMPACT).size() >= 3, one.events().toString());
        assertEquals(one.events().size(), scene.events().size(), scene.events().toString());
        for (int i = 0; i < one.events().size(); i++) {
            RunEvent a = one.events().get(i);
            RunEvent b = scene.events().get(i);
            assertEquals(a.kind(), b.kind());
            assertEquals("floor", b.patch());
            assertEquals(a.time(), b.time(), "event " + i);
        }
        assertEquals(one.endState().centre(), scene.endState().centre());
        assertEquals(one.endState().velocity(), scene.endState().velocity());
        assertEquals(one.endState().spin(), scene.endState().spin());
        assertEquals(one.energy().contactDampingLoss(), scene.energy().contactDampingLoss());
        assertEquals(one.energy().slidingFrictionLoss(), scene.energy().slidingFrictionLoss());
        assertEquals(one.energy().fin(), scene.energy().fin());
        assertEquals(0, scene.energy().relativeResidual(), 1e-7);
    }

    /**
     * A compliant floor moving at a constant horizontal velocity {@code U} is the still floor seen from a frame moving
     * at {@code −U} (Galilean invariance; common practice): a ball dropped with horizontal velocity {@code U + w} on
     * the moving floor bounces as one dropped with {@code w} on the still floor, shifted by {@code U t}; the
     * friction and damping losses are the same, and the floor's drive work {@code ∫F·U dt} closes the budget.
     */
    @Test
    void aMovingCompliantFloorActsRelativeToItsMotion() {
        Compliance c = HertzStiffness.compliance(Material.STEEL, Material.ACRYLIC, 0.7);
        Coulomb law = new Coulomb(0.3, 0.25, 0.7);
        Vector3D g = new Vector3D(0, 0, -9.81);
        Plane floor = new Plane(Vector3D.ZERO, Vector3D.PLUS_K);
        Vector3D u = new Vector3D(0.4, -0.2, 0);
        Vector3D w = new Vector3D(0.1, 0.05, -0.6);
        Vector3D spin = new Vector3D(30, 10, -8);
        double t = 0.15;
        RunResult still = Simulation.builder().ball(BALL).law(law).gravity(g).settings(TIGHT)
            .patch(Patch.of("floor", floor).withCompliance(c)).build()
            .run(BallState.flying(new Vector3D(0, 0, R + 0.01), w, spin), t);
        RunResult moving = Simulation.builder().ball(BALL).law(law).gravity(g).settings(TIGHT)
            .patch(new Patch("floor", floor, SurfaceMotion.translation(u), null, c)).build()
            .run(BallState.flying(new Vector3D(0, 0, R + 0.01), w.add(u), spin), t);
        System.out.printf("moving floor: drive work %.6e J, friction %.6e J (still %.6e J), damping %.6e J (still %.6e J),"
                + " residual %.2e%n", moving.energy().driveWork(), moving.energy().slidingFrictionLoss(),
            still.energy().slidingFrictionLoss(), moving.energy().contactDampingLoss(), still.energy().contactDampingLoss(),
            moving.energy().relativeResidual());
        // the integration error's size: the still run against itself at ten times the tolerance
        RunResult loose = Simulation.builder().ball(BALL).law(law).gravity(g).settings(TIGHT.withTolerance(1e-11))
            .patch(Patch.of("floor", floor).withCompliance(c)).build()
            .run(BallState.flying(new Vector3D(0, 0, R + 0.01), w, spin), t);
        double dc = moving.endState().centre().subtract(u.scalarMultiply(t)).distance(still.endState().centre());
        double dv = moving.endState().velocity().subtract(u).distance(still.endState().velocity());
        System.out.printf("moving against still floor: centre %.3e m, velocity %.3e m/s; still at tolerance 1e-11"
                + " against 1e-12: centre %.3e m, velocity %.3e m/s%n", dc, dv,
            loose.endState().centre().distance(still.endState().centre()),
            loose.endState().velocity().distance(still.endState().velocity()));
        assertEquals(still.eventsOf(EventKind.IMPACT).size(), moving.eventsOf(EventKind.IMPACT).size());
        assertTrue(still.eventsOf(EventKind.IMPACT).size() >= 2, still.events().toString());
        // the two runs integrate the same motion in two frames (tolerance 1e-12, events to 1e-12 s): they differ by
        // integration error, which the regularised friction of the contacts makes larger in the velocity than the
        // tolerance suggests (measured: the still run moves by 2e-11 m and 3e-9 m/s between tolerances 1e-12 and
        // 1e-11; the two frames differ by 7e-12 m and 4e-9 m/s); asserted at a few times that
        assertEquals(0, dc, 1e-10);
        assertEquals(0, dv, 1e-8);
        assertEquals(0, moving.endState().spin().distance(still.endState().spin()), 1e-9 * spin.getNorm());
        // the losses differ by the same relative integration error as the velocity (about 5e-9 measured)
        double scale = still.energy().scale();
        assertEquals(still.energy().slidingFrictionLoss(), moving.energy().slidingFrictionLoss(), 1e-8 * scale);
        assertEquals(still.energy().contactDampingLoss(), moving.energy().contactDampingLoss(), 1e-8 * scale);
        assertTrue(Math.abs(moving.energy().driveWork()) > 1e-3 * scale, "the moving floor does work");
        assertEquals(0, moving.energy().relativeResidual(), 1e-8);
        assertEquals(0, still.energy().relativeResidual(), 1e-8);
    }

    /**
     * A ball dropped with spin onto a compliant turntable (a plane turning about its normal at Ω, off the axis) is
     * dragged by friction: the table does work on it, {@code ∫(F·u(p) + τ_c·Ω) dt}, and the budget (kinetic,
     * potential and elastic energy, friction and damping losses, drive work) closes to the integration tolerance's
     * order; the ball leaves with a velocity turned toward the table's (energy balance; design notes §9).
     */
    @Test
    void aTurningCompliantTableDoesWorkAndTheBudgetCloses() {
        Compliance c = HertzStiffness.compliance(Material.STEEL, Material.ACRYLIC, 0.7);
        Coulomb law = new Coulomb(0.4, 0.3, 0.7);
        Plane table = new Plane(Vector3D.ZERO, Vector3D.PLUS_K);
        Simulation sim = Simulation.builder().ball(BALL).law(law).gravity(new Vector3D(0, 0, -9.81)).settings(TIGHT)
            .patch(new Patch("table", table, SurfaceMotion.rotation(Vector3D.PLUS_K, Vector3D.ZERO, 20.0), null, c))
            .build();
        RunResult r = sim.run(BallState.flying(new Vector3D(0.05, 0, R + 0.005), new Vector3D(0, 0, -0.3),
            new Vector3D(10, -20, 30)), 0.1);
        System.out.printf("turning table: drive work %.6e J, friction %.6e J, damping %.6e J, residual %.2e%n",
            r.energy().driveWork(), r.energy().slidingFrictionLoss(), r.energy().contactDampingLoss(),
            r.energy().relativeResidual());
        assertTrue(r.eventsOf(EventKind.IMPACT).size() >= 1, r.events().toString());
        assertTrue(Math.abs(r.energy().driveWork()) > 1e-2 * r.energy().scale(), "the table does work");
        // table velocity at the contact point is along +y (Ω ẑ × 0.05 x̂): friction drags the ball that way
        assertTrue(r.endState().velocity().getY() > 0, r.endState().toString());
        assertEquals(0, r.energy().relativeResidual(), 1e-8);
    }

    /**
     * A rigid and a compliant contact at once: a solid ball rolling without slip (pure rolling, unbounded grip) on a
     * rigid floor at {@code v} meets a frictionless compliant wall square on. The wall's force is horizontal through
     * the centre, and the floor's rolling constraint makes the ball answer it with the mass {@code m(1 + k)}
     * ({@code m a = F + F_t}, {@code k m r² α = −r F_t}, {@code a = r α}; common practice), so the horizontal motion
     * is a Hertz impact of that mass: for {@code e = 1} it lasts Johnson's {@code t_c = (4/5) B(2/5, 1/2) δ_m/v},
     * {@code δ_m = (5 m(1 + k) v²/(4K))^{2/5}} (K. L. Johnson, Contact Mechanics, 1985, §11.4), and for any {@code e}
     * it rolls back at {@code e v} (the exact relation of {@link Compliance}, independent of the mass). The ball keeps
     * rolling on the floor throughout, both contacts are in the samples, and the budget closes.
     */
    @ParameterizedTest(name = "e = {0}")
    @CsvSource({"1.0", "0.6"})
    void aBallRollingOnARigidFloorBouncesOffACompliantWall(double e) {
        double v = 0.5;
        Compliance c = HertzStiffness.compliance(Material.STEEL, Material.ACRYLIC, e);
        double k = c.stiffness(R, 0, 0);
        double mEff = M * (1 + BALL.inertiaFactor());
        double dStar = Math.pow(5 * mEff * v * v / (4 * k), 0.4);
        double tc = 0.8 * Math.exp(Beta.logBeta(0.4, 0.5)) * dStar / v;
        double gap = 2e-3;
        Simulation sim = Simulation.builder().ball(BALL).law(new PureRolling()).gravity(new Vector3D(0, 0, -9.81))
            .settings(TIGHT.withSampleInterval(tc / 40))
            .patch(Patch.of("floor", new Plane(Vector3D.ZERO, Vector3D.PLUS_K)))
            .patch(new Patch("wall", new Plane(new Vector3D(R + gap, 0, 0), Vector3D.MINUS_I), null,
                new Coulomb(0, 0, e), c))
            .build();
        List<Sample> samples = new ArrayList<>();
        RunResult r = sim.run(sim.rollingStart(new Vector3D(0, 0, R), new Vector3D(v, 0, 0)), gap / v + 3 * tc,
            samples::add);
        List<RunEvent> ev = r.events();
        System.out.printf("rolling into a compliant wall, e = %.1f: events %s; rebound %.12f, contact %.9e s (theory,"
                + " e = 1: %.9e s), residual %.2e%n", e, ev, -r.endState().velocity().getX() / v,
            ev.size() > 1 ? ev.get(1).time() - ev.get(0).time() : Double.NaN, tc, r.energy().relativeResidual());
        assertEquals(2, ev.size(), ev.toString());
        assertEquals(EventKind.IMPACT, ev.get(0).kind());
        assertEquals("wall", ev.get(0).patch());
        assertEquals(EventKind.LIFT_OFF, ev.get(1).kind());
        assertEquals("wall", ev.get(1).patch());
        assertEquals(org.trundle.core.Phase.ROLLING, r.endState().phase());
        // the impact event fires at a gap of 1e-9 r, 1e-9 r/v before the touch
        double duration = ev.get(1).time() - ev.get(0).time() + 1e-9 * R / v;
        if (e == 1.0) {
            assertEquals(tc, duration, 1e-8 * tc);
        }
        assertEquals(-e * v, r.endState().velocity().getX(), 1e-8 * v);
        assertEquals(0, r.endState().velocity().getZ(), 1e-12 * v);
        assertEquals(0.5 * (M + BALL.momentOfInertia() / (R * R)) * v * v * (1 - e * e), r.energy().contactDampingLoss(),
            1e-8 * 0.5 * mEff * v * v);
        assertEquals(0, r.energy().relativeResidual(), 1e-8);
        int both = 0;
        for (Sample s : samples) {
            if (s.touches().size() == 2) {
                both++;
                assertEquals(List.of("floor", "wall"), s.contacts());
                SampleContact floor = s.touches().get(0);
                // the wall's force is horizontal: the floor carries the weight alone (statics; common practice)
                assertEquals(M * 9.81, floor.normalForce(), 1e-9 * M * 9.81);
            }
        }
        assertTrue(both > 20, "samples on both: " + both);
    }

    /**
     * The same scene run twice, and on two threads at once, gives bit-identical results (a ball with spin and
     * friction rattling in a compliant groove under gravity).
     */
    @Test
    void compliantGrooveRunsAreDeterministic() throws Exception {
        Compliance c = HertzStiffness.compliance(Material.STEEL, Material.ACRYLIC, 0.6);
        Simulation sim = groove(90, c, new Coulomb(0.3, 0.25, 0.6), new Vector3D(0, 0.3, -9.81),
            SolverSettings.defaults());
        BallState start = BallState.flying(new Vector3D(0.01, 0.002, R / Math.sin(Math.PI / 4) + 0.004),
            new Vector3D(0.05, 0.1, -0.2), new Vector3D(5, -3, 40));
        RunResult a = sim.run(start, 0.1);
        CompletableFuture<RunResult> b = CompletableFuture.supplyAsync(() -> sim.run(start, 0.1));
        CompletableFuture<RunResult> d = CompletableFuture.supplyAsync(() -> sim.run(start, 0.1));
        for (RunResult x : List.of(b.get(), d.get())) {
            assertEquals(a.endState().centre(), x.endState().centre());
            assertEquals(a.endState().velocity(), x.endState().velocity());
            assertEquals(a.endState().spin(), x.endState().spin());
            assertEquals(a.endState().time(), x.endState().time());
            assertEquals(a.events().size(), x.events().size());
            for (int i = 0; i < a.events().size(); i++) {
                assertEquals(a.events().get(i).time(), x.events().get(i).time());
            }
            assertEquals(a.energy().contactDampingLoss(), x.energy().contactDampingLoss());
        }
        System.out.printf("groove rattle: %d events, %d impacts, damping %.6e J, residual %.2e%n", a.events().size(),
            a.eventsOf(EventKind.IMPACT).size(), a.energy().contactDampingLoss(), a.energy().relativeResidual());
        assertTrue(a.eventsOf(EventKind.IMPACT).size() >= 2, a.events().toString());
        assertEquals(0, a.energy().relativeResidual(), 1e-7);
    }

    /**
     * Dropped 10 cm down the bisector of a 90° groove with restitution 0.8 (frictionless walls), the ball meets the
     * walls again after {@code 2 e v₁/g} on rigid walls (projectile motion; common practice); on compliant walls the
     * bounce lasts a contact time {@code ∝ K^{-2/5}} (Johnson 1985, §11.4), so the difference of the second impact's
     * time from the rigid one falls like {@code K^{-2/5}}. Prints the evaluations of each run (the cost against the
     * rigid model; no assertion on them).
     */
    @Test
    void compliantGrooveConvergesToTheRigidOne() {
        double e = 0.8;
        double h = 0.1;
        Vector3D g = new Vector3D(0, 0, -9.81);
        double z0 = R / Math.sin(Math.PI / 4);
        BallState drop = BallState.flying(new Vector3D(0, 0, z0 + h), Vector3D.ZERO, Vector3D.ZERO);
        double v1 = Math.sqrt(2 * 9.81 * h);
        double tRigid = Math.sqrt(2 * h / 9.81) + 2 * e * v1 / 9.81;
        double kAcrylic = HertzStiffness.of(Material.STEEL, Material.ACRYLIC).of(R, 0, 0);
        double last = Double.POSITIVE_INFINITY;
        for (double factor : new double[] {1e-4, 1e-2, 1}) {
            Simulation soft = groove(90, Compliance.of(kAcrylic * factor, e), new Coulomb(0, 0, e), g,
                SolverSettings.defaults());
            RunResult rs = soft.run(drop, 0.5);
            List<RunEvent> impacts = rs.eventsOf(EventKind.IMPACT);
            // both walls are met at once: impacts come in pairs
            double second = impacts.get(2).time();
            double diff = Math.abs(second - tRigid);
            System.out.printf("groove K = %.3e N/m^1.5: second impact %.9f s, rigid %.9f s, difference %.3e s;"
                + " evaluations %d%n", kAcrylic * factor, second, tRigid, diff, rs.evaluations());
            assertEquals(impacts.get(2).time(), impacts.get(3).time());
            if (last < Double.POSITIVE_INFINITY) {
                // a hundred times stiffer: the delay falls by 100^{2/5} = 6.31 (the contact time's scaling); gravity
                // during the contact and the integration move it by far less than the 3% allowed (measured 0.3%)
                assertEquals(Math.pow(100, 0.4), last / diff, 0.03 * Math.pow(100, 0.4));
            }
            last = diff;
            assertEquals(0, rs.energy().relativeResidual(), 1e-7);
        }
        RunResult rigid = groove(90, null, new Coulomb(0, 0, e), g, SolverSettings.defaults()).run(drop, 0.5);
        List<RunEvent> ri = rigid.eventsOf(EventKind.IMPACT);
        System.out.printf("rigid groove: %d events, first impacts %s; evaluations %d%n", rigid.events().size(),
            ri.stream().map(RunEvent::time).limit(3).toList(), rigid.evaluations());
        assertEquals(tRigid, ri.get(2).time(), 1e-9);
    }
}
