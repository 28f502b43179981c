package org.trundle.core;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The settings groups: defaults, flat copies writing into the right group, checks naming parameter and value. */
class SolverSettingsTest {

    @Test
    void defaultsAreTheDocumentedValues() {
        SolverSettings s = SolverSettings.defaults();
        assertEquals(1e-10, s.tolerance());
        assertEquals(0.0, s.projectionThreshold());
        assertEquals(1e-10, s.effectiveProjectionThreshold());
        assertEquals(1e-3, s.maxCheckInterval());
        assertEquals(1e-12, s.eventTimeTolerance());
        assertEquals(1e-8, s.stickSpeedFraction());
        assertEquals(0.0, s.settleSpeed());
        assertEquals(1e-5, s.restSpeedFraction());
        assertEquals(1e-3, s.smoothingSpinFraction());
        assertEquals(1e-6, s.contactTolerance());
        assertEquals(0.0, s.sampleInterval());
        assertTrue(s.stopAtExit());
        assertEquals(20_000_000L, s.maxEvaluations());
        assertEquals(100_000, s.maxEvents());
    }

    @Test
    void eachFlatCopyChangesOneValueOfOneGroup() {
        SolverSettings d = SolverSettings.defaults();
        assertEquals(d.withIntegration(new IntegrationSettings(1e-8, 0.0)), d.withTolerance(1e-8));
        assertEquals(d.withIntegration(new IntegrationSettings(1e-10, 1e-7)), d.withProjectionThreshold(1e-7));
        assertEquals(d.withEvents(new EventSettings(2e-3, 1e-12)), d.withMaxCheckInterval(2e-3));
        assertEquals(d.withEvents(new EventSettings(1e-3, 1e-11)), d.withEventTimeTolerance(1e-11));
        assertEquals(d.withContact(new ContactThresholds(2e-8, 0.0, 1e-5, 1e-3, 1e-6)), d.withStickSpeedFraction(2e-8));
        assertEquals(d.withContact(new ContactThresholds(1e-8, 0.5, 1e-5, 1e-3, 1e-6)), d.withSettleSpeed(0.5));
        assertEquals(d.withContact(new ContactThresholds(1e-8, 0.0, 2e-5, 1e-3, 1e-6)), d.withRestSpeedFraction(2e-5));
        assertEquals(d.withContact(new ContactThresholds(1e-8, 0.0, 1e-5, 2e-3, 1e-6)), d.withSmoothingSpinFraction(2e-3));
        assertEquals(d.withContact(new ContactThresholds(1e-8, 0.0, 1e-5, 1e-3, 2e-6)), d.withContactTolerance(2e-6));
        assertEquals(d.withRun(new RunControl(0.01, true, 20_000_000L, 100_000)), d.withSampleInterval(0.01));
        assertEquals(d.withRun(new RunControl(0.0, false, 20_000_000L, 100_000)), d.withStopAtExit(false));
        assertEquals(d.withRun(new RunControl(0.0, true, 7L, 100_000)), d.withMaxEvaluations(7L));
        assertEquals(d.withRun(new RunControl(0.0, true, 20_000_000L, 9)), d.withMaxEvents(9));
        assertEquals(1e-7, d.withProjectionThreshold(1e-7).effectiveProjectionThreshold());
        assertEquals(d.withIntegration(new IntegrationSettings(1e-10, 0.0, Integrator.SYMMETRIC_PROJECTION, 1e-3, 4)),
                d.withIntegrator(Integrator.SYMMETRIC_PROJECTION));
        assertEquals(d.withIntegration(new IntegrationSettings(1e-10, 0.0, Integrator.DORMAND_PRINCE, 2e-4, 4)),
                d.withFixedStep(2e-4));
        assertEquals(d.withIntegration(new IntegrationSettings(1e-10, 0.0, Integrator.DORMAND_PRINCE, 1e-3, 6)),
                d.withSymmetricOrder(6));
        SolverSettings sym = d.withIntegrator(Integrator.SYMMETRIC_PROJECTION).withFixedStep(2e-4).withSymmetricOrder(2);
        assertEquals(sym.integration().withTolerance(1e-9), sym.withTolerance(1e-9).integration(),
                "the tolerance copy keeps the method, step and order");
        assertEquals(Integrator.DORMAND_PRINCE, d.integrator());
    }

    @Test
    void badValuesAreNamedWithTheirValue() {
        SolverSettings d = SolverSettings.defaults();
        assertMessage("tolerance must be finite and positive, got -1.0", () -> d.withTolerance(-1));
        assertMessage("tolerance must be below 1e-2, got 0.5", () -> d.withTolerance(0.5));
        assertMessage("projectionThreshold must be finite and not negative, got NaN", () -> d.withProjectionThreshold(Double.NaN));
        assertMessage("maxCheckInterval must be finite and positive, got 0.0", () -> d.withMaxCheckInterval(0));
        assertMessage("eventTimeTolerance must be finite and positive, got Infinity",
                () -> d.withEventTimeTolerance(Double.POSITIVE_INFINITY));
        assertMessage("settleSpeed must be finite and not negative, got -0.1", () -> d.withSettleSpeed(-0.1));
        assertMessage("contactTolerance must be finite and positive, got 0.0", () -> d.withContactTolerance(0));
        assertMessage("sampleInterval must be finite and not negative, got -2.0", () -> d.withSampleInterval(-2));
        assertMessage("maxEvaluations must be positive, got 0", () -> d.withMaxEvaluations(0));
        assertMessage("maxEvents must be positive, got -3", () -> d.withMaxEvents(-3));
        assertMessage("run must be given, got null", () -> d.withRun(null));
        assertMessage("fixedStep must be finite and positive, got -0.001", () -> d.withFixedStep(-1e-3));
        assertMessage("symmetricOrder must be 2, 4 or 6, got 3", () -> d.withSymmetricOrder(3));
        assertMessage("integrator must be given, got null", () -> d.withIntegrator(null));
        assertMessage("integrator must be \"dormand-prince\" or \"symmetric\", got \"leapfrog\"",
                () -> Integrator.ofLabel("leapfrog"));
    }

    private static void assertMessage(String expected, Runnable r) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, r::run);
        assertEquals(expected, e.getMessage());
    }
}
