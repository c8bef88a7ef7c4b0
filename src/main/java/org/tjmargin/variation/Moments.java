package org.tjmargin.variation;

/**
 * Count, mean and standard deviation of a sample.
 *
 * @param count             values, ≥ 0
 * @param mean              their mean (SI); 0 when there is none
 * @param standardDeviation their sample standard deviation, with the {@code n − 1} divisor (SI); 0 below two
 *                          values
 */
public record Moments(long count, double mean, double standardDeviation) {

    public Moments {
        if (count < 0 || !Double.isFinite(mean) || !(standardDeviation >= 0) || !Double.isFinite(standardDeviation)) {
            throw new IllegalArgumentException("need count ≥ 0, finite mean and standard deviation ≥ 0; got " + count
                    + ", " + mean + ", " + standardDeviation);
        }
    }
}
