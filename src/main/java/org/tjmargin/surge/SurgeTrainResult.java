package org.tjmargin.surge;

import org.tjmargin.thermal.FosterState;

/**
 * A train of identical surges at a fixed period.
 *
 * @param firstPulse               the first surge, from the steady state
 * @param lastPulse                the last surge, from the bounding rise the earlier ones left (see {@link SurgeTrain});
 *                                 the same as the first for one pulse
 * @param pulseCount               number of surges
 * @param periodS                  repetition period (s)
 * @param startOfLastPulse         the Foster stage rises at the start of the last surge
 * @param peakJunctionTemperatureK the highest junction temperature of the train (K)
 * @param averagePowerW            the train's mean dissipation, first pulse's energy over the period (W): what a
 *                                 long train feeds back into the steady state
 * @param buildUpIterations        fixed-point iterations spent on the build-up bound ({@link SurgeTrain})
 * @param buildUpConverged         whether that fixed point met its tolerance; if not (a train near thermal runaway),
 *                                 the last iterate is reported and must not be trusted
 */
public record SurgeTrainResult(ClampTransientResult firstPulse, ClampTransientResult lastPulse, int pulseCount, double periodS,
        FosterState startOfLastPulse, double peakJunctionTemperatureK, double averagePowerW, int buildUpIterations,
        boolean buildUpConverged) {

    public SurgeTrainResult {
        if (pulseCount < 1 || !(periodS > 0)) {
            throw new IllegalArgumentException("a surge train needs at least one pulse and a positive period: " + pulseCount
                    + " pulses, period " + periodS + " s");
        }
    }
}
