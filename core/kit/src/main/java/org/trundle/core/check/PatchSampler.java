package org.trundle.core.check;

import java.util.SplittableRandom;

import org.trundle.core.Ball;
import org.trundle.core.Patch;
import org.trundle.core.Surface;

/**
 * Draws a second patch beside a drawn surface (a floor below a chute, the next tube of a line), so
 * that a {@link CaseRecipe} makes two-patch scenes: the drawn surface (with its motion, if any) is
 * patch {@value org.trundle.core.Simulation#SINGLE_PATCH}, this one the other. Either may move: the
 * first through {@link CaseRecipe.Builder#motions(MotionSampler)}, this one through
 * {@link #withMotion(MotionSampler)} (a floor turning under a chute, a belt, a tube spinning about its
 * axis).
 */
@FunctionalInterface
public interface PatchSampler {
    /**
     * @param rnd the random source
     * @param ball the ball
     * @param surface the drawn first surface (at its rest pose)
     * @return the second patch; its id must differ from {@value org.trundle.core.Simulation#SINGLE_PATCH}
     */
    Patch draw(SplittableRandom rnd, Ball ball, Surface surface);

    /**
     * This sampler's patch set in motion: the patch is drawn first, then its motion from the same random
     * stream (so the case stays a function of its seed and index), replacing any motion the patch had.
     *
     * @param motions sampler of the patch's rigid motion, given the patch's surface at its rest pose
     * @return the sampler of moving patches
     */
    default PatchSampler withMotion(MotionSampler motions) {
        if (motions == null) {
            throw new IllegalArgumentException("motions must be given, got null");
        }
        return (rnd, ball, surface) -> {
            Patch p = draw(rnd, ball, surface);
            return p.withMotion(motions.draw(rnd, ball, p.surface()));
        };
    }
}
