package org.tjmargin.variation.statistical;

import java.util.ArrayList;
import java.util.List;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.variation.Axis;
import org.tjmargin.variation.AxisValues;
import org.tjmargin.variation.Corner;
import org.tjmargin.variation.Distribution;
import org.tjmargin.variation.Range;
import org.tjmargin.variation.SplitMix64;
import org.tjmargin.variation.VariationModel;

/**
 * The varying axes of a position with their distributions, and the mapping from uniform draws to axis values: one
 * draw per varying axis, in axis order. Immutable; the arrays it fills belong to the caller.
 */
final class SampleSpace {

    private static final Axis[] AXES = Axis.values();

    private final List<SampledAxis> axes;
    private final int[] ordinals;
    private final Range[] ranges;
    private final Distribution[] distributions;
    private final java.util.function.DoubleUnaryOperator[] inverse;
    private final double[] nominal;

    SampleSpace(PositionSpec spec, VariationModel model) {
        List<SampledAxis> list = new ArrayList<>();
        for (Axis a : spec.varyingAxes()) {
            list.add(new SampledAxis(a, model.toleranced(a, spec.rangeOf(a).orElseThrow())));
        }
        axes = List.copyOf(list);
        ordinals = new int[list.size()];
        ranges = new Range[list.size()];
        distributions = new Distribution[list.size()];
        inverse = new java.util.function.DoubleUnaryOperator[list.size()];
        for (int i = 0; i < list.size(); i++) {
            ordinals[i] = list.get(i).axis().ordinal();
            ranges[i] = list.get(i).toleranced().range();
            distributions[i] = list.get(i).toleranced().distribution();
            inverse[i] = distributions[i].inverseCdf(ranges[i]);
        }
        nominal = new double[AXES.length];
        for (Axis a : AXES) {
            nominal[a.ordinal()] = spec.rangeOf(a).map(Range::nominal).orElse(0.0);
        }
    }

    List<SampledAxis> axes() {
        return axes;
    }

    /** A fresh vector of every axis at its nominal, indexed by ordinal. */
    double[] nominalVector() {
        return nominal.clone();
    }

    /** Fills the varying axes of {@code into} with the next draw of {@code rng}. */
    void draw(SplitMix64 rng, double[] into) {
        for (int i = 0; i < ordinals.length; i++) {
            into[ordinals[i]] = inverse[i].applyAsDouble(rng.nextOpenUnit());
        }
    }

    /** The varying axes of {@code v} as axis values. */
    AxisValues values(double[] v) {
        AxisValues out = AxisValues.nominal();
        for (int o : ordinals) {
            out = out.with(AXES[o], v[o]);
        }
        return out;
    }

    /** Every corner of the varying axes (2^n), as axis values: for histogram edges. */
    List<AxisValues> corners() {
        List<AxisValues> out = new ArrayList<>();
        java.util.Set<Axis> set = java.util.EnumSet.noneOf(Axis.class);
        axes.forEach(a -> set.add(a.axis()));
        for (Corner c : Corner.all(set)) {
            AxisValues v = AxisValues.nominal();
            for (int i = 0; i < ordinals.length; i++) {
                v = v.with(AXES[ordinals[i]], c.valueOf(AXES[ordinals[i]], ranges[i]));
            }
            out.add(v);
        }
        return out;
    }
}
