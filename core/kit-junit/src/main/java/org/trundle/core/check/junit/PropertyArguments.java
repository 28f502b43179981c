package org.trundle.core.check.junit;

import java.util.stream.Stream;

import org.junit.jupiter.api.Named;
import org.junit.jupiter.params.provider.Arguments;
import org.trundle.core.check.CaseSource;
import org.trundle.core.check.PropertyCase;

/**
 * Streams of property cases as JUnit 5 arguments, each named by its one-line description (seed
 * and index first), for {@code @MethodSource}:
 *
 * <pre>{@code
 * static Stream<Arguments> cases() {
 *     return PropertyArguments.of(MY_CASES, 42L, 30);
 * }
 *
 * @ParameterizedTest(name = "{0}")
 * @MethodSource("cases")
 * void energyIsConserved(PropertyCase c) {
 *     PropertyAssertions.assertHolds(c, Invariants.energyConserved(1e-8));
 * }
 * }</pre>
 */
public final class PropertyArguments {
    private PropertyArguments() {
    }

    /**
     * @param source the case source
     * @param seed the seed
     * @param count number of cases
     * @return one single-argument {@link Arguments} per case, named by the case's description
     */
    public static Stream<Arguments> of(CaseSource source, long seed, int count) {
        return source.stream(seed, count).map(PropertyArguments::named);
    }

    /**
     * @param c a case
     * @return it as a named single argument
     */
    public static Arguments named(PropertyCase c) {
        return Arguments.of(Named.of(c.describe(), c));
    }
}
