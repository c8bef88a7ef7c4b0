package org.tjmargin.thermal;

/**
 * The peak junction rise found by a search through a Foster network's response.
 *
 * @param riseK       the highest rise found (K); when not converged, the highest rise at the times evaluated,
 *                    which is a lower bound of the true peak
 * @param timeS       the time of that rise (s)
 * @param evaluations number of response evaluations spent
 * @param converged   whether every root solve of the search met its tolerance within its budget
 */
public record FosterPeak(double riseK, double timeS, int evaluations, boolean converged) {

    public FosterPeak {
        if (!Double.isFinite(riseK) || !Double.isFinite(timeS)) {
            throw new IllegalArgumentException("peak rise and time must be finite: riseK = " + riseK + ", timeS = " + timeS);
        }
    }
}
