/**
 * Physical quantities for tjmargin: reading them from text, SI prefixes, unit checks and display
 * formatting.
 *
 * <p>What the package holds:
 * <ul>
 *   <li>{@link org.tjmargin.units.Dimension}: the kinds of quantity the tool knows, each with its
 *       SI unit symbol and a human name;</li>
 *   <li>{@link org.tjmargin.units.SiPrefix}: the SI prefixes that are read (yocto to giga, with
 *       centi only on the metre);</li>
 *   <li>{@link org.tjmargin.units.Quantities}: parsing text such as {@code "41 mA"} or
 *       {@code "25 °C"} into SI values, checking that the unit has the expected dimension, and
 *       formatting SI values for display with an SI prefix;</li>
 *   <li>{@link org.tjmargin.units.Quantity}: an SI value tagged with its dimension;</li>
 *   <li>{@link org.tjmargin.units.QuantityException}: why a text was rejected, with the parts
 *       (kind, text, expected and actual dimension) that a caller needs to report it.</li>
 * </ul>
 *
 * <p>Inside the program every value is in coherent SI units; absolute temperatures are in kelvin.
 * Degrees Celsius and prefixed units exist only at the text boundary (parsing and formatting).
 *
 * <p>The package depends on nothing but {@code java.base} ({@code java.lang}, {@code java.math},
 * {@code java.util}); it does no input or output ({@code java.io} is not used) and uses no
 * third-party library. It knows nothing about files, lines or field names: a caller that reads
 * an input file adds that context to the {@link org.tjmargin.units.QuantityException} it
 * receives.
 */
package org.tjmargin.units;
