package org.tjmargin.units;

import java.math.BigDecimal;
import java.util.List;

/**
 * Reads a quantity text: number, unit, dimension check, and exact conversion to SI.
 *
 * <p>Every unit read here is a power of ten of its SI unit, so the conversion is done in decimal
 * ({@link BigDecimal}), adding 273.15 K for degrees Celsius, and rounded to a double once: the
 * result is the double nearest to the exact value of the text.
 */
final class QuantityParser {

    /**
     * Decimal exponents beyond this are far outside the double range (about 1e-324 to 1e308)
     * whatever the unit; checking them first keeps the decimal arithmetic small.
     */
    private static final long MAGNITUDE_LIMIT = 1000;

    static final BigDecimal ZERO_CELSIUS = new BigDecimal("273.15");

    private QuantityParser() {
    }

    static Quantity parse(String text, List<Dimension> allowed) {
        NumberLexer.Lexed lexed = NumberLexer.lex(text, allowed);
        String unit = lexed.unit();
        if (unit.isEmpty() && !allowed.contains(Dimension.FRACTION)) {
            throw Rejections.missingUnit(text, allowed);
        }
        UnitTable.Resolved resolved = UnitTable.resolve(text, unit, allowed);
        List<Dimension> unitDimensions = resolved.dimensions();
        Dimension match = null;
        for (Dimension d : allowed) {
            if (unitDimensions.contains(d)) {
                match = d;
                break;
            }
        }
        if (match == null) {
            throw Rejections.wrongDimension(text, unit, unitDimensions.get(0),
                    resolved.prefix() != null, allowed);
        }
        BigDecimal exact = exactSi(text, unit, lexed, resolved.scaleExponent(), allowed);
        boolean absoluteCelsius = match == Dimension.TEMPERATURE && resolved.form().celsius();
        if (absoluteCelsius) {
            exact = exact.add(ZERO_CELSIUS);
        }
        if (match == Dimension.TEMPERATURE && exact.signum() < 0) {
            throw Rejections.belowAbsoluteZero(text, unit, allowed);
        }
        double value = exact.doubleValue();
        if (Double.isInfinite(value)) {
            throw Rejections.tooLarge(text, unit, allowed);
        }
        if (value == 0 && exact.signum() != 0) {
            throw Rejections.underflow(text, unit, allowed);
        }
        return new Quantity(value, match);
    }

    private static BigDecimal exactSi(String text, String unit, NumberLexer.Lexed lexed,
            int unitScale, List<Dimension> allowed) {
        BigDecimal significand = lexed.significand();
        if (significand.signum() == 0) {
            return BigDecimal.ZERO;
        }
        long exponent = lexed.exponent() + unitScale;
        long magnitude = (long) significand.precision() - significand.scale() - 1 + exponent;
        if (magnitude > MAGNITUDE_LIMIT) {
            throw Rejections.tooLarge(text, unit, allowed);
        }
        if (magnitude < -MAGNITUDE_LIMIT) {
            throw Rejections.underflow(text, unit, allowed);
        }
        return significand.scaleByPowerOfTen((int) exponent);
    }
}
