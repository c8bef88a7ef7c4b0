package org.tjmargin.bench;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.RunnerException;
import org.openjdk.jmh.runner.options.OptionsBuilder;
import org.tjmargin.surge.ClampLine;
import org.tjmargin.surge.CombinationWaveGenerator;
import org.tjmargin.surge.LinearClampLine;
import org.tjmargin.surge.SurgeSource;
import org.tjmargin.surge.SurgeTrain;
import org.tjmargin.surge.SurgeTrainResult;
import org.tjmargin.surge.TransientSettings;
import org.tjmargin.thermal.FosterNetwork;

/**
 * A 1 s train of 100 combination-wave surges (10 ms apart), each resolved to at least 50 points per front: the
 * surges are solved transiently and the train through the per-stage train algebra ({@link SurgeTrain}). Target:
 * under 50 ms per train.
 *
 * <p>Run (JMH is not part of {@code verify}):
 * <pre>
 *   mvn -B -q test-compile dependency:build-classpath -Dmdep.outputFile=target/test-classpath.txt
 *   java -cp target/test-classes:target/classes:$(cat target/test-classpath.txt) org.openjdk.jmh.Main 'Surge.*Benchmark'
 * </pre>
 * or this class's {@code main} with the same class path. Invented case: a level-2 surge (1 kV) line to earth
 * into a 60 V clamp with +0.1 %/K, a three-stage network.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class SurgeTrainBenchmark {

    private SurgeSource source;
    private ClampLine clamp;
    private FosterNetwork network;
    private TransientSettings settings;

    @Setup
    public void setUp() {
        source = CombinationWaveGenerator.of(1000, CombinationWaveGenerator.Coupling.POWER_LINE_TO_EARTH).source();
        clamp = new LinearClampLine(60, 0.06, 0.05);
        network = FosterNetwork.of(new double[] {0.05, 0.4, 3}, new double[] {5e-6, 3e-4, 0.02});
        settings = TransientSettings.defaults().withPointsPerFront(50);
    }

    @Benchmark
    public SurgeTrainResult hundredSurgesInOneSecond() {
        return SurgeTrain.analyse(source, clamp, network, 323.15, 0.01, 100, settings);
    }

    public static void main(String[] args) throws RunnerException {
        new Runner(new OptionsBuilder().include(SurgeTrainBenchmark.class.getSimpleName()).build()).run();
    }
}
