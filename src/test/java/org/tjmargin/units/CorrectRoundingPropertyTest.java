package org.tjmargin.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * Property: a prefixed text reads to the double nearest to its exact value, the same double
 * that {@link Double#parseDouble} gives for the decimal with the prefix folded into the exponent
 * (Double.parseDouble rounds correctly: Java SE 17 API, Double.valueOf(String)), except
 * that -0 reads as 0. Seeded random
 * loop; -Dtjmargin.test.seed=N changes the seed, which is printed on failure.
 */
class CorrectRoundingPropertyTest {

    private static final long SEED = Long.getLong("tjmargin.test.seed", 0x5EED_0002L);

    @Test
    void prefixedTextIsCorrectlyRounded() {
        Random random = new Random(SEED);
        SiPrefix[] prefixes = SiPrefix.values();
        for (int i = 0; i < 20_000; i++) {
            String mantissa = randomDecimal(random);
            int exponent = random.nextInt(61) - 30;
            SiPrefix p = prefixes[random.nextInt(prefixes.length)];
            if (p == SiPrefix.CENTI) {
                p = SiPrefix.MILLI;
            }
            String text = mantissa + "e" + exponent + " " + p.symbol() + "V";
            // + 0.0: the parser reads -0 as 0 on purpose
            double expected = Double.parseDouble(mantissa + "e" + (exponent + p.exponent()))
                    + 0.0;
            double actual = Quantities.parse(text, Dimension.VOLTAGE);
            assertEquals(expected, actual, "seed " + SEED + ", case " + i + ": " + text);
        }
    }

    @Test
    void squaredPrefixAndPercentAreCorrectlyRounded() {
        Random random = new Random(SEED + 1);
        for (int i = 0; i < 5_000; i++) {
            String mantissa = randomDecimal(random);
            String where = "seed " + (SEED + 1) + ", case " + i + ": " + mantissa;
            assertEquals(Double.parseDouble(mantissa + "e-6") + 0.0,
                    Quantities.parse(mantissa + " mm\u00B2", Dimension.AREA), where + " mm²");
            assertEquals(Double.parseDouble(mantissa + "e-2") + 0.0,
                    Quantities.parse(mantissa + " %", Dimension.FRACTION), where + " %");
            assertEquals(Double.parseDouble(mantissa + "e-6") + 0.0,
                    Quantities.parse(mantissa + " ppm/K",
                            Dimension.RELATIVE_TEMPERATURE_COEFFICIENT), where + " ppm/K");
        }
    }

    /** A decimal with 1 to 20 significant digits and a decimal point somewhere. */
    private static String randomDecimal(Random random) {
        int digits = 1 + random.nextInt(20);
        StringBuilder sb = new StringBuilder();
        if (random.nextBoolean()) {
            sb.append('-');
        }
        int point = random.nextInt(digits + 1);
        for (int k = 0; k < digits; k++) {
            if (k == point && k > 0) {
                sb.append('.');
            }
            sb.append((char) ('0' + random.nextInt(10)));
        }
        return sb.toString();
    }
}
