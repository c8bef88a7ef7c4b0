package org.tjmargin.variation;

import java.util.EnumMap;
import java.util.Map;

/**
 * The distribution of every axis: given ones as stated, every other axis {@link Distribution#UNIFORM uniform} over
 * its range (design 2.7: a range and optionally a distribution).
 *
 * @param distributions the stated distributions, by axis
 */
public record VariationModel(Map<Axis, Distribution> distributions) {

    /** Every axis uniform. */
    public static final VariationModel UNIFORM = new VariationModel(Map.of());

    public VariationModel {
        EnumMap<Axis, Distribution> copy = new EnumMap<>(Axis.class);
        for (Map.Entry<Axis, Distribution> e : distributions.entrySet()) {
            if (e.getKey() == null || e.getValue() == null) {
                throw new IllegalArgumentException("a variation model maps axes to distributions, got " + e);
            }
            copy.put(e.getKey(), e.getValue());
        }
        distributions = Map.copyOf(copy);
    }

    /** The distribution of {@code axis}. */
    public Distribution distribution(Axis axis) {
        return distributions.getOrDefault(axis, Distribution.UNIFORM);
    }

    /** This model with {@code axis} distributed as {@code d}. */
    public VariationModel with(Axis axis, Distribution d) {
        EnumMap<Axis, Distribution> copy = new EnumMap<>(Axis.class);
        copy.putAll(distributions);
        copy.put(axis, d);
        return new VariationModel(copy);
    }

    /** {@code range} on {@code axis} with its distribution. */
    public Toleranced toleranced(Axis axis, Range range) {
        return new Toleranced(range, distribution(axis));
    }
}
