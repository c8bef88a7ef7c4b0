package org.tjmargin.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * Formats SI values for display.
 *
 * <p>The exact decimal value of the double is rounded (half up) to the requested number of
 * significant digits, trailing zeros kept, so that the text shows its own precision. Then:
 * <ul>
 *   <li>units that take a prefix get the SI prefix that puts the number in [1, 1000) (for m², in
 *       [1, 10⁶), with cm² between m² and mm²); outside the prefixes read back (yocto to giga) the
 *       number is written as {@code 1.50e12};</li>
 *   <li>units without a prefix are written plainly between 10⁻⁴ and 10⁶, as {@code 1.50e-7}
 *       outside;</li>
 *   <li>an absolute temperature is written in °C, with as many decimals as the kelvin value
 *       needs for its significant digits (398.15 K with 4 digits: 125.0 °C).</li>
 * </ul>
 */
final class QuantityFormatter {

    /** How a dimension is displayed. */
    private record Style(String symbol, int prefixPower, boolean centi, int displayScale) {
    }

    private static final BigDecimal PLAIN_LOW = new BigDecimal("1e-4");
    private static final BigDecimal PLAIN_HIGH = new BigDecimal("1e6");
    private static final int MAX_DIGITS = 17;

    private QuantityFormatter() {
    }

    static String format(double si, Dimension d, int significantDigits) {
        Objects.requireNonNull(d, "dimension");
        if (!Double.isFinite(si)) {
            throw new IllegalArgumentException("cannot format a non-finite value: " + si);
        }
        if (significantDigits < 1 || significantDigits > MAX_DIGITS) {
            throw new IllegalArgumentException("significant digits must be 1 to " + MAX_DIGITS
                    + ", got " + significantDigits);
        }
        if (d == Dimension.TEMPERATURE) {
            return celsius(si, significantDigits) + " \u00B0C";
        }
        Style style = style(d);
        BigDecimal value = new BigDecimal(si).scaleByPowerOfTen(style.displayScale());
        BigDecimal rounded = roundSignificant(value, significantDigits);
        if (style.prefixPower() == 0) {
            return plainOrScientific(rounded) + " " + style.symbol();
        }
        return prefixed(rounded, style);
    }

    private static Style style(Dimension d) {
        return switch (d) {
            case VOLTAGE, CURRENT, RESISTANCE, POWER, ENERGY, TIME, LENGTH, CHARGE, FREQUENCY,
                    VOLTAGE_TEMPERATURE_COEFFICIENT, POWER_DERATING_SLOPE, HEAT_CAPACITY ->
                    new Style(d.symbol(), 1, false, 0);
            case AREA -> new Style(d.symbol(), 2, true, 0);
            case RELATIVE_TEMPERATURE_COEFFICIENT -> new Style("%/K", 0, false, 2);
            case FRACTION -> new Style("%", 0, false, 2);
            case TEMPERATURE, TEMPERATURE_DIFFERENCE, THERMAL_RESISTANCE, THERMAL_CONDUCTIVITY,
                    HEAT_TRANSFER_COEFFICIENT, ACTION_INTEGRAL -> new Style(d.symbol(), 0, false, 0);
        };
    }

    /** Rounds to n significant digits and pads with zeros so that n digits are shown. */
    static BigDecimal roundSignificant(BigDecimal v, int n) {
        if (v.signum() == 0) {
            return BigDecimal.ZERO.setScale(n - 1);
        }
        BigDecimal r = v.round(new MathContext(n, RoundingMode.HALF_UP));
        if (r.precision() < n) {
            r = r.setScale(r.scale() + n - r.precision());
        }
        return r;
    }

    private static String prefixed(BigDecimal r, Style style) {
        if (r.signum() == 0) {
            return r.toPlainString() + " " + style.symbol();
        }
        int e = leadingExponent(r);
        int p = style.prefixPower();
        String prefix = null;
        int bestShift = Integer.MIN_VALUE;
        if (e >= 0) {
            prefix = "";
            bestShift = 0;
        }
        for (SiPrefix candidate : displayPrefixes(style)) {
            int shift = p * candidate.exponent();
            if (shift <= e && shift > bestShift) {
                prefix = candidate.symbol();
                bestShift = shift;
            }
        }
        if (prefix == null || e - bestShift >= 3 * p) {
            return scientific(r) + " " + style.symbol();
        }
        return r.scaleByPowerOfTen(-bestShift).toPlainString() + " " + prefix + style.symbol();
    }

    private static List<SiPrefix> displayPrefixes(Style style) {
        List<SiPrefix> list = new ArrayList<>();
        for (SiPrefix s : SiPrefix.values()) {
            if (s.isEngineering() || (style.centi() && s == SiPrefix.CENTI)) {
                list.add(s);
            }
        }
        return list;
    }

    private static String celsius(double kelvin, int n) {
        BigDecimal k = new BigDecimal(kelvin);
        int integerDigits = k.signum() == 0 ? 1 : Math.max(1, leadingExponent(k) + 1);
        int decimals = n - integerDigits;
        BigDecimal exact = k.subtract(QuantityParser.ZERO_CELSIUS);
        BigDecimal c = exact.setScale(decimals, RoundingMode.HALF_UP);
        if (c.compareTo(QuantityParser.ZERO_CELSIUS.negate()) < 0) {
            // 0 K with one decimal is a tie that half-up would show as -273.2 °C, below absolute
            // zero; the step above (-273.1 °C) is as near and reads back
            c = exact.setScale(decimals, RoundingMode.CEILING);
        }
        if (c.abs().compareTo(PLAIN_HIGH) >= 0) {
            return scientific(c);
        }
        return c.toPlainString();
    }

    private static String plainOrScientific(BigDecimal r) {
        BigDecimal a = r.abs();
        if (r.signum() == 0 || (a.compareTo(PLAIN_LOW) >= 0 && a.compareTo(PLAIN_HIGH) < 0)) {
            return r.toPlainString();
        }
        return scientific(r);
    }

    /** Writes r as d.ddde±x, keeping every digit of its unscaled value. */
    private static String scientific(BigDecimal r) {
        String digits = r.unscaledValue().abs().toString();
        int exponent = digits.length() - 1 - r.scale();
        StringBuilder sb = new StringBuilder();
        if (r.signum() < 0) {
            sb.append('-');
        }
        sb.append(digits.charAt(0));
        if (digits.length() > 1) {
            sb.append('.').append(digits, 1, digits.length());
        }
        return sb.append('e').append(exponent).toString();
    }

    /** The exponent of the leading digit: 2 for 398.15, -3 for 0.0063. */
    private static int leadingExponent(BigDecimal nonZero) {
        return nonZero.precision() - nonZero.scale() - 1;
    }
}
