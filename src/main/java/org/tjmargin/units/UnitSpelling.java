package org.tjmargin.units;

import java.util.regex.Pattern;

/**
 * Brings the many ways of writing a unit to one spelling before it is looked up.
 *
 * <ul>
 *   <li>ohm: Ω (U+03A9), Ω (U+2126 ohm sign), {@code ohm}, {@code ohms}, {@code Ohm},
 *       {@code Ohms} become Ω (U+03A9);</li>
 *   <li>micro: μ (U+03BC) becomes µ (U+00B5); ASCII {@code u} is handled as a prefix;</li>
 *   <li>degree Celsius: {@code degC} and ℃ (U+2103) become °C;</li>
 *   <li>squares: {@code ^2} and a {@code 2} right after {@code m} become ², {@code ^-1} becomes
 *       ⁻¹;</li>
 *   <li>products: spaces, {@code *}, · (U+00B7) and ⋅ (U+22C5) become ·, and no separator is kept
 *       next to {@code /} or a parenthesis.</li>
 * </ul>
 */
final class UnitSpelling {

    private static final Pattern OHM = Pattern.compile("Ohms|ohms|Ohm|ohm");
    private static final Pattern SEPARATORS =
            Pattern.compile("[\\s\\u00A0\\u2007\\u2009\\u200A\\u202F*\\u00B7\\u22C5]+");
    private static final Pattern SEPARATOR_AROUND = Pattern.compile("\\u00B7?([/()])\\u00B7?");

    private UnitSpelling() {
    }

    static String normalise(String unit) {
        String s = unit.replace('\u2126', '\u03A9').replace('\u03BC', '\u00B5')
                .replace("\u2103", "\u00B0C").replace("degC", "\u00B0C");
        s = OHM.matcher(s).replaceAll("\u03A9");
        s = s.replace("^2", "\u00B2").replace("^-1", "\u207B\u00B9").replace("m2", "m\u00B2");
        s = SEPARATORS.matcher(s).replaceAll("\u00B7");
        s = SEPARATOR_AROUND.matcher(s).replaceAll("$1");
        return s;
    }

    /**
     * Tells whether a product follows a solidus without parentheses, as in {@code W/m·K}, which
     * could mean W/(m·K) or (W/m)·K.
     */
    static boolean isAmbiguous(String normalised) {
        int depth = 0;
        boolean afterSolidus = false;
        for (int i = 0; i < normalised.length(); i++) {
            char c = normalised.charAt(i);
            if (c == '(') {
                depth++;
            } else if (c == ')') {
                depth--;
            } else if (c == '/' && depth == 0) {
                afterSolidus = true;
            } else if (c == '\u00B7' && depth == 0 && afterSolidus) {
                return true;
            }
        }
        return false;
    }
}
