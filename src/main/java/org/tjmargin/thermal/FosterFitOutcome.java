package org.tjmargin.thermal;

import java.util.Optional;

/**
 * The outcome of fitting a Foster network: {@link Fitted} or {@link Failed}, never a network of NaNs.
 * Residuals are natural logarithms of model over target, so an RMS of 0.01 is about 1 % error.
 */
public sealed interface FosterFitOutcome permits FosterFitOutcome.Fitted, FosterFitOutcome.Failed {

    /** What the network was fitted to. */
    enum Basis {
        /** datasheet {@code Zth(t)} points ({@link ZthFit}) */
        ZTH_POINTS,
        /** a peak-pulse-power versus pulse-width rating curve ({@link PulseRatingFit}) */
        PULSE_RATING_CURVE,
        /** the semi-infinite die model, capped by a steady-state resistance ({@link SemiInfiniteDie}): an estimate */
        SEMI_INFINITE_DIE_ESTIMATE
    }

    /** Why a fit failed. */
    enum Reason {
        /** the evaluation or iteration budget ran out */
        BUDGET_EXHAUSTED,
        /** the optimizer could not make progress (singular or ill-conditioned problem) */
        NOT_CONVERGED,
        /** a pulse's peak search did not meet its tolerance within its budget */
        PEAK_SEARCH_NOT_CONVERGED
    }

    /** @return what was fitted */
    Basis basis();

    /** @return model evaluations spent */
    int evaluations();

    /** @return the network, or throws {@link FosterFitException} carrying the failure */
    FosterNetwork networkOrThrow();

    /**
     * @param network          fitted network, stages ordered by increasing time constant
     * @param basis            what was fitted
     * @param rmsLogResidual   root mean square of {@code ln(model/target)}
     * @param maxAbsLogResidual largest {@code |ln(model/target)|}
     * @param iterations       optimizer iterations
     * @param evaluations      model evaluations
     */
    record Fitted(FosterNetwork network, Basis basis, double rmsLogResidual, double maxAbsLogResidual, int iterations,
            int evaluations) implements FosterFitOutcome {

        /** @return whether the network is an estimate that every output should flag as such */
        public boolean estimated() {
            return basis == Basis.SEMI_INFINITE_DIE_ESTIMATE;
        }

        @Override
        public FosterNetwork networkOrThrow() {
            return network;
        }
    }

    /**
     * @param basis          what was being fitted
     * @param reason         why it failed
     * @param detail         the optimizer's message
     * @param evaluations    model evaluations spent
     * @param lastNetwork    the last network evaluated, if any evaluation succeeded
     * @param lastRmsLogResidual its RMS log residual ({@code +∞} if none)
     */
    record Failed(Basis basis, Reason reason, String detail, int evaluations, Optional<FosterNetwork> lastNetwork,
            double lastRmsLogResidual) implements FosterFitOutcome {

        @Override
        public FosterNetwork networkOrThrow() {
            throw new FosterFitException(this);
        }
    }
}
