package org.tjmargin.bench;

import java.nio.file.Path;
import java.util.Locale;
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

/**
 * How the statistics' cost grows with the sample count: the demo board's whole statistics stage (every position,
 * the highest-ambient run, RSS, tornado and the yield curve) at 2 500 … 80 000 samples per run, in one warm JVM,
 * each size the median of 5 runs after warm-up; then the least-squares slope of log(time) on log(samples), the
 * measured exponent (1 means linear). Surge samples stay at the demo's 200 (a fixed cost), so the exponent is
 * that of the steady-state runs plus a constant.
 *
 * <p>Run: {@code java -cp target/test-classes:target/classes:$(cat target/cp.txt) org.tjmargin.bench.SampleScaling
 * [design]} (class path as for the JMH benchmarks, see DEVELOPERS.md).
 */
public final class SampleScaling {

    private SampleScaling() {
    }

    public static void main(String[] args) {
        Path design = Path.of(args.length > 0 ? args[0] : "demo/design.yaml");
        LoadedDesign loaded = DesignLoader.load(design);
        Policy policy = ProfileLoader.shipped("general-commercial").policy().withBuiltInMinimum();
        AnalysisResult result = Analysis.run(loaded.board(), policy, SolverSettings.DEFAULT);
        StatisticsPlan base = loaded.statisticsWith(java.util.Optional.empty(), java.util.Optional.empty());
        long[] sizes = {2_500, 5_000, 10_000, 20_000, 40_000, 80_000};
        // Warm-up: the largest size twice, so that the JIT has compiled the kernels before timing.
        for (int w = 0; w < 2; w++) {
            time(result, base, sizes[sizes.length - 1]);
        }
        double[] x = new double[sizes.length];
        double[] y = new double[sizes.length];
        System.out.println("samples per run, statistics stage (s, median of 5), samples/s over all runs");
        for (int i = 0; i < sizes.length; i++) {
            double[] t = new double[5];
            for (int k = 0; k < t.length; k++) {
                t[k] = time(result, base, sizes[i]);
            }
            java.util.Arrays.sort(t);
            double med = t[2];
            long total = StatisticalAnalysis.totalSamples(result, plan(base, sizes[i]));
            System.out.printf(Locale.ROOT, "%8d  %8.4f  %.3g%n", sizes[i], med, total / med);
            x[i] = Math.log(sizes[i]);
            y[i] = Math.log(med);
        }
        System.out.printf(Locale.ROOT, "exponent of time in samples (least squares on logs): %.3f over all sizes, "
                + "%.3f over the largest four (the fixed cost of the surge samples and of the RSS and tornado "
                + "weighs on the small sizes)%n", slope(x, y), slope(java.util.Arrays.copyOfRange(x, 2, x.length),
                java.util.Arrays.copyOfRange(y, 2, y.length)));
    }

    private static StatisticsPlan plan(StatisticsPlan base, long samples) {
        return new StatisticsPlan(new MonteCarloSettings(samples, base.settings().seed(),
                base.settings().blockSize(), base.settings().histogramBins()), base.yieldPoints(), base.surgeSamples(),
                base.models());
    }

    private static double time(AnalysisResult result, StatisticsPlan base, long samples) {
        long t0 = System.nanoTime();
        StatisticalAnalysis.run(result, plan(base, samples), SolverSettings.DEFAULT, StatisticsProgress.NONE);
        return (System.nanoTime() - t0) / 1e9;
    }

    static double slope(double[] x, double[] y) {
        double mx = 0;
        double my = 0;
        for (int i = 0; i < x.length; i++) {
            mx += x[i];
            my += y[i];
        }
        mx /= x.length;
        my /= y.length;
        double sxy = 0;
        double sxx = 0;
        for (int i = 0; i < x.length; i++) {
            sxy += (x[i] - mx) * (y[i] - my);
            sxx += (x[i] - mx) * (x[i] - mx);
        }
        return sxy / sxx;
    }
}
