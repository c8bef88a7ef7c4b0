package org.tjmargin.design;

import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.tjmargin.surge.CombinationWaveGenerator;
import org.tjmargin.surge.CubicExponentialPulse;
import org.tjmargin.surge.DoubleExponentialPulse;
import org.tjmargin.surge.HalfSinePulse;
import org.tjmargin.surge.IdealCurrentSource;
import org.tjmargin.surge.LoadDumpPulse;
import org.tjmargin.surge.LoadDumpSystem;
import org.tjmargin.surge.RectangularPulse;
import org.tjmargin.surge.SurgeCase;
import org.tjmargin.surge.SurgeQuantity;
import org.tjmargin.surge.SurgeSource;
import org.tjmargin.surge.TabulatedWaveform;
import org.tjmargin.surge.TheveninSource;
import org.tjmargin.units.Dimension;
import org.tjmargin.units.Quantities;

/**
 * Reads a position's {@code surges} list (src/site/markdown/file-format.md, "Surges at a position"): each item an id, exactly
 * one of {@code combination-wave}, {@code load-dump} or {@code current-pulse}, an optional {@code repeat} and an
 * optional {@code protected-limit}.
 */
final class SurgeCaseReader {

    private static final Set<String> KEYS = Set.of("id", "combination-wave", "load-dump", "current-pulse", "table",
            "repeat",
            "protected-limit");
    private static final Set<String> CWG_KEYS = Set.of("peak", "coupling", "model");
    private static final Set<String> LOAD_DUMP_KEYS = Set.of("system", "test", "us", "ri", "td", "suppressed");
    private static final Set<String> PULSE_KEYS = Set.of("waveform", "peak", "width");
    private static final Set<String> TABLE_KEYS = Set.of("file", "source-resistance");
    private static final Set<String> REPEAT_KEYS = Set.of("count", "period");

    private SurgeCaseReader() {
    }

    static Optional<List<SurgeCase>> read(Fields position) {
        Optional<List<SurgeCase>> cases = position.listOf("surges", Need.REQUIRED, (node, path) -> one(position.ctx(), node, path));
        if (cases.isEmpty()) {
            return Optional.empty();
        }
        Set<String> seen = new HashSet<>();
        Node.Sequence seq = (Node.Sequence) position.get("surges", Need.REQUIRED).orElseThrow();
        for (int i = 0; i < cases.get().size(); i++) {
            if (!seen.add(cases.get().get(i).id())) {
                Node item = seq.items().get(i);
                Node at = item instanceof Node.Mapping m ? m.entry("id").map(Node.Entry::value).orElse(item) : item;
                position.ctx().report(InputProblem.Kind.DUPLICATE_ID, at, position.pathOf("surges") + "[" + i + "].id",
                        "surge id '" + cases.get().get(i).id() + "' is used twice at this position");
                return Optional.empty();
            }
        }
        if (cases.get().isEmpty()) {
            position.report(InputProblem.Kind.INCONSISTENT, "surges", "needs at least one surge");
            return Optional.empty();
        }
        return cases;
    }

    private static Optional<SurgeCase> one(FileContext ctx, Node node, String path) {
        Optional<Fields> of = Fields.of(ctx, node, path, KEYS);
        if (of.isEmpty()) {
            return Optional.empty();
        }
        Fields f = of.get();
        Optional<String> id = f.text("id", Need.REQUIRED);
        Optional<String> which = f.oneOf(Need.REQUIRED, "combination-wave", "load-dump", "current-pulse", "table");
        Optional<Value> limit = f.quantity("protected-limit", Need.OPTIONAL, Sign.POSITIVE, Dimension.VOLTAGE);
        Optional<Fields> repeat = f.object("repeat", Need.OPTIONAL, REPEAT_KEYS);
        Optional<Integer> count = repeat.flatMap(r -> r.integer("count", Need.REQUIRED));
        Optional<Value> period = repeat.flatMap(r -> r.quantity("period", Need.REQUIRED, Sign.POSITIVE, Dimension.TIME));
        if (count.isPresent() && count.get() < 1) {
            repeat.get().report(InputProblem.Kind.NOT_PHYSICAL, "count", "needs at least one pulse, got " + count.get());
            return Optional.empty();
        }
        if (which.isEmpty() || id.isEmpty() || (f.has("protected-limit") && limit.isEmpty())
                || (f.has("repeat") && (count.isEmpty() || period.isEmpty()))) {
            return Optional.empty();
        }
        Optional<Described> source = switch (which.get()) {
            case "combination-wave" -> f.object("combination-wave", Need.REQUIRED, CWG_KEYS).flatMap(SurgeCaseReader::combinationWave);
            case "load-dump" -> f.object("load-dump", Need.REQUIRED, LOAD_DUMP_KEYS).flatMap(SurgeCaseReader::loadDump);
            case "table" -> f.object("table", Need.REQUIRED, TABLE_KEYS).flatMap(SurgeCaseReader::table);
            default -> f.object("current-pulse", Need.REQUIRED, PULSE_KEYS).flatMap(SurgeCaseReader::currentPulse);
        };
        if (source.isEmpty()) {
            return Optional.empty();
        }
        OptionalDouble lim = limit.map(v -> OptionalDouble.of(v.si())).orElse(OptionalDouble.empty());
        double duration = source.get().source().waveform().durationS();
        if (period.isPresent() && !(period.get().si() >= duration)) {
            f.report(InputProblem.Kind.INCONSISTENT, period.get(), "period " + period.get().text()
                    + " is shorter than one surge, which lasts " + Quantities.format(duration, Dimension.TIME));
            return Optional.empty();
        }
        return f.build(() -> count.isPresent()
                ? new SurgeCase(id.get(), source.get().description(), source.get().source(), count.get(), period.get().si(), lim)
                : SurgeCase.single(id.get(), source.get().description(), source.get().source(), lim));
    }

    /** A source with its human description. */
    private record Described(SurgeSource source, String description) {
    }

    private static Optional<Described> combinationWave(Fields c) {
        Optional<Value> peak = c.quantity("peak", Need.REQUIRED, Sign.POSITIVE, Dimension.VOLTAGE);
        Optional<Value> coupling = c.quantity("coupling", Need.OPTIONAL, Sign.NON_NEGATIVE, Dimension.RESISTANCE);
        Optional<String> model = c.text("model", Need.OPTIONAL);
        if (peak.isEmpty() || (c.has("coupling") && coupling.isEmpty()) || (c.has("model") && model.isEmpty())) {
            return Optional.empty();
        }
        CombinationWaveGenerator.Model m = CombinationWaveGenerator.Model.THEVENIN_OPEN_CIRCUIT_VOLTAGE;
        if (model.isPresent()) {
            switch (model.get()) {
                case "thevenin" -> m = CombinationWaveGenerator.Model.THEVENIN_OPEN_CIRCUIT_VOLTAGE;
                case "norton" -> m = CombinationWaveGenerator.Model.NORTON_SHORT_CIRCUIT_CURRENT;
                case "ideal-current" -> m = CombinationWaveGenerator.Model.IDEAL_SHORT_CIRCUIT_CURRENT;
                default -> {
                    c.report(InputProblem.Kind.WRONG_TYPE, "model", "expected thevenin, norton or ideal-current, got '"
                            + model.get() + "'");
                    return Optional.empty();
                }
            }
        }
        double rc = coupling.map(Value::si).orElse(0.0);
        CombinationWaveGenerator.Model chosen = m;
        return c.build(() -> new CombinationWaveGenerator(peak.get().si(), rc, chosen)).map(g -> new Described(g.source(),
                "combination wave 1.2/50 µs, " + peak.get().text() + " open circuit, 2 Ω + "
                        + Quantities.format(rc, Dimension.RESISTANCE) + " coupling (IEC 61000-4-5 style, "
                        + chosen.name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ') + ")"));
    }

    private static Optional<Described> loadDump(Fields d) {
        Optional<Value> system = d.quantity("system", Need.REQUIRED, Sign.POSITIVE, Dimension.VOLTAGE);
        Optional<String> test = d.text("test", Need.REQUIRED);
        Optional<Value> us = d.quantity("us", Need.REQUIRED, Sign.POSITIVE, Dimension.VOLTAGE);
        Optional<Value> ri = d.quantity("ri", Need.REQUIRED, Sign.POSITIVE, Dimension.RESISTANCE);
        Optional<Value> td = d.quantity("td", Need.REQUIRED, Sign.POSITIVE, Dimension.TIME);
        Optional<Value> suppressed = d.quantity("suppressed", Need.OPTIONAL, Sign.POSITIVE, Dimension.VOLTAGE);
        if (!Fields.present(system, test, us, ri, td) || (d.has("suppressed") && suppressed.isEmpty())) {
            return Optional.empty();
        }
        LoadDumpSystem sys;
        if (Math.abs(system.get().si() - 12) < 1e-9) {
            sys = LoadDumpSystem.TWELVE_VOLT;
        } else if (Math.abs(system.get().si() - 24) < 1e-9) {
            sys = LoadDumpSystem.TWENTY_FOUR_VOLT;
        } else {
            d.report(InputProblem.Kind.NOT_PHYSICAL, system.get(), "load-dump systems are 12 V or 24 V, got " + system.get().text());
            return Optional.empty();
        }
        boolean b;
        switch (test.get()) {
            case "A" -> b = false;
            case "B" -> b = true;
            default -> {
                d.report(InputProblem.Kind.WRONG_TYPE, "test", "expected A or B, got '" + test.get() + "'");
                return Optional.empty();
            }
        }
        if (suppressed.isPresent() && !b) {
            d.report(InputProblem.Kind.INCONSISTENT, suppressed.get(), "a suppressed voltage belongs to test B only");
            return Optional.empty();
        }
        Optional<LoadDumpPulse> pulse = d.build(() -> {
            LoadDumpPulse a = LoadDumpPulse.testA(sys, us.get().si(), ri.get().si(), td.get().si());
            return b ? a.withSuppressedVoltage(suppressed.map(Value::si).orElse(sys.typicalSuppressedVoltageV())) : a;
        });
        return pulse.map(p -> new Described(p.source(), "load dump, test " + test.get() + " on a " + system.get().text()
                + " system: Us " + us.get().text() + ", Ri " + ri.get().text() + ", td " + td.get().text()
                + (b ? ", suppressed to " + Quantities.format(p.suppressedVoltageV().getAsDouble(), Dimension.VOLTAGE) : "")
                + " (ISO 16750-2 style)"));
    }

    private static Optional<Described> currentPulse(Fields c) {
        Optional<String> w = c.text("waveform", Need.REQUIRED);
        Optional<Value> peak = c.quantity("peak", Need.REQUIRED, Sign.POSITIVE, Dimension.CURRENT);
        if (!Fields.present(w, peak)) {
            return Optional.empty();
        }
        double ip = peak.get().si();
        SurgeSource s;
        switch (w.get()) {
            case "8/20" -> s = new IdealCurrentSource(CubicExponentialPulse.current8x20(ip));
            case "10/1000" -> s = new IdealCurrentSource(DoubleExponentialPulse.current10x1000(ip));
            case "5/320" -> s = new IdealCurrentSource(DoubleExponentialPulse.current5x320(ip));
            case "half-sine-8.3ms" -> s = new IdealCurrentSource(HalfSinePulse.sixtyHertzCurrent(ip));
            case "half-sine-10ms" -> s = new IdealCurrentSource(HalfSinePulse.fiftyHertzCurrent(ip));
            case "rectangular" -> {
                Optional<Value> width = c.quantity("width", Need.REQUIRED, Sign.POSITIVE, Dimension.TIME);
                if (width.isEmpty()) {
                    return Optional.empty();
                }
                s = new IdealCurrentSource(new RectangularPulse(ip, width.get().si(), SurgeQuantity.CURRENT));
            }
            default -> {
                c.report(InputProblem.Kind.WRONG_TYPE, "waveform", "expected 8/20, 10/1000, 5/320, half-sine-8.3ms, "
                        + "half-sine-10ms or rectangular, got '" + w.get() + "'");
                return Optional.empty();
            }
        }
        if (c.has("width") && !"rectangular".equals(w.get())) {
            c.report(InputProblem.Kind.INCONSISTENT, "width", "a width belongs to a rectangular pulse only");
            return Optional.empty();
        }
        return Optional.of(new Described(s, "current pulse " + w.get() + " µs, " + peak.get().text() + " peak"));
    }

    /** A user's waveform table: a current table drives the clamp directly, a voltage table through its resistance. */
    private static Optional<Described> table(Fields t) {
        Optional<String> file = t.text("file", Need.REQUIRED);
        Optional<Value> r = t.quantity("source-resistance", Need.OPTIONAL, Sign.POSITIVE, Dimension.RESISTANCE);
        if (file.isEmpty() || (t.has("source-resistance") && r.isEmpty())) {
            return Optional.empty();
        }
        Path designDir = Path.of(t.ctx().name()).toAbsolutePath().getParent();
        Path csv = designDir == null ? Path.of(file.get()) : designDir.resolve(file.get());
        Node at = t.get("file", Need.REQUIRED).orElseThrow();
        Optional<TabulatedWaveform> w = SurgeTableReader.read(t.ctx(), at, t.pathOf("file"), csv);
        if (w.isEmpty()) {
            return Optional.empty();
        }
        if (w.get().quantity() == SurgeQuantity.VOLTAGE) {
            if (r.isEmpty()) {
                t.report(InputProblem.Kind.MISSING_FIELD, "file", "a voltage table needs a source-resistance");
                return Optional.empty();
            }
            return Optional.of(new Described(new TheveninSource(w.get(), r.get().si()), "user voltage table "
                    + file.get() + " behind " + r.get().text()));
        }
        if (r.isPresent()) {
            t.report(InputProblem.Kind.INCONSISTENT, r.get(), "a current table drives the clamp directly; a "
                    + "source-resistance belongs to a voltage table");
            return Optional.empty();
        }
        return Optional.of(new Described(new IdealCurrentSource(w.get()), "user current table " + file.get()));
    }
}
