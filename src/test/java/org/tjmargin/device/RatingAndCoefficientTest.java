package org.tjmargin.device;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Device ratings, temperature coefficients and leakage against published conventions. */
class RatingAndCoefficientTest {

    @Test
    void oneWattAxialCurveReachesZeroAt200CAndImplies150KPerW() {
        // 1 W to 50 °C lead temperature (3/8 in), 6.67 mW/K: zero at 200 °C, 150 K/W; P(100 °C) = 0.6667 W,
        // P(150 °C) = 0.3333 W (generic 1 W axial datasheet convention, reference.md 2.6; Malvino and Bates, 7th ed.,
        // ch. 5 exercise). The printed slope 6.67 mW/K is 2/300 W/K rounded; the tolerance covers the rounding.
        PowerRatingCurve c = PowerRatingCurve.fromSlope(RatingReference.LEAD, 9.5e-3, 1.0, Celsius.toKelvin(50),
                6.67e-3);
        assertEquals(200.0, Celsius.toCelsius(c.zeroPowerTemperatureK()), 0.1);
        assertEquals(150.0, c.impliedResistanceKPerW(), 0.1);
        assertEquals(0.6667, c.allowedPowerAt(Celsius.toKelvin(100)), 5e-4);
        assertEquals(0.3333, c.allowedPowerAt(Celsius.toKelvin(150)), 5e-4);
        assertEquals(1.0, c.allowedPowerAt(Celsius.toKelvin(25)), 0.0);
        assertEquals(0.0, c.allowedPowerAt(Celsius.toKelvin(210)), 0.0);
    }

    @Test
    void halfWattGlassCurveIsConsistent() {
        // 500 mW to 75 °C, 4.0 mW/K, Tj max 200 °C: 0.5/125 = 4.0 mW/K (reference.md 2.6, generic series).
        PowerRatingCurve c = PowerRatingCurve.flatThenLinear(RatingReference.LEAD, 9.5e-3, 0.5, Celsius.toKelvin(75),
                Celsius.toKelvin(200));
        assertEquals(250.0, c.impliedResistanceKPerW(), 1e-9);
        assertEquals(0.5 - 4.0e-3 * 25, c.allowedPowerAt(Celsius.toKelvin(100)), 1e-12);
    }

    @Test
    void floydDeratingExample() {
        // 400 mW at 50 °C, 3.2 mW/K → 272 mW at 90 °C (T. L. Floyd, Electronic Devices, ch. 3 example; edition
        // unverified, from memory, verify).
        PowerRatingCurve c = PowerRatingCurve.fromSlope(RatingReference.LEAD, 0, 0.4, Celsius.toKelvin(50), 3.2e-3);
        assertEquals(0.272, c.allowedPowerAt(Celsius.toKelvin(90)), 1e-12);
    }

    @Test
    void relativeCoefficientConvertsToVoltsPerKelvin() {
        // mV/K = (%/K)·Vz·10 (reference.md 1.4): 10 V at 0.075 %/K → 7.5 mV/K; 24 V at 0.088 → 21.1; 51 V at
        // 0.096 → 49.0 (typical values of a generic 500 mW series, reference.md 1.4).
        assertEquals(7.5e-3, TemperatureCoefficient.voltsPerKelvin(0.075e-2, 10), 1e-12);
        assertEquals(21.1e-3, TemperatureCoefficient.voltsPerKelvin(0.088e-2, 24), 0.05e-3);
        assertEquals(49.0e-3, TemperatureCoefficient.voltsPerKelvin(0.096e-2, 51), 0.05e-3);
    }

    @Test
    void estimateFollowsSignOfTheMechanism() {
        // Negative below about 5 V (tunnelling), about zero near 5–6 V, positive above (avalanche): Walters and Clark,
        // application-note series no. 203 (reference.md 1.4).
        TemperatureCoefficient low = TemperatureCoefficientEstimate.forNominalVoltage(3.3);
        TemperatureCoefficient mid = TemperatureCoefficientEstimate.forNominalVoltage(5.1);
        TemperatureCoefficient high = TemperatureCoefficientEstimate.forNominalVoltage(12);
        assertTrue(low.maxAlphaVPerK() < 0 && low.estimated());
        assertEquals(0.0, mid.alphaVPerK(), 1e-12);
        assertTrue(high.minAlphaVPerK() > 0);
        // The typical 12 V value of the generic series, 0.077 %/K, lies within the estimate's range (1.4).
        double typical = 0.077e-2 * 12;
        assertTrue(high.minAlphaVPerK() <= typical && typical <= high.maxAlphaVPerK());
    }

    @Test
    void leakageDoublesEveryTenKelvin() {
        // Rule of thumb: Ir doubles per 10 K → ×1024 from 25 to 125 °C (reference.md 1.5, common practice).
        Leakage l = new Leakage(1e-6, 5, Leakage.DEFAULT_DOUBLING_K);
        assertEquals(1e-6, l.currentAtTestVoltageA(Celsius.T25_K), 1e-18);
        assertEquals(2e-6, l.currentAtTestVoltageA(Celsius.toKelvin(35)), 1e-18);
        assertEquals(1024e-6, l.currentAtTestVoltageA(Celsius.toKelvin(125)), 1e-15);
    }

    @Test
    void equilibriumTestBacksOutSelfHeating() {
        // Vz measured at equilibrium with the leads held at 25 °C at 9.5 mm: the junction ran hotter by
        // Vz·Izt·Rθjl (Walters and Clark, note no. 204, reference.md 1.6). 10 V, 25 mA, 150 K/W → +37.5 K; with
        // +7.5 mV/K the intercept at 25 °C is 0.28 V below the naive value.
        TemperatureCoefficient tc = TemperatureCoefficient.exact(7.5e-3);
        BreakdownDiode eq = BreakdownDiode.fromDatasheet(10, 25e-3, 7, 0.25e-3, Double.NaN, tc,
                new VzTestCondition.ThermalEquilibrium(Celsius.T25_K, 150), Leakage.NONE);
        BreakdownDiode pulsed = BreakdownDiode.fromDatasheet(10, 25e-3, 7, 0.25e-3, Double.NaN, tc,
                new VzTestCondition.Pulsed(Celsius.T25_K), Leakage.NONE);
        assertEquals(-7.5e-3 * 37.5, eq.vz0At25V() - pulsed.vz0At25V(), 1e-12);
        // At the equilibrium temperature the model gives back the datasheet's Vz.
        assertEquals(10.0, eq.breakdownVoltageV(25e-3, Celsius.T25_K + 37.5), 1e-12);
    }

    @Test
    void kneeBelowTestImpedanceIsRejected() {
        assertThrows(IllegalArgumentException.class,
                () -> KneeModel.CurrentDependent.through(20, 5e-3, 10, 0.25e-3));
    }

    @Test
    void currentDependentKneeMeetsBothImpedances() {
        // Zz(I) = a/I + b through Zzt at Izt and Zzk at Izk (construction); the 1/I law itself is K. Walters,
        // application-note series no. 202 (reference.md 1.2).
        KneeModel.CurrentDependent k = KneeModel.CurrentDependent.through(10, 20e-3, 600, 1e-3);
        assertEquals(10, k.aVolts() / 20e-3 + k.bOhm(), 1e-9);
        assertEquals(600, k.aVolts() / 1e-3 + k.bOhm(), 1e-9);
        BreakdownDiode d = new BreakdownDiode(6, 10, 20e-3, 1e-3, k, TemperatureCoefficient.exact(0), Leakage.NONE);
        double h = 1e-7;
        double slope = (d.breakdownVoltageV(1e-3 + h, Celsius.T25_K) - d.breakdownVoltageV(1e-3 - h, Celsius.T25_K))
                / (2 * h);
        assertEquals(600, slope, 0.01);
    }

    @Test
    void logarithmicKneeMatchesApplicationNoteForm() {
        // With Zzk chosen so that b = 0, Zz = Zzt·Izt/I and ΔVz = Zzt·Izt·ln(I/Izt): Izt 20 mA, Zzt 10 Ω, 10 mA →
        // −0.1386 V (reference.md 1.2 gives +0.1386 V for 40 mA, the same law above Izt).
        KneeModel.CurrentDependent k = KneeModel.CurrentDependent.through(10, 20e-3, 10 * 20e-3 / 1e-3, 1e-3);
        assertEquals(0.0, k.bOhm(), 1e-12);
        BreakdownDiode d = new BreakdownDiode(6, 10, 20e-3, 1e-3, k, TemperatureCoefficient.exact(0), Leakage.NONE);
        double drop = d.breakdownVoltageV(10e-3, Celsius.T25_K) - d.breakdownVoltageV(20e-3, Celsius.T25_K);
        assertEquals(-0.2 * Math.log(2), drop, 1e-12);
    }
}
