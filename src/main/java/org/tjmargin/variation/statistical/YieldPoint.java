package org.tjmargin.variation.statistical;

/**
 * The Monte Carlo yield of one position at one ambient.
 *
 * @param ambientK room temperature (K)
 * @param tLocalK  the position's air there, from the board balance (K)
 * @param yield    fraction of samples that pass every rule (1)
 * @param wilsonLo lower end of its 95 % Wilson score interval
 * @param wilsonHi upper end
 * @param samples  samples drawn
 */
public record YieldPoint(double ambientK, double tLocalK, double yield, double wilsonLo, double wilsonHi,
                         long samples) {
}
