package org.trundle.bench;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;

import org.junit.jupiter.api.Test;

/**
 * The four runs of {@link CompliantGrooveBenchmark} are what they claim (no timing here): its setup, which refuses to
 * measure unless each run meets its wall at the free-fall time and again at the projectile-motion time (the compliant
 * ones within their contact delay), passes.
 */
class CompliantGrooveBenchmarkTest {
    @Test
    void everyRunMeetsItsWallsWhenProjectileMotionSays() {
        assertDoesNotThrow(() -> new CompliantGrooveBenchmark.Runs().setUp());
    }
}
