package org.tjmargin.units;

import static org.tjmargin.units.Close.assertExactDecimal;

import org.junit.jupiter.api.Test;

/**
 * The example texts of the package specification, each against its SI value worked out by hand.
 * Prefix values: BIPM SI Brochure, 9th ed. 2019, Table 7 (SI prefixes). Degree Celsius:
 * t/°C = T/K - 273.15, same Brochure, section 2.3.1 (section number from memory, verify).
 */
class ParseExamplesTest {

    private static void check(String text, Dimension d, double expectedSi) {
        assertExactDecimal(expectedSi, Quantities.parse(text, d), text);
    }

    @Test
    void electricalExamples() {
        check("6.2 V", Dimension.VOLTAGE, 6.2);
        check("41 mA", Dimension.CURRENT, 41e-3);
        check("2 \u03A9", Dimension.RESISTANCE, 2);
        check("2 ohm", Dimension.RESISTANCE, 2);
        check("4.7 k\u03A9", Dimension.RESISTANCE, 4.7e3);
        check("1.5 W", Dimension.POWER, 1.5);
    }

    @Test
    void thermalExamples() {
        check("150 K/W", Dimension.THERMAL_RESISTANCE, 150);
        check("0.06 %/K", Dimension.RELATIVE_TEMPERATURE_COEFFICIENT, 0.06e-2);
        check("2 mV/K", Dimension.VOLTAGE_TEMPERATURE_COEFFICIENT, 2e-3);
        check("390 W/(m\u00B7K)", Dimension.THERMAL_CONDUCTIVITY, 390);
        check("6.67 mW/K", Dimension.POWER_DERATING_SLOPE, 6.67e-3);
        check("10 W/(m\u00B2\u00B7K)", Dimension.HEAT_TRANSFER_COEFFICIENT, 10);
    }

    @Test
    void temperatureExamples() {
        // 25 °C = 25 + 273.15 K (SI Brochure 9th ed., 2.3.1, from memory, verify)
        check("25 \u00B0C", Dimension.TEMPERATURE, 298.15);
        check("25 degC", Dimension.TEMPERATURE, 298.15);
    }

    @Test
    void fractionExample() {
        // per cent = 0.01 (SI Brochure 9th ed., 5.4.7, from memory, verify)
        check("5 %", Dimension.FRACTION, 0.05);
    }

    @Test
    void timeExamplesWithEveryMicroSpelling() {
        check("8 \u00B5s", Dimension.TIME, 8e-6); // micro sign U+00B5
        check("8 us", Dimension.TIME, 8e-6); // ASCII u
        check("20 \u03BCs", Dimension.TIME, 20e-6); // Greek small letter mu U+03BC
    }

    @Test
    void lengthAndAreaExamples() {
        check("9.5 mm", Dimension.LENGTH, 9.5e-3);
        check("35 \u00B5m", Dimension.LENGTH, 35e-6);
        // the prefix is squared with the metre: 1 mm² = (1e-3 m)²
        // (SI Brochure 9th ed., section 3, from memory, verify)
        check("25 mm\u00B2", Dimension.AREA, 25e-6);
    }
}
