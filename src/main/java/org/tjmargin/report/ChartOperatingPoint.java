package org.tjmargin.report;

import java.util.List;
import java.util.Optional;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.Layer;
import org.jfree.data.Range;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.CornerPoint;
import org.tjmargin.solve.OperatingPoint;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.solve.PositionResult;
import org.tjmargin.solve.PositionSpec;

/**
 * The operating point against ambient for one position, in three stacked plots on one ambient axis: the junction
 * temperature of the hottest corner with the air around the part and the part's Tj max; that corner's diode power;
 * and the output voltage, lowest and highest over the converged corners.
 *
 * <p>Where the hottest corner runs away there is no operating point: the lines break there.
 */
final class ChartOperatingPoint {

    private ChartOperatingPoint() {
    }

    static JFreeChart build(AnalysisResult result, int index) {
        PositionResult pr = result.positions().get(index);
        PositionSpec spec = result.board().positions().get(index);
        List<PositionAtAmbient> sweep = ChartData.sweepOf(result, index);

        double maxPower = 0;
        for (PositionAtAmbient p : sweep) {
            maxPower = Math.max(maxPower, p.hottest().flatMap(CornerPoint::point).map(OperatingPoint::diodePowerW)
                    .orElse(0.0));
        }
        ChartStyle.Scale pScale = ChartStyle.Scale.of(maxPower, "W");

        XYSeries tj = ChartData.series("Tj, hottest corner");
        XYSeries air = ChartData.series("air around the part");
        XYSeries power = ChartData.series("diode power, hottest corner");
        XYSeries vLow = ChartData.series("output, lowest corner");
        XYSeries vHigh = ChartData.series("output, highest corner");
        for (int k = 0; k < sweep.size(); k++) {
            PositionAtAmbient p = sweep.get(k);
            double x = ChartData.celsius(p.ambientK());
            // Air without a balance (it runs away) has no temperature to draw.
            air.add(x, result.sweep().get(k).airBalanced() ? (Number) ChartData.celsius(p.tLocalK()) : null);
            Optional<OperatingPoint> hot = p.hottest().flatMap(CornerPoint::point);
            tj.add(x, hot.isPresent() ? (Number) ChartData.celsius(hot.get().tjK()) : null);
            power.add(x, hot.isPresent() ? (Number) pScale.apply(hot.get().diodePowerW()) : null);
            boolean any = p.envelope().any();
            vLow.add(x, any ? (Number) p.envelope().outputMinV() : null);
            vHigh.add(x, any ? (Number) p.envelope().outputMaxV() : null);
        }

        NumberAxis ambient = ChartStyle.numberAxis("Ambient temperature (°C)");
        CombinedDomainXYPlot combined = new CombinedDomainXYPlot(ambient);
        combined.setGap(10.0);

        XYSeriesCollection temps = new XYSeriesCollection();
        temps.addSeries(tj);
        temps.addSeries(air);
        XYPlot tPlot = new XYPlot(temps, null, ChartStyle.numberAxis("Temperature (°C)"),
                ChartData.lines(0, 2, ChartData.markers(result.sweep().size())));
        double tjMaxK = spec.part().ratings().tjMaxK();
        tPlot.addRangeMarker(ChartData.level(ChartData.celsius(tjMaxK), Palette.RUNAWAY_MARK,
                Palette.designLimitLine(), "Tj max " + ChartData.temperature(tjMaxK)), Layer.BACKGROUND);
        ((NumberAxis) tPlot.getRangeAxis()).setAutoRangeIncludesZero(false);
        includeMarker(tPlot, ChartData.celsius(tjMaxK));

        XYPlot pPlot = new XYPlot(new XYSeriesCollection(power), null,
                ChartStyle.numberAxis("Diode power (" + pScale.symbol() + ")"), ChartData.lines(2, 1, ChartData.markers(result.sweep().size())));
        ((NumberAxis) pPlot.getRangeAxis()).setAutoRangeIncludesZero(true);

        XYSeriesCollection volts = new XYSeriesCollection();
        volts.addSeries(vLow);
        volts.addSeries(vHigh);
        XYPlot vPlot = new XYPlot(volts, null, ChartStyle.numberAxis("Output (V)"), ChartData.lines(3, 2, ChartData.markers(result.sweep().size())));

        // The junction temperature is what the chart is about: it gets the most height.
        int[] weights = {3, 2, 2};
        List<XYPlot> plots = List.of(tPlot, pPlot, vPlot);
        for (int i = 0; i < plots.size(); i++) {
            ChartStyle.plot(plots.get(i));
            combined.add(plots.get(i), weights[i]);
        }
        ChartStyle.plot(combined);
        return ChartStyle.chart(pr.id() + " — operating point against ambient",
                List.of("Hottest corner at each ambient (a runaway corner has no point: the lines break there)."),
                combined);
    }

    /** Widens the auto range of the plot's value axis so that a reference line at {@code value} stays in view. */
    private static void includeMarker(XYPlot plot, double value) {
        NumberAxis axis = (NumberAxis) plot.getRangeAxis();
        Range r = plot.getDataRange(axis);
        if (r == null) {
            return;
        }
        double lo = Math.min(r.getLowerBound(), value);
        double hi = Math.max(r.getUpperBound(), value);
        double span = Math.max(1.0, hi - lo);
        // More room above than below: the reference line's label sits above it.
        axis.setRange(lo - 0.06 * span, hi + 0.18 * span);
    }
}
