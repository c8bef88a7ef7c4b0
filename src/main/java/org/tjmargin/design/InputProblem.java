package org.tjmargin.design;

import java.util.Objects;

/**
 * One problem in an input file, located by file, line, column and field path.
 *
 * <p>The field path names the value from the file's root, keys joined by dots and list items by their index from
 * 0, e.g. {@code parts[2].breakdown.knee-current}; it is empty when the problem concerns the file as a whole.
 * Line and column count from 1; both are 0 when the problem has no place in the file (a file that cannot be
 * read).
 *
 * @param kind    what kind of problem it is; programs and tests rely on it, not on the message
 * @param file    the file as the user named it (relative paths stay relative)
 * @param line    line of the offending text, from 1; 0 when unknown
 * @param column  column of the offending text, from 1; 0 when unknown
 * @param field   path of the offending field, e.g. {@code positions[0].circuit.shunt-regulator.supply}
 * @param message what is wrong, in English, with the offending values and the expected unit where it applies
 */
public record InputProblem(Kind kind, String file, int line, int column, String field, String message) {

    /** The kinds of problem; each check of the readers reports exactly one of them. */
    public enum Kind {
        /** The text is not well-formed YAML or JSON, or a feature that is not read was used (aliases). */
        SYNTAX,
        /** A key that is not part of the format at that place. */
        UNKNOWN_KEY,
        /** A key written twice in one object. */
        DUPLICATE_KEY,
        /** A required key is absent. */
        MISSING_FIELD,
        /** A value has the wrong shape: a list where an object belongs, text where a count belongs, etc. */
        WRONG_TYPE,
        /** A quantity that cannot be read: no number, no unit, an unknown unit. */
        BAD_QUANTITY,
        /** A quantity whose unit measures something else than the field needs. */
        WRONG_DIMENSION,
        /** A single value outside what physics allows: negative resistance, zero current, a non-finite number,
         * Tj max below 25 °C. */
        NOT_PHYSICAL,
        /** Values that contradict each other: Izk ≥ Izt, min above max, Zzk below Zzt, the leakage voltage above
         * the knee, two alternatives given where one is allowed. */
        INCONSISTENT,
        /** A reference to a part or resistor that the library does not hold. */
        UNKNOWN_REFERENCE,
        /** An identifier used twice. */
        DUPLICATE_ID,
        /** A file that cannot be read. */
        FILE_NOT_FOUND
    }

    public InputProblem {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(field, "field");
        Objects.requireNonNull(message, "message");
        if (line < 0 || column < 0) {
            throw new IllegalArgumentException("line and column must be ≥ 0, got " + line + ":" + column);
        }
    }

    /**
     * The problem as one line, {@code file:line:column: field: message}; the location is left out when unknown
     * and the field when empty.
     */
    public String format() {
        StringBuilder sb = new StringBuilder(file);
        if (line > 0) {
            sb.append(':').append(line).append(':').append(column);
        }
        sb.append(": ");
        if (!field.isEmpty()) {
            sb.append(field).append(": ");
        }
        return sb.append(message).toString();
    }
}
