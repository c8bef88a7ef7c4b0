package org.tjmargin.report;

import java.awt.BasicStroke;
import java.awt.geom.Ellipse2D;
import java.util.List;
import java.util.Locale;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.tjmargin.device.PowerRatingCurve;
import org.tjmargin.units.Dimension;
import org.tjmargin.units.Quantities;

/**
 * A power rating curve (allowed power against the temperature of its reference point) with operating points held
 * against it: the common drawing of the diode's and of the series resistor's charts ({@link ChartDeviceRating},
 * {@link ChartResistorRating}).
 *
 * <p>The curve is drawn flat from the left edge of the plot to its first point, through its points, and at zero
 * past its last, as {@link PowerRatingCurve#allowedPowerAt} reads it. The operating points are a line of dots in
 * sweep order, the one at the design's highest ambient drawn large.
 */
final class ChartRating {

    private ChartRating() {
    }

    /**
     * One operating point of the chart.
     *
     * @param temperatureK temperature at which the curve is read for it (K)
     * @param powerW       its dissipation (W)
     */
    record Dot(double temperatureK, double powerW) {
    }

    /**
     * Builds the chart.
     *
     * @param title     chart title
     * @param subtitle  one line under the title
     * @param xLabel    the horizontal axis, with its unit
     * @param curve     the rating
     * @param curveName legend entry of the curve
     * @param dots      operating points in sweep order
     * @param dotsName  legend entry of the dots
     * @param last      the point at the design's highest ambient, or {@code null}
     * @param lastName  its legend entry
     */
    static JFreeChart build(String title, String subtitle, String xLabel, PowerRatingCurve curve, String curveName,
                            List<Dot> dots, String dotsName, Dot last, String lastName) {
        double maxPower = curve.ratedPowerW();
        double tLo = curve.points().get(0).temperatureK();
        double tHi = curve.zeroPowerTemperatureK();
        for (Dot d : dots) {
            maxPower = Math.max(maxPower, d.powerW());
            tLo = Math.min(tLo, d.temperatureK());
            tHi = Math.max(tHi, d.temperatureK());
        }
        double margin = Math.max(5.0, 0.08 * (tHi - tLo));
        double left = tLo - margin;
        double right = tHi + margin;
        ChartStyle.Scale scale = ChartStyle.Scale.of(maxPower, "W");

        XYSeries c = ChartData.series(curveName);
        c.add(ChartData.celsius(left), scale.apply(curve.allowedPowerAt(left)));
        for (PowerRatingCurve.Point p : curve.points()) {
            if (p.temperatureK() > left) {
                c.add(ChartData.celsius(p.temperatureK()), scale.apply(p.powerW()));
            }
        }
        c.add(ChartData.celsius(right), 0.0);
        XYSeries ops = ChartData.series(dotsName);
        for (Dot d : dots) {
            ops.add(ChartData.celsius(d.temperatureK()), scale.apply(d.powerW()));
        }
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(c);
        data.addSeries(ops);
        if (last != null) {
            XYSeries l = ChartData.series(lastName);
            l.add(ChartData.celsius(last.temperatureK()), scale.apply(last.powerW()));
            data.addSeries(l);
        }

        XYLineAndShapeRenderer r = ChartData.lines(0, 3, true);
        r.setSeriesShapesVisible(0, false);
        r.setSeriesStroke(1, new BasicStroke(1.0f));
        r.setSeriesPaint(1, Palette.seriesPaint(1));
        r.setSeriesLinesVisible(2, false);
        r.setSeriesPaint(2, Palette.seriesPaint(4));
        r.setSeriesShape(2, new Ellipse2D.Double(-6, -6, 12, 12));

        NumberAxis x = ChartStyle.numberAxis(xLabel);
        x.setRange(ChartData.celsius(left), ChartData.celsius(right));
        NumberAxis y = ChartStyle.numberAxis("Power (" + scale.symbol() + ")");
        y.setAutoRangeIncludesZero(true);
        y.setLowerBound(0.0);
        XYPlot plot = new XYPlot(data, x, y, r);
        ChartStyle.plot(plot);
        y.setRange(0.0, 1.08 * scale.apply(maxPower));
        return ChartStyle.chart(title, List.of(subtitle), plot);
    }

    /** A curve described in words, e.g. {@code 1.00 W to 50.0 °C, zero at 200.0 °C}. */
    static String describe(PowerRatingCurve curve) {
        PowerRatingCurve.Point first = curve.points().get(0);
        return String.format(Locale.ROOT, "%s to %s, zero at %s", Quantities.format(first.powerW(), Dimension.POWER),
                ChartData.temperature(first.temperatureK()), ChartData.temperature(curve.zeroPowerTemperatureK()));
    }
}
