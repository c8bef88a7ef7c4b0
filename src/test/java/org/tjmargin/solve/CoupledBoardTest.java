package org.tjmargin.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import java.util.concurrent.ForkJoinPool;
import org.junit.jupiter.api.Test;
import org.tjmargin.thermal.Enclosure;

/**
 * The linear-cost board analysis (continuation sweep, searches on the shared air map) against the reference that
 * solves the whole board's air balance afresh at every ambient it looks at ({@link BoardSolver#solveAt},
 * {@link MaximumAmbientSearch#find(PreparedBoard, org.tjmargin.derating.Policy, int, List, SolverSettings)},
 * {@link RunawayOnset#find(PreparedBoard, org.tjmargin.derating.Policy, int, List, SolverSettings)}), over seeded
 * random coupled boards. The reference is the definition of design 2.2 (the lowest fixed point of the rise), so these
 * are checks against the physics' own statement, with the tolerances the methods state.
 */
class CoupledBoardTest {

    private static final long SEED = 20_260_511L;
    private static final int BOARDS = 40;

    @Test
    void sweepMatchesPerAmbientBoardSolves() {
        Random rnd = new Random(SEED);
        int runawayAir = 0;
        for (int n = 0; n < BOARDS; n++) {
            String where = "seed " + SEED + " board " + n;
            Board board = RandomCoupledBoards.draw(rnd, where);
            PreparedBoard pb = PreparedBoard.of(board);
            AnalysisResult r = Analysis.run(board, RandomCoupledBoards.POLICY, SolverSettings.DEFAULT);
            for (BoardAtAmbient b : r.sweep()) {
                BoardAtAmbient exact = BoardSolver.solveAt(pb, RandomCoupledBoards.POLICY, b.ambientK(),
                        SolverSettings.DEFAULT);
                String at = where + " at " + b.ambientK() + " K";
                assertEquals(exact.status(), b.status(), at);
                assertEquals(exact.airStatus(), b.airStatus(), at);
                if (b.airStatus() == PointStatus.RUNAWAY) {
                    // Air without a balance heats without bound, and every junction in it.
                    runawayAir++;
                    for (PositionAtAmbient p : b.positions()) {
                        assertEquals(PointStatus.RUNAWAY, p.status(), at);
                        assertTrue(p.corners().stream().allMatch(c -> c.outcome() instanceof ThermalOutcome.Runaway),
                                at + ": every corner runs away with the air");
                    }
                }
                if (exact.status() == PointStatus.CONVERGED) {
                    // Both balances are held to 1e-9 K of residual (BoardSolver.AIR_BALANCE); the rise's slope in
                    // its residual is below 2 here, so the two roots agree within a few 1e-9 K.
                    assertEquals(exact.enclosureRiseK(), b.enclosureRiseK(), 1e-8, at);
                }
                for (int i = 0; i < b.positions().size(); i++) {
                    PositionAtAmbient p = b.positions().get(i);
                    PositionAtAmbient q = exact.positions().get(i);
                    assertEquals(q.status(), p.status(), at + " position " + i);
                    if (q.status() == PointStatus.CONVERGED) {
                        assertEquals(q.margin(), p.margin(), 1e-7, at + " position " + i);
                        assertEquals(q.limitingRuleId(), p.limitingRuleId(), at + " position " + i);
                    }
                }
            }
        }
        assertTrue(runawayAir >= 3, "only " + runawayAir + " ambients with runaway air");
    }

    @Test
    void searchesOnTheAirMapMatchSearchesOnExactBoardSolves() {
        Random rnd = new Random(SEED + 1);
        int found = 0;
        int onsets = 0;
        int inAir = 0;
        int drivers = 0;
        for (int n = 0; n < BOARDS; n++) {
            String where = "seed " + (SEED + 1) + " board " + n;
            Board board = RandomCoupledBoards.draw(rnd, where);
            PreparedBoard pb = PreparedBoard.of(board);
            AnalysisResult r = Analysis.run(board, RandomCoupledBoards.POLICY, SolverSettings.DEFAULT);
            for (int i = 0; i < board.positions().size(); i++) {
                String at = where + " position " + i;
                MaximumAmbient exact = MaximumAmbientSearch.find(pb, RandomCoupledBoards.POLICY, i, r.sweep(),
                        SolverSettings.DEFAULT);
                MaximumAmbient fast = r.positions().get(i).maxAmbient();
                assertEquals(exact.status(), fast.status(), at);
                // Each lies on the passing side within its tolerance of the limit it sees; the map's limit is within
                // its own tolerance of the exact one (AirMap class comment): together 0.1 K + 0.01 K.
                assertEquals(exact.ambientK(), fast.ambientK(),
                        MaximumAmbientSearch.TOLERANCE_K + AirMap.TOLERANCE_K, at);
                if (fast.status() == MaximumAmbient.Status.FOUND) {
                    found++;
                }
                RunawayOnset o = RunawayOnset.find(pb, RandomCoupledBoards.POLICY, i, r.sweep(), SolverSettings.DEFAULT);
                var f = r.positions().get(i).runaway();
                assertEquals(o == null, f.isEmpty(), at);
                if (o != null) {
                    onsets++;
                    assertEquals(o.atOrBelowSearch(), f.get().atOrBelowSearch(), at);
                    assertEquals(o.ambientK(), f.get().ambientK(),
                            MaximumAmbientSearch.TOLERANCE_K + AirMap.TOLERANCE_K, at);
                    assertEquals(o.cause(), f.get().cause(), at);
                    if (f.get().cause().enclosure()) {
                        inAir++;
                    }
                    if (f.get().cause() == RunawayOnset.Cause.DRIVES_ENCLOSURE) {
                        drivers++;
                    }
                }
            }
        }
        // The draw must exercise what it claims to: limits found by refinement and runaway within the ranges.
        assertTrue(found >= 20, "only " + found + " maximum ambients found by refinement");
        assertTrue(onsets >= 3, "only " + onsets + " runaway onsets");
        // ... and the enclosure air's own runaway, with positions that drive it and positions that only follow.
        assertTrue(drivers >= 2 && inAir - drivers >= 3, drivers + " drivers of " + inAir + " onsets in runaway air");
    }

    /**
     * The map's local air for any ambient is the exact lowest balance of an ambient within its tolerance: the
     * ambient {@code A(x) = x − ΔT(H(x))} of the air it returns, computed here by one exact board pass, is within
     * {@link AirMap#TOLERANCE_K} of the ambient asked; and it agrees with the exact balance's status.
     */
    @Test
    void airMapReturnsTheBalanceOfAnAmbientWithinItsTolerance() {
        Random rnd = new Random(SEED + 2);
        int checked = 0;
        for (int n = 0; n < 20; n++) {
            String where = "seed " + (SEED + 2) + " board " + n;
            Board board = RandomCoupledBoards.draw(rnd, where);
            PreparedBoard pb = PreparedBoard.of(board);
            CoupledSweep.Result sweep = CoupledSweep.run(pb, RandomCoupledBoards.POLICY, SolverSettings.DEFAULT);
            Enclosure enc = board.enclosure();
            try (AirMap map = AirMap.of(pb, SolverSettings.DEFAULT, sweep)) {
                double lo = board.ambient().minK() - 30;
                double hi = board.ambient().maxK() + 40;
                for (int k = 0; k < 15; k++) {
                    double ta = lo + (hi - lo) * rnd.nextDouble();
                    String at = where + " at " + ta + " K";
                    AirMap.LocalAir air = map.at(ta);
                    PositionAtAmbient exact = BoardSolver.positionAt(pb, RandomCoupledBoards.POLICY, ta,
                            SolverSettings.DEFAULT, 0);
                    boolean exactAirConverged = exact.status() != PointStatus.NOT_CONVERGED
                            && exact.tLocalK() - ta < BoardSolver.AIR_BALANCE.capK();
                    if (air.status() == PointStatus.CONVERGED && exactAirConverged) {
                        double a = air.tLocalK() - enc.riseK(boardHeat(pb, air.tLocalK()));
                        assertEquals(ta, a, AirMap.TOLERANCE_K, at);
                        checked++;
                    }
                }
            }
        }
        assertTrue(checked >= 200, "only " + checked + " ambients checked");
    }

    @Test
    void resultsDoNotDependOnTheNumberOfThreads() throws Exception {
        Board board = RandomCoupledBoards.draw(new Random(SEED + 3), "threads");
        AnalysisResult one = new ForkJoinPool(1).submit(
                () -> Analysis.run(board, RandomCoupledBoards.POLICY, SolverSettings.DEFAULT)).get();
        AnalysisResult four = new ForkJoinPool(4).submit(
                () -> Analysis.run(board, RandomCoupledBoards.POLICY, SolverSettings.DEFAULT)).get();
        for (int k = 0; k < one.sweep().size(); k++) {
            assertEquals(one.sweep().get(k).enclosureRiseK(), four.sweep().get(k).enclosureRiseK(), 0.0);
        }
        for (int i = 0; i < one.positions().size(); i++) {
            assertEquals(one.positions().get(i), four.positions().get(i));
        }
    }

    /** The board heat in air at {@code x}: every position at its corner of greatest heat (design 2.2). */
    private static double boardHeat(PreparedBoard pb, double x) {
        double sum = 0;
        for (List<PositionInstance> insts : pb.instances()) {
            double max = 0;
            for (PositionInstance inst : insts) {
                max = Math.max(max, CornerHeat.of(inst, inst.solve(x, SolverSettings.DEFAULT), SolverSettings.DEFAULT));
            }
            sum += max;
        }
        return sum;
    }
}
