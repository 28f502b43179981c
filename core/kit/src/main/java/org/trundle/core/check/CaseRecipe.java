package org.trundle.core.check;

import java.util.SplittableRandom;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.internal.Checks;
import org.trundle.core.ContactLaw;
import org.trundle.core.Simulation;
import org.trundle.core.Patch;
import org.trundle.core.SolverSettings;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceMotion;

/**
 * A {@link CaseSource} assembled from samplers: for case {@code i} of seed {@code s} it draws, from
 * {@link Draws#forCase(long, int)}, a ball, a surface for it, a law, a gravity vector and a start.
 * A draw whose parts do not fit together (the simulation rejects the ball, or no start is found in
 * the region) is redrawn from the same random stream, at most 20 times, so the case stays a
 * function of {@code (s, i)}. With a {@link Builder#neighbour} sampler each case is a two-patch
 * scene: the drawn surface and a second patch drawn beside it. Either patch may move: the drawn surface by
 * the {@link Builder#motions} sampler's motion, the second when its sampler gives it one
 * ({@link PatchSampler#withMotion}, with {@link MotionSampler#turntable}, {@link MotionSampler#belt} or
 * {@link MotionSampler#spinning}), so that a scene case can have a floor turning under a chute, a belt, or
 * a spinning tube. Draw order within a case: ball, surface, law, gravity, the surface's motion (only when a
 * motion sampler is given), the second patch and its motion, the start.
 *
 * <pre>{@code
 * CaseSource cases = CaseRecipe.builder()
 *     .label("trough x coulomb")
 *     .surfaces((rnd, ball) -> new Trough(...))
 *     .laws((rnd, ball) -> new Coulomb(0.3, 0.2, 0.5))
 *     .starts(StartSampler.near(Vector3D.ZERO, 0.05))
 *     .duration(0.1)
 *     .build();
 * }</pre>
 *
 * <p>Immutable once built.
 */
public final class CaseRecipe implements CaseSource {
    private static final int REDRAWS = 20;

    private final String label;
    private final BallSampler balls;
    private final SurfaceSampler surfaces;
    private final LawSampler laws;
    private final GravitySampler gravity;
    private final StartSampler starts;
    private final double duration;
    private final SolverSettings settings;
    /** Motion of the drawn surfaces, or null for still ones. */
    private final MotionSampler motions;
    /** Second patch of a two-patch scene, or null for one surface. */
    private final PatchSampler neighbour;

    private CaseRecipe(Builder b) {
        if (b.surfaces == null || b.laws == null || b.starts == null) {
            throw new IllegalArgumentException("a recipe needs surfaces, laws and starts, got surfaces = "
                + b.surfaces + ", laws = " + b.laws + ", starts = " + b.starts);
        }
        this.label = b.label;
        this.balls = b.balls;
        this.surfaces = b.surfaces;
        this.laws = b.laws;
        this.gravity = b.gravity;
        this.starts = b.starts;
        this.duration = b.duration;
        this.settings = b.settings;
        this.motions = b.motions;
        this.neighbour = b.neighbour;
    }

    /** @return a builder with default balls, gravity 9.81 m/s² in any direction, 0.1 s duration */
    public static Builder builder() {
        return new Builder();
    }

    @Override
    public PropertyCase make(long seed, int index) {
        SplittableRandom rnd = Draws.forCase(seed, index);
        RuntimeException last = null;
        for (int attempt = 0; attempt < REDRAWS; attempt++) {
            try {
                Ball ball = balls.draw(rnd);
                Surface surface = surfaces.draw(rnd, ball);
                ContactLaw law = laws.draw(rnd, ball);
                Vector3D g = gravity.draw(rnd);
                Simulation.Builder sb = Simulation.builder().ball(ball).law(law).gravity(g).settings(settings);
                // drawn only when asked for, so that recipes without motion or neighbour keep their cases
                SurfaceMotion motion = motions == null ? SurfaceMotion.NONE : motions.draw(rnd, ball, surface);
                if (neighbour == null) {
                    sb.surface(surface).motion(motion);
                } else {
                    sb.patch(new Patch(Simulation.SINGLE_PATCH, surface, motion, null))
                        .patch(neighbour.draw(rnd, ball, surface));
                }
                Simulation sim = sb.build();
                BallState start = starts.draw(rnd, sim);
                return PropertyCase.of(seed, index, label, sim, start, duration);
            } catch (IllegalArgumentException | IllegalStateException e) {
                last = e;
            }
        }
        throw new IllegalStateException("recipe " + label + " could not make case seed=" + seed + " index=" + index
            + " in " + REDRAWS + " draws: " + last.getMessage(), last);
    }

    /** Builder of a {@link CaseRecipe}. */
    public static final class Builder {
        private String label = "";
        private BallSampler balls = BallSampler.defaults();
        private SurfaceSampler surfaces;
        private LawSampler laws;
        private GravitySampler gravity = GravitySampler.anyDirection(Interval.fixed(9.81));
        private StartSampler starts;
        private double duration = 0.1;
        private SolverSettings settings = SolverSettings.defaults();
        private MotionSampler motions;
        private PatchSampler neighbour;

        private Builder() {
        }

        /**
         * @param l a short label shown in every case's description
         * @return this builder
         */
        public Builder label(String l) {
            this.label = l;
            return this;
        }

        /**
         * @param b ball sampler
         * @return this builder
         */
        public Builder balls(BallSampler b) {
            this.balls = b;
            return this;
        }

        /**
         * @param s surface sampler
         * @return this builder
         */
        public Builder surfaces(SurfaceSampler s) {
            this.surfaces = s;
            return this;
        }

        /**
         * @param l law sampler
         * @return this builder
         */
        public Builder laws(LawSampler l) {
            this.laws = l;
            return this;
        }

        /**
         * @param g gravity sampler
         * @return this builder
         */
        public Builder gravity(GravitySampler g) {
            this.gravity = g;
            return this;
        }

        /**
         * @param s start sampler
         * @return this builder
         */
        public Builder starts(StartSampler s) {
            this.starts = s;
            return this;
        }

        /**
         * @param t simulated duration of each case (s), positive
         * @return this builder
         */
        public Builder duration(double t) {
            this.duration = Checks.positive("duration", t);
            return this;
        }

        /**
         * @param s solver settings of each case
         * @return this builder
         */
        public Builder settings(SolverSettings s) {
            this.settings = s;
            return this;
        }

        /**
         * @param m motion sampler of the drawn surfaces (none by default: still surfaces); in a two-patch scene
         *     it moves the first patch (the drawn surface), not the neighbour
         * @return this builder
         */
        public Builder motions(MotionSampler m) {
            this.motions = m;
            return this;
        }

        /**
         * @param p sampler of a second patch beside the drawn surface (none by default: one surface);
         *     with it every case is a two-patch scene
         * @return this builder
         */
        public Builder neighbour(PatchSampler p) {
            this.neighbour = p;
            return this;
        }

        /** @return the recipe */
        public CaseRecipe build() {
            return new CaseRecipe(this);
        }
    }
}
