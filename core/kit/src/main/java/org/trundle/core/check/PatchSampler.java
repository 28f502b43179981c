package org.trundle.core.check;

import java.util.SplittableRandom;

import org.trundle.core.Ball;
import org.trundle.core.Patch;
import org.trundle.core.Surface;

/**
 * Draws a second patch beside a drawn surface (a floor below a chute, the next tube of a line), so
 * that a {@link CaseRecipe} makes two-patch scenes: the drawn surface (with its motion, if any) is
 * patch {@value org.trundle.core.Simulation#SINGLE_PATCH}, this one the other.
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
}
