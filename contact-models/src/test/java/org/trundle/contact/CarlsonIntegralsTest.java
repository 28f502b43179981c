package org.trundle.contact;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import org.hipparchus.special.elliptic.carlson.CarlsonEllipticIntegral;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The allocation-free Carlson integrals against a general-purpose reference library (Hipparchus'
 * {@code CarlsonEllipticIntegral}) over seeded arguments spanning the Hertz solution's range (one argument 0, the
 * others from 1e-24 to 1), and against closed forms: {@code R_F(0, 1, 1) = π/2}, {@code R_D(0, 1, 1) = 3π/4}
 * (complete integrals of a circle, DLMF 19.20.1 and 19.20.18 with K(0) = E(0) = π/2). Tolerance 4e-15 relative: both
 * truncate the same series at about 1e-16 and add round-off over at most about 30 duplication steps.
 */
class CarlsonIntegralsTest {
    static Stream<Arguments> arguments() {
        SplittableRandom rnd = new SplittableRandom(2026);
        return IntStream.range(0, 200).mapToObj(i -> {
            double m = Math.pow(10, -24 * rnd.nextDouble());
            double y = rnd.nextBoolean() ? m : 1.0;
            double z = y == 1.0 ? m : 1.0;
            double x = rnd.nextInt(4) == 0 ? rnd.nextDouble() : 0.0;
            return Arguments.of(x, y, z);
        });
    }

    @ParameterizedTest
    @MethodSource("arguments")
    void matchesTheReferenceLibrary(double x, double y, double z) {
        double f = CarlsonEllipticIntegral.rF(x, y, z);
        double d = CarlsonEllipticIntegral.rD(x, y, z);
        assertEquals(f, CarlsonIntegrals.rF(x, y, z), 4e-15 * f, "R_F");
        assertEquals(d, CarlsonIntegrals.rD(x, y, z), 4e-15 * d, "R_D");
    }

    @Test
    void circleValues() {
        assertEquals(Math.PI / 2, CarlsonIntegrals.rF(0, 1, 1), 4e-16 * Math.PI);
        assertEquals(3 * Math.PI / 4, CarlsonIntegrals.rD(0, 1, 1), 4e-16 * 3 * Math.PI);
    }
}
