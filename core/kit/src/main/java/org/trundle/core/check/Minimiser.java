package org.trundle.core.check;

import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Phase;
import org.trundle.core.Simulation;

/**
 * Walks a failing case toward a simpler one that still fails, and reports both (a greedy
 * shrinking in the manner of property-based testing tools, common practice). Moves, tried in this
 * order and restarted after each accepted one: halve the duration; round it to one significant
 * digit; halve the start speed and spin (velocity and spin scaled together, so a rolling start
 * stays rolling); round the speed to one significant digit; drop the spin about the normal;
 * replace the spin of a flight or sliding start by the rolling one (fewer phases); round the
 * gravity's magnitude; make the ball solid ({@code k = 2/5}); round the mass. A candidate counts
 * as still failing when the invariant fails on it (a candidate the library rejects, or one on
 * which the check does not apply, is not taken). Deterministic.
 */
public final class Minimiser {
    private final int maxTries;

    /**
     * @param maxTries largest number of candidates to check, positive
     */
    public Minimiser(int maxTries) {
        if (maxTries <= 0) {
            throw new IllegalArgumentException("maxTries must be positive, got " + maxTries);
        }
        this.maxTries = maxTries;
    }

    /** @return a minimiser trying at most 40 candidates */
    public static Minimiser defaults() {
        return new Minimiser(40);
    }

    /**
     * @param failing a case on which {@code invariant} fails
     * @param verdict its failing verdict
     * @param invariant the invariant
     * @return the reduction
     */
    public Reduction minimise(PropertyCase failing, Verdict verdict, Invariant invariant) {
        PropertyCase cur = failing;
        Verdict curVerdict = verdict;
        List<String> moves = new ArrayList<>();
        int tried = 0;
        boolean progress = true;
        while (progress && tried < maxTries) {
            progress = false;
            for (Move mv : MOVES) {
                if (tried >= maxTries) {
                    break;
                }
                PropertyCase cand;
                try {
                    cand = mv.op.apply(cur);
                } catch (RuntimeException e) {
                    continue;
                }
                if (cand == null) {
                    continue;
                }
                tried++;
                Verdict v;
                try {
                    v = invariant.check(cand);
                } catch (RuntimeException e) {
                    continue;
                }
                if (v.status() == Verdict.Status.FAILS) {
                    cur = cand;
                    curVerdict = v;
                    moves.add(mv.name);
                    progress = true;
                    break;
                }
            }
        }
        return new Reduction(failing, verdict, cur, curVerdict, moves, tried);
    }

    private record Move(String name, UnaryOperator<PropertyCase> op) {
    }

    private static final List<Move> MOVES = List.of(
        new Move("halve duration", c -> c.duration() > 1e-4 ? c.withDuration(c.duration() / 2) : null),
        new Move("round duration", c -> rounded(c.duration(), d -> c.withDuration(d))),
        new Move("halve speed", c -> c.start().velocity().getNorm() > 1e-6 || c.start().spin().getNorm() > 1e-6
            ? c.withStart(scaleMotion(c.start(), 0.5)) : null),
        new Move("round speed", c -> {
            double u = c.start().velocity().getNorm();
            double ru = round1(u);
            return u > 0 && ru != u ? c.withStart(scaleMotion(c.start(), ru / u)) : null;
        }),
        new Move("drop normal spin", c -> {
            BallState s = c.start();
            Vector3D n = normal(c);
            double wn = s.spin().dotProduct(n);
            return wn != 0 ? c.withStart(s.withSpin(s.spin().subtract(wn, n))) : null;
        }),
        new Move("rolling spin", c -> {
            BallState s = c.start();
            if (s.phase() == Phase.ROLLING) {
                return null;
            }
            Vector3D n = normal(c);
            Vector3D vt = s.velocity().subtract(s.velocity().dotProduct(n), n);
            Vector3D w = Vector3D.crossProduct(n, vt).scalarMultiply(1 / c.simulation().ball().radius());
            return w.distance(s.spin()) > 0 ? c.withStart(s.withSpin(w)) : null;
        }),
        new Move("round gravity", c -> {
            Vector3D g = c.simulation().gravity();
            double gn = g.getNorm();
            double rg = round1(gn);
            return gn > 0 && rg != gn ? c.withSimulation(c.simulation().toBuilder()
                .gravity(g.scalarMultiply(rg / gn)).build()) : null;
        }),
        new Move("solid ball", c -> {
            Ball b = c.simulation().ball();
            return b.inertiaFactor() != Ball.SOLID ? withBall(c, Ball.of(b.radius(), b.mass(), Ball.SOLID)) : null;
        }),
        new Move("round mass", c -> {
            Ball b = c.simulation().ball();
            double rm = round1(b.mass());
            return rm != b.mass() ? withBall(c, Ball.of(b.radius(), rm, b.inertiaFactor())) : null;
        }));

    private static PropertyCase rounded(double x, java.util.function.DoubleFunction<PropertyCase> f) {
        double r = round1(x);
        return r != x && r > 0 ? f.apply(r) : null;
    }

    private static double round1(double x) {
        return Draws.round(x, 1);
    }

    private static PropertyCase withBall(PropertyCase c, Ball b) {
        Simulation s = c.simulation().toBuilder().ball(b).build();
        return c.withSimulation(s);
    }

    private static BallState scaleMotion(BallState s, double f) {
        return s.withVelocity(s.velocity().scalarMultiply(f)).withSpin(s.spin().scalarMultiply(f));
    }

    private static Vector3D normal(PropertyCase c) {
        ContactGeometry g = c.simulation().geometryAt(c.start().centre(), c.start().time());
        return new Vector3D(g.normal[0], g.normal[1], g.normal[2]);
    }
}
