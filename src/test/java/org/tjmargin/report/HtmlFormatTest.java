package org.tjmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.tjmargin.derating.Limit;
import org.tjmargin.derating.Measure;
import org.tjmargin.units.Dimension;
import org.tjmargin.variation.Range;

/** Display of numbers in the report. */
class HtmlFormatTest {

    @Test
    void temperaturesHaveOneDecimalInCelsius() {
        assertEquals("85.0 °C", HtmlFormat.temperature(358.15));
        assertEquals("-40.0 °C", HtmlFormat.temperature(233.15));
        assertEquals("1000.0 °C", HtmlFormat.temperature(1273.15));
        assertEquals("156.8 °C", HtmlFormat.temperature(429.96));
    }

    @Test
    void marginsInPerCentWithOneDecimal() {
        assertEquals("12.1 %", HtmlFormat.margin(0.12104));
        assertEquals("-680.0 %", HtmlFormat.margin(-6.8));
        assertEquals("0.0 %", HtmlFormat.margin(0.0));
        // Past -10 000 % only stand-ins and meaningless figures remain (a rating at zero counts as a ratio of 1e9).
        assertEquals("-10000.0 %", HtmlFormat.margin(-100.0));
        assertEquals("< -10000 %", HtmlFormat.margin(-100.001));
        assertEquals("< -10000 %", HtmlFormat.margin(1 - 1e9 / 0.8));
    }

    @Test
    void plainNumbersKeepThreeSignificantDigits() {
        assertEquals("1.00", HtmlFormat.plain(1.0));
        assertEquals("11.1", HtmlFormat.plain(11.1234));
        assertEquals("0.00657", HtmlFormat.plain(0.006571));
        assertEquals("1010", HtmlFormat.plain(1013.0));
        assertEquals("-0.0167", HtmlFormat.plain(-0.016666));
        assertEquals("1.00e+09", HtmlFormat.plain(1e9));
        assertEquals("0", HtmlFormat.plain(0.0));
    }

    @Test
    void nonFiniteValuesShowAsADash() {
        assertEquals("—", HtmlFormat.plain(Double.NaN));
        assertEquals("—", HtmlFormat.temperature(Double.POSITIVE_INFINITY));
        assertEquals("—", HtmlFormat.si(Double.NaN, Dimension.POWER));
        assertEquals("—", HtmlFormat.margin(Double.NaN));
    }

    @Test
    void limitsInTheRulesUnit() {
        assertEquals("125.0 °C", HtmlFormat.limit(new Limit.Fixed(398.15), Measure.JUNCTION_TEMPERATURE));
        assertEquals("0.500", HtmlFormat.limit(new Limit.Fixed(0.5), Measure.POWER_RATIO));
        assertEquals("Tj max", HtmlFormat.limit(new Limit.BelowTjMax(0), Measure.JUNCTION_TEMPERATURE));
        assertEquals("Tj max − 40.0 K", HtmlFormat.limit(new Limit.BelowTjMax(40), Measure.JUNCTION_TEMPERATURE));
        assertEquals("lower of 125.0 °C and Tj max − 40.0 K", HtmlFormat.limit(
                new Limit.LowerOf(new Limit.Fixed(398.15), new Limit.BelowTjMax(40)), Measure.JUNCTION_TEMPERATURE));
    }

    @Test
    void rangesShowExtremesAndNominal() {
        assertEquals("12.0 V", HtmlFormat.range(Range.exact(12.0), Dimension.VOLTAGE));
        assertEquals("10.8 V … 13.2 V (nominal 12.0 V)", HtmlFormat.range(Range.relative(12.0, 0.1),
                Dimension.VOLTAGE));
        assertEquals("0.900 … 1.10 (nominal 1.00)", HtmlFormat.plainRange(Range.between(0.9, 1.1)));
    }
}
