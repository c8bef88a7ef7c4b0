package org.tjmargin.solve;

import java.util.List;
import java.util.Optional;
import org.tjmargin.derating.Policy;

/**
 * A whole analysis: the board swept over its ambient range, each position judged at every corner, its maximum
 * ambient, runaway onset and regulation. A pure function of its inputs.
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
        PreparedBoard prepared = PreparedBoard.of(board);
        // Every ambient is an independent pure solve, and so is every position's search below: they run on all
        // cores, and the ordered streams make the result identical whatever the number of threads.
        List<BoardAtAmbient> sweep = java.util.Arrays.stream(board.ambient().temperaturesK()).parallel()
                .mapToObj(t -> BoardSolver.solveAt(prepared, policy, t, settings)).toList();
        List<PositionResult> results = java.util.stream.IntStream.range(0, board.positions().size()).parallel()
                .mapToObj(i -> positionResult(prepared, policy, sweep, i, settings)).toList();
        Verdict overall = Verdict.PASS;
        for (PositionResult r : results) {
            overall = overall.worse(r.verdict());
        }
        return new AnalysisResult(board, policy, sweep, results, overall);
    }

    private static PositionResult positionResult(PreparedBoard prepared, Policy policy, List<BoardAtAmbient> sweep,
                                                 int i, SolverSettings settings) {
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
            MaximumAmbient max = MaximumAmbientSearch.find(prepared, policy, i, sweep, settings);
            RunawayOnset onset = RunawayOnset.find(prepared, policy, i, sweep, settings);
            BoardAtAmbient hottest = sweep.get(sweep.size() - 1);
            Optional<Regulation> reg = Regulation.of(spec, hottest.positions().get(i).tLocalK(), settings);
            return new PositionResult(spec.id(), v, limiting, worst, worstT, max, Optional.ofNullable(onset), reg,
                    spec.allNotes());
        }
    }
}
