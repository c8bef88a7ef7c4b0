/**
 * The electro-thermal operating point and everything built on it: the lowest fixed point of the junction's heat
 * balance, the board-level coupling of positions through the enclosure air, line and load regulation at thermal
 * equilibrium, worst-case corners at each ambient, the ambient sweep and the highest ambient a design holds.
 *
 * <p>Domain package: depends on {@code device}, {@code thermal}, {@code circuit}, {@code derating}, {@code surge},
 * {@code variation} and Apache Commons Math; never on files, Jackson, the console or charts.
 */
package org.tjmargin.solve;
