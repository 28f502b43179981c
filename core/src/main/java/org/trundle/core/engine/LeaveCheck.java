package org.trundle.core.engine;

import java.util.List;

import org.trundle.core.Slab;

/**
 * When a ball in free flight (gravity alone: no applied load, every patch still) can meet no patch
 * again. The centre follows {@code c(τ) = c₀ + v₀ τ + ½ g τ²} exactly; along a slab's direction
 * {@code d} its coordinate is the quadratic {@code q(τ) = c₀·d + (v₀·d) τ + ½ (g·d) τ²}. The ball
 * can touch a patch at time {@code τ} only if, for every slab holding the patch, {@code q(τ)} lies
 * in the slab grown by the reach (the radius and a margin for rounding and integration error).
 * Each slab gives an interval of times that holds every such {@code τ} (the hull of the set where
 * the quadratic is in range, from its roots); the intersection over the patch's slabs bounds when
 * the patch can be met, and after the latest such time over all patches the ball is clear for
 * good. A patch with no slabs can always be met (unknown extent): the flight goes on.
 *
 * <p>A gravity component along a slab's direction at the level of rounding ({@code |g·d| ≤ 16 ulp(|g|)},
 * about 3.5e-15 |g|) is taken as zero: it is what a direction perpendicular to gravity becomes once the
 * scene is turned by a rotation (the same scene in another frame), and would otherwise make the coordinate a
 * parabola that returns after about {@code 2 |v·d| / |g·d|} (10¹² s and more at everyday speeds), so that the
 * run's end would depend on the frame it is described in. A real tilt that small is below the resolution of
 * the inputs.
 */
final class LeaveCheck {
    private LeaveCheck() {
    }

    /**
     * The time from which the ball can meet no patch again.
     *
     * @param t the current time (s)
     * @param c the centre (m)
     * @param v the velocity (m/s)
     * @param g the acceleration, gravity alone (m/s²)
     * @param extents each patch's slabs
     * @param reach the centre's largest distance from a patch point at a touch (m): the radius and a margin
     * @return the absolute time (s) after which no patch can be met; {@code t} when none can be met
     *     now or later; +∞ when it cannot be shown
     */
    static double clearFrom(double t, double[] c, double[] v, double[] g, List<List<Slab>> extents, double reach) {
        double latest = Double.NEGATIVE_INFINITY;
        double level = 16 * Math.ulp(Math.sqrt(g[0] * g[0] + g[1] * g[1] + g[2] * g[2]));
        for (List<Slab> slabs : extents) {
            if (slabs.isEmpty()) {
                return Double.POSITIVE_INFINITY;
            }
            double lo = 0;
            double hi = Double.POSITIVE_INFINITY;
            for (Slab s : slabs) {
                double dx = s.direction().getX();
                double dy = s.direction().getY();
                double dz = s.direction().getZ();
                double q0 = c[0] * dx + c[1] * dy + c[2] * dz;
                double w = v[0] * dx + v[1] * dy + v[2] * dz;
                double a = g[0] * dx + g[1] * dy + g[2] * dz;
                if (Math.abs(a) <= level) {
                    // perpendicular to gravity up to rounding (see the class comment)
                    a = 0;
                }
                // the rounding of q0 and of the bounds, on top of the reach (a few units in the last
                // place: a pad proportional to the coordinates would make the end time depend on
                // where the origin is)
                double pad = reach + 8 * (Math.ulp(q0) + ulpOf(s.low()) + ulpOf(s.high()));
                double[] below = below(q0, w, a, s.high() + pad);
                double[] above = below(-q0, -w, -a, -(s.low() - pad));
                if (below == null || above == null) {
                    lo = 1;
                    hi = 0;
                    break;
                }
                lo = Math.max(lo, Math.max(below[0], above[0]));
                hi = Math.min(hi, Math.min(below[1], above[1]));
                if (!(lo <= hi)) {
                    break;
                }
            }
            if (Double.isNaN(lo) || Double.isNaN(hi)) {
                return Double.POSITIVE_INFINITY;
            }
            if (lo <= hi) {
                // may meet this patch up to hi (padded for the rounding of the roots)
                latest = Math.max(latest, hi + 1e-9 * hi);
            }
        }
        return latest == Double.NEGATIVE_INFINITY ? t : t + latest;
    }

    private static double ulpOf(double x) {
        return Double.isFinite(x) ? Math.ulp(x) : 0.0;
    }

    /**
     * An interval of times {@code τ ≥ 0} holding every {@code τ} with
     * {@code q0 + w τ + ½ a τ² ≤ h} (the hull of that set), or null when there is none.
     */
    private static double[] below(double q0, double w, double a, double h) {
        if (h == Double.POSITIVE_INFINITY) {
            return new double[] {0, Double.POSITIVE_INFINITY};
        }
        if (h == Double.NEGATIVE_INFINITY) {
            return null;
        }
        double c = q0 - h;
        if (!Double.isFinite(c) || !Double.isFinite(w) || !Double.isFinite(a)) {
            return new double[] {0, Double.POSITIVE_INFINITY};
        }
        if (a == 0) {
            if (w == 0) {
                return c <= 0 ? new double[] {0, Double.POSITIVE_INFINITY} : null;
            }
            double root = -c / w;
            if (w > 0) {
                // falls below h until the root
                return c <= 0 ? new double[] {0, root} : null;
            }
            return new double[] {Math.max(0, root), Double.POSITIVE_INFINITY};
        }
        // ½ a τ² + w τ + c = 0: stable roots
        double disc = w * w - 2 * a * c;
        if (!Double.isFinite(disc)) {
            return new double[] {0, Double.POSITIVE_INFINITY};
        }
        if (disc < 0) {
            // no root: the sign is that of a everywhere
            return a > 0 ? null : new double[] {0, Double.POSITIVE_INFINITY};
        }
        double sq = Math.sqrt(disc);
        double qq = -(w + Math.copySign(sq, w));
        double r1 = qq / a;
        double r2 = qq != 0 ? 2 * c / qq : r1;
        double lo = Math.min(r1, r2);
        double hi = Math.max(r1, r2);
        if (a > 0) {
            // convex: at or below h between the roots
            return hi < 0 ? null : new double[] {Math.max(0, lo), hi};
        }
        // concave: at or below h outside the roots; after the larger root for good
        return c <= 0 ? new double[] {0, Double.POSITIVE_INFINITY} : new double[] {Math.max(0, hi), Double.POSITIVE_INFINITY};
    }
}
