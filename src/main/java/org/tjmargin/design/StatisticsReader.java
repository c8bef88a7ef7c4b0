package org.tjmargin.design;

import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.variation.Axis;
import org.tjmargin.variation.Distribution;
import org.tjmargin.variation.Range;
import org.tjmargin.variation.VariationModel;
import org.tjmargin.variation.statistical.MonteCarloSettings;
import org.tjmargin.variation.statistical.StatisticsPlan;

/**
 * Reads the design's {@code statistics} object and each position's {@code distributions}.
 *
 * <pre>
 * statistics: {samples: 10000, seed: 7, yield-points: 16, surge-samples: 200, distribution: uniform,
 *              positions: [D1, D4]}
 * positions:
 *   - id: D1
 *     distributions: {supply: normal 3σ, thermal-resistance: triangular}
 * </pre>
 *
 * <p>A distribution is {@code uniform}, {@code triangular} (mode at the nominal) or {@code normal Kσ} (also
 * {@code normal K sigma}) with an optional {@code truncated}: the range's half-width spans K standard deviations.
 * The design-level {@code distribution} applies to every axis a position does not name. {@code positions}, when
 * given, names the positions the statistics run for (every position otherwise); each must be a position of the
 * design, which {@link DesignReader} checks once the positions are read.
 */
final class StatisticsReader {

    private static final Set<String> KEYS = Set.of("samples", "seed", "yield-points", "surge-samples",
            "distribution", "positions");

    /** Distribution keys of a position, by the axis they name. */
    static final Map<String, Axis> AXIS_KEYS;

    static {
        Map<String, Axis> m = new LinkedHashMap<>();
        m.put("supply", Axis.SUPPLY);
        m.put("load", Axis.LOAD);
        m.put("vz", Axis.VZ);
        m.put("series-resistor", Axis.SERIES_RESISTOR);
        m.put("thermal-resistance", Axis.THERMAL_RESISTANCE);
        m.put("temperature-coefficient", Axis.TEMPERATURE_COEFFICIENT);
        AXIS_KEYS = java.util.Collections.unmodifiableMap(m);
    }

    private static final Pattern NORMAL = Pattern.compile(
            "normal\\s+([0-9]+(?:\\.[0-9]+)?)\\s*(?:σ|sigma)(\\s+truncated)?");

    /**
     * The lowest standard normal value a draw can take: the inverse CDF of the smallest uniform the random stream
     * gives (2⁻⁵³), about −8.2; an untruncated normal must keep a positive quantity positive out to there.
     */
    static final double DEEPEST_DRAW_SIGMA = 8.3;

    private StatisticsReader() {
    }

    /** The default distribution and the run's budget from {@code statistics}, without the positions' models. */
    record Header(MonteCarloSettings settings, int yieldPoints, long surgeSamples, Distribution defaultDistribution,
                  Optional<List<Selected>> positions) {
    }

    /** One id of {@code statistics.positions}, with where it was written. */
    record Selected(String id, Node at, String path) {
    }

    static Optional<Header> header(Fields top) {
        Optional<Fields> of = top.object("statistics", Need.OPTIONAL, KEYS);
        if (of.isEmpty()) {
            return Optional.empty();
        }
        Fields f = of.get();
        Optional<Long> samples = count(f, "samples", 1, 1_000_000_000L, StatisticsPlan.DEFAULT_SAMPLES);
        Optional<Long> seed = count(f, "seed", Long.MIN_VALUE, Long.MAX_VALUE, StatisticsPlan.DEFAULT_SEED);
        Optional<Long> yieldPoints = count(f, "yield-points", 2, 1000, StatisticsPlan.DEFAULT_YIELD_POINTS);
        Optional<Long> surgeSamples = count(f, "surge-samples", 1, 1_000_000_000L,
                StatisticsPlan.DEFAULT_SURGE_SAMPLES);
        boolean ok = Fields.present(samples, seed, yieldPoints, surgeSamples);
        Distribution d = Distribution.UNIFORM;
        if (f.has("distribution")) {
            Optional<Distribution> read = distribution(f, "distribution");
            ok &= read.isPresent();
            d = read.orElse(d);
        }
        Optional<List<Selected>> positions = Optional.empty();
        if (f.has("positions")) {
            positions = f.listOf("positions", Need.OPTIONAL, (node, path) -> {
                if (node instanceof Node.Scalar sc && !sc.text().isBlank()) {
                    return Optional.of(new Selected(sc.text().strip(), node, path));
                }
                f.ctx().report(InputProblem.Kind.WRONG_TYPE, node, path, "expected a position id, got "
                        + node.describe());
                return Optional.empty();
            });
            if (positions.isPresent() && positions.get().isEmpty()) {
                f.report(InputProblem.Kind.MISSING_FIELD, "positions", "name at least one position, or leave "
                        + "'positions' out to run the statistics for every position");
                positions = Optional.empty();
            }
            ok &= positions.isPresent();
        }
        if (!ok) {
            return Optional.empty();
        }
        return Optional.of(new Header(MonteCarloSettings.of(samples.get(), seed.get()), yieldPoints.get().intValue(),
                surgeSamples.get(), d, positions));
    }

    /**
     * A position's distributions: its own {@code distributions} over the design's default. Reports an axis the
     * position does not have and an untruncated normal that could draw a non-physical value.
     */
    static Optional<VariationModel> model(FileContext ctx, Node position, String path, PositionSpec spec,
                                          Distribution defaultDistribution) {
        Map<Axis, Distribution> map = new EnumMap<>(Axis.class);
        boolean ok = true;
        for (Axis a : spec.varyingAxes()) {
            map.put(a, defaultDistribution);
        }
        Optional<Fields> pf = Fields.checked(ctx, position, path);
        Optional<Fields> dist = pf.flatMap(p -> p.object("distributions", Need.OPTIONAL, AXIS_KEYS.keySet()));
        if (pf.isPresent() && pf.get().has("distributions") && dist.isEmpty()) {
            return Optional.empty();
        }
        if (dist.isPresent()) {
            for (Map.Entry<String, Axis> e : AXIS_KEYS.entrySet()) {
                if (!dist.get().has(e.getKey())) {
                    continue;
                }
                if (spec.rangeOf(e.getValue()).isEmpty()) {
                    dist.get().report(InputProblem.Kind.INCONSISTENT, e.getKey(), "position '" + spec.id()
                            + "' has no " + e.getKey() + " input to distribute (its circuit does not take one)");
                    ok = false;
                    continue;
                }
                Optional<Distribution> d = distribution(dist.get(), e.getKey());
                if (d.isEmpty()) {
                    ok = false;
                    continue;
                }
                map.put(e.getValue(), d.get());
            }
        }
        for (Map.Entry<Axis, Distribution> e : map.entrySet()) {
            if (!staysPhysical(spec, e.getKey(), e.getValue())) {
                String key = keyOf(e.getKey());
                String msg = "an untruncated " + e.getValue().label() + " of " + key + " can draw a value at or below"
                        + " zero (nominal − " + DEEPEST_DRAW_SIGMA + " σ ≤ 0); write 'truncated' or a larger k";
                if (dist.isPresent() && dist.get().has(key)) {
                    dist.get().report(InputProblem.Kind.NOT_PHYSICAL, key, msg);
                } else {
                    ctx.report(InputProblem.Kind.NOT_PHYSICAL, position, path, msg + " (from the design's"
                            + " statistics.distribution)");
                }
                ok = false;
            }
        }
        return ok ? Optional.of(new VariationModel(map)) : Optional.empty();
    }

    private static String keyOf(Axis a) {
        return AXIS_KEYS.entrySet().stream().filter(e -> e.getValue() == a).findFirst().orElseThrow().getKey();
    }

    /** False when an untruncated normal on a positive-only axis can reach zero. */
    private static boolean staysPhysical(PositionSpec spec, Axis axis, Distribution d) {
        if (!(d instanceof Distribution.Normal n) || n.truncated()) {
            return true;
        }
        boolean positiveOnly = axis == Axis.SUPPLY || axis == Axis.LOAD || axis == Axis.SERIES_RESISTOR
                || axis == Axis.THERMAL_RESISTANCE;
        if (!positiveOnly) {
            return true;
        }
        Optional<Range> r = spec.rangeOf(axis);
        return r.isEmpty() || !r.get().varies() || r.get().nominal() - DEEPEST_DRAW_SIGMA * n.sigma(r.get()) > 0;
    }

    /** A distribution written as text. */
    static Optional<Distribution> distribution(Fields f, String key) {
        Optional<String> text = f.text(key, Need.REQUIRED);
        if (text.isEmpty()) {
            return Optional.empty();
        }
        String t = text.get().strip().toLowerCase(Locale.ROOT).replaceAll("\\s+", " ");
        if (t.equals("uniform")) {
            return Optional.of(Distribution.UNIFORM);
        }
        if (t.equals("triangular")) {
            return Optional.of(new Distribution.Triangular());
        }
        Matcher m = NORMAL.matcher(t);
        if (m.matches()) {
            double k = Double.parseDouble(m.group(1));
            if (!(k > 0)) {
                f.report(InputProblem.Kind.NOT_PHYSICAL, key, "k-sigma must be > 0, got '" + text.get() + "'");
                return Optional.empty();
            }
            return Optional.of(new Distribution.Normal(k, m.group(2) != null));
        }
        f.report(InputProblem.Kind.WRONG_TYPE, key, "expected a distribution: uniform, triangular, or normal Kσ"
                + " [truncated] (e.g. 'normal 3σ truncated'), got '" + text.get() + "'");
        return Optional.empty();
    }

    /** The whole number at {@code key}, or {@code byDefault} when the key is absent; empty when reported. */
    private static Optional<Long> count(Fields f, String key, long min, long max, long byDefault) {
        return f.has(key) ? count(f, key, min, max) : Optional.of(byDefault);
    }

    /** A whole number in {@code [min, max]}, written without unit. */
    private static Optional<Long> count(Fields f, String key, long min, long max) {
        Optional<String> text = f.get(key, Need.REQUIRED).flatMap(n -> n instanceof Node.Scalar s
                ? Optional.of(s.text().strip()) : Optional.empty());
        if (text.isPresent() && text.get().matches("[+-]?[0-9]{1,19}")) {
            try {
                long v = Long.parseLong(text.get());
                if (v >= min && v <= max) {
                    return Optional.of(v);
                }
            } catch (NumberFormatException e) {
                // out of range of a long: reported below
            }
        }
        f.report(InputProblem.Kind.WRONG_TYPE, key, "expected a whole number without unit from " + min + " to " + max
                + ", got " + f.get(key, Need.OPTIONAL).map(Node::describe).orElse("nothing"));
        return Optional.empty();
    }
}
