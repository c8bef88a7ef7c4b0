package org.tjmargin.design;

import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.tjmargin.device.BreakdownDiode;
import org.tjmargin.device.Celsius;
import org.tjmargin.device.Leakage;
import org.tjmargin.device.TemperatureCoefficient;
import org.tjmargin.device.TemperatureCoefficientEstimate;
import org.tjmargin.device.VzTestCondition;
import org.tjmargin.units.Dimension;
import org.tjmargin.units.Quantities;

/**
 * Reads a part's {@code breakdown} and {@code leakage} into the electrical model, through
 * {@link BreakdownDiode#fromDatasheet}. Every relation the model needs is checked at its field first: the knee
 * current below the test current, the knee impedance not below {@code Zzt}, the coefficient inside its range, the
 * leakage voltage below the knee.
 */
final class BreakdownReader {

    private static final Set<String> KEYS = Set.of("vz", "tolerance", "test-current", "impedance", "knee-current",
            "knee-impedance", "temperature-coefficient", "temperature-coefficient-range", "measured");
    private static final Set<String> MEASURED_KEYS = Set.of("at", "held-temperature", "held-distance",
            "held-rtheta", "junction-temperature");
    private static final Set<String> LEAKAGE_KEYS = Set.of("current", "voltage", "doubling");

    /**
     * The breakdown data as mapped.
     *
     * @param vzNomV    nominal voltage at the test current (V)
     * @param tolerance relative tolerance of {@code vzNomV}
     * @param model     the electrical model
     */
    record Breakdown(double vzNomV, double tolerance, BreakdownDiode model) {
    }

    private BreakdownReader() {
    }

    /**
     * Reads the breakdown and leakage of a part.
     *
     * @param part  the part's object
     * @param pkg   the part's package, if it could be read (needed for an equilibrium measurement)
     * @param notes where estimate notes go
     */
    static Optional<Breakdown> read(Fields part, Optional<PackageSpec> pkg, List<String> notes) {
        Optional<Fields> of = part.object("breakdown", Need.REQUIRED, KEYS);
        Optional<Fields> leakageFields = part.object("leakage", Need.OPTIONAL, LEAKAGE_KEYS);
        Optional<Leakage> leakage = part.has("leakage") ? leakageFields.flatMap(BreakdownReader::leakage)
                : Optional.of(Leakage.NONE);
        if (of.isEmpty()) {
            return Optional.empty();
        }
        Fields f = of.get();
        Optional<Value> vz = f.quantity("vz", Need.REQUIRED, Sign.POSITIVE, Dimension.VOLTAGE);
        Optional<Value> tol = f.tolerance("tolerance", Need.REQUIRED);
        Optional<Value> izt = f.quantity("test-current", Need.REQUIRED, Sign.POSITIVE, Dimension.CURRENT);
        Optional<Value> zzt = f.quantity("impedance", Need.REQUIRED, Sign.POSITIVE, Dimension.RESISTANCE);
        Optional<Value> izk = f.quantity("knee-current", Need.REQUIRED, Sign.POSITIVE, Dimension.CURRENT)
                .filter(k -> {
                    if (izt.isEmpty() || k.si() < izt.get().si()) {
                        return true;
                    }
                    f.report(InputProblem.Kind.INCONSISTENT, k, "knee current " + k.text()
                            + " must lie below the test current " + izt.get().text());
                    return false;
                });
        Optional<Value> zzk = f.quantity("knee-impedance", Need.OPTIONAL, Sign.POSITIVE, Dimension.RESISTANCE)
                .filter(k -> {
                    if (zzt.isEmpty() || k.si() >= zzt.get().si()) {
                        return true;
                    }
                    f.report(InputProblem.Kind.INCONSISTENT, k, "knee impedance " + k.text()
                            + " is below the test-current impedance " + zzt.get().text()
                            + "; a breakdown diode's impedance grows toward the knee");
                    return false;
                });
        Optional<TemperatureCoefficient> tc = vz.flatMap(v -> temperatureCoefficient(f, v, notes));
        Optional<VzTestCondition> test = measured(f, pkg);
        if (!Fields.present(vz, tol, izt, zzt, izk, tc, test, leakage)
                || (f.has("knee-impedance") && zzk.isEmpty())) {
            return Optional.empty();
        }
        double zzkOhm = zzk.map(Value::si).orElse(Double.NaN);
        Optional<BreakdownDiode> bare = f.build(() -> BreakdownDiode.fromDatasheet(vz.get().si(), izt.get().si(),
                zzt.get().si(), izk.get().si(), zzkOhm, tc.get(), test.get(), Leakage.NONE));
        if (bare.isEmpty()) {
            return Optional.empty();
        }
        Leakage leak = leakage.get();
        double kneeV = bare.get().kneeVoltageV(Celsius.T25_K);
        if (leak.isKnown() && !(leak.vrV() < kneeV)) {
            leakageFields.orElseThrow().report(InputProblem.Kind.INCONSISTENT, "voltage", "leakage test voltage "
                    + Quantities.format(leak.vrV(), Dimension.VOLTAGE) + " must lie below the knee voltage "
                    + Quantities.format(kneeV, Dimension.VOLTAGE) + " at 25 °C");
            return Optional.empty();
        }
        BreakdownDiode d = bare.get();
        return f.build(() -> new BreakdownDiode(d.vz0At25V(), d.rzOhm(), d.iztA(), d.izkA(), d.knee(), d.tc(), leak))
                .map(m -> new Breakdown(vz.get().si(), tol.get().si(), m));
    }

    /** A coefficient in V/K, or in %/K (or 1/K, ppm/K) converted at the nominal voltage. */
    static Optional<Value> coefficient(FileContext ctx, Node node, String path, double vzNomV) {
        return Scalars.quantity(ctx, node, path, Sign.ANY, Dimension.VOLTAGE_TEMPERATURE_COEFFICIENT,
                Dimension.RELATIVE_TEMPERATURE_COEFFICIENT).map(v -> v.dimension()
                == Dimension.RELATIVE_TEMPERATURE_COEFFICIENT
                ? new Value(TemperatureCoefficient.voltsPerKelvin(v.si(), vzNomV),
                        Dimension.VOLTAGE_TEMPERATURE_COEFFICIENT, v.node(), v.path())
                : v);
    }

    private static Optional<TemperatureCoefficient> temperatureCoefficient(Fields f, Value vz, List<String> notes) {
        double vzNom = vz.si();
        Optional<Value> nominal = f.get("temperature-coefficient", Need.OPTIONAL)
                .flatMap(n -> coefficient(f.ctx(), n, f.pathOf("temperature-coefficient"), vzNom));
        Optional<Value[]> range = f.object("temperature-coefficient-range", Need.OPTIONAL, Set.of("min", "max"))
                .flatMap(r -> {
                    Optional<Value> lo = r.get("min", Need.REQUIRED)
                            .flatMap(n -> coefficient(r.ctx(), n, r.pathOf("min"), vzNom));
                    Optional<Value> hi = r.get("max", Need.REQUIRED)
                            .flatMap(n -> coefficient(r.ctx(), n, r.pathOf("max"), vzNom));
                    if (!Fields.present(lo, hi)) {
                        return Optional.empty();
                    }
                    if (lo.get().si() > hi.get().si()) {
                        r.report(InputProblem.Kind.INCONSISTENT, lo.get(), "min " + lo.get().text()
                                + " is above max " + hi.get().text());
                        return Optional.empty();
                    }
                    return Optional.of(new Value[] {lo.get(), hi.get()});
                });
        boolean hasNominal = f.has("temperature-coefficient");
        boolean hasRange = f.has("temperature-coefficient-range");
        if ((hasNominal && nominal.isEmpty()) || (hasRange && range.isEmpty())) {
            return Optional.empty();
        }
        if (!hasNominal && !hasRange) {
            TemperatureCoefficient est = TemperatureCoefficientEstimate.forNominalVoltage(vzNom);
            notes.add("temperature coefficient estimated from Vz: "
                    + Quantities.format(est.alphaVPerK(), Dimension.VOLTAGE_TEMPERATURE_COEFFICIENT) + " ("
                    + Quantities.format(est.minAlphaVPerK(), Dimension.VOLTAGE_TEMPERATURE_COEFFICIENT) + " … "
                    + Quantities.format(est.maxAlphaVPerK(), Dimension.VOLTAGE_TEMPERATURE_COEFFICIENT) + ")");
            return Optional.of(est);
        }
        if (!hasRange) {
            return Optional.of(TemperatureCoefficient.exact(nominal.get().si()));
        }
        double lo = range.get()[0].si();
        double hi = range.get()[1].si();
        if (!hasNominal) {
            return Optional.of(new TemperatureCoefficient(0.5 * (lo + hi), lo, hi, false));
        }
        double n = nominal.get().si();
        if (n < lo || n > hi) {
            f.report(InputProblem.Kind.INCONSISTENT, nominal.get(), "temperature coefficient " + nominal.get().text()
                    + " lies outside its range " + range.get()[0].text() + " … " + range.get()[1].text());
            return Optional.empty();
        }
        return Optional.of(new TemperatureCoefficient(n, lo, hi, false));
    }

    private static Optional<VzTestCondition> measured(Fields f, Optional<PackageSpec> pkg) {
        if (!f.has("measured")) {
            return Optional.of(new VzTestCondition.Pulsed(Celsius.T25_K));
        }
        Optional<Fields> of = f.object("measured", Need.REQUIRED, MEASURED_KEYS);
        if (of.isEmpty()) {
            return Optional.empty();
        }
        Fields m = of.get();
        Optional<String> at = m.text("at", Need.REQUIRED);
        if (at.isEmpty()) {
            return Optional.empty();
        }
        if (at.get().equals("pulse")) {
            for (String k : List.of("held-temperature", "held-distance", "held-rtheta")) {
                if (m.has(k)) {
                    m.report(InputProblem.Kind.INCONSISTENT, k, "'" + k + "' belongs to an equilibrium measurement");
                }
            }
            Optional<Value> tj = m.quantity("junction-temperature", Need.OPTIONAL, Sign.ANY, Dimension.TEMPERATURE);
            if (m.has("junction-temperature") && tj.isEmpty()) {
                return Optional.empty();
            }
            return m.build(() -> new VzTestCondition.Pulsed(tj.map(Value::si).orElse(Celsius.T25_K)));
        }
        if (!at.get().equals("equilibrium")) {
            m.report(InputProblem.Kind.WRONG_TYPE, "at", "expected pulse or equilibrium, got '" + at.get() + "'");
            return Optional.empty();
        }
        if (m.has("junction-temperature")) {
            m.report(InputProblem.Kind.INCONSISTENT, "junction-temperature",
                    "a junction temperature belongs to a pulse measurement; an equilibrium one gives the held point");
        }
        Optional<Value> held = m.quantity("held-temperature", Need.REQUIRED, Sign.ANY, Dimension.TEMPERATURE);
        boolean axial = pkg.isPresent() && pkg.get() instanceof PackageSpec.Axial;
        Optional<String> how = m.oneOf(Need.REQUIRED, "held-distance", "held-rtheta");
        if (how.isEmpty() || held.isEmpty() || pkg.isEmpty()) {
            return Optional.empty();
        }
        if (how.get().equals("held-distance")) {
            if (!axial) {
                m.report(InputProblem.Kind.INCONSISTENT, "held-distance",
                        "a held distance along the leads needs an axial package; give held-rtheta instead");
                return Optional.empty();
            }
            Optional<Value> dist = m.quantity("held-distance", Need.REQUIRED, Sign.NON_NEGATIVE, Dimension.LENGTH);
            return dist.flatMap(d -> m.build(() -> new VzTestCondition.ThermalEquilibrium(held.get().si(),
                    ((PackageSpec.Axial) pkg.get()).junctionToLeadKPerW(d.si()))));
        }
        Optional<Value> r = m.quantity("held-rtheta", Need.REQUIRED, Sign.NON_NEGATIVE, Dimension.THERMAL_RESISTANCE);
        return r.flatMap(v -> m.build(() -> new VzTestCondition.ThermalEquilibrium(held.get().si(), v.si())));
    }

    private static Optional<Leakage> leakage(Fields l) {
        Optional<Value> ir = l.quantity("current", Need.REQUIRED, Sign.NON_NEGATIVE, Dimension.CURRENT);
        Optional<Value> vr = l.quantity("voltage", Need.REQUIRED, Sign.POSITIVE, Dimension.VOLTAGE);
        Optional<Value> td = l.quantity("doubling", Need.OPTIONAL, Sign.POSITIVE, Dimension.TEMPERATURE_DIFFERENCE);
        if (!Fields.present(ir, vr) || (l.has("doubling") && td.isEmpty())) {
            return Optional.empty();
        }
        return l.build(() -> new Leakage(ir.get().si(), vr.get().si(),
                td.map(Value::si).orElse(Leakage.DEFAULT_DOUBLING_K)));
    }
}
