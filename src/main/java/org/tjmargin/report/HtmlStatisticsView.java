package org.tjmargin.report;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.tjmargin.derating.Policy;
import org.tjmargin.derating.Rule;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.solve.WorstCheck;
import org.tjmargin.variation.Moments;
import org.tjmargin.variation.WilsonInterval;
import org.tjmargin.variation.statistical.AxisSensitivity;
import org.tjmargin.variation.statistical.CornerExtremes;
import org.tjmargin.variation.statistical.Evaluation;
import org.tjmargin.variation.statistical.MonteCarloResult;
import org.tjmargin.variation.statistical.PositionStatistics;
import org.tjmargin.variation.statistical.RssOutcome;
import org.tjmargin.variation.statistical.RuleViolation;
import org.tjmargin.variation.statistical.SampledAxis;
import org.tjmargin.variation.statistical.StatisticsResult;
import org.tjmargin.variation.statistical.TornadoBar;

/**
 * The statistics of the report: a position's "Statistical spread" block and the statistics line of the verdict
 * area, read from {@link StatisticsResult} and formatted. Chooses and formats values; computes none. The method
 * names come from {@link StatisticsText} and {@link RssOutcome#METHOD}, the input names and units from
 * {@link Labels}, as in the JSON and the CSV.
 */
final class HtmlStatisticsView {

    private HtmlStatisticsView() {
    }

    /** The section's anchor for a position's anchor. */
    static String anchor(String positionAnchor) {
        return positionAnchor + "-statistics";
    }

    /**
     * The statistics line of the verdict area: the position most likely to violate the policy at the design's
     * highest ambient (largest estimate, then largest upper bound), and each position's probability.
     *
     * <p>Only positions with a section get a line; the others are counted in the text (their probabilities are in
     * results.json and spread.csv), so a board of a thousand positions does not list a thousand lines.
     *
     * @param anchors each position's section anchor, in board order; {@code null} for a position without a section
     */
    static Optional<HtmlView.StatisticsSummary> summary(AnalysisResult result, StatisticsResult stats,
                                                        List<String> anchors) {
        List<HtmlView.StatisticsLine> lines = new ArrayList<>();
        PositionStatistics worst = null;
        int unlisted = 0;
        Comparator<PositionStatistics> byRisk = Comparator.comparingDouble(
                (PositionStatistics p) -> p.monteCarlo().violation().estimate())
                .thenComparingDouble(p -> p.monteCarlo().violation().upper());
        for (int i = 0; i < result.positions().size(); i++) {
            Optional<PositionStatistics> ps = stats.of(result.positions().get(i).id());
            if (ps.isEmpty()) {
                continue;
            }
            PositionStatistics p = ps.get();
            MonteCarloResult mc = p.monteCarlo();
            if (worst == null || byRisk.compare(p, worst) > 0) {
                worst = p;
            }
            if (anchors.get(i) == null) {
                unlisted++;
                continue;
            }
            lines.add(new HtmlView.StatisticsLine(p.positionId(), anchor(anchors.get(i)),
                    StatisticsFormat.withInterval(mc.violation()) + " of " + mc.violation().trials() + " samples"
                            + (p.surgesIncluded() ? " with surges" : "") + "; limiting margin "
                            + meanAndSigma(mc.margin(), false) + "."));
        }
        if (worst == null) {
            return Optional.empty();
        }
        WilsonInterval w = worst.monteCarlo().violation();
        String run = " at the design's highest ambient, " + HtmlFormat.temperature(worst.ambientK())
                + " (seeded Monte Carlo, seed " + worst.monteCarlo().settings().seed() + ")";
        String text = w.successes() == 0
                ? "No sample of any position violates the policy" + run + "; the largest 95 % upper bound is "
                        + worst.positionId() + "'s, " + StatisticsFormat.probability(w.upper()) + "."
                : "Probability of violating the policy" + run + ": highest at " + worst.positionId() + ", "
                        + StatisticsFormat.withInterval(w) + ".";
        if (unlisted > 0) {
            text += " " + unlisted + " position" + (unlisted == 1 ? "" : "s") + " without a section below: "
                    + (unlisted == 1 ? "its probability is" : "their probabilities are")
                    + " in results.json and spread.csv.";
        }
        return Optional.of(new HtmlView.StatisticsSummary(text, lines));
    }

    /** A position's block. */
    static HtmlView.Statistics of(AnalysisResult result, int index, PositionStatistics s, String positionAnchor,
                                  List<HtmlView.Chart> charts) {
        PositionSpec spec = result.board().positions().get(index);
        PositionAtAmbient atMax = result.atMaximumAmbient().positions().get(index);
        MonteCarloResult mc = s.monteCarlo();
        String at = HtmlFormat.temperature(s.ambientK());
        String caption = "Position " + s.positionId() + " at the design's highest ambient, " + at + " ("
                + ChartStatisticsData.airAtPart(s, HtmlFormat::temperature) + "): the worst-case corners beside the"
                + " statistical spread of "
                + "the same inputs" + (s.surgesIncluded() ? ", surges included" : "") + ".";
        String surges = null;
        if (s.surgesIncluded()) {
            surges = "At " + at + " the Monte Carlo (" + mc.settings().samples() + " samples), the root-sum-square "
                    + "spread and the ranking run every surge of this position on every point. The yield chart has"
                    + " two curves: the " + StatisticsText.YIELD_RULES + " (" + s.yield().get(0).samples()
                    + " samples at each ambient) and " + StatisticsText.YIELD_WITH_SURGES + " ("
                    + mc.settings().samples() + ", the same parts as the first of the others).";
        }
        return new HtmlView.Statistics(anchor(positionAnchor), caption, methods(s), run(s), violations(result, atMax,
                mc), "Each rule of the policy that applies to this position, with the fraction of the "
                + mc.violation().trials() + " samples that violate it; a runaway or unconverged sample violates "
                + "every rule.", inputs(spec, s), "Nominal limiting margin " + HtmlFormat.margin(
                        s.tornado().nominal().margin()) + " (rule " + s.tornado().nominal().limitingRuleId() + "); "
                + StatisticsText.TORNADO + ".", tornado(spec, s), charts, ChartStatisticsData.air(),
                surges == null ? null : new HtmlView.Text(surges));
    }

    private static List<HtmlView.MethodRow> methods(PositionStatistics s) {
        List<HtmlView.MethodRow> rows = new ArrayList<>();
        CornerExtremes c = s.corners();
        rows.add(new HtmlView.MethodRow("Worst-case corners", StatisticsText.CORNERS,
                Double.isNaN(c.tjMinK()) ? "no corner converged" : "coolest "
                        + StatisticsFormat.temperature(c.tjMinK(), c.tjMaxK() - c.tjMinK()) + ", hottest "
                        + StatisticsFormat.temperature(c.tjMaxK(), c.tjMaxK() - c.tjMinK()),
                HtmlFormat.margin(c.margin()) + " (rule " + c.limitingRuleId() + ")",
                "— (extremes together, not a probability)", c.corners() + " corner" + (c.corners() == 1 ? "" : "s")));
        if (s.rss() instanceof RssOutcome.Spread r) {
            rows.add(new HtmlView.MethodRow("Root-sum-square", r.method(),
                    HtmlFormat.temperature(r.nominalTjK()) + " ± " + HtmlFormat.kelvinDifference(r.tjSigmaK())
                            + " (nominal ± 1σ)",
                    HtmlFormat.margin(r.nominalMargin()) + " " + StatisticsFormat.marginSpread(r.marginSigma())
                            + " (nominal ± 1σ, rule " + r.limitingRuleId() + ")",
                    HtmlFormat.NONE, r.axes().size() + " input" + (r.axes().size() == 1 ? "" : "s")
                            + ", central differences"));
        } else {
            RssOutcome.Unresolved u = (RssOutcome.Unresolved) s.rss();
            String where = u.axis() == null ? "the nominal point" : "a step of " + u.axis().label();
            String why = "not resolved: " + where + " " + switch (u.status()) {
                case RUNAWAY -> "runs away";
                case NOT_CONVERGED -> "did not converge";
                case CONVERGED -> "converged";
            };
            rows.add(new HtmlView.MethodRow("Root-sum-square", RssOutcome.METHOD, why, why, HtmlFormat.NONE,
                    HtmlFormat.NONE));
        }
        MonteCarloResult mc = s.monteCarlo();
        rows.add(new HtmlView.MethodRow("Monte Carlo", StatisticsText.MONTE_CARLO, meanAndSigma(mc.tj(), true),
                meanAndSigma(mc.margin(), false), StatisticsFormat.withInterval(mc.violation()),
                mc.settings().samples() + " samples, seed " + mc.settings().seed()
                        + (s.surgesIncluded() ? ", surges on every sample" : "")));
        return rows;
    }

    /** Mean ± σ of the converged samples, e.g. {@code 111.5 °C ± 18.7 K (mean ± 1σ)}; a dash when none. */
    static String meanAndSigma(Moments m, boolean temperature) {
        if (m.count() == 0) {
            return HtmlFormat.NONE + " (no sample converged)";
        }
        return temperature
                ? HtmlFormat.temperature(m.mean()) + " ± " + HtmlFormat.kelvinDifference(m.standardDeviation())
                        + " (mean ± 1σ)"
                : HtmlFormat.margin(m.mean()) + " " + StatisticsFormat.marginSpread(m.standardDeviation())
                        + " (mean ± 1σ)";
    }

    private static List<HtmlView.Fact> run(PositionStatistics s) {
        MonteCarloResult mc = s.monteCarlo();
        List<HtmlView.Fact> f = new ArrayList<>();
        f.add(new HtmlView.Fact("Samples", Long.toString(mc.settings().samples())
                + (s.surgesIncluded() ? ", every surge run on each" : "")));
        f.add(new HtmlView.Fact("Seed, block size", mc.settings().seed() + ", " + mc.settings().blockSize()
                + " samples per random stream (the same for any number of threads)"));
        f.add(new HtmlView.Fact("Runaway samples", mc.runawaySamples() + " (counted as violations)"));
        f.add(new HtmlView.Fact("Samples that did not converge", mc.notConvergedSamples()
                + " (counted as violations)"));
        f.add(new HtmlView.Fact("Solved in closed form", Long.toString(mc.fastPathSamples())));
        f.add(new HtmlView.Fact("Probability of violating the policy", StatisticsFormat.withInterval(mc.violation())
                + ", " + StatisticsFormat.count(mc.violation())));
        return f;
    }

    private static List<HtmlView.ViolationRow> violations(AnalysisResult result, PositionAtAmbient atMax,
                                                          MonteCarloResult mc) {
        Set<String> applies = new HashSet<>();
        for (WorstCheck w : atMax.worst()) {
            applies.add(w.check().ruleId());
        }
        Policy policy = result.policy();
        List<HtmlView.ViolationRow> rows = new ArrayList<>();
        for (RuleViolation v : mc.rules()) {
            WilsonInterval p = v.probability();
            // A rule the corner analysis found no quantity for is left out, unless a sample violated it.
            if (!applies.contains(v.ruleId()) && p.successes() == 0) {
                continue;
            }
            rows.add(new HtmlView.ViolationRow(v.ruleId(), policy.rule(v.ruleId()).map(Rule::title).orElse(""),
                    StatisticsFormat.probability(p.estimate()), StatisticsFormat.interval(p),
                    StatisticsFormat.count(p), p.successes() > 0 ? "violated" : ""));
        }
        return rows;
    }

    private static List<HtmlView.InputRow> inputs(PositionSpec spec, PositionStatistics s) {
        List<HtmlView.InputRow> rows = new ArrayList<>();
        for (SampledAxis a : s.monteCarlo().axes()) {
            String sigma = HtmlFormat.NONE;
            if (s.rss() instanceof RssOutcome.Spread r) {
                sigma = r.axes().stream().filter(x -> x.axis() == a.axis()).findFirst()
                        .map(x -> StatisticsFormat.axisValue(spec, a.axis(), x.inputSigma())).orElse(HtmlFormat.NONE);
            }
            rows.add(new HtmlView.InputRow(StatisticsFormat.axisTitle(spec, a.axis()),
                    a.toleranced().distribution().label(),
                    StatisticsFormat.axisRange(spec, a.axis(), a.toleranced().range()), sigma));
        }
        return rows;
    }

    private static List<HtmlView.TornadoRow> tornado(PositionSpec spec, PositionStatistics s) {
        List<HtmlView.TornadoRow> rows = new ArrayList<>();
        int rank = 1;
        for (TornadoBar b : s.tornado().bars()) {
            String share = HtmlFormat.NONE;
            if (s.rss() instanceof RssOutcome.Spread r) {
                share = r.axes().stream().filter(x -> x.axis() == b.axis()).findFirst()
                        .map(AxisSensitivity::marginSigma).map(StatisticsFormat::percent).orElse(HtmlFormat.NONE);
            }
            rows.add(new HtmlView.TornadoRow(Integer.toString(rank++), StatisticsFormat.axisTitle(spec, b.axis()),
                    StatisticsFormat.axisRange(spec, b.axis(), b.lowValue(), b.highValue()),
                    end(b.atLow()), end(b.atHigh()), StatisticsFormat.percent(b.swing()), share));
        }
        return rows;
    }

    private static String end(Evaluation e) {
        String m = HtmlFormat.margin(e.margin()) + " (" + e.limitingRuleId() + ")";
        return switch (e.status()) {
            case CONVERGED -> m;
            case RUNAWAY -> "runaway (taken at the search cap: " + m + ")";
            case NOT_CONVERGED -> "not converged (last iterate: " + m + ")";
        };
    }
}
