package org.tjmargin.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.Map;
import java.util.Set;

import org.junit.jupiter.api.Test;

/** The unit symbols against the SI Brochure, and the names used in messages. */
class DimensionTest {

    @Test
    void symbolsOfNamedUnitsMatchTheBrochure() {
        // BIPM SI Brochure, 9th ed. 2019: Table 2 (base units s, m, A, K) and Table 4 (units
        // with special names: Hz, J, W, C, V, Ω); table numbers from memory, verify.
        Map<Dimension, String> brochure = Map.of(
                Dimension.TIME, "s", Dimension.LENGTH, "m", Dimension.CURRENT, "A",
                Dimension.TEMPERATURE, "K", Dimension.FREQUENCY, "Hz", Dimension.ENERGY, "J",
                Dimension.POWER, "W", Dimension.CHARGE, "C", Dimension.VOLTAGE, "V",
                Dimension.RESISTANCE, "\u03A9");
        brochure.forEach((d, symbol) -> assertEquals(symbol, d.symbol(), d.name()));
    }

    @Test
    void everyDimensionHasASymbolAndADistinctName() {
        Set<String> names = new HashSet<>();
        for (Dimension d : Dimension.values()) {
            assertFalse(d.symbol().isBlank(), d.name());
            assertTrue(names.add(d.humanName()), "name used twice: " + d.humanName());
            assertEquals(d.humanName().toLowerCase(java.util.Locale.ROOT), d.humanName());
        }
    }

    @Test
    void messagePhrasesUseTheRightArticle() {
        assertEquals("a current in A", Dimension.CURRENT.expectedPhrase());
        assertEquals("an energy in J", Dimension.ENERGY.expectedPhrase());
        assertEquals("an area in m\u00B2", Dimension.AREA.expectedPhrase());
        assertTrue(Dimension.TEMPERATURE.expectedPhrase().startsWith("an absolute temperature"));
    }
}
