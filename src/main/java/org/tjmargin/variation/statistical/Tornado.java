package org.tjmargin.variation.statistical;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.tjmargin.variation.AxisValues;
import org.tjmargin.variation.Range;
import org.tjmargin.variation.VariationModel;

/**
 * One-at-a-time sensitivity ranking (tornado data): each varying input at its low and its high end with the others
 * nominal, ranked by how far the limiting margin swings (common practice in worst-case and design reviews, no
 * single source). The swing includes the nominal, so an input whose response peaks inside its range still ranks by
 * what it can do.
 *
 * <p>Stateless and thread-safe.
 */
public final class Tornado {

    private Tornado() {
    }

    /** The ranking at the evaluator's position and air. */
    public static TornadoResult of(PointEvaluator ev) {
        SampleSpace space = new SampleSpace(ev.spec(), VariationModel.UNIFORM);
        Evaluation nominal = ev.evaluate(AxisValues.nominal());
        List<TornadoBar> bars = new ArrayList<>();
        for (SampledAxis a : space.axes()) {
            Range r = a.toleranced().range();
            Evaluation lo = ev.evaluate(AxisValues.nominal().with(a.axis(), r.lo()));
            Evaluation hi = ev.evaluate(AxisValues.nominal().with(a.axis(), r.hi()));
            double max = Math.max(nominal.margin(), Math.max(lo.margin(), hi.margin()));
            double min = Math.min(nominal.margin(), Math.min(lo.margin(), hi.margin()));
            bars.add(new TornadoBar(a.axis(), r.lo(), r.hi(), lo, hi, max - min));
        }
        // List.sort is stable: equal swings keep axis order.
        bars.sort(Comparator.comparingDouble(TornadoBar::swing).reversed());
        return new TornadoResult(ev.spec().id(), ev.tLocalK(), nominal, bars);
    }
}
