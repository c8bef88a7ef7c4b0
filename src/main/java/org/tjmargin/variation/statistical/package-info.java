/**
 * The statistical worst-case engines (design 2.7): seeded parallel Monte Carlo of the coupled operating point with
 * violation probabilities and Wilson intervals, root-sum-square spreads from central-difference sensitivities,
 * one-at-a-time sensitivity ranking (tornado), and yield against ambient; with the closed-form fast path of the
 * linear case. Results are plain immutable records for the writers.
 *
 * <p>A subpackage so that the value types of {@code org.tjmargin.variation}, which {@code circuit} and {@code solve}
 * use, do not depend back on the solver: {@code variation → (nothing)}, {@code circuit, solve → variation},
 * {@code variation.statistical → solve, derating, circuit, device}. Domain package: no files, Jackson, console or
 * charts.
 */
package org.tjmargin.variation.statistical;
