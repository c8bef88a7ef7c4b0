package org.tjmargin.solve;

/**
 * The ambient (room) temperatures a design must work in, swept in equal steps.
 *
 * @param minK   lowest ambient (K)
 * @param maxK   highest ambient, the design's worst (K), ≥ min
 * @param points number of sweep points, ≥ 2 unless min = max
 */
public record AmbientRange(double minK, double maxK, int points) {

    public AmbientRange {
        if (!Double.isFinite(minK) || !Double.isFinite(maxK) || !(minK > 0) || maxK < minK) {
            throw new IllegalArgumentException("ambient range must be finite kelvin values with min ≤ max, got "
                    + minK + " K … " + maxK + " K");
        }
        if (points < 1 || (points < 2 && maxK > minK) || points > 100_000) {
            throw new IllegalArgumentException("ambient sweep needs 2 … 100000 points, got " + points);
        }
    }

    /** The sweep's ambient temperatures (K), increasing. */
    public double[] temperaturesK() {
        if (points == 1) {
            return new double[] {maxK};
        }
        double[] t = new double[points];
        for (int i = 0; i < points; i++) {
            t[i] = i == points - 1 ? maxK : minK + (maxK - minK) * i / (points - 1);
        }
        return t;
    }

    /** Step between sweep points (K); 0 for a single point. */
    public double stepK() {
        return points == 1 ? 0.0 : (maxK - minK) / (points - 1);
    }
}
