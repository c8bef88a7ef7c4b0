package org.tjmargin.units;

import static org.junit.jupiter.api.Assertions.assertTrue;

/** Assertions on doubles with a relative tolerance. */
final class Close {

    /**
     * Relative tolerance for conversions that are exact in decimal (a power of ten, or adding
     * 273.15): the parser rounds once, so the error is half an ulp (about 1.1e-16); 1e-12 leaves
     * room without hiding a wrong factor, which would be off by at least 1e-2.
     */
    static final double EXACT_DECIMAL = 1e-12;

    private Close() {
    }

    static void assertRelative(double expected, double actual, double relative, String what) {
        double allowed = Math.abs(expected) * relative;
        assertTrue(Math.abs(actual - expected) <= allowed,
                () -> what + ": expected " + expected + " within relative " + relative
                        + ", got " + actual);
    }

    static void assertExactDecimal(double expected, double actual, String what) {
        assertRelative(expected, actual, EXACT_DECIMAL, what);
    }
}
