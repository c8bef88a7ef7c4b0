/**
 * Variation of the inputs: ranges of toleranced values, worst-case corners over their extremes, and (in later
 * work) root-sum-square spreads and seeded Monte Carlo.
 *
 * <p>Domain package: depends on {@code java.base} and Apache Commons Math only; no files, Jackson, console or charts.
 */
package org.tjmargin.variation;
