package org.tjmargin.design;

import java.util.Optional;
import java.util.Set;
import org.tjmargin.units.Dimension;
import org.tjmargin.units.Quantities;
import org.tjmargin.variation.Range;

/**
 * Reads a toleranced value in any of its four forms: a plain quantity ({@code 12 V}, exact),
 * {@code {nominal, tolerance}} (nominal ± tolerance·|nominal|), {@code {min, max}} (nominal in the middle) or
 * {@code {min, nominal, max}}; {@code {nominal}} alone is exact too.
 */
final class RangeReader {

    private static final Set<String> KEYS = Set.of("min", "nominal", "max", "tolerance");

    private RangeReader() {
    }

    /** Reads one end or the nominal of a range (in SI), reporting what is wrong with it. */
    @FunctionalInterface
    interface ValueReader {
        Optional<Value> read(FileContext ctx, Node node, String path);
    }

    /** A reader of quantities of one dimension with a sign. */
    static ValueReader of(Dimension d, Sign sign) {
        return (ctx, node, path) -> Scalars.quantity(ctx, node, path, sign, d);
    }

    /** Reads the range at {@code key} of {@code f}. */
    static Optional<Range> read(Fields f, String key, Need need, ValueReader values, Sign sign) {
        return f.get(key, need).flatMap(n -> read(f.ctx(), n, f.pathOf(key), values, sign));
    }

    /**
     * Reads a range.
     *
     * @param ctx    where to report
     * @param node   the value
     * @param path   its field path
     * @param values how to read each number
     * @param sign   the sign every value of the range must have, the low end of {@code {nominal, tolerance}}
     *               included
     */
    static Optional<Range> read(FileContext ctx, Node node, String path, ValueReader values, Sign sign) {
        if (node instanceof Node.Scalar) {
            return values.read(ctx, node, path).map(v -> Range.exact(v.si()));
        }
        Optional<Fields> of = Fields.of(ctx, node, path, KEYS);
        if (of.isEmpty()) {
            return Optional.empty();
        }
        Fields f = of.get();
        Optional<Value> min = f.get("min", Need.OPTIONAL).flatMap(n -> values.read(ctx, n, f.pathOf("min")));
        Optional<Value> nom = f.get("nominal", Need.OPTIONAL).flatMap(n -> values.read(ctx, n, f.pathOf("nominal")));
        Optional<Value> max = f.get("max", Need.OPTIONAL).flatMap(n -> values.read(ctx, n, f.pathOf("max")));
        if (f.has("tolerance")) {
            Optional<Value> tol = f.quantity("tolerance", Need.REQUIRED, Sign.NON_NEGATIVE, Dimension.FRACTION);
            if (f.has("min") || f.has("max")) {
                f.report(InputProblem.Kind.INCONSISTENT, "tolerance",
                        "a tolerance goes with a nominal alone, not with min or max");
                return Optional.empty();
            }
            if (!f.has("nominal")) {
                f.get("nominal", Need.REQUIRED);
                return Optional.empty();
            }
            if (!Fields.present(tol, nom)) {
                return Optional.empty();
            }
            Range r = Range.relative(nom.get().si(), tol.get().si());
            if (!sign.admits(r.lo())) {
                f.report(InputProblem.Kind.NOT_PHYSICAL, tol.get(), "the tolerance takes the value to "
                        + Quantities.format(r.lo(), nom.get().dimension()) + " at its low end; it must stay " + sign.phrase());
                return Optional.empty();
            }
            return Optional.of(r);
        }
        if (!f.has("min") && !f.has("max")) {
            if (f.has("nominal")) {
                return nom.map(v -> Range.exact(v.si()));
            }
            f.reportHere(InputProblem.Kind.MISSING_FIELD,
                    "give a value, {nominal, tolerance}, {min, max} or {min, nominal, max}");
            return Optional.empty();
        }
        if (!f.has("min") || !f.has("max")) {
            f.get("min", Need.REQUIRED);
            f.get("max", Need.REQUIRED);
            return Optional.empty();
        }
        if (!Fields.present(min, max) || (f.has("nominal") && nom.isEmpty())) {
            return Optional.empty();
        }
        double lo = min.get().si();
        double hi = max.get().si();
        if (lo > hi) {
            f.report(InputProblem.Kind.INCONSISTENT, min.get(), "min " + min.get().text() + " is above max "
                    + max.get().text());
            return Optional.empty();
        }
        if (nom.isPresent()) {
            double n = nom.get().si();
            if (n < lo || n > hi) {
                f.report(InputProblem.Kind.INCONSISTENT, nom.get(), "nominal " + nom.get().text()
                        + " lies outside min " + min.get().text() + " … max " + max.get().text());
                return Optional.empty();
            }
            return Optional.of(new Range(lo, n, hi));
        }
        return Optional.of(Range.between(lo, hi));
    }
}
