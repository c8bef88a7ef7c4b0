package org.tjmargin.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.jfree.chart.JFreeChart;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.PositionSpec;

/**
 * Every chart of an analysis, drawn as PNG and SVG, in board order and per position in the order of
 * {@link ChartKind}: {@code <position>-margin}, {@code -operating}, {@code -rating} and, for shunt regulators,
 * {@code -resistor}, and for positions with surges {@code -surge} and {@code -surge-margin} (names from
 * {@link ChartNames}). Nothing is written to disk here.
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
        return render(result, size, ReportDetail.all(result));
    }

    /** The charts of the detailed positions only, at {@code size}. */
    public static List<RenderedChart> render(AnalysisResult result, ChartSize size, ReportDetail detail) {
        Objects.requireNonNull(result, "result");
        Objects.requireNonNull(size, "size");
        Objects.requireNonNull(detail, "detail");
        List<String> stems = ChartNames.stems(result);
        record Task(int position, ChartKind kind) {
        }
        List<Task> tasks = new ArrayList<>();
        for (int i : detail.indices()) {
            for (ChartKind kind : kindsFor(result, i)) {
                tasks.add(new Task(i, kind));
            }
        }
        // Charts are independent objects, each drawn into its own image and SVG context, so they render on all
        // cores; the ordered stream keeps the list in position/kind order.
        return tasks.parallelStream()
                .map(t -> ChartRenderer.render(ChartNames.baseName(stems.get(t.position()), t.kind()), t.kind(),
                        build(result, t.position(), t.kind()), size))
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
     * One chart as a JFreeChart object, styled but not drawn (for a caller that draws it elsewhere).
     *
     * @throws IllegalArgumentException for {@link ChartKind#RESISTOR} at a position without a series resistor
     */
    public static JFreeChart build(AnalysisResult result, int positionIndex, ChartKind kind) {
        return switch (kind) {
            case MARGIN -> ChartMargin.build(result, positionIndex);
            case SURGE -> ChartSurge.build(result, positionIndex);
            case SURGE_MARGIN -> ChartMargin.buildSurge(result, positionIndex);
            case OPERATING -> ChartOperatingPoint.build(result, positionIndex);
            case RATING -> ChartDeviceRating.build(result, positionIndex);
            case RESISTOR -> ChartResistorRating.build(result, positionIndex);
        };
    }
}
