/**
 * The breakdown diode's electrical model and its ratings: the piecewise-linear breakdown line with its
 * temperature coefficient, the knee, leakage below breakdown, the high-current (surge) line, the correction
 * of datasheet test conditions, and the temperature-coefficient estimate used when a part gives none.
 *
 * <p>Domain package: it depends on nothing but {@code java.base} and Apache Commons Math. No files, no
 * Jackson, no console, no charts.
 */
package org.tjmargin.device;
