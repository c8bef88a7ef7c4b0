package org.tjmargin.surge;

import org.tjmargin.thermal.FosterNetwork;
import org.tjmargin.thermal.FosterState;

/**
 * A train of identical surges repeated at a period, without stepping through every surge. Each surge's heat,
 * per Foster stage, is the stage's state one period after the surge less the decayed state it started from; summed
 * over the earlier pulses as a geometric series ({@link FosterNetwork#trainStartState}, reference 3.3
 * generalised), it gives the state the last surge starts from, which is then solved transiently, so its own
 * coupling (breakdown voltage at the warmer junction) is exact.
 *
 * <p>The earlier pulses do not all dissipate alike: warmer, the clamp's {@code Vbr} is higher. For a Thevenin
 * source {@code dP/dTj = αV·(R·I − V)/(R + Rd)} (derived from {@code P = V·I}, {@code I = (v − Vbr)/(R + Rd)}),
 * positive for {@code αV > 0} whenever the clamp voltage is below the drop across the source resistance (the
 * usual surge: more voltage, slightly less current, more power); for an ideal current source
 * {@code dP/dTj = αV·I}. So the state is bracketed two ways:
 * <ol>
 *   <li>every earlier pulse dissipating what the first did (from rest): the upper bound when {@code dP/dTj < 0};</li>
 *   <li>every earlier pulse dissipating what the last does, solved as a fixed point (the last pulse's heat sets
 *       the state it starts from): the upper bound when {@code dP/dTj > 0}, since the true state lies below it and
 *       the iteration map is monotone (derived).</li>
 * </ol>
 * The reported last pulse is whichever of the two reaches the higher junction temperature: conservative for either
 * sign. With no coupling ({@code αV = 0} and a current source) both are exact (tests hold them against pulse-by-pulse
 * stepping).
 */
public final class SurgeTrain {

    /** Fixed-point iterations allowed for case 2; the contraction per iteration is the train's small loop gain. */
    public static final int MAX_BUILD_UP_ITERATIONS = 20;
    /** The fixed point's stop: the largest change of a stage's start rise between iterations (K). */
    public static final double BUILD_UP_TOLERANCE_K = 1e-6;

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
        FosterState rest = network.rest();
        ClampTransientResult first = ClampTransient.solve(source, clamp, network, startTjK, settings).resultOrThrow();
        double averagePowerW = first.energyJ() / periodS;
        if (pulseCount == 1) {
            return new SurgeTrainResult(first, first, 1, periodS, rest, first.peakJunctionTemperatureK(), averagePowerW, 0, true);
        }
        FosterState fromFirst = startOfLast(network, first, rest, periodS, pulseCount);
        ClampTransientResult lastFromFirst = ClampTransient.solve(source, clamp, network, startTjK, fromFirst, settings).resultOrThrow();

        FosterState state = startOfLast(network, lastFromFirst, fromFirst, periodS, pulseCount);
        ClampTransientResult last = ClampTransient.solve(source, clamp, network, startTjK, state, settings).resultOrThrow();
        int iterations = 1;
        boolean converged = false;
        while (iterations < MAX_BUILD_UP_ITERATIONS) {
            FosterState next = startOfLast(network, last, state, periodS, pulseCount);
            double change = maxDifference(next, state);
            state = next;
            last = ClampTransient.solve(source, clamp, network, startTjK, state, settings).resultOrThrow();
            iterations++;
            if (change <= BUILD_UP_TOLERANCE_K) {
                converged = true;
                break;
            }
        }
        boolean firstBoundIsHotter = lastFromFirst.peakJunctionTemperatureK() >= last.peakJunctionTemperatureK();
        ClampTransientResult worst = firstBoundIsHotter ? lastFromFirst : last;
        FosterState worstStart = firstBoundIsHotter ? fromFirst : state;
        double peak = Math.max(first.peakJunctionTemperatureK(), worst.peakJunctionTemperatureK());
        return new SurgeTrainResult(first, worst, pulseCount, periodS, worstStart, peak, averagePowerW, iterations, converged);
    }

    /**
     * The state at the start of the last pulse if every earlier one left the heat that {@code pulse} (started from
     * {@code pulseStart}) left: its state one period on, less the decayed start.
     */
    private static FosterState startOfLast(FosterNetwork network, ClampTransientResult pulse, FosterState pulseStart, double periodS,
            int pulseCount) {
        double[] end = network.decay(pulse.finalRise(), periodS - pulse.endTimeS()).stageRiseK();
        double[] decayedStart = network.decay(pulseStart, periodS).stageRiseK();
        for (int i = 0; i < end.length; i++) {
            end[i] -= decayedStart[i];
        }
        return network.trainStartState(new FosterState(end), periodS, pulseCount - 1);
    }

    private static double maxDifference(FosterState a, FosterState b) {
        double d = 0;
        for (int i = 0; i < a.stages(); i++) {
            d = Math.max(d, Math.abs(a.stageRiseK(i) - b.stageRiseK(i)));
        }
        return d;
    }
}
