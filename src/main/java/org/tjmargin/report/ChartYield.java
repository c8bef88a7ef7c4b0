package org.tjmargin.report;

import java.awt.geom.Ellipse2D;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.DeviationRenderer;
import org.jfree.chart.ui.Layer;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.variation.statistical.PositionStatistics;
import org.tjmargin.variation.statistical.YieldPoint;

/**
 * The yield of one position against ambient ({@link PositionStatistics#yield()}): the fraction of Monte Carlo
 * samples that pass the steady-state rules at each ambient of the curve, inside its 95 % Wilson score band, with the
 * design's highest ambient marked; for a position with surges, a second curve and band with every rule, each surge
 * run on every sample ({@link PositionStatistics#yieldWithSurges()}, fewer samples, so a wider band).
 */
final class ChartYield {

    /** Smallest span of the yield axis (percentage points): a curve at 100 % stays a readable line, not a border. */
    static final double MIN_SPAN_PERCENT = 1.0;

    private ChartYield() {
    }

    static JFreeChart build(AnalysisResult result, PositionStatistics s) {
        boolean surges = !s.yieldWithSurges().isEmpty();
        YIntervalSeries yield = new YIntervalSeries("yield, " + StatisticsText.YIELD_RULES
                + (surges ? " (" + s.yield().get(0).samples() + " samples)" : "") + ", with its 95 % Wilson band",
                false, true);
        double lo = add(yield, s.yield());
        YIntervalSeriesCollection data = new YIntervalSeriesCollection();
        data.addSeries(yield);
        if (surges) {
            YIntervalSeries with = new YIntervalSeries("yield, " + StatisticsText.YIELD_WITH_SURGES + " ("
                    + s.yieldWithSurges().get(0).samples() + " samples), with its band", false, true);
            lo = Math.min(lo, add(with, s.yieldWithSurges()));
            data.addSeries(with);
        }

        double firstK = result.sweep().get(0).ambientK();
        double designK = result.atMaximumAmbient().ambientK();
        double xSpan = Math.max(1.0, designK - firstK);
        double xLo = ChartData.celsius(firstK) - 0.02 * xSpan;
        double xHi = ChartData.celsius(designK) + 0.04 * xSpan;
        NumberAxis x = ChartStyle.numberAxis("Ambient temperature (°C)");
        x.setRange(xLo, xHi);
        double ySpan = Math.max(MIN_SPAN_PERCENT, 100.0 - lo);
        NumberAxis y = ChartStyle.numberAxis("Yield (%)");
        // Room below for the design line's label, a little above 100 % so the curve does not sit on the border.
        y.setRange(Math.max(-0.5, 100.0 - 1.12 * ySpan), 100.0 + 0.05 * ySpan);

        DeviationRenderer r = new DeviationRenderer(true, ChartData.markers(s.yield().size()));
        r.setSeriesPaint(0, Palette.seriesPaint(0));
        r.setSeriesStroke(0, Palette.seriesStroke(0));
        r.setSeriesFillPaint(0, Palette.seriesPaint(0));
        r.setSeriesShape(0, new Ellipse2D.Double(-3, -3, 6, 6));
        r.setSeriesPaint(1, Palette.seriesPaint(1));
        r.setSeriesStroke(1, Palette.seriesStroke(1));
        r.setSeriesFillPaint(1, Palette.seriesPaint(1));
        r.setSeriesShape(1, new java.awt.geom.Rectangle2D.Double(-3, -3, 6, 6));
        // The band is a wash of the line's ink.
        r.setAlpha(0.22f);
        XYPlot plot = new XYPlot(data, x, y, r);
        ChartStyle.plot(plot);
        plot.addDomainMarker(ChartData.vertical(ChartData.celsius(designK), Palette.INK, Palette.designLimitLine(),
                "design max " + ChartData.temperature(designK), ChartData.LabelAt.BOTTOM, xLo, xHi),
                Layer.BACKGROUND);

        List<String> subtitles = new ArrayList<>();
        subtitles.add("Seeded Monte Carlo of " + s.yield().get(0).samples() + " samples (seed "
                + s.monteCarlo().settings().seed() + ") at each of " + s.yield().size() + " ambients, the same draws"
                + " at every ambient" + (surges ? "; with surges, the first " + s.yieldWithSurges().get(0).samples()
                + " of them." : "."));
        subtitles.add("Yield against the " + StatisticsText.YIELD_RULES + (surges ? " and against "
                + StatisticsText.YIELD_WITH_SURGES : "") + ": the fraction of samples passing all of them;"
                + " band: 95 % Wilson score interval.");
        subtitles.add(ChartStatisticsData.air());
        return ChartStyle.chart(s.positionId() + " — yield against ambient", subtitles, plot);
    }

    /** Adds the points to the series; returns the lowest lower bound (%). */
    private static double add(YIntervalSeries series, List<YieldPoint> points) {
        double lo = 100.0;
        for (YieldPoint p : points) {
            series.add(ChartData.celsius(p.ambientK()), 100.0 * p.yield(), 100.0 * p.wilsonLo(),
                    100.0 * p.wilsonHi());
            lo = Math.min(lo, 100.0 * p.wilsonLo());
        }
        return lo;
    }
}
