package org.tjmargin.design;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.tjmargin.device.Celsius;
import org.tjmargin.device.PowerRatingCurve;
import org.tjmargin.device.RatingReference;
import org.tjmargin.units.Dimension;

/**
 * Reads a diode's {@code ratings}: Tj max, the rated power, the maximum current and the power derating curve.
 */
final class RatingsReader {

    private static final Set<String> KEYS = Set.of("tj-max", "power", "max-current", "derating");
    private static final Set<String> DERATING_KEYS = Set.of("reference", "reference-distance", "knee", "slope",
            "zero-at", "points");

    /**
     * The ratings as read; the maximum current's default needs the nominal voltage and is applied by the caller.
     *
     * @param tjMaxK     Tj max (K)
     * @param power      rated power
     * @param maxCurrent maximum steady current, if given
     * @param curve      the power rating curve
     */
    record Ratings(double tjMaxK, Value power, Optional<Value> maxCurrent, PowerRatingCurve curve) {
    }

    private RatingsReader() {
    }

    static Optional<Ratings> read(Fields part, List<String> notes) {
        Optional<Fields> of = part.object("ratings", Need.REQUIRED, KEYS);
        if (of.isEmpty()) {
            return Optional.empty();
        }
        Fields f = of.get();
        Optional<Value> tjMax = f.quantity("tj-max", Need.REQUIRED, Sign.ANY, Dimension.TEMPERATURE);
        if (tjMax.isPresent() && !(tjMax.get().si() > Celsius.T25_K)) {
            f.report(InputProblem.Kind.NOT_PHYSICAL, tjMax.get(), "Tj max must lie above 25 °C, got "
                    + tjMax.get().text());
            tjMax = Optional.empty();
        }
        Optional<Value> power = f.quantity("power", Need.REQUIRED, Sign.POSITIVE, Dimension.POWER);
        Optional<Value> maxCurrent = f.quantity("max-current", Need.OPTIONAL, Sign.POSITIVE, Dimension.CURRENT);
        Optional<Fields> derating = f.object("derating", Need.REQUIRED, DERATING_KEYS);
        Optional<PowerRatingCurve> curve = Optional.empty();
        if (derating.isPresent()) {
            Fields d = derating.get();
            Optional<RatingReference> ref = reference(d);
            OptionalDouble refLength = referenceLength(d, ref);
            if (ref.isPresent() && refLength.isPresent() && Fields.present(tjMax, power)) {
                curve = DeratingReader.read(d, ref.get(), refLength.getAsDouble(), power.get(),
                        OptionalDouble.of(tjMax.get().si()), notes);
            }
        }
        if (!Fields.present(tjMax, power, curve) || (f.has("max-current") && maxCurrent.isEmpty())) {
            return Optional.empty();
        }
        return Optional.of(new Ratings(tjMax.get().si(), power.get(), maxCurrent, curve.get()));
    }

    private static Optional<RatingReference> reference(Fields d) {
        Optional<String> text = d.text("reference", Need.REQUIRED);
        if (text.isEmpty()) {
            return Optional.empty();
        }
        switch (text.get()) {
            case "lead":
                return Optional.of(RatingReference.LEAD);
            case "ambient":
                return Optional.of(RatingReference.AMBIENT);
            case "case":
                return Optional.of(RatingReference.CASE);
            case "junction":
                return Optional.of(RatingReference.JUNCTION);
            default:
                d.report(InputProblem.Kind.WRONG_TYPE, "reference", "expected lead, ambient, case or junction, got '"
                        + text.get() + "'");
                return Optional.empty();
        }
    }

    private static OptionalDouble referenceLength(Fields d, Optional<RatingReference> ref) {
        if (ref.isEmpty()) {
            return OptionalDouble.empty();
        }
        if (ref.get() == RatingReference.LEAD) {
            Optional<Value> l = d.quantity("reference-distance", Need.REQUIRED, Sign.POSITIVE, Dimension.LENGTH);
            return l.isPresent() ? OptionalDouble.of(l.get().si()) : OptionalDouble.empty();
        }
        if (d.has("reference-distance")) {
            d.report(InputProblem.Kind.INCONSISTENT, "reference-distance",
                    "a reference distance belongs to a lead-referenced rating only");
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(0.0);
    }
}
