package org.tjmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.tjmargin.device.Celsius;
import org.tjmargin.solve.AmbientRange;

/**
 * The °C the writers print. Source of the conversion: the SI definition of the Celsius temperature,
 * {@code t/°C = T/K − 273.15} (SI Brochure, 9th edition, 2019, section 2.3.1; section number from memory, verify).
 */
class LabelsTest {

    @Test
    void aSweepGridGivenInWholeAndHalfDegreesComesBackAsTheDecimalsTheUserWrote() {
        // Seeded loop over grids of the kind a design gives: ends in tenths of a degree, steps that are decimals.
        SplittableRandom rnd = new SplittableRandom(20261202);
        double[] steps = {0.25, 0.5, 1.0, 2.5, 5.0};
        for (int trial = 0; trial < 2000; trial++) {
            BigDecimal min = BigDecimal.valueOf(rnd.nextInt(-600, 1300), 1);
            BigDecimal step = BigDecimal.valueOf(steps[rnd.nextInt(steps.length)]);
            int points = rnd.nextInt(2, 201);
            BigDecimal max = min.add(step.multiply(BigDecimal.valueOf(points - 1)));
            AmbientRange range = new AmbientRange(Celsius.toKelvin(min.doubleValue()),
                    Celsius.toKelvin(max.doubleValue()), points);
            double[] t = range.temperaturesK();
            for (int i = 0; i < points; i++) {
                double expected = min.add(step.multiply(BigDecimal.valueOf(i))).doubleValue();
                assertEquals(expected, Labels.celsius(t[i]), 0.0,
                        () -> "grid " + min + " … " + max + " °C in " + points + " points");
            }
        }
    }

    @Test
    void theDesignsLowestAmbientReadsAsGiven() {
        // −20 °C is 253.14999999999998 K; the plain subtraction gives −20.000000000000028.
        assertEquals("-20.0", Double.toString(Labels.celsius(Celsius.toKelvin(-20.0))));
        assertEquals("55.0", Double.toString(Labels.celsius(Celsius.toKelvin(55.0))));
        assertEquals("-40.0", Double.toString(Labels.celsius(Celsius.toKelvin(-40.0))));
        assertEquals("0.1", Double.toString(Labels.celsius(Celsius.toKelvin(0.1))));
    }

    @Test
    void aComputedTemperatureIsNeverMovedByMoreThanTheWindow() {
        SplittableRandom rnd = new SplittableRandom(7);
        int unchanged = 0;
        for (int trial = 0; trial < 100_000; trial++) {
            double k = 150.0 + 600.0 * rnd.nextDouble();
            double plain = k - 273.15;
            double shown = Labels.celsius(k);
            assertTrue(Math.abs(shown - plain) <= Labels.SNAP_K, () -> k + " K shown as " + shown);
            if (shown == plain) {
                unchanged++;
            }
        }
        // A value is snapped only within 1e-11 K of a six-place decimal: about 2e-5 of random values.
        assertTrue(unchanged >= 99_990, "unchanged " + unchanged);
    }

    @Test
    void aJunctionTemperatureOfTheSweepIsWrittenAsItIs() {
        // A solved junction temperature (from the demo's sweep): no six-place decimal lies within the window.
        double k = 369.94650801803837;
        assertEquals(k - 273.15, Labels.celsius(k), 0.0);
    }

    @Test
    void nonFiniteValuesPassThrough() {
        assertTrue(Double.isNaN(Labels.celsius(Double.NaN)));
        assertEquals(Double.POSITIVE_INFINITY, Labels.celsius(Double.POSITIVE_INFINITY));
        assertEquals(Double.NEGATIVE_INFINITY, Labels.celsius(Double.NEGATIVE_INFINITY));
    }
}
