package org.tjmargin.units;

import java.util.Objects;

/**
 * A value in coherent SI units, tagged with its dimension.
 *
 * <p>An absolute temperature ({@link Dimension#TEMPERATURE}) is in kelvin and may not be negative.
 * Negative zero is stored as positive zero, so that equal values compare equal.
 *
 * @param valueSi the value in the SI unit of the dimension ({@link Dimension#symbol()}); finite
 * @param dimension what the value measures; not null
 */
public record Quantity(double valueSi, Dimension dimension) {

    /**
     * Checks and normalises the components.
     *
     * @param valueSi the value in the SI unit of the dimension; finite
     * @param dimension what the value measures; not null
     * @throws NullPointerException if the dimension is null
     * @throws IllegalArgumentException if the value is NaN or infinite, or is an absolute
     *     temperature below 0 K
     */
    public Quantity {
        Objects.requireNonNull(dimension, "dimension");
        if (!Double.isFinite(valueSi)) {
            throw new IllegalArgumentException("a " + dimension.humanName()
                    + " must be a finite number, got " + valueSi);
        }
        if (dimension == Dimension.TEMPERATURE && valueSi < 0) {
            throw new IllegalArgumentException(
                    "an absolute temperature cannot be below 0 K, got " + valueSi + " K");
        }
        valueSi = valueSi + 0.0; // turns -0.0 into 0.0
    }

    /**
     * Formats the value for display, as {@link Quantities#format(double, Dimension)} does.
     *
     * @return the display text, for example {@code "6.30 mA"}
     */
    public String format() {
        return Quantities.format(valueSi, dimension);
    }

    /**
     * Formats the value for display, as {@link Quantities#format(double, Dimension, int)} does.
     *
     * @param significantDigits how many significant digits to show, 1 to 17
     * @return the display text
     */
    public String format(int significantDigits) {
        return Quantities.format(valueSi, dimension, significantDigits);
    }
}
