package org.tjmargin.report;

import org.tjmargin.circuit.CircuitSpec;
import org.tjmargin.circuit.CurrentFedSpec;
import org.tjmargin.circuit.ShuntRegulatorSpec;
import org.tjmargin.device.Celsius;
import org.tjmargin.solve.MaximumAmbient;

/** Short names shared by every writer, so that the table, the CSV, the JSON and the HTML say the same thing. */
public final class Labels {

    private Labels() {
    }

    /**
     * Below this margin (1, i.e. −10 000 %) the table and the report write {@code < -10000 %} instead of the figure.
     * Such margins come from stand-ins (a rating that has reached zero while power flows counts as a ratio of 1e9,
     * a junction with no operating point as sitting at the solver's cap) or from ratios so far past their limit that
     * the figure says nothing more; {@code results.json} and the CSV files keep the number.
     */
    public static final double MARGIN_SHOWN_FLOOR = -100.0;

    /** A margin in per cent with one decimal in {@code format}'s rounding, or {@code < -10000 %} below the floor. */
    static String marginPercent(double fraction, java.util.function.DoubleFunction<String> format) {
        return fraction < MARGIN_SHOWN_FLOOR ? "< -10000 %" : format.apply(fraction);
    }

    /** The circuit's kind as a short key: {@code shunt-regulator}, {@code current-fed}, {@code standoff-clamp}. */
    public static String circuitKind(CircuitSpec c) {
        if (c instanceof ShuntRegulatorSpec) {
            return "shunt-regulator";
        }
        return c instanceof CurrentFedSpec ? "current-fed" : "standoff-clamp";
    }

    /**
     * Kelvin to °C for display and for the {@code …C} keys, {@code t/°C = T/K − 273.15} (the SI definition of the
     * Celsius temperature, SI Brochure, 9th edition, 2.3.1; section from memory, verify), without the round trip's
     * rounding where the value is a decimal of at most {@value #SNAP_DECIMALS} places.
     *
     * <p>Temperatures are held in kelvin, so a temperature the user gave in °C comes back through two roundings
     * ({@code −20 °C} is 253.14999999999998 K, and the sweep's grid adds its own): written as it is, the design's
     * lowest ambient would read {@code −19.99999999999997}. The error of that round trip is a few units in the last
     * place of a kelvin value (about 1e-13 K); a value within {@value #SNAP_K} K of a decimal with at most
     * {@value #SNAP_DECIMALS} places is written as that decimal. The window is a hundred times the round trip's error
     * and a tenth of the junction solver's residual tolerance (1e-10 K), so it never moves a computed temperature by
     * anything the solve itself resolves; a value outside it is written as it is.
     */
    public static double celsius(double kelvin) {
        double c = Celsius.toCelsius(kelvin);
        if (!(Math.abs(c) < SNAP_RANGE_C)) {
            return c;
        }
        double decimal = Math.round(c * SNAP_SCALE) / SNAP_SCALE;
        return Math.abs(c - decimal) <= SNAP_K ? decimal : c;
    }

    /** Decimal places a temperature in °C is snapped to when it lies within {@link #SNAP_K} of one. */
    static final int SNAP_DECIMALS = 6;
    /** Window of that snap (K). */
    static final double SNAP_K = 1e-11;
    private static final double SNAP_SCALE = 1e6;
    /** Beyond this magnitude (°C) a temperature is written as it is (no junction or air gets near it). */
    private static final double SNAP_RANGE_C = 1e6;

    /** The maximum ambient in words: {@code 61.3 °C}, {@code ≥ 200.0 °C (Tj max)} or {@code none}. */
    public static String maxAmbient(MaximumAmbient m) {
        return switch (m.status()) {
            case FOUND -> String.format(java.util.Locale.ROOT, "%.1f °C", celsius(m.ambientK()));
            case HOLDS_TO_LIMIT -> String.format(java.util.Locale.ROOT, "≥ %.1f °C (Tj max)", celsius(m.ambientK()));
            case NONE -> "none";
        };
    }

    /**
     * The unit of an axis's values at a position (see {@link org.tjmargin.variation.AxisValues}): the supply is a
     * current for a current-fed diode, the load a resistance where it is given as one; the thermal resistance is a
     * factor on every resistance of the path.
     */
    public static String axisUnit(org.tjmargin.solve.PositionSpec spec, org.tjmargin.variation.Axis axis) {
        return switch (axis) {
            case SUPPLY -> spec.circuit() instanceof CurrentFedSpec ? "A" : "V";
            case LOAD -> spec.circuit() instanceof ShuntRegulatorSpec s
                    && s.load() instanceof org.tjmargin.circuit.LoadRange.Resistive ? "Ω" : "A";
            case VZ -> "V";
            case SERIES_RESISTOR -> "Ω";
            case THERMAL_RESISTANCE -> "1";
            case TEMPERATURE_COEFFICIENT -> "V/K";
        };
    }

    /** What an axis is, in words, for tables: e.g. {@code supply voltage}, {@code Vz shift}. */
    public static String axisName(org.tjmargin.solve.PositionSpec spec, org.tjmargin.variation.Axis axis) {
        return switch (axis) {
            case SUPPLY -> spec.circuit() instanceof CurrentFedSpec ? "feed current"
                    : spec.circuit() instanceof ShuntRegulatorSpec ? "supply voltage" : "line voltage";
            case LOAD -> "load";
            case VZ -> "Vz shift";
            case SERIES_RESISTOR -> "series resistor";
            case THERMAL_RESISTANCE -> "thermal-resistance factor";
            case TEMPERATURE_COEFFICIENT -> "temperature coefficient";
        };
    }

    /**
     * Identifiers as a list for a sentence: all of them up to {@code shown}, else the first {@code shown} and a count
     * of the rest ("D1, D2, D3 and 997 more").
     */
    public static String ids(java.util.List<String> ids, int shown) {
        if (ids.size() <= shown) {
            return String.join(", ", ids);
        }
        return String.join(", ", ids.subList(0, shown)) + " and " + (ids.size() - shown) + " more";
    }
}
