package org.tjmargin.design;

import java.util.Optional;
import java.util.Set;
import org.tjmargin.solve.AmbientRange;
import org.tjmargin.thermal.Enclosure;
import org.tjmargin.units.Dimension;

/**
 * Reads the design's {@code ambient} sweep and its {@code enclosure}.
 *
 * <p>The sweep runs from {@code min} to {@code max} in {@code points} equal steps, or in the fewest equal steps no
 * larger than {@code step}; with neither, in steps of at most {@value #DEFAULT_STEP_K} K.
 */
final class AmbientReader {

    /** Default largest sweep step (K): fine enough for a chart, cheap enough for a board of many positions. */
    static final double DEFAULT_STEP_K = 1.0;
    /** Most sweep points {@link AmbientRange} accepts. */
    private static final int MAX_POINTS = 100_000;
    /** Relative slack so that a step that divides the range exactly is not rounded up to one more point. */
    private static final double STEP_SLACK = 1e-9;

    private static final Set<String> KEYS = Set.of("min", "max", "points", "step");
    private static final Set<String> ENCLOSURE_KEYS = Set.of("sealed-box", "rise", "open-air");
    private static final Set<String> BOX_KEYS = Set.of("surface-area", "heat-transfer", "other-dissipation");

    private AmbientReader() {
    }

    static Optional<AmbientRange> ambient(Fields design) {
        Optional<Fields> of = design.object("ambient", Need.REQUIRED, KEYS);
        if (of.isEmpty()) {
            return Optional.empty();
        }
        Fields f = of.get();
        Optional<Value> min = f.quantity("min", Need.REQUIRED, Sign.ANY, Dimension.TEMPERATURE);
        Optional<Value> max = f.quantity("max", Need.REQUIRED, Sign.ANY, Dimension.TEMPERATURE);
        Optional<String> how = f.oneOf(Need.OPTIONAL, "points", "step");
        Optional<Integer> points = f.integer("points", Need.OPTIONAL);
        Optional<Value> step = f.quantity("step", Need.OPTIONAL, Sign.POSITIVE, Dimension.TEMPERATURE_DIFFERENCE);
        if (!Fields.present(min, max) || (f.has("points") && points.isEmpty()) || (f.has("step") && step.isEmpty())
                || (f.has("points") && f.has("step"))) {
            return Optional.empty();
        }
        double lo = min.get().si();
        double hi = max.get().si();
        if (lo > hi) {
            f.report(InputProblem.Kind.INCONSISTENT, min.get(), "min " + min.get().text() + " is above max "
                    + max.get().text());
            return Optional.empty();
        }
        int n;
        if (hi == lo) {
            n = 1;
        } else if (how.orElse("").equals("points")) {
            n = points.get();
            if (n < 2 || n > MAX_POINTS) {
                f.report(InputProblem.Kind.NOT_PHYSICAL, "points", "a sweep needs 2 … " + MAX_POINTS
                        + " points, got " + n);
                return Optional.empty();
            }
        } else {
            double stepK = step.map(Value::si).orElse(DEFAULT_STEP_K);
            double steps = Math.ceil((hi - lo) / stepK * (1 - STEP_SLACK));
            if (steps + 1 > MAX_POINTS) {
                f.report(InputProblem.Kind.NOT_PHYSICAL, "step", "the step makes more than " + MAX_POINTS
                        + " points");
                return Optional.empty();
            }
            n = (int) steps + 1;
        }
        final int count = n;
        return f.build(() -> new AmbientRange(lo, hi, count));
    }

    static Optional<Enclosure> enclosure(Fields design) {
        Optional<Fields> of = design.object("enclosure", Need.REQUIRED, ENCLOSURE_KEYS);
        if (of.isEmpty()) {
            return Optional.empty();
        }
        Fields f = of.get();
        Optional<String> which = f.oneOf(Need.REQUIRED, "sealed-box", "rise", "open-air");
        if (which.isEmpty()) {
            return Optional.empty();
        }
        switch (which.get()) {
            case "rise":
                return f.quantity("rise", Need.REQUIRED, Sign.NON_NEGATIVE, Dimension.TEMPERATURE_DIFFERENCE)
                        .flatMap(v -> f.build(() -> new Enclosure.FixedRise(v.si())));
            case "open-air": {
                Optional<Boolean> open = f.bool("open-air", Need.REQUIRED);
                if (open.isPresent() && !open.get()) {
                    f.report(InputProblem.Kind.INCONSISTENT, "open-air",
                            "open-air: false says nothing; give sealed-box or rise instead");
                    return Optional.empty();
                }
                return open.map(o -> new Enclosure.FixedRise(0.0));
            }
            default: {
                Optional<Fields> box = f.object("sealed-box", Need.REQUIRED, BOX_KEYS);
                if (box.isEmpty()) {
                    return Optional.empty();
                }
                Fields b = box.get();
                Optional<Value> area = b.quantity("surface-area", Need.REQUIRED, Sign.POSITIVE, Dimension.AREA);
                Optional<Value> h = b.quantity("heat-transfer", Need.REQUIRED, Sign.POSITIVE,
                        Dimension.HEAT_TRANSFER_COEFFICIENT);
                Optional<Value> other = b.quantity("other-dissipation", Need.OPTIONAL, Sign.NON_NEGATIVE,
                        Dimension.POWER);
                if (!Fields.present(area, h) || (b.has("other-dissipation") && other.isEmpty())) {
                    return Optional.empty();
                }
                return b.build(() -> new Enclosure.SealedBox(area.get().si(), h.get().si(),
                        other.map(Value::si).orElse(0.0)));
            }
        }
    }
}
