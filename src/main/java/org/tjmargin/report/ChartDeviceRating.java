package org.tjmargin.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.jfree.chart.JFreeChart;
import org.tjmargin.device.PowerRatingCurve;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.CornerPoint;
import org.tjmargin.solve.OperatingPoint;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.units.Dimension;
import org.tjmargin.units.Quantities;

/**
 * The diode's power rating curve ({@link org.tjmargin.device.DiodeRatings#powerCurve()}) with the hottest corner's
 * operating point at each sweep ambient, drawn at (temperature of the rating's reference point
 * {@link OperatingPoint#referenceK()}, diode power): a dot above the curve is outside the part's own rating.
 */
final class ChartDeviceRating {

    private ChartDeviceRating() {
    }

    static JFreeChart build(AnalysisResult result, int index) {
        PositionSpec spec = result.board().positions().get(index);
        PowerRatingCurve curve = spec.part().ratings().powerCurve();
        List<PositionAtAmbient> sweep = ChartData.sweepOf(result, index);
        List<ChartRating.Dot> dots = new ArrayList<>();
        ChartRating.Dot last = null;
        for (PositionAtAmbient p : sweep) {
            Optional<OperatingPoint> hot = p.hottest().flatMap(CornerPoint::point);
            if (hot.isPresent()) {
                ChartRating.Dot d = new ChartRating.Dot(hot.get().referenceK(), hot.get().diodePowerW());
                dots.add(d);
                if (p == sweep.get(sweep.size() - 1)) {
                    last = d;
                }
            }
        }
        String design = ChartData.temperature(result.atMaximumAmbient().ambientK());
        return ChartRating.build(result.positions().get(index).id() + " — diode power rating",
                "Part " + spec.part().id() + ": " + ChartRating.describe(curve) + "; dots: hottest corner at each "
                        + "ambient.",
                referenceLabel(curve), curve, "allowed power (rating curve)", dots, "hottest corner, each ambient",
                last, "at the design's highest ambient, " + design);
    }

    /** The horizontal axis: the rating's reference point, with its unit. */
    static String referenceLabel(PowerRatingCurve curve) {
        return switch (curve.reference()) {
            case LEAD -> curve.referenceLengthM() > 0
                    ? "Lead temperature " + Quantities.format(curve.referenceLengthM(), Dimension.LENGTH)
                            + " from the body (°C)"
                    : "Lead temperature (°C)";
            case AMBIENT -> "Air temperature at the part (°C)";
            case CASE -> "Case temperature (°C)";
            case JUNCTION -> "Junction temperature (°C)";
        };
    }
}
