package org.tjmargin.solve;

/**
 * The highest ambient at which a position still meets every rule (design 2.5).
 *
 * @param status   how the search ended
 * @param ambientK the highest passing ambient found (K): within {@link MaximumAmbientSearch#TOLERANCE_K} below the
 *                 first failing one for {@link Status#FOUND}; the search's end for {@link Status#HOLDS_TO_LIMIT};
 *                 0 for {@link Status#NONE}
 */
public record MaximumAmbient(Status status, double ambientK) {

    /** How the search ended. */
    public enum Status {
        /** Bracketed and refined. */
        FOUND,
        /** Still passing at the highest ambient searched (the part's Tj max). */
        HOLDS_TO_LIMIT,
        /** Failing at every ambient searched. */
        NONE
    }
}
