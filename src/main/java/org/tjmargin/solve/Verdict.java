package org.tjmargin.solve;

/** The outcome of a position, and of a design (the worst of its positions). */
public enum Verdict {
    /** Every rule holds at every corner of every ambient in the range. */
    PASS,
    /** A rule is violated somewhere in the range. */
    FAIL,
    /** A corner runs away thermally somewhere in the range. */
    RUNAWAY,
    /** A solve did not converge: the tool cannot stand behind an answer. */
    UNRESOLVED;

    /** The worse of two verdicts (UNRESOLVED over RUNAWAY over FAIL over PASS). */
    public Verdict worse(Verdict o) {
        return ordinal() >= o.ordinal() ? this : o;
    }
}
