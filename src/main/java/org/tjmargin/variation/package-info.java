/**
 * Variation of the inputs, as values: ranges of toleranced values, their distributions, worst-case corners over
 * their extremes, arbitrary points of the input space ({@link org.tjmargin.variation.AxisValues}), the split random
 * streams, Wilson intervals, moments and histograms. The engines that solve positions at those points (Monte
 * Carlo, root-sum-square, tornado, yield) are in {@code org.tjmargin.variation.statistical}, so that this package,
 * which {@code circuit} and {@code solve} use, depends on nothing of theirs.
 *
 * <p>Domain package: depends on {@code java.base} and Apache Commons Math only; no files, Jackson, console or charts.
 */
package org.tjmargin.variation;
