package org.tjmargin.variation.statistical;

/**
 * The Monte Carlo yield of one position at one ambient.
 *
 * @param ambientK room temperature (K)
 * @param tLocalK  the position's air there, from the board balance (K); NaN where the air has no balance
 * @param yield    fraction of samples that pass every rule (1)
 * @param wilsonLo lower end of its 95 % Wilson score interval
 * @param wilsonHi upper end
 * @param samples  samples drawn
 * @param rules    each policy rule's violating fraction there with its 95 % Wilson interval, in policy order
 */
public record YieldPoint(double ambientK, double tLocalK, double yield, double wilsonLo, double wilsonHi,
                         long samples, java.util.List<RuleViolation> rules) {
    public YieldPoint {
        rules = java.util.List.copyOf(rules);
    }

    /** The yield of a Monte Carlo run at {@code ambientK}, whose air was {@code tLocalK}. */
    public static YieldPoint of(double ambientK, double tLocalK, MonteCarloResult run) {
        var y = run.yield();
        return new YieldPoint(ambientK, tLocalK, y.estimate(), y.lower(), y.upper(), y.trials(), run.rules());
    }

    /** The rule violated by the most samples here, if any sample violates one. */
    public java.util.Optional<RuleViolation> mostViolated() {
        return rules.stream().filter(r -> r.probability().successes() > 0)
                .max(java.util.Comparator.comparingLong(r -> r.probability().successes()));
    }
}
