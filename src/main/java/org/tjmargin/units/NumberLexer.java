package org.tjmargin.units;

import java.math.BigDecimal;
import java.util.List;
import java.util.Locale;

/**
 * Splits a quantity text into its number and its unit.
 *
 * <p>The number is an optional sign (+, - or the minus sign U+2212), digits with an optional
 * decimal point, and an optional exponent ({@code e} or {@code E}, optional sign, digits). The
 * unit is whatever follows, with spaces around it removed; it may follow the number directly.
 */
final class NumberLexer {

    /**
     * A number as written: value = significand × 10^exponent. The exponent is kept apart (and
     * saturated far outside the double range) so that no written exponent can overflow.
     */
    record Lexed(BigDecimal significand, long exponent, String unit) {
    }

    private static final long EXPONENT_LIMIT = 1_000_000_000_000L;

    private NumberLexer() {
    }

    static Lexed lex(String text, List<Dimension> expected) {
        String t = strip(text);
        if (t.isEmpty()) {
            throw Rejections.empty(text, expected);
        }
        int n = t.length();
        int i = 0;
        boolean negative = false;
        char first = t.charAt(0);
        if (first == '+' || first == '-' || first == '\u2212') {
            negative = first != '+';
            i++;
        }
        if (startsNonFinite(t, i)) {
            throw Rejections.notFinite(text, expected);
        }
        int intStart = i;
        i = skipDigits(t, i);
        String intPart = t.substring(intStart, i);
        String fracPart = "";
        if (i < n && t.charAt(i) == '.') {
            int fracEnd = skipDigits(t, i + 1);
            fracPart = t.substring(i + 1, fracEnd);
            if (!intPart.isEmpty() || !fracPart.isEmpty()) {
                i = fracEnd;
            }
        }
        if (intPart.isEmpty() && fracPart.isEmpty()) {
            throw Rejections.notANumber(text, expected);
        }
        long exponent = 0;
        if (i < n && (t.charAt(i) == 'e' || t.charAt(i) == 'E')) {
            int j = i + 1;
            boolean expNegative = false;
            if (j < n && (t.charAt(j) == '+' || t.charAt(j) == '-' || t.charAt(j) == '\u2212')) {
                expNegative = t.charAt(j) != '+';
                j++;
            }
            int expEnd = skipDigits(t, j);
            if (expEnd > j) {
                exponent = saturatedExponent(t.substring(j, expEnd), expNegative);
                i = expEnd;
            }
        }
        if (i + 1 < n && t.charAt(i) == ',' && isAsciiDigit(t.charAt(i + 1))) {
            throw Rejections.decimalComma(text, expected);
        }
        String digits = (intPart.isEmpty() ? "0" : intPart)
                + (fracPart.isEmpty() ? "" : "." + fracPart);
        BigDecimal significand = new BigDecimal(digits);
        if (negative) {
            significand = significand.negate();
        }
        return new Lexed(significand, exponent, strip(t.substring(i)));
    }

    /** Removes leading and trailing white space, including no-break and thin spaces. */
    static String strip(String s) {
        int start = 0;
        int end = s.length();
        while (start < end && isSpace(s.charAt(start))) {
            start++;
        }
        while (end > start && isSpace(s.charAt(end - 1))) {
            end--;
        }
        return s.substring(start, end);
    }

    static boolean isSpace(char c) {
        return Character.isWhitespace(c) || Character.isSpaceChar(c);
    }

    private static boolean startsNonFinite(String t, int i) {
        String rest = t.substring(i).toLowerCase(Locale.ROOT);
        return rest.startsWith("nan") || rest.startsWith("inf") || rest.startsWith("\u221E");
    }

    private static int skipDigits(String t, int i) {
        while (i < t.length() && isAsciiDigit(t.charAt(i))) {
            i++;
        }
        return i;
    }

    private static boolean isAsciiDigit(char c) {
        return c >= '0' && c <= '9';
    }

    private static long saturatedExponent(String digits, boolean negative) {
        long value = 0;
        for (int k = 0; k < digits.length() && value < EXPONENT_LIMIT; k++) {
            value = value * 10 + (digits.charAt(k) - '0');
        }
        value = Math.min(value, EXPONENT_LIMIT);
        return negative ? -value : value;
    }
}
