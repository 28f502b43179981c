package org.trundle.contact;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * The Hertz contact patch of a ball pressed on a curved wall: an ellipse with semi-axes
 * {@code a ≥ b}, an elliptic pressure {@code p = p₀ √(1 − x²/a² − y²/b²)}, and the approach of the
 * two bodies' distant points. Solved by {@link HertzContact#solve}; see there for the equations
 * (K. L. Johnson, Contact Mechanics, Cambridge University Press 1985, §4.2).
 *
 * <p>Immutable and thread-safe.
 *
 * @param load normal load P (N)
 * @param semiMajor semi-major axis a (m)
 * @param semiMinor semi-minor axis b ≤ a (m)
 * @param majorAxis unit vector along the major axis, world frame (tangent to the wall)
 * @param minorAxis unit vector along the minor axis, world frame
 * @param maxPressure maximum pressure p₀ = 3P/(2π a b) (Pa)
 * @param approach approach δ (m) of the two bodies
 * @param stiffness K of the force–approach law {@code P = K δ^{3/2}} (N/m^{3/2}), independent of the load
 * @param contactModulus the pair's contact modulus E* (Pa)
 */
public record HertzPatch(double load, double semiMajor, double semiMinor, Vector3D majorAxis, Vector3D minorAxis,
                         double maxPressure, double approach, double stiffness, double contactModulus) {

    /** @return eccentricity {@code e = √(1 − (b/a)²)}; 0 for a circle (and for zero load) */
    public double eccentricity() {
        if (!(semiMajor > 0)) {
            return 0.0;
        }
        double beta = semiMinor / semiMajor;
        return Math.sqrt(Math.max(0.0, (1 - beta) * (1 + beta)));
    }

    /** @return mean contact radius {@code c = √(a b)} (m) */
    public double meanRadius() {
        return Math.sqrt(semiMajor * semiMinor);
    }

    /** @return contact area {@code π a b} (m²) */
    public double area() {
        return Math.PI * semiMajor * semiMinor;
    }

    /** @return mean pressure {@code P/(π a b) = 2 p₀/3} (Pa) */
    public double meanPressure() {
        return 2.0 * maxPressure / 3.0;
    }
}
