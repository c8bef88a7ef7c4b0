package org.tjmargin.variation.statistical;

import java.util.List;
import org.tjmargin.variation.Histogram;
import org.tjmargin.variation.Moments;

/**
 * A seeded Monte Carlo of the coupled operating point alone (junction temperature, no policy): the fast kernel.
 *
 * @param positionId          the position
 * @param tLocalK             local air temperature (K)
 * @param settings            samples, seed, block size, bins
 * @param axes                the axes drawn
 * @param runawaySamples      samples that ran away
 * @param notConvergedSamples samples whose solve exhausted its budget
 * @param fastPathSamples     samples solved in closed form
 * @param tj                  junction temperature over the converged samples (K)
 * @param tjHistogram         junction temperature of the converged samples (K)
 */
public record OperatingPointSpread(String positionId, double tLocalK, MonteCarloSettings settings,
                                   List<SampledAxis> axes, long runawaySamples, long notConvergedSamples,
                                   long fastPathSamples, Moments tj, Histogram tjHistogram) {

    public OperatingPointSpread {
        axes = List.copyOf(axes);
    }
}
