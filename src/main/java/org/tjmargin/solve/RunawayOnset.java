package org.tjmargin.solve;

import java.util.List;
import java.util.function.DoubleFunction;
import java.util.function.DoublePredicate;
import org.tjmargin.derating.Policy;
import org.tjmargin.thermal.Enclosure;

/**
 * The ambient at which thermal runaway begins for one position: bisection between the last sweep ambient where every
 * corner converges and the first where one runs away, to {@link MaximumAmbientSearch#TOLERANCE_K}. As for the
 * maximum ambient, the reference reads every probe from an exact board solve, the analysis from the board's
 * {@link AirMap} (bisecting to {@code TOLERANCE_K − AirMap.TOLERANCE_K}, the map's own error taking up the rest).
 *
 * <p>Causes ({@link Cause}). A position runs away in its own right when one of its corners finds no operating point
 * in balanced air. It also runs away when the enclosure air does: in a sealed box, above some ambient no air
 * temperature balances the board's heat against what the box sheds, the air heats without bound and every junction
 * with it ({@link BoardSolver#inAir}). That happens when one position's heat leaps (its junction runs away, or a
 * leaky clamp snaps into full conduction through its source resistance) by more than the box can shed, or when the
 * board's heat as a whole grows with temperature faster than the box sheds it. Where the onset is the air's, a
 * position drives it when its own heat, from the hottest balanced air below the onset to
 * {@link #DRIVER_AIR_SPAN_K} above, grows by more than the box sheds over that span
 * ({@code ΔT(ΔH_i) > span}, design 2.2's rise): its growth alone outruns the box. The bracket of the onset, 0.1 K of
 * ambient, moves the air by 0.1 K over the slope of {@code A(x) = x − ΔT(H(x))}, well inside the span where a leap
 * causes the air's runaway; a smooth fold of the board's heat as a whole names no position.
 *
 * @param ambientK        the onset ambient (K): every corner converges just below it
 * @param atOrBelowSearch true when the position runs away already at the lowest ambient searched, so the onset is
 *                        at or below {@code ambientK}
 * @param cause           the position's own runaway, or the enclosure air's (driven by this position or not)
 */
public record RunawayOnset(double ambientK, boolean atOrBelowSearch, Cause cause) {

    /** Why a position runs away at its onset. */
    public enum Cause {
        /** One of its own corners finds no operating point while the enclosure air is still in balance. */
        OWN,
        /** The enclosure air has no balance above the onset, and this position's heat growth drives it. */
        DRIVES_ENCLOSURE,
        /** The enclosure air has no balance above the onset; the position runs away with it. */
        ENCLOSURE;

        /** True when the enclosure air runs away at the onset. */
        public boolean enclosure() {
            return this != OWN;
        }
    }

    private static final int MAX_BISECTIONS = 60;
    private static final double DOWNWARD_SPAN_K = 200.0;
    /** Air span over which a position's own heat growth is weighed against what the box sheds (K). */
    static final double DRIVER_AIR_SPAN_K = 1.0;

    /**
     * Locates the onset with exact board solves at every probe (the reference; cost grows with the board).
     *
     * @return the onset, or {@code null} when no corner of the position runs away in the sweep
     */
    public static RunawayOnset find(PreparedBoard board, Policy policy, int index, List<BoardAtAmbient> sweep,
                                    SolverSettings settings) {
        return find(board, policy, index, sweep, settings, t -> BoardSolver.localAir(board, t, settings),
                MaximumAmbientSearch.TOLERANCE_K);
    }

    /**
     * Locates the onset on the board's air map: each probe solves only this position's corners; air without a
     * balance counts as runaway.
     *
     * @return the onset, or {@code null} when no corner of the position runs away in the sweep
     */
    static RunawayOnset find(PreparedBoard board, Policy policy, int index, List<BoardAtAmbient> sweep,
                             SolverSettings settings, AirMap air) {
        return find(board, policy, index, sweep, settings, air::at,
                MaximumAmbientSearch.TOLERANCE_K - AirMap.TOLERANCE_K);
    }

    private static RunawayOnset find(PreparedBoard board, Policy policy, int index, List<BoardAtAmbient> sweep,
                                     SolverSettings settings, DoubleFunction<AirMap.LocalAir> airAt,
                                     double tolerance) {
        Bracketed o = bracket(board, index, sweep, t -> {
            AirMap.LocalAir local = airAt.apply(t);
            if (local.status() != PointStatus.CONVERGED) {
                return local.status() == PointStatus.RUNAWAY;
            }
            return BoardSolver.evaluate(board.board().positions().get(index), board.instances().get(index), policy,
                    t, local.tLocalK(), settings, CornersKept.REPORTED).status() == PointStatus.RUNAWAY;
        }, tolerance);
        if (o == null) {
            return null;
        }
        if (airAt.apply(o.ambientK()).status() == PointStatus.CONVERGED) {
            return new RunawayOnset(o.ambientK(), o.atOrBelowSearch(), Cause.OWN);
        }
        AirMap.LocalAir below = Double.isNaN(o.lastHoldingK()) ? null : airAt.apply(o.lastHoldingK());
        boolean drives = below != null && below.status() == PointStatus.CONVERGED
                && drives(board, index, below.tLocalK(), settings);
        return new RunawayOnset(o.ambientK(), o.atOrBelowSearch(), drives ? Cause.DRIVES_ENCLOSURE : Cause.ENCLOSURE);
    }

    /**
     * Whether position {@code index}'s own heat, from air at {@code tLocalK} to {@link #DRIVER_AIR_SPAN_K} above,
     * grows by more than the box sheds over that span.
     */
    private static boolean drives(PreparedBoard board, int index, double tLocalK, SolverSettings settings) {
        Enclosure enc = board.board().enclosure();
        double below = heatW(board, index, tLocalK, settings);
        double above = heatW(board, index, tLocalK + DRIVER_AIR_SPAN_K, settings);
        return enc.riseK(above) - enc.riseK(below) > DRIVER_AIR_SPAN_K;
    }

    /**
     * The heat position {@code index} puts into air at {@code tLocalK}: its corner of greatest heat, as the board's
     * air balance counts it.
     */
    private static double heatW(PreparedBoard board, int index, double tLocalK, SolverSettings settings) {
        double max = 0;
        HeatBalance balance = new HeatBalance();
        for (PositionInstance inst : board.instances().get(index)) {
            max = Math.max(max, CornerHeat.inAir(inst, tLocalK, settings, balance));
        }
        return max;
    }

    /** The bracket's result before its cause is known. */
    private record Bracketed(double ambientK, boolean atOrBelowSearch, double lastHoldingK) {
    }

    /** Brackets the onset; {@code lastHoldingK} is the ambient just below it where nothing runs away, or NaN. */
    private static Bracketed bracket(PreparedBoard board, int index, List<BoardAtAmbient> sweep,
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
                return new Bracketed(hi, true, Double.NaN);
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
        return new Bracketed(hi, false, lo);
    }
}
