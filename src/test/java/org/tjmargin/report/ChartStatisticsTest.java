package org.tjmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Optional;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.Layer;
import org.jfree.data.category.IntervalCategoryDataset;
import org.jfree.data.xy.IntervalXYDataset;
import org.junit.jupiter.api.Test;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.variation.Histogram;
import org.tjmargin.variation.statistical.PositionStatistics;
import org.tjmargin.variation.statistical.StatisticsResult;
import org.tjmargin.variation.statistical.TornadoBar;
import org.tjmargin.variation.statistical.YieldPoint;

/**
 * The four statistics charts, drawn from real results of the demo design: present exactly when statistics are,
 * readable in both encodings, and showing the run's own numbers (bins, ranking, band) without recomputing them.
 */
class ChartStatisticsTest {

    private static final StatisticsFixtures.Run DEMO = StatisticsFixtures.demo();

    @Test
    void aPositionGetsTheFourStatisticsChartsAfterItsOwn() {
        List<String> names = DEMO.charts().stream().map(RenderedChart::baseName).toList();
        assertEquals(List.of("D1-margin", "D1-operating", "D1-rating", "D1-resistor", "D1-tj-histogram",
                "D1-margin-histogram", "D1-tornado", "D1-yield"), names.subList(0, 8));
        assertEquals(List.of("D4-margin", "D4-operating", "D4-rating", "D4-surge", "D4-surge-margin",
                "D4-tj-histogram", "D4-margin-histogram", "D4-tornado", "D4-yield"),
                names.subList(names.size() - 9, names.size()));
        for (int i = 0; i < DEMO.result().positions().size(); i++) {
            assertEquals(ChartSet.kindsFor(DEMO.result(), i), ChartSet.kindsFor(DEMO.result(), Optional.empty(), i));
        }
    }

    @Test
    void withoutStatisticsTheChartsAreTheOldOnes() {
        AnalysisResult r = DEMO.result();
        List<ChartKind> kinds = new ArrayList<>();
        for (int i = 0; i < r.positions().size(); i++) {
            kinds.addAll(ChartSet.kindsFor(r, Optional.empty(), i));
        }
        assertTrue(kinds.stream().noneMatch(ChartKind::statistical), kinds::toString);
        StatisticsResult empty = new StatisticsResult(DEMO.stats().plan(), List.of());
        assertEquals(ChartSet.kindsFor(r, 0), ChartSet.kindsFor(r, Optional.of(empty), 0),
                "statistics that do not cover a position add no chart to it");
        assertThrows(IllegalArgumentException.class, () -> ChartSet.build(r, 0, ChartKind.TORNADO));
        assertThrows(IllegalArgumentException.class, () -> ChartSet.build(r, Optional.of(empty), 0,
                ChartKind.YIELD));
    }

    @Test
    void everyStatisticsChartIsANonEmptyPngAndAnSvgOfTheDefaultSize() throws Exception {
        int n = 0;
        for (RenderedChart c : DEMO.charts()) {
            if (c.kind().statistical()) {
                ChartSetTest.assertPngOfSize(c, 800, 480);
                ChartSetTest.assertSvgOfSize(c, 800, 480);
                assertTrue(c.svg().contains(c.baseName() + "-"), "SVG ids carry the chart's name: " + c.baseName());
                n++;
            }
        }
        assertEquals(4 * DEMO.result().positions().size(), n);
    }

    @Test
    void anotherSizeIsHonouredByEveryStatisticsChart() throws Exception {
        for (ChartKind kind : ChartKind.STATISTICAL) {
            RenderedChart c = ChartRenderer.render("D2-" + kind.suffix(), kind,
                    ChartSet.build(DEMO.result(), DEMO.optional(), 1, kind), new ChartSize(640, 400));
            ChartSetTest.assertPngOfSize(c, 640, 400);
            ChartSetTest.assertSvgOfSize(c, 640, 400);
        }
    }

    @Test
    void tornadoRowsFollowTheResultsRankOrderWithTheMarginsAtEachEnd() {
        for (int i = 0; i < DEMO.result().positions().size(); i++) {
            PositionStatistics s = stats(i);
            CategoryPlot plot = ChartSet.build(DEMO.result(), DEMO.optional(), i, ChartKind.TORNADO)
                    .getCategoryPlot();
            IntervalCategoryDataset data = (IntervalCategoryDataset) plot.getDataset();
            List<TornadoBar> bars = s.tornado().bars();
            assertEquals(bars.size(), data.getColumnCount(), s.positionId());
            double nominal = 100.0 * s.tornado().nominal().margin();
            for (int k = 0; k < bars.size(); k++) {
                ChartTornado.Row row = (ChartTornado.Row) data.getColumnKey(k);
                assertEquals(k, row.rank(), s.positionId());
                assertEquals(bars.get(k).axis(), row.axis(), s.positionId() + " row " + k);
                assertTrue(row.label().contains(Labels.axisName(DEMO.result().board().positions().get(i),
                        row.axis())), row.label());
                assertEquals(nominal, data.getStartValue(0, k).doubleValue(), 0.0);
                assertEquals(100.0 * bars.get(k).atLow().margin(), data.getEndValue(0, k).doubleValue(), 0.0);
                assertEquals(100.0 * bars.get(k).atHigh().margin(), data.getEndValue(1, k).doubleValue(), 0.0);
            }
            assertTrue(values(plot.getRangeMarkers(Layer.FOREGROUND)).contains(nominal), "nominal line");
        }
    }

    @Test
    void tornadoRangesAreInTheInputsOwnUnits() {
        // D1 is the shunt regulator: its supply is a voltage, its load a current (demo/design.yaml).
        List<String> labels = tornadoLabels(0);
        assertTrue(labels.contains("supply voltage (Vs): 19.2 V … 28.0 V"), labels::toString);
        assertTrue(labels.contains("load (IL): 2.00 mA … 15.0 mA"), labels::toString);
        // D2 is fed a current of 5 mA ± 10 %.
        assertTrue(tornadoLabels(1).contains("feed current (Vs): 4.50 mA … 5.50 mA"), tornadoLabels(1)::toString);
    }

    @Test
    void histogramsDrawTheRunsOwnBins() {
        for (int i = 0; i < DEMO.result().positions().size(); i++) {
            PositionStatistics s = stats(i);
            assertBins(ChartSet.build(DEMO.result(), DEMO.optional(), i, ChartKind.TJ_HISTOGRAM),
                    s.monteCarlo().tjHistogram(), true);
            assertBins(ChartSet.build(DEMO.result(), DEMO.optional(), i, ChartKind.MARGIN_HISTOGRAM),
                    s.monteCarlo().marginHistogram(), false);
        }
    }

    @Test
    void tjHistogramMarksTheCornersAndTjMaxOrSaysWhereTjMaxIs() {
        PositionStatistics d1 = stats(0);
        JFreeChart chart = ChartSet.build(DEMO.result(), DEMO.optional(), 0, ChartKind.TJ_HISTOGRAM);
        List<Double> lines = values(chart.getXYPlot().getDomainMarkers(Layer.FOREGROUND));
        double tjMaxC = Labels.celsius(DEMO.result().board().positions().get(0).part().ratings().tjMaxK());
        assertTrue(lines.contains(Labels.celsius(d1.corners().tjMinK())), "coolest corner");
        assertTrue(lines.contains(Labels.celsius(d1.corners().tjMaxK())), "hottest corner");
        // D1's hottest corner reaches about 172 °C against its Tj max of 200 °C (the demo's tuning, see
        // DemoDesignTest): within one data span of the bins, so the line is drawn.
        assertTrue(lines.contains(tjMaxC), "Tj max");

        // D3's junction barely moves (a clamp at standoff): Tj max lies far off the axis and is named instead.
        JFreeChart d3 = ChartSet.build(DEMO.result(), DEMO.optional(), 2, ChartKind.TJ_HISTOGRAM);
        assertEquals(2, values(d3.getXYPlot().getDomainMarkers(Layer.FOREGROUND)).size());
        assertTrue(subtitles(d3).stream().anyMatch(t -> t.startsWith("Off the axis to the right: Tj max")),
                subtitles(d3)::toString);
    }

    @Test
    void marginHistogramMarksZeroAndTheCornersWorstMargin() {
        PositionStatistics d1 = stats(0);
        JFreeChart chart = ChartSet.build(DEMO.result(), DEMO.optional(), 0, ChartKind.MARGIN_HISTOGRAM);
        List<Double> lines = values(chart.getXYPlot().getDomainMarkers(Layer.FOREGROUND));
        assertTrue(lines.contains(0.0), "zero margin");
        assertTrue(lines.contains(100.0 * d1.corners().margin()), "worst-case corners");
        assertTrue(subtitles(chart).stream().anyMatch(t -> t.contains(
                StatisticsFormat.withInterval(d1.monteCarlo().violation()))), "violation probability");
    }

    @Test
    void yieldCurveDrawsTheBandTheDesignMaximumAndTheCurveWithSurges() {
        for (int i = 0; i < DEMO.result().positions().size(); i++) {
            PositionStatistics s = stats(i);
            JFreeChart chart = ChartSet.build(DEMO.result(), DEMO.optional(), i, ChartKind.YIELD);
            XYPlot plot = chart.getXYPlot();
            IntervalXYDataset data = (IntervalXYDataset) plot.getDataset();
            List<YieldPoint> yield = s.yield();
            assertEquals(yield.size(), data.getItemCount(0));
            for (int k = 0; k < yield.size(); k++) {
                assertEquals(Labels.celsius(yield.get(k).ambientK()), data.getXValue(0, k), 1e-12);
                assertEquals(100.0 * yield.get(k).yield(), data.getYValue(0, k), 0.0);
                assertEquals(100.0 * yield.get(k).wilsonLo(), data.getStartYValue(0, k), 0.0);
                assertEquals(100.0 * yield.get(k).wilsonHi(), data.getEndYValue(0, k), 0.0);
            }
            assertEquals(List.of(Labels.celsius(DEMO.result().atMaximumAmbient().ambientK())),
                    values(plot.getDomainMarkers(Layer.BACKGROUND)));
            List<String> sub = subtitles(chart);
            assertTrue(sub.stream().anyMatch(t -> t.contains(StatisticsText.YIELD_RULES)), sub::toString);
            boolean surges = DEMO.result().board().positions().get(i).surges().isPresent();
            assertEquals(surges, sub.stream().anyMatch(t -> t.contains(StatisticsText.YIELD_WITH_SURGES)),
                    s.positionId());
            assertEquals(surges ? 2 : 1, data.getSeriesCount(), s.positionId());
            List<YieldPoint> with = s.yieldWithSurges();
            assertEquals(surges ? yield.size() : 0, with.size(), s.positionId());
            for (int k = 0; k < with.size(); k++) {
                // The second curve: every rule with the surges, at the same ambients.
                assertEquals(data.getXValue(0, k), data.getXValue(1, k), 0.0);
                assertEquals(100.0 * with.get(k).yield(), data.getYValue(1, k), 0.0);
                assertEquals(100.0 * with.get(k).wilsonLo(), data.getStartYValue(1, k), 0.0);
                assertEquals(StatisticsFixtures.SURGE_SAMPLES, with.get(k).samples());
            }
        }
    }

    @Test
    void hostilePositionIdIsSanitisedInNamesAndEscapedInTheSvg() throws Exception {
        String hostile = "<script>alert(1)</script>/../D&1";
        AnalysisResult r = ReportFixtures.regulatorOnly("board", hostile);
        List<RenderedChart> charts = ChartSet.render(r, Optional.of(StatisticsFixtures.of(r)));
        assertEquals(8, charts.size());
        for (RenderedChart c : charts.subList(4, 8)) {
            assertTrue(c.kind().statistical(), c.baseName());
            assertTrue(ChartNames.isSafe(c.baseName()), c.baseName());
            assertFalse(c.svg().contains("<script"), "unescaped id in " + c.baseName());
            assertNotNull(ChartSetTest.parse(c.svg()).getDocumentElement());
        }
    }

    @Test
    void aPositionFailingEverySampleStillDrawsItsCharts() throws Exception {
        // Invented: a rule no point can meet, so every margin is a stand-in near −1e15 (ReportFixtures.hopeless).
        AnalysisResult r = ReportFixtures.hopeless("board");
        Optional<StatisticsResult> s = Optional.of(StatisticsFixtures.of(r));
        for (ChartKind kind : ChartKind.STATISTICAL) {
            RenderedChart c = ChartRenderer.render("D7-" + kind.suffix(), kind, ChartSet.build(r, s, 0, kind),
                    ChartSize.DEFAULT);
            ChartSetTest.assertPngOfSize(c, 800, 480);
            ChartSetTest.assertSvgOfSize(c, 800, 480);
        }
        JFreeChart margin = ChartSet.build(r, s, 0, ChartKind.MARGIN_HISTOGRAM);
        assertTrue(subtitles(margin).stream().anyMatch(t -> t.startsWith("Off the axis to the right: zero margin")),
                subtitles(margin)::toString);
    }

    private static PositionStatistics stats(int i) {
        return DEMO.stats().of(DEMO.result().positions().get(i).id()).orElseThrow();
    }

    private static List<String> tornadoLabels(int i) {
        IntervalCategoryDataset data = (IntervalCategoryDataset) ChartSet.build(DEMO.result(), DEMO.optional(), i,
                ChartKind.TORNADO).getCategoryPlot().getDataset();
        List<String> out = new ArrayList<>();
        for (int k = 0; k < data.getColumnCount(); k++) {
            out.add(data.getColumnKey(k).toString());
        }
        return out;
    }

    /** The bars are the histogram's occupied bins, in the display unit, with their counts. */
    private static void assertBins(JFreeChart chart, Histogram h, boolean temperature) {
        IntervalXYDataset data = (IntervalXYDataset) chart.getXYPlot().getDataset();
        long[] counts = h.counts();
        long drawn = 0;
        int k = 0;
        for (int i = 0; i < counts.length; i++) {
            if (counts[i] == 0) {
                continue;
            }
            double lo = temperature ? Labels.celsius(h.binLo(i)) : 100.0 * h.binLo(i);
            double width = temperature ? h.binWidth() : 100.0 * h.binWidth();
            // Display units: one kelvin/percent conversion per edge, so a few ulps of the edge's magnitude.
            assertEquals(lo, data.getStartXValue(0, k), 1e-9 * Math.max(1, Math.abs(lo)));
            assertEquals(lo + width, data.getEndXValue(0, k), 1e-9 * Math.max(1, Math.abs(lo)));
            assertEquals(counts[i], data.getYValue(0, k), 0.0);
            drawn += counts[i];
            k++;
        }
        assertEquals(k, data.getItemCount(0));
        assertEquals(h.total() - h.underflow() - h.overflow(), drawn);
    }

    /** The values of a plot's reference lines (all {@link ValueMarker}s). */
    private static List<Double> values(Collection<?> markers) {
        List<Double> out = new ArrayList<>();
        if (markers != null) {
            for (Object m : markers) {
                assertTrue(m instanceof ValueMarker, () -> "unexpected marker " + m);
                out.add(((ValueMarker) m).getValue());
            }
        }
        return out;
    }

    private static List<String> subtitles(JFreeChart chart) {
        List<String> out = new ArrayList<>();
        for (Object t : chart.getSubtitles()) {
            if (t instanceof TextTitle tt) {
                out.add(tt.getText());
            }
        }
        return out;
    }
}
