package org.tjmargin.report;

/** The charts drawn for a position, each with the suffix of its file name. */
public enum ChartKind {
    /** Margin of every rule against ambient. */
    MARGIN("margin", "Margin against ambient"),
    /** Junction temperature, diode power and output voltage against ambient. */
    OPERATING("operating", "Operating point against ambient"),
    /** The diode's power rating curve with its operating points. */
    RATING("rating", "Diode power rating and operating points"),
    /** The series resistor's power rating curve with its operating points (shunt regulators only). */
    RESISTOR("resistor", "Series resistor rating and operating points"),
    /** Junction temperature, clamp current and clamp voltage during each surge (positions with surges only). */
    SURGE("surge", "Tj, current and clamp voltage during each surge, at its worst corner at the design's highest ambient"),
    /** Margin of every surge rule against ambient (positions with surges only). */
    SURGE_MARGIN("surge-margin", "Surge margin against ambient");

    private final String suffix;
    private final String caption;

    ChartKind(String suffix, String caption) {
        this.suffix = suffix;
        this.caption = caption;
    }

    /** File-name suffix after the position, e.g. {@code margin} in {@code D1-margin.png}. */
    public String suffix() {
        return suffix;
    }

    /** A short caption for the report. */
    public String caption() {
        return caption;
    }
}
