package org.tjmargin.variation;

import org.apache.commons.math3.special.Erf;

/**
 * How a toleranced value spreads over its {@link Range} (design 2.7). Every distribution maps one uniform draw
 * {@code u ∈ (0, 1)} to a value by its inverse cumulative distribution function, so one stream of uniforms serves
 * every distribution and a sample consumes exactly one draw per varying axis.
 *
 * <p>A range without width ({@link Range#varies()} false) always gives its nominal, whatever the distribution.
 */
public sealed interface Distribution permits Distribution.Uniform, Distribution.Normal, Distribution.Triangular {

    /** Uniform over the range: the default when the input says nothing (every value inside it equally likely). */
    Distribution UNIFORM = new Uniform();

    /**
     * The value of {@code range} at cumulative probability {@code u}.
     *
     * @param range the toleranced value
     * @param u     a uniform draw, strictly inside (0, 1)
     */
    double valueAt(Range range, double u);

    /** Mean of the value over {@code range} (same unit as the range). */
    double mean(Range range);

    /** Standard deviation of the value over {@code range} (same unit as the range), ≥ 0. */
    double standardDeviation(Range range);

    /** A short name for reports, e.g. {@code uniform}, {@code normal 3σ truncated}. */
    String label();

    /**
     * {@link #valueAt} for one fixed range, with whatever depends on the range alone worked out once (for a
     * truncated normal, the cumulative probabilities of both cuts): what a sampling loop calls per draw. Gives the
     * same value as {@code valueAt(range, u)} for every {@code u}.
     */
    default java.util.function.DoubleUnaryOperator inverseCdf(Range range) {
        return u -> valueAt(range, u);
    }

    /**
     * Uniform between {@code lo} and {@code hi}, whatever the nominal: mean {@code (lo + hi)/2}, standard deviation
     * {@code (hi − lo)/√12} (any probability text, e.g. Papoulis, <i>Probability, Random Variables and Stochastic
     * Processes</i>, the uniform density).
     */
    record Uniform() implements Distribution {
        @Override
        public double valueAt(Range r, double u) {
            return r.varies() ? r.lo() + u * (r.hi() - r.lo()) : r.nominal();
        }

        @Override
        public double mean(Range r) {
            return r.varies() ? 0.5 * (r.lo() + r.hi()) : r.nominal();
        }

        @Override
        public double standardDeviation(Range r) {
            return (r.hi() - r.lo()) / Math.sqrt(12.0);
        }

        @Override
        public String label() {
            return "uniform";
        }
    }

    /**
     * Normal, centred on the nominal, with the range's full width equal to {@code 2k·σ}: a tolerance stated as a
     * "k-sigma" limit, {@code σ = (hi − lo)/(2k)} (for a symmetric range the half-width is {@code k·σ}; an
     * asymmetric range keeps the nominal as the centre and the mean width for σ).
     *
     * <p>{@code truncated}: the density is cut at {@code lo} and {@code hi} and renormalised, so every draw stays
     * inside the range (the usual reading of a screened part: nothing outside the tolerance ships); its mean and
     * standard deviation are those of the truncated normal (N. L. Johnson, S. Kotz, N. Balakrishnan,
     * <i>Continuous Univariate Distributions</i>, vol. 1, 2nd ed., §13.10). Not truncated: draws may fall outside
     * the range with the normal tail probability {@code 2·(1 − Φ(k))}; a draw that makes a value non-physical
     * (e.g. a negative resistance) is rejected by the position's constructors, so use truncation or a large
     * {@code k} for wide tolerances.
     *
     * @param kSigma    how many standard deviations the half-width spans, > 0 (3 is common practice)
     * @param truncated true to keep every draw inside the range
     */
    record Normal(double kSigma, boolean truncated) implements Distribution {
        public Normal {
            if (!(kSigma > 0) || !Double.isFinite(kSigma)) {
                throw new IllegalArgumentException("k-sigma must be > 0 and finite, got " + kSigma);
            }
        }

        /** The untruncated normal's σ for {@code range}. */
        public double sigma(Range r) {
            return (r.hi() - r.lo()) / (2.0 * kSigma);
        }

        @Override
        public double valueAt(Range r, double u) {
            return inverseCdf(r).applyAsDouble(u);
        }

        @Override
        public java.util.function.DoubleUnaryOperator inverseCdf(Range r) {
            if (!r.varies()) {
                double v = r.nominal();
                return u -> v;
            }
            double s = sigma(r);
            double nominal = r.nominal();
            double lo = r.lo();
            double hi = r.hi();
            double fa = truncated ? phi(standardised(lo, r)) : 0.0;
            double width = truncated ? phi(standardised(hi, r)) - fa : 1.0;
            return u -> {
                double x = nominal + s * inversePhi(fa + u * width);
                // The inverse CDF is accurate to a few ulps of the standardised value; clamp its rounding at the cut.
                return truncated ? Math.min(hi, Math.max(lo, x)) : x;
            };
        }

        @Override
        public double mean(Range r) {
            if (!r.varies() || !truncated) {
                return r.nominal();
            }
            double a = standardised(r.lo(), r);
            double b = standardised(r.hi(), r);
            return r.nominal() + sigma(r) * (density(a) - density(b)) / (phi(b) - phi(a));
        }

        @Override
        public double standardDeviation(Range r) {
            if (!r.varies()) {
                return 0.0;
            }
            double s = sigma(r);
            if (!truncated) {
                return s;
            }
            double a = standardised(r.lo(), r);
            double b = standardised(r.hi(), r);
            double z = phi(b) - phi(a);
            double t = (density(a) - density(b)) / z;
            return s * Math.sqrt(1.0 + (a * density(a) - b * density(b)) / z - t * t);
        }

        @Override
        public String label() {
            return "normal " + kSigma + "σ" + (truncated ? " truncated" : "");
        }

        private double standardised(double x, Range r) {
            return (x - r.nominal()) / sigma(r);
        }

        private static double density(double z) {
            return Math.exp(-0.5 * z * z) / Math.sqrt(2.0 * Math.PI);
        }

        private static double phi(double z) {
            return 0.5 * Erf.erfc(-z / Math.sqrt(2.0));
        }

        private static double inversePhi(double p) {
            return Math.sqrt(2.0) * Erf.erfInv(2.0 * p - 1.0);
        }
    }

    /**
     * Triangular from {@code lo} to {@code hi} with its mode at the nominal: mean {@code (lo + nominal + hi)/3},
     * variance {@code (a² + b² + c² − ab − ac − bc)/18} with {@code a = lo, b = hi, c = nominal}; inverse CDF in
     * closed form (Johnson, Kotz, Balakrishnan, <i>Continuous Univariate Distributions</i>, vol. 2, 2nd ed.,
     * ch. 26, the triangular distribution).
     */
    record Triangular() implements Distribution {
        @Override
        public double valueAt(Range r, double u) {
            if (!r.varies()) {
                return r.nominal();
            }
            double a = r.lo();
            double b = r.hi();
            double c = r.nominal();
            double fc = (c - a) / (b - a);
            return u < fc ? a + Math.sqrt(u * (b - a) * (c - a)) : b - Math.sqrt((1.0 - u) * (b - a) * (b - c));
        }

        @Override
        public double mean(Range r) {
            return r.varies() ? (r.lo() + r.nominal() + r.hi()) / 3.0 : r.nominal();
        }

        @Override
        public double standardDeviation(Range r) {
            double a = r.lo();
            double b = r.hi();
            double c = r.nominal();
            return Math.sqrt(Math.max(0.0, (a * a + b * b + c * c - a * b - a * c - b * c) / 18.0));
        }

        @Override
        public String label() {
            return "triangular";
        }
    }
}
