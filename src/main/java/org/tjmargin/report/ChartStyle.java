package org.tjmargin.report;

import java.awt.Font;
import java.awt.RenderingHints;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.Axis;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;

/**
 * The look of every chart (see {@link Palette}): fonts, backgrounds, grid, axes and legend, applied after a chart is
 * built so that each chart class only says what it plots.
 *
 * <p>Fonts are Java's logical {@code SansSerif}: whatever sans face the machine has for the PNG, and the generic CSS
 * family {@code sans-serif} in the SVG, so the report needs no font files. Stateless.
 */
final class ChartStyle {

    static final Font TITLE = new Font(Font.SANS_SERIF, Font.BOLD, 15);
    static final Font SUBTITLE = new Font(Font.SANS_SERIF, Font.PLAIN, 11);
    static final Font AXIS_LABEL = new Font(Font.SANS_SERIF, Font.PLAIN, 12);
    static final Font TICK = new Font(Font.SANS_SERIF, Font.PLAIN, 11);
    static final Font LEGEND = new Font(Font.SANS_SERIF, Font.PLAIN, 11);
    static final Font MARKER = new Font(Font.SANS_SERIF, Font.PLAIN, 10);

    private ChartStyle() {
    }

    /** A chart with our title, optional subtitle lines, and the house look on every plot and axis. */
    static JFreeChart chart(String title, List<String> subtitles, org.jfree.chart.plot.Plot plot) {
        JFreeChart chart = new JFreeChart(title, TITLE, plot, true);
        chart.getTitle().setPaint(Palette.INK);
        for (String s : subtitles) {
            TextTitle t = new TextTitle(s, SUBTITLE);
            t.setPaint(Palette.INK_SOFT);
            chart.addSubtitle(t);
        }
        chart.setBackgroundPaint(Palette.PAPER);
        chart.setPadding(new RectangleInsets(8, 8, 6, 12));
        chart.setAntiAlias(true);
        chart.setTextAntiAlias(RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        LegendTitle legend = chart.getLegend();
        legend.setItemFont(LEGEND);
        legend.setItemPaint(Palette.INK);
        legend.setBackgroundPaint(Palette.PAPER);
        legend.setFrame(BlockBorder.NONE);
        legend.setPosition(RectangleEdge.BOTTOM);
        return chart;
    }

    /** Backgrounds, grid and outline of one plot, and the look of its axes. */
    static void plot(XYPlot plot) {
        plot.setBackgroundPaint(Palette.SHEET);
        plot.setOutlinePaint(Palette.RULE);
        plot.setDomainGridlinePaint(Palette.GRID);
        plot.setRangeGridlinePaint(Palette.GRID);
        plot.setDomainGridlinesVisible(true);
        plot.setRangeGridlinesVisible(true);
        plot.setAxisOffset(new RectangleInsets(4, 4, 4, 4));
        for (int i = 0; i < plot.getDomainAxisCount(); i++) {
            axis(plot.getDomainAxis(i));
        }
        for (int i = 0; i < plot.getRangeAxisCount(); i++) {
            axis(plot.getRangeAxis(i));
        }
    }

    /** The same look for a category plot (the tornado's rows): grid along the values only. */
    static void plot(CategoryPlot plot) {
        plot.setBackgroundPaint(Palette.SHEET);
        plot.setOutlinePaint(Palette.RULE);
        plot.setRangeGridlinePaint(Palette.GRID);
        plot.setRangeGridlinesVisible(true);
        plot.setDomainGridlinesVisible(false);
        plot.setAxisOffset(new RectangleInsets(4, 4, 4, 4));
        CategoryAxis rows = plot.getDomainAxis();
        axis(rows);
        if (rows != null) {
            // The rows' labels name the inputs: in full ink, not the soft ink of numeric ticks.
            rows.setTickLabelPaint(Palette.INK);
        }
        for (int i = 0; i < plot.getRangeAxisCount(); i++) {
            axis(plot.getRangeAxis(i));
        }
    }

    /** A number axis with its label (which carries the unit). */
    static NumberAxis numberAxis(String label) {
        NumberAxis a = new NumberAxis(label);
        a.setAutoRangeIncludesZero(false);
        axis(a);
        return a;
    }

    /** The house look of any axis (value or category): fonts, inks, axis line and tick marks. */
    static void axis(Axis a) {
        if (a == null) {
            return;
        }
        a.setLabelFont(AXIS_LABEL);
        a.setLabelPaint(Palette.INK);
        a.setTickLabelFont(TICK);
        a.setTickLabelPaint(Palette.INK_SOFT);
        a.setAxisLinePaint(Palette.INK_SOFT);
        a.setTickMarkPaint(Palette.INK_SOFT);
    }

    /**
     * A unit with the SI prefix that keeps the largest value of an axis in [1, 1000): the axis shows
     * {@code value / factor} and its label {@code symbol}.
     *
     * @param factor divisor of SI values for display
     * @param symbol unit with prefix, e.g. {@code mW}
     */
    record Scale(double factor, String symbol) {

        private static final String[] PREFIXES = {"n", "µ", "m", "", "k"};

        /** The scale for values up to {@code maxAbs} in {@code unit} (n … k; plain unit for 0 or non-finite). */
        static Scale of(double maxAbs, String unit) {
            if (!(maxAbs > 0) || !Double.isFinite(maxAbs)) {
                return new Scale(1.0, unit);
            }
            int k = (int) Math.floor(Math.log10(maxAbs) / 3.0);
            k = Math.max(-3, Math.min(1, k));
            return new Scale(Math.pow(1000.0, k), PREFIXES[k + 3] + unit);
        }

        double apply(double si) {
            return si / factor;
        }
    }
}
