package org.tjmargin.variation.statistical;

/**
 * Budget and reproducibility of a Monte Carlo run.
 *
 * @param samples       samples drawn, ≥ 1
 * @param seed          the seed: with the block size it fixes every draw (see {@link org.tjmargin.variation.SplitMix64})
 * @param blockSize     samples per random stream, ≥ 1. Part of the result's identity: the same seed with another
 *                      block size draws other samples. The thread count is not.
 * @param histogramBins bins of each histogram, ≥ 1
 */
public record MonteCarloSettings(long samples, long seed, int blockSize, int histogramBins) {

    /** 4096 samples per block: enough work per task to amortise the fork-join overhead (≈ 1 µs) at ≥ 100 ns per
     * sample, and enough blocks (≥ 2 per core at 1e4 samples) to balance two cores. */
    public static final int DEFAULT_BLOCK_SIZE = 4096;

    /** 40 bins: at 1e4 samples about 250 per bin in the middle of a spread, a readable shape. */
    public static final int DEFAULT_BINS = 40;

    public MonteCarloSettings {
        if (samples < 1 || blockSize < 1 || histogramBins < 1) {
            throw new IllegalArgumentException("need ≥ 1 sample, block size ≥ 1 and ≥ 1 bin; got " + samples + ", "
                    + blockSize + ", " + histogramBins);
        }
        if ((samples + blockSize - 1) / blockSize > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("too many blocks: " + samples + " samples in blocks of " + blockSize);
        }
    }

    /** {@code samples} with the default block size and bins. */
    public static MonteCarloSettings of(long samples, long seed) {
        return new MonteCarloSettings(samples, seed, DEFAULT_BLOCK_SIZE, DEFAULT_BINS);
    }

    /** Number of blocks. */
    public int blocks() {
        return (int) ((samples + blockSize - 1) / blockSize);
    }

    /** Samples in block {@code b}. */
    public int samplesIn(int b) {
        return (int) Math.min(blockSize, samples - (long) b * blockSize);
    }
}
