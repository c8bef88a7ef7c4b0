package org.tjmargin.solve;

/**
 * Outcome of the search for the lowest fixed point {@code x = F(x)} above a start value: a root, a proof that
 * none exists below the cap (runaway), or an exhausted budget with the last iterate and its residual.
 */
public sealed interface FixedPointOutcome
        permits FixedPointOutcome.Root, FixedPointOutcome.Runaway, FixedPointOutcome.Exhausted {

    /** Evaluations of {@code F} used. */
    int evaluations();

    /**
     * The lowest fixed point.
     *
     * @param x           the root
     * @param residual    {@code x − F(x)} there
     * @param evaluations evaluations used
     */
    record Root(double x, double residual, int evaluations) implements FixedPointOutcome {
    }

    /**
     * No fixed point below the cap: {@code F(x) > x} all the way up.
     *
     * @param lastX       the highest point examined (the cap)
     * @param evaluations evaluations used
     */
    record Runaway(double lastX, int evaluations) implements FixedPointOutcome {
    }

    /**
     * Budget spent before the search could stand behind an answer.
     *
     * @param lastX       last iterate
     * @param residual    {@code x − F(x)} there
     * @param evaluations evaluations used
     */
    record Exhausted(double lastX, double residual, int evaluations) implements FixedPointOutcome {
    }
}
