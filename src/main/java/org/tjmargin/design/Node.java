package org.tjmargin.design;

import java.util.List;
import java.util.Optional;

/**
 * A value of an input file with the line and column where it starts (both from 1): the located tree that the
 * readers map from. Jackson's own tree model drops locations, so the streaming parser builds this one
 * ({@link TreeReader}).
 */
sealed interface Node permits Node.Mapping, Node.Sequence, Node.Scalar {

    /** Line of the value's first character, from 1. */
    int line();

    /** Column of the value's first character, from 1. */
    int column();

    /** What the value is, for messages: "an object", "a list", "the text '12 V'". */
    String describe();

    /**
     * One key of an object with its value.
     *
     * @param key    the key as written
     * @param line   line of the key
     * @param column column of the key
     * @param value  the value
     */
    record Entry(String key, int line, int column, Node value) {
    }

    /**
     * An object (YAML mapping, JSON object): its entries in file order, keys unique.
     *
     * @param entries the entries
     * @param line    where the object starts
     * @param column  where the object starts
     */
    record Mapping(List<Entry> entries, int line, int column) implements Node {
        public Mapping {
            entries = List.copyOf(entries);
        }

        /** The entry with this key, if present. */
        Optional<Entry> entry(String key) {
            return entries.stream().filter(e -> e.key().equals(key)).findFirst();
        }

        @Override
        public String describe() {
            return "an object";
        }
    }

    /**
     * A list (YAML sequence, JSON array).
     *
     * @param items  the items in file order
     * @param line   where the list starts
     * @param column where the list starts
     */
    record Sequence(List<Node> items, int line, int column) implements Node {
        public Sequence {
            items = List.copyOf(items);
        }

        @Override
        public String describe() {
            return "a list";
        }
    }

    /**
     * A scalar, kept as the text that was written: quantities carry their unit in it ({@code "12 V"}), and YAML's
     * numbers and strings both arrive as text.
     *
     * @param text   the text as written ({@code ""} for an empty value)
     * @param type   how the parser typed it
     * @param line   where it starts
     * @param column where it starts
     */
    record Scalar(String text, Type type, int line, int column) implements Node {

        /** The parser's type of a scalar. */
        enum Type { TEXT, NUMBER, BOOLEAN, EMPTY }

        @Override
        public String describe() {
            return type == Type.EMPTY ? "an empty value" : "the " + (type == Type.TEXT ? "text" : "value")
                    + " '" + text + "'";
        }
    }
}
