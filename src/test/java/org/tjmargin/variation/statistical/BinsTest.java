package org.tjmargin.variation.statistical;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.tjmargin.variation.Histogram;

/** The histogram edges chosen from a corner scan before a run. */
class BinsTest {

    @Test
    void edgesPadTheCornersSpanByTenPerCentOrTheMinimumHalfWidth() {
        Histogram wide = Bins.around(300.0, 400.0, 0.5, 10).histogram();
        assertEquals(290.0, wide.lo(), 1e-12);
        assertEquals(410.0, wide.hi(), 1e-12);
        Histogram flat = Bins.around(0.25, 0.25, 0.01, 10).histogram();
        assertEquals(0.24, flat.lo(), 1e-15);
        assertEquals(0.26, flat.hi(), 1e-15);
    }

    @Test
    void edgesStayApartAtTheMagnitudeOfAStandInRatio() {
        // A power-ratio rule with a tiny limit gives margins near 1 − 1e15 at every corner; 0.01 is below the
        // 0.125 spacing of doubles there, so without a relative pad both edges round to the same value.
        double m = 1.0 - 1e15;
        Bins b = Bins.around(m, m, 0.01, 40);
        b.add(m);
        Histogram h = b.histogram();
        assertTrue(h.lo() < m && m < h.hi(), h::toString);
        assertEquals(1, h.total() - h.underflow() - h.overflow(), "the corners' value falls inside the bins");
    }
}
