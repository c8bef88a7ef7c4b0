package org.tjmargin.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.Layer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.tjmargin.derating.Rule;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.MaximumAmbient;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.solve.PositionResult;
import org.tjmargin.solve.RunawayOnset;
import org.tjmargin.solve.WorstCheck;

/**
 * Margin against ambient for one position: a line per rule through the rule's worst margin over all corners at each
 * sweep ambient ({@link PositionAtAmbient#worst()}), the zero-margin line, the design's highest ambient (the last
 * sweep point), the maximum ambient the search found ({@link PositionResult#maxAmbient()}) and, if any, the onset of
 * thermal runaway.
 *
 * <p>A rule that does not apply at an ambient (no corner produced its quantity) leaves a gap. The vertical axis
 * follows the data but stops at ±{@value #AXIS_LIMIT_PERCENT} %: a floor rule far above its limit (a Zener current
 * thirty times its knee current is a margin of 2900 %) would otherwise flatten every other line; the subtitle says
 * when lines leave the axis.
 */
final class ChartMargin {

    /** Largest margin magnitude the axis shows (%). */
    static final double AXIS_LIMIT_PERCENT = 100.0;

    private ChartMargin() {
    }

    static JFreeChart build(AnalysisResult result, int index) {
        return build(result, index, false);
    }

    /** The margin of the surge rules only (design 2.6: surge margin against ambient). */
    static JFreeChart buildSurge(AnalysisResult result, int index) {
        return build(result, index, true);
    }

    private static JFreeChart build(AnalysisResult result, int index, boolean surgeOnly) {
        PositionResult pr = result.positions().get(index);
        List<PositionAtAmbient> sweep = ChartData.sweepOf(result, index);
        XYSeriesCollection data = new XYSeriesCollection();
        double lo = 0;
        double hi = 0;
        for (Rule rule : result.policy().rules()) {
            if (surgeOnly && !rule.measure().isSurge()) {
                continue;
            }
            XYSeries s = ChartData.series(rule.id() + ": " + rule.title());
            boolean any = false;
            for (PositionAtAmbient p : sweep) {
                Optional<WorstCheck> w = p.worst().stream().filter(c -> c.check().ruleId().equals(rule.id()))
                        .findFirst();
                double x = ChartData.celsius(p.ambientK());
                if (w.isPresent()) {
                    double m = 100.0 * w.get().check().margin();
                    s.add(x, m);
                    lo = Math.min(lo, m);
                    hi = Math.max(hi, m);
                    any = true;
                } else {
                    s.add(x, null);
                }
            }
            if (any) {
                data.addSeries(s);
            }
        }

        NumberAxis xAxis = ChartStyle.numberAxis("Ambient temperature (°C)");
        NumberAxis yAxis = ChartStyle.numberAxis("Margin (%)");
        boolean clipped = lo < -AXIS_LIMIT_PERCENT || hi > AXIS_LIMIT_PERCENT;
        double yLo = Math.max(-AXIS_LIMIT_PERCENT, lo);
        double yHi = Math.min(AXIS_LIMIT_PERCENT, hi);
        double pad = Math.max(2.0, 0.06 * (yHi - yLo));
        yAxis.setRange(yLo - pad, yHi + pad);

        XYPlot plot = new XYPlot(data, xAxis, yAxis, ChartData.lines(0, data.getSeriesCount(), ChartData.markers(result.sweep().size())));
        ChartStyle.plot(plot);
        plot.addRangeMarker(new ValueMarker(0.0, Palette.INK, Palette.zeroLine()), Layer.BACKGROUND);

        double firstK = sweep.get(0).ambientK();
        double designK = result.atMaximumAmbient().ambientK();
        MaximumAmbient max = pr.maxAmbient();
        Optional<RunawayOnset> onset = pr.runaway();
        double xHiK = designK;
        if (max.status() != MaximumAmbient.Status.NONE) {
            xHiK = Math.max(xHiK, max.ambientK());
        }
        if (onset.isPresent()) {
            xHiK = Math.max(xHiK, onset.get().ambientK());
        }
        double span = Math.max(1.0, xHiK - firstK);
        double xLo = ChartData.celsius(firstK) - 0.02 * span;
        double xHi = ChartData.celsius(xHiK) + 0.04 * span;
        xAxis.setRange(xLo, xHi);

        plot.addDomainMarker(ChartData.vertical(ChartData.celsius(designK), Palette.INK, Palette.designLimitLine(),
                "design max " + ChartData.temperature(designK), ChartData.LabelAt.TOP, xLo, xHi), Layer.BACKGROUND);
        List<String> subtitles = new ArrayList<>();
        switch (max.status()) {
            case FOUND -> plot.addDomainMarker(ChartData.vertical(ChartData.celsius(max.ambientK()), Palette.ACCENT,
                    Palette.answerLine(), "max ambient " + ChartData.temperature(max.ambientK()),
                    ChartData.LabelAt.BOTTOM, xLo, xHi), Layer.FOREGROUND);
            case HOLDS_TO_LIMIT -> plot.addDomainMarker(ChartData.vertical(ChartData.celsius(max.ambientK()),
                    Palette.ACCENT, Palette.answerLine(), "holds to " + ChartData.temperature(max.ambientK())
                            + " (end of search)", ChartData.LabelAt.BOTTOM, xLo, xHi), Layer.FOREGROUND);
            case NONE -> subtitles.add("No ambient in the search passes every rule.");
        }
        if (onset.isPresent()) {
            RunawayOnset o = onset.get();
            plot.addDomainMarker(ChartData.vertical(ChartData.celsius(o.ambientK()), Palette.RUNAWAY_MARK,
                    Palette.designLimitLine(), (o.atOrBelowSearch() ? "runaway at or below " : "runaway from ")
                            + ChartData.temperature(o.ambientK()), ChartData.LabelAt.MIDDLE, xLo, xHi),
                    Layer.FOREGROUND);
        }
        subtitles.add("Each rule at its worst corner at each ambient; a rule holds where its margin is ≥ 0.");
        if (surgeOnly) {
            subtitles.add("Thermal-model estimate: measured surge limits fall below thermal predictions (current crowding).");
        }
        if (clipped) {
            subtitles.add("Vertical axis limited to ±" + (int) AXIS_LIMIT_PERCENT
                    + " %; lines leaving it continue beyond.");
        }
        return ChartStyle.chart(pr.id() + (surgeOnly ? " — surge margin against ambient" : " — margin against ambient"),
                subtitles, plot);
    }
}
