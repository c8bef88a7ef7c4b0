package org.tjmargin.circuit;

/** Where on its characteristic the diode operates. */
public enum Region {
    /** On the straight breakdown line: regulating. */
    BREAKDOWN,
    /** Between {@code Izk} and {@code Izt} on a current-dependent knee: regulating, with a softer slope. */
    KNEE,
    /** Below {@code Izk}: out of regulation (for a clamp at standoff, the normal blocking state). */
    BELOW_KNEE;

    /** {@code values()} copies its array at every call; the circuits map an ordinal at every evaluation. */
    private static final Region[] BY_ORDINAL = values();

    /** The region of ordinal {@code i}. */
    static Region ofOrdinal(int i) {
        return BY_ORDINAL[i];
    }
}
