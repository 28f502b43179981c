package org.trundle.contact;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.core.Compliance;
import org.trundle.core.Material;

/** The compliant contact's Hertz stiffness. */
class HertzStiffnessTest {

    /** Sphere on a flat: K = (4/3) E* √r (K. L. Johnson, Contact Mechanics, 1985, eq. 4.23). */
    @Test
    void flatGivesTheCircularResult() {
        HertzStiffness s = HertzStiffness.of(Material.STEEL, Material.ACRYLIC);
        double eStar = Material.STEEL.contactModulus(Material.ACRYLIC);
        double r = 0.006;
        assertEquals(4.0 / 3 * eStar * Math.sqrt(r), s.of(r, 0, 0), 1e-12 * eStar * Math.sqrt(r));
        // the memo answers the same pair again identically
        assertEquals(s.of(r, 0, 0), s.of(r, 0, 0));
    }

    /** Spherical seat of radius R: 1/R* = 1/r − 1/R, same circular result (Johnson 1985, §4.2). */
    @Test
    void sphericalSeatUsesTheRelativeRadius() {
        HertzStiffness s = HertzStiffness.of(Material.STEEL, Material.STEEL);
        double eStar = Material.STEEL.contactModulus(Material.STEEL);
        double r = 0.005;
        double seat = 0.02;
        double rStar = 1 / (1 / r - 1 / seat);
        assertEquals(4.0 / 3 * eStar * Math.sqrt(rStar), s.of(r, 1 / seat, 1 / seat), 1e-12 * eStar * Math.sqrt(rStar));
    }

    /** In a bore the ellipse is elongated; K is the exact solution's, and it lies between the flat's and the seat's. */
    @Test
    void boreLiesBetweenFlatAndSeat() {
        HertzStiffness s = HertzStiffness.of(Material.STEEL, Material.STEEL);
        double r = 0.005;
        double bore = 0.008;
        double k = s.of(r, 1 / bore, 0);
        // K does not depend on the load: the patch solved at 5 N has the same K
        assertEquals(HertzContact.solve(5.0, r, Material.STEEL, 1 / bore, Vector3D.PLUS_I, 0, Vector3D.PLUS_J,
            Material.STEEL).stiffness(), k, 1e-9 * k);
        assertTrue(k > s.of(r, 0, 0) && k < s.of(r, 1 / bore, 1 / bore));
        Compliance c = HertzStiffness.compliance(Material.STEEL, Material.STEEL, 0.8);
        assertEquals(k, c.stiffness(r, 1 / bore, 0), 1e-9 * k);
        assertThrows(IllegalArgumentException.class, () -> HertzStiffness.of(null, Material.STEEL));
    }
}
