package org.tjmargin.device;

/**
 * The one reference temperature of datasheet ratings, 25 °C, in kelvin.
 *
 * <p>Kept here rather than in {@code units} so that the domain packages need no text parsing; the value is the
 * definition of the degree Celsius (BIPM, <i>The International System of Units</i>, 9th ed. 2019, 2.3.1):
 * {@code T/K = t/°C + 273.15}.
 */
public final class Celsius {
    /** 0 °C in kelvin (K), BIPM SI Brochure 9th ed. */
    public static final double ZERO_K = 273.15;
    /** 25 °C in kelvin (K): the reference temperature of datasheet ratings and of {@code Vz0}. */
    public static final double T25_K = ZERO_K + 25.0;

    private Celsius() {
    }

    /** Converts a Celsius temperature (°C) to kelvin (K). */
    public static double toKelvin(double celsius) {
        return celsius + ZERO_K;
    }

    /** Converts a kelvin temperature (K) to Celsius (°C). */
    public static double toCelsius(double kelvin) {
        return kelvin - ZERO_K;
    }
}
