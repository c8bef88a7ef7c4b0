package org.tjmargin.report;

import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.tjmargin.circuit.SeriesResistor;
import org.tjmargin.circuit.ShuntRegulatorSpec;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.units.Dimension;
import org.tjmargin.units.Quantities;

/**
 * The series resistor's power rating ({@link SeriesResistor#rating()}) with its operating points: at each sweep
 * ambient, the corner where the resistor dissipates most, drawn at the air temperature around the position
 * ({@link PositionAtAmbient#tLocalK()}), which is where the analysis reads the resistor's rating. Shunt regulators
 * only.
 */
final class ChartResistorRating {

    private ChartResistorRating() {
    }

    /** True when the position has a series resistor to draw. */
    static boolean applies(PositionSpec spec) {
        return spec.circuit() instanceof ShuntRegulatorSpec;
    }

    static JFreeChart build(AnalysisResult result, int index) {
        PositionSpec spec = result.board().positions().get(index);
        if (!(spec.circuit() instanceof ShuntRegulatorSpec reg)) {
            throw new IllegalArgumentException("position " + spec.id() + " has no series resistor");
        }
        SeriesResistor rs = reg.resistor();
        List<PositionAtAmbient> sweep = ChartData.sweepOf(result, index);
        List<ChartRating.Dot> dots = new ArrayList<>();
        ChartRating.Dot last = null;
        for (PositionAtAmbient p : sweep) {
            if (p.envelope().any()) {
                ChartRating.Dot d = new ChartRating.Dot(p.tLocalK(), p.envelope().resistorMaxW());
                dots.add(d);
                if (p == sweep.get(sweep.size() - 1)) {
                    last = d;
                }
            }
        }
        String design = ChartData.temperature(result.atMaximumAmbient().ambientK());
        return ChartRating.build(result.positions().get(index).id() + " — series resistor rating",
                "Rs " + Quantities.format(rs.ohm().nominal(), Dimension.RESISTANCE) + ": "
                        + ChartRating.describe(rs.rating()) + "; dots: corner of most resistor power at each ambient.",
                "Air temperature at the resistor (°C)", rs.rating(), "allowed power (resistor rating)", dots,
                "most-dissipating corner, each ambient", last, "at the design's highest ambient, " + design);
    }
}
