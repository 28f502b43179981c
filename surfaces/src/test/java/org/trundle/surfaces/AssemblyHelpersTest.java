package org.trundle.surfaces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Surface;

/**
 * The assembly helpers (V-groove, rails, bearing races): a ball placed where the helper says touches both
 * patches ({@code d = r}), with the contact points and rolling radius the helper's formulas give, derived
 * independently here from the contact points the surfaces report.
 */
class AssemblyHelpersTest {
    private static final double R = 0.005;

    @Test
    void ballInAVGrooveTouchesBothWallsAndRollsAtRSinGamma() {
        VGroove v = new VGroove(new Vector3D(0.1, -0.2, 0.3), new Vector3D(1, 1, 0), new Vector3D(0, 0, 2),
            Math.toRadians(60));
        Vector3D c = v.restingCentre(R, 0.04);
        assertTouchesBoth(v.plusWall(), v.minusWall(), c, v.axis(), v.rollingRadius(R));
        assertEquals(R * 0.5, v.rollingRadius(R), 1e-15);
    }

    @Test
    void ballOnRailsTouchesBothAndRollsAtTheTextbookRadius() {
        Rails rails = new Rails(new Vector3D(0, 0, 0), new Vector3D(0, 1, 0), new Vector3D(0, 0, 1), 0.008, 0.004);
        Vector3D c = rails.restingCentre(R, -0.3);
        double d = rails.contactSpacing(R);
        assertEquals(Math.sqrt(R * R - d * d / 4), rails.rollingRadius(R), 1e-15);
        assertTouchesBoth(rails.plusRail(), rails.minusRail(), c, rails.axis(), rails.rollingRadius(R));
        assertThrows(IllegalArgumentException.class, () -> rails.restingCentre(0.001, 0));
    }

    @Test
    void ballOnThePitchCircleTouchesBothRacesAtTheGrooveBottoms() {
        double dm = 0.04;
        double dBall = 2 * R;
        BearingRaces b = new BearingRaces(Vector3D.ZERO, Vector3D.PLUS_K, dm, dBall, 0.52, 0.53);
        Vector3D c = b.ballCentre(new Vector3D(1, 1, 0));
        ContactGeometry gi = query(b.innerRace(), c);
        ContactGeometry go = query(b.outerRace(), c);
        assertEquals(R, gi.distance, 1e-15);
        assertEquals(R, go.distance, 1e-15);
        // groove bottoms at radii (dm - D)/2 and (dm + D)/2
        assertEquals((dm - dBall) / 2, Math.hypot(gi.point[0], gi.point[1]), 1e-15);
        assertEquals((dm + dBall) / 2, Math.hypot(go.point[0], go.point[1]), 1e-15);
        // groove curvatures: concave 1/(f D) across the groove on both rings (Trundle's sign convention)
        assertEquals(1 / (0.52 * dBall), Math.max(gi.curvature1, gi.curvature2), 1e-9);
        assertEquals(1 / (0.53 * dBall), Math.max(go.curvature1, go.curvature2), 1e-9);
        // cage speed with the outer ring still: ½ ω_i (1 − D/d_m)
        assertEquals(0.5 * 100 * (1 - dBall / dm), b.cageSpeed(100, 0), 1e-12);
    }

    /**
     * Diametral clearance P_d (common practice: outer groove bottom diameter − inner groove bottom diameter − 2 D):
     * the groove bottoms move to (d_m − D)/2 − P_d/4 and (d_m + D)/2 + P_d/4, and a ball on the pitch circle has
     * P_d/4 of play toward each race.
     */
    @Test
    void clearanceOpensTheGrooveBottomsSymmetricallyAboutThePitchCircle() {
        double dm = 0.04;
        double dBall = 2 * R;
        double pd = 2e-5;
        BearingRaces b = new BearingRaces(Vector3D.ZERO, Vector3D.PLUS_K, dm, dBall, 0.52, 0.53, pd);
        Vector3D c = b.ballCentre(Vector3D.PLUS_I);
        ContactGeometry gi = query(b.innerRace(), c);
        ContactGeometry go = query(b.outerRace(), c);
        assertEquals(R + pd / 4, gi.distance, 1e-15);
        assertEquals(R + pd / 4, go.distance, 1e-15);
        double outerBottom = Math.hypot(go.point[0], go.point[1]);
        double innerBottom = Math.hypot(gi.point[0], gi.point[1]);
        assertEquals(pd, 2 * outerBottom - 2 * innerBottom - 2 * dBall, 1e-15);
        assertEquals(pd, b.clearance(), 0.0);
        assertThrows(IllegalArgumentException.class,
            () -> new BearingRaces(Vector3D.ZERO, Vector3D.PLUS_K, dm, dBall, 0.52, 0.53, -1e-6));
    }

    /** Both surfaces at distance r, and the chord through the two contact points at distance r_e from the centre. */
    private static void assertTouchesBoth(Surface s1, Surface s2, Vector3D c, Vector3D axis, double re) {
        ContactGeometry g1 = query(s1, c);
        ContactGeometry g2 = query(s2, c);
        assertEquals(R, g1.distance, 1e-15);
        assertEquals(R, g2.distance, 1e-15);
        Vector3D p1 = new Vector3D(g1.point[0], g1.point[1], g1.point[2]);
        Vector3D p2 = new Vector3D(g2.point[0], g2.point[1], g2.point[2]);
        Vector3D chord = p2.subtract(p1);
        // the chord is perpendicular to the rolling direction; distance from the centre to the chord line
        assertEquals(0, chord.normalize().dotProduct(axis.normalize()), 1e-12);
        Vector3D m = c.subtract(p1);
        Vector3D u = chord.normalize();
        double dist = m.subtract(u.scalarMultiply(m.dotProduct(u))).getNorm();
        assertEquals(re, dist, 1e-15);
    }

    private static ContactGeometry query(Surface s, Vector3D c) {
        ContactGeometry g = new ContactGeometry();
        g.scratch = s.newScratch();
        s.query(0, c.toArray(), g);
        return g;
    }
}
