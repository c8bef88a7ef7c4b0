/**
 * Derating: the quantities a policy limits ({@link org.tjmargin.derating.Measure}), rules with their limits and
 * provenance, policies, and the margin of an operating point against each rule (design 2.5).
 *
 * <p>Domain package: depends on {@code java.base} and, for the 25 °C reference of ratings, on
 * {@code device.Celsius} only; rules see plain numbers in a
 * {@link org.tjmargin.derating.RuleContext}, never solver internals, files, Jackson, the console or charts.
 */
package org.tjmargin.derating;
