package org.tjmargin.variation.statistical;

import java.util.List;
import org.tjmargin.variation.Histogram;
import org.tjmargin.variation.Moments;
import org.tjmargin.variation.WilsonInterval;

/**
 * A seeded Monte Carlo of one position's coupled operating point in fixed local air, held against a policy.
 *
 * @param positionId       the position
 * @param tLocalK          local air temperature (K)
 * @param settings         samples, seed, block size, bins
 * @param axes             the axes drawn, with their distributions
 * @param violation        fraction of samples that fail (any rule, or runaway / not converged), 95 % Wilson
 * @param rules            each policy rule's violating fraction, in policy order
 * @param runawaySamples   samples that ran away thermally (counted as failing)
 * @param notConvergedSamples samples whose solve exhausted its budget (counted as failing)
 * @param fastPathSamples  samples solved by the closed form of {@link LinearFastPath}
 * @param tj               junction temperature over the converged samples (K)
 * @param margin           limiting margin over the converged samples (1)
 * @param tjHistogram      junction temperature of the converged samples (K)
 * @param marginHistogram  limiting margin of the converged samples (1)
 */
public record MonteCarloResult(String positionId, double tLocalK, MonteCarloSettings settings, List<SampledAxis> axes,
                               WilsonInterval violation, List<RuleViolation> rules, long runawaySamples,
                               long notConvergedSamples, long fastPathSamples, Moments tj, Moments margin,
                               Histogram tjHistogram, Histogram marginHistogram) {

    public MonteCarloResult {
        axes = List.copyOf(axes);
        rules = List.copyOf(rules);
    }

    /** The fraction that passes, {@code 1 − violation}, with its interval. */
    public WilsonInterval yield() {
        return WilsonInterval.of(violation.trials() - violation.successes(), violation.trials(), WilsonInterval.Z_95,
                violation.confidence());
    }
}
