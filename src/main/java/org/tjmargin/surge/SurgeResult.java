package org.tjmargin.surge;

import java.util.Optional;
import java.util.OptionalDouble;

/**
 * One surge at one operating point: the transient of its hottest pulse and its checks' quantities. Every writer
 * reads it; none recomputes.
 *
 * @param caseId                   the surge
 * @param startTjK                 steady-state junction temperature the surge starts from (K)
 * @param pulse                    the hottest pulse's transient (the last of a train, from the rise the earlier ones left)
 * @param pulseCount               pulses in the test
 * @param peakJunctionTemperatureK highest junction temperature of the test (K)
 * @param peakPowerW               largest clamp dissipation of the hottest pulse (W)
 * @param averagePowerW            the train's mean dissipation, energy over period (W)
 * @param rating                   the part's rating converted to the applied pulse, with the method
 * @param deratingFactor           the rating's fraction at the start temperature (reference 4.6)
 * @param allowedPeakPowerW        converted rating times the derating factor (W)
 * @param powerRatio               {@code peakPowerW / allowedPeakPowerW}; {@link #RATIO_AT_ZERO_RATING} when the
 *                                 rating has fallen to zero
 * @param protectedLimitV          the protected input's limit (V), if stated
 * @param stopped                  why the transient stopped early, if it did (then the values are of the partial
 *                                 transient and must not be trusted)
 * @param estimated                whether the network or the conversion is an estimate
 */
public record SurgeResult(String caseId, double startTjK, ClampTransientResult pulse, int pulseCount,
        double peakJunctionTemperatureK, double peakPowerW, double averagePowerW, ConvertedRating rating, double deratingFactor,
        double allowedPeakPowerW, double powerRatio, OptionalDouble protectedLimitV, Optional<ClampTransientOutcome.Reason> stopped,
        boolean estimated) {

    /** Stand-in ratio (1) when the pulse rating is zero at the start temperature: any policy fails it, and it stays finite. */
    public static final double RATIO_AT_ZERO_RATING = 1e9;

    /**
     * Shown with every surge verdict (reference 3.3, datasheet notes, sourced): measured surge limits fall below
     * thermal predictions because of current crowding, so a thermal model is not proof of surge capability.
     */
    public static final String THERMAL_MODEL_CAUTION = "Surge margins come from a thermal model. Measured surge limits fall below "
            + "thermal predictions (current crowding in the die), so treat these margins as optimistic estimates and confirm "
            + "surge capability by the part's rated pulse curves and by test; for worst case, datasheets suggest 2/3 of the "
            + "typical surge-power curve.";

    public SurgeResult {
        double[] values = {startTjK, peakJunctionTemperatureK, peakPowerW, averagePowerW, deratingFactor, allowedPeakPowerW, powerRatio};
        for (double v : values) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("surge " + caseId + " has a non-finite value: start " + startTjK + " K, peak "
                        + peakJunctionTemperatureK + " K, P " + peakPowerW + " W, ratio " + powerRatio);
            }
        }
        if (pulseCount < 1) {
            throw new IllegalArgumentException("surge result needs at least one pulse: " + pulseCount);
        }
    }

    /** @return the largest clamp current (A) */
    public double peakCurrentA() {
        return pulse.peakCurrentA();
    }

    /** @return the largest clamp voltage (V) */
    public double peakClampVoltageV() {
        return pulse.peakClampVoltageV();
    }

    /** @return one pulse's energy (J) */
    public double energyJ() {
        return pulse.energyJ();
    }

    /** @return the clamp voltage over the protected input's limit (1), if a limit is stated */
    public OptionalDouble clampVoltageRatio() {
        return protectedLimitV.isPresent() ? OptionalDouble.of(pulse.peakClampVoltageV() / protectedLimitV.getAsDouble())
                : OptionalDouble.empty();
    }

    /**
     * True when the transient stopped for a numerical reason: it gives partial values only, so the point has no
     * answer to stand behind. Runaway within the pulse is a physical answer (the surge rules fail it from its peak
     * Tj) and does not count.
     */
    public boolean stoppedNumerically() {
        return stopped.isPresent() && stopped.get() != ClampTransientOutcome.Reason.JUNCTION_RUNAWAY;
    }

    /** True when any of {@code surges} {@linkplain #stoppedNumerically() stopped numerically}. */
    public static boolean anyStoppedNumerically(java.util.List<SurgeResult> surges) {
        // A loop by index, neither a stream nor an iterator: this runs for every corner at every ambient, most
        // often on an empty list, and either allocated there.
        for (int k = 0; k < surges.size(); k++) {
            if (surges.get(k).stoppedNumerically()) {
                return true;
            }
        }
        return false;
    }
}
