package org.tjmargin.bench;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.RunnerException;
import org.openjdk.jmh.runner.options.OptionsBuilder;
import org.tjmargin.thermal.FosterFitOutcome;
import org.tjmargin.thermal.FosterFitSettings;
import org.tjmargin.thermal.FosterNetwork;
import org.tjmargin.thermal.FosterPeakSearch;
import org.tjmargin.thermal.FosterPulse;
import org.tjmargin.thermal.PulseRatingFit;

/**
 * A four-stage Foster fit to 20 points of a peak-pulse-power rating curve (1 µs to 1 s). Target: under 200 ms.
 * Run as described in {@link SurgeTrainBenchmark}. The points come from an invented four-stage network, so the
 * fit has an exact answer to find.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class SurgeRatingFitBenchmark {

    @Param({"RECTANGULAR", "EXPONENTIAL_DECAY"})
    public FosterPulse.Shape shape;

    private double[] widthsS;
    private double[] powersW;

    @Setup
    public void setUp() {
        FosterNetwork truth = FosterNetwork.of(new double[] {0.02, 0.15, 1.2, 9}, new double[] {3e-6, 1e-4, 4e-3, 0.2});
        widthsS = new double[20];
        powersW = new double[20];
        for (int j = 0; j < 20; j++) {
            widthsS[j] = 1e-6 * Math.pow(1e6, j / 19.0);
            powersW[j] = PulseRatingFit.ratedPeakPowerW(truth, new FosterPulse(shape, widthsS[j]), 448.15, FosterPeakSearch.defaults());
        }
    }

    @Benchmark
    public FosterFitOutcome fitTwentyPoints() {
        return PulseRatingFit.fit(shape, widthsS, powersW, 448.15, 4, FosterFitSettings.defaults());
    }

    public static void main(String[] args) throws RunnerException {
        new Runner(new OptionsBuilder().include(SurgeRatingFitBenchmark.class.getSimpleName()).build()).run();
    }
}
