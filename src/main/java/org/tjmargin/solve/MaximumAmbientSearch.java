package org.tjmargin.solve;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.AllowedSolution;
import org.apache.commons.math3.analysis.solvers.BracketingNthOrderBrentSolver;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.tjmargin.derating.Policy;

/**
 * Finds the highest ambient with margin ≥ 0 for one position: the sweep brackets the transition, a bracketing
 * solver refines it.
 *
 * <p>The margin against ambient is continuous where the limiting rule is, but jumps where a corner starts to run
 * away or the limiting rule changes; a bracketing method copes with both. Commons Math's
 * {@link BracketingNthOrderBrentSolver} with {@link AllowedSolution#ABOVE_SIDE} returns a point whose margin is
 * ≥ 0, so the reported ambient always passes. When the sweep passes throughout, the search steps on above the
 * sweep (in sweep steps, at least 5 K) up to the part's Tj max, above which no junction can be cooler than its air;
 * when it fails throughout, it steps down by the same steps for at most 200 K.
 *
 * <p>Two ways to read the margin at a probed ambient. The reference ({@link #find(PreparedBoard, Policy, int, List,
 * SolverSettings)}) solves the whole board's air balance again at every probe ({@link BoardSolver#positionAt}):
 * exact, but each probe costs the whole board, so the searches of all positions cost the square of their number.
 * The analysis ({@link #find(PreparedBoard, Policy, int, List, SolverSettings, AirMap)}) reads the local air from
 * the board's shared {@link AirMap} and solves only the position's own corners there: the margin is then the exact
 * margin at an ambient within {@link AirMap#TOLERANCE_K} of the probed one, and the refinement runs to
 * {@code TOLERANCE_K − AirMap.TOLERANCE_K} so that the reported ambient stays within {@link #TOLERANCE_K} of the
 * limit.
 */
public final class MaximumAmbientSearch {

    /** Resolution of the maximum ambient (K), design 2.5 / issue requirement. */
    public static final double TOLERANCE_K = 0.1;
    /** Evaluation budget of the refinement: a 5 K bracket needs about 6 bisections, Brent steps need fewer. */
    private static final int MAX_EVALUATIONS = 60;
    /** Shortest step of the searches beyond the sweep (K). */
    static final double MIN_STEP_K = 5.0;
    private static final double DOWNWARD_SPAN_K = 200.0;

    private MaximumAmbientSearch() {
    }

    /**
     * Searches one position with exact board solves at every probe (the reference; cost grows with the board).
     *
     * @param board    the prepared board
     * @param policy   the policy
     * @param index    the position's index on the board
     * @param sweep    the sweep already computed
     * @param settings solver settings
     */
    public static MaximumAmbient find(PreparedBoard board, Policy policy, int index, List<BoardAtAmbient> sweep,
                                      SolverSettings settings) {
        return find(board, index, sweep, t -> marginAt(board, policy, index, t, settings), TOLERANCE_K);
    }

    /**
     * Searches one position on the board's air map: each probe solves only this position's corners.
     *
     * @param air the board's air map, built from {@code sweep}
     */
    static MaximumAmbient find(PreparedBoard board, Policy policy, int index, List<BoardAtAmbient> sweep,
                               SolverSettings settings, AirMap air) {
        return find(board, index, sweep, t -> marginAt(board, policy, index, t, settings, air),
                TOLERANCE_K - AirMap.TOLERANCE_K);
    }

    private static MaximumAmbient find(PreparedBoard board, int index, List<BoardAtAmbient> sweep,
                                       DoubleUnaryOperator margin, double tolerance) {
        double step = Math.max(MIN_STEP_K, board.board().ambient().stepK());
        double tjMax = board.board().positions().get(index).part().ratings().tjMaxK();
        int n = sweep.size();
        double passT = Double.NaN;
        double failT = Double.NaN;
        for (int k = n - 1; k >= 0; k--) {
            PositionAtAmbient p = sweep.get(k).positions().get(index);
            if (passes(p)) {
                passT = p.ambientK();
                if (k + 1 < n) {
                    failT = sweep.get(k + 1).ambientK();
                }
                break;
            }
        }
        if (Double.isNaN(passT)) {
            double lo = sweep.get(0).ambientK();
            failT = lo;
            for (double t = lo - step; t >= lo - DOWNWARD_SPAN_K; t -= step) {
                if (margin.applyAsDouble(t) >= 0) {
                    passT = t;
                    break;
                }
                failT = t;
            }
            if (Double.isNaN(passT)) {
                return new MaximumAmbient(MaximumAmbient.Status.NONE, 0.0);
            }
        } else if (Double.isNaN(failT)) {
            for (double t = passT + step; ; t += step) {
                double tt = Math.min(t, tjMax);
                if (margin.applyAsDouble(tt) < 0) {
                    failT = tt;
                    break;
                }
                passT = tt;
                if (tt >= tjMax) {
                    return new MaximumAmbient(MaximumAmbient.Status.HOLDS_TO_LIMIT, tjMax);
                }
            }
        }
        return new MaximumAmbient(MaximumAmbient.Status.FOUND, refine(margin, passT, failT, tolerance));
    }

    /**
     * The limit between {@code passT} (margin ≥ 0) and {@code failT} (margin < 0), on the passing side within
     * {@code tolerance}. Brent's method first; where the margin jumps (a corner running away takes it from a few
     * per cent to a stand-in of several hundred per cent below zero) its interpolation can creep from one end by
     * ever smaller steps and spend its budget without closing the bracket, so every probe also narrows a bracket of
     * its own, and bisection of that bracket finishes the search. Bisection halves the bracket at every probe
     * whatever the margin's shape, so the answer is always within the tolerance.
     */
    private static double refine(DoubleUnaryOperator margin, double passT, double failT, double tolerance) {
        double[] bracket = {passT, failT};
        DoubleUnaryOperator narrowing = t -> {
            double m = margin.applyAsDouble(t);
            if (t > bracket[0] && t < bracket[1]) {
                bracket[m >= 0 ? 0 : 1] = t;
            }
            return m;
        };
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(1e-12, tolerance, 1e-12, 3);
        try {
            double t = solver.solve(MAX_EVALUATIONS, narrowing::applyAsDouble, passT, failT,
                    AllowedSolution.ABOVE_SIDE);
            if (margin.applyAsDouble(t) >= 0) {
                return t;
            }
        } catch (MathIllegalStateException e) {
            // Crept: bisect what the probes have left.
        }
        double pass = bracket[0];
        double fail = bracket[1];
        while (fail - pass > tolerance) {
            double mid = 0.5 * (pass + fail);
            if (margin.applyAsDouble(mid) >= 0) {
                pass = mid;
            } else {
                fail = mid;
            }
        }
        return pass;
    }

    private static boolean passes(PositionAtAmbient p) {
        return p.status() == PointStatus.CONVERGED && p.margin() >= 0;
    }

    /** The position's margin at one ambient; runaway and unresolved points count as failing. */
    static double marginAt(PreparedBoard board, Policy policy, int index, double ambientK, SolverSettings settings) {
        PositionAtAmbient p = BoardSolver.positionAt(board, policy, ambientK, settings, index);
        if (p.status() != PointStatus.CONVERGED) {
            return Math.min(p.margin(), -1.0);
        }
        return p.margin();
    }

    /**
     * The position's margin at one ambient with its local air read from the board's air map; failing (−1) where the
     * air finds no balance, like runaway and unresolved points.
     */
    static double marginAt(PreparedBoard board, Policy policy, int index, double ambientK, SolverSettings settings,
                           AirMap air) {
        AirMap.LocalAir local = air.at(ambientK);
        if (local.status() != PointStatus.CONVERGED) {
            return -1.0;
        }
        // Only the status and the margin are read: the point keeps its reported corners alone.
        PositionAtAmbient p = BoardSolver.evaluate(board.board().positions().get(index), board.instances().get(index),
                policy, ambientK, local.tLocalK(), settings, CornersKept.REPORTED);
        if (p.status() != PointStatus.CONVERGED) {
            return Math.min(p.margin(), -1.0);
        }
        return p.margin();
    }
}
