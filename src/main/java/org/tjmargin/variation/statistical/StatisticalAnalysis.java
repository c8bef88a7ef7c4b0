package org.tjmargin.variation.statistical;

import java.util.List;
import java.util.concurrent.atomic.AtomicLong;
import java.util.stream.IntStream;
import org.tjmargin.derating.Policy;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.BoardAtAmbient;
import org.tjmargin.solve.PointStatus;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.solve.SolverSettings;
import org.tjmargin.variation.VariationModel;

/**
 * The statistical analysis of a board after its corner analysis (design 2.7): for every position, at the design's
 * highest ambient, the worst-case corners, the root-sum-square spread, a seeded Monte Carlo held against the policy
 * and the tornado ranking; and the yield against ambient over {@link StatisticsPlan#yieldPoints()} ambients of the
 * sweep.
 *
 * <p>The air. Ambient is not sampled: at each ambient a position's air is the one of the corner analysis's board
 * balance, in which every position sits at its corner of greatest heat. That air is the worst the board can make,
 * so the Monte Carlo probabilities are conditional on it and err on the safe side (a sampled board dissipates no
 * more than its worst corners).
 *
 * <p>Surges. Where a position has surges, its run at the highest ambient (and the spread and ranking there) runs
 * every surge on every sample, with {@link StatisticsPlan#surgeSamples()} samples since each is a coupled transient
 * (about 0.5 ms per surge and sample here). Its yield curve is drawn twice over the same ambients: the steady-state
 * rules with the full sample count, which resolves small probabilities, and every rule with each surge run on every
 * sample, with the surge sample count (the same parts, the first of the full run's draws), which is what the
 * position must pass. Both are labelled so in every output.
 *
 * <p>Determinism. Every run uses the plan's seed (common random numbers across ambients: the same parts at every
 * temperature, so the yield curve is smooth) and {@link MonteCarlo}'s split streams, so results are identical
 * whatever the number of threads. Positions and ambients run in parallel on the common fork-join pool.
 *
 * <p>Cost: {@code positions × (1 + yield points − 1) × samples} steady-state samples (the curve's last point reuses
 * the highest-ambient run where no surges are run), plus {@code surge positions × yield points × surge samples}
 * samples with transients (the curve with surges reuses the highest-ambient run at its last point).
 */
public final class StatisticalAnalysis {

    private StatisticalAnalysis() {
    }

    /**
     * Runs the statistics of {@code result}'s board.
     *
     * @param result   the corner analysis (its sweep gives every ambient's air)
     * @param plan     budgets, seed and distributions
     * @param solver   junction solve settings (those of the corner analysis)
     * @param progress told of every finished run
     */
    public static StatisticsResult run(AnalysisResult result, StatisticsPlan plan, SolverSettings solver,
                                       StatisticsProgress progress) {
        List<PositionSpec> specs = result.board().positions();
        int[] ambients = yieldIndices(result.sweep().size(), plan.yieldPoints());
        Work work = new Work(progress, totalSamples(result, plan));
        List<PositionStatistics> out = IntStream.range(0, specs.size()).filter(i -> plan.covers(specs.get(i).id()))
                .parallel().mapToObj(i -> position(result, i, plan, solver, ambients, work)).toList();
        return new StatisticsResult(plan, out);
    }

    /** Samples the whole statistics of {@code result}'s board draw under {@code plan}: the unit of its progress. */
    public static long totalSamples(AnalysisResult result, StatisticsPlan plan) {
        int points = yieldIndices(result.sweep().size(), plan.yieldPoints()).length;
        long total = 0;
        for (PositionSpec s : result.board().positions()) {
            if (plan.covers(s.id())) {
                total += samplesOf(s, plan, points);
            }
        }
        return total;
    }

    /** Samples one position draws: the highest-ambient run and the yield curves' other points. */
    static long samplesOf(PositionSpec spec, StatisticsPlan plan, int yieldPoints) {
        long n = plan.settings().samples();
        if (spec.surges().isPresent()) {
            return (long) yieldPoints * (plan.surgeSamples() + n);
        }
        return (long) yieldPoints * n;
    }

    /**
     * Indices of {@code points} ambients spread evenly over a sweep of {@code size}, first and last included, each
     * once, increasing.
     */
    static int[] yieldIndices(int size, int points) {
        int n = Math.min(size, points);
        if (n <= 1) {
            return new int[] {size - 1};
        }
        int[] idx = new int[n];
        for (int k = 0; k < n; k++) {
            idx[k] = (int) Math.round((double) k * (size - 1) / (n - 1));
        }
        return idx;
    }

    private static PositionStatistics position(AnalysisResult result, int i, StatisticsPlan plan,
                                               SolverSettings solver, int[] ambients, Work work) {
        PositionSpec spec = result.board().positions().get(i);
        Policy policy = result.policy();
        VariationModel model = plan.modelFor(spec.id());
        BoardAtAmbient hottest = result.atMaximumAmbient();
        PositionAtAmbient at = hottest.positions().get(i);
        boolean surges = spec.surges().isPresent();
        PointEvaluator ev = new PointEvaluator(spec, policy, at.tLocalK(), solver, surges,
                hottest.airStatus() == PointStatus.RUNAWAY);
        // The air the results name: none where it has no balance (the evaluator is told it runs away).
        double air = hottest.airBalanced() ? at.tLocalK() : Double.NaN;
        MonteCarloSettings top = surges
                ? new MonteCarloSettings(plan.surgeSamples(), plan.settings().seed(), plan.settings().blockSize(),
                        plan.settings().histogramBins())
                : plan.settings();
        MonteCarloResult mc = MonteCarlo.run(ev, model, top);
        work.done(top.samples());
        RssOutcome rss = RootSumSquare.of(ev, model, RootSumSquare.DEFAULT_RELATIVE_STEP);
        TornadoResult tornado = Tornado.of(ev);
        int last = result.sweep().size() - 1;
        List<YieldPoint> yield = IntStream.of(ambients).parallel().mapToObj(k -> {
            if (k == last && !surges) {
                return YieldPoint.of(hottest.ambientK(), air, mc);
            }
            YieldPoint p = YieldCurve.at(result.sweep().get(k), i, spec, policy, model, plan.settings(), solver,
                    false);
            work.done(plan.settings().samples());
            return p;
        }).toList();
        List<YieldPoint> withSurges = !surges ? List.of() : IntStream.of(ambients).parallel().mapToObj(k -> {
            if (k == last) {
                return YieldPoint.of(hottest.ambientK(), air, mc);
            }
            YieldPoint p = YieldCurve.at(result.sweep().get(k), i, spec, policy, model, top, solver, true);
            work.done(top.samples());
            return p;
        }).toList();
        return new PositionStatistics(spec.id(), hottest.ambientK(), air, extremes(at), rss, mc, surges,
                tornado, yield, withSurges);
    }

    private static CornerExtremes extremes(PositionAtAmbient at) {
        return new CornerExtremes(at.envelope().tjMinK(), at.envelope().tjMaxK(), at.margin(), at.limitingRuleId(),
                at.cornerCount());
    }

    /** Shared progress count. */
    private static final class Work {
        private final StatisticsProgress progress;
        private final long total;
        private final AtomicLong done = new AtomicLong();

        Work(StatisticsProgress progress, long total) {
            this.progress = progress;
            this.total = total;
        }

        void done(long samples) {
            progress.advanced(done.addAndGet(samples), total);
        }
    }
}
