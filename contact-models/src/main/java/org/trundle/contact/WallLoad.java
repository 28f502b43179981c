package org.trundle.contact;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * The load one wall carries at one instant: the contact forces and the exact Hertz contact patch under the
 * normal force (K. L. Johnson, Contact Mechanics, 1985, §4.2; see {@link HertzContact}).
 *
 * <p>Immutable.
 *
 * @param time time (s)
 * @param patch the patch's id
 * @param mode the contact's mode ("rolling", "sliding", "rest", or "compliant" for a compliant contact; {@code SampleContact.modeLabel()})
 * @param normalForce normal force F_n (N), positive pressing the wall
 * @param frictionForce magnitude of the tangential (friction) force (N)
 * @param hertz the Hertz patch under {@code normalForce}: semi-axes a ≥ b (m), their world directions (the
 *     ellipse's orientation, tangent to the wall), maximum pressure p₀ (Pa), approach δ (m)
 */
public record WallLoad(double time, String patch, String mode, double normalForce, double frictionForce,
                       HertzPatch hertz) {
    /** @return maximum contact pressure p₀ (Pa) */
    public double maxPressure() {
        return hertz.maxPressure();
    }

    /** @return semi-major axis a (m) */
    public double semiMajor() {
        return hertz.semiMajor();
    }

    /** @return semi-minor axis b (m) */
    public double semiMinor() {
        return hertz.semiMinor();
    }

    /** @return approach δ of ball and wall (m) */
    public double approach() {
        return hertz.approach();
    }

    /** @return unit direction of the ellipse's major axis (world frame) */
    public Vector3D majorAxis() {
        return hertz.majorAxis();
    }
}
