package org.tjmargin.solve;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
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
import org.tjmargin.thermal.Enclosure;
import org.tjmargin.thermal.GivenPath;
import org.tjmargin.variation.Range;

/**
 * Small INVENTED boards in small sealed boxes, for property tests of the board-level coupling: two to four positions
 * drawn among shunt regulators, current-fed references and leaky clamps (whose leakage doubling makes them run away
 * in the hot end), every value from a physically sensible range, the box small enough that its air rises by several
 * to tens of kelvin, and a short sweep so that exact per-ambient board solves stay cheap. The policy holds the
 * junction 20 K below Tj max and the diode power at most 80 % of its derated rating, besides the built-in minimum.
 */
final class RandomCoupledBoards {

    private RandomCoupledBoards() {
    }

    static final Policy POLICY = policy();

    static Board draw(Random rnd, String name) {
        int n = 2 + rnd.nextInt(3);
        List<PositionSpec> positions = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            String id = "P" + i;
            positions.add(switch (rnd.nextInt(3)) {
                case 0 -> regulator(id, rnd);
                case 1 -> reference(id, rnd);
                default -> clamp(id, rnd);
            });
        }
        double area = 0.02 + 0.1 * rnd.nextDouble();
        double minC = -30 + 40 * rnd.nextDouble();
        double maxC = minC + 30 + 60 * rnd.nextDouble();
        return new Board(name, positions, new Enclosure.SealedBox(area, 5 + 5 * rnd.nextDouble(), rnd.nextDouble()),
                new AmbientRange(Celsius.toKelvin(minC), Celsius.toKelvin(maxC), 5 + rnd.nextInt(8)));
    }

    private static BreakdownPart zener(Random rnd) {
        double vz = 5 + 20 * rnd.nextDouble();
        double alpha = TemperatureCoefficient.voltsPerKelvin((0.02 + 0.08 * rnd.nextDouble()) / 100, vz);
        double izt = 5e-3 + 20e-3 * rnd.nextDouble();
        double rz = 2 + 15 * rnd.nextDouble();
        BreakdownDiode d = new BreakdownDiode(vz - rz * izt, rz, izt, 0.5e-3, new KneeModel.Linear(),
                new TemperatureCoefficient(alpha, 0.8 * alpha, 1.2 * alpha, false), Leakage.NONE);
        double pMax = 0.3 + 1.2 * rnd.nextDouble();
        PowerRatingCurve curve = PowerRatingCurve.flatThenLinear(RatingReference.AMBIENT, 0, pMax,
                Celsius.toKelvin(50), Celsius.toKelvin(175));
        return new BreakdownPart("invented-zener", BreakdownPart.Kind.ZENER, vz, 0.05, d,
                new DiodeRatings(Celsius.toKelvin(175), curve, 3 * pMax / vz), 0, List.of());
    }

    private static PositionSpec regulator(String id, Random rnd) {
        BreakdownPart z = zener(rnd);
        double vz = z.vzNomV();
        double supply = vz * (1.5 + rnd.nextDouble());
        double rs = (supply - vz) / (10e-3 + 30e-3 * rnd.nextDouble());
        SeriesResistor r = new SeriesResistor(Range.relative(rs, 0.01), PowerRatingCurve.flatThenLinear(
                RatingReference.AMBIENT, 0, 2, Celsius.toKelvin(70), Celsius.toKelvin(155)));
        ShuntRegulatorSpec c = new ShuntRegulatorSpec(Range.relative(supply, 0.1), r,
                new LoadRange.Current(Range.between(1e-3, 3e-3 + 4e-3 * rnd.nextDouble())));
        double rth = 80 + 150 * rnd.nextDouble();
        return new PositionSpec(id, z, new GivenPath(rth, 0.5 * rth, List.of()), c, Range.between(-0.02 * vz, 0.02 * vz),
                Range.relative(1, 0.15), new Range(z.model().tc().minAlphaVPerK(),
                        z.model().tc().alphaVPerK(), z.model().tc().maxAlphaVPerK()), List.of());
    }

    private static PositionSpec reference(String id, Random rnd) {
        BreakdownPart z = zener(rnd);
        double i = 2e-3 + 10e-3 * rnd.nextDouble();
        double rth = 150 + 250 * rnd.nextDouble();
        return new PositionSpec(id, z, new GivenPath(rth, 0.5 * rth, List.of()),
                new CurrentFedSpec(Range.relative(i, 0.1)), Range.between(-0.02 * z.vzNomV(), 0.02 * z.vzNomV()),
                Range.exact(1), Range.exact(z.model().tc().alphaVPerK()), List.of());
    }

    private static PositionSpec clamp(String id, Random rnd) {
        double vbr = 30 + 10 * rnd.nextDouble();
        BreakdownDiode d = new BreakdownDiode(vbr, 1.0, 1e-3, 0.5e-3, new KneeModel.Linear(),
                TemperatureCoefficient.exact(0.001 * vbr), new Leakage(1e-6 + 30e-6 * rnd.nextDouble(), 0.85 * vbr,
                        8 + 6 * rnd.nextDouble()));
        PowerRatingCurve curve = PowerRatingCurve.flatThenLinear(RatingReference.AMBIENT, 0, 1.0, Celsius.toKelvin(25),
                Celsius.toKelvin(150));
        BreakdownPart t = new BreakdownPart("invented-clamp", BreakdownPart.Kind.TVS, vbr, 0.05, d,
                new DiodeRatings(Celsius.toKelvin(150), curve, 0.03), 0.85 * vbr, List.of());
        double line = 0.8 * vbr * (0.9 + 0.1 * rnd.nextDouble());
        double rth = 150 + 300 * rnd.nextDouble();
        return new PositionSpec(id, t, new GivenPath(rth, rth, List.of()), new StandoffClampSpec(
                Range.between(0.95 * line, line), 0.5), Range.exact(0), Range.relative(1, 0.1), Range.exact(0.001 * vbr),
                List.of());
    }

    private static Policy policy() {
        List<Rule> rules = new ArrayList<>(Policy.builtInMinimum().rules());
        rules.add(new Rule("tj-20-below", "junction 20 K below Tj max", Measure.JUNCTION_TEMPERATURE, Bound.MAX,
                new Limit.BelowTjMax(20.0), "common practice, no single source"));
        rules.add(new Rule("power-80", "diode power at most 80 % of its derated rating", Measure.POWER_RATIO,
                Bound.MAX, new Limit.Fixed(0.8), "common practice, no single source"));
        return new Policy("test", "invented for the coupling tests", rules);
    }
}
