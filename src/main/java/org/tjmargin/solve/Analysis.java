package org.tjmargin.solve;

import java.util.concurrent.atomic.AtomicInteger;

import java.util.List;
import java.util.Optional;
import org.tjmargin.derating.Policy;

/**
 * A whole analysis: the board swept over its ambient range, each position judged at every corner, its maximum
 * ambient, runaway onset and regulation. A pure function of its inputs.
 *
 * <p>Cost grows linearly with the number of positions: a board in a sealed box is swept by continuation
 * ({@link CoupledSweep}, every corner solved about once per ambient), and each position's searches read the local
 * air from the board's shared {@link AirMap} and solve only that position's corners at each probe.
 */
public final class Analysis {

    private Analysis() {
    }

    /**
     * Runs the analysis.
     *
     * @param board    the board
     * @param policy   the policy
     * @param settings solver settings
     */
    public static AnalysisResult run(Board board, Policy policy, SolverSettings settings) {
        return run(board, policy, settings, AnalysisProgress.NONE);
    }

    /**
     * Runs the analysis, telling {@code progress} how far it has come (which changes nothing in the result).
     *
     * @param progress told after each ambient of the sweep and each position's searches
     */
    public static AnalysisResult run(Board board, Policy policy, SolverSettings settings, AnalysisProgress progress) {
        PreparedBoard prepared = PreparedBoard.of(board);
        List<BoardAtAmbient> sweep;
        AirMap map;
        if (board.enclosure().couplesPositions()) {
            CoupledSweep.Result r = CoupledSweep.run(prepared, policy, settings, progress);
            sweep = r.sweep();
            map = AirMap.of(prepared, settings, r);
        } else {
            // Without coupling every ambient is an independent pure solve: they run on all cores.
            double[] ambients = board.ambient().temperaturesK();
            AtomicInteger swept = new AtomicInteger();
            sweep = java.util.stream.IntStream.range(0, ambients.length).parallel()
                    .mapToObj(a -> {
                        BoardAtAmbient b = BoardSolver.solveAt(prepared, policy, ambients[a], settings);
                        progress.ambientsSwept(swept.incrementAndGet(), ambients.length);
                        // Below the highest ambient a position keeps only its reported corners.
                        return a == ambients.length - 1 ? b : b.reportedOnly();
                    }).toList();
            map = AirMap.fixed(prepared, settings, sweep);
        }
        // Every position's search is a pure function of the sweep and the map (whose answers do not depend on the
        // order of the questions): they run on all cores, and the ordered stream keeps board order.
        List<PositionResult> results;
        int n = board.positions().size();
        AtomicInteger searched = new AtomicInteger();
        try (map) {
            results = java.util.stream.IntStream.range(0, n).parallel()
                    .mapToObj(i -> {
                        PositionResult r = positionResult(prepared, policy, sweep, map, i, settings);
                        progress.positionsSearched(searched.incrementAndGet(), n);
                        return r;
                    }).toList();
        }
        Verdict overall = Verdict.PASS;
        for (PositionResult r : results) {
            overall = overall.worse(r.verdict());
        }
        // Every corner at the highest ambient is reported, so every one gets its loop gain (the sweep's solves
        // compute it only for the hottest and least-current corner) and its surges' time histories (charted there
        // only; the sweep's surge checks do not record them).
        List<BoardAtAmbient> reported = new java.util.ArrayList<>(sweep);
        int last = reported.size() - 1;
        reported.set(last, BoardSolver.reportedInFull(prepared, reported.get(last)));
        return new AnalysisResult(board, policy, reported, results, overall);
    }

    private static PositionResult positionResult(PreparedBoard prepared, Policy policy, List<BoardAtAmbient> sweep,
                                                 AirMap map, int i, SolverSettings settings) {
        Board board = prepared.board();
        {
            PositionSpec spec = board.positions().get(i);
            Verdict v = Verdict.PASS;
            double worst = Double.POSITIVE_INFINITY;
            double worstT = sweep.get(0).ambientK();
            String limiting = "none";
            for (BoardAtAmbient b : sweep) {
                PositionAtAmbient p = b.positions().get(i);
                v = v.worse(switch (p.status()) {
                    case CONVERGED -> p.margin() >= 0 ? Verdict.PASS : Verdict.FAIL;
                    case RUNAWAY -> Verdict.RUNAWAY;
                    case NOT_CONVERGED -> Verdict.UNRESOLVED;
                });
                if (p.margin() < worst) {
                    worst = p.margin();
                    worstT = p.ambientK();
                    limiting = p.limitingRuleId();
                }
            }
            MaximumAmbient max = MaximumAmbientSearch.find(prepared, policy, i, sweep, settings, map);
            RunawayOnset onset = RunawayOnset.find(prepared, policy, i, sweep, settings, map);
            BoardAtAmbient hottest = sweep.get(sweep.size() - 1);
            // Where the air at the highest ambient has no balance, there is no air to regulate in.
            Optional<Regulation> reg = hottest.airBalanced()
                    ? Regulation.of(spec, hottest.positions().get(i).tLocalK(), settings) : Optional.empty();
            return new PositionResult(spec.id(), v, limiting, worst, worstT, max, Optional.ofNullable(onset), reg,
                    spec.allNotes());
        }
    }
}
