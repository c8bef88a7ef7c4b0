package org.tjmargin.cli;

import org.tjmargin.solve.Verdict;

/** Exit statuses of the command line (design section 4). */
public final class ExitCodes {
    /** Every position passes its policy. */
    public static final int PASS = 0;
    /** At least one position violates its policy (or runs away thermally). */
    public static final int VIOLATION = 1;
    /** The input is invalid: one message per problem, nothing written. */
    public static final int INVALID_INPUT = 2;
    /** The solver could not reach an answer it can stand behind. */
    public static final int UNRESOLVED = 3;

    private ExitCodes() {
    }

    /** The status for a design verdict. */
    public static int of(Verdict v) {
        return switch (v) {
            case PASS -> PASS;
            case FAIL, RUNAWAY -> VIOLATION;
            case UNRESOLVED -> UNRESOLVED;
        };
    }
}
