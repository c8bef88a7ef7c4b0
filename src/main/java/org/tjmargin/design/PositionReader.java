package org.tjmargin.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.tjmargin.circuit.CircuitSpec;
import org.tjmargin.device.BreakdownPart;
import org.tjmargin.device.TemperatureCoefficient;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.surge.PositionSurges;
import org.tjmargin.surge.SurgeCase;
import org.tjmargin.surge.SurgeRating;
import org.tjmargin.thermal.SteadyThermalPath;
import org.tjmargin.units.Decimals;
import org.tjmargin.variation.Range;

/**
 * Reads one entry of the design's {@code positions} into a {@link PositionSpec}: the part placed, its mounting, its
 * circuit and the position's tolerances.
 *
 * <p>Tolerances: {@code vz} (a fraction; default the part's) gives the shift {@code ±tol·Vz_nom} around 0;
 * {@code thermal-resistance} (a fraction, default 0) the factor {@code 1 ± tol} on every thermal resistance;
 * {@code temperature-coefficient} (a range in V/K or %/K, default the part's range) the coefficient's range.
 */
final class PositionReader {

    private static final Set<String> KEYS = Set.of("id", "part", "mounting", "circuit", "tolerances", "surges",
            "distributions");
    private static final Set<String> TOLERANCE_KEYS = Set.of("thermal-resistance", "vz", "temperature-coefficient");

    private PositionReader() {
    }

    static Optional<PositionSpec> read(FileContext ctx, Node node, String path, PartReferences refs,
                                       SurgeMapping.Estimates estimates) {
        Optional<Fields> of = Fields.of(ctx, node, path, KEYS);
        if (of.isEmpty()) {
            return Optional.empty();
        }
        Fields f = of.get();
        Optional<String> id = f.text("id", Need.REQUIRED);
        Optional<LibraryPart> part = refs.part(f, "part");
        Optional<SteadyThermalPath> thermal = MountingReader.read(f, part);
        Optional<CircuitSpec> circuit = CircuitReader.read(f, refs);
        Optional<Fields> tol = f.object("tolerances", Need.OPTIONAL, TOLERANCE_KEYS);
        if (f.has("tolerances") && tol.isEmpty()) {
            return Optional.empty();
        }
        Optional<Value> rTheta = tol.flatMap(t -> t.tolerance("thermal-resistance", Need.OPTIONAL));
        Optional<Value> vzTol = tol.flatMap(t -> t.tolerance("vz", Need.OPTIONAL));
        Optional<Range> alpha = part.flatMap(p -> alphaRange(tol, p.part()));
        boolean tolOk = tol.isEmpty() || ((!tol.get().has("thermal-resistance") || rTheta.isPresent())
                && (!tol.get().has("vz") || vzTol.isPresent()));
        if (tol.isPresent() && part.isEmpty() && tol.get().has("temperature-coefficient")) {
            // Checked one by one without the part's nominal voltage, which converts %/K.
            RangeReader.read(tol.get(), "temperature-coefficient", Need.REQUIRED,
                    (c, n, p) -> BreakdownReader.coefficient(c, n, p, 1.0), Sign.ANY);
        }
        Optional<List<SurgeCase>> surges = f.has("surges") ? SurgeCaseReader.read(f) : Optional.empty();
        if (!Fields.present(id, part, thermal, circuit, alpha) || !tolOk || (f.has("surges") && surges.isEmpty())) {
            return Optional.empty();
        }
        Optional<PositionSurges> withRating = Optional.empty();
        if (surges.isPresent()) {
            if (part.get().surge().isEmpty()) {
                f.report(InputProblem.Kind.INCONSISTENT, "surges", "part '" + part.get().part().id()
                        + "' has no surge data: give the part a 'surge' object to check surges");
                return Optional.empty();
            }
            Optional<SurgeRating> rating = SurgeMapping.rating(f, part.get().surge().get(), thermal.get(),
                    estimates);
            if (rating.isEmpty()) {
                return Optional.empty();
            }
            withRating = f.build(() -> new PositionSurges(rating.get(), surges.get()));
            if (withRating.isEmpty()) {
                return Optional.empty();
            }
        }
        Optional<PositionSurges> positionSurges = withRating;
        BreakdownPart bp = part.get().part();
        double vzTolerance = vzTol.map(Value::si).orElse(bp.vzTolerance());
        // In decimal: 5 % of 12 V is 0.6 V, not 0.6000000000000001 V (Decimals).
        double shift = Decimals.product(vzTolerance, bp.vzNomV());
        Range rThetaFactor = Range.relative(1.0, rTheta.map(Value::si).orElse(0.0));
        List<String> notes = new ArrayList<>();
        return f.build(() -> new PositionSpec(id.get(), bp, thermal.get(), circuit.get(), new Range(-shift, 0, shift),
                rThetaFactor, alpha.get(), notes, positionSurges));
    }

    /** The coefficient's range at this position: the tolerances' override, else the part's own. */
    private static Optional<Range> alphaRange(Optional<Fields> tol, BreakdownPart part) {
        if (tol.isPresent() && tol.get().has("temperature-coefficient")) {
            double vzNom = part.vzNomV();
            return RangeReader.read(tol.get(), "temperature-coefficient", Need.REQUIRED,
                    (c, n, p) -> BreakdownReader.coefficient(c, n, p, vzNom), Sign.ANY);
        }
        TemperatureCoefficient tc = part.model().tc();
        return Optional.of(new Range(tc.minAlphaVPerK(), tc.alphaVPerK(), tc.maxAlphaVPerK()));
    }
}
