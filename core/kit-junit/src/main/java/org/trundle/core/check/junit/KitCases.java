package org.trundle.core.check.junit;

import java.lang.annotation.Documented;
import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;

import org.junit.jupiter.params.provider.ArgumentsSource;
import org.trundle.core.check.CaseSource;

/**
 * Supplies a {@code @ParameterizedTest} with the cases of a {@link CaseSource} class (which must
 * have a public or package-visible no-argument constructor):
 *
 * <pre>{@code
 * @ParameterizedTest(name = "{0}")
 * @KitCases(source = TroughCases.class, seed = 7, count = 30)
 * void budgetCloses(PropertyCase c) {
 *     PropertyAssertions.assertHolds(c, Invariants.budgetCloses(1e-8));
 * }
 * }</pre>
 */
@Target({ElementType.METHOD, ElementType.ANNOTATION_TYPE})
@Retention(RetentionPolicy.RUNTIME)
@Documented
@ArgumentsSource(KitCasesProvider.class)
public @interface KitCases {
    /** @return the case source class */
    Class<? extends CaseSource> source();

    /** @return the seed */
    long seed();

    /** @return number of cases */
    int count() default 30;
}
