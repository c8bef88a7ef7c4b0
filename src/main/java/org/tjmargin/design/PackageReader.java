package org.tjmargin.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.tjmargin.device.PowerRatingCurve;
import org.tjmargin.device.RatingReference;
import org.tjmargin.thermal.LeadConduction;
import org.tjmargin.thermal.SurfaceMountPad;
import org.tjmargin.units.Dimension;
import org.tjmargin.units.Quantities;

/**
 * Reads a part's {@code package}: exactly one of {@code axial}, {@code surface-mount} or {@code given}.
 *
 * <p>An axial part without its internal resistance is calibrated from a lead-referenced rating curve:
 * {@code R_int = Rθjl(L_ref) − (L_ref/(k·A))/2} with {@code Rθjl(L_ref)} the curve's implied resistance
 * (design 2.2; {@link org.tjmargin.thermal.AxialLeadMount#calibrated}).
 */
final class PackageReader {

    private static final Set<String> KEYS = Set.of("axial", "surface-mount", "given");
    private static final Set<String> AXIAL_KEYS = Set.of("lead-diameter", "lead-conductivity", "internal");
    private static final Set<String> SMD_KEYS = Set.of("rtheta-ja", "rtheta-jc");
    private static final Set<String> GIVEN_KEYS = Set.of("rtheta-ja");

    private PackageReader() {
    }

    /**
     * Reads the package.
     *
     * @param part  the part's object
     * @param curve the part's rating curve, if it could be read (needed to calibrate axial leads)
     * @param notes where estimate notes go
     */
    static Optional<PackageSpec> read(Fields part, Optional<PowerRatingCurve> curve, List<String> notes) {
        Optional<Fields> of = part.object("package", Need.REQUIRED, KEYS);
        if (of.isEmpty()) {
            return Optional.empty();
        }
        Fields f = of.get();
        Optional<String> which = f.oneOf(Need.REQUIRED, "axial", "surface-mount", "given");
        if (which.isEmpty()) {
            return Optional.empty();
        }
        switch (which.get()) {
            case "axial":
                return f.object("axial", Need.REQUIRED, AXIAL_KEYS).flatMap(a -> axial(a, curve, notes));
            case "surface-mount":
                return f.object("surface-mount", Need.REQUIRED, SMD_KEYS).flatMap(s -> surfaceMount(s, curve));
            default:
                return f.object("given", Need.REQUIRED, GIVEN_KEYS)
                        .flatMap(g -> g.quantity("rtheta-ja", Need.REQUIRED, Sign.POSITIVE,
                                Dimension.THERMAL_RESISTANCE))
                        .map(v -> new PackageSpec.Given(v.si()));
        }
    }

    private static Optional<PackageSpec> axial(Fields a, Optional<PowerRatingCurve> curve, List<String> notes) {
        Optional<Value> d = a.quantity("lead-diameter", Need.REQUIRED, Sign.POSITIVE, Dimension.LENGTH);
        Optional<Value> k = a.quantity("lead-conductivity", Need.OPTIONAL, Sign.POSITIVE,
                Dimension.THERMAL_CONDUCTIVITY);
        Optional<Value> internal = a.quantity("internal", Need.OPTIONAL, Sign.NON_NEGATIVE,
                Dimension.THERMAL_RESISTANCE);
        if (d.isEmpty() || (a.has("lead-conductivity") && k.isEmpty()) || (a.has("internal") && internal.isEmpty())) {
            return Optional.empty();
        }
        double kWPerMK;
        if (k.isPresent()) {
            kWPerMK = k.get().si();
        } else {
            kWPerMK = LeadConduction.COPPER_W_PER_M_K;
            notes.add("lead conductivity not given: copper assumed, "
                    + Quantities.format(kWPerMK, Dimension.THERMAL_CONDUCTIVITY));
        }
        if (internal.isPresent()) {
            return Optional.of(new PackageSpec.Axial(d.get().si(), kWPerMK, internal.get().si(), false));
        }
        if (curve.isEmpty()) {
            return Optional.empty();
        }
        PowerRatingCurve c = curve.get();
        if (c.reference() != RatingReference.LEAD) {
            a.get("internal", Need.REQUIRED);
            return Optional.empty();
        }
        double rating = c.impliedResistanceKPerW();
        double leads = LeadConduction.resistanceKPerW(c.referenceLengthM(), d.get().si(), kWPerMK) / 2.0;
        if (leads > rating) {
            a.report(InputProblem.Kind.INCONSISTENT, d.get(), "the two leads alone conduct with "
                    + Quantities.format(leads, Dimension.THERMAL_RESISTANCE) + " to the rating's reference point, more"
                    + " than the " + Quantities.format(rating, Dimension.THERMAL_RESISTANCE)
                    + " the derating curve implies: lead diameter or conductivity disagree with the rating");
            return Optional.empty();
        }
        return Optional.of(new PackageSpec.Axial(d.get().si(), kWPerMK, rating - leads, true));
    }

    private static Optional<PackageSpec> surfaceMount(Fields s, Optional<PowerRatingCurve> curve) {
        Optional<List<Value[]>> table = s.listOf("rtheta-ja", Need.REQUIRED, (node, path) -> {
            Optional<Fields> pf = Fields.of(s.ctx(), node, path, Set.of("copper-area", "rtheta"));
            if (pf.isEmpty()) {
                return Optional.empty();
            }
            Optional<Value> area = pf.get().quantity("copper-area", Need.REQUIRED, Sign.POSITIVE, Dimension.AREA);
            Optional<Value> r = pf.get().quantity("rtheta", Need.REQUIRED, Sign.POSITIVE,
                    Dimension.THERMAL_RESISTANCE);
            return Fields.present(area, r) ? Optional.of(new Value[] {area.get(), r.get()}) : Optional.empty();
        });
        Optional<Value> jc = s.quantity("rtheta-jc", Need.OPTIONAL, Sign.NON_NEGATIVE, Dimension.THERMAL_RESISTANCE);
        if (table.isEmpty() || (s.has("rtheta-jc") && jc.isEmpty())) {
            return Optional.empty();
        }
        if (table.get().isEmpty()) {
            s.report(InputProblem.Kind.INCONSISTENT, "rtheta-ja", "needs at least one (copper-area, rtheta) point");
            return Optional.empty();
        }
        List<SurfaceMountPad.AreaPoint> points = new ArrayList<>();
        boolean ok = true;
        Value[] prev = null;
        for (Value[] v : table.get()) {
            if (prev != null && !(v[0].si() > prev[0].si())) {
                s.report(InputProblem.Kind.INCONSISTENT, v[0], "copper areas must increase from point to point: "
                        + prev[0].text() + " then " + v[0].text());
                ok = false;
            }
            prev = v;
            points.add(new SurfaceMountPad.AreaPoint(v[0].si(), v[1].si()));
        }
        if (jc.isEmpty() && curve.isPresent() && curve.get().reference() == RatingReference.CASE) {
            s.get("rtheta-jc", Need.REQUIRED);
            ok = false;
        }
        return ok ? Optional.of(new PackageSpec.SurfaceMount(points, jc.map(Value::si).orElse(Double.NaN)))
                : Optional.empty();
    }
}
