/**
 * JUnit 5 integration of the property-testing kit {@link org.trundle.core.check}: argument streams
 * ready for {@code @MethodSource}, the {@link org.trundle.core.check.junit.KitCases} annotation for
 * {@code @ParameterizedTest}s, and {@link org.trundle.core.check.junit.PropertyAssertions}, which
 * minimise a failing case before reporting it.
 *
 * <p>Published as the {@code tests} jar of {@code trundle-core} (dependency type
 * {@code test-jar}); it needs {@code junit-jupiter-api} and {@code junit-jupiter-params} on the
 * user's test classpath and brings nothing else.
 */
package org.trundle.core.check.junit;
