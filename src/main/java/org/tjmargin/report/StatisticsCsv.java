package org.tjmargin.report;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.variation.WilsonInterval;
import org.tjmargin.variation.statistical.AxisSensitivity;
import org.tjmargin.variation.statistical.MonteCarloResult;
import org.tjmargin.variation.statistical.PositionStatistics;
import org.tjmargin.variation.statistical.RssOutcome;
import org.tjmargin.variation.statistical.RuleViolation;
import org.tjmargin.variation.statistical.StatisticsResult;
import org.tjmargin.variation.statistical.TornadoBar;
import org.tjmargin.variation.statistical.YieldPoint;

/**
 * The statistics as CSV (Commons CSV, RFC 4180), for spreadsheets:
 * <ul>
 *   <li>{@code spread.csv}: per position one row per method (worst-case corners, root-sum-square, Monte Carlo)
 *       at the design's highest ambient, side by side (for Monte Carlo, {@code tjLowC}/{@code tjHighC} are the
 *       edges of the outermost occupied histogram bins, exact to one bin width, and {@code tjCentreC} the mean;
 *       for the corners, the coolest and hottest corner; for RSS, the nominal with its σ);</li>
 *   <li>{@code yield.csv}: the yield against ambient, per position;</li>
 *   <li>{@code sensitivity.csv}: per position and input, the tornado swing and the RSS share, in rank order.</li>
 * </ul>
 * Temperatures in °C, spreads in K, probabilities as fractions; the unit of an input's values in its own column.
 */
public final class StatisticsCsv {

    /** Header of {@code spread.csv}. */
    public static final String[] SPREAD_HEADER = {"position", "method", "ambientC", "tLocalC", "samples",
        "tjLowC", "tjCentreC", "tjHighC", "tjSigmaK", "margin", "marginSigma", "limitingRule",
        "violationProbability", "violationLower", "violationUpper", "surgesIncluded"};

    /** Header of {@code yield.csv}. */
    public static final String[] YIELD_HEADER = {"position", "ambientC", "tLocalC", "yield", "yieldLower",
        "yieldUpper", "samples", "rules", "mostViolatedRule", "itsProbability"};

    /** Header of {@code sensitivity.csv}. */
    public static final String[] SENSITIVITY_HEADER = {"position", "rank", "axis", "input", "unit", "low", "high",
        "marginAtLow", "marginAtHigh", "marginSwing", "rssTjSigmaK", "rssMarginSigma"};

    private StatisticsCsv() {
    }

    /** {@code spread.csv}. */
    public static String spread(StatisticsResult s) {
        return print(SPREAD_HEADER, csv -> {
            for (PositionStatistics p : s.positions()) {
                String amb = num(Labels.celsius(p.ambientK()));
                String air = celsiusOrBlank(p.tLocalK());
                csv.printRecord(p.positionId(), "corners", amb, air, p.corners().corners(),
                        celsiusOrBlank(p.corners().tjMinK()), "", celsiusOrBlank(p.corners().tjMaxK()), "",
                        p.corners().margin(), "", p.corners().limitingRuleId(), "", "", "", p.surgesIncluded());
                if (p.rss() instanceof RssOutcome.Spread r) {
                    csv.printRecord(p.positionId(), "rss", amb, air, "", "", Labels.celsius(r.nominalTjK()), "",
                            r.tjSigmaK(), r.nominalMargin(), r.marginSigma(), r.limitingRuleId(), "", "", "",
                            p.surgesIncluded());
                } else {
                    csv.printRecord(p.positionId(), "rss (unresolved: "
                            + ((RssOutcome.Unresolved) p.rss()).status().name() + ")", amb, air, "", "", "", "", "",
                            "", "", "", "", "", "", p.surgesIncluded());
                }
                MonteCarloResult mc = p.monteCarlo();
                WilsonInterval v = mc.violation();
                csv.printRecord(p.positionId(), "monte-carlo", amb, air, mc.settings().samples(),
                        histogramLo(mc), mc.tj().count() > 0 ? Labels.celsius(mc.tj().mean()) : "", histogramHi(mc),
                        mc.tj().standardDeviation(), mc.margin().mean(), mc.margin().standardDeviation(), "",
                        v.estimate(), v.lower(), v.upper(), p.surgesIncluded());
            }
        });
    }

    /** {@code yield.csv}. */
    public static String yield(StatisticsResult s) {
        return print(YIELD_HEADER, csv -> {
            for (PositionStatistics p : s.positions()) {
                yieldRows(csv, p.positionId(), p.yield(), "steady-state");
                yieldRows(csv, p.positionId(), p.yieldWithSurges(), "with-surges");
            }
        });
    }

    /** The rows of one yield curve; {@code rules} names what it holds. */
    private static void yieldRows(CSVPrinter csv, String id, List<YieldPoint> points, String rules)
            throws IOException {
        for (YieldPoint y : points) {
            var worst = y.mostViolated();
            csv.printRecord(id, Labels.celsius(y.ambientK()), celsiusOrBlank(y.tLocalK()), y.yield(), y.wilsonLo(),
                    y.wilsonHi(), y.samples(), rules, worst.map(RuleViolation::ruleId).orElse(""),
                    worst.map(w -> (Object) w.probability().estimate()).orElse(""));
        }
    }

    /** {@code sensitivity.csv}. */
    public static String sensitivity(AnalysisResult r, StatisticsResult s) {
        return print(SENSITIVITY_HEADER, csv -> {
            for (PositionStatistics p : s.positions()) {
                PositionSpec spec = r.board().positions().stream().filter(x -> x.id().equals(p.positionId()))
                        .findFirst().orElseThrow();
                int rank = 1;
                for (TornadoBar b : p.tornado().bars()) {
                    AxisSensitivity share = p.rss() instanceof RssOutcome.Spread sp ? sp.axes().stream()
                            .filter(a -> a.axis() == b.axis()).findFirst().orElse(null) : null;
                    csv.printRecord(p.positionId(), rank++, b.axis().label(), Labels.axisName(spec, b.axis()),
                            Labels.axisUnit(spec, b.axis()), b.lowValue(), b.highValue(), b.atLow().margin(),
                            b.atHigh().margin(), b.swing(), share == null ? "" : share.tjSigmaK(),
                            share == null ? "" : share.marginSigma());
                }
            }
        });
    }

    /** Low end of the sampled junction temperatures (the histogram's first occupied bin's lower edge), °C. */
    private static String histogramLo(MonteCarloResult mc) {
        var h = mc.tjHistogram();
        long[] c = h.counts();
        for (int i = 0; i < c.length; i++) {
            if (c[i] > 0) {
                return h.underflow() > 0 ? "" : num(Labels.celsius(h.binLo(i)));
            }
        }
        return "";
    }

    /** High end: the last occupied bin's upper edge, °C. */
    private static String histogramHi(MonteCarloResult mc) {
        var h = mc.tjHistogram();
        long[] c = h.counts();
        for (int i = c.length - 1; i >= 0; i--) {
            if (c[i] > 0) {
                return h.overflow() > 0 ? "" : num(Labels.celsius(h.binLo(i) + h.binWidth()));
            }
        }
        return "";
    }

    private static String celsiusOrBlank(double k) {
        return Double.isNaN(k) ? "" : num(Labels.celsius(k));
    }

    private static String num(double v) {
        return Double.toString(v);
    }

    private interface Rows {
        void print(CSVPrinter csv) throws IOException;
    }

    private static String print(String[] header, Rows rows) {
        StringWriter out = new StringWriter();
        try (CSVPrinter csv = new CSVPrinter(out, CSVFormat.RFC4180.builder().setHeader(header).get())) {
            rows.print(csv);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }
}
