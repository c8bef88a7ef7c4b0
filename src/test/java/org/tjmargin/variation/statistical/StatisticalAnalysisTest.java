package org.tjmargin.variation.statistical;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tjmargin.derating.Policy;
import org.tjmargin.design.DesignLoader;
import org.tjmargin.design.LoadedDesign;
import org.tjmargin.design.ProfileLoader;
import org.tjmargin.solve.Analysis;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.SolverSettings;
import org.tjmargin.variation.Axis;
import org.tjmargin.variation.Distribution;

/**
 * The statistics stage on the (invented) demo board: what the design file asks for reaches the runs, the runs
 * agree with each other where they must, and the result does not depend on the number of threads.
 */
class StatisticalAnalysisTest {

    static final Path DEMO = Path.of("demo/design.yaml");

    static LoadedDesign loaded;
    static AnalysisResult result;
    static StatisticsPlan plan;
    static StatisticsResult stats;

    @BeforeAll
    static void run() {
        loaded = DesignLoader.load(DEMO);
        Policy policy = ProfileLoader.shipped("general-commercial").policy().withBuiltInMinimum();
        result = Analysis.run(loaded.board(), policy, SolverSettings.DEFAULT);
        StatisticsPlan design = loaded.statistics().orElseThrow();
        // A smaller budget than the demo's, to keep the suite fast; the seed and the distributions are the design's.
        plan = new StatisticsPlan(MonteCarloSettings.of(3000, design.settings().seed()), 6, 12, design.models());
        stats = StatisticalAnalysis.run(result, plan, SolverSettings.DEFAULT, StatisticsProgress.NONE);
    }

    @Test
    void theDesignsStatisticsBlockAndDistributionsAreRead() {
        StatisticsPlan p = loaded.statistics().orElseThrow();
        assertEquals(10_000, p.settings().samples());
        assertEquals(20_261_202L, p.settings().seed());
        assertEquals(16, p.yieldPoints());
        assertEquals(200, p.surgeSamples());
        var d1 = p.modelFor("D1");
        assertEquals(new Distribution.Normal(3, true), d1.distribution(Axis.SERIES_RESISTOR));
        assertEquals(new Distribution.Normal(3, true), d1.distribution(Axis.VZ));
        assertEquals(new Distribution.Triangular(), d1.distribution(Axis.THERMAL_RESISTANCE));
        // Not named: uniform, the default.
        assertEquals(Distribution.UNIFORM, d1.distribution(Axis.SUPPLY));
        assertEquals(Distribution.UNIFORM, p.modelFor("D2").distribution(Axis.SUPPLY));
    }

    @Test
    void commandLineSamplesAndSeedOverrideTheDesign() {
        StatisticsPlan p = loaded.statisticsWith(Optional.of(500L), Optional.of(9L));
        assertEquals(500, p.settings().samples());
        assertEquals(9, p.settings().seed());
        assertEquals(200, p.surgeSamples());
        assertEquals(loaded.statistics().orElseThrow().models(), p.models());
    }

    @Test
    void theStatisticsBlockMayNameItsPositions(@org.junit.jupiter.api.io.TempDir Path dir) throws Exception {
        Path fixture = Path.of("src/test/resources/bad-input/statistics-unknown-position.yaml");
        String text = java.nio.file.Files.readString(fixture)
                .replace("positions: [D1, D7]", "positions: [D1]")
                .replace("parts: ../design/parts.json", "parts: " + Path.of("src/test/resources/design/parts.json")
                        .toAbsolutePath());
        Path design = java.nio.file.Files.writeString(dir.resolve("selected.yaml"), text);
        StatisticsPlan p = DesignLoader.load(design).statistics().orElseThrow();
        assertEquals(Optional.of(java.util.Set.of("D1")), p.positions());
        assertTrue(p.covers("D1"));
        assertFalse(p.covers("D2"));
        assertTrue(plan.covers("any"), "without a selection every position is covered");
    }

    /**
     * A design may name the positions its statistics run for (a large board needs them for a few only): the others
     * get none, and the named ones get exactly the numbers of the run over every position, because each position
     * draws from its own split stream (the determinism property of design 2.7).
     */
    @Test
    void aSelectionOfPositionsRunsThoseOnlyWithTheSameNumbers() {
        StatisticsPlan only = new StatisticsPlan(plan.settings(), plan.yieldPoints(), plan.surgeSamples(),
                plan.models(), Optional.of(java.util.Set.of("D2")));
        StatisticsResult some = StatisticalAnalysis.run(result, only, SolverSettings.DEFAULT, StatisticsProgress.NONE);
        assertEquals(1, some.positions().size());
        assertEquals(some.of("D2").orElseThrow(), stats.of("D2").orElseThrow());
        assertTrue(some.of("D1").isEmpty());
        assertEquals(StatisticalAnalysis.samplesOf(result.board().positions().get(1), plan, plan.yieldPoints()),
                StatisticalAnalysis.totalSamples(result, only));
        assertEquals("D2", result.board().positions().get(1).id());
    }

    @Test
    void everyPositionHasItsRunsAtTheHighestAmbient() {
        assertEquals(result.board().positions().size(), stats.positions().size());
        for (PositionStatistics p : stats.positions()) {
            assertEquals(result.board().ambient().maxK(), p.ambientK(), 1e-9);
            boolean surges = result.board().positions().stream().filter(s -> s.id().equals(p.positionId()))
                    .findFirst().orElseThrow().surges().isPresent();
            assertEquals(surges, p.surgesIncluded(), p.positionId());
            assertEquals(surges ? plan.surgeSamples() : plan.settings().samples(), p.monteCarlo().settings().samples());
            assertEquals(plan.yieldPoints(), p.yield().size());
            assertTrue(p.rss() instanceof RssOutcome.Spread, p.positionId());
        }
    }

    /**
     * Worst-case corners bound the sampled junction temperatures. Every input is drawn inside its range (uniform,
     * triangular, truncated normal) and each position's Tj is monotone in every input over its range, so the
     * extreme-value analysis must bracket every sample (Monte Carlo within the corners: textbook property of a
     * monotone function on a box, its extremes at vertices). Tolerance: the solver's 1e-9 K.
     */
    @Test
    void cornersBracketTheSampledJunctionTemperatures() {
        for (PositionStatistics p : stats.positions()) {
            var mc = p.monteCarlo();
            assertEquals(0, mc.tjHistogram().underflow() + mc.tjHistogram().overflow(), p.positionId());
            assertTrue(mc.tj().mean() >= p.corners().tjMinK() - 1e-9 && mc.tj().mean() <= p.corners().tjMaxK()
                    + 1e-9, p.positionId());
            if (p.corners().margin() >= 0) {
                assertEquals(0, mc.violation().successes(), p.positionId() + ": every corner passes, so no sample"
                        + " inside the box can fail a rule monotone in the inputs");
            }
        }
    }

    /**
     * Common random numbers: the same parts at every ambient. D1's junction only heats with ambient, so its yield
     * can only fall, never rise by sampling noise; where no surges run, the curve's last point is the highest-
     * ambient run itself.
     */
    @Test
    void yieldFallsWithAmbientAndEndsAtTheHighestAmbientRun() {
        PositionStatistics d1 = stats.of("D1").orElseThrow();
        List<YieldPoint> y = d1.yield();
        for (int k = 1; k < y.size(); k++) {
            assertTrue(y.get(k).ambientK() > y.get(k - 1).ambientK());
            assertTrue(y.get(k).yield() <= y.get(k - 1).yield(), "yield rose at " + y.get(k).ambientK());
        }
        assertEquals(result.board().ambient().minK(), y.get(0).ambientK(), 1e-9);
        assertEquals(d1.monteCarlo().yield().estimate(), y.get(y.size() - 1).yield(), 0.0);
    }

    /**
     * The surge clamp D4's second yield curve: the same ambients, every rule with each surge run on every sample, the
     * highest-ambient run (with surges) as its last point. Adding rules can only add failures, so on the same parts
     * (common random numbers: the curve's samples are the first of the steady-state run's draws) it fails at least
     * every sample the steady-state rules fail. Positions without surges have none.
     */
    @Test
    void theSurgeClampsSecondYieldCurveRunsItsSurgesOnTheSameParts() {
        PositionStatistics d4 = stats.of("D4").orElseThrow();
        List<YieldPoint> with = d4.yieldWithSurges();
        List<YieldPoint> steady = d4.yield();
        assertEquals(steady.size(), with.size());
        int index = result.board().positions().indexOf(result.board().positions().stream()
                .filter(p -> p.id().equals("D4")).findFirst().orElseThrow());
        int[] ambients = StatisticalAnalysis.yieldIndices(result.sweep().size(), plan.yieldPoints());
        MonteCarloSettings few = new MonteCarloSettings(plan.surgeSamples(), plan.settings().seed(),
                plan.settings().blockSize(), plan.settings().histogramBins());
        for (int k = 0; k < with.size(); k++) {
            assertEquals(steady.get(k).ambientK(), with.get(k).ambientK(), 0.0);
            assertEquals(plan.surgeSamples(), with.get(k).samples());
            YieldPoint sameParts = YieldCurve.at(result.sweep().get(ambients[k]), index,
                    result.board().positions().get(index), result.policy(), plan.modelFor("D4"), few,
                    SolverSettings.DEFAULT, false);
            assertTrue(with.get(k).yield() <= sameParts.yield(), "with surges at " + with.get(k).ambientK()
                    + " K: " + with.get(k).yield() + " > " + sameParts.yield());
        }
        assertEquals(d4.monteCarlo().yield().estimate(), with.get(with.size() - 1).yield(), 0.0);
        assertTrue(stats.of("D1").orElseThrow().yieldWithSurges().isEmpty());
    }

    /**
     * The same board swept hotter, to 100 °C, where the clamp D4's surges exceed their limits while its steady state
     * still holds: the curve with surges falls where the steady-state one does not.
     */
    @Test
    void theCurveWithSurgesFallsWhereTheSurgesFail() {
        var b = loaded.board();
        var hotter = new org.tjmargin.solve.Board(b.name(), b.positions(), b.enclosure(),
                new org.tjmargin.solve.AmbientRange(org.tjmargin.device.Celsius.toKelvin(40),
                        org.tjmargin.device.Celsius.toKelvin(100), 4));
        AnalysisResult r = Analysis.run(hotter, result.policy(), SolverSettings.DEFAULT);
        StatisticsPlan small = new StatisticsPlan(MonteCarloSettings.of(400, plan.settings().seed()), 4, 40,
                plan.models(), Optional.of(java.util.Set.of("D4")));
        PositionStatistics d4 = StatisticalAnalysis.run(r, small, SolverSettings.DEFAULT, StatisticsProgress.NONE)
                .of("D4").orElseThrow();
        YieldPoint steady = d4.yield().get(3);
        YieldPoint with = d4.yieldWithSurges().get(3);
        assertEquals(1.0, steady.yield(), 0.0, "D4's steady state holds at 100 °C");
        assertEquals(0.0, with.yield(), 0.0, "its surges fail there on every part");
        assertEquals(1.0, d4.yieldWithSurges().get(0).yield(), 0.0, "and pass at 40 °C");
    }

    /**
     * Root-sum-square against Monte Carlo on the near-linear current-fed reference D2 (JCGM 100:2008, §5.1.2: the
     * first-order law is exact for a linear model; D2's Tj is linear in its inputs to about 1 %): the spreads agree
     * within the Monte Carlo's own sampling error of σ at 3000 samples (σ/√(2n) ≈ 1.3 %) plus the nonlinearity,
     * taken together as 6 %.
     */
    @Test
    void rssAndMonteCarloAgreeOnTheNearLinearReference() {
        PositionStatistics d2 = stats.of("D2").orElseThrow();
        double rss = ((RssOutcome.Spread) d2.rss()).tjSigmaK();
        double mc = d2.monteCarlo().tj().standardDeviation();
        assertEquals(rss, mc, 0.06 * rss, "RSS " + rss + " K, Monte Carlo " + mc + " K");
    }

    @Test
    void progressCountsEverySampleOnce() {
        AtomicLong last = new AtomicLong();
        AtomicLong total = new AtomicLong();
        StatisticalAnalysis.run(result, plan, SolverSettings.DEFAULT, (done, all) -> {
            last.accumulateAndGet(done, Math::max);
            total.set(all);
        });
        assertEquals(total.get(), last.get());
        long expected = 0;
        for (var s : result.board().positions()) {
            expected += StatisticalAnalysis.samplesOf(s, plan, plan.yieldPoints());
        }
        assertEquals(expected, total.get());
    }

    @Test
    void yieldAmbientsIncludeBothEndsOnce() {
        assertEquals(List.of(0, 25, 50, 75), java.util.Arrays.stream(StatisticalAnalysis.yieldIndices(76, 4))
                .boxed().toList());
        assertEquals(List.of(0, 1, 2), java.util.Arrays.stream(StatisticalAnalysis.yieldIndices(3, 16))
                .boxed().toList());
    }

    @Test
    void resultsAreIdenticalOnOneAndFourThreads() throws Exception {
        StatisticsResult one = inPool(1);
        StatisticsResult four = inPool(4);
        assertEquals(one, four);
        assertFalse(one.positions().isEmpty());
    }

    private static StatisticsResult inPool(int threads) throws Exception {
        ForkJoinPool pool = new ForkJoinPool(threads);
        try {
            return pool.submit(() -> StatisticalAnalysis.run(result, plan, SolverSettings.DEFAULT,
                    StatisticsProgress.NONE)).get();
        } finally {
            pool.shutdown();
        }
    }
}
