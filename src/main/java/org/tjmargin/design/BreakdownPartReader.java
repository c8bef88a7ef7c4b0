package org.tjmargin.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.tjmargin.device.BreakdownPart;
import org.tjmargin.device.DiodeRatings;
import org.tjmargin.units.Dimension;
import org.tjmargin.units.Quantities;

/**
 * Reads one entry of the library's {@code parts} list into a {@link LibraryPart}: kind, breakdown, leakage,
 * ratings, package and, for a clamp, its standoff voltage. Values the entry leaves out and the reader estimates
 * (temperature coefficient, maximum current, lead material) are noted in the part's estimates.
 */
final class BreakdownPartReader {

    private static final Set<String> KEYS = Set.of("id", "kind", "breakdown", "leakage", "ratings", "package",
            "clamp", "surge");
    private static final Set<String> CLAMP_KEYS = Set.of("standoff");

    private BreakdownPartReader() {
    }

    /**
     * Reads one part.
     *
     * @param ctx  where to report
     * @param node the entry
     * @param path its field path, e.g. {@code parts[2]}
     */
    static Optional<LibraryPart> read(FileContext ctx, Node node, String path) {
        Optional<Fields> of = Fields.of(ctx, node, path, KEYS);
        if (of.isEmpty()) {
            return Optional.empty();
        }
        Fields f = of.get();
        List<String> notes = new ArrayList<>();
        Optional<String> id = f.text("id", Need.REQUIRED);
        Optional<BreakdownPart.Kind> kind = kind(f);
        Optional<RatingsReader.Ratings> ratings = RatingsReader.read(f, notes);
        Optional<PackageSpec> pkg = PackageReader.read(f, ratings.map(RatingsReader.Ratings::curve), notes);
        Optional<BreakdownReader.Breakdown> bd = BreakdownReader.read(f, pkg, notes);
        Optional<Value> standoff = f.object("clamp", kind.orElse(null) == BreakdownPart.Kind.TVS ? Need.REQUIRED
                : Need.OPTIONAL, CLAMP_KEYS).flatMap(c -> c.quantity("standoff", Need.REQUIRED, Sign.POSITIVE,
                Dimension.VOLTAGE));
        if (!Fields.present(id, kind, ratings, pkg, bd) || ((f.has("clamp") || kind.orElse(null) == BreakdownPart.Kind.TVS) && standoff.isEmpty())) {
            return Optional.empty();
        }
        BreakdownReader.Breakdown b = bd.get();
        if (standoff.isPresent()) {
            double lowest = b.vzNomV() * (1 - b.tolerance());
            if (!(standoff.get().si() < lowest)) {
                f.report(InputProblem.Kind.INCONSISTENT, standoff.get(), "standoff " + standoff.get().text()
                        + " must lie below the lowest breakdown voltage "
                        + Quantities.format(lowest, Dimension.VOLTAGE));
                return Optional.empty();
            }
        }
        RatingsReader.Ratings r = ratings.get();
        double izmA;
        if (r.maxCurrent().isPresent()) {
            izmA = r.maxCurrent().get().si();
        } else {
            izmA = r.power().si() / b.vzNomV();
            notes.add("maximum current not given: taken as power / Vz = " + Quantities.format(izmA, Dimension.CURRENT));
        }
        Optional<SurgePartSpec> surge = f.has("surge")
                ? SurgePartReader.read(f, r.tjMaxK(), b.model().vz0At25V()) : Optional.empty();
        if (f.has("surge") && surge.isEmpty()) {
            return Optional.empty();
        }
        Optional<DiodeRatings> dr = f.build(() -> new DiodeRatings(r.tjMaxK(), r.curve(), izmA));
        return dr.flatMap(d -> f.build(() -> new BreakdownPart(id.get(), kind.get(), b.vzNomV(), b.tolerance(),
                b.model(), d, standoff.map(Value::si).orElse(0.0), notes)))
                .map(part -> new LibraryPart(part, pkg.get(), surge));
    }

    private static Optional<BreakdownPart.Kind> kind(Fields f) {
        Optional<String> k = f.text("kind", Need.REQUIRED);
        if (k.isEmpty()) {
            return Optional.empty();
        }
        switch (k.get()) {
            case "zener":
                return Optional.of(BreakdownPart.Kind.ZENER);
            case "tvs":
                return Optional.of(BreakdownPart.Kind.TVS);
            default:
                f.report(InputProblem.Kind.WRONG_TYPE, "kind", "expected zener or tvs, got '" + k.get() + "'");
                return Optional.empty();
        }
    }
}
