package org.trundle.core.check;

import java.util.SplittableRandom;

import org.trundle.core.Ball;
import org.trundle.core.Surface;

/**
 * Draws a surface for a given ball (so that a concave surface can be made wide enough for it).
 * A lambda serves: {@code (rnd, ball) -> new MyTrough(...)}.
 */
@FunctionalInterface
public interface SurfaceSampler {
    /**
     * @param rnd the random source
     * @param ball the ball that will touch it
     * @return a surface the ball fits
     */
    Surface draw(SplittableRandom rnd, Ball ball);

    /**
     * @param s a surface
     * @return a sampler that always gives s
     */
    static SurfaceSampler fixed(Surface s) {
        return (rnd, ball) -> s;
    }
}
