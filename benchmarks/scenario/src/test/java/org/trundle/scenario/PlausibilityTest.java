package org.trundle.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * Each plausibility warning fires for the slip it is meant for and not for the demo's SI values
 * (thresholds in {@link Plausibility}: common practice, from memory).
 */
class PlausibilityTest {
    private static List<String> warnings(String... fromTo) {
        String s = ScenarioFiles.demoText();
        for (int i = 0; i < fromTo.length; i += 2) {
            assertTrue(s.contains(fromTo[i]), fromTo[i]);
            s = s.replace(fromTo[i], fromTo[i + 1]);
        }
        return Scenario.parse(ScenarioFiles.parse(s)).warnings();
    }

    @Test
    void theDemoHasNone() {
        assertEquals(List.of(), warnings());
    }

    @Test
    void gramsAsKilogramsAreTooDense() {
        // a 4 mm radius ball of 2.1 kg: 7.8e6 kg/m^3, 340 times osmium
        List<String> w = warnings("\"mass\": 0.0021", "\"mass\": 2.1");
        assertEquals(1, w.size(), w.toString());
        assertTrue(w.get(0).startsWith("ball: mass 2.1 kg and radius 0.004 m give a mean density of 7.83e+06 kg/m^3"),
            w.get(0));
    }

    @Test
    void resistanceLengthsOfSeveralRadiiAreWarned() {
        List<String> w = warnings("\"rolling_resistance\": 0.0", "\"rolling_resistance\": 0.004",
            "\"pivoting_resistance\": 0.0", "\"pivoting_resistance\": 0.001");
        assertEquals(List.of("contact.rolling_resistance = 0.004 m is 1.00 ball radii; resistance lengths are usually a few"
            + " hundredths of the radius at most" + Plausibility.SI), w);
    }

    @Test
    void aBoreInMillimetresForABallInMetresIsWarned() {
        List<String> w = warnings("\"radius\": 0.015", "\"radius\": 15", "[0.011, 0, -0.002]", "[14.996, 0, -0.002]");
        assertEquals(List.of("surface: a length of 15.0 m is 3.75e+03 times the ball radius 0.004 m; are the lengths in"
            + " one unit?" + Plausibility.SI), w);
    }

    @Test
    void gravityInMillimetresPerSecondSquaredIsWarnedAndZeroIsNot() {
        assertEquals(List.of("gravity: |g| = 9810.0 m/s^2 is outside 0.5 to 100 m/s^2 (Earth 9.81)" + Plausibility.SI),
            warnings("[0, 0, -9.81]", "[0, 0, -9810]"));
        assertEquals(List.of(), warnings("[0, 0, -9.81]", "[0, 0, 0]"));
    }
}
