/**
 * The property-testing kit: seeded samplers of balls, gravity, surfaces, laws and consistent
 * starts; invariant checks that run a {@link org.trundle.core.Simulation} and return a
 * {@link org.trundle.core.check.Verdict} with the worst deviation found (energy, budget,
 * constraint residuals, time reversibility, frame invariance, dimensional scaling, the rolling
 * integrals of symmetric surfaces); a {@link org.trundle.core.check.Minimiser} that walks a failing
 * case toward a simpler one; and the robustness {@link org.trundle.core.check.Robustness} probe
 * that classifies the outcome of hostile inputs.
 *
 * <p>Framework-neutral: nothing here depends on a test framework. The JUnit 5 integration
 * (argument streams, an {@code ArgumentsProvider}, assertions that minimise on failure) lives in
 * package {@code org.trundle.core.check.junit}, artifact {@code trundle-kit-junit}. This package is
 * the artifact {@code trundle-kit}.
 *
 * <p>Reproduction: every case is made by a {@link org.trundle.core.check.CaseSource} from a seed
 * and an index alone ({@link org.trundle.core.check.CaseSource#make(long, int)}), and describes
 * itself in one line ({@link org.trundle.core.check.PropertyCase#describe()}).
 */
package org.trundle.core.check;
