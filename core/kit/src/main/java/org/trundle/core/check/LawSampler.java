package org.trundle.core.check;

import java.util.SplittableRandom;

import org.trundle.core.Ball;
import org.trundle.core.ContactLaw;

/**
 * Draws a contact law with coefficients from ranges, for a given ball (so that lengths such as a
 * rolling-resistance length can be scaled to its radius). A lambda serves:
 * {@code (rnd, ball) -> new Coulomb(mu.draw(rnd), ...)}.
 */
@FunctionalInterface
public interface LawSampler {
    /**
     * @param rnd the random source
     * @param ball the ball
     * @return a contact law
     */
    ContactLaw draw(SplittableRandom rnd, Ball ball);

    /**
     * @param law a law
     * @return a sampler that always gives it
     */
    static LawSampler fixed(ContactLaw law) {
        return (rnd, ball) -> law;
    }
}
