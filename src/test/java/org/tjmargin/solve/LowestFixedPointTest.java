package org.tjmargin.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.AllowedSolution;
import org.apache.commons.math3.analysis.solvers.PegasusSolver;
import org.junit.jupiter.api.Test;

/**
 * The bracketed stage of {@link LowestFixedPoint} against the Commons Math {@link PegasusSolver} (3.6.1) on the
 * same bracket, tolerances and map: the same root bit for bit, with two evaluations fewer (the library evaluates the
 * bracket's ends again, which the search already has). The Pegasus iteration itself is Dowell and Jarratt's, BIT 12
 * (1972) 503–508.
 */
class LowestFixedPointTest {

    @Test
    void pegasusStageEqualsTheLibrarySolverOnTheSameBracket() {
        long seed = 20261203L;
        Random rnd = new Random(seed);
        SolverSettings settings = SolverSettings.DEFAULT;
        int compared = 0;
        for (int n = 0; n < 2000; n++) {
            // Heat maps F(x) = x − g(x) with one root r in the bracket: g convex or concave, steep or flat, shaped
            // like the heat balance of a part whose dissipation grows or falls with temperature.
            double r = 250 + 400 * rnd.nextDouble();
            double k = (rnd.nextBoolean() ? 1 : -1) * 0.2 * rnd.nextDouble();
            double m = 0.05 + 2 * rnd.nextDouble();
            double q = 0.02 * rnd.nextDouble();
            DoubleUnaryOperator map = switch (n % 3) {
                case 0 -> x -> x - m * (x - r) * (1 + q * (x - r) * (x - r));
                case 1 -> x -> x - m * Math.expm1(k * (x - r)) / (k == 0 ? 1 : Math.signum(k));
                default -> x -> x - m * (x - r) - q * Math.max(0, x - r) * (x - r);
            };
            double lo = r - (0.01 + 30 * rnd.nextDouble());
            double hi = r + (0.01 + 30 * rnd.nextDouble());
            double gLo = lo - map.applyAsDouble(lo);
            double gHi = hi - map.applyAsDouble(hi);
            if (!(gLo < -settings.toleranceK() && gHi > 0)) {
                continue; // not a bracket the search would hand over
            }
            String where = "seed " + seed + " case " + n;
            PegasusSolver library = new PegasusSolver(1e-15, 0.01 * settings.toleranceK(),
                    0.1 * settings.toleranceK());
            double expected = library.solve(settings.maxEvaluations(), x -> x - map.applyAsDouble(x), lo, hi,
                    AllowedSolution.ANY_SIDE);
            FixedPointOutcome.Root root = assertInstanceOf(FixedPointOutcome.Root.class,
                    LowestFixedPoint.pegasus(map, lo, gLo, hi, gHi, 0, settings), where);
            assertEquals(expected, root.x(), where);
            assertEquals(expected - map.applyAsDouble(expected), root.residual(), where);
            assertEquals(library.getEvaluations() - 2, root.evaluations(), where);
            compared++;
        }
        assertTrue(compared > 1500, "brackets compared: " + compared);
    }

    @Test
    void solvedPointIsTheCircuitAtTheRoot() {
        // The solver keeps the circuit state of its last evaluation (the root's, see below) instead of solving the
        // root's point again: the point it returns must be the circuit solved afresh at the returned temperature.
        long seed = 20261204L;
        Random rnd = new Random(seed);
        for (int n = 0; n < 1000; n++) {
            RandomDesigns c = RandomDesigns.draw(rnd);
            double tl = org.tjmargin.device.Celsius.toKelvin(-40 + 140 * rnd.nextDouble());
            ThermalOutcome out = ElectroThermalSolver.solve(c.circuit(), c.diode(), c.path(), tl,
                    SolverSettings.DEFAULT);
            if (out instanceof ThermalOutcome.Converged conv) {
                OperatingPoint p = conv.point();
                assertEquals(c.circuit().at(c.diode(), p.tjK()), p.circuit(), "seed " + seed + " case " + n);
            }
        }
    }

    @Test
    void theRootIsTheLastPointEvaluated() {
        // The contract ElectroThermalSolver and CornerHeat build on: the root is the last point the search
        // evaluated, so the state of that evaluation is the root's. Seeded heat maps of both signs of slope, roots
        // near and far from the start, some at the start itself.
        long seed = 20261205L;
        Random rnd = new Random(seed);
        int roots = 0;
        for (int n = 0; n < 3000; n++) {
            double r = 250 + 400 * rnd.nextDouble();
            double m = 0.05 + 2 * rnd.nextDouble();
            double q = 0.02 * rnd.nextDouble();
            DoubleUnaryOperator shape = n % 2 == 0 ? x -> x - m * (x - r) * (1 + q * (x - r) * (x - r))
                    : x -> x - m * (x - r) - q * Math.max(0, x - r) * (x - r);
            double x0 = r - (n % 10 == 0 ? 0 : 200 * rnd.nextDouble());
            double[] seen = new double[SolverSettings.DEFAULT.maxEvaluations() + 1];
            int[] count = {0};
            DoubleUnaryOperator map = x -> {
                seen[count[0]++] = x;
                return shape.applyAsDouble(x);
            };
            FixedPointOutcome out = LowestFixedPoint.find(map, x0, SolverSettings.DEFAULT);
            if (out instanceof FixedPointOutcome.Root root) {
                String where = "seed " + seed + " case " + n;
                assertEquals(root.x(), seen[count[0] - 1], 0.0, where);
                assertEquals(count[0], root.evaluations(), where);
                roots++;
            }
        }
        assertTrue(roots > 2500, "roots: " + roots);
    }
}
