package org.tjmargin.variation.statistical;

import org.tjmargin.variation.Histogram;

/** A histogram being filled: fixed edges, counts per bin and outside. Mutable; one per block. */
final class Bins {

    private final double lo;
    private final double hi;
    private final long[] counts;
    private final double scale;
    private long under;
    private long over;

    Bins(double lo, double hi, int bins) {
        this.lo = lo;
        this.hi = hi;
        this.counts = new long[bins];
        this.scale = bins / (hi - lo);
    }

    /**
     * Edges that hold the values a corner scan found, {@code [min, max]}, padded by 10 % of their span on each side
     * (values between corners of a non-monotone response may reach a little beyond them), and by
     * {@code minHalfWidth} when the span is smaller than that.
     */
    static Bins around(double min, double max, double minHalfWidth, int bins) {
        double pad = Math.max(0.1 * (max - min), minHalfWidth);
        return new Bins(min - pad, max + pad, bins);
    }

    void add(double x) {
        if (x < lo) {
            under++;
        } else if (x >= hi) {
            over++;
        } else {
            counts[Math.min(counts.length - 1, (int) ((x - lo) * scale))]++;
        }
    }

    Bins emptyCopy() {
        return new Bins(lo, hi, counts.length);
    }

    void merge(Bins o) {
        for (int i = 0; i < counts.length; i++) {
            counts[i] += o.counts[i];
        }
        under += o.under;
        over += o.over;
    }

    Histogram histogram() {
        return new Histogram(lo, hi, counts, under, over);
    }
}
