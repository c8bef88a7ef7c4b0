package org.tjmargin.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.HashSet;
import java.util.Set;

import org.junit.jupiter.api.Test;

/** The table of units is consistent: every unit is read one way only. */
class UnitTableTest {

    @Test
    void noSpellingIsAPrefixBeforeAnotherSpelling() {
        Set<String> spellings = new HashSet<>();
        UnitTable.forms().forEach(f -> spellings.add(f.spelling()));
        for (String s : spellings) {
            if (s.isEmpty()) {
                continue; // the plain number; a prefix alone is not read as a unit
            }
            for (SiPrefix p : SiPrefix.values()) {
                assertFalse(spellings.contains(p.symbol() + s),
                        p.symbol() + s + " would be both a unit and " + p.prefixName() + s);
            }
            assertFalse(spellings.contains("u" + s), "u" + s);
        }
    }

    @Test
    void everyDimensionCanBeRead() {
        Set<Dimension> covered = EnumSet.noneOf(Dimension.class);
        UnitTable.forms().forEach(f -> covered.addAll(f.dimensions()));
        assertEquals(EnumSet.allOf(Dimension.class), covered);
    }

    @Test
    void siSymbolOfEveryDimensionWithAUnitIsReadAsThatDimension() {
        for (Dimension d : Dimension.values()) {
            if (d == Dimension.FRACTION) {
                continue; // its SI unit "1" is written as a plain number
            }
            assertEquals(7.0, Quantities.parse("7 " + d.symbol(), d), d.name());
        }
    }

    @Test
    void normalisationBringsVariantsTogether() {
        assertEquals("W/(m\u00B7K)", UnitSpelling.normalise("W/( m * K )"));
        assertEquals("k\u03A9", UnitSpelling.normalise("kohm"));
        assertEquals("\u00B5s", UnitSpelling.normalise("\u03BCs"));
        assertEquals("W/(m\u00B2\u00B7\u00B0C)", UnitSpelling.normalise("W/(m^2 degC)"));
        assertTrue(UnitSpelling.isAmbiguous("W/m\u00B7K"));
        assertFalse(UnitSpelling.isAmbiguous("W/(m\u00B7K)"));
        assertFalse(UnitSpelling.isAmbiguous("A\u00B7s"));
    }
}
