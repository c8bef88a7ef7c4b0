package org.tjmargin.units;

import java.util.List;

/**
 * One accepted way of writing a unit, without its prefix, in the normalised spelling of
 * {@link UnitSpelling}.
 *
 * @param spelling the normalised spelling, e.g. {@code "W/(m·K)"}; empty for a plain number
 * @param dimensions the dimensions the unit can measure, the usual one first
 * @param prefixes which SI prefixes may stand before the unit
 * @param prefixPower the power to which the prefix is raised (2 for m², 1 otherwise)
 * @param scaleExponent the unit is 10^scaleExponent of the SI unit (-2 for %, -6 for ppm)
 * @param celsius whether the unit is the degree Celsius, which is offset when it is read as an
 *     absolute temperature
 */
record UnitForm(String spelling, List<Dimension> dimensions, Prefixes prefixes, int prefixPower,
        int scaleExponent, boolean celsius) {

    /** Which prefixes a unit takes. */
    enum Prefixes {
        /** No prefix at all. */
        NONE,
        /** Every prefix of {@link SiPrefix} except centi. */
        ALL_BUT_CENTI,
        /** Every prefix of {@link SiPrefix}; only for the metre and the square metre. */
        ALL;

        boolean allows(SiPrefix p) {
            return this == ALL || (this == ALL_BUT_CENTI && p != SiPrefix.CENTI);
        }
    }

    UnitForm {
        dimensions = List.copyOf(dimensions);
    }
}
