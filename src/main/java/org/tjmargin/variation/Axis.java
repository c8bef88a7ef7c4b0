package org.tjmargin.variation;

/**
 * The toleranced inputs a worst-case corner combines (design 2.7), with the short label used in tables.
 */
public enum Axis {
    /** Supply voltage of a regulator, line voltage of a clamp, or the feed current of a current-fed diode. */
    SUPPLY("Vs"),
    /** Load current drawn (HIGH = heaviest load: most current, least resistance). */
    LOAD("IL"),
    /** Breakdown voltage within its tolerance. */
    VZ("Vz"),
    /** Series resistor within its tolerance. */
    SERIES_RESISTOR("Rs"),
    /** Thermal resistance within its tolerance. */
    THERMAL_RESISTANCE("Rθ"),
    /** Temperature coefficient within its range. */
    TEMPERATURE_COEFFICIENT("αV");

    private final String label;

    Axis(String label) {
        this.label = label;
    }

    /** Short label, e.g. {@code Vs}. */
    public String label() {
        return label;
    }
}
