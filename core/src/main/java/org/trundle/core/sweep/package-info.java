/**
 * Parameter sweeps over runs of a {@link org.trundle.core.Simulation}: grids and seeded random
 * samples over named numeric parameters ({@link org.trundle.core.sweep.ParameterSpace}), executed in
 * parallel with results streamed in index order and bit-identical on any thread count
 * ({@link org.trundle.core.sweep.Sweep}), and a bisection for the parameter value where an outcome
 * changes ({@link org.trundle.core.sweep.BoundarySearch}).
 */
package org.trundle.core.sweep;
