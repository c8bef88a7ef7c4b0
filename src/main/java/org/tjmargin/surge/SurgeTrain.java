package org.tjmargin.surge;

import org.tjmargin.thermal.FosterNetwork;
import org.tjmargin.thermal.FosterState;

/**
 * A train of identical surges repeated at a period, without stepping through every surge: the first surge is
 * solved transiently; the rise it leaves after one period, per Foster stage, is summed over the earlier pulses
 * as a geometric series ({@link FosterNetwork#trainStartState}, reference 3.3 generalised); the last surge is
 * solved transiently again from that state, so its own coupling (breakdown voltage at the warmer junction) is
 * exact.
 *
 * <p>Approximation: the earlier pulses are taken to dissipate what the first did. With a positive temperature
 * coefficient a warmer clamp takes less power from a Thevenin source, so the estimate of the build-up is
 * conservative; with a negative coefficient (below about 5 V) it is slightly optimistic. With no coupling
 * ({@code αV = 0} or an ideal current source with {@code Rd} fixed) it is exact (tests hold it against pulse-by-pulse
 * stepping).
 */
public final class SurgeTrain {

    private SurgeTrain() {
    }

    /**
     * @param source     one surge
     * @param clamp      the clamp's line
     * @param network    the junction's transient thermal impedance
     * @param startTjK   the steady-state junction temperature before the train (K)
     * @param periodS    repetition period (s), not shorter than one surge's duration
     * @param pulseCount number of surges, at least 1
     * @param settings   transient settings
     * @throws TransientStoppedException if a surge's transient stopped early
     */
    public static SurgeTrainResult analyse(SurgeSource source, ClampLine clamp, FosterNetwork network, double startTjK,
            double periodS, int pulseCount, TransientSettings settings) {
        if (pulseCount < 1) {
            throw new IllegalArgumentException("a surge train needs at least one pulse: " + pulseCount);
        }
        double duration = source.waveform().durationS();
        if (!(periodS >= duration) || !Double.isFinite(periodS)) {
            throw new IllegalArgumentException("train period must be finite and not shorter than one surge: periodS = " + periodS
                    + ", surge lasts " + duration + " s");
        }
        ClampTransientResult first = ClampTransient.solve(source, clamp, network, startTjK, settings).resultOrThrow();
        double averagePowerW = first.energyJ() / periodS;
        if (pulseCount == 1) {
            return new SurgeTrainResult(first, first, 1, periodS, network.rest(), first.peakJunctionTemperatureK(), averagePowerW);
        }
        FosterState endOfPeriod = network.decay(first.finalRise(), periodS - first.endTimeS());
        FosterState startOfLast = network.trainStartState(endOfPeriod, periodS, pulseCount - 1);
        ClampTransientResult last = ClampTransient.solve(source, clamp, network, startTjK, startOfLast, settings).resultOrThrow();
        double peak = Math.max(first.peakJunctionTemperatureK(), last.peakJunctionTemperatureK());
        return new SurgeTrainResult(first, last, pulseCount, periodS, startOfLast, peak, averagePowerW);
    }
}
