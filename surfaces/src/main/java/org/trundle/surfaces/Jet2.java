package org.trundle.surfaces;

import org.hipparchus.CalculusFieldElement;
import org.hipparchus.Field;
import org.hipparchus.util.FastMath;

/**
 * A lean second-order automatic-differentiation number in three variables: value {@code v},
 * gradient {@code (g0, g1, g2)} and symmetric Hessian ({@code h00 … h22}) held in ten plain fields,
 * implementing Hipparchus' {@link CalculusFieldElement} so that an {@link ImplicitFunction} written
 * once can be evaluated with it. It gives the same numbers as
 * {@link org.hipparchus.analysis.differentiation.DerivativeStructure} of order 2 in 3 variables at a
 * fraction of the cost (no general-order index tables).
 *
 * <p>Rules (chain rule, common practice): a function {@code f} of one argument {@code u} gives
 * {@code v = f(u)}, {@code ∇ = f'(u) ∇u}, {@code ∇² = f'(u) ∇²u + f''(u) ∇u ∇uᵀ}; a product
 * {@code a b} gives {@code ∇²(ab) = a ∇²b + b ∇²a + ∇a ∇bᵀ + ∇b ∇aᵀ}; functions of two arguments
 * ({@code atan2}, {@code hypot}, {@code pow}) use their second partial derivatives.
 *
 * <p>Immutable.
 */
public final class Jet2 implements CalculusFieldElement<Jet2> {
    /** The field of these numbers. */
    public static final Field<Jet2> FIELD = new Field<Jet2>() {
        @Override
        public Jet2 getZero() {
            return Jet2.constant(0);
        }

        @Override
        public Jet2 getOne() {
            return Jet2.constant(1);
        }

        @Override
        public Class<Jet2> getRuntimeClass() {
            return Jet2.class;
        }
    };

    final double v;
    final double g0;
    final double g1;
    final double g2;
    final double h00;
    final double h01;
    final double h02;
    final double h11;
    final double h12;
    final double h22;

    private Jet2(double v, double g0, double g1, double g2, double h00, double h01, double h02, double h11, double h12,
                 double h22) {
        this.v = v;
        this.g0 = g0;
        this.g1 = g1;
        this.g2 = g2;
        this.h00 = h00;
        this.h01 = h01;
        this.h02 = h02;
        this.h11 = h11;
        this.h12 = h12;
        this.h22 = h22;
    }

    /**
     * @param value a constant
     * @return the constant (zero derivatives)
     */
    public static Jet2 constant(double value) {
        return new Jet2(value, 0, 0, 0, 0, 0, 0, 0, 0, 0);
    }

    /**
     * @param index which of the three variables (0, 1 or 2)
     * @param value its value
     * @return the independent variable
     */
    public static Jet2 variable(int index, double value) {
        return new Jet2(value, index == 0 ? 1 : 0, index == 1 ? 1 : 0, index == 2 ? 1 : 0, 0, 0, 0, 0, 0, 0);
    }

    /** @return the value */
    public double value() {
        return v;
    }

    /**
     * @param i variable index
     * @return the first partial derivative with respect to variable {@code i}
     */
    public double gradient(int i) {
        return i == 0 ? g0 : i == 1 ? g1 : g2;
    }

    /**
     * @param i first variable index
     * @param j second variable index
     * @return the second partial derivative with respect to variables {@code i} and {@code j}
     */
    public double hessian(int i, int j) {
        int a = Math.min(i, j);
        int b = Math.max(i, j);
        if (a == 0) {
            return b == 0 ? h00 : b == 1 ? h01 : h02;
        }
        return a == 1 ? (b == 1 ? h11 : h12) : h22;
    }

    /** f(this) from f, f', f''. */
    private Jet2 compose(double f0, double f1, double f2) {
        return new Jet2(f0, f1 * g0, f1 * g1, f1 * g2,
            f1 * h00 + f2 * g0 * g0, f1 * h01 + f2 * g0 * g1, f1 * h02 + f2 * g0 * g2,
            f1 * h11 + f2 * g1 * g1, f1 * h12 + f2 * g1 * g2, f1 * h22 + f2 * g2 * g2);
    }

    /** f(this, b) from its value and first and second partial derivatives. */
    private Jet2 compose2(Jet2 b, double f0, double fa, double fb, double faa, double fab, double fbb) {
        return new Jet2(f0, fa * g0 + fb * b.g0, fa * g1 + fb * b.g1, fa * g2 + fb * b.g2,
            fa * h00 + fb * b.h00 + faa * g0 * g0 + fab * 2 * g0 * b.g0 + fbb * b.g0 * b.g0,
            fa * h01 + fb * b.h01 + faa * g0 * g1 + fab * (g0 * b.g1 + g1 * b.g0) + fbb * b.g0 * b.g1,
            fa * h02 + fb * b.h02 + faa * g0 * g2 + fab * (g0 * b.g2 + g2 * b.g0) + fbb * b.g0 * b.g2,
            fa * h11 + fb * b.h11 + faa * g1 * g1 + fab * 2 * g1 * b.g1 + fbb * b.g1 * b.g1,
            fa * h12 + fb * b.h12 + faa * g1 * g2 + fab * (g1 * b.g2 + g2 * b.g1) + fbb * b.g1 * b.g2,
            fa * h22 + fb * b.h22 + faa * g2 * g2 + fab * 2 * g2 * b.g2 + fbb * b.g2 * b.g2);
    }

    private Jet2 scale(double f) {
        return new Jet2(f * v, f * g0, f * g1, f * g2, f * h00, f * h01, f * h02, f * h11, f * h12, f * h22);
    }

    @Override
    public double getReal() {
        return v;
    }

    @Override
    public Field<Jet2> getField() {
        return FIELD;
    }

    @Override
    public Jet2 newInstance(double value) {
        return constant(value);
    }

    @Override
    public Jet2 getAddendum() {
        return new Jet2(0, g0, g1, g2, h00, h01, h02, h11, h12, h22);
    }

    @Override
    public Jet2 add(Jet2 b) {
        return new Jet2(v + b.v, g0 + b.g0, g1 + b.g1, g2 + b.g2, h00 + b.h00, h01 + b.h01, h02 + b.h02,
            h11 + b.h11, h12 + b.h12, h22 + b.h22);
    }

    @Override
    public Jet2 add(double a) {
        return new Jet2(v + a, g0, g1, g2, h00, h01, h02, h11, h12, h22);
    }

    @Override
    public Jet2 subtract(Jet2 b) {
        return new Jet2(v - b.v, g0 - b.g0, g1 - b.g1, g2 - b.g2, h00 - b.h00, h01 - b.h01, h02 - b.h02,
            h11 - b.h11, h12 - b.h12, h22 - b.h22);
    }

    @Override
    public Jet2 subtract(double a) {
        return new Jet2(v - a, g0, g1, g2, h00, h01, h02, h11, h12, h22);
    }

    @Override
    public Jet2 negate() {
        return scale(-1);
    }

    @Override
    public Jet2 multiply(int n) {
        return scale(n);
    }

    @Override
    public Jet2 multiply(double a) {
        return scale(a);
    }

    @Override
    public Jet2 multiply(Jet2 b) {
        return new Jet2(v * b.v, v * b.g0 + b.v * g0, v * b.g1 + b.v * g1, v * b.g2 + b.v * g2,
            v * b.h00 + b.v * h00 + 2 * g0 * b.g0,
            v * b.h01 + b.v * h01 + g0 * b.g1 + g1 * b.g0,
            v * b.h02 + b.v * h02 + g0 * b.g2 + g2 * b.g0,
            v * b.h11 + b.v * h11 + 2 * g1 * b.g1,
            v * b.h12 + b.v * h12 + g1 * b.g2 + g2 * b.g1,
            v * b.h22 + b.v * h22 + 2 * g2 * b.g2);
    }

    @Override
    public Jet2 square() {
        return new Jet2(v * v, 2 * v * g0, 2 * v * g1, 2 * v * g2,
            2 * (v * h00 + g0 * g0), 2 * (v * h01 + g0 * g1), 2 * (v * h02 + g0 * g2),
            2 * (v * h11 + g1 * g1), 2 * (v * h12 + g1 * g2), 2 * (v * h22 + g2 * g2));
    }

    @Override
    public Jet2 divide(double a) {
        return scale(1 / a);
    }

    @Override
    public Jet2 divide(Jet2 b) {
        return multiply(b.reciprocal());
    }

    @Override
    public Jet2 reciprocal() {
        double r = 1 / v;
        return compose(r, -r * r, 2 * r * r * r);
    }

    @Override
    public Jet2 scalb(int n) {
        return scale(FastMath.scalb(1.0, n));
    }

    @Override
    public Jet2 sqrt() {
        double s = FastMath.sqrt(v);
        return compose(s, 0.5 / s, -0.25 / (s * v));
    }

    @Override
    public Jet2 cbrt() {
        double c = FastMath.cbrt(v);
        return compose(c, c / (3 * v), -2 * c / (9 * v * v));
    }

    @Override
    public Jet2 rootN(int n) {
        return pow(1.0 / n);
    }

    @Override
    public Jet2 pow(double p) {
        if (p == 0) {
            return constant(1);
        }
        double f0 = FastMath.pow(v, p);
        double f1 = p * FastMath.pow(v, p - 1);
        double f2 = p * (p - 1) * FastMath.pow(v, p - 2);
        return compose(f0, f1, f2);
    }

    @Override
    public Jet2 pow(int n) {
        if (n == 0) {
            return constant(1);
        }
        double f0 = FastMath.pow(v, n);
        double f1 = n * FastMath.pow(v, n - 1);
        double f2 = n == 1 ? 0 : n * (n - 1) * FastMath.pow(v, n - 2);
        return compose(f0, f1, f2);
    }

    @Override
    public Jet2 pow(Jet2 e) {
        // a^b = exp(b ln a), partials in (a, b)
        double la = FastMath.log(v);
        double f = FastMath.pow(v, e.v);
        double fa = e.v * f / v;
        double fb = f * la;
        double faa = e.v * (e.v - 1) * f / (v * v);
        double fab = f / v * (1 + e.v * la);
        double fbb = f * la * la;
        return compose2(e, f, fa, fb, faa, fab, fbb);
    }

    @Override
    public Jet2 hypot(Jet2 b) {
        double r = FastMath.hypot(v, b.v);
        double r3 = r * r * r;
        return compose2(b, r, v / r, b.v / r, b.v * b.v / r3, -v * b.v / r3, v * v / r3);
    }

    @Override
    public Jet2 exp() {
        double e = FastMath.exp(v);
        return compose(e, e, e);
    }

    @Override
    public Jet2 expm1() {
        double e = FastMath.exp(v);
        return compose(FastMath.expm1(v), e, e);
    }

    @Override
    public Jet2 log() {
        return compose(FastMath.log(v), 1 / v, -1 / (v * v));
    }

    @Override
    public Jet2 log1p() {
        double w = 1 + v;
        return compose(FastMath.log1p(v), 1 / w, -1 / (w * w));
    }

    @Override
    public Jet2 log10() {
        double l = FastMath.log(10.0);
        return compose(FastMath.log10(v), 1 / (v * l), -1 / (v * v * l));
    }

    @Override
    public Jet2 cos() {
        double c = FastMath.cos(v);
        return compose(c, -FastMath.sin(v), -c);
    }

    @Override
    public Jet2 sin() {
        double s = FastMath.sin(v);
        return compose(s, FastMath.cos(v), -s);
    }

    @Override
    public Jet2 tan() {
        double t = FastMath.tan(v);
        double d = 1 + t * t;
        return compose(t, d, 2 * t * d);
    }

    @Override
    public Jet2 acos() {
        double w = 1 - v * v;
        double s = FastMath.sqrt(w);
        return compose(FastMath.acos(v), -1 / s, -v / (w * s));
    }

    @Override
    public Jet2 asin() {
        double w = 1 - v * v;
        double s = FastMath.sqrt(w);
        return compose(FastMath.asin(v), 1 / s, v / (w * s));
    }

    @Override
    public Jet2 atan() {
        double w = 1 + v * v;
        return compose(FastMath.atan(v), 1 / w, -2 * v / (w * w));
    }

    @Override
    public Jet2 atan2(Jet2 x) {
        // this = y; partials of atan2(y, x) in (y, x)
        double r2 = v * v + x.v * x.v;
        double r4 = r2 * r2;
        return compose2(x, FastMath.atan2(v, x.v), x.v / r2, -v / r2, -2 * v * x.v / r4, (v * v - x.v * x.v) / r4,
            2 * v * x.v / r4);
    }

    @Override
    public Jet2 cosh() {
        double c = FastMath.cosh(v);
        return compose(c, FastMath.sinh(v), c);
    }

    @Override
    public Jet2 sinh() {
        double s = FastMath.sinh(v);
        return compose(s, FastMath.cosh(v), s);
    }

    @Override
    public Jet2 tanh() {
        double t = FastMath.tanh(v);
        double d = 1 - t * t;
        return compose(t, d, -2 * t * d);
    }

    @Override
    public Jet2 acosh() {
        double w = v * v - 1;
        double s = FastMath.sqrt(w);
        return compose(FastMath.acosh(v), 1 / s, -v / (w * s));
    }

    @Override
    public Jet2 asinh() {
        double w = v * v + 1;
        double s = FastMath.sqrt(w);
        return compose(FastMath.asinh(v), 1 / s, -v / (w * s));
    }

    @Override
    public Jet2 atanh() {
        double w = 1 - v * v;
        return compose(FastMath.atanh(v), 1 / w, 2 * v / (w * w));
    }

    @Override
    public Jet2 linearCombination(Jet2[] a, Jet2[] b) {
        Jet2 s = constant(0);
        for (int i = 0; i < a.length; i++) {
            s = s.add(a[i].multiply(b[i]));
        }
        return s;
    }

    @Override
    public Jet2 linearCombination(double[] a, Jet2[] b) {
        Jet2 s = constant(0);
        for (int i = 0; i < a.length; i++) {
            s = s.add(b[i].scale(a[i]));
        }
        return s;
    }

    @Override
    public Jet2 linearCombination(Jet2 a1, Jet2 b1, Jet2 a2, Jet2 b2) {
        return a1.multiply(b1).add(a2.multiply(b2));
    }

    @Override
    public Jet2 linearCombination(Jet2 a1, Jet2 b1, Jet2 a2, Jet2 b2, Jet2 a3, Jet2 b3) {
        return a1.multiply(b1).add(a2.multiply(b2)).add(a3.multiply(b3));
    }

    @Override
    public Jet2 linearCombination(Jet2 a1, Jet2 b1, Jet2 a2, Jet2 b2, Jet2 a3, Jet2 b3, Jet2 a4, Jet2 b4) {
        return a1.multiply(b1).add(a2.multiply(b2)).add(a3.multiply(b3)).add(a4.multiply(b4));
    }

    @Override
    public Jet2 remainder(double a) {
        double r = FastMath.IEEEremainder(v, a);
        return new Jet2(r, g0, g1, g2, h00, h01, h02, h11, h12, h22);
    }

    @Override
    public Jet2 remainder(Jet2 a) {
        double n = FastMath.rint((v - FastMath.IEEEremainder(v, a.v)) / a.v);
        return subtract(a.scale(n));
    }

    @Override
    public Jet2 copySign(Jet2 s) {
        return copySign(s.v);
    }

    @Override
    public Jet2 copySign(double s) {
        long m = Double.doubleToLongBits(v);
        long n = Double.doubleToLongBits(s);
        return (m ^ n) >= 0 ? this : negate();
    }

    @Override
    public Jet2 abs() {
        return Double.doubleToLongBits(v) < 0 ? negate() : this;
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof Jet2)) {
            return false;
        }
        Jet2 b = (Jet2) o;
        return Double.compare(v, b.v) == 0 && Double.compare(g0, b.g0) == 0 && Double.compare(g1, b.g1) == 0
            && Double.compare(g2, b.g2) == 0 && Double.compare(h00, b.h00) == 0 && Double.compare(h01, b.h01) == 0
            && Double.compare(h02, b.h02) == 0 && Double.compare(h11, b.h11) == 0 && Double.compare(h12, b.h12) == 0
            && Double.compare(h22, b.h22) == 0;
    }

    @Override
    public int hashCode() {
        long h = Double.doubleToLongBits(v);
        for (double d : new double[] {g0, g1, g2, h00, h01, h02, h11, h12, h22}) {
            h = 31 * h + Double.doubleToLongBits(d);
        }
        return (int) (h ^ (h >>> 32));
    }

    @Override
    public String toString() {
        return "Jet2(" + v + "; " + g0 + ", " + g1 + ", " + g2 + "; " + h00 + ", " + h01 + ", " + h02 + ", " + h11 + ", "
            + h12 + ", " + h22 + ")";
    }
}
