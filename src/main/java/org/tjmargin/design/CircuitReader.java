package org.tjmargin.design;

import java.util.Optional;
import java.util.Set;
import org.tjmargin.circuit.CircuitSpec;
import org.tjmargin.circuit.CurrentFedSpec;
import org.tjmargin.circuit.LoadRange;
import org.tjmargin.circuit.SeriesResistor;
import org.tjmargin.circuit.ShuntRegulatorSpec;
import org.tjmargin.circuit.StandoffClampSpec;
import org.tjmargin.units.Dimension;
import org.tjmargin.variation.Range;

/**
 * Reads a position's {@code circuit}: exactly one of {@code shunt-regulator}, {@code current-fed} or
 * {@code standoff-clamp}.
 */
final class CircuitReader {

    private static final Set<String> KEYS = Set.of("shunt-regulator", "current-fed", "standoff-clamp");
    private static final Set<String> SHUNT_KEYS = Set.of("supply", "series-resistor", "load");
    private static final Set<String> RESISTOR_KEYS = Set.of("resistor", "value", "tolerance");
    private static final Set<String> LOAD_KEYS = Set.of("current", "resistance");
    private static final Set<String> FED_KEYS = Set.of("current");
    private static final Set<String> CLAMP_KEYS = Set.of("line", "source-resistance");

    private CircuitReader() {
    }

    static Optional<CircuitSpec> read(Fields position, PartReferences refs) {
        Optional<Fields> of = position.object("circuit", Need.REQUIRED, KEYS);
        if (of.isEmpty()) {
            return Optional.empty();
        }
        Fields f = of.get();
        Optional<String> which = f.oneOf(Need.REQUIRED, "shunt-regulator", "current-fed", "standoff-clamp");
        if (which.isEmpty()) {
            return Optional.empty();
        }
        switch (which.get()) {
            case "shunt-regulator":
                return f.object("shunt-regulator", Need.REQUIRED, SHUNT_KEYS).flatMap(s -> shunt(s, refs));
            case "current-fed":
                return f.object("current-fed", Need.REQUIRED, FED_KEYS)
                        .flatMap(c -> RangeReader.read(c, "current", Need.REQUIRED,
                                RangeReader.of(Dimension.CURRENT, Sign.POSITIVE), Sign.POSITIVE))
                        .flatMap(r -> f.build(() -> new CurrentFedSpec(r)));
            default:
                return f.object("standoff-clamp", Need.REQUIRED, CLAMP_KEYS).flatMap(CircuitReader::clamp);
        }
    }

    private static Optional<CircuitSpec> shunt(Fields s, PartReferences refs) {
        Optional<Range> supply = RangeReader.read(s, "supply", Need.REQUIRED,
                RangeReader.of(Dimension.VOLTAGE, Sign.NON_NEGATIVE), Sign.NON_NEGATIVE);
        Optional<SeriesResistor> resistor = s.object("series-resistor", Need.REQUIRED, RESISTOR_KEYS)
                .flatMap(r -> seriesResistor(r, refs));
        Optional<LoadRange> load = s.object("load", Need.REQUIRED, LOAD_KEYS).flatMap(CircuitReader::load);
        if (!Fields.present(supply, resistor, load)) {
            return Optional.empty();
        }
        return s.build(() -> new ShuntRegulatorSpec(supply.get(), resistor.get(), load.get()));
    }

    private static Optional<SeriesResistor> seriesResistor(Fields r, PartReferences refs) {
        Optional<ResistorPart> type = refs.resistor(r, "resistor");
        Optional<Value> ohm = r.quantity("value", Need.REQUIRED, Sign.POSITIVE, Dimension.RESISTANCE);
        Optional<Value> tol = r.tolerance("tolerance", Need.OPTIONAL);
        if (!Fields.present(type, ohm) || (r.has("tolerance") && tol.isEmpty())) {
            return Optional.empty();
        }
        Range range = Range.relative(ohm.get().si(), tol.map(Value::si).orElse(0.0));
        return r.build(() -> new SeriesResistor(range, type.get().rating()));
    }

    private static Optional<LoadRange> load(Fields l) {
        Optional<String> which = l.oneOf(Need.REQUIRED, "current", "resistance");
        if (which.isEmpty()) {
            return Optional.empty();
        }
        if (which.get().equals("current")) {
            return RangeReader.read(l, "current", Need.REQUIRED, RangeReader.of(Dimension.CURRENT, Sign.NON_NEGATIVE),
                    Sign.NON_NEGATIVE).flatMap(r -> l.build(() -> new LoadRange.Current(r)));
        }
        return RangeReader.read(l, "resistance", Need.REQUIRED, RangeReader.of(Dimension.RESISTANCE, Sign.POSITIVE),
                Sign.POSITIVE).flatMap(r -> l.build(() -> new LoadRange.Resistive(r)));
    }

    private static Optional<CircuitSpec> clamp(Fields c) {
        Optional<Range> line = RangeReader.read(c, "line", Need.REQUIRED,
                RangeReader.of(Dimension.VOLTAGE, Sign.NON_NEGATIVE), Sign.NON_NEGATIVE);
        Optional<Value> source = c.quantity("source-resistance", Need.OPTIONAL, Sign.NON_NEGATIVE,
                Dimension.RESISTANCE);
        if (line.isEmpty() || (c.has("source-resistance") && source.isEmpty())) {
            return Optional.empty();
        }
        return c.build(() -> new StandoffClampSpec(line.get(), source.map(Value::si).orElse(0.0)));
    }
}
