package org.trundle.core;

import org.trundle.core.internal.Checks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.stream.Stream;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * {@link Checks#direction}: normalising with scaling gives the unit vector for directions of any
 * finite size (the expected values are exact: each input is a power-of-two or decimal multiple of
 * a vector whose unit vector is known in closed form), and only true zeros and non-finite values
 * are rejected.
 */
class ChecksTest {
    static Stream<Arguments> directions() {
        double s = 1 / Math.sqrt(3);
        return Stream.of(
            Arguments.of(new Vector3D(0, 0, 1e200), new Vector3D(0, 0, 1)),
            Arguments.of(new Vector3D(1e300, -1e300, 1e300), new Vector3D(s, -s, s)),
            Arguments.of(new Vector3D(Double.MAX_VALUE, Double.MAX_VALUE, 0), new Vector3D(Math.sqrt(0.5), Math.sqrt(0.5), 0)),
            Arguments.of(new Vector3D(1e-160, 1e-160, 1e-160), new Vector3D(s, s, s)),
            Arguments.of(new Vector3D(0, -1e-154, 0), new Vector3D(0, -1, 0)),
            Arguments.of(new Vector3D(Double.MIN_VALUE, 0, 0), new Vector3D(1, 0, 0)),
            Arguments.of(new Vector3D(3e-320, 4e-320, 0), new Vector3D(0.6, 0.8, 0)),
            Arguments.of(new Vector3D(3, 0, -4), new Vector3D(0.6, 0, -0.8)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("directions")
    void normalisesAnyFiniteNonZeroVector(Vector3D v, Vector3D unit) {
        Vector3D u = Checks.direction("axis", v);
        // subnormal inputs carry few significant bits: 3e-320 has about 12, so 1e-3 there
        double tol = Math.abs(v.getX()) + Math.abs(v.getY()) + Math.abs(v.getZ()) < 1e-300 ? 1e-3 : 1e-15;
        assertEquals(0.0, u.subtract(unit).getNorm(), tol, "unit vector of " + v);
        assertEquals(1.0, u.getNorm(), 1e-15);
    }

    static Stream<Arguments> rejected() {
        return Stream.of(
            Arguments.of(Vector3D.ZERO, "non-zero"),
            Arguments.of(new Vector3D(-0.0, 0.0, -0.0), "non-zero"),
            Arguments.of(new Vector3D(Double.NaN, 0, 1), "finite"),
            Arguments.of(new Vector3D(0, Double.POSITIVE_INFINITY, 1), "finite"),
            Arguments.of(new Vector3D(Double.NEGATIVE_INFINITY, 0, 0), "finite"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("rejected")
    void rejectsOnlyZerosAndNonFiniteValues(Vector3D v, String why) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Checks.direction("axis", v));
        assertTrue(e.getMessage().startsWith("axis must") && e.getMessage().contains(why), e.getMessage());
    }
}
