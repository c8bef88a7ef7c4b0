package org.tjmargin.solve;

/** Whether a point (a corner, a position at an ambient, a board) has an answer the tool stands behind. */
public enum PointStatus {
    /** Converged operating point(s). */
    CONVERGED,
    /** At least one corner runs away thermally. */
    RUNAWAY,
    /** At least one solve exhausted its budget. */
    NOT_CONVERGED;

    /** The worse of two statuses (NOT_CONVERGED over RUNAWAY over CONVERGED). */
    public PointStatus worse(PointStatus o) {
        return ordinal() >= o.ordinal() ? this : o;
    }
}
