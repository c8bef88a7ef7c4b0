package org.tjmargin.report;

import java.awt.Color;
import java.awt.Paint;
import java.awt.Stroke;
import java.awt.geom.Ellipse2D;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.BoardAtAmbient;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.units.Dimension;
import org.tjmargin.units.Quantities;

/**
 * What the chart classes share: reading one position out of the sweep, kelvin to the °C of the axes, series that
 * keep gaps where a corner has no operating point, and labelled reference lines. Reads results only.
 */
final class ChartData {

    private ChartData() {
    }

    /** The position at every sweep ambient, increasing. */
    static List<PositionAtAmbient> sweepOf(AnalysisResult result, int index) {
        List<PositionAtAmbient> out = new ArrayList<>(result.sweep().size());
        for (BoardAtAmbient b : result.sweep()) {
            out.add(b.positions().get(index));
        }
        return out;
    }

    /** Kelvin to the °C of the axes. */
    static double celsius(double kelvin) {
        return Quantities.kelvinToCelsius(kelvin);
    }

    /** A temperature for a label, e.g. {@code 85.0 °C}. */
    static String temperature(double kelvin) {
        return Quantities.format(kelvin, Dimension.TEMPERATURE);
    }

    /** A series in the order points are added (the sweep is increasing); {@code null} values leave gaps. */
    static XYSeries series(String key) {
        return new XYSeries(key, false, true);
    }

    /** Sweeps longer than this draw lines only: markers would merge into a band (and bloat the SVG), while the
     * palette's dash patterns still tell the series apart. */
    static final int MAX_MARKED_POINTS = 25;

    /** Whether a sweep of {@code points} ambients gets point markers. */
    static boolean markers(int points) {
        return points <= MAX_MARKED_POINTS;
    }

    /** A line renderer in the palette, series {@code first}, {@code first + 1} … taking successive inks. */
    static XYLineAndShapeRenderer lines(int first, int count, boolean shapes) {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, shapes);
        for (int i = 0; i < count; i++) {
            r.setSeriesPaint(i, Palette.seriesPaint(first + i));
            r.setSeriesStroke(i, Palette.seriesStroke(first + i));
            r.setSeriesShape(i, new Ellipse2D.Double(-3, -3, 6, 6));
        }
        r.setDrawSeriesLineAsPath(true);
        return r;
    }

    /** Where a vertical line's label sits along the line. */
    enum LabelAt { TOP, MIDDLE, BOTTOM }

    /** A labelled horizontal reference line, its label above the line at the left end of the plot. */
    static ValueMarker level(double value, Paint paint, Stroke stroke, String label) {
        ValueMarker m = marker(value, paint, stroke, label);
        m.setLabelAnchor(RectangleAnchor.TOP_LEFT);
        m.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
        return m;
    }

    /**
     * A labelled vertical reference line at {@code value} on an axis from {@code axisLo} to {@code axisHi}: the
     * label goes on the side of the line with more room, so that a line near the right edge keeps its label inside
     * the plot.
     */
    static ValueMarker vertical(double value, Paint paint, Stroke stroke, String label, LabelAt at, double axisLo,
                                double axisHi) {
        ValueMarker m = marker(value, paint, stroke, label);
        boolean left = value > 0.5 * (axisLo + axisHi);
        switch (at) {
            case TOP -> {
                m.setLabelAnchor(left ? RectangleAnchor.TOP_LEFT : RectangleAnchor.TOP_RIGHT);
                m.setLabelTextAnchor(left ? TextAnchor.TOP_RIGHT : TextAnchor.TOP_LEFT);
            }
            case MIDDLE -> {
                m.setLabelAnchor(left ? RectangleAnchor.LEFT : RectangleAnchor.RIGHT);
                m.setLabelTextAnchor(left ? TextAnchor.CENTER_RIGHT : TextAnchor.CENTER_LEFT);
            }
            case BOTTOM -> {
                m.setLabelAnchor(left ? RectangleAnchor.BOTTOM_LEFT : RectangleAnchor.BOTTOM_RIGHT);
                m.setLabelTextAnchor(left ? TextAnchor.BOTTOM_RIGHT : TextAnchor.BOTTOM_LEFT);
            }
        }
        return m;
    }

    private static ValueMarker marker(double value, Paint paint, Stroke stroke, String label) {
        ValueMarker m = new ValueMarker(value, paint, stroke);
        m.setLabel(label);
        m.setLabelFont(ChartStyle.MARKER);
        m.setLabelPaint(paint);
        // Paper behind the label, slightly translucent, so that a label crossing a data line stays legible.
        m.setLabelBackgroundColor(new Color(Palette.PAPER.getRed(), Palette.PAPER.getGreen(), Palette.PAPER.getBlue(),
                210));
        m.setLabelOffset(new RectangleInsets(4, 4, 4, 4));
        return m;
    }
}
