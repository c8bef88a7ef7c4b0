package org.tjmargin.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** The checks of the Quantity record. */
class QuantityTest {

    @Test
    void holdsItsComponents() {
        Quantity q = new Quantity(0.041, Dimension.CURRENT);
        assertEquals(0.041, q.valueSi());
        assertEquals(Dimension.CURRENT, q.dimension());
        assertEquals(q, new Quantity(0.041, Dimension.CURRENT));
    }

    @Test
    void rejectsNonFiniteValues() {
        for (double x : new double[] {Double.NaN, Double.POSITIVE_INFINITY,
                Double.NEGATIVE_INFINITY}) {
            assertThrows(IllegalArgumentException.class, () -> new Quantity(x, Dimension.POWER));
        }
        assertThrows(NullPointerException.class, () -> new Quantity(1, null));
    }

    @Test
    void rejectsAbsoluteTemperatureBelowZeroKelvin() {
        assertThrows(IllegalArgumentException.class,
                () -> new Quantity(-0.001, Dimension.TEMPERATURE));
        assertEquals(0.0, new Quantity(0, Dimension.TEMPERATURE).valueSi());
        // a negative temperature difference is fine
        assertEquals(-5.0, new Quantity(-5, Dimension.TEMPERATURE_DIFFERENCE).valueSi());
    }

    @Test
    void negativeZeroEqualsZero() {
        assertEquals(new Quantity(0.0, Dimension.VOLTAGE), new Quantity(-0.0, Dimension.VOLTAGE));
        assertEquals(Double.doubleToRawLongBits(0.0),
                Double.doubleToRawLongBits(new Quantity(-0.0, Dimension.VOLTAGE).valueSi()));
    }
}
