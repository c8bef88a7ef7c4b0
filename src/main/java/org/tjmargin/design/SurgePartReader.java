package org.tjmargin.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.tjmargin.surge.SurgeRating;
import org.tjmargin.thermal.FosterFitOutcome;
import org.tjmargin.thermal.FosterFitSettings;
import org.tjmargin.thermal.FosterNetwork;
import org.tjmargin.thermal.FosterPulse;
import org.tjmargin.thermal.PulseRatingFit;
import org.tjmargin.thermal.ZthFit;
import org.tjmargin.units.Dimension;

/**
 * Reads a part's {@code surge} object (src/site/markdown/file-format.md, "Surge data of a clamp"): the rated peak pulse power at
 * its waveform, the clamping voltage at its peak current, the optional pulse Tj max, and the optional transient
 * thermal impedance (Foster stages, {@code Zth(t)} points, or a peak-pulse-power curve, the last two fitted here).
 */
final class SurgePartReader {

    private static final Set<String> KEYS = Set.of("peak-pulse-power", "waveform", "clamping-voltage", "clamping-current",
            "pulse-tj-max", "transient");
    private static final Set<String> TRANSIENT_KEYS = Set.of("foster", "zth", "rating-curve", "stages");
    /** {@code front/half-value} in µs, e.g. {@code 10/1000}, optionally followed by {@code µs} or {@code us}. */
    private static final Pattern WAVEFORM = Pattern.compile("\\s*([0-9]+(?:\\.[0-9]+)?)\\s*/\\s*([0-9]+(?:\\.[0-9]+)?)\\s*(?:µs|us)?\\s*");
    /** Foster stages fitted when the part does not say: three span the usual µs-to-s range of a small clamp. */
    private static final int DEFAULT_STAGES = 3;
    private static final double MICROSECOND = 1e-6;

    private SurgePartReader() {
    }

    /**
     * @param part          the part's fields
     * @param tjMaxK        the part's Tj max (K), the default of the pulse Tj max
     * @param breakdown25V  the breakdown line's intercept at 25 °C (V), which the clamping voltage must exceed
     */
    static Optional<SurgePartSpec> read(Fields part, double tjMaxK, double breakdown25V) {
        Optional<Fields> of = part.object("surge", Need.REQUIRED, KEYS);
        if (of.isEmpty()) {
            return Optional.empty();
        }
        Fields f = of.get();
        Optional<Value> power = f.quantity("peak-pulse-power", Need.REQUIRED, Sign.POSITIVE, Dimension.POWER);
        Optional<FosterPulse> pulse = waveform(f);
        Optional<Value> vc = f.quantity("clamping-voltage", Need.REQUIRED, Sign.POSITIVE, Dimension.VOLTAGE);
        Optional<Value> ipp = f.quantity("clamping-current", Need.REQUIRED, Sign.POSITIVE, Dimension.CURRENT);
        Optional<Value> pulseTjMax = f.quantity("pulse-tj-max", Need.OPTIONAL, Sign.POSITIVE, Dimension.TEMPERATURE);
        if (!Fields.present(power, pulse, vc, ipp) || (f.has("pulse-tj-max") && pulseTjMax.isEmpty())) {
            return Optional.empty();
        }
        double tjPulse = pulseTjMax.map(Value::si).orElse(tjMaxK);
        if (!(tjPulse > SurgeRating.RATING_START_K)) {
            f.report(InputProblem.Kind.NOT_PHYSICAL, pulseTjMax.get(), "pulse Tj max must lie above 25 °C, got "
                    + pulseTjMax.get().text());
            return Optional.empty();
        }
        if (!(vc.get().si() > breakdown25V)) {
            f.report(InputProblem.Kind.INCONSISTENT, vc.get(), "clamping voltage " + vc.get().text()
                    + " must exceed the breakdown line's intercept at 25 °C, "
                    + org.tjmargin.units.Quantities.format(breakdown25V, Dimension.VOLTAGE));
            return Optional.empty();
        }
        List<String> notes = new ArrayList<>();
        Optional<FosterNetwork> network = Optional.empty();
        SurgeRating.NetworkSource source = SurgeRating.NetworkSource.SEMI_INFINITE_DIE_ESTIMATE;
        if (f.has("transient")) {
            Optional<Fields> t = f.object("transient", Need.REQUIRED, TRANSIENT_KEYS);
            if (t.isEmpty()) {
                return Optional.empty();
            }
            Optional<String> which = t.get().oneOf(Need.REQUIRED, "foster", "zth", "rating-curve");
            if (which.isEmpty()) {
                return Optional.empty();
            }
            Optional<Integer> stages = t.get().integer("stages", Need.OPTIONAL);
            if (t.get().has("stages") && (stages.isEmpty() || stages.get() < 1)) {
                if (stages.isPresent()) {
                    t.get().report(InputProblem.Kind.NOT_PHYSICAL, "stages", "needs at least one stage, got " + stages.get());
                }
                return Optional.empty();
            }
            switch (which.get()) {
                case "foster" -> {
                    network = pairs(t.get(), "foster", "r", Dimension.THERMAL_RESISTANCE, "tau", Dimension.TIME)
                            .flatMap(p -> t.get().build(() -> FosterNetwork.of(p[0], p[1])));
                    source = SurgeRating.NetworkSource.GIVEN_FOSTER;
                }
                case "zth" -> {
                    network = pairs(t.get(), "zth", "time", Dimension.TIME, "zth", Dimension.THERMAL_RESISTANCE)
                            .flatMap(p -> fit(t.get(), "zth", p, stages, (n) -> ZthFit.fit(p[0], p[1], n, FosterFitSettings.defaults())));
                    source = SurgeRating.NetworkSource.ZTH_POINTS;
                }
                default -> {
                    FosterPulse.Shape shape = pulse.get().shape();
                    network = pairs(t.get(), "rating-curve", "width", Dimension.TIME, "power", Dimension.POWER)
                            .flatMap(p -> fit(t.get(), "rating-curve", p, stages,
                                    (n) -> PulseRatingFit.fit(shape, p[0], p[1], tjPulse, n, FosterFitSettings.defaults())));
                    source = SurgeRating.NetworkSource.RATING_CURVE;
                }
            }
            if (network.isEmpty()) {
                return Optional.empty();
            }
        } else {
            notes.add("surge transient thermal impedance not given: estimated as a semi-infinite silicon die sized to the "
                    + "pulse rating, capped by the steady thermal path");
        }
        return Optional.of(new SurgePartSpec(power.get().si(), pulse.get(), vc.get().si(), ipp.get().si(), tjPulse, network,
                source, notes));
    }

    private static Optional<FosterPulse> waveform(Fields f) {
        Optional<String> w = f.text("waveform", Need.REQUIRED);
        if (w.isEmpty()) {
            return Optional.empty();
        }
        Matcher m = WAVEFORM.matcher(w.get());
        if (!m.matches() || !(Double.parseDouble(m.group(1)) < Double.parseDouble(m.group(2)))
                || !(Double.parseDouble(m.group(1)) > 0)) {
            f.report(InputProblem.Kind.WRONG_TYPE, "waveform", "expected front/half-value time in µs with the front shorter, "
                    + "such as '10/1000', got '" + w.get() + "'");
            return Optional.empty();
        }
        // Rating curves state exponential pulses by their time to half value; the front is neglected (FosterPulse).
        return Optional.of(FosterPulse.exponentialDecay(Double.parseDouble(m.group(2)) * MICROSECOND));
    }

    /** A list of two-quantity objects, as two arrays; the first quantity must increase. */
    private static Optional<double[][]> pairs(Fields t, String key, String a, Dimension da, String b, Dimension db) {
        Optional<List<Value[]>> rows = t.listOf(key, Need.REQUIRED, (node, path) -> {
            Optional<Fields> pf = Fields.of(t.ctx(), node, path, Set.of(a, b));
            if (pf.isEmpty()) {
                return Optional.empty();
            }
            Optional<Value> va = pf.get().quantity(a, Need.REQUIRED, Sign.POSITIVE, da);
            Optional<Value> vb = pf.get().quantity(b, Need.REQUIRED, Sign.POSITIVE, db);
            return Fields.present(va, vb) ? Optional.of(new Value[] {va.get(), vb.get()}) : Optional.empty();
        });
        if (rows.isEmpty()) {
            return Optional.empty();
        }
        if (rows.get().isEmpty()) {
            t.report(InputProblem.Kind.INCONSISTENT, key, "needs at least one point");
            return Optional.empty();
        }
        int n = rows.get().size();
        double[][] out = new double[2][n];
        for (int i = 0; i < n; i++) {
            Value[] v = rows.get().get(i);
            if (i > 0 && !key.equals("foster") && !(v[0].si() > out[0][i - 1])) {
                t.report(InputProblem.Kind.INCONSISTENT, v[0], a + " must increase from point to point: "
                        + rows.get().get(i - 1)[0].text() + " then " + v[0].text());
                return Optional.empty();
            }
            out[0][i] = v[0].si();
            out[1][i] = v[1].si();
        }
        return Optional.of(out);
    }

    private static Optional<FosterNetwork> fit(Fields t, String key, double[][] points, Optional<Integer> stages,
            java.util.function.IntFunction<FosterFitOutcome> fitter) {
        int n = stages.orElse(Math.max(1, Math.min(DEFAULT_STAGES, points[0].length / 2)));
        if (points[0].length < 2 * n) {
            t.report(InputProblem.Kind.INCONSISTENT, key, "a " + n + "-stage fit needs at least " + 2 * n + " points, got "
                    + points[0].length);
            return Optional.empty();
        }
        FosterFitOutcome out;
        try {
            out = fitter.apply(n);
        } catch (IllegalArgumentException e) {
            t.report(InputProblem.Kind.NOT_PHYSICAL, key, e.getMessage());
            return Optional.empty();
        }
        if (out instanceof FosterFitOutcome.Fitted fitted) {
            return Optional.of(fitted.network());
        }
        FosterFitOutcome.Failed failed = (FosterFitOutcome.Failed) out;
        t.report(InputProblem.Kind.NOT_PHYSICAL, key, "no Foster network fits these points: " + failed.reason() + ", "
                + failed.detail());
        return Optional.empty();
    }
}
