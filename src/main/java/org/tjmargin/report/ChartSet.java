package org.tjmargin.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicInteger;
import org.jfree.chart.JFreeChart;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.variation.statistical.PositionStatistics;
import org.tjmargin.variation.statistical.StatisticsResult;

/**
 * Every chart of an analysis, drawn as PNG and SVG, in board order and per position in the order of
 * {@link ChartKind}: {@code <position>-margin}, {@code -operating}, {@code -rating} and, for shunt regulators,
 * {@code -resistor}, for positions with surges {@code -surge} and {@code -surge-margin}, and, when a statistical
 * analysis is given and covers the position, {@code -tj-histogram}, {@code -margin-histogram}, {@code -tornado} and
 * {@code -yield} (names from {@link ChartNames}). Nothing is written to disk here.
 *
 * <p>The charts read the analysis only; none recomputes a physical quantity. Headless: set
 * {@code java.awt.headless=true} in a process without a display. Stateless and thread-safe.
 */
public final class ChartSet {

    private ChartSet() {
    }

    /** All charts of the analysis at {@link ChartSize#DEFAULT}. */
    public static List<RenderedChart> render(AnalysisResult result) {
        return render(result, ChartSize.DEFAULT);
    }

    /** All charts of the analysis at {@code size}. */
    public static List<RenderedChart> render(AnalysisResult result, ChartSize size) {
        return render(result, Optional.empty(), size);
    }

    /** All charts of the analysis and of its statistics, when given, at {@link ChartSize#DEFAULT}. */
    public static List<RenderedChart> render(AnalysisResult result, Optional<StatisticsResult> stats) {
        return render(result, stats, ChartSize.DEFAULT);
    }

    /** All charts of the analysis and of its statistics, when given, at {@code size}. */
    public static List<RenderedChart> render(AnalysisResult result, Optional<StatisticsResult> stats,
                                             ChartSize size) {
        return render(result, stats, size, ReportDetail.all(result));
    }

    /** The charts of the detailed positions only, with their statistics when given, at {@code size}. */
    public static List<RenderedChart> render(AnalysisResult result, Optional<StatisticsResult> stats,
                                             ChartSize size, ReportDetail detail) {
        return render(result, stats, size, detail, Progress.NONE);
    }

    /** How many of the charts are drawn, for a progress display; told from the drawing threads. */
    @FunctionalInterface
    public interface Progress {

        /** Ignores progress. */
        Progress NONE = (done, total) -> { };

        /** {@code done} of the {@code total} charts are drawn (PNG and SVG). */
        void chartsDrawn(int done, int total);
    }

    /** As above, telling {@code progress} after each chart (which changes nothing in the charts). */
    public static List<RenderedChart> render(AnalysisResult result, Optional<StatisticsResult> stats,
                                             ChartSize size, ReportDetail detail, Progress progress) {
        Objects.requireNonNull(result, "result");
        Objects.requireNonNull(stats, "stats");
        Objects.requireNonNull(size, "size");
        Objects.requireNonNull(detail, "detail");
        List<String> stems = ChartNames.stems(result);
        record Task(int position, ChartKind kind) {
        }
        List<Task> tasks = new ArrayList<>();
        for (int i : detail.indices()) {
            for (ChartKind kind : kindsFor(result, stats, i)) {
                tasks.add(new Task(i, kind));
            }
        }
        // Charts are independent objects, each drawn into its own image and SVG context, so they render on all
        // cores; the ordered stream keeps the list in position/kind order.
        AtomicInteger drawn = new AtomicInteger();
        int total = tasks.size();
        return tasks.parallelStream()
                .map(t -> {
                    RenderedChart c = ChartRenderer.render(ChartNames.baseName(stems.get(t.position()), t.kind()),
                            t.kind(), build(result, stats, t.position(), t.kind()), size);
                    progress.chartsDrawn(drawn.incrementAndGet(), total);
                    return c;
                })
                .toList();
    }

    /** The charts a position gets: all four for a shunt regulator, no resistor chart otherwise. */
    public static List<ChartKind> kindsFor(AnalysisResult result, int positionIndex) {
        PositionSpec spec = result.board().positions().get(positionIndex);
        List<ChartKind> kinds = new ArrayList<>(List.of(ChartKind.MARGIN, ChartKind.OPERATING, ChartKind.RATING));
        if (ChartResistorRating.applies(spec)) {
            kinds.add(ChartKind.RESISTOR);
        }
        if (spec.surges().isPresent()) {
            kinds.add(ChartKind.SURGE);
            kinds.add(ChartKind.SURGE_MARGIN);
        }
        return List.copyOf(kinds);
    }

    /**
     * The charts a position gets with statistics: those of {@link #kindsFor(AnalysisResult, int)}, then
     * {@link ChartKind#STATISTICAL} when {@code stats} covers the position.
     */
    public static List<ChartKind> kindsFor(AnalysisResult result, Optional<StatisticsResult> stats,
                                           int positionIndex) {
        List<ChartKind> kinds = kindsFor(result, positionIndex);
        if (statisticsOf(result, stats, positionIndex).isEmpty()) {
            return kinds;
        }
        List<ChartKind> all = new ArrayList<>(kinds);
        all.addAll(ChartKind.STATISTICAL);
        return List.copyOf(all);
    }

    /**
     * One chart as a JFreeChart object, styled but not drawn (for a caller that draws it elsewhere).
     *
     * @throws IllegalArgumentException for {@link ChartKind#RESISTOR} at a position without a series resistor, and
     *                                  for a statistical kind (use {@link #build(AnalysisResult, Optional, int,
     *                                  ChartKind)})
     */
    public static JFreeChart build(AnalysisResult result, int positionIndex, ChartKind kind) {
        return build(result, Optional.empty(), positionIndex, kind);
    }

    /**
     * One chart, of the analysis or of its statistics, styled but not drawn.
     *
     * @throws IllegalArgumentException for {@link ChartKind#RESISTOR} at a position without a series resistor, and
     *                                  for a statistical kind when {@code stats} does not cover the position
     */
    public static JFreeChart build(AnalysisResult result, Optional<StatisticsResult> stats, int positionIndex,
                                   ChartKind kind) {
        return switch (kind) {
            case MARGIN -> ChartMargin.build(result, positionIndex);
            case SURGE -> ChartSurge.build(result, positionIndex);
            case SURGE_MARGIN -> ChartMargin.buildSurge(result, positionIndex);
            case OPERATING -> ChartOperatingPoint.build(result, positionIndex);
            case RATING -> ChartDeviceRating.build(result, positionIndex);
            case RESISTOR -> ChartResistorRating.build(result, positionIndex);
            case TJ_HISTOGRAM -> ChartHistogram.buildTj(result, positionIndex, required(result, stats, positionIndex,
                    kind));
            case MARGIN_HISTOGRAM -> ChartHistogram.buildMargin(result, positionIndex, required(result, stats,
                    positionIndex, kind));
            case TORNADO -> ChartTornado.build(result, positionIndex, required(result, stats, positionIndex, kind));
            case YIELD -> ChartYield.build(result, required(result, stats, positionIndex, kind));
        };
    }

    private static PositionStatistics required(AnalysisResult result, Optional<StatisticsResult> stats,
                                               int positionIndex, ChartKind kind) {
        return statisticsOf(result, stats, positionIndex).orElseThrow(() -> new IllegalArgumentException("chart "
                + kind.suffix() + " needs the statistics of position " + result.positions().get(positionIndex).id()));
    }

    /** The statistics of a position, when {@code stats} covers it. */
    static Optional<PositionStatistics> statisticsOf(AnalysisResult result, Optional<StatisticsResult> stats,
                                                     int positionIndex) {
        String id = result.positions().get(positionIndex).id();
        return stats.flatMap(s -> s.of(id));
    }
}
