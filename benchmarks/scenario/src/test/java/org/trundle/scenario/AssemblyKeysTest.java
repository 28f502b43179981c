package org.trundle.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.WallLoads;
import org.trundle.core.ContactGeometry;
import org.trundle.core.MotionState;
import org.trundle.core.Patch;
import org.trundle.core.Simulation;

/**
 * The assembly surface types ({@code v_groove}, {@code rails}, {@code bearing_races}) expand into ordinary
 * patches with ids, placed where the textbook geometry puts them (common practice): a ball resting in a V of
 * half-angle γ has its centre {@code r / sin γ} above the apex and touches both walls; a ball on rails of radius ρ
 * with axes S apart rests at height {@code √((r + ρ)² − S²/4)} above the midpoint; a ball on a bearing's pitch
 * circle touches the inner groove bottom at radius {@code (d_m − D)/2} and the outer at {@code (d_m + D)/2}. Each
 * resting centre is at distance r from every part, to 1e-12 m (closed forms).
 */
class AssemblyKeysTest {
    private static final String BALL = "\"ball\": {\"radius\": 0.004, \"mass\": 0.0021},\n";
    private static final String REST = "\"contact\": {\"law\": \"rolling\"},\n"
        + "\"start\": {\"position\": [%s], \"velocity\": [0, 0, 0], \"spin\": [0, 0, 0]},\n"
        + "\"run\": {\"duration\": 0.01}\n";

    private static Scenario scenario(String surface, String start) {
        return ScenarioParsingTest.parse("{\n" + BALL + surface + ",\n" + String.format(REST, start) + "}");
    }

    private static double distance(Patch p, Vector3D x) {
        ContactGeometry g = new ContactGeometry();
        g.scratch = p.surface().newScratch();
        MotionState pose = new MotionState();
        p.motion().at(0.0, pose);
        pose.query(p.surface(), 0.0, x.toArray(), g);
        return g.distance;
    }

    @Test
    void vGrooveExpandsIntoLeftAndRightWallsThatHoldARestingBall() {
        double gamma = Math.toRadians(30);   // 60 degree groove
        double slope = Math.toRadians(10);
        Vector3D a = new Vector3D(Math.cos(slope), 0, -Math.sin(slope));
        Vector3D b = new Vector3D(Math.sin(slope), 0, Math.cos(slope));
        Vector3D centre = new Vector3D(0.05, a, 0.004 / Math.sin(gamma), b);
        Scenario s = scenario("\"surface\": {\"type\": \"v_groove\", \"included_angle_deg\": 60, \"slope_deg\": 10,"
            + " \"length\": 0.2, \"wall_width\": 0.02}", "0.1, 0, 0.1");
        List<Patch> patches = s.simulation().patches();
        assertEquals(List.of("left", "right"), patches.stream().map(Patch::id).toList());
        for (Patch p : patches) {
            assertEquals(0.004, distance(p, centre), 1e-12, p.id());
        }
        // left is on +y looking down the groove (x forward, z up)
        ContactGeometry g = new ContactGeometry();
        g.scratch = patches.get(0).surface().newScratch();
        patches.get(0).surface().query(0, centre.toArray(), g);
        assertTrue(g.point[1] > 0, "left wall's contact at +y");
        assertEquals(List.of("apex", "rim", "axial_from", "axial_to"), SweepSpec.edgeNames(patches.get(0).surface()));
    }

    @Test
    void railsExpandIntoTwoRailsThatHoldARestingBall() {
        double h = Math.sqrt(Math.pow(0.004 + 0.003, 2) - 0.010 * 0.010 / 4);
        Scenario s = scenario("\"surface\": {\"type\": \"rails\", \"spacing\": 0.010, \"rail_radius\": 0.003,"
            + " \"origin\": [0, 0, 0.1], \"axis\": [0, 1, 0], \"up\": [0, 0, 1], \"length\": 0.5}", "0, 0.1, 0.2");
        List<Patch> patches = s.simulation().patches();
        assertEquals(List.of("left", "right"), patches.stream().map(Patch::id).toList());
        Vector3D centre = new Vector3D(0, 0.2, 0.1 + h);
        for (Patch p : patches) {
            assertEquals(0.004, distance(p, centre), 1e-12, p.id());
        }
        ScenarioException e = assertThrows(ScenarioException.class, () -> scenario("\"surface\": {\"type\": \"rails\","
            + " \"spacing\": 0.016, \"rail_radius\": 0.003}", "0, 0, 0.1"));
        assertTrue(e.getMessage().contains("surface.spacing = 0.016 m lets a ball of radius 0.004 m fall between rails"),
            e.getMessage());
    }

    @Test
    void bearingRacesExpandIntoInnerAndOuterRacesTurningAtTheirRates() {
        double dm = 0.03;
        Scenario s = scenario("\"surface\": {\"type\": \"bearing_races\", \"axis\": [1, 0, 0], \"pitch_diameter\": 0.03,"
            + " \"inner_rate\": 12.5}", "0, 0, 0.015");
        List<Patch> patches = s.simulation().patches();
        assertEquals(List.of("inner", "outer"), patches.stream().map(Patch::id).toList());
        Vector3D onPitch = new Vector3D(0, 0, dm / 2);
        for (Patch p : patches) {
            assertEquals(0.004, distance(p, onPitch), 1e-12, p.id());
        }
        assertFalse(patches.get(0).motion().stationary());
        MotionState m = new MotionState();
        patches.get(0).motion().at(0.4, m);
        assertEquals(12.5, m.spin[0], 0.0);
        assertTrue(patches.get(1).motion().stationary());
        ContactGeometry g = new ContactGeometry();
        g.scratch = patches.get(0).surface().newScratch();
        patches.get(0).surface().query(0, onPitch.toArray(), g);
        assertEquals((dm - 0.008) / 2, g.point[2], 1e-12, "inner groove bottom at (d_m - D)/2");
        g.scratch = patches.get(1).surface().newScratch();
        patches.get(1).surface().query(0, onPitch.toArray(), g);
        assertEquals((dm + 0.008) / 2, g.point[2], 1e-12, "outer groove bottom at (d_m + D)/2");
    }

    @Test
    void bearingClearanceGivesTheBallPlayTowardEachRace() {
        Scenario s = scenario("\"surface\": {\"type\": \"bearing_races\", \"axis\": [1, 0, 0], \"pitch_diameter\": 0.03,"
            + " \"clearance\": 2e-5}", "0, 0, 0.015");
        List<Patch> patches = s.simulation().patches();
        assertEquals(0.004, distance(patches.get(0), new Vector3D(0, 0, 0.015 - 5e-6)), 1e-12, "touching the inner race");
        assertEquals(0.004, distance(patches.get(1), new Vector3D(0, 0, 0.015 + 5e-6)), 1e-12, "touching the outer race");
        assertRefused("\"type\": \"bearing_races\", \"axis\": [1, 0, 0], \"pitch_diameter\": 0.03, \"clearance\": 0.01",
            "surface.clearance must be below the ball's diameter 0.008 m, got 0.01");
    }

    @Test
    void anEntryOfSurfacesPrefixesItsPartsAndSharesItsMaterial() {
        String json = "{\n\"ball\": {\"radius\": 0.004, \"mass\": 0.0021,"
            + " \"material\": {\"youngs_modulus\": 210e9, \"poisson_ratio\": 0.3}},\n"
            + "\"surfaces\": [{\"id\": \"feeder\", \"type\": \"v_groove\", \"included_angle_deg\": 90,"
            + " \"material\": {\"youngs_modulus\": 70e9, \"poisson_ratio\": 0.33}},\n"
            + " {\"id\": \"tray\", \"type\": \"plane\", \"origin\": [0, 0, -0.5], \"normal\": [0, 0, 1]}],\n"
            + String.format(REST, "0, 0, 0.1") + "}";
        Scenario s = ScenarioParsingTest.parse(json);
        assertEquals(List.of("feeder.left", "feeder.right", "tray"),
            s.simulation().patches().stream().map(Patch::id).toList());
        WallLoads w = s.wallLoads().orElseThrow();
        assertEquals(List.of("feeder.left", "feeder.right"), w.patches());
        ScenarioException twice = assertThrows(ScenarioException.class, () -> ScenarioParsingTest.parse(
            json.replace("\"id\": \"tray\"", "\"id\": \"feeder.left\"")));
        assertTrue(twice.getMessage().contains("gives the patch id \"feeder.left\" a second time"), twice.getMessage());
    }

    @Test
    void spinCreepInASceneUsesEachPatchsOwnMaterial() {
        String json = "{\n\"ball\": {\"radius\": 0.004, \"mass\": 0.0021,"
            + " \"material\": {\"youngs_modulus\": 210e9, \"poisson_ratio\": 0.3}},\n"
            + "\"surfaces\": [{\"id\": \"feeder\", \"type\": \"v_groove\", \"included_angle_deg\": 90,"
            + " \"material\": {\"youngs_modulus\": 70e9, \"poisson_ratio\": 0.33}},\n"
            + " {\"id\": \"tray\", \"type\": \"plane\", \"origin\": [0, 0, -0.5], \"normal\": [0, 0, 1],"
            + " \"material\": {\"youngs_modulus\": 3e9, \"poisson_ratio\": 0.37}}],\n"
            + String.format(REST, "0, 0, 0.1").replace("\"law\": \"rolling\"", "\"law\": \"rolling\", \"spin_creep\": true")
            + "}";
        List<Patch> patches = ScenarioParsingTest.parse(json).simulation().patches();
        assertTrue(patches.get(0).law().name().contains("wall Material[E=7.0E10 Pa"), patches.get(0).law().name());
        assertTrue(patches.get(1).law().name().contains("wall Material[E=7.0E10 Pa"), patches.get(1).law().name());
        assertTrue(patches.get(2).law().name().contains("wall Material[E=3.0E9 Pa"), patches.get(2).law().name());
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioParsingTest.parse(json.replace(
            ", \"material\": {\"youngs_modulus\": 3e9, \"poisson_ratio\": 0.37}}", "}")));
        assertTrue(e.getMessage().contains("needs ball.material and the material of every patch without a contact of its"
            + " own; patch \"tray\" has none"), e.getMessage());
    }

    @Test
    void badValuesAreRefusedNamingKeyAndValue() {
        assertRefused("\"type\": \"v_groove\", \"included_angle_deg\": 180",
            "surface.included_angle_deg must lie in (0, 180) degrees, got 180");
        assertRefused("\"type\": \"v_groove\", \"included_angle_deg\": 90, \"slope_deg\": 90",
            "surface.slope_deg must lie in (-90, 90) degrees, got 90");
        assertRefused("\"type\": \"v_groove\", \"included_angle_deg\": 90, \"slope_deg\": 5, \"axis\": [1, 0, 0]",
            "give either surface.slope_deg or surface.axis with surface.up, not both");
        assertRefused("\"type\": \"rails\", \"spacing\": 0.01, \"rail_radius\": -1",
            "surface.rail_radius must be positive");
        assertRefused("\"type\": \"bearing_races\", \"axis\": [1, 0, 0], \"pitch_diameter\": 0.015",
            "surface.pitch_diameter must exceed twice the ball's diameter 0.008 m (the inner ring needs a bore), got 0.015");
        assertRefused("\"type\": \"bearing_races\", \"axis\": [1, 0, 0], \"pitch_diameter\": 0.03, \"outer_conformity\": 0.5",
            "surface.outer_conformity must lie in (0.5, 1) (groove radius over ball diameter), got 0.5");
        assertRefused("\"type\": \"bearing_races\", \"axis\": [1, 0, 0], \"pitch_diameter\": 0.03,"
            + " \"motion\": {\"type\": \"translation\", \"velocity\": [1, 0, 0]}",
            "surface.motion: a bearing's races turn by inner_rate and outer_rate");
        assertRefused("\"type\": \"grove\"", "\"v_groove\", \"rails\", \"bearing_races\"");
    }

    private static void assertRefused(String surfaceKeys, String message) {
        ScenarioException e = assertThrows(ScenarioException.class,
            () -> scenario("\"surface\": {" + surfaceKeys + "}", "0, 0, 0.1"));
        assertTrue(e.getMessage().contains(message), e.getMessage());
    }
}
