package org.tjmargin.variation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class SplitMix64Test {

    /**
     * Reference outputs of S. Vigna's {@code splitmix64.c} (prng.di.unimi.it) for the state 1234567, as used by the
     * test suites of several generator libraries, e.g. Apache Commons RNG's {@code SplitMix64Test} (from memory,
     * verify): 6457827717110365317, 3203168211198807973, 9817491932198370423 (unsigned).
     */
    @Test
    void matchesPublishedReferenceOutputs() {
        SplitMix64 g = new SplitMix64(1234567L);
        assertEquals(6457827717110365317L, g.nextLong());
        assertEquals(3203168211198807973L, g.nextLong());
        assertEquals(Long.parseUnsignedLong("9817491932198370423"), g.nextLong());
    }

    /**
     * The JDK's {@code SplittableRandom} implements the same algorithm (Steele, Lea, Flood 2014): a seeded one
     * starts with the same state and the same γ, so the streams must agree (seeded loop, seed printed on failure).
     */
    @Test
    void agreesWithSplittableRandom() {
        long seed = 77L;
        Random rnd = new Random(seed);
        for (int k = 0; k < 100; k++) {
            long s = rnd.nextLong();
            SplitMix64 ours = new SplitMix64(s);
            SplittableRandom jdk = new SplittableRandom(s);
            for (int i = 0; i < 50; i++) {
                assertEquals(jdk.nextLong(), ours.nextLong(), "seed " + seed + ", state " + s);
            }
        }
    }

    @Test
    void blocksStartApartAndUnitsStayOpen() {
        assertNotEquals(SplitMix64.forBlock(1, 0).nextLong(), SplitMix64.forBlock(1, 1).nextLong());
        assertNotEquals(SplitMix64.forBlock(1, 0).nextLong(), SplitMix64.forBlock(2, 0).nextLong());
        assertEquals(SplitMix64.forBlock(5, 3).nextLong(), SplitMix64.forBlock(5, 3).nextLong());
        SplitMix64 g = new SplitMix64(0);
        for (int i = 0; i < 100_000; i++) {
            double u = g.nextOpenUnit();
            assertTrue(u > 0 && u < 1, "u = " + u);
        }
        // The extreme outputs, k = 0 and k = 2^52 − 1: both strictly inside (0, 1), exactly.
        long top = (1L << 52) - 1;
        assertTrue((0 + 0.5) * 0x1.0p-52 > 0);
        assertTrue((top + 0.5) * 0x1.0p-52 < 1);
        assertEquals(1.0 - 0x1.0p-53, (top + 0.5) * 0x1.0p-52, 0.0);
    }
}
