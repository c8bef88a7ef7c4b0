package org.tjmargin.surge;

/**
 * A front time and time to half value that a waveform model cannot produce, or whose solve did not converge.
 * Carries the request and, for an unreachable ratio, the reachable range of {@code T1/T2}.
 */
public final class PulseTimingException extends IllegalArgumentException {

    /** What went wrong. */
    public enum Kind {
        /** the ratio {@code T1/T2} is outside what the model can reach */
        UNREACHABLE_RATIO,
        /** the solve ran out of budget */
        NOT_CONVERGED
    }

    private final Kind kind;
    private final double frontTimeS;
    private final double timeToHalfS;
    private final double lowestReachableRatio;
    private final double highestReachableRatio;

    PulseTimingException(Kind kind, SurgeQuantity quantity, double frontTimeS, double timeToHalfS, double lowestReachableRatio,
            double highestReachableRatio, String detail) {
        super(message(kind, quantity, frontTimeS, timeToHalfS, lowestReachableRatio, highestReachableRatio, detail));
        this.kind = kind;
        this.frontTimeS = frontTimeS;
        this.timeToHalfS = timeToHalfS;
        this.lowestReachableRatio = lowestReachableRatio;
        this.highestReachableRatio = highestReachableRatio;
    }

    private static String message(Kind kind, SurgeQuantity quantity, double t1, double t2, double lo, double hi, String detail) {
        String request = String.format("%s pulse T1 = %.6g s, T2 = %.6g s (T1/T2 = %.6g)", quantity.name().toLowerCase(), t1, t2, t1 / t2);
        return switch (kind) {
            case UNREACHABLE_RATIO -> "a double exponential cannot make the " + request + ": with the "
                    + quantity.name().toLowerCase() + " timing definitions it reaches T1/T2 only between "
                    + String.format("%.6g and %.6g", lo, hi) + detail;
            case NOT_CONVERGED -> "timing solve for the " + request + " did not converge: " + detail;
        };
    }

    /** @return what went wrong */
    public Kind kind() {
        return kind;
    }

    /** @return the requested front time {@code T1} (s) */
    public double frontTimeS() {
        return frontTimeS;
    }

    /** @return the requested time to half value {@code T2} (s) */
    public double timeToHalfS() {
        return timeToHalfS;
    }

    /** @return the lowest reachable {@code T1/T2} */
    public double lowestReachableRatio() {
        return lowestReachableRatio;
    }

    /** @return the highest reachable {@code T1/T2} (the limit as the two time constants meet) */
    public double highestReachableRatio() {
        return highestReachableRatio;
    }
}
