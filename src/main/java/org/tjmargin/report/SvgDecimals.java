package org.tjmargin.report;

import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.Locale;
import java.util.function.DoubleFunction;

/**
 * Coordinates of the SVG charts with at most two decimals, as JFreeSVG's own converter writes them
 * ({@code DecimalFormat("0.##")}, US symbols: half-even rounding of the double's exact binary value, no grouping,
 * trailing zeros dropped, {@code -0} for a negative value that rounds to zero) but without the general formatter on
 * every number of every chart. Rounding is exact: a double is {@code m·2^e} with a 53-bit {@code m}, so
 * {@code 100·m} fits a {@code long} and the rounding to hundredths is an integer shift with its remainder.
 * Values of 10¹⁵ and more, infinities and NaN go to the general formatter. {@code SvgDecimalsTest} holds the text
 * equal to JFreeSVG's converter's.
 *
 * <p>Not thread-safe (the fallback formatter is not): one per SVG context, as JFreeSVG's own.
 */
final class SvgDecimals implements DoubleFunction<String> {

    /** From this magnitude on the general formatter writes the number (see the class comment). */
    private static final double EXACT_LIMIT = 1e12;

    private final DecimalFormat general = new DecimalFormat("0.##", DecimalFormatSymbols.getInstance(Locale.US));
    private final StringBuilder text = new StringBuilder(24);

    @Override
    public String apply(double d) {
        if (!(Math.abs(d) < EXACT_LIMIT)) {
            return general.format(d);
        }
        long bits = Double.doubleToRawLongBits(d);
        int biased = (int) ((bits >>> 52) & 0x7ff);
        long hundredths;
        if (biased == 0) {
            hundredths = 0; // zero or subnormal: far below half a hundredth
        } else {
            long m100 = 100 * ((bits & ((1L << 52) - 1)) | (1L << 52));
            int shift = 1075 - biased; // d = m·2^(−shift)
            if (shift <= 0) {
                hundredths = m100 << -shift;
            } else if (shift > 61) {
                hundredths = 0; // 100·m < 2^60: below half a hundredth
            } else {
                hundredths = m100 >>> shift;
                long rest = m100 & ((1L << shift) - 1);
                long half = 1L << (shift - 1);
                if (rest > half || (rest == half && (hundredths & 1) == 1)) {
                    hundredths++;
                }
            }
        }
        text.setLength(0);
        if (bits < 0) {
            text.append('-');
        }
        text.append(hundredths / 100);
        int frac = (int) (hundredths % 100);
        if (frac != 0) {
            text.append('.').append((char) ('0' + frac / 10));
            if (frac % 10 != 0) {
                text.append((char) ('0' + frac % 10));
            }
        }
        return text.toString();
    }
}
