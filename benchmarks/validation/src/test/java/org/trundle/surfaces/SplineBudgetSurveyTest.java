package org.trundle.surfaces;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Locale;
import java.util.SplittableRandom;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.Coulomb;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.ContactLaw;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;

/**
 * Energy budgets of runs in helical spline tubes at the default tolerance (1e-10): the figure the
 * README's limits section quotes. Seeded random helices (invented data: helix radius 50–150 mm,
 * pitch 20–80 mm, 8–24 points per turn, bore 8–15 mm, steel balls of 0.3–0.6 of the bore), pure
 * rolling or Coulomb friction, started on the floor with a sideways component so the ball climbs
 * the walls; 0.5 s each. The budget's relative residual (energy scale: design notes §8) must stay
 * below the README's bound.
 */
class SplineBudgetSurveyTest {
    static final int CASES = 200;
    /** The bound the README states for spline surfaces at the default tolerance. */
    static final double README_BOUND = 5e-8;

    @Test
    void helixBudgetsAtTheDefaultTolerance() {
        SplittableRandom rnd = new SplittableRandom(2026);
        double[] res = new double[CASES];
        for (int i = 0; i < CASES; i++) {
            double a = rnd.nextDouble(0.05, 0.15);
            double pitch = rnd.nextDouble(0.02, 0.08);
            int k = new int[] {6, 8, 12, 16, 24}[rnd.nextInt(5)];
            double bore = rnd.nextDouble(0.008, 0.015);
            double r = bore * rnd.nextDouble(0.3, 0.6);
            Vector3D[] pts = new Vector3D[3 * k / 2 + 1];
            for (int j = 0; j < pts.length; j++) {
                double phi = 2 * Math.PI * j / k;
                pts[j] = new Vector3D(a * Math.cos(phi), a * Math.sin(phi), -pitch * phi / (2 * Math.PI));
            }
            double[] radii = new double[pts.length];
            Arrays.fill(radii, bore);
            SplineTube tube = new SplineTube(pts, radii, Side.INSIDE);
            ContactLaw law = i % 2 == 0 ? new PureRolling() : new Coulomb(0.5, 0.4, 0.0);
            Ball ball = Ball.solid(r, 7800 * 4.0 / 3 * Math.PI * r * r * r);
            Simulation sim = Simulation.builder().ball(ball).surface(tube).law(law).gravity(new Vector3D(0, 0, -9.81)).build();
            double u = 0.05 * tube.length();
            Vector3D t = tube.tangent(u);
            Vector3D down = Vector3D.MINUS_K.subtract(Vector3D.MINUS_K.dotProduct(t), t).normalize();
            Vector3D side = Vector3D.crossProduct(t, down);
            double speed = rnd.nextDouble(0.1, 2.0);
            Vector3D v = t.scalarMultiply(speed).add(rnd.nextDouble(-1.0, 1.0) * speed, side);
            RunResult out = sim.run(sim.rollingStart(tube.centre(u).add(bore - r, down), v), 1.0);
            res[i] = Math.abs(out.energy().relativeResidual());
        }
        double[] sorted = res.clone();
        Arrays.sort(sorted);
        long above = Arrays.stream(res).filter(x -> x > 1e-8).count();
        System.out.printf(Locale.ROOT, "helix budgets at tolerance 1e-10: %d runs, median %.2e, 90th percentile %.2e, worst %.2e, %d above 1e-8%n",
            CASES, sorted[CASES / 2], sorted[(int) (0.9 * CASES)], sorted[CASES - 1], above);
        assertTrue(sorted[CASES - 1] <= README_BOUND, "worst helix budget " + sorted[CASES - 1] + " above the README's " + README_BOUND);
    }
}
