package org.tjmargin.surge;

/**
 * A front of a waveform: an interval over which it rises to a peak. The transient solver puts at least its
 * points-per-front setting into every front. Both ends are breakpoints of the waveform.
 *
 * @param startS start (s), finite, not negative
 * @param endS   end (s), after the start
 */
public record Front(double startS, double endS) {

    public Front {
        if (!(startS >= 0) || !(endS > startS) || !Double.isFinite(endS)) {
            throw new IllegalArgumentException("a front needs 0 <= startS < endS < ∞: startS = " + startS + ", endS = " + endS);
        }
    }

    /** @return the front's duration (s) */
    public double lengthS() {
        return endS - startS;
    }
}
