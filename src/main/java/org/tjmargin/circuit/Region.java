package org.tjmargin.circuit;

/** Where on its characteristic the diode operates. */
public enum Region {
    /** On the straight breakdown line: regulating. */
    BREAKDOWN,
    /** Between {@code Izk} and {@code Izt} on a current-dependent knee: regulating, with a softer slope. */
    KNEE,
    /** Below {@code Izk}: out of regulation (for a clamp at standoff, the normal blocking state). */
    BELOW_KNEE
}
