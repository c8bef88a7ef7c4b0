package org.tjmargin.report;

import java.util.ArrayList;
import java.util.List;
import org.tjmargin.circuit.CurrentFedSpec;
import org.tjmargin.circuit.LoadRange;
import org.tjmargin.circuit.SeriesResistor;
import org.tjmargin.circuit.ShuntRegulatorSpec;
import org.tjmargin.circuit.StandoffClampSpec;
import org.tjmargin.derating.Bound;
import org.tjmargin.derating.Limit;
import org.tjmargin.derating.Measure;
import org.tjmargin.derating.Policy;
import org.tjmargin.derating.Rule;
import org.tjmargin.device.BreakdownDiode;
import org.tjmargin.device.BreakdownPart;
import org.tjmargin.device.Celsius;
import org.tjmargin.device.DiodeRatings;
import org.tjmargin.device.KneeModel;
import org.tjmargin.device.Leakage;
import org.tjmargin.device.PowerRatingCurve;
import org.tjmargin.device.RatingReference;
import org.tjmargin.device.TemperatureCoefficient;
import org.tjmargin.device.VzTestCondition;
import org.tjmargin.solve.AmbientRange;
import org.tjmargin.solve.Analysis;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.Board;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.solve.SolverSettings;
import org.tjmargin.surge.CombinationWaveGenerator;
import org.tjmargin.surge.PositionSurges;
import org.tjmargin.surge.SurgeCase;
import org.tjmargin.surge.SurgeRating;
import org.tjmargin.thermal.FosterNetwork;
import org.tjmargin.thermal.FosterPulse;
import org.tjmargin.thermal.Enclosure;
import org.tjmargin.thermal.GivenPath;
import org.tjmargin.variation.Range;

/**
 * Small invented boards for the report tests (invented numbers, no real part): a shunt regulator, a current-fed
 * reference and a leaky clamp that runs away in the hot end of the range.
 */
final class ReportFixtures {

    private ReportFixtures() {
    }

    static double c(double celsius) {
        return Celsius.toKelvin(celsius);
    }

    /** An invented 6.8 V, 0.5 W Zener rated at the lead 9.5 mm from the body, 75 °C knee, zero at 175 °C. */
    static BreakdownPart zener() {
        double alpha = TemperatureCoefficient.voltsPerKelvin(5e-4, 6.8);
        BreakdownDiode d = BreakdownDiode.fromDatasheet(6.8, 20e-3, 5.0, 1e-3, Double.NaN,
                TemperatureCoefficient.exact(alpha), new VzTestCondition.Pulsed(Celsius.T25_K), Leakage.NONE);
        PowerRatingCurve curve = PowerRatingCurve.flatThenLinear(RatingReference.LEAD, 9.5e-3, 0.5, c(75), c(175));
        return new BreakdownPart("ZX-6V8-invented", BreakdownPart.Kind.ZENER, 6.8, 0.05, d,
                new DiodeRatings(c(175), curve, 0.5 / 6.8), 0.0, List.of());
    }

    /** An invented 33 V clamp with 20 µA leakage at 30 V, 150 °C Tj max, rated against ambient. */
    static BreakdownPart leakyClamp() {
        BreakdownDiode d = new BreakdownDiode(33.0, 1.0, 1e-3, 0.5e-3, new KneeModel.Linear(),
                TemperatureCoefficient.exact(0.0), new Leakage(20e-6, 30.0, 10.0));
        PowerRatingCurve curve = PowerRatingCurve.flatThenLinear(RatingReference.AMBIENT, 0.0, 1.0, c(25), c(150));
        return new BreakdownPart("TV-33-invented", BreakdownPart.Kind.TVS, 34.0, 0.05, d,
                new DiodeRatings(c(150), curve, 0.03), 28.0, List.of("leakage doubling interval: common practice"));
    }

    static PositionSpec regulator(String id) {
        BreakdownPart z = zener();
        SeriesResistor rs = new SeriesResistor(Range.relative(220.0, 0.05),
                PowerRatingCurve.flatThenLinear(RatingReference.AMBIENT, 0.0, 0.25, c(70), c(155)));
        ShuntRegulatorSpec circuit = new ShuntRegulatorSpec(Range.relative(12.0, 0.10), rs,
                new LoadRange.Current(Range.between(0.0, 5e-3)));
        return new PositionSpec(id, z, new GivenPath(300.0, 150.0, List.of("Rθja from a rule of thumb")), circuit,
                Range.exact(0.0), Range.exact(1.0), Range.exact(z.model().tc().alphaVPerK()),
                List.of("mounting assumed as on the datasheet"));
    }

    static PositionSpec reference(String id) {
        BreakdownPart z = zener();
        return new PositionSpec(id, z, new GivenPath(250.0, 120.0, List.of()),
                new CurrentFedSpec(Range.between(4e-3, 6e-3)), Range.relative(0.0, 0.0),
                Range.between(0.9, 1.1), Range.exact(z.model().tc().alphaVPerK()), List.of());
    }

    static PositionSpec clamp(String id) {
        BreakdownPart t = leakyClamp();
        return new PositionSpec(id, t, new GivenPath(300.0, 300.0, List.of()), new StandoffClampSpec(
                Range.between(23.0, 24.0), 0.0), Range.exact(0.0), Range.exact(1.0), Range.exact(0.0), List.of());
    }

    /** The clamp with invented surge data (given Foster stages) facing a 1 kV combination wave on 2 Ω + 40 Ω. */
    static PositionSpec surgeClamp(String id) {
        PositionSpec base = clamp(id);
        SurgeRating rating = new SurgeRating(1500, FosterPulse.exponentialDecay(1e-3), 55, 27, c(175),
                FosterNetwork.of(new double[] {0.5, 3.0}, new double[] {1e-4, 5e-3}), SurgeRating.NetworkSource.GIVEN_FOSTER,
                List.of());
        SurgeCase cwg = new SurgeCase("cwg-1kv", "combination wave 1 kV, 2 Ω + 40 Ω (invented test)",
                CombinationWaveGenerator.of(1000, CombinationWaveGenerator.Coupling.OTHER_LINES).source(), 3, 10,
                java.util.OptionalDouble.of(70));
        return new PositionSpec(id, base.part(), base.path(), base.circuit(), base.vzShiftV(), base.rThetaFactor(),
                base.alphaVPerK(), base.notes(), java.util.Optional.of(new PositionSurges(rating, List.of(cwg))));
    }

    /** The surge clamp alone under the built-in minimum. */
    static AnalysisResult surgeOnly(String name) {
        return Analysis.run(new Board(name, List.of(surgeClamp("TVS9")), new Enclosure.FixedRise(10.0),
                new AmbientRange(c(0), c(50), 6)), Policy.builtInMinimum(), SolverSettings.DEFAULT);
    }

    /**
     * A regulator feeding a resistive load in a sealed box, with a diode whose rating reaches zero at 100 °C lead
     * temperature, under a rule no point can meet: fails at every ambient, so there is no maximum ambient.
     */
    static AnalysisResult hopeless(String name) {
        BreakdownPart z = zener();
        BreakdownPart early = new BreakdownPart("ZX-early-invented", z.kind(), z.vzNomV(), z.vzTolerance(), z.model(),
                new DiodeRatings(c(175), PowerRatingCurve.flatThenLinear(RatingReference.LEAD, 9.5e-3, 0.5, c(25),
                        c(100)), 0.5 / 6.8), 0.0, List.of());
        SeriesResistor rs = new SeriesResistor(Range.exact(220.0),
                PowerRatingCurve.flatThenLinear(RatingReference.AMBIENT, 0.0, 0.25, c(70), c(155)));
        PositionSpec p = new PositionSpec("D7", early, new GivenPath(300.0, 150.0, List.of()),
                new ShuntRegulatorSpec(Range.relative(12.0, 0.05), rs, new LoadRange.Resistive(
                        Range.between(2_000.0, 10_000.0))), Range.exact(0.0), Range.exact(1.0),
                Range.exact(early.model().tc().alphaVPerK()), List.of());
        List<Rule> rules = new ArrayList<>(policy().rules());
        rules.add(new Rule("power-nil", "no diode power at all", Measure.POWER_RATIO, Bound.MAX,
                new Limit.Fixed(1e-6), "invented: cannot be met"));
        return Analysis.run(new Board(name, List.of(p), new Enclosure.SealedBox(0.05, 6.0, 0.5),
                new AmbientRange(c(0), c(85), 6)), new Policy("hopeless", "invented", rules), SolverSettings.DEFAULT);
    }

    /**
     * The mixed board's three positions in a small sealed box: the leaky clamp's leakage, doubling every 10 K, runs
     * its junction away in the hot end, its heat at the junction cap is more than the box can shed, and the air runs
     * away with it, taking the regulator and the reference along.
     */
    static AnalysisResult boxRunsAway(String name) {
        return Analysis.run(new Board(name, List.of(regulator("D1"), reference("REF2"), clamp("TVS3")),
                new Enclosure.SealedBox(0.05, 6.0, 0.5), new AmbientRange(c(0), c(85), 10)),
                Policy.builtInMinimum(), SolverSettings.DEFAULT);
    }

    /** The built-in minimum plus a few policy rules, so that charts have several lines. */
    static Policy policy() {
        List<Rule> rules = new ArrayList<>(Policy.builtInMinimum().rules());
        rules.add(new Rule("power-half", "diode power at most half its derated rating", Measure.POWER_RATIO,
                Bound.MAX, new Limit.Fixed(0.5), "common practice, no single source"));
        rules.add(new Rule("tj-40-below", "junction 40 K below Tj max", Measure.JUNCTION_TEMPERATURE, Bound.MAX,
                new Limit.BelowTjMax(40.0), "common practice, no single source"));
        rules.add(new Rule("rs-power", "series resistor inside its derating", Measure.RESISTOR_POWER_RATIO,
                Bound.MAX, new Limit.Fixed(1.0), "resistor's own rating"));
        return new Policy("test policy", "invented for the report tests", rules);
    }

    static Board board(String name, List<PositionSpec> positions) {
        return new Board(name, positions, new Enclosure.FixedRise(10.0), new AmbientRange(c(0), c(85), 10));
    }

    /** A three-position board under the built-in minimum. */
    static AnalysisResult mixed(String name) {
        return Analysis.run(board(name, List.of(regulator("D1"), reference("REF2"), clamp("TVS3"))),
                Policy.builtInMinimum(), SolverSettings.DEFAULT);
    }

    /** A one-regulator board under the richer test policy. */
    static AnalysisResult regulatorOnly(String name, String id) {
        return Analysis.run(board(name, List.of(regulator(id))), policy(), SolverSettings.DEFAULT);
    }
}
