package org.tjmargin.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.tjmargin.variation.Range;

/**
 * {@link Decimals}: products and toleranced ends of decimal inputs are the doubles nearest to their exact decimal
 * values. Reference: {@link BigDecimal}'s exact arithmetic and {@link Double#parseDouble}'s correct rounding (Java
 * SE 17 API). Seeded random loops; -Dtjmargin.test.seed=N changes the seed, which is printed on failure.
 */
class DecimalsTest {

    private static final long SEED = Long.getLong("tjmargin.test.seed", 0x5EED_0DECL);

    @Test
    void engineersExamplesComeOutAsTheirDecimals() {
        // Binary arithmetic gives 0.010199999999999999 and 0.6000000000000001 here.
        assertEquals(0.0102, Decimals.product(0.00085, 12.0));
        assertEquals(0.6, Decimals.product(0.05, 12.0));
        Range r = Range.relative(0.005, 0.10);
        assertEquals(0.0045, r.lo());
        assertEquals(0.0055, r.hi());
        assertEquals(0.005, r.nominal());
    }

    @Test
    void productOfShortDecimalsIsTheNearestDouble() {
        Random random = new Random(SEED);
        for (int i = 0; i < 20_000; i++) {
            String a = shortDecimal(random);
            String b = shortDecimal(random);
            double expected = new BigDecimal(a).multiply(new BigDecimal(b)).doubleValue();
            assertEquals(expected, Decimals.product(Double.parseDouble(a), Double.parseDouble(b)),
                    "seed " + SEED + ", case " + i + ": " + a + " × " + b);
        }
    }

    @Test
    void relativeEndsAreNearestDoublesOnTheirSides() {
        Random random = new Random(SEED + 1);
        for (int i = 0; i < 20_000; i++) {
            String n = shortDecimal(random);
            String t = "0." + String.format("%03d", random.nextInt(1000));
            double nominal = Double.parseDouble(n);
            double[] ends = Decimals.relativeEnds(nominal, Double.parseDouble(t));
            BigDecimal d = new BigDecimal(n).abs().multiply(new BigDecimal(t));
            String where = "seed " + (SEED + 1) + ", case " + i + ": " + n + " ± " + t;
            assertEquals(new BigDecimal(n).subtract(d).doubleValue(), ends[0], where);
            assertEquals(new BigDecimal(n).add(d).doubleValue(), ends[1], where);
            assertTrue(ends[0] <= nominal && nominal <= ends[1], where);
        }
    }

    @Test
    void computedValuesOfManyDigitsStayWithinTheirFifteenthDigit() {
        Random random = new Random(SEED + 2);
        for (int i = 0; i < 20_000; i++) {
            double a = Math.scalb(1 + random.nextDouble(), random.nextInt(40) - 20);
            double b = Math.scalb(1 + random.nextDouble(), random.nextInt(40) - 20);
            double p = Decimals.product(a, b);
            // Each operand is taken to 15 significant digits (relative error at most 5e-15 each), then the product
            // is rounded once more: the bound is about 1e-14 relative.
            assertEquals(a * b, p, Math.abs(a * b) * 1.1e-14, "seed " + (SEED + 2) + ", case " + i);
            double[] ends = Decimals.relativeEnds(a, 0.01);
            assertTrue(ends[0] <= a && a <= ends[1], "seed " + (SEED + 2) + ", case " + i);
        }
    }

    @Test
    void nonFiniteOperandsFallBackToBinaryArithmetic() {
        assertEquals(Double.POSITIVE_INFINITY, Decimals.product(Double.POSITIVE_INFINITY, 2.0));
        assertTrue(Double.isNaN(Decimals.product(Double.NaN, 2.0)));
        double[] zero = Decimals.relativeEnds(3.3, 0.0);
        assertEquals(3.3, zero[0]);
        assertEquals(3.3, zero[1]);
    }

    /** A decimal of 1 to 6 significant digits, of either sign, scaled by 10^-6 … 10^3. */
    private static String shortDecimal(Random random) {
        int digits = 1 + random.nextInt(6);
        long mantissa = 1 + (long) (random.nextDouble() * (Math.pow(10, digits) - 1));
        int scale = random.nextInt(10) - 3;
        BigDecimal v = BigDecimal.valueOf(mantissa, scale);
        return (random.nextBoolean() ? "-" : "") + v.toPlainString();
    }
}
