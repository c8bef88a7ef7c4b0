package org.tjmargin.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Arithmetic on values read from decimal text, done in decimal and rounded to a double once, as
 * {@link QuantityParser} converts a text: the product of two inputs, and a nominal widened by a relative
 * tolerance.
 *
 * <p>Why. In binary the ends of {@code 5 mA ± 10 %} come out as {@code 0.0045000000000000005} and
 * {@code 0.0055}, and {@code 0.085 %/K} of 12 V as {@code 0.010199999999999999} V/K: two roundings (the
 * tolerance's product, then the sum) put the end a unit in the last place off the decimal the engineer means,
 * and the results and CSV files carry that tail. Here each operand is taken back to the decimal it was read
 * from, the operation is exact, and the result is the double nearest to it: {@code 0.0045}, {@code 0.0102}.
 *
 * <p>Taking a double back to its decimal: any decimal of at most 15 significant digits survives the trip to a
 * binary64 double and back when the double is rounded to 15 significant digits (15 is {@code DBL_DIG}, ISO/IEC
 * 9899 5.2.4.2.2, for IEEE 754 binary64; from memory, verify). Every value this tool reads has far fewer digits
 * than that; a value with more (one computed, not read) moves by at most half a unit in its 15th digit, far below
 * anything the physics resolves.
 *
 * <p>Stateless and thread-safe.
 */
public final class Decimals {

    /** Significant digits a decimal keeps through a binary64 double and back (DBL_DIG). */
    static final int DIGITS = 15;
    private static final MathContext BACK = new MathContext(DIGITS, RoundingMode.HALF_EVEN);

    private Decimals() {
    }

    /** The decimal that {@code v} was read from, if that had at most 15 significant digits; {@code v} finite. */
    static BigDecimal decimalOf(double v) {
        return new BigDecimal(v).round(BACK);
    }

    /** {@code a·b}, as the double nearest to the product of the decimals the two were read from. */
    public static double product(double a, double b) {
        if (!Double.isFinite(a) || !Double.isFinite(b)) {
            return a * b;
        }
        return decimalOf(a).multiply(decimalOf(b)).doubleValue();
    }

    /**
     * The ends {@code n − |n|·t} and {@code n + |n|·t} of a nominal {@code n} with relative tolerance {@code t ≥ 0},
     * each the double nearest to its exact decimal value, never on the wrong side of {@code n}.
     *
     * @return {@code {low, high}}
     */
    public static double[] relativeEnds(double nominal, double relative) {
        if (!Double.isFinite(nominal) || !Double.isFinite(relative) || relative == 0.0) {
            double d = Math.abs(nominal) * relative;
            return new double[] {nominal - d, nominal + d};
        }
        BigDecimal n = decimalOf(nominal);
        BigDecimal d = n.abs().multiply(decimalOf(relative));
        double lo = n.subtract(d).doubleValue();
        double hi = n.add(d).doubleValue();
        // A nominal of more than 15 digits is taken back to 15; keep the ends on their sides of it all the same.
        return new double[] {Math.min(lo, nominal), Math.max(hi, nominal)};
    }
}
