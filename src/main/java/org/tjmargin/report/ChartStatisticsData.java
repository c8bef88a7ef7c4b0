package org.tjmargin.report;

import java.util.Locale;
import org.tjmargin.variation.statistical.MonteCarloResult;
import org.tjmargin.variation.statistical.PositionStatistics;

/**
 * What the statistics charts share: the sentence that names the run, the air assumption, and the rule that decides
 * whether a reference line is drawn on an axis or named in a subtitle. Reads results only.
 */
final class ChartStatisticsData {

    private ChartStatisticsData() {
    }

    /**
     * The run at the design's highest ambient, e.g. {@code Seeded Monte Carlo of 10000 samples (seed 1) at 55.0 °C
     * ambient, air at the part 60.9 °C.}
     */
    static String run(PositionStatistics s) {
        MonteCarloResult mc = s.monteCarlo();
        return "Seeded Monte Carlo of " + mc.settings().samples() + " samples (seed " + mc.settings().seed() + ") at "
                + ChartData.temperature(s.ambientK()) + " ambient, " + airAtPart(s, ChartData::temperature)
                + (s.surgesIncluded() ? ", every surge run on every sample" : "") + ".";
    }

    /** {@code air at the part 60.9 °C}, or that the enclosure air has no steady state there. */
    static String airAtPart(PositionStatistics s, java.util.function.DoubleFunction<String> temperature) {
        return Double.isNaN(s.tLocalK()) ? "the enclosure air has no steady state there (every sample runs away)"
                : "air at the part " + temperature.apply(s.tLocalK());
    }

    /** The air assumption of every statistical run ({@link StatisticsText#AIR}) as a sentence. */
    static String air() {
        return sentence(StatisticsText.AIR);
    }

    /** Samples drawn but not in a histogram, as a sentence, or {@code null} when every sample is in it. */
    static String leftOut(MonteCarloResult mc, long underflow, long overflow) {
        StringBuilder sb = new StringBuilder();
        if (mc.runawaySamples() > 0 || mc.notConvergedSamples() > 0) {
            sb.append("Not drawn: ").append(mc.runawaySamples()).append(" runaway and ")
                    .append(mc.notConvergedSamples()).append(" not converged sample(s), counted as violations.");
        }
        if (underflow > 0 || overflow > 0) {
            sb.append(sb.length() > 0 ? " " : "").append(underflow).append(" sample(s) below and ").append(overflow)
                    .append(" above the bins, not drawn.");
        }
        return sb.length() == 0 ? null : sb.toString();
    }

    /** A phrase as a sentence: capital first letter, full stop. */
    static String sentence(String phrase) {
        return phrase.substring(0, 1).toUpperCase(Locale.ROOT) + phrase.substring(1) + ".";
    }

    /**
     * Whether a reference line at {@code value} is drawn on an axis whose data span {@code lo … hi}: it is when it
     * lies within one data span of the data. Farther out it would squeeze the data into a sliver, so the chart names
     * it in a subtitle instead.
     */
    static boolean withinReach(double value, double lo, double hi) {
        double span = Math.max(hi - lo, 1e-9 * Math.max(1.0, Math.abs(hi)));
        return Double.isFinite(value) && value >= lo - span && value <= hi + span;
    }
}
