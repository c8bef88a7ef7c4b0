package org.tjmargin.thermal;

/** Thrown by {@link FosterFitOutcome#networkOrThrow()} when a fit failed; carries the failure. */
public final class FosterFitException extends RuntimeException {

    private final transient FosterFitOutcome.Failed failure;

    FosterFitException(FosterFitOutcome.Failed failure) {
        super("Foster fit to " + failure.basis() + " failed (" + failure.reason() + ") after " + failure.evaluations()
                + " evaluations, last RMS log residual " + failure.lastRmsLogResidual() + ": " + failure.detail());
        this.failure = failure;
    }

    /** @return the failed outcome */
    public FosterFitOutcome.Failed failure() {
        return failure;
    }
}
