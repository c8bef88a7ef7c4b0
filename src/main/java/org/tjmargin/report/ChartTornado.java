package org.tjmargin.report;

import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.AxisLocation;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.CategoryLabelPositions;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.renderer.category.IntervalBarRenderer;
import org.jfree.chart.renderer.category.StandardBarPainter;
import org.jfree.chart.ui.Layer;
import org.jfree.data.category.DefaultIntervalCategoryDataset;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.PointStatus;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.variation.Axis;
import org.tjmargin.variation.statistical.Evaluation;
import org.tjmargin.variation.statistical.PositionStatistics;
import org.tjmargin.variation.statistical.TornadoBar;
import org.tjmargin.variation.statistical.TornadoResult;

/**
 * The sensitivity ranking ({@link TornadoResult}) of one position at the design's highest ambient as a tornado: a
 * row per input, in the result's rank order from the top (largest swing first), each row a pair of bars from the
 * nominal limiting margin to the margin with the input at its low end and at its high end, the others nominal. The
 * row names the input and its range in its unit ({@link Labels#axisName}, {@link Labels#axisUnit}); the nominal margin
 * is a vertical line and, within reach, so is zero.
 *
 * <p>The rows are {@link Row} keys of the chart's category dataset, so a caller can read back which input each row is.
 */
final class ChartTornado {

    /** Series of the bars with the input at its low end. */
    static final String LOW = "input at its low end";
    /** Series of the bars with the input at its high end. */
    static final String HIGH = "input at its high end";

    private ChartTornado() {
    }

    /**
     * One row of the tornado: its rank (0 = largest swing), its input and its label. Compared by rank, the order
     * of the rows.
     */
    record Row(int rank, Axis axis, String label) implements Comparable<Row> {

        @Override
        public int compareTo(Row o) {
            return Integer.compare(rank, o.rank);
        }

        /** The axis draws this as the row's name. */
        @Override
        public String toString() {
            return label;
        }
    }

    static JFreeChart build(AnalysisResult result, int index, PositionStatistics s) {
        PositionSpec spec = result.board().positions().get(index);
        TornadoResult t = s.tornado();
        List<TornadoBar> bars = t.bars();
        int n = bars.size();
        double nominal = 100.0 * t.nominal().margin();
        Row[] rows = new Row[n];
        Number[][] starts = new Number[2][n];
        Number[][] ends = new Number[2][n];
        double lo = nominal;
        double hi = nominal;
        for (int k = 0; k < n; k++) {
            TornadoBar b = bars.get(k);
            rows[k] = new Row(k, b.axis(), label(spec, b));
            starts[0][k] = nominal;
            starts[1][k] = nominal;
            ends[0][k] = 100.0 * b.atLow().margin();
            ends[1][k] = 100.0 * b.atHigh().margin();
            lo = Math.min(lo, Math.min(ends[0][k].doubleValue(), ends[1][k].doubleValue()));
            hi = Math.max(hi, Math.max(ends[0][k].doubleValue(), ends[1][k].doubleValue()));
        }
        DefaultIntervalCategoryDataset data = new DefaultIntervalCategoryDataset(new Comparable<?>[] {LOW, HIGH},
                rows, starts, ends);

        CategoryAxis inputs = new CategoryAxis("Input and its range (largest swing first)");
        inputs.setMaximumCategoryLabelLines(2);
        inputs.setMaximumCategoryLabelWidthRatio(0.4f);
        inputs.setCategoryLabelPositions(CategoryLabelPositions.STANDARD);
        NumberAxis margin = ChartStyle.numberAxis("Limiting margin (%)");
        IntervalBarRenderer r = new IntervalBarRenderer();
        r.setBarPainter(new StandardBarPainter());
        r.setShadowVisible(false);
        r.setDrawBarOutline(false);
        // The two bars of a row touch: they are one input's two ends.
        r.setItemMargin(0.0);
        r.setSeriesPaint(0, Palette.seriesPaint(0));
        r.setSeriesPaint(1, Palette.seriesPaint(1));
        CategoryPlot plot = new CategoryPlot(data, inputs, margin, r);
        plot.setOrientation(PlotOrientation.HORIZONTAL);
        // The margin axis below the rows, as on every other chart.
        plot.setRangeAxisLocation(AxisLocation.BOTTOM_OR_RIGHT);
        inputs.setCategoryMargin(0.35);
        ChartStyle.plot(plot);

        List<String> subtitles = new ArrayList<>();
        subtitles.add(ChartStatisticsData.sentence(StatisticsText.TORNADO) + " At "
                + ChartData.temperature(s.ambientK()) + " ambient, " + ChartStatisticsData.airAtPart(s,
                ChartData::temperature) + (s.surgesIncluded() ? ", surge rules included" : "") + ".");
        subtitles.add("Nominal limiting margin " + HtmlFormat.margin(t.nominal().margin()) + " (rule "
                + t.nominal().limitingRuleId() + ")" + (t.nominal().status() == PointStatus.CONVERGED ? ""
                : ", nominal point " + status(t.nominal())) + ".");
        if (n == 0) {
            subtitles.add("No input varies at this position: nothing to rank.");
        }
        double xLo = lo;
        double xHi = hi;
        if (ChartStatisticsData.withinReach(0.0, lo, hi)) {
            plot.addRangeMarker(new ValueMarker(0.0, Palette.INK, Palette.zeroLine()), Layer.BACKGROUND);
            xLo = Math.min(xLo, 0.0);
            xHi = Math.max(xHi, 0.0);
        } else {
            subtitles.add("Zero margin (the limit) is off the axis " + (lo > 0 ? "to the left." : "to the right."));
        }
        // Half a percentage point at least, and a millionth of the magnitude: a stand-in margin near −1e17 % (a
        // rating fallen to zero) is spaced 16 apart in doubles, and a smaller pad would give an empty axis range.
        double pad = Math.max(Math.max(0.5, 0.06 * (xHi - xLo)), 1e-6 * Math.max(Math.abs(xLo), Math.abs(xHi)));
        margin.setRange(xLo - pad, xHi + pad);
        plot.addRangeMarker(ChartData.vertical(nominal, Palette.INK, Palette.nominalLine(), "nominal "
                + HtmlFormat.margin(t.nominal().margin()), ChartData.LabelAt.BOTTOM, xLo - pad, xHi + pad),
                Layer.FOREGROUND);
        return ChartStyle.chart(s.positionId() + " — sensitivity of the limiting margin", subtitles, plot);
    }

    /** The row's name: the input, its label, its range in its unit, and an end that did not converge. */
    static String label(PositionSpec spec, TornadoBar b) {
        StringBuilder sb = new StringBuilder(StatisticsFormat.axisTitle(spec, b.axis())).append(": ")
                .append(StatisticsFormat.axisRange(spec, b.axis(), b.lowValue(), b.highValue()));
        if (b.atLow().status() != PointStatus.CONVERGED) {
            sb.append(", low end ").append(status(b.atLow()));
        }
        if (b.atHigh().status() != PointStatus.CONVERGED) {
            sb.append(", high end ").append(status(b.atHigh()));
        }
        return sb.toString();
    }

    private static String status(Evaluation e) {
        return switch (e.status()) {
            case CONVERGED -> "converged";
            case RUNAWAY -> "runs away";
            case NOT_CONVERGED -> "not converged";
        };
    }
}
