package org.tjmargin.design;

import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * Reads a parts library file: {@code parts} (breakdown diodes) and {@code resistors}, each a list of entries with
 * unique ids.
 */
final class PartsReader {

    private static final Set<String> KEYS = Set.of("parts", "resistors");

    /**
     * What a library file declared and what of it could be mapped. Ids of entries that failed are still declared,
     * so that the design's references to them are not reported a second time as unknown.
     *
     * @param library        the entries that mapped
     * @param partIds        every diode id written
     * @param resistorIds    every resistor id written
     */
    record Result(PartsLibrary library, Set<String> partIds, Set<String> resistorIds) {
    }

    private PartsReader() {
    }

    static Result read(FileContext ctx, Node root) {
        Map<String, LibraryPart> parts = new LinkedHashMap<>();
        Map<String, ResistorPart> resistors = new LinkedHashMap<>();
        Set<String> partIds = new LinkedHashSet<>();
        Set<String> resistorIds = new LinkedHashSet<>();
        Optional<Fields> of = Fields.of(ctx, root, "", KEYS);
        if (of.isPresent()) {
            Fields f = of.get();
            f.list("parts", Need.REQUIRED).ifPresent(seq -> readEach(ctx, seq.items(), "parts", partIds,
                    (n, p) -> BreakdownPartReader.read(ctx, n, p).ifPresent(lp -> parts.put(lp.part().id(), lp))));
            f.list("resistors", Need.OPTIONAL).ifPresent(seq -> readEach(ctx, seq.items(), "resistors",
                    resistorIds, (n, p) -> ResistorReader.read(ctx, n, p).ifPresent(r -> resistors.put(r.id(), r))));
        }
        return new Result(new PartsLibrary(parts, resistors), partIds, resistorIds);
    }

    private interface EntryReader {
        void read(Node node, String path);
    }

    private static void readEach(FileContext ctx, List<Node> items, String key, Set<String> ids, EntryReader reader) {
        for (int i = 0; i < items.size(); i++) {
            String path = key + "[" + i + "]";
            Node item = items.get(i);
            if (item instanceof Node.Mapping m) {
                Optional<Node.Entry> id = m.entry("id");
                if (id.isPresent() && id.get().value() instanceof Node.Scalar s && !s.text().isBlank()
                        && !ids.add(s.text().strip())) {
                    ctx.report(InputProblem.Kind.DUPLICATE_ID, s, path + ".id", "id '" + s.text().strip()
                            + "' is already used by an earlier entry of " + key);
                    continue;
                }
            }
            reader.read(item, path);
        }
    }
}
