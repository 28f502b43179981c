package org.trundle.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Named;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.trundle.contact.BandedPivoting;
import org.trundle.contact.HertzContact;
import org.trundle.contact.PivotingResistance;
import org.trundle.contact.PureRolling;
import org.trundle.contact.RollingResistance;
import org.trundle.contact.SpinCreepPivoting;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.ContactLaw;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.Material;
import org.trundle.core.Phase;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Side;

/**
 * Why a ball stops travelling along a horizontal tube: the spin about the contact normal couples the
 * axial travel to the circling.
 *
 * <p><b>Derivation</b> (Newton–Euler with the no-slip constraint; our own, written out here). Tube
 * axis {@code e_x}, radius {@code R}, ball radius {@code r}, {@code ρ = R − r}, inertia
 * {@code I = k m r²}. Centre {@code c = x e_x + ρ e_r(φ)} with {@code e_r = (0, cos φ, sin φ)},
 * {@code e_φ = (0, −sin φ, cos φ)}; {@code (e_x, e_r, e_φ)} is right-handed. The normal toward the ball
 * is {@code n = −e_r}, the contact point {@code p = c + r e_r}. Write
 * {@code ω = ω_x e_x + ω_φ e_φ + ω_r e_r}. No slip, {@code v = r ω × n}, gives the axial speed
 * {@code X = ẋ = r ω_φ} and {@code ρ φ̇ = −r ω_x}; let {@code u = r ω·n = −r ω_r}. The contact force
 * {@code F} acts at {@code p}, so its moment about the centre is {@code r e_r × F = r F_φ e_x − r F_x e_φ};
 * the law adds the couple {@code τ = M_p n + τ_t} ({@code M_p} about the normal, {@code τ_t} tangential).
 * With {@code ė_r = φ̇ e_φ}, {@code ė_φ = −φ̇ e_r} and gravity perpendicular to the axis:
 * <pre>
 *   axial force:       m Ẋ = F_x
 *   e_φ moment:        I (ω̇_φ + ω_r φ̇) = −r F_x + τ_φ
 *   e_r moment:        I (ω̇_r − ω_φ φ̇) = −M_p
 * </pre>
 * Eliminating {@code F_x}: {@code (1+k) m r Ẋ = −I ω_r φ̇ + τ_φ}, so with {@code λ² = k/(1+k)}
 * <pre>
 *   dX/dt = λ² u φ̇ + τ_φ / ((1+k) m r),     du/dt = −X φ̇ + M_p / (k m r)
 * </pre>
 * for any gravity perpendicular to the axis (gravity has no moment about the centre and no axial
 * component). (With {@code φ} and {@code u} counted the other way round this is the form of the issue.)
 * Hence {@code d/dt (X² + λ² u²) = 2 λ² u M_p/(k m r) + 2 X τ_φ/((1+k) m r)}:
 * <ul>
 *   <li>pure rolling ({@code τ = 0}): {@code X² + λ² u²} is conserved;</li>
 *   <li>a couple about the normal only: {@code ½(1+k) m Δ(X² + λ² u²) = ∫ M_p (ω·n) dt}, the pivoting
 *       work (minus the pivoting loss of the energy budget);</li>
 *   <li>viscous pivoting {@code M_p = −c_v ω·n = −c_v u/r}, no gravity: {@code φ̇ = Ω} is constant
 *       (the {@code e_φ} force and {@code e_x} moment equations give {@code F_φ (1/m + r²/I) = 0}) and
 *       {@code Ẍ + γ Ẋ + λ² Ω² X = 0} with {@code γ = c_v/I}: the axial amplitude decays as
 *       {@code exp(−γ t/2)} while the circling is untouched;</li>
 *   <li>rolling resistance {@code τ_t = −δ F_n ŵ_t}, no gravity: {@code F_n = m ρ φ̇²},
 *       {@code ŵ_t = (ω_x e_x + ω_φ e_φ)/(V_c/r)} with {@code V_c} the centre speed; with
 *       {@code D = δ F_n/((1+k) m r V_c)} the circling speed obeys {@code d(ρφ̇)/dt = −D ρφ̇} and
 *       {@code d(X² + λ²u²)/dt = −2 D X²}, so over the axial oscillation ({@code X² = A² cos²θ}, mean ½)
 *       the amplitude {@code A} decays at {@code D/2}: rolling resistance damps the circling twice as
 *       fast (in logarithm) as the axial travel.</li>
 * </ul>
 */
class TubeSpinTest {
    static final long SEED = 0x7b5e_0013L;
    static final int CASES = 15;
    static final double R = 0.015;
    static final double RADIUS = 0.004;
    static final double MASS = 0.0021;

    /** {@code X² + λ² u²} and the circling speed {@code ρ|φ̇|} of a state in the tube along x. */
    static double[] reduced(BallState s, double k) {
        Vector3D c = s.centre();
        Vector3D er = new Vector3D(0, c.getY(), c.getZ()).normalize();
        Vector3D n = er.negate();
        double x = s.velocity().getX();
        double u = RADIUS * Vector3D.dotProduct(s.spin(), n);
        double lambda2 = k / (1 + k);
        Vector3D ephi = Vector3D.crossProduct(Vector3D.PLUS_I, er);
        double circling = Vector3D.dotProduct(s.velocity(), ephi);
        return new double[] {x * x + lambda2 * u * u, x, u, circling};
    }

    /** The unbounded tube along x with the solver's default settings (tolerance 1e-10). */
    static Simulation tube(double k, Vector3D gravity, ContactLaw law) {
        return Simulation.builder().ball(Ball.of(RADIUS, MASS, k))
            .surface(new Cylinder(Vector3D.ZERO, Vector3D.PLUS_I, R, Side.INSIDE))
            .law(law).gravity(gravity).build();
    }

    /** A seeded random start on the wall: angle, axial and circling speed, spin about the normal. */
    static BallState randomStart(Simulation sim, SplittableRandom rnd, boolean gravity) {
        double rho = R - RADIUS;
        double k = sim.ball().inertiaFactor();
        double phi = -Math.PI / 2 + 0.6 * (rnd.nextDouble() - 0.5);   // near the bottom
        Vector3D er = new Vector3D(0, Math.cos(phi), Math.sin(phi));
        Vector3D ephi = new Vector3D(0, -Math.sin(phi), Math.cos(phi));
        // with gravity, keep the swing below the axis so the ball never leaves the wall:
        // ½(1+k) v² < g ρ (1 − 0.3) with 0.3 the largest start offset's cosine margin
        double vMax = gravity ? Math.sqrt(2 * 9.81 * rho * 0.6 / (1 + k)) : 0.8;
        double circling = (gravity ? 1 : 0.3) * vMax * (rnd.nextDouble() - (gravity ? 0.5 : -0.5));
        double axial = 0.3 * (rnd.nextDouble() - 0.5);
        double normalSpin = 40 * (rnd.nextDouble() - 0.5);
        return sim.rollingStart(er.scalarMultiply(rho), new Vector3D(axial, 0, 0).add(circling, ephi), normalSpin);
    }

    static Stream<Arguments> laws() {
        return IntStream.range(0, CASES).mapToObj(i -> {
            SplittableRandom rnd = new SplittableRandom(SEED + 6151L * i);
            double k = 0.25 + 0.4 * rnd.nextDouble();
            boolean gravity = i % 2 == 0;
            ContactLaw law;
            switch (i % 5) {
                case 0:
                    law = new PureRolling();
                    break;
                case 1:
                    law = new PureRolling().and(BandedPivoting.viscous(2e-8 * (0.5 + rnd.nextDouble())));
                    break;
                case 2:
                    law = new PureRolling().and(BandedPivoting.banded(5e-8, 2e-5 * rnd.nextDouble() + 1e-6));
                    break;
                case 3:
                    law = new PureRolling().and(new PivotingResistance(2e-5 * rnd.nextDouble() + 1e-6));
                    break;
                default:
                    law = new PureRolling().and(new SpinCreepPivoting(Material.STEEL, Material.ACRYLIC,
                        2e-6 * rnd.nextDouble() + 1e-7));
                    break;
            }
            Simulation sim = tube(k, gravity ? new Vector3D(0, 0, -9.81) : Vector3D.ZERO, law);
            BallState start = randomStart(sim, rnd, gravity);
            String label = "seed=" + SEED + " case=" + i + " k=" + k + (gravity ? " g" : " no g") + " " + law.name();
            return Arguments.of(Named.of(label, sim), start);
        });
    }

    /**
     * {@code ½(1+k) m (X² + λ²u²)} changes by exactly the pivoting work (conserved under pure rolling),
     * 1e-9 of its start value at every sample; the energy budget closes to 1e-8 of its scale.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("laws")
    void reducedInvariantChangesByThePivotingWork(Simulation sim, BallState start) {
        double k = sim.ball().inertiaFactor();
        double w0 = reduced(start, k)[0];
        double scale = 0.5 * (1 + k) * MASS;
        List<double[]> deviations = new ArrayList<>();
        RunResult res = sim.run(start, 1.0, s -> deviations.add(new double[] {s.time(), reduced(s.state(), k)[0]}));
        assertEquals(EndReason.DURATION, res.endReason(), res.message());
        assertTrue(res.phases().stream().allMatch(p -> p.phase() == Phase.ROLLING), res.phases().toString());
        double lossPivot = res.energy().pivotingResistanceLoss();
        double wEnd = reduced(res.endState(), k)[0];
        System.out.println(sim.law().name() + ": invariant change + pivot loss = "
            + (scale * (wEnd - w0) + lossPivot) / (scale * w0) + " of start, pivot loss " + lossPivot / (scale * w0)
            + ", budget " + res.energy().relativeResidual());
        assertEquals(-lossPivot, scale * (wEnd - w0), 1e-9 * scale * w0, "pivoting work vs change of the invariant");
        if (lossPivot == 0) {
            double worst = 0;
            for (double[] d : deviations) {
                worst = Math.max(worst, Math.abs(d[1] - w0));
            }
            System.out.println("  pure rolling: largest drift of X^2 + lambda^2 u^2 " + worst / w0);
            assertTrue(worst <= 1e-9 * w0, "X^2 + lambda^2 u^2 drifted by " + worst / w0 + " relative");
        }
        assertTrue(res.energy().relativeResidual() < 1e-8, "budget " + res.energy());
    }

    /**
     * Viscous pivoting, no gravity: the axial speed is a damped oscillator {@code Ẍ + γẊ + λ²Ω²X = 0},
     * {@code γ = c_v/I}; the extremes of {@code X} decay at {@code γ/2}, measured by a least-squares fit
     * of {@code ln|X|} at its extremes; 1 %.
     */
    @Test
    void viscousPivotingDampsTheAxialTravelExponentially() {
        double k = Ball.SOLID;
        double inertia = k * MASS * RADIUS * RADIUS;
        double gamma = 2.0;
        Simulation sim = tube(k, Vector3D.ZERO, new PureRolling().and(BandedPivoting.viscous(gamma * inertia)));
        double rate = measuredAxialDecay(sim, 0.5, 0.05, 3.0);
        System.out.println("viscous pivoting: axial decay " + rate + " 1/s, derived " + gamma / 2);
        assertEquals(gamma / 2, rate, 0.01 * gamma / 2, "axial amplitude decay rate (1/s)");
    }

    /**
     * Spin creep, no gravity, steel on steel: the same decay with {@code γ = c_v/I},
     * {@code c_v = G c⁴ C₃₃ / V}, {@code c} the mean radius of the exact Hertz patch under
     * {@code F_n = m ρ Ω²} and {@code V = ρΩ·R/ρ} the contact point's speed over the wall (axial part
     * ≤ 3 % of it, so {@code V} varies by less than 5e-4); 1 %.
     */
    @Test
    void spinCreepDampsTheAxialTravelAtItsDerivedRate() {
        double k = Ball.SOLID;
        double inertia = k * MASS * RADIUS * RADIUS;
        double rho = R - RADIUS;
        double circling = 0.6;
        double fn = MASS * circling * circling / rho;
        double c = HertzContact.meanRadius(fn, RADIUS, 1 / R, 0, Material.STEEL.contactModulus(Material.STEEL));
        double v = circling * R / rho;
        double cv = Material.STEEL.combinedShearModulus(Material.STEEL) * Math.pow(c, 4)
            * SpinCreepPivoting.C33_CIRCULAR / v;
        double gamma = cv / inertia;
        Simulation sim = tube(k, Vector3D.ZERO, new PureRolling().and(
            new SpinCreepPivoting(Material.STEEL, Material.STEEL, Double.POSITIVE_INFINITY)));
        double rate = measuredAxialDecay(sim, circling, 0.02, 8.0);
        System.out.println("spin creep: axial decay " + rate + " 1/s, derived " + gamma / 2 + " (c_v " + cv + " N m s)");
        assertEquals(gamma / 2, rate, 0.01 * gamma / 2, "axial amplitude decay rate (1/s), gamma = " + gamma);
    }

    /**
     * Rolling resistance alone, no gravity: the circling speed {@code ρφ̇} decays (in logarithm) twice as
     * fast as the axial amplitude {@code A = √(X² + λ²u²)}; measured between the first and the last
     * zero of {@code u} (where {@code θ} is a multiple of π, so the averaging of {@code cos²θ} is exact
     * up to the slow change of {@code D}); 1 %.
     */
    @Test
    void rollingResistanceDampsTheCirclingTwiceAsFast() {
        double k = Ball.SOLID;
        Simulation sim = tube(k, Vector3D.ZERO, new PureRolling().and(new RollingResistance(1e-4)))
            .withSettings(SolverSettings.defaults().withSampleInterval(1e-4));
        double rho = R - RADIUS;
        BallState start = sim.rollingStart(new Vector3D(0, 0, -rho), new Vector3D(0.03, 0.6, 0));
        List<double[]> rows = new ArrayList<>();
        RunResult res = sim.run(start, 3.0, s -> {
            double[] q = reduced(s.state(), k);
            rows.add(new double[] {s.time(), q[0], q[2], q[3]});
        });
        assertEquals(EndReason.DURATION, res.endReason(), res.message());
        // zeros of u, interpolated linearly
        List<double[]> zeros = new ArrayList<>();
        for (int i = 1; i < rows.size(); i++) {
            double[] a = rows.get(i - 1);
            double[] b = rows.get(i);
            if (a[2] != 0 && Math.signum(a[2]) != Math.signum(b[2])) {
                double f = a[2] / (a[2] - b[2]);
                zeros.add(new double[] {a[0] + f * (b[0] - a[0]), a[1] + f * (b[1] - a[1]), a[3] + f * (b[3] - a[3])});
            }
        }
        assertTrue(zeros.size() >= 10, "zeros of u: " + zeros.size());
        double[] first = zeros.get(0);
        double[] last = zeros.get(zeros.size() - 1);
        double circlingDecay = -Math.log(Math.abs(last[2] / first[2]));
        double axialDecay = -0.5 * Math.log(last[1] / first[1]);
        assertTrue(circlingDecay > 0.3, "circling decayed by " + circlingDecay + " in logarithm");
        System.out.println("rolling resistance: circling/axial log decay " + circlingDecay / axialDecay + " (circling "
            + circlingDecay + ", axial " + axialDecay + ", " + zeros.size() + " zeros of u), derived 2");
        assertEquals(2.0, circlingDecay / axialDecay, 0.02, "ratio of logarithmic decays (circling / axial)");
        assertTrue(res.energy().relativeResidual() < 1e-8, "budget " + res.energy());
    }

    /**
     * Coulomb pivoting {@code M_p = −δ_p F_n sgn(ω·n)}, no gravity: with {@code φ̇ = Ω},
     * {@code F_n = m ρ Ω²} and {@code μ = δ_p F_n/(k m r)} the reduced equations give
     * {@code Ẍ + λ²Ω² X = −λ²Ω μ sgn(Ẋ)}, a Coulomb-damped oscillator (any vibrations text): the extremes
     * of {@code |X|} fall by the constant step {@code ΔX = 2μ/Ω = 2 δ_p ρ Ω/(k r)} per half cycle, until
     * {@code |X| < μ/Ω}, where the needed couple is within {@code δ_p F_n} and the ball locks into a
     * helix ({@link #coulombPivotingLocksIntoASteadyHelix}; this test stops before). Near each extreme
     * {@code ω·n} passes zero: the solver's pivoting stick fires where it enters the law's smoothing band
     * ({@code ω_s r = 1e-3 V}), removes the spin left ({@code ω_s}, changing {@code X² + λ²u²} by
     * {@code λ²(ω_s r)²}) and, the needed couple being past the limit, lets it go on through zero; with
     * the regularised couple's shortfall over the band this moves each step by a few times
     * {@code λ² (ω_s r/|X|)²}, below 2e-4 for the extremes used ({@code |X| ≥ 0.02 m/s}), 5e-4
     * measured; each step within 1e-3.
     */
    @Test
    void coulombPivotingLowersTheAxialExtremesByAConstantStep() {
        double k = Ball.SOLID;
        double rho = R - RADIUS;
        double circling = 0.5;
        double omega = circling / rho;
        double dp = 5e-6;
        double step = 2 * dp * rho * omega / (k * RADIUS);
        Simulation sim = tube(k, Vector3D.ZERO, new PureRolling().and(new PivotingResistance(dp)))
            .withSettings(SolverSettings.defaults().withSampleInterval(2e-4));
        BallState start = sim.rollingStart(new Vector3D(0, 0, -rho), new Vector3D(0.06, circling, 0));
        List<double[]> xs = new ArrayList<>();
        RunResult res = sim.run(start, 1.5, s -> xs.add(new double[] {s.time(), s.state().velocity().getX()}));
        assertEquals(EndReason.DURATION, res.endReason(), res.message());
        assertTrue(res.energy().relativeResidual() < 1e-8, "budget " + res.energy());
        List<double[]> ext = new ArrayList<>();
        ext.add(new double[] {0, 0.06});          // the start is an extreme (u = 0 there)
        for (double[] e : extremes(xs, false)) {
            if (e[1] >= 0.02) {
                ext.add(e);
            }
        }
        assertTrue(ext.size() >= 10, "extremes above 0.02 m/s: " + ext.size());
        double worst = 0;
        for (int i = 1; i < ext.size(); i++) {
            double drop = ext.get(i - 1)[1] - ext.get(i)[1];
            worst = Math.max(worst, Math.abs(drop / step - 1));
            assertEquals(step, drop, 1e-3 * step, "drop between extremes " + (i - 1) + " and " + i);
        }
        System.out.println("coulomb pivoting: step " + step + " m/s, largest relative deviation " + worst + " over "
            + (ext.size() - 1) + " half cycles");
    }

    /**
     * Coulomb pivoting, no gravity, the exact pivoting stick: once {@code |X| < μ/Ω} at a zero of
     * {@code u} (an extreme of {@code X}) the couple needed to keep {@code u = 0},
     * {@code k m r |X| Ω} (from {@code du/dt = −XΩ + M_p/(k m r)}), is within {@code δ_p F_n} and the
     * ball locks into a steady helix: {@code X} stays constant, to 1e-9 relative over more than ten
     * turns (the hold keeps {@code ω·n} constant exactly in the equations, so only the integration
     * error is left, tolerance 1e-10). The run logs the stick and no release; the budget closes.
     * With {@code ω_s} smoothing alone the helix would drain at {@code δ_p F_n/(I ω_s)} relative
     * per second (the artefact this removes).
     */
    @Test
    void coulombPivotingLocksIntoASteadyHelix() {
        double k = Ball.SOLID;
        double rho = R - RADIUS;
        double circling = 0.5;
        double omega = circling / rho;
        double dp = 5e-6;
        double mu = dp * MASS * rho * omega * omega / (k * MASS * RADIUS);
        double lockSpeed = mu / omega;
        Simulation sim = tube(k, Vector3D.ZERO, new PureRolling().and(new PivotingResistance(dp)))
            .withSettings(SolverSettings.defaults().withSampleInterval(1e-3));
        BallState start = sim.rollingStart(new Vector3D(0, 0, -rho), new Vector3D(0.01, circling, 0));
        List<double[]> xs = new ArrayList<>();
        RunResult res = sim.run(start, 2.5, s -> xs.add(new double[] {s.time(), s.state().velocity().getX()}));
        assertEquals(EndReason.DURATION, res.endReason(), res.message());
        assertTrue(res.energy().relativeResidual() < 1e-8, "budget " + res.energy());
        List<RunEvent> sticks = res.eventsOf(EventKind.PIVOT_STICK);
        assertEquals(1, sticks.size(), res.events().toString());
        assertTrue(res.eventsOf(EventKind.PIVOT_RELEASE).isEmpty(), res.events().toString());
        double tLock = sticks.get(0).before().time();
        double xLock = sticks.get(0).after().velocity().getX();
        assertTrue(Math.abs(xLock) < lockSpeed, "locked at |X| = " + Math.abs(xLock) + " above mu/Omega = " + lockSpeed);
        double worst = 0;
        double turns = 0;
        for (double[] x : xs) {
            if (x[0] > tLock) {
                worst = Math.max(worst, Math.abs(x[1] / xLock - 1));
                turns = (x[0] - tLock) * omega / (2 * Math.PI);
            }
        }
        System.out.println("coulomb pivoting lock at t = " + tLock + " s, X = " + xLock + " m/s (mu/Omega = "
            + lockSpeed + "), largest relative change of X over " + turns + " turns " + worst);
        assertTrue(turns > 10, "turns after the lock: " + turns);
        assertTrue(worst <= 1e-9, "X changed by " + worst + " relative after the lock");
    }

    /**
     * Runs a no-gravity start at the bottom circling at {@code circling} (m/s) with axial speed
     * {@code axial} and no spin about the normal; returns minus the slope of {@code ln|X|} at the
     * extremes of {@code X} (each located by a parabola through three samples) against time.
     */
    private static double measuredAxialDecay(Simulation sim, double circling, double axial, double duration) {
        double rho = R - RADIUS;
        Simulation sampled = sim.withSettings(sim.settings().withSampleInterval(2e-4));
        BallState start = sampled.rollingStart(new Vector3D(0, 0, -rho), new Vector3D(axial, circling, 0));
        List<double[]> xs = new ArrayList<>();
        RunResult res = sampled.run(start, duration, s -> xs.add(new double[] {s.time(), s.state().velocity().getX()}));
        assertEquals(EndReason.DURATION, res.endReason(), res.message());
        assertTrue(res.energy().relativeResidual() < 1e-8, "budget " + res.energy());
        List<double[]> extremes = extremes(xs, true);
        assertTrue(extremes.size() >= 6, "extremes of X: " + extremes.size());
        double n = extremes.size();
        double st = 0;
        double sy = 0;
        double stt = 0;
        double sty = 0;
        for (double[] e : extremes) {
            st += e[0];
            sy += e[1];
            stt += e[0] * e[0];
            sty += e[0] * e[1];
        }
        return -(n * sty - st * sy) / (n * stt - st * st);
    }

    /**
     * The local maxima of {@code |X|} in samples {@code (t, X)}, each located by a parabola through three
     * samples: {@code (t, ln|X|)} when {@code log}, else {@code (t, |X|)}.
     */
    private static List<double[]> extremes(List<double[]> xs, boolean log) {
        List<double[]> extremes = new ArrayList<>();
        for (int i = 1; i + 1 < xs.size(); i++) {
            double y0 = Math.abs(xs.get(i - 1)[1]);
            double y1 = Math.abs(xs.get(i)[1]);
            double y2 = Math.abs(xs.get(i + 1)[1]);
            if (y1 > y0 && y1 >= y2) {
                double h = xs.get(i + 1)[0] - xs.get(i)[0];
                double den = y0 - 2 * y1 + y2;
                double off = 0.5 * (y0 - y2) / den;
                double peak = y1 - 0.25 * (y0 - y2) * off;
                extremes.add(new double[] {xs.get(i)[0] + off * h, log ? Math.log(peak) : peak});
            }
        }
        return extremes;
    }
}
