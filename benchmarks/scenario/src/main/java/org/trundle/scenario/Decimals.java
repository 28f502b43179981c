package org.trundle.scenario;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * The shortest decimal that reads back to the same double. {@link Double#toString(double)} on
 * Java 17 sometimes gives one digit more than needed (fixed in Java 19); this starts from it and
 * drops digits while the value still reads back exactly. Used for the parameter columns of
 * {@link SweepRow#csv()}.
 */
public final class Decimals {
    private Decimals() {
    }

    /**
     * @param v a double
     * @return its shortest exact decimal, in {@link Double#toString(double)}'s notation when no
     *     digit could be dropped, else as a plain decimal for magnitudes from 1e-3 to 1e7 and in
     *     {@code 1.5E-9} notation otherwise
     */
    public static String shortest(double v) {
        String s = Double.toString(v);
        if (!Double.isFinite(v) || v == 0) {
            return s;
        }
        BigDecimal exact = new BigDecimal(v);
        int digits = new BigDecimal(s).stripTrailingZeros().precision();
        BigDecimal best = null;
        for (int p = digits - 1; p >= 1; p--) {
            BigDecimal d = exact.round(new MathContext(p, RoundingMode.HALF_EVEN));
            if (d.doubleValue() != v) {
                break;
            }
            best = d;
        }
        if (best == null) {
            return s;
        }
        best = best.stripTrailingZeros();
        double a = Math.abs(v);
        if (a >= 1e-3 && a < 1e7) {
            String plain = best.toPlainString();
            return plain.contains(".") ? plain : plain + ".0";
        }
        return best.unscaledValue().signum() < 0 ? "-" + sci(best.negate()) : sci(best);
    }

    private static String sci(BigDecimal d) {
        String u = d.unscaledValue().toString();
        int exp = u.length() - 1 - d.scale();
        String mant = u.length() == 1 ? u + ".0" : u.charAt(0) + "." + u.substring(1);
        return mant + "E" + exp;
    }
}
