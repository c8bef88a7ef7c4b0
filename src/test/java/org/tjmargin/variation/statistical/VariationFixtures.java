package org.tjmargin.variation.statistical;

import java.util.ArrayList;
import java.util.List;
import org.tjmargin.circuit.CircuitSpec;
import org.tjmargin.circuit.CurrentFedSpec;
import org.tjmargin.circuit.LoadRange;
import org.tjmargin.circuit.SeriesResistor;
import org.tjmargin.circuit.ShuntRegulatorSpec;
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
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.thermal.GivenPath;
import org.tjmargin.variation.Range;

/** Invented parts and positions for the variation tests (invented numbers, no real part). */
final class VariationFixtures {

    private VariationFixtures() {
    }

    static double c(double celsius) {
        return Celsius.toKelvin(celsius);
    }

    /** An invented piecewise-linear 6.2 V, 0.5 W Zener: Vz0(25 °C) = 6.1 V, Rz = 5 Ω, Izk = 1 mA, αV given. */
    static BreakdownPart zener(double alphaVPerK) {
        BreakdownDiode d = new BreakdownDiode(6.1, 5.0, 20e-3, 1e-3, new KneeModel.Linear(),
                TemperatureCoefficient.exact(alphaVPerK), Leakage.NONE);
        PowerRatingCurve curve = PowerRatingCurve.flatThenLinear(RatingReference.LEAD, 9.5e-3, 0.5, c(75), c(175));
        return new BreakdownPart("ZX-6V2-invented", BreakdownPart.Kind.ZENER, 6.2, 0.05, d,
                new DiodeRatings(c(175), curve, 0.5 / 6.2), 0.0, List.of());
    }

    static PositionSpec position(String id, BreakdownPart part, double rThetaKPerW, CircuitSpec circuit,
                                 Range vzShift, Range rThetaFactor, Range alpha) {
        return new PositionSpec(id, part, new GivenPath(rThetaKPerW, 0.5 * rThetaKPerW, List.of()), circuit, vzShift,
                rThetaFactor, alpha, List.of());
    }

    /** A shunt regulator: 15 V ± 10 % through 220 Ω ± 5 %, 2 … 8 mA load, Vz ± 2 %, Rθ 300 K/W ± 10 %, αV range. */
    static PositionSpec regulator() {
        BreakdownPart z = zener(2.5e-3);
        SeriesResistor rs = new SeriesResistor(Range.relative(220.0, 0.05),
                PowerRatingCurve.flatThenLinear(RatingReference.AMBIENT, 0.0, 0.5, c(70), c(155)));
        return position("D1", z, 300.0, new ShuntRegulatorSpec(Range.relative(15.0, 0.10), rs,
                new LoadRange.Current(Range.between(2e-3, 8e-3))), new Range(-0.12, 0.0, 0.12),
                Range.relative(1.0, 0.10), new Range(2.0e-3, 2.5e-3, 3.0e-3));
    }

    /** A current-fed diode with αV = 0: {@code Tj = T_local + Rθ·(Vz0 + Rz·I)·I} exactly. */
    static PositionSpec currentFed(Range currentA, Range vzShift, Range rThetaFactor, double rThetaKPerW) {
        return position("U1", zener(0.0), rThetaKPerW, new CurrentFedSpec(currentA), vzShift, rThetaFactor,
                Range.exact(0.0));
    }

    /** The built-in minimum plus policy rules on power, junction and resistor. */
    static Policy policy() {
        List<Rule> rules = new ArrayList<>(Policy.builtInMinimum().rules());
        rules.add(new Rule("power-half", "diode power at most half its derated rating", Measure.POWER_RATIO,
                Bound.MAX, new Limit.Fixed(0.5), "common practice, no single source"));
        rules.add(new Rule("tj-40-below", "junction 40 K below Tj max", Measure.JUNCTION_TEMPERATURE, Bound.MAX,
                new Limit.BelowTjMax(40.0), "common practice, no single source"));
        rules.add(new Rule("rs-power", "series resistor inside its derating", Measure.RESISTOR_POWER_RATIO,
                Bound.MAX, new Limit.Fixed(1.0), "IEC 60115-1 rating curve"));
        return new Policy("test", "invented", rules);
    }
}
