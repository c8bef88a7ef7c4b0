package org.tjmargin.solve;

import java.util.ArrayList;
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
        List<BoardAtAmbient> sweep = new ArrayList<>();
        for (double t : board.ambient().temperaturesK()) {
            sweep.add(BoardSolver.solveAt(prepared, policy, t, settings));
        }
        List<PositionResult> results = new ArrayList<>();
        Verdict overall = Verdict.PASS;
        for (int i = 0; i < board.positions().size(); i++) {
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
            results.add(new PositionResult(spec.id(), v, limiting, worst, worstT, max, Optional.ofNullable(onset), reg,
                    spec.allNotes()));
            overall = overall.worse(v);
        }
        return new AnalysisResult(board, policy, sweep, results, overall);
    }
}
