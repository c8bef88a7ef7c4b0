package org.tjmargin.solve;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import org.tjmargin.derating.Policy;
import org.tjmargin.derating.CornerReadings;
import org.tjmargin.derating.WorstChecks;
import org.tjmargin.surge.SurgeResult;
import org.tjmargin.thermal.Enclosure;

/**
 * The whole board at one ambient: every corner of every position, coupled through the enclosure air.
 *
 * <p>With a sealed box the air's rise depends on what the board dissipates, which depends on the air's
 * temperature: {@code ΔT = (Σ heat_i(T_amb + ΔT) + P_other)/(h·A)} (design 2.2). Each position contributes the
 * heat of its corner of greatest heat (diode plus series resistor), so the rise is the worst the board can make;
 * every corner of every position is then judged in that air. This is conservative for temperatures; it is also
 * what a designer needs for the least-current check when the coefficient is positive (hot makes {@code Vz} rise and
 * the current fall). The balance is the lowest fixed point of the rise, found by {@link LowestFixedPoint}.
 *
 * <p>Stateless and thread-safe.
 */
public final class BoardSolver {

    /** Air-balance search: cap 1000 K of rise (any real enclosure fails long before), tolerance 1e-9 K, budget 200, steps
     * of at most 50 K. */
    static final SolverSettings AIR_BALANCE = new SolverSettings(1000.0, 1e-9, 200, 50.0);

    private BoardSolver() {
    }

    /**
     * Solves the board at one ambient.
     *
     * @param board    the prepared board
     * @param policy   the rules to hold every corner against
     * @param ambientK room temperature (K)
     * @param settings junction solve settings
     */
    public static BoardAtAmbient solveAt(PreparedBoard board, Policy policy, double ambientK,
                                         SolverSettings settings) {
        Air air = air(board, ambientK, settings);
        double tLocal = ambientK + air.riseK();
        List<PositionAtAmbient> positions = new ArrayList<>();
        PointStatus status = air.status();
        double heat = 0;
        for (int i = 0; i < board.board().positions().size(); i++) {
            List<ThermalOutcome> solved = solvedIn(board, i, tLocal, settings, air);
            heat += maxHeatW(solved, board.instances().get(i), settings);
            PositionAtAmbient p = inAir(board.board().positions().get(i), board.instances().get(i), policy, ambientK,
                    tLocal, settings, solved, air.status(), CornersKept.EVERY);
            positions.add(p);
            status = status.worse(p.status());
        }
        return new BoardAtAmbient(ambientK, air.riseK(), air.status() == PointStatus.RUNAWAY ? Double.NaN : heat,
                positions, air.evaluations(), air.status(), status);
    }

    /**
     * One position of the board at one ambient: the same air balance over the whole board as
     * {@link #solveAt}, but only this position held against the policy (its surges included). What the searches
     * for the maximum ambient and the runaway onset need, at a fraction of the cost.
     */
    public static PositionAtAmbient positionAt(PreparedBoard board, Policy policy, double ambientK,
                                               SolverSettings settings, int index) {
        Air air = air(board, ambientK, settings);
        double tLocal = ambientK + air.riseK();
        return inAir(board.board().positions().get(index), board.instances().get(index), policy, ambientK, tLocal,
                settings, solvedIn(board, index, tLocal, settings, air), air.status(), CornersKept.EVERY);
    }

    /**
     * The enclosure air at one ambient by an exact balance of the whole board (the reference the analysis's
     * {@link AirMap} is held against): its temperature and the status of its balance.
     */
    static AirMap.LocalAir localAir(PreparedBoard board, double ambientK, SolverSettings settings) {
        Air air = air(board, ambientK, settings);
        return new AirMap.LocalAir(ambientK + air.riseK(), air.status());
    }

    /**
     * One position held against the policy in air whose balance has status {@code air}: in balanced air as
     * {@link #evaluate(PositionSpec, List, Policy, double, double, SolverSettings, List, CornersKept)}. Where the
     * enclosure air runs away (no air temperature below the search's cap balances the board's heat against what the
     * box sheds) the air heats without bound, and with it every junction in it: every corner is a
     * {@link ThermalOutcome.Runaway} in the air where the search stopped, whatever its own solve gave there (a part
     * solved in air a thousand kelvin above any survivable temperature gives numbers no one should read). Where the
     * balance ran out of budget the position's own results stand, marked not converged.
     *
     * @param outcomes each corner's outcome in air at {@code tLocalK}; not read where the air runs away
     */
    static PositionAtAmbient inAir(PositionSpec spec, List<PositionInstance> instances, Policy policy,
                                   double ambientK, double tLocalK, SolverSettings settings,
                                   List<ThermalOutcome> outcomes, PointStatus air, CornersKept kept) {
        if (air == PointStatus.RUNAWAY) {
            ThermalOutcome runaway = new ThermalOutcome.Runaway(tLocalK, settings.capK());
            return evaluate(spec, instances, policy, ambientK, tLocalK, settings,
                    Collections.nCopies(instances.size(), runaway), kept);
        }
        PositionAtAmbient p = evaluate(spec, instances, policy, ambientK, tLocalK, settings, outcomes, kept);
        return air == PointStatus.CONVERGED ? p : p.withStatus(p.status().worse(air));
    }

    /**
     * The enclosure air's rise at one ambient, with the status of its balance and, when the balance's last
     * evaluation was at the returned rise (as the fixed-point search guarantees), every corner's outcome there, so
     * that the positions are not solved a second time in the same air.
     */
    private record Air(double riseK, int evaluations, PointStatus status, List<List<ThermalOutcome>> outcomes) {

        /** The outcomes of position {@code i} in this air, or null when they were not kept. */
        List<ThermalOutcome> outcomesOf(int i) {
            return outcomes == null ? null : outcomes.get(i);
        }
    }

    /** The last air evaluated by the balance, and every corner's outcome in it. */
    private static final class LastHeat {
        double tLocalK = Double.NaN;
        List<List<ThermalOutcome>> outcomes;
    }

    private static Air air(PreparedBoard board, double ambientK, SolverSettings settings) {
        Enclosure enc = board.board().enclosure();
        if (!enc.couplesPositions()) {
            return new Air(enc.riseK(0.0), 0, PointStatus.CONVERGED, null);
        }
        LastHeat last = new LastHeat();
        FixedPointOutcome air = LowestFixedPoint.find(
                dT -> enc.riseK(boardHeatW(board, ambientK + dT, settings, last)), 0.0, AIR_BALANCE);
        double rise;
        PointStatus status;
        if (air instanceof FixedPointOutcome.Root r) {
            rise = r.x();
            status = PointStatus.CONVERGED;
        } else if (air instanceof FixedPointOutcome.Runaway rw) {
            rise = rw.lastX();
            status = PointStatus.RUNAWAY;
        } else {
            rise = ((FixedPointOutcome.Exhausted) air).lastX();
            status = PointStatus.NOT_CONVERGED;
        }
        return new Air(rise, air.evaluations(), status, last.tLocalK == ambientK + rise ? last.outcomes : null);
    }

    /**
     * Every corner of position {@code i} in air at {@code tLocalK}: the balance's own outcomes where it solved them
     * there.
     */
    private static List<ThermalOutcome> solvedIn(PreparedBoard board, int i, double tLocalK, SolverSettings settings,
                                                 Air air) {
        List<ThermalOutcome> solved = air.outcomesOf(i);
        return solved != null ? solved : solve(board.instances().get(i), tLocalK, settings);
    }

    /** Every corner solved in air at {@code tLocalK}. */
    private static List<ThermalOutcome> solve(List<PositionInstance> instances, double tLocalK,
                                              SolverSettings settings) {
        List<ThermalOutcome> outcomes = new ArrayList<>(instances.size());
        HeatBalance balance = new HeatBalance();
        for (PositionInstance inst : instances) {
            outcomes.add(inst.solveWithoutLoopGain(tLocalK, settings, balance));
        }
        return outcomes;
    }

    /**
     * Every corner of one position solved in air at {@code tLocalK} and held against the policy, the point keeping
     * every corner or only the reported ones ({@link #evaluate(PositionSpec, List, Policy, double, double,
     * SolverSettings, List, CornersKept)}): the searches read only the status and the margin.
     */
    static PositionAtAmbient evaluate(PositionSpec spec, List<PositionInstance> instances, Policy policy,
                                      double ambientK, double tLocalK, SolverSettings settings, CornersKept kept) {
        return evaluate(spec, instances, policy, ambientK, tLocalK, settings, solve(instances, tLocalK, settings),
                kept);
    }

    /**
     * One position held against the policy in air at {@code tLocalK}, with its corners' outcomes in this air already
     * solved (by the air balance or the caller). The solves stay out of this method so that it has no branch that one
     * caller takes and another never does: the optimising compiler would otherwise compile it for the sweep's callers
     * and throw that away at the first search probe (which corners are kept is read without a branch, see
     * {@link CornersKept}).
     *
     * <p>With {@link CornersKept#REPORTED} the point keeps only its reported corners, exactly what
     * {@code evaluate(...).reportedOnly()} gives ({@link PositionAtAmbient#reportedOnly()}: the hottest, the
     * least-current and each rule's worst, renumbered, with the count and envelope of all), built without a corner
     * point for every corner and a full point to thin out: what the sweep keeps below the design's highest ambient
     * and what the searches read.
     */
    static PositionAtAmbient evaluate(PositionSpec spec, List<PositionInstance> instances, Policy policy,
                                      double ambientK, double tLocalK, SolverSettings settings,
                                      List<ThermalOutcome> outcomes, CornersKept kept) {
        int n = instances.size();
        double[] allowedAt = new double[n];
        List<List<SurgeResult>> surgesAt = new ArrayList<>(n);
        CornerEnvelope.Accumulator envelope = new CornerEnvelope.Accumulator();
        int hottest = -1;
        double hottestTj = Double.NEGATIVE_INFINITY;
        boolean hottestRunaway = false;
        int least = -1;
        double leastI = Double.POSITIVE_INFINITY;
        PointStatus status = PointStatus.CONVERGED;
        WorstChecks worst = new WorstChecks(policy);
        // One set of readings refilled at every corner (a context per corner was most of the check's garbage).
        CornerReadings readings = new CornerReadings();
        double resistorAllowed = spec.resistorAllowedW(tLocalK);
        boolean[] surgeAt = SurgeChecks.cornersToEvaluate(spec, instances, outcomes);
        for (int k = 0; k < n; k++) {
            PositionInstance inst = instances.get(k);
            ThermalOutcome out = outcomes.get(k);
            envelope.add(out);
            CornerReadings ctx;
            List<SurgeResult> surges = List.of();
            double allowed = 0;
            if (out instanceof ThermalOutcome.Converged c) {
                OperatingPoint p = c.point();
                allowed = spec.allowedPowerW(p);
                surges = surgeAt[k] ? SurgeChecks.at(spec, inst, p) : List.of();
                if (SurgeResult.anyStoppedNumerically(surges)) {
                    // A surge transient that stopped for numerical reasons gives partial values only: the position
                    // has no answer the tool can stand behind (exit status 3), though its other checks are still
                    // shown. Runaway within the pulse is a physical answer: its peak Tj fails the surge rules.
                    status = status.worse(PointStatus.NOT_CONVERGED);
                }
                ctx = Measurements.fill(readings, spec, inst, p, allowed, resistorAllowed, surges);
                if (!hottestRunaway && p.tjK() > hottestTj) {
                    hottestTj = p.tjK();
                    hottest = k;
                }
                if (p.circuit().diodeCurrentA() < leastI) {
                    leastI = p.circuit().diodeCurrentA();
                    least = k;
                }
            } else if (out instanceof ThermalOutcome.Runaway r) {
                ctx = Measurements.unresolved(readings, spec, r.capK(), tLocalK);
                status = status.worse(PointStatus.RUNAWAY);
                if (!hottestRunaway) {
                    hottestRunaway = true;
                    hottest = k;
                }
            } else {
                ctx = Measurements.unresolved(readings, spec, ((ThermalOutcome.NotConverged) out).lastTjK(), tLocalK);
                status = status.worse(PointStatus.NOT_CONVERGED);
            }
            worst.add(ctx, k);
            allowedAt[k] = allowed;
            surgesAt.add(surges);
        }
        List<WorstChecks.Worst> worstOfRules = worst.worst();
        double margin = 1.0;
        String limiting = "none";
        for (WorstChecks.Worst w : worstOfRules) {
            if (w.check().margin() < margin || "none".equals(limiting)) {
                margin = w.check().margin();
                limiting = w.check().ruleId();
            }
        }
        // The corners kept, in their order: every one, or the reported ones (the hottest, the least-current and
        // each rule's worst); each kept corner's new index, -1 for one dropped.
        int[] renumbered = new int[n];
        Arrays.fill(renumbered, kept.startMark);
        keep(renumbered, hottest);
        keep(renumbered, least);
        for (WorstChecks.Worst w : worstOfRules) {
            keep(renumbered, w.cornerIndex());
        }
        List<CornerPoint> corners = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            if (renumbered[k] < 0) {
                continue;
            }
            renumbered[k] = corners.size();
            ThermalOutcome out = outcomes.get(k);
            if (k == hottest || k == least) {
                // The reported corners get their loop gain (the solves above may have skipped it).
                out = ElectroThermalSolver.withLoopGain(instances.get(k), out);
            }
            corners.add(new CornerPoint(instances.get(k).corner(), out, allowedAt[k], resistorAllowed,
                    surgesAt.get(k)));
        }
        List<WorstCheck> worstByRule = new ArrayList<>(worstOfRules.size());
        for (WorstChecks.Worst w : worstOfRules) {
            worstByRule.add(new WorstCheck(w.check(), renumbered[w.cornerIndex()]));
        }
        return new PositionAtAmbient(spec.id(), ambientK, tLocalK, corners, hottest < 0 ? -1 : renumbered[hottest],
                least < 0 ? -1 : renumbered[least], worstByRule, margin, limiting, status, n, envelope.envelope());
    }

    /** Marks corner {@code index} as kept ({@code index < 0}: none). */
    private static void keep(int[] renumbered, int index) {
        if (index >= 0) {
            renumbered[index] = 0;
        }
    }

    /** Corner {@code k} of {@code corners} with its loop gain ({@code k < 0}: none). */
    private static void withLoopGain(List<CornerPoint> corners, List<PositionInstance> instances, int k) {
        if (k < 0) {
            return;
        }
        CornerPoint c = corners.get(k);
        ThermalOutcome out = ElectroThermalSolver.withLoopGain(instances.get(k), c.outcome());
        if (out != c.outcome()) {
            corners.set(k, new CornerPoint(c.corner(), out, c.allowedPowerW(), c.resistorAllowedW(), c.surges()));
        }
    }

    /**
     * The board with every corner reported in full: each corner's loop gain and its surges' time histories, which
     * the sweep's solves leave out. For the design's highest ambient, where every corner is reported (results.json's
     * corners at the highest ambient, the report's corner table) and the surges are charted.
     */
    static BoardAtAmbient reportedInFull(PreparedBoard board, BoardAtAmbient b) {
        List<PositionAtAmbient> positions = new ArrayList<>(b.positions().size());
        for (int i = 0; i < b.positions().size(); i++) {
            PositionAtAmbient p = b.positions().get(i);
            List<CornerPoint> corners = new ArrayList<>(p.corners());
            List<PositionInstance> instances = board.instances().get(i);
            PositionSpec spec = board.board().positions().get(i);
            for (int k = 0; k < corners.size(); k++) {
                withLoopGain(corners, instances, k);
                CornerPoint c = corners.get(k);
                if (!c.surges().isEmpty() && c.point().isPresent()) {
                    List<SurgeResult> full = SurgeChecks.withSeries(spec, instances.get(k), c.point().get(),
                            c.surges());
                    corners.set(k, new CornerPoint(c.corner(), c.outcome(), c.allowedPowerW(), c.resistorAllowedW(),
                            full));
                }
            }
            positions.add(new PositionAtAmbient(p.positionId(), p.ambientK(), p.tLocalK(), corners, p.hottestIndex(),
                    p.leastCurrentIndex(), p.worst(), p.margin(), p.limitingRuleId(), p.status()));
        }
        return new BoardAtAmbient(b.ambientK(), b.enclosureRiseK(), b.boardHeatW(), positions,
                b.couplingEvaluations(), b.airStatus(), b.status());
    }

    /** Heat of the board with the air at {@code tLocalK}: every position at its corner of greatest heat. */
    private static double boardHeatW(PreparedBoard board, double tLocalK, SolverSettings settings, LastHeat last) {
        double sum = 0;
        List<List<ThermalOutcome>> all = new ArrayList<>(board.instances().size());
        HeatBalance balance = new HeatBalance();
        for (List<PositionInstance> insts : board.instances()) {
            double max = 0;
            List<ThermalOutcome> outs = new ArrayList<>(insts.size());
            for (PositionInstance inst : insts) {
                ThermalOutcome out = inst.solveWithoutLoopGain(tLocalK, settings, balance);
                outs.add(out);
                max = Math.max(max, CornerHeat.of(inst, out, settings));
            }
            all.add(outs);
            sum += max;
        }
        last.tLocalK = tLocalK;
        last.outcomes = all;
        return sum;
    }

    private static double maxHeatW(List<ThermalOutcome> outcomes, List<PositionInstance> insts,
                                   SolverSettings settings) {
        double max = 0;
        for (int k = 0; k < insts.size(); k++) {
            max = Math.max(max, CornerHeat.of(insts.get(k), outcomes.get(k), settings));
        }
        return max;
    }
}
