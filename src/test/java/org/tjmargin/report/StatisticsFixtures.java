package org.tjmargin.report;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.tjmargin.derating.Policy;
import org.tjmargin.design.DesignLoader;
import org.tjmargin.design.LoadedDesign;
import org.tjmargin.design.ProfileLoader;
import org.tjmargin.solve.Analysis;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.SolverSettings;
import org.tjmargin.variation.statistical.MonteCarloSettings;
import org.tjmargin.variation.statistical.StatisticalAnalysis;
import org.tjmargin.variation.statistical.StatisticsPlan;
import org.tjmargin.variation.statistical.StatisticsProgress;
import org.tjmargin.variation.statistical.StatisticsResult;

/**
 * Real statistical results for the report tests, kept small so that the suite stays fast: 2000 samples per run,
 * 6 ambients on the yield curve and 20 samples with surges (the engine's defaults are 10 000, 16 and 200). The
 * demo design (invented) is analysed under its own profile, as the command line does.
 */
final class StatisticsFixtures {

    /** Samples per Monte Carlo run in these tests. */
    static final long SAMPLES = 2000;
    /** Ambients of the yield curve in these tests. */
    static final int YIELD_POINTS = 6;
    /** Samples of a position with surges in these tests (each runs every surge transient). */
    static final long SURGE_SAMPLES = 20;

    private StatisticsFixtures() {
    }

    /** An analysis with its statistics and every chart of both. */
    record Run(AnalysisResult result, StatisticsResult stats, List<RenderedChart> charts) {

        Optional<StatisticsResult> optional() {
            return Optional.of(stats);
        }
    }

    /** The demo, analysed once per test JVM (initialisation-on-demand holder). */
    static Run demo() {
        return Demo.RUN;
    }

    private static final class Demo {
        static final Run RUN = demoRun();
    }

    private static Run demoRun() {
        LoadedDesign d = DesignLoader.load(Path.of("demo/design.yaml"));
        Policy policy = ProfileLoader.shipped(d.policy().orElseThrow()).policy().withBuiltInMinimum();
        AnalysisResult r = Analysis.run(d.board(), policy, SolverSettings.DEFAULT);
        StatisticsPlan p = d.statisticsWith(Optional.of(SAMPLES), Optional.empty());
        StatisticsPlan small = new StatisticsPlan(p.settings(), YIELD_POINTS, SURGE_SAMPLES, p.models());
        StatisticsResult s = StatisticalAnalysis.run(r, small, SolverSettings.DEFAULT, StatisticsProgress.NONE);
        return new Run(r, s, ChartSet.render(r, Optional.of(s)));
    }

    /** Statistics of any analysis with every input uniform, at the small budget, seed 1; charts not drawn. */
    static StatisticsResult of(AnalysisResult r) {
        StatisticsPlan plan = new StatisticsPlan(MonteCarloSettings.of(SAMPLES, 1), YIELD_POINTS, SURGE_SAMPLES,
                Map.of());
        return StatisticalAnalysis.run(r, plan, SolverSettings.DEFAULT, StatisticsProgress.NONE);
    }
}
