package org.tjmargin.surge;

/** Thrown by {@link ClampTransientOutcome#resultOrThrow()} when a transient stopped early; carries the stop. */
public final class TransientStoppedException extends RuntimeException {

    private final transient ClampTransientOutcome.Stopped stop;

    TransientStoppedException(ClampTransientOutcome.Stopped stop) {
        super("clamp transient stopped (" + stop.reason() + ") at t = " + stop.stoppedAtS() + " s after "
                + stop.result().steps() + " steps, last step " + stop.lastStepS() + " s, last Tj " + stop.lastJunctionTemperatureK()
                + " K, last residual " + stop.lastResidualK() + " K");
        this.stop = stop;
    }

    /** @return the stopped outcome */
    public ClampTransientOutcome.Stopped stop() {
        return stop;
    }
}
