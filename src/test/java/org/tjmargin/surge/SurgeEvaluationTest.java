package org.tjmargin.surge;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.tjmargin.thermal.FosterNetwork;
import org.tjmargin.thermal.FosterPeakSearch;
import org.tjmargin.thermal.FosterPulse;
import org.tjmargin.thermal.SemiInfiniteDie;

/** Surge rating, derating and evaluation from a start temperature, against closed forms and reference values. */
class SurgeEvaluationTest {

    private static final double T25 = 298.15;
    private static final FosterNetwork ONE_STAGE = FosterNetwork.of(new double[] {2.0}, new double[] {1e-3});

    private static SurgeRating rating(FosterNetwork network, SurgeRating.NetworkSource source) {
        return new SurgeRating(5000, FosterPulse.exponentialDecay(1e-3), 48, 104, T25 + 150, network, source, List.of());
    }

    @Test
    void pulseRatingDeratesLinearlyToZeroAtTjMax() {
        // Reference 4.6 (TVS pulse-derating curves, sourced): 175 °C part, (175 − Tj)/150: 100 °C → 0.500, 125 °C → 0.333.
        SurgeRating r = rating(ONE_STAGE, SurgeRating.NetworkSource.GIVEN_FOSTER);
        assertEquals(0.5, r.deratingFactor(T25 + 75), 1e-12);
        assertEquals(1.0 / 3.0, r.deratingFactor(T25 + 100), 1e-12);
        assertEquals(1.0, r.deratingFactor(T25), 1e-12);
        // Held at 100 % below 25 °C and at zero above Tj max (common practice).
        assertEquals(1.0, r.deratingFactor(T25 - 45), 0.0);
        assertEquals(0.0, r.deratingFactor(T25 + 200), 0.0);
    }

    @Test
    void dynamicResistanceComesFromTheClampingVoltage() {
        // Design 2.1: Rd = (Vc − Vbr)/Ipp.
        SurgeRating r = rating(ONE_STAGE, SurgeRating.NetworkSource.GIVEN_FOSTER);
        assertEquals((48 - 29.5) / 104, r.dynamicResistanceOhm(29.5), 1e-15);
        assertThrows(IllegalArgumentException.class, () -> r.dynamicResistanceOhm(48));
    }

    @Test
    void dieAreaMakesTheRatingPulseReachTjMaxOnTheSemiInfiniteDie() {
        // Carslaw and Jaeger §2.9 (reference 3.4): surface rise 2q√(t/(π kρc)) over the equivalent rectangle te.
        FosterPulse pulse = FosterPulse.exponentialDecay(1e-3);
        double eff = SemiInfiniteDie.silicon(1.0).effusivity();
        double area = SurgeRating.dieAreaForRatingM2(5000, pulse, T25 + 150, eff);
        double te = RatingConversion.equivalentRectangleWidthS(pulse);
        assertEquals(150.0, SemiInfiniteDie.silicon(area).surfaceRiseK(5000 / area, te), 1e-9);
    }

    @Test
    void rectangularCurrentThroughOneFosterStageRisesAsTheStepResponse() {
        // Closed form (reference 3.1): a constant power P for w through one stage rises P·R·(1 − e^(−w/τ)).
        double current = 10;
        double width = 0.5e-3;
        LinearClampLine line = new LinearClampLine(30, 0, 0.2);
        SurgeCase c = SurgeCase.single("rect", null, new IdealCurrentSource(new RectangularPulse(current, width,
                SurgeQuantity.CURRENT)), OptionalDouble.of(40));
        SurgeRating r = rating(ONE_STAGE, SurgeRating.NetworkSource.GIVEN_FOSTER);
        double start = 330;
        SurgeResult s = SurgeEvaluation.evaluate(c, r, line, start, TransientSettings.defaults(), FosterPeakSearch.defaults());
        double p = (30 + 0.2 * current) * current;
        assertEquals(start, s.startTjK(), 0.0);
        assertEquals(start + p * 2.0 * -Math.expm1(-width / 1e-3), s.peakJunctionTemperatureK(), 1e-6);
        assertEquals(p, s.peakPowerW(), 1e-9);
        assertEquals(32.0 / 40.0, s.clampVoltageRatio().getAsDouble(), 1e-12);
        // The rating goes to the applied pulse (exponential of equal peak and energy) through the network.
        assertEquals(RatingConversion.Method.FOSTER_NETWORK, s.rating().method());
        assertFalse(s.estimated());
        FosterPulse applied = FosterPulse.exponentialDecay(Math.log(2) * width);
        double converted = 5000 * FosterPulse.exponentialDecay(1e-3).peakRiseKPerW(ONE_STAGE, FosterPeakSearch.defaults()).riseK()
                / applied.peakRiseKPerW(ONE_STAGE, FosterPeakSearch.defaults()).riseK();
        assertEquals(converted, s.rating().peakPowerW(), 1e-6 * converted);
        double factor = (T25 + 150 - start) / 150;
        assertEquals(p / (converted * factor), s.powerRatio(), 1e-6 * s.powerRatio());
    }

    @Test
    void combinationWavePeakCurrentMatchesTheOpenCircuitEstimate() {
        // Reference 4.2 (derived): Ipk ≈ (Voc − Vc)/Zs: 1 kV, 2 Ω, 40 V → 480 A. An ideal 40 V clamp (Rd = 0, αV = 0)
        // conducts the generator's peak exactly at the open-circuit peak; the sampled peak is within 0.1 %.
        SurgeCase c = SurgeCase.single("cwg", null, CombinationWaveGenerator.of(1000, CombinationWaveGenerator.Coupling.POWER_LINE_TO_LINE)
                .source(), OptionalDouble.empty());
        SurgeResult s = SurgeEvaluation.evaluate(c, rating(ONE_STAGE, SurgeRating.NetworkSource.GIVEN_FOSTER),
                new LinearClampLine(40, 0, 0), 330, TransientSettings.defaults(), FosterPeakSearch.defaults());
        assertEquals(480, s.peakCurrentA(), 0.48);
        assertTrue(s.clampVoltageRatio().isEmpty());
    }

    @Test
    void loadDumpEnergyMatchesTheIdealClampClosedForm() {
        // Reference 4.4 (common practice model): v = UA + Us·e^(−t/τ) behind Ri on an ideal clamp Vc conducts until
        // t0 = τ·ln(Us/(Vc − UA)) and takes E = (Vc/Ri)·[(UA − Vc)·t0 + Us·τ·(1 − e^(−t0/τ))].
        double ua = 14;
        double us = 79;
        double ri = 4;
        double vc = 33;
        LoadDumpPulse pulse = LoadDumpPulse.testA(LoadDumpSystem.TWELVE_VOLT, us, ri, 0.040).withRiseTime(0);
        double tau = pulse.decayTimeConstantS();
        double t0 = tau * Math.log(us / (vc - ua));
        double expected = (vc / ri) * ((ua - vc) * t0 + us * tau * -Math.expm1(-t0 / tau));
        SurgeCase c = SurgeCase.single("dump", null, pulse.source(), OptionalDouble.empty());
        SurgeResult s = SurgeEvaluation.evaluate(c, rating(ONE_STAGE, SurgeRating.NetworkSource.GIVEN_FOSTER),
                new LinearClampLine(vc, 0, 0), 330, TransientSettings.defaults(), FosterPeakSearch.defaults());
        assertEquals(expected, s.energyJ(), 1e-3 * expected);
    }

    @Test
    void aStartAtThePulseTjMaxLeavesNoRating() {
        SurgeCase c = SurgeCase.single("rect", null, new IdealCurrentSource(new RectangularPulse(10, 1e-4,
                SurgeQuantity.CURRENT)), OptionalDouble.empty());
        SurgeResult s = SurgeEvaluation.evaluate(c, rating(ONE_STAGE, SurgeRating.NetworkSource.GIVEN_FOSTER),
                new LinearClampLine(30, 0, 0.2), T25 + 150, TransientSettings.defaults(), FosterPeakSearch.defaults());
        assertEquals(0.0, s.allowedPeakPowerW(), 0.0);
        assertEquals(SurgeResult.RATIO_AT_ZERO_RATING, s.powerRatio(), 0.0);
    }

    @Test
    void theDieEstimateConvertsByTheEquivalentRectangleAndSaysSo() {
        SurgeCase c = SurgeCase.single("rect", null, new IdealCurrentSource(new RectangularPulse(10, 1e-4,
                SurgeQuantity.CURRENT)), OptionalDouble.empty());
        SurgeResult s = SurgeEvaluation.evaluate(c, rating(ONE_STAGE, SurgeRating.NetworkSource.SEMI_INFINITE_DIE_ESTIMATE),
                new LinearClampLine(30, 0, 0.2), 330, TransientSettings.defaults(), FosterPeakSearch.defaults());
        assertEquals(RatingConversion.Method.EQUIVALENT_RECTANGLE_SQRT_T, s.rating().method());
        assertTrue(s.estimated());
    }

    @Test
    void aTrainOfPulsesIsNeverCoolerThanItsFirst() {
        // Seeded loop (seed printed on failure): periods from 2 to 50 ms against a 1 ms stage.
        long seed = 20261202L;
        java.util.Random rnd = new java.util.Random(seed);
        for (int k = 0; k < 10; k++) {
            double period = 2e-3 + rnd.nextDouble() * 48e-3;
            SurgeCase one = SurgeCase.single("one", null, new IdealCurrentSource(new RectangularPulse(10, 1e-3,
                    SurgeQuantity.CURRENT)), OptionalDouble.empty());
            SurgeCase train = new SurgeCase("train", null, one.source(), 5, period, OptionalDouble.empty());
            SurgeRating r = rating(ONE_STAGE, SurgeRating.NetworkSource.GIVEN_FOSTER);
            LinearClampLine line = new LinearClampLine(30, 0.03, 0.2);
            double a = SurgeEvaluation.evaluate(one, r, line, 330, TransientSettings.defaults(), FosterPeakSearch.defaults())
                    .peakJunctionTemperatureK();
            double b = SurgeEvaluation.evaluate(train, r, line, 330, TransientSettings.defaults(), FosterPeakSearch.defaults())
                    .peakJunctionTemperatureK();
            int kk = k;
            assertTrue(b >= a - 1e-9, () -> "seed " + seed + ", case " + kk + ": train " + b + " K below one pulse " + a + " K");
        }
    }
}
