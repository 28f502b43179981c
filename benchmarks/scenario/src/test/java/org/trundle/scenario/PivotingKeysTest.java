package org.trundle.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.trundle.contact.BandedPivoting;
import org.trundle.contact.PivotingResistance;
import org.trundle.contact.PureRolling;
import org.trundle.contact.SpinCreepPivoting;
import org.trundle.core.Material;

/**
 * The pivoting keys of the {@code contact} section: {@code pivoting_resistance} (δp, m),
 * {@code pivoting_damping} (c_v, N·m·s) and {@code spin_creep}, each alone and together, build the
 * law they name (compared by the laws' own names, built directly), and their misuses are refused
 * with a message naming the key and the value.
 */
class PivotingKeysTest {
    private static final String STEEL = "{\"youngs_modulus\": 2.1e11, \"poisson_ratio\": 0.3}";
    private static final String ACRYLIC = "{\"youngs_modulus\": 3.0e9, \"poisson_ratio\": 0.37}";

    /** A ball in a horizontal tube with the given contact keys (after the law) and material keys. */
    static String tube(String contactKeys, String ballMaterial, String wallMaterial) {
        return "{\"ball\": {\"radius\": 0.004, \"mass\": 0.0021"
            + (ballMaterial == null ? "" : ", \"material\": " + ballMaterial) + "},"
            + " \"surface\": {\"type\": \"cylinder\", \"origin\": [0, 0, 0], \"axis\": [1, 0, 0], \"radius\": 0.015,"
            + " \"side\": \"inside\"" + (wallMaterial == null ? "" : ", \"material\": " + wallMaterial) + "},"
            + " \"contact\": {\"law\": \"rolling\"" + contactKeys + "},"
            + " \"start\": {\"position\": [0, 0, -0.011], \"velocity\": [0.01, 0.5, 0], \"spin\": \"rolling\"},"
            + " \"run\": {\"duration\": 0.1}}";
    }

    static String lawName(String json) {
        return ScenarioParsingTest.parse(json).simulation().law().name();
    }

    @Test
    void eachKeyAloneAndTogetherBuildsItsLaw() {
        String rolling = new PureRolling().name() + " + ";
        assertEquals(rolling + new PivotingResistance(2e-6).name(),
            lawName(tube(", \"pivoting_resistance\": 2e-6", null, null)));
        assertEquals(rolling + BandedPivoting.viscous(3e-9).name(),
            lawName(tube(", \"pivoting_damping\": 3e-9", null, null)));
        assertEquals(rolling + BandedPivoting.banded(3e-9, 2e-6).name(),
            lawName(tube(", \"pivoting_damping\": 3e-9, \"pivoting_resistance\": 2e-6", null, null)));
        assertEquals(new PureRolling().name(), lawName(tube(", \"pivoting_damping\": 0, \"spin_creep\": false",
            null, null)));
        assertEquals(rolling + new SpinCreepPivoting(Material.of(2.1e11, 0.3), Material.of(3.0e9, 0.37),
                Double.POSITIVE_INFINITY).name(),
            lawName(tube(", \"spin_creep\": true", STEEL, ACRYLIC)));
        assertEquals(rolling + new SpinCreepPivoting(Material.of(2.1e11, 0.3), Material.of(3.0e9, 0.37), 2e-6).name(),
            lawName(tube(", \"spin_creep\": true, \"pivoting_resistance\": 2e-6", STEEL, ACRYLIC)));
    }

    @Test
    void coulombLawTakesThePivotingKeysToo() {
        String json = tube(", \"pivoting_damping\": 3e-9", null, null)
            .replace("\"law\": \"rolling\"", "\"law\": \"coulomb\", \"static_friction\": 0.4, \"kinetic_friction\": 0.3");
        assertTrue(lawName(json).endsWith(" + " + BandedPivoting.viscous(3e-9).name()), lawName(json));
    }

    @Test
    void misusesAreRefusedNamingTheKey() {
        ScenarioException noMaterials = assertThrows(ScenarioException.class,
            () -> lawName(tube(", \"spin_creep\": true", null, null)));
        assertTrue(noMaterials.getMessage().contains("contact.spin_creep = true needs ball.material and"
            + " surface.material"), noMaterials.getMessage());
        ScenarioException oneMaterial = assertThrows(ScenarioException.class,
            () -> lawName(tube(", \"spin_creep\": true", STEEL, null)));
        assertTrue(oneMaterial.getMessage().contains("contact.spin_creep need both); surface.material is missing"),
            oneMaterial.getMessage());
        ScenarioException both = assertThrows(ScenarioException.class,
            () -> lawName(tube(", \"spin_creep\": true, \"pivoting_damping\": 1e-9", STEEL, ACRYLIC)));
        assertTrue(both.getMessage().contains("leave out contact.pivoting_damping = 1.0E-9"), both.getMessage());
        ScenarioException negative = assertThrows(ScenarioException.class,
            () -> lawName(tube(", \"pivoting_damping\": -1e-9", null, null)));
        assertTrue(negative.getMessage().contains("contact.pivoting_damping") && negative.getMessage().contains("-1.0E-9"),
            negative.getMessage());
        ScenarioException notBool = assertThrows(ScenarioException.class,
            () -> lawName(tube(", \"spin_creep\": \"yes\"", STEEL, ACRYLIC)));
        assertTrue(notBool.getMessage().contains("contact.spin_creep"), notBool.getMessage());
    }
}
