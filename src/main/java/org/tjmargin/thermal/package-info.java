/**
 * Heat paths of a mounted diode: steady-state paths from junction to the local air (a given {@code Rθja}, axial
 * leads composed from conduction along the leads, surface-mount pads scaled with copper area), the enclosure's
 * rise above the room, and transient thermal impedance (Foster networks, Cauer ladders, their fits).
 *
 * <p>Domain package: it depends on {@code device} for rating references and on Apache Commons Math, never on
 * files, Jackson, the console or charts.
 */
package org.tjmargin.thermal;
