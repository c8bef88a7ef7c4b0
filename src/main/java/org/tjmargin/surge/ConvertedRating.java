package org.tjmargin.surge;

import org.tjmargin.thermal.FosterPulse;

/**
 * A peak-pulse-power rating carried from one waveform to another, with the method that did it so outputs can
 * name it.
 *
 * @param ratedPulse      the waveform of the rating
 * @param ratedPeakPowerW its rated peak power (W)
 * @param appliedPulse    the waveform applied
 * @param peakPowerW      the peak power of the applied waveform judged equivalent (W)
 * @param method          how
 */
public record ConvertedRating(FosterPulse ratedPulse, double ratedPeakPowerW, FosterPulse appliedPulse, double peakPowerW,
        RatingConversion.Method method) {

    public ConvertedRating {
        if (!(peakPowerW > 0) || !Double.isFinite(peakPowerW)) {
            throw new IllegalArgumentException("converted peak power must be positive and finite: " + peakPowerW + " W");
        }
    }

    /** @return whether the conversion is an estimate ({@link RatingConversion.Method#isEstimate()}) */
    public boolean estimated() {
        return method.isEstimate();
    }
}
