/**
 * The circuits a breakdown diode sits in, each solved for its operating point at a given junction temperature:
 * the shunt regulator (supply, series resistor, load), the current-fed diode, and the clamp at its DC standoff
 * voltage. The electro-thermal coupling lives in {@code solve}; here the junction temperature is an input.
 *
 * <p>Domain package: depends on {@code device} only (and {@code java.base}); no files, Jackson, console or charts.
 */
package org.tjmargin.circuit;
