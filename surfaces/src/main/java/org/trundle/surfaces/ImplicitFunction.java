package org.trundle.surfaces;

import org.hipparchus.CalculusFieldElement;

/**
 * A user's shape written once as an implicit function {@code f(x, y, z)} whose zero set is the
 * surface, generic over Hipparchus' {@link CalculusFieldElement} so that
 * {@link ImplicitSurface} can evaluate it with automatic differentiation ({@link Jet2}, or any
 * other field such as {@link org.hipparchus.analysis.differentiation.DerivativeStructure} or plain
 * {@link org.hipparchus.util.Binary64} values in the user's own tests).
 *
 * <p>{@code f} must be twice continuously differentiable near the patch, with {@code ∇f ≠ 0} on
 * the surface; it need not be a distance. Use only operations of the field type (no conversion to
 * {@code double} in the middle, which would drop the derivatives). A generic method cannot be a
 * lambda; write an anonymous or named class:
 * <pre>{@code
 * ImplicitFunction ellipticTube = new ImplicitFunction() {
 *     public <T extends CalculusFieldElement<T>> T value(T x, T y, T z) {
 *         return x.divide(0.03).square().add(y.divide(0.02).square()).subtract(1.0);
 *     }
 * };
 * }</pre>
 */
public interface ImplicitFunction {

    /**
     * @param <T> the field type (automatic-differentiation numbers)
     * @param x x coordinate (m)
     * @param y y coordinate (m)
     * @param z z coordinate (m)
     * @return {@code f(x, y, z)}, zero on the surface (any unit)
     */
    <T extends CalculusFieldElement<T>> T value(T x, T y, T z);
}
