package org.tjmargin.variation;

import java.util.Arrays;

/**
 * Counts per bin of equal width over {@code [lo, hi)}, with the values below and above counted apart, so that no
 * sample is lost when the bins were chosen before the run.
 *
 * <p>Immutable: {@link #counts()} returns a copy.
 *
 * @param lo        lower edge of the first bin (SI)
 * @param hi        upper edge of the last bin (SI), > lo
 * @param counts    counts per bin (copied)
 * @param underflow values below {@code lo}
 * @param overflow  values at or above {@code hi}
 */
public record Histogram(double lo, double hi, long[] counts, long underflow, long overflow) {

    public Histogram {
        if (!(hi > lo) || !Double.isFinite(lo) || !Double.isFinite(hi) || counts.length == 0) {
            throw new IllegalArgumentException("need lo < hi, both finite, and at least one bin; got " + lo + " … "
                    + hi + ", " + counts.length + " bins");
        }
        counts = counts.clone();
        if (underflow < 0 || overflow < 0 || Arrays.stream(counts).anyMatch(c -> c < 0)) {
            throw new IllegalArgumentException("counts must be ≥ 0");
        }
    }

    @Override
    public long[] counts() {
        return counts.clone();
    }

    /** Width of one bin (SI). */
    public double binWidth() {
        return (hi - lo) / counts.length;
    }

    /** Lower edge of bin {@code i} (SI). */
    public double binLo(int i) {
        return lo + i * binWidth();
    }

    /** Every value counted, in the bins and outside. */
    public long total() {
        return Arrays.stream(counts).sum() + underflow + overflow;
    }

    /** The bin a value falls in: −1 below, {@code bins} at or above. */
    public static int binOf(double x, double lo, double hi, int bins) {
        if (x < lo) {
            return -1;
        }
        if (x >= hi) {
            return bins;
        }
        return Math.min(bins - 1, (int) ((x - lo) / (hi - lo) * bins));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Histogram h && h.lo == lo && h.hi == hi && Arrays.equals(h.counts, counts)
                && h.underflow == underflow && h.overflow == overflow;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(lo) * 31 + Arrays.hashCode(counts);
    }

    @Override
    public String toString() {
        return "Histogram[" + lo + " … " + hi + ", " + Arrays.toString(counts) + ", under " + underflow + ", over "
                + overflow + "]";
    }
}
