package org.tjmargin.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** Display formatting: the examples of the specification and the edges of the rules. */
class FormatTest {

    @Test
    void specificationExamples() {
        assertEquals("6.30 mA", Quantities.format(0.0063, Dimension.CURRENT));
        assertEquals("150 K/W", Quantities.format(150, Dimension.THERMAL_RESISTANCE));
        assertEquals("125.0 \u00B0C", Quantities.format(398.15, Dimension.TEMPERATURE));
        assertEquals("5.00 %", Quantities.format(0.05, Dimension.FRACTION));
        assertEquals("0.0600 %/K",
                Quantities.format(6e-4, Dimension.RELATIVE_TEMPERATURE_COEFFICIENT));
    }

    @Test
    void prefixesPutTheNumberBetweenOneAndAThousand() {
        assertEquals("4.70 k\u03A9", Quantities.format(4700, Dimension.RESISTANCE));
        assertEquals("8.00 \u00B5s", Quantities.format(8e-6, Dimension.TIME));
        assertEquals("6.67 mW/K", Quantities.format(6.67e-3, Dimension.POWER_DERATING_SLOPE));
        assertEquals("2.00 mV/K",
                Quantities.format(2e-3, Dimension.VOLTAGE_TEMPERATURE_COEFFICIENT));
        assertEquals("1.00 A", Quantities.format(1, Dimension.CURRENT));
        assertEquals("999 mA", Quantities.format(0.999, Dimension.CURRENT));
        assertEquals("50.0 kHz", Quantities.format(5e4, Dimension.FREQUENCY));
        assertEquals("2.00 \u00B5C", Quantities.format(2e-6, Dimension.CHARGE));
    }

    @Test
    void roundingUpMovesToTheNextPrefix() {
        assertEquals("1.00 kV", Quantities.format(999.96, Dimension.VOLTAGE));
        assertEquals("1.00 A", Quantities.format(0.99996, Dimension.CURRENT));
        assertEquals("-1.00 kV", Quantities.format(-999.96, Dimension.VOLTAGE));
    }

    @Test
    void areaPrefixesApplyToTheMetre() {
        assertEquals("25.0 mm\u00B2", Quantities.format(25e-6, Dimension.AREA));
        assertEquals("3.00 cm\u00B2", Quantities.format(3e-4, Dimension.AREA));
        assertEquals("1.50 m\u00B2", Quantities.format(1.5, Dimension.AREA));
        assertEquals("200 \u00B5m\u00B2", Quantities.format(200e-12, Dimension.AREA));
    }

    @Test
    void unitsWithoutPrefixArePlainOrScientific() {
        assertEquals("390 W/(m\u00B7K)", Quantities.format(390, Dimension.THERMAL_CONDUCTIVITY));
        assertEquals("10.0 W/(m\u00B2\u00B7K)",
                Quantities.format(10, Dimension.HEAT_TRANSFER_COEFFICIENT));
        assertEquals("0.00500 K", Quantities.format(5e-3, Dimension.TEMPERATURE_DIFFERENCE));
        assertEquals("1.50e-7 K/W", Quantities.format(1.5e-7, Dimension.THERMAL_RESISTANCE));
        assertEquals("1.50e6 A\u00B2s", Quantities.format(1.5e6, Dimension.ACTION_INTEGRAL));
        assertEquals("123000 K/W", Quantities.format(123456, Dimension.THERMAL_RESISTANCE));
    }

    @Test
    void beyondTheReadPrefixesTheNumberIsScientific() {
        assertEquals("1.50e12 \u03A9", Quantities.format(1.5e12, Dimension.RESISTANCE));
        assertEquals("1.00e-27 A", Quantities.format(1e-27, Dimension.CURRENT));
        assertEquals("999 G\u03A9", Quantities.format(999e9, Dimension.RESISTANCE));
        assertEquals("1.00 yA", Quantities.format(1e-24, Dimension.CURRENT));
    }

    @Test
    void zeroAndNegativeZero() {
        assertEquals("0.00 A", Quantities.format(0.0, Dimension.CURRENT));
        assertEquals("0.00 A", Quantities.format(-0.0, Dimension.CURRENT));
        assertEquals("0.00 %", Quantities.format(0.0, Dimension.FRACTION));
    }

    @Test
    void temperaturesInCelsius() {
        // 0 °C = 273.15 K, -40 °C = 233.15 K (SI Brochure 9th ed., degree Celsius)
        assertEquals("0.0 \u00B0C", Quantities.format(273.15, Dimension.TEMPERATURE));
        assertEquals("-40.0 \u00B0C", Quantities.format(233.15, Dimension.TEMPERATURE));
        assertEquals("25.0 \u00B0C", Quantities.format(298.15, Dimension.TEMPERATURE));
        // the decimals follow the kelvin value: 4 digits of 3 K need 3 decimals
        assertEquals("-270.150 \u00B0C", Quantities.format(3, Dimension.TEMPERATURE));
        assertEquals("1000 \u00B0C", Quantities.format(1273.15, Dimension.TEMPERATURE));
        assertEquals("125 \u00B0C", Quantities.format(398.15, Dimension.TEMPERATURE, 3));
    }

    @Test
    void significantDigits() {
        assertEquals("6 mA", Quantities.format(0.0063, Dimension.CURRENT, 1));
        assertEquals("6.3000 mA", Quantities.format(0.0063, Dimension.CURRENT, 5));
        // 0.25 is exact in binary, so this is a true tie: rounded half up
        assertEquals("300 mA", Quantities.format(0.25, Dimension.CURRENT, 1));
        assertThrows(IllegalArgumentException.class,
                () -> Quantities.format(1, Dimension.CURRENT, 0));
        assertThrows(IllegalArgumentException.class,
                () -> Quantities.format(1, Dimension.CURRENT, 18));
    }

    @Test
    void nonFiniteValuesCannotBeFormatted() {
        for (double x : new double[] {Double.NaN, Double.POSITIVE_INFINITY,
                Double.NEGATIVE_INFINITY}) {
            assertThrows(IllegalArgumentException.class,
                    () -> Quantities.format(x, Dimension.VOLTAGE));
        }
        assertThrows(NullPointerException.class, () -> Quantities.format(1, null));
    }

    @Test
    void quantityFormatsItself() {
        assertEquals("6.30 mA", new Quantity(0.0063, Dimension.CURRENT).format());
        assertEquals("6.3 mA", new Quantity(0.0063, Dimension.CURRENT).format(2));
    }
}
