package org.tjmargin.design;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.tjmargin.solve.Board;
import org.tjmargin.variation.statistical.StatisticsPlan;

/**
 * Loads a design file and the parts library it names, validates both and maps them into the domain.
 *
 * <p>Every problem of both files is collected and thrown together as one {@link InputException}; nothing is
 * returned unless both files are entirely valid. YAML or JSON is chosen by each file's extension. Stateless and
 * thread-safe.
 */
public final class DesignLoader {

    private DesignLoader() {
    }

    /**
     * Loads a design.
     *
     * @param designFile the design file ({@code .yaml}, {@code .yml} or {@code .json})
     * @return the validated design with its board, policy name and input files
     * @throws InputException with every problem found, when either file is invalid or cannot be read
     */
    public static LoadedDesign load(Path designFile) {
        Problems problems = new Problems();
        Optional<SourceFile> src = SourceFile.read(designFile, problems, Optional.empty());
        problems.throwIfAny();
        SourceFile design = src.orElseThrow();
        FileContext ctx = problems.contextFor(design.name());
        Optional<Fields> top = TreeReader.read(design, ctx)
                .flatMap(root -> Fields.of(ctx, root, "", DesignReader.KEYS));
        if (top.isEmpty()) {
            // Unparsable, or not an object at its top: nothing more can be read.
            problems.throwIfAny();
        }
        Fields f = top.orElseThrow();
        List<InputFile> inputs = new ArrayList<>();
        inputs.add(design.toInputFile());

        Optional<PartsReader.Result> library = Optional.empty();
        Optional<String> partsName = f.text("parts", Need.REQUIRED);
        if (partsName.isPresent()) {
            Node at = f.get("parts", Need.REQUIRED).orElseThrow();
            Optional<SourceFile> parts = SourceFile.read(relativeTo(designFile, partsName.get()), problems,
                    Optional.of(new SourceFile.Referrer(ctx, at, "parts")));
            if (parts.isPresent()) {
                inputs.add(parts.get().toInputFile());
                library = readLibrary(parts.get(), problems);
            }
        }
        Optional<String> policy = f.text("policy", Need.OPTIONAL);
        Optional<DesignReader.Mapped> mapped = DesignReader.read(f, new PartReferences(library));
        problems.throwIfAny();
        DesignReader.Mapped m = mapped.orElseThrow(() -> new IllegalStateException("the design did not map, yet no"
                + " problem was reported"));
        inputs.addAll(problems.furtherInputs());
        Board b = m.board();
        Optional<StatisticsPlan> plan = m.statistics().map(h -> new StatisticsPlan(h.settings(), h.yieldPoints(),
                h.surgeSamples(), m.distributions(), h.positions().map(l -> l.stream()
                        .map(StatisticsReader.Selected::id).collect(java.util.stream.Collectors.toSet()))));
        return new LoadedDesign(b, policy, inputs, b.name(), plan, m.distributions());
    }

    /**
     * Loads a parts library on its own.
     *
     * @param partsFile the library file
     * @return its diodes and resistors
     * @throws InputException with every problem found
     */
    public static PartsLibrary loadParts(Path partsFile) {
        Problems problems = new Problems();
        Optional<SourceFile> src = SourceFile.read(partsFile, problems, Optional.empty());
        problems.throwIfAny();
        Optional<PartsReader.Result> r = readLibrary(src.orElseThrow(), problems);
        problems.throwIfAny();
        return r.orElseThrow().library();
    }

    private static Optional<PartsReader.Result> readLibrary(SourceFile file, Problems problems) {
        FileContext ctx = problems.contextFor(file.name());
        return TreeReader.read(file, ctx).map(root -> PartsReader.read(ctx, root));
    }

    /** {@code name} relative to the directory of {@code file}, as the user would name it (relative stays so). */
    private static Path relativeTo(Path file, String name) {
        Path parent = file.getParent();
        return parent == null ? Path.of(name) : parent.resolve(name);
    }
}
