package org.trundle.contact;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.Compliance;
import org.trundle.core.Material;

/**
 * The stiffness {@code K} of the Hertz force–approach law {@code P = K δ^{3/2}} for a ball on a curved wall,
 * from the two materials and the wall's local principal curvatures, by the exact Hertz solution
 * ({@link HertzContact#solve}: complete elliptic integrals, K. L. Johnson, Contact Mechanics, 1985, §4.2).
 * For a ball on a flat or in a spherical seat it is the circular result {@code K = (4/3) E* √R*},
 * {@code 1/R* = 1/r − κ}.
 *
 * <p>{@code K} does not depend on the load, so it is solved at a unit load. The last curvature pair and its
 * {@code K} are remembered (a plane, cylinder or sphere asks the same pair every time); the memo is a single
 * immutable holder swapped atomically, so an instance stays thread-safe.
 */
public final class HertzStiffness implements Compliance.Stiffness {
    private final Material ball;
    private final Material wall;
    private volatile double[] memo = {Double.NaN, Double.NaN, Double.NaN, Double.NaN};

    private HertzStiffness(Material ball, Material wall) {
        if (ball == null) {
            throw new IllegalArgumentException("ball material must be given, got null");
        }
        if (wall == null) {
            throw new IllegalArgumentException("wall material must be given, got null");
        }
        this.ball = ball;
        this.wall = wall;
    }

    /**
     * @param ball the ball's material
     * @param wall the wall's material
     * @return the stiffness model
     */
    public static HertzStiffness of(Material ball, Material wall) {
        return new HertzStiffness(ball, wall);
    }

    /**
     * A compliant Hertz contact with Hunt–Crossley damping for a restitution.
     *
     * @param ball the ball's material
     * @param wall the wall's material
     * @param restitution coefficient of restitution e
     * @return the compliant contact
     */
    public static Compliance compliance(Material ball, Material wall, double restitution) {
        return Compliance.of(of(ball, wall), restitution);
    }

    @Override
    public double of(double ballRadius, double curvature1, double curvature2) {
        double[] m = memo;
        if (m[0] == ballRadius && m[1] == curvature1 && m[2] == curvature2) {
            return m[3];
        }
        double k = HertzContact.solve(1.0, ballRadius, ball, curvature1, Vector3D.PLUS_I, curvature2, Vector3D.PLUS_J, wall)
            .stiffness();
        memo = new double[] {ballRadius, curvature1, curvature2, k};
        return k;
    }

    @Override
    public String toString() {
        return "Hertz(ball " + ball + ", wall " + wall + ")";
    }
}
