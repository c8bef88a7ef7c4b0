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
}
