package org.tjmargin.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.tjmargin.units.Dimension;

/**
 * Typed access to one object of a file, by key, with every problem reported at its place: unknown keys when the
 * view is made, missing keys and bad values when they are read. Each read reports its own problem and returns
 * empty, so that a reader can go on reading the other keys and report them all.
 */
final class Fields {

    private final FileContext ctx;
    private final Node.Mapping mapping;
    private final String path;

    private Fields(FileContext ctx, Node.Mapping mapping, String path) {
        this.ctx = ctx;
        this.mapping = mapping;
        this.path = path;
    }

    /**
     * A view of {@code node} as an object whose keys must be among {@code allowed}.
     *
     * @return the view, or empty (reported) when the node is not an object
     */
    static Optional<Fields> of(FileContext ctx, Node node, String path, Set<String> allowed) {
        if (!(node instanceof Node.Mapping m)) {
            ctx.report(InputProblem.Kind.WRONG_TYPE, node, path, "expected an object with keys "
                    + String.join(", ", sorted(allowed)) + ", got " + node.describe());
            return Optional.empty();
        }
        for (Node.Entry e : m.entries()) {
            if (!allowed.contains(e.key())) {
                ctx.report(InputProblem.Kind.UNKNOWN_KEY, e.line(), e.column(), join(path, e.key()),
                        "unknown key '" + e.key() + "'; expected one of " + String.join(", ", sorted(allowed)));
            }
        }
        return Optional.of(new Fields(ctx, m, path));
    }

    /** A view of an object whose keys were already checked (by an earlier {@link #of}), or empty. */
    static Optional<Fields> checked(FileContext ctx, Node node, String path) {
        return node instanceof Node.Mapping m ? Optional.of(new Fields(ctx, m, path)) : Optional.empty();
    }

    private static List<String> sorted(Set<String> keys) {
        List<String> l = new ArrayList<>(keys);
        l.sort(null);
        return l;
    }

    static String join(String path, String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    FileContext ctx() {
        return ctx;
    }

    Node node() {
        return mapping;
    }

    String path() {
        return path;
    }

    /** The path of one key of this object. */
    String pathOf(String key) {
        return join(path, key);
    }

    boolean has(String key) {
        return mapping.entry(key).isPresent();
    }

    /** The value of a key; when absent and required, a {@code MISSING_FIELD} at this object. */
    Optional<Node> get(String key, Need need) {
        Optional<Node.Entry> e = mapping.entry(key);
        if (e.isEmpty() && need == Need.REQUIRED) {
            ctx.report(InputProblem.Kind.MISSING_FIELD, mapping, pathOf(key), "required key '" + key
                    + "' is missing");
        }
        return e.map(Node.Entry::value);
    }

    /** The entry (key with its location) of a present key. */
    Optional<Node.Entry> entry(String key) {
        return mapping.entry(key);
    }

    /** A quantity of one dimension. */
    Optional<Value> quantity(String key, Need need, Sign sign, Dimension d) {
        return get(key, need).flatMap(n -> Scalars.quantity(ctx, n, pathOf(key), sign, d));
    }

    /** A quantity of one of several dimensions, read as the first the unit measures. */
    Optional<Value> quantityOf(String key, Need need, Sign sign, Dimension... allowed) {
        return get(key, need).flatMap(n -> Scalars.quantity(ctx, n, pathOf(key), sign, allowed));
    }

    /** A tolerance: a fraction from 0 (inclusive) to 1 (exclusive), e.g. {@code 5 %}. */
    Optional<Value> tolerance(String key, Need need) {
        return quantity(key, need, Sign.NON_NEGATIVE, Dimension.FRACTION).filter(t -> {
            if (t.si() < 1) {
                return true;
            }
            report(InputProblem.Kind.NOT_PHYSICAL, t, "a tolerance must be below 100 %, got " + t.text());
            return false;
        });
    }

    /** A name or identifier. */
    Optional<String> text(String key, Need need) {
        return get(key, need).flatMap(n -> Scalars.text(ctx, n, pathOf(key)));
    }

    /** A bare integer. */
    Optional<Integer> integer(String key, Need need) {
        return get(key, need).flatMap(n -> Scalars.integer(ctx, n, pathOf(key)));
    }

    /** A flag. */
    Optional<Boolean> bool(String key, Need need) {
        return get(key, need).flatMap(n -> Scalars.bool(ctx, n, pathOf(key)));
    }

    /** A nested object with its own allowed keys. */
    Optional<Fields> object(String key, Need need, Set<String> allowed) {
        return get(key, need).flatMap(n -> of(ctx, n, pathOf(key), allowed));
    }

    /** A list. */
    Optional<Node.Sequence> list(String key, Need need) {
        Optional<Node> n = get(key, need);
        if (n.isEmpty()) {
            return Optional.empty();
        }
        if (n.get() instanceof Node.Sequence s) {
            return Optional.of(s);
        }
        ctx.report(InputProblem.Kind.WRONG_TYPE, n.get(), pathOf(key), "expected a list, got " + n.get().describe());
        return Optional.empty();
    }

    /**
     * A list whose every item is read by {@code item} (given the item's node and path); empty when the list is
     * absent or any item failed (each failure reported).
     */
    <T> Optional<List<T>> listOf(String key, Need need, ItemReader<T> item) {
        Optional<Node.Sequence> seq = list(key, need);
        if (seq.isEmpty()) {
            return Optional.empty();
        }
        List<T> out = new ArrayList<>();
        boolean ok = true;
        List<Node> items = seq.get().items();
        for (int i = 0; i < items.size(); i++) {
            Optional<T> t = item.read(items.get(i), pathOf(key) + "[" + i + "]");
            if (t.isPresent()) {
                out.add(t.get());
            } else {
                ok = false;
            }
        }
        return ok ? Optional.of(out) : Optional.empty();
    }

    /** Reads one item of a list. */
    @FunctionalInterface
    interface ItemReader<T> {
        Optional<T> read(Node node, String path);
    }

    /**
     * Which one of several alternative keys is present. Two or more: an {@code INCONSISTENT} at the second; none
     * and required: a {@code MISSING_FIELD} naming them all.
     *
     * @return the present key, or empty
     */
    Optional<String> oneOf(Need need, String... keys) {
        String found = null;
        for (Node.Entry e : mapping.entries()) {
            for (String k : keys) {
                if (e.key().equals(k)) {
                    if (found == null) {
                        found = k;
                    } else {
                        ctx.report(InputProblem.Kind.INCONSISTENT, e.line(), e.column(), pathOf(k),
                                "'" + found + "' and '" + k + "' exclude each other; give one of "
                                        + String.join(", ", keys));
                        return Optional.empty();
                    }
                }
            }
        }
        if (found == null && need == Need.REQUIRED) {
            ctx.report(InputProblem.Kind.MISSING_FIELD, mapping, path, "give one of " + String.join(", ", keys));
        }
        return Optional.ofNullable(found);
    }

    /** Reports a problem at a key's value (or at this object when the key is absent). */
    void report(InputProblem.Kind kind, String key, String message) {
        Node at = mapping.entry(key).map(Node.Entry::value).orElse(mapping);
        ctx.report(kind, at, pathOf(key), message);
    }

    /** Reports a problem at this object. */
    void reportHere(InputProblem.Kind kind, String message) {
        ctx.report(kind, mapping, path, message);
    }

    /** Reports a problem at a value already read. */
    void report(InputProblem.Kind kind, Value at, String message) {
        ctx.report(kind, at.node(), at.path(), message);
    }

    /**
     * Builds a domain value, reporting an {@link IllegalArgumentException} of its constructor as a
     * {@code NOT_PHYSICAL} at this object: the last line of defence where a field check did not catch it.
     */
    <T> Optional<T> build(java.util.function.Supplier<T> constructor) {
        try {
            return Optional.of(constructor.get());
        } catch (IllegalArgumentException e) {
            reportHere(InputProblem.Kind.NOT_PHYSICAL, e.getMessage());
            return Optional.empty();
        }
    }

    /** True when every optional is present. */
    static boolean present(Optional<?>... values) {
        for (Optional<?> v : values) {
            if (v.isEmpty()) {
                return false;
            }
        }
        return true;
    }
}
