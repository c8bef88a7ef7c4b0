package org.tjmargin.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tjmargin.units.QuantityException.Kind;

/** Texts that are not quantities are rejected with the right kind and parts. */
class RejectionTest {

    private static QuantityException reject(String text, Dimension d, Kind kind) {
        QuantityException e = assertThrows(QuantityException.class,
                () -> Quantities.parse(text, d), text);
        assertEquals(kind, e.kind(), () -> "\"" + text + "\": " + e.getMessage());
        assertEquals(text, e.text());
        assertEquals(List.of(d), e.expected());
        if (kind != Kind.WRONG_DIMENSION) {
            assertTrue(e.actual().isEmpty(), text);
        }
        return e;
    }

    @Test
    void emptyAndBlank() {
        for (String t : List.of("", " ", "\t\n", "\u00A0\u2009")) {
            reject(t, Dimension.VOLTAGE, Kind.EMPTY);
        }
    }

    @Test
    void notANumber() {
        for (String t : List.of("V", "abc", "five V", "- 5 V", ".V", "e3 V", "--5 V", "+",
                "\u0665 V")) {
            reject(t, Dimension.VOLTAGE, Kind.NOT_A_NUMBER);
        }
    }

    @Test
    void decimalCommaIsNotANumber() {
        reject("1,5 V", Dimension.VOLTAGE, Kind.NOT_A_NUMBER);
        reject("1,5", Dimension.FRACTION, Kind.NOT_A_NUMBER);
    }

    @Test
    void plainNumberOnlyForAFraction() {
        for (Dimension d : Dimension.values()) {
            if (d == Dimension.FRACTION) {
                assertEquals(0.5, Quantities.parse("0.5", d));
            } else {
                reject("0.5", d, Kind.MISSING_UNIT);
            }
        }
    }

    @Test
    void unknownUnits() {
        for (String t : List.of("5 v", "5 volt", "5 Q", "5 k", "5 TV", "5 hV", "5 V V",
                "5 V extra", "5 mV/mK", "5 /K", "5 \u00B0K", "5 deg C", "5 As", "5 kw",
                "0x10 V")) {
            QuantityException e = reject(t, Dimension.VOLTAGE, Kind.UNKNOWN_UNIT);
            assertTrue(e.unit().isPresent(), t);
        }
        assertEquals("qV", reject("5 qV", Dimension.VOLTAGE, Kind.UNKNOWN_UNIT).unit()
                .orElseThrow());
    }

    @Test
    void productAfterSolidusWithoutParenthesesIsAmbiguous() {
        for (String t : List.of("0.5 W/m\u00B7K", "0.5 W/m K", "0.5 W/m*K")) {
            reject(t, Dimension.THERMAL_CONDUCTIVITY, Kind.AMBIGUOUS_UNIT);
        }
        reject("10 W/m\u00B2\u00B7K", Dimension.HEAT_TRANSFER_COEFFICIENT, Kind.AMBIGUOUS_UNIT);
    }

    @Test
    void prefixesWhereNoneIsRead() {
        reject("5 m%", Dimension.FRACTION, Kind.PREFIX_NOT_ALLOWED);
        reject("5 kppm", Dimension.FRACTION, Kind.PREFIX_NOT_ALLOWED);
        reject("5 mK/W", Dimension.THERMAL_RESISTANCE, Kind.PREFIX_NOT_ALLOWED);
        reject("5 kA\u00B2s", Dimension.ACTION_INTEGRAL, Kind.PREFIX_NOT_ALLOWED);
        reject("5 mA^2s", Dimension.ACTION_INTEGRAL, Kind.PREFIX_NOT_ALLOWED);
        reject("5 m%/K", Dimension.RELATIVE_TEMPERATURE_COEFFICIENT, Kind.PREFIX_NOT_ALLOWED);
        // centi only on the metre
        reject("5 cV", Dimension.VOLTAGE, Kind.PREFIX_NOT_ALLOWED);
        reject("5 cs", Dimension.TIME, Kind.PREFIX_NOT_ALLOWED);
    }

    @Test
    void nonFiniteNumbers() {
        for (String t : List.of("NaN", "nan V", "Infinity", "-Infinity V", "+inf V",
                "\u221E V", "1e999 V", "-1e999 V", "1e99999999999999999999 V", "1e308 kV")) {
            reject(t, Dimension.VOLTAGE, Kind.NOT_FINITE);
        }
        reject("NaN", Dimension.FRACTION, Kind.NOT_FINITE);
    }

    @Test
    void nonZeroNumbersTooSmallToHold() {
        for (String t : List.of("1e-999 V", "1e-330 V", "1e-99999999999999999999 V",
                "1e-320 nV")) {
            reject(t, Dimension.VOLTAGE, Kind.UNDERFLOW);
        }
        // zero written with a huge exponent is still zero
        assertEquals(0.0, Quantities.parse("0e99999 V", Dimension.VOLTAGE));
        // the smallest subnormal double (about 4.9e-324) is still held
        assertTrue(Quantities.parse("5e-324 V", Dimension.VOLTAGE) > 0);
    }

    @Test
    void nullArguments() {
        assertThrows(NullPointerException.class, () -> Quantities.parse(null, Dimension.VOLTAGE));
        assertThrows(NullPointerException.class, () -> Quantities.parse("5 V", null));
        assertThrows(NullPointerException.class,
                () -> Quantities.parseAny("5 V", Dimension.VOLTAGE, null));
        assertThrows(IllegalArgumentException.class, () -> Quantities.parseAny("5 V"));
    }
}
