package org.tjmargin.surge;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class WaveformTimingTest {

    private static final int SAMPLES = 1_000_000;

    /** T1 and T2 within 1 % of nominal, measured independently (reference 4.1 definitions; the brief's 1 %). */
    private static void assertTiming(Waveform w, double t1, double t2, boolean current) {
        SampledTiming.Timing m = SampledTiming.measure(w, 3 * t2, SAMPLES, current);
        assertEquals(t1, m.frontTimeS(), 0.01 * t1, "T1 of " + w);
        assertEquals(t2, m.timeToHalfS(), 0.01 * t2, "T2 of " + w);
    }

    @Test
    void measurementReproducesTheReferenceClosedFormTiming() {
        // reference 4.2: 1.037·Vp(1 − e^(−t/0.4074 µs))e^(−t/68.22 µs) → T1 = 1.202 µs, T2 = 50.00 µs, peak
        // 0.99976 at 2.09 µs (derived there); this checks the measuring helper itself against printed digits
        Waveform closedForm = new Waveform() {
            @Override
            public SurgeQuantity quantity() {
                return SurgeQuantity.VOLTAGE;
            }

            @Override
            public double valueAt(double t) {
                return 1.037 * (1 - Math.exp(-t / 0.4074e-6)) * Math.exp(-t / 68.22e-6);
            }

            @Override
            public double[] breakpointsS() {
                return new double[] {0};
            }

            @Override
            public java.util.List<Front> fronts() {
                return java.util.List.of();
            }

            @Override
            public double durationS() {
                return 1e-3;
            }
        };
        SampledTiming.Timing m = SampledTiming.measure(closedForm, 150e-6, SAMPLES, false);
        assertEquals(1.202e-6, m.frontTimeS(), 0.0005e-6);
        assertEquals(50.00e-6, m.timeToHalfS(), 0.005e-6);
        assertEquals(0.99976, m.peak(), 0.000005);
        assertEquals(2.09e-6, m.peakTimeS(), 0.005e-6);
    }

    @Test
    void presetsMeetTheirNominalTimings() {
        assertTiming(DoubleExponentialPulse.current10x1000(1), 10e-6, 1000e-6, true);   // reference 4.3
        assertTiming(DoubleExponentialPulse.current5x320(1), 5e-6, 320e-6, true);      // reference 4.3
        assertTiming(DoubleExponentialPulse.voltage1p2x50(1), 1.2e-6, 50e-6, false);   // reference 4.2
        assertTiming(DoubleExponentialPulse.voltage10x700(1), 10e-6, 700e-6, false);   // reference 4.3
        assertTiming(CubicExponentialPulse.current8x20(1), 8e-6, 20e-6, true);         // reference 4.2
    }

    @Test
    void presetsPeakAtTheRequestedValue() {
        SampledTiming.Timing m = SampledTiming.measure(DoubleExponentialPulse.current10x1000(250), 3e-3, SAMPLES, true);
        assertEquals(250, m.peak(), 1e-9 * 250);
        assertEquals(123.0, CubicExponentialPulse.current8x20(123).valueAt(3 * CubicExponentialPulse.EIGHT_TWENTY_TAU_S), 1e-12);
    }

    @Test
    void cubicExponentialTimingMatchesReference42() {
        // reference 4.2 (derived there): peak at 11.73 µs, T1 = 8.02 µs, T2 = 19.94 µs
        SampledTiming.Timing m = SampledTiming.measure(CubicExponentialPulse.current8x20(1), 60e-6, SAMPLES, true);
        assertEquals(11.73e-6, m.peakTimeS(), 0.005e-6);
        assertEquals(8.02e-6, m.frontTimeS(), 0.005e-6);
        assertEquals(19.94e-6, m.timeToHalfS(), 0.005e-6);
    }

    @Test
    void tenThousandParametersMatchReference43() {
        // reference 4.3 (derived there): α = 7.124e-4 /µs, β = 0.26203 /µs, k = 1.01901, peak at 22.6 µs
        DoubleExponentialPulse p = DoubleExponentialPulse.current10x1000(1);
        assertEquals(7.124e-4, 1e-6 / p.tau1S(), 0.0005e-4);
        assertEquals(0.26203, 1e-6 / p.tau2S(), 0.000005);
        assertEquals(1.01901, p.amplitude(), 0.000005);
        assertEquals(22.6e-6, p.peakTimeS(), 0.05e-6);
    }

    @Test
    void combinationVoltageAgreesWithTheReferenceClosedForm() {
        // reference 4.2's closed form is the same double exponential family: τ1 = 68.22 µs,
        // τ2 = 1/(1/0.4074 + 1/68.22) µs = 0.40498 µs, a = 1.037; our fit to exactly 1.2/50 (the closed form
        // gives T1 = 1.202) differs by the 0.2 % that moves T1 by 0.002 µs
        DoubleExponentialPulse p = CombinationWaveGenerator.of(1, CombinationWaveGenerator.Coupling.POWER_LINE_TO_LINE)
                .openCircuitVoltage();
        assertEquals(68.22e-6, p.tau1S(), 0.001 * 68.22e-6);
        assertEquals(0.40498e-6, p.tau2S(), 0.005 * 0.40498e-6);
        assertEquals(1.037, p.amplitude(), 0.001 * 1.037);
    }

    @Test
    void eightTwentyCannotBeADoubleExponential() {
        // reference 4.2: under the 4.1 definitions a double exponential reaches T1/T2 ≈ 0.263 at most
        PulseTimingException e = assertThrows(PulseTimingException.class,
                () -> DoubleExponentialPulse.fromTimings(8e-6, 20e-6, 1, SurgeQuantity.CURRENT, TimingSolveBudget.defaults()));
        assertEquals(PulseTimingException.Kind.UNREACHABLE_RATIO, e.kind());
        assertEquals(8e-6, e.frontTimeS());
        assertEquals(20e-6, e.timeToHalfS());
        assertEquals(0.263, e.highestReachableRatio(), 0.0005);
        assertTrue(e.getMessage().contains("8.00000e-06") && e.getMessage().contains("2.00000e-05"), e.getMessage());
    }

    @Test
    void exhaustedTimingBudgetIsTyped() {
        PulseTimingException e = assertThrows(PulseTimingException.class,
                () -> DoubleExponentialPulse.fromTimings(10e-6, 1000e-6, 1, SurgeQuantity.CURRENT, new TimingSolveBudget(2, 1e-13)));
        assertEquals(PulseTimingException.Kind.NOT_CONVERGED, e.kind());
    }
}
