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
     * {@code minHalfWidth} when the span is smaller than that, and by at least {@value #RELATIVE_PAD} of the
     * values' magnitude: a ratio rule's stand-in value where a rating has fallen to zero gives margins near
     * {@code -1e15}, where a fixed half-width is below the spacing of doubles and both edges would round to one.
     */
    static Bins around(double min, double max, double minHalfWidth, int bins) {
        double pad = Math.max(Math.max(0.1 * (max - min), minHalfWidth),
                RELATIVE_PAD * Math.max(Math.abs(min), Math.abs(max)));
        return new Bins(min - pad, max + pad, bins);
    }

    /** Smallest pad relative to the magnitude of the edges (1): far above the 1.1e-16 spacing of doubles, far
     * below any span a report shows at an ordinary magnitude (1e-6 of a 400 K junction is 0.4 mK). */
    static final double RELATIVE_PAD = 1e-6;

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
