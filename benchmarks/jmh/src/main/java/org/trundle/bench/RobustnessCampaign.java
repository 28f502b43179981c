package org.trundle.bench;

import java.util.Locale;
import java.util.SplittableRandom;
import java.util.stream.IntStream;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.contact.Coulomb;
import org.trundle.contact.PivotingResistance;
import org.trundle.contact.PureRolling;
import org.trundle.contact.RollingResistance;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.ContactGeometry;
import org.trundle.core.ContactLaw;
import org.trundle.core.Phase;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceDomainException;
import org.trundle.core.check.Draws;
import org.trundle.core.check.Probe;
import org.trundle.core.check.Robustness;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Plane;
import org.trundle.surfaces.Side;
import org.trundle.surfaces.SplineTube;

/**
 * The robustness campaign: hostile inputs drawn from a seed, each run through
 * {@link Robustness#probe} and counted as valid, rejected (with a message), typed stop or failure
 * (which must be zero). Hostile menus: radii from 1 µm to 1 m and invalid ones, extreme ratios of
 * surface to ball radius (a tube barely wider than the ball, 10⁶ times wider, a rod 10⁻⁶ of the
 * ball), grazing flight starts (a gap of 10⁻¹² r, tangential or barely approaching), speeds from 0
 * and 10⁻¹² to 10⁶ m/s, spins up to 10⁹ rad/s, {@code μ} at 0, 10⁻⁹ and 10⁶, restitution 0 and 1,
 * rolling- and pivoting-resistance lengths up to ten radii, zero, tiny and huge gravity, starts
 * exactly on a patch edge or just outside it, on a tube's axis, tubes along a spline centreline
 * (a bend, and one that doubles back on itself), and in every number NaN, ±∞, subnormals
 * (4.9e-324, 1e-310) and 10^±300 (a mass of 1e308 kg, a speed of 1e154 m/s, a rolling-resistance
 * length of 1e300 radii among them). One case in five has a piece of user code that turns hostile
 * part-way ({@link HostileUserCode}: surfaces, laws, loads and observers that return NaN, ±∞,
 * non-unit normals or negative force bounds, or throw, and an interrupt of the thread). Every run
 * has a budget (10⁵ right-hand-side evaluations, 2,000 events); one case in 25 asks for a huge
 * duration (10⁶ s, 10¹² s, 3e99 s, the largest double), which a flight that leaves for good ends at once.
 * Approaches to a cone apex join the
 * menus when the project has a cone (one more surface kind in {@link #probe}).
 *
 * <p>Run 10⁵ cases: {@code java -cp benchmarks/jmh/target/trundle-benchmarks.jar org.trundle.bench.RobustnessCampaign 100000}
 * (optional second argument: the seed; third: print every non-valid case).
 */
public final class RobustnessCampaign {
    /** Default seed of the campaign. */
    public static final long SEED = 0x0b57_ac1eL;

    private static final double NAN = Double.NaN;
    private static final double INF = Double.POSITIVE_INFINITY;
    /** The smallest subnormal, 4.9e-324. */
    private static final double TINY = Double.MIN_VALUE;
    /** A subnormal well inside the subnormal range. */
    private static final double SUB = 1e-310;

    private RobustnessCampaign() {
    }

    /**
     * Runs cases 0 … count−1 of a seed (in parallel; the counts do not depend on the thread count).
     *
     * @param seed the seed
     * @param count number of cases
     * @return the tally
     */
    public static Robustness.Tally run(long seed, int count) {
        return IntStream.range(0, count).parallel().mapToObj(i -> probe(seed, i))
            .collect(Robustness.Tally::new, Robustness.Tally::add, Robustness.Tally::add);
    }

    private static double pick(SplittableRandom rnd, double... menu) {
        return menu[rnd.nextInt(menu.length)];
    }

    /** Mostly a sensible value, sometimes hostile. */
    private static double hostile(SplittableRandom rnd, double sensible, double... menu) {
        return rnd.nextInt(10) == 0 ? pick(rnd, menu) : sensible;
    }

    /**
     * One hostile case.
     *
     * @param seed the seed
     * @param index the index
     * @return its classified outcome
     */
    public static Probe probe(long seed, int index) {
        SplittableRandom rnd = Draws.forCase(seed, index);
        // each input is drawn from a menu with sensible and hostile entries, or is hostile one time in ten
        double r = hostile(rnd, 0.001 + 0.02 * rnd.nextDouble(), 1e-6, 1e-4, 1.0, 0.0, -0.001, NAN, INF, -INF, TINY,
            SUB, 1e-300, 1e300);
        double mass = hostile(rnd, 0.002, 1e-9, 10.0, 0.0, NAN, INF, TINY, SUB, 1e-300, 1e300, 1e308);
        double k = hostile(rnd, 0.4, 2.0 / 3.0, 1e-6, 0.7, NAN, TINY, -INF);
        double gMag = hostile(rnd, 9.81, 0.0, 1e-9, 1e6, NAN, INF, -INF, TINY, 1e300, 1e-300);
        Vector3D gDir = Draws.unitVector(rnd);
        int surfaceKind = rnd.nextInt(4);
        Vector3D axis = rnd.nextInt(20) == 0 ? new Vector3D(pick(rnd, 0.0, NAN, TINY, 1e-300, 1e300, INF), 0, 0)
            : Draws.unitVector(rnd);
        Vector3D origin = rnd.nextInt(20) == 0 ? new Vector3D(pick(rnd, INF, -INF, NAN, 1e300, SUB), 0, 0)
            : Draws.inBall(rnd, Vector3D.ZERO, 0.1);
        double ratio = surfaceKind == 1 || surfaceKind == 3 ? pick(rnd, 1 + 1e-9, 1.001, 1.5, 4.0, 1e3, 1e6, 0.9, 1.0)
            : pick(rnd, 1e-6, 0.01, 1.0, 5.0, 1e6, 0.0, -1.0);
        double halfLength = hostile(rnd, 0.05, 1e-9, 0.0, INF, NAN, TINY, 1e300);
        int lawKind = rnd.nextInt(6);
        double mu = hostile(rnd, 0.05 + rnd.nextDouble(), 0.0, 1e-9, 1e6, -1.0, NAN, INF, TINY, 1e300);
        double muK = rnd.nextInt(20) == 0 ? mu * 2 : mu * rnd.nextDouble();
        double e = hostile(rnd, pick(rnd, 0.0, 1.0, rnd.nextDouble()), 1.5, NAN, TINY, -0.0);
        double delta = Math.abs(r) * pick(rnd, 0.0, 1e-9, 0.001, 1.0, 10.0, 1e300, TINY) * (rnd.nextInt(15) == 0 ? -1 : 1);
        double speed = hostile(rnd, pick(rnd, 0.0, 1e-12, 1e-6, 0.01, 0.5, 2.0, 1e3, 1e6), NAN, INF, TINY, 1e154, 1e300);
        double spinFactor = pick(rnd, 0.0, 1.0, -3.0, 1e3, 1e9);
        int startKind = rnd.nextInt(3);
        int place = rnd.nextInt(8);
        double gap = pick(rnd, 0.0, 1e-12, 0.1, 1.0);
        double approach = pick(rnd, 0.0, -1e-9, -0.3, 0.3);
        double drawnDuration = hostile(rnd, 0.05 + 0.15 * rnd.nextDouble(), 1e-9, 0.0, -1.0, NAN, INF, TINY, SUB, 1e-300);
        double tangentAngle = 2 * Math.PI * rnd.nextDouble();
        Vector3D kick = Draws.unitVector(rnd);
        // one case in five has a piece of user code that turns hostile part-way
        HostileUserCode.Fault[] faults = HostileUserCode.Fault.values();
        HostileUserCode.Fault fault = rnd.nextInt(5) == 0 ? faults[1 + rnd.nextInt(faults.length - 1)]
            : HostileUserCode.Fault.NONE;
        double faultAt = 0.1 * rnd.nextDouble();
        int faultCalls = rnd.nextInt(3000);
        boolean doubledBack = rnd.nextBoolean();
        // drawn after every other input, so that the cases before this pool keep their draws: one case
        // in 25 asks for a huge duration (a flight that leaves for good ends at once, anything else
        // meets the budget)
        double duration = rnd.nextInt(25) == 0 ? pick(rnd, 1e6, 1e12, 3e99, Double.MAX_VALUE) : drawnDuration;

        String[] surfaceNames = {"plane", "tube", "rod", doubledBack ? "spline doubling back" : "spline bend"};
        String[] lawNames = {"pure rolling", "coulomb", "rolling resistance", "pivoting resistance",
            "coulomb + rolling + pivoting", "coulomb + rolling"};
        String[] startNames = {"rolling", "sliding", "flight"};
        String[] placeNames = {"mid", "mid", "mid", "on edge 'from'", "on edge 'to'", "just outside edge", "on axis",
            "mid, rotated start"};
        String desc = String.format(Locale.ROOT,
            "seed=%d index=%d r=%s m=%s k=%s |g|=%s %s ratio=%s halfLength=%s law=%s mu=%s mu_k=%s e=%s delta=%s"
                + " speed=%s spin=%sx start=%s place=%s gap=%sr approach=%s T=%s fault=%s at t=%s s or call %d",
            seed, index, r, mass, k, gMag, surfaceNames[surfaceKind], ratio, halfLength, lawNames[lawKind], mu, muK, e,
            delta, speed, spinFactor, startNames[startKind], placeNames[place], gap, approach, duration, fault.label(),
            faultAt, faultCalls);

        return Robustness.probe(desc, () -> {
            Ball ball = Ball.of(r, mass, k);
            Surface surface;
            Vector3D c;
            Vector3D n;
            if (surfaceKind == 0) {
                surface = new Plane(origin, axis);
                n = unit(axis);
                c = origin.add(r, n).add(0.01, n.orthogonal());
            } else if (surfaceKind == 3) {
                // a tube along a spline centreline: a gentle bend, or one that doubles back on itself
                double len = 20 * r;
                Vector3D[] pts = doubledBack
                    ? new Vector3D[] {origin, origin.add(len, Vector3D.PLUS_I), origin, origin.add(len, Vector3D.PLUS_I)}
                    : new Vector3D[] {origin, origin.add(new Vector3D(len, 0.2 * len, 0)),
                        origin.add(new Vector3D(2 * len, 0, 0.2 * len)), origin.add(3 * len, Vector3D.PLUS_I)};
                surface = new SplineTube(pts, ratio * r, Side.INSIDE);
                // onto the wall from a point off the centreline: c = q − (d − r) n
                Vector3D q = pts[1].add(0.3 * (ratio - 1) * r, Vector3D.PLUS_K);
                ContactGeometry g = new ContactGeometry();
                g.scratch = surface.newScratch();
                try {
                    surface.query(0, q.toArray(), g);
                } catch (SurfaceDomainException x) {
                    throw new IllegalArgumentException("no start on this spline tube: " + x.getMessage(), x);
                }
                n = new Vector3D(g.normal[0], g.normal[1], g.normal[2]);
                c = q.subtract(g.distance - r, n);
            } else {
                double bigR = ratio * r;
                Side side = surfaceKind == 1 ? Side.INSIDE : Side.OUTSIDE;
                surface = new Cylinder(origin, axis, bigR, side, -halfLength, halfLength);
                Vector3D a = unit(axis);
                Vector3D er = a.orthogonal();
                double s = place == 3 ? -halfLength : place == 4 ? halfLength
                    : place == 5 ? halfLength * (1 + 1e-12) + 1e-15 : 0.3 * halfLength;
                if (!Double.isFinite(s)) {
                    s = 0;
                }
                double rho = place == 6 ? 0.0 : side == Side.INSIDE ? bigR - r : bigR + r;
                c = origin.add(s, a).add(rho, er);
                n = side == Side.INSIDE ? er.negate() : er;
            }
            ContactLaw law;
            switch (lawKind) {
                case 0:
                    law = new PureRolling(e);
                    break;
                case 1:
                    law = new Coulomb(mu, muK, e);
                    break;
                case 2:
                    law = new RollingResistance(delta);
                    break;
                case 3:
                    law = new PivotingResistance(delta);
                    break;
                case 4:
                    law = new Coulomb(mu, muK, e).and(new RollingResistance(delta)).and(new PivotingResistance(delta));
                    break;
                default:
                    law = new Coulomb(mu, muK, e).and(new RollingResistance(delta));
                    break;
            }
            law = HostileUserCode.law(law, fault, faultCalls);
            surface = HostileUserCode.surface(surface, fault, faultAt);
            SolverSettings settings = SolverSettings.defaults().withMaxEvaluations(100_000).withMaxEvents(2_000);
            Simulation sim = Simulation.builder().ball(ball).surface(surface).law(law)
                .gravity(gDir.scalarMultiply(gMag)).load(HostileUserCode.load(fault, faultAt)).settings(settings).build();
            Vector3D t1 = n.orthogonal();
            Vector3D t2 = Vector3D.crossProduct(n, t1);
            Vector3D v = new Vector3D(speed * Math.cos(tangentAngle), t1, speed * Math.sin(tangentAngle), t2);
            double spinScale = spinFactor * speed / r;
            BallState start;
            if (startKind == 0) {
                start = sim.rollingStart(c, v, spinScale);
            } else if (startKind == 1) {
                start = BallState.of(0, c, v, Rotation.IDENTITY, kick.scalarMultiply(spinScale), Phase.SLIDING);
            } else {
                start = BallState.flying(c.add(gap * r, n), v.add(approach * Math.max(speed, 1e-3), n),
                    kick.scalarMultiply(spinScale));
            }
            if (place == 7) {
                start = start.withOrientation(new Rotation(kick, 1.0, org.hipparchus.geometry.euclidean.threed
                    .RotationConvention.VECTOR_OPERATOR));
            }
            try {
                return sim.run(start, duration, HostileUserCode.observer(fault, faultAt));
            } finally {
                if (fault == HostileUserCode.Fault.INTERRUPT) {
                    // the run leaves the status set for its caller; the campaign's pool thread goes on
                    Thread.interrupted();
                }
            }
        });
    }

    /** The unit vector of a direction, scaled first so that tiny or huge components normalise too. */
    private static Vector3D unit(Vector3D d) {
        double s = Math.max(Math.abs(d.getX()), Math.max(Math.abs(d.getY()), Math.abs(d.getZ())));
        return d.scalarMultiply(1 / s).normalize();
    }

    /**
     * Runs the campaign and prints the counts.
     *
     * @param args number of cases (default 100000), seed (default {@link #SEED}), "-v" to list every
     *     non-valid outcome's kind
     */
    public static void main(String[] args) {
        int count = args.length > 0 ? Integer.parseInt(args[0]) : 100_000;
        long seed = args.length > 1 ? Long.decode(args[1]) : SEED;
        long t0 = System.nanoTime();
        Robustness.Tally tally = run(seed, count);
        double secs = (System.nanoTime() - t0) * 1e-9;
        System.out.println(tally.summary() + String.format(Locale.ROOT, " seconds=%.1f seed=%d", secs, seed));
        if (args.length > 2) {
            tally.reasons().forEach((kind, n) -> System.out.println("  " + n + "  " + kind));
        }
        for (Probe p : tally.failures()) {
            System.out.println("FAILURE " + p.describe());
        }
        if (tally.count(org.trundle.core.check.Outcome.FAILURE) > 0) {
            System.exit(1);
        }
    }
}
