package org.trundle.core.sweep;

import java.io.Serializable;

/**
 * A counter-based random generator: the {@code k}-th draw is a pure function of the seed and
 * {@code k}, so any draw can be made on any machine without drawing the ones before it.
 *
 * <p><b>Method.</b> SplitMix64 (G. L. Steele Jr., D. Lea, C. H. Flood, "Fast splittable pseudorandom
 * number generators", OOPSLA 2014, doi:10.1145/2660193.2660195): the state after {@code k + 1}
 * steps is {@code s_k = seed + (k + 1)·γ (mod 2⁶⁴)} with the odd constant
 * {@code γ = 0x9e3779b97f4a7c15} (⌊2⁶⁴/φ⌋ made odd), and the output is the finaliser
 * {@code mix(s_k)}, D. Stafford's "variant 13" of the MurmurHash3 64-bit mix ("Better bit mixing",
 * 2011): {@code z ← (z ⊕ z≫30)·0xbf58476d1ce4e5b9; z ← (z ⊕ z≫27)·0x94d049bb133111eb; z ⊕ z≫31}.
 * Since the state is an affine function of the counter, the sequence is counter-based as it
 * stands; it is, draw for draw, the sequence of {@link java.util.SplittableRandom#nextLong()} for
 * the same seed (checked in {@code CounterRandomTest}), so sweeps drawn with it keep the values a
 * sequential {@code SplittableRandom} gave.
 *
 * <p>A uniform double in [0, 1) takes the top 53 bits: {@code u = (bits ≫ 11)·2⁻⁵³}.
 *
 * <p>Immutable and thread-safe.
 */
public final class CounterRandom implements Serializable {
    private static final long serialVersionUID = 1L;
    /** The SplitMix64 increment γ (odd). */
    private static final long GAMMA = 0x9e3779b97f4a7c15L;
    /** 2⁻⁵³. */
    private static final double UNIT = 0x1.0p-53;

    private final long seed;

    /** @param seed the seed (any value) */
    public CounterRandom(long seed) {
        this.seed = seed;
    }

    /** @return the seed */
    public long seed() {
        return seed;
    }

    /**
     * @param k draw number, {@code ≥ 0}
     * @return the k-th 64-bit draw, {@code mix(seed + (k + 1)·γ)}
     */
    public long bits(long k) {
        if (k < 0) {
            throw new IllegalArgumentException("draw number must not be negative, got " + k);
        }
        return mix(seed + (k + 1) * GAMMA);
    }

    /**
     * @param k draw number, {@code ≥ 0}
     * @return the k-th draw as a uniform double in [0, 1), a multiple of 2⁻⁵³
     */
    public double unit(long k) {
        return (bits(k) >>> 11) * UNIT;
    }

    /**
     * The k-th draw scaled to {@code [low, high)}: {@code low + u·(high − low)}, rounded down to the
     * largest double below {@code high} when rounding reaches it (as
     * {@link java.util.SplittableRandom#nextDouble(double, double)} does).
     *
     * @param k draw number, {@code ≥ 0}
     * @param low lower bound, finite
     * @param high upper bound, finite, {@code > low}
     * @return the value
     */
    public double uniform(long k, double low, double high) {
        if (!(high > low) || !Double.isFinite(high - low)) {
            throw new IllegalArgumentException("uniform range must be finite with low < high, got low = " + low
                + ", high = " + high);
        }
        double r = unit(k) * (high - low) + low;
        return r >= high ? Math.nextDown(high) : r;
    }

    private static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xbf58476d1ce4e5b9L;
        z = (z ^ (z >>> 27)) * 0x94d049bb133111ebL;
        return z ^ (z >>> 31);
    }

    @Override
    public String toString() {
        return "CounterRandom(seed = " + seed + ")";
    }
}
