package org.tjmargin.solve;

import java.util.List;
import java.util.function.DoublePredicate;
import org.tjmargin.derating.Policy;

/**
 * The ambient at which thermal runaway begins for one position: bisection between the last sweep ambient where every
 * corner converges and the first where one runs away, to {@link MaximumAmbientSearch#TOLERANCE_K}. As for the
 * maximum ambient, the reference reads every probe from an exact board solve, the analysis from the board's
 * {@link AirMap} (bisecting to {@code TOLERANCE_K − AirMap.TOLERANCE_K}, the map's own error taking up the rest).
 *
 * @param ambientK the onset ambient (K): every corner converges just below it
 * @param atOrBelowSearch true when the position runs away already at the lowest ambient searched, so the onset is
 *                        at or below {@code ambientK}
 */
public record RunawayOnset(double ambientK, boolean atOrBelowSearch) {

    private static final int MAX_BISECTIONS = 60;
    private static final double DOWNWARD_SPAN_K = 200.0;

    /**
     * Locates the onset with exact board solves at every probe (the reference; cost grows with the board).
     *
     * @return the onset, or {@code null} when no corner of the position runs away in the sweep
     */
    public static RunawayOnset find(PreparedBoard board, Policy policy, int index, List<BoardAtAmbient> sweep,
                                    SolverSettings settings) {
        return find(board, index, sweep, t -> BoardSolver.positionAt(board, policy, t, settings, index).status()
                == PointStatus.RUNAWAY, MaximumAmbientSearch.TOLERANCE_K);
    }

    /**
     * Locates the onset on the board's air map: each probe solves only this position's corners; air without a
     * balance counts as runaway.
     *
     * @return the onset, or {@code null} when no corner of the position runs away in the sweep
     */
    static RunawayOnset find(PreparedBoard board, Policy policy, int index, List<BoardAtAmbient> sweep,
                             SolverSettings settings, AirMap air) {
        return find(board, index, sweep, t -> {
            AirMap.LocalAir local = air.at(t);
            if (local.status() != PointStatus.CONVERGED) {
                return local.status() == PointStatus.RUNAWAY;
            }
            return BoardSolver.evaluate(board.board().positions().get(index), board.instances().get(index), policy, t,
                    local.tLocalK(), settings, CornersKept.REPORTED).status() == PointStatus.RUNAWAY;
        }, MaximumAmbientSearch.TOLERANCE_K - AirMap.TOLERANCE_K);
    }

    private static RunawayOnset find(PreparedBoard board, int index, List<BoardAtAmbient> sweep,
                                     DoublePredicate runsAway, double tolerance) {
        int first = -1;
        for (int k = 0; k < sweep.size(); k++) {
            if (sweep.get(k).positions().get(index).status() == PointStatus.RUNAWAY) {
                first = k;
                break;
            }
        }
        if (first < 0) {
            return null;
        }
        double hi = sweep.get(first).ambientK();
        double lo;
        if (first > 0) {
            lo = sweep.get(first - 1).ambientK();
        } else {
            double step = Math.max(MaximumAmbientSearch.MIN_STEP_K, board.board().ambient().stepK());
            lo = Double.NaN;
            for (double t = hi - step; t >= hi - DOWNWARD_SPAN_K; t -= step) {
                if (!runsAway.test(t)) {
                    lo = t;
                    break;
                }
                hi = t;
            }
            if (Double.isNaN(lo)) {
                return new RunawayOnset(hi, true);
            }
        }
        for (int i = 0; i < MAX_BISECTIONS && hi - lo > tolerance; i++) {
            double mid = 0.5 * (lo + hi);
            if (runsAway.test(mid)) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return new RunawayOnset(hi, false);
    }
}
