package org.trundle.core.check;

import java.util.SplittableRandom;

import org.trundle.core.Ball;

/**
 * Draws balls: radius {@code r} (m) and mass {@code m} (kg) log-uniformly, inertia factor
 * {@code k} uniformly. Defaults: {@code r} in 1–20 mm, {@code m} in 0.1–100 g, {@code k} in
 * [0.2, 2/3] (solid 2/5 and thin shell 2/3 inside; common practice for ball-handling parts).
 *
 * <p>Immutable; {@code withX} copies.
 */
public final class BallSampler {
    private final Interval radius;
    private final Interval mass;
    private final Interval inertiaFactor;

    private BallSampler(Interval radius, Interval mass, Interval inertiaFactor) {
        this.radius = radius;
        this.mass = mass;
        this.inertiaFactor = inertiaFactor;
    }

    /** @return the default sampler */
    public static BallSampler defaults() {
        return new BallSampler(Interval.log(0.001, 0.02), Interval.log(1e-4, 0.1), Interval.of(0.2, Ball.THIN_SHELL));
    }

    /**
     * @param r radius range (m)
     * @return a copy drawing radii from r
     */
    public BallSampler withRadius(Interval r) {
        return new BallSampler(r, mass, inertiaFactor);
    }

    /**
     * @param m mass range (kg)
     * @return a copy drawing masses from m
     */
    public BallSampler withMass(Interval m) {
        return new BallSampler(radius, m, inertiaFactor);
    }

    /**
     * @param k inertia factor range, within (0, 2/3]
     * @return a copy drawing inertia factors from k
     */
    public BallSampler withInertiaFactor(Interval k) {
        return new BallSampler(radius, mass, k);
    }

    /**
     * @param rnd the random source
     * @return a ball
     */
    public Ball draw(SplittableRandom rnd) {
        double r = radius.draw(rnd);
        double m = mass.draw(rnd);
        double k = inertiaFactor.draw(rnd);
        return Ball.of(r, m, Math.min(k, Ball.THIN_SHELL));
    }
}
