package org.tjmargin.design;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.tjmargin.solve.AmbientRange;
import org.tjmargin.solve.Board;
import org.tjmargin.solve.PositionSpec;
import org.tjmargin.thermal.Enclosure;
import org.tjmargin.variation.Distribution;
import org.tjmargin.variation.VariationModel;

/**
 * Maps the top level of a design file, once its parts library has been read, into a {@link Board}.
 */
final class DesignReader {

    /** Keys of a design file's top level. */
    static final Set<String> KEYS = Set.of("design", "parts", "policy", "ambient", "enclosure", "positions",
            "statistics");

    private DesignReader() {
    }

    /**
     * The design mapped: its board, the statistics block if any, and each position's distributions.
     *
     * @param board         the board
     * @param statistics    the {@code statistics} block's budget and default, when the design has one
     * @param distributions each position's distributions (the design's default where a position names none)
     */
    record Mapped(Board board, Optional<StatisticsReader.Header> statistics,
                  Map<String, VariationModel> distributions) {
    }

    /**
     * Maps the design.
     *
     * @param top  the design file's top-level object
     * @param refs the parts library's references
     * @return the mapped design, or empty when any problem was reported
     */
    static Optional<Mapped> read(Fields top, PartReferences refs) {
        Optional<String> name = top.text("design", Need.REQUIRED);
        Optional<AmbientRange> ambient = AmbientReader.ambient(top);
        Optional<Enclosure> enclosure = AmbientReader.enclosure(top);
        Optional<StatisticsReader.Header> stats = StatisticsReader.header(top);
        boolean statsOk = !top.has("statistics") || stats.isPresent();
        Distribution byDefault = stats.map(StatisticsReader.Header::defaultDistribution)
                .orElse(Distribution.UNIFORM);
        Map<String, VariationModel> models = new LinkedHashMap<>();
        Optional<List<PositionSpec>> positions = positions(top, refs, byDefault, models);
        if (positions.isPresent() && stats.isPresent() && stats.get().positions().isPresent()) {
            Set<String> ids = new HashSet<>();
            positions.get().forEach(p -> ids.add(p.id()));
            for (StatisticsReader.Selected sel : stats.get().positions().get()) {
                if (!ids.contains(sel.id())) {
                    top.ctx().report(InputProblem.Kind.UNKNOWN_REFERENCE, sel.at(), sel.path(), "'" + sel.id()
                            + "' is not a position of this design");
                    statsOk = false;
                }
            }
        }
        if (!Fields.present(name, ambient, enclosure, positions) || !statsOk) {
            return Optional.empty();
        }
        return top.build(() -> new Board(name.get(), positions.get(), enclosure.get(), ambient.get()))
                .map(b -> new Mapped(b, stats, models));
    }

    private static Optional<List<PositionSpec>> positions(Fields top, PartReferences refs, Distribution byDefault,
                                                          Map<String, VariationModel> models) {
        Optional<Node.Sequence> seq = top.list("positions", Need.REQUIRED);
        if (seq.isEmpty()) {
            return Optional.empty();
        }
        if (seq.get().items().isEmpty()) {
            top.report(InputProblem.Kind.MISSING_FIELD, "positions", "a design needs at least one position");
            return Optional.empty();
        }
        List<PositionSpec> out = new ArrayList<>();
        Set<String> ids = new LinkedHashSet<>();
        boolean ok = true;
        SurgeMapping.Estimates estimates = new SurgeMapping.Estimates();
        List<Node> items = seq.get().items();
        for (int i = 0; i < items.size(); i++) {
            String path = top.pathOf("positions") + "[" + i + "]";
            Node item = items.get(i);
            if (item instanceof Node.Mapping m && m.entry("id").isPresent()
                    && m.entry("id").get().value() instanceof Node.Scalar s && !s.text().isBlank()
                    && !ids.add(s.text().strip())) {
                top.ctx().report(InputProblem.Kind.DUPLICATE_ID, s, path + ".id", "position id '" + s.text().strip()
                        + "' is already used by an earlier position");
                ok = false;
            }
            Optional<PositionSpec> p = PositionReader.read(top.ctx(), item, path, refs, estimates);
            Optional<VariationModel> model = p.flatMap(spec -> StatisticsReader.model(top.ctx(), item, path, spec,
                    byDefault));
            if (p.isPresent() && model.isPresent()) {
                out.add(p.get());
                models.put(p.get().id(), model.get());
            } else {
                ok = false;
            }
        }
        return ok ? Optional.of(out) : Optional.empty();
    }
}
