package org.tjmargin.variation.statistical;

import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.tjmargin.variation.VariationModel;

/**
 * What a statistical analysis of a board runs (design 2.7): the Monte Carlo budget and seed, how many ambients of
 * the sweep the yield curve takes, how many samples run the (costly) surge transients, and each position's
 * distributions.
 *
 * @param settings      samples per Monte Carlo run, seed, block size, histogram bins
 * @param yieldPoints   ambients of the yield-against-ambient curve, taken evenly from the sweep (its first and last
 *                      always among them), ≥ 2
 * @param surgeSamples  samples of each run of a position with surges in which every sample runs each surge
 *                      transient (≈ 0.5 ms each): the run at the design's highest ambient and each point of the
 *                      position's yield curve with surges; ≥ 1, at most {@code settings.samples()}
 * @param models        each position's distributions by position id; a position not named has every axis uniform
 * @param positions     the positions the statistics run for, by id; empty for every position. On a board of a
 *                      thousand positions the whole budget is positions × yield points × samples (1.6e8 solves at
 *                      the defaults, minutes): a design can name the few it needs statistics for.
 */
public record StatisticsPlan(MonteCarloSettings settings, int yieldPoints, long surgeSamples,
                             Map<String, VariationModel> models, Optional<Set<String>> positions) {

    /** A plan for every position. */
    public StatisticsPlan(MonteCarloSettings settings, int yieldPoints, long surgeSamples,
                          Map<String, VariationModel> models) {
        this(settings, yieldPoints, surgeSamples, models, Optional.empty());
    }

    /** Default samples per run: 10 000, which puts the 95 % Wilson upper bound of a run with no failure at 0.04 %. */
    public static final long DEFAULT_SAMPLES = 10_000;

    /** Default ambients of the yield curve: 16. */
    public static final int DEFAULT_YIELD_POINTS = 16;

    /**
     * Default samples with surges: 200 (upper 95 % bound 1.9 % when none fails; about 0.1 s per run of two surges on
     * one core).
     */
    public static final long DEFAULT_SURGE_SAMPLES = 200;

    /** Default seed. */
    public static final long DEFAULT_SEED = 1;

    public StatisticsPlan {
        if (settings == null || models == null || positions == null) {
            throw new IllegalArgumentException("a statistics plan needs settings and models");
        }
        if (yieldPoints < 2) {
            throw new IllegalArgumentException("the yield curve needs at least 2 ambients, got " + yieldPoints);
        }
        if (surgeSamples < 1) {
            throw new IllegalArgumentException("surge samples must be ≥ 1, got " + surgeSamples);
        }
        surgeSamples = Math.min(surgeSamples, settings.samples());
        models = Map.copyOf(models);
        positions = positions.map(Set::copyOf);
    }

    /** Whether the statistics run for position {@code id}. */
    public boolean covers(String id) {
        return positions.isEmpty() || positions.get().contains(id);
    }

    /** The distributions of position {@code id}. */
    public VariationModel modelFor(String id) {
        return models.getOrDefault(id, VariationModel.UNIFORM);
    }

    /** This plan with another budget and seed (e.g. from the command line), the rest kept. */
    public StatisticsPlan withSamplesAndSeed(long samples, long seed) {
        return new StatisticsPlan(new MonteCarloSettings(samples, seed, settings.blockSize(),
                settings.histogramBins()), yieldPoints, surgeSamples, models, positions);
    }
}
