package org.tjmargin.variation.statistical;

import java.util.List;

/**
 * One position's statistical results: the extreme-value corners, the root-sum-square spread and the Monte Carlo
 * run at the design's highest ambient, the sensitivity ranking there, and the yield against ambient.
 *
 * @param positionId     the position
 * @param ambientK       the design's highest ambient, where the runs below are taken (K)
 * @param tLocalK        the position's air there, from the worst-case board balance (K); NaN where the air has no
 *                       balance (every sample then runs away)
 * @param corners        worst-case corners at that ambient
 * @param rss            first-order spread about the nominal
 * @param monteCarlo     Monte Carlo at that ambient, surges included where {@code surgesIncluded}
 * @param surgesIncluded true when the run at the highest ambient ran the position's surges on every sample
 * @param tornado        each input swung over its range, the others nominal, ranked by its effect on the margin
 * @param yield          the probability of passing the steady-state rules, and of violating each, at each ambient
 *                       of the yield curve
 * @param yieldWithSurges for a position with surges, the same ambients with every rule, each surge run on every
 *                       sample (with the surge sample count, see {@link StatisticalAnalysis}); empty otherwise
 */
public record PositionStatistics(String positionId, double ambientK, double tLocalK, CornerExtremes corners,
                                 RssOutcome rss, MonteCarloResult monteCarlo, boolean surgesIncluded,
                                 TornadoResult tornado, List<YieldPoint> yield, List<YieldPoint> yieldWithSurges) {
    public PositionStatistics {
        yield = List.copyOf(yield);
        yieldWithSurges = List.copyOf(yieldWithSurges);
        if (!yieldWithSurges.isEmpty() && yieldWithSurges.size() != yield.size()) {
            throw new IllegalArgumentException("the curve with surges must take the ambients of the steady-state one");
        }
    }
}
