package org.tjmargin.surge;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.tjmargin.thermal.FosterNetwork;
import org.tjmargin.thermal.FosterState;

class SurgeTrainTest {

    /** Invented network: a fast die stage and a slow stage that carries the build-up between surges. */
    private static final FosterNetwork NETWORK = FosterNetwork.of(new double[] {0.3, 8}, new double[] {30e-6, 20e-3});
    private static final TransientSettings SETTINGS = TransientSettings.defaults();

    /** The reference: every pulse solved transiently, the state carried across each period. */
    private record Stepped(ClampTransientResult last, FosterState startOfLast) {
    }

    private static Stepped stepped(SurgeSource source, ClampLine clamp, double period, int count) {
        FosterState state = NETWORK.rest();
        FosterState start = state;
        ClampTransientResult r = null;
        for (int k = 0; k < count; k++) {
            start = state;
            r = ClampTransient.solve(source, clamp, NETWORK, 298.15, state, SETTINGS).resultOrThrow();
            state = NETWORK.decay(r.finalRise(), period - r.endTimeS());
        }
        return new Stepped(r, start);
    }

    @Test
    void withoutCouplingTheAlgebraEqualsPulseByPulseStepping() {
        // ideal current source and αV = 0: each pulse dissipates the same, so the geometric series is exact
        SurgeSource source = new IdealCurrentSource(CubicExponentialPulse.current8x20(300));
        ClampLine clamp = new LinearClampLine(40, 0, 0.05);
        SurgeTrainResult train = SurgeTrain.analyse(source, clamp, NETWORK, 298.15, 2e-3, 20, SETTINGS);
        ClampTransientResult last = stepped(source, clamp, 2e-3, 20).last();
        assertEquals(last.peakJunctionTemperatureK(), train.peakJunctionTemperatureK(), 1e-9 * last.peakRiseK());
        assertEquals(train.firstPulse().energyJ() / 2e-3, train.averagePowerW(), 1e-12);
        assertTrue(train.peakJunctionTemperatureK() > train.firstPulse().peakJunctionTemperatureK());
    }

    @Test
    void withCouplingTheBoundIsConservativeAndClose() {
        // Thevenin source, αV > 0, clamp voltage below the source-resistance drop: warmer pulses dissipate more
        // (dP/dTj = αV(R·I − V)/(R + Rd) > 0), so the bound built from the last pulse's heat lies above the truth
        // (invented case: 500 V level-1 surges line to earth every 10 ms into a 60 V clamp, +0.1 %/K)
        SurgeSource source = CombinationWaveGenerator.of(500, CombinationWaveGenerator.Coupling.POWER_LINE_TO_EARTH).source();
        ClampLine clamp = new LinearClampLine(60, 0.06, 0.1);
        double period = 10e-3;
        SurgeTrainResult train = SurgeTrain.analyse(source, clamp, NETWORK, 298.15, period, 30, SETTINGS);
        Stepped reference = stepped(source, clamp, period, 30);
        assertTrue(train.buildUpConverged());
        // (to 1e-9: the transients behind both states run on different adaptive grids)
        assertTrue(train.startOfLastPulse().totalRiseK() >= reference.startOfLast().totalRiseK() * (1 - 1e-9),
                train.startOfLastPulse() + " vs " + reference.startOfLast());
        // the peaks come from two transients on different adaptive grids, each good to about 1e-4 of the rise
        double rise = reference.last().peakRiseK();
        assertTrue(train.peakJunctionTemperatureK() >= reference.last().peakJunctionTemperatureK() - 2e-4 * rise);
        assertEquals(reference.last().peakJunctionTemperatureK(), train.peakJunctionTemperatureK(), 0.01 * rise);
    }

    @Test
    void periodShorterThanASurgeIsRejected() {
        SurgeSource source = new IdealCurrentSource(CubicExponentialPulse.current8x20(10));
        assertThrows(IllegalArgumentException.class,
                () -> SurgeTrain.analyse(source, new LinearClampLine(40, 0, 0), NETWORK, 298.15, 10e-6, 5, SETTINGS));
    }
}
