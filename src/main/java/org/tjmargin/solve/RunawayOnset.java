package org.tjmargin.solve;

import java.util.List;
import org.tjmargin.derating.Policy;

/**
 * The ambient at which thermal runaway begins for one position: bisection between the last sweep ambient where every
 * corner converges and the first where one runs away, to {@link MaximumAmbientSearch#TOLERANCE_K}.
 *
 * @param ambientK the onset ambient (K): every corner converges just below it
 * @param atOrBelowSearch true when the position runs away already at the lowest ambient searched, so the onset is
 *                        at or below {@code ambientK}
 */
public record RunawayOnset(double ambientK, boolean atOrBelowSearch) {

    private static final int MAX_BISECTIONS = 60;
    private static final double DOWNWARD_SPAN_K = 200.0;

    /**
     * Locates the onset, if the sweep shows runaway for the position.
     *
     * @return the onset, or {@code null} when no corner of the position runs away in the sweep
     */
    public static RunawayOnset find(PreparedBoard board, Policy policy, int index, List<BoardAtAmbient> sweep,
                                    SolverSettings settings) {
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
            double step = Math.max(5.0, board.board().ambient().stepK());
            lo = Double.NaN;
            for (double t = hi - step; t >= hi - DOWNWARD_SPAN_K; t -= step) {
                if (!runsAway(board, policy, index, t, settings)) {
                    lo = t;
                    break;
                }
                hi = t;
            }
            if (Double.isNaN(lo)) {
                return new RunawayOnset(hi, true);
            }
        }
        for (int i = 0; i < MAX_BISECTIONS && hi - lo > MaximumAmbientSearch.TOLERANCE_K; i++) {
            double mid = 0.5 * (lo + hi);
            if (runsAway(board, policy, index, mid, settings)) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return new RunawayOnset(hi, false);
    }

    private static boolean runsAway(PreparedBoard board, Policy policy, int index, double t, SolverSettings s) {
        return BoardSolver.positionAt(board, policy, t, s, index).status() == PointStatus.RUNAWAY;
    }
}
