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

    /** The circuit's kind as a short key: {@code shunt-regulator}, {@code current-fed}, {@code standoff-clamp}. */
    public static String circuitKind(CircuitSpec c) {
        if (c instanceof ShuntRegulatorSpec) {
            return "shunt-regulator";
        }
        return c instanceof CurrentFedSpec ? "current-fed" : "standoff-clamp";
    }

    /** Kelvin to °C for display and for the {@code …C} keys. */
    public static double celsius(double kelvin) {
        return Celsius.toCelsius(kelvin);
    }

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
