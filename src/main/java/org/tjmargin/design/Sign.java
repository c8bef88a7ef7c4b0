package org.tjmargin.design;

/** The sign a quantity must have to be physical; a violation is a {@link InputProblem.Kind#NOT_PHYSICAL}. */
enum Sign {
    /** Any finite value. */
    ANY("", true),
    /** Strictly positive: resistances, currents, powers, lengths. */
    POSITIVE("> 0", false),
    /** Zero allowed: a source resistance of 0 Ω is a stiff line. */
    NON_NEGATIVE("≥ 0", true);

    private final String phrase;
    private final boolean zeroAllowed;

    Sign(String phrase, boolean zeroAllowed) {
        this.phrase = phrase;
        this.zeroAllowed = zeroAllowed;
    }

    /** True when {@code v} has this sign. */
    boolean admits(double v) {
        return this == ANY || v > 0 || (zeroAllowed && v == 0);
    }

    /** The condition, e.g. "> 0". */
    String phrase() {
        return phrase;
    }
}
