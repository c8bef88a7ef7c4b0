package org.tjmargin.surge;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;
import org.junit.jupiter.api.Test;
import org.tjmargin.thermal.FosterFitSettings;
import org.tjmargin.thermal.FosterNetwork;
import org.tjmargin.thermal.FosterPeakSearch;
import org.tjmargin.thermal.FosterPulse;
import org.tjmargin.thermal.SemiInfiniteDie;

class RatingConversionTest {

    private static final IterativeLegendreGaussIntegrator INTEGRATOR = new IterativeLegendreGaussIntegrator(16, 1e-14, 1e-15);

    private static double dawson(double x) {
        return Math.exp(-x * x) * INTEGRATOR.integrate(10_000, s -> Math.exp(s * s), 0, x);
    }

    private static UnivariatePointValuePair maximise(org.apache.commons.math3.analysis.UnivariateFunction f, double lo, double hi) {
        return new BrentOptimizer(1e-12, 1e-14).optimize(new MaxEval(500), new UnivariateObjectiveFunction(f), GoalType.MAXIMIZE,
                new SearchInterval(lo, hi));
    }

    @Test
    void dawsonMaximumMatchesAbramowitzStegunTable75() {
        // A&S Table 7.5: max of F(x) = e^(−x²)∫₀ˣe^(t²)dt is 0.541044 at x = 0.924139 (reference 4.7); computed here
        // by Gauss–Legendre quadrature and Brent maximisation, independent of the production constants
        UnivariatePointValuePair max = maximise(RatingConversionTest::dawson, 0.5, 1.5);
        assertEquals(RatingConversion.DAWSON_MAXIMUM, max.getValue(), 5e-7);
        assertEquals(RatingConversion.DAWSON_MAXIMUM_AT, max.getPoint(), 5e-6);
        assertEquals(RatingConversion.EXPONENTIAL_EQUIVALENT_RECTANGLE_PER_TAU, max.getValue() * max.getValue(), 5e-7);
    }

    @Test
    void equivalentRectangleOfAnExponentialGivesTheSamePeakOnASemiInfiniteDie() {
        // reference 4.7: te = 0.292729·τ = 0.4223·td, peak at 0.8540·τ = 1.232·td. Checked by convolving
        // p = e^(−t/τ) with the die's √t response: ΔT(t) = K∫₀ᵗ p(s)/(2√(t−s)) ds (u = √(t−s) removes the
        // singularity: ΔT = K∫₀^√t e^(−(t−u²)/τ) du), against K·√te for the rectangle
        SemiInfiniteDie die = SemiInfiniteDie.silicon(1e-6);
        double k = die.zthKPerW(1); // Zth = K·√t
        double td = 1e-3;
        FosterPulse exp = FosterPulse.exponentialDecay(td);
        double tau = exp.decayTimeConstantS();
        UnivariatePointValuePair peak = maximise(
                t -> k * INTEGRATOR.integrate(10_000, u -> Math.exp(-(t - u * u) / tau), 0, Math.sqrt(t)), 0.1 * tau, 3 * tau);
        double te = RatingConversion.equivalentRectangleWidthS(exp);
        assertEquals(peak.getValue(), k * Math.sqrt(te), 1e-6 * peak.getValue());
        assertEquals(0.8540 * tau, peak.getPoint(), 0.0005 * tau);
        assertEquals(0.4223 * td, te, 0.00005 * td);
        assertEquals(1.232 * td, peak.getPoint(), 0.0005 * td);
    }

    @Test
    void conversionsNameTheirMethodAndFlagEstimates() {
        FosterPulse rect = FosterPulse.rectangular(1e-3);
        FosterPulse exp = FosterPulse.exponentialDecay(1e-3);
        // equal energy: 1000 W for 1 ms is 1 J; the exponential's energy is P·τ, τ = 1 ms/ln 2 (derived)
        ConvertedRating energy = RatingConversion.byEqualEnergy(rect, 1000, exp);
        assertEquals(1000 * Math.log(2), energy.peakPowerW(), 1e-9);
        assertTrue(energy.estimated());
        // √t: P·√te conserved, te = 0.4223 ms (reference 4.7) → 1000·√(1/0.42230) = 1538.8 W
        ConvertedRating sqrt = RatingConversion.byEquivalentRectangle(rect, 1000, exp);
        assertEquals(1538.8, sqrt.peakPowerW(), 0.1);
        assertEquals(RatingConversion.Method.EQUIVALENT_RECTANGLE_SQRT_T, sqrt.method());
        // through a network that follows the die's √t law closely: near the √t answer
        SemiInfiniteDie die = SemiInfiniteDie.silicon(1e-6);
        FosterNetwork net = die.fosterEstimate(1e-6, 1, 1e4, 6, FosterFitSettings.defaults()).networkOrThrow();
        ConvertedRating viaNet = RatingConversion.throughNetwork(rect, 1000, exp, net, FosterPeakSearch.defaults());
        assertFalse(viaNet.estimated());
        assertEquals(sqrt.peakPowerW(), viaNet.peakPowerW(), 0.03 * sqrt.peakPowerW()); // the estimate's few-% ripple
    }
}
