package org.tjmargin.units;

import java.util.List;
import java.util.stream.Collectors;

import org.tjmargin.units.QuantityException.Kind;

/** Builds the {@link QuantityException}s of this package, with their messages, in one place. */
final class Rejections {

    private Rejections() {
    }

    static QuantityException empty(String text, List<Dimension> expected) {
        return new QuantityException(Kind.EMPTY, text, null, expected, null,
                "empty value, expected " + phrases(expected));
    }

    static QuantityException notANumber(String text, List<Dimension> expected) {
        return new QuantityException(Kind.NOT_A_NUMBER, text, null, expected, null,
                quote(text) + " does not start with a number, expected " + phrases(expected));
    }

    static QuantityException decimalComma(String text, List<Dimension> expected) {
        return new QuantityException(Kind.NOT_A_NUMBER, text, null, expected, null,
                quote(text) + " has a decimal comma; write a decimal point (1.5, not 1,5)");
    }

    static QuantityException missingUnit(String text, List<Dimension> expected) {
        return new QuantityException(Kind.MISSING_UNIT, text, null, expected, null,
                quote(text) + " has no unit, expected " + phrases(expected));
    }

    static QuantityException unknownUnit(String text, String unit, List<Dimension> expected) {
        return new QuantityException(Kind.UNKNOWN_UNIT, text, unit, expected, null,
                quote(text) + " has unknown unit " + unit + ", expected " + phrases(expected));
    }

    static QuantityException ambiguousUnit(String text, String unit, List<Dimension> expected) {
        return new QuantityException(Kind.AMBIGUOUS_UNIT, text, unit, expected, null,
                quote(text) + " has ambiguous unit " + unit
                        + ": put a product after \"/\" in parentheses, as in W/(m\u00B7K)");
    }

    static QuantityException prefixNotAllowed(String text, String unit, SiPrefix prefix,
            String bareUnit, List<Dimension> expected) {
        String why = prefix == SiPrefix.CENTI
                ? "the prefix c is read only on m and m\u00B2"
                : "the prefix " + prefix.symbol() + " is not read on " + bareUnit
                        + "; write the value in " + bareUnit;
        return new QuantityException(Kind.PREFIX_NOT_ALLOWED, text, unit, expected, null,
                quote(text) + " has unit " + unit + ": " + why);
    }

    static QuantityException wrongDimension(String text, String unit, Dimension actual,
            boolean prefixed, List<Dimension> expected) {
        String hint = "";
        if (actual == Dimension.TEMPERATURE_DIFFERENCE && prefixed
                && expected.contains(Dimension.TEMPERATURE)) {
            hint = " (no prefix is read on an absolute temperature)";
        } else if (actual == Dimension.CHARGE && unit.equals("C")
                && (expected.contains(Dimension.TEMPERATURE)
                        || expected.contains(Dimension.TEMPERATURE_DIFFERENCE))) {
            hint = " (C is the coulomb; degrees Celsius are written \u00B0C or degC)";
        }
        return new QuantityException(Kind.WRONG_DIMENSION, text, unit, expected, actual,
                quote(text) + " has unit " + unit + " (" + actual.humanName() + "), expected "
                        + phrases(expected) + hint);
    }

    static QuantityException notFinite(String text, List<Dimension> expected) {
        return new QuantityException(Kind.NOT_FINITE, text, null, expected, null,
                quote(text) + " is not a finite number");
    }

    static QuantityException tooLarge(String text, String unit, List<Dimension> expected) {
        return new QuantityException(Kind.NOT_FINITE, text, unit, expected, null,
                quote(text) + " is too large to be held as a finite number");
    }

    static QuantityException underflow(String text, String unit, List<Dimension> expected) {
        return new QuantityException(Kind.UNDERFLOW, text, unit, expected, null,
                quote(text) + " is too small in magnitude to be held as a number; it would read"
                        + " as zero");
    }

    static QuantityException belowAbsoluteZero(String text, String unit,
            List<Dimension> expected) {
        return new QuantityException(Kind.BELOW_ABSOLUTE_ZERO, text, unit, expected, null,
                quote(text) + " is below absolute zero (0 K = -273.15 \u00B0C)");
    }

    private static String quote(String text) {
        return "\"" + text + "\"";
    }

    private static String phrases(List<Dimension> expected) {
        return expected.stream().map(Dimension::expectedPhrase)
                .collect(Collectors.joining(" or "));
    }
}
