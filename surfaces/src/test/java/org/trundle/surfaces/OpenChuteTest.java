package org.trundle.surfaces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.core.ContactGeometry;

/**
 * An open spline-tube chute keeps its lips where the builder put them: a two-turn helical chute
 * (helix radius 0.1 m, pitch 50 mm, bore 24 mm) open ±100° about a downward reference has its
 * edges at ±100° from the reference projected onto each cross-section along the whole length.
 * (Measured in a rotation-minimising frame, the lips turn relative to the helix instead: that frame
 * stays available on request, and the test shows the difference.)
 */
class OpenChuteTest {
    static final double BORE = 0.012;
    static final double LIP = Math.toRadians(100);

    static SplineTube chute(AngleFrame frame) {
        Vector3D[] h = SurfaceMeshTest.helix(0.1, 0.05, 2, 48);
        return new SplineTube(h, SurfaceMeshTest.constant(h.length, BORE), Side.INSIDE, Vector3D.MINUS_K, -LIP, LIP, frame);
    }

    /** Worst angle error (rad) of the lips along the chute, from the patch margin R·Δθ. */
    static double worstLipError(SplineTube tube) {
        ContactGeometry g = new ContactGeometry();
        g.scratch = tube.newScratch();
        double worst = 0;
        int n = 400;
        for (int i = 1; i < n; i++) {
            double u = tube.length() * i / n;
            Vector3D t = tube.tangent(u);
            // the reference −z projected onto the cross-section, and t × r
            Vector3D r = Vector3D.MINUS_K.subtract(Vector3D.MINUS_K.dotProduct(t), t).normalize();
            Vector3D b = Vector3D.crossProduct(t, r);
            for (int side = -1; side <= 1; side += 2) {
                double th = side * LIP;
                Vector3D x = tube.centre(u).add(0.5 * BORE * Math.cos(th), r).add(0.5 * BORE * Math.sin(th), b);
                g.hintValid = false;
                tube.query(0, x.toArray(), g);
                if (tube.angleFrame() == AngleFrame.PROJECTED_REFERENCE) {
                    assertEquals(side < 0 ? "angle_from" : "angle_to", tube.edgeName(g.edge), "nearest edge at u = " + u);
                }
                worst = Math.max(worst, Math.abs(g.patchMargin) / BORE);
                double[] c = new double[2];
                g.hintValid = false;
                tube.coordinatesAt(0, x.toArray(), g, c);
                if (tube.angleFrame() == AngleFrame.PROJECTED_REFERENCE) {
                    assertEquals(th, c[1], 1e-9, "angle coordinate at u = " + u);
                }
            }
        }
        return worst;
    }

    @Test
    void lipsStayAtTheirAngleFromTheProjectedReference() {
        SplineTube tube = chute(AngleFrame.PROJECTED_REFERENCE);
        double worst = worstLipError(tube);
        assertTrue(worst <= 1e-9, "lip angle error " + worst + " rad");
        // the six-argument constructor measures the same way
        Vector3D[] h = SurfaceMeshTest.helix(0.1, 0.05, 2, 48);
        assertEquals(AngleFrame.PROJECTED_REFERENCE,
            new SplineTube(h, SurfaceMeshTest.constant(h.length, BORE), Side.INSIDE, Vector3D.MINUS_K, -LIP, LIP).angleFrame());
    }

    @Test
    void aRotationMinimisingFrameTwistsAgainstTheHelix() {
        // about 29° per turn on this helix (torsion × arc length), so the lips drift by tens of degrees
        double worst = worstLipError(chute(AngleFrame.ROTATION_MINIMISING));
        assertTrue(worst > Math.toRadians(20), "rotation-minimising lips drifted only " + Math.toDegrees(worst) + "°");
    }

    @Test
    void aReferenceAlongTheTangentIsRejected() {
        // a half circle in the xz-plane, symmetric about its middle point, where the tangent is +z
        Vector3D[] arc = new Vector3D[7];
        for (int i = 0; i < arc.length; i++) {
            double phi = Math.toRadians(-90 + 30 * i);
            arc[i] = new Vector3D(0.1 * Math.cos(phi), 0, 0.1 * Math.sin(phi));
        }
        double[] radii = SurfaceMeshTest.constant(arc.length, 0.01);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
            () -> new SplineTube(arc, radii, Side.INSIDE, Vector3D.MINUS_K, -1, 1));
        assertTrue(e.getMessage().contains("tangent") && e.getMessage().contains("rotation-minimising"), e.getMessage());
        // the rotation-minimising frame accepts it (only the first tangent matters there)
        assertEquals(AngleFrame.ROTATION_MINIMISING,
            new SplineTube(arc, radii, Side.INSIDE, Vector3D.MINUS_K, -1, 1, AngleFrame.ROTATION_MINIMISING).angleFrame());
    }
}
