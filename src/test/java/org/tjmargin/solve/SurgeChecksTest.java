package org.tjmargin.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.tjmargin.derating.Measure;
import org.tjmargin.derating.Policy;
import org.tjmargin.derating.RuleContext;
import org.tjmargin.design.DesignLoader;

/** The corner selection of {@link SurgeChecks} keeps every surge quantity's worst value over all corners. */
class SurgeChecksTest {

    @Test
    void selectedCornersHoldTheWorstSurgeQuantitiesOfAllCorners() {
        Board board = DesignLoader.load(Path.of("demo/design.yaml")).board();
        PreparedBoard prepared = PreparedBoard.of(board);
        int index = 3;
        PositionSpec spec = board.positions().get(index);
        List<PositionInstance> instances = prepared.instances().get(index);
        long seed = 77L;
        Random rnd = new Random(seed);
        for (int k = 0; k < 4; k++) {
            double tLocal = 253.15 + rnd.nextDouble() * 100;
            List<ThermalOutcome> outcomes = new ArrayList<>();
            for (PositionInstance inst : instances) {
                outcomes.add(inst.solve(tLocal, SolverSettings.DEFAULT));
            }
            boolean[] chosen = SurgeChecks.cornersToEvaluate(spec, instances, outcomes);
            double[] all = {Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
            double[] sel = all.clone();
            int count = 0;
            for (int c = 0; c < instances.size(); c++) {
                OperatingPoint p = ((ThermalOutcome.Converged) outcomes.get(c)).point();
                RuleContext ctx = Measurements.of(spec, instances.get(c), p, 1, 0, SurgeChecks.at(spec, instances.get(c), p));
                double[] v = {ctx.value(Measure.SURGE_JUNCTION_TEMPERATURE).getAsDouble(),
                    ctx.value(Measure.SURGE_POWER_RATIO).getAsDouble(), ctx.value(Measure.CLAMP_VOLTAGE_RATIO).getAsDouble()};
                for (int m = 0; m < 3; m++) {
                    all[m] = Math.max(all[m], v[m]);
                    if (chosen[c]) {
                        sel[m] = Math.max(sel[m], v[m]);
                    }
                }
                count += chosen[c] ? 1 : 0;
            }
            int kk = k;
            // D4 varies its breakdown voltage (two clamp lines) with a positive coefficient: two corners of eight.
            assertEquals(2, count, () -> "seed " + seed + ", case " + kk);
            // Corners that differ only in line voltage start within micro-kelvin of each other, where the adaptive
            // transient's own error (tolerance 1e-3 of the local value) exceeds the physical difference: equal to 1e-6.
            for (int m = 0; m < 3; m++) {
                assertEquals(all[m], sel[m], 1e-6 * all[m], "seed " + seed + ", case " + k + ", measure " + m);
            }
        }
    }

    @Test
    void aNegativeCoefficientAlsoRunsTheColdestCornerOfEachLine() {
        // With αV < 0 the clamp voltage is highest at the coldest start (design 2.1): that corner joins the hottest.
        Board board = DesignLoader.load(Path.of("demo/design.yaml")).board();
        PositionSpec d4 = board.positions().get(3);
        PositionSpec negative = new PositionSpec(d4.id(), d4.part(), d4.path(), d4.circuit(), d4.vzShiftV(), d4.rThetaFactor(),
                org.tjmargin.variation.Range.exact(-0.01), d4.notes(), d4.surges());
        List<PositionInstance> instances = negative.corners().stream().map(negative::at).toList();
        List<ThermalOutcome> outcomes = instances.stream().map(i -> i.solve(330, SolverSettings.DEFAULT)).toList();
        boolean[] chosen = SurgeChecks.cornersToEvaluate(negative, instances, outcomes);
        double all = 0;
        double sel = 0;
        int count = 0;
        for (int c = 0; c < instances.size(); c++) {
            OperatingPoint p = ((ThermalOutcome.Converged) outcomes.get(c)).point();
            double v = SurgeChecks.at(negative, instances.get(c), p).stream().mapToDouble(r -> r.peakClampVoltageV()).max()
                    .orElseThrow();
            all = Math.max(all, v);
            if (chosen[c]) {
                sel = Math.max(sel, v);
                count++;
            }
        }
        assertEquals(4, count);
        assertEquals(all, sel, 1e-6 * all);
    }

    @Test
    void positionsWithoutSurgesRunNone() {
        Board board = DesignLoader.load(Path.of("demo/design.yaml")).board();
        PositionAtAmbient d3 = BoardSolver.evaluate(board.positions().get(2), PreparedBoard.of(board).instances().get(2),
                Policy.builtInMinimum(), 328.15, 330, SolverSettings.DEFAULT, CornersKept.EVERY);
        assertTrue(d3.corners().stream().allMatch(c -> c.surges().isEmpty()));
        assertTrue(d3.worst().stream().noneMatch(w -> w.check().measure().isSurge()));
    }
}
