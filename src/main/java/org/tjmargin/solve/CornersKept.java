package org.tjmargin.solve;

/**
 * Which corners a position's point keeps ({@link PositionAtAmbient}): every corner, or only the reported ones (the
 * hottest, the least-current and each rule's worst), as the sweep keeps them below the design's highest ambient and
 * as the searches, which read only the status and the margin, need them.
 *
 * <p>The choice is carried as the mark a corner starts with before the reported ones are marked kept
 * ({@link #startMark}), so that the policy check reads it without a branch: the sweep takes the "every corner"
 * choice only at its last ambient, and a branch first taken there would make the optimising compiler throw away and
 * redo its compile of the whole check.
 */
enum CornersKept {
    /** Every corner. */
    EVERY(0),
    /** Only the reported corners. */
    REPORTED(-1);

    /** The mark every corner starts with: 0 kept, −1 dropped unless reported. */
    final int startMark;

    CornersKept(int startMark) {
        this.startMark = startMark;
    }

    /** {@link #EVERY} when {@code every}, else {@link #REPORTED}. */
    static CornersKept every(boolean every) {
        return every ? EVERY : REPORTED;
    }
}
