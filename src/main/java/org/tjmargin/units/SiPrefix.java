package org.tjmargin.units;

import java.util.Optional;

/**
 * The SI prefixes that tjmargin reads, from yocto (10⁻²⁴) to giga (10⁹).
 *
 * <p>Micro is written with the micro sign µ (U+00B5); the Greek small letter mu μ (U+03BC) and
 * the ASCII letter {@code u} are read as micro too. Centi is read only on the metre (cm, cm²).
 * The larger prefixes (tera and up) and deca, hecto and deci are not read.
 */
public enum SiPrefix {
    /** 10⁻²⁴. */
    YOCTO("yocto", "y", -24),
    /** 10⁻²¹. */
    ZEPTO("zepto", "z", -21),
    /** 10⁻¹⁸. */
    ATTO("atto", "a", -18),
    /** 10⁻¹⁵. */
    FEMTO("femto", "f", -15),
    /** 10⁻¹². */
    PICO("pico", "p", -12),
    /** 10⁻⁹. */
    NANO("nano", "n", -9),
    /** 10⁻⁶, symbol µ (U+00B5). */
    MICRO("micro", "\u00B5", -6),
    /** 10⁻³. */
    MILLI("milli", "m", -3),
    /** 10⁻², read only on the metre. */
    CENTI("centi", "c", -2),
    /** 10³. */
    KILO("kilo", "k", 3),
    /** 10⁶. */
    MEGA("mega", "M", 6),
    /** 10⁹. */
    GIGA("giga", "G", 9);

    private final String prefixName;
    private final String symbol;
    private final int exponent;
    private final double factor;

    SiPrefix(String prefixName, String symbol, int exponent) {
        this.prefixName = prefixName;
        this.symbol = symbol;
        this.exponent = exponent;
        this.factor = Double.parseDouble("1e" + exponent);
    }

    /**
     * Returns the prefix name.
     *
     * @return the name in lower case, for example {@code "milli"}
     */
    public String prefixName() {
        return prefixName;
    }

    /**
     * Returns the symbol that is printed.
     *
     * @return the symbol, for example {@code "m"} or {@code "µ"} (U+00B5)
     */
    public String symbol() {
        return symbol;
    }

    /**
     * Returns the power of ten that the prefix stands for.
     *
     * @return the exponent, for example -3 for milli
     */
    public int exponent() {
        return exponent;
    }

    /**
     * Returns the factor that the prefix stands for, as the double nearest to 10^exponent.
     *
     * @return the factor, for example 0.001 for milli
     */
    public double factor() {
        return factor;
    }

    /**
     * Tells whether the exponent is a multiple of three (every prefix here except centi).
     *
     * @return true for the prefixes used in engineering display
     */
    public boolean isEngineering() {
        return exponent % 3 == 0;
    }

    /**
     * Finds the prefix written with the given symbol.
     *
     * @param symbol a one-character symbol; {@code "µ"} (U+00B5), {@code "μ"} (U+03BC) and
     *     {@code "u"} all give {@link #MICRO}
     * @return the prefix, or empty when the symbol is not one of the prefixes read here
     */
    public static Optional<SiPrefix> fromSymbol(String symbol) {
        if (symbol.equals("u") || symbol.equals("\u03BC")) {
            return Optional.of(MICRO);
        }
        for (SiPrefix p : values()) {
            if (p.symbol.equals(symbol)) {
                return Optional.of(p);
            }
        }
        return Optional.empty();
    }
}
