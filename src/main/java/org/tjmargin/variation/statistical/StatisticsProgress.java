package org.tjmargin.variation.statistical;

/**
 * Told how far a statistical analysis has come, in samples. Called from several threads at once; an
 * implementation must be thread-safe and quick.
 */
@FunctionalInterface
public interface StatisticsProgress {

    /** Ignores progress. */
    StatisticsProgress NONE = (done, total) -> { };

    /**
     * @param samplesDone  samples finished so far, over all runs
     * @param samplesTotal samples the whole analysis draws
     */
    void advanced(long samplesDone, long samplesTotal);
}
