package org.tjmargin.units;

/**
 * The kinds of physical quantity that tjmargin reads and prints.
 *
 * <p>Each constant carries the symbol of its coherent SI unit, as used in messages, and a human
 * name. Values of every dimension are held in that SI unit; {@link #TEMPERATURE} is held in
 * kelvin even though it is usually written and printed in degrees Celsius.
 */
public enum Dimension {
    /** Electric potential difference, in volt (V). */
    VOLTAGE("V", "voltage"),
    /** Electric current, in ampere (A). */
    CURRENT("A", "current"),
    /** Electric resistance, in ohm (Ω). */
    RESISTANCE("\u03A9", "resistance"),
    /** Power, in watt (W). */
    POWER("W", "power"),
    /** Energy, in joule (J). */
    ENERGY("J", "energy"),
    /** Time or duration, in second (s). */
    TIME("s", "time"),
    /** Length, in metre (m). */
    LENGTH("m", "length"),
    /** Area, in square metre (m²). */
    AREA("m\u00B2", "area"),
    /** Absolute (thermodynamic) temperature, in kelvin; read from °C, degC or K. */
    TEMPERATURE("K", "absolute temperature"),
    /** Temperature difference, in kelvin; 1 °C of difference is 1 K. */
    TEMPERATURE_DIFFERENCE("K", "temperature difference"),
    /** Thermal resistance, in kelvin per watt (K/W). */
    THERMAL_RESISTANCE("K/W", "thermal resistance"),
    /** Thermal conductivity of a material, in W/(m·K). */
    THERMAL_CONDUCTIVITY("W/(m\u00B7K)", "thermal conductivity"),
    /** Heat transfer coefficient of a surface, in W/(m²·K). */
    HEAT_TRANSFER_COEFFICIENT("W/(m\u00B2\u00B7K)", "heat transfer coefficient"),
    /** Temperature coefficient of a voltage, in volt per kelvin (V/K). */
    VOLTAGE_TEMPERATURE_COEFFICIENT("V/K", "voltage temperature coefficient"),
    /** Relative temperature coefficient, in 1/K (printed as %/K). */
    RELATIVE_TEMPERATURE_COEFFICIENT("1/K", "relative temperature coefficient"),
    /** Slope of a power derating curve, in watt per kelvin (W/K). */
    POWER_DERATING_SLOPE("W/K", "power derating slope"),
    /** Dimensionless ratio, SI unit one (1); read from a plain number, % or ppm, printed as %. */
    FRACTION("1", "fraction"),
    /** Electric charge, in coulomb (C). */
    CHARGE("C", "charge"),
    /** Time integral of the squared current, in A²s. */
    ACTION_INTEGRAL("A\u00B2s", "action integral"),
    /** Frequency, in hertz (Hz). */
    FREQUENCY("Hz", "frequency"),
    /** Heat capacity, in joule per kelvin (J/K). */
    HEAT_CAPACITY("J/K", "heat capacity");

    private final String symbol;
    private final String humanName;

    Dimension(String symbol, String humanName) {
        this.symbol = symbol;
        this.humanName = humanName;
    }

    /**
     * Returns the symbol of the coherent SI unit in which values of this dimension are held.
     *
     * @return the unit symbol, for example {@code "V"}, {@code "K/W"} or {@code "1"}
     */
    public String symbol() {
        return symbol;
    }

    /**
     * Returns the human name of this dimension, in lower case, for messages.
     *
     * @return the name, for example {@code "current"} or {@code "absolute temperature"}
     */
    public String humanName() {
        return humanName;
    }

    /** The human name with its indefinite article, e.g. "a current", "an energy". */
    String withArticle() {
        char first = humanName.charAt(0);
        boolean vowel = "aeiou".indexOf(first) >= 0;
        return (vowel ? "an " : "a ") + humanName;
    }

    /** How messages name what was expected, e.g. "a current in A". */
    String expectedPhrase() {
        switch (this) {
            case TEMPERATURE:
                return withArticle() + " in \u00B0C or K";
            case FRACTION:
                return withArticle() + " (a plain number, % or ppm)";
            case RELATIVE_TEMPERATURE_COEFFICIENT:
                return withArticle() + " in %/K, ppm/K or 1/K";
            default:
                return withArticle() + " in " + symbol;
        }
    }
}
