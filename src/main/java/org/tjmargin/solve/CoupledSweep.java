package org.tjmargin.solve;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import java.util.stream.IntStream;
import org.tjmargin.derating.Policy;
import org.tjmargin.thermal.Enclosure;

/**
 * The ambient sweep of a board whose positions share a sealed box's air (design 2.2), solved ambient after ambient
 * by continuation, with every position solved once per ambient.
 *
 * <p>Notation. With the air at {@code x} every corner {@code k} of position {@code i} settles at its own operating
 * point and puts heat {@code h_ik(x)} into the air ({@link CornerHeat}); the board heat is
 * {@code H(x) = Σ_i max_k h_ik(x)} (each position at its corner of greatest heat, as in {@link BoardSolver}), and the
 * box's rise is {@code ΔT(H) = (H + P_other)/(h·A)}. Air at {@code x} is in balance at the ambient
 * {@code A(x) = x − ΔT(H(x))}, explicitly. The balance at ambient {@code Ta} is the lowest {@code x ≥ Ta} with
 * {@code A(x) = Ta}, the lowest fixed point of the rise that {@link BoardSolver#solveAt} finds from zero rise.
 *
 * <p>Method. Two facts make it cheap and leave the answer unchanged:
 * <ol>
 *   <li>Continuation is exact. If {@code x_p} is the lowest balance at {@code Ta_p < Ta}, then {@code A(y) < Ta_p}
 *   for every {@code y < x_p} and {@code A(x_p) = Ta_p < Ta}, so no balance at {@code Ta} lies below {@code x_p}: the
 *   search for {@code Ta} starts at {@code x_p} (one sweep step below the answer) instead of at zero rise.</li>
 *   <li>A lower bound of the heat is enough to search with. Over a subset {@code C_i} of each position's corners,
 *   {@code Ĥ(x) = Σ_i max_{k∈C_i} h_ik(x) ≤ H(x)}, so the balance function {@code x − Ta − ΔT(Ĥ(x))} lies above
 *   the true one {@code x − Ta − ΔT(H(x))}; where it is still negative, so is the true one. The lowest root
 *   {@code x̂} of the bounded balance (found by {@link LowestFixedPoint}, cheap: one or two corners per position)
 *   therefore lies at or below the true lowest balance. Every corner of every position is then solved at
 *   {@code x̂}, which the results need anyway; if each position's hottest corner there is in its subset,
 *   {@code Ĥ(x̂) = H(x̂)} and {@code x̂} is the true lowest balance, with the same residual. Otherwise the subsets
 *   take the corners that came out hottest and the search goes on from {@code x̂} (still below the answer).</li>
 * </ol>
 * The subsets are each position's corners whose heat at the previous balance was within
 * {@value #CANDIDATE_BAND} (relative) of its greatest; the band only trades searches against retries, the check
 * decides (on a generated 1,000-position board, 0.1 % keeps about 1.1 corners per position and costs one retry in a
 * hundred ambients; 5 % kept five and made the searches cost as much as the solves). The bounded search starts just
 * below a parabola through the last three balances ({@link #predictedRiseK}) when the bounded balance is still
 * negative there (a check, not an assumption), else at {@code x_p}. Where the bounded search finds no balance below the cap (runaway), none exists for the true heat either
 * (it is larger): as in {@link BoardSolver#solveAt}, the air is left at the search's last rise and every position runs
 * away with it ({@link BoardSolver#inAir}); the next ambient then starts again from zero rise.
 *
 * <p>Cost per ambient: about four evaluations of {@code Ĥ} and one solve of every corner, instead of
 * {@link BoardSolver#solveAt}'s five to ten solves of every corner. The ambients depend on each other, so they run in
 * order; the positions within each step run on all cores, and the board heat is summed in board order, so the
 * result is the same whatever the number of threads. Stateless and thread-safe.
 */
final class CoupledSweep {

    /** Relative band of heat within which a corner joins its position's search subset (1). */
    static final double CANDIDATE_BAND = 0.001;
    /** Solves of every corner allowed for one ambient before its balance counts as not converged. */
    private static final int MAX_FULL_PASSES = 20;

    private CoupledSweep() {
    }

    /**
     * The sweep and the exact samples of the air map it leaves behind.
     *
     * @param sweep   the board at every ambient, increasing
     * @param air     the status of the air balance at every ambient
     * @param samples for every ambient whose air balance converged, the local air and the ambient at which that air
     *                is in balance, computed from the board heat there; increasing in both
     */
    record Result(List<BoardAtAmbient> sweep, List<PointStatus> air, List<AirMap.Sample> samples) {
    }

    /**
     * Every corner of every position solved at one air temperature, with the heat each puts into the air, and each
     * position held against the policy there for ambient {@code ambientK} (the ambient the pass was made for): if the
     * pass turns out to be the ambient's balance, those are its results.
     */
    private record Pass(double tLocalK, List<List<ThermalOutcome>> outcomes, double[][] heat, double[] maxHeat,
                        double boardHeatW, AirMap.HeatFloor floor, double ambientK,
                        List<PositionAtAmbient> positions) {

        /** Whether each position's hottest corner is among its subset. */
        boolean hottestIn(int[][] subsets) {
            for (int i = 0; i < maxHeat.length; i++) {
                double m = 0;
                for (int k : subsets[i]) {
                    m = Math.max(m, heat[i][k]);
                }
                if (m != maxHeat[i]) {
                    return false;
                }
            }
            return true;
        }

        /** Each position's corners within the band of its greatest heat. */
        int[][] subsets() {
            int[][] s = new int[maxHeat.length][];
            for (int i = 0; i < s.length; i++) {
                double floor = maxHeat[i] - CANDIDATE_BAND * Math.abs(maxHeat[i]);
                int[] h = new int[heat[i].length];
                int n = 0;
                for (int k = 0; k < heat[i].length; k++) {
                    if (heat[i][k] >= floor) {
                        h[n++] = k;
                    }
                }
                s[i] = Arrays.copyOf(h, n);
            }
            return s;
        }
    }

    /**
     * Runs the sweep.
     *
     * @param board    the prepared board, in a sealed box
     * @param policy   the rules to hold every corner against
     * @param settings junction solve settings
     */
    static Result run(PreparedBoard board, Policy policy, SolverSettings settings) {
        return run(board, policy, settings, AnalysisProgress.NONE);
    }

    /** As above, telling {@code progress} after each ambient. */
    static Result run(PreparedBoard board, Policy policy, SolverSettings settings, AnalysisProgress progress) {
        Enclosure enc = board.board().enclosure();
        if (!enc.couplesPositions()) {
            throw new IllegalArgumentException("the continuation sweep is for an enclosure that couples positions");
        }
        List<BoardAtAmbient> sweep = new ArrayList<>();
        List<AirMap.Sample> samples = new ArrayList<>();
        List<PointStatus> airStatus = new ArrayList<>();
        Pass previous = null;
        // The rises of the last consecutive converged ambients, for the predictor.
        List<double[]> recent = new ArrayList<>();
        double[] ambients = board.board().ambient().temperaturesK();
        for (int a = 0; a < ambients.length; a++) {
            double ta = ambients[a];
            // Below the highest ambient a position keeps only its reported corners (PositionAtAmbient).
            CornersKept kept = CornersKept.every(a == ambients.length - 1);
            int evaluations = 0;
            Pass pass;
            double rise0;
            if (previous == null) {
                pass = fullPass(board, ta, settings, policy, ta, kept);
                evaluations++;
                rise0 = 0.0;
            } else {
                pass = previous;
                rise0 = Math.max(0.0, previous.tLocalK() - ta);
            }
            double predicted = predictedRiseK(recent, ta);
            int[][] subsets = pass.subsets();
            PointStatus air = PointStatus.NOT_CONVERGED;
            double rise = rise0;
            for (int full = 0; full < MAX_FULL_PASSES; full++) {
                final int[][] s = subsets;
                BoundedBalance map = new BoundedBalance(dT -> enc.riseK(boundedHeatW(board, s, ta + dT, settings)));
                double start = rise0;
                if (full == 0 && predicted > rise0) {
                    // Start just below the predicted balance if the bounded balance is still negative there; the
                    // search then needs two or three steps instead of about ten from the previous balance.
                    if (predicted - map.applyAsDouble(predicted) < 0) {
                        start = predicted;
                    }
                    evaluations++;
                }
                FixedPointOutcome out = LowestFixedPoint.find(map, start, BoardSolver.AIR_BALANCE);
                evaluations += out.evaluations() - map.cacheHits();
                if (out instanceof FixedPointOutcome.Root r) {
                    rise = r.x();
                    if (pass.tLocalK() != ta + rise) {
                        pass = fullPass(board, ta + rise, settings, policy, ta, kept);
                        evaluations++;
                    }
                    if (pass.hottestIn(s)) {
                        air = PointStatus.CONVERGED;
                        break;
                    }
                    subsets = pass.subsets();
                    rise0 = rise;
                } else {
                    rise = out instanceof FixedPointOutcome.Runaway rw ? rw.lastX()
                            : ((FixedPointOutcome.Exhausted) out).lastX();
                    air = out instanceof FixedPointOutcome.Runaway ? PointStatus.RUNAWAY : PointStatus.NOT_CONVERGED;
                    break;
                }
            }
            double tLocal = ta + rise;
            // In air that runs away no corner's solve is read (BoardSolver.inAir), so none is made there.
            if (pass.tLocalK() != tLocal && air != PointStatus.RUNAWAY) {
                pass = fullPass(board, tLocal, settings, policy, ta, kept);
                evaluations++;
            }
            final Pass at = pass;
            final PointStatus airAt = air;
            // Held against the policy in the pass itself, while its corners are fresh in the cache; a pass carried
            // over from the previous ambient was held for that ambient and is held again here. In air without a
            // balance every position is judged in it as BoardSolver.inAir says (runaway air: every corner runs away).
            List<PositionAtAmbient> positions = air == PointStatus.CONVERGED && at.ambientK() == ta ? at.positions()
                    : IntStream.range(0, board.instances().size()).parallel()
                            .mapToObj(i -> BoardSolver.inAir(board.board().positions().get(i),
                                    board.instances().get(i), policy, ta, tLocal, settings, at.outcomes().get(i),
                                    airAt, kept))
                            .toList();
            PointStatus status = air;
            for (PositionAtAmbient p : positions) {
                status = status.worse(p.status());
            }
            sweep.add(new BoardAtAmbient(ta, rise, air == PointStatus.RUNAWAY ? Double.NaN : pass.boardHeatW(),
                    positions, evaluations, air, status));
            progress.ambientsSwept(a + 1, ambients.length);
            airStatus.add(air);
            if (air == PointStatus.CONVERGED) {
                samples.add(new AirMap.Sample(tLocal, tLocal - enc.riseK(pass.boardHeatW()), pass.floor()));
                previous = pass;
                recent.add(new double[] {ta, rise});
                if (recent.size() > 3) {
                    recent.remove(0);
                }
            } else {
                previous = null;
                recent.clear();
            }
        }
        return new Result(sweep, airStatus, samples);
    }

    /** How far below the extrapolated rise the search starts (K): well beyond the extrapolation's usual error. */
    static final double PREDICTOR_OFFSET_K = 1e-4;

    /**
     * The rise at {@code ta} extrapolated from the last converged ambients (a parabola through three, a line through
     * two), less {@link #PREDICTOR_OFFSET_K}; NaN with fewer than two. Only a starting point: the search checks it lies
     * below the balance.
     */
    static double predictedRiseK(List<double[]> recent, double ta) {
        int n = recent.size();
        if (n < 2) {
            return Double.NaN;
        }
        double[] c = recent.get(n - 1);
        double[] b = recent.get(n - 2);
        double value;
        if (n >= 3) {
            double[] a = recent.get(n - 3);
            value = a[1] * (ta - b[0]) * (ta - c[0]) / ((a[0] - b[0]) * (a[0] - c[0]))
                    + b[1] * (ta - a[0]) * (ta - c[0]) / ((b[0] - a[0]) * (b[0] - c[0]))
                    + c[1] * (ta - a[0]) * (ta - b[0]) / ((c[0] - a[0]) * (c[0] - b[0]));
        } else {
            value = c[1] + (c[1] - b[1]) * (ta - c[0]) / (c[0] - b[0]);
        }
        return value - PREDICTOR_OFFSET_K;
    }

    /** The bounded balance's map, remembering its last value so that the predictor's check is not repeated. */
    private static final class BoundedBalance implements DoubleUnaryOperator {
        private final DoubleUnaryOperator map;
        private double lastX = Double.NaN;
        private double lastValue;
        private int hits;

        BoundedBalance(DoubleUnaryOperator map) {
            this.map = map;
        }

        @Override
        public double applyAsDouble(double x) {
            if (x == lastX) {
                hits++;
                return lastValue;
            }
            lastX = x;
            lastValue = map.applyAsDouble(x);
            return lastValue;
        }

        int cacheHits() {
            return hits;
        }
    }

    /** Position {@code i} held against the policy at ambient {@code ta} in air {@code tLocalK}, as the sweep keeps it. */
    private static PositionAtAmbient held(PreparedBoard board, Policy policy, double ta, double tLocalK,
                                          SolverSettings settings, List<ThermalOutcome> outcomes, int i,
                                          CornersKept kept) {
        return BoardSolver.evaluate(board.board().positions().get(i), board.instances().get(i), policy, ta, tLocalK,
                settings, outcomes, kept);
    }

    /**
     * Every corner of every position at air {@code tLocalK}, each position then held against the policy for ambient
     * {@code ta}; positions on all cores, the heat summed in order. The policy checks of a pass that is not the
     * ambient's balance (about one pass in a hundred) are wasted; done here, they read every corner's point while it
     * is still in the cache instead of in a second pass over the whole board.
     */
    private static Pass fullPass(PreparedBoard board, double tLocalK, SolverSettings settings, Policy policy,
                                 double ta, CornersKept kept) {
        int n = board.instances().size();
        @SuppressWarnings("unchecked")
        List<ThermalOutcome>[] outcomes = new List[n];
        PositionAtAmbient[] held = new PositionAtAmbient[n];
        double[][] heat = new double[n][];
        double[] max = new double[n];
        double[] runaway = new double[n];
        double[] diode = new double[n];
        double[] perKelvin = new double[n];
        IntStream.range(0, n).parallel().forEach(i -> {
            List<PositionInstance> insts = board.instances().get(i);
            List<ThermalOutcome> outs = new ArrayList<>(insts.size());
            double[] h = new double[insts.size()];
            double m = 0;
            int hottest = 0;
            HeatBalance balance = new HeatBalance();
            for (int k = 0; k < insts.size(); k++) {
                ThermalOutcome o = insts.get(k).solveWithoutLoopGain(tLocalK, settings, balance);
                outs.add(o);
                h[k] = CornerHeat.of(insts.get(k), o, settings);
                if (h[k] > m) {
                    m = h[k];
                    hottest = k;
                }
            }
            outcomes[i] = outs;
            heat[i] = h;
            max[i] = m;
            ThermalOutcome o = outs.get(hottest);
            runaway[i] = o instanceof ThermalOutcome.Runaway ? m : 0.0;
            diode[i] = o instanceof ThermalOutcome.Converged c ? c.point().diodePowerW() : 0.0;
            perKelvin[i] = 1.0 / insts.get(hottest).path().rThetaJaKPerW();
            held[i] = held(board, policy, ta, tLocalK, settings, outs, i, kept);
        });
        double sum = 0;
        for (double m : max) {
            sum += m;
        }
        return new Pass(tLocalK, Arrays.asList(outcomes), heat, max, sum,
                AirMap.HeatFloor.of(runaway, diode, perKelvin), ta, List.of(held));
    }

    /** {@code Ĥ(x)}: each position at the hottest corner of its subset, solved for its heat only (W). */
    private static double boundedHeatW(PreparedBoard board, int[][] subsets, double tLocalK, SolverSettings settings) {
        double[] max = new double[subsets.length];
        IntStream.range(0, subsets.length).parallel().forEach(i -> {
            List<PositionInstance> insts = board.instances().get(i);
            double m = 0;
            HeatBalance balance = new HeatBalance();
            for (int k : subsets[i]) {
                m = Math.max(m, CornerHeat.inAir(insts.get(k), tLocalK, settings, balance));
            }
            max[i] = m;
        });
        double sum = 0;
        for (double m : max) {
            sum += m;
        }
        return sum;
    }
}
