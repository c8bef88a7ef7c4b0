package org.tjmargin.variation.statistical;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.IntStream;
import org.tjmargin.circuit.CurrentFedSpec;
import org.tjmargin.circuit.LoadRange;
import org.tjmargin.circuit.ShuntRegulatorSpec;
import org.tjmargin.derating.Rule;
import org.tjmargin.device.BreakdownDiode;
import org.tjmargin.solve.PointStatus;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.solve.SolverSettings;
import org.tjmargin.solve.ThermalOutcome;
import org.tjmargin.variation.Axis;
import org.tjmargin.variation.AxisValues;
import org.tjmargin.variation.SplitMix64;
import org.tjmargin.variation.VariationModel;
import org.tjmargin.variation.WilsonInterval;

/**
 * Seeded Monte Carlo of one position's coupled operating point in fixed local air (design 2.7): every varying axis
 * drawn from its distribution by inverse CDF, the point solved ({@link PointEvaluator}) and held against the
 * policy. The air is held, not sampled: pass the position's {@code T_local} from the board balance at the
 * ambient of interest (e.g. {@code BoardAtAmbient.positions().get(i).tLocalK()}, the air at its worst case).
 *
 * <p>Reproducibility: the samples are cut into blocks of {@link MonteCarloSettings#blockSize()}; block {@code b}
 * draws from {@link SplitMix64#forBlock(long, long) SplitMix64.forBlock(seed, b)}, one uniform per varying axis
 * per sample in axis order. Blocks run in parallel on the common fork-join pool (or the pool the caller runs in)
 * and their counts and moments are merged in block order, so a seed gives bit-identical results whatever the
 * number of threads.
 *
 * <p>Stateless and thread-safe.
 */
public final class MonteCarlo {

    private MonteCarlo() {
    }

    /**
     * The full run: violation probabilities per rule and overall with 95 % Wilson intervals, moments and
     * histograms of the junction temperature and the limiting margin.
     */
    public static MonteCarloResult run(PointEvaluator evaluator, VariationModel model, MonteCarloSettings settings) {
        SampleSpace space = new SampleSpace(evaluator.spec(), model);
        int rules = evaluator.policy().rules().size();
        Tally prototype = edges(evaluator, space, settings);
        List<Tally> blocks = IntStream.range(0, settings.blocks()).parallel()
                .mapToObj(b -> runBlock(evaluator, space, settings, prototype, b)).toList();
        Tally total = prototype.emptyCopy(rules);
        blocks.forEach(total::merge);
        long n = settings.samples();
        List<RuleViolation> perRule = new ArrayList<>(rules);
        for (int i = 0; i < rules; i++) {
            Rule r = evaluator.policy().rules().get(i);
            perRule.add(new RuleViolation(r.id(), WilsonInterval.of95(total.ruleViolations[i], n)));
        }
        return new MonteCarloResult(evaluator.spec().id(), evaluator.tLocalK(), settings, space.axes(),
                WilsonInterval.of95(total.failures, n), perRule, total.runaway, total.notConverged, total.fast,
                total.tj.moments(), total.margin.moments(), total.tjBins.histogram(), total.marginBins.histogram());
    }

    private static Tally runBlock(PointEvaluator ev, SampleSpace space, MonteCarloSettings s, Tally prototype,
                                  int block) {
        SplitMix64 rng = SplitMix64.forBlock(s.seed(), block);
        Tally t = prototype.emptyCopy(ev.policy().rules().size());
        double[] v = space.nominalVector();
        for (int k = s.samplesIn(block); k > 0; k--) {
            space.draw(rng, v);
            Evaluation e = ev.evaluate(space.values(v));
            t.add(e);
        }
        return t;
    }

    /** Histogram edges from the corners of the varying axes (and the nominal). */
    private static Tally edges(PointEvaluator ev, SampleSpace space, MonteCarloSettings s) {
        double tjMin = Double.POSITIVE_INFINITY;
        double tjMax = Double.NEGATIVE_INFINITY;
        double mMin = Double.POSITIVE_INFINITY;
        double mMax = Double.NEGATIVE_INFINITY;
        List<AxisValues> points = new ArrayList<>(space.corners());
        points.add(AxisValues.nominal());
        for (AxisValues p : points) {
            Evaluation e = ev.evaluate(p);
            if (e.status() == PointStatus.CONVERGED) {
                tjMin = Math.min(tjMin, e.tjK());
                tjMax = Math.max(tjMax, e.tjK());
                mMin = Math.min(mMin, e.margin());
                mMax = Math.max(mMax, e.margin());
            }
        }
        if (tjMin > tjMax) {
            // No corner converged: the whole searched span (in runaway air, whose search stopped above the junction
            // cap, from the cap to that air), and every margin a rule can give.
            tjMin = Math.min(ev.tLocalK(), ev.settings().capK());
            tjMax = Math.max(ev.tLocalK(), ev.settings().capK());
            mMin = -1.0;
            mMax = 1.0;
        }
        // Half-widths when every corner gives the same value: 0.5 K and 0.01 of margin, finer than any report shows.
        return new Tally(Bins.around(tjMin, tjMax, 0.5, s.histogramBins()),
                Bins.around(mMin, mMax, 0.01, s.histogramBins()), ev.policy().rules().size());
    }

    /**
     * The operating point alone (no policy): junction temperature moments and histogram. Where the position is a
     * shunt regulator with a current load or a current-fed diode, without leakage data, each sample is solved by
     * the closed form of {@link LinearFastPath} on primitives (no allocation), falling back to the general solver
     * for a sample outside its assumptions; otherwise every sample goes to the general solver.
     *
     * @param spec     the position
     * @param model    the distributions
     * @param tLocalK  local air temperature (K)
     * @param settings samples, seed, block size, bins
     * @param solver   junction solve settings
     */
    public static OperatingPointSpread operatingPoints(PositionSpec spec, VariationModel model, double tLocalK,
                                                       MonteCarloSettings settings, SolverSettings solver) {
        SampleSpace space = new SampleSpace(spec, model);
        Kernel kernel = new Kernel(spec, tLocalK, solver);
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        List<AxisValues> points = new ArrayList<>(space.corners());
        points.add(AxisValues.nominal());
        for (AxisValues p : points) {
            ThermalOutcome out = spec.atValues(p).solve(tLocalK, solver);
            if (out instanceof ThermalOutcome.Converged c) {
                min = Math.min(min, c.point().tjK());
                max = Math.max(max, c.point().tjK());
            }
        }
        if (min > max) {
            min = Math.min(tLocalK, solver.capK());
            max = Math.max(tLocalK, solver.capK());
        }
        Bins edges = Bins.around(min, max, 0.5, settings.histogramBins());
        List<Tally> blocks = IntStream.range(0, settings.blocks()).parallel().mapToObj(b -> {
            SplitMix64 rng = SplitMix64.forBlock(settings.seed(), b);
            Tally t = new Tally(edges.emptyCopy(), edges.emptyCopy(), 0);
            double[] v = space.nominalVector();
            for (int k = settings.samplesIn(b); k > 0; k--) {
                space.draw(rng, v);
                kernel.add(v, space, t);
            }
            return t;
        }).toList();
        Tally total = new Tally(edges.emptyCopy(), edges.emptyCopy(), 0);
        blocks.forEach(total::merge);
        return new OperatingPointSpread(spec.id(), tLocalK, settings, space.axes(), total.runaway,
                total.notConverged, total.fast, total.tj.moments(), total.tjBins.histogram());
    }

    /** The per-sample solve of {@link #operatingPoints}: closed form on primitives where it applies. */
    private static final class Kernel {
        private final PositionSpec spec;
        private final double tLocalK;
        private final SolverSettings solver;
        private final boolean shunt;
        private final boolean currentFed;
        private final double vz0At25;
        private final double rz;
        private final double lineStartA;
        private final double rTheta;

        Kernel(PositionSpec spec, double tLocalK, SolverSettings solver) {
            this.spec = spec;
            this.tLocalK = tLocalK;
            this.solver = solver;
            BreakdownDiode d = spec.part().model();
            // Without leakage data the excess-leakage conductance is zero at every temperature.
            boolean noLeak = !d.leakage().isKnown();
            shunt = noLeak && spec.circuit() instanceof ShuntRegulatorSpec s && s.load() instanceof LoadRange.Current;
            currentFed = noLeak && spec.circuit() instanceof CurrentFedSpec;
            vz0At25 = d.vz0At25V();
            rz = d.rzOhm();
            lineStartA = d.lineStartA();
            rTheta = spec.path().rThetaJaKPerW();
        }

        void add(double[] v, SampleSpace space, Tally t) {
            double tj = Double.NaN;
            int vz = Axis.VZ.ordinal();
            int rth = Axis.THERMAL_RESISTANCE.ordinal();
            int alpha = Axis.TEMPERATURE_COEFFICIENT.ordinal();
            if (shunt) {
                tj = LinearFastPath.shuntTjK(v[Axis.SUPPLY.ordinal()], v[Axis.LOAD.ordinal()],
                        v[Axis.SERIES_RESISTOR.ordinal()], vz0At25 + v[vz], rz, v[alpha], rTheta * v[rth], tLocalK,
                        lineStartA, solver.capK());
            } else if (currentFed) {
                tj = LinearFastPath.currentFedTjK(v[Axis.SUPPLY.ordinal()], vz0At25 + v[vz], rz, v[alpha],
                        rTheta * v[rth], tLocalK, lineStartA, solver.capK());
            }
            if (!Double.isNaN(tj)) {
                t.fast++;
                t.tj.add(tj);
                t.tjBins.add(tj);
                return;
            }
            ThermalOutcome out = spec.atValues(space.values(v)).solve(tLocalK, solver);
            if (out instanceof ThermalOutcome.Converged c) {
                t.tj.add(c.point().tjK());
                t.tjBins.add(c.point().tjK());
            } else if (out instanceof ThermalOutcome.Runaway) {
                t.runaway++;
            } else {
                t.notConverged++;
            }
        }
    }

    /** Counts and moments of one block. Mutable; one per block. */
    private static final class Tally {
        final RunningMoments tj = new RunningMoments();
        final RunningMoments margin = new RunningMoments();
        final Bins tjBins;
        final Bins marginBins;
        final long[] ruleViolations;
        long failures;
        long runaway;
        long notConverged;
        long fast;

        Tally(Bins tjBins, Bins marginBins, int rules) {
            this.tjBins = tjBins;
            this.marginBins = marginBins;
            this.ruleViolations = new long[rules];
        }

        Tally emptyCopy(int rules) {
            return new Tally(tjBins.emptyCopy(), marginBins.emptyCopy(), rules);
        }

        void add(Evaluation e) {
            if (e.fastPath()) {
                fast++;
            }
            if (!e.passes()) {
                failures++;
            }
            long m = e.violatedMask();
            for (int i = 0; m != 0; i++, m >>>= 1) {
                if ((m & 1L) != 0) {
                    ruleViolations[i]++;
                }
            }
            switch (e.status()) {
                case CONVERGED -> {
                    tj.add(e.tjK());
                    margin.add(e.margin());
                    tjBins.add(e.tjK());
                    marginBins.add(e.margin());
                }
                case RUNAWAY -> runaway++;
                case NOT_CONVERGED -> notConverged++;
            }
        }

        void merge(Tally o) {
            tj.merge(o.tj);
            margin.merge(o.margin);
            tjBins.merge(o.tjBins);
            marginBins.merge(o.marginBins);
            for (int i = 0; i < ruleViolations.length; i++) {
                ruleViolations[i] += o.ruleViolations[i];
            }
            failures += o.failures;
            runaway += o.runaway;
            notConverged += o.notConverged;
            fast += o.fast;
        }
    }
}
