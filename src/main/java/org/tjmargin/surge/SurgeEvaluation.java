package org.tjmargin.surge;

import java.util.Optional;

import org.tjmargin.thermal.FosterPeakSearch;
import org.tjmargin.thermal.FosterPulse;

/**
 * Evaluates one {@link SurgeCase} on a clamp from a steady-state junction temperature (design 2.6): the coupled
 * transient of the train ({@link SurgeTrain}), the peak junction temperature, and the peak power against the part's
 * rating carried to the applied pulse and derated to the start temperature.
 *
 * <p>The applied pulse, for the rating conversion, is the exponential decay with the transient's peak power and
 * energy ({@code τ = E/P_peak}, time to half value {@code τ·ln 2}; common practice, no single source): the shape
 * {@link RatingConversion} handles. The conversion is {@link RatingConversion.Method#FOSTER_NETWORK} through the
 * part's network when that network was given or fitted to the part's data, and
 * {@link RatingConversion.Method#EQUIVALENT_RECTANGLE_SQRT_T} (reference 4.7 (b)) when the network is itself the
 * semi-infinite-die estimate: both are named in the result, the second flagged as an estimate.
 *
 * <p>A train whose period lets every Foster stage decay to below {@link #NEGLIGIBLE_RESIDUE} of its rise before
 * the next pulse ({@code e^(−(T − duration)/τ_max)} below it) is solved as one pulse: the earlier pulses' residue
 * changes the peak by less than that fraction of the rise (exact bound for the decay of a linear network; the
 * average power {@code E/T} is still reported). This saves the train's three extra solves where, as in the usual
 * surge test with pulses a minute apart, they cannot matter.
 *
 * <p>Stateless and thread-safe.
 */
public final class SurgeEvaluation {

    /** Residual fraction of a stage's rise below which earlier pulses of a train are neglected (1). */
    public static final double NEGLIGIBLE_RESIDUE = 1e-9;

    private SurgeEvaluation() {
    }

    /**
     * @param surge    the surge
     * @param rating   the part's surge data
     * @param clamp    the clamp's high-current line at this operating point
     * @param startTjK the steady-state junction temperature (K)
     * @param settings transient settings
     * @param search   peak search for the rating conversion
     */
    public static SurgeResult evaluate(SurgeCase surge, SurgeRating rating, ClampLine clamp, double startTjK,
            TransientSettings settings, FosterPeakSearch search) {
        ClampTransientResult pulse;
        double peakTj;
        double average;
        Optional<ClampTransientOutcome.Reason> stopped = Optional.empty();
        try {
            double slowest = 0;
            for (double tau : rating.network().timeConstantsS()) {
                slowest = Math.max(slowest, tau);
            }
            double quiet = surge.periodS() - surge.source().waveform().durationS();
            boolean independent = Math.exp(-quiet / slowest) < NEGLIGIBLE_RESIDUE;
            SurgeTrainResult train = SurgeTrain.analyse(surge.source(), clamp, rating.network(), startTjK, surge.periodS(),
                    independent ? 1 : surge.pulseCount(), settings);
            pulse = train.lastPulse();
            peakTj = train.peakJunctionTemperatureK();
            average = train.averagePowerW();
        } catch (TransientStoppedException e) {
            pulse = e.stop().result();
            peakTj = pulse.peakJunctionTemperatureK();
            average = pulse.energyJ() / surge.periodS();
            stopped = Optional.of(e.stop().reason());
        }
        double peakP = pulse.peakPowerW();
        FosterPulse applied = peakP > 0 && pulse.energyJ() > 0
                ? FosterPulse.exponentialDecay(Math.log(2) * pulse.energyJ() / peakP)
                : rating.ratedPulse();
        ConvertedRating converted = rating.networkSource().isEstimate()
                ? RatingConversion.byEquivalentRectangle(rating.ratedPulse(), rating.ratedPeakPowerW(), applied)
                : RatingConversion.throughNetwork(rating.ratedPulse(), rating.ratedPeakPowerW(), applied, rating.network(), search);
        double factor = rating.deratingFactor(startTjK);
        double allowed = converted.peakPowerW() * factor;
        double ratio = allowed > 0 ? peakP / allowed : (peakP > 0 ? SurgeResult.RATIO_AT_ZERO_RATING : 0.0);
        return new SurgeResult(surge.id(), startTjK, pulse, surge.pulseCount(), peakTj, peakP, average, converted, factor, allowed,
                ratio, surge.protectedLimitV(), stopped, rating.estimated() || converted.estimated());
    }
}
