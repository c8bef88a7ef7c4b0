package org.tjmargin.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tjmargin.units.Close.assertExactDecimal;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;

/** The prefixes against BIPM SI Brochure, 9th ed. 2019, Table 7 (SI prefixes). */
class SiPrefixTest {

    /** Name, symbol and power of ten, copied from Table 7 of the SI Brochure (9th ed.). */
    private record Row(String name, String symbol, int exponent) {
    }

    private static final List<Row> TABLE_7 = List.of(
            new Row("yocto", "y", -24), new Row("zepto", "z", -21), new Row("atto", "a", -18),
            new Row("femto", "f", -15), new Row("pico", "p", -12), new Row("nano", "n", -9),
            new Row("micro", "\u00B5", -6), new Row("milli", "m", -3), new Row("centi", "c", -2),
            new Row("kilo", "k", 3), new Row("mega", "M", 6), new Row("giga", "G", 9));

    @Test
    void everyPrefixMatchesTheBrochure() {
        assertEquals(TABLE_7.size(), SiPrefix.values().length);
        for (Row row : TABLE_7) {
            SiPrefix p = SiPrefix.fromSymbol(row.symbol()).orElseThrow();
            assertEquals(row.name(), p.prefixName());
            assertEquals(row.symbol(), p.symbol());
            assertEquals(row.exponent(), p.exponent(), row.name());
            assertEquals(Double.parseDouble("1e" + row.exponent()), p.factor(), row.name());
        }
    }

    @Test
    void everyPrefixScalesAVoltReadFromText() {
        for (Row row : TABLE_7) {
            if (row.symbol().equals("c")) {
                continue; // centi is read only on the metre, below
            }
            double expected = Double.parseDouble("3.5e" + row.exponent());
            assertExactDecimal(expected,
                    Quantities.parse("3.5 " + row.symbol() + "V", Dimension.VOLTAGE), row.name());
        }
        assertExactDecimal(3.5e-2, Quantities.parse("3.5 cm", Dimension.LENGTH), "centi");
    }

    @Test
    void microHasThreeSpellings() {
        assertEquals(Optional.of(SiPrefix.MICRO), SiPrefix.fromSymbol("\u00B5"));
        assertEquals(Optional.of(SiPrefix.MICRO), SiPrefix.fromSymbol("\u03BC"));
        assertEquals(Optional.of(SiPrefix.MICRO), SiPrefix.fromSymbol("u"));
    }

    @Test
    void unknownSymbolsAreNotPrefixes() {
        for (String s : List.of("T", "P", "h", "d", "K", "", "mu", "x")) {
            assertTrue(SiPrefix.fromSymbol(s).isEmpty(), s);
        }
    }

    @Test
    void onlyCentiIsNotAnEngineeringPrefix() {
        for (SiPrefix p : SiPrefix.values()) {
            assertEquals(p != SiPrefix.CENTI, p.isEngineering(), p.name());
        }
        assertFalse(SiPrefix.CENTI.isEngineering());
    }
}
