package org.tjmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.apache.commons.csv.CSVFormat;
import org.junit.jupiter.api.Test;

/**
 * The numbers of {@code sweep.csv}: every one reads back as the same double (the property a data file must have,
 * IEEE 754 round trip) and is never longer than what {@code Double.toString} writes.
 */
class SweepCsvNumberTest {

    @Test
    void numbersRoundTripAndAreNoLongerThanTheRuntimes() {
        SplittableRandom rnd = new SplittableRandom(20_261_202L);
        for (int i = 0; i < 200_000; i++) {
            // Random bit patterns cover every exponent; scaled uniforms cover the values a sweep writes.
            double v = i % 2 == 0 ? Double.longBitsToDouble(rnd.nextLong())
                    : (rnd.nextDouble() - 0.5) * Math.pow(10, rnd.nextInt(-12, 6));
            if (!Double.isFinite(v)) {
                continue;
            }
            String s = SweepCsv.num(v);
            assertEquals(v, Double.parseDouble(s), 0.0, s);
            assertTrue(digits(s) <= digits(Double.toString(v)), s + " against " + Double.toString(v));
        }
    }

    /**
     * The numbers of {@code sweep.csv} are never quoted (a spreadsheet reads them as numbers): Commons CSV's
     * RFC 4180 printing (what a {@code CSVPrinter} does per value) leaves every one unquoted, as first field and
     * after one, including the non-finite ones.
     */
    @Test
    void numbersNeedNoQuotesInRfc4180() throws Exception {
        SplittableRandom rnd = new SplittableRandom(4180L);
        CSVFormat format = CSVFormat.RFC4180;
        for (int i = 0; i < 100_000; i++) {
            double v = switch (i) {
                case 0 -> Double.NaN;
                case 1 -> Double.POSITIVE_INFINITY;
                case 2 -> Double.NEGATIVE_INFINITY;
                case 3 -> -0.0;
                default -> i % 2 == 0 ? Double.longBitsToDouble(rnd.nextLong())
                        : (rnd.nextDouble() - 0.5) * Math.pow(10, rnd.nextInt(-12, 6));
            };
            String s = SweepCsv.num(v);
            StringBuilder after = new StringBuilder();
            format.print(s, after, false);
            assertEquals("," + s, after.toString());
            StringBuilder first = new StringBuilder();
            format.print(s, first, true);
            assertEquals(s, first.toString());
        }
    }

    /**
     * Java 17's {@code Double.toString} writes {@code 2e23} as {@code 1.9999999999999998E23} and {@code 1e23} as
     * {@code 9.999999999999999E22} (observed on OpenJDK 17.0.15; the long-standing JDK bug 4511638, fixed in Java 19
     * by the shortest-decimal algorithm used here). The shortest decimals that read back as the same doubles are
     * {@code 2.0E23} and {@code 1.0E23}.
     */
    @Test
    void theShortestDecimalIsWritten() {
        assertEquals("2.0E23", SweepCsv.num(2e23));
        assertEquals("1.0E23", SweepCsv.num(1e23));
        assertEquals("0.002", SweepCsv.num(2e-3));
        assertEquals("25.0", SweepCsv.num(25.0));
    }

    private static int digits(String s) {
        String mantissa = s.contains("E") ? s.substring(0, s.indexOf('E')) : s;
        String d = mantissa.replace("-", "").replace(".", "").replaceFirst("^0+", "");
        return d.replaceFirst("0+$", "").length();
    }
}
