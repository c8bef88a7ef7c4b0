package org.tjmargin.solve;

/**
 * How far a corner analysis has come, for a progress display: first the sweep, ambient by ambient, then the
 * positions' searches for their maximum ambient and runaway onset, position by position. Called from the
 * analysis's worker threads; an implementation must be thread-safe and quick. It only observes: the results do not
 * depend on it.
 */
public interface AnalysisProgress {

    /** Ignores progress. */
    AnalysisProgress NONE = new AnalysisProgress() {
        @Override
        public void ambientsSwept(int done, int total) {
        }

        @Override
        public void positionsSearched(int done, int total) {
        }
    };

    /**
     * The sweep has solved {@code done} of its {@code total} ambients (each the whole board at that ambient, with its
     * air balance); not necessarily in order of ambient when the ambients are independent and run in parallel.
     */
    void ambientsSwept(int done, int total);

    /** The searches of {@code done} of the board's {@code total} positions have ended. */
    void positionsSearched(int done, int total);
}
