package org.tjmargin.variation;

/**
 * The Wilson score interval for a binomial proportion (E. B. Wilson, "Probable inference, the law of succession,
 * and statistical inference", J. Amer. Statist. Assoc. 22 (1927) 209–212): the set of {@code p} whose score test
 * does not reject, {@code (p̂ + z²/2n ± z·√(p̂(1 − p̂)/n + z²/4n²)) / (1 + z²/n)}. Unlike the Wald interval it stays
 * inside [0, 1] and is not empty at 0 or n successes, which is what a Monte Carlo with few violations needs
 * (R. G. Newcombe, "Two-sided confidence intervals for the single proportion: comparison of seven methods",
 * Statistics in Medicine 17 (1998) 857–872, method 3).
 *
 * @param successes  events counted, 0 ≤ successes ≤ trials
 * @param trials     trials, > 0
 * @param estimate   {@code successes/trials}
 * @param lower      lower bound
 * @param upper      upper bound
 * @param confidence two-sided confidence level, e.g. 0.95
 */
public record WilsonInterval(long successes, long trials, double estimate, double lower, double upper,
                             double confidence) {

    /** {@code z} of the two-sided 95 % level, {@code Φ⁻¹(0.975)} (1.959963984540054, to double precision). */
    public static final double Z_95 = 1.959963984540054;

    public WilsonInterval {
        if (trials <= 0 || successes < 0 || successes > trials) {
            throw new IllegalArgumentException("need 0 ≤ successes ≤ trials and trials > 0, got " + successes + " of "
                    + trials);
        }
        if (!(lower >= 0 && lower <= estimate && estimate <= upper && upper <= 1)) {
            throw new IllegalArgumentException("need 0 ≤ lower ≤ estimate ≤ upper ≤ 1, got " + lower + ", "
                    + estimate + ", " + upper);
        }
    }

    /** The 95 % Wilson score interval of {@code successes} in {@code trials}. */
    public static WilsonInterval of95(long successes, long trials) {
        return of(successes, trials, Z_95, 0.95);
    }

    /**
     * The Wilson score interval.
     *
     * @param z          the standard normal quantile of the level, {@code Φ⁻¹(1 − (1 − confidence)/2)}
     * @param confidence the level it stands for (carried for the reports)
     */
    public static WilsonInterval of(long successes, long trials, double z, double confidence) {
        if (trials <= 0 || successes < 0 || successes > trials) {
            throw new IllegalArgumentException("need 0 ≤ successes ≤ trials and trials > 0, got " + successes + " of "
                    + trials);
        }
        double n = trials;
        double p = successes / n;
        double z2 = z * z;
        double denominator = 1.0 + z2 / n;
        double centre = (p + z2 / (2 * n)) / denominator;
        double half = z * Math.sqrt(p * (1 - p) / n + z2 / (4 * n * n)) / denominator;
        // At 0 or n successes the bound equals the estimate exactly; rounding must not push it across.
        double lo = successes == 0 ? 0.0 : Math.min(p, Math.max(0.0, centre - half));
        double hi = successes == trials ? 1.0 : Math.max(p, Math.min(1.0, centre + half));
        return new WilsonInterval(successes, trials, p, lo, hi, confidence);
    }
}
