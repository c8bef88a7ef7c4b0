package org.tjmargin.variation;

/**
 * A toleranced input with its distribution.
 *
 * @param range        the value's range (SI)
 * @param distribution how it spreads over the range
 */
public record Toleranced(Range range, Distribution distribution) {

    public Toleranced {
        if (range == null || distribution == null) {
            throw new IllegalArgumentException("a toleranced value needs a range and a distribution");
        }
    }

    /** Uniform over {@code range} (the default). */
    public static Toleranced uniform(Range range) {
        return new Toleranced(range, Distribution.UNIFORM);
    }

    /** The value at cumulative probability {@code u ∈ (0, 1)}. */
    public double valueAt(double u) {
        return distribution.valueAt(range, u);
    }

    /** Mean (SI). */
    public double mean() {
        return distribution.mean(range);
    }

    /** Standard deviation (SI). */
    public double standardDeviation() {
        return distribution.standardDeviation(range);
    }
}
