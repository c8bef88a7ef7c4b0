package org.tjmargin.design;

/** Whether a key must be present. */
enum Need {
    /** Absent: a {@link InputProblem.Kind#MISSING_FIELD} problem. */
    REQUIRED,
    /** Absent: no problem, the reader applies the documented default. */
    OPTIONAL
}
