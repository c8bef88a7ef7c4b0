package org.tjmargin.bench;

import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;
import org.tjmargin.circuit.LoadRange;
import org.tjmargin.circuit.SeriesResistor;
import org.tjmargin.circuit.ShuntRegulatorSpec;
import org.tjmargin.derating.Policy;
import org.tjmargin.device.BreakdownDiode;
import org.tjmargin.device.BreakdownPart;
import org.tjmargin.device.Celsius;
import org.tjmargin.device.DiodeRatings;
import org.tjmargin.device.KneeModel;
import org.tjmargin.device.Leakage;
import org.tjmargin.device.PowerRatingCurve;
import org.tjmargin.device.RatingReference;
import org.tjmargin.device.TemperatureCoefficient;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.solve.SolverSettings;
import org.tjmargin.thermal.GivenPath;
import org.tjmargin.variation.Range;
import org.tjmargin.variation.VariationModel;
import org.tjmargin.variation.statistical.MonteCarlo;
import org.tjmargin.variation.statistical.MonteCarloSettings;
import org.tjmargin.variation.statistical.PointEvaluator;

/**
 * Monte Carlo of the coupled shunt-regulator operating point, all six axes varying, on all cores (target ≥ 1e7
 * samples per second on two cores). {@link #operatingPoints} is the fast kernel (closed form per sample,
 * junction temperature moments and histogram); {@link #withPolicy} the full run, each sample built as records and
 * held against the built-in policy. Throughput is in samples per second. The seed changes per invocation so the
 * JIT cannot fold the run away. Run: {@code java -cp <test classpath> org.openjdk.jmh.Main MonteCarloBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 3, time = 2)
@Fork(1)
@Threads(1)
public class MonteCarloBenchmark {

    static final int FAST_SAMPLES = 4_000_000;
    static final int FULL_SAMPLES = 200_000;

    private PositionSpec spec;
    private PointEvaluator evaluator;
    private long seed;

    @Setup
    public void setUp() {
        // Invented 6.2 V piecewise-linear Zener, 300 K/W ± 10 %, 15 V ± 10 % through 220 Ω ± 5 %, 2 … 8 mA load.
        BreakdownDiode d = new BreakdownDiode(6.1, 5.0, 20e-3, 1e-3, new KneeModel.Linear(),
                TemperatureCoefficient.exact(2.5e-3), Leakage.NONE);
        BreakdownPart part = new BreakdownPart("bench-invented", BreakdownPart.Kind.ZENER, 6.2, 0.05, d,
                new DiodeRatings(Celsius.toKelvin(175), PowerRatingCurve.flatThenLinear(RatingReference.LEAD, 9.5e-3,
                        0.5, Celsius.toKelvin(75), Celsius.toKelvin(175)), 0.08), 0.0, List.of());
        SeriesResistor rs = new SeriesResistor(Range.relative(220.0, 0.05), PowerRatingCurve.flatThenLinear(
                RatingReference.AMBIENT, 0.0, 0.5, Celsius.toKelvin(70), Celsius.toKelvin(155)));
        spec = new PositionSpec("D1", part, new GivenPath(300, 150, List.of()), new ShuntRegulatorSpec(
                Range.relative(15.0, 0.10), rs, new LoadRange.Current(Range.between(2e-3, 8e-3))),
                new Range(-0.12, 0.0, 0.12), Range.relative(1.0, 0.10), new Range(2.0e-3, 2.5e-3, 3.0e-3), List.of());
        evaluator = new PointEvaluator(spec, Policy.builtInMinimum(), Celsius.toKelvin(50), SolverSettings.DEFAULT);
    }

    @Benchmark
    @OperationsPerInvocation(FAST_SAMPLES)
    public double operatingPoints() {
        return MonteCarlo.operatingPoints(spec, VariationModel.UNIFORM, Celsius.toKelvin(50),
                MonteCarloSettings.of(FAST_SAMPLES, seed++), SolverSettings.DEFAULT).tj().mean();
    }

    @Benchmark
    @OperationsPerInvocation(FULL_SAMPLES)
    public double withPolicy() {
        return MonteCarlo.run(evaluator, VariationModel.UNIFORM, MonteCarloSettings.of(FULL_SAMPLES, seed++))
                .tj().mean();
    }
}
