package org.tjmargin.units;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Tells why a text could not be read as a quantity.
 *
 * <p>It carries the parts of the problem separately, so that a caller can report them in its own
 * terms and add where the text came from (file, line, column, field), which this package does not
 * know. The message is for people and may change; programs should use {@link #kind()},
 * {@link #text()}, {@link #unit()}, {@link #expected()} and {@link #actual()}.
 */
public final class QuantityException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    /** What was wrong with the text. */
    public enum Kind {
        /** The text is empty or blank. */
        EMPTY,
        /** The text does not start with a number (or uses a decimal comma). */
        NOT_A_NUMBER,
        /** A number without a unit, where a unit is needed (anything but a fraction). */
        MISSING_UNIT,
        /** The unit is not one that is read. */
        UNKNOWN_UNIT,
        /** The unit could be read in more than one way, e.g. {@code W/m·K}. */
        AMBIGUOUS_UNIT,
        /** The unit is known, but not with the prefix written before it, e.g. {@code m°C}. */
        PREFIX_NOT_ALLOWED,
        /** The unit is known but measures another dimension than the one expected. */
        WRONG_DIMENSION,
        /** The number is NaN or infinite, or too large to be held as a finite double. */
        NOT_FINITE,
        /** The number is not zero but too small in magnitude to be held as a double. */
        UNDERFLOW,
        /** An absolute temperature below 0 K. */
        BELOW_ABSOLUTE_ZERO
    }

    /** What was wrong. */
    private final Kind kind;
    /** The rejected text, as given. */
    private final String text;
    /** The unit as written, or null when none was reached. */
    private final String unit;
    /** The accepted dimensions, in the order given (an array, so that it serialises). */
    private final Dimension[] expected;
    /** The dimension of the unit, for a wrong dimension; otherwise null. */
    private final Dimension actual;

    QuantityException(Kind kind, String text, String unit, List<Dimension> expected,
            Dimension actual, String message) {
        super(message);
        this.kind = Objects.requireNonNull(kind, "kind");
        this.text = Objects.requireNonNull(text, "text");
        this.unit = unit;
        this.expected = expected.toArray(new Dimension[0]);
        this.actual = actual;
    }

    /**
     * Returns what was wrong.
     *
     * @return the kind of problem
     */
    public Kind kind() {
        return kind;
    }

    /**
     * Returns the text that was rejected, exactly as it was given.
     *
     * @return the offending text
     */
    public String text() {
        return text;
    }

    /**
     * Returns the unit as written in the text, when the text had a number followed by a unit.
     *
     * @return the unit text, trimmed; empty when no unit was reached
     */
    public Optional<String> unit() {
        return Optional.ofNullable(unit);
    }

    /**
     * Returns the dimensions that the caller accepted, in the order given.
     *
     * @return an unmodifiable, non-empty list
     */
    public List<Dimension> expected() {
        return List.of(expected);
    }

    /**
     * Returns the dimension that the unit actually has, for {@link Kind#WRONG_DIMENSION}.
     *
     * @return the actual dimension; empty for every other kind
     */
    public Optional<Dimension> actual() {
        return Optional.ofNullable(actual);
    }
}
