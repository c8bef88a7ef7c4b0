package org.tjmargin.report;

import java.util.List;

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
    SURGE_MARGIN("surge-margin", "Surge margin against ambient"),
    /** Monte Carlo junction temperatures at the design's highest ambient (with statistics only). */
    TJ_HISTOGRAM("tj-histogram", "Monte Carlo junction temperature at the design's highest ambient, with the "
            + "worst-case corners' extremes"),
    /** Monte Carlo limiting margins at the design's highest ambient (with statistics only). */
    MARGIN_HISTOGRAM("margin-histogram", "Monte Carlo limiting margin at the design's highest ambient, with the "
            + "worst-case corners' margin"),
    /** Each input swung over its range, the others nominal, ranked by the swing of the margin (with statistics). */
    TORNADO("tornado", "Sensitivity of the limiting margin to each input (tornado)"),
    /** The probability of passing the steady-state rules against ambient (with statistics only). */
    YIELD("yield", "Yield against ambient with its 95 % Wilson band");

    /** The kinds drawn from a statistical analysis, in the order a position gets them. */
    public static final List<ChartKind> STATISTICAL = List.of(TJ_HISTOGRAM, MARGIN_HISTOGRAM,
            TORNADO, YIELD);

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

    /** True for the kinds drawn from a statistical analysis. */
    public boolean statistical() {
        return STATISTICAL.contains(this);
    }

    /** A short caption for the report. */
    public String caption() {
        return caption;
    }
}
