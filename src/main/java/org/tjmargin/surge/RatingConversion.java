package org.tjmargin.surge;

import org.tjmargin.thermal.FosterNetwork;
import org.tjmargin.thermal.FosterPeakSearch;
import org.tjmargin.thermal.FosterPulse;

/**
 * Carries a peak-pulse-power rating from the waveform it was stated for to another (reference 4.7). Three
 * methods, named in the result:
 * <ol>
 *   <li>{@link Method#EQUAL_ENERGY}: same energy. Right only in the adiabatic regime (pulses much shorter than the
 *       die's diffusion time); an estimate.</li>
 *   <li>{@link Method#EQUIVALENT_RECTANGLE_SQRT_T}: in the √t regime of a semi-infinite die (reference 3.4, 3.5)
 *       the peak rise of a pulse equals that of a rectangle of the same peak power and an equivalent width
 *       {@code te}, and equal rises mean {@code P·√te} is conserved. For {@code p = e^(−t/τ)},
 *       {@code te = D_max²·τ = 0.292729·τ = 0.4223·td}, {@code D_max = 0.541044} the maximum of Dawson's integral
 *       at {@code x = 0.924139} (Abramowitz and Stegun, Table 7.5; derivation in the tests' reference README);
 *       the peak comes at {@code 0.8540·τ}. Real curves flatten at long widths: an estimate.</li>
 *   <li>{@link Method#FOSTER_NETWORK}: the peak power of the applied waveform that gives the same peak rise through
 *       the part's fitted network ({@link FosterPulse#peakRiseKPerW}); preferred wherever a network exists.</li>
 * </ol>
 */
public final class RatingConversion {

    /** The maximum of Dawson's integral, 0.541044 (Abramowitz and Stegun, Table 7.5). */
    public static final double DAWSON_MAXIMUM = 0.541044;
    /** Where Dawson's integral peaks, x = 0.924139 (Abramowitz and Stegun, Table 7.5). */
    public static final double DAWSON_MAXIMUM_AT = 0.924139;
    /** {@code te/τ} of an exponential pulse in the √t regime: {@code D_max² = 0.292729} (reference 4.7, derived). */
    public static final double EXPONENTIAL_EQUIVALENT_RECTANGLE_PER_TAU = 0.292729;

    /** How a rating was converted. */
    public enum Method {
        /** equal energy (adiabatic regime) */
        EQUAL_ENERGY(true),
        /** equivalent rectangle in the √t (semi-infinite die) regime */
        EQUIVALENT_RECTANGLE_SQRT_T(true),
        /** equal peak rise through the fitted Foster network */
        FOSTER_NETWORK(false);

        private final boolean estimate;

        Method(boolean estimate) {
            this.estimate = estimate;
        }

        /** @return whether outputs must flag the result as an estimate */
        public boolean isEstimate() {
            return estimate;
        }
    }

    private RatingConversion() {
    }

    /** @return the applied pulse's peak power with the rated pulse's energy */
    public static ConvertedRating byEqualEnergy(FosterPulse rated, double ratedPeakPowerW, FosterPulse applied) {
        double p = ratedPeakPowerW * rated.energyPerPeakPowerJPerW() / applied.energyPerPeakPowerJPerW();
        return new ConvertedRating(rated, ratedPeakPowerW, applied, p, Method.EQUAL_ENERGY);
    }

    /** @return the applied pulse's peak power with equal {@code P·√te} */
    public static ConvertedRating byEquivalentRectangle(FosterPulse rated, double ratedPeakPowerW, FosterPulse applied) {
        double p = ratedPeakPowerW * Math.sqrt(equivalentRectangleWidthS(rated) / equivalentRectangleWidthS(applied));
        return new ConvertedRating(rated, ratedPeakPowerW, applied, p, Method.EQUIVALENT_RECTANGLE_SQRT_T);
    }

    /** @return the applied pulse's peak power with the same peak rise through {@code network} */
    public static ConvertedRating throughNetwork(FosterPulse rated, double ratedPeakPowerW, FosterPulse applied,
            FosterNetwork network, FosterPeakSearch search) {
        double ratedRise = rated.peakRiseKPerW(network, search).riseK();
        double appliedRise = applied.peakRiseKPerW(network, search).riseK();
        return new ConvertedRating(rated, ratedPeakPowerW, applied, ratedPeakPowerW * ratedRise / appliedRise, Method.FOSTER_NETWORK);
    }

    /**
     * @return the width (s) of the rectangle with the same peak power and the same peak rise in the √t regime: the
     *         width itself for a rectangle, {@code 0.292729·τ} for an exponential decay
     */
    public static double equivalentRectangleWidthS(FosterPulse pulse) {
        return switch (pulse.shape()) {
            case RECTANGULAR -> pulse.widthS();
            case EXPONENTIAL_DECAY -> EXPONENTIAL_EQUIVALENT_RECTANGLE_PER_TAU * pulse.decayTimeConstantS();
        };
    }
}
