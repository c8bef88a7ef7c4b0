package org.tjmargin.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.tjmargin.device.PowerRatingCurve;
import org.tjmargin.device.RatingReference;
import org.tjmargin.thermal.AxialLeadMount;
import org.tjmargin.thermal.GivenPath;
import org.tjmargin.thermal.SteadyThermalPath;
import org.tjmargin.thermal.SurfaceMountPad;
import org.tjmargin.units.Dimension;
import org.tjmargin.units.Quantities;

/**
 * Composes a position's steady thermal path from the part's package and the position's {@code mounting}.
 *
 * <ul>
 *   <li>{@code rtheta-ja} in the mounting overrides any package: a {@link GivenPath}.</li>
 *   <li>Axial: {@code lead-length} and {@code tie-point} give an {@link AxialLeadMount} whose reference point is the
 *   lead at the rating's distance. A curve read elsewhere than at the lead maps to a {@link GivenPath} with the
 *   mount's {@code Rθja}: junction reference 0, ambient {@code Rθja}, case the internal (body) resistance.</li>
 *   <li>Surface-mount: {@code copper-area} gives a {@link SurfaceMountPad}; its junction-to-reference resistance is
 *   {@code rtheta-jc} for a case (or lead/terminal) reference, the local air for an ambient one, 0 for a junction
 *   one; a lead reference without {@code rtheta-jc} takes the curve's implied resistance.</li>
 *   <li>Given: the package's {@code rtheta-ja}, no mounting needed.</li>
 * </ul>
 * A {@link GivenPath}'s junction-to-reference resistance is 0 for a junction reference, {@code Rθja} for an ambient
 * one, and {@code min(curve's implied resistance, Rθja)} for a lead or case one.
 */
final class MountingReader {

    private static final Set<String> KEYS = Set.of("lead-length", "tie-point", "copper-area", "rtheta-ja");

    private MountingReader() {
    }

    /**
     * Reads the mounting of a position.
     *
     * @param position the position's object
     * @param part     the part placed there, when known; without it the values are only checked one by one
     */
    static Optional<SteadyThermalPath> read(Fields position, Optional<LibraryPart> part) {
        Optional<Fields> of = position.object("mounting", Need.OPTIONAL, KEYS);
        if (position.has("mounting") && of.isEmpty()) {
            return Optional.empty();
        }
        Optional<Value> leadLength = of.flatMap(m -> m.quantity("lead-length", Need.OPTIONAL, Sign.NON_NEGATIVE,
                Dimension.LENGTH));
        Optional<Value> tie = of.flatMap(m -> m.quantity("tie-point", Need.OPTIONAL, Sign.NON_NEGATIVE,
                Dimension.THERMAL_RESISTANCE));
        Optional<Value> area = of.flatMap(m -> m.quantity("copper-area", Need.OPTIONAL, Sign.POSITIVE,
                Dimension.AREA));
        Optional<Value> ja = of.flatMap(m -> m.quantity("rtheta-ja", Need.OPTIONAL, Sign.POSITIVE,
                Dimension.THERMAL_RESISTANCE));
        if (part.isEmpty()) {
            return Optional.empty();
        }
        PowerRatingCurve curve = part.get().part().ratings().powerCurve();
        PackageSpec pkg = part.get().pkg();
        if (of.isEmpty()) {
            if (pkg instanceof PackageSpec.Given g) {
                return position.build(() -> given(g.rThetaJaKPerW(), curve));
            }
            position.get("mounting", Need.REQUIRED);
            return Optional.empty();
        }
        Fields m = of.get();
        if (m.has("rtheta-ja")) {
            if (!onlyKeys(m, "an rtheta-ja override", "rtheta-ja")) {
                return Optional.empty();
            }
            return ja.flatMap(v -> m.build(() -> given(v.si(), curve)));
        }
        if (pkg instanceof PackageSpec.Axial a) {
            if (!onlyKeys(m, "an axial part", "lead-length", "tie-point")) {
                return Optional.empty();
            }
            m.get("lead-length", Need.REQUIRED);
            m.get("tie-point", Need.REQUIRED);
            if (!Fields.present(leadLength, tie)) {
                return Optional.empty();
            }
            return m.build(() -> axial(a, leadLength.get().si(), tie.get().si(), curve));
        }
        if (pkg instanceof PackageSpec.SurfaceMount s) {
            if (!onlyKeys(m, "a surface-mount part", "copper-area")) {
                return Optional.empty();
            }
            m.get("copper-area", Need.REQUIRED);
            return area.flatMap(v -> m.build(() -> new SurfaceMountPad(s.table(), v.si(), padReference(s, curve))));
        }
        if (!onlyKeys(m, "a part of given Rθja", "rtheta-ja")) {
            return Optional.empty();
        }
        return m.build(() -> given(((PackageSpec.Given) pkg).rThetaJaKPerW(), curve));
    }

    /** Reports every key of {@code m} outside {@code keys} as not applying; true when there is none. */
    private static boolean onlyKeys(Fields m, String what, String... keys) {
        boolean ok = true;
        Set<String> allowed = Set.of(keys);
        for (String k : KEYS) {
            if (m.has(k) && !allowed.contains(k)) {
                Node.Entry e = m.entry(k).orElseThrow();
                m.ctx().report(InputProblem.Kind.INCONSISTENT, e.line(), e.column(), m.pathOf(k),
                        "'" + k + "' does not apply to " + what + "; give " + String.join(" and ", keys));
                ok = false;
            }
        }
        return ok;
    }

    private static SteadyThermalPath axial(PackageSpec.Axial a, double leadLengthM, double tieKPerW,
                                           PowerRatingCurve curve) {
        List<String> notes = new ArrayList<>();
        if (a.internalFromRating()) {
            notes.add("junction-to-lead internal resistance "
                    + Quantities.format(a.internalKPerW(), Dimension.THERMAL_RESISTANCE)
                    + " calibrated from the lead-referenced derating curve");
        }
        if (curve.reference() == RatingReference.LEAD) {
            return a.mount(leadLengthM, curve.referenceLengthM(), tieKPerW, notes);
        }
        AxialLeadMount mount = a.mount(leadLengthM, 0.0, tieKPerW, notes);
        double jaKPerW = mount.rThetaJaKPerW();
        double jr = switch (curve.reference()) {
            case JUNCTION -> 0.0;
            case AMBIENT -> jaKPerW;
            default -> {
                notes.add("the case of an axial part is taken at the lead roots: Rθjc = internal resistance");
                yield Math.min(a.internalKPerW(), jaKPerW);
            }
        };
        return new GivenPath(jaKPerW, jr, notes);
    }

    private static double padReference(PackageSpec.SurfaceMount s, PowerRatingCurve curve) {
        return switch (curve.reference()) {
            case JUNCTION -> 0.0;
            case AMBIENT -> Double.NaN;
            case CASE -> s.rThetaJcKPerW();
            case LEAD -> Double.isNaN(s.rThetaJcKPerW()) ? curve.impliedResistanceKPerW() : s.rThetaJcKPerW();
        };
    }

    private static GivenPath given(double jaKPerW, PowerRatingCurve curve) {
        double jr = switch (curve.reference()) {
            case JUNCTION -> 0.0;
            case AMBIENT -> jaKPerW;
            case LEAD, CASE -> Math.min(curve.impliedResistanceKPerW(), jaKPerW);
        };
        return new GivenPath(jaKPerW, jr, List.of());
    }
}
