package org.tjmargin.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.tjmargin.circuit.Load;
import org.tjmargin.circuit.ShuntRegulator;
import org.tjmargin.circuit.StandoffClamp;
import org.tjmargin.device.BreakdownDiode;
import org.tjmargin.device.Celsius;
import org.tjmargin.device.KneeModel;
import org.tjmargin.device.Leakage;
import org.tjmargin.device.TemperatureCoefficient;
import org.tjmargin.thermal.GivenPath;

/**
 * The coupled solver against closed forms derived in {@code src/test/resources/reference/electrothermal/README.md}.
 */
class ElectroThermalSolverTest {

    private static final double T25 = Celsius.T25_K;

    private static BreakdownDiode lineDiode(double vz0, double rz, double alpha) {
        return new BreakdownDiode(vz0, rz, 5e-3, 0.1e-3, new KneeModel.Linear(), TemperatureCoefficient.exact(alpha),
                Leakage.NONE);
    }

    @Test
    void shuntRegulatorMatchesQuadraticClosedForm() {
        long seed = 20261201L;
        Random rnd = new Random(seed);
        for (int n = 0; n < 2000; n++) {
            double vz0 = 3 + 40 * rnd.nextDouble();
            double rz = 0.5 + 30 * rnd.nextDouble();
            double alpha = (rnd.nextDouble() * 2 - 0.6) * 1e-3 * vz0;
            double rs = 20 + 2000 * rnd.nextDouble();
            double vs = vz0 * (1.3 + rnd.nextDouble());
            double il = rnd.nextDouble() * 0.3 * (vs - vz0) / rs;
            double rth = 20 + 400 * rnd.nextDouble();
            double tl = Celsius.toKelvin(-40 + 120 * rnd.nextDouble());
            double s = rs + rz;
            double a0 = vs - il * rs - vz0;
            double c0 = vz0 + rz * a0 / s;
            double c1 = alpha * rs / s;
            double d0 = a0 / s;
            double d1 = -alpha / s;
            double p0 = c0 * d0;
            double p1 = c0 * d1 + c1 * d0;
            double p2 = c1 * d1;
            double a = -rth * p2;
            double b = 1 - rth * p1;
            double c = -((tl - T25) + rth * p0);
            if (b <= 0 || b * b - 4 * a * c < 0) {
                continue; // loop gain ≥ 1 at the origin: not the stable linear case this closed form covers
            }
            double u = -2 * c / (b + Math.sqrt(b * b - 4 * a * c));
            double izAtRoot = d0 + d1 * u;
            if (izAtRoot < 0.2e-3) {
                continue; // left the breakdown line: the closed form no longer applies
            }
            if (T25 + u > SolverSettings.DEFAULT.capK()) {
                continue; // beyond the search cap, reported as runaway by design
            }
            ThermalOutcome out = ElectroThermalSolver.solve(new ShuntRegulator(vs, rs, new Load.Current(il)),
                    lineDiode(vz0, rz, alpha), new GivenPath(rth, rth, List.of()), tl, SolverSettings.DEFAULT);
            OperatingPoint p = assertInstanceOf(ThermalOutcome.Converged.class, out, "seed " + seed + " case " + n)
                    .point();
            // Tolerance 1e-8 K: the solver's 1e-10 K tolerance plus the closed form's own rounding near 300 K.
            assertEquals(T25 + u, p.tjK(), 1e-8, "seed " + seed + " case " + n);
            // Cost: one evaluation per capped upward step to the root, then a handful of secant/Pegasus steps and
            // the two of the loop gain.
            int cap = (int) Math.ceil((p.tjK() - tl) / SolverSettings.DEFAULT.maxStepK()) + 14;
            assertTrue(p.evaluations() <= cap, "evaluations " + p.evaluations() + " > " + cap + ", seed " + seed
                    + " case " + n);
        }
    }

    @Test
    void currentFreeIsothermalCaseIsLinear() {
        // αV = 0: Tj = T_local + Rθ·P with P independent of Tj (design 2.3; reduces the closed form to linear).
        ShuntRegulator r = new ShuntRegulator(10, 500, new Load.Current(0));
        BreakdownDiode d = lineDiode(6.7, 20, 0);
        ThermalOutcome out = ElectroThermalSolver.solve(r, d, new GivenPath(300, 300, List.of()), T25,
                SolverSettings.DEFAULT);
        double iz = 3.3 / 520;
        double p = (6.7 + 20 * iz) * iz;
        assertEquals(T25 + 300 * p, ((ThermalOutcome.Converged) out).point().tjK(), 1e-9);
    }

    /** Principal (branch 0) or lower (branch −1) real Lambert W of z in (−1/e, 0), by Halley's iteration. */
    static double lambertW(double z, boolean lowerBranch) {
        double w = lowerBranch ? -2.0 : -0.5;
        for (int i = 0; i < 100; i++) {
            double e = Math.exp(w);
            double f = w * e - z;
            double next = w - f / (e * (w + 1) - (w + 2) * f / (2 * w + 2));
            if (Math.abs(next - w) < 1e-15 * Math.max(1, Math.abs(w))) {
                return next;
            }
            w = next;
        }
        return w;
    }

    private static BreakdownDiode leakyClamp(double irA) {
        // 33 V clamp, leakage specified at 30 V; the line below 30 V stays on the ohmic leakage segment.
        return new BreakdownDiode(33.0, 1.0, 1e-3, 0.5e-3, new KneeModel.Linear(), TemperatureCoefficient.exact(0),
                new Leakage(irA, 30.0, 10.0));
    }

    @Test
    void leakageCaseReturnsLowerOfTwoRoots() {
        double v = 24.0;
        double ir = 50e-6;
        double rth = 300;
        double tl = Celsius.toKelvin(60);
        double lambda = Math.log(2) / 10.0;
        double k = rth * v * v * ir / 30.0 * Math.exp(lambda * (tl - T25));
        assertTrue(lambda * k < 1 / Math.E, "case must have two roots");
        double yLow = -lambertW(-lambda * k, false) / lambda;
        double yHigh = -lambertW(-lambda * k, true) / lambda;
        assertTrue(yHigh > yLow + 10);
        ThermalOutcome out = ElectroThermalSolver.solve(new StandoffClamp(v, 0), leakyClamp(ir),
                new GivenPath(rth, rth, List.of()), tl, SolverSettings.DEFAULT);
        OperatingPoint p = assertInstanceOf(ThermalOutcome.Converged.class, out).point();
        assertEquals(tl + yLow, p.tjK(), 1e-8);
        assertTrue(p.loopGain() < 1, "lower root is stable, loop gain " + p.loopGain());
        // At the lower root of y = K·e^(λy) the loop gain is λ·y (derivative of the right side equals λ·K·e^(λy)).
        assertEquals(lambda * yLow, p.loopGain(), 1e-5);
    }

    @Test
    void leakageBeyondTangencyRunsAway() {
        double v = 24.0;
        double ir = 2e-3; // λ·K0 = 0.0693 · 300 · 24² · 2e-3 / 30 = 0.80, above 1/e already at 25 °C
        ThermalOutcome out = ElectroThermalSolver.solve(new StandoffClamp(v, 0), leakyClamp(ir),
                new GivenPath(300, 300, List.of()), T25, SolverSettings.DEFAULT);
        assertInstanceOf(ThermalOutcome.Runaway.class, out);
    }

    @Test
    void runawayOnsetMatchesLambertTangency() {
        double v = 24.0;
        double ir = 20e-6;
        double rth = 300;
        double lambda = Math.log(2) / 10.0;
        double k0 = rth * v * v * ir / 30.0;
        double onsetK = T25 + Math.log(1 / (Math.E * lambda * k0)) / lambda;
        ThermalOutcome below = ElectroThermalSolver.solve(new StandoffClamp(v, 0), leakyClamp(ir),
                new GivenPath(rth, rth, List.of()), onsetK - 0.05, SolverSettings.DEFAULT);
        ThermalOutcome above = ElectroThermalSolver.solve(new StandoffClamp(v, 0), leakyClamp(ir),
                new GivenPath(rth, rth, List.of()), onsetK + 0.05, SolverSettings.DEFAULT);
        assertInstanceOf(ThermalOutcome.Converged.class, below);
        assertInstanceOf(ThermalOutcome.Runaway.class, above);
    }
}
