package org.tjmargin.device;

import java.util.List;

/**
 * A breakdown diode as a part of the library: its identifier, the electrical model, its ratings, the nominal
 * voltage and tolerance it is sold with, and notes on any value that was estimated rather than given.
 *
 * @param id             identifier in the parts library
 * @param kind           Zener (regulator/reference) or transient suppressor (clamp)
 * @param vzNomV         nominal breakdown voltage at {@code Izt} (V)
 * @param vzTolerance    relative tolerance of {@code Vz_nom} (fraction, e.g. 0.05), ≥ 0
 * @param model          electrical model at nominal voltage
 * @param ratings        absolute ratings
 * @param standoffV      for clamps, the working standoff voltage {@code Vwm} (V); 0 when not given
 * @param estimates      human-readable notes on estimated values (empty when none); shown in every output
 */
public record BreakdownPart(String id, Kind kind, double vzNomV, double vzTolerance, BreakdownDiode model,
                            DiodeRatings ratings, double standoffV, List<String> estimates) {

    /** What the part is built and rated for. */
    public enum Kind { ZENER, TVS }

    public BreakdownPart {
        estimates = List.copyOf(estimates);
        if (id == null || id.isBlank()) {
            throw new IllegalArgumentException("a part needs an identifier");
        }
        if (!(vzNomV > 0) || !(vzTolerance >= 0) || vzTolerance >= 1) {
            throw new IllegalArgumentException("need Vz_nom > 0 and 0 ≤ tolerance < 1, got " + vzNomV + " V, "
                    + vzTolerance);
        }
        if (!(standoffV >= 0)) {
            throw new IllegalArgumentException("standoff voltage must be ≥ 0, got " + standoffV + " V");
        }
    }
}
