package org.tjmargin.variation.statistical;

/**
 * The worst-case (extreme-value) result at one ambient, from the corner analysis, beside which the statistical
 * spreads are shown: every corner of the toleranced inputs taken together at its extreme.
 *
 * @param tjMinK         lowest junction temperature over the converged corners (K); NaN when none converged
 * @param tjMaxK         highest (K); NaN when none converged
 * @param margin         the position's limiting margin over every corner (1)
 * @param limitingRuleId the rule giving it
 * @param corners        corners evaluated
 */
public record CornerExtremes(double tjMinK, double tjMaxK, double margin, String limitingRuleId, int corners) {
}
