package org.trundle.core.check;

import java.util.SplittableRandom;

import org.trundle.core.Ball;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceMotion;

/** Draws a rigid motion for a drawn surface (a turntable, a spinning drum, a belt). */
@FunctionalInterface
public interface MotionSampler {
    /**
     * @param rnd the random source
     * @param ball the ball
     * @param surface the drawn surface (at its rest pose)
     * @return its motion
     */
    SurfaceMotion draw(SplittableRandom rnd, Ball ball, Surface surface);
}
