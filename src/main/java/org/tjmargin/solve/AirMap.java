package org.tjmargin.solve;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ForkJoinPool;
import java.util.stream.IntStream;
import org.tjmargin.thermal.Enclosure;

/**
 * The board's enclosure air as a map from ambient to local air temperature, shared by every position's searches
 * for its maximum ambient and runaway onset, so that a search probes only its own position (a few corners) and never
 * the whole board again.
 *
 * <p>Why it is possible. A position's margin depends on the ambient only through its local air {@code x}
 * ({@link BoardSolver#evaluate} takes {@code tLocalK}). For a sealed box the ambient at which air at {@code x} is in
 * balance is explicit, {@code A(x) = x − ΔT(H(x))}, with {@code H(x)} the board heat, each position at its corner
 * of greatest heat (see {@link CoupledSweep}): one pass over the board, no fixed point. The balance at ambient
 * {@code Ta} is the lowest {@code x ≥ Ta} with {@code A(x) ≥ Ta} (the lowest fixed point; where {@code A} jumps over
 * {@code Ta}, the point of the jump), so the map is the generalised inverse of {@code A}.
 *
 * <p>Samples. Exact values of {@code A}: the sweep's balances (each also certifies that {@code A < Ta_j} below its
 * {@code x_j}, being the lowest root); above and below the sweep a lattice in {@code x} with the searches' step
 * ({@code max(5 K, sweep step)}), built as far as queries reach and, once {@code A} has turned down (the air itself
 * runs away), with steps doubling up to 200 K, the air balance's own longest reach; refinement samples at cell
 * midpoints. Between samples the map interpolates {@code A} linearly, only in cells whose error bound is at most
 * {@code δ =} {@value #TOLERANCE_K} K; other cells are bisected (new exact samples, memoised for every position)
 * until they pass or are {@value #MIN_CELL_K} K wide.
 *
 * <p>Error bound. Linear interpolation of {@code A} over a cell of width {@code w} errs by at most
 * {@code |A''|·w²/8} (the remainder of linear interpolation, {@code f''(ξ)/2·(x − x0)(x − x1)}, largest at the
 * cell's middle; e.g. R. L. Burden and J. D. Faires, <i>Numerical Analysis</i>, Theorem 3.3, from memory, verify).
 * The bound used is {@code 4·w²/2·|f|}, with {@code f} the smaller in magnitude of the second
 * divided differences of the cell with its left and with its right neighbour ({@code ≈ A''/2} where {@code A} is
 * smooth). For a locally quadratic {@code A} that is eight times the error. Where the cell holds a kink of {@code A}
 * (a position's hottest corner changing, the only non-smooth point of the board heat apart from runaway) of slope
 * change {@code s} at distance {@code ε} from its nearer end, the error is {@code s·ε·(w−ε)/w} and the smaller
 * divided difference is {@code s·ε/(2w²)} (neighbours one cell away), so the bound is {@code s·ε} or more: at least
 * the error (worked out from the two divided differences across a single kink). Accepting cells at {@code δ}
 * therefore keeps {@code |A − Ã| ≤ δ} in both cases: the local air the
 * map returns for {@code Ta} is the exact lowest balance of an ambient within {@code δ} of {@code Ta}, and a search
 * on the map lands within {@code δ} of the search on exact board solves. Where {@code A} jumps (a corner starts to
 * run away and its heat is taken at the junction cap), the jump is located to {@value #MIN_CELL_K} K of air. The
 * estimate is an a-posteriori one from samples, not a proof: {@code MaximumAmbientSearchTest} holds map-based
 * searches against exact per-ambient board solves on random coupled boards.
 *
 * <p>Where no balance exists within the air search's cap (1000 K of rise) the map reports {@link PointStatus#RUNAWAY},
 * as the exact balance does; beyond {@value #MAX_LATTICE_NODES} lattice nodes on either side,
 * {@link PointStatus#NOT_CONVERGED}.
 *
 * <p>Thread-safe. Every sample is a pure function of its {@code x}, the lattice and each cell's refinement are pure
 * functions of the samples, so the answer to a query does not depend on which queries came first or on the number
 * of threads. Samples are memoised; the board passes behind them run on a pool of the map's own, never on the pool
 * of the searches that ask, so no search thread ever runs another search while it holds the lattice.
 */
final class AirMap implements AutoCloseable {

    /** Bound on the error of the interpolated air map in ambient terms (K), δ of the class comment. */
    static final double TOLERANCE_K = 0.01;
    /** Narrowest cell refined (K of air): where {@code A} jumps, the jump is located this closely. */
    static final double MIN_CELL_K = 0.005;
    /** Lattice nodes allowed on either side of the sweep. */
    static final int MAX_LATTICE_NODES = 400;
    /**
     * Longest lattice step once the air has turned (K): the longest reach of the air balance's own search
     * ({@link LowestFixedPoint} steps up to four times its 50 K cap where the balance is nearly linear).
     */
    private static final double MAX_STEP_K = 4 * BoardSolver.AIR_BALANCE.maxStepK();

    /**
     * One exact sample of the map.
     *
     * @param tLocalK      air temperature (K)
     * @param ambientK     the ambient at which that air is in balance, {@code A(x)} (K)
     * @param floor        a floor of the board heat in every hotter air
     */
    record Sample(double tLocalK, double ambientK, HeatFloor floor) {
    }

    /**
     * A floor of the board heat in air {@code d} kelvin hotter than a sample's, from the sample alone. A corner's
     * lowest balance {@code Tj*} only moves up when the air warms (its heat balance {@code Tj = x + Rθ·P(Tj)}
     * moves up), so a corner that runs away keeps running away, its heat taken at the cap, and a converged corner
     * keeps a diode power of at least {@code (Tj* − x − d)/Rθ = P − d/Rθ}. Each position's heat is at least that of
     * its hottest corner at the sample, so the board heat is at least the runaway heats plus
     * {@code Σ max(0, P − d/Rθ)} over the other positions; the floor is the larger of that sum over the
     * {@value #FLOOR_TERMS} positions of greatest diode power and its linear lower bound {@code ΣP − d·Σ(1/Rθ)} over
     * all. It is what lets the map step over air that cannot balance (corners whose balance has jumped to hundreds
     * of degrees) without sampling it, and prove runaway where even the floor's rise exceeds the cap. (Up to the
     * junction search's own caveat: it can step over a narrow excursion of a heat balance, see
     * {@link SolverSettings#maxStepK()}.)
     *
     * @param constantW       heat that stays in all hotter air: the runaway corners' (W)
     * @param diodeW          the diode power of each kept position's hottest corner (W)
     * @param perKelvinW      its {@code 1/Rθ}: how fast that floor falls with the air (W/K)
     * @param allDiodeW       {@code ΣP} over every position whose hottest corner converged (W)
     * @param allPerKelvinW   {@code Σ1/Rθ} over the same positions (W/K)
     */
    record HeatFloor(double constantW, double[] diodeW, double[] perKelvinW, double allDiodeW,
                     double allPerKelvinW) {

        /** The floor of the board heat {@code dK ≥ 0} kelvin above the sample (W). */
        double atW(double dK) {
            double sum = 0;
            for (int i = 0; i < diodeW.length; i++) {
                sum += Math.max(0.0, diodeW[i] - dK * perKelvinW[i]);
            }
            return constantW + Math.max(sum, allDiodeW - dK * allPerKelvinW);
        }

        /**
         * The floor from each position's hottest corner: its heat if it runs away (else 0), its diode power if it
         * converged (else 0) and its {@code 1/Rθ}.
         */
        static HeatFloor of(double[] runawayW, double[] diodeW, double[] perKelvinW) {
            double constant = 0;
            double allP = 0;
            double allG = 0;
            for (int i = 0; i < runawayW.length; i++) {
                constant += runawayW[i];
                if (diodeW[i] > 0) {
                    allP += diodeW[i];
                    allG += perKelvinW[i];
                }
            }
            int[] order = largestFirst(diodeW, FLOOR_TERMS);
            int k = order.length;
            double[] p = new double[k];
            double[] g = new double[k];
            for (int i = 0; i < k; i++) {
                p[i] = diodeW[order[i]];
                g[i] = perKelvinW[order[i]];
            }
            return new HeatFloor(constant, p, g, allP, allG);
        }

        /**
         * The indices of the {@code k} largest values (fewer if there are fewer), largest first, equal values in
         * index order: the first {@code k} of a stable sort by {@code Double.compare}, descending, in one pass with
         * no boxing (a board of a thousand positions needs only the top few).
         */
        static int[] largestFirst(double[] values, int k) {
            int[] top = new int[Math.min(k, values.length)];
            int size = 0;
            for (int i = 0; i < values.length; i++) {
                // After every kept index whose value is not less than this one (those kept came earlier).
                int at = size;
                while (at > 0 && Double.compare(values[top[at - 1]], values[i]) < 0) {
                    at--;
                }
                if (at >= top.length) {
                    continue;
                }
                int last = Math.min(size, top.length - 1);
                System.arraycopy(top, at, top, at + 1, last - at);
                top[at] = i;
                size = Math.min(size + 1, top.length);
            }
            return top;
        }
    }

    /** Positions whose diode power enters a {@link HeatFloor}: the few that can dominate the board's heat. */
    static final int FLOOR_TERMS = 8;

    /**
     * The local air at one ambient.
     *
     * @param tLocalK air temperature (K)
     * @param status  whether the air found a balance
     */
    record LocalAir(double tLocalK, PointStatus status) {
    }

    private final PreparedBoard board;
    private final SolverSettings settings;
    private final Enclosure enclosure;
    private final double fixedRiseK;
    private final double stepK;
    private final double[] sweepAmbientsK;
    private final double[] sweepLocalK;
    private final PointStatus[] sweepAir;
    /** The sweep's converged balances, increasing; or, if none converged, one sample at the lowest ambient. */
    private final Sample[] base;
    /** How many of {@link #base} are lowest balances, certifying {@code A < ambient} below them. */
    private final int certified;
    private final List<Sample> up = new ArrayList<>();
    private final List<Sample> down = new ArrayList<>();
    private double upStepK;
    private double upMaxAmbientK;
    private final ConcurrentHashMap<Double, CompletableFuture<Sample>> samples = new ConcurrentHashMap<>();
    private final ForkJoinPool pool;

    private AirMap(PreparedBoard board, SolverSettings settings, List<BoardAtAmbient> sweep, List<PointStatus> air,
                   List<Sample> converged) {
        this.board = board;
        this.settings = settings;
        this.enclosure = board.board().enclosure();
        this.stepK = Math.max(MaximumAmbientSearch.MIN_STEP_K, board.board().ambient().stepK());
        this.sweepAmbientsK = sweep.stream().mapToDouble(BoardAtAmbient::ambientK).toArray();
        this.sweepLocalK = sweep.stream().mapToDouble(b -> b.ambientK() + b.enclosureRiseK()).toArray();
        this.sweepAir = air.toArray(new PointStatus[0]);
        if (!enclosure.couplesPositions()) {
            this.fixedRiseK = enclosure.riseK(0.0);
            this.base = new Sample[0];
            this.certified = 0;
            this.pool = null;
            return;
        }
        this.fixedRiseK = Double.NaN;
        this.pool = new ForkJoinPool(Runtime.getRuntime().availableProcessors());
        if (converged.isEmpty()) {
            this.base = new Sample[] {sample(board.board().ambient().minK())};
            this.certified = 0;
        } else {
            this.base = converged.toArray(new Sample[0]);
            this.certified = base.length;
        }
        this.upStepK = stepK;
        this.upMaxAmbientK = base[base.length - 1].ambientK();
    }

    /**
     * The map of a board in a sealed box after its sweep.
     *
     * @param board    the prepared board
     * @param settings junction solve settings
     * @param sweep    the continuation sweep
     */
    static AirMap of(PreparedBoard board, SolverSettings settings, CoupledSweep.Result sweep) {
        return new AirMap(board, settings, sweep.sweep(), sweep.air(), sweep.samples());
    }

    /** The map of a board whose enclosure rise is given: {@code T_local = Ta + ΔT}, exact. */
    static AirMap fixed(PreparedBoard board, SolverSettings settings, List<BoardAtAmbient> sweep) {
        return new AirMap(board, settings, sweep, sweep.stream().map(b -> PointStatus.CONVERGED).toList(), List.of());
    }

    /** The local air at ambient {@code ambientK}: exact at the sweep's ambients, within δ in between. */
    LocalAir at(double ambientK) {
        if (!Double.isNaN(fixedRiseK)) {
            return new LocalAir(ambientK + fixedRiseK, PointStatus.CONVERGED);
        }
        int hit = Arrays.binarySearch(sweepAmbientsK, ambientK);
        if (hit >= 0) {
            // A sweep ambient: the sweep's own balance, so that a search sees the very point the sweep judged.
            return new LocalAir(sweepLocalK[hit], sweepAir[hit]);
        }
        if (!(ambientK > 0)) {
            return new LocalAir(ambientK, PointStatus.NOT_CONVERGED);
        }
        double capX = ambientK + BoardSolver.AIR_BALANCE.capK();
        // Start where no lower balance can lie: at the ambient itself (A(x) ≤ x), or at the highest certified
        // balance whose ambient is at most this one.
        double start = ambientK;
        int j = highestCertifiedAtOrBelow(ambientK);
        if (j >= 0) {
            start = Math.max(start, base[j].tLocalK());
        }
        Integer g = cellContaining(start);
        if (g == null) {
            return new LocalAir(start, PointStatus.NOT_CONVERGED);
        }
        for (int cell = g; ; cell++) {
            Sample lo = node(cell);
            Sample hi = node(cell + 1);
            if (lo == null || hi == null) {
                return new LocalAir(start, PointStatus.NOT_CONVERGED);
            }
            // From lo on, the board heat is at least lo's floor, so no balance lies below the first air where
            // x − ΔT(floor) reaches the ambient, and none at all if that is beyond the cap.
            double floor = firstPossibleBalance(lo, Math.max(start, lo.tLocalK()), ambientK, capX);
            if (Double.isNaN(floor) || lo.tLocalK() > capX) {
                return new LocalAir(capX, PointStatus.RUNAWAY);
            }
            if (floor > start) {
                start = floor;
                if (start >= hi.tLocalK()) {
                    Integer ahead = cellContaining(start);
                    if (ahead == null) {
                        return new LocalAir(start, PointStatus.NOT_CONVERGED);
                    }
                    cell = ahead - 1;
                    continue;
                }
            }
            double x = crossingInCell(cell, start, ambientK);
            if (!Double.isNaN(x)) {
                return x > capX ? new LocalAir(capX, PointStatus.RUNAWAY) : new LocalAir(x, PointStatus.CONVERGED);
            }
        }
    }

    /** Exact samples computed beyond the sweep so far (for the cost report of benchmarks and tests). */
    int extraSamples() {
        return samples.size();
    }

    @Override
    public void close() {
        if (pool != null) {
            pool.shutdown();
        }
    }

    private int highestCertifiedAtOrBelow(double ambientK) {
        int lo = 0;
        int hi = certified - 1;
        int found = -1;
        while (lo <= hi) {
            int mid = (lo + hi) >>> 1;
            if (base[mid].ambientK() <= ambientK) {
                found = mid;
                lo = mid + 1;
            } else {
                hi = mid - 1;
            }
        }
        return found;
    }

    /**
     * The lowest {@code x} in {@code [from, capX]} with {@code x − ΔT(floor of lo at x) ≥ ambientK}, by bisection
     * (the left side increases with {@code x}, the floor falling); NaN when there is none, which proves runaway.
     */
    private double firstPossibleBalance(Sample lo, double from, double ambientK, double capX) {
        if (bound(lo, capX) < ambientK) {
            return Double.NaN;
        }
        if (bound(lo, from) >= ambientK) {
            return from;
        }
        double a = from;
        double b = capX;
        // 60 halvings of at most 1000 K: far below any tolerance here.
        for (int i = 0; i < 60 && b - a > 1e-9; i++) {
            double m = 0.5 * (a + b);
            if (bound(lo, m) >= ambientK) {
                b = m;
            } else {
                a = m;
            }
        }
        return b;
    }

    /** The highest ambient air at {@code x ≥ lo} can balance at, by lo's floor of the board heat (K). */
    private double bound(Sample lo, double x) {
        return x - enclosure.riseK(lo.floor().atW(x - lo.tLocalK()));
    }

    /** The lowest balance {@code x ≥ start} for {@code ambientK} in lattice cell {@code g}; NaN when there is none. */
    private double crossingInCell(int g, double start, double ambientK) {
        Sample a = node(g);
        Sample b = node(g + 1);
        if (b.tLocalK() < start || bound(a, b.tLocalK()) < ambientK) {
            return Double.NaN;
        }
        return crossing(a, b, node(g - 1), node(g + 2), start, ambientK);
    }

    /**
     * The lowest {@code x ≥ start} in {@code [a, b]} where the interpolant reaches {@code ambientK}: linear where the
     * error estimate allows, else bisected into new samples. A part where even the floor of the board heat (from its
     * left sample) keeps the air from balancing at {@code ambientK} is skipped without sampling it, so the
     * refinement a query asks for depends only on the query and on samples, never on the order of the queries.
     */
    private double crossing(Sample a, Sample b, Sample left, Sample right, double start, double ambientK) {
        if (b.tLocalK() < start || bound(a, b.tLocalK()) < ambientK) {
            return Double.NaN;
        }
        double w = b.tLocalK() - a.tLocalK();
        double errorBound = errorBound(a, b, left, right);
        if (Math.max(a.ambientK(), b.ambientK()) + errorBound < ambientK) {
            // Even with its error bound the interpolant stays below the ambient: no balance in this part.
            return Double.NaN;
        }
        if (errorBound <= TOLERANCE_K || w <= MIN_CELL_K) {
            return linearCrossing(a, b, start, ambientK);
        }
        Sample m = sample(a.tLocalK() + w / 2);
        double x = crossing(a, m, left, b, start, ambientK);
        return Double.isNaN(x) ? crossing(m, b, a, right, start, ambientK) : x;
    }

    /** Where the straight line from {@code a} to {@code b} first reaches {@code ambientK} at or after {@code start}. */
    private static double linearCrossing(Sample a, Sample b, double start, double ambientK) {
        double xa = Math.max(a.tLocalK(), start);
        double fa = a.ambientK() + (b.ambientK() - a.ambientK()) * (xa - a.tLocalK()) / (b.tLocalK() - a.tLocalK());
        if (fa >= ambientK) {
            return xa;
        }
        if (b.ambientK() >= ambientK) {
            double x = xa + (ambientK - fa) / (b.ambientK() - fa) * (b.tLocalK() - xa);
            return Math.min(Math.max(x, xa), b.tLocalK());
        }
        return Double.NaN;
    }

    /** The cell {@code [node(g), node(g+1)]} holding {@code x}, growing the lattice as needed; null past its budget. */
    private Integer cellContaining(double x) {
        int top = base.length - 1;
        if (x >= base[top].tLocalK()) {
            int g = top;
            while (true) {
                Sample next = node(g + 1);
                if (next == null) {
                    return null;
                }
                if (next.tLocalK() > x) {
                    return g;
                }
                g++;
            }
        }
        if (x < base[0].tLocalK()) {
            int g = -1;
            while (true) {
                Sample s = node(g);
                if (s == null) {
                    return null;
                }
                if (s.tLocalK() <= x) {
                    return g;
                }
                g--;
            }
        }
        int lo = 0;
        int hi = top;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (base[mid].tLocalK() <= x) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /** Lattice node {@code g}: the base for {@code 0 ≤ g < base.length}, above and below it the extensions. */
    private Sample node(int g) {
        if (g >= 0 && g < base.length) {
            return base[g];
        }
        return g >= base.length ? upNode(g - base.length) : downNode(-g - 1);
    }

    private Sample upNode(int k) {
        if (k >= MAX_LATTICE_NODES) {
            return null;
        }
        synchronized (up) {
            while (up.size() <= k) {
                Sample last = up.isEmpty() ? base[base.length - 1] : up.get(up.size() - 1);
                Sample next = sample(last.tLocalK() + upStepK);
                if (next.ambientK() < upMaxAmbientK) {
                    // The air has turned: the balance may next be found far above (or not within the cap), so the
                    // lattice reaches out as the air balance's search would, doubling its steps up to 200 K.
                    upStepK = Math.min(2 * upStepK, MAX_STEP_K);
                }
                upMaxAmbientK = Math.max(upMaxAmbientK, next.ambientK());
                up.add(next);
            }
            return up.get(k);
        }
    }

    private Sample downNode(int k) {
        if (k >= MAX_LATTICE_NODES) {
            return null;
        }
        synchronized (down) {
            while (down.size() <= k) {
                Sample last = down.isEmpty() ? base[0] : down.get(down.size() - 1);
                double x = last.tLocalK() - stepK;
                if (!(x > 0)) {
                    return null;
                }
                down.add(sample(x));
            }
            return down.get(k);
        }
    }

    /**
     * The estimated bound on the error of the straight line from {@code a} to {@code b} (K of ambient): four times
     * {@code w²/2·|f|}, with {@code f} the smaller in magnitude of the second divided differences of the cell with
     * its left and with its right neighbour. Both triples span the whole cell, so a kink or jump inside it shows in
     * both, while one just outside shows in one only: the smaller localises the estimate to the cell (a jump next
     * door does not make a smooth cell look curved). See the class comment for the factors.
     */
    private static double errorBound(Sample a, Sample b, Sample left, Sample right) {
        double w = b.tLocalK() - a.tLocalK();
        double f;
        if (left != null && right != null) {
            f = Math.min(Math.abs(dividedDifference(left, a, b)), Math.abs(dividedDifference(a, b, right)));
        } else if (left != null) {
            f = Math.abs(dividedDifference(left, a, b));
        } else if (right != null) {
            f = Math.abs(dividedDifference(a, b, right));
        } else {
            f = 0;
        }
        return 4 * (w * w / 2 * f);
    }

    /** The second divided difference {@code f[p, q, r]} of the samples' ambients over their air (1/K). */
    private static double dividedDifference(Sample p, Sample q, Sample r) {
        double s1 = (q.ambientK() - p.ambientK()) / (q.tLocalK() - p.tLocalK());
        double s2 = (r.ambientK() - q.ambientK()) / (r.tLocalK() - q.tLocalK());
        return (s2 - s1) / (r.tLocalK() - p.tLocalK());
    }

    /** The exact sample at air {@code x}, memoised: one pass over every corner of the board. */
    private Sample sample(double x) {
        CompletableFuture<Sample> mine = new CompletableFuture<>();
        CompletableFuture<Sample> theirs = samples.putIfAbsent(x, mine);
        if (theirs != null) {
            return theirs.join();
        }
        try {
            mine.complete(pool.submit(() -> boardSample(x)).join());
        } catch (RuntimeException | Error e) {
            mine.completeExceptionally(e);
            throw e;
        }
        return mine.join();
    }

    /**
     * The sample at {@code x}: {@code H(x)} (every position at its corner of greatest heat), positions in parallel,
     * summed in board order, with its floor.
     */
    private Sample boardSample(double x) {
        int n = board.instances().size();
        double[] max = new double[n];
        double[] runaway = new double[n];
        double[] diode = new double[n];
        double[] perKelvin = new double[n];
        IntStream.range(0, n).parallel().forEach(i -> {
            CornerHeat.Heat hottest = null;
            PositionInstance at = null;
            HeatBalance balance = new HeatBalance();
            for (PositionInstance inst : board.instances().get(i)) {
                CornerHeat.Heat h = CornerHeat.heatInAir(inst, x, settings, balance);
                if (hottest == null || h.totalW() > hottest.totalW()) {
                    hottest = h;
                    at = inst;
                }
            }
            max[i] = Math.max(0.0, hottest.totalW());
            runaway[i] = hottest.outcome() == PointStatus.RUNAWAY ? hottest.totalW() : 0.0;
            diode[i] = hottest.diodeW();
            perKelvin[i] = 1.0 / at.path().rThetaJaKPerW();
        });
        double sum = 0;
        for (double m : max) {
            sum += m;
        }
        return new Sample(x, x - enclosure.riseK(sum), HeatFloor.of(runaway, diode, perKelvin));
    }
}
