package org.tjmargin.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.Layer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.CornerPoint;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.surge.SurgeCase;
import org.tjmargin.surge.SurgeResult;
import org.tjmargin.surge.TransientSeries;

/**
 * Each surge of a position at its worst corner at the design's highest ambient
 * ({@link PositionAtAmbient#worstCornerForSurge}), in three stacked plots on one logarithmic time axis (surges span
 * microseconds to a fraction of a second): the junction temperature with the part's Tj max, the clamp current, and
 * the clamp voltage with each surge's protected limit. The series are the transient's own samples; nothing is
 * recomputed. Samples at {@code t = 0} are left out (no place on a log axis).
 */
final class ChartSurge {

    private ChartSurge() {
    }

    static JFreeChart build(AnalysisResult result, int index) {
        PositionSpec spec = result.board().positions().get(index);
        if (spec.surges().isEmpty()) {
            throw new IllegalArgumentException("position " + spec.id() + " has no surges");
        }
        PositionAtAmbient hot = result.atMaximumAmbient().positions().get(index);
        double tjMaxK = spec.part().ratings().tjMaxK();
        XYSeriesCollection temps = new XYSeriesCollection();
        XYSeriesCollection amps = new XYSeriesCollection();
        XYSeriesCollection volts = new XYSeriesCollection();
        List<Double> limits = new ArrayList<>();
        List<String> missing = new ArrayList<>();
        for (SurgeCase c : spec.surges().get().cases()) {
            Optional<CornerPoint> worst = hot.worstCornerForSurge(c.id(), tjMaxK);
            if (worst.isEmpty()) {
                missing.add(c.id());
                continue;
            }
            SurgeResult r = worst.get().surge(c.id()).orElseThrow();
            TransientSeries ts = r.pulse().series();
            double[] t = ts.timeS();
            double[] tj = ts.junctionTemperatureK();
            double[] i = ts.currentA();
            double[] v = ts.clampVoltageV();
            String key = c.id() + " (" + worst.get().corner().label() + ")";
            XYSeries sT = new XYSeries(key, false, true);
            XYSeries sI = new XYSeries(key, false, true);
            XYSeries sV = new XYSeries(key, false, true);
            for (int k = 0; k < t.length; k++) {
                if (t[k] > 0) {
                    sT.add(t[k], ChartData.celsius(tj[k]));
                    sI.add(t[k], i[k]);
                    sV.add(t[k], v[k]);
                }
            }
            temps.addSeries(sT);
            amps.addSeries(sI);
            volts.addSeries(sV);
            c.protectedLimitV().ifPresent(limits::add);
        }
        LogAxis time = new LogAxis("Time since the surge began (s)");
        time.setSmallestValue(1e-9);
        // whole decades: a log axis's default ticks fall on half decades (10^-8.5), hard to read
        time.setTickUnit(new NumberTickUnit(1.0));
        ChartStyle.axis(time);
        CombinedDomainXYPlot combined = new CombinedDomainXYPlot(time);
        combined.setGap(10.0);
        int n = temps.getSeriesCount();
        XYPlot tPlot = new XYPlot(temps, null, ChartStyle.numberAxis("Junction (°C)"), ChartData.lines(0, n, false));
        tPlot.addRangeMarker(ChartData.level(ChartData.celsius(tjMaxK), Palette.RUNAWAY_MARK, Palette.designLimitLine(),
                "Tj max " + ChartData.temperature(tjMaxK)), Layer.BACKGROUND);
        XYPlot iPlot = new XYPlot(amps, null, ChartStyle.numberAxis("Current (A)"), ChartData.lines(0, n, false));
        XYPlot vPlot = new XYPlot(volts, null, ChartStyle.numberAxis("Voltage (V)"), ChartData.lines(0, n, false));
        for (double lim : limits.stream().distinct().toList()) {
            vPlot.addRangeMarker(ChartData.level(lim, Palette.RUNAWAY_MARK, Palette.designLimitLine(),
                    "protected limit " + HtmlFormat.si(lim, org.tjmargin.units.Dimension.VOLTAGE)), Layer.BACKGROUND);
        }
        double top = limits.stream().mapToDouble(Double::doubleValue).max().orElse(0);
        org.jfree.data.Range vr = vPlot.getDataRange(vPlot.getRangeAxis());
        if (vr != null && top > 0) {
            double hi = Math.max(vr.getUpperBound(), top);
            // room above the limit line for its label
            vPlot.getRangeAxis().setRange(Math.min(0, vr.getLowerBound()), hi * 1.2);
        }
        // one legend for the three plots: the series are the same surges in the same order
        iPlot.getRenderer().setDefaultSeriesVisibleInLegend(false);
        vPlot.getRenderer().setDefaultSeriesVisibleInLegend(false);
        tPlot.getRenderer().setDefaultSeriesVisibleInLegend(true);
        int[] weights = {3, 2, 2};
        List<XYPlot> plots = List.of(tPlot, iPlot, vPlot);
        for (int k = 0; k < plots.size(); k++) {
            ChartStyle.plot(plots.get(k));
            combined.add(plots.get(k), weights[k]);
        }
        ChartStyle.plot(combined);
        List<String> subtitles = new ArrayList<>();
        subtitles.add("At " + ChartData.temperature(hot.ambientK()) + " ambient, each surge at its worst corner, from that "
                + "corner's steady-state junction temperature; a train shows its hottest pulse.");
        subtitles.add("Thermal-model estimate: measured surge limits fall below thermal predictions (current crowding).");
        if (!missing.isEmpty()) {
            subtitles.add("Not evaluated (no converged corner): " + String.join(", ", missing) + ".");
        }
        return ChartStyle.chart(spec.id() + " — surges", subtitles, combined);
    }
}
