package org.tjmargin.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.tjmargin.device.PowerRatingCurve;
import org.tjmargin.device.RatingReference;
import org.tjmargin.units.Dimension;
import org.tjmargin.units.Quantities;

/**
 * Reads a power rating curve: flat at the rated power to {@code knee}, then linear to zero at {@code zero-at} or
 * with {@code slope}; or a list of {@code points}. Shared by diodes (whose curve ends at Tj max by default) and
 * resistors (whose curve must say where it ends).
 */
final class DeratingReader {

    /** Relative disagreement between a datasheet's slope and {@code P/(Tj max − knee)} worth a note: 2 %. */
    static final double SLOPE_NOTE_THRESHOLD = 0.02;
    /** Relative difference tolerated between the rated power and the first point's power (rounding only). */
    private static final double SAME_POWER = 1e-9;

    static final Set<String> SHAPE_KEYS = Set.of("knee", "slope", "zero-at", "points");

    private DeratingReader() {
    }

    /**
     * Reads the curve's shape from {@code f}.
     *
     * @param f          the derating object
     * @param reference  where the curve's temperature is read
     * @param refLengthM the reference distance for a lead reference (m), else 0
     * @param powerW     the rated power (W)
     * @param tjMaxK     Tj max for a diode (the default end of the curve), empty for a resistor
     * @param notes      where estimate notes go
     */
    static Optional<PowerRatingCurve> read(Fields f, RatingReference reference, double refLengthM, Value powerW,
                                           OptionalDouble tjMaxK, List<String> notes) {
        if (f.has("points")) {
            for (String k : List.of("knee", "slope", "zero-at")) {
                if (f.has(k)) {
                    f.report(InputProblem.Kind.INCONSISTENT, k, "'" + k + "' and 'points' exclude each other");
                }
            }
            return points(f, reference, refLengthM, powerW, tjMaxK, notes);
        }
        Optional<Value> knee = f.quantity("knee", Need.REQUIRED, Sign.ANY, Dimension.TEMPERATURE);
        Optional<String> end = f.oneOf(tjMaxK.isPresent() ? Need.OPTIONAL : Need.REQUIRED, "slope", "zero-at");
        Optional<Value> slope = f.quantity("slope", Need.OPTIONAL, Sign.POSITIVE, Dimension.POWER_DERATING_SLOPE);
        Optional<Value> zeroAt = f.quantity("zero-at", Need.OPTIONAL, Sign.ANY, Dimension.TEMPERATURE);
        if (knee.isEmpty() || (f.has("slope") && slope.isEmpty()) || (f.has("zero-at") && zeroAt.isEmpty())
                || (end.isEmpty() && tjMaxK.isEmpty())) {
            return Optional.empty();
        }
        double kneeK = knee.get().si();
        if (tjMaxK.isPresent() && !(kneeK < tjMaxK.getAsDouble())) {
            f.report(InputProblem.Kind.INCONSISTENT, knee.get(), "knee " + knee.get().text()
                    + " must lie below Tj max " + Quantities.format(tjMaxK.getAsDouble(), Dimension.TEMPERATURE));
            return Optional.empty();
        }
        double zeroK;
        if ("slope".equals(end.orElse(""))) {
            double s = slope.get().si();
            zeroK = kneeK + powerW.si() / s;
            if (tjMaxK.isPresent()) {
                double expected = powerW.si() / (tjMaxK.getAsDouble() - kneeK);
                if (Math.abs(s - expected) > SLOPE_NOTE_THRESHOLD * expected) {
                    notes.add("derating slope " + slope.get().text() + " disagrees with power / (Tj max − knee) = "
                            + Quantities.format(expected, Dimension.POWER_DERATING_SLOPE)
                            + " by more than 2 %; the given slope is used (zero power at "
                            + Quantities.format(zeroK, Dimension.TEMPERATURE) + ")");
                }
            }
        } else if ("zero-at".equals(end.orElse(""))) {
            zeroK = zeroAt.get().si();
            if (!(zeroK > kneeK)) {
                f.report(InputProblem.Kind.INCONSISTENT, zeroAt.get(), "zero-at " + zeroAt.get().text()
                        + " must lie above the knee " + knee.get().text());
                return Optional.empty();
            }
            noteAboveTjMax(zeroK, tjMaxK, notes);
        } else {
            zeroK = tjMaxK.getAsDouble();
        }
        return f.build(() -> PowerRatingCurve.flatThenLinear(reference, refLengthM, powerW.si(), kneeK, zeroK));
    }

    private static Optional<PowerRatingCurve> points(Fields f, RatingReference reference, double refLengthM,
                                                     Value powerW, OptionalDouble tjMaxK, List<String> notes) {
        Optional<List<Value[]>> pts = f.listOf("points", Need.REQUIRED, (node, path) -> {
            Optional<Fields> pf = Fields.of(f.ctx(), node, path, Set.of("temperature", "power"));
            if (pf.isEmpty()) {
                return Optional.empty();
            }
            Optional<Value> t = pf.get().quantity("temperature", Need.REQUIRED, Sign.ANY, Dimension.TEMPERATURE);
            Optional<Value> p = pf.get().quantity("power", Need.REQUIRED, Sign.NON_NEGATIVE, Dimension.POWER);
            return Fields.present(t, p) ? Optional.of(new Value[] {t.get(), p.get()}) : Optional.empty();
        });
        if (pts.isEmpty()) {
            return Optional.empty();
        }
        List<Value[]> list = pts.get();
        if (list.size() < 2) {
            f.report(InputProblem.Kind.INCONSISTENT, "points", "a rating curve needs at least two points, got "
                    + list.size());
            return Optional.empty();
        }
        boolean ok = true;
        for (int i = 1; i < list.size(); i++) {
            Value[] a = list.get(i - 1);
            Value[] b = list.get(i);
            if (!(b[0].si() > a[0].si())) {
                f.report(InputProblem.Kind.INCONSISTENT, b[0], "temperatures must rise from point to point: "
                        + a[0].text() + " then " + b[0].text());
                ok = false;
            }
            if (b[1].si() > a[1].si()) {
                f.report(InputProblem.Kind.INCONSISTENT, b[1], "allowed power must not rise with temperature: "
                        + a[1].text() + " then " + b[1].text());
                ok = false;
            }
        }
        Value[] last = list.get(list.size() - 1);
        if (last[1].si() != 0.0) {
            f.report(InputProblem.Kind.INCONSISTENT, last[1], "the last point must be at zero power, got "
                    + last[1].text());
            ok = false;
        }
        Value first = list.get(0)[1];
        if (Math.abs(first.si() - powerW.si()) > SAME_POWER * powerW.si()) {
            f.report(InputProblem.Kind.INCONSISTENT, first, "the first point's power " + first.text()
                    + " differs from the rated power " + powerW.text());
            ok = false;
        }
        if (!ok) {
            return Optional.empty();
        }
        if (tjMaxK.isPresent() && !(list.get(0)[0].si() < tjMaxK.getAsDouble())) {
            f.report(InputProblem.Kind.INCONSISTENT, list.get(0)[0], "the first point must lie below Tj max "
                    + Quantities.format(tjMaxK.getAsDouble(), Dimension.TEMPERATURE));
            return Optional.empty();
        }
        noteAboveTjMax(last[0].si(), tjMaxK, notes);
        List<PowerRatingCurve.Point> points = new ArrayList<>();
        for (Value[] v : list) {
            points.add(new PowerRatingCurve.Point(v[0].si(), v[1].si()));
        }
        return f.build(() -> new PowerRatingCurve(reference, refLengthM, points));
    }

    private static void noteAboveTjMax(double zeroK, OptionalDouble tjMaxK, List<String> notes) {
        if (tjMaxK.isPresent() && zeroK > tjMaxK.getAsDouble()) {
            notes.add("the derating curve reaches zero power at " + Quantities.format(zeroK, Dimension.TEMPERATURE)
                    + ", above Tj max " + Quantities.format(tjMaxK.getAsDouble(), Dimension.TEMPERATURE));
        }
    }
}
