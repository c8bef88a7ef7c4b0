package org.tjmargin.variation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

class WilsonIntervalTest {

    /**
     * R. G. Newcombe, "Two-sided confidence intervals for the single proportion: comparison of seven methods",
     * Statistics in Medicine 17 (1998) 857–872, Table I, method 3 (score interval without continuity correction),
     * the examples 81/263 → 0.2553–0.3662 and 0/20 → 0–0.1611 (from memory, verify against the paper). Recomputed
     * here by hand from Wilson's formula with z = 1.95996: 81/263 gives p̂ = 0.307985, centre 0.310750, half-width
     * 0.055464, hence 0.25529–0.36621; 0/20 gives 0 and z²/(n + z²) = 3.84146/23.84146 = 0.16113. The table prints
     * four decimals, so the tolerance is half a unit of the fourth.
     */
    @Test
    void wilsonIntervalMatchesNewcombeTableOne() {
        WilsonInterval a = WilsonInterval.of95(81, 263);
        assertEquals(0.2553, a.lower(), 5e-5);
        assertEquals(0.3662, a.upper(), 5e-5);
        WilsonInterval b = WilsonInterval.of95(0, 20);
        assertEquals(0.0, b.lower(), 0.0);
        assertEquals(0.1611, b.upper(), 5e-5);
        // Regression, tight: the values recomputed above.
        assertEquals(0.255290, a.lower(), 2e-6);
        assertEquals(0.366210, a.upper(), 2e-6);
    }

    /**
     * Wilson's definition (Wilson 1927): the bounds are the two solutions p of the score equation
     * {@code (p̂ − p)² = z²·p(1 − p)/n}. Checked on seeded random counts (seed printed on failure).
     */
    @Test
    void boundsSolveTheScoreEquation() {
        long seed = 20261202L;
        Random rnd = new Random(seed);
        for (int k = 0; k < 500; k++) {
            long n = 1 + rnd.nextInt(100_000);
            long x = (long) (rnd.nextDouble() * (n + 1));
            x = Math.min(x, n);
            WilsonInterval w = WilsonInterval.of95(x, n);
            double z = WilsonInterval.Z_95;
            for (double p : new double[] {w.lower(), w.upper()}) {
                double lhs = (w.estimate() - p) * (w.estimate() - p);
                double rhs = z * z * p * (1 - p) / n;
                assertEquals(lhs, rhs, 1e-12 + 1e-9 * rhs, "seed " + seed + ", " + x + "/" + n + " at p = " + p);
            }
            assertTrue(w.lower() <= w.estimate() && w.estimate() <= w.upper(), "seed " + seed);
        }
    }

    @Test
    void rejectsImpossibleCounts() {
        assertThrows(IllegalArgumentException.class, () -> WilsonInterval.of95(5, 4));
        assertThrows(IllegalArgumentException.class, () -> WilsonInterval.of95(0, 0));
    }
}
