package org.trundle.scenario;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.trundle.core.Patch;

/**
 * {@code contact.compliant} per patch: an entry of {@code surfaces} with its own {@code contact.compliant} is compliant
 * (every part of an assembly), the scenario's {@code contact.compliant} in a scene makes every patch without a contact
 * of its own compliant, the rest stay rigid; each needs {@code ball.material} and the entry's {@code material}.
 */
class CompliantKeysTest {
    private static final String BALL = "\"ball\": {\"radius\": 0.004, \"mass\": 0.0021,"
        + " \"material\": {\"youngs_modulus\": 210e9, \"poisson_ratio\": 0.3}}";
    private static final String POLYMER = "\"material\": {\"youngs_modulus\": 2.8e9, \"poisson_ratio\": 0.35}";
    private static final String TAIL = "\"start\": {\"position\": [0, 0, 0.05], \"velocity\": [0, 0, 0],"
        + " \"spin\": [0, 0, 0]}, \"run\": {\"duration\": 0.1}}";

    private static List<Patch> patches(String json) {
        return Scenario.parse(ScenarioFiles.parse(json)).simulation().patches();
    }

    @Test
    void anEntryOwnCompliantContactMakesItsPatchesCompliant() {
        String json = "{" + BALL + ", \"surfaces\": ["
            + "{\"id\": \"floor\", \"type\": \"plane\", \"origin\": [0, 0, -1], \"normal\": [0, 0, 1]},"
            + "{\"id\": \"liner\", \"type\": \"v_groove\", \"included_angle_deg\": 90, " + POLYMER + ","
            + " \"contact\": {\"law\": \"coulomb\", \"static_friction\": 0.3, \"kinetic_friction\": 0.3,"
            + " \"restitution\": 0.6, \"compliant\": true}}],"
            + " \"contact\": {\"law\": \"coulomb\", \"static_friction\": 0.3, \"kinetic_friction\": 0.3}, " + TAIL;
        List<Patch> ps = patches(json);
        assertNull(ps.get(0).compliance(), "floor stays rigid");
        assertNotNull(ps.get(1).compliance());
        assertSame(ps.get(1).compliance(), ps.get(2).compliance(), "both walls of the groove");
        assertTrue(ps.get(1).compliance().toString().contains("Hertz"), ps.get(1).compliance().toString());
    }

    @Test
    void theScenarioCompliantContactCoversThePatchesWithoutTheirOwn() {
        String json = "{" + BALL + ", \"surfaces\": ["
            + "{\"id\": \"soft\", \"type\": \"plane\", \"origin\": [0, 0, 0], \"normal\": [0, 0, 1], " + POLYMER + "},"
            + "{\"id\": \"hard\", \"type\": \"plane\", \"origin\": [1, 0, 0], \"normal\": [-1, 0, 0], " + POLYMER + ","
            + " \"contact\": {\"law\": \"coulomb\", \"static_friction\": 0.3, \"kinetic_friction\": 0.3}}],"
            + " \"contact\": {\"law\": \"coulomb\", \"static_friction\": 0.3, \"kinetic_friction\": 0.3,"
            + " \"restitution\": 0.7, \"compliant\": true}, " + TAIL;
        List<Patch> ps = patches(json);
        assertNotNull(ps.get(0).compliance());
        assertNull(ps.get(1).compliance(), "a patch with its own contact decides for itself");
    }

    @Test
    void missingMaterialsAndLowRestitutionAreNamed() {
        String noWallMaterial = "{" + BALL + ", \"surfaces\": ["
            + "{\"id\": \"liner\", \"type\": \"plane\", \"origin\": [0, 0, 0], \"normal\": [0, 0, 1],"
            + " \"contact\": {\"law\": \"coulomb\", \"static_friction\": 0.3, \"kinetic_friction\": 0.3,"
            + " \"restitution\": 0.6, \"compliant\": true}},"
            + "{\"id\": \"floor\", \"type\": \"plane\", \"origin\": [0, 0, -1], \"normal\": [0, 0, 1], " + POLYMER + "}],"
            + " \"contact\": {\"law\": \"coulomb\", \"static_friction\": 0.3, \"kinetic_friction\": 0.3}, " + TAIL;
        ScenarioException a = assertThrows(ScenarioException.class, () -> patches(noWallMaterial));
        assertTrue(a.getMessage().contains("surfaces[0].contact.compliant needs ball.material and this entry's material"),
            a.getMessage());
        String low = noWallMaterial.replace("\"normal\": [0, 0, 1], \"contact\"", "\"normal\": [0, 0, 1], " + POLYMER + ", \"contact\"")
            .replace("\"restitution\": 0.6", "\"restitution\": 0.05");
        ScenarioException b = assertThrows(ScenarioException.class, () -> patches(low));
        assertTrue(b.getMessage().contains("surfaces[0].contact.compliant needs surfaces[0].contact.restitution of at"
            + " least 0.1"), b.getMessage());
        String sceneWide = "{" + BALL + ", \"surfaces\": ["
            + "{\"id\": \"bare\", \"type\": \"plane\", \"origin\": [0, 0, 0], \"normal\": [0, 0, 1]},"
            + "{\"id\": \"own\", \"type\": \"plane\", \"origin\": [1, 0, 0], \"normal\": [-1, 0, 0], " + POLYMER + ","
            + " \"contact\": {\"law\": \"coulomb\", \"static_friction\": 0.3, \"kinetic_friction\": 0.3}}],"
            + " \"contact\": {\"law\": \"coulomb\", \"static_friction\": 0.3, \"kinetic_friction\": 0.3,"
            + " \"restitution\": 0.7, \"compliant\": true}, " + TAIL;
        ScenarioException c = assertThrows(ScenarioException.class, () -> patches(sceneWide));
        assertTrue(c.getMessage().contains("patch \"bare\" has none"), c.getMessage());
    }
}
