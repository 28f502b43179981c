package org.trundle.surfaces;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import java.util.function.Function;

import org.hipparchus.CalculusFieldElement;
import org.hipparchus.analysis.differentiation.DSFactory;
import org.hipparchus.analysis.differentiation.DerivativeStructure;
import org.hipparchus.util.MathArrays;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * {@link Jet2} against Hipparchus' {@link DerivativeStructure} of order 2 in 3 variables (a
 * general-purpose reference library) on expressions that use every operation.
 */
class Jet2Test {

    /** Expressions generic over the field, each on a domain where it is defined. */
    static <T extends CalculusFieldElement<T>> T expression(int which, T x, T y, T z) {
        switch (which) {
            case 0:
                return x.multiply(y).add(z.square().multiply(3)).subtract(x.divide(y.add(2))).reciprocal().add(x.pow(3));
            case 1:
                return x.exp().add(y.expm1()).multiply(z.log()).add(x.log1p()).subtract(z.log10()).add(y.sqrt()).add(z.cbrt());
            case 2:
                return x.sin().multiply(y.cos()).add(z.tan()).add(x.multiply(0.3).asin()).add(y.multiply(0.2).acos()).add(z.atan());
            case 3:
                return x.sinh().add(y.cosh()).multiply(z.tanh()).add(z.add(1.5).acosh()).add(x.asinh()).add(y.multiply(0.3).atanh());
            case 4:
                return y.atan2(x).add(x.hypot(z)).add(z.pow(y)).add(x.pow(2.5)).add(y.rootN(3)).add(z.pow(-2));
            default:
                return x.linearCombination(x, y, z, x).add(x.linearCombination(y, z, x, y, z, z))
                    .add(x.abs().multiply(z.copySign(y.negate()))).add(x.scalb(3)).add(y.remainder(0.3))
                    .add(x.linearCombination(new double[] {1.5, -2}, pair(y, z)));
        }
    }

    static <T extends CalculusFieldElement<T>> T[] pair(T a, T b) {
        T[] p = MathArrays.buildArray(a.getField(), 2);
        p[0] = a;
        p[1] = b;
        return p;
    }

    @ParameterizedTest(name = "expression {0}")
    @ValueSource(ints = {0, 1, 2, 3, 4, 5})
    void agreesWithDerivativeStructure(int which) {
        DSFactory f = new DSFactory(3, 2);
        SplittableRandom rnd = new SplittableRandom(99L + which);
        for (int k = 0; k < 20; k++) {
            double x = rnd.nextDouble(0.2, 1.5);
            double y = rnd.nextDouble(0.2, 1.5);
            double z = rnd.nextDouble(0.2, 1.5);
            DerivativeStructure d = expression(which, f.variable(0, x), f.variable(1, y), f.variable(2, z));
            Jet2 j = expression(which, Jet2.variable(0, x), Jet2.variable(1, y), Jet2.variable(2, z));
            double scale = Math.max(1, Math.abs(d.getValue()));
            assertEquals(d.getValue(), j.value(), 1e-13 * scale, "value");
            Function<int[], Double> pd = o -> d.getPartialDerivative(o);
            for (int i = 0; i < 3; i++) {
                int[] o = new int[3];
                o[i] = 1;
                double ref = pd.apply(o);
                assertEquals(ref, j.gradient(i), 1e-12 * Math.max(1, Math.abs(ref)), "gradient " + i);
                for (int m = 0; m < 3; m++) {
                    int[] oo = new int[3];
                    oo[i]++;
                    oo[m]++;
                    double ref2 = pd.apply(oo);
                    assertEquals(ref2, j.hessian(i, m), 1e-11 * Math.max(1, Math.abs(ref2)), "hessian " + i + m);
                }
            }
        }
    }
}
