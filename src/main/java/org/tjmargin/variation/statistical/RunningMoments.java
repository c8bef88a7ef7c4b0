package org.tjmargin.variation.statistical;

import org.tjmargin.variation.Moments;

/**
 * Welford's running mean and sum of squared deviations (B. P. Welford, "Note on a method for calculating corrected
 * sums of squares and products", Technometrics 4 (1962) 419–420), merged across blocks by the pairwise update of
 * T. F. Chan, G. H. Golub, R. J. LeVeque, "Updating formulae and a pairwise algorithm for computing sample
 * variances", Stanford CS report STAN-CS-79-773 (1979). Merging in block order keeps the result bit-identical
 * whatever the thread count. Mutable; one per block.
 */
final class RunningMoments {

    private long n;
    private double mean;
    private double m2;

    void add(double x) {
        n++;
        double d = x - mean;
        mean += d / n;
        m2 += d * (x - mean);
    }

    void merge(RunningMoments o) {
        if (o.n == 0) {
            return;
        }
        if (n == 0) {
            n = o.n;
            mean = o.mean;
            m2 = o.m2;
            return;
        }
        long total = n + o.n;
        double d = o.mean - mean;
        mean += d * o.n / total;
        m2 += o.m2 + d * d * ((double) n * o.n / total);
        n = total;
    }

    Moments moments() {
        return new Moments(n, n == 0 ? 0.0 : mean, n < 2 ? 0.0 : Math.sqrt(Math.max(0.0, m2 / (n - 1))));
    }
}
