/**
 * JUnit 5 integration of the property-testing kit {@link org.trundle.core.check}: argument streams
 * ready for {@code @MethodSource}, the {@link org.trundle.core.check.junit.KitCases} annotation for
 * {@code @ParameterizedTest}s, and {@link org.trundle.core.check.junit.PropertyAssertions}, which
 * minimise a failing case before reporting it.
 *
 * <p>Published as the artifact {@code trundle-kit-junit} (a user adds it with test scope); it brings
 * {@code trundle-kit}, {@code junit-jupiter-api} and {@code junit-jupiter-params} and nothing else.
 */
package org.trundle.core.check.junit;
