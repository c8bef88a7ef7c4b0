package org.tjmargin.variation;

/**
 * The SplitMix64 generator (G. L. Steele Jr., D. Lea, C. H. Flood, "Fast splittable pseudorandom number
 * generators", OOPSLA 2014, §3; the algorithm of {@code java.util.SplittableRandom}, reimplemented here so that the
 * stream is fixed by this file and not by a JDK version): a Weyl sequence {@code s += γ},
 * {@code γ = 0x9E3779B97F4A7C15}, each state passed through the finaliser {@code mix64} (D. Stafford's "variant
 * 13" of the MurmurHash3 finaliser, as in the paper).
 *
 * <p>Splitting scheme for seeded parallel Monte Carlo: the stream of block {@code b} starts at state
 * {@code mix64(seed + (b + 1)·γ)} ({@link #forBlock}). Each block's stream is a stretch of the same Weyl sequence
 * at a scrambled, effectively random, offset; for {@code B} blocks of {@code L} draws the chance that two
 * stretches overlap is about {@code B²·L/2^64}, below 1e-6 for a billion draws in a million blocks. A block's
 * draws depend only on {@code (seed, b)}, so results do not depend on which thread runs which block.
 *
 * <p>Mutable, not thread-safe: one generator per block.
 */
public final class SplitMix64 {

    /** The golden-ratio increment {@code γ} of the Weyl sequence (Steele, Lea, Flood 2014). */
    public static final long GOLDEN_GAMMA = 0x9E3779B97F4A7C15L;

    private long state;

    /** A generator starting at {@code state}. */
    public SplitMix64(long state) {
        this.state = state;
    }

    /** The generator of block {@code block} of a run seeded with {@code seed} (see the class comment). */
    public static SplitMix64 forBlock(long seed, long block) {
        return new SplitMix64(mix64(seed + (block + 1) * GOLDEN_GAMMA));
    }

    /** Stafford's variant 13 finaliser. */
    public static long mix64(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    /** The next 64 random bits. */
    public long nextLong() {
        state += GOLDEN_GAMMA;
        return mix64(state);
    }

    /**
     * A uniform double strictly inside (0, 1): the top 52 bits {@code k} as {@code (k + ½)·2^−52}, so that an
     * inverse CDF never sees 0 or 1. With 52 bits {@code k + ½} is exact (below 2^52 doubles are spaced by ½); with
     * 53 bits the largest {@code k + ½} would round up to 2^53 and give exactly 1. Values
     * {@code 2^−53 … 1 − 2^−53}, spaced 2^−52.
     */
    public double nextOpenUnit() {
        return ((nextLong() >>> 12) + 0.5) * 0x1.0p-52;
    }
}
