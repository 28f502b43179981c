package org.trundle.core.check;

import java.util.List;
import java.util.stream.IntStream;
import java.util.stream.Stream;

/**
 * Makes property cases from a seed and an index alone, so that any case can be rebuilt from the
 * two numbers its description shows. {@link CaseRecipe} builds one from samplers; a lambda serves
 * for hand-made ones.
 */
@FunctionalInterface
public interface CaseSource {
    /**
     * @param seed the seed
     * @param index the index, ≥ 0
     * @return case {@code index} of the run seeded with {@code seed}
     */
    PropertyCase make(long seed, int index);

    /**
     * @param seed the seed
     * @param count number of cases, ≥ 0
     * @return cases 0 … count−1, made lazily
     */
    default Stream<PropertyCase> stream(long seed, int count) {
        if (count < 0) {
            throw new IllegalArgumentException("case count must not be negative, got " + count);
        }
        return IntStream.range(0, count).mapToObj(i -> make(seed, i));
    }

    /**
     * @param seed the seed
     * @param count number of cases
     * @return cases 0 … count−1
     */
    default List<PropertyCase> list(long seed, int count) {
        return stream(seed, count).toList();
    }
}
