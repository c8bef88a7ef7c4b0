package org.tjmargin.bench;

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
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;
import org.tjmargin.circuit.Load;
import org.tjmargin.circuit.ShuntRegulator;
import org.tjmargin.device.BreakdownDiode;
import org.tjmargin.device.Celsius;
import org.tjmargin.device.Leakage;
import org.tjmargin.device.TemperatureCoefficient;
import org.tjmargin.solve.ElectroThermalSolver;
import org.tjmargin.solve.SolverSettings;
import org.tjmargin.solve.ThermalOutcome;
import org.tjmargin.thermal.GivenPath;

/**
 * The general bracketed solve of one shunt-regulator operating point (target ≥ 1e6 solves per second on one
 * core). The supply is varied from call to call so the JIT cannot fold the solve away. Run as described in
 * DEVELOPERS.md, "Benchmarks".
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
@Threads(1)
public class SolverBenchmark {

    private BreakdownDiode diode;
    private GivenPath path;
    private double supplyV;

    @Setup
    public void setUp() {
        // 6.2 V Zener with a positive coefficient and a current-dependent knee, 150 K/W, 15 V supply through 220 Ω,
        // 5 mA load: about 0.23 W, a typical self-heated regulator.
        diode = BreakdownDiode.fromDatasheet(6.2, 20e-3, 4, 1e-3, 200, TemperatureCoefficient.exact(2.5e-3),
                new org.tjmargin.device.VzTestCondition.Pulsed(Celsius.T25_K), Leakage.NONE);
        path = new GivenPath(150, 150, List.of());
        supplyV = 15;
    }

    @Benchmark
    public double shuntRegulatorPoint() {
        supplyV = supplyV > 16 ? 14 : supplyV + 1e-3;
        ThermalOutcome out = ElectroThermalSolver.solve(new ShuntRegulator(supplyV, 220, new Load.Current(5e-3)),
                diode, path, Celsius.toKelvin(55), SolverSettings.DEFAULT);
        return ((ThermalOutcome.Converged) out).point().tjK();
    }

    /** A quick smoke check that the benchmark state is valid (not a timing test). */
    static boolean isValid() {
        SolverBenchmark b = new SolverBenchmark();
        b.setUp();
        return b.shuntRegulatorPoint() > 0;
    }

}
