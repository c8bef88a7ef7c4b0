package org.tjmargin.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.tjmargin.units.Close.assertExactDecimal;

import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * Every accepted way of writing each unit reads to the same SI value. Prefix values: BIPM SI
 * Brochure, 9th ed. 2019, Table 7; ppm = 1e-6 and % = 1e-2 (from memory, verify).
 */
class SpellingsTest {

    private static void all(Dimension d, double expectedSi, List<String> texts) {
        for (String t : texts) {
            assertExactDecimal(expectedSi, Quantities.parse(t, d), "\"" + t + "\" as " + d);
        }
    }

    @Test
    void ohmInEverySpelling() {
        all(Dimension.RESISTANCE, 2, List.of("2 \u03A9", "2 \u2126", "2 ohm", "2 ohms",
                "2 Ohm", "2 Ohms", "2\u03A9", "2ohm"));
        all(Dimension.RESISTANCE, 4.7e3, List.of("4.7 k\u03A9", "4.7 k\u2126", "4.7 kohm",
                "4.7 kOhm", "4.7k\u03A9"));
        all(Dimension.RESISTANCE, 500, List.of("0.5 kohm", "0.5 k\u03A9"));
        all(Dimension.RESISTANCE, 1e6, List.of("1 Mohm", "1 M\u03A9", "1 MOhm"));
        all(Dimension.RESISTANCE, 1e-3, List.of("1 mohm", "1 m\u03A9"));
    }

    @Test
    void spacesBetweenNumberAndUnit() {
        all(Dimension.VOLTAGE, 6.2, List.of("6.2 V", "6.2V", "6.2\u2009V", "6.2\u00A0V",
                "6.2\u202FV", "  6.2   V  ", "\t6.2 V\n"));
        all(Dimension.CURRENT, 41e-3, List.of("41mA", "41 mA", "41\u2009mA"));
    }

    @Test
    void numberForms() {
        all(Dimension.CURRENT, 1e-3, List.of("1e-3 A", "1E-3 A", "0.001 A", ".001 A",
                "+1e-3A", "1 mA", "1. mA", "0.1e-2 A"));
        all(Dimension.POWER, 1.5e3, List.of("1.5E3 W", "1.5e+3 W", "1.5 kW", "1500 W"));
        all(Dimension.TEMPERATURE, 233.15, List.of("-40 \u00B0C", "\u221240 \u00B0C",
                "-40degC", "233.15 K"));
    }

    @Test
    void temperatureDifferences() {
        // a difference of 1 °C is a difference of 1 K
        // (SI Brochure 9th ed., 2.3.1, from memory, verify)
        all(Dimension.TEMPERATURE_DIFFERENCE, 10, List.of("10 K", "10 \u00B0C", "10 degC",
                "10 \u2103", "10000 mK"));
        all(Dimension.TEMPERATURE_DIFFERENCE, -5, List.of("-5 K", "-5 \u00B0C"));
        all(Dimension.TEMPERATURE_DIFFERENCE, 2e-3, List.of("2 mK"));
    }

    @Test
    void thermalResistance() {
        all(Dimension.THERMAL_RESISTANCE, 150, List.of("150 K/W", "150 \u00B0C/W",
                "150 degC/W", "150K/W", "150 K / W"));
    }

    @Test
    void thermalConductivity() {
        all(Dimension.THERMAL_CONDUCTIVITY, 390, List.of("390 W/(m\u00B7K)", "390 W/(m*K)",
                "390 W/(m K)", "390 W/m/K", "390 W/mK", "390 W/(m\u22C5K)", "390 W/(m\u00B7\u00B0C)",
                "390 W/m/degC", "390 W/( m K )"));
        all(Dimension.THERMAL_CONDUCTIVITY, 0.026, List.of("26 mW/(m\u00B7K)", "26 mW/mK"));
    }

    @Test
    void heatTransferCoefficient() {
        all(Dimension.HEAT_TRANSFER_COEFFICIENT, 10, List.of("10 W/(m\u00B2\u00B7K)",
                "10 W/(m^2\u00B7K)", "10 W/(m2\u00B7K)", "10 W/(m^2*K)", "10 W/(m2 K)",
                "10 W/m\u00B2/K", "10 W/m^2/K", "10 W/m2/K", "10 W/m\u00B2K", "10 W/m2K",
                "10 W/(m\u00B2\u00B7degC)"));
        all(Dimension.HEAT_TRANSFER_COEFFICIENT, 1.2e3, List.of("1.2 kW/(m\u00B2\u00B7K)"));
    }

    @Test
    void temperatureCoefficients() {
        all(Dimension.VOLTAGE_TEMPERATURE_COEFFICIENT, 2e-3, List.of("2 mV/K",
                "2 mV/\u00B0C", "2 mV/degC", "2000 \u00B5V/K", "0.002 V/K"));
        all(Dimension.RELATIVE_TEMPERATURE_COEFFICIENT, 6e-4, List.of("0.06 %/K",
                "0.06 %/\u00B0C", "0.06 %/degC", "600 ppm/K", "600 ppm/\u00B0C", "6e-4 1/K",
                "6e-4 K^-1", "6e-4 K\u207B\u00B9", "0.06%/K"));
        all(Dimension.RELATIVE_TEMPERATURE_COEFFICIENT, 1e-6, List.of("1 ppm/K"));
    }

    @Test
    void deratingSlopeAndHeatCapacity() {
        all(Dimension.POWER_DERATING_SLOPE, 6.67e-3, List.of("6.67 mW/K", "6.67 mW/\u00B0C",
                "6.67 mW/degC", "0.00667 W/K"));
        all(Dimension.HEAT_CAPACITY, 0.5, List.of("0.5 J/K", "500 mJ/K", "0.5 J/\u00B0C"));
    }

    @Test
    void fractions() {
        all(Dimension.FRACTION, 0.05, List.of("5 %", "5%", "0.05", "50000 ppm", "+0.05"));
        all(Dimension.FRACTION, 500e-6, List.of("500 ppm", "0.05 %", "0.0005"));
    }

    @Test
    void chargeActionIntegralFrequency() {
        all(Dimension.CHARGE, 2e-6, List.of("2 \u00B5C", "2 uC", "2e-6 C", "2 \u00B5A\u00B7s",
                "2 uA*s", "2 \u00B5A s"));
        all(Dimension.ACTION_INTEGRAL, 0.5, List.of("0.5 A\u00B2s", "0.5 A^2s",
                "0.5 A\u00B2\u00B7s", "0.5 A^2\u00B7s", "0.5 A^2 s"));
        all(Dimension.FREQUENCY, 50e3, List.of("50 kHz", "50000 Hz", "0.05 MHz"));
    }

    @Test
    void areaSquaresThePrefixedMetre() {
        // (1 cm)² = 1e-4 m², (1 mm)² = 1e-6 m², (1 µm)² = 1e-12 m²
        // (SI Brochure 9th ed., section 3, from memory, verify)
        all(Dimension.AREA, 3e-4, List.of("3 cm\u00B2", "3 cm2", "3 cm^2", "300 mm\u00B2",
                "300 mm2", "3e8 \u00B5m\u00B2", "0.0003 m\u00B2", "0.0003 m2"));
        all(Dimension.AREA, 2e6, List.of("2 km\u00B2"));
    }

    @Test
    void lengthTakesCenti() {
        all(Dimension.LENGTH, 0.025, List.of("2.5 cm", "25 mm", "25000 \u00B5m", "0.025 m"));
    }

    @Test
    void negativeZeroReadsAsZero() {
        assertEquals(0.0, Quantities.parse("-0 V", Dimension.VOLTAGE));
        assertEquals(Double.doubleToRawLongBits(0.0),
                Double.doubleToRawLongBits(Quantities.parse("-0 V", Dimension.VOLTAGE)));
    }
}
