package org.tjmargin.surge;

/**
 * The outcome of a clamp transient: {@link Completed}, or {@link Stopped} with the reason, the partial result and
 * the last iterate. Never a result with NaN in it.
 */
public sealed interface ClampTransientOutcome permits ClampTransientOutcome.Completed, ClampTransientOutcome.Stopped {

    /** Why a transient stopped early. */
    enum Reason {
        /** the accepted-step budget ran out before the end of the waveform */
        STEP_BUDGET_EXHAUSTED,
        /** the junction-temperature fixed point did not converge even at the smallest step */
        COUPLING_NOT_CONVERGED,
        /** the error control asked for a step below the smallest allowed (a discontinuity off the breakpoints) */
        STEP_TOO_SMALL,
        /** the junction passed {@link ClampTransient#RUNAWAY_CAP_K} during the pulse: a physical outcome (the part
         * fails), not a numerical one; the partial result carries the temperature reached */
        JUNCTION_RUNAWAY
    }

    /** @return the result, partial (up to {@link ClampTransientResult#endTimeS()}) when stopped */
    ClampTransientResult result();

    /** @return the complete result, or throws {@link TransientStoppedException} carrying the stop */
    ClampTransientResult resultOrThrow();

    /** @param result the complete result */
    record Completed(ClampTransientResult result) implements ClampTransientOutcome {
        @Override
        public ClampTransientResult resultOrThrow() {
            return result;
        }
    }

    /**
     * @param reason              why it stopped
     * @param result              the result up to the stop
     * @param stoppedAtS          the time at which the failing step started (s)
     * @param lastStepS           the last step length tried (s)
     * @param lastJunctionTemperatureK the last junction-temperature iterate (K)
     * @param lastResidualK       the last change between fixed-point iterates (K), or 0 if the coupling was not the cause
     */
    record Stopped(Reason reason, ClampTransientResult result, double stoppedAtS, double lastStepS,
            double lastJunctionTemperatureK, double lastResidualK) implements ClampTransientOutcome {
        @Override
        public ClampTransientResult resultOrThrow() {
            throw new TransientStoppedException(this);
        }
    }
}
