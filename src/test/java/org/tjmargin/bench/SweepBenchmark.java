package org.tjmargin.bench;

import java.nio.file.Path;
import java.util.List;
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
import org.tjmargin.derating.Policy;
import org.tjmargin.design.DesignLoader;
import org.tjmargin.design.ProfileLoader;
import org.tjmargin.device.Celsius;
import org.tjmargin.solve.AmbientRange;
import org.tjmargin.solve.Board;
import org.tjmargin.solve.BoardSolver;
import org.tjmargin.solve.PreparedBoard;
import org.tjmargin.solve.SolverSettings;
import org.tjmargin.thermal.Enclosure;

/**
 * A 100-point ambient sweep of one position at all its corners, held against a policy (target under 10 ms).
 * The demo's shunt regulator D1 with six varying axes (64 corners) in air 10 K above the room. Run as described in
 * DEVELOPERS.md, "Benchmarks".
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class SweepBenchmark {

    private PreparedBoard board;
    private Policy policy;
    private double[] ambients;

    @Setup
    public void setUp() {
        Board demo = DesignLoader.load(Path.of("demo/design.yaml")).board();
        Board one = new Board("bench", List.of(demo.positions().get(0)), new Enclosure.FixedRise(10),
                new AmbientRange(Celsius.toKelvin(-20), Celsius.toKelvin(79), 100));
        board = PreparedBoard.of(one);
        policy = ProfileLoader.shipped("general-commercial").policy().withBuiltInMinimum();
        ambients = one.ambient().temperaturesK();
    }

    @Benchmark
    public double sweepOnePositionAllCorners() {
        double sum = 0;
        for (double t : ambients) {
            sum += BoardSolver.solveAt(board, policy, t, SolverSettings.DEFAULT).positions().get(0).margin();
        }
        return sum;
    }
}
