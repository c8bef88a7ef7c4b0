package org.tjmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import java.util.function.DoubleFunction;
import org.jfree.svg.SVGUtils;
import org.junit.jupiter.api.Test;

/**
 * The charts' coordinate writer against JFreeSVG's converter with two decimals (a {@code DecimalFormat}), which
 * wrote them before: the same text for every value, at every scale a chart meets and beyond, exact ties included.
 */
class SvgDecimalsTest {

    @Test
    void writesWhatJFreeSvgsConverterWrites() {
        DoubleFunction<String> library = SVGUtils.createDoubleConverter(2);
        SvgDecimals ours = new SvgDecimals();
        double[] special = {0.0, -0.0, 0.005, -0.005, 0.015, 0.025, 0.125, 0.375, -0.125, 2.675, 1.005, 0.994999,
            0.995, 99.995, 1e-300, -1e-300, Double.MIN_VALUE, 4.9e-324, 123456789.125, 999999999999.995, 1e12,
            -1e12, 999999999999999.9, 1e16, 1e300, Double.MAX_VALUE, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NaN,
            0.004999999999999999, 0.005000000000000001, 4503599627370496.5, 0.1, 0.7, 800, 479.99999};
        for (double d : special) {
            assertEquals(library.apply(d), ours.apply(d), "value " + d);
        }
        long seed = 20261207L;
        Random rnd = new Random(seed);
        for (int n = 0; n < 400_000; n++) {
            double d = switch (n % 4) {
                // pixel coordinates of a chart
                case 0 -> (rnd.nextDouble() - 0.1) * 1000;
                // any scale
                case 1 -> (rnd.nextBoolean() ? 1 : -1) * Math.pow(10, -6 + 20 * rnd.nextDouble());
                // exact binary ties and their neighbours: k/8 and k/200 near a half hundredth
                case 2 -> (rnd.nextInt(200_000) - 100_000) / 8.0;
                default -> Math.nextAfter((rnd.nextInt(2_000_000) - 1_000_000) / 200.0 + 0.005,
                        rnd.nextBoolean() ? Double.POSITIVE_INFINITY : Double.NEGATIVE_INFINITY);
            };
            assertEquals(library.apply(d), ours.apply(d), "seed " + seed + " case " + n + ", value " + d);
        }
    }
}
