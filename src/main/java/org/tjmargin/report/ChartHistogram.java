package org.tjmargin.report;

import java.awt.Paint;
import java.awt.Stroke;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.chart.ui.Layer;
import org.jfree.data.xy.XYIntervalSeries;
import org.jfree.data.xy.XYIntervalSeriesCollection;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.variation.Histogram;
import org.tjmargin.variation.statistical.CornerExtremes;
import org.tjmargin.variation.statistical.MonteCarloResult;
import org.tjmargin.variation.statistical.PositionStatistics;

/**
 * The Monte Carlo histograms of one position at the design's highest ambient, drawn from the run's own bins
 * ({@link MonteCarloResult#tjHistogram()}, {@link MonteCarloResult#marginHistogram()}): nothing is re-binned.
 *
 * <ul>
 *   <li>Junction temperature (°C) with the worst-case corners' coolest and hottest junction and the part's Tj max;
 *   </li>
 *   <li>limiting margin (%) with the zero-margin line and the corner analysis's worst margin.</li>
 * </ul>
 * A reference line farther than one data span from the bins is named in a subtitle instead of drawn
 * ({@link ChartStatisticsData#withinReach}), so that the bars never shrink to a sliver.
 */
final class ChartHistogram {

    private ChartHistogram() {
    }

    /** Junction temperature of the converged samples, in °C. */
    static JFreeChart buildTj(AnalysisResult result, int index, PositionStatistics s) {
        PositionSpec spec = result.board().positions().get(index);
        MonteCarloResult mc = s.monteCarlo();
        Histogram h = mc.tjHistogram();
        CornerExtremes c = s.corners();
        double tjMaxK = spec.part().ratings().tjMaxK();
        // Enough decimals to tell the corners apart and to read a bin: one, or more for a narrow spread.
        double resolution = Math.min(h.binWidth(), c.tjMaxK() > c.tjMinK() ? c.tjMaxK() - c.tjMinK()
                : Double.POSITIVE_INFINITY);
        List<Mark> marks = new ArrayList<>();
        List<String> missing = new ArrayList<>();
        if (Double.isNaN(c.tjMinK())) {
            missing.add("No corner converged: the corners' extremes are not drawn.");
        } else {
            marks.add(new Mark(ChartData.celsius(c.tjMinK()), "coolest corner "
                    + StatisticsFormat.temperature(c.tjMinK(), resolution),
                    Palette.INK, Palette.cornerLine(), ChartData.LabelAt.TOP));
            marks.add(new Mark(ChartData.celsius(c.tjMaxK()), "hottest corner "
                    + StatisticsFormat.temperature(c.tjMaxK(), resolution),
                    Palette.INK, Palette.cornerLine(), ChartData.LabelAt.MIDDLE));
        }
        marks.add(new Mark(ChartData.celsius(tjMaxK), "Tj max " + ChartData.temperature(tjMaxK), Palette.RUNAWAY_MARK,
                Palette.designLimitLine(), ChartData.LabelAt.BOTTOM));
        List<String> subtitles = new ArrayList<>();
        subtitles.add(ChartStatisticsData.run(s) + " Bins of " + HtmlFormat.plain(h.binWidth()) + " K"
                + "; corners: " + c.corners() + " worst-case corners at the same ambient.");
        subtitles.addAll(missing);
        String left = ChartStatisticsData.leftOut(mc, h.underflow(), h.overflow());
        if (left != null) {
            subtitles.add(left);
        }
        return draw(s.positionId() + " — junction temperature, Monte Carlo", subtitles,
                "Junction temperature (°C)", "converged samples (" + mc.tj().count() + ")",
                ChartData.celsius(h.lo()), h.binWidth(), h.counts(), marks, 0);
    }

    /** Limiting margin of the converged samples, in per cent. */
    static JFreeChart buildMargin(AnalysisResult result, int index, PositionStatistics s) {
        MonteCarloResult mc = s.monteCarlo();
        Histogram h = mc.marginHistogram();
        CornerExtremes c = s.corners();
        List<Mark> marks = new ArrayList<>();
        marks.add(new Mark(0.0, "zero margin: the limit", Palette.INK, Palette.zeroLine(), ChartData.LabelAt.TOP));
        marks.add(new Mark(100.0 * c.margin(), "worst-case corners " + HtmlFormat.margin(c.margin()) + " ("
                + c.limitingRuleId() + ")", Palette.INK, Palette.cornerLine(), ChartData.LabelAt.MIDDLE));
        List<String> subtitles = new ArrayList<>();
        subtitles.add(ChartStatisticsData.run(s) + " Bins of " + HtmlFormat.plain(100.0 * h.binWidth()) + " %.");
        subtitles.add("Each sample's smallest margin over the policy's rules; probability of violating the policy "
                + StatisticsFormat.withInterval(mc.violation()) + ".");
        String left = ChartStatisticsData.leftOut(mc, h.underflow(), h.overflow());
        if (left != null) {
            subtitles.add(left);
        }
        return draw(s.positionId() + " — limiting margin, Monte Carlo", subtitles, "Limiting margin (%)",
                "converged samples (" + mc.margin().count() + ")", 100.0 * h.lo(), 100.0 * h.binWidth(), h.counts(),
                marks, 2);
    }

    /** A reference line: where, its label, its look, and where its label sits along it. */
    private record Mark(double x, String label, Paint paint, Stroke stroke, ChartData.LabelAt at) {
    }

    /**
     * The histogram's bars, in display units from {@code lo} in bins of {@code binWidth}, with its reference lines.
     *
     * @param ink the series ink of the bars
     */
    private static JFreeChart draw(String title, List<String> subtitles, String xLabel, String key, double lo,
                                   double binWidth, long[] counts, List<Mark> marks, int ink) {
        XYIntervalSeries bars = new XYIntervalSeries(key, false, true);
        for (int i = 0; i < counts.length; i++) {
            // Empty bins draw nothing; leaving them out keeps the SVG small.
            if (counts[i] > 0) {
                double a = lo + i * binWidth;
                bars.add(a + 0.5 * binWidth, a, a + binWidth, counts[i], 0.0, counts[i]);
            }
        }
        XYIntervalSeriesCollection data = new XYIntervalSeriesCollection();
        data.addSeries(bars);
        // The axis spans the occupied bins (the run chose its bins before it saw the samples, so some may be
        // empty at either end), widened to the reference lines within reach.
        int first = 0;
        while (first < counts.length - 1 && counts[first] == 0) {
            first++;
        }
        int last = counts.length - 1;
        while (last > first && counts[last] == 0) {
            last--;
        }
        double dataLo = lo + first * binWidth;
        double dataHi = lo + (last + 1) * binWidth;
        double xLo = dataLo;
        double xHi = dataHi;
        List<Mark> drawn = new ArrayList<>();
        List<String> lines = new ArrayList<>(subtitles);
        for (Mark m : marks) {
            if (ChartStatisticsData.withinReach(m.x(), dataLo, dataHi)) {
                drawn.add(m);
                xLo = Math.min(xLo, m.x());
                xHi = Math.max(xHi, m.x());
            } else {
                lines.add("Off the axis " + (m.x() < dataLo ? "to the left" : "to the right") + ": " + m.label()
                        + ".");
            }
        }
        lines.add(ChartStatisticsData.air());
        // A millionth of the magnitude at least, as the run's own bins (see Bins.around): never an empty range.
        double pad = Math.max(0.04 * (xHi - xLo), 1e-6 * Math.max(Math.abs(xLo), Math.abs(xHi)));
        xLo -= pad;
        xHi += pad;

        NumberAxis x = ChartStyle.numberAxis(xLabel);
        x.setRange(xLo, xHi);
        NumberAxis y = ChartStyle.numberAxis("Samples per bin");
        y.setAutoRangeIncludesZero(true);
        y.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        // Room above the tallest bar for the reference lines' labels.
        y.setUpperMargin(0.18);

        XYBarRenderer r = new XYBarRenderer();
        r.setBarPainter(new StandardXYBarPainter());
        r.setShadowVisible(false);
        r.setSeriesPaint(0, Palette.seriesPaint(ink));
        r.setDrawBarOutline(true);
        r.setSeriesOutlinePaint(0, Palette.SHEET);
        XYPlot plot = new XYPlot(data, x, y, r);
        ChartStyle.plot(plot);
        for (Mark m : drawn) {
            plot.addDomainMarker(ChartData.vertical(m.x(), m.paint(), m.stroke(), m.label(), m.at(), xLo, xHi),
                    Layer.FOREGROUND);
        }
        return ChartStyle.chart(title, lines, plot);
    }
}
