package org.tjmargin.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.tjmargin.units.Close.assertExactDecimal;

import org.junit.jupiter.api.Test;

/**
 * Celsius and kelvin. Source for every value: BIPM SI Brochure, 9th ed. 2019, definition of the
 * degree Celsius, t/°C = T/K - 273.15 (section 2.3.1, from memory, verify).
 */
class TemperatureTest {

    @Test
    void zeroCelsiusIs27315Kelvin() {
        assertEquals(273.15, Quantities.ZERO_CELSIUS_K);
        assertEquals(273.15, Quantities.celsiusToKelvin(0));
        assertEquals(0.0, Quantities.kelvinToCelsius(273.15));
        assertEquals(273.15, Quantities.parse("0 \u00B0C", Dimension.TEMPERATURE));
    }

    @Test
    void conversionsBothWays() {
        assertExactDecimal(398.15, Quantities.celsiusToKelvin(125), "125 °C");
        assertExactDecimal(233.15, Quantities.celsiusToKelvin(-40), "-40 °C");
        assertExactDecimal(-273.15, Quantities.kelvinToCelsius(0), "0 K");
        assertExactDecimal(26.85, Quantities.kelvinToCelsius(300), "300 K");
    }

    @Test
    void absoluteZeroIsTheLowestTemperature() {
        assertEquals(0.0, Quantities.parse("-273.15 \u00B0C", Dimension.TEMPERATURE));
        assertEquals(0.0, Quantities.parse("0 K", Dimension.TEMPERATURE));
        for (String below : new String[] {"-273.16 \u00B0C", "-300 degC", "-1 K", "-1e-9 K"}) {
            QuantityException e = assertThrows(QuantityException.class,
                    () -> Quantities.parse(below, Dimension.TEMPERATURE), below);
            assertEquals(QuantityException.Kind.BELOW_ABSOLUTE_ZERO, e.kind(), below);
        }
    }

    @Test
    void celsiusIsOffsetOnlyAsAnAbsoluteTemperature() {
        assertExactDecimal(298.15, Quantities.parse("25 \u00B0C", Dimension.TEMPERATURE), "abs");
        assertExactDecimal(25, Quantities.parse("25 \u00B0C", Dimension.TEMPERATURE_DIFFERENCE),
                "difference");
        assertExactDecimal(25, Quantities.parse("25 \u00B0C/W", Dimension.THERMAL_RESISTANCE),
                "in a compound unit");
    }

    @Test
    void kelvinAsAbsoluteTemperatureTakesNoPrefix() {
        QuantityException e = assertThrows(QuantityException.class,
                () -> Quantities.parse("300 mK", Dimension.TEMPERATURE));
        assertEquals(QuantityException.Kind.WRONG_DIMENSION, e.kind());
        assertEquals(Dimension.TEMPERATURE_DIFFERENCE, e.actual().orElseThrow());
        assertExactDecimal(0.3, Quantities.parse("300 mK", Dimension.TEMPERATURE_DIFFERENCE),
                "mK difference");
    }

    @Test
    void celsiusTakesNoPrefixAtAll() {
        for (Dimension d : new Dimension[] {Dimension.TEMPERATURE,
                Dimension.TEMPERATURE_DIFFERENCE}) {
            QuantityException e = assertThrows(QuantityException.class,
                    () -> Quantities.parse("5 m\u00B0C", d));
            assertEquals(QuantityException.Kind.PREFIX_NOT_ALLOWED, e.kind());
            assertEquals("m\u00B0C", e.unit().orElseThrow());
        }
        QuantityException k = assertThrows(QuantityException.class,
                () -> Quantities.parse("5 kdegC", Dimension.TEMPERATURE));
        assertEquals(QuantityException.Kind.PREFIX_NOT_ALLOWED, k.kind());
    }
}
