package org.tjmargin.report;

import java.util.Locale;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.units.Dimension;
import org.tjmargin.variation.Axis;
import org.tjmargin.variation.Range;
import org.tjmargin.variation.WilsonInterval;

/**
 * Numbers of the statistics for the charts and the HTML report: probabilities in per cent with three significant
 * digits and their Wilson interval, input values in the unit {@link Labels#axisUnit} gives them, margins and their
 * spreads in per cent. Formats only; computes nothing. Stateless.
 */
final class StatisticsFormat {

    private StatisticsFormat() {
    }

    /** A probability in per cent, e.g. {@code 0 %}, {@code 0.192 %}, {@code 100 %}. */
    static String probability(double p) {
        return percent(p);
    }

    /** The estimate with its interval, e.g. {@code 0 % (95 % Wilson interval 0 % … 0.192 %)}. */
    static String withInterval(WilsonInterval w) {
        return probability(w.estimate()) + " (" + interval(w) + ")";
    }

    /** The interval alone, e.g. {@code 95 % Wilson interval 0 % … 0.192 %}. */
    static String interval(WilsonInterval w) {
        return level(w.confidence()) + " % Wilson interval "
                + probability(w.lower()) + " … " + probability(w.upper());
    }

    /** A confidence level in per cent without trailing zeros, e.g. {@code 95}. */
    private static String level(double confidence) {
        return HtmlFormat.plain(100.0 * confidence).replaceAll("\\.0+$", "");
    }

    /**
     * A temperature in °C with one decimal, or as many more (up to four) as it takes to resolve {@code resolutionK},
     * e.g. {@code 60.887 °C} for corners 0.015 K apart.
     */
    static String temperature(double kelvin, double resolutionK) {
        int decimals = 1;
        if (resolutionK > 0 && Double.isFinite(resolutionK)) {
            decimals = (int) Math.max(1, Math.min(4, Math.ceil(-Math.log10(resolutionK))));
        }
        return String.format(Locale.ROOT, "%." + decimals + "f °C", Labels.celsius(kelvin));
    }

    /** How many of how many, e.g. {@code 3 of 2000 samples}. */
    static String count(WilsonInterval w) {
        return w.successes() + " of " + w.trials() + " samples";
    }

    /**
     * A small fraction in per cent with three significant digits, e.g. {@code 12.2 %}, {@code 0.0134 %}: spreads,
     * swings and shares, which one decimal of a margin would round to nothing.
     */
    static String percent(double fraction) {
        return HtmlFormat.plain(100.0 * fraction) + " %";
    }

    /** A spread of a margin (a fraction), e.g. {@code ± 12.2 %}, {@code ± 0.157 %}. */
    static String marginSpread(double sigma) {
        return "± " + percent(sigma);
    }

    /** One value of an input in its unit at this position, e.g. {@code 19.2 V}, {@code 0.850} for a factor. */
    static String axisValue(PositionSpec spec, Axis axis, double value) {
        Dimension d = dimension(Labels.axisUnit(spec, axis));
        return d == null ? HtmlFormat.plain(value) : HtmlFormat.si(value, d);
    }

    /** An input's range, {@code low … high}, in its unit. */
    static String axisRange(PositionSpec spec, Axis axis, double low, double high) {
        return axisValue(spec, axis, low) + " … " + axisValue(spec, axis, high);
    }

    /** An input's range with its nominal, {@code low … high (nominal n)}. */
    static String axisRange(PositionSpec spec, Axis axis, Range r) {
        return axisRange(spec, axis, r.lo(), r.hi()) + " (nominal " + axisValue(spec, axis, r.nominal()) + ")";
    }

    /** An input in words with its short label, e.g. {@code supply voltage (Vs)}. */
    static String axisTitle(PositionSpec spec, Axis axis) {
        return Labels.axisName(spec, axis) + " (" + axis.label() + ")";
    }

    /**
     * The dimension of a unit symbol of {@link Labels#axisUnit}, so that the unit has one source; {@code null} for
     * the plain factor {@code 1}.
     */
    private static Dimension dimension(String unit) {
        return switch (unit) {
            case "V" -> Dimension.VOLTAGE;
            case "A" -> Dimension.CURRENT;
            case "Ω" -> Dimension.RESISTANCE;
            case "V/K" -> Dimension.VOLTAGE_TEMPERATURE_COEFFICIENT;
            default -> null;
        };
    }
}
