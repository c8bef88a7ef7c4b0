/**
 * Surges on a breakdown-diode clamp: waveforms and the standards' timing definitions, surge sources (ideal current
 * source or Thevenin voltage source), the clamp's high-current line, the coupled electro-thermal clamp transient,
 * pulse trains, and conversion of pulse ratings between waveforms.
 *
 * <p>Everything is SI (s, A, V, W, J, K, Ω). Waveforms expose their breakpoints and fronts so the transient
 * solver can stop exactly there. Transient thermal impedance comes from {@code org.tjmargin.thermal}.
 *
 * <p>Must not depend on: files or {@code java.io}, Jackson, picocli, JFreeChart, the console, or the
 * {@code design}, {@code report} and {@code cli} packages. File reading (e.g. a CSV waveform table) lives at the
 * edge; this package takes parsed arrays.
 */
package org.tjmargin.surge;
