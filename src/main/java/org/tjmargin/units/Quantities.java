package org.tjmargin.units;

import java.util.List;
import java.util.Objects;

/**
 * Reads quantities from text and formats them for display. Static methods only; no state.
 *
 * <h2>Reading</h2>
 * A text is a number, optional white space (ordinary, no-break or thin spaces), and a unit:
 * {@code "6.2 V"}, {@code "41mA"}, {@code "-40 °C"}, {@code "1.5E3 W"}. The number has an
 * optional sign (+, - or −), digits with an optional decimal point, and an optional exponent;
 * a decimal comma is rejected. Only a {@link Dimension#FRACTION} may be a plain number. Units are
 * case-sensitive SI symbols with an optional SI prefix ({@link SiPrefix}). The result is the
 * double nearest to the exact decimal value of the text in SI units.
 *
 * <p>Accepted units ("p" marks where an SI prefix may stand; °C may be written degC or ℃
 * everywhere; a product may be written with ·, ⋅, * or a space; a square as ², ^2, or 2 after m;
 * Ω may be Ω (U+2126), ohm, ohms, Ohm or Ohms):
 * <ul>
 *   <li>VOLTAGE pV, CURRENT pA, RESISTANCE pΩ, POWER pW, ENERGY pJ, TIME ps, FREQUENCY pHz;</li>
 *   <li>LENGTH pm, AREA pm² (centi allowed on both; the prefix is squared: 1 mm² = 1e-6 m²);</li>
 *   <li>TEMPERATURE K or °C, no prefix; TEMPERATURE_DIFFERENCE pK or °C (no prefix on °C);</li>
 *   <li>THERMAL_RESISTANCE K/W, °C/W;</li>
 *   <li>THERMAL_CONDUCTIVITY pW/(m·K), pW/m/K, pW/mK (and with °C);</li>
 *   <li>HEAT_TRANSFER_COEFFICIENT pW/(m²·K), pW/m²/K, pW/m²K (and with °C);</li>
 *   <li>VOLTAGE_TEMPERATURE_COEFFICIENT pV/K, POWER_DERATING_SLOPE pW/K, HEAT_CAPACITY pJ/K
 *       (and with °C);</li>
 *   <li>RELATIVE_TEMPERATURE_COEFFICIENT %/K, ppm/K, 1/K, K⁻¹, K^-1 (and with °C);</li>
 *   <li>FRACTION: a plain number, %, ppm;</li>
 *   <li>CHARGE pC, pA·s; ACTION_INTEGRAL A²s, A²·s (no prefix).</li>
 * </ul>
 * A product after a solidus without parentheses ({@code W/m·K}) is rejected as ambiguous.
 *
 * <h2>Formatting</h2>
 * Values are shown with a chosen number of significant digits, by default
 * {@value #DEFAULT_SIGNIFICANT_DIGITS} ({@value #DEFAULT_TEMPERATURE_DIGITS} for an absolute
 * temperature), with an SI prefix that puts the number in [1, 1000):
 * {@code 0.0063 A -> "6.30 mA"}, {@code 398.15 K -> "125.0 °C"}, {@code 0.05 -> "5.00 %"}.
 * The output is UTF-8 text (Ω, °C, µ, ², ·).
 *
 * <p>Contract: {@code parse(format(x, d, n), d)} gives back x to within half a unit in the last
 * displayed digit.
 */
public final class Quantities {

    /**
     * The kelvin value of 0 °C: t/°C = T/K − 273.15 (BIPM, The International System of Units,
     * 9th edition 2019, definition of the degree Celsius; section 2.3.1 from memory, verify).
     */
    public static final double ZERO_CELSIUS_K = 273.15;

    /** Significant digits shown by {@link #format(double, Dimension)}. */
    public static final int DEFAULT_SIGNIFICANT_DIGITS = 3;

    /**
     * Significant digits of the kelvin value shown by {@link #format(double, Dimension)} for an
     * absolute temperature: 0.1 K resolution from 100 K to 999 K, e.g. "125.0 °C".
     */
    public static final int DEFAULT_TEMPERATURE_DIGITS = 4;

    private Quantities() {
    }

    /**
     * Reads a quantity of the expected dimension.
     *
     * @param text the text, e.g. {@code "41 mA"}; leading and trailing white space is ignored
     * @param expected the dimension the text must have
     * @return the value in the SI unit of the dimension (kelvin for an absolute temperature)
     * @throws QuantityException if the text is not a finite quantity of that dimension
     * @throws NullPointerException if an argument is null
     */
    public static double parse(String text, Dimension expected) {
        return parseAny(text, expected).valueSi();
    }

    /**
     * Reads a quantity of any one of the allowed dimensions.
     *
     * <p>The result has the first allowed dimension, in the order given, that the unit can
     * measure; so {@code "25 K"} with (TEMPERATURE_DIFFERENCE, TEMPERATURE) is a difference.
     *
     * @param text the text, e.g. {@code "2 mV/K"} or {@code "0.06 %/K"}
     * @param allowed the dimensions accepted, at least one
     * @return the value and the dimension it was read as
     * @throws QuantityException if the text is not a finite quantity of an allowed dimension
     * @throws IllegalArgumentException if no dimension is given
     * @throws NullPointerException if the text, the array or one of its elements is null
     */
    public static Quantity parseAny(String text, Dimension... allowed) {
        Objects.requireNonNull(text, "text");
        List<Dimension> list = List.of(allowed);
        if (list.isEmpty()) {
            throw new IllegalArgumentException("at least one dimension must be allowed");
        }
        return QuantityParser.parse(text, list);
    }

    /**
     * Formats an SI value with {@value #DEFAULT_SIGNIFICANT_DIGITS} significant digits
     * ({@value #DEFAULT_TEMPERATURE_DIGITS} for an absolute temperature).
     *
     * @param si the value in the SI unit of the dimension
     * @param d the dimension
     * @return the display text, e.g. {@code "6.30 mA"}
     * @throws IllegalArgumentException if the value is not finite
     */
    public static String format(double si, Dimension d) {
        int n = d == Dimension.TEMPERATURE ? DEFAULT_TEMPERATURE_DIGITS
                : DEFAULT_SIGNIFICANT_DIGITS;
        return format(si, d, n);
    }

    /**
     * Formats an SI value for display.
     *
     * <ul>
     *   <li>Units that take a prefix (V, A, Ω, W, J, s, m, m², C, Hz, V/K, W/K, J/K) get the SI
     *       prefix from yocto to giga that puts the number in [1, 1000); m² uses mm², cm², m²,
     *       so its number is in [1, 10⁶). Outside that range: {@code "1.50e12 Ω"}.</li>
     *   <li>Other units (K, K/W, W/(m·K), W/(m²·K), A²s) are written without prefix, plainly from
     *       10⁻⁴ to 10⁶ and as {@code 1.50e-7} outside; a fraction is shown in %, a relative
     *       temperature coefficient in %/K.</li>
     *   <li>An absolute temperature is shown in °C with the decimals that give its kelvin value
     *       the requested significant digits (at least as many decimals as give 1 K the
     *       digits requested below 1 K).</li>
     * </ul>
     *
     * @param si the value in the SI unit of the dimension (kelvin for an absolute temperature)
     * @param d the dimension
     * @param significantDigits how many significant digits to show, 1 to 17
     * @return the display text
     * @throws IllegalArgumentException if the value is not finite or the digits out of range
     */
    public static String format(double si, Dimension d, int significantDigits) {
        return QuantityFormatter.format(si, d, significantDigits);
    }

    /**
     * Converts a Celsius temperature to kelvin.
     *
     * @param celsius the temperature in °C
     * @return celsius + {@link #ZERO_CELSIUS_K}
     */
    public static double celsiusToKelvin(double celsius) {
        return celsius + ZERO_CELSIUS_K;
    }

    /**
     * Converts a kelvin temperature to Celsius.
     *
     * @param kelvin the temperature in K
     * @return kelvin − {@link #ZERO_CELSIUS_K}
     */
    public static double kelvinToCelsius(double kelvin) {
        return kelvin - ZERO_CELSIUS_K;
    }
}
