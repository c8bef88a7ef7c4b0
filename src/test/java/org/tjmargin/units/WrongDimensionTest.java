package org.tjmargin.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tjmargin.units.Close.assertExactDecimal;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tjmargin.units.QuantityException.Kind;

/** A known unit of another dimension, and choosing among allowed dimensions. */
class WrongDimensionTest {

    @Test
    void wrongDimensionNamesExpectedAndActual() {
        QuantityException e = assertThrows(QuantityException.class,
                () -> Quantities.parse("41 mV", Dimension.CURRENT));
        assertEquals(Kind.WRONG_DIMENSION, e.kind());
        assertEquals("41 mV", e.text());
        assertEquals("mV", e.unit().orElseThrow());
        assertEquals(List.of(Dimension.CURRENT), e.expected());
        assertEquals(Dimension.VOLTAGE, e.actual().orElseThrow());
        // the message names both dimensions and the expected unit; its wording may change
        assertTrue(e.getMessage().contains("voltage"), e.getMessage());
        assertTrue(e.getMessage().contains("current"), e.getMessage());
    }

    @Test
    void actualDimensionForEachKindOfUnit() {
        assertActual("150 K/W", Dimension.THERMAL_CONDUCTIVITY, Dimension.THERMAL_RESISTANCE);
        assertActual("390 W/mK", Dimension.POWER_DERATING_SLOPE,
                Dimension.THERMAL_CONDUCTIVITY);
        assertActual("25 \u00B0C", Dimension.CURRENT, Dimension.TEMPERATURE);
        assertActual("25 C", Dimension.TEMPERATURE, Dimension.CHARGE);
        assertActual("5 %", Dimension.VOLTAGE, Dimension.FRACTION);
        assertActual("2 mV/K", Dimension.RELATIVE_TEMPERATURE_COEFFICIENT,
                Dimension.VOLTAGE_TEMPERATURE_COEFFICIENT);
        assertActual("0.5 A\u00B7s", Dimension.ACTION_INTEGRAL, Dimension.CHARGE);
        assertActual("25 mm\u00B2", Dimension.LENGTH, Dimension.AREA);
    }

    private static void assertActual(String text, Dimension expected, Dimension actual) {
        QuantityException e = assertThrows(QuantityException.class,
                () -> Quantities.parse(text, expected), text);
        assertEquals(Kind.WRONG_DIMENSION, e.kind(), text);
        assertEquals(actual, e.actual().orElseThrow(), text);
    }

    @Test
    void parseAnyTakesTheFirstAllowedDimensionTheUnitMatches() {
        Dimension[] tc = {Dimension.VOLTAGE_TEMPERATURE_COEFFICIENT,
                Dimension.RELATIVE_TEMPERATURE_COEFFICIENT};
        Quantity absolute = Quantities.parseAny("2 mV/K", tc);
        assertEquals(Dimension.VOLTAGE_TEMPERATURE_COEFFICIENT, absolute.dimension());
        assertExactDecimal(2e-3, absolute.valueSi(), "2 mV/K");
        Quantity relative = Quantities.parseAny("0.06 %/K", tc);
        assertEquals(Dimension.RELATIVE_TEMPERATURE_COEFFICIENT, relative.dimension());
        assertExactDecimal(6e-4, relative.valueSi(), "0.06 %/K");
    }

    @Test
    void orderOfAllowedDimensionsDecidesBetweenTemperatureAndDifference() {
        Quantity diff = Quantities.parseAny("25 \u00B0C", Dimension.TEMPERATURE_DIFFERENCE,
                Dimension.TEMPERATURE);
        assertEquals(new Quantity(25, Dimension.TEMPERATURE_DIFFERENCE), diff);
        Quantity abs = Quantities.parseAny("25 \u00B0C", Dimension.TEMPERATURE,
                Dimension.TEMPERATURE_DIFFERENCE);
        assertEquals(Dimension.TEMPERATURE, abs.dimension());
        assertExactDecimal(298.15, abs.valueSi(), "25 °C absolute");
        // a prefixed kelvin can only be a difference, whatever the order
        assertEquals(Dimension.TEMPERATURE_DIFFERENCE, Quantities.parseAny("5 mK",
                Dimension.TEMPERATURE, Dimension.TEMPERATURE_DIFFERENCE).dimension());
    }

    @Test
    void parseAnyReportsEveryAllowedDimension() {
        QuantityException e = assertThrows(QuantityException.class,
                () -> Quantities.parseAny("41 mV", Dimension.CURRENT, Dimension.POWER));
        assertEquals(Kind.WRONG_DIMENSION, e.kind());
        assertEquals(List.of(Dimension.CURRENT, Dimension.POWER), e.expected());
        assertEquals(Dimension.VOLTAGE, e.actual().orElseThrow());
    }

    @Test
    void plainNumberAllowedWhenAFractionIsAmongTheAllowed() {
        Quantity q = Quantities.parseAny("0.5", Dimension.VOLTAGE, Dimension.FRACTION);
        assertEquals(new Quantity(0.5, Dimension.FRACTION), q);
        assertEquals(Kind.MISSING_UNIT, assertThrows(QuantityException.class,
                () -> Quantities.parseAny("0.5", Dimension.VOLTAGE, Dimension.CURRENT)).kind());
    }
}
