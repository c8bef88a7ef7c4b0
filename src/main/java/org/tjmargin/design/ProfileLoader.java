package org.tjmargin.design;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import org.tjmargin.derating.Bound;
import org.tjmargin.derating.Limit;
import org.tjmargin.derating.Measure;
import org.tjmargin.derating.Policy;
import org.tjmargin.derating.Rule;
import org.tjmargin.units.Dimension;

/**
 * Reads derating profiles (our own format, {@code derating-profiles/README.md}): named rules with a quantity, a
 * ceiling or floor, a limit and its provenance; a profile may extend another, by the name of a shipped profile or
 * of a file beside it, and override rules by id. Profiles are validated like designs: every problem located,
 * all problems of a file reported together.
 */
public final class ProfileLoader {

    /** The profiles shipped in {@code derating-profiles/} (and inside the jar), in the order they are listed. */
    public static final List<String> SHIPPED = List.of("general-commercial", "industrial", "high-reliability",
            "reliability-level-1", "reliability-level-2", "reliability-level-3");

    private static final String RESOURCE_DIR = "/org/tjmargin/profiles/";
    private static final Set<String> TOP_KEYS = Set.of("profile", "extends", "title", "provenance", "rules");
    private static final Set<String> RULE_KEYS = Set.of("id", "title", "quantity", "max", "min", "provenance");
    private static final Set<String> CURVE_KEYS = Set.of("basis", "points");
    private static final Set<String> POINT_KEYS = Set.of("temperature", "value");
    private static final int MAX_DEPTH = 16;

    private ProfileLoader() {
    }

    /**
     * Resolves a policy given on the command line or in a design: a file path (it has an extension or a folder)
     * or the name of a shipped profile.
     *
     * @param nameOrFile the text as given
     * @param base       folder that a relative file path is relative to
     */
    public static LoadedPolicy resolve(String nameOrFile, Path base) {
        if (looksLikeFile(nameOrFile)) {
            Path p = Path.of(nameOrFile);
            return load(base == null || p.isAbsolute() ? p : base.resolve(p));
        }
        return shipped(nameOrFile);
    }

    /** Loads a shipped profile by name. */
    public static LoadedPolicy shipped(String name) {
        Problems problems = new Problems();
        List<InputFile> inputs = new ArrayList<>();
        Optional<Policy> p = readShipped(name, problems, inputs, new LinkedHashSet<>(), null, null, null);
        problems.throwIfAny();
        return new LoadedPolicy(p.orElseThrow(), inputs);
    }

    /** Loads a profile file. */
    public static LoadedPolicy load(Path file) {
        Problems problems = new Problems();
        List<InputFile> inputs = new ArrayList<>();
        Optional<SourceFile> src = SourceFile.read(file, problems, Optional.empty());
        problems.throwIfAny();
        Optional<Policy> p = read(src.orElseThrow(), problems, inputs, new LinkedHashSet<>());
        problems.throwIfAny();
        return new LoadedPolicy(p.orElseThrow(), inputs);
    }

    private static boolean looksLikeFile(String s) {
        String l = s.toLowerCase(Locale.ROOT);
        return l.endsWith(".yaml") || l.endsWith(".yml") || l.endsWith(".json") || s.contains("/")
                || s.contains("\\");
    }

    private static Optional<Policy> readShipped(String name, Problems problems, List<InputFile> inputs,
                                                Set<String> chain, FileContext referrer, Node at, String field) {
        if (!SHIPPED.contains(name)) {
            String msg = "no shipped profile '" + name + "'; shipped: " + String.join(", ", SHIPPED)
                    + " (or give a profile file)";
            if (referrer != null) {
                referrer.report(InputProblem.Kind.UNKNOWN_REFERENCE, at, field, msg);
            } else {
                problems.add(new InputProblem(InputProblem.Kind.UNKNOWN_REFERENCE, name, 0, 0, "", msg));
            }
            return Optional.empty();
        }
        String resource = RESOURCE_DIR + name + ".yaml";
        byte[] bytes;
        try (InputStream in = ProfileLoader.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("shipped profile " + resource + " is missing from the build");
            }
            bytes = in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        Path shown = Path.of("derating-profiles", name + ".yaml");
        return read(new SourceFile(shown, shown.toString(), bytes, SourceFile.sha256Of(bytes)), problems, inputs,
                chain);
    }

    private static Optional<Policy> read(SourceFile src, Problems problems, List<InputFile> inputs,
                                         Set<String> chain) {
        inputs.add(src.toInputFile());
        FileContext ctx = problems.contextFor(src.name());
        Optional<Fields> top = TreeReader.read(src, ctx).flatMap(root -> Fields.of(ctx, root, "", TOP_KEYS));
        if (top.isEmpty()) {
            return Optional.empty();
        }
        Fields f = top.get();
        Optional<String> name = f.text("profile", Need.REQUIRED);
        Optional<String> title = f.text("title", Need.OPTIONAL);
        Optional<String> provenance = f.text("provenance", Need.REQUIRED);
        Optional<String> parent = f.text("extends", Need.OPTIONAL);
        Optional<List<Rule>> rules = f.listOf("rules", Need.REQUIRED, (node, path) -> rule(ctx, node, path));
        Optional<Policy> base = Optional.empty();
        if (parent.isPresent()) {
            Node at = f.get("extends", Need.OPTIONAL).orElseThrow();
            if (!chain.add(src.name()) || chain.size() > MAX_DEPTH) {
                ctx.report(InputProblem.Kind.INCONSISTENT, at, "extends", "profiles extend each other in a cycle: "
                        + String.join(" → ", chain));
                return Optional.empty();
            }
            Path sibling = src.path().resolveSibling(parent.get() + ".yaml");
            if (!SHIPPED.contains(parent.get()) && !looksLikeFile(parent.get()) && Files.isRegularFile(sibling)) {
                Optional<SourceFile> s = SourceFile.read(sibling, problems,
                        Optional.of(new SourceFile.Referrer(ctx, at, "extends")));
                base = s.flatMap(sf -> read(sf, problems, inputs, chain));
            } else if (looksLikeFile(parent.get())) {
                Optional<SourceFile> s = SourceFile.read(src.path().resolveSibling(parent.get()), problems,
                        Optional.of(new SourceFile.Referrer(ctx, at, "extends")));
                base = s.flatMap(sf -> read(sf, problems, inputs, chain));
            } else {
                base = readShipped(parent.get(), problems, inputs, chain, ctx, at, "extends");
            }
            if (base.isEmpty()) {
                return Optional.empty();
            }
        }
        if (name.isEmpty() || provenance.isEmpty() || rules.isEmpty()) {
            return Optional.empty();
        }
        Set<String> ids = new LinkedHashSet<>();
        for (int i = 0; i < rules.get().size(); i++) {
            if (!ids.add(rules.get().get(i).id())) {
                Node item = f.list("rules", Need.REQUIRED).orElseThrow().items().get(i);
                ctx.report(InputProblem.Kind.DUPLICATE_ID, item, "rules[" + i + "].id",
                        "rule id '" + rules.get().get(i).id() + "' appears twice in this profile");
            }
        }
        String label = title.orElse(name.get());
        if (base.isPresent()) {
            Policy b = base.get();
            return f.build(() -> Policy.extending(b, name.get(), provenance.get(), rules.get()))
                    .map(p -> new Policy(p.name(), label.equals(name.get()) ? provenance.get()
                            : label + " — " + provenance.get(), p.rules()));
        }
        return f.build(() -> new Policy(name.get(), label.equals(name.get()) ? provenance.get()
                : label + " — " + provenance.get(), rules.get()));
    }

    private static Optional<Rule> rule(FileContext ctx, Node node, String path) {
        Optional<Fields> of = Fields.of(ctx, node, path, RULE_KEYS);
        if (of.isEmpty()) {
            return Optional.empty();
        }
        Fields f = of.get();
        Optional<String> id = f.text("id", Need.REQUIRED);
        Optional<String> title = f.text("title", Need.OPTIONAL);
        Optional<String> provenance = f.text("provenance", Need.REQUIRED);
        Optional<String> quantity = f.text("quantity", Need.REQUIRED);
        Optional<Measure> measure = quantity.flatMap(q -> {
            Optional<Measure> m = Measure.fromKey(q);
            if (m.isEmpty()) {
                List<String> keys = new ArrayList<>();
                for (Measure x : Measure.values()) {
                    keys.add(x.key());
                }
                ctx.report(InputProblem.Kind.UNKNOWN_REFERENCE, f.get("quantity", Need.REQUIRED).orElseThrow(),
                        f.pathOf("quantity"), "unknown quantity '" + q + "'; expected one of " + String.join(", ", keys));
            }
            return m;
        });
        boolean hasMax = f.has("max");
        boolean hasMin = f.has("min");
        if (hasMax == hasMin) {
            ctx.report(hasMax ? InputProblem.Kind.INCONSISTENT : InputProblem.Kind.MISSING_FIELD, node, path,
                    "a rule needs exactly one of 'max' (a ceiling) or 'min' (a floor)");
            return Optional.empty();
        }
        String key = hasMax ? "max" : "min";
        if (measure.isEmpty() || id.isEmpty() || provenance.isEmpty()) {
            return Optional.empty();
        }
        Optional<Limit> limit = limit(ctx, f.get(key, Need.REQUIRED).orElseThrow(), f.pathOf(key), measure.get());
        if (limit.isEmpty()) {
            return Optional.empty();
        }
        return f.build(() -> new Rule(id.get(), title.orElse(id.get()), measure.get(), hasMax ? Bound.MAX : Bound.MIN,
                limit.get(), provenance.get()));
    }

    private static Dimension dimensionOf(Measure m) {
        return m.isTemperature() ? Dimension.TEMPERATURE : Dimension.FRACTION;
    }

    private static Optional<Limit> limit(FileContext ctx, Node node, String path, Measure m) {
        if (node instanceof Node.Scalar) {
            return Scalars.quantity(ctx, node, path, m.isTemperature() ? Sign.ANY : Sign.POSITIVE, dimensionOf(m))
                    .map(v -> new Limit.Fixed(v.si()));
        }
        Optional<Fields> of = Fields.of(ctx, node, path, Set.of("below-tj-max", "lower-of", "curve"));
        if (of.isEmpty()) {
            return Optional.empty();
        }
        Fields f = of.get();
        int forms = (f.has("below-tj-max") ? 1 : 0) + (f.has("lower-of") ? 1 : 0) + (f.has("curve") ? 1 : 0);
        if (forms != 1) {
            ctx.report(forms == 0 ? InputProblem.Kind.MISSING_FIELD : InputProblem.Kind.INCONSISTENT, node, path,
                    "a limit object needs exactly one of below-tj-max, lower-of, curve");
            return Optional.empty();
        }
        if (f.has("below-tj-max")) {
            if (!m.isTemperature()) {
                ctx.report(InputProblem.Kind.INCONSISTENT, node, path, "below-tj-max applies only to "
                        + Measure.JUNCTION_TEMPERATURE.key());
                return Optional.empty();
            }
            return f.quantity("below-tj-max", Need.REQUIRED, Sign.NON_NEGATIVE, Dimension.TEMPERATURE_DIFFERENCE)
                    .map(v -> new Limit.BelowTjMax(v.si()));
        }
        if (f.has("lower-of")) {
            Optional<List<Limit>> parts = f.listOf("lower-of", Need.REQUIRED, (n, p) -> limit(ctx, n, p, m));
            if (parts.isEmpty()) {
                return Optional.empty();
            }
            if (parts.get().size() < 2) {
                ctx.report(InputProblem.Kind.INCONSISTENT, f.get("lower-of", Need.REQUIRED).orElseThrow(),
                        f.pathOf("lower-of"), "lower-of needs at least two limits");
                return Optional.empty();
            }
            Limit l = parts.get().get(0);
            for (int i = 1; i < parts.get().size(); i++) {
                l = new Limit.LowerOf(l, parts.get().get(i));
            }
            return Optional.of(l);
        }
        Optional<Fields> curve = f.object("curve", Need.REQUIRED, CURVE_KEYS);
        if (curve.isEmpty()) {
            return Optional.empty();
        }
        Fields c = curve.get();
        Optional<Limit.Basis> basis = c.text("basis", Need.REQUIRED).flatMap(b -> {
            for (Limit.Basis x : Limit.Basis.values()) {
                if (x.name().toLowerCase(Locale.ROOT).replace('_', '-').equals(b)) {
                    return Optional.of(x);
                }
            }
            ctx.report(InputProblem.Kind.UNKNOWN_REFERENCE, c.get("basis", Need.REQUIRED).orElseThrow(),
                    c.pathOf("basis"), "unknown basis '" + b + "'; expected junction, reference or local-air");
            return Optional.empty();
        });
        Optional<List<double[]>> points = c.listOf("points", Need.REQUIRED, (n, p) -> {
            Optional<Fields> pf = Fields.of(ctx, n, p, POINT_KEYS);
            if (pf.isEmpty()) {
                return Optional.empty();
            }
            Optional<Value> t = pf.get().quantity("temperature", Need.REQUIRED, Sign.ANY, Dimension.TEMPERATURE);
            Optional<Value> v = pf.get().quantity("value", Need.REQUIRED, m.isTemperature() ? Sign.ANY : Sign.POSITIVE,
                    dimensionOf(m));
            return t.isPresent() && v.isPresent() ? Optional.of(new double[] {t.get().si(), v.get().si()})
                    : Optional.empty();
        });
        if (basis.isEmpty() || points.isEmpty()) {
            return Optional.empty();
        }
        double[] ts = points.get().stream().mapToDouble(p -> p[0]).toArray();
        double[] vs = points.get().stream().mapToDouble(p -> p[1]).toArray();
        return c.build(() -> new Limit.TemperatureCurve(basis.get(), ts, vs));
    }
}
