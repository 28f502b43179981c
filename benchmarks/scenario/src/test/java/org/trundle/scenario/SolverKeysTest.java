package org.trundle.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;
import org.trundle.core.Integrator;
import org.trundle.core.SolverSettings;

/** The {@code solver} section: the integration method, its fixed step and order, and clear errors for bad values. */
class SolverKeysTest {
    private static Scenario withSolver(String solver) {
        ObjectNode doc = (ObjectNode) ScenarioFiles.parse(ScenarioFiles.demoText());
        doc.set("solver", ScenarioFiles.parse(solver));
        return Scenario.parse(doc);
    }

    private static String error(String solver) {
        return assertThrows(ScenarioException.class, () -> withSolver(solver)).getMessage();
    }

    @Test
    void theSymmetricIntegratorWithItsStepAndOrder() {
        SolverSettings set = withSolver("{\"integrator\": \"symmetric\", \"step\": 5e-4, \"order\": 6}").simulation()
            .settings();
        assertEquals(Integrator.SYMMETRIC_PROJECTION, set.integrator());
        assertEquals(5e-4, set.fixedStep());
        assertEquals(6, set.symmetricOrder());
        SolverSettings dflt = withSolver("{\"integrator\": \"symmetric\"}").simulation().settings();
        assertEquals(1e-3, dflt.fixedStep());
        assertEquals(4, dflt.symmetricOrder());
        assertEquals(Integrator.DORMAND_PRINCE, Scenario.parse(ScenarioFiles.parse(ScenarioFiles.demoText()))
            .simulation().settings().integrator(), "without the section");
    }

    @Test
    void badValuesNameTheKeyAndTheValue() {
        assertTrue(error("{\"integrator\": \"leapfrog\"}").contains("\"leapfrog\""));
        assertTrue(error("{\"integrator\": \"symmetric\", \"step\": -1e-3}").contains("solver.step must be positive"));
        assertTrue(error("{\"integrator\": \"symmetric\", \"order\": 3}").contains("solver.order must be 2, 4 or 6, got 3"));
        assertTrue(error("{\"integrator\": \"dormand-prince\", \"step\": 1e-3}").contains("symmetric integrator only"));
        assertTrue(error("{\"integrator\": \"symmetric\", \"steps\": 1}").contains("steps"));
    }
}
